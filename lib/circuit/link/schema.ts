/**
 * The input schema of `solveLink(system)`: coils and poses, parts with units, drive specs and
 * loads. Quantities accept SI numbers or strings with units ("200 kHz", "2.2 nF", "5 V").
 */
import { z } from "zod";
import { angle, capacitance, current, frequency, power, quantity, resistance, temperature, unitVector, vec3, voltage } from "../../schema.ts";
import type { Coil } from "../../em/types.ts";
import type { DriveEquivalent } from "../drive.ts";
import type { TokenLoad } from "../loads/types.ts";
import type { LinkLoadModel } from "./network.ts";

const coilSchema = z.custom<Coil>(
  (c) =>
    typeof c === "object" &&
    c !== null &&
    Array.isArray((c as Coil).filaments) &&
    (c as Coil).filaments.length > 0 &&
    typeof (c as Coil).conductor === "object",
  { message: "expected a Coil from a builder (roundCoil, flatSpiral, …)" },
);

/** A pose: position (lengths), axis (direction, default +z), spin (angle, default 0). */
export const PoseInput = z.strictObject({
  position: vec3(),
  axis: unitVector().optional(),
  spin: angle().optional(),
});

/** A capacitor: value, and its loss as ESR or dissipation factor tan δ, and a voltage rating. */
export const CapacitorInput = z.strictObject({
  capacitance: capacitance(),
  /** equivalent series resistance, Ω (give this or dissipationFactor; default 0) */
  esr: resistance().optional(),
  /** tan δ at the drive frequency, ESR = tan δ/(ωC) */
  dissipationFactor: quantity("dimensionless", { nonNegative: true, max: 1 }).optional(),
  /** voltage rating, V (compared with the peak voltage) */
  rating: voltage({ positive: true }).optional(),
});

/** Drive specs with units; or pass a ready DriveEquivalent (sineDrive(…), classEDrive(…), …). */
export const DriveInput = z.union([
  z.strictObject({ kind: z.literal("sine"), amplitude: voltage({ nonNegative: true }), outputResistance: resistance().optional() }),
  z.strictObject({ kind: z.literal("halfBridge"), supply: voltage({ positive: true }), onResistance: resistance().optional() }),
  z.strictObject({ kind: z.literal("fullBridge"), supply: voltage({ positive: true }), onResistance: resistance().optional() }),
  z.strictObject({ kind: z.literal("currentRegulated"), amplitude: current({ nonNegative: true }) }),
  z.strictObject({ kind: z.literal("parallelTank"), supply: voltage({ positive: true }), onResistance: resistance().optional() }),
  z.strictObject({ kind: z.literal("classE"), supply: voltage({ positive: true }), power: power({ positive: true }), onResistance: resistance().optional() }),
  z.custom<DriveEquivalent>(
    (d) =>
      typeof d === "object" &&
      d !== null &&
      ((d as DriveEquivalent).kind === "voltage" || (d as DriveEquivalent).kind === "current") &&
      typeof (d as DriveEquivalent).amplitude === "number",
    { message: "expected a drive spec { kind: 'sine' | 'halfBridge' | 'fullBridge' | 'currentRegulated' | 'parallelTank' | 'classE', … } or a drive equivalent from sineDrive(), classEDrive(), …" },
  ),
]);

const loadSchema = z.custom<TokenLoad | LinkLoadModel>(
  (l) =>
    typeof l === "object" &&
    l !== null &&
    (typeof (l as { kind?: unknown }).kind === "string" || typeof (l as LinkLoadModel).conductance === "function"),
  { message: "expected a TokenLoad ({ kind: 'led', led }, …) or a load model with conductance(amplitude)" },
);

/** The transmitter: coil, pose (default at the origin, axis +z), compensation, capacitor, drive. */
export const TransmitterInput = z.strictObject({
  label: z.string().optional(),
  coil: coilSchema,
  pose: PoseInput.optional(),
  compensation: z.enum(["series", "parallel", "none"]),
  capacitor: CapacitorInput.optional(),
  drive: DriveInput,
  /** override of the coil's AC resistance, Ω (default: coilResistance at the frequency) */
  resistance: resistance().optional(),
});

/** One receiver (token). */
export const ReceiverInput = z.strictObject({
  label: z.string().optional(),
  coil: coilSchema,
  pose: PoseInput,
  topology: z.enum(["series", "parallel"]),
  capacitor: CapacitorInput,
  load: loadSchema,
  resistance: resistance().optional(),
});

/** The whole system. */
export const LinkSystemInput = z.strictObject({
  frequency: frequency(),
  transmitter: TransmitterInput,
  receivers: z.array(ReceiverInput),
  /** conductor temperature for the coil resistances, K (default 20 °C) */
  temperature: temperature().optional(),
});

/** What solveLink accepts (quantities as numbers or strings). */
export type LinkSystem = z.input<typeof LinkSystemInput>;
/** The parsed system (SI numbers). */
export type LinkSystemParsed = z.output<typeof LinkSystemInput>;

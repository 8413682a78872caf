/**
 * The input schema of `solveLink(system)`: coils and poses, parts with units, drive specs and
 * loads. Quantities accept SI numbers or strings with units ("200 kHz", "2.2 nF", "5 V").
 */
import * as z from "../../zod.ts";
import { angle, capacitance, frequency, quantity, resistance, temperature, unitVector, vec3, voltage, lazySchema } from "../../schema.ts";
import type { Coil } from "../../em/types.ts";
import { GEOMETRY_LIMITS } from "../../em/inputs.ts";
import { TanklightInputError } from "../../errors.ts";
import { DRIVE_FIELDS, type DriveEquivalent } from "../drive.ts";
import type { TokenLoad } from "../loads/types.ts";
import type { LinkLoadModel } from "./network.ts";

const coilSchema = lazySchema(() => z.custom<Coil>(
  (c) =>
    typeof c === "object" &&
    c !== null &&
    Array.isArray((c as Coil).filaments) &&
    (c as Coil).filaments.length > 0 &&
    typeof (c as Coil).conductor === "object",
  { message: "expected a Coil from a builder (roundCoil, flatSpiral, …)" },
));

/** A pose: position (lengths), axis (direction, default +z), spin (angle, default 0). */
export const PoseInput = lazySchema(() => z.strictObject({
  /** within ±1000 km, as the EM layer's poses (GEOMETRY_LIMITS: beyond it the field sums lose every digit) */
  position: vec3({ min: -GEOMETRY_LIMITS.maxLength, max: GEOMETRY_LIMITS.maxLength }),
  axis: unitVector().optional(),
  spin: angle().optional(),
}));

/** A capacitor: value, and its loss as ESR or dissipation factor tan δ, and a voltage rating. */
export const CapacitorInput = lazySchema(() => z.strictObject({
  capacitance: capacitance(),
  /** equivalent series resistance, Ω (give this or dissipationFactor; default 0) */
  esr: resistance().optional(),
  /** tan δ at the drive frequency, ESR = tan δ/(ωC) */
  dissipationFactor: quantity("dimensionless", { nonNegative: true, max: 1 }).optional(),
  /** voltage rating, V (compared with the peak voltage) */
  rating: voltage({ positive: true }).optional(),
}));

/** Drive specs with units (the fields of DRIVE_FIELDS, lib/circuit/drive.ts); or pass a ready DriveEquivalent (sineDrive(…), classEDrive(…), …). */
export const DriveInput = lazySchema(() => z.union([
  z.strictObject({ kind: z.literal("sine"), ...DRIVE_FIELDS.sine }),
  z.strictObject({ kind: z.literal("halfBridge"), ...DRIVE_FIELDS.switched }),
  z.strictObject({ kind: z.literal("fullBridge"), ...DRIVE_FIELDS.switched }),
  z.strictObject({ kind: z.literal("currentRegulated"), ...DRIVE_FIELDS.current }),
  z.strictObject({ kind: z.literal("parallelTank"), ...DRIVE_FIELDS.switched }),
  z.strictObject({ kind: z.literal("classE"), ...DRIVE_FIELDS.classE }),
  z.custom<DriveEquivalent>(
    (d) =>
      typeof d === "object" &&
      d !== null &&
      ((d as DriveEquivalent).kind === "voltage" || (d as DriveEquivalent).kind === "current") &&
      typeof (d as DriveEquivalent).amplitude === "number",
    { message: "expected a drive spec { kind: 'sine' | 'halfBridge' | 'fullBridge' | 'currentRegulated' | 'parallelTank' | 'classE', … } or a drive equivalent from sineDrive(), classEDrive(), …" },
  ),
]));

const loadSchema = lazySchema(() => z.custom<TokenLoad | LinkLoadModel>(
  (l) =>
    typeof l === "object" &&
    l !== null &&
    (typeof (l as { kind?: unknown }).kind === "string" || typeof (l as LinkLoadModel).conductance === "function"),
  { message: "expected a TokenLoad ({ kind: 'led', led }, …) or a load model with conductance(amplitude)" },
));

/**
 * A transmitter: coil, pose (default at the origin, axis +z), compensation, capacitor, and its
 * drive — its own drive spec (with `phase`, the phase of its EMF or held current, default 0),
 * or the `name` of an entry of the system's `sharedDrives` (then `phase` is 0 or 180°: which
 * way round the coil is connected).
 */
export const TransmitterInput = lazySchema(() => z.strictObject({
  label: z.string().optional(),
  coil: coilSchema,
  pose: PoseInput.optional(),
  compensation: z.enum(["series", "parallel", "none"]),
  capacitor: CapacitorInput.optional(),
  drive: z.union([DriveInput, z.string().min(1)]),
  /** phase of its own drive, or 0 / 180° (connection) on a shared drive; default 0 */
  phase: angle().optional(),
  /** override of the coil's AC resistance, Ω (default: coilResistance at the frequency) */
  resistance: resistance().optional(),
}));

/**
 * A drive shared by several transmitters: its spec, its name (which transmitters give as their
 * `drive`), how the coils hang on it — "series" (one string through every tank) or "parallel"
 * (every tank across its terminals) — and its phase (default 0).
 */
export const SharedDriveInput = lazySchema(() => z.strictObject({
  name: z.string().min(1),
  drive: DriveInput,
  wiring: z.enum(["series", "parallel"]),
  phase: angle().optional(),
}));

/** One receiver (token). */
export const ReceiverInput = lazySchema(() => z.strictObject({
  label: z.string().optional(),
  coil: coilSchema,
  pose: PoseInput,
  topology: z.enum(["series", "parallel"]),
  capacitor: CapacitorInput,
  load: loadSchema,
  resistance: resistance().optional(),
}));

/** At most this many transmitters in one link (each adds a row to a dense complex matrix solved per iteration). */
export const MAX_TRANSMITTERS = 256;

/**
 * The whole system: one `transmitter` (shorthand) or several `transmitters` (give one of the
 * two), the drives they share, and the receivers.
 */
export const LinkSystemInput = lazySchema(() => z
  .strictObject({
    frequency: frequency(),
    transmitter: TransmitterInput.optional(),
    transmitters: z.array(TransmitterInput).min(1).max(MAX_TRANSMITTERS).optional(),
    sharedDrives: z.array(SharedDriveInput).optional(),
    receivers: z.array(ReceiverInput),
    /** conductor temperature for the coil resistances, K (default 20 °C) */
    temperature: temperature().optional(),
  })
  .superRefine((s, ctx) => {
    if (s.transmitter === undefined && s.transmitters === undefined) {
      ctx.addIssue({ code: "custom", path: ["transmitter"], message: "give the transmitter (or a list as 'transmitters')", input: undefined });
    } else if (s.transmitter !== undefined && s.transmitters !== undefined) {
      ctx.addIssue({ code: "custom", path: ["transmitters"], message: "give either 'transmitter' (one) or 'transmitters' (a list), not both", input: s.transmitters });
    }
    const names = (s.sharedDrives ?? []).map((d) => d.name);
    names.forEach((nm, g) => {
      if (names.indexOf(nm) !== g) ctx.addIssue({ code: "custom", path: ["sharedDrives", g, "name"], message: `'${nm}' names two shared drives`, input: nm });
    });
  }));

/** What solveLink accepts (quantities as numbers or strings). */
export type LinkSystem = z.input<typeof LinkSystemInput>;
/** The parsed system (SI numbers). */
export type LinkSystemParsed = z.output<typeof LinkSystemInput>;
/** One parsed transmitter (SI numbers). */
export type TransmitterParsed = z.output<typeof TransmitterInput>;
/** A parsed drive spec or equivalent (SI numbers). */
export type DriveParsed = z.output<typeof DriveInput>;

/**
 * The transmitters of a parsed system, in order: `transmitters`, or the one `transmitter`.
 * @example systemTransmitters({ transmitter: tx0, receivers: [] } as LinkSystemParsed).length // → 1
 */
export function systemTransmitters(s: Pick<LinkSystemParsed, "transmitter" | "transmitters">): readonly TransmitterParsed[] {
  return s.transmitters ?? (s.transmitter !== undefined ? [s.transmitter] : []);
}

/**
 * The one transmitter of a parsed system, for functions that handle one: throws a
 * TanklightInputError naming `transmitters` when the system has several.
 * @param what what cannot take several, for the message (e.g. "toleranceYield").
 */
export function soleTransmitter(s: Pick<LinkSystemParsed, "transmitter" | "transmitters">, where: string): TransmitterParsed {
  const txs = systemTransmitters(s);
  if (txs.length !== 1) {
    throw new TanklightInputError(
      [{ path: "transmitters", message: `${where} handles a system of one transmitter; this one has ${txs.length} (solve arrays with solveLink or solveLinkSequence)`, value: txs.length }],
      where,
    );
  }
  return txs[0]!;
}

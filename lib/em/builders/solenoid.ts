/**
 * solenoid — a single-layer circular coil with a pitch. `radius` is the radius of the wire
 * centres (the current sheet's radius in Nagaoka's formula); the winding length is
 * ℓ = turns·pitch (each turn owns one pitch of the sheet), so a close-wound solenoid of N turns has
 * pitch = wire outer diameter and ℓ = N·d_o. Turns are circle filaments at
 * z = (i − (N − 1)/2)·pitch; wire length N·√((2πa)² + pitch²) (the helix; leads excluded).
 */
import * as z from "../../zod.ts";
import { parseInput, length, lazySchema } from "../../schema.ts";
import type { Coil, CoilShape } from "../types.ts";
import { IssueList, count, metres } from "./common.ts";
import { conductorFields, conductorFootprint, resolveConductor } from "./conductor.ts";
import { layeredTurns } from "./roundCoil.ts";

/** Input of {@link solenoid}: lengths as SI numbers (m) or strings. */
export const SolenoidSpec = lazySchema(() => z.strictObject({
  /** radius of the wire centres, m */
  radius: length(),
  turns: count(1, "turns"),
  /** centre-to-centre distance of neighbouring turns, m (give pitch or length; default: outer diameter) */
  pitch: length().optional(),
  /** winding length = turns·pitch, m */
  length: length().optional(),
  ...conductorFields,
}));
/** What {@link solenoid} accepts. */
export type SolenoidInput = z.input<typeof SolenoidSpec>;
/** The shape record of a solenoid. */
export type SolenoidShape = Extract<CoilShape, { kind: "solenoid" }>;
/** A coil made by {@link solenoid}. */
export type Solenoid = Coil & { readonly shape: SolenoidShape };

/**
 * A single-layer solenoid of round wire.
 * @param spec.radius wire-centre radius a, m, ≥ d_o (the turn's inner edge at least d_o/2 from the axis).
 * @param spec.turns N, integer ≥ 1.
 * @param spec.pitch p ≥ d_o, m, or spec.length ℓ (p = ℓ/N); default p = d_o (close wound).
 * @param spec.wire / spec.awg the wire.
 * @returns a readonly Coil with shape `{ kind: "solenoid", radius, length, pitch, turns }`.
 * @example solenoid({ radius: "10 mm", turns: 20, wire: { diameter: "0.5 mm" } }).shape.length // → 0.01
 */
export function solenoid(spec: SolenoidInput): Solenoid {
  const where = "solenoid";
  const s = parseInput(SolenoidSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(s, issues, false);
  if (s.pitch !== undefined && s.length !== undefined) issues.add("pitch", "give pitch or length, not both", spec.pitch);
  issues.throwIfAny();
  const od = conductorFootprint(conductor!);
  const pitch = s.pitch ?? (s.length !== undefined ? s.length / s.turns : od);
  if (pitch < od) {
    const field = s.length !== undefined ? "length" : "pitch";
    issues.add(
      field,
      `gives a pitch of ${metres(pitch)}, narrower than the wire's outer diameter ${metres(od)}`,
      field === "length" ? spec.length : spec.pitch,
      field === "length" ? `≥ ${metres(od * s.turns)}` : `≥ ${metres(od)}`,
    );
  }
  if (s.radius < od) {
    issues.add("radius", `is smaller than the wire's outer diameter ${metres(od)}: a turn cannot be wound tighter than its own wire`, spec.radius, `≥ ${metres(od)}`);
  }
  issues.throwIfAny();
  const { filaments, wireLength } = layeredTurns(s.radius, s.turns, s.turns, pitch, pitch);
  const shape: SolenoidShape = { kind: "solenoid", radius: s.radius, length: s.turns * pitch, pitch, turns: s.turns };
  return Object.freeze({ filaments: Object.freeze(filaments), conductor: conductor!, turns: s.turns, wireLength, shape });
}

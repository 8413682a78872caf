/**
 * Quality factor of a coil from the loss models: Q = ωL/R.
 */

import { underName } from "../../errors.ts";
import type { Coil } from "../types.ts";
import { selfInductanceDetailCore } from "../selfInductance.ts";
import { selfResonance } from "../selfCapacitance.ts";
import { coilLossInputs, coilResistanceCore, type CoilResistanceOptions } from "./coilResistance.ts";

/** Q with what it was computed from. */
export interface QualityFactorDetail {
  /** Q = ωL/R, dimensionless */
  readonly q: number;
  /** L at f, H */
  readonly inductance: number;
  /** AC series resistance at f, Ω */
  readonly resistance: number;
  /** estimated self-resonant frequency, Hz */
  readonly selfResonance: number;
  readonly warnings: readonly string[];
}

/**
 * Quality factor of a coil and its parts at one frequency.
 *
 * Q = 2πf·L(f)/R(f), L from selfInductance(coil, { frequency: f }) (filament method), R from
 * coilResistanceDetail (DC at temperature + skin + proximity). The self-capacitance is not folded
 * into Q (it raises the apparent L and lowers Q near resonance); above f_sr/3 a warning says so.
 * @param coil the coil. @param f frequency, Hz, > 0 ("200 kHz" accepted). @param opts `{ temperature }`, K (default 293.15 K).
 * @returns `{ q, inductance (H), resistance (Ω), selfResonance (Hz), warnings }`.
 * @example qualityFactorDetail(tx20Turns, 200e3).q // → 89.7 (radius 40 mm, 20 turns of 0.5 mm wire with 25 µm enamel)
 */
export function qualityFactorDetail(coil: Coil, f: number | string, opts: CoilResistanceOptions = {}): QualityFactorDetail {
  return qualityFactorAt(coil, f, opts, "qualityFactor");
}

function qualityFactorAt(coil: Coil, freq: number | string, opts: CoilResistanceOptions, where: string): QualityFactorDetail {
  const x = coilLossInputs(coil, freq, opts, where, true);
  const f = x.f;
  const r = coilResistanceCore(coil, f, x.temperature, true);
  const L = selfInductanceDetailCore(coil, f).value;
  const fsr = underName(where, () => selfResonance(coil));
  const warnings = [...r.warnings];
  if (f > fsr / 3) {
    warnings.push(`frequency ${f.toPrecision(4)} Hz is above a third of the coil's estimated self-resonance ${fsr.toPrecision(3)} Hz: lumped L, R and Q are no longer accurate`);
  }
  return { q: (2 * Math.PI * f * L) / r.total, inductance: L, resistance: r.total, selfResonance: fsr, warnings };
}

/**
 * Quality factor Q = ωL/R of a coil at frequency f (see qualityFactorDetail for parts and warnings).
 * @param coil the coil. @param f frequency, Hz, > 0. @param opts temperature, K.
 * @returns Q, dimensionless.
 * @example qualityFactor(tx20Turns, 200e3) // → 89.7
 */
export function qualityFactor(coil: Coil, f: number | string, opts: CoilResistanceOptions = {}): number {
  return qualityFactorAt(coil, f, opts, "qualityFactor").q;
}

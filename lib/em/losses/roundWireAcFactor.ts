/**
 * Exact skin-effect resistance ratio of an isolated straight round wire.
 */

import { requirePositive, requireNonNegative } from "../../errors.ts";
import { kelvinScaledInto } from "../../math/kelvin.ts";
import { checkNumbers } from "../inputs.ts";
import { skinDepthCore } from "./skinDepth.ts";


/**
 * R_ac/R_dc from q = √2·r/δ (hot path: no checks, no allocation). q ≥ 0.
 *
 * R_ac/R_dc = (q/2)·(ber q·bei′q − bei q·ber′q)/(ber′²q + bei′²q), evaluated with the Kelvin
 * functions scaled by e^{−q/√2} (the scale cancels), so it is finite for any q.
 */
export function acFactorFromQ(q: number): number {
  if (q === 0) return 1;
  const buf = new Float64Array(6);
  kelvinScaledInto(q, buf);
  const br = buf[0]!, bi = buf[1]!;
  const b1r = buf[2]!, b1i = buf[3]!;
  const dr = (b1r + b1i) * Math.SQRT1_2; // ber′
  const di = (b1i - b1r) * Math.SQRT1_2; // bei′
  return ((q / 2) * (br * di - bi * dr)) / (dr * dr + di * di);
}

/**
 * The input check of the round-wire loss functions: the wire's size (radius or diameter, m) and
 * its resistivity (Ω·m) finite and > 0, the frequency (Hz) finite and ≥ 0; throws
 * TanklightInputError naming the field under `where`.
 * @example checkRoundWire("roundWireAcFactor", "radius", 0.25e-3, 0, 1.7241e-8) // → undefined
 */
export function checkRoundWire(where: string, sizeField: string, size: number, f: number, resistivity: number): void {
  requirePositive(size, sizeField, "m", where);
  requirePositive(resistivity, "resistivity", "Ω·m", where);
  requireNonNegative(f, "f", "Hz", where);
  checkNumbers(where, [[sizeField, size, "positive"], ["f", f, "nonNegative"], ["resistivity", resistivity, "positive"]]);
}

/**
 * Exact AC-to-DC resistance ratio of an isolated straight round wire (skin effect only).
 *
 * With δ = √(ρ/(πfμ₀)) and q = √2·r/δ:
 * R_ac/R_dc = (q/2)·(ber q·bei′q − bei q·ber′q)/(ber′²q + bei′²q)
 * (the Kelvin-function form of Re[(ka/2)J₀(ka)/J₁(ka)], k = (1−j)/δ; Ramo, Whinnery & Van Duzer
 * §5.14; Terman, Radio Engineers' Handbook 1943 §2). Low frequency 1 + (r/δ)⁴/48 − …; high
 * frequency r/(2δ) + 1/4 + 3δ/(32r) + ….
 * @param radius bare conductor radius, m, > 0.
 * @param f frequency, Hz, ≥ 0 (0 → exactly 1).
 * @param resistivity conductor resistivity, Ω·m, > 0 (non-magnetic conductor).
 * @returns R_ac/R_dc, dimensionless, ≥ 1.
 * @example roundWireAcFactor(0.25e-3, 200e3, 1.7241e-8) // → 1.1504 (0.5 mm copper, 200 kHz)
 * @example roundWireAcFactor(0.25e-3, 0, 1.7241e-8) // → 1
 */
export function roundWireAcFactor(radius: number, f: number, resistivity: number): number {
  checkRoundWire("roundWireAcFactor", "radius", radius, f, resistivity);
  if (f === 0) return 1;
  const delta = skinDepthCore(f, resistivity);
  return acFactorFromQ((Math.SQRT2 * radius) / delta);
}

/**
 * Internal-inductance factor Y of an isolated straight round wire: Y = 2πL′_int/μ₀, exactly.
 *
 * From the same internal impedance as roundWireAcFactor: ωL′_int = Im Z′, giving with
 * q = √2·r/δ  Y = (ber q·ber′q + bei q·bei′q) / (q·(ber′²q + bei′²q))  — 1/4 at DC (uniform
 * current), → δ/(2r) at high frequency (Ramo, Whinnery & Van Duzer §5.14, Kelvin form). It is the
 * Y of the own-turn term μ₀a(ln(8a/r) − 2 + Y) (Rosa & Grover) without a fitted blend.
 * @param radius bare conductor radius, m, > 0.
 * @param f frequency, Hz, ≥ 0 (0 → exactly 1/4).
 * @param resistivity Ω·m, > 0 (non-magnetic conductor).
 * @returns Y, dimensionless, in (0, 1/4].
 * @example roundWireInternalInductanceFactor(0.25e-3, 200e3, 1.7241e-8) // → 0.2314
 */
export function roundWireInternalInductanceFactor(radius: number, f: number, resistivity: number): number {
  checkRoundWire("roundWireInternalInductanceFactor", "radius", radius, f, resistivity);
  if (f === 0) return 0.25;
  const q = (Math.SQRT2 * radius) / skinDepthCore(f, resistivity);
  // small q: ber′ = (ber₁ + bei₁)/√2 cancels to O(q³), so use the series Y = 1/4 − x⁴/384 + O(x⁸),
  // x = r/δ = q/√2 (checked against the exact fixture); at x < 0.05 the O(x⁸) rest is < 1e-14
  if (q < 0.05 * Math.SQRT2) return 0.25 - (q * q * q * q) / 1536;
  const buf = new Float64Array(6);
  kelvinScaledInto(q, buf);
  const br = buf[0]!, bi = buf[1]!;
  const b1r = buf[2]!, b1i = buf[3]!;
  const dr = (b1r + b1i) * Math.SQRT1_2;
  const di = (b1i - b1r) * Math.SQRT1_2;
  return (br * dr + bi * di) / (q * (dr * dr + di * di));
}

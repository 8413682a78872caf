/**
 * Skin depth of a good conductor.
 */

import { MU0 } from "../../constants.ts";
import { TanklightInputError, requirePositive } from "../../errors.ts";

/**
 * Skin depth: the depth at which a plane wave's current density in a good conductor falls to 1/e.
 *
 * δ = √(ρ / (π f μ₀ μ_r)) (Ramo, Whinnery & Van Duzer, Fields and Waves, §3.16; valid while
 * the conductor is "good", σ ≫ ωε, true for metals far beyond our band).
 * @param f frequency, Hz, > 0.
 * @param resistivity conductor resistivity, Ω·m, > 0.
 * @param muR relative permeability, ≥ 1 for the conductors we model, default 1.
 * @returns δ, m.
 * @example skinDepth(100e3, 1.7241e-8) // → 2.0898e-4 m (annealed copper, 100 kHz)
 * @example skinDepth(50, 1.7241e-8) // → 9.3456e-3 m
 */
export function skinDepth(f: number, resistivity: number, muR = 1): number {
  requirePositive(f, "f", "Hz", "skinDepth");
  requirePositive(resistivity, "resistivity", "Ω·m", "skinDepth");
  if (!(Number.isFinite(muR) && muR >= 1)) {
    throw new TanklightInputError([{ path: "muR", message: "must be a finite number ≥ 1", value: muR, expected: "≥ 1" }], "skinDepth");
  }
  return Math.sqrt(resistivity / (Math.PI * f * MU0 * muR));
}

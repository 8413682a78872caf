/**
 * Skin depth of a good conductor.
 */

import { MU0 } from "../../constants.ts";
import { dimensionless, frequency, resistivity as resistivityQ, lazySchema } from "../../schema.ts";
import { quantityArg } from "../inputs.ts";

const FREQUENCY = lazySchema(() => frequency());
const RESISTIVITY = lazySchema(() => resistivityQ());
const MU_R = lazySchema(() => dimensionless({ min: 1 }));

/**
 * Skin depth: the depth at which a plane wave's current density in a good conductor falls to 1/e.
 *
 * δ = √(ρ / (π f μ₀ μ_r)) (Ramo, Whinnery & Van Duzer, Fields and Waves, §3.16; valid while
 * the conductor is "good", σ ≫ ωε, true for metals far beyond our band).
 * @param f frequency, Hz, > 0 (or a quantity string, "200 kHz").
 * @param resistivity conductor resistivity, Ω·m, > 0 (or "1.7241e-8 ohm m").
 * @param muR relative permeability, ≥ 1 for the conductors we model, default 1.
 * @returns δ, m.
 * @example skinDepth(100e3, 1.7241e-8) // → 2.0898e-4 m (annealed copper, 100 kHz)
 * @example skinDepth(50, 1.7241e-8) // → 9.3456e-3 m
 */
export function skinDepth(f: number | string, resistivity: number | string, muR: number | string = 1): number {
  const where = "skinDepth";
  const F = quantityArg(FREQUENCY, (x) => x > 0, f, "f", where);
  const rho = quantityArg(RESISTIVITY, (x) => x > 0, resistivity, "resistivity", where);
  const mu = quantityArg(MU_R, (x) => x >= 1, muR, "muR", where);
  return skinDepthCore(F, rho, mu);
}

/**
 * The skin-depth formula on plain SI numbers, δ = √(ρ/(πfμ₀μ_r)), m — the unchecked core of
 * {@link skinDepth} and the one place the formula is written (f > 0 Hz, ρ > 0 Ω·m, μ_r ≥ 1).
 * @example skinDepthCore(100e3, 1.7241e-8) // → 2.0898e-4
 */
export function skinDepthCore(f: number, resistivity: number, muR = 1): number {
  return Math.sqrt(resistivity / (Math.PI * f * MU0 * muR));
}

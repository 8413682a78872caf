/**
 * Published limits of a two-coil resonant link: the maximum efficiency and the load that
 * reaches it.
 */
import { TanklightInputError, requireFinite, requirePositive } from "../errors.ts";
import * as z from "../zod.ts";
import { parseInput, lazySchema } from "../schema.ts";

/** optimalLoad's options (values checked below). */
const OptimalLoadOptions = lazySchema(() => z.strictObject({
  options: z.strictObject({ topology: z.enum(["series", "parallel"], { error: "must be 'series' or 'parallel'" }).optional(), reactance: z.unknown().optional() }, { error: "must be an object { topology?, reactance? }" }),
}));

/**
 * Maximum efficiency of a two-coil resonant link over all receiver loads, both tanks tuned:
 *
 *   η_max = k²Q₁Q₂ / (1 + √(1 + k²Q₁Q₂))²
 *
 * Follows from the coupled-mode optimum of Kurs et al., Science 317:83–86 (2007); the same
 * result comes from coupled-circuit theory with a series-tuned receiver (the tests check the
 * solver reaches it at {@link optimalLoad}).
 * @param k coupling factor, 0 ≤ |k| < 1 (its sign does not matter).
 * @param q1 transmitter coil quality factor ωL₁/R₁, > 0.
 * @param q2 receiver coil quality factor ωL₂/R₂, > 0.
 * @returns efficiency, 0…1 (dimensionless).
 * @example maxLinkEfficiency(0.1, 100, 100) // → 0.8190024875775822 (k²Q₁Q₂ = 100: 100/(1 + √101)²)
 * @example maxLinkEfficiency(0, 100, 100)   // → 0
 */
export function maxLinkEfficiency(k: number, q1: number, q2: number): number {
  const where = "maxLinkEfficiency";
  checkK(k, where);
  requirePositive(q1, "q1", "(dimensionless)", where);
  requirePositive(q2, "q2", "(dimensionless)", where);
  const u = k * k * q1 * q2;
  const d = 1 + Math.sqrt(1 + u);
  return u / (d * d);
}

/**
 * The receiver load resistance that gives {@link maxLinkEfficiency}.
 *
 * Series-tuned receiver (load in series with the coil and capacitor): R_L = R₂·√(1 + k²Q₁Q₂)
 * (follows from Kurs et al. 2007; exact in coupled-circuit theory for tuned tanks).
 * Parallel-tuned receiver (load across the capacitor): the parallel resistance whose series
 * equivalent at the capacitor equals that value, R_p = X²/R_s·(1 + √(1 − 4R_s²/X²))/2 with X the
 * tank reactance ωL₂ = 1/(ωC₂) (≈ X²/R_s at high Q); the capacitor must then be retuned by the
 * small reactance the load adds — see docs/methods/link.md.
 *
 * @param k coupling factor, |k| < 1.
 * @param q1 transmitter coil Q, > 0.
 * @param q2 receiver coil Q, > 0.
 * @param r2 receiver coil series resistance, Ω, > 0.
 * @param options.topology "series" (default) or "parallel".
 * @param options.reactance tank reactance ωL₂, Ω, > 0 (required for "parallel").
 * @returns the optimal load resistance, Ω.
 * @example optimalLoad(0.1, 100, 100, 0.5) // → 5.024937810560445 (= 0.5·√101)
 */
export function optimalLoad(
  k: number,
  q1: number,
  q2: number,
  r2: number,
  options: { readonly topology?: "series" | "parallel"; readonly reactance?: number } = {},
): number {
  const where = "optimalLoad";
  parseInput(OptimalLoadOptions, { options }, where);
  checkK(k, where);
  requirePositive(q1, "q1", "(dimensionless)", where);
  requirePositive(q2, "q2", "(dimensionless)", where);
  requirePositive(r2, "r2", "Ω", where);
  const rs = r2 * Math.sqrt(1 + k * k * q1 * q2);
  if ((options.topology ?? "series") === "series") return rs;
  const x = requirePositive(options.reactance ?? NaN, "options.reactance", "Ω", where);
  if (!(x <= 1e12)) {
    throw new TanklightInputError([{ path: "options.reactance", message: "must be ≤ 1e12 Ω (far beyond any tank; its square overflows)", value: x }], where);
  }
  const disc = 1 - (4 * rs * rs) / (x * x);
  if (disc < 0) {
    throw new TanklightInputError(
      [{ path: "options.reactance", message: `must exceed 2·R_s = ${2 * rs} Ω for a parallel load to reach the optimum`, value: x }],
      where,
    );
  }
  return ((x * x) / rs) * ((1 + Math.sqrt(disc)) / 2);
}

function checkK(k: number, where: string): void {
  requireFinite(k, "k", "(dimensionless)", where);
  if (!(Math.abs(k) < 1)) {
    throw new TanklightInputError([{ path: "k", message: "coupling factor must satisfy |k| < 1", value: k, expected: "|k| < 1" }], where);
  }
}

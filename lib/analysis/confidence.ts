/**
 * Confidence interval of a proportion (a yield: k of n samples lit): the Wilson score interval
 * (E. B. Wilson, "Probable inference, the law of succession, and statistical inference", JASA
 * 22(158):209–212, 1927). With p̂ = k/n and z the two-sided normal quantile of the level,
 *   centre = (p̂ + z²/2n)/(1 + z²/n),  half-width = z·√(p̂(1 − p̂)/n + z²/4n²)/(1 + z²/n).
 * Unlike the textbook normal ("Wald") interval it stays inside [0, 1] and keeps close to its
 * stated coverage near 0 and 1 and for small n (Brown, Cai & DasGupta, Statistical Science
 * 16(2):101–133, 2001).
 */
import { probit } from "simple-statistics";
import { TanklightInputError } from "../errors.ts";
import { integrateGaussLegendre } from "../math/quadrature.ts";

/**
 * The standard normal quantile z(p), p in (0, 1), to about 1e-13: simple-statistics' `probit`
 * (good to about 1e-3: 1.95716 for p = 0.975 against 1.959964) refined by Newton's method on
 * Φ(z) − p, with Φ(z) = ½ + ∫₀ᶻ φ(t) dt by 32-point Gauss–Legendre on pieces of length ≤ ½
 * (lib/math/quadrature.ts; exact to rounding for this smooth integrand).
 * @example normalQuantile(0.975) // → 1.959963984540054
 */
export function normalQuantile(p: number): number {
  let z = probit(p);
  const phi = (t: number): number => Math.exp(-0.5 * t * t) / Math.sqrt(2 * Math.PI);
  for (let k = 0; k < 8; k++) {
    const pieces = Math.max(1, Math.ceil(Math.abs(z) * 2));
    let cdf = 0.5;
    for (let k = 0; k < pieces; k++) cdf += integrateGaussLegendre(phi, (z * k) / pieces, (z * (k + 1)) / pieces, 32);
    const step = (cdf - p) / phi(z);
    z -= step;
    if (Math.abs(step) <= 1e-15 * Math.max(1, Math.abs(z))) break;
  }
  return z;
}

/** A confidence interval of a proportion. */
export interface ProportionInterval {
  readonly estimate: number;
  readonly lower: number;
  readonly upper: number;
  /** confidence level, e.g. 0.95 */
  readonly level: number;
  readonly method: "Wilson score interval (Wilson 1927)";
}

/**
 * Wilson score interval of a proportion.
 * @param successes k, integer 0 ≤ k ≤ n.
 * @param trials n, integer ≥ 1.
 * @param level confidence level in (0, 1), default 0.95.
 * @example wilsonInterval(81, 263, 0.95).lower // → 0.2553;  wilsonInterval(81, 263, 0.95).upper // → 0.3662 (Newcombe 1998, Table I);  wilsonInterval(0, 10).lower // → 0
 */
export function wilsonInterval(successes: number, trials: number, level = 0.95): ProportionInterval {
  const where = "wilsonInterval";
  if (!(Number.isInteger(trials) && trials >= 1)) throw new TanklightInputError([{ path: "trials", message: "must be an integer ≥ 1", value: trials }], where);
  if (!(Number.isInteger(successes) && successes >= 0 && successes <= trials)) {
    throw new TanklightInputError([{ path: "successes", message: `must be an integer from 0 to trials (${trials})`, value: successes }], where);
  }
  if (!(typeof level === "number" && level > 0 && level < 1)) throw new TanklightInputError([{ path: "level", message: "must be between 0 and 1, e.g. 0.95", value: level }], where);
  const n = trials;
  const p = successes / n;
  const z = normalQuantile(1 - (1 - level) / 2);
  const z2 = z * z;
  const denom = 1 + z2 / n;
  const centre = (p + z2 / (2 * n)) / denom;
  const half = (z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n))) / denom;
  return {
    estimate: p,
    lower: successes === 0 ? 0 : Math.max(0, centre - half),
    upper: successes === n ? 1 : Math.min(1, centre + half),
    level,
    method: "Wilson score interval (Wilson 1927)",
  };
}

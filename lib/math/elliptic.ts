/**
 * Complete elliptic integrals of the first and second kind, parameter convention m = k².
 *
 * Method: arithmetic–geometric mean (Abramowitz & Stegun 1964, §17.6, eqs. 17.6.1–17.6.4).
 * With a₀ = 1, b₀ = √m₁ (m₁ = 1 − m), c₀ = √m:
 *   K(m) = π / (2·a_N),   E(m) = K(m)·(1 − Σ 2^{n−1} c_n²).
 * The complementary forms take m₁ directly so that callers near m → 1 (touching filaments)
 * keep every digit: form m₁ from the geometry, never as 1 − m after the fact.
 */

const HALF_PI = Math.PI / 2;
/** Stop when |a − b| falls below this relative gap (quadratic convergence: one more step is exact to rounding). */
const AGM_TOLERANCE = 1e-15;

/** Result of {@link ellipticKE}: both complete integrals from one AGM run. */
export interface EllipticPair {
  readonly K: number;
  readonly E: number;
}

/**
 * K(m) and E(m) from their complementary parameter m₁ = 1 − m, one AGM run.
 *
 * @param m1 complementary parameter 1 − k², 0 < m₁ ≤ 1 (m₁ = 0 gives K = +∞, E = 1).
 * @returns `{ K, E }`, dimensionless.
 * @example ellipticKEComplement(1e-12).K // → 15.201804919087715 (m = 1 − 1e-12)
 */
export function ellipticKEComplement(m1: number): EllipticPair {
  if (!(m1 >= 0 && m1 <= 1)) {
    throw new RangeError(`ellipticKEComplement: m1 must be in [0, 1] (got ${m1})`);
  }
  if (m1 === 0) return { K: Infinity, E: 1 };
  let a = 1;
  let b = Math.sqrt(m1);
  // c₀² = m = 1 − m₁; weight 2^{n−1} starts at ½ for n = 0.
  let sum = 0.5 * (1 - m1);
  let weight = 0.5;
  for (let i = 0; i < 40; i++) {
    const c = 0.5 * (a - b);
    const an = 0.5 * (a + b);
    b = Math.sqrt(a * b);
    a = an;
    weight *= 2;
    sum += weight * c * c;
    if (Math.abs(c) <= AGM_TOLERANCE * a) break;
  }
  const K = HALF_PI / a;
  return { K, E: K * (1 - sum) };
}

/**
 * K(m) and E(m) together, parameter m = k², 0 ≤ m ≤ 1.
 * @example ellipticKE(0.5) // → { K: 1.8540746773013719, E: 1.3506438810476755 }
 */
export function ellipticKE(m: number): EllipticPair {
  if (!(m >= 0 && m <= 1)) {
    throw new RangeError(`ellipticKE: m must be in [0, 1] (got ${m})`);
  }
  return ellipticKEComplement(1 - m);
}

/**
 * Complete elliptic integral of the first kind K(m) = ∫₀^{π/2} dθ / √(1 − m sin²θ).
 *
 * @param m parameter k², 0 ≤ m ≤ 1; K(1) = +∞ by definition.
 * @returns K, dimensionless.
 * @example ellipticK(0) // → π/2;  ellipticK(0.5) // → 1.8540746773013719
 * @see ellipticE, ellipticKEComplement (for m near 1)
 */
export function ellipticK(m: number): number {
  return ellipticKE(m).K;
}

/**
 * Complete elliptic integral of the second kind E(m) = ∫₀^{π/2} √(1 − m sin²θ) dθ.
 *
 * @param m parameter k², 0 ≤ m ≤ 1; E(1) = 1.
 * @returns E, dimensionless.
 * @example ellipticE(0.5) // → 1.3506438810476755
 */
export function ellipticE(m: number): number {
  return ellipticKE(m).E;
}

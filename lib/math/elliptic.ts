/**
 * Complete elliptic integrals of the first and second kind, parameter convention m = k²
 * (the convention of A&S Ch. 17, DLMF §19.2 uses k; m = k² throughout tanklight).
 *
 *   K(m) = ∫₀^{π/2} dθ / √(1 − m sin²θ),   E(m) = ∫₀^{π/2} √(1 − m sin²θ) dθ.
 *
 * Method: arithmetic–geometric mean (Abramowitz & Stegun 1964, §17.6, eqs. 17.6.1–17.6.4).
 * With a₀ = 1, b₀ = √m₁ (m₁ = 1 − m), c₀ = √m and a_{n+1} = (a_n + b_n)/2,
 * b_{n+1} = √(a_n b_n), c_{n+1} = (a_n − b_n)/2:
 *   K(m) = π / (2·a_N),   E(m) = K(m)·(1 − S(m)),   S(m) = Σ_{n≥0} 2^{n−1} c_n²     (17.6.3–4).
 * Near m → 1 the difference 1 − S(m) cancels (it tends to 1/K); there E comes instead from
 * Legendre's relation (A&S 17.3.13, DLMF 19.7.1) E·K′ + E′·K − K·K′ = π/2 with
 * K′ = K(m₁), E′ = E(m₁) and K′ − E′ = K′·S(m₁), which gives the cancellation-free
 *   E(m) = π/(2K′) + K·S(m₁)      (both terms positive),
 * at the price of a second, short AGM run (m₁ small converges in 2–3 steps).
 *
 * The complementary form takes m₁ directly so that callers near m → 1 (touching filaments)
 * keep every digit: form m₁ from the geometry, never as 1 − m after the fact.
 *
 * Edge values, decided once: K(0) = E(0) = π/2; K(1) = +∞ and E(1) = 1 (the limits;
 * A&S 17.3.21, 17.3.24 give K → ln(4/k′)). NaN, ±∞ and m outside [0, 1] throw
 * TanklightInputError.
 *
 * Measured accuracy (tests/math/elliptic.test.ts against mpmath at 40 digits): ≤ 1e-15
 * relative for K and E over 0 ≤ m ≤ 1 − 1e-300 (parameter and complementary forms).
 */
import { TanklightInputError } from "../errors.ts";

const HALF_PI = Math.PI / 2;
/**
 * AGM stop: |c_{n+1}| ≤ this × a_{n+1}. Convergence is quadratic: the next gap is
 * c_{n+2} = c_{n+1}²/(4a_{n+2}) ≤ 2.5e-17·a, below half an ulp, so a_{n+1} is already the limit
 * to rounding and the remaining terms of S are below 1e-30 (one AGM step fewer than 1e-15).
 */
const AGM_TOLERANCE = 1e-8;
/** ellipticKEInto: largest accepted |m + m₁ − 1| (both formed from the same geometry agree far better). */
const SUM_TOLERANCE = 1e-12;
/** Below this m₁, E is taken from Legendre's relation (two AGM runs) instead of K·(1 − S). */
const LEGENDRE_BELOW_M1 = 0.01;

/** Result of {@link ellipticKE}: both complete integrals from one evaluation. */
export interface EllipticPair {
  readonly K: number;
  readonly E: number;
}

// Results of the last agm() call (module scratch, so that the hot path allocates nothing).
let agmK = 0;
let agmS = 0;

/** One AGM run for parameter m (c₀² = m) and complement m₁ (b₀ = √m₁): sets agmK and agmS = S(m). */
function agm(m: number, m1: number): void {
  let a = 1;
  let b = Math.sqrt(m1);
  let sum = 0.5 * m; // n = 0 term: 2^{−1}·c₀²
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
  agmK = HALF_PI / a;
  agmS = sum;
}

/** K and E for a validated pair (m, m₁ = 1 − m), m₁ > 0. */
function pair(m: number, m1: number): EllipticPair {
  agm(m, m1);
  const K = agmK;
  if (m1 >= LEGENDRE_BELOW_M1) return { K, E: K * (1 - agmS) };
  agm(m1, m);
  // Legendre's relation: E = π/(2K′) + K·S(m₁), K′ = K(m₁)
  return { K, E: HALF_PI / agmK + K * agmS };
}

function domainError(where: string, field: string, value: number): TanklightInputError {
  return new TanklightInputError(
    [{ path: field, message: "must be a finite number in [0, 1]", value, expected: "0 ≤ value ≤ 1" }],
    where,
  );
}

/**
 * K(m) and E(m) from the complementary parameter m₁ = 1 − m, full accuracy as m → 1.
 *
 * @param m1 complementary parameter 1 − k², 0 ≤ m₁ ≤ 1, dimensionless (m₁ = 0: K = +∞, E = 1).
 * @returns `{ K, E }`, dimensionless.
 * Method: AGM (A&S 17.6) with Legendre's relation (A&S 17.3.13) for E when m₁ < 0.01.
 * @example ellipticKEComplement(1e-12) // → { K: 15.201804919087715, E: 1.0000000000073508 } (m = 1 − 1e-12)
 * @see ellipticKE, ellipticK, ellipticE
 */
export function ellipticKEComplement(m1: number): EllipticPair {
  if (!(m1 >= 0 && m1 <= 1)) throw domainError("ellipticKEComplement", "m1", m1);
  if (m1 === 0) return { K: Infinity, E: 1 };
  return pair(1 - m1, m1);
}

/**
 * K and E from both m and m₁ as the caller formed them, written into `out` — the hot-path
 * form: no allocation, and no digits lost at either end when both come from the geometry
 * (e.g. m = 4ab/((a+b)² + d²), m₁ = ((a−b)² + d²)/((a+b)² + d²) for two coaxial circles).
 *
 * @param m parameter k², 0 ≤ m ≤ 1, dimensionless.
 * @param m1 complementary parameter, 0 ≤ m₁ ≤ 1, with |m + m₁ − 1| ≤ 1e-12 (checked).
 * @param out receives K at out[offset] and E at out[offset + 1] (K = +∞, E = 1 when m₁ = 0).
 * Method: AGM, A&S 1964 §17.6; Legendre's relation 17.3.13 for E when m₁ < 0.01.
 * @example ellipticKEInto(0.5, 0.5, out) // out → [1.8540746773013719, 1.3506438810476755]
 */
export function ellipticKEInto(m: number, m1: number, out: Float64Array, offset = 0): void {
  if (!(m >= 0 && m <= 1)) throw domainError("ellipticKEInto", "m", m);
  if (!(m1 >= 0 && m1 <= 1)) throw domainError("ellipticKEInto", "m1", m1);
  if (!(Math.abs(m + m1 - 1) <= SUM_TOLERANCE)) {
    throw new TanklightInputError(
      [{ path: "m1", message: `must equal 1 − m to within ${SUM_TOLERANCE} (m = ${m})`, value: m1, expected: "m + m1 = 1" }],
      "ellipticKEInto",
    );
  }
  if (m1 === 0) {
    out[offset] = Infinity;
    out[offset + 1] = 1;
    return;
  }
  agm(m, m1);
  const K = agmK;
  out[offset] = K;
  if (m1 >= LEGENDRE_BELOW_M1) {
    out[offset + 1] = K * (1 - agmS);
  } else {
    agm(m1, m);
    out[offset + 1] = HALF_PI / agmK + K * agmS;
  }
}

/**
 * K(m) and E(m) together (one evaluation), parameter m = k².
 *
 * @param m parameter k², 0 ≤ m ≤ 1, dimensionless (m = 1: K = +∞, E = 1).
 * @returns `{ K, E }`, dimensionless.
 * Method: AGM, A&S 1964 §17.6. For m near 1 prefer {@link ellipticKEComplement}.
 * @example ellipticKE(0.5) // → { K: 1.8540746773013719, E: 1.3506438810476755 }
 */
export function ellipticKE(m: number): EllipticPair {
  if (!(m >= 0 && m <= 1)) throw domainError("ellipticKE", "m", m);
  if (m === 1) return { K: Infinity, E: 1 };
  return pair(m, 1 - m);
}

/**
 * Complete elliptic integral of the first kind K(m) = ∫₀^{π/2} dθ / √(1 − m sin²θ).
 *
 * @param m parameter k², 0 ≤ m ≤ 1, dimensionless; K(1) = +∞ by decision (the limit).
 * @returns K, dimensionless.
 * Method: AGM, A&S 1964 eq. 17.6.1–17.6.3.
 * @example ellipticK(0) // → 1.5707963267948966 (π/2);  ellipticK(0.5) // → 1.8540746773013719;
 *   ellipticK(1) // → Infinity
 * @see ellipticE, ellipticKEComplement (for m near 1)
 */
export function ellipticK(m: number): number {
  if (!(m >= 0 && m <= 1)) throw domainError("ellipticK", "m", m);
  if (m === 1) return Infinity;
  agm(m, 1 - m);
  return agmK;
}

/**
 * Complete elliptic integral of the second kind E(m) = ∫₀^{π/2} √(1 − m sin²θ) dθ.
 *
 * @param m parameter k², 0 ≤ m ≤ 1, dimensionless; E(1) = 1.
 * @returns E, dimensionless.
 * Method: AGM, A&S 1964 eq. 17.6.4 (Legendre's relation 17.3.13 near m = 1).
 * @example ellipticE(0.5) // → 1.3506438810476755;  ellipticE(1) // → 1
 */
export function ellipticE(m: number): number {
  if (!(m >= 0 && m <= 1)) throw domainError("ellipticE", "m", m);
  if (m === 1) return 1;
  return pair(m, 1 - m).E;
}

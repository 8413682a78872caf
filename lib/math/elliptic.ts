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
import { outArg } from "./args.ts";

const HALF_PI = Math.PI / 2;
/**
 * AGM stop: c_{n+1} ≤ this × a_{n+1}. Convergence is quadratic: the next gap is
 * c_{n+2} = c_{n+1}²/(4a_{n+2}) ≤ 2.5e-19·a, below rounding, so a_{n+1} is already the limit
 * and the remaining terms of the sums are below 1e-34 relative.
 */
const AGM_STOP = 1e-9;
/** ellipticKEInto: largest accepted |m + m₁ − 1| (both formed from the same geometry agree far better). */
const SUM_TOLERANCE = 1e-12;
/** Below this m₁, E is taken from Legendre's relation (two AGM runs) instead of K·(1 − S). */
const LEGENDRE_BELOW_M1 = 0.01;

/** Result of {@link ellipticKE}: both complete integrals from one evaluation. */
export interface EllipticPair {
  readonly K: number;
  readonly E: number;
}

/** The two outputs of {@link agmScaledSum}: K and the scaled sum T. A small workspace the caller owns. */
export interface AgmSums {
  K: number;
  T: number;
}

/**
 * The one AGM of the code base (A&S 1964 §17.6), in the scaled form that keeps every digit of
 * the combination (1 − m/2)K − E: with a₀ = 1, b₀ = √m₁, c₀ = √m and c_{n+1} = c_n²/(4a_{n+1}),
 * writes K = π/(2a_∞) and T = Σ_{n≥1} 2^{n−1}(c_n/m)² into `out`, so that
 *
 *   S(m) = Σ_{n≥0} 2^{n−1} c_n² = m/2 + m²·T,   E = K·(1 − S),   (1 − m/2)K − E = K·m²·T,
 *
 * every term of T positive (T → 1/16 as m → 0). m and m₁ = 1 − m are both formed by the caller
 * from its geometry (m₁ > 0). No checks, no allocation: the hot-path core of ellipticKE,
 * ellipticKEInto and the circular-filament kernels of lib/em (loopKernel.ts). A workspace
 * created next to the call (`const w = { K: 0, T: 0 }`) costs nothing once the engine inlines.
 *
 * @param m parameter k², 0 ≤ m < 1.  @param m1 complement 1 − m, > 0.
 * @param out receives K and T.
 * @example agmScaledSum(0.5, 0.5, w) // w.K → 1.8540746773013719; E = w.K·(1 − 0.25 − 0.25·w.T) → 1.3506438810476755
 */
export function agmScaledSum(m: number, m1: number, out: AgmSums): void {
  let an = 1;
  let bn = Math.sqrt(m1);
  let g = 1 / (2 * (1 + bn)); // γ₁ = c₁/m
  let T = g * g;
  let w = 1;
  // invariant: g = γ_{n+1} = (a_n − b_n)/(2m). Once c_{n+1} ≤ 1e-9·a, the next correction
  // c_{n+2} ≈ c_{n+1}²/4 is below rounding, so a_{n+1} is the AGM limit and T is complete.
  for (let i = 0; i < 30; i++) {
    const an1 = 0.5 * (an + bn);
    bn = Math.sqrt(an * bn);
    an = an1;
    if (m * g <= AGM_STOP * an) break;
    g = (m * g * g) / (2 * (an + bn)); // c_{n+2} = c_{n+1}²/(4 a_{n+2})
    w *= 2;
    T += w * g * g;
  }
  out.K = HALF_PI / an;
  out.T = T;
}

/** E near m = 1 (m₁ < 0.01) from Legendre's relation, given K: E = π/(2K′) + K·S(m₁), S(m₁) = m₁/2 + m₁²T′. */
function ellipticENearOne(m: number, m1: number, K: number): number {
  const sums: AgmSums = { K: 0, T: 0 };
  agmScaledSum(m1, m, sums); // K′ = K(m₁), T′
  return HALF_PI / sums.K + K * (0.5 * m1 + m1 * m1 * sums.T);
}

/** K and E for a validated pair (m, m₁ = 1 − m), m₁ > 0. */
function pair(m: number, m1: number): EllipticPair {
  const sums: AgmSums = { K: 0, T: 0 };
  agmScaledSum(m, m1, sums);
  const K = sums.K;
  return { K, E: m1 >= LEGENDRE_BELOW_M1 ? K * (1 - 0.5 * m - m * m * sums.T) : ellipticENearOne(m, m1, K) };
}

/** The error of ellipticKEInto for a bad (m, m₁). */
function pairError(m: number, m1: number): TanklightInputError {
  if (!(typeof m === "number" && m >= 0 && m <= 1)) return domainError("ellipticKEInto", "m", m);
  if (!(typeof m1 === "number" && m1 >= 0 && m1 <= 1)) return domainError("ellipticKEInto", "m1", m1);
  return new TanklightInputError(
    [{ path: "m1", message: `must equal 1 − m to within ${SUM_TOLERANCE} (m = ${m})`, value: m1, expected: "m + m1 = 1" }],
    "ellipticKEInto",
  );
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
  if (!(typeof m1 === "number" && m1 >= 0 && m1 <= 1)) throw domainError("ellipticKEComplement", "m1", m1);
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
export function ellipticKEInto(m: number, m1: number, out: Float64Array, offset?: number): void {
  // one test on the hot path; the diagnosis only when it fails
  if (!(typeof m === "number" && typeof m1 === "number" && m >= 0 && m1 >= 0 && Math.abs(m + m1 - 1) <= SUM_TOLERANCE && m <= 1 && m1 <= 1)) throw pairError(m, m1);
  const at = outArg(out, offset, 2, "ellipticKEInto");
  let K = Infinity;
  let E = 1;
  if (m1 > 0) {
    const sums: AgmSums = { K: 0, T: 0 };
    agmScaledSum(m, m1, sums);
    K = sums.K;
    E = m1 >= LEGENDRE_BELOW_M1 ? K * (1 - 0.5 * m - m * m * sums.T) : ellipticENearOne(m, m1, K);
  }
  out[at] = K;
  out[at + 1] = E;
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
  if (!(typeof m === "number" && m >= 0 && m <= 1)) throw domainError("ellipticKE", "m", m);
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
  if (!(typeof m === "number" && m >= 0 && m <= 1)) throw domainError("ellipticK", "m", m);
  if (m === 1) return Infinity;
  const sums: AgmSums = { K: 0, T: 0 };
  agmScaledSum(m, 1 - m, sums);
  return sums.K;
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
  if (!(typeof m === "number" && m >= 0 && m <= 1)) throw domainError("ellipticE", "m", m);
  if (m === 1) return 1;
  return pair(m, 1 - m).E;
}

/**
 * The cancellation-free kernel shared by the circular-filament functions (loopField,
 * loopVectorPotential, coaxialLoopMutualInductance, loopMutualInductance). Private to lib/em.
 *
 * For a circle of radius a, a point at distance ρ from its axis and height z above its
 * plane, with α² = (a−ρ)² + z², β² = (a+ρ)² + z², m = 4aρ/β², m₁ = α²/β² (both formed from
 * the geometry, docs/physics-notes.md), the arithmetic–geometric mean (A&S 1964 §17.6) with
 * a₀ = 1, b₀ = √m₁, c_{n+1} = c_n²/(4a_{n+1}) gives K = π/(2a_∞) and
 *
 *   (1 − m/2)·K − E = K · Σ_{n≥1} 2^{n−1} c_n²  ≡  K · m² · T,      T = Σ 2^{n−1} (c_n/m)²,
 *
 * because the n = 0 term of E = K(1 − Σ_{n≥0} 2^{n−1}c_n²) is exactly m/2. Every term of T
 * is positive, so the combination that cancels to O(m²) in the textbook forms (far from the
 * loop, near the axis) keeps full relative precision; T → 1/16 as m → 0. With it
 *
 *   A_φ/ρ = 8 μ₀ a² K T / (π β³)                          (Smythe 1950 §7.10, rearranged)
 *   B_ρ  = μ₀ a z I₃ / (π β³),  B_z = μ₀ a (a E/m₁ − ρ I₃) / (π β³),
 *   I₃   = ∫₀^{π/2} (sin²θ − cos²θ)/(1 − m sin²θ)^{3/2} dθ = K·m·(½ + mT − 2T)/m₁
 *
 * (the integral forms of Ortner et al. 2023, Magnetism 3(1), eqs. for Bulirsch's cel with
 * p = k_c², evaluated here by the AGM sum instead of cel). Near the wire (m > M_SPLIT) the
 * bracket ½ + mT − 2T cancels instead, and the textbook forms of Simpson et al. 2001 are
 * exact to rounding there, so the kernel switches to them. The AGM itself is agmScaledSum of
 * lib/math/elliptic.ts, the one implementation in the code base.
 */
import { MU0 } from "../constants.ts";
import { agmScaledSum, type AgmSums } from "../math/elliptic.ts";
import { TanklightInputError, requireFinite, requireNonNegative, requirePositive } from "../errors.ts";
import { GEOMETRY_LIMITS } from "./inputs.ts";

/** Above this m the near-wire (textbook) field forms are used; below it the AGM-sum forms. */
const M_SPLIT = 0.7;
const MU0_OVER_PI = MU0 / Math.PI;

/** Indices into the kernel's output array. */
export const K_A_OVER_RHO = 0;
export const K_B_RHO = 1;
export const K_B_Z = 2;
export const K_ALPHA2 = 3;

/**
 * Per-ampere field quantities of a circular filament at (ρ, z) in its own frame, written to
 * `out`: [A_φ/ρ (T), B_ρ (T), B_z (T), α² (m², squared distance to the wire)].
 * Returns false (and leaves `out` untouched but α²) when the point lies on the wire (α² = 0).
 * @param a loop radius, m, > 0;  rho ≥ 0, m;  z any, m.  No validation (hot path).
 */
export function loopKernel(a: number, rho: number, z: number, out: Float64Array, wantField: boolean): boolean {
  const dm = a - rho;
  const dp = a + rho;
  const z2 = z * z;
  const alpha2 = dm * dm + z2;
  out[K_ALPHA2] = alpha2;
  if (alpha2 === 0) return false;
  const beta2 = dp * dp + z2;
  const m1 = alpha2 / beta2;
  const m = (4 * a * rho) / beta2;
  const sums: AgmSums = { K: 0, T: 0 };
  agmScaledSum(m, m1, sums);
  const K = sums.K, T = sums.T;
  const beta = Math.sqrt(beta2);
  const beta3 = beta2 * beta;
  out[K_A_OVER_RHO] = (8 * MU0_OVER_PI * a * a * K * T) / beta3;
  if (!wantField) return true;
  const E = K * (1 - 0.5 * m - m * m * T);
  if (m <= M_SPLIT) {
    const i3 = (K * m * (0.5 + m * T - 2 * T)) / m1;
    const pre = (MU0_OVER_PI * a) / beta3;
    out[K_B_RHO] = pre * z * i3;
    out[K_B_Z] = pre * ((a * E) / m1 - rho * i3);
  } else {
    // Simpson et al. 2001: B_z = μ₀/(2πβ)[K + (a² − r²)E/α²], B_ρ = μ₀z/(2πρβ)[(a² + r²)E/α² − K]
    const r2 = rho * rho + z2;
    const pre = (0.5 * MU0_OVER_PI) / beta;
    out[K_B_Z] = pre * (K + ((a * a - r2) * E) / alpha2);
    out[K_B_RHO] = ((pre * z) / rho) * (((a * a + r2) * E) / alpha2 - K);
  }
  return true;
}

/**
 * μ₀-scaled Maxwell bracket for coaxial circles: M = μ₀ m² β K T (see header); per unit
 * current, H. ra, rb > 0, d any; returns +∞ when the circles coincide (caller rejects).
 */
export function coaxialKernel(ra: number, rb: number, d: number): number {
  const dm = ra - rb;
  const dp = ra + rb;
  const d2 = d * d;
  const alpha2 = dm * dm + d2;
  if (alpha2 === 0) return Infinity;
  const beta2 = dp * dp + d2;
  const m1 = alpha2 / beta2;
  const m = (4 * ra * rb) / beta2;
  const sums: AgmSums = { K: 0, T: 0 };
  agmScaledSum(m, m1, sums);
  return MU0 * m * m * Math.sqrt(beta2) * sums.K * sums.T;
}

/**
 * A_φ/ρ per ampere (T) only — the hot path of the line integrals; same AGM sum as
 * {@link loopKernel}. α² must be > 0 (the caller checks).
 */
export function aOverRhoKernel(a: number, rho: number, z2: number, alpha2: number): number {
  const dp = a + rho;
  const beta2 = dp * dp + z2;
  const m1 = alpha2 / beta2;
  const m = (4 * a * rho) / beta2;
  const sums: AgmSums = { K: 0, T: 0 };
  agmScaledSum(m, m1, sums);
  return (8 * MU0_OVER_PI * a * a * sums.K * sums.T) / (beta2 * Math.sqrt(beta2));
}

/**
 * Checks the arguments of the single-loop field and potential (loopField, loopVectorPotential):
 * radius > 0, rho ≥ 0, z and current finite, and every length within GEOMETRY_LIMITS.maxLength
 * (beyond it the kernel's squares overflow). Throws TanklightInputError naming the argument.
 */
export function checkLoopArgs(radius: number, current: number, rho: number, z: number, where: string): void {
  requirePositive(radius, "radius", "m", where);
  requireFinite(current, "current", "A", where);
  requireFinite(z, "z", "m", where);
  requireNonNegative(rho, "rho", "m", where);
  const limit = GEOMETRY_LIMITS.maxLength;
  for (const [name, v] of [["radius", radius], ["rho", rho], ["z", z]] as const) {
    if (Math.abs(v) > limit) {
      throw new TanklightInputError([{ path: name, message: `must be at most ${limit} m in magnitude (a longer length overflows the field kernel)`, value: v }], where);
    }
  }
}

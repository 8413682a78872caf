/**
 * Mutual inductance of two coaxial circular filaments (Maxwell's formula).
 */
import { TanklightInputError, requireFinite, requirePositive } from "../errors.ts";
import { coaxialKernel } from "./loopKernel.ts";

/**
 * Mutual inductance of two coaxial circular filaments of radii a and b whose planes are a
 * distance d apart:
 *
 *   M = μ₀√(ab)·[(2/k − k)K(k²) − (2/k)E(k²)],   k² = 4ab/((a+b)² + d²)
 *
 * (Maxwell 1873, Treatise on Electricity and Magnetism §701). Evaluated as M = μ₀m²βK·T with
 * β² = (a+b)² + d² and the positive AGM sum T of loopKernel.ts: no cancellation far away (the
 * bracket is O(k³) there; the dipole limit μ₀πa²b²/(2d³) comes out to rounding) and the
 * complementary parameter m₁ = ((a−b)² + d²)/β² is formed from the geometry, so touching
 * filaments (m → 1) keep every digit (docs/physics-notes.md).
 *
 * @param ra radius of loop a, m, > 0.
 * @param rb radius of loop b, m, > 0.
 * @param d axial distance between the loop planes, m, finite (sign irrelevant).
 * @returns M, H (> 0 for currents in the same sense). Coincident filaments (a = b, d = 0)
 *   have no finite filament mutual inductance: TanklightInputError.
 * @example coaxialLoopMutualInductance(0.04, 0.006, 0.03) // → 9.0560e-10 H
 * @example coaxialLoopMutualInductance(0.04, 0.006, 100) // → 1.1370e-19 H (= μ₀πa²b²/(2d³) to 1e-7)
 * @see loopMutualInductance (any relative position), mutualInductance (coils)
 */
export function coaxialLoopMutualInductance(ra: number, rb: number, d: number): number {
  requirePositive(ra, "ra", "m", "coaxialLoopMutualInductance");
  requirePositive(rb, "rb", "m", "coaxialLoopMutualInductance");
  requireFinite(d, "d", "m", "coaxialLoopMutualInductance");
  const M = coaxialKernel(ra, rb, d);
  if (!Number.isFinite(M)) {
    throw new TanklightInputError(
      [{ path: "ra, rb, d", message: "the filaments coincide (ra = rb and d = 0): their filament mutual inductance is infinite; use selfInductance with a wire radius", value: [ra, rb, d] }],
      "coaxialLoopMutualInductance",
    );
  }
  return M;
}

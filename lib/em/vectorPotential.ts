/**
 * Magnetic vector potential of a circular filament (closed form) and of a straight segment.
 */
import { MU0 } from "../constants.ts";
import { TanklightInputError, requireFinite, requirePositive } from "../errors.ts";
import { K_A_OVER_RHO, loopKernel } from "./loopKernel.ts";

const scratch = new Float64Array(4);

/**
 * Azimuthal vector potential A_φ of a circular filament in its own frame (Coulomb gauge):
 *
 *   A_φ(ρ, z) = (μ₀I/(πk))·√(a/ρ)·[(1 − k²/2)K(k²) − E(k²)],   k² = 4aρ/((a+ρ)² + z²)
 *
 * (Smythe 1950, Static and Dynamic Electricity §7.10), evaluated without cancellation by the
 * AGM sum of loopKernel.ts. The flux through a coaxial circle of radius ρ at height z is 2πρA_φ.
 *
 * @param radius loop radius a, m, > 0.  @param current I, A.
 * @param rho ≥ 0, m.  @param z finite, m.
 * @returns A_φ, T·m (= Wb/m); 0 on the axis. Throws on the wire itself.
 * @example loopVectorPotential(0.04, 1, 0.006, 0.03) // → 2πρA_φ = coaxialLoopMutualInductance(0.04, 0.006, 0.03)
 */
export function loopVectorPotential(radius: number, current: number, rho: number, z: number): number {
  requirePositive(radius, "radius", "m", "loopVectorPotential");
  requireFinite(current, "current", "A", "loopVectorPotential");
  requireFinite(z, "z", "m", "loopVectorPotential");
  if (!(Number.isFinite(rho) && rho >= 0)) {
    throw new TanklightInputError([{ path: "rho", message: "must be a finite distance ≥ 0 m", value: rho }], "loopVectorPotential");
  }
  if (!loopKernel(radius, rho, z, scratch, false)) {
    throw new TanklightInputError([{ path: "rho, z", message: "the point lies on the filament", value: [rho, z] }], "loopVectorPotential");
  }
  return current * rho * scratch[K_A_OVER_RHO]!;
}

const MU0_OVER_4PI = MU0 / (4 * Math.PI);

/**
 * Scalar factor of the vector potential of a straight current segment from p to q, per ampere:
 * A(x) = (μ₀/4π)·ŝ·ln((R₁ + R₂ + L)/(R₁ + R₂ − L)) = (μ₀/4π)·ŝ·2·atanh(L/(R₁ + R₂)),
 * R₁ = |x − p|, R₂ = |x − q|, L = |q − p|, ŝ = (q − p)/L (Hanson & Hirshman 2002, Phys. Plasmas
 * 9(8):3529, eq. 7). Returns the magnitude along ŝ in T·m/A; +∞ on the segment itself.
 * Private helper shared with the polygon mutual inductance (no validation).
 */
export function segmentPotentialFactor(R1: number, R2: number, L: number): number {
  const s = R1 + R2;
  // 2·atanh(L/s) = ln((s + L)/(s − L)); s − L formed as ((s² − L²))/(s + L) would not help
  // when the point is on the segment (both are 0); the caller keeps points off the wire.
  return MU0_OVER_4PI * Math.log((s + L) / (s - L));
}

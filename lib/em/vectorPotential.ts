/**
 * Magnetic vector potential of a circular filament (closed form); a straight segment's is in
 * segmentPotential.ts.
 */
import { TanklightInputError } from "../errors.ts";
import { K_A_OVER_RHO, checkLoopArgs, loopKernel } from "./loopKernel.ts";

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
  checkLoopArgs(radius, current, rho, z, "loopVectorPotential");
  const scratch = new Float64Array(4);
  if (!loopKernel(radius, rho, z, scratch, false)) {
    throw new TanklightInputError([{ path: "rho, z", message: "the point lies on the filament", value: [rho, z] }], "loopVectorPotential");
  }
  return current * rho * scratch[K_A_OVER_RHO]!;
}

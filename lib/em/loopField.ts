/**
 * Magnetic flux density of a circular current filament in its own frame.
 */
import { TanklightInputError } from "../errors.ts";
import { K_B_RHO, K_B_Z, checkLoopArgs, loopKernel } from "./loopKernel.ts";

/** Radial and axial flux density of a loop, T. */
export interface LoopFieldValue {
  /** component along the outward cylindrical radius ρ̂, T */
  readonly bRho: number;
  /** component along the loop's axis ẑ, T */
  readonly bZ: number;
}

/**
 * Flux density of a circular filament of radius a carrying current I, at cylindrical
 * coordinates (ρ, z) of its own frame (loop in the plane z = 0, centred on the axis, current
 * counter-clockwise seen from +z).
 *
 *   B_z = μ₀I/(2πβ)·[K(m) + (a² − r²)/α²·E(m)],  B_ρ = μ₀Iz/(2πρβ)·[(a² + r²)/α²·E(m) − K(m)],
 *   α² = (a−ρ)² + z², β² = (a+ρ)² + z², r² = ρ² + z², m = 1 − α²/β²
 *
 * (Simpson, Lane, Immer & Youngquist 2001, NASA NTRS 20010038494, eqs. for B_ρ, B_z), evaluated
 * in a cancellation-free rearrangement (AGM sum, after the integral forms of Ortner et al. 2023,
 * Magnetism 3(1):11–31; see loopKernel.ts) so it is finite and exact to rounding on the axis,
 * at the centre and far away (dipole region).
 *
 * @param radius loop radius a, m, > 0.
 * @param current filament current I, A, finite (sign gives direction).
 * @param rho distance ρ from the loop's axis, m, ≥ 0.
 * @param z height above the loop's plane, m, finite.
 * @returns `{ bRho, bZ }`, T. Throws TanklightInputError on the wire itself (ρ = a, z = 0),
 *   where the filament field is infinite.
 * @example loopField(0.04, 1, 0, 0) // → { bRho: 0, bZ: 1.5707963267e-5 } (μ₀I/(2a))
 * @example loopField(0.04, 1, 0, 0.03) // → bZ = μ₀Ia²/(2(a²+z²)^{3/2}) = 8.0424771931e-6
 * @see magneticField (coils in any pose), loopVectorPotential
 */
export function loopField(radius: number, current: number, rho: number, z: number): LoopFieldValue {
  checkLoopArgs(radius, current, rho, z, "loopField");
  const scratch = new Float64Array(4);
  if (!loopKernel(radius, rho, z, scratch, true)) {
    throw new TanklightInputError(
      [{ path: "rho, z", message: "the point lies on the filament, where its field is infinite", value: [rho, z], expected: "a point off the wire" }],
      "loopField",
    );
  }
  return { bRho: rho === 0 ? 0 : current * scratch[K_B_RHO]!, bZ: current * scratch[K_B_Z]! };
}

/**
 * Flux density of a straight current segment (closed-form Biot–Savart).
 */
import { MU0 } from "../constants.ts";

const MU0_OVER_4PI = MU0 / (4 * Math.PI);

/**
 * Adds the flux density of a straight filament segment p → q carrying current I, at point x,
 * to `out` (T): B = (μ₀I/4π)·(r₁ × r₂)·(R₁ + R₂)/(R₁R₂(R₁R₂ + r₁·r₂)), r₁ = x − p, r₂ = x − q
 * (Hanson & Hirshman 2002, Phys. Plasmas 9(8):3529–3533, eq. 8 rearranged; the infinite-wire
 * limit is μ₀I/(2πd)). Beside the segment r₁ and r₂ point nearly opposite ways and
 * R₁R₂ + r₁·r₂ = R₁R₂(1 + cos γ) cancels (its relative error grows like (R/d)²); there it is
 * formed as |r₁ × r₂|²/(R₁R₂ − r₁·r₂), the same quantity by (R₁R₂)² − (r₁·r₂)² = |r₁ × r₂|²
 * (Lagrange's identity), which has no cancellation. Returns false without adding when x lies on
 * the segment (infinite field). Private helper of magneticField (no validation, no allocation).
 */
export function addSegmentField(
  px: number, py: number, pz: number, qx: number, qy: number, qz: number,
  current: number, x: number, y: number, z: number, out: Float64Array, offset = 0,
): boolean {
  const r1x = x - px, r1y = y - py, r1z = z - pz;
  const r2x = x - qx, r2y = y - qy, r2z = z - qz;
  const R1 = Math.sqrt(r1x * r1x + r1y * r1y + r1z * r1z);
  const R2 = Math.sqrt(r2x * r2x + r2y * r2y + r2z * r2z);
  const cx = r1y * r2z - r1z * r2y;
  const cy = r1z * r2x - r1x * r2z;
  const cz = r1x * r2y - r1y * r2x;
  const dot = r1x * r2x + r1y * r2y + r1z * r2z;
  const RR = R1 * R2;
  // R₁R₂ + r₁·r₂, without cancellation on either side of the segment's ends
  const sum = dot >= 0 ? RR + dot : (cx * cx + cy * cy + cz * cz) / (RR - dot);
  const den = RR * sum;
  if (!(den > 0)) {
    // on the segment (or so close that |r₁ × r₂|² underflows): the filament field is infinite
    if (dot < 0 || R1 === 0 || R2 === 0) return false;
    return true; // on the line beyond the segment: no field (r₁ × r₂ = 0)
  }
  const f = (MU0_OVER_4PI * current * (R1 + R2)) / den;
  out[offset] = out[offset]! + f * cx;
  out[offset + 1] = out[offset + 1]! + f * cy;
  out[offset + 2] = out[offset + 2]! + f * cz;
  return true;
}

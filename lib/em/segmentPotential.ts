/**
 * Magnetic vector potential of a straight current segment in closed form, written without
 * cancellation near the wire and along its extension.
 */
import { MU0 } from "../constants.ts";
import { TanklightInputError, requireFinite } from "../errors.ts";
import type { Vec3 } from "./types.ts";

const MU0_OVER_4PI = MU0 / (4 * Math.PI);

/**
 * ln((R₁ + R₂ + L)/(R₁ + R₂ − L)) for a point at axial coordinate t along a segment of
 * length L and perpendicular distance² d2 from its line — the vector potential factor of a
 * straight segment (Hanson & Hirshman 2002, Phys. Plasmas 9(8):3529, eq. 7), with R₁ + R₂ − L
 * formed as (R₁ − t) + (R₂ − (L − t)) and each difference rewritten as d²/(R + ·) where it
 * would cancel. +Infinity on the segment itself. Private to lib/em (no validation).
 */
export function segmentLog(t: number, d2: number, L: number): number {
  const u = L - t;
  const R1 = Math.sqrt(t * t + d2);
  const R2 = Math.sqrt(u * u + d2);
  const e1 = t > 0 ? d2 / (R1 + t) : R1 - t;
  const e2 = u > 0 ? d2 / (R2 + u) : R2 - u;
  return Math.log((R1 + R2 + L) / (e1 + e2));
}

function point(v: unknown, path: string, where: string): Vec3 {
  if (!Array.isArray(v) || v.length !== 3 || !v.every((x) => typeof x === "number" && Number.isFinite(x))) {
    throw new TanklightInputError([{ path, message: "must be three finite coordinates in m", value: v, expected: "[x, y, z] in m" }], where);
  }
  return v as unknown as Vec3;
}

/**
 * Vector potential of a straight filament segment p → q carrying current I, at point x
 * (Coulomb gauge, the segment alone):
 *
 *   A(x) = (μ₀I/4π)·ŝ·ln((R₁ + R₂ + L)/(R₁ + R₂ − L)),  R₁ = |x − p|, R₂ = |x − q|, L = |q − p|
 *
 * (Hanson & Hirshman 2002, Phys. Plasmas 9(8):3529–3533, eq. 7), evaluated without cancellation
 * (see {@link segmentLog}). The segments of a closed polygon sum to its potential; ∮A·dl around
 * another loop is their mutual inductance times I (Stokes).
 *
 * @param p start, m. @param q end, m (≠ p). @param current I, A. @param x field point, m, off the segment.
 * @returns A, T·m (Wb/m). Throws TanklightInputError on non-finite input, p = q, or x on the segment.
 * @example segmentVectorPotential([0,0,-1], [0,0,1], 1, [0.01,0,0]) // → [0, 0, 1.0597e-6] (1 m either side of a point 1 cm away: ≈ (μ₀/2π)·ln(2L/d); it grows without bound as L → ∞)
 * @see loopVectorPotential, straightFilamentMutual
 */
export function segmentVectorPotential(p: Vec3, q: Vec3, current: number, x: Vec3): [number, number, number] {
  const where = "segmentVectorPotential";
  const P = point(p, "p", where), Q = point(q, "q", where), X = point(x, "x", where);
  requireFinite(current, "current", "A", where);
  const sx = Q[0] - P[0], sy = Q[1] - P[1], sz = Q[2] - P[2];
  const L = Math.sqrt(sx * sx + sy * sy + sz * sz);
  if (!(L > 0)) throw new TanklightInputError([{ path: "q", message: "must differ from p (a segment of zero length)", value: q }], where);
  const ux = sx / L, uy = sy / L, uz = sz / L;
  const rx = X[0] - P[0], ry = X[1] - P[1], rz = X[2] - P[2];
  const t = rx * ux + ry * uy + rz * uz;
  const cx = ry * uz - rz * uy, cy = rz * ux - rx * uz, cz = rx * uy - ry * ux;
  const d2 = cx * cx + cy * cy + cz * cz;
  const f = segmentLog(t, d2, L);
  if (!Number.isFinite(f)) throw new TanklightInputError([{ path: "x", message: "lies on the segment (the filament potential is infinite there)", value: x }], where);
  const k = MU0_OVER_4PI * current * f;
  return [k * ux, k * uy, k * uz];
}

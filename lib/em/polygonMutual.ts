/**
 * Mutual inductance between straight segments and between a circle and a segment, the
 * building blocks for polygon (path) filaments: Neumann's formula with one integral in
 * closed form (the vector potential of a straight segment or of a circle) and the other by
 * adaptive Gauss–Kronrod quadrature.
 */
import { MU0 } from "../constants.ts";
import { integrateAdaptive } from "../math/quadrature.ts";
import { TanklightInputError } from "../errors.ts";
import { aOverRhoKernel } from "./loopKernel.ts";
import { segmentLog } from "./segmentPotential.ts";
import type { Vec3 } from "./types.ts";

const MU0_OVER_4PI = MU0 / (4 * Math.PI);
/** Relative tolerance of the segment quadratures (the adaptive rule's target). */
export const POLYGON_MUTUAL_TOL = 1e-10;

/** Out-parameter of the segment mutuals: the smallest squared distance (m²) between quadrature nodes and the other conductor. */
export interface SegmentProbe {
  minDistance2: number;
}

function overlapError(where: string): never {
  throw new TanklightInputError(
    [{ path: "filaments", message: "two filament segments overlap (collinear and sharing length) or a node lies on a wire; their filament mutual inductance is infinite", value: "overlapping filaments" }],
    where,
  );
}

/**
 * Mutual inductance of two straight filament segments p₁→q₁ and p₂→q₂ (Neumann):
 * M = (μ₀/4π)(ŝ₁·ŝ₂) ∫₀^{L₂} ln((R₁ + R₂ + L₁)/(R₁ + R₂ − L₁)) dl — the closed-form segment
 * potential (Hanson & Hirshman 2002) integrated along the second segment, adaptive
 * Gauss–Kronrod 7/15 (handles the logarithmic end singularity of segments meeting at a
 * vertex). Perpendicular segments give exactly 0. Per turn, H; symmetric in the two segments.
 */
export function segmentMutual(p1: Vec3, q1: Vec3, p2: Vec3, q2: Vec3, tol = POLYGON_MUTUAL_TOL, probe?: SegmentProbe): number {
  const ax = q1[0] - p1[0], ay = q1[1] - p1[1], az = q1[2] - p1[2];
  const bx = q2[0] - p2[0], by = q2[1] - p2[1], bz = q2[2] - p2[2];
  const L1 = Math.sqrt(ax * ax + ay * ay + az * az);
  const L2 = Math.sqrt(bx * bx + by * by + bz * bz);
  if (L1 === 0 || L2 === 0) return 0;
  const s1x = ax / L1, s1y = ay / L1, s1z = az / L1;
  const cosang = (s1x * bx + s1y * by + s1z * bz) / L2;
  if (Math.abs(cosang) < 1e-15) return 0;
  let minD2 = Infinity;
  const f = (l: number): number => {
    const r = l / L2;
    const x = p2[0] + r * bx - p1[0], y = p2[1] + r * by - p1[1], z = p2[2] + r * bz - p1[2];
    const t = x * s1x + y * s1y + z * s1z;
    // perpendicular distance² from the cross product (no cancellation)
    const cx = y * s1z - z * s1y, cy = z * s1x - x * s1z, cz = x * s1y - y * s1x;
    const d2 = cx * cx + cy * cy + cz * cz;
    const u = L1 - t;
    const dist2 = d2 + (t < 0 ? t * t : u < 0 ? u * u : 0);
    if (dist2 < minD2) minD2 = dist2;
    if (d2 === 0 && t >= 0 && u >= 0) overlapError("segmentMutual");
    return segmentLog(t, d2, L1);
  };
  const res = integrateAdaptive(f, 0, L2, { relTol: tol, absTol: tol * 1e-3 * L2, maxIntervals: 4000 });
  if (probe) probe.minDistance2 = minD2;
  return MU0_OVER_4PI * cosang * res.value;
}

/**
 * Mutual inductance of a circle filament (world centre, unit axis, radius) and a straight
 * segment p→q: M = ∫ A_circle · ŝ dl with A_φ in closed form (Smythe 1950 §7.10, AGM kernel),
 * adaptive Gauss–Kronrod along the segment. Per turn, H.
 */
export function circleSegmentMutual(center: Vec3, axis: Vec3, radius: number, p: Vec3, q: Vec3, tol = POLYGON_MUTUAL_TOL, probe?: SegmentProbe): number {
  const bx = q[0] - p[0], by = q[1] - p[1], bz = q[2] - p[2];
  const L = Math.sqrt(bx * bx + by * by + bz * bz);
  if (L === 0) return 0;
  const sx = bx / L, sy = by / L, sz = bz / L;
  const [nx, ny, nz] = axis;
  // (n × w)·ŝ = w·(ŝ × n)
  const kx = sy * nz - sz * ny, ky = sz * nx - sx * nz, kz = sx * ny - sy * nx;
  let minD2 = Infinity;
  const f = (l: number): number => {
    const wx = p[0] + l * sx - center[0], wy = p[1] + l * sy - center[1], wz = p[2] + l * sz - center[2];
    const z = wx * nx + wy * ny + wz * nz;
    const cx = ny * wz - nz * wy, cy = nz * wx - nx * wz, cz = nx * wy - ny * wx;
    const rho = Math.sqrt(cx * cx + cy * cy + cz * cz);
    const dm = radius - rho;
    const alpha2 = dm * dm + z * z;
    if (alpha2 < minD2) minD2 = alpha2;
    if (alpha2 === 0) overlapError("circleSegmentMutual");
    return aOverRhoKernel(radius, rho, z * z, alpha2) * (wx * kx + wy * ky + wz * kz);
  };
  // the integrand is of order μ₀ (A_φ/ρ ~ μ₀/a times a length ~ a): absolute floor tol·1e-3·μ₀·L
  const res = integrateAdaptive(f, 0, L, { relTol: tol, absTol: tol * 1e-3 * MU0 * L, maxIntervals: 4000 });
  if (probe) probe.minDistance2 = minD2;
  return res.value;
}

/**
 * Partial self-inductance of a straight round wire of length l and radius r, for the own-wire
 * term of a polygon turn: L = (μ₀/2π)·l·[ln(2l/r) − 1 + Y] (Grover 1946, Inductance
 * Calculations, ch. 5 eq. (7): 0.002·l·[ln(2l/ρ) − 3/4] µH, l in cm, for uniform current Y = 1/4;
 * Y = 0 for surface current). Valid for r ≪ l.
 */
export function straightWireSelfInductance(l: number, r: number, Y: number): number {
  return ((MU0 / (2 * Math.PI)) * l * (Math.log((2 * l) / r) - 1 + Y));
}

/**
 * Mutual inductance of straight filament segments in closed form — parallel, collinear, touching
 * and skew — and of closed polygons as sums over their segment pairs.
 *
 * Neumann's formula for two segments with unit directions ŝ₁, ŝ₂ (cos ε = ŝ₁·ŝ₂):
 *   M = (μ₀/4π)·cos ε·∬ ds₁ ds₂ / R.
 * The double integral has an antiderivative Φ(x, y) (∂²Φ/∂x∂y = 1/R) in coordinates measured
 * from the feet of the common perpendicular of the two lines (length d), R² = x² + y² − 2xy·cos ε + d²:
 *   Φ = x·ln(y − x cos ε + R) + y·ln(x − y cos ε + R) − (d/sin ε)·atan((d² cos ε + xy sin²ε)/(d R sin ε)),
 * and M = (μ₀/4π)·cos ε·[Φ(x₂,y₂) − Φ(x₁,y₂) − Φ(x₂,y₁) + Φ(x₁,y₁)] — the form of Campbell (1915)
 * given by Grover (1946, Inductance Calculations, ch. 6, "filaments inclined to each other"),
 * written here with logarithms instead of Grover's tanh⁻¹ terms (checked term by term against the
 * filament double integral in tests/em/straightMutual.test.ts). Parallel segments (sin ε = 0) take
 * the limit, Grover's formula for parallel filaments of unequal length with an offset (ch. 5):
 *   ∬ = Σ± G(u),  G(u) = u·asinh(u/d) − √(u² + d²),  u over the four end-to-end offsets,
 * rearranged as G̃(u) = |u|·ln(|u| + √(u² + d²)) − √(u² + d²) with the ln d terms collected, so
 * collinear segments (d = 0) and touching ends need no special case.
 *
 * Numerics: y − x cos ε + R is formed as (x² sin²ε + d²)/(R − (y − x cos ε)) where the sum
 * would cancel. Far pairs (centre distance > FAR_FIELD × (l₁ + l₂)) use a 4 × 4 Gauss–Legendre
 * product of 1/R instead (relative error below (l/2D)⁸ ≈ 1e-13, and no cancellation of the
 * four Φ terms). Nearly parallel lines (1e-9 < sin ε < 1e-3), where the feet of the common
 * perpendicular run off to infinity and the Φ terms cancel, use the adaptive line integral of
 * the closed-form segment potential (polygonMutual.ts).
 */
import { MU0 } from "../constants.ts";
import { TanklightInputError } from "../errors.ts";
import { segmentMutual } from "./polygonMutual.ts";
import type { Vec3 } from "./types.ts";

const MU0_OVER_4PI = MU0 / (4 * Math.PI);
/** Pairs whose centres are farther apart than this many summed lengths use Gauss–Legendre. */
const FAR_FIELD = 20;
/** Below this sin ε (and above PARALLEL_SIN) the closed skew form loses digits: adaptive quadrature. */
const SKEW_MIN_SIN = 1e-3;
/** At or below this sin ε the lines are taken as parallel (the angle changes M by < 1e-9 relative). */
const PARALLEL_SIN = 1e-9;
/** Collinear overlap below this fraction of the summed lengths is taken as touching. */
const OVERLAP_RTOL = 1e-12;

// 4-point Gauss–Legendre on [0, 1] (A&S Table 25.4)
const GL_X = [0.0694318442029737, 0.330009478207572, 0.669990521792428, 0.9305681557970263];
const GL_W = [0.1739274225687269, 0.3260725774312731, 0.3260725774312731, 0.1739274225687269];

/**
 * Segments packed for the hot paths: stride {@link SEG_STRIDE} — start point (3), unit direction
 * (3), length (m), weight (turns). Private to lib/em.
 */
export const SEG_STRIDE = 8;

/**
 * Packs closed polygons (each `points` with a weight) into one segment array, stride SEG_STRIDE.
 * Zero-length segments are dropped.
 */
export function packPolygons(polygons: readonly { readonly points: readonly Vec3[]; readonly turns: number }[]): Float64Array {
  const out: number[] = [];
  for (const poly of polygons) {
    const pts = poly.points;
    for (let i = 0; i < pts.length; i++) {
      const p = pts[i]!, q = pts[(i + 1) % pts.length]!;
      const dx = q[0] - p[0], dy = q[1] - p[1], dz = q[2] - p[2];
      const L = Math.sqrt(dx * dx + dy * dy + dz * dz);
      if (L === 0) continue;
      out.push(p[0], p[1], p[2], dx / L, dy / L, dz / L, L, poly.turns);
    }
  }
  return Float64Array.from(out);
}

/** ln(a + R) with a + R = q/(R − a) where it would cancel (q = R² − a² formed from the geometry). */
function logSum(a: number, R: number, q: number): number {
  return Math.log(a >= 0 ? a + R : q / (R - a));
}

/** G̃(u) = |u|·ln(|u| + √(u² + d²)) − √(u² + d²) (parallel-filament antiderivative less |u|·ln d). */
function gTilde(u: number, d2: number): number {
  const au = Math.abs(u);
  const r = Math.sqrt(u * u + d2);
  return au === 0 ? -r : au * Math.log(au + r) - r;
}

/**
 * cos ε·∬ ds₁ ds₂/R for segment i of `a` and segment j of `b` (packed, stride SEG_STRIDE), m.
 * M = (μ₀/4π) × this, per turn (weights not applied). +Infinity where collinear segments
 * overlap. No validation (hot path).
 */
export function segmentPairIntegral(a: Float64Array, i: number, b: Float64Array, j: number): number {
  const o = i * SEG_STRIDE, k = j * SEG_STRIDE;
  const s1x = a[o + 3]!, s1y = a[o + 4]!, s1z = a[o + 5]!, l = a[o + 6]!;
  const s2x = b[k + 3]!, s2y = b[k + 4]!, s2z = b[k + 5]!, m = b[k + 6]!;
  const c = s1x * s2x + s1y * s2y + s1z * s2z;
  if (c === 0) return 0;
  // w = p₁ − p₂
  const wx = a[o]! - b[k]!, wy = a[o + 1]! - b[k + 1]!, wz = a[o + 2]! - b[k + 2]!;
  // far field: 4 × 4 Gauss–Legendre of 1/R
  const mx = wx + 0.5 * (l * s1x - m * s2x), my = wy + 0.5 * (l * s1y - m * s2y), mz = wz + 0.5 * (l * s1z - m * s2z);
  const D2 = mx * mx + my * my + mz * mz;
  const span = FAR_FIELD * (l + m);
  if (D2 > span * span) {
    let sum = 0;
    for (let p = 0; p < 4; p++) {
      const u = GL_X[p]! * l;
      const ax = wx + u * s1x, ay = wy + u * s1y, az = wz + u * s1z;
      let inner = 0;
      for (let q = 0; q < 4; q++) {
        const v = GL_X[q]! * m;
        const rx = ax - v * s2x, ry = ay - v * s2y, rz = az - v * s2z;
        inner += GL_W[q]! / Math.sqrt(rx * rx + ry * ry + rz * rz);
      }
      sum += GL_W[p]! * inner;
    }
    return c * sum * l * m;
  }
  const nx = s1y * s2z - s1z * s2y, ny = s1z * s2x - s1x * s2z, nz = s1x * s2y - s1y * s2x;
  const sin2 = nx * nx + ny * ny + nz * nz;
  if (sin2 > SKEW_MIN_SIN * SKEW_MIN_SIN) return c * skewIntegral(wx, wy, wz, s1x, s1y, s1z, l, s2x, s2y, s2z, m, c, nx, ny, nz, sin2);
  if (sin2 > PARALLEL_SIN * PARALLEL_SIN) {
    const p2: Vec3 = [b[k]!, b[k + 1]!, b[k + 2]!];
    const q2: Vec3 = [p2[0] + m * s2x, p2[1] + m * s2y, p2[2] + m * s2z];
    const p1: Vec3 = [a[o]!, a[o + 1]!, a[o + 2]!];
    const q1: Vec3 = [p1[0] + l * s1x, p1[1] + l * s1y, p1[2] + l * s1z];
    return segmentMutual(p1, q1, p2, q2) / MU0_OVER_4PI;
  }
  return parallelIntegral(wx, wy, wz, s1x, s1y, s1z, l, s2x, s2y, s2z, m, c);
}

/** Campbell–Grover skew form (module header); returns ∬ ds₁ ds₂/R without cos ε. */
function skewIntegral(
  wx: number, wy: number, wz: number, s1x: number, s1y: number, s1z: number, l: number,
  s2x: number, s2y: number, s2z: number, m: number, c: number, nx: number, ny: number, nz: number, sin2: number,
): number {
  const ws1 = wx * s1x + wy * s1y + wz * s1z;
  const ws2 = wx * s2x + wy * s2y + wz * s2z;
  const x0 = (c * ws2 - ws1) / sin2; // foot of the common perpendicular on line 1, from p₁
  const y0 = (ws2 - c * ws1) / sin2; // … on line 2, from p₂
  const s = Math.sqrt(sin2);
  const d = Math.abs(wx * nx + wy * ny + wz * nz) / s;
  const d2 = d * d;
  const phi = (x: number, y: number): number => {
    const R = Math.sqrt(Math.max(0, x * x + y * y - 2 * x * y * c + d2));
    let f = 0;
    if (x !== 0) f += x * logSum(y - x * c, R, x * x * sin2 + d2);
    if (y !== 0) f += y * logSum(x - y * c, R, y * y * sin2 + d2);
    if (d > 0) f -= (d / s) * Math.atan((d2 * c + x * y * sin2) / (d * R * s));
    return f;
  };
  const x1 = -x0, x2 = l - x0, y1 = -y0, y2 = m - y0;
  return phi(x2, y2) - phi(x1, y2) - phi(x2, y1) + phi(x1, y1);
}

/** Grover's parallel-filament form (module header); returns cos ε·∬ with cos ε = ±1. */
function parallelIntegral(
  wx: number, wy: number, wz: number, s1x: number, s1y: number, s1z: number, l: number,
  s2x: number, s2y: number, s2z: number, m: number, c: number,
): number {
  // segment 2 projected on line 1 (origin p₁): [t_p, t_q]; d from the midpoint of segment 2
  const tp = -(wx * s1x + wy * s1y + wz * s1z);
  const tq = tp + m * c;
  const hx = -wx + 0.5 * m * s2x, hy = -wy + 0.5 * m * s2y, hz = -wz + 0.5 * m * s2z;
  const cx = hy * s1z - hz * s1y, cy = hz * s1x - hx * s1z, cz = hx * s1y - hy * s1x;
  const d2 = cx * cx + cy * cy + cz * cz;
  const lo = Math.min(tp, tq), hi = Math.max(tp, tq);
  const u1 = l - lo, u2 = -lo, u3 = l - hi, u4 = -hi;
  const lin = Math.abs(u1) - Math.abs(u2) - Math.abs(u3) + Math.abs(u4);
  let sum = gTilde(u1, d2) - gTilde(u2, d2) - gTilde(u3, d2) + gTilde(u4, d2);
  if (d2 === 0) {
    if (lin > OVERLAP_RTOL * (l + m)) return Infinity;
  } else {
    sum -= 0.5 * Math.log(d2) * lin;
  }
  return Math.sign(c) * sum;
}

function vec(v: unknown, path: string, where: string): Vec3 {
  if (!Array.isArray(v) || v.length !== 3 || !v.every((x) => typeof x === "number" && Number.isFinite(x))) {
    throw new TanklightInputError([{ path, message: "must be three finite coordinates in m", value: v, expected: "[x, y, z] in m" }], where);
  }
  return v as unknown as Vec3;
}

function overlap(where: string, path: string): never {
  throw new TanklightInputError(
    [{ path, message: "two segments are collinear and share length: their filament mutual inductance is infinite", value: "overlapping segments" }],
    where,
  );
}

/**
 * Mutual inductance of two straight current filaments p₁→q₁ and p₂→q₂ in any relative
 * position, in closed form (Campbell 1915 / Grover 1946 ch. 5–6; see the module header):
 * parallel with any offset, collinear, touching at an end, meeting at an angle, or skew.
 * The sign follows the directions: reversing one segment negates M; perpendicular segments give 0.
 *
 * @param p1, q1 ends of segment 1, m (world coordinates). @param p2, q2 ends of segment 2, m.
 * @returns M per turn, H. Throws TanklightInputError for non-finite points or collinear
 *   segments that overlap (M infinite).
 * @example straightFilamentMutual([0,0,0], [0.1,0,0], [0,0.01,0], [0.1,0.01,0]) // → 4.1865e-8 (two 10 cm wires 1 cm apart);  straightFilamentMutual([0,0,0], [0.1,0,0], [0.1,0,0], [0.2,0,0]) // → 1.3863e-8 (collinear and touching: (μ₀/4π)·0.2·ln 2)
 * @see polygonPairMutual, segmentVectorPotential
 */
export function straightFilamentMutual(p1: Vec3, q1: Vec3, p2: Vec3, q2: Vec3): number {
  const where = "straightFilamentMutual";
  const pts = [vec(p1, "p1", where), vec(q1, "q1", where), vec(p2, "p2", where), vec(q2, "q2", where)];
  const a = packPolygons([{ points: [pts[0]!, pts[1]!], turns: 1 }]);
  const b = packPolygons([{ points: [pts[2]!, pts[3]!], turns: 1 }]);
  // a two-point "polygon" packs the segment there and back: use only the first
  if (a.length === 0 || b.length === 0) return 0;
  const v = segmentPairIntegral(a, 0, b, 0);
  if (!Number.isFinite(v)) overlap(where, "p2, q2");
  return MU0_OVER_4PI * v;
}

/**
 * Σ over every segment pair of two packed sets of w₁w₂·(μ₀/4π)·cos ε·∬ 1/R — the mutual
 * inductance of two sets of closed polygon filaments, H. +Infinity where segments overlap.
 * No validation (hot path).
 */
export function packedPolygonMutual(a: Float64Array, b: Float64Array): number {
  const na = a.length / SEG_STRIDE, nb = b.length / SEG_STRIDE;
  let sum = 0;
  for (let i = 0; i < na; i++) {
    const wa = a[i * SEG_STRIDE + 7]!;
    let row = 0;
    for (let j = 0; j < nb; j++) row += b[j * SEG_STRIDE + 7]! * segmentPairIntegral(a, i, b, j);
    sum += wa * row;
  }
  return MU0_OVER_4PI * sum;
}

/**
 * Mutual inductance of two closed polygon filaments (each a list of vertices, closed back to
 * the first), per turn, H: the sum over all segment pairs of the closed-form straight-filament
 * mutual inductance (Grover 1946 ch. 6, the method for polygons; formulas in the module header).
 *
 * @param a vertices of polygon a, m, ≥ 2 points. @param b vertices of polygon b, m, ≥ 2 points.
 * @returns M, H. Throws TanklightInputError for non-finite vertices or overlapping collinear sides.
 * @example polygonPairMutual([[-0.05,-0.05,0],[0.05,-0.05,0],[0.05,0.05,0],[-0.05,0.05,0]], [[-0.05,-0.05,0.05],[0.05,-0.05,0.05],[0.05,0.05,0.05],[-0.05,0.05,0.05]]) // → 3.2228e-8 (two coaxial 10 cm squares 5 cm apart)
 * @see straightFilamentMutual, circlePolygonMutual
 */
export function polygonPairMutual(a: readonly Vec3[], b: readonly Vec3[]): number {
  const where = "polygonPairMutual";
  for (const [name, poly] of [["a", a], ["b", b]] as const) {
    if (!Array.isArray(poly) || poly.length < 2) {
      throw new TanklightInputError([{ path: name, message: "must be a polygon of at least 2 vertices [x, y, z] in m", value: poly }], where);
    }
    poly.forEach((p, i) => vec(p, `${name}[${i}]`, where));
  }
  const v = packedPolygonMutual(packPolygons([{ points: a, turns: 1 }]), packPolygons([{ points: b, turns: 1 }]));
  if (!Number.isFinite(v)) overlap(where, "a, b");
  return v;
}

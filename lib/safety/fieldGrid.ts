/**
 * The transmitters' flux density as phasors (peak, real and imaginary vector parts) on a set of
 * horizontal levels of points — the field model of lib/em (magneticField, the loop closed form
 * of Simpson et al. 2001 through loopKernel) summed over coils with their currents and phases.
 *
 * Fast path: a coil made only of circles coaxial with its own axis, posed with that axis
 * vertical, has a field that depends on (ρ, z) alone. For each level it is tabulated on a
 * uniform ρ grid (spacing a twelfth of the level's distance to the nearest filament, so the
 * field varies little between nodes) and read back by 4-point Lagrange interpolation
 * (error O(h⁴); measured 5.7e-5 of the local field at worst against magneticField, 5–110 mm
 * above a 20-turn winding, tests/safety/exposure.test.ts).
 * Every other coil (polygons, tilted poses), and a level so close to the winding that the table
 * would be longer than the level, takes magneticField point by point.
 */
import { K_B_RHO, K_B_Z, loopKernel } from "../em/loopKernel.ts";
import { magneticField } from "../em/magneticField.ts";
import { poseFrame } from "../em/frames.ts";
import type { Coil, Pose, Vec3 } from "../em/types.ts";

/** One current-carrying coil: peak current and its phase. */
export interface FieldSource {
  readonly coil: Coil;
  readonly pose: Pose;
  /** A peak */
  readonly current: number;
  /** rad */
  readonly phase: number;
}

/** Points on horizontal levels: level k holds the points (xs[i], ys[i], zs[k]) for every i. */
export interface LevelPoints {
  readonly xs: Float64Array;
  readonly ys: Float64Array;
  readonly zs: Float64Array;
}

/** Phasor flux density at every point (index k·n + i), T peak: real and imaginary parts of each component. */
export interface FieldPhasors {
  readonly re: readonly [Float64Array, Float64Array, Float64Array];
  readonly im: readonly [Float64Array, Float64Array, Float64Array];
}

interface AxialCoil {
  /** world axis sign: +1 if the coil's +z is world +z, −1 if flipped */
  readonly sign: number;
  readonly centre: Vec3;
  /** per filament: radius, centre height along the coil axis, axis sign, turns */
  readonly radius: Float64Array;
  readonly height: Float64Array;
  readonly axisSign: Float64Array;
  readonly turns: Float64Array;
}

const AXIS_TOL = 1e-12;

/** The coil as coaxial circles about a vertical world axis, or undefined if it is not one. */
function axialCoil(coil: Coil, pose: Pose): AxialCoil | undefined {
  const n = coil.filaments.length;
  const radius = new Float64Array(n), height = new Float64Array(n), axisSign = new Float64Array(n), turns = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const f = coil.filaments[i]!;
    if (f.kind !== "circle") return undefined;
    const al = Math.hypot(f.axis[0], f.axis[1], f.axis[2]);
    if (Math.abs(f.axis[0]) > AXIS_TOL * al || Math.abs(f.axis[1]) > AXIS_TOL * al) return undefined;
    if (Math.abs(f.center[0]) > AXIS_TOL || Math.abs(f.center[1]) > AXIS_TOL) return undefined;
    radius[i] = f.radius;
    height[i] = f.center[2];
    axisSign[i] = Math.sign(f.axis[2]);
    turns[i] = f.turns;
  }
  const frame = poseFrame(pose, "exposureCheck", "pose");
  // world image of the coil's +z is the third column of R
  const ax = frame.R[2]!, ay = frame.R[5]!, az = frame.R[8]!;
  if (Math.abs(ax) > AXIS_TOL || Math.abs(ay) > AXIS_TOL) return undefined;
  return { sign: Math.sign(az), centre: frame.position, radius, height, axisSign, turns };
}

/**
 * Adds one axisymmetric coil's field (per ampere, coil frame) on one level to the phasor sums.
 * Tabulates (B_ρ, B_z) at ρ = n·h and interpolates.
 */
function addAxialLevel(c: AxialCoil, p: LevelPoints, k: number, cre: number, cim: number, out: FieldPhasors, scratch: Float64Array): boolean {
  const n = p.xs.length;
  const zc = c.sign * (p.zs[k]! - c.centre[2]);
  let rhoMax = 0;
  for (let i = 0; i < n; i++) rhoMax = Math.max(rhoMax, Math.hypot(p.xs[i]! - c.centre[0], p.ys[i]! - c.centre[1]));
  let dMin = Infinity;
  for (let f = 0; f < c.radius.length; f++) dMin = Math.min(dMin, Math.abs(c.axisSign[f]! * (zc - c.height[f]!)));
  if (!(dMin > 0)) return false;
  const h = dMin / 12;
  const nodes = Math.ceil(rhoMax / h) + 3;
  if (nodes > n) return false; // a table longer than the level: point by point is cheaper and exact
  const br = new Float64Array(nodes + 1), bz = new Float64Array(nodes + 1);
  for (let m = 0; m <= nodes; m++) {
    const rho = m * h;
    let sr = 0, sz = 0;
    for (let f = 0; f < c.radius.length; f++) {
      const s = c.axisSign[f]!;
      loopKernel(c.radius[f]!, rho, s * (zc - c.height[f]!), scratch, true);
      sr += c.turns[f]! * scratch[K_B_RHO]!;
      sz += s * c.turns[f]! * scratch[K_B_Z]!;
    }
    br[m] = rho === 0 ? 0 : sr;
    bz[m] = sz;
  }
  const [rx, ry, rz] = out.re, [ix, iy, iz] = out.im;
  for (let i = 0; i < n; i++) {
    const dx = p.xs[i]! - c.centre[0], dy = p.ys[i]! - c.centre[1];
    const rho = Math.hypot(dx, dy);
    const t = rho / h;
    const m = Math.max(1, Math.floor(t));
    const u = t - m; // nodes m−1, m, m+1, m+2 at u = −1, 0, 1, 2
    const w0 = (-u * (u - 1) * (u - 2)) / 6, w1 = ((u + 1) * (u - 1) * (u - 2)) / 2, w2 = (-(u + 1) * u * (u - 2)) / 2, w3 = ((u + 1) * u * (u - 1)) / 6;
    const vr = w0 * br[m - 1]! + w1 * br[m]! + w2 * br[m + 1]! + w3 * br[m + 2]!;
    const vz = c.sign * (w0 * bz[m - 1]! + w1 * bz[m]! + w2 * bz[m + 1]! + w3 * bz[m + 2]!);
    const ux = rho > 0 ? dx / rho : 0, uy = rho > 0 ? dy / rho : 0;
    const j = k * n + i;
    const bxw = vr * ux, byw = vr * uy;
    rx[j] = rx[j]! + cre * bxw; ry[j] = ry[j]! + cre * byw; rz[j] = rz[j]! + cre * vz;
    ix[j] = ix[j]! + cim * bxw; iy[j] = iy[j]! + cim * byw; iz[j] = iz[j]! + cim * vz;
  }
  return true;
}

/** Adds one coil's field on one level point by point through magneticField. */
function addDirectLevel(src: FieldSource, p: LevelPoints, k: number, cre: number, cim: number, out: FieldPhasors): void {
  const n = p.xs.length;
  const z = p.zs[k]!;
  for (let i = 0; i < n; i++) {
    const b = magneticField(src.coil, src.pose, 1, [p.xs[i]!, p.ys[i]!, z]);
    const j = k * n + i;
    for (let d = 0 as 0 | 1 | 2; d < 3; d++) {
      const re = out.re[d], im = out.im[d];
      re[j] = re[j]! + cre * b[d];
      im[j] = im[j]! + cim * b[d];
    }
  }
}

/**
 * Phasor flux density of all sources at every point of the levels, T peak.
 * @param sources coils with their peak currents and phases.
 * @param points level points (see {@link LevelPoints}).
 * @returns real and imaginary parts of (B_x, B_y, B_z), index k·n + i.
 * @example fieldPhasors([{ coil: tx, pose: { position: [0, 0, 0] }, current: 1, phase: 0 }], { xs: Float64Array.of(0), ys: Float64Array.of(0), zs: Float64Array.of(0.01) }).re[2][0] // → B_z on the axis 10 mm up, T peak
 */
export function fieldPhasors(sources: readonly FieldSource[], points: LevelPoints): FieldPhasors {
  const total = points.xs.length * points.zs.length;
  const mk = () => new Float64Array(total);
  const out: FieldPhasors = { re: [mk(), mk(), mk()], im: [mk(), mk(), mk()] };
  const scratch = new Float64Array(4);
  for (const src of sources) {
    const cre = src.current * Math.cos(src.phase), cim = src.current * Math.sin(src.phase);
    const axial = axialCoil(src.coil, src.pose);
    for (let k = 0; k < points.zs.length; k++) {
      if (!(axial && addAxialLevel(axial, points, k, cre, cim, out, scratch))) addDirectLevel(src, points, k, cre, cim, out);
    }
  }
  return out;
}

/**
 * Poses and frames: the rotation that carries a coil's own frame (axis +z) to the world, and
 * the world positions of its filaments.
 */
import { TanklightInputError } from "../errors.ts";
import { checkCoil, checkPose } from "./inputs.ts";
import type { Coil, Filament, Pose, Vec3 } from "./types.ts";

/** A validated pose as a 3×3 rotation (row-major, coil → world) and a translation. */
export interface Frame {
  /** rotation matrix, row-major: world = R·p + position */
  readonly R: Float64Array;
  readonly position: Vec3;
}

function finiteVec(v: unknown, path: string, where: string): Vec3 {
  if (!Array.isArray(v) || v.length !== 3 || !v.every((x) => typeof x === "number" && Number.isFinite(x))) {
    throw new TanklightInputError([{ path, message: "must be three finite numbers", value: v, expected: "[x, y, z]" }], where);
  }
  return v as unknown as Vec3;
}

/**
 * The rotation matrix of a pose: R = R_align(n)·R_z(spin), where R_z(spin) turns the coil by
 * `spin` about its own axis and R_align is the smallest rotation taking +z to the unit axis n
 * (about ẑ × n by the angle between them; Rodrigues' formula). For n = −z exactly R_align is
 * the half-turn about x. Entries use k = 1/(1 + n_z) or, for n_z < 0, the equal (1 − n_z)/(n_x² + n_y²)
 * with the in-plane direction normalised first, so nothing cancels or underflows near n = −z
 * (there the in-plane orientation, i.e. the reference of `spin`, depends on the direction of approach).
 *
 * @param pose `{ position (m), axis? (any non-zero vector, normalised; default [0,0,1]), spin? (rad, default 0) }`;
 *   strict keys, lengths and angles may be quantity strings (`["12 mm", 0, "2 cm"]`, `"30 deg"`).
 * @param where function name for error messages.  @param field field name for error messages.
 * @returns the frame (R row-major, position). Throws TanklightInputError on NaN/∞ or a zero axis.
 * @example poseFrame({ position: [0, 0, 0.01], axis: [1, 0, 0] }).R // → [0,0,1, 0,1,0, −1,0,0]
 */
export function poseFrame(pose: Pose, where = "poseFrame", field = "pose"): Frame {
  if (!pose || typeof pose !== "object") {
    throw new TanklightInputError([{ path: field, message: "must be a pose { position, axis?, spin? }", value: pose }], where);
  }
  // strict keys (a mistyped 'axsi' names 'axis'), quantity strings ("12 mm", "30 deg") to SI
  pose = checkPose(pose, field, where);
  const position = finiteVec(pose.position, `${field}.position`, where);
  let nx = 0, ny = 0, nz = 1;
  if (pose.axis !== undefined) {
    const a = finiteVec(pose.axis, `${field}.axis`, where);
    const len = Math.hypot(a[0], a[1], a[2]);
    if (!(len > 0)) {
      throw new TanklightInputError([{ path: `${field}.axis`, message: "must be a non-zero direction", value: pose.axis, expected: "non-zero vector" }], where);
    }
    nx = a[0] / len; ny = a[1] / len; nz = a[2] / len;
  }
  const spin = pose.spin ?? 0;
  if (!(typeof spin === "number" && Number.isFinite(spin))) {
    throw new TanklightInputError([{ path: `${field}.spin`, message: "must be a finite angle in rad", value: spin }], where);
  }
  const A = new Float64Array(9);
  A[2] = nx; A[5] = ny; A[6] = -nx; A[7] = -ny; A[8] = nz;
  if (nz >= 0) {
    const k = 1 / (1 + nz);
    A[0] = 1 - k * nx * nx; A[1] = -k * nx * ny;
    A[3] = -k * nx * ny; A[4] = 1 - k * ny * ny;
  } else {
    // k·nᵢnⱼ = (1 − n_z)·ĉᵢĉⱼ with ĉ = (n_x, n_y)/hypot(n_x, n_y): no cancellation, no underflow
    const h = Math.hypot(nx, ny);
    // below 1e-100 the direction of (n_x, n_y) is lost in subnormals: take the half-turn about x
    const cx = h > 1e-100 ? nx / h : 0;
    const cy = h > 1e-100 ? ny / h : 1;
    const w = 1 - nz;
    A[0] = 1 - w * cx * cx; A[1] = -w * cx * cy;
    A[3] = -w * cx * cy; A[4] = 1 - w * cy * cy;
  }
  const c = Math.cos(spin);
  const s = Math.sin(spin);
  // R = A·R_z(spin), R_z = [[c, −s, 0], [s, c, 0], [0, 0, 1]]
  const R = new Float64Array(9);
  for (let i = 0; i < 3; i++) {
    const a0 = A[3 * i]!, a1 = A[3 * i + 1]!, a2 = A[3 * i + 2]!;
    R[3 * i] = a0 * c + a1 * s;
    R[3 * i + 1] = -a0 * s + a1 * c;
    R[3 * i + 2] = a2;
  }
  return { R, position };
}

/** R·v (coil → world direction). */
export function rotate(R: Float64Array, v: Vec3): [number, number, number] {
  return [
    R[0]! * v[0] + R[1]! * v[1] + R[2]! * v[2],
    R[3]! * v[0] + R[4]! * v[1] + R[5]! * v[2],
    R[6]! * v[0] + R[7]! * v[1] + R[8]! * v[2],
  ];
}

/** Rᵀ·v (world → coil direction). */
export function rotateBack(R: Float64Array, v: Vec3): [number, number, number] {
  return [
    R[0]! * v[0] + R[3]! * v[1] + R[6]! * v[2],
    R[1]! * v[0] + R[4]! * v[1] + R[7]! * v[2],
    R[2]! * v[0] + R[5]! * v[1] + R[8]! * v[2],
  ];
}

/** A point of the coil's frame in world coordinates: R·p + position. */
export function toWorld(frame: Frame, p: Vec3): [number, number, number] {
  const r = rotate(frame.R, p);
  return [r[0] + frame.position[0], r[1] + frame.position[1], r[2] + frame.position[2]];
}

/** A world point in the coil's frame: Rᵀ·(x − position). */
export function toCoil(frame: Frame, x: Vec3): [number, number, number] {
  return rotateBack(frame.R, [x[0] - frame.position[0], x[1] - frame.position[1], x[2] - frame.position[2]]);
}

/** One filament carried into the world by a frame (circle axes stay unit vectors). */
export function filamentToWorld(f: Filament, frame: Frame): Filament {
  if (f.kind === "circle") {
    const n = rotate(frame.R, f.axis);
    const l = Math.hypot(n[0], n[1], n[2]);
    return { kind: "circle", center: toWorld(frame, f.center), axis: [n[0] / l, n[1] / l, n[2] / l], radius: f.radius, turns: f.turns };
  }
  return { kind: "path", points: f.points.map((p) => toWorld(frame, p)), turns: f.turns };
}

/**
 * The filaments of a coil placed by a pose, in world coordinates.
 * @example worldFilaments(coil, { position: [0, 0, 0.02] }) // each circle's centre raised by 20 mm
 */
export function worldFilaments(coil: Coil, pose: Pose, where = "worldFilaments", field = "pose"): Filament[] {
  checkCoil(coil, "coil", where);
  const frame = poseFrame(pose, where, field);
  return coil.filaments.map((f) => filamentToWorld(f, frame));
}

/**
 * Flux density of a coil in any pose at a world point.
 */
import { TanklightInputError } from "../errors.ts";
import { current as currentQ, vec3, lazySchema } from "../schema.ts";
import { checkCoil, checkPose, GEOMETRY_LIMITS, parseArg, quantityArg } from "./inputs.ts";
import { K_B_RHO, K_B_Z, loopKernel } from "./loopKernel.ts";
import { addSegmentField } from "./segmentField.ts";
import { poseFrame, rotate, toCoil } from "./frames.ts";
import type { Coil, Pose, Vec3 } from "./types.ts";

const POINT = lazySchema(() => vec3({ min: -GEOMETRY_LIMITS.maxLength, max: GEOMETRY_LIMITS.maxLength }));
const CURRENT = lazySchema(() => currentQ());

/**
 * Flux density B of a coil carrying current I, placed by a pose, at a world point:
 * the sum over its filaments, each weighted by its turns — circles by the closed form of
 * {@link loopField} (Simpson et al. 2001, cancellation-free kernel), polygon paths by the
 * closed-form Biot–Savart field of each straight segment (Hanson & Hirshman 2002).
 *
 * @param coil a Coil (filaments in its own frame, axis +z).
 * @param pose `{ position, axis?, spin? }` — the coil's +z maps to `axis`.
 * @param current coil current I, A, finite (peak if you use it as an amplitude); "150 mA" accepted.
 * @param point world point, m.
 * @returns B as a world vector, T. Throws TanklightInputError for a point on a filament.
 * @example magneticField(coil, { position: [0, 0, 0] }, 1, [0, 0, 0]) // single 40 mm turn → [0, 0, 1.5708e-5]
 * @see loopField, mutualInductance
 */
export function magneticField(coil: Coil, pose: Pose, current: number | string, point: Vec3): Vec3 {
  const where = "magneticField";
  checkCoil(coil, "coil", where);
  const I = quantityArg(CURRENT, () => true, current, "current", where);
  const x: Vec3 =
    Array.isArray(point) && point.length === 3 && point.every((c) => typeof c === "number" && Math.abs(c) <= GEOMETRY_LIMITS.maxLength)
      ? (point as Vec3)
      : parseArg(POINT, point, "point", where);
  const frame = poseFrame(checkPose(pose, "pose", where), where, "pose");
  const p = toCoil(frame, x);
  const ks = new Float64Array(4);
  const acc = new Float64Array(3);
  for (const f of coil.filaments) {
    if (f.kind === "circle") {
      const n = f.axis;
      const nl = Math.hypot(n[0], n[1], n[2]);
      const nx = n[0] / nl, ny = n[1] / nl, nz = n[2] / nl;
      const wx = p[0] - f.center[0], wy = p[1] - f.center[1], wz = p[2] - f.center[2];
      const z = wx * nx + wy * ny + wz * nz;
      const rx = wx - z * nx, ry = wy - z * ny, rz = wz - z * nz;
      const rho = Math.sqrt(rx * rx + ry * ry + rz * rz);
      if (!loopKernel(f.radius, rho, z, ks, true)) onWire(x);
      const bz = ks[K_B_Z]! * f.turns;
      const br = rho > 0 ? (ks[K_B_RHO]! * f.turns) / rho : 0;
      acc[0] = acc[0]! + bz * nx + br * rx;
      acc[1] = acc[1]! + bz * ny + br * ry;
      acc[2] = acc[2]! + bz * nz + br * rz;
    } else {
      const pts = f.points;
      for (let i = 0; i < pts.length; i++) {
        const a = pts[i]!;
        const b = pts[(i + 1) % pts.length]!;
        if (!addSegmentField(a[0], a[1], a[2], b[0], b[1], b[2], f.turns, p[0], p[1], p[2], acc)) onWire(x);
      }
    }
  }
  const B = rotate(frame.R, [acc[0]! * I, acc[1]! * I, acc[2]! * I]);
  return [B[0] + 0, B[1] + 0, B[2] + 0];
}

function onWire(point: Vec3): never {
  throw new TanklightInputError(
    [{ path: "point", message: "lies on a filament of the coil, where the filament field is infinite", value: point, expected: "a point off the winding" }],
    "magneticField",
  );
}

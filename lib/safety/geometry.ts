/**
 * Small geometric facts about posed transmitter coils that several safety checks need: the
 * coil's reach in the plane, the top of its winding, and its magnetic moment per ampere.
 */
import { poseFrame, rotate } from "../em/frames.ts";
import type { Coil, Pose, Vec3 } from "../em/types.ts";

/** Largest distance of any filament from the coil's own axis, m. */
export function coilReach(coil: Coil): number {
  let r = 0;
  for (const f of coil.filaments) {
    if (f.kind === "circle") r = Math.max(r, Math.hypot(f.center[0], f.center[1]) + f.radius);
    else for (const p of f.points) r = Math.max(r, Math.hypot(p[0], p[1]));
  }
  return r;
}

/** Highest world z of the winding (circles: centre height ± the tilt of the ring), m. */
export function windingTop(coil: Coil, pose: Pose): number {
  const frame = poseFrame(pose, "windingTop", "pose");
  let top = -Infinity;
  for (const f of coil.filaments) {
    const pts: Vec3[] = f.kind === "circle" ? circleExtremes(f.center, f.axis, f.radius) : [...f.points];
    for (const p of pts) top = Math.max(top, rotate(frame.R, p)[2] + frame.position[2]);
  }
  return top;
}

/** Points of a circle that bound it (four points on two orthogonal diameters suffice for a bound within the ring's tilt). */
function circleExtremes(c: Vec3, n: Vec3, r: number): Vec3[] {
  const l = Math.hypot(n[0], n[1], n[2]);
  const nz = n[2] / l;
  const s = Math.sqrt(Math.max(0, 1 - nz * nz)); // the ring rises r·sin(tilt) above its centre
  return [[c[0], c[1], c[2] + r * s], [c[0], c[1], c[2] - r * s], [c[0] + r, c[1], c[2]], [c[0] - r, c[1], c[2]]];
}

/**
 * Magnetic moment of a coil per ampere in the world frame: Σ turns × vector area of each
 * filament (circle: πa²·n̂; polygon: ½Σ pᵢ × pᵢ₊₁), rotated by the pose, A·m² per A.
 * @example momentPerAmpere(tx, { position: [0, 0, 0] })[2] // → 0.10564 (m², Σ turns × πa²)
 */
export function momentPerAmpere(coil: Coil, pose: Pose): Vec3 {
  let mx = 0, my = 0, mz = 0;
  for (const f of coil.filaments) {
    if (f.kind === "circle") {
      const l = Math.hypot(f.axis[0], f.axis[1], f.axis[2]);
      const a = (Math.PI * f.radius * f.radius * f.turns) / l;
      mx += a * f.axis[0]; my += a * f.axis[1]; mz += a * f.axis[2];
    } else {
      const p = f.points;
      for (let i = 0; i < p.length; i++) {
        const u = p[i]!, v = p[(i + 1) % p.length]!;
        mx += 0.5 * f.turns * (u[1] * v[2] - u[2] * v[1]);
        my += 0.5 * f.turns * (u[2] * v[0] - u[0] * v[2]);
        mz += 0.5 * f.turns * (u[0] * v[1] - u[1] * v[0]);
      }
    }
  }
  const frame = poseFrame(pose, "momentPerAmpere", "pose");
  return rotate(frame.R, [mx, my, mz]);
}

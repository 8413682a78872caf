/**
 * Per-turn mutual inductance of any two filaments (circle or polygon path) in world
 * coordinates: the dispatcher shared by mutualInductance, selfInductance and couplingEvaluator.
 */
import { circleMutualCore, circleMutualStats, LOOP_MUTUAL_TOL } from "./loopMutual.ts";
import { circleSegmentMutual, segmentMutual, type SegmentProbe } from "./polygonMutual.ts";
import type { Filament } from "./types.ts";

/** What {@link filamentMutual} reports besides the value (an out-parameter owned by the caller). */
export interface FilamentProbe {
  /** smallest squared distance found between the two filaments (node to wire), m² */
  minDistance2: number;
}

/** A fresh {@link FilamentProbe}. */
export function filamentProbe(): FilamentProbe {
  return { minDistance2: Infinity };
}

/**
 * Per-turn mutual inductance of two filaments in world coordinates, H (circle–circle:
 * loopMutualInductance's line integral; circle–path and path–path: segment sums, polygonMutual).
 * Writes the smallest node-to-wire distance² seen to `probe` when one is given.
 */
export function filamentMutual(a: Filament, b: Filament, tol = LOOP_MUTUAL_TOL, probe?: FilamentProbe): number {
  if (a.kind === "circle" && b.kind === "circle") {
    // integrate over the smaller circle (fewer nodes needed for the same accuracy)
    const [p, q] = a.radius >= b.radius ? [a, b] : [b, a];
    const stats = circleMutualStats();
    const m = circleMutualCore(
      p.center[0], p.center[1], p.center[2], p.axis[0], p.axis[1], p.axis[2], p.radius,
      q.center[0], q.center[1], q.center[2], q.axis[0], q.axis[1], q.axis[2], q.radius, tol, stats,
    );
    if (probe) probe.minDistance2 = stats.minDistance2;
    return m;
  }
  if (a.kind === "path" && b.kind === "path") {
    let sum = 0;
    let min = Infinity;
    const seg: SegmentProbe = { minDistance2: Infinity };
    for (let i = 0; i < a.points.length; i++) {
      const p1 = a.points[i]!, q1 = a.points[(i + 1) % a.points.length]!;
      for (let j = 0; j < b.points.length; j++) {
        sum += segmentMutual(p1, q1, b.points[j]!, b.points[(j + 1) % b.points.length]!, tol, seg);
        if (seg.minDistance2 < min) min = seg.minDistance2;
      }
    }
    if (probe) probe.minDistance2 = min;
    return sum;
  }
  const c = (a.kind === "circle" ? a : b) as Extract<Filament, { kind: "circle" }>;
  const path = (a.kind === "path" ? a : b) as Extract<Filament, { kind: "path" }>;
  let sum = 0;
  let min = Infinity;
  const seg: SegmentProbe = { minDistance2: Infinity };
  for (let j = 0; j < path.points.length; j++) {
    sum += circleSegmentMutual(c.center, c.axis, c.radius, path.points[j]!, path.points[(j + 1) % path.points.length]!, tol, seg);
    if (seg.minDistance2 < min) min = seg.minDistance2;
  }
  if (probe) probe.minDistance2 = min;
  return sum;
}


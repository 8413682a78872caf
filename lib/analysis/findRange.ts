/**
 * findRange(system, direction, options): how far a token still lights along a ray — straight
 * up the axis, sideways at a height, at a tilt — with the margin curve along the way.
 *
 * Method: bracketing and bisection. The ray is scanned outward at `step`; between two scan
 * points the verdict changes (a bracket), or the transmitter–token mutual inductance changes
 * sign while both ends are lit (a zero of M lies between: its position is found by bisection on
 * M, and the token is dark there — a thin dead line the scan stepped over). Each lit/unlit
 * boundary is then bisected until its bracket is narrower than `resolution`; the reported
 * distance is the lit end of the bracket, so the token is lit there (to the model's accuracy)
 * and dark within `resolution` beyond it. Each evaluation is a full nonlinear link solve
 * (./probe.ts) with M from couplingEvaluator; with several transmitters every coil's M, and the
 * sign test on their net coupling Σᵢ Mᵢ·Re(Iᵢ/I₀) (zero where their fields cancel).
 */
import * as z from "../zod.ts";
import type { Vec3 } from "../em/types.ts";
import type { LinkSystem } from "../circuit/link.ts";
import { length, parseInput, vec3, unitVector, lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import { makeProbe, probeModel, type ModelStatement, type Probe } from "./probe.ts";
import { probeSpec } from "./probeSpec.ts";
import { tokenAxes, type OrientationInput } from "./region.ts";

/** A ray of token positions: start point and direction. */
export const RayInput = lazySchema(() => z.strictObject({
  /** where the ray starts (the token's centre), m; default [0, 0, 0] */
  from: vec3().optional(),
  /** direction, normalised (e.g. [0, 0, 1] on the axis, [1, 0, 0] sideways) */
  along: unitVector(),
}));
/** What findRange accepts as a direction. */
export type RayInput = z.input<typeof RayInput>;

/** Options of {@link findRange}. */
export interface RangeOptions {
  readonly token?: number;
  readonly others?: boolean;
  /** token orientation (flat by default; a list takes the worst) */
  readonly orientation?: OrientationInput;
  /** lit threshold, A (default 0.5 mA, trade practice) */
  readonly litThreshold?: number;
  /** steady-state model, as solveLink's `model` (default "fundamental"; "auto" and "harmonic" run harmonic balance where needed) */
  readonly model?: "fundamental" | "harmonic" | "auto";
  /** how far to look, m or "300 mm" (default 0.3 m) */
  readonly max?: number | string;
  /** scan step, m (default max/150) */
  readonly step?: number | string;
  /** bisection resolution, m (default 0.1 mm) */
  readonly resolution?: number | string;
}

/** One point of the margin curve. */
export interface RangePoint {
  /** distance from the ray's start, m */
  readonly distance: number;
  /** the dimmest LED's current, worst over the orientations, A */
  readonly current: number;
  /** current / lit threshold (≥ 1 lit) */
  readonly margin: number;
}

/** The result of {@link findRange} (SI). */
export interface RangeResult {
  /** the end of the lit stretch that starts at the ray's start, m (0 if dark at the start) */
  readonly range: number;
  /** the far end of the furthest lit stretch within `max`, m (0 if never lit) */
  readonly furthest: number;
  /** world position at `range`, m */
  readonly position: Vec3;
  /** every lit/unlit boundary found, m from the start, each to within `resolution` */
  readonly boundaries: readonly number[];
  /** the margin curve: scan points and bisection points, by distance */
  readonly curve: readonly RangePoint[];
  readonly resolution: number;
  readonly litThreshold: number;
  /** true when still lit at `max` (the range may be longer) */
  readonly openEnded: boolean;
  /** with `options.model` "harmonic" or "auto": how the points were solved and the error band */
  readonly model?: ModelStatement;
  readonly warnings: readonly string[];
}

const Opts = lazySchema(() => z.object({
  max: length().optional(),
  step: length().optional(),
  resolution: length().optional(),
  model: z.enum(["fundamental", "harmonic", "auto"]).optional(),
}));

/**
 * The furthest distance along a ray at which a token still lights (see the module comment).
 *
 * @param system a link system; `options.token` (default 0) is the token that moves.
 * @param direction `{ from?: [x, y, z] (m or "5 mm"), along: [dx, dy, dz] }`.
 * @param options orientation, lit threshold, max (0.3 m), step (max/150), resolution (0.1 mm).
 * @returns {@link RangeResult}: range (continuous from the start), furthest lit distance, the
 *   boundaries, the margin curve; m and A.
 * @example findRange(system, { from: [0, 0, "5 mm"], along: [0, 0, 1] }).range // → 0.051 (m above the lid, pebble drawer)
 */
export function findRange(system: LinkSystem, direction: RayInput, options: RangeOptions = {}): RangeResult {
  const where = "findRange";
  const ray = parseInput(RayInput, direction, where);
  const o = parseInput(Opts, { max: options.max, step: options.step, resolution: options.resolution, model: options.model }, where);
  const max = o.max ?? 0.3;
  const step = o.step ?? max / 150;
  const resolution = o.resolution ?? 1e-4;
  if (!(step <= max && resolution <= step)) {
    throw new TanklightInputError([{ path: "step", message: "need resolution ≤ step ≤ max", value: { max, step, resolution }, expected: "e.g. max 0.3 m, step 2 mm, resolution 0.1 mm" }], where);
  }
  const axes = tokenAxes(options.orientation, where);
  const spec = probeSpec(system, { token: options.token ?? 0, others: options.others ?? false, axes, ...(options.litThreshold !== undefined ? { litThreshold: options.litThreshold } : {}), ...(o.model !== undefined ? { model: o.model } : {}) }, where);
  const probe = makeProbe(spec);
  const from = (ray.from as Vec3 | undefined) ?? [0, 0, 0];
  const r = rangeWith(probe, from, ray.along as Vec3, max, step, resolution);
  if (spec.model !== undefined) {
    const statement = probeModel(spec);
    return statement ? { ...r, model: statement } : r;
  }
  // the describing function's validity at the ray's start (usually its strongest coupling), each LED outside it named
  const at = from.map((c) => (1e3 * c).toFixed(1)).join(", ");
  const validity = [...new Set(axes.flatMap((a) => probe.validity(from, a)))].map((w) => `at the ray's start (${at}) mm: ${w}`);
  return validity.length > 0 ? { ...r, warnings: [...r.warnings, ...validity] } : r;
}

/** Where a coupling M(s) changes sign between lo and hi (`negativeAtLo`: M(lo) < 0), by bisection on M alone to `tol`, m. */
function signChange(mutualAt: (s: number) => number, lo: number, hi: number, negativeAtLo: boolean, tol: number): number {
  while (hi - lo > tol) {
    const m = 0.5 * (lo + hi);
    if (mutualAt(m) < 0 === negativeAtLo) lo = m;
    else hi = m;
  }
  return 0.5 * (lo + hi);
}

/** findRange's bracketing and bisection with a ready probe (also used by searchDesign). */
export function rangeWith(probe: Probe, from: Vec3, along: Vec3, max: number, step: number, resolution: number): RangeResult {
  const th = probe.spec.litThreshold;
  const axes = probe.spec.axes;
  const curve: RangePoint[] = [];
  const pos = (s: number): Vec3 => [from[0] + s * along[0], from[1] + s * along[1], from[2] + s * along[2]];
  const solve = (s: number): { current: number; mutual: number[] } => {
    let current = Infinity;
    const mutual: number[] = [];
    for (const a of axes) {
      const v = probe.at(pos(s), a);
      current = Math.min(current, v.current);
      mutual.push(v.mutual);
    }
    curve.push({ distance: s, current, margin: current / th });
    return { current, mutual };
  };
  const mutualOnly = (s: number, k: number): number => probe.at(pos(s), axes[k]!).mutual;
  const boundaries: number[] = [];
  /** bisect the boundary between a (lit = litA) and b, returns the lit end of the final bracket */
  const bisect = (a: number, b: number, litA: boolean): number => {
    let lo = a;
    let hi = b;
    while (Math.abs(hi - lo) > resolution) {
      const m = 0.5 * (lo + hi);
      if (solve(m).current >= th === litA) lo = m;
      else hi = m;
    }
    return litA ? lo : hi;
  };
  const n = Math.max(1, Math.round(max / step));
  let prev = { s: 0, ...solve(0) };
  let range: number | undefined = prev.current >= th ? undefined : 0;
  let furthest = prev.current >= th ? 0 : -1;
  for (let i = 1; i <= n; i++) {
    const s = (max * i) / n;
    const cur = { s, ...solve(s) };
    const litP = prev.current >= th;
    const litC = cur.current >= th;
    if (litP !== litC) {
      const edge = bisect(prev.s, cur.s, litP);
      boundaries.push(edge);
      if (litP) {
        range ??= edge;
        furthest = edge;
      }
    } else if (litP && litC) {
      // both lit: a sign change of M between them hides a dark line
      const k = cur.mutual.findIndex((m, j) => m < 0 !== prev.mutual[j]! < 0);
      if (k >= 0) {
        const zero = signChange((m) => mutualOnly(m, k), prev.s, cur.s, prev.mutual[k]! < 0, resolution / 4);
        const atZero = solve(zero);
        if (atZero.current < th) {
          const e1 = bisect(prev.s, zero, true);
          const e2 = bisect(zero, cur.s, false);
          boundaries.push(e1, e2);
          range ??= e1;
        }
      }
      furthest = s;
    }
    if (litC && !litP) furthest = s;
    prev = cur;
  }
  const openEnded = prev.current >= th;
  if (range === undefined) range = max;
  curve.sort((a, b) => a.distance - b.distance);
  const warnings: string[] = [];
  if (openEnded) warnings.push(`still lit at the end of the search (${max} m): the range may be longer; raise options.max`);
  return {
    range,
    furthest: Math.max(0, furthest),
    position: pos(range),
    boundaries,
    curve,
    resolution,
    litThreshold: th,
    openEnded,
    warnings,
  };
}

/**
 * flatSpiral — a planar circular (Archimedean) spiral of wire or PCB trace in the plane z = 0.
 *
 * Geometry: the conductor's centreline is r(θ) = r₀ + pθ/(2π), 0 ≤ θ ≤ 2πN, with
 * r₀ = innerRadius + w/2 (w: trace width or wire outer diameter), so the innermost conductor edge
 * is at innerRadius and the outermost at outerRadius = innerRadius + N·p + w.
 *
 * Two filament models (`model`):
 * - "rings" (default): turn i becomes a circle at the turn's mean radius r₀ + (i + ½)p. The flux a
 *   turn of the spiral links differs from its mean circle's only at second order in p/r
 *   (tests/em/builders/flatSpiral.test.ts compares the two models' inductance), and circle pairs
 *   use the fast closed-form mutual inductance.
 * - "spiral": one closed polygon following the spiral (`segmentsPerTurn` chords a turn), closed by
 *   the return lead: down one pitch below the plane at the outer end, radially in, and up to the
 *   start (as an underpass on a second layer would run). Slower; use it to check the rings.
 * wireLength is the spiral's exact arc length (closed form, see archimedeanArcLength), without
 * the return lead or other leads, in both models.
 */
import * as z from "../../zod.ts";
import { parseInput, length, lazySchema } from "../../schema.ts";
import type { Coil, CoilShape, Filament, Vec3 } from "../types.ts";
import { IssueList, SIZE_LIMITS, count, archimedeanArcLength, circleTurn, metres } from "./common.ts";
import { conductorFields, conductorFootprint, resolveConductor } from "./conductor.ts";

/** Input of {@link flatSpiral}: lengths as SI numbers (m) or strings. */
export const FlatSpiralSpec = lazySchema(() => z.strictObject({
  /** innermost conductor edge, m (give this or outerRadius) */
  innerRadius: length().optional(),
  /** outermost conductor edge, m */
  outerRadius: length().optional(),
  turns: count(1, "turns"),
  /** radial advance per turn, m, ≥ conductor width */
  pitch: length(),
  model: z.enum(["rings", "spiral"]).optional(),
  /** chords per turn of the "spiral" model, integer ≥ 8 (default 64) */
  segmentsPerTurn: count(8, "segmentsPerTurn").optional(),
  ...conductorFields,
}));
/** What {@link flatSpiral} accepts. */
export type FlatSpiralInput = z.input<typeof FlatSpiralSpec>;
/** The shape record of a flat spiral. */
export type FlatSpiralShape = Extract<CoilShape, { kind: "flatSpiral" }>;
/** A coil made by {@link flatSpiral}. */
export type FlatSpiral = Coil & { readonly shape: FlatSpiralShape };

/**
 * A planar circular spiral of N turns.
 * @param spec.innerRadius innermost conductor edge, m, ≥ w/2 (or spec.outerRadius = innerRadius + N·p + w).
 * @param spec.turns N, integer ≥ 1. @param spec.pitch p ≥ w, m.
 * @param spec.trace `{ width, thickness }` (thickness a length or "1 oz"), or spec.wire / spec.awg.
 * @param spec.model "rings" (default) or "spiral". @param spec.segmentsPerTurn for "spiral", default 64.
 * @returns a readonly Coil in the plane z = 0 (axis +z) with shape in SI.
 * @example flatSpiral({ innerRadius: "5 mm", turns: 10, pitch: "0.6 mm", trace: { width: "0.4 mm", thickness: "1 oz" } }).shape.outerRadius // → 0.0114
 */
export function flatSpiral(spec: FlatSpiralInput): FlatSpiral {
  const where = "flatSpiral";
  const s = parseInput(FlatSpiralSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(s, issues, true);
  if ((s.innerRadius === undefined) === (s.outerRadius === undefined)) {
    issues.add("innerRadius", "give exactly one of innerRadius or outerRadius", s.innerRadius ?? s.outerRadius);
  }
  issues.throwIfAny();
  const w = conductorFootprint(conductor!);
  const N = s.turns;
  const p = s.pitch;
  if (p < w) issues.add("pitch", `is narrower than the conductor width ${metres(w)}`, spec.pitch, `≥ ${metres(w)}`);
  const innerRadius = s.innerRadius ?? s.outerRadius! - N * p - w;
  if (innerRadius < w / 2) {
    const field = s.innerRadius !== undefined ? "innerRadius" : "outerRadius";
    issues.add(
      field,
      `leaves an inner radius of ${metres(innerRadius)}, smaller than half the conductor width (${metres(w / 2)})`,
      field === "innerRadius" ? spec.innerRadius : spec.outerRadius,
      field === "innerRadius" ? `≥ ${metres(w / 2)}` : `≥ ${metres(w / 2 + N * p + w)}`,
    );
  }
  const model = s.model ?? "rings";
  const vertices = model === "spiral" ? N * (s.segmentsPerTurn ?? 64) : 0;
  if (vertices > SIZE_LIMITS.points.max) {
    issues.add("segmentsPerTurn", `gives ${vertices} vertices (turns × segmentsPerTurn), more than ${SIZE_LIMITS.points.max}: ${SIZE_LIMITS.points.why}`, spec.segmentsPerTurn ?? 64, `turns × segmentsPerTurn ≤ ${SIZE_LIMITS.points.max}`);
  }
  issues.throwIfAny();
  const r0 = innerRadius + w / 2;
  const outerRadius = innerRadius + N * p + w;
  let filaments: Filament[];
  if (model === "rings") {
    filaments = Array.from({ length: N }, (_, i) => circleTurn(r0 + (i + 0.5) * p, 0));
  } else {
    filaments = [{ kind: "path", points: spiralPolygon(r0, p, N, s.segmentsPerTurn ?? 64), turns: 1 }];
  }
  const shape: FlatSpiralShape = {
    kind: "flatSpiral",
    innerRadius,
    outerRadius,
    meanRadius: (innerRadius + outerRadius) / 2,
    pitch: p,
    turns: N,
    conductorWidth: w,
    model,
  };
  return Object.freeze({
    filaments: Object.freeze(filaments),
    conductor: conductor!,
    turns: N,
    wireLength: archimedeanArcLength(r0, r0 + N * p, p),
    shape,
  });
}

/** Vertices of the spiral r = r₀ + pθ/(2π), θ ∈ [0, 2πN], counter-clockwise seen from +z, closed by the return lead one pitch below the plane. */
function spiralPolygon(r0: number, p: number, N: number, segmentsPerTurn: number): Vec3[] {
  const points: Vec3[] = [];
  const n = N * segmentsPerTurn;
  for (let k = 0; k <= n; k++) {
    const theta = (2 * Math.PI * k) / segmentsPerTurn;
    const r = r0 + (p * k) / segmentsPerTurn;
    points.push([r * Math.cos(theta), r * Math.sin(theta), 0]);
  }
  // Return lead: from the outer end (r₀ + Np, θ = 0) down, radially inward, and up to the start.
  points.push([r0 + N * p, 0, -p], [r0, 0, -p]);
  return points;
}

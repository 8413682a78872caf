/**
 * rectSpiral — a rectangular coil, planar (turns nest inward in the plane z = 0, one pitch per
 * turn) or wound (stacking "axial": every turn has the outer outline, turns one pitch apart along
 * z, centred on z = 0). Each turn is one closed polygon filament at the conductor centreline,
 * counter-clockwise seen from +z; rounded corners (cornerRadius > 0) become `cornerSegments`
 * chords per corner. Outline dimensions are measured to the outer conductor edge of the outermost
 * turn; the centreline of turn i (planar) has half-sides W/2 − w/2 − i·p and H/2 − w/2 − i·p and
 * corner radius max(R − w/2 − i·p, 0).
 *
 * Wire length (planar): a rectangular spiral whose sides step inward by one pitch each time it
 * passes its start corner is Σ (perimeter of turn i) − p exactly (its turns are the rings except
 * that the first ring's last side stops one pitch short); wound: Σ √(perimeter² + p²). Leads excluded.
 */
import * as z from "../../zod.ts";
import { parseInput, length, lazySchema } from "../../schema.ts";
import type { Coil, CoilShape, Filament } from "../types.ts";
import { IssueList, SIZE_LIMITS, count, metres, roundedRectangle, roundedRectanglePerimeter } from "./common.ts";
import { conductorFields, conductorFootprint, resolveConductor } from "./conductor.ts";

/** Input of {@link rectSpiral}: lengths as SI numbers (m) or strings. */
export const RectSpiralSpec = lazySchema(() => z.strictObject({
  outerWidth: length(),
  outerHeight: length(),
  turns: count(1, "turns"),
  pitch: length(),
  /** corner radius of the outline's outer edge, m (default 0) */
  cornerRadius: length({ nonNegative: true }).optional(),
  /** "planar" (default) or "axial" */
  stacking: z.enum(["planar", "axial"]).optional(),
  /** chords per rounded corner (default 8) */
  cornerSegments: count(1, "cornerSegments").optional(),
  ...conductorFields,
}));
/** What {@link rectSpiral} accepts. */
export type RectSpiralInput = z.input<typeof RectSpiralSpec>;
/** The shape record of a rectangular spiral. */
export type RectSpiralShape = Extract<CoilShape, { kind: "rectSpiral" }>;
/** A coil made by {@link rectSpiral}. */
export type RectSpiral = Coil & { readonly shape: RectSpiralShape };

/**
 * A rectangular planar or wound spiral.
 * @param spec.outerWidth W, m, and spec.outerHeight H, m: outer edge of the outermost turn.
 * @param spec.turns N, integer ≥ 1. @param spec.pitch p ≥ w, m (in-plane or axial by `stacking`).
 * @param spec.cornerRadius R, m, 0 ≤ R ≤ min(W, H)/2. @param spec.stacking "planar" | "axial".
 * @param spec.trace | spec.wire | spec.awg the conductor (footprint width w).
 * @returns a readonly Coil of N path filaments with shape in SI.
 * @example rectSpiral({ outerWidth: "30 mm", outerHeight: "20 mm", turns: 5, pitch: "1 mm", trace: { width: "0.5 mm", thickness: "35 um" } }).shape.innerWidth // → 0.021
 */
export function rectSpiral(spec: RectSpiralInput): RectSpiral {
  const where = "rectSpiral";
  const s = parseInput(RectSpiralSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(s, issues, true);
  issues.throwIfAny();
  const w = conductorFootprint(conductor!);
  const { outerWidth: W, outerHeight: H, turns: N, pitch: p } = s;
  const R = s.cornerRadius ?? 0;
  const stacking = s.stacking ?? "planar";
  const cornerSegments = s.cornerSegments ?? 8;
  if (p < w) issues.add("pitch", `is narrower than the conductor width ${metres(w)}`, spec.pitch, `≥ ${metres(w)}`);
  if (R > Math.min(W, H) / 2) issues.add("cornerRadius", `exceeds half the shorter side (${metres(Math.min(W, H) / 2)})`, spec.cornerRadius, `≤ ${metres(Math.min(W, H) / 2)}`);
  const inset = stacking === "planar" ? (N - 1) * p : 0;
  const innerWidth = W - 2 * inset - 2 * w;
  const innerHeight = H - 2 * inset - 2 * w;
  if (!(innerWidth > 0)) issues.add("outerWidth", `is too small for ${N} turns at ${metres(p)} pitch of a ${metres(w)} conductor`, spec.outerWidth, `> ${metres(2 * inset + 2 * w)}`);
  if (!(innerHeight > 0)) issues.add("outerHeight", `is too small for ${N} turns at ${metres(p)} pitch of a ${metres(w)} conductor`, spec.outerHeight, `> ${metres(2 * inset + 2 * w)}`);
  const vertices = N * 4 * (R > 0 ? cornerSegments + 1 : 1);
  if (vertices > SIZE_LIMITS.points.max) {
    issues.add("cornerSegments", `gives ${vertices} vertices (turns × 4 corners × (cornerSegments + 1)), more than ${SIZE_LIMITS.points.max}: ${SIZE_LIMITS.points.why}`, cornerSegments, `turns × 4 × (cornerSegments + 1) ≤ ${SIZE_LIMITS.points.max}`);
  }
  issues.throwIfAny();
  const filaments: Filament[] = [];
  let wireLength = 0;
  for (let i = 0; i < N; i++) {
    const d = stacking === "planar" ? w / 2 + i * p : w / 2;
    const z = stacking === "planar" ? 0 : (i - (N - 1) / 2) * p;
    const hx = W / 2 - d;
    const hy = H / 2 - d;
    const r = Math.max(R - d, 0);
    filaments.push({ kind: "path", points: roundedRectangle(hx, hy, r, z, cornerSegments), turns: 1 });
    const perimeter = roundedRectanglePerimeter(hx, hy, r);
    wireLength += stacking === "planar" ? perimeter : Math.hypot(perimeter, p);
  }
  if (stacking === "planar") wireLength -= p;
  const shape: RectSpiralShape = {
    kind: "rectSpiral",
    stacking,
    outerWidth: W,
    outerHeight: H,
    innerWidth,
    innerHeight,
    pitch: p,
    turns: N,
    cornerRadius: R,
    conductorWidth: w,
  };
  return Object.freeze({ filaments: Object.freeze(filaments), conductor: conductor!, turns: N, wireLength, shape });
}

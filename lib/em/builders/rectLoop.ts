/**
 * rectLoop — one rectangular turn in the plane z = 0, sides measured between conductor
 * centrelines (as in Grover's rectangle formula), one closed polygon filament counter-clockwise
 * seen from +z; wire length 2(width + height) (sharp corners; leads excluded).
 */
import * as z from "../../zod.ts";
import { parseInput, length, lazySchema } from "../../schema.ts";
import type { Coil, CoilShape } from "../types.ts";
import { IssueList, metres, roundedRectangle } from "./common.ts";
import { conductorFields, conductorFootprint, resolveConductor } from "./conductor.ts";

/** Input of {@link rectLoop}: lengths as SI numbers (m) or strings. */
export const RectLoopSpec = lazySchema(() => z.strictObject({
  /** centreline width along x, m */
  width: length(),
  /** centreline height along y, m */
  height: length(),
  ...conductorFields,
}));
/** What {@link rectLoop} accepts. */
export type RectLoopInput = z.input<typeof RectLoopSpec>;
/** The shape record of a rectangular loop. */
export type RectLoopShape = Extract<CoilShape, { kind: "rectLoop" }>;
/** A coil made by {@link rectLoop}. */
export type RectLoop = Coil & { readonly shape: RectLoopShape };

/**
 * One rectangular turn.
 * @param spec.width a, m, > w (conductor footprint). @param spec.height b, m, > w.
 * @param spec.wire | spec.awg | spec.trace the conductor.
 * @returns a readonly Coil with one path filament (4 vertices) and wireLength 2(a + b).
 * @example rectLoop({ width: "10 cm", height: "5 cm", awg: 18 }).wireLength // → 0.3
 */
export function rectLoop(spec: RectLoopInput): RectLoop {
  const where = "rectLoop";
  const s = parseInput(RectLoopSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(s, issues, true);
  issues.throwIfAny();
  const w = conductorFootprint(conductor!);
  if (!(s.width > w)) issues.add("width", `must exceed the conductor width ${metres(w)} (opposite sides would touch)`, spec.width, `> ${metres(w)}`);
  if (!(s.height > w)) issues.add("height", `must exceed the conductor width ${metres(w)} (opposite sides would touch)`, spec.height, `> ${metres(w)}`);
  issues.throwIfAny();
  const shape: RectLoopShape = { kind: "rectLoop", width: s.width, height: s.height };
  return Object.freeze({
    filaments: Object.freeze([{ kind: "path" as const, points: roundedRectangle(s.width / 2, s.height / 2, 0, 0, 1), turns: 1 }]),
    conductor: conductor!,
    turns: 1,
    wireLength: 2 * (s.width + s.height),
    shape,
  });
}

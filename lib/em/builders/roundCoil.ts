/**
 * roundCoil — a wound multi-turn circular coil with every turn where it really sits in the
 * winding window. Conventions (docs/methods/coils.md §roundCoil):
 * - the winding starts at the inner radius (the former surface) and layers stack radially
 *   outward, one radial pitch apart (default: the wire's outer diameter — square stacking);
 * - within a layer neighbouring turns are one axial pitch apart (default: the outer diameter —
 *   close wound); odd layers run back the other way, as a real winding does, so a last layer that
 *   is not full starts at the end where the previous layer stopped;
 * - origin at the centre of the winding window (radially the axis, axially the window's middle);
 * - each turn is one circle filament at its wire centre (radius r, height z), turns = 1;
 * - wire length: each turn's helix √((2πr)² + s²), s = the step to the next turn (axial pitch,
 *   radial pitch at a layer change); leads are not included.
 */
import * as z from "../../zod.ts";
import { parseInput, length, lazySchema } from "../../schema.ts";
import type { Coil, CoilShape, Filament } from "../types.ts";
import { IssueList, count, circleTurn, metres } from "./common.ts";
import { conductorFields, conductorFootprint, resolveConductor } from "./conductor.ts";

/** Input of {@link roundCoil}: lengths as SI numbers (m) or strings ("12 mm"). */
export const RoundCoilSpec = lazySchema(() => z.strictObject({
  /** radius of the former: inner boundary of the winding window, m (give this or meanRadius) */
  innerRadius: length().optional(),
  /** mean radius (inner + outer)/2 of the winding window, m */
  meanRadius: length().optional(),
  /** total turns, integer ≥ 1 */
  turns: count(1, "turns"),
  /** layers, integer ≥ 1 (default 1); turns per full layer = ⌈turns/layers⌉ */
  layers: count(1, "layers").optional(),
  /** axial centre-to-centre distance of turns, m (default: wire outer diameter) */
  pitch: length().optional(),
  /** radial centre-to-centre distance of layers, m (default: wire outer diameter) */
  radialPitch: length().optional(),
  ...conductorFields,
}));
/** What {@link roundCoil} accepts. */
export type RoundCoilInput = z.input<typeof RoundCoilSpec>;
/** The shape record of a roundCoil. */
export type RoundCoilShape = Extract<CoilShape, { kind: "roundCoil" }>;
/** A coil made by {@link roundCoil}. */
export type RoundCoil = Coil & { readonly shape: RoundCoilShape };

/**
 * Turns of a layered circular winding: per-turn radius and height, the layer each turn is in,
 * and the wire length. Inputs are validated SI numbers (see {@link roundCoil}).
 */
export function layeredTurns(
  firstRadius: number,
  turns: number,
  turnsPerLayer: number,
  axialPitch: number,
  radialPitch: number,
): { readonly filaments: Filament[]; readonly wireLength: number } {
  const filaments: Filament[] = [];
  let wireLength = 0;
  const z0 = -((turnsPerLayer - 1) * axialPitch) / 2;
  for (let t = 0; t < turns; t++) {
    const layer = Math.floor(t / turnsPerLayer);
    const i = t % turnsPerLayer;
    const slot = layer % 2 === 0 ? i : turnsPerLayer - 1 - i;
    const r = firstRadius + layer * radialPitch;
    filaments.push(circleTurn(r, z0 + slot * axialPitch));
    const lastInLayer = i === turnsPerLayer - 1;
    const step = lastInLayer && t < turns - 1 ? radialPitch : axialPitch;
    wireLength += Math.hypot(2 * Math.PI * r, step);
  }
  return { filaments, wireLength };
}

/**
 * A wound multi-layer circular coil with turns placed as they sit in the winding window.
 *
 * Geometry: r_j = innerRadius + d_o/2 + j·radialPitch for layer j; z = (slot − (n_L − 1)/2)·pitch;
 * outerRadius = innerRadius + (layers − 1)·radialPitch + d_o; windingHeight = (n_L − 1)·pitch + d_o,
 * with d_o the wire's outer diameter and n_L = ⌈turns/layers⌉ turns per full layer.
 *
 * @param spec.innerRadius former radius, m, ≥ d_o/2 (or spec.meanRadius, m).
 * @param spec.turns integer ≥ 1. @param spec.layers integer ≥ 1, no empty layer.
 * @param spec.wire `{ diameter, insulation? | outerDiameter? }` or a roundWire/awgWire/litzWire record; or spec.awg.
 * @param spec.pitch axial pitch ≥ d_o (default d_o). @param spec.radialPitch ≥ d_o (default d_o).
 * @returns a readonly Coil (axis +z, origin at the window centre) with `shape` in SI.
 * @throws TanklightInputError naming every bad field.
 * @example roundCoil({ innerRadius: "40 mm", turns: 20, layers: 4, wire: { diameter: "0.5 mm" } }).shape.outerRadius // → 0.042
 */
export function roundCoil(spec: RoundCoilInput): RoundCoil {
  const where = "roundCoil";
  const p = parseInput(RoundCoilSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(p, issues, false);
  const layers = p.layers ?? 1;
  if (layers > p.turns) issues.add("layers", `must be ≤ turns (${p.turns})`, p.layers, `≤ ${p.turns}`);
  const turnsPerLayer = Math.ceil(p.turns / layers);
  if (layers <= p.turns && (layers - 1) * turnsPerLayer >= p.turns) {
    issues.add("layers", `${p.turns} turns in ${layers} layers of ${turnsPerLayer} would leave a layer empty`, p.layers);
  }
  if ((p.innerRadius === undefined) === (p.meanRadius === undefined)) {
    issues.add("innerRadius", "give exactly one of innerRadius or meanRadius", p.innerRadius ?? p.meanRadius);
  }
  if (conductor === undefined) issues.throwIfAny();
  const od = conductorFootprint(conductor!);
  const axialPitch = p.pitch ?? od;
  const radialPitch = p.radialPitch ?? od;
  if (axialPitch < od) issues.add("pitch", `is narrower than the wire's outer diameter ${metres(od)}`, spec.pitch, `≥ ${metres(od)}`);
  if (radialPitch < od) issues.add("radialPitch", `is narrower than the wire's outer diameter ${metres(od)}`, spec.radialPitch, `≥ ${metres(od)}`);
  const depth = (layers - 1) * radialPitch + od;
  const innerRadius = p.innerRadius ?? (p.meanRadius ?? Infinity) - depth / 2;
  if (innerRadius < od / 2) {
    const field = p.innerRadius !== undefined ? "innerRadius" : "meanRadius";
    issues.add(
      field,
      `leaves an inner radius of ${metres(innerRadius)}, smaller than half the wire's outer diameter (${metres(od / 2)}): a turn cannot be wound tighter than its own wire`,
      field === "innerRadius" ? spec.innerRadius : spec.meanRadius,
      field === "innerRadius" ? `≥ ${metres(od / 2)}` : `≥ ${metres(od / 2 + depth / 2)}`,
    );
  }
  issues.throwIfAny();
  const outerRadius = innerRadius + depth;
  const { filaments, wireLength } = layeredTurns(innerRadius + od / 2, p.turns, turnsPerLayer, axialPitch, radialPitch);
  const shape: RoundCoilShape = {
    kind: "roundCoil",
    innerRadius,
    meanRadius: (innerRadius + outerRadius) / 2,
    outerRadius,
    windingHeight: (turnsPerLayer - 1) * axialPitch + od,
    turns: p.turns,
    layers,
    turnsPerLayer,
    axialPitch,
    radialPitch,
  };
  return Object.freeze({ filaments: Object.freeze(filaments), conductor: conductor!, turns: p.turns, wireLength, shape });
}

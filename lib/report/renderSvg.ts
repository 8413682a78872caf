/**
 * Renders a vega-lite spec to an SVG string: vega-lite compiles it to a vega spec, a headless
 * vega View (renderer "none", no browser, no canvas) draws it to SVG. vega and vega-lite are
 * loaded on first use (about a second), so importing tanklight costs nothing for them.
 * Text widths are vega's estimates (no fonts are measured), so the output is the same on every
 * machine; element ids that vega numbers per process are renumbered per chart so that the
 * same spec gives the same SVG bytes however many charts a process has drawn.
 */
import type { ChartSpec } from "./charts/spec.ts";
import { TanklightInputError, requireObject, unknownKeyMessage } from "../errors.ts";

/** Options of {@link renderSvg}. */
export interface RenderOptions {
  /** scale factor of the drawing (default 1) */
  readonly scale?: number;
}

/**
 * An SVG document for a vega-lite spec.
 * @param spec a vega-lite spec (e.g. from `chart.coverage(…)`).
 * @returns the SVG text, starting with `<svg`.
 * @example (await renderSvg(chart.ledCurrent({ curves: [{ colour: "red", distance: [0.01, 0.05], current: [5e-3, 2e-4] }], threshold: 5e-4 }))).startsWith("<svg") // → true
 */
export async function renderSvg(spec: ChartSpec, options: RenderOptions = {}): Promise<string> {
  const scale = checkRenderArgs(spec, options);
  const [{ compile }, { parse, View }] = await Promise.all([import("vega-lite"), import("vega")]);
  // vega-lite's types want its own TopLevelSpec; ours is the same JSON, typed loosely
  let compiled: ReturnType<typeof compile>["spec"];
  try {
    compiled = compile(spec as unknown as Parameters<typeof compile>[0]).spec;
  } catch (e) {
    // the spec is the caller's JSON: vega-lite's own check is its schema; its refusal is named here
    throw new TanklightInputError([{ path: "spec", message: `is not a vega-lite spec vega-lite can compile (${(e as Error).message})`, value: "the spec" }], "renderSvg");
  }
  const view = new View(parse(compiled), { renderer: "none" });
  try {
    const svg = await view.toSVG(scale);
    return renumberIds(svg);
  } finally {
    view.finalize();
  }
}

/** Renames every id="…" (and its url(#…) / href="#…" uses) to chart-local ids in order of appearance. */
function renumberIds(svg: string): string {
  const ids = [...svg.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]!);
  if (ids.length === 0) return svg;
  const map = new Map<string, string>();
  ids.forEach((id) => { if (!map.has(id)) map.set(id, `tl${map.size + 1}`); });
  return svg.replace(/(\sid="|url\(#|href="#)([^")]+)/g, (whole, lead: string, id: string) => (map.has(id) ? lead + map.get(id)! : whole));
}

/** renderSvg's arguments: a spec object with a mark, layer, concatenation or facet, and options { scale? } with 0 < scale ≤ 100. */
function checkRenderArgs(spec: unknown, options: unknown): number {
  const where = "renderSvg";
  requireObject(spec, "spec", where);
  const s = spec as Record<string, unknown>;
  if (!["mark", "layer", "hconcat", "vconcat", "concat", "facet", "repeat", "spec"].some((k) => k in s)) {
    throw new TanklightInputError([{ path: "spec", message: "must be a vega-lite spec (with a mark, layer, concat or facet; e.g. from chart.coverage(…))", value: spec }], where);
  }
  requireObject(options, "options", where);
  const o = options as Record<string, unknown>;
  for (const key of Object.keys(o)) if (key !== "scale") throw new TanklightInputError([{ path: `options.${key}`, message: unknownKeyMessage(key, ["scale"]), value: o[key] }], where);
  const scale = o["scale"] === undefined ? 1 : o["scale"];
  if (!(typeof scale === "number" && scale > 0 && scale <= 100)) throw new TanklightInputError([{ path: "options.scale", message: "must be a number > 0 and ≤ 100", value: scale }], where);
  return scale;
}

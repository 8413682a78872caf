/**
 * Renders a vega-lite spec to an SVG string: vega-lite compiles it to a vega spec, a headless
 * vega View (renderer "none", no browser, no canvas) draws it to SVG. vega and vega-lite are
 * loaded on first use (about a second), so importing tanklight costs nothing for them.
 * Text widths are vega's estimates (no fonts are measured), so the output is the same on every
 * machine; element ids that vega numbers per process are renumbered per chart so that the
 * same spec gives the same SVG bytes however many charts a process has drawn.
 */
import type { ChartSpec } from "./charts/spec.ts";

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
  const [{ compile }, { parse, View }] = await Promise.all([import("vega-lite"), import("vega")]);
  // vega-lite's types want its own TopLevelSpec; ours is the same JSON, typed loosely
  const compiled = compile(spec as unknown as Parameters<typeof compile>[0]).spec;
  const view = new View(parse(compiled), { renderer: "none" });
  try {
    const svg = await view.toSVG(options.scale ?? 1);
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

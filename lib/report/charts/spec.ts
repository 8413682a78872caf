/**
 * What every chart builder shares: the spec type, the top-level frame with our config, and
 * data-thinning for long series.
 */
import { CHART_CONFIG } from "../theme.ts";

/** A vega-lite specification (plain JSON data), as the chart builders return it. */
export interface ChartSpec {
  readonly $schema: string;
  readonly [key: string]: unknown;
}

/** vega-lite's schema address (a name only: nothing is fetched). */
export const VEGA_LITE_SCHEMA = "https://vega.github.io/schema/vega-lite/v6.json";

/** Title and subtitle of a chart. */
export interface ChartTitle {
  readonly title?: string;
  readonly subtitle?: string;
}

/** The top level of a spec: schema, title, our config, then the chart's own fields. */
export function frame(t: ChartTitle, fallbackTitle: string, body: Record<string, unknown>): ChartSpec {
  const title: Record<string, unknown> = { text: t.title ?? fallbackTitle };
  if (t.subtitle) title.subtitle = t.subtitle;
  return { $schema: VEGA_LITE_SCHEMA, title, config: CHART_CONFIG, ...body };
}

/**
 * Indices that keep at most `limit` evenly spread samples of a series of length n
 * (always the first and the last).
 */
export function thin(n: number, limit: number): number[] {
  if (n <= limit) return Array.from({ length: n }, (_, i) => i);
  const out: number[] = [];
  for (let j = 0; j < limit; j++) out.push(Math.round((j * (n - 1)) / (limit - 1)));
  return out;
}

/** Cell edges of a (possibly non-uniform) ascending grid: midpoints, extended half a step at each end. */
export function cellEdges(centres: readonly number[]): number[] {
  const n = centres.length;
  if (n === 1) return [centres[0]! - 0.5, centres[0]! + 0.5];
  const e = [centres[0]! - (centres[1]! - centres[0]!) / 2];
  for (let i = 0; i + 1 < n; i++) e.push((centres[i]! + centres[i + 1]!) / 2);
  e.push(centres[n - 1]! + (centres[n - 1]! - centres[n - 2]!) / 2);
  return e;
}

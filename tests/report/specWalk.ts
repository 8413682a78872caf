/** Test helpers: walk a vega-lite spec and collect its marks, axis titles and data. */
import type { ChartSpec } from "../../lib/report/chart.ts";

export interface SpecParts {
  marks: string[];
  titles: string[];
  data: Record<string, unknown>[][];
}

export function walkSpec(spec: ChartSpec | Record<string, unknown>): SpecParts {
  const out: SpecParts = { marks: [], titles: [], data: [] };
  const visit = (node: unknown): void => {
    if (Array.isArray(node)) return node.forEach(visit);
    if (typeof node !== "object" || node === null) return;
    const o = node as Record<string, unknown>;
    if (o.mark) out.marks.push(typeof o.mark === "string" ? o.mark : String((o.mark as { type: string }).type));
    const enc = o.encoding as Record<string, { title?: unknown }> | undefined;
    if (enc) for (const ch of ["x", "y"]) if (typeof enc[ch]?.title === "string") out.titles.push(enc[ch]!.title as string);
    const data = o.data as { values?: Record<string, unknown>[] } | undefined;
    if (data?.values) out.data.push(data.values);
    for (const k of ["layer", "hconcat", "vconcat"]) if (o[k]) visit(o[k]);
  };
  visit(spec);
  return out;
}

/** min and max of a field over some rows */
export function extent(rows: Record<string, unknown>[], field: string): [number, number] {
  const v = rows.map((r) => r[field]).filter((x): x is number => typeof x === "number");
  return [Math.min(...v), Math.max(...v)];
}

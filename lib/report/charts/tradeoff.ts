/**
 * Design-search trade-off: each candidate design as a point (a cost such as supply current
 * or part count against a margin), the non-dominated front joined by a line, the chosen
 * design ringed and labelled.
 */
import { axisTitle, displayScale, maxAbs, tidy } from "../scale.ts";
import { PALETTE } from "../theme.ts";
import { finiteArray } from "./check.ts";
import { frame, type ChartSpec, type ChartTitle } from "./spec.ts";

/** One candidate: its label, cost (x, SI units) and margin (y, SI units or a ratio). */
export interface TradeoffPoint {
  readonly label: string;
  readonly cost: number;
  readonly margin: number;
  readonly chosen?: boolean;
}

/** Input of {@link tradeoffChart}. */
export interface TradeoffChartInput extends ChartTitle {
  readonly points: readonly TradeoffPoint[];
  /** name and SI unit of the cost axis, e.g. { name: "supply current", unit: "A" } */
  readonly cost: { readonly name: string; readonly unit: string };
  /** name and unit of the margin axis, e.g. { name: "worst-point LED current / threshold", unit: "×" } */
  readonly margin: { readonly name: string; readonly unit: string };
}

/** Points not beaten on both counts (lower cost and higher margin), by ascending cost. */
export function paretoFront(points: readonly TradeoffPoint[]): TradeoffPoint[] {
  const sorted = [...points].sort((a, b) => a.cost - b.cost || b.margin - a.margin);
  const front: TradeoffPoint[] = [];
  let best = -Infinity;
  for (const p of sorted) if (p.margin > best) { front.push(p); best = p.margin; }
  return front;
}

/**
 * Trade-off scatter (vega-lite spec) with the non-dominated front.
 * @example tradeoffChart({ points: [{ label: "A", cost: 0.2, margin: 3 }], cost: { name: "supply current", unit: "A" }, margin: { name: "margin", unit: "×" } })
 */
export function tradeoffChart(input: TradeoffChartInput): ChartSpec {
  const where = "chart.tradeoff";
  finiteArray(input.points.map((p) => p.cost), "points[].cost", where, input.cost.unit);
  finiteArray(input.points.map((p) => p.margin), "points[].margin", where, input.margin.unit);
  const xs = displayScale(maxAbs(input.points.map((p) => p.cost)), input.cost.unit === "×" ? "" : input.cost.unit);
  const ys = displayScale(maxAbs(input.points.map((p) => p.margin)), input.margin.unit === "×" ? "" : input.margin.unit);
  const unitX = input.cost.unit === "×" ? "×" : xs.unit, unitY = input.margin.unit === "×" ? "×" : ys.unit;
  const row = (p: TradeoffPoint) => ({ label: p.label, cost: tidy(p.cost * xs.factor), margin: tidy(p.margin * ys.factor), kind: p.chosen ? "chosen" : "candidate" });
  const x = { field: "cost", type: "quantitative", title: axisTitle(input.cost.name, unitX) };
  const y = { field: "margin", type: "quantitative", title: axisTitle(input.margin.name, unitY) };
  return frame(input, "Candidate designs: margin against cost", {
    width: 420,
    height: 280,
    layer: [
      { data: { values: paretoFront(input.points).map(row) }, mark: { type: "line", color: PALETTE.amber, strokeDash: [4, 3] }, encoding: { x, y } },
      {
        data: { values: input.points.map(row) },
        mark: { type: "point", filled: true, size: 60 },
        encoding: { x, y, color: { field: "kind", type: "nominal", title: "design", scale: { domain: ["candidate", "chosen"], range: [PALETTE.teal, PALETTE.brick] } }, tooltip: [{ field: "label" }, x, y] },
      },
      {
        data: { values: input.points.filter((p) => p.chosen).map(row) },
        mark: { type: "text", dx: 8, align: "left", color: PALETTE.brick, fontWeight: "bold" },
        encoding: { x, y, text: { field: "label" } },
      },
    ],
  });
}

/**
 * Coverage heat map: LED average current over a plane of token positions, unlit cells in
 * the dark colour, the lit boundary drawn as a level line at the threshold (marching squares),
 * and dead zones outlined and labelled.
 */
import { formatQuantity } from "../../units.ts";
import { axisTitle, tidy } from "../scale.ts";
import { HEAT_RAMP, PALETTE } from "../theme.ts";
import { heatGrid } from "./heatGrid.ts";
import { frame, type ChartSpec, type ChartTitle } from "./spec.ts";

/** Input of {@link coverageChart}; positions in m, currents in A. */
export interface CoverageChartInput extends ChartTitle {
  /** column positions, m, ascending */
  readonly x: readonly number[];
  /** row positions, m, ascending */
  readonly y: readonly number[];
  /** LED average current, A, current[row][column] */
  readonly current: readonly (readonly number[])[];
  /** lit threshold, A */
  readonly threshold: number;
  /** dead zones as closed polygons of [x, y] points, m */
  readonly deadZones?: readonly (readonly (readonly [number, number])[])[];
  /** axis names (default "x", "y") */
  readonly xName?: string;
  readonly yName?: string;
  /** chart width in pixels (default 420; the height follows the aspect ratio) */
  readonly width?: number;
}

/**
 * A coverage heat map (vega-lite spec): colour = LED current on a log scale, unlit cells
 * dark, the lit boundary as a pale line, dead zones outlined in amber with a label.
 * @example coverageChart({ x: [0, 0.01], y: [0, 0.01], current: [[1e-3, 2e-4], [8e-4, 1e-4]], threshold: 5e-4 })
 */
export function coverageChart(input: CoverageChartInput): ChartSpec {
  const grid = heatGrid("chart.coverage", { x: ["x", input.x], y: ["y", input.y], values: ["current", input.current], level: ["threshold", input.threshold], unit: "A" });
  const { length: len, value: amps, xEdges: xe, yEdges: ye } = grid;
  const cells: Record<string, number | boolean>[] = [];
  input.current.forEach((row, r) => {
    row.forEach((i, c) => {
      cells.push({ ...grid.cell(r, c), current: tidy(Math.max(i, input.threshold / 100) * amps.factor), lit: i >= input.threshold });
    });
  });
  const boundary = grid.levelLine;
  const zones = (input.deadZones ?? []).flatMap((poly, zone) =>
    [...poly, poly[0]!].map((p, order) => ({ zone, order, x: tidy(p[0] * len.factor), y: tidy(p[1] * len.factor) })),
  );
  const labels = (input.deadZones ?? []).map((poly, zone) => ({
    zone,
    x: tidy((poly.reduce((s, p) => s + p[0], 0) / poly.length) * len.factor),
    y: tidy((poly.reduce((s, p) => s + p[1], 0) / poly.length) * len.factor),
    text: "dead zone",
  }));
  const xTitle = axisTitle(`${input.xName ?? "x"} position`, len.unit);
  const yTitle = axisTitle(`${input.yName ?? "y"} position`, len.unit);
  const spanX = xe[xe.length - 1]! - xe[0]!, spanY = ye[ye.length - 1]! - ye[0]!;
  const width = input.width ?? 420;
  const height = Math.max(120, Math.min(900, Math.round((width * spanY) / spanX)));
  const xScale = { domain: [tidy(xe[0]! * len.factor), tidy(xe[xe.length - 1]! * len.factor)], nice: false, zero: false };
  const yScale = { domain: [tidy(ye[0]! * len.factor), tidy(ye[ye.length - 1]! * len.factor)], nice: false, zero: false };
  const layers: Record<string, unknown>[] = [
    {
      data: { values: cells },
      mark: { type: "rect", tooltip: true },
      encoding: {
        x: { field: "x", type: "quantitative", title: xTitle, scale: xScale },
        x2: { field: "x2" },
        y: { field: "y", type: "quantitative", title: yTitle, scale: yScale },
        y2: { field: "y2" },
        color: {
          condition: { test: "!datum.lit", value: PALETTE.dark },
          field: "current",
          type: "quantitative",
          title: axisTitle("LED current", amps.unit),
          scale: { type: "log", range: HEAT_RAMP },
        },
      },
    },
  ];
  if (boundary.length > 0) {
    layers.push({
      data: { values: boundary },
      mark: { type: "rule", color: PALETTE.boundary, strokeWidth: 2 },
      encoding: { x: { field: "x", type: "quantitative" }, y: { field: "y", type: "quantitative" }, x2: { field: "x2" }, y2: { field: "y2" } },
    });
  }
  if (zones.length > 0) {
    layers.push(
      {
        data: { values: zones },
        mark: { type: "line", color: PALETTE.amber, strokeWidth: 2, strokeDash: [5, 3] },
        encoding: { x: { field: "x", type: "quantitative" }, y: { field: "y", type: "quantitative" }, order: { field: "order" }, detail: { field: "zone" } },
      },
      {
        data: { values: labels },
        mark: { type: "text", color: PALETTE.amber, fontWeight: "bold", fontSize: 11 },
        encoding: { x: { field: "x", type: "quantitative" }, y: { field: "y", type: "quantitative" }, text: { field: "text" } },
      },
    );
  }
  const dark = cells.filter((c) => !c.lit).length;
  const subtitle = input.subtitle ?? `dark: below the lit threshold ${formatQuantity(input.threshold, "A")} · pale line: the lit boundary`;
  return frame({ title: input.title, subtitle }, "Where a token lights", {
    description: `coverage map: ${cells.length - dark} of ${cells.length} cells lit at ≥ ${input.threshold} A; pale line = lit boundary; dark = unlit`,
    width,
    height,
    layer: layers,
  });
}

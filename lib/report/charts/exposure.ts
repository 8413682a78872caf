/**
 * Exposure map: RMS magnetic flux density over a vertical plane through the transmitter
 * (offset from the axis against height), on a log colour scale, with the reference level drawn
 * as a contour line and labelled.
 */
import { formatQuantity } from "../../units.ts";
import { axisTitle, tidy } from "../scale.ts";
import { HEAT_RAMP, PALETTE } from "../theme.ts";
import { heatGrid } from "./heatGrid.ts";
import { frame, type ChartSpec, type ChartTitle } from "./spec.ts";

/** Input of {@link exposureChart}: positions in m, field in T RMS. */
export interface ExposureChartInput extends ChartTitle {
  /** offsets from the transmitter axis, m, ascending */
  readonly offset: readonly number[];
  /** heights above the transmitter surface, m, ascending */
  readonly height: readonly number[];
  /** RMS flux density, T, field[heightIndex][offsetIndex] */
  readonly field: readonly (readonly number[])[];
  /** the reference level, T RMS */
  readonly referenceLevel: number;
  /** whose level, e.g. "ICNIRP 2010, general public" */
  readonly referenceName: string;
}

/**
 * Exposure contour chart (vega-lite spec).
 * @example exposureChart({ offset: [0, 0.05], height: [0.01, 0.05], field: [[3e-5, 1e-5], [5e-6, 3e-6]], referenceLevel: 27e-6, referenceName: "ICNIRP 2010 public" })
 */
export function exposureChart(input: ExposureChartInput): ChartSpec {
  const grid = heatGrid("chart.exposure", { x: ["offset", input.offset], y: ["height", input.height], values: ["field", input.field], level: ["referenceLevel", input.referenceLevel], unit: "T" });
  const { length: len, value: tesla } = grid;
  const floor = input.referenceLevel / 1000;
  const cells = input.field.flatMap((row, r) => row.map((b, c) => ({ ...grid.cell(r, c), field: tidy(Math.max(b, floor) * tesla.factor) })));
  const line = grid.levelLine;
  const layers: Record<string, unknown>[] = [
    {
      data: { values: cells },
      mark: { type: "rect" },
      encoding: {
        x: { field: "x", type: "quantitative", title: axisTitle("offset from the transmitter axis", len.unit), scale: { nice: false, zero: false } },
        x2: { field: "x2" },
        y: { field: "y", type: "quantitative", title: axisTitle("height above the surface", len.unit), scale: { nice: false, zero: false } },
        y2: { field: "y2" },
        color: { field: "field", type: "quantitative", title: axisTitle("B, RMS", tesla.unit), scale: { type: "log", range: HEAT_RAMP } },
      },
    },
  ];
  if (line.length > 0) {
    layers.push({
      data: { values: line },
      mark: { type: "rule", color: PALETTE.limit, strokeWidth: 2.5 },
      encoding: { x: { field: "x", type: "quantitative" }, y: { field: "y", type: "quantitative" }, x2: { field: "x2" }, y2: { field: "y2" } },
    });
  }
  const subtitle = input.subtitle ?? `red line: ${input.referenceName} reference level ${formatQuantity(input.referenceLevel, "T")} RMS${line.length === 0 ? " (not reached in this plane)" : ""}`;
  return frame({ title: input.title, subtitle }, "Magnetic field where people can reach", { width: 420, height: 280, layer: layers });
}

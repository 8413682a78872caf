/**
 * Exposure map: RMS magnetic flux density over a vertical plane through the transmitter
 * (offset from the axis against height), on a log colour scale, with the reference level drawn
 * as a contour line and labelled.
 */
import { formatQuantity } from "../../units.ts";
import { levelSegments } from "../contour.ts";
import { axisTitle, displayScale, maxAbs, tidy } from "../scale.ts";
import { HEAT_RAMP, PALETTE } from "../theme.ts";
import { finiteArray, gridShape, positive } from "./check.ts";
import { cellEdges, frame, type ChartSpec, type ChartTitle } from "./spec.ts";

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
  const where = "chart.exposure";
  finiteArray(input.offset, "offset", where, "m");
  finiteArray(input.height, "height", where, "m");
  gridShape(input.field, input.height.length, input.offset.length, "field", where);
  positive(input.referenceLevel, "referenceLevel", where, "T");
  const len = displayScale(Math.max(maxAbs(input.offset), maxAbs(input.height)), "m");
  const tesla = displayScale(Math.max(input.referenceLevel, maxAbs(input.field.flat())), "T");
  const xe = cellEdges(input.offset), ye = cellEdges(input.height);
  const floor = input.referenceLevel / 1000;
  const cells = input.field.flatMap((row, r) =>
    row.map((b, c) => ({
      x: tidy(xe[c]! * len.factor), x2: tidy(xe[c + 1]! * len.factor), y: tidy(ye[r]! * len.factor), y2: tidy(ye[r + 1]! * len.factor),
      field: tidy(Math.max(b, floor) * tesla.factor),
    })),
  );
  const line = levelSegments(input.offset, input.height, input.field, input.referenceLevel).map((s) => ({
    x: tidy(s.x1 * len.factor), y: tidy(s.y1 * len.factor), x2: tidy(s.x2 * len.factor), y2: tidy(s.y2 * len.factor),
  }));
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

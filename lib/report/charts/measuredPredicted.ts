/**
 * Measured against predicted: one point per measurement of a quantity (with the model's
 * 95 % band as a vertical rule where given), and the line of perfect agreement. Used for a
 * calibration's residuals (lib/analysis/calibrate.ts).
 */
import { axisTitle, displayScale, maxAbs, tidy } from "../scale.ts";
import { finiteArray } from "./check.ts";
import { frame, type ChartSpec, type ChartTitle } from "./spec.ts";

/** Input of {@link measuredPredictedChart}. */
export interface MeasuredPredictedInput extends ChartTitle {
  /** the quantity's name, e.g. "edge height", and its SI unit, e.g. "m" */
  readonly quantity: string;
  readonly unit: string;
  /** one label per measurement (token, pose …) */
  readonly labels: readonly string[];
  readonly measured: readonly number[];
  readonly predicted: readonly number[];
  /** the model's 95 % band per point, optional */
  readonly low?: readonly number[];
  readonly high?: readonly number[];
}

/**
 * Measured (x) against predicted (y), both in one display unit, with the y = x line
 * (vega-lite spec).
 * @example measuredPredictedChart({ quantity: "edge height", unit: "m", labels: ["red"], measured: [0.105], predicted: [0.102] }).title // → { text: "Measured against predicted" }
 */
export function measuredPredictedChart(input: MeasuredPredictedInput): ChartSpec {
  const where = "chart.measuredPredicted";
  finiteArray(input.measured, "measured", where, input.unit);
  finiteArray(input.predicted, "predicted", where, input.unit);
  if (input.low) finiteArray(input.low, "low", where, input.unit);
  if (input.high) finiteArray(input.high, "high", where, input.unit);
  const s = displayScale(maxAbs([...input.measured, ...input.predicted, ...(input.high ?? [])]), input.unit);
  const v = (x: number): number => tidy(x * s.factor);
  const points = input.measured.map((m, i) => ({
    label: input.labels[i] ?? `#${i + 1}`,
    measured: v(m),
    predicted: v(input.predicted[i]!),
    ...(input.low && input.high ? { low: v(input.low[i]!), high: v(input.high[i]!) } : {}),
  }));
  const all = points.flatMap((p) => [p.measured, p.predicted, ...(p.low !== undefined ? [p.low, p.high!] : [])]);
  const lo = Math.min(...all);
  const hi = Math.max(...all);
  const pad = 0.05 * (hi - lo || Math.abs(hi) || 1);
  const x = { field: "measured", type: "quantitative", title: axisTitle(`measured ${input.quantity}`, s.unit), scale: { domain: [tidy(lo - pad), tidy(hi + pad)] } };
  const y = { field: "predicted", type: "quantitative", title: axisTitle(`predicted ${input.quantity}`, s.unit), scale: { domain: [tidy(lo - pad), tidy(hi + pad)] } };
  const layers: Record<string, unknown>[] = [
    {
      data: { values: [{ measured: tidy(lo - pad), predicted: tidy(lo - pad) }, { measured: tidy(hi + pad), predicted: tidy(hi + pad) }] },
      mark: { type: "line", strokeDash: [4, 3], color: "#8c8f96" },
      encoding: { x, y },
    },
  ];
  if (input.low && input.high) {
    layers.push({ data: { values: points }, mark: { type: "rule", strokeWidth: 2 }, encoding: { x, y: { ...y, field: "low" }, y2: { field: "high" }, color: { field: "label", type: "nominal", title: "measurement" } } });
  }
  layers.push({ data: { values: points }, mark: { type: "point", filled: true, size: 70 }, encoding: { x, y, color: { field: "label", type: "nominal", title: "measurement" } } });
  return frame(input, "Measured against predicted", { width: 320, height: 300, layer: layers });
}

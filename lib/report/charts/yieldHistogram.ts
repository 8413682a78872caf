/**
 * Histogram of LED current over a batch (Monte Carlo samples), lit and unlit bars in two
 * colours, the lit threshold as a labelled rule.
 */
import { formatQuantity } from "../../units.ts";
import { axisTitle, displayScale, maxAbs, tidy } from "../scale.ts";
import { PALETTE } from "../theme.ts";
import { finiteArray, positive } from "./check.ts";
import { frame, type ChartSpec, type ChartTitle } from "./spec.ts";

/** Input of {@link yieldHistogramChart}: LED currents in A, one per sampled token. */
export interface YieldHistogramInput extends ChartTitle {
  readonly samples: ArrayLike<number>;
  /** lit threshold, A */
  readonly threshold: number;
  /** number of bins (default 30) */
  readonly bins?: number;
}

/**
 * Batch yield histogram (vega-lite spec). Bins are computed here (equal width from the
 * smallest to the largest sample) so the spec carries counts, not raw samples.
 * @example yieldHistogramChart({ samples: [1e-3, 2e-3, 3e-4], threshold: 5e-4 })
 */
export function yieldHistogramChart(input: YieldHistogramInput): ChartSpec {
  const where = "chart.yieldHistogram";
  finiteArray(input.samples, "samples", where, "A");
  positive(input.threshold, "threshold", where, "A");
  const s = Array.from(input.samples);
  const bins = input.bins ?? 30;
  let lo = Math.min(...s, input.threshold), hi = Math.max(...s, input.threshold);
  if (hi === lo) { lo *= 0.9; hi = hi * 1.1 || 1e-6; }
  const w = (hi - lo) / bins;
  const counts = new Array<number>(bins).fill(0);
  for (const v of s) counts[Math.min(bins - 1, Math.floor((v - lo) / w))]!++;
  const amps = displayScale(maxAbs([lo, hi]), "A");
  const lit = s.filter((v) => v >= input.threshold).length;
  const values = counts.map((count, i) => {
    const a = lo + i * w;
    return { start: tidy(a * amps.factor), end: tidy((a + w) * amps.factor), count, lit: a + w / 2 >= input.threshold ? "lit" : "unlit" };
  });
  const level = tidy(input.threshold * amps.factor);
  const subtitle = input.subtitle ?? `${lit} of ${s.length} sampled tokens lit (${((100 * lit) / s.length).toFixed(1)} %)`;
  return frame({ title: input.title, subtitle }, "LED current across the batch", {
    width: 420,
    height: 240,
    layer: [
      {
        data: { values },
        mark: { type: "rect", stroke: "#ffffff", strokeWidth: 0.5 },
        encoding: {
          x: { field: "start", type: "quantitative", title: axisTitle("LED average current", amps.unit) },
          x2: { field: "end" },
          y: { field: "count", type: "quantitative", title: axisTitle("tokens", "count") },
          y2: { datum: 0 },
          color: { field: "lit", type: "nominal", title: "verdict", scale: { domain: ["lit", "unlit"], range: [PALETTE.teal, PALETTE.brick] } },
        },
      },
      {
        data: { values: [{ level, text: `lit threshold ${formatQuantity(input.threshold, "A")}` }] },
        layer: [
          { mark: { type: "rule", color: PALETTE.ink, strokeDash: [6, 4] }, encoding: { x: { field: "level", type: "quantitative" } } },
          { mark: { type: "text", align: "left", dx: 4, y: 8, color: PALETTE.ink, fontSize: 10 }, encoding: { x: { field: "level", type: "quantitative" }, text: { field: "text" } } },
        ],
      },
    ],
  });
}

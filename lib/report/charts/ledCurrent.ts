/**
 * LED average current against a distance (height, offset, gap), one curve per LED colour,
 * drawn in a colour that reads as that LED, with the lit threshold as a labelled rule.
 */
import { formatQuantity } from "../../units.ts";
import { axisTitle, displayScale, maxAbs, tidy } from "../scale.ts";
import { ledSwatch, PALETTE } from "../theme.ts";
import { finiteArray, positive } from "./check.ts";
import { frame, type ChartSpec, type ChartTitle } from "./spec.ts";

/** One LED's curve: its colour name (an LED preset or free text), distances in m, currents in A. */
export interface LedCurrentCurve {
  readonly colour: string;
  /** legend text (default: the colour name) */
  readonly label?: string;
  readonly distance: readonly number[];
  readonly current: readonly number[];
}

/** Input of {@link ledCurrentChart}. */
export interface LedCurrentChartInput extends ChartTitle {
  readonly curves: readonly LedCurrentCurve[];
  /** lit threshold, A */
  readonly threshold: number;
  /** what the distance is (default "height above the transmitter") */
  readonly distanceName?: string;
  /** the unit of `distance`: "m" (default, shown with a prefix such as mm), "°" for a tilt angle in degrees, "×" for a ratio */
  readonly distanceUnit?: "m" | "°" | "×";
}

/**
 * LED current against distance for several colours (vega-lite spec; log current axis,
 * lit threshold as a dashed rule; currents below 1/100 of the threshold are clipped).
 * @example ledCurrentChart({ curves: [{ colour: "red", distance: [0.01, 0.05], current: [5e-3, 2e-4] }], threshold: 5e-4 })
 */
export function ledCurrentChart(input: LedCurrentChartInput): ChartSpec {
  const where = "chart.ledCurrent";
  positive(input.threshold, "threshold", where, "A");
  input.curves.forEach((c, i) => {
    finiteArray(c.distance, `curves[${i}].distance`, where, input.distanceUnit ?? "m");
    finiteArray(c.current, `curves[${i}].current`, where, "A");
  });
  const len = displayScale(maxAbs(input.curves.flatMap((c) => [...c.distance])), input.distanceUnit ?? "m");
  const amps = displayScale(Math.max(input.threshold, maxAbs(input.curves.flatMap((c) => [...c.current]))), "A");
  const floor = (input.threshold / 100) * amps.factor;
  const labels = input.curves.map((c) => c.label ?? `${c.colour} LED`);
  const values = input.curves.flatMap((c, ci) =>
    c.distance.map((d, i) => ({ led: labels[ci]!, distance: tidy(d * len.factor), current: tidy(Math.max(c.current[i]!, 0) * amps.factor) })).filter((v) => v.current >= floor),
  );
  const level = tidy(input.threshold * amps.factor);
  return frame(input, "LED current and the lit threshold", {
    width: 420,
    height: 280,
    layer: [
      {
        data: { values },
        mark: { type: "line", point: true, clip: true },
        encoding: {
          x: { field: "distance", type: "quantitative", title: axisTitle(input.distanceName ?? "height above the transmitter", len.unit) },
          y: { field: "current", type: "quantitative", title: axisTitle("LED average current", amps.unit), scale: { type: "log", domainMin: tidy(floor) } },
          color: { field: "led", type: "nominal", title: "LED", scale: { domain: labels, range: input.curves.map((c) => ledSwatch(c.colour)) } },
        },
      },
      {
        data: { values: [{ level, text: `lit threshold ${formatQuantity(input.threshold, "A")}` }] },
        layer: [
          { mark: { type: "rule", color: PALETTE.muted, strokeDash: [6, 4] }, encoding: { y: { field: "level", type: "quantitative" } } },
          { mark: { type: "text", align: "right", dy: -7, x: "width", color: PALETTE.muted, fontSize: 10 }, encoding: { y: { field: "level", type: "quantitative" }, text: { field: "text" } } },
        ],
      },
    ],
  });
}

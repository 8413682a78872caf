/**
 * The LED's load line on the token tank: against the tank voltage amplitude, the current the
 * tank can still give the LED (its Norton source less the tank's own loss and reactance) and
 * the LED's fundamental current; they cross at the operating point.
 */
import { axisTitle, displayScale, maxAbs, tidy } from "../scale.ts";
import { ledSwatch, PALETTE } from "../theme.ts";
import { finiteArray } from "./check.ts";
import { frame, type ChartSpec, type ChartTitle } from "./spec.ts";

/** Input of {@link loadLineChart}: voltages V peak, currents A peak (fundamental). */
export interface LoadLineChartInput extends ChartTitle {
  readonly voltage: readonly number[];
  /** current available to the LED from the tank at each voltage, A */
  readonly available: readonly number[];
  /** the LED's fundamental current at each voltage, A */
  readonly led: readonly number[];
  /** the solved operating point */
  readonly operatingPoint: { readonly voltage: number; readonly current: number };
  /** LED colour (for the curve's colour; default red) */
  readonly colour?: string;
}

/**
 * Load-line chart (vega-lite spec): x tank voltage (V peak), y fundamental current.
 * @example loadLineChart({ voltage: [0, 1, 2], available: [3e-3, 2e-3, 1e-3], led: [0, 1e-5, 4e-3], operatingPoint: { voltage: 1.8, current: 1.2e-3 } })
 */
export function loadLineChart(input: LoadLineChartInput): ChartSpec {
  const where = "chart.loadLine";
  finiteArray(input.voltage, "voltage", where, "V");
  finiteArray(input.available, "available", where, "A");
  finiteArray(input.led, "led", where, "A");
  const volts = displayScale(maxAbs(input.voltage), "V");
  const amps = displayScale(Math.max(maxAbs(input.available), input.operatingPoint.current), "A");
  const top = maxAbs(input.available) * 1.15;
  const values = input.voltage.flatMap((v, i) => [
    { curve: "available from the tank", voltage: tidy(v * volts.factor), current: tidy(input.available[i]! * amps.factor) },
    ...(input.led[i]! <= top ? [{ curve: "LED (fundamental)", voltage: tidy(v * volts.factor), current: tidy(input.led[i]! * amps.factor) }] : []),
  ]);
  const op = { voltage: tidy(input.operatingPoint.voltage * volts.factor), current: tidy(input.operatingPoint.current * amps.factor), text: "operating point" };
  return frame(input, "The LED on the token's tank", {
    width: 400,
    height: 280,
    layer: [
      {
        data: { values },
        mark: { type: "line", clip: true },
        encoding: {
          x: { field: "voltage", type: "quantitative", title: axisTitle("tank voltage amplitude, peak", volts.unit) },
          y: { field: "current", type: "quantitative", title: axisTitle("fundamental current, peak", amps.unit), scale: { domainMax: tidy(top * amps.factor) } },
          color: { field: "curve", type: "nominal", title: "curve", scale: { domain: ["available from the tank", "LED (fundamental)"], range: [PALETTE.teal, ledSwatch(input.colour ?? "red")] } },
        },
      },
      {
        data: { values: [op] },
        layer: [
          { mark: { type: "point", size: 90, color: PALETTE.ink, filled: true }, encoding: { x: { field: "voltage", type: "quantitative" }, y: { field: "current", type: "quantitative" } } },
          { mark: { type: "text", dx: -8, dy: -10, align: "right", color: PALETTE.ink }, encoding: { x: { field: "voltage", type: "quantitative" }, y: { field: "current", type: "quantitative" }, text: { field: "text" } } },
        ],
      },
    ],
  });
}

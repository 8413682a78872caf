/**
 * Coupling factor against height (on the axis) and against sideways offset (at fixed
 * heights), side by side. k is shown in per cent; a signed k shows where the flux through a
 * flat token reverses.
 */
import { axisTitle, displayScale, maxAbs, tidy } from "../scale.ts";
import { finiteArray } from "./check.ts";
import { frame, type ChartSpec, type ChartTitle } from "./spec.ts";

/** One curve: a label and points (distance in m, coupling factor k, signed). */
export interface CouplingCurve {
  readonly label: string;
  readonly distance: readonly number[];
  readonly k: readonly number[];
}

/** Input of {@link couplingChart}. */
export interface CouplingChartInput extends ChartTitle {
  /** curves against height (distance = height above the transmitter, m) */
  readonly byHeight?: readonly CouplingCurve[];
  /** curves against sideways offset (distance = offset from the axis, m) */
  readonly byOffset?: readonly CouplingCurve[];
}

function panel(curves: readonly CouplingCurve[], name: string, where: string, logY: boolean): Record<string, unknown> {
  curves.forEach((c, i) => {
    finiteArray(c.distance, `${where}[${i}].distance`, "chart.coupling", "m");
    finiteArray(c.k, `${where}[${i}].k`, "chart.coupling");
  });
  const len = displayScale(maxAbs(curves.flatMap((c) => [...c.distance])), "m");
  const values = curves.flatMap((c) =>
    c.distance.map((d, i) => ({ curve: c.label, distance: tidy(d * len.factor), k: tidy(100 * (logY ? Math.abs(c.k[i]!) : c.k[i]!)) })),
  );
  return {
    width: 300,
    height: 240,
    data: { values: logY ? values.filter((v) => v.k > 0) : values },
    mark: { type: "line", point: true },
    encoding: {
      x: { field: "distance", type: "quantitative", title: axisTitle(name, len.unit) },
      y: { field: "k", type: "quantitative", title: axisTitle(logY ? "coupling factor |k|" : "coupling factor k", "%"), scale: logY ? { type: "log" } : { zero: true } },
      color: { field: "curve", type: "nominal", title: "curve" },
    },
  };
}

/**
 * Coupling factor against height and against offset (vega-lite spec; k in %, height on a log
 * k axis, offset on a linear signed axis).
 * @example couplingChart({ byHeight: [{ label: "on the axis", distance: [0.01, 0.02], k: [0.05, 0.02] }] })
 */
export function couplingChart(input: CouplingChartInput): ChartSpec {
  const panels: Record<string, unknown>[] = [];
  if (input.byHeight?.length) panels.push(panel(input.byHeight, "height above the transmitter", "byHeight", true));
  if (input.byOffset?.length) panels.push(panel(input.byOffset, "offset from the axis", "byOffset", false));
  if (panels.length === 0) {
    finiteArray([], "byHeight", "chart.coupling");
  }
  return frame(input, "How coupling falls with distance", panels.length === 1 ? panels[0]! : { hconcat: panels, resolve: { scale: { color: "independent" } } });
}

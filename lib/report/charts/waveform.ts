/**
 * Time waveforms with their fundamental overlaid, and a harmonic spectrum.
 */
import { axisTitle, displayScale, maxAbs, tidy } from "../scale.ts";
import { PALETTE } from "../theme.ts";
import { finiteArray, positive } from "./check.ts";
import { frame, thin, type ChartSpec, type ChartTitle } from "./spec.ts";

/** Input of {@link waveformChart}: times in s, samples in SI units of `unit`. */
export interface WaveformChartInput extends ChartTitle {
  readonly time: ArrayLike<number>;
  readonly samples: ArrayLike<number>;
  /** the fundamental sampled at the same times (optional) */
  readonly fundamental?: ArrayLike<number>;
  /** what is plotted, e.g. "switch-node voltage" */
  readonly name: string;
  /** SI unit of the samples, e.g. "V" or "A" */
  readonly unit: string;
}

/**
 * A waveform and its fundamental against time (vega-lite spec; at most 600 points a curve;
 * time measured from the first sample).
 * @example waveformChart({ time, samples: v, fundamental: v1, name: "switch-node voltage", unit: "V" })
 */
export function waveformChart(input: WaveformChartInput): ChartSpec {
  const where = "chart.waveform";
  finiteArray(input.time, "time", where, "s");
  finiteArray(input.samples, "samples", where, input.unit);
  if (input.fundamental) finiteArray(input.fundamental, "fundamental", where, input.unit);
  const t0 = input.time[0]!;
  const span = input.time[input.time.length - 1]! - t0;
  const ts = displayScale(span, "s");
  const ys = displayScale(Math.max(maxAbs(Array.from(input.samples)), input.fundamental ? maxAbs(Array.from(input.fundamental)) : 0), input.unit);
  const idx = thin(input.time.length, 600);
  const label = input.name;
  const values = idx.flatMap((i) => {
    const t = tidy((input.time[i]! - t0) * ts.factor);
    const row = [{ curve: label, time: t, value: tidy(input.samples[i]! * ys.factor) }];
    if (input.fundamental) row.push({ curve: "fundamental", time: t, value: tidy(input.fundamental[i]! * ys.factor) });
    return row;
  });
  return frame(input, `${input.name} against time`, {
    width: 460,
    height: 240,
    data: { values },
    mark: { type: "line", strokeWidth: 1.8 },
    encoding: {
      x: { field: "time", type: "quantitative", title: axisTitle("time", ts.unit) },
      y: { field: "value", type: "quantitative", title: axisTitle(input.name, ys.unit) },
      color: { field: "curve", type: "nominal", title: "curve", scale: { domain: input.fundamental ? [label, "fundamental"] : [label], range: [PALETTE.indigo, PALETTE.amber] } },
      strokeDash: { field: "curve", type: "nominal", legend: null, scale: { domain: [label, "fundamental"], range: [[1, 0], [6, 3]] } },
    },
  });
}

/** Input of {@link spectrumChart}: peak amplitudes by harmonic number (index 0 = dc), SI units. */
export interface SpectrumChartInput extends ChartTitle {
  readonly amplitude: ArrayLike<number>;
  /** fundamental frequency, Hz */
  readonly frequency: number;
  readonly name: string;
  readonly unit: string;
}

/**
 * Harmonic spectrum (vega-lite spec): one bar per harmonic k ≥ 1 at k·f, amplitude in peak
 * units, each labelled with its level relative to the fundamental in dB.
 * @example spectrumChart({ amplitude: h.amplitude, frequency: 200e3, name: "switch-node voltage", unit: "V" })
 */
export function spectrumChart(input: SpectrumChartInput): ChartSpec {
  const where = "chart.spectrum";
  finiteArray(input.amplitude, "amplitude", where, input.unit);
  positive(input.frequency, "frequency", where, "Hz");
  const n = input.amplitude.length;
  const fs = displayScale(input.frequency * (n - 1), "Hz");
  const amp = Array.from(input.amplitude).slice(1);
  const ys = displayScale(maxAbs(amp), input.unit);
  const a1 = amp[0] ?? 0;
  const values = amp.map((a, i) => ({
    harmonic: i + 1,
    frequency: tidy((i + 1) * input.frequency * fs.factor),
    amplitude: tidy(a * ys.factor),
    level: a1 > 0 && a > 0 ? `${(20 * Math.log10(a / a1)).toFixed(0)} dB` : "",
  }));
  return frame(input, `Harmonics of the ${input.name}`, {
    width: 460,
    height: 220,
    data: { values },
    layer: [
      {
        mark: { type: "bar", color: PALETTE.teal, width: 10 },
        encoding: {
          x: { field: "frequency", type: "quantitative", title: axisTitle("frequency", fs.unit), scale: { domain: [0, tidy(n * input.frequency * fs.factor)], nice: false } },
          y: { field: "amplitude", type: "quantitative", title: axisTitle(`${input.name} amplitude, peak`, ys.unit) },
        },
      },
      {
        mark: { type: "text", dy: -6, fontSize: 9, color: PALETTE.muted },
        encoding: { x: { field: "frequency", type: "quantitative" }, y: { field: "amplitude", type: "quantitative" }, text: { field: "level" } },
      },
    ],
  });
}

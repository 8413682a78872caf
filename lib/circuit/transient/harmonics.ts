/**
 * Fundamental and harmonics of a sampled periodic waveform by an exact discrete Fourier
 * transform at the chosen harmonics over a whole number of cycles (no FFT needed: the count
 * of harmonics is small). With N uniform samples t_j spanning exactly `cycles` periods,
 * the phasor of harmonic k is X_k = (2/N)·Σ x_j·e^{−jkωt_j}, so that
 * x(t) ≈ dc + Σ_k |X_k|·cos(kωt + arg X_k) (phasors e^{jωt}, peak amplitudes).
 * For a waveform sampled at M points a period the result is exact for harmonics below M/2
 * (no leakage, since the window holds whole periods).
 */

import * as z from "../../zod.ts";
import { TanklightInputError } from "../../errors.ts";
import { frequency, parseArgs, wholeNumber, lazySchema } from "../../schema.ts";

/** Most samples a series may hold (as many as one simulate run keeps). */
const MAX_SAMPLES = 5e7;

/** A sampled series: a Float64Array or an array of finite numbers, at least 3 long. */
const series = (what: string) =>
  z.custom<ArrayLike<number>>(
    (x) => {
      if (!(x instanceof Float64Array || Array.isArray(x)) || x.length < 3 || x.length > MAX_SAMPLES) return false;
      for (let i = 0; i < x.length; i++) if (!(typeof x[i] === "number" && Number.isFinite(x[i]))) return false;
      return true;
    },
    { error: `must be a Float64Array or array of 3 to ${MAX_SAMPLES} finite ${what}` },
  );

const HarmonicsArgs = lazySchema(() => z.strictObject({
  time: series("times (s)"),
  samples: series("values"),
  opts: z.strictObject({
    frequency: frequency(),
    count: wholeNumber(1).optional(),
    cycles: wholeNumber(1).optional(),
  }),
}));

/** Harmonic content of a periodic waveform; index k of each array is harmonic k (index 0: dc). */
export interface Harmonics {
  /** mean over the analysed cycles */
  readonly dc: number;
  /** peak amplitude of harmonic k (amplitude[0] = |dc|) */
  readonly amplitude: Float64Array;
  /** phase of harmonic k, rad, cosine reference at t = 0 */
  readonly phase: Float64Array;
  /** real part of the phasor of harmonic k */
  readonly re: Float64Array;
  /** imaginary part of the phasor of harmonic k */
  readonly im: Float64Array;
  /** total harmonic distortion √(Σ_{k≥2} A_k²)/A_1 over the harmonics computed (∞ if A_1 = 0) */
  readonly distortion: number;
  /** RMS of the analysed samples (all harmonics) */
  readonly rms: number;
  /** peak |x| over the analysed samples */
  readonly peak: number;
}

/**
 * Harmonics of `samples` (taken at `time`, uniform step) over the LAST `cycles` whole
 * periods of `frequency`.
 * @param time sample times, s (uniform, as returned by simulate)
 * @param samples values at those times (V or A)
 * @param opts.frequency fundamental, Hz > 0; a period must hold a whole number of steps
 * @param opts.count highest harmonic, ≤ half the samples a period (higher ones alias), default 10 (or that limit)
 * @param opts.cycles periods analysed, default 1
 * @example waveformHarmonics(Array.from({ length: 201 }, (_, i) => i * 5e-8), Array.from({ length: 201 }, (_, i) => Math.cos((Math.PI * i) / 100)), { frequency: 1e5 }).amplitude[1] // → 1 (a unit cosine sampled 200 times a period)
 */
export function waveformHarmonics(
  time: ArrayLike<number>,
  samples: ArrayLike<number>,
  opts: { readonly frequency: number | string; readonly count?: number; readonly cycles?: number },
): Harmonics {
  const where = "waveformHarmonics";
  const args = parseArgs(HarmonicsArgs, [time, samples, opts], where);
  const f = args.opts.frequency;
  let count = args.opts.count ?? 10;
  const cycles = args.opts.cycles ?? 1;
  if (time.length !== samples.length) {
    throw new TanklightInputError([{ path: "samples", message: "must have the same length as time (≥ 3)", value: samples.length, expected: `${time.length}` }], where);
  }
  const step = time[1]! - time[0]!;
  const perCycle = 1 / (f * step);
  const spc = Math.round(perCycle);
  if (!(spc >= 2) || Math.abs(perCycle - spc) > 1e-6 * perCycle) {
    throw new TanklightInputError([{ path: "opts.frequency", message: `a period must hold a whole number of steps (holds ${perCycle})`, value: f }], where);
  }
  // the default stops below the aliasing limit; an explicit count above it is refused
  if (args.opts.count === undefined) count = Math.min(count, Math.floor(spc / 2));
  if (count > Math.floor(spc / 2)) {
    throw new TanklightInputError(
      [{ path: "opts.count", message: `must be ≤ ${Math.floor(spc / 2)}: with ${spc} samples a period, harmonics above half of them alias onto lower ones`, value: count }],
      where,
    );
  }
  const N = spc * cycles;
  if (N + 1 > samples.length) {
    throw new TanklightInputError([{ path: "opts.cycles", message: `needs ${N + 1} samples, have ${samples.length}`, value: cycles }], where);
  }
  // the last N intervals: samples j = end − N … end − 1 (the end sample repeats the first)
  const start = samples.length - 1 - N;
  const w = 2 * Math.PI * f;
  let peak = 0;
  for (let j = start; j < start + N; j++) if (Math.abs(samples[j]!) > peak) peak = Math.abs(samples[j]!);
  // values beyond 1e150 would overflow the sums of squares and products: those waveforms are
  // summed divided by their peak (ordinary ones unscaled, so their results keep every bit)
  const scale = peak > 1e150 ? peak : 1;
  let dc = 0;
  let sq = 0;
  for (let j = start; j < start + N; j++) {
    const v = samples[j]! / scale;
    dc += v;
    sq += v * v;
  }
  dc = (dc / N) * scale;
  const amplitude = new Float64Array(count + 1);
  const phase = new Float64Array(count + 1);
  const re = new Float64Array(count + 1);
  const im = new Float64Array(count + 1);
  amplitude[0] = Math.abs(dc);
  re[0] = dc;
  phase[0] = dc < 0 ? Math.PI : 0;
  const t0 = time[start]!;
  for (let k = 1; k <= count; k++) {
    // rotate by the exact sample phase k·2π·j/spc, referenced to t0
    let sr = 0;
    let si = 0;
    for (let j = 0; j < N; j++) {
      const a = (2 * Math.PI * k * j) / spc;
      const v = samples[start + j]! / scale;
      sr += v * Math.cos(a);
      si -= v * Math.sin(a);
    }
    sr *= (2 / N) * scale;
    si *= (2 / N) * scale;
    // shift reference from t0 to t = 0: multiply by e^{−jkωt0}
    const c = Math.cos(k * w * t0);
    const s = Math.sin(k * w * t0);
    const r = sr * c + si * s;
    const i = si * c - sr * s;
    re[k] = r;
    im[k] = i;
    amplitude[k] = Math.hypot(r, i);
    phase[k] = Math.atan2(i, r);
  }
  let hsum = 0;
  for (let k = 2; k <= count; k++) hsum += (amplitude[k]! / scale) * (amplitude[k]! / scale);
  const a1 = amplitude[1]!;
  return { dc, amplitude, phase, re, im, distortion: a1 > 0 ? (Math.sqrt(hsum) * scale) / a1 : Infinity, rms: Math.sqrt(sq / N) * scale, peak };
}

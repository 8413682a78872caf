/**
 * Source waveforms and switch gates for the transient engine, as plain functions of time.
 * Cosine phase convention, so a sine source of amplitude A and phase φ has the phasor A·e^{jφ}
 * (phasors e^{jωt}, docs/design.md §3).
 */

import * as z from "../../zod.ts";
import { requireFinite, requirePositive, TanklightInputError } from "../../errors.ts";
import { parseInput, lazySchema } from "../../schema.ts";

/** The keys each waveform's spec accepts (values checked in the function, SI numbers). */
const keysOf = (name: string, keys: readonly string[]) =>
  z.strictObject({ [name]: z.strictObject(Object.fromEntries(keys.map((k) => [k, z.unknown().optional()])), { error: `must be an object { ${keys.join(", ")} }` }) });
const SineKeys = lazySchema(() => keysOf("spec", ["amplitude", "frequency", "phase", "offset"]));
const StepKeys = lazySchema(() => keysOf("opts", ["at", "before"]));
const GateKeys = lazySchema(() => keysOf("spec", ["frequency", "duty", "delay", "invert"]));
import type { Waveform } from "./circuit.ts";

/**
 * A sinusoid v(t) = offset + amplitude·cos(2πf·t + phase).
 * @param spec.amplitude peak, V or A, finite
 * @param spec.frequency Hz, > 0
 * @param spec.phase rad, default 0
 * @param spec.offset V or A, default 0
 * @example sineWaveform({ amplitude: 2, frequency: 1e5 })(0) // → 2
 */
export function sineWaveform(spec: { amplitude: number; frequency: number; phase?: number; offset?: number }): Waveform {
  const where = "sineWaveform";
  parseInput(SineKeys, { spec }, where);
  const a = requireFinite(spec.amplitude, "amplitude", "V or A", where);
  const w = 2 * Math.PI * requirePositive(spec.frequency, "frequency", "Hz", where);
  const ph = requireFinite(spec.phase === undefined ? 0 : spec.phase, "phase", "rad", where);
  const off = requireFinite(spec.offset === undefined ? 0 : spec.offset, "offset", "V or A", where);
  return (t) => off + a * Math.cos(w * t + ph);
}

/**
 * A constant (DC) level from t = 0, or a step: `before` until `at`, `level` from then on.
 * @example stepWaveform(5)(0) // → 5;  stepWaveform(5, { at: 1e-3 })(0) // → 0
 */
export function stepWaveform(level: number, opts: { at?: number; before?: number } = {}): Waveform {
  const where = "stepWaveform";
  parseInput(StepKeys, { opts }, where);
  requireFinite(level, "level", "V or A", where);
  const at = requireFinite(opts.at === undefined ? 0 : opts.at, "at", "s", where);
  const before = requireFinite(opts.before === undefined ? 0 : opts.before, "before", "V or A", where);
  return (t) => (t >= at ? level : before);
}

/**
 * A periodic gate: closed for the fraction `duty` of each period, starting at `delay`
 * (closed on [delay + nT, delay + nT + duty·T)).
 * @param spec.frequency Hz, > 0
 * @param spec.duty 0 < duty < 1
 * @param spec.delay s, default 0 (closed from t = 0)
 * @param spec.invert true for the complementary gate (open where the plain gate is closed)
 * @example periodicGate({ frequency: 1e5, duty: 0.5 })(2e-6) // → true;  periodicGate({ frequency: 1e5, duty: 0.5 })(6e-6) // → false
 */
export function periodicGate(spec: { frequency: number; duty: number; delay?: number; invert?: boolean }): (t: number) => boolean {
  const where = "periodicGate";
  parseInput(GateKeys, { spec }, where);
  const f = requirePositive(spec.frequency, "frequency", "Hz", where);
  const duty = spec.duty;
  if (!(Number.isFinite(duty) && duty > 0 && duty < 1)) {
    throw new TanklightInputError([{ path: "duty", message: "must be between 0 and 1 (exclusive)", value: duty, expected: "0 < duty < 1" }], where);
  }
  const delay = requireFinite(spec.delay === undefined ? 0 : spec.delay, "delay", "s", where);
  if (spec.invert !== undefined && typeof spec.invert !== "boolean") {
    throw new TanklightInputError([{ path: "invert", message: "must be true or false", value: spec.invert }], where);
  }
  const invert = spec.invert === true;
  return (t) => {
    const phase = (t - delay) * f;
    const frac = phase - Math.floor(phase);
    return (frac < duty) !== invert;
  };
}

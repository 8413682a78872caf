/**
 * The options of {@link simulate} and their resolution into one run plan: the step (from
 * `step`, or `stepsPerCycle` with `frequency`, adjusted so a period holds a whole number of
 * steps), the number of output steps (at most {@link MAX_OUTPUT_STEPS}), the samples to keep,
 * and the steady-state settings. Bad or inconsistent options throw TanklightInputError naming
 * the field.
 */
import { requirePositive, TanklightInputError } from "../../errors.ts";
import type { SimulateOptions } from "./simulate.ts";

/** Output steps a run may ask for: 5e7 samples of one waveform are 400 MB. */
export const MAX_OUTPUT_STEPS = 5e7;

/** What a run will do, in SI numbers. */
export interface RunPlan {
  readonly stop: number;
  /** output and integration step, s */
  readonly h: number;
  /** steps per drive period (when a frequency is given) */
  readonly stepsPerCycle: number | undefined;
  /** output steps after t = 0 */
  readonly nGrid: number;
  /** samples kept (ring size) */
  readonly keep: number;
  readonly keepCycles: number | undefined;
  readonly steady: { readonly tolerance: number; readonly minCycles: number } | undefined;
  readonly maxNewton: number;
  readonly progress: ((fraction: number, time: number) => void) | undefined;
  /** notes on adjusted options (e.g. the step rounded to a whole number per period) */
  readonly warnings: string[];
}

function bad(path: string, message: string, value: unknown, expected?: string): never {
  throw new TanklightInputError([{ path, message, value, ...(expected ? { expected } : {}) }], "simulate");
}

/** The step h (s) and steps per cycle from `step` or `stepsPerCycle` (with `frequency`). */
function resolveStep(opts: SimulateOptions, frequency: number | undefined, warnings: string[]): { h: number; spc: number | undefined } {
  const where = "simulate";
  if (opts.stepsPerCycle !== undefined) {
    if (frequency === undefined) bad("frequency", "is needed with stepsPerCycle", undefined, "Hz > 0");
    const n = opts.stepsPerCycle;
    if (!(Number.isInteger(n) && n >= 8)) bad("stepsPerCycle", "must be an integer ≥ 8", n, "integer ≥ 8");
    return { h: 1 / (frequency * n), spc: n };
  }
  if (opts.step === undefined) bad("step", "give step, or stepsPerCycle with frequency", undefined, "s > 0");
  const h = requirePositive(opts.step, "step", "s", where);
  if (frequency === undefined) return { h, spc: undefined };
  const spc = Math.max(1, Math.round(1 / (frequency * h)));
  const hc = 1 / (frequency * spc);
  if (Math.abs(hc - h) > 1e-9 * h) {
    warnings.push(`step adjusted from ${h} s to ${hc} s so that a period of ${frequency} Hz holds a whole number (${spc}) of steps`);
  }
  return { h: hc, spc };
}

/** The steady-state settings of `untilSteady` (needs a frequency), or undefined. */
function resolveSteady(opts: SimulateOptions, spc: number | undefined): RunPlan["steady"] {
  if (opts.untilSteady === undefined || opts.untilSteady === false) return undefined;
  if (spc === undefined) bad("frequency", "is needed with untilSteady", undefined, "Hz > 0");
  const u = typeof opts.untilSteady === "object" ? opts.untilSteady : {};
  const tolerance = u.tolerance ?? 1e-4;
  const minCycles = u.minCycles ?? 5;
  if (!(tolerance > 0 && Number.isFinite(tolerance))) bad("untilSteady.tolerance", "must be > 0", tolerance);
  if (!(Number.isInteger(minCycles) && minCycles >= 3)) bad("untilSteady.minCycles", "must be an integer ≥ 3", minCycles);
  return { tolerance, minCycles };
}

/**
 * Checks the options and works out the run.
 * @example resolveOptions({ stop: 1e-3, stepsPerCycle: 100, frequency: 1e5 }).nGrid // → 10000
 */
export function resolveOptions(opts: SimulateOptions): RunPlan {
  const where = "simulate";
  const warnings: string[] = [];
  const stop = requirePositive(opts?.stop, "stop", "s", where);
  const frequency = opts.frequency === undefined ? undefined : requirePositive(opts.frequency, "frequency", "Hz", where);
  const { h, spc } = resolveStep(opts, frequency, warnings);
  if (h > stop) bad("step", `must not exceed stop (${stop} s)`, h, `≤ ${stop} s`);
  const nGrid = Math.max(1, Math.round(stop / h - 1e-9 * (stop / h)));
  if (nGrid > MAX_OUTPUT_STEPS) bad("stop", `asks for ${nGrid} steps (at most 5e7)`, stop, "stop/step ≤ 5e7");
  const steady = resolveSteady(opts, spc);
  let keep = nGrid + 1;
  const keepCycles = opts.keepCycles ?? (steady ? 4 : undefined);
  if (keepCycles !== undefined) {
    if (spc === undefined) bad("frequency", "is needed with keepCycles", undefined, "Hz > 0");
    if (!(Number.isInteger(keepCycles) && keepCycles >= 1)) bad("keepCycles", "must be an integer ≥ 1", keepCycles);
    keep = Math.min(keep, keepCycles * spc + 1);
  }
  const maxNewton = opts.maxNewtonIterations ?? 50;
  if (!(Number.isInteger(maxNewton) && maxNewton >= 2)) bad("maxNewtonIterations", "must be an integer ≥ 2", maxNewton);
  return { stop, h, stepsPerCycle: spc, nGrid, keep, keepCycles, steady, maxNewton, progress: opts.progress, warnings };
}

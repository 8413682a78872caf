/**
 * The options of {@link simulate} and their resolution into one run plan: the step (from
 * `step`, or `stepsPerCycle` with `frequency`, adjusted so a period holds a whole number of
 * steps), the number of output steps (at most {@link MAX_OUTPUT_STEPS}), the samples to keep,
 * and the steady-state settings. Bad or inconsistent options throw TanklightInputError naming
 * the field.
 */
import * as z from "../../zod.ts";
import { TanklightInputError } from "../../errors.ts";
import { dimensionless, frequency, parseInput, time, wholeNumber, lazySchema } from "../../schema.ts";

/** Output steps a run may ask for: 5e7 samples of one waveform are 400 MB. */
export const MAX_OUTPUT_STEPS = 5e7;

/** Newton iterations per step before it is halved: beyond a few hundred a step is not converging. */
const MAX_NEWTON = 10_000;

/** How to run a simulation: SI numbers or quantity strings ("10 ns", "200 kHz"). */
export const SimulateOptions = lazySchema(() => z.strictObject({
  /** end time, s, > 0 (the longest run when `untilSteady` is set) */
  stop: time(),
  /** output and integration step, s; or give `stepsPerCycle` with `frequency` */
  step: time().optional(),
  /** steps per period of `frequency`, integer ≥ 8 */
  stepsPerCycle: wholeNumber(8, MAX_OUTPUT_STEPS, "one run holds at most 5e7 output steps").optional(),
  /** the drive frequency, Hz: defines the cycle for `stepsPerCycle`, `untilSteady` and `keepCycles` */
  frequency: frequency().optional(),
  /**
   * stop at steady state: when the estimated remaining relative change of the state
   * (δₙ/(1 − r), δₙ the cycle-to-cycle change, r its decay ratio) is below `tolerance`
   * (default 1e-4), after at least `minCycles` cycles (default 5). Needs `frequency`.
   */
  untilSteady: z
    .union([
      z.boolean(),
      z.strictObject({
        tolerance: dimensionless({ positive: true }).optional(),
        minCycles: wholeNumber(3).optional(),
      }),
    ])
    .optional(),
  /** keep only the last N cycles of output (needs `frequency`); default all, or 4 with `untilSteady` */
  keepCycles: wholeNumber(1).optional(),
  /** called about every 1 % of the run with (fraction done 0…1, simulated time s) */
  progress: z
    .custom<(fraction: number, time: number) => void>((f) => typeof f === "function", { error: "must be a function (fraction, time) => void" })
    .optional(),
  /** Newton iterations per step before the step is halved; default 50 */
  maxNewtonIterations: wholeNumber(2, MAX_NEWTON, "a step that needs more is not converging; it is halved").optional(),
}));
/** What {@link simulate} accepts as options. */
export type SimulateOptions = z.input<typeof SimulateOptions>;
type ParsedOptions = z.output<typeof SimulateOptions>;

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
function resolveStep(opts: ParsedOptions, frequency: number | undefined, warnings: string[]): { h: number; spc: number | undefined } {
  if (opts.stepsPerCycle !== undefined) {
    if (frequency === undefined) bad("frequency", "is needed with stepsPerCycle", undefined, "Hz > 0");
    const n = opts.stepsPerCycle;
    return { h: 1 / (frequency * n), spc: n };
  }
  if (opts.step === undefined) bad("step", "give step, or stepsPerCycle with frequency", undefined, "s > 0");
  const h = opts.step;
  if (frequency === undefined) return { h, spc: undefined };
  const spc = Math.max(1, Math.round(1 / (frequency * h)));
  const hc = 1 / (frequency * spc);
  if (Math.abs(hc - h) > 1e-9 * h) {
    warnings.push(`step adjusted from ${h} s to ${hc} s so that a period of ${frequency} Hz holds a whole number (${spc}) of steps`);
  }
  return { h: hc, spc };
}

/** The steady-state settings of `untilSteady` (needs a frequency), or undefined. */
function resolveSteady(opts: ParsedOptions, spc: number | undefined): RunPlan["steady"] {
  if (opts.untilSteady === undefined || opts.untilSteady === false) return undefined;
  if (spc === undefined) bad("frequency", "is needed with untilSteady", undefined, "Hz > 0");
  const u = typeof opts.untilSteady === "object" ? opts.untilSteady : {};
  return { tolerance: u.tolerance ?? 1e-4, minCycles: u.minCycles ?? 5 };
}

/**
 * Checks the options and works out the run.
 * @example resolveOptions({ stop: 1e-3, stepsPerCycle: 100, frequency: 1e5 }).nGrid // → 10000
 */
export function resolveOptions(options: SimulateOptions): RunPlan {
  if (options === null || typeof options !== "object" || Array.isArray(options)) bad("options", "must be an object { stop, step | stepsPerCycle, … }", options);
  const opts = parseInput(SimulateOptions, options, "simulate");
  const warnings: string[] = [];
  const stop = opts.stop;
  const frequency = opts.frequency;
  const { h, spc } = resolveStep(opts, frequency, warnings);
  if (h > stop) bad("step", `must not exceed stop (${stop} s)`, h, `≤ ${stop} s`);
  const nGrid = Math.max(1, Math.round(stop / h - 1e-9 * (stop / h)));
  if (nGrid > MAX_OUTPUT_STEPS) bad("stop", `asks for ${nGrid} steps (at most 5e7)`, stop, "stop/step ≤ 5e7");
  const steady = resolveSteady(opts, spc);
  let keep = nGrid + 1;
  const keepCycles = opts.keepCycles ?? (steady ? 4 : undefined);
  if (keepCycles !== undefined) {
    if (spc === undefined) bad("frequency", "is needed with keepCycles", undefined, "Hz > 0");
    keep = Math.min(keep, keepCycles * spc + 1);
  }
  const maxNewton = opts.maxNewtonIterations ?? 50;
  return { stop, h, stepsPerCycle: spc, nGrid, keep, keepCycles, steady, maxNewton, progress: opts.progress, warnings };
}

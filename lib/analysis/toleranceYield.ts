/**
 * toleranceYield(system, variations, options): what fraction of a production batch lights —
 * Monte Carlo through the whole link with parts, windings, LEDs, placement, tilt and supply
 * drawn from their spreads (./yieldSpec.ts), every sample a full nonlinear link solve
 * (./yieldModel.ts) by the model asked for (the describing function by default; harmonic balance
 * or solveLink's "auto" choice per sample). Over a transmitter array every transmitter's capacitor
 * and winding is its own part, drawn independently; placement and tilt move the token relative
 * to the array.
 *
 * Summaries: the lit fraction with its Wilson score interval (./confidence.ts); percentiles of
 * the LED current and the supply current (simple-statistics quantileSorted, R-7 / Hyndman & Fan
 * type 7 would differ slightly: simple-statistics interpolates as documented in its README);
 * a sensitivity ranking — Spearman rank correlation of each variation's draw with the LED margin
 * ln(I·b/I_lit) over the run (a global, sampling-based measure; b the brightness factor), and on
 * request the one-at-a-time yield: the same draws with only that variation active, whose yield
 * loss says directly which variation costs the most. Reproducible: one seeded xoshiro128**
 * stream; the same seed gives the same result on any number of threads.
 */
import { mean, quantileSorted, sampleCorrelation } from "simple-statistics";
import type { LinkSystem } from "../circuit/link.ts";
import { TanklightInputError } from "../errors.ts";
import { wilsonInterval, type ProportionInterval } from "./confidence.ts";
import { drawsPerSample, makeYieldModel, nominalDraws, type YieldSpec, type YieldValues } from "./yieldModel.ts";
import { sampleDrawer, yieldSpec, type ActiveVariation, type VariationsInput } from "./yieldSpec.ts";
import { solveLinkModel, type LinkModel } from "../circuit/harmonic/modelChoice.ts";
import { progressCounter, type ProgressCallback } from "./progress.ts";
import { checkThreads, contentId, taskPool, type TaskPool, type ThreadsOption } from "./pool.ts";

/** Options of {@link toleranceYield}. */
export interface YieldOptions {
  /** number of samples, integer ≥ 10 (default 2000) */
  readonly samples?: number;
  /** seed of the generator, integer ≥ 0 (default 1) */
  readonly seed?: number;
  /** which receiver of the system is the token (default 0; the others are left out) */
  readonly token?: number;
  /** lit threshold, A (default 0.5 mA, trade practice) */
  readonly litThreshold?: number;
  /** confidence level of the interval (default 0.95) */
  readonly confidence?: number;
  /** "rank" (default) or "one-at-a-time" (adds one run of `samples` per active variation) */
  readonly sensitivity?: "rank" | "one-at-a-time";
  /**
   * forward-voltage grid of the LED tables, V (default 50 mV; ln G and ln I interpolated linearly
   * in ΔV between levels: with the amplitude table, within 3e-4 of the exact per-sample solve,
   * tests/analysis/toleranceYield.test.ts)
   */
  readonly vfStep?: number;
  /**
   * steady-state model of every sample, as solveLink's `model`: "fundamental" (default, the
   * describing function), "harmonic" (harmonic balance) or "auto" (the describing function where
   * its estimated error is small, harmonic balance elsewhere — per sample), over one transmitter
   * or several on their own drives. Coils on a shared drive: the describing function ("harmonic"
   * is refused), as solveLink.
   */
  readonly model?: LinkModel;
  readonly threads?: ThreadsOption;
  readonly onProgress?: ProgressCallback;
}

/** Percentiles of a quantity over the batch. */
export interface Percentiles {
  readonly p1: number;
  readonly p5: number;
  readonly p50: number;
  readonly p95: number;
  readonly p99: number;
  readonly mean: number;
  readonly min: number;
  readonly max: number;
}

/** One variation's place in the sensitivity ranking. */
export interface SensitivityEntry {
  readonly variation: string;
  /** Spearman rank correlation of its draw with the LED margin (sign: + means larger draw, more light) */
  readonly rankCorrelation: number;
  /** yield with only this variation active (one-at-a-time runs only) */
  readonly yieldAlone?: number;
  /** 1 − yieldAlone (one-at-a-time runs only) */
  readonly yieldLoss?: number;
}

/** The result of {@link toleranceYield}. */
export interface YieldResult {
  readonly samples: number;
  readonly seed: number;
  /** lit samples / samples */
  readonly litFraction: number;
  readonly lit: number;
  readonly interval: ProportionInterval;
  /** the nominal design (no variation) */
  readonly nominal: { readonly ledCurrent: number; readonly lit: boolean };
  /** LED average current, A */
  readonly ledCurrent: Percentiles;
  /** DC supply current, A (absent without a DC supply) */
  readonly supplyCurrent?: Percentiles;
  /** variations ranked by |rank correlation| (or by yield loss when one-at-a-time was run) */
  readonly sensitivity: readonly SensitivityEntry[];
  readonly sensitivityMethod: string;
  /** the model asked for and the samples each model solved (harmonicSamples: beyond the describing function — harmonic balance, or for a hard-switched single switch the periodic steady state) */
  readonly model: { readonly requested: LinkModel; readonly fundamentalSamples: number; readonly harmonicSamples: number };
  readonly litThreshold: number;
  readonly warnings: readonly string[];
}

const CHUNK = 500;

/**
 * Monte Carlo yield of a token design through the whole link (see the module comment).
 *
 * @param system a link system, one transmitter or several (`transmitters`, `sharedDrives`);
 *   `options.token` is the token (the others are left out).
 * @param variations `{ tokenCapacitor?: 0.05, transmitterCapacitor?, tokenTurns?: { spread, build },
 *   transmitterTurns?, ledForwardVoltage?: "preset" | "0.1 V", ledBrightness?: "preset" | 0.3,
 *   placement?: "2 mm", height?: "1 mm", tilt?: "10 deg", supply?: 0.05 }` — each ±tolerance,
 *   uniform unless `{ tolerance, distribution: "normal" }` (tolerance = 3σ, truncated). Over an
 *   array each transmitter draws its own capacitor and winding (`build(turns, transmitter)`), and
 *   the ranking lists them as `transmitterCapacitor[i]`, `transmitterTurns[i]`.
 * @param options samples (2000), seed (1), confidence (0.95), sensitivity, model ("fundamental",
 *   "harmonic", "auto"), threads, onProgress.
 * @returns {@link YieldResult}: lit fraction with a Wilson interval, percentiles (A), ranking, and
 *   the model used (how many samples each model solved).
 * @example (await toleranceYield(system, { tokenCapacitor: 0.1 }, { samples: 100, seed: 7 })).interval.method // → "Wilson score interval (Wilson 1927)"
 */
export async function toleranceYield(system: LinkSystem, variations: VariationsInput, options: YieldOptions = {}): Promise<YieldResult> {
  const where = "toleranceYield";
  const n = options.samples ?? 2000;
  const seed = options.seed ?? 1;
  if (!(Number.isInteger(n) && n >= 10)) throw new TanklightInputError([{ path: "samples", message: "must be an integer ≥ 10", value: n }], where);
  if (!(Number.isSafeInteger(seed) && seed >= 0)) throw new TanklightInputError([{ path: "seed", message: "must be an integer ≥ 0", value: seed }], where);
  checkThreads(options.threads, where);
  const requested = options.model ?? "fundamental";
  if (requested !== "fundamental" && requested !== "harmonic" && requested !== "auto") {
    throw new TanklightInputError([{ path: "model", message: "must be 'fundamental', 'harmonic' or 'auto'", value: requested }], where);
  }
  const { spec, parsed, active } = yieldSpec(system, variations, { ...options }, where);
  const model = makeYieldModel(spec);
  const nominal0 = nominalDraws(spec);
  const nominal = model.evaluate(nominal0);
  const threads = typeof options.threads === "object" ? options.threads.threads : (options.threads ?? 1);
  const pool: TaskPool | undefined = threads > 1 ? (typeof options.threads === "object" ? options.threads : await taskPool(threads)) : undefined;
  const owned = pool !== undefined && typeof options.threads !== "object";
  const id = pool ? contentId(spec) : "";
  const run = (draws: Float64Array): Promise<YieldValues> =>
    pool ? pool.run<YieldValues>({ kind: "yield", id, spec, draws }) : Promise.resolve(model.evaluate(draws));
  const oat = options.sensitivity === "one-at-a-time";
  const progress = progressCounter(options.onProgress);
  progress.add(n * (oat ? 1 + active.length : 1));
  try {
    const batch = await runBatch(spec, sampleDrawer(spec, parsed, seed), n, run, progress);
    const { current, lit, supply, unconverged, harmonic } = batch;
    let litCount = 0;
    for (let i = 0; i < n; i++) litCount += lit[i]!;
    const entries = await sensitivity(spec, active, batch, oat ? { run, progress } : undefined);
    const warnings: string[] = [];
    // the describing function's own validity at the nominal design (solveLink's warnings)
    if (requested === "fundamental" && spec.transmitters.length === 1 && spec.sharedDrives === undefined) {
      const check = solveLinkModel(model.network(nominal0), { litThreshold: spec.litThreshold, onNonConvergence: "warn", model: "fundamental" });
      warnings.push(...check.warnings.filter((w) => w.startsWith("describing function")).map((w) => `at the nominal design: ${w}`));
    }
    if (unconverged > 0) warnings.push(`${unconverged} of ${n} samples did not converge; their LED currents are the solver's last iterate`);
    if (litCount === n || litCount === 0) warnings.push(`every sample ${litCount === n ? "lit" : "dark"}: the interval is one-sided; more samples narrow it`);
    return {
      samples: n,
      seed,
      litFraction: litCount / n,
      lit: litCount,
      interval: wilsonInterval(litCount, n, options.confidence ?? 0.95),
      nominal: { ledCurrent: nominal.current[0]!, lit: nominal.lit[0] === 1 },
      ledCurrent: percentiles(current),
      ...(spec.supplyVoltage !== undefined ? { supplyCurrent: percentiles(supply) } : {}),
      sensitivity: entries,
      sensitivityMethod: oat
        ? "one-at-a-time yield: the same draws with only that variation active (ranked by yield loss); rankCorrelation: Spearman's ρ of the draw with ln(I·b/I_lit)"
        : "Spearman rank correlation of each variation's draw with the LED margin ln(I·b/I_lit) over the run (ranked by |ρ|)",
      model: { requested, fundamentalSamples: n - harmonic, harmonicSamples: harmonic },
      litThreshold: spec.litThreshold,
      warnings,
    };
  } finally {
    if (owned) await pool!.close();
  }
}

/** A batch's draws (row per sample) and its per-sample results. */
interface Batch extends YieldValues {
  readonly drawn: Float64Array;
}

type Run = (draws: Float64Array) => Promise<YieldValues>;
type ProgressCounter = ReturnType<typeof progressCounter>;

/** Draws n samples in chunks of CHUNK (in order, from one stream) and solves each chunk by `run`. */
async function runBatch(spec: YieldSpec, next: (count: number) => Float64Array, n: number, run: Run, progress: ProgressCounter): Promise<Batch> {
  const stride = drawsPerSample(spec.transmitters.length);
  const current = new Float64Array(n);
  const lit = new Uint8Array(n);
  const supply = new Float64Array(n);
  const drawn = new Float64Array(n * stride);
  let unconverged = 0;
  let harmonic = 0;
  const pending: Promise<void>[] = [];
  for (let s = 0; s < n; s += CHUNK) {
    const count = Math.min(CHUNK, n - s);
    const draws = next(count);
    drawn.set(draws, s * stride);
    pending.push(
      run(draws).then((v) => {
        current.set(v.current, s);
        lit.set(v.lit, s);
        supply.set(v.supply, s);
        unconverged += v.unconverged;
        harmonic += v.harmonic;
        progress.done(count);
      }),
    );
  }
  await Promise.all(pending);
  return { current, lit, supply, drawn, unconverged, harmonic };
}

/**
 * The sensitivity ranking: each active variation's Spearman ρ with the LED margin, and with
 * `oneAtATime` its yield over the same draws with every other column at its nominal value.
 */
async function sensitivity(spec: YieldSpec, active: readonly ActiveVariation[], batch: Batch, oneAtATime: { run: Run; progress: ProgressCounter } | undefined): Promise<SensitivityEntry[]> {
  const { current, drawn } = batch;
  const n = current.length;
  const stride = drawsPerSample(spec.transmitters.length);
  const brightness = 5; // the brightness draw's column (DRAW_NAMES)
  const margin = Float64Array.from(current, (c, i) => Math.log(Math.max(c * drawn[i * stride + brightness]!, 1e-12) / spec.litThreshold));
  const marginRanks = midranks(margin);
  const entries: SensitivityEntry[] = [];
  const nom = nominalDraws(spec);
  for (const { variation, columns } of active) {
    const col = columns[0]!;
    // a tilt is ranked by its size (its direction is the azimuth draw)
    const xs = Float64Array.from({ length: n }, (_, i) => (variation === "tilt" ? Math.abs(drawn[i * stride + col]!) : drawn[i * stride + col]!));
    // Spearman's ρ: Pearson's r of the midranks (as simple-statistics' sampleRankCorrelation, with the margin ranked once)
    const rho = constant(xs) || constant(margin) ? 0 : sampleCorrelation(midranks(xs), marginRanks);
    let alone: number | undefined;
    if (oneAtATime) {
      const masked = new Float64Array(drawn);
      for (let i = 0; i < n; i++) for (let d = 0; d < stride; d++) if (!columns.includes(d)) masked[i * stride + d] = nom[d]!;
      let litAlone = 0;
      const parts: Promise<void>[] = [];
      for (let s = 0; s < n; s += CHUNK) {
        const count = Math.min(CHUNK, n - s);
        parts.push(
          oneAtATime.run(masked.slice(s * stride, (s + count) * stride)).then((v) => {
            for (let i = 0; i < count; i++) litAlone += v.lit[i]!;
            oneAtATime.progress.done(count);
          }),
        );
      }
      await Promise.all(parts);
      alone = litAlone / n;
    }
    entries.push({ variation, rankCorrelation: rho, ...(alone !== undefined ? { yieldAlone: alone, yieldLoss: 1 - alone } : {}) });
  }
  entries.sort((a, b) => (oneAtATime ? b.yieldLoss! - a.yieldLoss! : Math.abs(b.rankCorrelation) - Math.abs(a.rankCorrelation)));
  return entries;
}

function constant(xs: Float64Array): boolean {
  return xs.every((x) => x === xs[0]);
}

/**
 * Midranks (0-based; tied values share the mean of the ranks they span), in the order of the
 * input — the ranks on which Spearman's ρ is defined (the same numbers simple-statistics ranks by).
 */
function midranks(values: Float64Array): number[] {
  // the sorted copy by the engine's native sort; each value's tied run [first, last] by binary search
  const sorted = Float64Array.from(values).sort();
  const n = sorted.length;
  const ranks = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    const v = values[i]!;
    let lo = 0;
    let hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (sorted[mid]! < v) lo = mid + 1;
      else hi = mid;
    }
    let end = lo;
    hi = n;
    while (end < hi) {
      const mid = (end + hi) >>> 1;
      if (sorted[mid]! <= v) end = mid + 1;
      else hi = mid;
    }
    ranks[i] = (lo + end - 1) / 2;
  }
  return ranks;
}

function percentiles(values: Float64Array): Percentiles {
  const sorted = Array.from(values).sort((a, b) => a - b);
  return {
    p1: quantileSorted(sorted, 0.01),
    p5: quantileSorted(sorted, 0.05),
    p50: quantileSorted(sorted, 0.5),
    p95: quantileSorted(sorted, 0.95),
    p99: quantileSorted(sorted, 0.99),
    mean: mean(sorted),
    min: sorted[0]!,
    max: sorted[sorted.length - 1]!,
  };
}

export type { YieldSpec };

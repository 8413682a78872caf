/**
 * The benchmark harness (docs/design.md §8). Each workload is warmed up (its code compiled by
 * the engine before timing), then timed in several rounds; each round is a batch of calls
 * calibrated to last about 10 ms (at least one call), and the time per call of every round is
 * kept. The printed figures are the minimum (the least disturbed round: what the code costs)
 * and the median (what a user sees on this machine). Workloads that name a `peer` are printed
 * with the ratio peer/this, taken from the two minima of the same run, so the figure holds on
 * a shared, noisy machine where absolute times wander by 2–5×.
 */

/** One workload: `fn` is called `batch` times per round (calibrated). */
export interface Workload {
  /** e.g. "ellipticK+E pair" */
  readonly name: string;
  /** what one call does, e.g. "1 evaluation", "121×61 poses" */
  readonly size: string;
  readonly fn: () => unknown;
  /** target time per call, seconds (from the issue), judged on the minimum */
  readonly target?: number;
  /** minimum total time to spend measuring, s (default 0.5) */
  readonly minTime?: number;
  /** minimum number of rounds (default 7) */
  readonly rounds?: number;
  /** warm-up time before measuring, s (default 0.2; at least one call) */
  readonly warmup?: number;
  /**
   * the name of another workload of the same file, measured before this one, to print a ratio
   * against: `ratio` = that workload's min / this one's min
   */
  readonly against?: string;
  /**
   * re-measure the `against` workload in rounds alternating with this one even when it is not
   * quick (fresh-process start-ups: a change of machine load falls on both)
   */
  readonly interleave?: boolean;
  /** the smallest acceptable `against` ratio (e.g. 10: at least ten times faster), judged on the minima */
  readonly targetRatio?: number;
  /** the largest acceptable ratio this/against (e.g. 1.3: at most 1.3× slower than the reference) */
  readonly maxSlowdown?: number;
}

export interface BenchResult {
  readonly name: string;
  readonly size: string;
  /** fastest round, seconds per call */
  readonly min: number;
  /** median round, seconds per call */
  readonly median: number;
  readonly target?: number;
  readonly rounds: number;
}

/** Results are written here so the engine cannot drop the calls as dead code. */
const sink: { value: unknown } = { value: undefined };

/** Runs one workload: warm-up, calibration, then rounds until both minTime and the round count are reached. */
export function runWorkload(w: Workload): BenchResult {
  const minTime = w.minTime ?? 0.5;
  const minRounds = w.rounds ?? 7;
  const warmEnd = performance.now() + 1000 * (w.warmup ?? 0.2);
  let last = 0;
  do {
    const t0 = performance.now();
    sink.value = w.fn();
    last = performance.now() - t0;
  } while (performance.now() < warmEnd);
  // calibrate the batch so one round takes ≈ 10 ms (at least one call; long calls need none)
  let batch = 1;
  while (last < 10) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) sink.value = w.fn();
    const dt = (performance.now() - t0) / 1000;
    if (dt > 0.01 || batch > 1e8) break;
    batch *= dt < 1e-4 ? 16 : 2;
  }
  const rounds: number[] = [];
  const start = performance.now();
  while (rounds.length < minRounds || ((performance.now() - start) / 1000 < minTime && rounds.length < 200)) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) sink.value = w.fn();
    rounds.push((performance.now() - t0) / 1000 / batch);
  }
  rounds.sort((a, b) => a - b);
  return {
    name: w.name,
    size: w.size,
    min: rounds[0]!,
    median: rounds[Math.floor(rounds.length / 2)]!,
    ...(w.target === undefined ? {} : { target: w.target }),
    rounds: rounds.length,
  };
}

/**
 * Runs a workload and its reference (`against`) in alternating rounds — reference, workload,
 * reference, … — after warming both, so that a change of machine load during the run falls on
 * both alike; the ratio printed for the pair comes from these rounds. Used where the reference
 * is quick (a round ≈ 10 ms); a slow reference (seconds per call) is compared with its own earlier run.
 */
export function runInterleaved(ref: Workload, w: Workload): { ref: BenchResult; result: BenchResult } {
  const warmEnd = performance.now() + 1000 * Math.max(ref.warmup ?? 0.2, w.warmup ?? 0.2);
  do { sink.value = ref.fn(); sink.value = w.fn(); } while (performance.now() < warmEnd);
  const calibrate = (fn: () => unknown): number => {
    let batch = 1;
    for (;;) {
      const t0 = performance.now();
      for (let i = 0; i < batch; i++) sink.value = fn();
      const dt = (performance.now() - t0) / 1000;
      if (dt > 0.01 || batch > 1e8) return batch;
      batch *= dt < 1e-4 ? 16 : 2;
    }
  };
  const bRef = calibrate(ref.fn), bW = calibrate(w.fn);
  const tRef: number[] = [], tW: number[] = [];
  const minRounds = Math.max(ref.rounds ?? 7, w.rounds ?? 7);
  const minTime = Math.max(ref.minTime ?? 0.5, w.minTime ?? 0.5);
  const start = performance.now();
  const round = (fn: () => unknown, batch: number, into: number[]): void => {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) sink.value = fn();
    into.push((performance.now() - t0) / 1000 / batch);
  };
  while (tW.length < minRounds || ((performance.now() - start) / 1000 < 2 * minTime && tW.length < 200)) {
    round(ref.fn, bRef, tRef);
    round(w.fn, bW, tW);
  }
  const summary = (x: Workload, t: number[]): BenchResult => {
    t.sort((a, b) => a - b);
    return { name: x.name, size: x.size, min: t[0]!, median: t[Math.floor(t.length / 2)]!, ...(x.target === undefined ? {} : { target: x.target }), rounds: t.length };
  };
  return { ref: summary(ref, tRef), result: summary(w, tW) };
}

/** Formats seconds with an SI prefix, e.g. 4.2e-8 → "42.0 ns". */
export function formatSeconds(s: number): string {
  if (s >= 1) return `${s.toFixed(3)} s`;
  if (s >= 1e-3) return `${(s * 1e3).toFixed(3)} ms`;
  if (s >= 1e-6) return `${(s * 1e6).toFixed(3)} µs`;
  return `${(s * 1e9).toFixed(1)} ns`;
}

/** One printed line: name, size, min and median, the target with a verdict, the ratio to its reference. */
export function formatResult(r: BenchResult, w?: Workload, reference?: BenchResult): string {
  const parts = [
    `${r.name.padEnd(60)} ${r.size.padEnd(24)} min ${formatSeconds(r.min).padStart(11)}  median ${formatSeconds(r.median).padStart(11)}  (${r.rounds} rounds)`,
  ];
  if (r.target !== undefined) parts.push(`target ≤ ${formatSeconds(r.target)} ${r.min <= r.target ? "met" : "MISSED"}`);
  if (w?.against !== undefined && reference !== undefined) {
    const ratio = reference.min / r.min;
    const medRatio = reference.median / r.median;
    let verdict = "";
    if (w.targetRatio !== undefined) verdict = ` target ≥ ${w.targetRatio}× ${ratio >= w.targetRatio ? "met" : "MISSED"}`;
    if (w.maxSlowdown !== undefined) verdict = ` target ≤ ${w.maxSlowdown}× of it ${1 / ratio <= w.maxSlowdown ? "met" : "MISSED"}`;
    // min and median in the same words ("1.36× its time (min; median 1.47× its time)")
    const words = (x: number): string => (x >= 1 ? `${x.toFixed(2)}× faster` : `${(1 / x).toFixed(2)}× its time`);
    parts.push(`vs "${w.against}": ${words(ratio)} (min; median ${words(medRatio)})${verdict}`);
  }
  return parts.join("  ");
}

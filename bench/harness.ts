/**
 * A tiny benchmark harness (docs/design.md §8): each workload runs in batches until enough time
 * has passed; the median time per call over the batches is printed with the workload size
 * and, where an issue sets one, the target.
 */

/** One workload: `fn` is called `batch` times per sample (default: calibrated). */
export interface Workload {
  /** e.g. "ellipticK+E pair" */
  readonly name: string;
  /** what one call does, e.g. "1 evaluation", "121×61 poses" */
  readonly size: string;
  readonly fn: () => unknown;
  /** target time per call, seconds (from the issue), printed beside the result */
  readonly target?: number;
  /** minimum total time to spend measuring, s (default 0.5) */
  readonly minTime?: number;
}

export interface BenchResult {
  readonly name: string;
  readonly size: string;
  /** median seconds per call */
  readonly median: number;
  readonly target?: number;
  readonly samples: number;
}

let sink: unknown;

/** Runs one workload and returns its median time per call. */
export function runWorkload(w: Workload): BenchResult {
  const minTime = w.minTime ?? 0.5;
  // calibrate the batch so one sample takes ≈ 10 ms (at least one call)
  let batch = 1;
  for (;;) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) sink = w.fn();
    const dt = (performance.now() - t0) / 1000;
    if (dt > 0.01 || batch > 1e8) break;
    batch *= dt < 1e-4 ? 16 : 2;
  }
  const samples: number[] = [];
  const start = performance.now();
  while (samples.length < 5 || ((performance.now() - start) / 1000 < minTime && samples.length < 200)) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) sink = w.fn();
    samples.push((performance.now() - t0) / 1000 / batch);
  }
  samples.sort((a, b) => a - b);
  const median = samples[Math.floor(samples.length / 2)]!;
  void sink;
  return { name: w.name, size: w.size, median, target: w.target, samples: samples.length };
}

/** Formats seconds with an SI prefix, e.g. 4.2e-8 → "42.0 ns". */
export function formatSeconds(s: number): string {
  if (s >= 1) return `${s.toFixed(3)} s`;
  if (s >= 1e-3) return `${(s * 1e3).toFixed(3)} ms`;
  if (s >= 1e-6) return `${(s * 1e6).toFixed(3)} µs`;
  return `${(s * 1e9).toFixed(1)} ns`;
}

/** One printed line: name, size, median, and the target with a verdict where there is one. */
export function formatResult(r: BenchResult): string {
  const target = r.target === undefined ? "" : `  target ≤ ${formatSeconds(r.target)} ${r.median <= r.target ? "met" : "MISSED"}`;
  return `${r.name.padEnd(58)} ${r.size.padEnd(26)} median ${formatSeconds(r.median).padStart(12)}${target}`;
}

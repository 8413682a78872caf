/**
 * Progress reports of long runs (maps, yields, searches): work done out of the work known so
 * far, the time spent and an estimate of the time left from the average rate so far.
 */

/** One progress report. */
export interface Progress {
  /** units of work done (points solved, samples drawn, designs evaluated) */
  readonly done: number;
  /** units of work known so far (may grow while a map refines) */
  readonly total: number;
  /** seconds since the run started */
  readonly elapsed: number;
  /** estimated seconds left: elapsed·(total − done)/done (0 when done) */
  readonly remaining: number;
}

/** A progress callback. */
export type ProgressCallback = (progress: Progress) => void;

/** A small counter that reports through an optional callback. */
export function progressCounter(callback: ProgressCallback | undefined): {
  add(total: number): void;
  done(units: number): void;
  readonly state: { done: number; total: number };
} {
  const t0 = performance.now();
  const state = { done: 0, total: 0 };
  const report = (): void => {
    if (!callback) return;
    const elapsed = (performance.now() - t0) / 1000;
    const remaining = state.done > 0 ? (elapsed * Math.max(0, state.total - state.done)) / state.done : 0;
    callback({ done: state.done, total: state.total, elapsed, remaining });
  };
  return {
    state,
    add(total: number): void {
      state.total += total;
    },
    done(units: number): void {
      state.done += units;
      report();
    },
  };
}

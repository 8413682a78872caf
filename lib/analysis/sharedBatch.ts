/**
 * A batch of token positions shared between threads (./pool.ts, ./worker.ts): the positions and
 * the result arrays in shared memory, and an atomic counter from which each thread claims the
 * next few positions until none are left — self-scheduling, so threads finish together whatever
 * each position costs. Every position's values are written at its own index, so the result does
 * not depend on which thread solved what.
 */
import type { Probe } from "./probe.ts";

/**
 * Positions a thread claims at a time: about half a millisecond of solves (≈ 25 µs each for one
 * token and one transmitter), so the threads finish within that of each other.
 */
export const POINTS_PER_CLAIM = 16;

/** A batch of positions shared with the workers: the positions, the result arrays and the counter [next, unconverged, done]. */
export interface SharedBatch {
  readonly positions: Float64Array;
  readonly current: Float64Array;
  readonly mutual: Float64Array;
  readonly supply: Float64Array;
  readonly counter: Int32Array;
  /** positions claimed at a time */
  readonly claim: number;
}
/** Slots of {@link SharedBatch}'s counter. */
export const SHARED_NEXT = 0;
export const SHARED_UNCONVERGED = 1;
export const SHARED_DONE = 2;

function sharedFloats(n: number): Float64Array {
  return new Float64Array(new SharedArrayBuffer(8 * Math.max(1, n)), 0, n);
}

/** A shared batch of positions ([x, y, z, …], m) for a probe of `axes` token axes, counters at zero. */
export function sharedBatch(positions: Float64Array, axes: number): SharedBatch {
  const n = positions.length / 3;
  const shared = sharedFloats(3 * n);
  shared.set(positions);
  return { positions: shared, current: sharedFloats(n), mutual: sharedFloats(n * axes), supply: sharedFloats(n), counter: new Int32Array(new SharedArrayBuffer(12)), claim: POINTS_PER_CLAIM };
}

/**
 * Solves a shared batch's positions in this thread, claiming them from its counter until none are
 * left (each position's values written at its index). Called by every worker of a batch.
 */
export function solveShared(probe: Probe, batch: SharedBatch): void {
  const n = batch.current.length;
  const na = probe.spec.axes.length;
  for (;;) {
    const s = Atomics.add(batch.counter, SHARED_NEXT, batch.claim);
    if (s >= n) return;
    const e = Math.min(n, s + batch.claim);
    const v = probe.evaluate(batch.positions.subarray(3 * s, 3 * e));
    batch.current.set(v.current, s);
    batch.mutual.set(v.mutual, s * na);
    batch.supply.set(v.supply, s);
    if (v.unconverged > 0) Atomics.add(batch.counter, SHARED_UNCONVERGED, v.unconverged);
    Atomics.add(batch.counter, SHARED_DONE, e - s);
  }
}


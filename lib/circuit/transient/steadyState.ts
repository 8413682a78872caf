/**
 * Steady state by cycle-to-cycle convergence: at the end of each drive period the state
 * (capacitor voltages, inductor currents) is compared with the previous period's, scaled by
 * each variable's peak, and the remaining distance is estimated from the geometric decay of
 * those changes.
 */
import type { CompiledCircuit } from "./compile.ts";
import type { Engine } from "./engine.ts";

/** Steady-state verdict of a run with `untilSteady`. */
export interface SteadyState {
  readonly reached: boolean;
  /** whole cycles simulated */
  readonly cycles: number;
  /** estimated remaining relative change of the state (∞ if it was not decaying) */
  readonly estimatedError: number;
}

/** Follows the state from step to step and judges, once per cycle, whether it has settled. */
export class SteadyStateTracker {
  private readonly cc: CompiledCircuit;
  private readonly stepsPerCycle: number;
  private readonly tolerance: number;
  private readonly minCycles: number;
  private readonly now: Float64Array;
  private readonly lastCycle: Float64Array;
  private readonly peak: Float64Array;
  private readonly deltas: number[] = [];
  private cycles = 0;
  /** the verdict after the last whole cycle (undefined before the first) */
  verdict: SteadyState | undefined;

  constructor(cc: CompiledCircuit, engine: Engine, stepsPerCycle: number, tolerance: number, minCycles: number) {
    this.cc = cc;
    this.stepsPerCycle = stepsPerCycle;
    this.tolerance = tolerance;
    this.minCycles = minCycles;
    const nState = cc.capacitors.length + cc.inductors.length;
    this.now = new Float64Array(nState);
    this.lastCycle = new Float64Array(nState);
    this.peak = new Float64Array(nState);
    engine.readState(this.lastCycle);
  }

  /** After output step n (1-based): tracks the peaks; at a cycle's end returns true once steady. */
  afterStep(engine: Engine, n: number): boolean {
    const { now, peak } = this;
    engine.readState(now);
    for (let i = 0; i < now.length; i++) {
      const v = Math.abs(now[i]!);
      if (v > peak[i]!) peak[i] = v;
    }
    if (n % this.stepsPerCycle !== 0) return false;
    this.cycles++;
    this.deltas.push(cycleChange(this.cc, now, this.lastCycle, peak));
    this.lastCycle.set(now);
    peak.fill(0);
    const est = remainingEstimate(this.deltas);
    const reached = this.cycles >= this.minCycles && est <= this.tolerance;
    this.verdict = { reached, cycles: this.cycles, estimatedError: est };
    return reached;
  }

  /** Cycles completed so far. */
  get cyclesDone(): number {
    return this.cycles;
  }
}

/** Largest relative change of any state variable over one cycle (scale: its peak, floored at 1e-3 of its kind's largest peak). */
export function cycleChange(cc: CompiledCircuit, now: Float64Array, last: Float64Array, peak: Float64Array): number {
  const nC = cc.capacitors.length;
  let maxV = 0;
  let maxI = 0;
  for (let i = 0; i < now.length; i++) {
    if (i < nC) maxV = Math.max(maxV, peak[i]!);
    else maxI = Math.max(maxI, peak[i]!);
  }
  let delta = 0;
  for (let i = 0; i < now.length; i++) {
    const kindMax = i < nC ? maxV : maxI;
    const scale = Math.max(peak[i]!, 1e-3 * kindMax);
    if (scale === 0) continue;
    const d = Math.abs(now[i]! - last[i]!) / scale;
    if (d > delta) delta = d;
  }
  return delta;
}

/**
 * Remaining distance to the steady state from the cycle-to-cycle changes δ: a geometric
 * tail δₙ/(1 − r) (δₙ and the changes still to come) with r the larger of the last two decay ratios (two coupled tanks beat,
 * so one ratio alone can look too good). ∞ while the changes are not decaying.
 * @example remainingEstimate([0.8, 0.4, 0.2]) // → 0.4 (r = 0.5)
 */
export function remainingEstimate(d: readonly number[]): number {
  const n = d.length;
  const last = d[n - 1]!;
  if (last === 0) return 0;
  if (n < 3) return Infinity;
  const r1 = last / d[n - 2]!;
  const r2 = d[n - 2]! / d[n - 3]!;
  const r = Math.max(r1, r2);
  if (!(r < 1)) return Infinity;
  return last / (1 - r);
}

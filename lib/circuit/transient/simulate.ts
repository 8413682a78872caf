/**
 * The time-domain engine: modified nodal analysis (Ho, Ruehli & Brennan, IEEE Trans.
 * Circuits Syst. 22(6):504–509, 1975) — node voltages plus the branch currents of voltage
 * sources and inductors as unknowns — integrated with the trapezoidal rule, with a
 * backward-Euler step at the start and after every switching instant (the usual cure for the
 * trapezoidal rule's undamped ringing after a discontinuity). Mutual inductance enters as
 * the coupled branch equations v_k = R_k i_k + Σ_j L_kj di_j/dt. Diodes are linearised
 * (companion conductance and current) and solved by Newton's method; a step whose Newton
 * iteration fails is halved and retried. Steady state is detected by cycle-to-cycle
 * convergence of the state (capacitor voltages, inductor currents) with a geometric
 * estimate of the remaining distance.
 *
 * Hot loop: all matrices and vectors are allocated once; nothing is allocated per step.
 */

import { requirePositive, TanklightInputError } from "../../errors.ts";
import { GROUND, type TransientCircuit } from "./circuit.ts";
import { compileCircuit, type CompiledCircuit } from "./compile.ts";
import { luFactor, luSolve, SingularMatrixError } from "../../math/lu.ts";
import { TransientConvergenceError } from "./errors.ts";

/** How to run a simulation. Times in s, frequencies in Hz. */
export interface SimulateOptions {
  /** end time, s, > 0 (the longest run when `untilSteady` is set) */
  readonly stop: number;
  /** output and integration step, s; or give `stepsPerCycle` with `frequency` */
  readonly step?: number;
  /** steps per period of `frequency`, integer ≥ 8 */
  readonly stepsPerCycle?: number;
  /** the drive frequency, Hz: defines the cycle for `stepsPerCycle`, `untilSteady` and `keepCycles` */
  readonly frequency?: number;
  /**
   * stop at steady state: when the estimated remaining relative change of the state
   * (δₙ/(1 − r), δₙ the cycle-to-cycle change, r its decay ratio) is below `tolerance`
   * (default 1e-4), after at least `minCycles` cycles (default 5). Needs `frequency`.
   */
  readonly untilSteady?: boolean | { readonly tolerance?: number; readonly minCycles?: number };
  /** keep only the last N cycles of output (needs `frequency`); default all, or 4 with `untilSteady` */
  readonly keepCycles?: number;
  /** called about every 1 % of the run with (fraction done 0…1, simulated time s) */
  readonly progress?: (fraction: number, time: number) => void;
  /** Newton iterations per step before the step is halved; default 50 */
  readonly maxNewtonIterations?: number;
}

/** Steady-state verdict of a run with `untilSteady`. */
export interface SteadyState {
  readonly reached: boolean;
  /** whole cycles simulated */
  readonly cycles: number;
  /** estimated remaining relative change of the state (∞ if it was not decaying) */
  readonly estimatedError: number;
}

/** Sampled waveforms of a run (uniform step; time[0] may be > 0 when `keepCycles` is set). */
export interface TransientResult {
  /** sample times, s */
  readonly time: Float64Array;
  /** sampling step, s */
  readonly step: number;
  /** voltage of every node to ground, V (ground itself is not listed) */
  readonly nodeVoltages: Readonly<Record<string, Float64Array>>;
  /**
   * current of every element except couplings, A: a → b (resistor, capacitor, inductor,
   * switch), anode → cathode (diode), from → to (current source), out of the plus
   * terminal into the circuit (voltage source)
   */
  readonly currents: Readonly<Record<string, Float64Array>>;
  /** present when `untilSteady` was set */
  readonly steady?: SteadyState;
  readonly stats: {
    /** accepted integration steps, including sub-steps */
    readonly steps: number;
    /** steps halved because Newton's method failed */
    readonly rejectedSteps: number;
    readonly newtonIterations: number;
    readonly factorizations: number;
    readonly switchingEvents: number;
  };
  readonly warnings: string[];
}

const VOLTAGE_ABSTOL = 1e-6; // V — Newton convergence floor on node voltages
const CURRENT_ABSTOL = 1e-9; // A — Newton convergence floor on branch currents
const NEWTON_RELTOL = 1e-7;
const MAX_HALVINGS = 24;
const MAX_PIECES_PER_STEP = 4096; // sub-steps (after halving) allowed inside one output step
const EDGE_RESOLUTION = 1e-10; // switching instants located to this fraction of a step

/**
 * Simulates a circuit in the time domain from rest (capacitor voltages and inductor currents
 * at their initial values, default 0) and returns its sampled waveforms.
 *
 * Method: MNA (Ho, Ruehli & Brennan 1975); trapezoidal rule (second order, A-stable, energy
 * conserving for lossless LC) with backward Euler at t = 0 and after each switching instant;
 * Newton on diodes with step halving; steady state by cycle-to-cycle convergence.
 *
 * @param circuit the elements (see circuit.ts)
 * @param opts.stop end time, s > 0; opts.step s > 0, or opts.stepsPerCycle with opts.frequency, Hz
 * @returns waveforms as Float64Array per node and element, stats and warnings
 * @throws TanklightInputError for bad options, a floating node, a loop of voltage sources or a
 *   singular matrix (naming the elements); TransientConvergenceError when Newton fails
 * @example
 *   // 1 V step into R = 1 Ω, C = 1 µF: v_C(1 µs) = 1 − e^{-1} ≈ 0.632 V
 *   simulate({ elements: [
 *     { kind: "voltageSource", name: "V1", plus: "in", minus: "ground", waveform: () => 1 },
 *     { kind: "resistor", name: "R1", a: "in", b: "out", resistance: 1 },
 *     { kind: "capacitor", name: "C1", a: "out", b: "ground", capacitance: 1e-6 } ] },
 *     { stop: 1e-6, step: 1e-9 }).nodeVoltages.out.at(-1) // → 0.6321
 */
export function simulate(circuit: TransientCircuit, opts: SimulateOptions): TransientResult {
  const where = "simulate";
  const warnings: string[] = [];
  const stop = requirePositive(opts?.stop, "stop", "s", where);
  const frequency = opts.frequency === undefined ? undefined : requirePositive(opts.frequency, "frequency", "Hz", where);
  let h: number;
  let spc: number | undefined;
  if (opts.stepsPerCycle !== undefined) {
    if (frequency === undefined) throw new TanklightInputError([{ path: "frequency", message: "is needed with stepsPerCycle", value: undefined, expected: "Hz > 0" }], where);
    const n = opts.stepsPerCycle;
    if (!(Number.isInteger(n) && n >= 8)) throw new TanklightInputError([{ path: "stepsPerCycle", message: "must be an integer ≥ 8", value: n, expected: "integer ≥ 8" }], where);
    spc = n;
    h = 1 / (frequency * n);
  } else if (opts.step !== undefined) {
    h = requirePositive(opts.step, "step", "s", where);
    if (frequency !== undefined) {
      spc = Math.max(1, Math.round(1 / (frequency * h)));
      const hc = 1 / (frequency * spc);
      if (Math.abs(hc - h) > 1e-9 * h) {
        warnings.push(`step adjusted from ${h} s to ${hc} s so that a period of ${frequency} Hz holds a whole number (${spc}) of steps`);
      }
      h = hc;
    }
  } else {
    throw new TanklightInputError([{ path: "step", message: "give step, or stepsPerCycle with frequency", value: undefined, expected: "s > 0" }], where);
  }
  if (h > stop) throw new TanklightInputError([{ path: "step", message: `must not exceed stop (${stop} s)`, value: h, expected: `≤ ${stop} s` }], where);
  const nGrid = Math.max(1, Math.round(stop / h - 1e-9 * (stop / h)));
  if (nGrid > 5e7) throw new TanklightInputError([{ path: "stop", message: `asks for ${nGrid} steps (at most 5e7)`, value: stop, expected: "stop/step ≤ 5e7" }], where);

  let steadyTol = 0;
  let minCycles = 0;
  const wantSteady = opts.untilSteady !== undefined && opts.untilSteady !== false;
  if (wantSteady) {
    if (spc === undefined) throw new TanklightInputError([{ path: "frequency", message: "is needed with untilSteady", value: undefined, expected: "Hz > 0" }], where);
    const u = typeof opts.untilSteady === "object" ? opts.untilSteady : {};
    steadyTol = u.tolerance ?? 1e-4;
    minCycles = u.minCycles ?? 5;
    if (!(steadyTol > 0 && Number.isFinite(steadyTol))) throw new TanklightInputError([{ path: "untilSteady.tolerance", message: "must be > 0", value: steadyTol }], where);
    if (!(Number.isInteger(minCycles) && minCycles >= 3)) throw new TanklightInputError([{ path: "untilSteady.minCycles", message: "must be an integer ≥ 3", value: minCycles }], where);
  }
  let keep = nGrid + 1;
  const keepCycles = opts.keepCycles ?? (wantSteady ? 4 : undefined);
  if (keepCycles !== undefined) {
    if (spc === undefined) throw new TanklightInputError([{ path: "frequency", message: "is needed with keepCycles", value: undefined, expected: "Hz > 0" }], where);
    if (!(Number.isInteger(keepCycles) && keepCycles >= 1)) throw new TanklightInputError([{ path: "keepCycles", message: "must be an integer ≥ 1", value: keepCycles }], where);
    keep = Math.min(keep, keepCycles * spc + 1);
  }
  const maxNewton = opts.maxNewtonIterations ?? 50;
  if (!(Number.isInteger(maxNewton) && maxNewton >= 2)) throw new TanklightInputError([{ path: "maxNewtonIterations", message: "must be an integer ≥ 2", value: maxNewton }], where);
  const progress = opts.progress;

  const cc = compileCircuit(circuit);
  const engine = new Engine(cc, maxNewton);
  const nNodes = cc.nodeNames.length;

  // ---- output buffers (ring of `keep` samples) ----
  const nodeOut = cc.nodeNames.map(() => new Float64Array(keep));
  const elemNames: string[] = [];
  for (const list of [cc.resistors, cc.capacitors, cc.inductors, cc.voltageSources, cc.currentSources, cc.switches, cc.diodes]) {
    for (const e of list) elemNames.push(e.name);
  }
  const curOut = elemNames.map(() => new Float64Array(keep));
  const timeOut = new Float64Array(keep);
  let recorded = 0;
  const record = (t: number) => {
    const slot = recorded % keep;
    timeOut[slot] = t;
    const x = engine.x;
    for (let i = 0; i < nNodes; i++) nodeOut[i]![slot] = x[i]!;
    engine.elementCurrents(t, curOut, slot);
    recorded++;
  };

  // ---- t = 0 ----
  engine.start(h);
  record(0);

  // ---- steady-state bookkeeping ----
  const nState = cc.capacitors.length + cc.inductors.length;
  const stateNow = new Float64Array(nState);
  const stateLastCycle = new Float64Array(nState);
  const peak = new Float64Array(nState);
  const deltas: number[] = [];
  let cycles = 0;
  let steady: SteadyState | undefined;
  if (wantSteady) engine.readState(stateLastCycle);

  const progressEvery = Math.max(1, Math.floor(nGrid / 100));
  let n = 1;
  for (; n <= nGrid; n++) {
    engine.advanceTo(n * h, h);
    record(n * h);
    if (wantSteady) {
      engine.readState(stateNow);
      for (let i = 0; i < nState; i++) {
        const v = Math.abs(stateNow[i]!);
        if (v > peak[i]!) peak[i] = v;
      }
      if (n % spc! === 0) {
        cycles++;
        const delta = cycleChange(cc, stateNow, stateLastCycle, peak);
        deltas.push(delta);
        stateLastCycle.set(stateNow);
        peak.fill(0);
        const est = remainingEstimate(deltas);
        steady = { reached: false, cycles, estimatedError: est };
        if (cycles >= minCycles && est <= steadyTol) {
          steady = { reached: true, cycles, estimatedError: est };
          break;
        }
      }
    }
    if (progress && n % progressEvery === 0) progress(n / nGrid, n * h);
  }
  if (progress) progress(1, Math.min(n, nGrid) * h);
  if (wantSteady && !steady?.reached) {
    warnings.push(
      `steady state not reached by ${stop} s (${cycles} cycles; estimated remaining change ${steady?.estimatedError.toExponential(2)}, tolerance ${steadyTol})`,
    );
  }
  if (keepCycles !== undefined && recorded < keep) {
    // fewer samples than asked: fine, return what there is
  }

  // ---- unroll the ring into time order ----
  const count = Math.min(recorded, keep);
  const first = recorded > keep ? recorded % keep : 0;
  const unroll = (buf: Float64Array): Float64Array => {
    const out = new Float64Array(count);
    for (let i = 0; i < count; i++) out[i] = buf[(first + i) % keep]!;
    return out;
  };
  const nodeVoltages: Record<string, Float64Array> = {};
  cc.nodeNames.forEach((name, i) => (nodeVoltages[name] = unroll(nodeOut[i]!)));
  const currents: Record<string, Float64Array> = {};
  elemNames.forEach((name, i) => (currents[name] = unroll(curOut[i]!)));
  warnings.push(...engine.warnings);
  return {
    time: unroll(timeOut),
    step: h,
    nodeVoltages,
    currents,
    ...(steady ? { steady } : {}),
    stats: {
      steps: engine.steps,
      rejectedSteps: engine.rejected,
      newtonIterations: engine.newtonIterations,
      factorizations: engine.factorizations,
      switchingEvents: engine.switchingEvents,
    },
    warnings,
  };
}

/** Largest relative change of any state variable over one cycle (scale: its peak, floored at 1e-3 of its kind's largest peak). */
function cycleChange(cc: CompiledCircuit, now: Float64Array, last: Float64Array, peak: Float64Array): number {
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
 * tail δₙ·r/(1 − r) with r the larger of the last two decay ratios (two coupled tanks beat,
 * so one ratio alone can look too good). ∞ while the changes are not decaying.
 */
function remainingEstimate(d: readonly number[]): number {
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

/** The integrator state and its preallocated workspace. */
class Engine {
  readonly cc: CompiledCircuit;
  readonly n: number;
  readonly nNodes: number;
  /** solution at the current time */
  readonly x: Float64Array;
  private readonly xTry: Float64Array;
  private readonly xSaved: Float64Array;
  private readonly base: Float64Array;
  private readonly work: Float64Array;
  private readonly rhsBase: Float64Array;
  private readonly pivots: Int32Array;
  // history
  private readonly capV: Float64Array;
  private readonly capI: Float64Array;
  private readonly indI: Float64Array;
  private readonly indW: Float64Array;
  private readonly capVSaved: Float64Array;
  private readonly capISaved: Float64Array;
  private readonly indISaved: Float64Array;
  private readonly indWSaved: Float64Array;
  private readonly switchState: Uint8Array;
  private readonly diodeV: Float64Array;
  /** diode currents of the last accepted solution (linearised at the converged voltage), A */
  private readonly diodeI: Float64Array;
  private readonly diodeG: Float64Array;
  private readonly diodeI0: Float64Array;
  private readonly nL: number;
  private readonly maxNewton: number;
  // cache of the linear matrix
  private baseAlpha = NaN;
  private baseSwitchVersion = -1;
  private switchVersion = 0;
  private factoredAlpha = NaN;
  private factoredVersion = -1;
  t = 0;
  private afterDiscontinuity = true;
  private subStep = 0;
  steps = 0;
  rejected = 0;
  newtonIterations = 0;
  factorizations = 0;
  switchingEvents = 0;
  readonly warnings: string[] = [];

  constructor(cc: CompiledCircuit, maxNewton: number) {
    this.cc = cc;
    this.n = cc.size;
    this.nNodes = cc.nodeNames.length;
    this.maxNewton = maxNewton;
    const n = this.n;
    this.x = new Float64Array(n);
    this.xTry = new Float64Array(n);
    this.xSaved = new Float64Array(n);
    this.base = new Float64Array(n * n);
    this.work = new Float64Array(n * n);
    this.rhsBase = new Float64Array(n);
    this.pivots = new Int32Array(n);
    this.capV = Float64Array.from(cc.capacitors, (c) => c.v0);
    this.capI = new Float64Array(cc.capacitors.length);
    this.indI = Float64Array.from(cc.inductors, (l) => l.i0);
    this.indW = new Float64Array(cc.inductors.length);
    this.capVSaved = new Float64Array(cc.capacitors.length);
    this.capISaved = new Float64Array(cc.capacitors.length);
    this.indISaved = new Float64Array(cc.inductors.length);
    this.indWSaved = new Float64Array(cc.inductors.length);
    this.switchState = new Uint8Array(cc.switches.length);
    this.diodeV = new Float64Array(cc.diodes.length);
    this.diodeI = new Float64Array(cc.diodes.length);
    this.diodeG = new Float64Array(cc.diodes.length);
    this.diodeI0 = new Float64Array(cc.diodes.length);
    this.nL = cc.inductors.length;
  }

  /** Sets the switch states at t = 0 and solves the t = 0 network (a backward-Euler step of 1e-4·h, state then restored). */
  start(h: number): void {
    this.cc.switches.forEach((s, i) => (this.switchState[i] = s.closed(0) ? 1 : 0));
    this.switchVersion++;
    this.subStep = h;
    this.saveHistory();
    const h0 = 1e-4 * h;
    if (!this.tryStep(h0, h0, true)) {
      throw new TransientConvergenceError(
        `simulate: Newton's method did not converge at t = 0 (diodes: ${this.cc.diodes.map((d) => d.name).join(", ")})`,
        0, h0, this.cc.diodes.map((d) => d.name),
      );
    }
    // keep the node voltages for the t = 0 sample, restore the state
    this.restoreHistory();
    this.afterDiscontinuity = true;
    this.t = 0;
  }

  /** Copies the state variables (capacitor voltages, then inductor currents) into `out`. */
  readState(out: Float64Array): void {
    out.set(this.capV, 0);
    out.set(this.indI, this.capV.length);
  }

  private saveHistory(): void {
    this.capVSaved.set(this.capV);
    this.capISaved.set(this.capI);
    this.indISaved.set(this.indI);
    this.indWSaved.set(this.indW);
    this.xSaved.set(this.x);
  }

  private restoreHistory(): void {
    this.capV.set(this.capVSaved);
    this.capI.set(this.capISaved);
    this.indI.set(this.indISaved);
    this.indW.set(this.indWSaved);
  }

  /** Integrates from the current time to tTarget (≤ one grid step h), cutting at switching instants. */
  advanceTo(tTarget: number, h: number): void {
    const cc = this.cc;
    const nSw = cc.switches.length;
    let guard = 0;
    while (tTarget - this.t > EDGE_RESOLUTION * h) {
      if (++guard > 1e6) throw new TransientConvergenceError(`simulate: no progress at t = ${this.t} s`, this.t, this.subStep, []);
      const rem = tTarget - this.t;
      // a remainder within rounding of the sub-step is taken as exactly the sub-step, so the
      // integration coefficient (and the cached factorisation) stays the same from step to step
      let hs = Math.abs(rem - this.subStep) <= 1e-9 * this.subStep ? this.subStep : Math.min(this.subStep, rem);
      if (rem - hs < EDGE_RESOLUTION * h) hs = Math.abs(rem - this.subStep) <= 1e-9 * this.subStep ? this.subStep : rem;
      // a switching instant inside (t, t + hs]?
      let flip = false;
      if (nSw > 0) {
        let tEdge = Infinity;
        for (let i = 0; i < nSw; i++) {
          const s = cc.switches[i]!;
          const now = this.switchState[i] === 1;
          if (s.closed(this.t + hs) !== now) {
            let lo = this.t;
            let hi = this.t + hs;
            while (hi - lo > EDGE_RESOLUTION * h) {
              const mid = 0.5 * (lo + hi);
              if (s.closed(mid) === now) lo = mid;
              else hi = mid;
            }
            if (hi < tEdge) tEdge = hi;
          }
        }
        if (tEdge !== Infinity) {
          flip = true;
          hs = tEdge - this.t;
        }
      }
      const tEnd = this.t + hs;
      if (hs > EDGE_RESOLUTION * h) this.stepWithHalving(hs, h);
      if (flip) {
        // the step ended at (or within EDGE_RESOLUTION·h before) the instant: take the new states there
        const tEdge = tEnd;
        this.t = tEdge;
        for (let i = 0; i < nSw; i++) {
          const v = cc.switches[i]!.closed(tEdge) ? 1 : 0;
          if (v !== this.switchState[i]) {
            this.switchState[i] = v;
            this.switchingEvents++;
          }
        }
        this.switchVersion++;
        this.afterDiscontinuity = true;
      }
    }
    this.t = tTarget;
  }

  /** One step of length hs, halved until Newton converges. */
  private stepWithHalving(hs: number, h: number): void {
    let remaining = hs;
    let tries = 0;
    let pieces = 0;
    while (remaining > EDGE_RESOLUTION * h) {
      if (++pieces > MAX_PIECES_PER_STEP) {
        const names = this.cc.diodes.map((d) => d.name);
        throw new TransientConvergenceError(
          `simulate: the step collapsed at t = ${this.t} s (more than ${MAX_PIECES_PER_STEP} sub-steps in one step; nonlinear elements: ${names.join(", ") || "none"})`,
          this.t, this.subStep, names,
        );
      }
      const len = Math.min(remaining, this.subStep);
      const tNew = this.t + len;
      const nonlinear = this.cc.diodes.length > 0;
      if (nonlinear) this.saveHistory();
      if (this.tryStep(tNew, len, this.afterDiscontinuity)) {
        this.t = tNew;
        remaining -= len;
        this.steps++;
        this.afterDiscontinuity = false;
        this.subStep = Math.min(h, this.subStep * 2);
        tries = 0;
      } else {
        if (!nonlinear) {
          throw new TransientConvergenceError(`simulate: the solution became non-finite at t = ${this.t} s`, this.t, len, []);
        }
        this.restoreHistory();
        this.x.set(this.xSaved);
        this.rejected++;
        this.subStep = len / 2;
        if (++tries > MAX_HALVINGS) {
          const names = this.cc.diodes.map((d) => d.name);
          throw new TransientConvergenceError(
            `simulate: Newton's method did not converge at t = ${this.t} s even with the step reduced to ${this.subStep} s (nonlinear elements: ${names.join(", ") || "none"})`,
            this.t, this.subStep, names,
          );
        }
      }
    }
  }

  /** Builds the linear part of the MNA matrix for integration coefficient alpha (1/h or 2/h). */
  private buildBase(alpha: number): void {
    const cc = this.cc;
    const n = this.n;
    const A = this.base;
    A.fill(0);
    const stampG = (a: number, b: number, g: number) => {
      if (a >= 0) A[a * n + a] = A[a * n + a]! + g;
      if (b >= 0) A[b * n + b] = A[b * n + b]! + g;
      if (a >= 0 && b >= 0) {
        A[a * n + b] = A[a * n + b]! - g;
        A[b * n + a] = A[b * n + a]! - g;
      }
    };
    for (const r of cc.resistors) stampG(r.a, r.b, r.g);
    cc.switches.forEach((s, i) => stampG(s.a, s.b, this.switchState[i] ? s.gOn : s.gOff));
    for (const c of cc.capacitors) stampG(c.a, c.b, alpha * c.c);
    for (const v of cc.voltageSources) {
      if (v.a >= 0) {
        A[v.a * n + v.row] = A[v.a * n + v.row]! + 1;
        A[v.row * n + v.a] = A[v.row * n + v.a]! + 1;
      }
      if (v.b >= 0) {
        A[v.b * n + v.row] = A[v.b * n + v.row]! - 1;
        A[v.row * n + v.b] = A[v.row * n + v.b]! - 1;
      }
    }
    for (const l of cc.inductors) {
      const k = l.row;
      if (l.a >= 0) {
        A[l.a * n + k] = A[l.a * n + k]! + 1;
        A[k * n + l.a] = A[k * n + l.a]! + 1;
      }
      if (l.b >= 0) {
        A[l.b * n + k] = A[l.b * n + k]! - 1;
        A[k * n + l.b] = A[k * n + l.b]! - 1;
      }
      A[k * n + k] = A[k * n + k]! - l.r;
      cc.inductors.forEach((m, j) => {
        A[k * n + m.row] = A[k * n + m.row]! - alpha * l.l[j]!;
      });
    }
    this.baseAlpha = alpha;
    this.baseSwitchVersion = this.switchVersion;
  }

  /** LU-factorises `m` in place (lib/math/lu.ts); a zero pivot becomes an error naming the elements. */
  private factor(m: Float64Array): void {
    this.factorizations++;
    try {
      luFactor(m, this.n, this.pivots);
    } catch (e) {
      if (e instanceof SingularMatrixError) this.singular(e.pivotIndex);
      throw e;
    }
  }

  /** Throws a TanklightInputError naming the unknown (and its elements) at a zero pivot. */
  private singular(k: number): never {
    const cc = this.cc;
    let what: string;
    if (k < this.nNodes) {
      what = `node "${cc.nodeNames[k]}" (elements attached: ${cc.attached[k]!.join(", ")})`;
    } else {
      what = cc.unknownNames[k]!;
    }
    throw new TanklightInputError(
      [
        {
          path: "circuit",
          message: `singular circuit matrix at t = ${this.t} s: the ${what} is not determined (e.g. inductors coupled with |k| ≈ 1 in parallel, or element values far out of scale)`,
          value: cc.unknownNames[k],
        },
      ],
      "simulate",
    );
  }

  /** Attempts one step to tNew of length hs; on success x and the history hold the new state. */
  private tryStep(tNew: number, hs: number, backwardEuler: boolean): boolean {
    const cc = this.cc;
    const n = this.n;
    const alpha = backwardEuler ? 1 / hs : 2 / hs;
    const theta = backwardEuler ? 0 : 1;
    if (alpha !== this.baseAlpha || this.baseSwitchVersion !== this.switchVersion) this.buildBase(alpha);

    // right-hand side: sources at tNew and the integration history
    const b = this.rhsBase;
    b.fill(0);
    for (const v of cc.voltageSources) b[v.row] = v.waveform(tNew);
    for (const s of cc.currentSources) {
      const j = s.waveform(tNew);
      if (s.to >= 0) b[s.to] = b[s.to]! + j;
      if (s.from >= 0) b[s.from] = b[s.from]! - j;
    }
    const capList = cc.capacitors;
    for (let i = 0; i < capList.length; i++) {
      const c = capList[i]!;
      const jeq = alpha * c.c * this.capV[i]! + theta * this.capI[i]!;
      if (c.a >= 0) b[c.a] = b[c.a]! + jeq;
      if (c.b >= 0) b[c.b] = b[c.b]! - jeq;
    }
    const indList = cc.inductors;
    const nL = this.nL;
    for (let k = 0; k < nL; k++) {
      const l = indList[k]!;
      let s = 0;
      for (let j = 0; j < nL; j++) s += l.l[j]! * this.indI[j]!;
      b[l.row] = -alpha * s - theta * this.indW[k]!;
    }

    const x = this.x;
    const diodes = cc.diodes;
    const nD = diodes.length;
    if (nD === 0) {
      if (this.factoredAlpha !== alpha || this.factoredVersion !== this.switchVersion) {
        this.work.set(this.base);
        this.factor(this.work);
        this.factoredAlpha = alpha;
        this.factoredVersion = this.switchVersion;
      }
      x.set(b);
      luSolve(this.work, n, this.pivots, x);
      for (let i = 0; i < n; i++) if (!Number.isFinite(x[i]!)) return false;
    } else {
      // Newton from the previous solution
      this.factoredAlpha = NaN;
      const xt = this.xTry;
      for (let d = 0; d < nD; d++) {
        const e = diodes[d]!;
        this.diodeV[d] = (e.a >= 0 ? x[e.a]! : 0) - (e.b >= 0 ? x[e.b]! : 0);
      }
      let converged = false;
      for (let it = 0; it < this.maxNewton; it++) {
        this.newtonIterations++;
        const W = this.work;
        W.set(this.base);
        xt.set(b);
        for (let d = 0; d < nD; d++) {
          const e = diodes[d]!;
          const v0 = this.diodeV[d]!;
          const g = e.model.conductance(v0);
          const i0 = e.model.current(v0);
          this.diodeG[d] = g;
          this.diodeI0[d] = i0;
          const ieq = i0 - g * v0;
          const a = e.a;
          const c = e.b;
          if (a >= 0) {
            W[a * n + a] = W[a * n + a]! + g;
            xt[a] = xt[a]! - ieq;
          }
          if (c >= 0) {
            W[c * n + c] = W[c * n + c]! + g;
            xt[c] = xt[c]! + ieq;
          }
          if (a >= 0 && c >= 0) {
            W[a * n + c] = W[a * n + c]! - g;
            W[c * n + a] = W[c * n + a]! - g;
          }
        }
        this.factor(W);
        luSolve(W, n, this.pivots, xt);
        let ok = true;
        for (let i = 0; i < n; i++) {
          const xi = xt[i]!;
          if (!Number.isFinite(xi)) return false;
          const tol = NEWTON_RELTOL * Math.abs(xi) + (i < this.nNodes ? VOLTAGE_ABSTOL : CURRENT_ABSTOL);
          if (Math.abs(xi - x[i]!) > tol) ok = false;
        }
        for (let d = 0; d < nD; d++) {
          const e = diodes[d]!;
          const v = (e.a >= 0 ? xt[e.a]! : 0) - (e.b >= 0 ? xt[e.b]! : 0);
          if (Math.abs(v - this.diodeV[d]!) > NEWTON_RELTOL * Math.abs(v) + VOLTAGE_ABSTOL) ok = false;
          // current of the linearised diode at the solution (equals model.current(v) at convergence)
          this.diodeI[d] = this.diodeI0[d]! + this.diodeG[d]! * (v - this.diodeV[d]!);
          this.diodeV[d] = v;
        }
        x.set(xt);
        if (ok && it > 0) {
          converged = true;
          break;
        }
      }
      if (!converged) return false;
    }

    // update the history
    for (let i = 0; i < capList.length; i++) {
      const c = capList[i]!;
      const v = (c.a >= 0 ? x[c.a]! : 0) - (c.b >= 0 ? x[c.b]! : 0);
      this.capI[i] = alpha * c.c * (v - this.capV[i]!) - theta * this.capI[i]!;
      this.capV[i] = v;
    }
    for (let k = 0; k < nL; k++) {
      const l = indList[k]!;
      const i = x[l.row]!;
      const v = (l.a >= 0 ? x[l.a]! : 0) - (l.b >= 0 ? x[l.b]! : 0);
      this.indI[k] = i;
      this.indW[k] = v - l.r * i;
    }
    return true;
  }

  /** Writes every element's current at the present solution into slot `slot` of the buffers, in compile order. */
  elementCurrents(t: number, out: Float64Array[], slot: number): void {
    const cc = this.cc;
    const x = this.x;
    let k = 0;
    for (const r of cc.resistors) out[k++]![slot] = r.g * this.across(r.a, r.b);
    for (let i = 0; i < cc.capacitors.length; i++) out[k++]![slot] = this.capI[i]!;
    for (const l of cc.inductors) out[k++]![slot] = x[l.row]!;
    for (const v of cc.voltageSources) out[k++]![slot] = -x[v.row]!;
    for (const s of cc.currentSources) out[k++]![slot] = s.waveform(t);
    for (let i = 0; i < cc.switches.length; i++) {
      const s = cc.switches[i]!;
      out[k++]![slot] = (this.switchState[i] ? s.gOn : s.gOff) * this.across(s.a, s.b);
    }
    for (let d = 0; d < cc.diodes.length; d++) out[k++]![slot] = this.diodeI[d]!;
  }

  /** v(a) − v(b) at the present solution (index −1 is ground). */
  private across(a: number, b: number): number {
    const x = this.x;
    return (a >= 0 ? x[a]! : 0) - (b >= 0 ? x[b]! : 0);
  }
}

/**
 * The voltage between two nodes of a result, v(a) − v(b), V ("ground" allowed on either side).
 * @example voltageBetween(result, "drain", "ground") // the drain waveform
 */
export function voltageBetween(result: TransientResult, a: string, b: string): Float64Array {
  const get = (name: string): Float64Array | undefined => (name === GROUND ? undefined : result.nodeVoltages[name]);
  for (const name of [a, b]) {
    if (name !== GROUND && result.nodeVoltages[name] === undefined) {
      throw new TanklightInputError([{ path: "node", message: "is not a node of this result", value: name, expected: Object.keys(result.nodeVoltages).join(", ") }], "voltageBetween");
    }
  }
  const va = get(a);
  const vb = get(b);
  const out = new Float64Array(result.time.length);
  for (let i = 0; i < out.length; i++) out[i] = (va ? va[i]! : 0) - (vb ? vb[i]! : 0);
  return out;
}

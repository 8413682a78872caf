/**
 * The integrator state of one simulation and its preallocated workspace: the present solution,
 * the reactive elements' history (and a saved copy for rejected steps), the switch states, the
 * diodes' linearisation, the cached linear matrix and its factors. One step at a time
 * ({@link Engine.tryStep}); where the steps fall is decided by ./stepControl.ts.
 * Nothing is allocated per step.
 */
import { TanklightInputError } from "../../errors.ts";
import { luFactorCore, luSolveCore } from "../../math/lu.ts";
import type { CompiledCircuit } from "./compile.ts";
import { TransientConvergenceError } from "./errors.ts";
import { stampDiodes, stampHistory, stampLinear, stampRhs, updateHistory, type ReactiveHistory } from "./stamps.ts";

const VOLTAGE_ABSTOL = 1e-6; // V — Newton convergence floor on node voltages
const CURRENT_ABSTOL = 1e-9; // A — Newton convergence floor on branch currents
const NEWTON_RELTOL = 1e-7;

/** How one step is integrated: backward Euler, the trapezoidal rule, or TR-BDF2. */
export type StepMethod = "euler" | "trapezoidal" | "trbdf2";
/** TR-BDF2's stage fraction γ = 2 − √2: the value at which both stages have the same α = 2/(γh) = 1/(βh), hence one matrix (Bank et al. 1985) */
const TRBDF2_GAMMA = 2 - Math.SQRT2;
const BDF2_A1 = 1 / (TRBDF2_GAMMA * (2 - TRBDF2_GAMMA));
const BDF2_A0 = (1 - TRBDF2_GAMMA) ** 2 / (TRBDF2_GAMMA * (2 - TRBDF2_GAMMA));

function history(cc: CompiledCircuit, initial: boolean): ReactiveHistory {
  return {
    capV: initial ? Float64Array.from(cc.capacitors, (c) => c.v0) : new Float64Array(cc.capacitors.length),
    capI: new Float64Array(cc.capacitors.length),
    indI: initial ? Float64Array.from(cc.inductors, (l) => l.i0) : new Float64Array(cc.inductors.length),
    indW: new Float64Array(cc.inductors.length),
  };
}

/**
 * `columns` zeroed histories side by side, all four arrays views on one buffer (so that saving
 * and restoring the block is one copy): column j of the capacitors at [j·nC, (j + 1)·nC) of
 * capV and capI, likewise the inductors.
 */
function historyBlock(cc: CompiledCircuit, columns: number): ReactiveHistory & { readonly buffer: Float64Array } {
  const nC = columns * cc.capacitors.length;
  const nL = columns * cc.inductors.length;
  const buffer = new Float64Array(2 * nC + 2 * nL);
  return {
    buffer,
    capV: buffer.subarray(0, nC),
    capI: buffer.subarray(nC, 2 * nC),
    indI: buffer.subarray(2 * nC, 2 * nC + nL),
    indW: buffer.subarray(2 * nC + nL),
  };
}

/** Column j of a {@link historyBlock}, as views on its arrays (writes go to the block). */
function historyColumn(block: ReactiveHistory, nC: number, nL: number, j: number): ReactiveHistory {
  return {
    capV: block.capV.subarray(j * nC, (j + 1) * nC),
    capI: block.capI.subarray(j * nC, (j + 1) * nC),
    indI: block.indI.subarray(j * nL, (j + 1) * nL),
    indW: block.indW.subarray(j * nL, (j + 1) * nL),
  };
}

/**
 * The sensitivities of the history to the state written by {@link Engine.writeState}: one
 * history per state variable j (∂history/∂state₀[j]), all held in one block so that saving,
 * restoring and the TR-BDF2 stage copy are a few array copies a step.
 */
interface Sensitivities {
  /** the columns side by side (historyBlock) */
  readonly block: ReactiveHistory & { readonly buffer: Float64Array };
  /** column j as views on `block` */
  readonly columns: readonly ReactiveHistory[];
  /** `block`'s buffer saved before a step that may be rejected */
  readonly saved: Float64Array;
  /** capacitor voltages and inductor currents of every column at the start of a TR-BDF2 step */
  readonly stageCapV: Float64Array;
  readonly stageIndI: Float64Array;
  /** workspace: every column's right-hand side and solution, column j at [j·n, (j + 1)·n) */
  readonly rhs: Float64Array;
  /** column j of `rhs` as a view */
  readonly rhsColumns: readonly Float64Array[];
}

/** Replaces the state of `h` (at t + γh) by TR-BDF2's BDF2 starting point a₁·x_γ − a₀·x, x the state at t. */
function bdf2Point(h: ReactiveHistory, capV0: Float64Array, indI0: Float64Array): void {
  for (let i = 0; i < h.capV.length; i++) h.capV[i] = BDF2_A1 * h.capV[i]! - BDF2_A0 * capV0[i]!;
  for (let k = 0; k < h.indI.length; k++) h.indI[k] = BDF2_A1 * h.indI[k]! - BDF2_A0 * indI0[k]!;
}

/**
 * Solves A·X = B in place for `m` right-hand sides side by side in `b` (column c at [c·n, (c + 1)·n))
 * with the factors of lib/math/lu.ts's luFactorCore: its forward and back substitution (Golub &
 * Van Loan 2013, Algorithms 3.1.1–3.1.2) with each factor entry read once for all columns, and
 * zero entries skipped (MNA factors are mostly zeros).
 */
function solveColumns(a: Float64Array, n: number, pivots: Int32Array, b: Float64Array, m: number): void {
  for (let k = 0; k < n; k++) {
    const p = pivots[k]!;
    if (p === k) continue;
    for (let c = 0; c < m * n; c += n) {
      const t = b[c + k]!;
      b[c + k] = b[c + p]!;
      b[c + p] = t;
    }
  }
  for (let i = 1; i < n; i++) {
    for (let j = 0; j < i; j++) {
      const l = a[i * n + j]!;
      if (l !== 0) for (let c = 0; c < m * n; c += n) b[c + i] = b[c + i]! - l * b[c + j]!;
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    for (let j = i + 1; j < n; j++) {
      const u = a[i * n + j]!;
      if (u !== 0) for (let c = 0; c < m * n; c += n) b[c + i] = b[c + i]! - u * b[c + j]!;
    }
    const inv = 1 / a[i * n + i]!;
    for (let c = 0; c < m * n; c += n) b[c + i] = b[c + i]! * inv;
  }
}

/** A run's counters, as a transient result reports them. */
export interface EngineStats {
  /** accepted integration steps, including sub-steps */
  readonly steps: number;
  /** steps halved because Newton's method failed */
  readonly rejectedSteps: number;
  readonly newtonIterations: number;
  readonly factorizations: number;
  readonly switchingEvents: number;
}

/** The integrator state and its preallocated workspace. */
export class Engine {
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
  private readonly hist: ReactiveHistory;
  private readonly saved: ReactiveHistory;
  /**
   * Sensitivities of the state to the state written by {@link writeState} (one history per
   * state variable: column j is ∂(history)/∂state₀[j]), present once {@link trackSensitivities}
   * was called, propagated only while `sensitivities` is true.
   */
  private sens: Sensitivities | undefined;
  /** propagate the sensitivities in each step (set by {@link trackSensitivities}) */
  private sensitivities = false;
  /** capacitor voltages and inductor currents at the start of a TR-BDF2 step */
  private readonly stageCapV: Float64Array;
  private readonly stageIndI: Float64Array;
  /** 1 closed, 0 open, per switch */
  readonly switchState: Uint8Array;
  private readonly diodeV: Float64Array;
  /** diode currents of the last accepted solution (linearised at the converged voltage), A */
  private readonly diodeI: Float64Array;
  private readonly diodeG: Float64Array;
  private readonly diodeI0: Float64Array;
  private readonly maxNewton: number;
  // cache of the linear matrix
  private baseAlpha = NaN;
  private baseSwitchVersion = -1;
  /** bumped whenever a switch state changes (invalidates the cached matrix) */
  switchVersion = 0;
  private factoredAlpha = NaN;
  private factoredVersion = -1;
  /** simulated time of the present solution, s */
  t = 0;
  /** the next step must be backward Euler (start, or just after a switching instant) */
  afterDiscontinuity = true;
  /** full-length steps still to be taken by TR-BDF2 after a restart (./stepControl.ts) */
  stableSteps = 0;
  /** present sub-step length, s (halved on Newton failure, grown back 1.5× a step on success) */
  subStep = 0;
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
    this.hist = history(cc, true);
    this.saved = history(cc, false);
    this.stageCapV = new Float64Array(cc.capacitors.length);
    this.stageIndI = new Float64Array(cc.inductors.length);
    this.switchState = new Uint8Array(cc.switches.length);
    this.diodeV = new Float64Array(cc.diodes.length);
    this.diodeI = new Float64Array(cc.diodes.length);
    this.diodeG = new Float64Array(cc.diodes.length);
    this.diodeI0 = new Float64Array(cc.diodes.length);
  }

  /** The counters so far (a copy: the engine keeps counting). */
  stats(): EngineStats {
    return {
      steps: this.steps,
      rejectedSteps: this.rejected,
      newtonIterations: this.newtonIterations,
      factorizations: this.factorizations,
      switchingEvents: this.switchingEvents,
    };
  }

  /** Sets the switch states at t = 0 and solves the t = 0 network (a backward-Euler step of 1e-4·h, state then restored). */
  start(h: number): void {
    this.cc.switches.forEach((s, i) => (this.switchState[i] = s.closed(0) ? 1 : 0));
    this.switchVersion++;
    this.subStep = h;
    this.saveHistory();
    const h0 = 1e-4 * h;
    if (!this.tryStep(h0, h0, "euler")) {
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
    out.set(this.hist.capV, 0);
    out.set(this.hist.indI, this.hist.capV.length);
  }

  /**
   * Sets the state variables (capacitor voltages, then inductor currents, as {@link readState}
   * gives them) at time t, s, with the switches as their gates say there; the next step is a
   * short backward-Euler restart of `subStep` s (no trapezoidal history carried over), then the
   * restart ramp with `stableSteps` full TR-BDF2 steps (./stepControl.ts).
   */
  writeState(state: Float64Array, t: number, subStep: number, stableSteps: number): void {
    const nC = this.hist.capV.length;
    this.hist.capV.set(state.subarray(0, nC));
    this.hist.indI.set(state.subarray(nC, nC + this.hist.indI.length));
    this.hist.capI.fill(0);
    this.hist.indW.fill(0);
    this.t = t;
    this.cc.switches.forEach((s, i) => (this.switchState[i] = s.closed(t) ? 1 : 0));
    this.switchVersion++;
    this.afterDiscontinuity = true;
    this.subStep = subStep;
    this.stableSteps = stableSteps;
    if (this.sens) {
      const { block } = this.sens;
      const nL = this.hist.indI.length;
      block.buffer.fill(0);
      for (let j = 0; j < nC + nL; j++) {
        if (j < nC) block.capV[j * nC + j] = 1;
        else block.indI[j * nL + j - nC] = 1;
      }
    }
  }

  /**
   * Turns on (or off) the propagation of the state's sensitivities to the state written by the
   * next {@link writeState}: each step then also solves, with the step's own factors, for how
   * its result moves with the history (the exact derivative of the discrete step, Newton's
   * last linearisation standing in for the converged one). Costs one triangular solve per
   * state variable a stage.
   */
  trackSensitivities(on: boolean): void {
    this.sensitivities = on;
    if (!on || this.sens) return;
    const nC = this.cc.capacitors.length;
    const nL = this.cc.inductors.length;
    const nS = nC + nL;
    const block = historyBlock(this.cc, nS);
    const rhs = new Float64Array(nS * this.n);
    this.sens = {
      block,
      columns: Array.from({ length: nS }, (_, j) => historyColumn(block, nC, nL, j)),
      saved: new Float64Array(block.buffer.length),
      stageCapV: new Float64Array(nS * nC),
      stageIndI: new Float64Array(nS * nL),
      rhs,
      rhsColumns: Array.from({ length: nS }, (_, j) => rhs.subarray(j * this.n, (j + 1) * this.n)),
    };
  }

  /**
   * Writes ∂state/∂state₀ (row-major nS×nS: row k the state variable in {@link readState}'s
   * order, column j the start value it is differentiated by) into `out`.
   */
  readSensitivities(out: Float64Array): void {
    const sens = this.sens;
    if (!sens) throw new Error("Engine.readSensitivities: trackSensitivities was not called");
    const nC = this.hist.capV.length;
    const nS = sens.columns.length;
    for (let j = 0; j < nS; j++) {
      const sh = sens.columns[j]!;
      for (let k = 0; k < nS; k++) out[k * nS + j] = k < nC ? sh.capV[k]! : sh.indI[k - nC]!;
    }
  }

  /** Saves the history and the solution (before a step that may be rejected). */
  saveHistory(): void {
    this.saved.capV.set(this.hist.capV);
    this.saved.capI.set(this.hist.capI);
    this.saved.indI.set(this.hist.indI);
    this.saved.indW.set(this.hist.indW);
    this.xSaved.set(this.x);
    if (this.sensitivities) this.sens!.saved.set(this.sens!.block.buffer);
  }

  /** Restores the history saved by {@link saveHistory} (not the solution). */
  restoreHistory(): void {
    this.hist.capV.set(this.saved.capV);
    this.hist.capI.set(this.saved.capI);
    this.hist.indI.set(this.saved.indI);
    this.hist.indW.set(this.saved.indW);
    if (this.sensitivities) this.sens!.block.buffer.set(this.sens!.saved);
  }

  /** Restores the solution saved by {@link saveHistory}. */
  restoreSolution(): void {
    this.x.set(this.xSaved);
  }

  /**
   * LU-factorises `m` in place (lib/math/lu.ts, the unchecked core: the engine's matrices are
   * its own); a zero pivot becomes an error naming the elements. A non-finite entry (a diode
   * driven far beyond its range) leaves non-finite factors, so the solution is non-finite and
   * the step is halved.
   */
  private factor(m: Float64Array): void {
    this.factorizations++;
    const bad = luFactorCore(m, this.n, this.pivots);
    if (bad >= 0) this.singular(bad);
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

  /**
   * Attempts one step to tNew of length hs by `method`; on success x and the history hold the
   * new state. "trbdf2" is TR-BDF2 (Bank, Coughran, Fichtner, Grosse, Rose & Smith, IEEE Trans.
   * CAD 4(4):436–451, 1985): a trapezoidal stage to t + γ·hs, γ = 2 − √2, then a BDF2 stage
   * to tNew through the two points — second order and L-stable (a stiff mode is damped, not
   * reflected as the trapezoidal rule reflects it).
   */
  tryStep(tNew: number, hs: number, method: StepMethod): boolean {
    if (method === "trbdf2") {
      const sens = this.sensitivities ? this.sens! : undefined;
      this.stageCapV.set(this.hist.capV);
      this.stageIndI.set(this.hist.indI);
      if (sens) {
        sens.stageCapV.set(sens.block.capV);
        sens.stageIndI.set(sens.block.indI);
      }
      const alpha = 2 / (TRBDF2_GAMMA * hs); // = 1/(β·hs), β = (1 − γ)/(2 − γ) = γ/2
      if (!this.solveStage(tNew - (1 - TRBDF2_GAMMA) * hs, alpha, 1)) return false;
      // BDF2 through (t, t + γh, t + h): x₊ − a₁x_γ + a₀x = β·h·x′₊ is a backward-Euler
      // step of length β·h from the point a₁x_γ − a₀x (a₁ − a₀ = 1)
      bdf2Point(this.hist, this.stageCapV, this.stageIndI);
      if (sens) bdf2Point(sens.block, sens.stageCapV, sens.stageIndI);
      return this.solveStage(tNew, alpha, 0);
    }
    return method === "euler" ? this.solveStage(tNew, 1 / hs, 0) : this.solveStage(tNew, 2 / hs, 1);
  }

  /** One implicit solve to tNew with integration coefficient alpha (1/s) and θ (1 trapezoidal, 0 backward Euler); updates the history. */
  private solveStage(tNew: number, alpha: number, theta: number): boolean {
    if (alpha !== this.baseAlpha || this.baseSwitchVersion !== this.switchVersion) {
      stampLinear(this.cc, this.base, this.n, alpha, this.switchState);
      this.baseAlpha = alpha;
      this.baseSwitchVersion = this.switchVersion;
    }
    stampRhs(this.cc, this.rhsBase, tNew, alpha, theta, this.hist);
    const ok = this.cc.diodes.length === 0 ? this.solveLinear(alpha) : this.solveNewton();
    if (!ok) return false;
    updateHistory(this.cc, this.x, alpha, theta, this.hist);
    if (this.sensitivities) {
      // the step's result depends on the history through the right-hand side only: the same
      // factors (this.work) carry each sensitivity column through the step
      const { columns, rhs, rhsColumns } = this.sens!;
      rhs.fill(0);
      for (let j = 0; j < columns.length; j++) stampHistory(this.cc, rhsColumns[j]!, alpha, theta, columns[j]!);
      solveColumns(this.work, this.n, this.pivots, rhs, columns.length);
      for (let j = 0; j < columns.length; j++) updateHistory(this.cc, rhsColumns[j]!, alpha, theta, columns[j]!);
    }
    return true;
  }

  /** A linear circuit: one solve with the cached factors (refactored when α or a switch changed). */
  private solveLinear(alpha: number): boolean {
    const n = this.n;
    if (this.factoredAlpha !== alpha || this.factoredVersion !== this.switchVersion) {
      this.work.set(this.base);
      this.factor(this.work);
      this.factoredAlpha = alpha;
      this.factoredVersion = this.switchVersion;
    }
    const x = this.x;
    x.set(this.rhsBase);
    luSolveCore(this.work, n, this.pivots, x);
    for (let i = 0; i < n; i++) if (!Number.isFinite(x[i]!)) return false;
    return true;
  }

  /**
   * Newton on the diodes from the previous solution: each iteration stamps the diodes
   * linearised at their present voltages, solves, and stops when every unknown and every diode
   * voltage moved less than NEWTON_RELTOL·|x| + the absolute floor (after at least two iterations).
   */
  private solveNewton(): boolean {
    const n = this.n;
    const x = this.x;
    const diodes = this.cc.diodes;
    const nD = diodes.length;
    this.factoredAlpha = NaN;
    const xt = this.xTry;
    for (let d = 0; d < nD; d++) {
      const e = diodes[d]!;
      this.diodeV[d] = (e.a >= 0 ? x[e.a]! : 0) - (e.b >= 0 ? x[e.b]! : 0);
    }
    for (let it = 0; it < this.maxNewton; it++) {
      this.newtonIterations++;
      const W = this.work;
      W.set(this.base);
      xt.set(this.rhsBase);
      stampDiodes(this.cc, W, xt, n, this.diodeV, this.diodeG, this.diodeI0);
      this.factor(W);
      luSolveCore(W, n, this.pivots, xt);
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
      if (ok && it > 0) return true;
    }
    return false;
  }

  /** Writes every element's current at the present solution into slot `slot` of the buffers, in compile order. */
  elementCurrents(t: number, out: readonly Float64Array[], slot: number): void {
    const cc = this.cc;
    const x = this.x;
    let k = 0;
    for (const r of cc.resistors) out[k++]![slot] = r.g * this.across(r.a, r.b);
    for (let i = 0; i < cc.capacitors.length; i++) out[k++]![slot] = this.hist.capI[i]!;
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

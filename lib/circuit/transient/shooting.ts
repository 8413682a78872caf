/**
 * Periodic steady state by the shooting method (Aprille & Trick, "Steady-state analysis of
 * nonlinear circuits with periodic inputs", Proc. IEEE 60(1):108–114, 1972): Newton's method on
 * the state at the start of a period, x₀, so that one period of time stepping maps it onto
 * itself, Φ_T(x₀) = x₀. The Jacobian of the period map (the sensitivity, or monodromy, matrix)
 * is integrated along with the period, as Aprille & Trick do: each step also carries the
 * state's derivative with respect to x₀ through the step's own factors (Engine.
 * trackSensitivities; one triangular solve per state variable a stage, ≈ 1.4× the cost of a
 * plain period for a switch + tank + LED token). Newton therefore costs one period an
 * iteration instead of one per state variable with finite differences; once a step has cut
 * the mismatch a hundredfold the last matrix is kept (chord steps, no sensitivities). The
 * period that meets the tolerance is the one returned.
 */
import { solveLinear } from "../../math/lu.ts";
import { requireObject, requirePositive, TanklightInputError } from "../../errors.ts";
import type { TransientCircuit } from "./circuit.ts";
import { compileCircuit, type CompiledCircuit } from "./compile.ts";
import { Engine } from "./engine.ts";
import { Recorder, type Recording } from "./recorder.ts";
import { cycleChange } from "./steadyState.ts";
import { advanceTo, RESTART_FRACTION, RESTART_FULL_STEPS } from "./stepControl.ts";
import type { TransientResult } from "./simulate.ts";

/** Options of {@link periodicSteadyState}. */
export interface ShootingOptions {
  /** drive frequency, Hz, > 0 (every source and gate must be periodic in 1/frequency) */
  readonly frequency: number;
  /** time steps per period, integer ≥ 8 */
  readonly stepsPerCycle: number;
  /**
   * largest distance of the returned period's start from the periodic orbit (the size of the
   * Newton step that would follow), relative to each state variable's peak over the period as
   * plain stepping's `untilSteady` measures it (steadyState.ts); default 1e-9
   */
  readonly tolerance?: number;
  /** Newton iterations, default 20 */
  readonly maxIterations?: number;
  /** plain periods integrated before Newton starts: default 1 from rest, 0 when `initialState` is given */
  readonly warmupCycles?: number;
  /**
   * a starting guess for Newton (e.g. from a describing-function or harmonic-balance solution):
   * capacitor voltages, V, and inductor currents, A, at the start of a period, by element name;
   * unnamed ones start from the end of the warm-up (from their initial values when there is none)
   */
  readonly initialState?: Readonly<Record<string, number>>;
}

/** The periodic steady state: one recorded period, and what the Newton iteration took. */
export interface ShootingResult extends TransientResult {
  readonly shooting: {
    readonly converged: boolean;
    readonly iterations: number;
    /** whole periods integrated, warm-up included (a period with sensitivities counts as one) */
    readonly periods: number;
    /** the returned period's mismatch |Φ_T(x₀) − x₀|, relative to each variable's peak */
    readonly residual: number;
    /** the returned period's distance from the orbit, |Newton step|, relative to each variable's peak (what `tolerance` bounds) */
    readonly estimatedError: number;
  };
}

/**
 * Periodic steady state of a periodically driven circuit by the shooting method.
 * @param circuit the elements (circuit.ts); opts frequency (Hz), stepsPerCycle, tolerance, maxIterations, warmupCycles, initialState.
 * @returns one period of waveforms (as simulate returns them) plus `shooting` (converged, iterations, periods, residual, estimatedError).
 * @throws TanklightInputError for bad options; TransientConvergenceError from the time stepping.
 * @example periodicSteadyState(bridgeDrive({ supply: 5, frequency: 2e5, bridge: "full", coilInductance: 1e-5, tankCapacitance: 6.33e-8 }).circuit, { frequency: 2e5, stepsPerCycle: 200 }).shooting.converged // → true
 */
export function periodicSteadyState(circuit: TransientCircuit, opts: ShootingOptions): ShootingResult {
  const where = "periodicSteadyState";
  requireObject(circuit, "circuit", where);
  requireObject(opts, "opts", where);
  const f = requirePositive(opts.frequency, "frequency", "Hz", where);
  const spc = opts.stepsPerCycle;
  if (!(Number.isInteger(spc) && spc >= 8)) throw new TanklightInputError([{ path: "stepsPerCycle", message: "must be an integer ≥ 8", value: spc }], where);
  const tol = opts.tolerance ?? 1e-9;
  const maxIter = opts.maxIterations ?? 20;
  const cc = compileCircuit(circuit);
  const seed = opts.initialState === undefined ? undefined : seedState(cc, opts.initialState, where);
  const warm = opts.warmupCycles ?? (seed ? 0 : 1);
  const h = 1 / (f * spc);
  const T = spc * h;
  const engine = new Engine(cc, 50);
  engine.start(h);
  for (let n = 1; n <= warm * spc; n++) advanceTo(engine, n * h, h);
  const t0 = warm * T;
  const nC = cc.capacitors.length;
  const nS = nC + cc.inductors.length;
  let periods = warm;
  const recorder = new Recorder(cc, spc);
  const nS2 = nS * nS;
  const monodromy = new Float64Array(nS2);
  const now = new Float64Array(nS);
  const peak = new Float64Array(nS);
  // one period from x0 (samples t0 + h … t0 + T recorded: the last period is the result), with
  // the sensitivities if asked, and each state variable's peak over it
  const period = (x0: Float64Array, out: Float64Array, sensitivities: boolean): void => {
    engine.trackSensitivities(sensitivities);
    engine.writeState(x0, t0, RESTART_FRACTION * h, RESTART_FULL_STEPS);
    for (let k = 0; k < nS; k++) peak[k] = Math.abs(x0[k]!);
    for (let n = 1; n <= spc; n++) {
      advanceTo(engine, t0 + n * h, h);
      recorder.record(t0 + n * h, engine);
      engine.readState(now);
      for (let k = 0; k < nS; k++) peak[k] = Math.max(peak[k]!, Math.abs(now[k]!));
    }
    engine.readState(out);
    if (sensitivities) engine.readSensitivities(monodromy);
    periods++;
  };
  const x0 = new Float64Array(nS);
  engine.readState(x0);
  if (seed) for (const [k, v] of seed) x0[k] = v;
  const x1 = new Float64Array(nS);
  const zero = new Float64Array(nS);
  const b = new Float64Array(nS);
  let residual = Infinity;
  let lastResidual = Infinity;
  let estimatedError = Infinity;
  let jac: Float64Array | undefined;
  let converged = false;
  let iterations = 0;
  for (; iterations < maxIter; iterations++) {
    // the monodromy matrix ∂Φ/∂x₀ comes with the period (Engine.trackSensitivities); once a
    // Newton step has cut the mismatch a hundredfold the last one is kept (chord steps)
    const fresh = jac === undefined || !(residual <= 0.01 * lastResidual && lastResidual < Infinity);
    lastResidual = residual;
    period(x0, x1, fresh);
    // the mismatch as plain stepping's steady-state detector measures a cycle's change
    residual = cycleChange(cc, x1, x0, peak);
    if (fresh) {
      jac = new Float64Array(nS2);
      for (let k = 0; k < nS2; k++) jac[k] = monodromy[k]! - (k % (nS + 1) === 0 ? 1 : 0);
    }
    // Newton: (∂Φ/∂x₀ − I)·Δ = x₀ − Φ(x₀); |Δ| is this period's distance from the orbit
    for (let k = 0; k < nS; k++) b[k] = x0[k]! - x1[k]!;
    const dx = residual === 0 ? zero : solveLinear(jac!, b);
    estimatedError = cycleChange(cc, dx, zero, peak);
    if (estimatedError <= tol) {
      converged = true;
      break;
    }
    for (let k = 0; k < nS; k++) x0[k] = x0[k]! + dx[k]!;
  }
  return {
    ...periodicRecording(recorder.finish(), t0),
    step: h,
    stats: engine.stats(),
    warnings: converged ? [...engine.warnings] : [...engine.warnings, `${where}: shooting did not converge in ${maxIter} Newton iterations (distance from the orbit ${estimatedError.toExponential(2)}, tolerance ${tol})`],
    shooting: { converged, iterations, periods, residual, estimatedError },
  };
}

/** The indices (into readState's order) and values of an initial-state guess, checked against the circuit's capacitors and inductors. */
function seedState(cc: CompiledCircuit, state: Readonly<Record<string, number>>, where: string): [number, number][] {
  requireObject(state, "initialState", where);
  const names = [...cc.capacitors.map((c) => c.name), ...cc.inductors.map((l) => l.name)];
  return Object.entries(state).map(([name, v]) => {
    const k = names.indexOf(name);
    if (k < 0) throw new TanklightInputError([{ path: `initialState.${name}`, message: "is not a capacitor or inductor of the circuit", value: name, expected: names.join(", ") }], where);
    if (typeof v !== "number" || !Number.isFinite(v)) throw new TanklightInputError([{ path: `initialState.${name}`, message: `must be a finite number (${k < cc.capacitors.length ? "V" : "A"})`, value: v }], where);
    return [k, v];
  });
}

/**
 * One period's samples t0 + h … t0 + T with the sample at t0 put in front: the state there is
 * the state at t0 + T (periodic to the tolerance), and like plain stepping's sample at a
 * switching instant it is taken before the switches act.
 */
function periodicRecording(r: Recording, t0: number): Recording {
  const wrap = (a: Float64Array): Float64Array => {
    const out = new Float64Array(a.length + 1);
    out[0] = a[a.length - 1]!;
    out.set(a, 1);
    return out;
  };
  const time = wrap(r.time);
  time[0] = t0;
  const map = (o: Record<string, Float64Array>) => Object.fromEntries(Object.entries(o).map(([k, v]) => [k, wrap(v)]));
  return { time, nodeVoltages: map(r.nodeVoltages), currents: map(r.currents) };
}

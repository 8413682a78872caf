/**
 * Periodic steady state by the shooting method (Aprille & Trick, "Steady-state analysis of
 * nonlinear circuits with periodic inputs", Proc. IEEE 60(1):108–114, 1972): Newton's method on
 * the state at the start of a period, x₀, so that one period of time stepping maps it onto
 * itself, Φ_T(x₀) = x₀. The Jacobian of the period map (the sensitivity, or monodromy, matrix)
 * is formed by finite differences — one extra period per state variable — which for the small
 * circuits here (a drive tank, a token tank: four to six states) costs far less than the ≈ Q
 * periods that plain stepping needs to settle a high-Q tank.
 */
import { solveLinear } from "../../math/lu.ts";
import { requirePositive, TanklightInputError } from "../../errors.ts";
import type { TransientCircuit } from "./circuit.ts";
import { compileCircuit } from "./compile.ts";
import { Engine } from "./engine.ts";
import { Recorder } from "./recorder.ts";
import { advanceTo, RESTART_FRACTION, RESTART_FULL_STEPS } from "./stepControl.ts";
import type { TransientResult } from "./simulate.ts";

/** Options of {@link periodicSteadyState}. */
export interface ShootingOptions {
  /** drive frequency, Hz, > 0 (every source and gate must be periodic in 1/frequency) */
  readonly frequency: number;
  /** time steps per period, integer ≥ 8 */
  readonly stepsPerCycle: number;
  /** largest |Φ_T(x₀) − x₀| relative to each kind's largest state (V or A), default 1e-9 */
  readonly tolerance?: number;
  /** Newton iterations, default 20 */
  readonly maxIterations?: number;
  /** plain periods integrated before Newton starts (from rest), default 2 */
  readonly warmupCycles?: number;
}

/** The periodic steady state: one recorded period, and what the Newton iteration took. */
export interface ShootingResult extends TransientResult {
  readonly shooting: {
    readonly converged: boolean;
    readonly iterations: number;
    /** whole periods integrated, warm-up, Newton and finite differences included */
    readonly periods: number;
    /** the final relative mismatch |Φ_T(x₀) − x₀| */
    readonly residual: number;
  };
}

/**
 * Periodic steady state of a periodically driven circuit by the shooting method.
 * @param circuit the elements (circuit.ts); opts frequency (Hz), stepsPerCycle, tolerance, maxIterations, warmupCycles.
 * @returns one period of waveforms (as simulate returns them) plus `shooting` (converged, iterations, periods, residual).
 * @throws TanklightInputError for bad options; TransientConvergenceError from the time stepping.
 * @example periodicSteadyState(bridgeDrive({ supply: 5, frequency: 2e5, bridge: "full", coilInductance: 1e-5, tankCapacitance: 6.33e-8 }).circuit, { frequency: 2e5, stepsPerCycle: 200 }).shooting.converged // → true
 */
export function periodicSteadyState(circuit: TransientCircuit, opts: ShootingOptions): ShootingResult {
  const where = "periodicSteadyState";
  const f = requirePositive(opts.frequency, "frequency", "Hz", where);
  const spc = opts.stepsPerCycle;
  if (!(Number.isInteger(spc) && spc >= 8)) throw new TanklightInputError([{ path: "stepsPerCycle", message: "must be an integer ≥ 8", value: spc }], where);
  const tol = opts.tolerance ?? 1e-9;
  const maxIter = opts.maxIterations ?? 20;
  const warm = opts.warmupCycles ?? 2;
  const h = 1 / (f * spc);
  const T = spc * h;
  const cc = compileCircuit(circuit);
  const engine = new Engine(cc, 50);
  engine.start(h);
  for (let n = 1; n <= warm * spc; n++) advanceTo(engine, n * h, h);
  const t0 = warm * T;
  const nC = cc.capacitors.length;
  const nS = nC + cc.inductors.length;
  let periods = warm;
  const period = (x0: Float64Array, out: Float64Array, recorder?: Recorder): void => {
    engine.writeState(x0, t0, RESTART_FRACTION * h, RESTART_FULL_STEPS);
    recorder?.record(t0, engine);
    for (let n = 1; n <= spc; n++) {
      advanceTo(engine, t0 + n * h, h);
      recorder?.record(t0 + n * h, engine);
    }
    engine.readState(out);
    periods++;
  };
  const x0 = new Float64Array(nS);
  engine.readState(x0);
  const x1 = new Float64Array(nS);
  const xp = new Float64Array(nS);
  const y = new Float64Array(nS);
  const scales = (x: Float64Array): [number, number] => {
    let v = 1e-12;
    let i = 1e-15;
    for (let k = 0; k < nS; k++) {
      if (k < nC) v = Math.max(v, Math.abs(x[k]!));
      else i = Math.max(i, Math.abs(x[k]!));
    }
    return [v, i];
  };
  let residual = Infinity;
  let lastResidual = Infinity;
  let jac: Float64Array | undefined;
  let converged = false;
  let iterations = 0;
  for (; iterations < maxIter; iterations++) {
    period(x0, x1);
    const [sv, si] = scales(x1);
    residual = 0;
    for (let k = 0; k < nS; k++) residual = Math.max(residual, Math.abs(x1[k]! - x0[k]!) / (k < nC ? sv : si));
    if (residual <= tol) {
      converged = true;
      break;
    }
    // J = ∂Φ/∂x₀ by forward differences, formed once and kept while each step cuts the
    // mismatch at least tenfold (a chord Newton: the period map of these circuits is nearly
    // linear, so one Jacobian usually serves to the end); solve (J − I)·Δ = x₀ − Φ(x₀)
    if (jac === undefined || residual > 0.1 * lastResidual) {
      jac = new Float64Array(nS * nS);
      for (let j = 0; j < nS; j++) {
        const d = 1e-7 * (j < nC ? sv : si);
        xp.set(x0);
        xp[j] = xp[j]! + d;
        period(xp, y);
        for (let k = 0; k < nS; k++) jac[k * nS + j] = (y[k]! - x1[k]!) / d - (k === j ? 1 : 0);
      }
    }
    lastResidual = residual;
    const b = new Float64Array(nS);
    for (let k = 0; k < nS; k++) b[k] = x0[k]! - x1[k]!;
    const dx = solveLinear(jac.slice(), b);
    for (let k = 0; k < nS; k++) x0[k] = x0[k]! + dx[k]!;
  }
  const recorder = new Recorder(cc, spc + 1);
  period(x0, x1, recorder);
  return {
    ...recorder.finish(),
    step: h,
    stats: {
      steps: engine.steps,
      rejectedSteps: engine.rejected,
      newtonIterations: engine.newtonIterations,
      factorizations: engine.factorizations,
      switchingEvents: engine.switchingEvents,
    },
    warnings: converged ? [...engine.warnings] : [...engine.warnings, `${where}: shooting did not converge in ${maxIter} Newton iterations (relative mismatch ${residual.toExponential(2)}, tolerance ${tol})`],
    shooting: { converged, iterations, periods, residual },
  };
}

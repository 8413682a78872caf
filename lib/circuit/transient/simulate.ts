/**
 * The time-domain engine: modified nodal analysis (Ho, Ruehli & Brennan, IEEE Trans.
 * Circuits Syst. 22(6):504–509, 1975) — node voltages plus the branch currents of voltage
 * sources and inductors as unknowns — integrated with the trapezoidal rule, with a
 * backward-Euler step at the start, and after every switching instant a short backward-Euler
 * step and an L-stable TR-BDF2 ramp back to the full step (Bank et al. 1985; the cure for the
 * trapezoidal rule's undamped ringing after a discontinuity, ./stepControl.ts). Mutual inductance enters as
 * the coupled branch equations v_k = R_k i_k + Σ_j L_kj di_j/dt. Diodes are linearised
 * (companion conductance and current) and solved by Newton's method; a step whose Newton
 * iteration fails is halved and retried. Steady state is detected by cycle-to-cycle
 * convergence of the state (capacitor voltages, inductor currents) with a geometric
 * estimate of the remaining distance.
 *
 * Hot loop: all matrices and vectors are allocated once; nothing is allocated per step.
 *
 * The pieces: ./simulateOptions.ts (options → run plan), ./engine.ts (state and one step),
 * ./stamps.ts (MNA stamps), ./stepControl.ts (switching instants, step halving),
 * ./steadyState.ts (cycle-to-cycle convergence), ./recorder.ts (the kept samples).
 */

import { TanklightInputError } from "../../errors.ts";
import { GROUND, type TransientCircuit } from "./circuit.ts";
import { compileCircuit } from "./compile.ts";
import { Engine, type EngineStats } from "./engine.ts";
import { Recorder } from "./recorder.ts";
import { resolveOptions, type SimulateOptions } from "./simulateOptions.ts";
import { SteadyStateTracker, type SteadyState } from "./steadyState.ts";
import { advanceTo } from "./stepControl.ts";

export type { SteadyState } from "./steadyState.ts";
export { SimulateOptions } from "./simulateOptions.ts";

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
  /** steps, rejected steps, Newton iterations, factorizations, switching events */
  readonly stats: EngineStats;
  readonly warnings: string[];
}

/**
 * Simulates a circuit in the time domain from rest (capacitor voltages and inductor currents
 * at their initial values, default 0) and returns its sampled waveforms.
 *
 * Method: MNA (Ho, Ruehli & Brennan 1975); trapezoidal rule (second order, A-stable, energy
 * conserving for lossless LC) with backward Euler at t = 0 and a TR-BDF2 restart after each switching instant;
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
  const plan = resolveOptions(opts);
  const { h, nGrid, progress } = plan;
  const cc = compileCircuit(circuit);
  const engine = new Engine(cc, plan.maxNewton);
  const recorder = new Recorder(cc, plan.keep);
  engine.start(h);
  recorder.record(0, engine);
  const tracker = plan.steady ? new SteadyStateTracker(cc, engine, plan.stepsPerCycle!, plan.steady.tolerance, plan.steady.minCycles) : undefined;
  const progressEvery = Math.max(1, Math.floor(nGrid / 100));
  let n = 1;
  for (; n <= nGrid; n++) {
    advanceTo(engine, n * h, h);
    recorder.record(n * h, engine);
    if (tracker?.afterStep(engine, n)) break;
    if (progress && n % progressEvery === 0) progress(n / nGrid, n * h);
  }
  if (progress) progress(1, Math.min(n, nGrid) * h);
  const warnings = plan.warnings;
  const steady: SteadyState | undefined = tracker?.verdict;
  if (tracker && !steady?.reached) {
    warnings.push(
      `steady state not reached by ${plan.stop} s (${tracker.cyclesDone} cycles; estimated remaining change ${steady?.estimatedError.toExponential(2)}, tolerance ${plan.steady!.tolerance})`,
    );
  }
  warnings.push(...engine.warnings);
  return {
    ...recorder.finish(),
    step: h,
    ...(steady ? { steady } : {}),
    stats: engine.stats(),
    warnings,
  };
}

/**
 * The voltage between two nodes of a result, v(a) − v(b), V ("ground" allowed on either side).
 * @example voltageBetween(result, "drain", "ground") // the drain waveform
 */
export function voltageBetween(result: TransientResult, a: string, b: string): Float64Array {
  const where = "voltageBetween";
  const nodes = result?.nodeVoltages;
  if (nodes === null || typeof nodes !== "object" || !(result.time instanceof Float64Array)) {
    throw new TanklightInputError([{ path: "result", message: "must be a TransientResult from simulate()", value: result }], where);
  }
  // own keys only: "toString" or "__proto__" is not a node
  const get = (name: string): Float64Array | undefined => (name === GROUND ? undefined : nodes[name]);
  for (const [field, name] of [["a", a], ["b", b]] as const) {
    if (name !== GROUND && !(typeof name === "string" && Object.hasOwn(nodes, name) && nodes[name] instanceof Float64Array)) {
      throw new TanklightInputError([{ path: field, message: "is not a node of this result", value: name, expected: Object.keys(nodes).join(", ") }], where);
    }
  }
  const va = get(a);
  const vb = get(b);
  const out = new Float64Array(result.time.length);
  for (let i = 0; i < out.length; i++) out[i] = (va ? va[i]! : 0) - (vb ? vb[i]! : 0);
  return out;
}

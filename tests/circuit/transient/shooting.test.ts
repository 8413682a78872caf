/**
 * Periodic steady state by the shooting method (Aprille & Trick 1972) against plain time
 * stepping run until the cycle-to-cycle change is below 1e-9 (independent method: the same
 * engine, integrated long).
 */
import { describe, expect, it } from "vitest";
import { periodicSteadyState } from "../../../lib/circuit/transient/shooting.ts";
import { simulate } from "../../../lib/circuit/transient/simulate.ts";
import { bridgeDrive, singleSwitchDrive } from "../../../lib/circuit/transient/drives.ts";
import { addToken } from "../../../lib/circuit/transient/token.ts";
import { ledPreset } from "../../../lib/circuit/loads/ledPresets.ts";
import type { TransientCircuit } from "../../../lib/circuit/transient/circuit.ts";
import { expectOutside } from "../../helpers/validation.ts";

const f = 200e3;
const w = 2 * Math.PI * f;
const spc = 200;

function compare(circuit: TransientCircuit, nodes: readonly string[]) {
  const s = periodicSteadyState(circuit, { frequency: f, stepsPerCycle: spc });
  const r = simulate(circuit, { stop: 8000 / f, stepsPerCycle: spc, frequency: f, untilSteady: { tolerance: 1e-9 }, keepCycles: 1 });
  expect(s.shooting.converged).toBe(true);
  expect(r.steady?.reached).toBe(true);
  let worst = 0;
  for (const n of nodes) {
    const a = s.nodeVoltages[n]!;
    const b = r.nodeVoltages[n]!;
    let e = 0;
    let m = 0;
    for (let j = 0; j <= spc; j++) {
      e = Math.max(e, Math.abs(a[j]! - b[j]!));
      m = Math.max(m, Math.abs(b[j]!));
    }
    worst = Math.max(worst, e / m);
  }
  return { s, r, worst };
}

describe("periodicSteadyState (shooting)", () => {
  it("a Q = 50 series tank on a full bridge: the steady waveform within 1e-6 of long time stepping, in far fewer periods", () => {
    const L = 10e-6;
    const d = bridgeDrive({ supply: 5, frequency: f, bridge: "full", coilInductance: L, coilResistance: (w * L) / 50 - 0.02, tankCapacitance: 1 / (w * w * L), onResistance: 0.01 });
    const { s, r, worst } = compare(d.circuit, ["coilTop", "midA"]);
    expectOutside({ quantity: "full-bridge Q 50 tank waveform, shooting vs long time stepping (largest deviation / peak)", source: "independent method: plain time stepping to a cycle-to-cycle change below 1e-9", ours: 1 + worst, reference: 1, rtol: 1e-6 });
    // plain stepping needs ≈ Q·ln(1/tol)/π periods; shooting a handful
    expect(s.shooting.periods * 5).toBeLessThan(r.steady!.cycles);
  });

  it("single switch + parallel tank + red LED token (token Q 50): agrees with long time stepping to 1e-6", () => {
    const L1 = 1.6e-6;
    const L2 = 30e-6;
    const d = singleSwitchDrive({ supply: 5, frequency: f, coilInductance: L1, coilResistance: 0.05, tankCapacitance: 1 / ((1.3 * w) ** 2 * L1), onResistance: 0.05 });
    const tok = addToken(d.circuit, { coupledTo: "Ltx", k: 0.05, inductance: L2, resistance: (w * L2) / 50, capacitance: 1 / (w * w * L2), load: { kind: "led", led: ledPreset("red") } });
    const { s, r, worst } = compare(tok.circuit, [tok.top, "switch"]);
    // sensitivities integrated with the period: 6 periods (1 warm-up, 4 with sensitivities, 1
    // chord) where plain stepping takes 30 to 1e-9 (finite differences took 23); the time
    // ratio is measured in bench/steady.bench.ts
    expect(s.shooting.periods * 4).toBeLessThan(r.steady!.cycles);
    expectOutside({ quantity: "single-switch drive with an LED token, shooting vs long time stepping (largest deviation / peak)", source: "independent method: plain time stepping to a cycle-to-cycle change below 1e-9", ours: 1 + worst, reference: 1, rtol: 1e-6 });
    // the returned period is within the tolerance of the orbit as plain stepping's detector measures it
    expect(s.shooting.estimatedError).toBeLessThanOrEqual(1e-9);
  });

  it("a starting guess (initialState) skips the warm-up: fewer periods, the same orbit", () => {
    const L1 = 1.6e-6;
    const L2 = 30e-6;
    const d = singleSwitchDrive({ supply: 5, frequency: f, coilInductance: L1, coilResistance: 0.05, tankCapacitance: 1 / ((1.3 * w) ** 2 * L1), onResistance: 0.05 });
    const tok = addToken(d.circuit, { coupledTo: "Ltx", k: 0.05, inductance: L2, resistance: (w * L2) / 50, capacitance: 1 / (w * w * L2), load: { kind: "led", led: ledPreset("red") } });
    const cold = periodicSteadyState(tok.circuit, { frequency: f, stepsPerCycle: spc });
    // a guess 10–30 % off the orbit's start values (measured there: Ctank 5.63 V, token.C −3.40 V, Ltx −3.69 A, token.L 0.0449 A), as a describing function gives
    const seeded = periodicSteadyState(tok.circuit, { frequency: f, stepsPerCycle: spc, initialState: { Ctank: 5, "token.C": -2.6, Ltx: -3.9, "token.L": 0.04 } });
    expect(seeded.shooting.converged).toBe(true);
    expect(seeded.shooting.periods).toBeLessThan(cold.shooting.periods);
    for (const n of [tok.top, "switch"]) {
      const a = seeded.nodeVoltages[n]!;
      const b = cold.nodeVoltages[n]!;
      let e = 0;
      let m = 0;
      for (let j = 0; j <= spc; j++) {
        e = Math.max(e, Math.abs(a[j]! - b[j]!));
        m = Math.max(m, Math.abs(b[j]!));
      }
      expect(e / m).toBeLessThan(1e-8);
    }
    expect(() => periodicSteadyState(tok.circuit, { frequency: f, stepsPerCycle: spc, initialState: { Cx: 1 } })).toThrow(/initialState\.Cx: is not a capacitor or inductor of the circuit/);
    expect(() => periodicSteadyState(tok.circuit, { frequency: f, stepsPerCycle: spc, initialState: { Ltx: Number.NaN } })).toThrow(/initialState\.Ltx: must be a finite number \(A\)/);
  });
});

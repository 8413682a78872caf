/**
 * Switching instants done right (breakpoint restart, lib/circuit/transient/stepControl.ts): a
 * short backward-Euler step after each switching instant, then TR-BDF2 steps growing back to
 * the output step, two full TR-BDF2 steps, then the trapezoidal rule. Checks: a full bridge driving a series tank at its resonance carries the
 * exact fundamental 4V/(πR) (Fourier series of a square wave into a resistive tank — any
 * circuits text) within 0.1 % at 200 steps a cycle for Q = 11, 42, 84 (one full-length
 * backward-Euler step made it −0.35 %, −1.3 %, −2.6 %); and a hard turn-on no longer rings
 * (the TR-BDF2 ramp after the restart, Bank et al. 1985).
 */
import { describe, expect, it } from "vitest";
import { bridgeDrive, singleSwitchDrive } from "../../../lib/circuit/transient/drives.ts";
import { simulate } from "../../../lib/circuit/transient/simulate.ts";
import { waveformHarmonics } from "../../../lib/circuit/transient/harmonics.ts";
import { expectOutside } from "../../helpers/validation.ts";

const f = 200e3;
const w = 2 * Math.PI * f;
const L = 10e-6;

describe("breakpoint restart after switching instants", () => {
  for (const Q of [11, 42, 84]) {
    it(`full bridge into a series tank, Q = ${Q}, 200 steps a cycle: coil current within 0.1 % of 4V/(πR)`, () => {
      const R = (w * L) / Q; // total loop resistance, both switches' R_on included
      const ron = 0.01;
      const d = bridgeDrive({ supply: 5, frequency: f, bridge: "full", coilInductance: L, coilResistance: R - 2 * ron, tankCapacitance: 1 / (w * w * L), onResistance: ron });
      const r = simulate(d.circuit, { stop: 3000 / f, stepsPerCycle: 200, frequency: f, untilSteady: { tolerance: 1e-8 }, keepCycles: 1 });
      expect(r.steady?.reached).toBe(true);
      const i1 = waveformHarmonics(r.time, r.currents.Ltx!, { frequency: f }).amplitude[1]!;
      // source: Fourier series of a ±V square wave, fundamental 4V/π, into a tank that is purely resistive at resonance
      expectOutside({ quantity: `full-bridge coil current fundamental, Q ${Q}, 200 steps a cycle`, source: "source: Fourier series of a square wave (fundamental 4V/π) into a series tank at resonance, I = 4V/(πR)", ours: i1, reference: (4 * 5) / Math.PI / R, rtol: 1e-3, unit: "A" });
    });
  }

  for (const spc of [200, 400, 1000]) {
    it(`a switch closing on a charged tank (R_on·C = 3.9 ns), ${spc} steps a cycle: no swing below ground beyond R_on × coil current; the decay follows e^(−t/R_on·C)`, () => {
      // tank tuned 0.9× the switching frequency: the switch closes on ≈ 12 V. With a
      // backward-Euler step and the trapezoidal rule after it the switch node went
      // 12.1 → 1.61 → −0.88 → 0.42 V (200 steps); with a short backward-Euler step and a
      // trapezoidal ramp doubling back to h, −0.086 V (200) and −0.11 V (400); the TR-BDF2
      // ramp (stepControl.ts) leaves only what the on-resistance carries: v = R_on·(i_L + i_C).
      const C = 1 / ((0.9 * w) ** 2 * L);
      const ron = 0.05;
      const d = singleSwitchDrive({ supply: 5, frequency: f, coilInductance: L, coilResistance: 0.1, tankCapacitance: C, onResistance: ron });
      const r = simulate(d.circuit, { stop: 200 / f, stepsPerCycle: spc, frequency: f, keepCycles: 1 });
      const v = r.nodeVoltages.switch!;
      const iL = r.currents.Ltx!;
      expect(v[0]!).toBeGreaterThan(10); // it closes on a charged tank
      let vmin = Infinity;
      let iMax = 0;
      for (let j = 1; j < spc / 2; j++) {
        vmin = Math.min(vmin, v[j]!);
        iMax = Math.max(iMax, Math.abs(iL[j]!));
      }
      // the capacitor's share of the switch current adds a few per cent to R_on·i_L (measured ≤ 3 %)
      expect(vmin).toBeGreaterThanOrEqual(-1.1 * ron * iMax);
      // one step after the turn-on: the closed-form RC discharge of the tank capacitor through R_on
      // (τ = R_on·C), on top of R_on·i_L — source: first-order RC decay, any circuits text
      const h = 1 / (f * spc);
      const expected = (v[0]! - ron * iL[0]!) * Math.exp(-h / (ron * C)) + ron * iL[1]!;
      // the ramp's steps reach 2.4τ while the mode decays, so this is the ramp's accuracy, not
      // rounding: measured 7.7e-4 (200), 2.2e-3 (400), 8.8e-4 (1000) of the 12 V jump
      expect(Math.abs(v[1]! - expected)).toBeLessThan(3e-3 * v[0]!);
    });
  }
});

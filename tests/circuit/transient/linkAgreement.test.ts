/**
 * The time-domain engine against the frequency-domain link solver (issue 7 checks "linear
 * coupled tanks agree with solveLink within 0.5 %" and "LED tokens: describing-function result
 * vs this engine's steady state"). The link solver is used through its numeric core
 * `solveLinkNetwork` (the part of `solveLink` that takes L, R, C and M as numbers), so both
 * engines see exactly the same circuit: a sine source driving a series-tuned transmitter, a
 * parallel-tuned token with its load, coupling k = 0.05.
 */
import { describe, expect, it } from "vitest";
import { simulate } from "../../../lib/circuit/transient/simulate.ts";
import { addToken } from "../../../lib/circuit/transient/token.ts";
import { sineWaveform } from "../../../lib/circuit/transient/waveforms.ts";
import { waveformHarmonics } from "../../../lib/circuit/transient/harmonics.ts";
import type { TransientCircuit } from "../../../lib/circuit/transient/circuit.ts";
import { ledPreset } from "../../../lib/circuit/loads/ledPresets.ts";
import type { TokenLoad } from "../../../lib/circuit/loads/types.ts";
import { solveLinkNetwork } from "../../../lib/circuit/link/solveNetwork.ts";
import { tokenLoadModel } from "../../../lib/circuit/link/tokenLoad.ts";
import { sineDrive } from "../../../lib/circuit/drive.ts";
import { expectOutside } from "../../helpers/validation.ts";

const f = 200e3;
const w = 2 * Math.PI * f;
const L1 = 10e-6;
const L2 = 30e-6;
const k = 0.05;
const R1 = 1.5;
const R2 = 1.2;
const C1 = 1 / (w * w * L1);
const C2 = 1 / (w * w * L2);
const M = k * Math.sqrt(L1 * L2);
const SPC = 400;

function both(load: TokenLoad, V: number) {
  const tx: TransientCircuit = {
    elements: [
      { kind: "voltageSource", name: "Vs", plus: "s", minus: "ground", waveform: sineWaveform({ amplitude: V, frequency: f }) },
      { kind: "resistor", name: "R1", a: "s", b: "c", resistance: R1 },
      { kind: "capacitor", name: "C1", a: "c", b: "top1", capacitance: C1 },
      { kind: "inductor", name: "L1", a: "top1", b: "ground", inductance: L1 },
    ],
  };
  const tok = addToken(tx, { coupledTo: "L1", k, inductance: L2, resistance: R2, capacitance: C2, load });
  const r = simulate(tok.circuit, { stop: 3000 / f, stepsPerCycle: SPC, frequency: f, untilSteady: { tolerance: 1e-6 }, keepCycles: 1 });
  expect(r.steady?.reached).toBe(true);
  const fd = solveLinkNetwork({
    frequency: f,
    inductance: [[L1, M], [M, L2]],
    transmitter: { resistance: R1, compensation: "series", capacitance: C1, drive: sineDrive(V) },
    receivers: [{ resistance: R2, topology: "parallel", capacitance: C2, load: tokenLoadModel(load) }],
  });
  const avg = (name: string) => {
    const i = r.currents[name]!;
    let s = 0;
    for (let j = 0; j < SPC; j++) s += i[j]!;
    return s / SPC;
  };
  return {
    tankFundamental: waveformHarmonics(r.time, r.nodeVoltages[tok.top]!, { frequency: f }).amplitude[1]!,
    txCurrent: waveformHarmonics(r.time, r.currents.L1!, { frequency: f }).amplitude[1]!,
    ledAverage: Object.fromEntries(Object.entries(tok.leds).map(([role, name]) => [role, avg(name!)])) as Record<string, number>,
    fd,
    rx: fd.receivers[0]!,
  };
}

describe("transient steady state vs the frequency-domain link solver", () => {
  it("linear coupled tanks (resistor token) agree within 0.5 % — in fact within 1e-4", () => {
    const x = both({ kind: "resistor", resistance: 1000 }, 1);
    // independent method: phasor link solver vs time-domain steady state. Regime "linear,
    // 400 steps a cycle": trapezoidal frequency warp (ωh)²/12 ≈ 2e-5 times the tanks'
    // sensitivity to detuning (≈ 2Q) stays below 1e-4 (measured 6e-7 and 9e-6).
    expectOutside({ quantity: "token tank amplitude, linear coupled tanks (transient vs solveLinkNetwork)", source: "independent method: frequency-domain link solver (solveLinkNetwork)", ours: x.tankFundamental, reference: x.rx.loadVoltage, rtol: 1e-4, unit: "V" });
    expectOutside({ quantity: "transmitter coil current, linear coupled tanks (transient vs solveLinkNetwork)", source: "independent method: frequency-domain link solver (solveLinkNetwork)", ours: x.txCurrent, reference: x.fd.transmitter.coilCurrent, rtol: 1e-4, unit: "A" });
  });

  // The describing-function (fundamental-only) model against the true waveform, single red LED,
  // across drive levels. Measured band (describing function relative to transient, 400 steps a cycle):
  //   drive 0.25 V: LED 1.1 mA — average current +0.9 %, tank fundamental −1.0 %, Tx current +0.3 %
  //   drive 1 V:    LED 8.6 mA — average current −1.8 %, tank fundamental −8 %,   Tx current +0.4 %
  //   drive 4 V:    LED 43 mA  — average current −8 %,   tank fundamental −15 %,  Tx current +0.2 %
  // The brightness (average current) is what the fast model is used for; it stays within 10 %
  // up to twice the rated current. The tank fundamental is underestimated more because the
  // clipped waveform is asymmetric (the free half-cycle swings further), which a symmetric
  // sinusoid cannot represent.
  const regimes = [
    { V: 0.25, name: "weak (≈ 1 mA)", led: 0.02, tank: 0.02 },
    { V: 1, name: "indicator (≈ 9 mA)", led: 0.03, tank: 0.12 },
    { V: 4, name: "strong (≈ 2 × rated)", led: 0.12, tank: 0.22 },
  ];
  for (const g of regimes) {
    it(`red LED token, ${g.name}: describing-function result within the documented band`, () => {
      const x = both({ kind: "led", led: ledPreset("red") }, g.V);
      expectOutside({ quantity: `red LED average current, drive ${g.V} V (describing function vs transient)`, source: "independent method: transient steady state vs describing-function link solver", ours: x.rx.leds[0]!.averageCurrent, reference: x.ledAverage.led!, rtol: g.led, unit: "A" });
      expectOutside({ quantity: `red LED token tank fundamental, drive ${g.V} V (describing function vs transient)`, source: "independent method: transient steady state vs describing-function link solver", ours: x.rx.loadVoltage, reference: x.tankFundamental, rtol: g.tank, unit: "V" });
      expectOutside({ quantity: `transmitter current with a red LED token, drive ${g.V} V (describing function vs transient)`, source: "independent method: transient steady state vs describing-function link solver", ours: x.fd.transmitter.coilCurrent, reference: x.txCurrent, rtol: 0.01, unit: "A" });
    });
  }

  it("back-to-back red + InGaN green: the fundamental-only model misses most of the green LED's current", () => {
    // The clipped positive half (red, ≈ 2 V) forces the negative half further out (the coil
    // carries no DC voltage), so the green LED (≈ 3 V) conducts far more than a symmetric
    // sinusoid of the same fundamental predicts. Measured at drive 2 V: transient 1.7 mA,
    // describing function 0.013 mA. This is a documented limit of the fast model.
    const x = both({ kind: "antiParallel", a: ledPreset("red"), b: ledPreset("green-ingan") }, 2);
    expect(x.ledAverage.b!).toBeGreaterThan(1e-3);
    expect(x.ledAverage.b! / x.rx.leds[1]!.averageCurrent).toBeGreaterThan(10);
    // the red LED, which sets the clamp, is still within 10 %
    expectOutside({ quantity: "red LED of a red+green pair, average current, drive 2 V (describing function vs transient)", source: "independent method: transient steady state vs describing-function link solver", ours: x.rx.leds[0]!.averageCurrent, reference: x.ledAverage.a!, rtol: 0.1, unit: "A" });
  });
});

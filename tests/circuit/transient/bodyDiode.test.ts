/**
 * The switch's optional body diode (./bodyDiode.ts): a hard turn-off of an inductive current
 * clamps the switch node at minus the diode's forward drop instead of ringing far below ground,
 * and the drive builders include it only when asked.
 */
import { describe, expect, it } from "vitest";
import { simulate } from "../../../lib/circuit/transient/simulate.ts";
import { bodyDiodeModel } from "../../../lib/circuit/transient/bodyDiode.ts";
import { singleSwitchDrive, bridgeDrive } from "../../../lib/circuit/transient/drives.ts";
import { addToken } from "../../../lib/circuit/transient/token.ts";
import { periodicSteadyState } from "../../../lib/circuit/transient/shooting.ts";
import { ledPreset } from "../../../lib/circuit/loads/ledPresets.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";
import type { TransientCircuit } from "../../../lib/circuit/transient/circuit.ts";
import { expectOutside } from "../../helpers/validation.ts";

// 1 A circulating from the switch node through a 10 µH coil to ground and back through the
// closed switch; the switch opens at 1 µs. 1 nF across the switch (its output capacitance).
const L = 10e-6;
const C = 1e-9;
function turnOff(withDiode: boolean): TransientCircuit {
  return {
    elements: [
      { kind: "inductor", name: "L", a: "sw", b: "ground", inductance: L, resistance: 0.1, initialCurrent: 1 },
      { kind: "capacitor", name: "Cds", a: "sw", b: "ground", capacitance: C },
      { kind: "switch", name: "S", a: "sw", b: "ground", closed: (t) => t < 1e-6, onResistance: 0.05, ...(withDiode ? { bodyDiode: bodyDiodeModel() } : {}) },
    ],
  };
}

describe("switch body diode", () => {
  it("the default model passes through its two stated points", () => {
    const d = bodyDiodeModel();
    expectRelClose(d.voltage(0.1), 0.65, 5e-10, "V_f at 0.1 A (the model's own anchor point)");
    expectRelClose(d.voltage(1), 0.8, 5e-10, "V_f at 1 A (the model's own anchor point)");
  });

  it("hard turn-off of an inductive current: without it the node rings to −i·√(L/C); with it the node clamps at −V_f(i)", () => {
    const opts = { stop: 3e-6, step: 1e-9 };
    const bare = simulate(turnOff(false), opts);
    const vBare = bare.nodeVoltages.sw!;
    // undamped LC swing of 1 A: √(L/C) = 100 V (closed form of the series LC ring)
    expectOutside({ quantity: "switch-node swing after turn-off without a body diode", source: "closed form: i·√(L/C) of an LC ring (1 A, 10 µH, 1 nF)", ours: -Math.min(...vBare), reference: Math.sqrt(L / C), rtol: 0.05, unit: "V" });
    const clamped = simulate(turnOff(true), opts);
    const v = clamped.nodeVoltages.sw!;
    const iD = clamped.currents["S.body"]!;
    const iL = clamped.currents.L!;
    const d = bodyDiodeModel();
    let worst = 0;
    for (let j = 0; j < v.length; j++) {
      if (clamped.time[j]! < 1.2e-6) continue;
      // after the capacitor has handed the current over: the diode carries the coil current at −V_f(i)
      worst = Math.max(worst, Math.abs(-v[j]! - d.voltage(iL[j]!)) / d.voltage(iL[j]!));
    }
    expectOutside({ quantity: "switch node while the body diode freewheels the coil current", source: "the diode's own Shockley I–V at the coil current (−V_f ≈ −0.8 V at 1 A; a MOSFET body diode clamps at −0.7…−1 V, trade practice (no source))", ours: 1 + worst, reference: 1, rtol: 0.01 });
    expect(Math.min(...v)).toBeGreaterThan(-1);
    expectRelClose(iD.at(-1)!, iL.at(-1)!, 5e-4, "the diode carries the coil current");
    // while the switch is closed the diode is forward-biased only by R_on·i = 0.05 V: it carries next to nothing
    const before = clamped.time.findIndex((t) => t > 0.9e-6);
    expect(Math.abs(iD[before]!)).toBeLessThan(1e-3);
  });

  it("bad input names the field", () => {
    const c = turnOff(false);
    const bad = { elements: c.elements.map((e) => (e.kind === "switch" ? { ...e, bodyDiode: { current: 1 } as never } : e)) };
    expect(() => simulate(bad, { stop: 1e-6, step: 1e-9 })).toThrow(/elements\[2\] \(S\)\.bodyDiode: must be a DiodeModel/);
  });

  it("drive builders: off by default, every switch gets one with bodyDiode: true", () => {
    const base = { supply: 5, frequency: 200e3, coilInductance: 1.6e-6, tankCapacitance: 1e-7 };
    const sw = (c: TransientCircuit) => c.elements.filter((e) => e.kind === "switch");
    expect(sw(singleSwitchDrive(base).circuit).every((e) => e.kind === "switch" && e.bodyDiode === undefined)).toBe(true);
    expect(sw(singleSwitchDrive({ ...base, bodyDiode: true }).circuit).every((e) => e.kind === "switch" && e.bodyDiode !== undefined)).toBe(true);
    const full = sw(bridgeDrive({ ...base, bridge: "full", bodyDiode: true }).circuit);
    expect(full.length).toBe(4);
    expect(full.every((e) => e.kind === "switch" && e.bodyDiode !== undefined)).toBe(true);
  });

  it("the pebble drawer: the switch node's dip before turn-on is where the body diode conducts (why it is off by default)", () => {
    const f = 200e3;
    const w = 2 * Math.PI * f;
    const L1 = 1.6e-6;
    const L2 = 30e-6;
    const run = (bodyDiode: boolean) => {
      const d = singleSwitchDrive({ supply: 5, frequency: f, coilInductance: L1, coilResistance: 0.05, tankCapacitance: 1 / ((1.3 * w) ** 2 * L1), onResistance: 0.05, bodyDiode });
      const tok = addToken(d.circuit, { coupledTo: "Ltx", k: 0.05, inductance: L2, resistance: (w * L2) / 50, capacitance: 1 / (w * w * L2), load: { kind: "led", led: ledPreset("red") } });
      const s = periodicSteadyState(tok.circuit, { frequency: f, stepsPerCycle: 200 });
      expect(s.shooting.converged).toBe(true);
      const led = s.currents[tok.leds.led!]!;
      let avg = 0;
      for (let j = 1; j < led.length; j++) avg += led[j]! / (led.length - 1);
      return { s, avg, vmin: Math.min(...s.nodeVoltages.switch!) };
    };
    const off = run(false);
    const on = run(true);
    // measured: the node dips to −0.632 V before turn-on; with the diode −0.628 V, the diode
    // peaking at 67 mA for a few steps; the LED's average current (25.901 mA) moves by < 1e-4
    expect(off.vmin).toBeLessThan(-0.6);
    expect(on.vmin).toBeGreaterThan(off.vmin);
    expect(Math.max(...on.s.currents["S1.body"]!)).toBeGreaterThan(0.03);
    expect(Math.abs(on.avg / off.avg - 1)).toBeLessThan(1e-4);
  });
});

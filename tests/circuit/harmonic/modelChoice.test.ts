/**
 * Model choice with a stated error: solveLinkModel / solveLink `model: "fundamental" |
 * "harmonic" | "auto"`. Independent method for the bands: harmonic balance at order 25.
 */
import { describe, expect, it } from "vitest";
import { solveLinkModel, fundamentalCheck, FUNDAMENTAL_ACCEPT } from "../../../lib/circuit/harmonic/modelChoice.ts";
import { solveLinkHarmonic } from "../../../lib/circuit/harmonic/solveHarmonic.ts";
import { solveLinkNetwork } from "../../../lib/circuit/link/solveNetwork.ts";
import { solveLink } from "../../../lib/circuit/link.ts";
import { ledPreset, diodePreset } from "../../../lib/circuit/loads/ledPresets.ts";
import { roundCoil } from "../../../lib/em/builders/roundCoil.ts";
import type { TokenLoad } from "../../../lib/circuit/loads/types.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { networkOf, type DriveKind } from "./circuits.ts";
import { selfInductance } from "../../../lib/em/selfInductance.ts";
import { coilResistance } from "../../../lib/em/losses/coilResistance.ts";
import { mutualInductance } from "../../../lib/em/mutualInductance.ts";
import { singleSwitchDrive } from "../../../lib/circuit/transient/drives.ts";
import { addToken } from "../../../lib/circuit/transient/token.ts";
import { simulate } from "../../../lib/circuit/transient/simulate.ts";
import { expectOutside } from "../../helpers/validation.ts";

const red = ledPreset("red");
const pair: TokenLoad = { kind: "antiParallel", a: red, b: ledPreset("green-ingan") };

describe("solveLinkModel: which model, and its error band", () => {
  it("a resistive token with a sine drive: auto keeps the describing function (exact there)", () => {
    const r = solveLinkModel(networkOf("sine", 1, 0.05, { kind: "resistor", resistance: 1000 }), { model: "auto" });
    expect(r.model).toBe("fundamental");
    expect(r.errorBand.relative).toBeLessThanOrEqual(1e-3);
  });

  it("a red + InGaN green pair at 2 V: auto runs harmonic balance; forced fundamental warns, naming the green LED", () => {
    const net = networkOf("sine", 2, 0.05, pair);
    const auto = solveLinkModel(net, { model: "auto" });
    expect(auto.model).toBe("harmonic");
    expect(auto.receivers[0]!.leds[1]!.averageCurrent).toBeGreaterThan(1e-3);
    const df = solveLinkModel(net, { model: "fundamental" });
    expect(df.model).toBe("fundamental");
    expect(df.errorBand.relative).toBeGreaterThanOrEqual(1);
    const w = df.warnings.find((x) => x.includes("outside its validity"));
    expect(w).toMatch(/green/i);
  });

  it("a token far out (LEDs dark) keeps the describing function under auto", () => {
    const r = solveLinkModel(networkOf("sine", 0.05, 0.05, pair), { model: "auto" });
    expect(r.model).toBe("fundamental");
    expect(r.receivers[0]!.leds.every((l) => !l.lit)).toBe(true);
  });

  it("the single-switch drive: auto runs harmonic balance (the switch waveform is solved, not assumed)", () => {
    const r = solveLinkModel(networkOf("singleSwitch", 5, 0.05, { kind: "led", led: red }), { model: "auto" });
    expect(r.model).toBe("harmonic");
    expect(r.harmonic?.switchNode).toBeDefined();
    const f = solveLinkModel(networkOf("singleSwitch", 5, 0.05, { kind: "led", led: red }), { model: "fundamental" });
    expect(f.errorBand.relative).toBe(Infinity);
    expect(f.warnings.some((x) => x.includes("cannot be estimated"))).toBe(true);
  });

  it("auto is within its stated band of order-25 harmonic balance over a grid (levels × couplings × loads × drives)", () => {
    const loads: TokenLoad[] = [
      { kind: "antiParallel", a: red, b: red },
      { kind: "bridge", diode: diodePreset("schottky"), led: red },
      { kind: "led", led: red },
      pair,
    ];
    let fundamental = 0;
    let harmonic = 0;
    for (const load of loads) {
      for (const kind of ["sine", "fullBridge"] as DriveKind[]) {
        for (const level of [0.1, 0.25, 1, 4]) {
          for (const k of [0.01, 0.05, 0.15]) {
            const net = networkOf(kind, level, k, load);
            const ref = solveLinkHarmonic(net, { order: 25 });
            const r = solveLinkModel(net, { model: "auto" });
            if (r.model === "fundamental") fundamental++;
            else harmonic++;
            expect(Number.isFinite(r.errorBand.relative)).toBe(true);
            // LED currents relative, with a floor of 1 % of the lit threshold (5 µA) for dark LEDs
            ref.receivers[0]!.leds.forEach((l, i) => {
              const e = Math.abs(r.receivers[0]!.leds[i]!.averageCurrent - l.averageCurrent) / Math.max(l.averageCurrent, 5e-6);
              expect(e, `${kind} ${level} k ${k} ${load.kind} LED ${i} (${r.model})`).toBeLessThanOrEqual(r.errorBand.relative);
            });
            expect(Math.abs(r.transmitter.coilCurrent / ref.transmitter.coilCurrent - 1)).toBeLessThanOrEqual(r.errorBand.relative);
          }
        }
      }
    }
    // both models are used on this grid
    expect(fundamental).toBeGreaterThan(10);
    expect(harmonic).toBeGreaterThan(10);
  });

  it("fundamentalCheck: zero for a linear network, above the acceptance for a rectifying pair at 2 V", () => {
    const lin = networkOf("sine", 1, 0.05, { kind: "resistor", resistance: 500 });
    expect(fundamentalCheck(lin, solveLinkNetwork(lin)).estimate).toBe(0);
    const net = networkOf("sine", 2, 0.05, pair);
    expect(fundamentalCheck(net, solveLinkNetwork(net)).estimate).toBeGreaterThan(FUNDAMENTAL_ACCEPT);
  });

  it("a bad model name is an input error naming the field", () => {
    expect(() => solveLinkModel(networkOf("sine", 1, 0.05, pair), { model: "exact" as never })).toThrow(TanklightInputError);
    expect(() => solveLinkModel(networkOf("sine", 1, 0.05, pair), { model: "exact" as never })).toThrow(/model/);
  });
});

describe("solveLink(system, { model })", () => {
  const tx = roundCoil({ meanRadius: 0.05, turns: 5, wire: { diameter: 0.8e-3, insulation: 0.03e-3 } });
  const token = roundCoil({ innerRadius: 0.0065, turns: 120, layers: 6, wire: { diameter: 0.1e-3, insulation: 0.01e-3 } });
  const system = {
    frequency: 196.9e3,
    transmitter: { coil: tx, compensation: "parallel" as const, capacitor: { capacitance: 106.8e-9 }, drive: { kind: "parallelTank" as const, supply: 5, onResistance: 0.05 } },
    receivers: [{ coil: token, pose: { position: [0, 0, 0.03] as [number, number, number] }, topology: "parallel" as const, capacitor: { capacitance: 2.2e-9 }, load: pair }],
  };
  it("every result states its model and error band; the single switch under auto: the periodic steady state where it switches hard", () => {
    // the drawer's 106.8 nF tank resonates at the switching frequency: the switch closes on ≈ 10 V
    // (hard switching), where harmonic balance at order 15 is 3.8 % off the periodic steady state
    const auto = solveLink(system, { model: "auto" });
    expect(auto.model).toBe("periodic");
    expect(auto.errorBand.relative).toBeGreaterThan(0);
    expect(auto.errorBand.basis).toMatch(/periodic steady state/);
    const zvs = solveLinkModel(networkOf("singleSwitch", 5, 0.05, { kind: "led", led: red }), { model: "auto" });
    expect(zvs.model).toBe("harmonic"); // tuned 1.3× for zero-voltage turn-on: harmonic balance is within 0.07 %
    const f = solveLink(system, { model: "fundamental" });
    expect(f.model).toBe("fundamental");
    expect(f.errorBand.basis).toMatch(/describing function/);
    const h = solveLink(system, { model: "harmonic", order: 9 });
    expect(h.harmonic?.order).toBe(9);
  });
});

describe("the single switch tuned away from zero-voltage switching (the drive-waveforms casebook's coil)", () => {
  // demo coils of casebook/driveWaveforms.ts: 6 turns, 35 mm, as a parallel tank under one
  // switch from 5 V; a 100-turn token 30 mm above with a red LED, its tank at the switching frequency
  const tx = roundCoil({ meanRadius: 0.035, turns: 6, wire: { diameter: 0.8e-3, insulation: 0.03e-3 } });
  const token = roundCoil({ innerRadius: 0.006, turns: 100, layers: 5, wire: { diameter: 0.1e-3, insulation: 0.01e-3 } });
  const f = 203.66e3;
  const w = 2 * Math.PI * f;
  const L1 = selfInductance(tx, { frequency: f });
  const L2 = selfInductance(token, { frequency: f });
  const C2 = 1 / (w * w * L2);
  const c1 = (ratio: number): number => 1 / ((ratio * w) ** 2 * L1);
  const system = (ratio: number) => ({
    frequency: f,
    transmitter: { coil: tx, compensation: "parallel" as const, capacitor: { capacitance: c1(ratio) }, drive: { kind: "parallelTank" as const, supply: 5, onResistance: 0.05 } },
    receivers: [{ coil: token, pose: { position: [0, 0, 0.03] as [number, number, number] }, topology: "parallel" as const, capacitor: { capacitance: C2 }, load: { kind: "led" as const, led: red } }],
  });
  /** the LED's average current by plain time stepping (400 steps a cycle) run until the cycle-to-cycle change is below 1e-9 */
  const stepped = (ratio: number): number => {
    const drive = singleSwitchDrive({ supply: 5, frequency: f, coilInductance: L1, coilResistance: coilResistance(tx, f), tankCapacitance: c1(ratio), onResistance: 0.05 });
    const M = mutualInductance(tx, { position: [0, 0, 0] }, token, { position: [0, 0, 0.03] });
    const tok = addToken(drive.circuit, { coupledTo: drive.coil, mutualInductance: M, inductance: L2, resistance: coilResistance(token, f), capacitance: C2, load: { kind: "led", led: red } });
    const r = simulate(tok.circuit, { stop: 3000 / f, stepsPerCycle: 400, frequency: f, untilSteady: { tolerance: 1e-9 }, keepCycles: 1 });
    expect(r.steady?.reached).toBe(true);
    const i = r.currents[tok.leds.led!]!;
    let s = 0;
    for (let k = 0; k < 400; k++) s += i[k]!;
    return s / 400;
  };

  it("at 1.6× (hard switching) auto answers from the periodic steady state, within 1 % of long time stepping, and says so", () => {
    const ref = stepped(1.6);
    const auto = solveLink(system(1.6), { model: "auto" });
    expect(auto.model).toBe("periodic");
    expect(auto.errorBand.basis).toMatch(/periodic steady state/);
    expect(auto.errorBand.relative).toBeLessThanOrEqual(0.01);
    // measured 2e-5 (shooting at 400 steps a cycle against plain stepping at 400)
    expectOutside({ quantity: "LED average current, single switch at 1.6×, model auto", source: "independent method: plain time stepping of the same circuit until the cycle-to-cycle change is below 1e-9 (400 steps a cycle)", ours: auto.receivers[0]!.leds[0]!.averageCurrent, reference: ref, rtol: 0.01, unit: "A" });
  });

  it("forced harmonic balance states a band that covers its error there (−23 % at order 15 at 1.6×, −5.9 % at 1.45×)", () => {
    for (const ratio of [1.45, 1.6]) {
      const ref = stepped(ratio);
      const h = solveLink(system(ratio), { model: "harmonic" });
      expect(h.model).toBe("harmonic");
      const err = Math.abs(h.receivers[0]!.leds[0]!.averageCurrent / ref - 1);
      expect(err).toBeGreaterThan(0.01); // the reason for the route above
      expect(h.errorBand.relative).toBeGreaterThanOrEqual(err);
      expect(h.errorBand.basis).toMatch(/periodic steady state/);
    }
  });
});

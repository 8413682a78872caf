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
  it("every result states its model and error band; the single switch under auto is harmonic balance", () => {
    const auto = solveLink(system, { model: "auto" });
    expect(auto.model).toBe("harmonic");
    expect(auto.errorBand.relative).toBeGreaterThan(0);
    expect(auto.errorBand.basis).toMatch(/harmonic balance/);
    const f = solveLink(system, { model: "fundamental" });
    expect(f.model).toBe("fundamental");
    expect(f.errorBand.basis).toMatch(/describing function/);
    const h = solveLink(system, { model: "harmonic", order: 9 });
    expect(h.harmonic?.order).toBe(9);
  });
});

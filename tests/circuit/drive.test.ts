import { describe, expect, expectTypeOf, it } from "vitest";
import { readFileSync } from "node:fs";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import {
  CLASS_E,
  classEDesign,
  classEDrive,
  currentDrive,
  fullBridgeDrive,
  halfBridgeDrive,
  parallelTankDrive,
  sineDrive,
  type ClassEDesign,
  type DriveEquivalent,
} from "../../lib/circuit/drive.ts";
import { TanklightInputError } from "../../lib/errors.ts";

interface Case {
  quantity: string;
  value: number;
}
const load = (name: string): Case[] =>
  (JSON.parse(readFileSync(new URL(`../fixtures/link/${name}`, import.meta.url), "utf8")) as { cases: Case[] }).cases;
const ideal = load("class-e-ideal.json");
const spot = load("sokal1975-raab1977.json");
const byName = (cases: Case[], q: string): number => {
  const c = cases.find((x) => x.quantity.startsWith(q));
  if (!c) throw new Error(`fixture has no ${q}`);
  return c.value;
};

describe("square-wave bridges", () => {
  it("a full bridge's fundamental is 4/π of its ±V_DD swing, a half bridge's is 2/π of V_DD", () => {
    // Fourier series of a 50 % square wave of amplitude A: fundamental 4A/π (independent
    // method below: a direct numerical Fourier integral of the switched waveform).
    const vdd = 12;
    const fundamental = (wave: (t: number) => number): number => {
      const n = 20000; // midpoint rule, exact to O(1/n²) on this piecewise-constant wave
      let a = 0;
      let b = 0;
      for (let i = 0; i < n; i++) {
        const t = (2 * Math.PI * (i + 0.5)) / n;
        a += wave(t) * Math.cos(t);
        b += wave(t) * Math.sin(t);
      }
      return (2 / n) * Math.hypot(a, b);
    };
    const full = fundamental((t) => (t < Math.PI ? vdd : -vdd));
    const half = fundamental((t) => (t < Math.PI ? vdd : 0));
    // rtol 1e-6: midpoint rule on a wave with two jumps, 20000 points
    expectRelClose(fullBridgeDrive(vdd).amplitude, full, 1e-6, "full bridge vs numerical Fourier integral");
    expectRelClose(halfBridgeDrive(vdd).amplitude, half, 1e-6, "half bridge vs numerical Fourier integral");
    expectRelClose(fullBridgeDrive(vdd).amplitude, (4 * vdd) / Math.PI, 1e-15, "full bridge 4V/π");
    expectRelClose(halfBridgeDrive(vdd).amplitude, (2 * vdd) / Math.PI, 1e-15, "half bridge 2V/π");
  });

  it("a full bridge has two switches in the current path, a half bridge one", () => {
    const f = fullBridgeDrive(5, 0.1);
    const h = halfBridgeDrive(5, 0.1);
    expect(f.kind === "voltage" && f.resistance).toBe(0.2);
    expect(h.kind === "voltage" && h.resistance).toBe(0.1);
  });

  it("sine and current drives pass their amplitude through", () => {
    const s = sineDrive(3, 50);
    expect(s.kind).toBe("voltage");
    expect(s.amplitude).toBe(3);
    expect(currentDrive(1.5)).toMatchObject({ kind: "current", amplitude: 1.5 });
  });

  it("rejects bad numbers with a TanklightInputError naming the field", () => {
    expect(() => halfBridgeDrive(-5)).toThrow(TanklightInputError);
    expect(() => fullBridgeDrive(5, -1)).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: fullBridgeDrive: onResistance: must be ≥ 0 Ω, got -1]`,
    );
    expect(() => sineDrive(Number.NaN)).toThrow(/amplitude/);
    expect(() => currentDrive(Infinity)).toThrow(/amplitude/);
  });
});

describe("class E", () => {
  it("the closed-form constants agree with the published 4-digit design values", () => {
    // source: Sokal & Sokal, IEEE JSSC SC-10(3), 1975; Raab, IEEE TCAS 24(12), 1977
    // (docs/references.md, checked). Tolerance: half a unit in the last printed decimal.
    const s = "source: Sokal & Sokal 1975; Raab 1977 (design equations)";
    const rt = (v: number): number => (0.5 * 10 ** -(String(v).split(".")[1]?.length ?? 0)) / v + 1e-12;
    const pairs: [string, number, string][] = [
      ["R·P/V_DD^2", CLASS_E.resistanceFactor, "R = 0.5768 V²/P"],
      ["omega·C1·R", CLASS_E.shuntFactor, "C₁ = 0.1836/(ωR)"],
      ["X/R", CLASS_E.excessReactanceFactor, "X = 1.1525 R"],
      ["peak switch voltage", CLASS_E.peakSwitchVoltageFactor, "V_sw,peak = 3.562 V_DD"],
      ["peak switch current", CLASS_E.peakSwitchCurrentFactor, "I_sw,peak = 2.862 I_DC"],
    ];
    for (const [q, ours, label] of pairs) {
      const ref = byName(spot, q);
      expectOutside({ quantity: `class E ${label}`, source: s, ours, reference: ref, rtol: rt(ref) });
    }
    expect(CLASS_E.minimumLoadedQ).toBe(byName(spot, "minimum loaded Q"));
  });

  it("the closed forms agree with the ideal waveform evaluated independently (mpmath quadrature and root)", () => {
    // independent method: scripts/gen_link_fixtures.py maximises the ideal switch waveform
    // numerically and takes its fundamental by quadrature. rtol 1e-13: both double-rounded.
    expectRelClose(CLASS_E.peakSwitchVoltageFactor, byName(ideal, "peak switch voltage"), 1e-13, "peak switch voltage");
    expectRelClose(
      CLASS_E.fundamentalFactor * Math.hypot(1, CLASS_E.excessReactanceFactor),
      byName(ideal, "switch-node fundamental"),
      1e-13,
      "switch-node fundamental = 1.0741·√(1 + 1.1525²)",
    );
    expectRelClose(byName(ideal, "average switch voltage"), 1, 1e-15, "the waveform averages to V_DD (sanity of the fixture)");
    // the fundamental across R: P = V_R²/(2R) with R = K_R V²/P → V_R = √(2 K_R) V
    expectRelClose(CLASS_E.fundamentalFactor, Math.sqrt(2 * CLASS_E.resistanceFactor), 1e-15, "V_R = √(2·0.5768)·V_DD");
  });

  it("classEDesign sizes a 5 V, 200 kHz, 2 W drive by the published relations", () => {
    const d = classEDesign({ supply: 5, frequency: 200e3, power: 2, inductance: 20e-6 });
    const w = 2 * Math.PI * 200e3;
    // source: Sokal & Sokal 1975 / Raab 1977 design relations (docs/references.md); rtol 1e-3:
    // the printed coefficients carry 4 digits
    const s = "source: Sokal & Sokal 1975; Raab 1977 (design equations)";
    expectOutside({ quantity: "class E R for 5 V, 2 W", source: s, ours: d.resistance, reference: (0.5768 * 25) / 2, rtol: 1e-3, unit: "Ω" });
    expectOutside({ quantity: "class E C₁ at 200 kHz", source: s, ours: d.shuntCapacitance, reference: 0.1836 / (w * d.resistance), rtol: 1e-3, unit: "F" });
    expectOutside({ quantity: "class E excess reactance", source: s, ours: d.excessReactance, reference: 1.1525 * d.resistance, rtol: 1e-3, unit: "Ω" });
    expectOutside({ quantity: "class E peak switch voltage at 5 V", source: s, ours: d.peakSwitchVoltage, reference: 3.562 * 5, rtol: 1e-3, unit: "V" });
    expectOutside({ quantity: "class E peak switch current", source: s, ours: d.peakSwitchCurrent, reference: 2.862 * (2 / 5), rtol: 1e-3, unit: "A" });
    // identities (independent of the sources): power balance and the series capacitor
    expectRelClose(0.5 * d.loadCurrent * d.loadCurrent * d.resistance, d.power, 1e-13, "½I²R = P");
    expectRelClose(d.dcCurrent * d.supply, d.power, 1e-15, "V_DD·I_DC = P (lossless switch)");
    expectRelClose(w * 20e-6 - 1 / (w * d.seriesCapacitance!), d.excessReactance, 1e-12, "ωL − 1/(ωC) = X");
    expectRelClose(d.loadedQ!, (w * 20e-6) / d.resistance, 1e-15, "Q_L = ωL/R");
    // Q_L = ωL/R ≈ 3.5 is above the minimum 1.7879 but low for the high-Q assumption: one warning
    expect(d.warnings.length).toBe(1);
    expect(d.warnings[0]).toMatch(/loaded Q 3.49 is low/);
  });

  it("classEDesign from a resistance gives the power back, and warns below the minimum loaded Q", () => {
    const a = classEDesign({ supply: 12, frequency: 1e6, power: 10 });
    const b = classEDesign({ supply: 12, frequency: 1e6, resistance: a.resistance });
    expectRelClose(b.power, 10, 1e-14, "round trip power → R → power");
    const low = classEDesign({ supply: 5, frequency: 200e3, power: 2, inductance: 5e-6 });
    expect(low.loadedQ!).toBeLessThan(CLASS_E.minimumLoadedQ);
    expect(low.warnings.join(" ")).toMatch(/below the class-E minimum/);
  });

  it("classEDesign rejects a missing or doubled power/resistance", () => {
    expect(() => classEDesign({ supply: 5, frequency: 2e5 })).toThrow(/exactly one of power/);
    expect(() => classEDesign({ supply: 5, frequency: 2e5, power: 1, resistance: 3 })).toThrow(TanklightInputError);
    expect(() => classEDesign({ supply: 0, frequency: 2e5, power: 1 })).toThrow(/supply/);
  });

  it("the equivalent source drives the design's R with the design current when the network keeps X", () => {
    const d = classEDesign({ supply: 5, frequency: 200e3, power: 2 });
    const e = classEDrive(d);
    // |V_eq| / |R + jX| must equal the design's network current (a consistency identity)
    expectRelClose(e.amplitude / Math.hypot(d.resistance, d.excessReactance), d.loadCurrent, 1e-14, "I = V_eq/|R + jX|");
    expect(e.kind === "voltage" && e.resistance).toBe(0);
    expect(e.assumptions.join(" ")).toMatch(/optimum/);
  });
});

describe("class-E equivalent against a time-domain simulation of the ideal circuit", () => {
  const off = JSON.parse(readFileSync(new URL("../fixtures/link/class-e-offnominal.json", import.meta.url), "utf8")) as {
    cases: { loadedQ: number; loadRatio: number; simulatedCurrent: number; equivalentCurrent: number; simulatedPeakSwitchVoltage: number }[];
  };
  const src = "independent method: RK4 simulation of the ideal class-E circuit, Q_L = 10 (scripts/gen_classe_offnominal.py)";

  it("at the nominal load the equivalent source gives the simulated network current", () => {
    const nominal = off.cases.find((c) => c.loadRatio === 1)!;
    const d = classEDesign({ supply: 1, frequency: 1 / (2 * Math.PI), resistance: 1 });
    const e = classEDrive(d);
    const ours = e.amplitude / Math.hypot(1, d.excessReactance);
    // rtol 3 %: the relations assume an infinite loaded Q and choke; at Q_L = 10 the simulated
    // fundamental is 2.0 % higher (and the peak switch voltage 3.74 rather than 3.562 V_DD)
    expectOutside({ quantity: "class-E network current at nominal load (V_DD = 1 V, R = 1 Ω)", source: src, ours, reference: nominal.simulatedCurrent, rtol: 0.03, unit: "A" });
    expectOutside({ quantity: "class-E peak switch voltage at Q_L = 10", source: src, ours: d.peakSwitchVoltage, reference: nominal.simulatedPeakSwitchVoltage, rtol: 0.06, unit: "V" });
  });

  it("off the nominal load (R'/R from 0.25 to 4) the equivalent stays within 15 % of the simulation (measured ≤ 12.7 %)", () => {
    // the measured band of the equivalent's error, reported in docs/methods/link.md: it
    // under-predicts light loads (+9 % at R'/R = 0.25) and over-predicts heavy ones (−13 % at 4)
    for (const c of off.cases) {
      expectRelClose(c.equivalentCurrent, c.simulatedCurrent, 0.15, `R'/R = ${c.loadRatio}`);
      const d = classEDesign({ supply: 1, frequency: 1 / (2 * Math.PI), resistance: 1 });
      const ours = classEDrive(d).amplitude / Math.hypot(c.loadRatio, d.excessReactance);
      expectRelClose(ours, c.equivalentCurrent, 1e-4, "the fixture's equivalent is ours");
    }
  });
});

describe("parallel-tank single switch", () => {
  it("its tank fundamental is π/2 of the supply (half sine of peak πV_DD averaging to V_DD)", () => {
    // independent method: numerical Fourier integral of the half-sine switch waveform whose
    // average must equal the supply
    const vdd = 5;
    const n = 20000;
    let avg = 0;
    let a = 0;
    let b = 0;
    for (let i = 0; i < n; i++) {
      const t = (2 * Math.PI * (i + 0.5)) / n;
      const v = t >= Math.PI ? Math.PI * vdd * -Math.sin(t) : 0;
      avg += v / n;
      a += (2 / n) * v * Math.cos(t);
      b += (2 / n) * v * Math.sin(t);
    }
    // rtol 1e-7: midpoint rule with 20000 points on a wave with a kink
    expectRelClose(avg, vdd, 1e-7, "the switch node averages to the supply");
    expectRelClose(parallelTankDrive(vdd).amplitude, Math.hypot(a, b), 1e-7, "fundamental of the half sine");
  });
});

describe("types", () => {
  it("drive constructors return DriveEquivalent", () => {
    expectTypeOf(sineDrive).returns.toEqualTypeOf<DriveEquivalent>();
    expectTypeOf(classEDrive).parameter(0).toEqualTypeOf<ClassEDesign>();
    expectTypeOf(classEDesign).returns.toEqualTypeOf<ClassEDesign>();
  });
});

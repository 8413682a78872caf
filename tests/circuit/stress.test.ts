import { describe, expect, expectTypeOf, it } from "vitest";
import { capacitorStress, type CapacitorStress } from "../../lib/circuit/stress.ts";
import { esrFromDissipationFactor, recommendCapacitor, dielectric, DIELECTRICS, VOLTAGE_RATINGS } from "../../lib/circuit/dielectrics.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

describe("capacitorStress", () => {
  it("voltage-given and current-given inputs agree: I = ωC·V, RMS = peak/√2", () => {
    const C = 6.8e-9, f = 200e3, V = 30;
    const a = capacitorStress({ capacitance: C, frequency: f, voltageAmplitude: V });
    expectRelClose(a.peakCurrent, 2 * Math.PI * f * C * V, 1e-15, "I = ωCV");
    expectRelClose(a.rmsVoltage, V / Math.SQRT2, 1e-15, "V_rms");
    const b = capacitorStress({ capacitance: C, frequency: f, currentAmplitude: a.peakCurrent });
    expectRelClose(b.peakVoltage, V, 1e-14, "round trip");
    expectRelClose(a.reactivePower, 0.5 * V * a.peakCurrent, 1e-15, "Q = ½·V·I");
    // loss = I_rms²·ESR, ESR = tan δ/(ωC)
    expectRelClose(a.dissipatedPower, a.rmsCurrent ** 2 * (DIELECTRICS.C0G.dissipationFactor / (2 * Math.PI * f * C)), 1e-14, "P = I²·ESR");
    // and equals tan δ × reactive power (identity)
    expectRelClose(a.dissipatedPower, DIELECTRICS.C0G.dissipationFactor * a.reactivePower, 1e-14, "P = tan δ·Q");
  });

  it("recommends a tank dielectric and a rating of at least twice the peak (trade practice)", () => {
    const s = capacitorStress({ capacitance: 6.8e-9, frequency: 200e3, voltageAmplitude: 40 });
    expect(s.recommendation.ratedVoltage).toBe(100);
    expect(s.recommendation.dielectrics[0]).toBe("C0G");
    expect(recommendCapacitor(40, 100e-9).dielectrics[0]).toBe("polypropylene");
    expect(recommendCapacitor(5000, 1e-9).ratedVoltage).toBe(Infinity);
    for (const d of s.recommendation.dielectrics) expect(DIELECTRICS[d].goodForTanks).toBe(true);
  });

  it("warns about a class 2 dielectric, an under-rated part, and cautions at high voltage", () => {
    const s = capacitorStress({ capacitance: 10e-9, frequency: 150e3, voltageAmplitude: 120, dielectric: "X7R", ratedVoltage: 100 });
    expect(s.warnings.join(" ")).toMatch(/X7R.*detunes/);
    expect(s.warnings.join(" ")).toMatch(/exceeds the part's rating/);
    expect(s.cautions.join(" ")).toMatch(/local codes/);
    const low = capacitorStress({ capacitance: 10e-9, frequency: 150e3, voltageAmplitude: 5, ratedVoltage: 50 });
    expect(low.warnings).toEqual([]);
    expect(low.cautions).toEqual([]);
  });

  it("bad input throws", () => {
    expect(() => capacitorStress({ capacitance: 1e-9, frequency: 1e5 })).toThrow(/exactly one/);
    expect(() => capacitorStress({ capacitance: 1e-9, frequency: 1e5, voltageAmplitude: -1 })).toThrow(/≥ 0/);
  });

  it("types", () => {
    expectTypeOf(capacitorStress).returns.toEqualTypeOf<CapacitorStress>();
  });
});

describe("dielectrics", () => {
  it("ESR = tan δ/(ωC)", () => {
    expectRelClose(esrFromDissipationFactor(4e-4, 200e3, 10e-9), 4e-4 / (2 * Math.PI * 200e3 * 10e-9), 1e-15, "ESR");
    expectRelClose(esrFromDissipationFactor("polypropylene", 200e3, 10e-9), DIELECTRICS.polypropylene.dissipationFactor / (2 * Math.PI * 2e-3), 1e-15, "by key");
  });

  it("every entry is labelled, tank dielectrics are the low-loss ones", () => {
    for (const [k, d] of Object.entries(DIELECTRICS)) {
      expect(d.source).toMatch(/memory/);
      if (d.goodForTanks) expect(d.dissipationFactor, k).toBeLessThanOrEqual(2e-3);
      else expect(d.dissipationFactor, k).toBeGreaterThanOrEqual(5e-3);
    }
    expect(dielectric("C0G").dissipationFactor).toBe(5e-4);
    expect([...VOLTAGE_RATINGS].sort((a, b) => a - b)).toEqual(VOLTAGE_RATINGS);
  });
});

import { describe, expect, it } from "vitest";
import { HAZARD_THRESHOLDS, HIGH_VOLTAGE } from "../../lib/hazards.ts";
import { capacitorStress } from "../../lib/circuit/stress.ts";
import { tokenResponse } from "../../lib/circuit/loads/tokenResponse.ts";
import { resistorLoad } from "../../lib/circuit/loads/tokenCircuits.ts";
import { resonantCapacitance } from "../../lib/circuit/tank.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { DEFAULT_CAUTION_VOLTAGE } from "../../lib/circuit/link/network.ts";

describe("hazard thresholds: one constant per hazard, used everywhere", () => {
  it("every threshold carries a value, a unit, a source form and a meaning", () => {
    for (const t of Object.values(HAZARD_THRESHOLDS)) {
      expect(Number.isFinite(t.value) && t.value > 0).toBe(true);
      expect(t.unit.length).toBeGreaterThan(0);
      expect(t.source).toMatch(/^(source:|from memory \(unverified\)|trade practice \(no source\))/);
      expect(t.meaning.length).toBeGreaterThan(10);
    }
  });

  it("42.4 V peak is 30 V RMS of a sine", () => {
    // trade practice (no source): the high-voltage threshold is quoted as 30 V RMS
    // (42.4 is 30·√2 = 42.43 rounded down to one decimal, as the standards print it)
    expectRelClose(HIGH_VOLTAGE.value / Math.SQRT2, 30, 1e-3, "high-voltage threshold, V RMS");
  });

  it("capacitorStress, tokenResponse and the link solver switch at the same voltage", () => {
    const v = HIGH_VOLTAGE.value;
    const just = (x: number) => capacitorStress({ capacitance: 10e-9, frequency: 150e3, voltageAmplitude: x }).cautions.length;
    expect(just(v * 0.999)).toBe(0);
    expect(just(v * 1.001)).toBe(1);
    expect(DEFAULT_CAUTION_VOLTAGE).toBe(v);
    // tokenResponse: a resistor load on a resonant tank, amplitude = EMF·(R_L ∥ …) — find EMFs either side
    const f = 200e3, L = 100e-6, C = resonantCapacitance(L, f);
    const tok = (emf: number) => tokenResponse({ emf, frequency: f, inductance: L, coilResistance: 5, capacitance: C, load: resistorLoad(2000) });
    const gain = tok(1).amplitude; // linear load: amplitude ∝ EMF
    expect(tok((v * 0.999) / gain).warnings).toEqual([]);
    expect(tok((v * 1.001) / gain).warnings.join(" ")).toMatch(/high voltage/);
  });
});

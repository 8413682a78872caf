import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { resonantCapacitance, resonantFrequency, tankQuality, tankBandwidth, detuningTolerance } from "../../lib/circuit/tank.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

describe("resonantCapacitance / resonantFrequency", () => {
  it("Thomson's formula: 100 µH tuned to 200 kHz needs 6.3326 nF", () => {
    // independent method: C = 1/(4π²f²L) evaluated by hand = 6.332573977646111e-9 F
    expectOutside({
      quantity: "C for 100 µH at 200 kHz",
      source: "independent method: Thomson's formula f = 1/(2π√(LC)) evaluated directly",
      ours: resonantCapacitance(100e-6, 200e3),
      reference: 1 / (4 * Math.PI ** 2 * 200e3 ** 2 * 100e-6),
      rtol: 1e-15,
      unit: "F",
    });
    // ARRL-style worked value (from memory (unverified)): 1 µH with 253.3 pF resonates at 10 MHz
    expectOutside({ quantity: "f for 1 µH, 253.3 pF", source: "from memory (unverified): 1 µH + 253.3 pF ≈ 10 MHz", ours: resonantFrequency(1e-6, 253.3e-12), reference: 10e6, rtol: 1e-4, unit: "Hz" });
  });

  it("round trip: resonantFrequency(L, resonantCapacitance(L, f)) = f (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-9, max: 1, noNaN: true }), fc.double({ min: 1e3, max: 1e8, noNaN: true }), (L, f) => {
        const back = resonantFrequency(L, resonantCapacitance(L, f));
        return Math.abs(back / f - 1) < 4e-16 * 8; // a few roundings
      }),
    );
  });

  it("bad input throws", () => {
    expect(() => resonantCapacitance(0, 1e5)).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: resonantCapacitance: inductance: must be > 0 H, got 0]`,
    );
    expect(() => resonantFrequency(1e-6, Number.NaN)).toThrow(/capacitance/);
  });
});

describe("tankQuality / bandwidth / detuningTolerance", () => {
  it("coil-only loss: Q = ωL/R, bandwidth f₀/Q, dynamic resistance Q·ωL = L/(CR)", () => {
    const L = 100e-6, C = 6.8e-9, R = 2;
    const t = tankQuality({ inductance: L, capacitance: C, coilResistance: R });
    const w = 2 * Math.PI * resonantFrequency(L, C);
    expectRelClose(t.q, (w * L) / R, 1e-14, "Q");
    expectRelClose(t.bandwidth, t.frequency / t.q, 1e-15, "bandwidth");
    // independent identity: R_p = L/(C·R) for a series-loss coil at resonance
    expectRelClose(t.dynamicResistance, L / (C * R), 1e-13, "R_p = L/(CR)");
    expect(t.capacitorQ).toBe(Infinity);
  });

  it("losses add reciprocally: coil, capacitor tan δ and a parallel load", () => {
    const t = tankQuality({ inductance: 100e-6, capacitance: 6.8e-9, coilResistance: 2, dissipationFactor: 1e-3, parallelResistance: 20e3 });
    expectRelClose(1 / t.q, 1 / t.coilQ + 1 / t.capacitorQ + 1 / t.loadQ, 1e-14, "1/Q sum");
    expectRelClose(t.capacitorQ, 1000, 1e-12, "Q_C = 1/tan δ");
    // ESR form gives the same capacitor Q
    const esr = 1e-3 / (2 * Math.PI * t.frequency * 6.8e-9);
    expectRelClose(tankQuality({ inductance: 100e-6, capacitance: 6.8e-9, capacitorEsr: esr }).q, 1000, 1e-12, "ESR form");
    expect(() => tankQuality({ inductance: 1e-6, capacitance: 1e-9 })).toThrow(/at least one loss/);
  });

  it("detuning: the −3 dB points are f₀(√(1 + 1/4Q²) ± 1/2Q) and their half-width is exactly 1/(2Q)", () => {
    for (const q of [5, 30, 200]) {
      const d = detuningTolerance(q, 1 - Math.SQRT1_2);
      // source: universal resonance curve (Terman 1943, from memory (unverified)); closed form of its −3 dB points
      const root = Math.sqrt(1 + 1 / (4 * q * q));
      expectRelClose(d.upperRatio, root + 1 / (2 * q), 1e-12, `upper, Q = ${q}`);
      expectRelClose(d.lowerRatio, root - 1 / (2 * q), 1e-12, `lower, Q = ${q}`);
      expectRelClose(d.relativeHalfWidth, 1 / (2 * q), 1e-12, `half width, Q = ${q}`);
      // geometric symmetry of a single tuned circuit: lower·upper = 1
      expectRelClose(d.lowerRatio * d.upperRatio, 1, 1e-14, "f_lo·f_hi = f₀²");
    }
  });

  it("detuning: at the returned ratios the response has fallen by the fraction", () => {
    const q = 40, frac = 0.1;
    const d = detuningTolerance(q, frac);
    for (const r of [d.lowerRatio, d.upperRatio]) {
      const h = 1 / Math.sqrt(1 + (q * (r - 1 / r)) ** 2);
      expectRelClose(h, 1 - frac, 1e-12, `ratio ${r}`);
    }
    // the capacitance change that moves f₀ by the same ratios
    expectRelClose(1 / Math.sqrt(1 + d.capacitanceChange[0]), d.upperRatio, 1e-12, "C change ↔ f ratio");
    expectRelClose(tankBandwidth(200e3, 50), 4000, 1e-15, "bandwidth");
    expect(() => detuningTolerance(40, 1)).toThrow(/fraction/);
  });

  it("types", () => {
    expectTypeOf(resonantCapacitance).parameters.toEqualTypeOf<[number | string, number | string]>(); // SI numbers or quantity strings
    expectTypeOf(resonantFrequency).returns.toEqualTypeOf<number>();
  });
});

describe("tuneWithStandardParts", () => {
  it("each choice's frequency follows from its capacitance, and the ranking is by |error| then part count", async () => {
    const { tuneWithStandardParts } = await import("../../lib/circuit/tank.ts");
    const L = 100e-6, f = 200e3;
    const r = tuneWithStandardParts(L, f, { series: "E12", maxParts: 2 });
    expectRelClose(r.capacitance, resonantCapacitance(L, f), 1e-15, "ideal C");
    for (const c of r.choices) {
      expectRelClose(c.frequency, resonantFrequency(L, c.capacitance), 1e-14, "f from C");
      // f ∝ C^(−1/2): a small capacitance error ε moves f by ≈ −ε/2
      const eps = c.capacitance / r.capacitance - 1;
      expectRelClose(c.frequencyError, 1 / Math.sqrt(1 + eps) - 1, 1e-9, "error relation", 1e-15);
    }
    expect(r.choices[0]).toMatchObject({ parts: [6.8e-9, 1e-7], topology: "series" });
    // a single E12 part is worse than the best pair
    const single = tuneWithStandardParts(L, f, { maxParts: 1 }).choices[0]!;
    expect(Math.abs(single.frequencyError)).toBeGreaterThan(Math.abs(r.choices[0]!.frequencyError));
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { resonantFrequencyWindow, type FrequencyWindow } from "../../lib/circuit/tolerance.ts";
import { resonantFrequency } from "../../lib/circuit/tank.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { expectOutside } from "../helpers/validation.ts";

describe("resonantFrequencyWindow", () => {
  const base = { inductance: 100e-6, capacitance: 6.8e-9, inductanceTolerance: 0.05, capacitanceTolerance: 0.05 };

  it("worst case: both parts high give the lowest frequency, both low the highest", () => {
    const w = resonantFrequencyWindow(base);
    expectRelClose(w.worstCase.min, resonantFrequency(105e-6, 6.8e-9 * 1.05), 1e-14, "min");
    expectRelClose(w.worstCase.max, resonantFrequency(95e-6, 6.8e-9 * 0.95), 1e-14, "max");
    expectRelClose(w.nominal, resonantFrequency(100e-6, 6.8e-9), 1e-15, "nominal");
  });

  it("statistical band lies inside the worst case and its σ matches first-order propagation", () => {
    const w = resonantFrequencyWindow({ ...base, samples: 40000, seed: 7 });
    expect(w.statistical.lower).toBeGreaterThan(w.worstCase.min);
    expect(w.statistical.upper).toBeLessThan(w.worstCase.max);
    // uniform ±5 % on each part: σ_f/f = ½√2·0.05/√3 = 2.04 %; Monte Carlo of 40 000 draws has
    // a sampling error of ≈ 0.4 % in σ, and the first-order formula misses O(t²) ≈ 0.5 % terms
    expectOutside({
      quantity: "σ_f of a ±5 %/±5 % uniform tank batch",
      source: "independent method: first-order propagation of uncertainty (GUM, JCGM 100:2008 eq. 10, from memory (unverified))",
      ours: w.statistical.sd,
      reference: w.linearisedSd,
      rtol: 0.02,
      unit: "Hz",
    });
  });

  it("a normal reading (t = 3σ) gives a narrower band than a uniform one", () => {
    const u = resonantFrequencyWindow({ ...base, seed: 3 });
    const n = resonantFrequencyWindow({ ...base, seed: 3, distribution: "normal" });
    expect(n.statistical.sd).toBeLessThan(u.statistical.sd);
    expectRelClose(n.statistical.sd, n.linearisedSd, 0.03, "normal: MC σ vs linearised (truncation at 3σ and sampling)");
  });

  it("the same seed gives the same band; another seed a slightly different one", () => {
    const a = resonantFrequencyWindow({ ...base, seed: 11 });
    const b = resonantFrequencyWindow({ ...base, seed: 11 });
    const c = resonantFrequencyWindow({ ...base, seed: 12 });
    expect(a).toEqual(b);
    expect(a.statistical.mean).not.toBe(c.statistical.mean);
  });

  it("zero tolerances collapse the window to f₀", () => {
    const w = resonantFrequencyWindow({ ...base, inductanceTolerance: 0, capacitanceTolerance: 0, samples: 100 });
    expect(w.worstCase.min).toBe(w.nominal);
    // the sample σ of identical doubles is 0 up to the rounding of their mean: 1e-15·f₀ floor
    expectRelClose(w.statistical.sd, 0, 0, "σ", 1e-15 * w.nominal);
  });

  it("bad input throws", () => {
    expect(() => resonantFrequencyWindow({ ...base, capacitanceTolerance: 5 })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: resonantFrequencyWindow: capacitanceTolerance: must be a relative tolerance in [0, 1), e.g. 0.05 for ±5 %, got 5]`,
    );
  });

  it("types", () => {
    expectTypeOf(resonantFrequencyWindow).returns.toEqualTypeOf<FrequencyWindow>();
  });
});

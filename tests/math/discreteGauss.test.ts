import { describe, expect, it } from "vitest";
import { discreteGaussRule } from "../../lib/math/discreteGauss.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

describe("discreteGaussRule", () => {
  it("is the two-point rule of four equal points: the roots of x² − 3x + 1 (closed form: mean 1.5, variance 1.25)", () => {
    const r = discreteGaussRule([3, 1, 0, 2], [1, 1, 1, 1], 2);
    expectRelClose(r.x[0]!, 1.5 - Math.sqrt(1.25), 1e-14, "x₁");
    expectRelClose(r.x[1]!, 1.5 + Math.sqrt(1.25), 1e-14, "x₂");
    expectRelClose(r.w[0]!, 2, 1e-14, "w₁");
    expectRelClose(r.w[1]!, 2, 1e-14, "w₂");
  });

  it("sums every polynomial of degree ≤ 2p − 1 exactly, for uneven points and weights (against the direct sum)", () => {
    const x = Array.from({ length: 30 }, (_, i) => 0.004 + 0.0001 * i + 0.00003 * Math.sin(7 * i));
    const w = x.map((_, i) => 1 + 0.5 * Math.cos(3 * i));
    for (const p of [1, 2, 3, 5, 8]) {
      const r = discreteGaussRule(x, w, p);
      expect(r.x.length).toBe(p);
      for (let d = 0; d < 2 * p; d++) {
        const f = (v: number) => ((v - 0.0055) / 0.0015) ** d;
        const direct = x.reduce((a, v, i) => a + w[i]! * f(v), 0);
        const rule = Array.from(r.x).reduce((a, v, i) => a + r.w[i]! * f(v), 0);
        expect(Math.abs(rule - direct), `p = ${p}, degree ${d}`).toBeLessThanOrEqual(1e-11 * w.reduce((a, b) => a + b, 0));
      }
      expect(Math.min(...r.w)).toBeGreaterThan(0);
    }
  });

  it("returns the measure itself (repeats merged) when p reaches the number of distinct points", () => {
    const r = discreteGaussRule([2, 1, 2, 3], [1, 1, 1, 1], 3);
    expect(Array.from(r.x)).toEqual([1, 2, 3]);
    expect(Array.from(r.w)).toEqual([1, 2, 1]);
  });
});

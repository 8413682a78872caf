import { describe, expect, it } from "vitest";
import { TanklightInputError, wilsonInterval } from "../../lib/mod.ts";
import { normalQuantile } from "../../lib/analysis/confidence.ts";
import { createRandom } from "../../lib/advanced.ts";
import { expectOutside } from "../helpers/validation.ts";

describe("wilsonInterval", () => {
  it("matches a published worked example", () => {
    const ci = wilsonInterval(81, 263, 0.95);
    // from memory (unverified): Newcombe, Stat. Med. 17:857–872 (1998), Table I, 81/263 → 0.2553,
    // 0.3662 (half a unit in the 4th digit)
    expectOutside({ quantity: "Wilson 95 % interval of 81/263, lower", source: "from memory (unverified): Newcombe 1998 Table I", ours: ci.lower, reference: 0.2553, rtol: 2e-4 });
    expectOutside({ quantity: "Wilson 95 % interval of 81/263, upper", source: "from memory (unverified): Newcombe 1998 Table I", ours: ci.upper, reference: 0.3662, rtol: 2e-4 });
  });

  it("uses normal quantiles good to many digits", () => {
    // source: Abramowitz & Stegun 1964, Table 26.5 (percentage points of the normal distribution)
    expectOutside({ quantity: "z(0.975)", source: "source: Abramowitz & Stegun 1964 Table 26.5", ours: normalQuantile(0.975), reference: 1.959964, rtol: 5e-7 });
    expectOutside({ quantity: "z(0.995)", source: "source: Abramowitz & Stegun 1964 Table 26.5", ours: normalQuantile(0.995), reference: 2.575829, rtol: 5e-7 });
    expect(normalQuantile(0.5)).toBe(0);
  });

  it("bounds are the roots of (p̂ − p)² = z²·p(1 − p)/n (independent method: the quadratic solved by bisection)", () => {
    const z = 1.959963984540054; // 97.5 % normal quantile, source: A&S 1964 Table 26.5 (1.959964)
    for (const [k, n] of [[0, 10], [3, 10], [50, 100], [99, 100], [7, 7]] as const) {
      const ci = wilsonInterval(k, n, 0.95);
      const p = k / n;
      const f = (q: number): number => (p - q) ** 2 - (z * z * q * (1 - q)) / n;
      const root = (a: number, b: number): number => {
        for (let i = 0; i < 200; i++) {
          const m = (a + b) / 2;
          if (f(a) * f(m) <= 0) b = m;
          else a = m;
        }
        return (a + b) / 2;
      };
      // (open brackets: the quadratic also vanishes at q = p when p is 0 or 1)
      if (k > 0) expect(Math.abs(ci.lower - root(0, p - 1e-12)) / ci.lower).toBeLessThan(1e-6);
      else expect(ci.lower).toBe(0);
      if (k < n) expect(Math.abs(ci.upper - root(p + 1e-12, 1)) / ci.upper).toBeLessThan(1e-6);
      else expect(ci.upper).toBe(1);
    }
  });

  it("covers the true proportion at about its stated rate over many seeds, and shrinks as 1/√n", () => {
    // source: Brown, Cai & DasGupta, Statistical Science 16(2), 2001: Wilson's coverage stays
    // close to nominal for moderate n; with 2000 repetitions the Monte Carlo error is ±0.005
    const truth = 0.9;
    let covered = 0;
    const reps = 2000;
    for (let seed = 0; seed < reps; seed++) {
      const rng = createRandom(seed);
      let k = 0;
      for (let i = 0; i < 200; i++) if (rng.uniform() < truth) k++;
      const ci = wilsonInterval(k, 200, 0.95);
      if (ci.lower <= truth && truth <= ci.upper) covered++;
    }
    expect(Math.abs(covered / reps - 0.95)).toBeLessThan(0.02);
    const w = (n: number): number => {
      const ci = wilsonInterval(Math.round(0.8 * n), n);
      return ci.upper - ci.lower;
    };
    expect(w(400) / w(1600)).toBeGreaterThan(1.95);
    expect(w(400) / w(1600)).toBeLessThan(2.05);
  });

  it("rejects impossible counts", () => {
    expect(() => wilsonInterval(5, 4)).toThrow(TanklightInputError);
    expect(() => wilsonInterval(1, 4, 1.5)).toThrow(TanklightInputError);
  });
});

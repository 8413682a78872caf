import { describe, expect, expectTypeOf, it } from "vitest";
import { mean, sampleSkewness, standardDeviation } from "simple-statistics";
import { createRandom, createRandomFromState, type RandomSource } from "../../lib/math/random.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectOutside } from "../helpers/validation.ts";
import ref from "../fixtures/math/xoshiro128ss.json" with { type: "json" };
import cref from "../fixtures/math/xoshiro128ss-c-reference-vectors.json" with { type: "json" };

const PORT = "independent method: Python port of xoshiro128** + SplitMix64 seeding (tests/fixtures/math/xoshiro128ss.json)";

describe("createRandom(seed) — xoshiro128**", () => {
  it("reproduces test data of the C reference implementation of xoshiro128** (published vectors)", () => {
    // source: C reference implementation test data as published in edorfaus/xoshiro-6502
    // test-rom/testdata.asm (fixture tests/fixtures/math/xoshiro128ss-c-reference-vectors.json)
    for (const c of cref.cases) {
      const rng = createRandomFromState(c.state as [number, number, number, number]);
      c.outputs.forEach((expected, i) => {
        // exact integer equality (rtol 0)
        expectOutside({ quantity: `xoshiro128** output ${i} from the published state`, source: "source: C reference test data (edorfaus/xoshiro-6502 testdata.asm)", ours: rng.nextUint32(), reference: expected, rtol: 0 });
      });
      expect(rng.seed).toBe(-1);
    }
    expect(() => createRandomFromState([0, 0, 0, 0])).toThrow(TanklightInputError);
    expect(() => createRandomFromState([1, 2, 3, 2 ** 32])).toThrow(TanklightInputError);
  });

  it("reproduces an independent Python port of xoshiro128** (Blackman & Vigna 2021) bit for bit", () => {
    for (const c of ref.cases) {
      const rng = createRandom(c.seed);
      expect(c.uint32.map(() => rng.nextUint32())).toEqual(c.uint32);
      const u = createRandom(c.seed);
      c.uniform.forEach((x, i) => {
        // exact: the 53-bit construction is exact in double arithmetic
        expectOutside({ quantity: `uniform draw ${i} of seed ${c.seed}`, source: PORT, ours: u.uniform(), reference: x, rtol: 0 });
      });
    }
  });

  it("the same seed gives the same stream; different seeds differ", () => {
    const a = createRandom(123);
    const b = createRandom(123);
    const c = createRandom(124);
    const xa = Array.from({ length: 50 }, () => a.normal());
    expect(Array.from({ length: 50 }, () => b.normal())).toEqual(xa);
    expect(Array.from({ length: 50 }, () => c.normal())).not.toEqual(xa);
    expect(a.seed).toBe(123);
  });

  it("uniform() lies in [0, 1) with mean ½ and variance 1/12 (statistical check, 200,000 draws)", () => {
    const rng = createRandom(2026);
    const n = 200_000;
    const xs = Array.from({ length: n }, () => rng.uniform());
    expect(xs.reduce((m, x) => Math.min(m, x), 1)).toBeGreaterThanOrEqual(0);
    expect(xs.reduce((m, x) => Math.max(m, x), 0)).toBeLessThan(1);
    // standard error of the mean √(1/12/n) = 6.5e-4: 5σ bound
    expect(Math.abs(mean(xs) - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / n));
    // sd of U(0,1) = 1/√12 = 0.2887; its standard error ≈ 0.2887·√(0.8/(4n))… < 3.3e-4; 5σ bound
    expect(Math.abs(standardDeviation(xs) - 1 / Math.sqrt(12))).toBeLessThan(1.7e-3);
    // 10-bin histogram, chi-square with 9 degrees of freedom: 99.9th percentile is 27.9
    const bins = new Array<number>(10).fill(0);
    for (const x of xs) bins[Math.floor(x * 10)]! += 1;
    const chi2 = bins.reduce((s, k) => s + (k - n / 10) ** 2 / (n / 10), 0);
    expect(chi2).toBeLessThan(27.9);
  });

  it("uniformIn(low, high) maps onto [low, high)", () => {
    const rng = createRandom(9);
    for (let i = 0; i < 1000; i++) {
      const x = rng.uniformIn(-3, 5);
      expect(x).toBeGreaterThanOrEqual(-3);
      expect(x).toBeLessThan(5);
    }
  });

  it("normal(mean, sd) has the requested mean and sd, no skew, and Gaussian tail fractions (200,000 draws)", () => {
    const rng = createRandom(77);
    const n = 200_000;
    const xs = Array.from({ length: n }, () => rng.normal(3, 2));
    // standard errors: mean 2/√n = 4.5e-3, sd ≈ 2/√(2n) = 3.2e-3, skewness √(6/n) = 5.5e-3; 5σ bounds
    expect(Math.abs(mean(xs) - 3)).toBeLessThan(5 * 2 / Math.sqrt(n));
    expect(Math.abs(standardDeviation(xs) - 2)).toBeLessThan(5 * 2 / Math.sqrt(2 * n));
    expect(Math.abs(sampleSkewness(xs))).toBeLessThan(5 * Math.sqrt(6 / n));
    // P(|Z| > 1) = 0.3173, P(|Z| > 2) = 0.0455 (source: A&S 1964 Table 26.1, erfc values)
    const over1 = xs.filter((x) => Math.abs(x - 3) > 2).length / n;
    const over2 = xs.filter((x) => Math.abs(x - 3) > 4).length / n;
    expectOutside({ quantity: "P(|Z| > 1) of normal()", source: "source: A&S 1964 Table 26.1 (normal probability integral)", ours: over1, reference: 0.31731, rtol: 0.01 });
    expectOutside({ quantity: "P(|Z| > 2) of normal()", source: "source: A&S 1964 Table 26.1 (normal probability integral)", ours: over2, reference: 0.0455, rtol: 0.05 });
    // tolerances: binomial standard errors √(p(1−p)/n) are 1.0e-3 (0.33 % of 0.317) and 4.7e-4
    // (1.0 % of 0.0455); the bounds are ≈ 3σ and 5σ.
  });

  it("rejects seeds that are not safe non-negative integers", () => {
    for (const bad of [-1, 1.5, Number.NaN, Infinity, 2 ** 53]) expect(() => createRandom(bad)).toThrow(TanklightInputError);
    expect(() => createRandom(-1)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: createRandom: seed: must be an integer in [0, 2^53 − 1], got -1]`);
  });

  it("has the documented types", () => {
    expectTypeOf(createRandom).toEqualTypeOf<(seed: number) => RandomSource>();
    expectTypeOf(createRandomFromState).parameter(0).toEqualTypeOf<readonly [number, number, number, number]>();
    expectTypeOf<RandomSource["normal"]>().toEqualTypeOf<(mean?: number, sd?: number) => number>();
  });
});

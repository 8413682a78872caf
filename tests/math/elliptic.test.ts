import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import ellipk from "@stdlib/math-base-special-ellipk";
import ellipe from "@stdlib/math-base-special-ellipe";
import {
  ellipticE,
  ellipticK,
  ellipticKE,
  ellipticKEComplement,
  ellipticKEInto,
  type EllipticPair,
} from "../../lib/math/elliptic.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { integrateGaussLegendre } from "../../lib/math/quadrature.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import table from "../fixtures/math/as-table-17-1.json" with { type: "json" };
import mp from "../fixtures/math/elliptic-mpmath.json" with { type: "json" };

// Tolerance regimes (relative):
// - MPMATH_RTOL = 2e-15 against 17-digit mpmath values, all m: the AGM is exact to a few
//   rounding errors (measured worst 4.3e-16 over the whole fixture, both forms); 2e-15
//   leaves room for a different libm sqrt, and is well inside the 1e-14.
// - TABLE_RTOL = 1e-14 against the 15-decimal table: the table's rounding alone is
//   ≤ 5e-16/1.35 ≈ 4e-16 relative; 1e-14 is the accuracy requirement.
// - STDLIB_RTOL = 1e-14 against @stdlib: that library (Fukushima 2015 piecewise minimax) is
//   itself accurate to a few e-15 (we measured its K 3.5e-15 from ours at m = 0.85 while ours
//   is 4e-16 from mpmath there), so the comparison cannot be tighter than its own error.
const MPMATH_RTOL = 2e-15;
const TABLE_RTOL = 1e-14;
const STDLIB_RTOL = 1e-14;

const MPMATH_SOURCE = "reference library: mpmath 1.3 ellipk/ellipe at 40 digits (tests/fixtures/math/elliptic-mpmath.json)";

describe("ellipticK(m), ellipticE(m) — parameter m = k²", () => {
  it("match A&S Table 17.1 spot values (regenerated with mpmath) to 1e-14", () => {
    // source: Abramowitz & Stegun 1964, Table 17.1 (values regenerated with mpmath, 15 decimals)
    for (const c of table.cases) {
      expectOutside({ quantity: `K(m = ${c.m})`, source: "source: A&S 1964 Table 17.1 (regenerated with mpmath)", ours: ellipticK(c.m), reference: c.K, rtol: TABLE_RTOL });
      expectOutside({ quantity: `E(m = ${c.m})`, source: "source: A&S 1964 Table 17.1 (regenerated with mpmath)", ours: ellipticE(c.m), reference: c.E, rtol: TABLE_RTOL });
    }
  });

  it("match mpmath to 2e-15 on 0 ≤ m < 1, including m → 0 (parameter form)", () => {
    // reference library: mpmath (Python) via the committed fixture
    const cases = mp.cases.filter((c) => c.form === "parameter");
    expect(cases.length).toBeGreaterThan(20);
    for (const c of cases) {
      const m = c.m!;
      expectOutside({ quantity: `K(m = ${m})`, source: MPMATH_SOURCE, ours: ellipticK(m), reference: c.K, rtol: MPMATH_RTOL });
      expectOutside({ quantity: `E(m = ${m})`, source: MPMATH_SOURCE, ours: ellipticE(m), reference: c.E, rtol: MPMATH_RTOL });
      const both = ellipticKE(m);
      expectRelClose(both.K, c.K, MPMATH_RTOL, `ellipticKE(${m}).K`);
      expectRelClose(both.E, c.E, MPMATH_RTOL, `ellipticKE(${m}).E`);
    }
  });

  it("ellipticKEComplement(m1) matches mpmath to 2e-15 for m = 1 − m1, m1 from 0.5 down to 1e-300", () => {
    // reference library: mpmath (Python), m = 1 − m1 formed at 40+ digits in the generator
    const cases = mp.cases.filter((c) => c.form === "complement");
    expect(cases.map((c) => c.m1)).toEqual(expect.arrayContaining([1e-6, 1e-9, 1e-12, 1e-15]));
    for (const c of cases) {
      const r = ellipticKEComplement(c.m1!);
      expectOutside({ quantity: `K(m = 1 − ${c.m1})`, source: MPMATH_SOURCE, ours: r.K, reference: c.K, rtol: MPMATH_RTOL });
      expectOutside({ quantity: `E(m = 1 − ${c.m1})`, source: MPMATH_SOURCE, ours: r.E, reference: c.E, rtol: MPMATH_RTOL });
    }
  });

  it("agree with @stdlib ellipk/ellipe (parameter m, as their READMEs state) at 1,000 points of [0, 1) to 1e-14", () => {
    // reference library: @stdlib/math-base-special-ellipk, @stdlib/math-base-special-ellipe
    // Convention: both packages' READMEs (node_modules/@stdlib/math-base-special-ellipk/README.md)
    // define K(m) = ∫ dθ/√(1 − m sin²θ) "where the parameter m is related to the modulus k by
    // m = k²" — the same m as ours, so no conversion.
    let worstK = { m: 0, rel: 0 };
    let worstE = { m: 0, rel: 0 };
    for (let i = 0; i < 1000; i++) {
      const m = (i + 0.5) / 1000;
      const r = ellipticKE(m);
      const k = ellipk(m);
      const e = ellipe(m);
      expectRelClose(r.K, k, STDLIB_RTOL, `K(${m}) vs @stdlib`);
      expectRelClose(r.E, e, STDLIB_RTOL, `E(${m}) vs @stdlib`);
      const rk = Math.abs(r.K - k) / k;
      const re = Math.abs(r.E - e) / e;
      if (rk >= worstK.rel) worstK = { m, rel: rk };
      if (re >= worstE.rel) worstE = { m, rel: re };
    }
    // record the worst point of each sweep for docs/validation.md
    expectOutside({ quantity: `K(m = ${worstK.m}), worst of 1000 points`, source: "reference library: @stdlib/math-base-special-ellipk", ours: ellipticK(worstK.m), reference: ellipk(worstK.m), rtol: STDLIB_RTOL });
    expectOutside({ quantity: `E(m = ${worstE.m}), worst of 1000 points`, source: "reference library: @stdlib/math-base-special-ellipe", ours: ellipticE(worstE.m), reference: ellipe(worstE.m), rtol: STDLIB_RTOL });
  });

  it("satisfy Legendre's relation E·K′ + E′·K − K·K′ = π/2 for random m (property, fast-check)", () => {
    // source: A&S 1964 eq. 17.3.13 (an identity; independent of the AGM sums used for E)
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true }), (m) => {
        const a = ellipticKE(m);
        const b = ellipticKEComplement(m); // K′ = K(1 − m), E′ = E(1 − m)
        // rounding: four products of O(1..15) numbers, each to ~1 ulp → ≤ 1e-14 of π/2
        expectRelClose(a.E * b.K + b.E * a.K - a.K * b.K, Math.PI / 2, 1e-14, `Legendre relation at m = ${m}`);
      }),
      { numRuns: 300, seed: 17 },
    );
  });

  it("agree with the defining integrals by 64-point Gauss–Legendre for m ≤ 0.9 (independent method)", () => {
    // independent method: direct quadrature of the definitions; the integrand is analytic and
    // the 64-point rule converges to rounding for m ≤ 0.9 (nearest singularity far from [0, π/2])
    for (const m of [0.05, 0.3, 0.6, 0.9]) {
      const K = integrateGaussLegendre((t) => 1 / Math.sqrt(1 - m * Math.sin(t) ** 2), 0, Math.PI / 2, 64);
      const E = integrateGaussLegendre((t) => Math.sqrt(1 - m * Math.sin(t) ** 2), 0, Math.PI / 2, 64);
      expectRelClose(ellipticK(m), K, 1e-14, `K(${m}) vs quadrature`);
      expectRelClose(ellipticE(m), E, 1e-14, `E(${m}) vs quadrature`);
    }
  });

  it("the complementary form keeps the digits that 1 − m loses near m → 1", () => {
    // m = 1 − 1e-12 is not representable: as a double its m1 is wrong by ~1e-4 relative, and
    // K follows with ~1e-6 error; the complementary form has none of it.
    const ref = mp.cases.find((c) => c.form === "complement" && c.m1 === 1e-12)!;
    expectRelClose(ellipticKEComplement(1e-12).K, ref.K, MPMATH_RTOL, "complement form");
    expect(Math.abs(ellipticK(1 - 1e-12) - ref.K) / ref.K).toBeGreaterThan(1e-8);
  });

  it("edge values: K(0) = E(0) = π/2, K(1) = +∞, E(1) = 1, complement m1 = 0 and m1 = 1", () => {
    expect(ellipticK(0)).toBe(Math.PI / 2);
    expect(ellipticE(0)).toBe(Math.PI / 2);
    expect(ellipticK(1)).toBe(Infinity);
    expect(ellipticE(1)).toBe(1);
    expect(ellipticKE(1)).toEqual({ K: Infinity, E: 1 });
    expect(ellipticKEComplement(0)).toEqual({ K: Infinity, E: 1 });
    expect(ellipticKEComplement(1)).toEqual({ K: Math.PI / 2, E: Math.PI / 2 });
  });

  it("K is increasing and E decreasing in m (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.999, noNaN: true }), fc.double({ min: 1e-9, max: 1e-3, noNaN: true }), (m, dm) => {
        expect(ellipticK(m + dm)).toBeGreaterThan(ellipticK(m));
        expect(ellipticE(m + dm)).toBeLessThan(ellipticE(m));
      }),
      { numRuns: 200, seed: 3 },
    );
  });

  it("rejects NaN, ±Infinity and m outside [0, 1] with TanklightInputError naming the field", () => {
    for (const bad of [Number.NaN, Infinity, -Infinity, -1e-300, -0.5, 1 + 2 ** -52, 2]) {
      expect(() => ellipticK(bad)).toThrow(TanklightInputError);
      expect(() => ellipticE(bad)).toThrow(TanklightInputError);
      expect(() => ellipticKE(bad)).toThrow(TanklightInputError);
      expect(() => ellipticKEComplement(bad)).toThrow(TanklightInputError);
    }
    expect(() => ellipticK(Number.NaN)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: ellipticK: m: must be a finite number in [0, 1], got NaN]`);
    expect(() => ellipticKEComplement(-1)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: ellipticKEComplement: m1: must be a finite number in [0, 1], got -1]`);
  });

  it("has the documented types", () => {
    expectTypeOf(ellipticK).toEqualTypeOf<(m: number) => number>();
    expectTypeOf(ellipticE).toEqualTypeOf<(m: number) => number>();
    expectTypeOf(ellipticKE).returns.toEqualTypeOf<EllipticPair>();
    expectTypeOf(ellipticKEComplement).parameters.toEqualTypeOf<[number]>();
    expectTypeOf<EllipticPair>().toEqualTypeOf<{ readonly K: number; readonly E: number }>();
  });
});

describe("ellipticKEInto(m, m1, out, offset) — hot-path form with both parameters", () => {
  it("matches mpmath at both ends when m and m1 are both given, and writes at the offset", () => {
    // reference library: mpmath via the fixture; m and m1 given exactly as in the generator
    const out = new Float64Array(3);
    for (const c of mp.cases) {
      const m = c.form === "parameter" ? c.m! : 1 - c.m1!;
      const m1 = c.form === "parameter" ? 1 - c.m! : c.m1!;
      // parameter form: m exact, m1 = 1 − m rounded; complement form: m1 exact. The AGM uses
      // c₀² = m only in the E sum and b₀ = √m₁ for K, so each end keeps its exact input.
      ellipticKEInto(m, m1, out, 1);
      expectRelClose(out[1]!, c.K, MPMATH_RTOL, `K (${c.form} ${c.m ?? c.m1})`);
      expectRelClose(out[2]!, c.E, MPMATH_RTOL, `E (${c.form} ${c.m ?? c.m1})`);
    }
    expect(out[0]).toBe(0);
    ellipticKEInto(1, 0, out);
    expect([out[0], out[1]]).toEqual([Infinity, 1]);
  });

  it("rejects m, m1 that do not add up to 1, and out-of-range values", () => {
    const out = new Float64Array(2);
    expect(() => ellipticKEInto(0.5, 0.6, out)).toThrow(TanklightInputError);
    expect(() => ellipticKEInto(Number.NaN, 0.5, out)).toThrow(TanklightInputError);
    expect(() => ellipticKEInto(0.5, -0.5, out)).toThrow(TanklightInputError);
    expectTypeOf(ellipticKEInto).returns.toEqualTypeOf<void>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import {
  gaussLegendre,
  integrateAdaptive,
  integrateGaussLegendre,
  type AdaptiveOptions,
  type GaussRule,
  type IntegrationResult,
} from "../../lib/math/quadrature.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import gl from "../fixtures/math/gauss-legendre.json" with { type: "json" };

// Tolerance regimes for the Gauss–Legendre rule against mpmath (40-digit Newton):
// - nodes: absolute 2.3e-16 (= ulp(1)) for every n ≤ 500: a node is a double, so its own
//   rounding is ≤ ulp/2; measured worst 1.1e-16.
// - weights, n ≤ 20: 4e-15 relative (measured 2.2e-15: the recurrence for P_n′ carries ~n ulp).
// - weights, 20 < n ≤ 500: 5e-13 relative (measured 1.0e-13 at n = 200, 2.3e-13 at n = 500).
//   The worst are the outermost nodes, where 1 − x² ≈ 1e-5 and the weight depends on the
//   node to 1/(1 − x) — we correct for the node's rounding to first order (see
//   quadrature.ts), which gains a factor ~20, but P_n at the node is itself only known to
//   a few ulp. Those weights are ~1e-4 of the total, so an integral moves by < 1e-16.
const NODE_ATOL = 2.3e-16;
const WEIGHT_RTOL_SMALL_N = 4e-15;
const WEIGHT_RTOL_LARGE_N = 5e-13;
const GL_SOURCE = "reference library: mpmath 1.3, Newton on P_n at 40 digits (tests/fixtures/math/gauss-legendre.json)";

describe("gaussLegendre(n)", () => {
  it("nodes and weights match mpmath for n = 1, 2, 5, 20, 64, 200, 500", () => {
    for (const rule of gl.cases) {
      const { nodes, weights } = gaussLegendre(rule.n);
      const offset = rule.n - rule.nonNegativeNodes.length;
      const rtol = rule.n <= 20 ? WEIGHT_RTOL_SMALL_N : WEIGHT_RTOL_LARGE_N;
      let worstW = 0;
      let worstI = 0;
      rule.nonNegativeNodes.forEach((x, i) => {
        expectRelClose(nodes[offset + i]!, x, 0, `node ${i} of n = ${rule.n}`, NODE_ATOL);
        // the mirrored node is exactly the negative
        expect(nodes[rule.n - 1 - offset - i]! + nodes[offset + i]!).toBe(0);
        const ref = rule.weights[i]!;
        expectRelClose(weights[offset + i]!, ref, rtol, `weight ${i} of n = ${rule.n}`);
        const rel = Math.abs(weights[offset + i]! - ref) / ref;
        if (rel >= worstW) {
          worstW = rel;
          worstI = i;
        }
      });
      // record the worst weight of each rule for docs/validation.md
      expectOutside({ quantity: `Gauss–Legendre weight at x = ${rule.nonNegativeNodes[worstI]}, n = ${rule.n} (worst)`, source: GL_SOURCE, ours: weights[offset + worstI]!, reference: rule.weights[worstI]!, rtol });
    }
  });

  it("integrates every monomial of degree ≤ 2n − 1 exactly (n = 1…12, 40), and x^{2n} with the published remainder", () => {
    // exact moments: ∫_{−1}^{1} x^d dx = 2/(d+1) for even d, 0 for odd d (elementary calculus)
    for (const n of [1, 2, 3, 4, 5, 6, 7, 8, 10, 12, 40]) {
      for (let d = 0; d <= 2 * n - 1; d++) {
        const exact = d % 2 === 0 ? 2 / (d + 1) : 0;
        // rounding only: n terms of size ≤ 2 → a few ulp; odd d cancel to exactly ±ulp-level
        expectRelClose(integrateGaussLegendre((x) => x ** d, -1, 1, n), exact, 1e-14, `n = ${n}, x^${d}`, 1e-15);
      }
      if (n > 12) continue;
      // x^{2n} is not exact: the Gauss remainder is (source: A&S 1964 eq. 25.4.30)
      // R = 2^{2n+1}(n!)⁴/((2n+1)((2n)!)³)·f^{(2n)} with f^{(2n)} = (2n)! — about π·4^{−n},
      // ≥ 1.9e-7 for n ≤ 12, far above rounding (~1e-17), so it is checked to 1e-8 relative.
      const d = 2 * n;
      let fact = 1;
      for (let k = 2; k <= n; k++) fact *= k;
      let fact2 = 1;
      for (let k = 2; k <= 2 * n; k++) fact2 *= k;
      const remainder = (2 ** (2 * n + 1) * fact ** 4) / ((2 * n + 1) * fact2 ** 2);
      const gauss = integrateGaussLegendre((x) => x ** d, -1, 1, n);
      expectOutside({ quantity: `Gauss remainder for x^${d}, n = ${n}`, source: "source: A&S 1964 eq. 25.4.30", ours: 2 / (d + 1) - gauss, reference: remainder, rtol: 1e-8 });
    }
  });

  it("integrates random polynomials of degree 2n − 1 on random intervals (property)", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 30 }),
        fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 60, maxLength: 60 }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 4, noNaN: true }),
        (n, coeffs, a, len) => {
          const c = coeffs.slice(0, 2 * n);
          const b = a + len;
          const p = (x: number): number => c.reduceRight((s, ck) => s * x + ck, 0);
          // exact antiderivative, Horner
          const P = (x: number): number => c.reduceRight((s, ck, k) => s * x + ck / (k + 1), 0) * x;
          const exact = P(b) - P(a);
          // absolute floor: the terms reach |x|^{2n} ≤ 7^{60}; compare against the sum of |terms|
          const scale = c.reduce((s, ck, k) => s + (Math.abs(ck) * (Math.max(Math.abs(a), Math.abs(b)) ** (k + 1))) / (k + 1), 0);
          expectRelClose(integrateGaussLegendre(p, a, b, n), exact, 0, `n = ${n} on [${a}, ${b}]`, 1e-13 * scale + 1e-300);
        },
      ),
      { numRuns: 200, seed: 7 },
    );
  });

  it("caches rules: the same n returns the same arrays", () => {
    expect(gaussLegendre(37)).toBe(gaussLegendre(37));
  });

  it("weights are positive and sum to 2 (n up to 1000)", () => {
    for (const n of [1, 2, 3, 17, 100, 333, 1000]) {
      const { weights } = gaussLegendre(n);
      expect(Math.min(...weights)).toBeGreaterThan(0);
      expectRelClose(weights.reduce((s, w) => s + w, 0), 2, 1e-14, `Σw for n = ${n}`);
    }
  });

  it("rejects n that is not an integer ≥ 1, and non-finite limits", () => {
    for (const bad of [0, -1, 2.5, 10001, Number.NaN, Infinity]) expect(() => gaussLegendre(bad)).toThrow(TanklightInputError);
    expect(() => integrateGaussLegendre((x) => x, 0, Infinity, 4)).toThrow(TanklightInputError);
    expect(() => gaussLegendre(0)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: gaussLegendre: n: must be an integer in [1, 10000], got 0]`);
  });
});

// Integrals with closed forms (elementary calculus), including endpoint singularities.
const KNOWN: { name: string; f: (x: number) => number; a: number; b: number; exact: number }[] = [
  { name: "∫₀¹ ln x dx = −1 (endpoint log singularity)", f: Math.log, a: 0, b: 1, exact: -1 },
  { name: "∫₀¹ x^−½ dx = 2 (1/√x)", f: (x) => 1 / Math.sqrt(x), a: 0, b: 1, exact: 2 },
  { name: "∫₀^π ln sin x dx = −π ln 2 (log singularities at both ends)", f: (x) => Math.log(Math.sin(x)), a: 0, b: Math.PI, exact: -Math.PI * Math.LN2 },
  { name: "∫₀¹ x^−0.9 dx = 10 (strong algebraic singularity)", f: (x) => Math.pow(x, -0.9), a: 0, b: 1, exact: 10 },
  { name: "∫₀¹ 4/(1 + x²) dx = π", f: (x) => 4 / (1 + x * x), a: 0, b: 1, exact: Math.PI },
  { name: "∫₀¹ sin 50x dx = (1 − cos 50)/50 (oscillatory)", f: (x) => Math.sin(50 * x), a: 0, b: 1, exact: (1 - Math.cos(50)) / 50 },
  { name: "∫₀¹ dx/(10⁻⁴ + (x − 0.3)²) (sharp peak)", f: (x) => 1 / (1e-4 + (x - 0.3) ** 2), a: 0, b: 1, exact: (Math.atan(70) + Math.atan(30)) / 1e-2 },
  { name: "∫₁⁰ eˣ dx = 1 − e (reversed limits)", f: Math.exp, a: 1, b: 0, exact: 1 - Math.E },
];

describe("integrateAdaptive(f, a, b, { absTol, relTol, maxIntervals })", () => {
  it("reaches the requested tolerance on integrals with known values, and its error bounds the true error", () => {
    for (const k of KNOWN) {
      for (const tol of [1e-6, 1e-10, 1e-13]) {
        const r = integrateAdaptive(k.f, k.a, k.b, { absTol: tol, relTol: tol });
        const trueError = Math.abs(r.value - k.exact);
        expect(r.converged, `${k.name} at tol ${tol}`).toBe(true);
        // the true error may be below rounding of the exact value: allow 2 ulp of |exact|
        expect(trueError, `${k.name}: true error ≤ reported error (tol ${tol})`).toBeLessThanOrEqual(r.error + 4.5e-16 * Math.abs(k.exact));
        expect(r.error).toBeLessThanOrEqual(Math.max(tol, tol * Math.abs(r.value)));
        // independent check against the closed form; tolerance = the requested one
        expectRelClose(r.value, k.exact, tol, k.name, tol);
      }
    }
  });

  it("counts evaluations (15 per Kronrod rule) and returns 0 for an empty interval", () => {
    const r = integrateAdaptive((x) => x * x, 0, 1);
    expect(r.evaluations).toBe(15); // a quadratic is exact for K15 and G7: no split
    expectRelClose(r.value, 1 / 3, 1e-15, "∫x² = 1/3");
    expect(integrateAdaptive(Math.exp, 2, 2)).toEqual({ value: 0, error: 0, evaluations: 0, converged: true });
    const s = integrateAdaptive(Math.log, 0, 1);
    expect((s.evaluations - 15) % 30).toBe(0);
  });

  it("reports converged = false when maxIntervals is too small", () => {
    const r = integrateAdaptive((x) => Math.pow(x, -0.9), 0, 1, { absTol: 1e-12, relTol: 1e-12, maxIntervals: 5 });
    expect(r.converged).toBe(false);
    expect(r.evaluations).toBe(15 + 4 * 30);
    expect(Math.abs(r.value - 10)).toBeLessThanOrEqual(r.error);
  });

  it("nested use (an integrand that itself integrates) works: ∫₀¹∫₀¹ xy dy dx = 1/4", () => {
    const r = integrateAdaptive((x) => integrateAdaptive((y) => x * y, 0, 1).value, 0, 1);
    expectRelClose(r.value, 0.25, 1e-14, "double integral");
  });

  it("rejects non-finite limits, bad options and a non-finite integrand", () => {
    expect(() => integrateAdaptive(Math.exp, 0, Infinity)).toThrow(TanklightInputError);
    expect(() => integrateAdaptive(Math.exp, Number.NaN, 1)).toThrow(TanklightInputError);
    expect(() => integrateAdaptive(Math.exp, 0, 1, { absTol: -1 })).toThrow(TanklightInputError);
    expect(() => integrateAdaptive(Math.exp, 0, 1, { relTol: Number.NaN })).toThrow(TanklightInputError);
    expect(() => integrateAdaptive(Math.exp, 0, 1, { maxIntervals: 0 })).toThrow(TanklightInputError);
    expect(() => integrateAdaptive(() => Number.NaN, 0, 1)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: integrateAdaptive: f: integrand is not finite on [0, 1], got NaN]`);
  });

  it("has the documented types", () => {
    expectTypeOf(gaussLegendre).returns.toEqualTypeOf<GaussRule>();
    expectTypeOf(integrateGaussLegendre).toEqualTypeOf<(f: (x: number) => number, a: number, b: number, n: number) => number>();
    expectTypeOf(integrateAdaptive).returns.toEqualTypeOf<IntegrationResult>();
    expectTypeOf(integrateAdaptive).parameter(3).toEqualTypeOf<AdaptiveOptions | undefined>();
    expectTypeOf<IntegrationResult>().toHaveProperty("error").toEqualTypeOf<number>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { complex, divide, multiply, sqrt, type Complex as MathComplex } from "mathjs";
import {
  complexAbs,
  complexArg,
  complexDiv,
  complexFromPolar,
  complexInv,
  complexMul,
  complexMulConj,
  complexSqrt,
} from "../../lib/math/complex.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

// Comparisons are made on the modulus of the result (a complex result's parts can cancel):
// |ours − reference| ≤ RTOL·|reference|. Each operation rounds a few times: 4 ulp = 1e-15.
const RTOL = 1e-15;
// operands: zero or |x| > 1e-100. Below that, mathjs's own sqrt squares its operand and
// underflows (we saw it return |√a| = 1.0e-145 for a = −1e-290(1 + j), true 1.19e-145);
// tiny and subnormal operands are checked separately against exact values.
const finite = fc.double({ min: -1e6, max: 1e6, noNaN: true }).filter((x) => x === 0 || Math.abs(x) > 1e-100);

function expectComplexClose(out: Float64Array, re: number, im: number, rtol: number, context: string): void {
  const d = Math.hypot(out[0]! - re, out[1]! - im);
  expectRelClose(Math.hypot(out[0]!, out[1]!) + d, Math.hypot(re, im), rtol, `${context} (|Δ| = ${d})`, 1e-300);
  expect(d).toBeLessThanOrEqual(rtol * Math.hypot(re, im) + 1e-300);
}

describe("complex helpers (write into a caller's Float64Array)", () => {
  const out = new Float64Array(4);

  it("match the documented examples", () => {
    complexMul(1, 2, 3, -1, out);
    expect([out[0], out[1]]).toEqual([5, 5]);
    complexMulConj(1, 2, 3, -1, out);
    expect([out[0], out[1]]).toEqual([1, 7]);
    complexDiv(5, 5, 3, -1, out);
    expectComplexClose(out, 1, 2, RTOL, "(5+5j)/(3−j)");
    complexInv(0, 2, out);
    expect([out[0], out[1]]).toEqual([0, -0.5]);
    expect(complexAbs(3, 4)).toBe(5);
    expect(complexArg(0, 1)).toBe(Math.PI / 2);
    complexSqrt(-4, 0, out);
    expect([out[0], out[1]]).toEqual([0, 2]);
    complexSqrt(3, 4, out);
    expect([out[0], out[1]]).toEqual([2, 1]);
    complexFromPolar(2, Math.PI / 2, out, 2);
    expectRelClose(out[3]!, 2, 1e-16, "polar im");
  });

  it("agree with mathjs complex arithmetic for random operands (reference library, property)", () => {
    // reference library: mathjs (multiply, divide, sqrt on Complex)
    let worstDiv = { rel: -1, a: [1, 2], b: [3, -1] };
    fc.assert(
      fc.property(finite, finite, finite, finite, (ar, ai, br, bi) => {
        const a = complex(ar, ai);
        const b = complex(br, bi);
        complexMul(ar, ai, br, bi, out);
        const m = multiply(a, b) as MathComplex;
        expectComplexClose(out, m.re, m.im, RTOL, "mul");
        if (br !== 0 || bi !== 0) {
          complexDiv(ar, ai, br, bi, out);
          const q = divide(a, b) as MathComplex;
          expectComplexClose(out, q.re, q.im, 4 * RTOL, "div");
          const rel = Math.hypot(out[0]! - q.re, out[1]! - q.im) / (Math.hypot(q.re, q.im) || 1);
          if (rel > worstDiv.rel) worstDiv = { rel, a: [ar, ai], b: [br, bi] };
        }
        // on the branch cut mathjs ignores the sign of a zero imaginary part; we follow it
        // (Kahan 1987: −0 selects the lower side), so compare there only for +0
        fc.pre(!Object.is(ai, -0));
        complexSqrt(ar, ai, out);
        const s = sqrt(a) as unknown as MathComplex;
        // mathjs's own sqrt over/underflows for subnormal operands: compare only where it is finite
        fc.pre(Number.isFinite(s.re) && Number.isFinite(s.im));
        expectComplexClose(out, s.re, s.im, 4 * RTOL, "sqrt");
        expect(out[0]).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: 1000, seed: 31 },
    );
    const [ar, ai] = worstDiv.a as [number, number];
    const [br, bi] = worstDiv.b as [number, number];
    complexDiv(ar, ai, br, bi, out);
    const q = divide(complex(ar, ai), complex(br, bi)) as MathComplex;
    expectOutside({ quantity: `Re((${ar}+${ai}j)/(${br}+${bi}j)) (worst of 1000)`, source: "reference library: mathjs divide", ours: out[0]!, reference: q.re, rtol: 0, atol: 4 * RTOL * Math.hypot(q.re, q.im) });
  });

  it("complexDiv avoids overflow where |b|² would overflow (Smith 1962)", () => {
    complexDiv(1e300, 1e300, 1e300, 1e300, out);
    expectComplexClose(out, 1, 0, RTOL, "(1e300+1e300j)/(1e300+1e300j)");
    complexDiv(1, 1, 1e-300, 1e-300, out);
    expectComplexClose(out, 1e300, 0, RTOL, "tiny divisor");
  });

  it("complexSqrt keeps subnormal and huge operands finite", () => {
    complexSqrt(0, 5e-324, out);
    expect(out[0]).toBeGreaterThan(0);
    expectRelClose(out[0]! * out[0]! * 2 * 2 ** 1000 * 2 ** 74, 5e-324 * 2 ** 1074, 1e-3, "√(5e-324 j) (subnormal: 1 significant bit)");
    complexSqrt(-1.7e308, 1.7e308, out);
    expect(Number.isFinite(out[0]!) && Number.isFinite(out[1]!)).toBe(true);
    // Im (√a)² = 2xy; the real part x² − y² passes ∞ − ∞ in doubles, which complexMul refuses
    expectRelClose(2 * out[0]! * out[1]!, 1.7e308, 4e-16 * 8, "(√a)² = a near the double limit");
    expect(() => complexMul(out[0]!, out[1]!, out[0]!, out[1]!, out, 2)).toThrow(/complexMul: result: the product is not a finite double/);
  });

  it("a·b / b = a and (√a)² = a round trips (property)", () => {
    fc.assert(
      fc.property(finite, finite, finite, finite, (ar, ai, br, bi) => {
        fc.pre(Math.hypot(br, bi) > 1e-6 && Math.hypot(ar, ai) > 1e-6);
        complexMul(ar, ai, br, bi, out);
        complexDiv(out[0]!, out[1]!, br, bi, out);
        expectComplexClose(out, ar, ai, 8 * RTOL, "a·b/b");
        complexSqrt(ar, ai, out);
        complexMul(out[0]!, out[1]!, out[0]!, out[1]!, out, 2);
        expectComplexClose(out.subarray(2), ar, ai, 8 * RTOL, "(√a)²");
      }),
      { numRuns: 500, seed: 32 },
    );
  });

  it("complexDiv and complexInv throw TanklightInputError on a zero divisor", () => {
    expect(() => complexDiv(1, 1, 0, 0, out)).toThrow(TanklightInputError);
    expect(() => complexInv(0, 0, out)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: complexInv: br, bi: divisor must be non-zero, got 0]`);
  });

  it("have the documented types (no return value: results go to out)", () => {
    expectTypeOf(complexMul).returns.toEqualTypeOf<void>();
    expectTypeOf(complexAbs).toEqualTypeOf<(ar: number, ai: number) => number>();
    expectTypeOf(complexDiv).parameter(4).toEqualTypeOf<Float64Array>();
  });
});

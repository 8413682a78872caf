import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { solveComplex, solveComplex2x2 } from "../../lib/math/solveComplex.ts";
import type { Complex } from "../../lib/math/complex.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { createRandom, type RandomSource } from "../../lib/math/random.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

function randomSystem(rng: RandomSource, n: number): { A: Complex[][]; b: Complex[] } {
  const A = Array.from({ length: n }, () => Array.from({ length: n }, () => ({ re: rng.normal(), im: rng.normal() })));
  const b = Array.from({ length: n }, () => ({ re: rng.normal(), im: rng.normal() }));
  return { A, b };
}

/** Normwise backward error ‖Ax − b‖∞ / (‖A‖∞‖x‖∞ + ‖b‖∞) (Higham 2002, §7.1). */
function backwardError(A: readonly (readonly Complex[])[], x: readonly Complex[], b: readonly Complex[]): number {
  let r = 0, na = 0, nx = 0, nb = 0;
  A.forEach((row, i) => {
    let sr = 0, si = 0, rowNorm = 0;
    row.forEach((a, j) => {
      sr += a.re * x[j]!.re - a.im * x[j]!.im;
      si += a.re * x[j]!.im + a.im * x[j]!.re;
      rowNorm += Math.hypot(a.re, a.im);
    });
    r = Math.max(r, Math.hypot(sr - b[i]!.re, si - b[i]!.im));
    na = Math.max(na, rowNorm);
    nx = Math.max(nx, Math.hypot(x[i]!.re, x[i]!.im));
    nb = Math.max(nb, Math.hypot(b[i]!.re, b[i]!.im));
  });
  return r / (na * nx + nb);
}

describe("solveComplex(A, b) and solveComplex2x2(a, b, out)", () => {
  it("solves the documented example [[1, j], [j, 1]]·x = [1, 0] → x = [0.5, −0.5j]", () => {
    const x = solveComplex(
      [[{ re: 1, im: 0 }, { re: 0, im: 1 }], [{ re: 0, im: 1 }, { re: 1, im: 0 }]],
      [{ re: 1, im: 0 }, { re: 0, im: 0 }],
    );
    expectRelClose(x[0]!.re, 0.5, 1e-16, "x1.re");
    expectRelClose(x[1]!.im, -0.5, 1e-16, "x2.im");
    expect(Math.abs(x[0]!.im) + Math.abs(x[1]!.re)).toBeLessThan(1e-16);
  });

  it("has a small residual A·x − b for random systems n = 1…12 (property; n > 2 through mathjs)", () => {
    // backward-stable LU: backward error ≈ n·ε; bound 20·n·ε; the 2×2 Cramer path is also
    // backward stable for well-scaled 2×2 systems (its error is bounded by the determinant's)
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12 }), fc.integer({ min: 0, max: 2 ** 31 }), fc.double({ min: -12, max: 12, noNaN: true }), (n, seed, log10Scale) => {
        const rng = createRandom(seed);
        const { A, b } = randomSystem(rng, n);
        // scale A by 10^k to show the solve is unit-independent (Ω or S)
        const s = 10 ** log10Scale;
        const As = A.map((row) => row.map((z) => ({ re: z.re * s, im: z.im * s })));
        const x = solveComplex(As, b);
        expect(backwardError(As, x, b)).toBeLessThan(20 * n * Number.EPSILON);
      }),
      { numRuns: 200, seed: 41 },
    );
  });

  it("the closed-form 2×2 path agrees with the mathjs path (independent method)", () => {
    // independent method: Cramer's rule against mathjs LU on the same 2×2 embedded in a 3×3
    // block-diagonal system (third equation 1·x3 = 1) so that mathjs handles it
    const rng = createRandom(99);
    for (let t = 0; t < 50; t++) {
      const { A, b } = randomSystem(rng, 2);
      const x2 = solveComplex(A, b);
      const zero = { re: 0, im: 0 };
      const A3 = [[...A[0]!, zero], [...A[1]!, zero], [zero, zero, { re: 1, im: 0 }]];
      const x3 = solveComplex(A3, [...b, { re: 1, im: 0 }]);
      for (let i = 0; i < 2; i++) {
        const d = Math.hypot(x2[i]!.re - x3[i]!.re, x2[i]!.im - x3[i]!.im);
        const size = Math.hypot(x3[0]!.re, x3[0]!.im) + Math.hypot(x3[1]!.re, x3[1]!.im);
        // random 2×2 normal matrices can be ill-conditioned; compare with cond-aware slack:
        // both solutions have backward error ~ε, so forward difference ≲ cond·ε; 1e-10 covers cond ≤ 1e5
        expect(d).toBeLessThanOrEqual(1e-10 * size);
      }
    }
  });

  it("solveComplex2x2 writes into out without allocating and may alias b", () => {
    const a = Float64Array.of(2, 1, 0, 1, 0, -1, 3, 0);
    const b = Float64Array.of(1, 0, 0, 1);
    const out = new Float64Array(4);
    solveComplex2x2(a, b, out);
    const x = solveComplex(
      [[{ re: 2, im: 1 }, { re: 0, im: 1 }], [{ re: 0, im: -1 }, { re: 3, im: 0 }]],
      [{ re: 1, im: 0 }, { re: 0, im: 1 }],
    );
    expect(Array.from(out)).toEqual([x[0]!.re, x[0]!.im, x[1]!.re, x[1]!.im]);
    solveComplex2x2(a, b, b);
    expect(Array.from(b)).toEqual(Array.from(out));
  });

  it("a singular matrix throws TanklightInputError (1×1, 2×2 and mathjs paths)", () => {
    const z = (re: number, im = 0): Complex => ({ re, im });
    expect(() => solveComplex([[z(0)]], [z(1)])).toThrow(TanklightInputError);
    expect(() => solveComplex([[z(1, 1), z(2, 2)], [z(2, 2), z(4, 4)]], [z(1), z(1)])).toThrow(TanklightInputError);
    expect(() => solveComplex2x2(Float64Array.of(1, 0, 2, 0, 2, 0, 4, 0), Float64Array.of(1, 0, 1, 0), new Float64Array(4))).toThrow(TanklightInputError);
    expect(() =>
      solveComplex(
        [[z(1), z(2), z(3)], [z(4), z(5), z(6)], [z(5), z(7), z(9)]], // row 3 = row 1 + row 2
        [z(1), z(1), z(1)],
      ),
    ).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: solveComplex: A: matrix is singular (mathjs lusolve: Linear system cannot be solved since matrix is singular), got 3]`);
  });

  it("rejects non-square or mismatched systems and non-finite entries", () => {
    const z = (re: number): Complex => ({ re, im: 0 });
    expect(() => solveComplex([[z(1), z(2)]], [z(1)])).toThrow(TanklightInputError);
    expect(() => solveComplex([], [])).toThrow(TanklightInputError);
    expect(() => solveComplex([[z(Number.NaN)]], [z(1)])).toThrow(TanklightInputError);
    expect(() => solveComplex([[z(1)]], [z(Infinity)])).toThrow(TanklightInputError);
  });

  it("has the documented types", () => {
    expectTypeOf(solveComplex).returns.toEqualTypeOf<Complex[]>();
    expectTypeOf(solveComplex2x2).toEqualTypeOf<(a: Float64Array, b: Float64Array, out: Float64Array) => void>();
  });
});

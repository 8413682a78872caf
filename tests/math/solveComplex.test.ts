import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { lusolve, complex, matrix, type Matrix, type Complex as MathComplex } from "mathjs";
import { solveComplex } from "../../lib/math/solveComplex.ts";
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

describe("solveComplex(A, b)", () => {
  it("solves the documented example [[1, j], [j, 1]]·x = [1, 0] → x = [0.5, −0.5j]", () => {
    const x = solveComplex(
      [[{ re: 1, im: 0 }, { re: 0, im: 1 }], [{ re: 0, im: 1 }, { re: 1, im: 0 }]],
      [{ re: 1, im: 0 }, { re: 0, im: 0 }],
    );
    expectRelClose(x[0]!.re, 0.5, 1e-16, "x1.re");
    expectRelClose(x[1]!.im, -0.5, 1e-16, "x2.im");
    expect(Math.abs(x[0]!.im) + Math.abs(x[1]!.re)).toBeLessThan(1e-16);
  });

  it("has a small residual A·x − b for random systems n = 1…12 (property)", () => {
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

  it("agrees with mathjs's lusolve on random systems n = 1…12", () => {
    // reference library: mathjs (lusolve on complex matrices). Random normal matrices can be
    // ill-conditioned; both solutions have backward error ~ε, so the forward difference is
    // ≲ cond·ε: 1e-10 of |x| covers cond ≤ 1e5 (the seed's systems are below that)
    const rng = createRandom(99);
    for (let t = 0; t < 50; t++) {
      const n = 1 + (t % 12);
      const { A, b } = randomSystem(rng, n);
      const x = solveComplex(A, b);
      const ref = (lusolve(matrix(A.map((row) => row.map((z) => complex(z.re, z.im)))), matrix(b.map((z) => [complex(z.re, z.im)]))) as Matrix).toArray() as unknown as MathComplex[][];
      let size = 0;
      for (const r of ref) size += Math.hypot(r[0]!.re, r[0]!.im);
      for (let i = 0; i < n; i++) {
        const d = Math.hypot(x[i]!.re - ref[i]![0]!.re, x[i]!.im - ref[i]![0]!.im);
        expect(d).toBeLessThanOrEqual(1e-10 * size);
      }
    }
  });

  it("a singular matrix throws TanklightInputError naming the column (1×1, 2×2, 3×3)", () => {
    const z = (re: number, im = 0): Complex => ({ re, im });
    expect(() => solveComplex([[z(0)]], [z(1)])).toThrow(TanklightInputError);
    expect(() => solveComplex([[z(1, 1), z(2, 2)], [z(2, 2), z(4, 4)]], [z(1), z(1)])).toThrow(TanklightInputError);
    expect(() =>
      solveComplex(
        [[z(1), z(2), z(3)], [z(4), z(5), z(6)], [z(5), z(7), z(9)]], // row 3 = row 1 + row 2
        [z(1), z(1), z(1)],
      ),
    ).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: solveComplex: A: matrix is singular (zero pivot in column 2), got 3]`);
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
  });
});

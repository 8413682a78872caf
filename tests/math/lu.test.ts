import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { lusolve } from "mathjs";
import { LU_PIVOT_RTOL, luFactor, luSolve, SingularMatrixError, solveLinear } from "../../lib/math/lu.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { createRandom } from "../../lib/math/random.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

/** ‖A·x − b‖∞ / (‖A‖∞·‖x‖∞ + ‖b‖∞): the normwise backward error (Higham 2002, §7.1). */
function backwardError(a: Float64Array, n: number, x: Float64Array, b: Float64Array): number {
  let r = 0;
  let na = 0;
  let nx = 0;
  let nb = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    let row = 0;
    for (let j = 0; j < n; j++) {
      s += a[i * n + j]! * x[j]!;
      row += Math.abs(a[i * n + j]!);
    }
    r = Math.max(r, Math.abs(s - b[i]!));
    na = Math.max(na, row);
    nx = Math.max(nx, Math.abs(x[i]!));
    nb = Math.max(nb, Math.abs(b[i]!));
  }
  return r / (na * nx + nb);
}

describe("luFactor(a, n, pivots) / luSolve(a, n, pivots, b)", () => {
  it("solves the documented 2×2 example: [[2, 1], [1, 3]]·x = [3, 5] → x = [0.8, 1.4]", () => {
    const a = Float64Array.of(2, 1, 1, 3);
    const p = new Int32Array(2);
    luFactor(a, 2, p);
    const b = Float64Array.of(3, 5);
    luSolve(a, 2, p, b);
    expectRelClose(b[0]!, 0.8, 4e-16, "x0");
    expectRelClose(b[1]!, 1.4, 4e-16, "x1");
  });

  it("has a small backward error ‖Ax − b‖ for random n×n systems, n = 1…20 (property)", () => {
    // partial pivoting is backward stable in practice: backward error ≈ n·ε (Higham 2002, Thm 9.4
    // with a modest growth factor); bound 10·n·ε
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 20 }), fc.integer({ min: 0, max: 2 ** 31 }), (n, seed) => {
        const rng = createRandom(seed);
        const a = Float64Array.from({ length: n * n }, () => rng.normal());
        const b = Float64Array.from({ length: n }, () => rng.normal());
        const lu = Float64Array.from(a);
        const x = Float64Array.from(b);
        const piv = new Int32Array(n);
        luFactor(lu, n, piv);
        luSolve(lu, n, piv, x);
        expect(backwardError(a, n, x, b)).toBeLessThan(10 * n * Number.EPSILON);
      }),
      { numRuns: 300, seed: 21 },
    );
  });

  it("agrees with mathjs lusolve on a 12×12 system (reference library)", () => {
    const n = 12;
    const rng = createRandom(12);
    const a = Float64Array.from({ length: n * n }, () => rng.uniformIn(-1, 1));
    for (let i = 0; i < n; i++) a[i * n + i]! += 3; // comfortably regular: cond ~ 10
    const b = Float64Array.from({ length: n }, () => rng.uniformIn(-1, 1));
    const x = solveLinear(a, b);
    const rows = Array.from({ length: n }, (_, i) => Array.from(a.subarray(i * n, i * n + n)));
    const ref = (lusolve(rows, Array.from(b)) as number[][]).map((r) => r[0]!);
    let worst = 0;
    for (let i = 1; i < n; i++) if (Math.abs(x[i]! - ref[i]!) > Math.abs(x[worst]! - ref[worst]!)) worst = i;
    // two backward-stable solvers of a well-conditioned system agree to cond·ε ≈ 1e-14
    for (let i = 0; i < n; i++) expectRelClose(x[i]!, ref[i]!, 1e-13, `x[${i}] vs mathjs`);
    expectOutside({ quantity: `12×12 solve, x[${worst}] (largest difference)`, source: "reference library: mathjs lusolve", ours: x[worst]!, reference: ref[worst]!, rtol: 1e-13 });
  });

  it("reuses its workspace: factor once, solve many right-hand sides; refactor in place", () => {
    const n = 5;
    const rng = createRandom(5);
    const a0 = Float64Array.from({ length: n * n }, () => rng.normal());
    const lu = new Float64Array(n * n);
    const piv = new Int32Array(n);
    const x = new Float64Array(n);
    for (let trial = 0; trial < 3; trial++) {
      lu.set(a0);
      luFactor(lu, n, piv);
      for (let k = 0; k < 4; k++) {
        const b = Float64Array.from({ length: n }, () => rng.normal());
        x.set(b);
        luSolve(lu, n, piv, x);
        expect(backwardError(a0, n, x, b)).toBeLessThan(10 * n * Number.EPSILON);
      }
    }
  });

  it("handles badly scaled but regular matrices (MNA-like: 1e6 and 1e-12 side by side)", () => {
    const a = Float64Array.of(1e6, 0, 0, 0, 1e-12, 1e-13, 0, 1e-13, 2e-12);
    const b = Float64Array.of(1e6, 1.1e-12, 2.1e-12);
    const x = solveLinear(a, b);
    expectRelClose(x[0]!, 1, 1e-14, "x0");
    expectRelClose(x[1]!, 1, 1e-14, "x1");
    expectRelClose(x[2]!, 1, 1e-14, "x2");
  });

  it("throws SingularMatrixError (a TanklightInputError) naming the column of the zero pivot", () => {
    // rank 2: third row = first + second
    const a = Float64Array.of(1, 2, 3, 4, 5, 6, 5, 7, 9);
    let caught: unknown;
    try {
      luFactor(a, 3, new Int32Array(3));
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(SingularMatrixError);
    expect(caught).toBeInstanceOf(TanklightInputError);
    expect((caught as SingularMatrixError).pivotIndex).toBe(2);
    // a zero column: floating node at index 1
    expect(() => luFactor(Float64Array.of(1, 0, 0, 0, 0, 0, 0, 0, 1), 3, new Int32Array(3))).toThrowErrorMatchingInlineSnapshot(`[SingularMatrixError: luFactor: matrix column 1: matrix is singular (zero pivot at this column), got 0]`);
    expect(LU_PIVOT_RTOL).toBeLessThan(1e-14);
  });

  it("rejects bad dimensions and non-finite entries", () => {
    expect(() => luFactor(new Float64Array(3), 2, new Int32Array(2))).toThrow(TanklightInputError);
    expect(() => luFactor(new Float64Array(4), 2, new Int32Array(1))).toThrow(TanklightInputError);
    expect(() => luFactor(new Float64Array(4), 0, new Int32Array(1))).toThrow(TanklightInputError);
    expect(() => luFactor(Float64Array.of(1, Number.NaN, 0, 1), 2, new Int32Array(2))).toThrow(TanklightInputError);
    expect(() => solveLinear(new Float64Array(4), new Float64Array(3))).toThrow(TanklightInputError);
  });

  it("has the documented types", () => {
    expectTypeOf(luFactor).toEqualTypeOf<(a: Float64Array, n: number, pivots: Int32Array) => void>();
    expectTypeOf(luSolve).toEqualTypeOf<(a: Float64Array, n: number, pivots: Int32Array, b: Float64Array) => void>();
    expectTypeOf(solveLinear).returns.toEqualTypeOf<Float64Array>();
  });
});

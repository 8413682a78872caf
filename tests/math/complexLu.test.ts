import { describe, expect, it } from "vitest";
import { complex, lusolve, matrix, type Complex, type Matrix } from "mathjs";
import { complexLuFactor, complexLuFactorCore, complexLuSolve } from "../../lib/math/complexLu.ts";
import { SingularMatrixError } from "../../lib/math/lu.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectOutside } from "../helpers/validation.ts";

describe("complexLuFactor / complexLuSolve and their cores", () => {
  it("solves a random complex system like mathjs's lusolve", () => {
    // reference library: mathjs (lusolve on complex matrices)
    let seed = 7;
    const rnd = (): number => ((seed = (seed * 16807) % 2147483647) / 2147483647) * 2 - 1;
    const n = 7;
    const re = new Float64Array(n * n);
    const im = new Float64Array(n * n);
    const rows: Complex[][] = [];
    for (let i = 0; i < n; i++) {
      const row: Complex[] = [];
      for (let j = 0; j < n; j++) {
        re[i * n + j] = rnd();
        im[i * n + j] = rnd();
        row.push(complex(re[i * n + j]!, im[i * n + j]!));
      }
      rows.push(row);
    }
    const br = Float64Array.from({ length: n }, rnd);
    const bi = Float64Array.from({ length: n }, rnd);
    const ref = lusolve(matrix(rows), matrix(Array.from(br, (x, i) => [complex(x, bi[i]!)]))) as Matrix;
    const piv = new Int32Array(n);
    complexLuFactor(re, im, n, piv);
    complexLuSolve(re, im, n, piv, br, bi);
    const arr = ref.toArray() as unknown as Complex[][];
    for (let i = 0; i < n; i++) {
      // rtol 1e-11: two pivoted eliminations of a well-conditioned random 7×7 system
      expectOutside({ quantity: `random 7×7 complex solve, x[${i}].re`, source: "reference library: mathjs", ours: br[i]!, reference: arr[i]![0]!.re, rtol: 1e-11, atol: 1e-13 });
      expectOutside({ quantity: `random 7×7 complex solve, x[${i}].im`, source: "reference library: mathjs", ours: bi[i]!, reference: arr[i]![0]!.im, rtol: 1e-11, atol: 1e-13 });
    }
  });

  it("reports the column of a zero pivot: the core returns it, the public form throws SingularMatrixError", () => {
    const n = 2;
    expect(complexLuFactorCore(new Float64Array([1, 2, 2, 4]), new Float64Array(4), n, new Int32Array(n))).toBe(1);
    try {
      complexLuFactor(new Float64Array([1, 2, 2, 4]), new Float64Array(4), n, new Int32Array(n));
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SingularMatrixError);
      expect((e as SingularMatrixError).pivotIndex).toBe(1);
    }
  });

  it("the public form refuses non-finite entries and short arrays, naming the field", () => {
    const piv = new Int32Array(2);
    expect(() => complexLuFactor(Float64Array.of(1, NaN, 0, 1), new Float64Array(4), 2, piv)).toThrow(/re\[1\], im\[1\] \(row 0, column 1\): entries must be finite/);
    expect(() => complexLuFactor(new Float64Array(3), new Float64Array(4), 2, piv)).toThrow(TanklightInputError);
    expect(() => complexLuSolve(Float64Array.of(1, 0, 0, 1), new Float64Array(4), 2, Int32Array.of(0, 1), new Float64Array(1), new Float64Array(2))).toThrow(/br.length/);
    // a pivot record luFactor cannot have written (row 1 swapped with row 0 at step 1)
    expect(() => complexLuSolve(Float64Array.of(1, 0, 0, 1), new Float64Array(4), 2, piv, new Float64Array(2), new Float64Array(2))).toThrow(/piv\[1\]: must lie in \[1, 2\)/);
  });
});

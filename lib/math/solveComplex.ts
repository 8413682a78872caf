/**
 * Complex linear systems A·x = b from arrays of `{ re, im }`: a validated convenience over the
 * library's one complex dense LU (./complexLu.ts). Allocates; for the edges of the library,
 * not per-pose hot loops (those call complexLuFactorCore / complexLuSolveCore on their own
 * workspace).
 *
 * Method: LU with partial pivoting, PA = LU (Golub & Van Loan, *Matrix Computations*, 4th ed.
 * 2013, Algorithm 3.4.1); checked against mathjs's lusolve (reference library: mathjs) in
 * tests/math/solveComplex.test.ts.
 */
import { TanklightInputError, unknownKeyMessage } from "../errors.ts";
import type { Complex } from "./complex.ts";
import { complexLuFactorCore, complexLuSolveCore } from "./complexLu.ts";

/** The largest order solved (n² entries are allocated twice). */
const MAX_ORDER = 2000;

/** A finite complex number { re, im } with no other own keys (a mistyped "img" is refused). */
function isComplex(z: unknown): z is Complex {
  if (typeof z !== "object" || z === null) return false;
  const o = z as Record<string, unknown>;
  if (!(typeof o["re"] === "number" && Number.isFinite(o["re"]) && typeof o["im"] === "number" && Number.isFinite(o["im"]))) return false;
  for (const k of Reflect.ownKeys(o)) if (k !== "re" && k !== "im") return false;
  return true;
}

/** The error for an entry that is no finite { re, im }: an extra key is named with the nearest valid one. */
function entryError(path: string, z: unknown): TanklightInputError {
  const extra = typeof z === "object" && z !== null ? Reflect.ownKeys(z).find((k) => k !== "re" && k !== "im") : undefined;
  if (extra !== undefined) {
    return new TanklightInputError([{ path: `${path}.${String(extra)}`, message: unknownKeyMessage(String(extra), ["re", "im"]), value: (z as Record<PropertyKey, unknown>)[extra] }], "solveComplex");
  }
  return new TanklightInputError([{ path, message: "entries must be finite complex numbers { re, im }", value: z }], "solveComplex");
}

function singular(detail: string, value: unknown): TanklightInputError {
  return new TanklightInputError(
    [{ path: "A", message: `matrix is singular (${detail})`, value, expected: "a regular (invertible) matrix" }],
    "solveComplex",
  );
}

/**
 * Solves the complex system A·x = b (any n ≥ 1).
 *
 * @param A n×n matrix of complex entries `{ re, im }` (units of impedance or admittance; any).
 * @param b right-hand side, n complex entries.
 * @returns x, n complex entries `{ re, im }` with A·x = b.
 * Throws TanklightInputError on a non-square or mismatched system, non-finite entries, or a
 * singular matrix (naming the column whose pivot vanished).
 * @example solveComplex([[{re: 1, im: 0}, {re: 0, im: 1}], [{re: 0, im: 1}, {re: 1, im: 0}]],
 *   [{re: 1, im: 0}, {re: 0, im: 0}]) // → [{re: 0.5, im: 0}, {re: 0, im: −0.5}]
 */
export function solveComplex(A: readonly (readonly Complex[])[], b: readonly Complex[]): Complex[] {
  if (!Array.isArray(b) || b.length < 1) {
    throw new TanklightInputError([{ path: "b", message: "must be a non-empty array of complex numbers { re, im }", value: b }], "solveComplex");
  }
  if (b.length > MAX_ORDER) {
    throw new TanklightInputError([{ path: "b", message: `holds more than ${MAX_ORDER} entries (a dense n×n solve costs n³/3 steps and n² numbers)`, value: `${b.length} entries` }], "solveComplex");
  }
  const n = b.length;
  if (!Array.isArray(A) || A.length !== n || A.some((row) => !Array.isArray(row) || row.length !== n)) {
    throw new TanklightInputError(
      [{ path: "A", message: `must be square with as many rows as b has entries (${n})`, value: Array.isArray(A) ? A.map((r) => r?.length) : A }],
      "solveComplex",
    );
  }
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  A.forEach((row, i) =>
    row.forEach((z: Complex, j: number) => {
      if (!isComplex(z)) {
        throw entryError(`A[${i}][${j}]`, z);
      }
      re[i * n + j] = z.re;
      im[i * n + j] = z.im;
    }),
  );
  const br = new Float64Array(n);
  const bi = new Float64Array(n);
  b.forEach((z, i) => {
    if (!isComplex(z)) {
      throw entryError(`b[${i}]`, z);
    }
    br[i] = z.re;
    bi[i] = z.im;
  });
  const piv = new Int32Array(n);
  const bad = complexLuFactorCore(re, im, n, piv);
  if (bad >= 0) throw singular(`zero pivot in column ${bad}`, n);
  complexLuSolveCore(re, im, n, piv, br, bi);
  const x: Complex[] = Array.from(br, (r, i) => ({ re: r, im: bi[i]! }));
  if (x.some((z) => !Number.isFinite(z.re) || !Number.isFinite(z.im))) throw singular("the solution is not finite", n);
  return x;
}

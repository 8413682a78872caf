/**
 * Complex linear systems A·x = b: a closed-form 2×2 path for hot loops (one transmitter and
 * one receiver) and mathjs's LU solve for larger systems (docs/design.md §3: mathjs objects stay
 * at the edges, e.g. general complex solves of more than two coils).
 *
 * Methods: 2×2 by Cramer's rule with Smith's complex division (Smith, Comm. ACM 5(8), 1962);
 * n > 2 by mathjs `lusolve` (LU with partial pivoting). The matrix is scaled by its largest
 * entry modulus before mathjs sees it, so mathjs's absolute zero-pivot test acts as a
 * relative one and systems in any unit (Ω, S) behave the same.
 */
import { complex, lusolve, matrix, type Complex as MathComplex, type Matrix } from "mathjs";
import { TanklightInputError } from "../errors.ts";
import { complexDiv, type Complex } from "./complex.ts";

/** Relative size of a 2×2 determinant, against its two products, below which the matrix is singular. */
const DET_RTOL = 8 * Number.EPSILON;

function singular(where: string, detail: string, value: unknown): TanklightInputError {
  return new TanklightInputError(
    [{ path: "A", message: `matrix is singular (${detail})`, value, expected: "a regular (invertible) matrix" }],
    where,
  );
}

/**
 * Solves the complex 2×2 system A·x = b by Cramer's rule, writing into `out`; no allocation.
 *
 * @param a Float64Array(8): [a11re, a11im, a12re, a12im, a21re, a21im, a22re, a22im].
 * @param b Float64Array(4): [b1re, b1im, b2re, b2im].
 * @param out Float64Array(≥ 4): receives [x1re, x1im, x2re, x2im] (may not alias a; may alias b).
 * @returns nothing; throws TanklightInputError when |det A| ≤ 8ε·(|a11·a22| + |a12·a21|).
 * @example a = [[1, j], [j, 1]] (det = 2), b = [1, 0] → x = [0.5, −0.5j]
 */
export function solveComplex2x2(a: Float64Array, b: Float64Array, out: Float64Array): void {
  const a11r = a[0]!, a11i = a[1]!, a12r = a[2]!, a12i = a[3]!;
  const a21r = a[4]!, a21i = a[5]!, a22r = a[6]!, a22i = a[7]!;
  const b1r = b[0]!, b1i = b[1]!, b2r = b[2]!, b2i = b[3]!;
  // products a11·a22 and a12·a21
  const p1r = a11r * a22r - a11i * a22i, p1i = a11r * a22i + a11i * a22r;
  const p2r = a12r * a21r - a12i * a21i, p2i = a12r * a21i + a12i * a21r;
  const dr = p1r - p2r, di = p1i - p2i;
  const dAbs = Math.hypot(dr, di);
  const scale = Math.hypot(p1r, p1i) + Math.hypot(p2r, p2i);
  if (!(dAbs > DET_RTOL * scale)) {
    if (!Number.isFinite(scale)) {
      throw new TanklightInputError([{ path: "A", message: "entries must be finite", value: scale }], "solveComplex2x2");
    }
    throw singular("solveComplex2x2", "zero determinant", dAbs);
  }
  // numerators: x1 = (b1·a22 − a12·b2)/det, x2 = (a11·b2 − a21·b1)/det
  const n1r = b1r * a22r - b1i * a22i - (a12r * b2r - a12i * b2i);
  const n1i = b1r * a22i + b1i * a22r - (a12r * b2i + a12i * b2r);
  const n2r = a11r * b2r - a11i * b2i - (a21r * b1r - a21i * b1i);
  const n2i = a11r * b2i + a11i * b2r - (a21r * b1i + a21i * b1r);
  // Smith division by det
  if (Math.abs(dr) >= Math.abs(di)) {
    const r = di / dr, d = dr + di * r;
    out[0] = (n1r + n1i * r) / d;
    out[1] = (n1i - n1r * r) / d;
    out[2] = (n2r + n2i * r) / d;
    out[3] = (n2i - n2r * r) / d;
  } else {
    const r = dr / di, d = dr * r + di;
    out[0] = (n1r * r + n1i) / d;
    out[1] = (n1i * r - n1r) / d;
    out[2] = (n2r * r + n2i) / d;
    out[3] = (n2i * r - n2r) / d;
  }
}

/**
 * Solves the complex system A·x = b (any n ≥ 1): closed form for n ≤ 2, mathjs `lusolve`
 * for n > 2. Allocates; for the edges of the library, not per-pose hot loops.
 *
 * @param A n×n matrix of complex entries `{ re, im }` (units of impedance or admittance; any).
 * @param b right-hand side, n complex entries.
 * @returns x, n complex entries `{ re, im }` with A·x = b.
 * Throws TanklightInputError on a non-square or mismatched system, non-finite entries, or a
 * singular matrix.
 * @example solveComplex([[{re: 1, im: 0}, {re: 0, im: 1}], [{re: 0, im: 1}, {re: 1, im: 0}]],
 *   [{re: 1, im: 0}, {re: 0, im: 0}]) // → [{re: 0.5, im: 0}, {re: 0, im: −0.5}]
 */
export function solveComplex(A: readonly (readonly Complex[])[], b: readonly Complex[]): Complex[] {
  const n = b.length;
  if (n < 1 || A.length !== n || A.some((row) => row.length !== n)) {
    throw new TanklightInputError(
      [{ path: "A", message: `must be square with as many rows as b has entries (${n})`, value: A.map((r) => r.length) }],
      "solveComplex",
    );
  }
  let scale = 0;
  for (const row of A) {
    for (const z of row) {
      if (!Number.isFinite(z.re) || !Number.isFinite(z.im)) {
        throw new TanklightInputError([{ path: "A", message: "entries must be finite", value: z }], "solveComplex");
      }
      scale = Math.max(scale, Math.hypot(z.re, z.im));
    }
  }
  for (const z of b) {
    if (!Number.isFinite(z.re) || !Number.isFinite(z.im)) {
      throw new TanklightInputError([{ path: "b", message: "entries must be finite", value: z }], "solveComplex");
    }
  }
  if (scale === 0) throw singular("solveComplex", "all entries zero", 0);
  if (n === 1) {
    const a = A[0]![0]!;
    const bz = b[0]!;
    const out = new Float64Array(2);
    complexDiv(bz.re, bz.im, a.re, a.im, out); // a ≠ 0: scale > 0 was checked
    return [{ re: out[0]!, im: out[1]! }];
  }
  if (n === 2) {
    const a = new Float64Array(8);
    const bb = new Float64Array(4);
    const out = new Float64Array(4);
    let k = 0;
    for (const row of A) for (const z of row) { a[k++] = z.re; a[k++] = z.im; }
    bb[0] = b[0]!.re; bb[1] = b[0]!.im; bb[2] = b[1]!.re; bb[3] = b[1]!.im;
    solveComplex2x2(a, bb, out);
    return [{ re: out[0]!, im: out[1]! }, { re: out[2]!, im: out[3]! }];
  }
  const Am = matrix(A.map((row) => row.map((z) => complex(z.re / scale, z.im / scale))));
  const bm = matrix(b.map((z) => [complex(z.re, z.im)]));
  let xm: Matrix;
  try {
    xm = lusolve(Am, bm) as Matrix;
  } catch (e) {
    throw singular("solveComplex", `mathjs lusolve: ${(e as Error).message}`, n);
  }
  const rows = xm.toArray() as unknown as (MathComplex | number)[][];
  const x: Complex[] = rows.map((r) => {
    const v = r[0]!;
    const re = typeof v === "number" ? v : v.re;
    const im = typeof v === "number" ? 0 : v.im;
    return { re: re / scale, im: im / scale };
  });
  if (x.some((z) => !Number.isFinite(z.re) || !Number.isFinite(z.im))) {
    throw singular("solveComplex", "the solution is not finite", n);
  }
  return x;
}

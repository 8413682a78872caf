/**
 * Dense real LU factorisation with partial (row) pivoting, in place on a row-major
 * Float64Array, and the matching forward/back substitution. Made for the transient
 * engine's modified nodal analysis: factor once per Newton step, solve, reuse the arrays.
 *
 * Method: Doolittle elimination with partial pivoting, PA = LU (Golub & Van Loan,
 * *Matrix Computations*, 4th ed. 2013, Algorithm 3.4.1 "outer product LU with partial
 * pivoting" and §3.1 for the triangular solves). L has a unit diagonal and is stored below
 * the diagonal of `a`; U on and above it.
 *
 * Singularity rule (one named tolerance, {@link LU_PIVOT_RTOL}): at step k the pivot
 * |u_kk| is compared with the largest magnitude in column k of the working matrix (the
 * U entries above it and the reduced entries below). If |u_kk| ≤ LU_PIVOT_RTOL·n·max, or the
 * column is all zero, the matrix is treated as singular and {@link SingularMatrixError}
 * names the column. Column-relative so that badly scaled but regular MNA matrices (a 1 MΩ
 * and a 1 mΩ branch side by side) are not rejected.
 */
import { TanklightInputError, underName } from "../errors.ts";
import { typedArg } from "./args.ts";

/** Relative pivot tolerance (times n) below which a matrix is called singular: a few ulps. */
export const LU_PIVOT_RTOL = 4 * Number.EPSILON;

/** Thrown by {@link luFactor} when a pivot vanishes; `pivotIndex` is the 0-based column. */
export class SingularMatrixError extends TanklightInputError {
  /** 0-based column (and elimination step) whose pivot vanished */
  readonly pivotIndex: number;
  constructor(pivotIndex: number, pivot: number, where: string) {
    super(
      [
        {
          path: `matrix column ${pivotIndex}`,
          message: "matrix is singular (zero pivot at this column)",
          value: pivot,
          expected: "a non-zero pivot",
        },
      ],
      where,
    );
    this.name = "SingularMatrixError";
    this.pivotIndex = pivotIndex;
  }
}

function checkDims(a: Float64Array, n: number, where: string): void {
  typedArg(a, Float64Array, "a", where);
  if (!(Number.isInteger(n) && n >= 1)) {
    throw new TanklightInputError([{ path: "n", message: "must be an integer ≥ 1", value: n }], where);
  }
  if (a.length < n * n) {
    throw new TanklightInputError(
      [{ path: "a.length", message: `must be ≥ n² = ${n * n}`, value: a.length }],
      where,
    );
  }
}

/**
 * Factors the n×n row-major matrix `a` in place into P·A = L·U (partial pivoting).
 *
 * @param a row-major n×n matrix, element (i, j) at a[i·n + j]; overwritten by L (unit
 *   diagonal, below) and U (on and above the diagonal). Entries must be finite.
 * @param n order of the matrix, integer ≥ 1.
 * @param pivots Int32Array of length ≥ n; receives the row interchanges (row k was swapped
 *   with row pivots[k] at step k).
 * @returns nothing; throws {@link SingularMatrixError} (with `pivotIndex`) on a zero pivot.
 * Method: Golub & Van Loan 2013, Algorithm 3.4.1.
 * @example
 *   const a = Float64Array.of(2, 1, 1, 3); const p = new Int32Array(2);
 *   luFactor(a, 2, p); const b = Float64Array.of(3, 5); luSolve(a, 2, p, b); // b → [0.8, 1.4]
 * @see luSolve
 */
export function luFactor(a: Float64Array, n: number, pivots: Int32Array): void {
  checkDims(a, n, "luFactor");
  typedArg(pivots, Int32Array, "pivots", "luFactor");
  if (pivots.length < n) {
    throw new TanklightInputError([{ path: "pivots.length", message: `must be ≥ n = ${n}`, value: pivots.length }], "luFactor");
  }
  for (let i = 0; i < n * n; i++) {
    if (!Number.isFinite(a[i]!)) {
      throw new TanklightInputError(
        [{ path: `a[${i}] (row ${Math.floor(i / n)}, column ${i % n})`, message: "entries must be finite", value: a[i] }],
        "luFactor",
      );
    }
  }
  const bad = luFactorCore(a, n, pivots);
  if (bad >= 0) {
    let big = 0; // the largest pivot candidate of the failed column (left unchanged by the core)
    for (let i = bad; i < n; i++) big = Math.max(big, Math.abs(a[i * n + bad]!));
    throw new SingularMatrixError(bad, big, "luFactor");
  }
  for (let i = 0; i < n * n; i++) {
    if (!Number.isFinite(a[i]!)) {
      throw new TanklightInputError([{ path: "a", message: "the elimination overflows the double range (entries too large or too unequal in scale)", value: a[i] }], "luFactor");
    }
  }
}

/** Checks pivots as luFactor writes them: a Int32Array whose entry k lies in [k, n). */
export function checkPivots(pivots: unknown, n: number, field: string, where: string): void {
  typedArg(pivots, Int32Array, field, where);
  const p = pivots as Int32Array;
  if (p.length < n) throw new TanklightInputError([{ path: `${field}.length`, message: `must be ≥ n = ${n}`, value: p.length }], where);
  for (let k = 0; k < n; k++) {
    if (!(p[k]! >= k && p[k]! < n)) {
      throw new TanklightInputError([{ path: `${field}[${k}]`, message: `must lie in [${k}, ${n}) (the row interchanges written by the factorisation)`, value: p[k] }], where);
    }
  }
}

/**
 * The unchecked core of {@link luFactor} for hot paths (the transient engine, the link
 * solver's Newton step): the same elimination and singularity rule, no argument checks.
 * Entries must be finite (a NaN entry leaves NaN factors rather than an error).
 * @returns −1 on success, else the 0-based column whose pivot vanished (the factors are then
 *   partial).
 * @example luFactorCore(Float64Array.of(2, 1, 1, 3), 2, new Int32Array(2)) // → −1
 */
export function luFactorCore(a: Float64Array, n: number, pivots: Int32Array): number {
  for (let k = 0; k < n; k++) {
    // pivot search in column k, rows k..n-1
    let p = k;
    let big = Math.abs(a[k * n + k]!);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]!);
      if (v > big) {
        big = v;
        p = i;
      }
    }
    // column scale: U entries above (rows < k) and the pivot candidate
    let scale = big;
    for (let i = 0; i < k; i++) scale = Math.max(scale, Math.abs(a[i * n + k]!));
    if (big === 0 || big <= LU_PIVOT_RTOL * n * scale) return k;
    pivots[k] = p;
    if (p !== k) {
      const rk = k * n;
      const rp = p * n;
      for (let j = 0; j < n; j++) {
        const t = a[rk + j]!;
        a[rk + j] = a[rp + j]!;
        a[rp + j] = t;
      }
    }
    const rk = k * n;
    const inv = 1 / a[rk + k]!;
    for (let i = k + 1; i < n; i++) {
      const ri = i * n;
      const l = a[ri + k]! * inv;
      a[ri + k] = l;
      if (l !== 0) {
        for (let j = k + 1; j < n; j++) a[ri + j] = a[ri + j]! - l * a[rk + j]!;
      }
    }
  }
  return -1;
}

/**
 * Solves A·x = b in place using the factors left in `a` and `pivots` by {@link luFactor}.
 *
 * @param a the factored matrix from luFactor (unchanged).
 * @param n order, as given to luFactor.
 * @param pivots the row interchanges from luFactor.
 * @param b right-hand side of length ≥ n; overwritten by the solution x (same units as
 *   b divided by the units of A).
 * Method: forward substitution with L (unit diagonal) after applying P, then back
 * substitution with U (Golub & Van Loan 2013, Algorithms 3.1.1–3.1.2).
 * @example see {@link luFactor}: A = [[2, 1], [1, 3]], b = [3, 5] → x = [0.8, 1.4]
 */
export function luSolve(a: Float64Array, n: number, pivots: Int32Array, b: Float64Array): void {
  checkDims(a, n, "luSolve");
  checkPivots(pivots, n, "pivots", "luSolve");
  typedArg(b, Float64Array, "b", "luSolve");
  if (b.length < n) {
    throw new TanklightInputError([{ path: "b.length", message: `must be ≥ n = ${n}`, value: b.length }], "luSolve");
  }
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(b[i]!)) throw new TanklightInputError([{ path: `b[${i}]`, message: "entries must be finite", value: b[i] }], "luSolve");
  }
  // U's diagonal (what the back substitution divides by): finite and non-zero, as luFactor leaves it
  for (let i = 0; i < n; i++) {
    const d = a[i * n + i]!;
    if (!(Number.isFinite(d) && d !== 0)) throw new TanklightInputError([{ path: `a[${i * n + i}]`, message: "must be a finite, non-zero pivot (a holds luFactor's output)", value: d }], "luSolve");
  }
  luSolveCore(a, n, pivots, b);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(b[i]!)) {
      throw new TanklightInputError(
        [{ path: "a", message: "the solution is not finite: a and pivots are not luFactor's output, or the solution overflows the double range", value: b[i] }],
        "luSolve",
      );
    }
  }
}

/**
 * The unchecked core of {@link luSolve}: forward and back substitution, no argument checks.
 * @example see {@link luFactorCore}
 */
export function luSolveCore(a: Float64Array, n: number, pivots: Int32Array, b: Float64Array): void {
  for (let k = 0; k < n; k++) {
    const p = pivots[k]!;
    if (p !== k) {
      const t = b[k]!;
      b[k] = b[p]!;
      b[p] = t;
    }
  }
  for (let i = 1; i < n; i++) {
    const ri = i * n;
    let s = b[i]!;
    for (let j = 0; j < i; j++) s -= a[ri + j]! * b[j]!;
    b[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    const ri = i * n;
    let s = b[i]!;
    for (let j = i + 1; j < n; j++) s -= a[ri + j]! * b[j]!;
    b[i] = s / a[ri + i]!;
  }
}

/**
 * Convenience: solves A·x = b for a fresh copy of A and b (allocates; not for hot paths).
 *
 * @param a row-major n×n matrix (not modified).
 * @param b right-hand side, length n (not modified).
 * @returns x as a new Float64Array.
 * @example solveLinear(Float64Array.of(2, 1, 1, 3), Float64Array.of(3, 5)) // → [0.8, 1.4]
 */
export function solveLinear(a: Float64Array, b: Float64Array): Float64Array {
  typedArg(a, Float64Array, "a", "solveLinear");
  typedArg(b, Float64Array, "b", "solveLinear");
  const n = b.length;
  if (n < 1) throw new TanklightInputError([{ path: "b", message: "must hold at least one entry", value: b }], "solveLinear");
  if (a.length !== n * n) {
    throw new TanklightInputError(
      [{ path: "a.length", message: `must equal b.length² = ${n * n}`, value: a.length }],
      "solveLinear",
    );
  }
  const lu = Float64Array.from(a);
  const x = Float64Array.from(b);
  const piv = new Int32Array(n);
  underName("solveLinear", () => {
    luFactor(lu, n, piv);
    luSolve(lu, n, piv, x);
  });
  return x;
}

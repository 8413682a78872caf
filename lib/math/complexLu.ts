/**
 * Dense complex LU with partial pivoting on split real/imaginary Float64Arrays — the one
 * complex linear solver of the library (the link solver's coupled-circuit impedance matrix,
 * {@link solveComplex}). A validated public form ({@link complexLuFactor},
 * {@link complexLuSolve}) and the unchecked cores beside it for hot paths; no allocation per
 * call (the caller owns every array).
 *
 * Method: Doolittle elimination with partial pivoting, PA = LU (Golub & Van Loan, *Matrix
 * Computations*, 4th ed. 2013, Algorithm 3.4.1), pivot chosen by the modulus |a_ik|. The test
 * checks it against mathjs's general complex solve (reference library: mathjs).
 */

import { TanklightInputError } from "../errors.ts";
import { LU_PIVOT_RTOL, SingularMatrixError, checkPivots } from "./lu.ts";
import { typedArg } from "./args.ts";

function checkDims(re: Float64Array, im: Float64Array, n: number, where: string): void {
  typedArg(re, Float64Array, "re", where);
  typedArg(im, Float64Array, "im", where);
  if (!(Number.isInteger(n) && n >= 1)) {
    throw new TanklightInputError([{ path: "n", message: "must be an integer ≥ 1", value: n }], where);
  }
  if (re.length < n * n || im.length < n * n) {
    throw new TanklightInputError([{ path: "re.length, im.length", message: `must be ≥ n² = ${n * n}`, value: [re.length, im.length] }], where);
  }
}

/**
 * Factors the n×n row-major complex matrix (re, im) in place into P·A = L·U.
 * @param re, im real and imaginary parts, element (i, j) at [i·n + j]; entries finite.
 * @param n order, integer ≥ 1.
 * @param piv Int32Array of length ≥ n; receives the row swapped into position k at step k.
 * @returns nothing; throws {@link SingularMatrixError} when a pivot vanishes (at most
 *   LU_PIVOT_RTOL·n of its column's largest modulus, as in ./lu.ts).
 * @example
 *   const re = Float64Array.of(1, 0, 0, 1), im = Float64Array.of(0, 1, 1, 0), p = new Int32Array(2);
 *   complexLuFactor(re, im, 2, p); const br = Float64Array.of(1, 0), bi = Float64Array.of(0, 0);
 *   complexLuSolve(re, im, 2, p, br, bi); // x = [0.5, −0.5j]: br → [0.5, 0], bi → [0, −0.5]
 */
export function complexLuFactor(re: Float64Array, im: Float64Array, n: number, piv: Int32Array): void {
  checkDims(re, im, n, "complexLuFactor");
  typedArg(piv, Int32Array, "piv", "complexLuFactor");
  if (piv.length < n) {
    throw new TanklightInputError([{ path: "piv.length", message: `must be ≥ n = ${n}`, value: piv.length }], "complexLuFactor");
  }
  for (let i = 0; i < n * n; i++) {
    if (!Number.isFinite(re[i]!) || !Number.isFinite(im[i]!)) {
      throw new TanklightInputError(
        [{ path: `re[${i}], im[${i}] (row ${Math.floor(i / n)}, column ${i % n})`, message: "entries must be finite", value: { re: re[i], im: im[i] } }],
        "complexLuFactor",
      );
    }
  }
  const bad = complexLuFactorCore(re, im, n, piv);
  if (bad >= 0) throw new SingularMatrixError(bad, 0, "complexLuFactor");
  for (let i = 0; i < n * n; i++) {
    if (!Number.isFinite(re[i]!) || !Number.isFinite(im[i]!)) {
      throw new TanklightInputError([{ path: "re, im", message: "the elimination overflows the double range (entries too large or too unequal in scale)", value: { re: re[i], im: im[i] } }], "complexLuFactor");
    }
  }
}

/**
 * Solves A·x = b in place on (br, bi) with the factors from {@link complexLuFactor}.
 * @param br, bi right-hand side (length ≥ n), overwritten by x.
 * @example see {@link complexLuFactor}: A = [[1, j], [j, 1]], b = [1, 0] → x = [0.5, −0.5j]
 */
export function complexLuSolve(re: Float64Array, im: Float64Array, n: number, piv: Int32Array, br: Float64Array, bi: Float64Array): void {
  checkDims(re, im, n, "complexLuSolve");
  checkPivots(piv, n, "piv", "complexLuSolve");
  typedArg(br, Float64Array, "br", "complexLuSolve");
  typedArg(bi, Float64Array, "bi", "complexLuSolve");
  if (br.length < n || bi.length < n) {
    throw new TanklightInputError([{ path: "br.length, bi.length", message: `must be ≥ n = ${n}`, value: [br.length, bi.length] }], "complexLuSolve");
  }
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(br[i]!) || !Number.isFinite(bi[i]!)) {
      throw new TanklightInputError([{ path: `br[${i}], bi[${i}]`, message: "entries must be finite", value: [br[i], bi[i]] }], "complexLuSolve");
    }
  }
  for (let i = 0; i < n; i++) {
    const dr = re[i * n + i]!, di = im[i * n + i]!;
    if (!(Number.isFinite(dr) && Number.isFinite(di) && (dr !== 0 || di !== 0))) {
      throw new TanklightInputError([{ path: `re[${i * n + i}], im[${i * n + i}]`, message: "must be a finite, non-zero pivot (re, im hold complexLuFactor's output)", value: [dr, di] }], "complexLuSolve");
    }
  }
  complexLuSolveCore(re, im, n, piv, br, bi);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(br[i]!) || !Number.isFinite(bi[i]!)) {
      throw new TanklightInputError(
        [{ path: "re, im", message: "the solution is not finite: re, im and piv are not complexLuFactor's output, or the solution overflows the double range", value: [br[i], bi[i]] }],
        "complexLuSolve",
      );
    }
  }
}

/**
 * The unchecked core of {@link complexLuFactor}: factors in place; `piv[k]` receives the row
 * swapped into position k. Pivot by the modulus |re| + |im|; a pivot of modulus at most
 * LU_PIVOT_RTOL·n times its column's largest (the real LU's rule), or not finite, stops the
 * factorisation.
 * @returns the 0-based index of the first zero pivot, or −1 on success.
 */
export function complexLuFactorCore(re: Float64Array, im: Float64Array, n: number, piv: Int32Array): number {
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = -1;
    for (let i = k; i < n; i++) {
      const m = Math.abs(re[i * n + k]!) + Math.abs(im[i * n + k]!);
      if (m > best) {
        best = m;
        p = i;
      }
    }
    piv[k] = p;
    // the singularity rule of the real LU (./lu.ts): a pivot within LU_PIVOT_RTOL·n of its
    // column's largest modulus (U entries above, candidates below) is zero
    let scale = best;
    for (let i = 0; i < k; i++) scale = Math.max(scale, Math.abs(re[i * n + k]!) + Math.abs(im[i * n + k]!));
    if (!(best > LU_PIVOT_RTOL * n * scale) || !Number.isFinite(best)) return k;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const a = k * n + j;
        const b = p * n + j;
        const tr = re[a]!;
        re[a] = re[b]!;
        re[b] = tr;
        const ti = im[a]!;
        im[a] = im[b]!;
        im[b] = ti;
      }
    }
    const dr = re[k * n + k]!;
    const di = im[k * n + k]!;
    const den = dr * dr + di * di;
    const ir = dr / den;
    const ii = -di / den;
    for (let i = k + 1; i < n; i++) {
      const ar = re[i * n + k]!;
      const ai = im[i * n + k]!;
      const lr = ar * ir - ai * ii;
      const li = ar * ii + ai * ir;
      re[i * n + k] = lr;
      im[i * n + k] = li;
      if (lr === 0 && li === 0) continue;
      for (let j = k + 1; j < n; j++) {
        const ur = re[k * n + j]!;
        const ui = im[k * n + j]!;
        re[i * n + j] = re[i * n + j]! - (lr * ur - li * ui);
        im[i * n + j] = im[i * n + j]! - (lr * ui + li * ur);
      }
    }
  }
  return -1;
}

/** The unchecked core of {@link complexLuSolve}: solves A x = b in place on (br, bi). */
export function complexLuSolveCore(
  re: Float64Array,
  im: Float64Array,
  n: number,
  piv: Int32Array,
  br: Float64Array,
  bi: Float64Array,
): void {
  for (let k = 0; k < n; k++) {
    const p = piv[k]!;
    if (p !== k) {
      const tr = br[k]!;
      br[k] = br[p]!;
      br[p] = tr;
      const ti = bi[k]!;
      bi[k] = bi[p]!;
      bi[p] = ti;
    }
  }
  for (let i = 1; i < n; i++) {
    let sr = br[i]!;
    let si = bi[i]!;
    for (let j = 0; j < i; j++) {
      const lr = re[i * n + j]!;
      const li = im[i * n + j]!;
      sr -= lr * br[j]! - li * bi[j]!;
      si -= lr * bi[j]! + li * br[j]!;
    }
    br[i] = sr;
    bi[i] = si;
  }
  for (let i = n - 1; i >= 0; i--) {
    let sr = br[i]!;
    let si = bi[i]!;
    for (let j = i + 1; j < n; j++) {
      const ur = re[i * n + j]!;
      const ui = im[i * n + j]!;
      sr -= ur * br[j]! - ui * bi[j]!;
      si -= ur * bi[j]! + ui * br[j]!;
    }
    const dr = re[i * n + i]!;
    const di = im[i * n + i]!;
    const den = dr * dr + di * di;
    br[i] = (sr * dr + si * di) / den;
    bi[i] = (si * dr - sr * di) / den;
  }
}

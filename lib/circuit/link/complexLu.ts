/**
 * Small dense complex LU with partial pivoting on split real/imaginary Float64Arrays, for the
 * link solver's coupled-circuit impedance matrix (a few to a few tens of loops). Private to the
 * link solver; no allocation per call (the caller owns every array).
 *
 * Method: Doolittle elimination with partial pivoting, PA = LU (Golub & Van Loan, *Matrix
 * Computations*, 4th ed. 2013, Algorithm 3.4.1), pivot chosen by the modulus |a_ik|. The test
 * checks it against mathjs's general complex solve (reference library: mathjs).
 */

/**
 * Factors the n×n row-major complex matrix (re, im) in place; `piv[k]` receives the row
 * swapped into position k. Returns the 0-based index of the first zero pivot, or −1 on success.
 */
export function complexLuFactor(re: Float64Array, im: Float64Array, n: number, piv: Int32Array): number {
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
    if (!(best > 0) || !Number.isFinite(best)) return k;
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

/** Solves A x = b in place on (br, bi) with the factors from {@link complexLuFactor}. */
export function complexLuSolve(
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

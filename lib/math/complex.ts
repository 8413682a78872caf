/**
 * Small complex arithmetic for hot paths: plain numbers in, results written into a caller's
 * Float64Array at an offset (re at out[i], im at out[i + 1]) — no allocation per call.
 * Phasor convention e^{jωt} (docs/design.md §3); these helpers know no physics.
 * Every argument is checked (finite parts, an `out` with room at `offset`) and a result that
 * leaves the double range is an error, not ±∞: these are public helpers, not a hot path.
 *
 * Methods: division by Smith's algorithm (R. L. Smith, "Algorithm 116: Complex division",
 * Comm. ACM 5(8):435, 1962), which avoids overflow/underflow of |b|²; modulus by
 * Math.hypot; principal square root by the cancellation-free form of Kahan ("Branch cuts
 * for complex elementary functions", 1987, procedure CSQRT; also DLMF §4.2(iv) for the
 * principal branch).
 */
import { TanklightInputError } from "../errors.ts";
import { finiteArg, outArg, overflowError } from "./args.ts";

/** A complex number as plain data (mathjs Complex objects also fit this shape). */
export interface Complex {
  readonly re: number;
  readonly im: number;
}

/**
 * out ← a·b.
 * @param ar, ai real and imaginary parts of a; br, bi of b (any finite numbers).
 * @param out receives re at out[offset], im at out[offset + 1].
 * @example complexMul(1, 2, 3, -1, out) // out → [5, 5]
 */
export function complexMul(ar: number, ai: number, br: number, bi: number, out: Float64Array, offset = 0): void {
  const at = checkParts("complexMul", out, offset, ar, ai, br, bi);
  write("complexMul", "the product", out, at, ar * br - ai * bi, ar * bi + ai * br);
}

/** Checks the parts (named ar, ai, br, bi in order) and the output array; returns the offset. */
function checkParts(where: string, out: unknown, offset: unknown, ...parts: number[]): number {
  const names = parts.length === 4 ? ["ar", "ai", "br", "bi"] : ["br", "bi"];
  parts.forEach((x, i) => finiteArg(x, names[i]!, where));
  return outArg(out, offset, 2, where);
}

/** Writes re, im at out[at], or throws when either left the double range. */
function write(where: string, what: string, out: Float64Array, at: number, re: number, im: number): void {
  if (!Number.isFinite(re) || !Number.isFinite(im)) throw overflowError(what, where, [re, im]);
  out[at] = re;
  out[at + 1] = im;
}

/**
 * out ← a·conj(b); with a = V and b = I, ½·out[0] is the real power ½Re(V·I*).
 * @example complexMulConj(1, 2, 3, -1, out) // out → [1, 7]
 */
export function complexMulConj(ar: number, ai: number, br: number, bi: number, out: Float64Array, offset = 0): void {
  const at = checkParts("complexMulConj", out, offset, ar, ai, br, bi);
  write("complexMulConj", "the product", out, at, ar * br + ai * bi, ai * br - ar * bi);
}

/**
 * out ← a / b by Smith's algorithm (Smith 1962). Throws TanklightInputError when b = 0.
 * @example complexDiv(5, 5, 3, -1, out) // out → [1, 2]
 */
export function complexDiv(ar: number, ai: number, br: number, bi: number, out: Float64Array, offset = 0): void {
  divide("complexDiv", ar, ai, br, bi, out, checkParts("complexDiv", out, offset, ar, ai, br, bi));
}

function divide(where: string, ar: number, ai: number, br: number, bi: number, out: Float64Array, at: number): void {
  if (br === 0 && bi === 0) {
    throw new TanklightInputError([{ path: "br, bi", message: "divisor must be non-zero", value: 0 }], where);
  }
  if (Math.abs(br) >= Math.abs(bi)) {
    const r = bi / br;
    const d = br + bi * r;
    write(where, "the quotient", out, at, (ar + ai * r) / d, (ai - ar * r) / d);
  } else {
    const r = br / bi;
    const d = br * r + bi;
    write(where, "the quotient", out, at, (ar * r + ai) / d, (ai * r - ar) / d);
  }
}

/**
 * out ← 1 / b (Smith 1962). Throws TanklightInputError when b = 0.
 * @example complexInv(0, 2, out) // out → [0, −0.5]
 */
export function complexInv(br: number, bi: number, out: Float64Array, offset = 0): void {
  divide("complexInv", 1, 0, br, bi, out, checkParts("complexInv", out, offset, br, bi));
}

/**
 * |a| = √(re² + im²) without overflow.
 * @example complexAbs(3, 4) // → 5
 */
export function complexAbs(ar: number, ai: number): number {
  const r = Math.hypot(finiteArg(ar, "ar", "complexAbs"), finiteArg(ai, "ai", "complexAbs"));
  if (!Number.isFinite(r)) throw overflowError("|a|", "complexAbs", r);
  return r;
}

/**
 * Argument (phase) of a in (−π, π], rad.
 * @example complexArg(0, 1) // → π/2
 */
export function complexArg(ar: number, ai: number): number {
  return Math.atan2(finiteArg(ai, "ai", "complexArg"), finiteArg(ar, "ar", "complexArg"));
}

/**
 * out ← √a, principal branch (Re ≥ 0; branch cut on the negative real axis, the upper side
 * for im = +0 as in DLMF §4.2(iv)); cancellation-free (Kahan 1987).
 * @example complexSqrt(-4, 0, out) // out → [0, 2];  complexSqrt(3, 4, out) // out → [2, 1]
 */
export function complexSqrt(ar: number, ai: number, out: Float64Array, offset = 0): void {
  finiteArg(ar, "ar", "complexSqrt");
  finiteArg(ai, "ai", "complexSqrt");
  offset = outArg(out, offset, 2, "complexSqrt");
  if (ar === 0 && ai === 0) {
    out[offset] = 0;
    out[offset + 1] = ai;
    return;
  }
  // rescale by an even power of two outside [2^-500, 2^500] so that neither the hypot nor
  // the quotient under- or overflows (subnormal inputs, |a| near the double limit)
  const big = Math.max(Math.abs(ar), Math.abs(ai));
  let scale = 1;
  if (big < 3.054936363499605e-151) scale = 2 ** 600; // 2^-500
  else if (big > 3.273390607896142e150) scale = 2 ** -600; // 2^500
  const sr = ar * scale;
  const si = ai * scale;
  const back = scale === 1 ? 1 : scale > 1 ? 2 ** -300 : 2 ** 300;
  const t = Math.sqrt((Math.abs(sr) + Math.hypot(sr, si)) / 2);
  if (sr >= 0) {
    out[offset] = t * back;
    out[offset + 1] = (si / (2 * t)) * back;
  } else {
    out[offset] = (Math.abs(si) / (2 * t)) * back;
    out[offset + 1] = (si < 0 || Object.is(si, -0) ? -t : t) * back;
  }
}

/**
 * out ← e^{jθ}·r = r·(cos θ + j sin θ): a phasor of magnitude r and phase θ.
 * @param r magnitude (any unit); theta phase, rad.
 * @example complexFromPolar(2, Math.PI / 2, out) // out → [1.2e−16, 2]
 */
export function complexFromPolar(r: number, theta: number, out: Float64Array, offset = 0): void {
  finiteArg(r, "r", "complexFromPolar");
  finiteArg(theta, "theta", "complexFromPolar");
  const at = outArg(out, offset, 2, "complexFromPolar");
  write("complexFromPolar", "the phasor", out, at, r * Math.cos(theta), r * Math.sin(theta));
}

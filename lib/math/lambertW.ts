/**
 * Lambert W function, principal branch W₀: the w ≥ −1 with w·e^w = x, for x ≥ −1/e.
 *
 * Method: Halley's iteration (Corless, Gonnet, Hare, Jeffrey & Knuth 1996, "On the Lambert
 * W function", Adv. Comput. Math. 5, eq. 5.9), started from the branch-point series near
 * −1/e, log asymptotics for large x, and a rational guess in between. For very large x
 * (diode currents far in forward bias) the iteration runs on ln x to avoid overflow of e^w.
 */

const INV_E = Math.exp(-1);

/**
 * W₀(x), principal branch.
 * @param x argument, x ≥ −1/e (finite).
 * @returns w with w·e^w = x, w ≥ −1.
 * @example lambertW(1) // → 0.5671432904097838 (the omega constant);  lambertW(Math.E) // → 1
 */
export function lambertW(x: number): number {
  if (!Number.isFinite(x) || x < -INV_E - 1e-16) {
    throw new RangeError(`lambertW: x must be finite and ≥ −1/e (got ${x})`);
  }
  if (x === 0) return 0;
  if (x <= -INV_E) return -1;
  let w: number;
  if (x < -0.32) {
    // branch point series: p = √(2(ex + 1))
    const p = Math.sqrt(Math.max(0, 2 * (Math.E * x + 1)));
    w = -1 + p - p * p / 3 + (11 / 72) * p * p * p;
  } else if (x < 3) {
    w = Math.log1p(x) * (1 - Math.log1p(Math.log1p(x)) / (2 + Math.log1p(x)));
  } else {
    const l1 = Math.log(x);
    const l2 = Math.log(l1);
    w = l1 - l2 + l2 / l1;
  }
  if (x > 1e300 || !Number.isFinite(Math.exp(w))) {
    return lambertWOfLog(Math.log(x));
  }
  for (let i = 0; i < 50; i++) {
    const ew = Math.exp(w);
    const f = w * ew - x;
    const wp1 = w + 1;
    if (wp1 === 0) break;
    const dw = f / (ew * wp1 - ((w + 2) * f) / (2 * wp1));
    w -= dw;
    if (Math.abs(dw) <= 4e-16 * Math.max(1, Math.abs(w))) break;
  }
  return w;
}

/**
 * W₀(e^y) for large y without forming e^y: solves w + ln w = y by Newton.
 * Used for diode equations whose argument overflows a double.
 * @param y ln of the argument, y > 1.
 * @example lambertWOfLog(1000) // → 993.1258... (W(e^1000))
 */
export function lambertWOfLog(y: number): number {
  if (!Number.isFinite(y)) throw new RangeError(`lambertWOfLog: y must be finite (got ${y})`);
  if (y < 1) return lambertW(Math.exp(y));
  let w = y - Math.log(y);
  for (let i = 0; i < 50; i++) {
    const f = w + Math.log(w) - y;
    const dw = f / (1 + 1 / w);
    w -= dw;
    if (Math.abs(dw) <= 4e-16 * w) break;
  }
  return w;
}

/**
 * Kelvin functions of the first kind, ber_ν x and bei_ν x (ν = 0, 1, 2), and the derivatives
 * ber′x, bei′x of order 0, for real x ≥ 0.
 *
 * Definition (Abramowitz & Stegun 1964, eq. 9.9.1): ber_ν x + i·bei_ν x = J_ν(x·e^{3πi/4}).
 * Derivatives (A&S 9.9.14 with ν = 0, from J₀′ = −J₁): ber′x = (ber₁x + bei₁x)/√2,
 * bei′x = (bei₁x − ber₁x)/√2.
 *
 * Method. Both regimes compute the scaled complex value S_ν(x) = e^{−x/√2}·J_ν(x·e^{3πi/4}),
 * whose modulus stays near 1/√(2πx), so ratios such as the round-wire AC factor never overflow:
 * - x < 26: the ascending series J_ν(z) = (z/2)^ν Σ (−z²/4)^k / (k!(k+ν)!) (A&S 9.1.10) with
 *   −z²/4 = i·x²/4; its largest term is up to e^{(1−1/√2)x} times the result, so near the
 *   crossover a few digits are lost (measured: ≤ 4e-14 of the modulus |ber + i bei|).
 * - x ≥ 26: Hankel's expansions of H⁽¹⁾ and H⁽²⁾ (A&S 9.2.7–9.2.10, valid at arg z = 3π/4),
 *   J = (H⁽¹⁾ + H⁽²⁾)/2, each truncated at its smallest term (≈ e^{−2x} relative; at x = 18 that
 *   was still 1e-11, hence the crossover at 26); both exponentials are kept. The phase
 *   x/√2 costs ≈ x·1e-16 relative at large x (4e-14 at x = 500).
 * The unscaled ber/bei grow like e^{x/√2}: they are finite for x ≤ 1000 (overflow at ≈ 1003);
 * larger x throws (use the scaled form there).
 */

import { TanklightInputError } from "../errors.ts";

const SQRT1_2 = Math.SQRT1_2;
/** series below, Hankel asymptotic at and above this argument */
export const KELVIN_CROSSOVER = 26;
/** largest x for the unscaled functions (e^{x/√2} stays below the float64 range) */
const UNSCALED_MAX = 1000;

/** e^{−x/√2}·J_ν(x e^{3πi/4}) into out[at] (real part) and out[at + 1] (imaginary part); ν ∈ {0, 1, 2}; x ≥ 0 (not checked: private hot path). */
function scaledJ(nu: number, x: number, out: Float64Array, at: number): void {
  if (x < KELVIN_CROSSOVER) seriesJ(nu, x, out, at);
  else hankelJ(nu, x, out, at);
}

/** Ascending series of J_ν(x e^{3πi/4}), times e^{−x/√2}. */
function seriesJ(nu: number, x: number, out: Float64Array, at: number): void {
  // Σ_k t_k i^k with t_k = (x²/4)^k / (k!(k+ν)!) real and positive.
  const q = (x * x) / 4;
  let fact = 1; // 1/ν!
  for (let j = 2; j <= nu; j++) fact /= j;
  let t = fact;
  let re = 0;
  let im = 0;
  for (let k = 0; k < 400; k++) {
    switch (k & 3) {
      case 0: re += t; break;
      case 1: im += t; break;
      case 2: re -= t; break;
      default: im -= t;
    }
    t *= q / ((k + 1) * (k + 1 + nu));
    if (t < 1e-18 * Math.max(Math.abs(re), Math.abs(im), 1e-300) && k > 2) break;
  }
  // prefactor (x/2)^ν e^{3πiν/4} e^{−x/√2}
  const mag = Math.pow(x / 2, nu) * Math.exp(-x * SQRT1_2);
  const ang = (3 * Math.PI * nu) / 4;
  const c = Math.cos(ang) * mag;
  const s = Math.sin(ang) * mag;
  out[at] = re * c - im * s;
  out[at + 1] = re * s + im * c;
}

/** Hankel's asymptotic expansion of J_ν(x e^{3πi/4}), times e^{−x/√2}. */
function hankelJ(nu: number, x: number, out: Float64Array, at: number): void {
  // a_k(ν) = Π_{j=1..k} (4ν² − (2j−1)²) / (k! 8^k); w = 1/z = e^{−3πi/4}/x.
  // H⁽²⁾ ~ √(2/(πz)) e^{−iχ} Σ (−i)^k a_k w^k,  H⁽¹⁾ ~ √(2/(πz)) e^{iχ} Σ i^k a_k w^k,
  // χ = z − (ν/2 + 1/4)π. For z = x e^{3πi/4}: e^{−iχ} = e^{x/√2} e^{iθ}, e^{iχ} = e^{−x/√2} e^{−iθ},
  // θ = x/√2 + (ν/2 + 1/4)π.
  const mu = 4 * nu * nu;
  const wr = -SQRT1_2 / x; // Re(1/z) = cos(−3π/4)/x
  const wi = -SQRT1_2 / x; // Im(1/z) = sin(−3π/4)/x
  // S− = Σ (−i w)^k a_k, S+ = Σ (i w)^k a_k (a_k real). Track powers p = (−i w)^k; (i w)^k = (−1)^k p.
  const mr = wi; // −i·w = −i(wr + i wi) = wi − i wr
  const mi = -wr;
  let pr = 1;
  let pi = 0;
  let a = 1;
  let sMr = 1, sMi = 0, sPr = 1, sPi = 0;
  let lastMag = Infinity;
  for (let k = 1; k < 200; k++) {
    a *= (mu - (2 * k - 1) * (2 * k - 1)) / (k * 8);
    const nr = pr * mr - pi * mi;
    const ni = pr * mi + pi * mr;
    pr = nr;
    pi = ni;
    const tr = a * pr;
    const ti = a * pi;
    const mag = Math.abs(tr) + Math.abs(ti);
    if (mag === 0) break; // series terminates (half-integer ν; not used here)
    if (mag > lastMag) break; // asymptotic: stop before the terms grow
    lastMag = mag;
    sMr += tr;
    sMi += ti;
    if (k & 1) { sPr -= tr; sPi -= ti; } else { sPr += tr; sPi += ti; }
    if (mag < 1e-17) break;
  }
  const theta = x * SQRT1_2 + (nu / 2 + 0.25) * Math.PI;
  const ct = Math.cos(theta);
  const st = Math.sin(theta);
  // e^{iθ} S− + e^{−x√2} e^{−iθ} S+
  const damp = Math.exp(-x * Math.SQRT2);
  const re = ct * sMr - st * sMi + damp * (ct * sPr + st * sPi);
  const im = ct * sMi + st * sMr + damp * (ct * sPi - st * sPr);
  // ½ √(2/(πz)) = ½ √(2/(πx)) e^{−3πi/8}
  const amp = 0.5 * Math.sqrt(2 / (Math.PI * x));
  const cr = Math.cos((-3 * Math.PI) / 8) * amp;
  const ci = Math.sin((-3 * Math.PI) / 8) * amp;
  out[at] = re * cr - im * ci;
  out[at + 1] = re * ci + im * cr;
}

/** Kelvin functions of order 0 and their derivatives, plus orders 1 and 2, at one x. */
export interface KelvinValues {
  readonly ber: number;
  readonly bei: number;
  /** d ber x / dx */
  readonly berp: number;
  /** d bei x / dx */
  readonly beip: number;
  readonly ber1: number;
  readonly bei1: number;
  readonly ber2: number;
  readonly bei2: number;
}

function checkX(x: number, where: string, max: number): void {
  if (!(typeof x === "number" && Number.isFinite(x) && x >= 0 && x <= max)) {
    throw new TanklightInputError(
      [{ path: "x", message: `must be a finite number in [0, ${max}]`, value: x, expected: `0 ≤ x ≤ ${max}` }],
      where,
    );
  }
}

/**
 * All Kelvin values at x scaled by e^{−x/√2} (finite for every x ≥ 0).
 *
 * kelvinScaled(x) = e^{−x/√2}·{ber x, bei x, ber′x, bei′x, ber₁x, bei₁x, ber₂x, bei₂x}.
 * @param x argument, ≥ 0 (dimensionless), finite.
 * @returns the scaled values (dimensionless).
 * @example kelvinScaled(0).ber // → 1
 * @example kelvinScaled(2000).ber // → finite; |ber + i bei|·e^{−x/√2} ≈ 1/√(2πx) = 8.9e-3
 * @see kelvin for the unscaled values; A&S 1964 §9.9–9.10.
 */
export function kelvinScaled(x: number): KelvinValues {
  checkX(x, "kelvinScaled", Number.MAX_VALUE);
  return assemble(x, 1);
}

/**
 * Kelvin functions ber, bei (orders 0, 1, 2) and ber′, bei′ at x.
 *
 * ber_ν x + i bei_ν x = J_ν(x e^{3πi/4}) (A&S 9.9.1); ber′ = (ber₁ + bei₁)/√2, bei′ = (bei₁ − ber₁)/√2.
 * @param x argument, 0 ≤ x ≤ 1000 (dimensionless); beyond, the values overflow — use kelvinScaled.
 * @returns the values (dimensionless).
 * @example kelvin(1).ber // → 0.98438178126 (A&S Table 9.12: 0.98438178)
 * @example kelvin(0) // → { ber: 1, bei: 0, berp: 0, beip: 0, … }
 */
export function kelvin(x: number): KelvinValues {
  return unscaled(x, "kelvin");
}

/** The unscaled values at x, checked for 0 ≤ x ≤ 1000 in the name of `where` (kelvin and its one-value forms). */
function unscaled(x: number, where: string): KelvinValues {
  checkX(x, where, UNSCALED_MAX);
  return assemble(x, Math.exp(x * SQRT1_2));
}

function assemble(x: number, scale: number): KelvinValues {
  const p = new Float64Array(6);
  kelvinScaledInto(x, p);
  return {
    ber: p[0]! * scale,
    bei: p[1]! * scale,
    berp: ((p[2]! + p[3]!) * SQRT1_2) * scale,
    beip: ((p[3]! - p[2]!) * SQRT1_2) * scale,
    ber1: p[2]! * scale,
    bei1: p[3]! * scale,
    ber2: p[4]! * scale,
    bei2: p[5]! * scale,
  };
}

/** ber x (A&S 9.9.1), 0 ≤ x ≤ 1000. @example ber(2) // → 0.7517341827 */
export function ber(x: number): number {
  return unscaled(x, "ber").ber;
}
/** bei x (A&S 9.9.1), 0 ≤ x ≤ 1000. @example bei(2) // → 0.9722916273 */
export function bei(x: number): number {
  return unscaled(x, "bei").bei;
}
/** ber′x = d ber x/dx (A&S 9.9.14), 0 ≤ x ≤ 1000. @example berPrime(1) // → −0.0624457522 */
export function berPrime(x: number): number {
  return unscaled(x, "berPrime").berp;
}
/** bei′x = d bei x/dx (A&S 9.9.14), 0 ≤ x ≤ 1000. @example beiPrime(1) // → 0.4973965115 */
export function beiPrime(x: number): number {
  return unscaled(x, "beiPrime").beip;
}

/**
 * Hot-path kernel: writes the scaled order-0, order-1 and order-2 complex values
 * e^{−x/√2}J_ν(x e^{3πi/4}) into a caller-owned Float64Array(6) as
 * [ber, bei, ber₁, bei₁, ber₂, bei₂]·e^{−x/√2}. No allocation, no input check (x ≥ 0 finite).
 */
export function kelvinScaledInto(x: number, out: Float64Array): void {
  scaledJ(0, x, out, 0);
  scaledJ(1, x, out, 2);
  scaledJ(2, x, out, 4);
}

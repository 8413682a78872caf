/**
 * The quadrature kernel of the describing functions: integrals over one half-cycle of the
 * current a conducting branch draws when the voltage across it is u(θ) = A·sin θ − offset.
 *
 * A branch is either one Shockley junction (LED or diode, with any extra series resistance)
 * or a series string of junctions and a resistor (bridge rectifier path). Only the part of the
 * current above −I_s (i⁺ = i + I_s ≥ 0) is integrated here; the constant −I_s is added exactly
 * by the caller where it matters.
 *
 * Rule (fixed, no adaptivity, no allocation): by symmetry about θ = π/2 only [θ_low, π/2] is
 * integrated, where θ_low is the angle at which i⁺ has fallen to 1e-14 of its peak. The
 * current of a junction with series resistance, i⁺(u) = (nV_T/r)·W(·), is analytic except at
 * the branch points of W (argument −1/e), at u = u* ± iπ·nV_T with u* a little below the
 * knee. In the angle variable that singularity sits at θ_s = asin((u* + offset ± iπ·nV_T)/A).
 * Panels are graded geometrically (ratio 4, first width 2·d) away from Re θ_s in both
 * directions, d = min(|Im θ_s|, √(nV_T/A)) (the second bound resolves the Gaussian-like crest
 * far below the knee), with 12-point Gauss–Legendre on each: composite Gauss–Legendre on a
 * mesh graded towards a nearby complex singularity (Davis & Rabinowitz, "Methods of Numerical
 * Integration", 2nd ed. 1984, §4.8; convergence of Gauss rules for functions analytic in a
 * Bernstein ellipse, Trefethen, "Approximation Theory and Approximation Practice", 2013,
 * Thm 19.3). About 40–90 evaluations a half-cycle; relative error ≲ 1e-10 against adaptive
 * Gauss–Kronrod (tests/circuit/loads/describingFunction.test.ts).
 */
import { gaussLegendre } from "../../math/quadrature.ts";
import { lambertWOfLogCore } from "../../math/lambertW.ts";

/** A conducting branch evaluated at a voltage: writes its current i⁺ and dI/du into `i`, `g`. */
export interface Branch {
  /** sharpness of the exponential, V: total n·V_T of the junctions in the path */
  readonly nvt: number;
  /** total series resistance of the path, Ω */
  readonly rs: number;
  /** current i⁺ at the last evalAt, A (scratch, avoids allocating a result) */
  i: number;
  /** dI/du at the last evalAt, S */
  g: number;
  /** evaluates i⁺(u) (A) and its derivative (S) into `i`, `g` */
  evalAt(u: number): void;
  /** the voltage at which i⁺ = current (≥ 0), V */
  voltageAt(current: number): number;
  /** real part of the voltage of the nearest complex singularity of i⁺(u), V (its imaginary part is π·nvt) */
  singularVoltage(): number;
}

/** One junction with extra series resistance: i⁺ = (nV_T/r)·W(·). */
export class JunctionBranch implements Branch {
  readonly nvt: number;
  readonly rs: number;
  readonly is: number;
  readonly lnIs: number;
  /** ln of the W argument at u = 0: ln(I_s·r/nV_T) + I_s·r/nV_T */
  private readonly y0: number;
  private readonly invNvt: number;
  i = 0;
  g = 0;
  constructor(is: number, nvt: number, rs: number) {
    this.is = is;
    this.nvt = nvt;
    this.rs = rs;
    this.lnIs = Math.log(is);
    this.y0 = this.lnIs + Math.log(rs / nvt) + (is * rs) / nvt;
    this.invNvt = 1 / nvt;
  }
  evalAt(u: number): void {
    const w = lambertWOfLogCore(this.y0 + u * this.invNvt);
    this.i = (this.nvt / this.rs) * w;
    this.g = w / (this.rs * (1 + w));
  }
  voltageAt(current: number): number {
    // i⁺ = I_s·e^{(u − (i⁺ − I_s) r)/nV_T} ⇒ u = nV_T ln(i⁺/I_s) + (i⁺ − I_s)·r
    return this.nvt * (Math.log(current) - this.lnIs) + (current - this.is) * this.rs;
  }
  singularVoltage(): number {
    // branch point of W at argument −1/e: ln x = −1 ± iπ
    return this.nvt * (-1 - this.lnIs - Math.log(this.rs / this.nvt)) - this.is * this.rs;
  }
}

/**
 * A series string: `count` identical junctions (I_s1, nV_T1) plus one junction (I_s2, nV_T2)
 * plus resistance r. Voltage: u(i) = a₁·ln(1 + i/I₁) + a₂·ln(1 + i/I₂) + r·i; inverted by a
 * Lambert-W start (the two logarithms merged exactly for i ≫ I₁, I₂) and Newton.
 */
export class StringBranch implements Branch {
  readonly nvt: number;
  readonly rs: number;
  readonly a1: number;
  readonly i1: number;
  readonly a2: number;
  readonly i2: number;
  readonly lnIeff: number;
  readonly ieff: number;
  i = 0;
  g = 0;
  constructor(a1: number, i1: number, a2: number, i2: number, r: number) {
    this.a1 = a1;
    this.i1 = i1;
    this.a2 = a2;
    this.i2 = i2;
    this.rs = r;
    this.nvt = a1 + a2;
    this.lnIeff = (a1 * Math.log(i1) + a2 * Math.log(i2)) / (a1 + a2);
    this.ieff = Math.exp(this.lnIeff);
  }
  singularVoltage(): number {
    // estimate from the merged single junction (the two logarithms act as one above ~I₁, I₂)
    return this.nvt * (-1 - this.lnIeff - Math.log(this.rs / this.nvt)) - this.ieff * this.rs;
  }
  voltageAt(i: number): number {
    return this.a1 * Math.log1p(i / this.i1) + this.a2 * Math.log1p(i / this.i2) + this.rs * i;
  }
  evalAt(u: number): void {
    if (u <= 0) {
      // reverse or zero: the string blocks (the bridge never applies u < 0 to a string)
      this.i = 0;
      this.g = 1 / (this.a1 / this.i1 + this.a2 / this.i2 + this.rs);
      return;
    }
    const w = lambertWOfLogCore(this.lnIeff + Math.log(this.rs / this.nvt) + (u + this.ieff * this.rs) / this.nvt);
    let i = Math.max(0, (this.nvt / this.rs) * w - this.ieff);
    let dvdi = 1;
    for (let k = 0; k < 30; k++) {
      const f = this.voltageAt(i) - u;
      dvdi = this.a1 / (this.i1 + i) + this.a2 / (this.i2 + i) + this.rs;
      let next = i - f / dvdi;
      if (next < 0) next = 0.5 * i; // u(i) is concave-plus-linear: stay in the domain
      const done = Math.abs(next - i) <= 1e-15 * Math.max(i, 1e-300) + 1e-300;
      i = next;
      if (done) break;
    }
    this.i = i;
    this.g = 1 / (this.a1 / (this.i1 + i) + this.a2 / (this.i2 + i) + this.rs);
  }
}

/** Relative current below which the tail of a half-cycle is dropped. */
export const TAIL_FRACTION = 1e-14;
const GRADING = 4;
const FIRST_PANEL = 2; // first panel width, in units of the singularity distance d
const NODES = 12;

/**
 * Integrals over θ ∈ [0, π] of the branch current at u = A·sin θ − offset, written into out:
 * out[0] = ∫ i⁺ sin θ dθ, out[1] = ∫ i⁺ dθ, out[2] = ∫ g sin²θ dθ, out[3] = ∫ g sin θ dθ,
 * out[4] = ∫ g dθ, out[5] = i⁺ at the peak (A).
 * @param br the branch; A amplitude, V, > 0; offset, V, ≥ 0 and < A for any conduction.
 */
export function halfWaveIntegrals(br: Branch, A: number, offset: number, out: Float64Array): void {
  for (let k = 0; k < 6; k++) out[k] = 0;
  const up = A - offset;
  br.evalAt(up);
  const ip = br.i;
  out[5] = ip;
  if (!(ip > 0)) return;
  const uLow = br.voltageAt(TAIL_FRACTION * ip);
  const thLow = angleOf((uLow + offset) / A);
  const half = Math.PI / 2;
  // nearest singularity θ_s = asin((u* + offset + iπ·nvt)/A); grade the panels towards Re θ_s
  const zr = (br.singularVoltage() + offset) / A;
  const zi = (Math.PI * br.nvt) / A;
  const [asinRe, asinIm] = complexAsin(zr, zi);
  const centre = Math.min(half, Math.max(thLow, asinRe));
  // scale: the singularity's distance, but no more than the crest's Gaussian width √(nvt/A)
  // (far below the knee the current is ∝ exp(A·sin θ/nvt), entire but steep)
  const d = Math.max(Math.min(Math.abs(asinIm), Math.sqrt(br.nvt / A)), 1e-12);
  // left of the centre: panels [c − w_{j+1}, c − w_j], widths growing by GRADING
  let right = centre;
  let width = FIRST_PANEL * d;
  while (right > thLow) {
    let left = right - width;
    if (left - thLow < width) left = thLow; // merge a short remainder
    panel(br, A, offset, left, right, out);
    right = left;
    width *= GRADING;
  }
  let left = centre;
  width = FIRST_PANEL * d;
  while (left < half) {
    let r = left + width;
    if (half - r < width) r = half;
    panel(br, A, offset, left, r, out);
    left = r;
    width *= GRADING;
  }
  for (let k = 0; k < 5; k++) out[k] = 2 * out[k]!;
}

/** Principal complex arcsine of x + iy as [re, im]: asin z = −i·ln(iz + √(1 − z²)). */
function complexAsin(x: number, y: number): [number, number] {
  const wr = 1 - (x * x - y * y);
  const wi = -2 * x * y;
  const m = Math.hypot(wr, wi);
  const sr = Math.sqrt(Math.max(0, (m + wr) / 2));
  const si = (wi < 0 ? -1 : 1) * Math.sqrt(Math.max(0, (m - wr) / 2));
  const ar = sr - y;
  const ai = x + si;
  return [Math.atan2(ai, ar), -Math.log(Math.hypot(ar, ai))];
}

function angleOf(s: number): number {
  if (s <= 0) return 0;
  if (s >= 1) return Math.PI / 2;
  return Math.asin(s);
}

function panel(br: Branch, A: number, offset: number, a: number, b: number, out: Float64Array): void {
  if (!(b > a)) return;
  const { nodes, weights } = gaussLegendre(NODES);
  const h = 0.5 * (b - a);
  const m = 0.5 * (a + b);
  let s1 = 0, s0 = 0, g2 = 0, g1 = 0, g0 = 0;
  for (let k = 0; k < NODES; k++) {
    const th = m + h * nodes[k]!;
    const s = Math.sin(th);
    br.evalAt(A * s - offset);
    const w = weights[k]!;
    const i = br.i;
    const g = br.g;
    s1 += w * i * s;
    s0 += w * i;
    g2 += w * g * s * s;
    g1 += w * g * s;
    g0 += w * g;
  }
  out[0] = out[0]! + h * s1;
  out[1] = out[1]! + h * s0;
  out[2] = out[2]! + h * g2;
  out[3] = out[3]! + h * g1;
  out[4] = out[4]! + h * g0;
}

/**
 * The reverse half-cycle of a junction branch (voltage −A·sin θ): out[0] = ∫₀^π i⁺ sin θ dθ,
 * out[1] = ∫₀^π i⁺ dθ, out[2] = ∫₀^π g sin²θ dθ, with i⁺ ∈ [0, I_s] the exact branch current
 * (its series drop matters when I_s·r/nV_T is not small, e.g. leaky Schottky diodes).
 * 16-point Gauss–Legendre on [0, π/2]: the integrand is smooth; far in reverse it is a
 * boundary layer of width nV_T/A at θ = 0 whose absolute error stays below I_s·nV_T/A, far
 * below any current that matters (the whole term is at most I_s).
 */
export function reverseHalfIntegrals(br: Branch, A: number, out: Float64Array): void {
  const { nodes, weights } = gaussLegendre(16);
  const h = Math.PI / 4;
  let s1 = 0, s0 = 0, g2 = 0;
  for (let k = 0; k < 16; k++) {
    const th = h + h * nodes[k]!;
    const s = Math.sin(th);
    br.evalAt(-A * s);
    const w = weights[k]!;
    s1 += w * br.i * s;
    s0 += w * br.i;
    g2 += w * br.g * s * s;
  }
  out[0] = 2 * h * s1;
  out[1] = 2 * h * s0;
  out[2] = 2 * h * g2;
}

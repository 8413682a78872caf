/**
 * One receiver's amplitude against its Thevenin source (step 1 of the method in
 * ./solveNetwork.ts): ln x + ln|S(x)| = ln|E| with S(x) = s₀ + B·Y(x), Y the load's
 * describing function. The left side increases with x; bracketed Newton (bisection in ln x when
 * a Newton step leaves the bracket), Y' by a forward difference.
 */
import { TanklightInputError } from "../../errors.ts";
import type { LinkLoadModel } from "./network.ts";

/** An open load (conductance below this) is taken as this conductance, S: a 1 PΩ leak. */
export const OPEN_LOAD_CONDUCTANCE = 1e-15;

/** Thrown when the operating point cannot be found; the message names the receivers and residuals. */
export class LinkConvergenceError extends Error {
  readonly iterations: number;
  readonly residuals: readonly number[];
  constructor(message: string, iterations: number, residuals: readonly number[]) {
    super(message);
    this.name = "LinkConvergenceError";
    this.iterations = iterations;
    this.residuals = residuals;
  }
}

/**
 * The load's admittance at peak amplitude v (V): writes G into out[2] and B into out[3] (S),
 * with |Y| below {@link OPEN_LOAD_CONDUCTANCE} raised to it.
 * @throws TanklightInputError naming `receivers[k].load` if the describing function gives a
 *   non-finite or negative conductance.
 */
export function loadAdmittance(load: LinkLoadModel, k: number, v: number, where: string, out: Float64Array): void {
  let g = load.conductance(v);
  const b = load.susceptance ? load.susceptance(v) : 0;
  if (!Number.isFinite(g) || !Number.isFinite(b) || g < 0) {
    throw new TanklightInputError(
      [{ path: `receivers[${k}].load`, message: `describing function must give a finite conductance ≥ 0 S at ${v} V`, value: g }],
      where,
    );
  }
  if (Math.hypot(g, b) < OPEN_LOAD_CONDUCTANCE) g = OPEN_LOAD_CONDUCTANCE;
  out[2] = g;
  out[3] = b;
}

/** The scalar problem of one receiver: |E| (V) and S(x) = (s0Re + j·s0Im) + (bRe + j·bIm)·Y(x). */
export interface LocalProblem {
  readonly load: LinkLoadModel;
  /** receiver index and label, for messages */
  readonly k: number;
  readonly label: string;
  readonly eAbs: number;
  readonly s0Re: number;
  readonly s0Im: number;
  readonly bRe: number;
  readonly bIm: number;
}

/** Result of {@link solveLocal}: the amplitude x (V peak), the scalar iterations, and Y(x) = g + jb (S). */
export interface LocalSolution {
  amplitude: number;
  iterations: number;
  g: number;
  b: number;
}

/** |S(v)| = |s₀ + B·Y(v)|, with S into out[0], out[1] and Y = G + jB into out[2], out[3]. */
function sAbs(p: LocalProblem, v: number, where: string, out: Float64Array): number {
  loadAdmittance(p.load, p.k, v, where, out);
  const g = out[2]!;
  const b = out[3]!;
  out[0] = p.s0Re + p.bRe * g - p.bIm * b;
  out[1] = p.s0Im + p.bRe * b + p.bIm * g;
  return Math.hypot(out[0]!, out[1]!);
}

/** φ(v) = ln v + ln|S(v)| − ln|E| (S, G, B at v left in tmp). */
function phi(p: LocalProblem, v: number, lnE: number, where: string, tmp: Float64Array): number {
  return Math.log(v) + Math.log(sAbs(p, v, where, tmp)) - lnE;
}

/**
 * Solves ln x + ln|S(x)| − ln|E| = 0 for the load amplitude x by bracketed Newton.
 * `tmp` and `tmp2` are 4-element scratch arrays ([S re, S im, G, B]).
 * @throws LinkConvergenceError when no upper bracket is found within 200 doublings.
 */
export function solveLocal(p: LocalProblem, where: string, tmp: Float64Array, tmp2: Float64Array): LocalSolution {
  if (!(p.eAbs > 0)) return { amplitude: 0, iterations: 0, g: OPEN_LOAD_CONDUCTANCE, b: 0 };
  const lnE = Math.log(p.eAbs);
  // upper bracket: the amplitude if the load stayed as small as at v → 0, then doubled until φ ≥ 0
  let hi = p.eAbs / sAbs(p, 0, where, tmp);
  let its = 0;
  let fhi = phi(p, hi, lnE, where, tmp);
  while (!(fhi >= 0)) {
    hi *= 2;
    fhi = phi(p, hi, lnE, where, tmp);
    if (++its > 200) throw new LinkConvergenceError(`solveLinkNetwork: receiver ${p.label}: no upper bound for the tank amplitude found`, its, []);
  }
  let lo = 0;
  let v = hi;
  let fv = fhi; // tmp holds S, g, b at v
  for (let it = 0; it < 200; it++) {
    its++;
    if (fv === 0) break;
    // φ'(v) = 1/v + Re(conj(S)·B·Y')/|S|², Y' by a forward difference (tmp still holds v's values)
    const sRe = tmp[0]!;
    const sIm = tmp[1]!;
    const s2 = sRe * sRe + sIm * sIm;
    const h = 1e-7 * v;
    sAbs(p, v + h, where, tmp2);
    const dgRe = (tmp2[2]! - tmp[2]!) / h;
    const dgIm = (tmp2[3]! - tmp[3]!) / h;
    const dsRe = p.bRe * dgRe - p.bIm * dgIm;
    const dsIm = p.bRe * dgIm + p.bIm * dgRe;
    const dphi = 1 / v + (sRe * dsRe + sIm * dsIm) / s2;
    if (fv < 0) lo = v;
    else hi = v;
    let vn = v - fv / dphi;
    if (!(dphi > 0) || !(vn > lo && vn < hi)) vn = lo > 0 ? Math.sqrt(lo * hi) : hi / 8;
    const step = Math.abs(vn - v);
    v = vn;
    fv = phi(p, v, lnE, where, tmp);
    if (step <= 1e-12 * v || Math.abs(fv) <= 1e-14 || hi - lo <= 1e-14 * hi) break;
  }
  return { amplitude: v, iterations: its, g: tmp[2]!, b: tmp[3]! };
}

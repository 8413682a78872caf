/**
 * The nonlinear operating point of the link (the method is described in ./solveNetwork.ts):
 * every array the iteration needs lives in one explicit {@link LinkWorkspace}, made once per
 * solve; the functions here read and write it and allocate nothing per iteration.
 */
import { TanklightInputError } from "../../errors.ts";
import { luFactorCore, luSolveCore } from "../../math/lu.ts";
import { complexLuFactorCore, complexLuSolveCore } from "../../math/complexLu.ts";
import { LinkConvergenceError, OPEN_LOAD_CONDUCTANCE, loadAdmittance, solveLocal } from "./localSolve.ts";
import { networkTransmitters, type LinkNetwork, type ReceiverNetwork } from "./network.ts";
import { externalImpedance, loadVoltageImpedance, type BaseMatrix, type ReceiverTanks } from "./tankImpedance.ts";

/** Amplitudes below this are taken as zero in the convergence test, V. */
export const AMPLITUDE_FLOOR = 1e-12;

/** The state and scratch arrays of one operating-point solve (n loops, m receivers, q nonlinear). */
export interface LinkWorkspace {
  readonly network: LinkNetwork;
  readonly where: string;
  /** angular frequency, rad/s */
  readonly w: number;
  readonly n: number;
  readonly m: number;
  /** number of transmitter-side unknowns: receiver k is unknown p + k */
  readonly p: number;
  /** number of transmitters: receiver k is row t + k of the inductance matrix */
  readonly t: number;
  readonly base: BaseMatrix;
  readonly tanks: ReceiverTanks;
  /** indices of the nonlinear receivers; q = nl.length */
  readonly nl: readonly number[];
  /** the factored coupled-circuit matrix and its pivots */
  readonly zRe: Float64Array;
  readonly zIm: Float64Array;
  readonly piv: Int32Array;
  /** loop currents, A peak (the p transmitter-side unknowns, then the receivers) */
  readonly iRe: Float64Array;
  readonly iIm: Float64Array;
  /** load admittance in use per receiver, S */
  readonly yG: Float64Array;
  readonly yB: Float64Array;
  /** trial load amplitudes (nonlinear receivers; linear ones unused), V peak */
  readonly x: Float64Array;
  /** load voltage phasors, V peak */
  readonly vRe: Float64Array;
  readonly vIm: Float64Array;
  /** receiver diagonal in use, Ω */
  readonly zkkRe: Float64Array;
  readonly zkkIm: Float64Array;
  /** columns of W = Z⁻¹ at the nonlinear receivers (q × n) */
  readonly colRe: Float64Array;
  readonly colIm: Float64Array;
  /** local-step results before they are applied (q) */
  readonly next: Float64Array;
  readonly nextG: Float64Array;
  readonly nextB: Float64Array;
  /** Newton arrays: Jacobian (q × q), residual, ln x, step, Y' (2q), trial residual, |V| − x */
  readonly jac: Float64Array;
  readonly jacPiv: Int32Array;
  readonly rhs: Float64Array;
  readonly sv: Float64Array;
  readonly ds: Float64Array;
  readonly dy: Float64Array;
  readonly ftrial: Float64Array;
  readonly resid: Float64Array;
  /** scratch: [S re, S im, G, B] twice, and one complex number */
  readonly tmp: Float64Array;
  readonly tmp2: Float64Array;
  readonly z2: Float64Array;
  readonly z3: Float64Array;
  /** scalar iterations of the local solves, total */
  scalarIterations: number;
}

function zeros(len: number): Float64Array {
  return new Float64Array(len);
}

function sameList(a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/**
 * The workspace of one solve. `reuse`: a workspace of an earlier solve of the same layout (the
 * same loop, receiver and nonlinear counts) whose arrays are taken over — batch runs solve many
 * networks without allocating them again; every array is written before it is read.
 */
export function createWorkspace(network: LinkNetwork, w: number, base: BaseMatrix, tanks: ReceiverTanks, where: string, reuse?: LinkWorkspace): LinkWorkspace {
  const m = network.receivers.length;
  const p = base.p;
  const t = networkTransmitters(network).length;
  const n = p + m;
  const nl: number[] = [];
  for (let k = 0; k < m; k++) if (!network.receivers[k]!.load.linear) nl.push(k);
  const q = nl.length;
  // no closures here (this runs once per solve of a map or a yield): under tsx each closure made
  // per call gets its name set, which cost more than the solve's own set-up
  const r = reuse !== undefined && reuse.n === n && reuse.m === m && sameList(reuse.nl, nl) ? reuse : undefined;
  if (r) r.x.fill(0);
  const f = zeros;
  // written out field by field (an object spread of the old workspace is several times slower in V8)
  return {
    network, where, w, n, m, p, t, base, tanks, nl,
    zRe: r ? r.zRe : f(n * n), zIm: r ? r.zIm : f(n * n), piv: r ? r.piv : new Int32Array(n), iRe: r ? r.iRe : f(n), iIm: r ? r.iIm : f(n),
    yG: r ? r.yG : f(m), yB: r ? r.yB : f(m), x: r ? r.x : f(m), vRe: r ? r.vRe : f(m), vIm: r ? r.vIm : f(m), zkkRe: r ? r.zkkRe : f(m), zkkIm: r ? r.zkkIm : f(m),
    colRe: r ? r.colRe : f(q * n), colIm: r ? r.colIm : f(q * n), next: r ? r.next : f(q), nextG: r ? r.nextG : f(q), nextB: r ? r.nextB : f(q),
    jac: r ? r.jac : f(q * q), jacPiv: r ? r.jacPiv : new Int32Array(q), rhs: r ? r.rhs : f(q), sv: r ? r.sv : f(q), ds: r ? r.ds : f(q), dy: r ? r.dy : f(2 * q),
    ftrial: r ? r.ftrial : f(q), resid: r ? r.resid : f(q),
    tmp: r ? r.tmp : f(4), tmp2: r ? r.tmp2 : f(4), z2: r ? r.z2 : f(2), z3: r ? r.z3 : f(2),
    scalarIterations: 0,
  };
}

/** Sets receiver k's admittance to its describing function at `amplitude` (V). */
export function setAdmittance(ws: LinkWorkspace, k: number, amplitude: number): void {
  loadAdmittance(ws.network.receivers[k]!.load, k, amplitude, ws.where, ws.tmp);
  ws.yG[k] = ws.tmp[2]!;
  ws.yB[k] = ws.tmp[3]!;
}

/** Builds Z with the admittances in use, factors it and solves for the loop currents and load voltages. */
export function evaluate(ws: LinkWorkspace): void {
  const { n, m, p, base, zRe, zIm, iRe, iIm, z2 } = ws;
  zRe.set(base.re);
  zIm.set(base.im);
  for (let k = 0; k < m; k++) {
    const d = (k + p) * n + k + p;
    externalImpedance(ws.tanks, k, ws.yG[k]!, ws.yB[k]!, z2);
    ws.zkkRe[k] = base.re[d]! + z2[0]!;
    ws.zkkIm[k] = base.im[d]! + z2[1]!;
    zRe[d] = ws.zkkRe[k]!;
    zIm[d] = ws.zkkIm[k]!;
  }
  const bad = complexLuFactorCore(zRe, zIm, n, ws.piv);
  if (bad >= 0) {
    throw new TanklightInputError(
      [{ path: bad < ws.p ? (ws.t === 1 ? "transmitter" : "transmitters") : `receivers[${bad - ws.p}]`, message: "the coupled-circuit matrix is singular (a lossless loop exactly at resonance with no load?)", value: bad }],
      ws.where,
    );
  }
  iRe.fill(0);
  iIm.fill(0);
  for (let u = 0; u < base.p; u++) {
    iRe[u] = base.eRe[u]!;
    iIm[u] = base.eIm[u]!;
  }
  complexLuSolveCore(zRe, zIm, n, ws.piv, iRe, iIm);
  for (let k = 0; k < m; k++) {
    loadVoltageImpedance(ws.tanks, k, ws.yG[k]!, ws.yB[k]!, z2);
    const ir = iRe[k + p]!;
    const ii = iIm[k + p]!;
    ws.vRe[k] = ir * z2[0]! - ii * z2[1]!;
    ws.vIm[k] = ir * z2[1]! + ii * z2[0]!;
  }
}

/** Columns of W = Z⁻¹ at the nonlinear receivers, from the factors left by {@link evaluate}. */
export function computeColumns(ws: LinkWorkspace): void {
  const { n, nl, p } = ws;
  for (let c = 0; c < nl.length; c++) {
    const k = nl[c]!;
    const oRe = ws.colRe.subarray(c * n, (c + 1) * n);
    const oIm = ws.colIm.subarray(c * n, (c + 1) * n);
    oRe.fill(0);
    oIm.fill(0);
    oRe[k + p] = 1;
    complexLuSolveCore(ws.zRe, ws.zIm, n, ws.piv, oRe, oIm);
  }
}

/**
 * Jacobi step: each nonlinear receiver solved locally against its Thevenin source
 * (Sherman–Morrison on its diagonal; needs {@link evaluate} and {@link computeColumns}).
 */
export function localStep(ws: LinkWorkspace): void {
  const { n, nl, p, tanks, base } = ws;
  for (let c = 0; c < nl.length; c++) {
    const k = nl[c]!;
    const wRe = ws.colRe[c * n + k + p]!;
    const wIm = ws.colIm[c * n + k + p]!;
    const wd = wRe * wRe + wIm * wIm;
    const invRe = wRe / wd;
    const invIm = -wIm / wd;
    const ir = ws.iRe[k + p]!;
    const ii = ws.iIm[k + p]!;
    const eRe = ir * invRe - ii * invIm;
    const eIm = ir * invIm + ii * invRe;
    // Z_loop = Z_s + R + jωL = 1/W − Z_kk⁰ + (R + jωL)
    const d = (k + p) * n + k + p;
    const zlRe = invRe - ws.zkkRe[k]! + base.re[d]!;
    const zlIm = invIm - ws.zkkIm[k]! + base.im[d]!;
    let aRe = 0;
    let aIm = 0;
    let bRe = zlRe;
    let bIm = zlIm;
    if (tanks.series[k]) {
      bRe += tanks.zcRe[k]!;
      bIm += tanks.zcIm[k]!;
    } else {
      aRe = zlRe * tanks.ycRe[k]! - zlIm * tanks.ycIm[k]!;
      aIm = zlRe * tanks.ycIm[k]! + zlIm * tanks.ycRe[k]!;
    }
    const r = ws.network.receivers[k]!;
    const problem = { load: r.load, k, label: receiverLabel(r, k), eAbs: Math.hypot(eRe, eIm), s0Re: 1 + aRe, s0Im: aIm, bRe, bIm };
    const res = solveLocal(problem, ws.where, ws.tmp, ws.tmp2);
    ws.scalarIterations += res.iterations;
    ws.next[c] = res.amplitude;
    ws.nextG[c] = res.g;
    ws.nextB[c] = res.b;
  }
  for (let c = 0; c < nl.length; c++) {
    const k = nl[c]!;
    ws.x[k] = ws.next[c]!;
    ws.yG[k] = ws.nextG[c]!; // the describing function at x, already evaluated by the local solve
    ws.yB[k] = ws.nextB[c]!;
  }
}

/** A receiver's label for messages: its own, or "receiver k+1". */
export function receiverLabel(r: ReceiverNetwork, k: number): string {
  return r.label ?? `receiver ${k + 1}`;
}

/**
 * Worst convergence ratio |(|Vₖ| − xₖ)| / (tol·max(|Vₖ|, xₖ) + floor) over the nonlinear
 * receivers (≤ 1: converged); the absolute residuals go to ws.resid (V).
 */
export function residualMax(ws: LinkWorkspace, tol: number): number {
  const { nl, vRe, vIm, x } = ws;
  let worst = 0;
  for (let c = 0; c < nl.length; c++) {
    const k = nl[c]!;
    const va = Math.hypot(vRe[k]!, vIm[k]!);
    const xa = x[k]!;
    const r = Math.abs(va - xa) / (tol * Math.max(va, xa) + AMPLITUDE_FLOOR);
    ws.resid[c] = Math.abs(va - xa);
    worst = Math.max(worst, r);
  }
  return worst;
}

/**
 * Probe admittance 1/(ωLₖ) for a local solve: any base point is exact for the Sherman–Morrison
 * update, but a nearly open series load (|Zₖₖ| ≈ 1 PΩ) would cancel digits in Z_s = 1/Wₖₖ − Zₖₖ⁰.
 */
function probeThenLocalStep(ws: LinkWorkspace): void {
  const L = ws.network.inductance;
  for (const k of ws.nl) {
    ws.yG[k] = 1 / (ws.w * L[ws.t + k]![ws.t + k]!);
    ws.yB[k] = 0;
  }
  evaluate(ws);
  computeColumns(ws);
  localStep(ws);
  evaluate(ws);
}

/** Outcome of {@link solveOperatingPoint}. */
export interface OperatingPoint {
  readonly converged: boolean;
  readonly iterations: number;
}

/**
 * Finds the operating point: linear loads set once, then (with nonlinear loads) a local step
 * and damped Newton steps until every |Vₖ| matches xₖ to `tol` or `maxIter` is reached.
 * On return ws holds the loop currents, load voltages and admittances of the last iterate.
 */
export function solveOperatingPoint(ws: LinkWorkspace, tol: number, maxIter: number): OperatingPoint {
  const { m, nl } = ws;
  const q = nl.length;
  for (let k = 0; k < m; k++) if (ws.network.receivers[k]!.load.linear) setAdmittance(ws, k, 1);
  if (q === 0) {
    evaluate(ws);
    return { converged: true, iterations: 0 };
  }
  probeThenLocalStep(ws);
  let iterations = 1;
  let converged = false;
  while (iterations < maxIter) {
    if (residualMax(ws, tol) <= 1) {
      converged = true;
      break;
    }
    iterations++;
    computeColumns(ws);
    if (q === 1) probeThenLocalStep(ws);
    else newtonStep(ws, tol);
  }
  if (!converged && residualMax(ws, tol) <= 1) converged = true;
  return { converged, iterations };
}

/**
 * One damped Newton step on s = ln x (needs {@link computeColumns}): step limited to a factor e³,
 * halved up to 8 times while the residual does not fall; a failed line search falls back to a
 * local step for all receivers from the present x.
 */
function newtonStep(ws: LinkWorkspace, tol: number): void {
  const { nl, x, sv, ds } = ws;
  const q = nl.length;
  const f0 = logResidual(ws, ws.rhs);
  newtonJacobian(ws);
  const ok = solveNewtonSystem(ws);
  let accepted = false;
  if (ok) {
    let big = 0;
    for (let c = 0; c < q; c++) big = Math.max(big, Math.abs(ds[c]!));
    let alpha = big > 3 ? 3 / big : 1;
    for (let tries = 0; tries < 8 && !accepted; tries++) {
      for (let c = 0; c < q; c++) {
        const k = nl[c]!;
        x[k] = Math.exp(sv[c]! + alpha * ds[c]!);
        setAdmittance(ws, k, x[k]!);
      }
      evaluate(ws);
      const f1 = logResidual(ws, ws.ftrial);
      if (f1 <= (1 - 1e-4 * alpha) * f0 || residualMax(ws, tol) <= 1) accepted = true;
      else alpha /= 2;
    }
  }
  if (!accepted) {
    for (let c = 0; c < q; c++) {
      const k = nl[c]!;
      x[k] = Math.exp(sv[c]!);
      setAdmittance(ws, k, x[k]!);
    }
    evaluate(ws);
    computeColumns(ws);
    localStep(ws);
    evaluate(ws);
  }
}

/**
 * The Jacobian of F_k = ln|V_k| − s_k with respect to s_j = ln x_j into ws.jac, and −F into
 * ws.rhs (which holds F on entry); s into ws.sv. Exact from the LU: ∂I/∂x_j = −W·e_j·∂Z_jj/∂x_j·I_j,
 * ∂Z_jj/∂Y = −Z_v,j², Y' by a forward difference.
 */
function newtonJacobian(ws: LinkWorkspace): void {
  const { nl, n, p, x, yG, yB, dy, iRe, iIm, vRe, vIm, colRe, colIm, jac, rhs, z2, z3 } = ws;
  const q = nl.length;
  for (let c = 0; c < q; c++) {
    const k = nl[c]!;
    const xa = Math.max(x[k]!, AMPLITUDE_FLOOR);
    ws.sv[c] = Math.log(xa);
    // Y'(x) by forward difference
    const h = 1e-7 * xa;
    const load = ws.network.receivers[k]!.load;
    const g1 = load.conductance(xa + h);
    const b1 = load.susceptance ? load.susceptance(xa + h) : 0;
    const g1f = Math.hypot(g1, b1) < OPEN_LOAD_CONDUCTANCE ? OPEN_LOAD_CONDUCTANCE : g1;
    dy[2 * c] = (g1f - yG[k]!) / h;
    dy[2 * c + 1] = (b1 - yB[k]!) / h;
  }
  for (let c = 0; c < q; c++) {
    const k = nl[c]!;
    const va2 = Math.max(vRe[k]! * vRe[k]! + vIm[k]! * vIm[k]!, AMPLITUDE_FLOOR * AMPLITUDE_FLOOR);
    loadVoltageImpedance(ws.tanks, k, yG[k]!, yB[k]!, z2);
    const zvRe = z2[0]!;
    const zvIm = z2[1]!;
    for (let e = 0; e < q; e++) {
      const j = nl[e]!;
      // dZ/dY of receiver j (both topologies): −Zv_j² ; dZ_jj/dx_j = −Zv_j²·Y'_j
      loadVoltageImpedance(ws.tanks, j, yG[j]!, yB[j]!, z3);
      const zjRe = z3[0]!;
      const zjIm = z3[1]!;
      const sqRe = zjRe * zjRe - zjIm * zjIm;
      const sqIm = 2 * zjRe * zjIm;
      const dzRe = -(sqRe * dy[2 * e]! - sqIm * dy[2 * e + 1]!);
      const dzIm = -(sqRe * dy[2 * e + 1]! + sqIm * dy[2 * e]!);
      // dI_k/dx_j = −W[k, j]·dZ_jj·I_j
      const wRe = colRe[e * n + k + p]!;
      const wIm = colIm[e * n + k + p]!;
      const ijRe = iRe[j + p]!;
      const ijIm = iIm[j + p]!;
      const pRe = dzRe * ijRe - dzIm * ijIm;
      const pIm = dzRe * ijIm + dzIm * ijRe;
      const diRe = -(wRe * pRe - wIm * pIm);
      const diIm = -(wRe * pIm + wIm * pRe);
      let dvRe = diRe * zvRe - diIm * zvIm;
      let dvIm = diRe * zvIm + diIm * zvRe;
      if (j === k) {
        // + I_k·dZv/dY·Y' with dZv/dY = −Zv² (the same product as dZ_jj above)
        dvRe += iRe[k + p]! * dzRe - iIm[k + p]! * dzIm;
        dvIm += iRe[k + p]! * dzIm + iIm[k + p]! * dzRe;
      }
      const xj = Math.max(x[j]!, AMPLITUDE_FLOOR);
      jac[c * q + e] = ((vRe[k]! * dvRe + vIm[k]! * dvIm) * xj) / va2 - (c === e ? 1 : 0);
    }
    rhs[c] = -rhs[c]!;
  }
}

/** Solves jac·ds = rhs (destroying jac) by the dense LU of lib/math; false when singular or not finite. */
function solveNewtonSystem(ws: LinkWorkspace): boolean {
  const q = ws.nl.length;
  if (luFactorCore(ws.jac, q, ws.jacPiv) >= 0) return false;
  ws.ds.set(ws.rhs);
  luSolveCore(ws.jac, q, ws.jacPiv, ws.ds);
  for (let c = 0; c < q; c++) if (!Number.isFinite(ws.ds[c]!)) return false;
  return true;
}

/** max over the nonlinear receivers of |ln|Vₖ| − ln xₖ|; each signed value into `out`. */
function logResidual(ws: LinkWorkspace, out: Float64Array): number {
  const { nl, x, vRe, vIm } = ws;
  let worst = 0;
  for (let c = 0; c < nl.length; c++) {
    const k = nl[c]!;
    const va = Math.max(Math.hypot(vRe[k]!, vIm[k]!), AMPLITUDE_FLOOR);
    const xa = Math.max(x[k]!, AMPLITUDE_FLOOR);
    const r = Math.log(va) - Math.log(xa);
    out[c] = r;
    worst = Math.max(worst, Math.abs(r));
  }
  return worst;
}

/**
 * Steady state of a driven transmitter and any number of coupled receivers with nonlinear
 * loads, at the drive frequency, from plain numbers (the link solver's numeric core).
 *
 * Linear part — the coupled-circuit (loop) impedance matrix, one loop per coil:
 *   Z₀₀ = Z_src + R₀ + jωL₀ (+ Z_C₀ if series-compensated),  Zₖₖ = Rₖ + jωLₖ + Z_ext,k(Yₖ),
 *   Zᵢⱼ = jωMᵢⱼ (i ≠ j),  Z·I = [V_th, 0, …, 0]ᵀ,
 * with Z_ext = Z_C + 1/Y for a series tank and 1/(Y_C + Y) for a parallel tank (load admittance
 * Y across the capacitor), Z_C = ESR + 1/(jωC). A parallel-compensated transmitter driven through
 * Z_src is replaced by its Thevenin equivalent seen from the coil: V_th = V·Z_C/(Z_src + Z_C),
 * Z_th = Z_src ∥ Z_C. A current-regulated transmitter replaces row 0 by I₀ = I_set. This is the
 * textbook coupled-circuit (mesh) analysis; for one receiver it gives the reflected impedance
 * (ωM)²/Z₂ (checked in tests/circuit/link.test.ts).
 *
 * Nonlinear part — each load's describing function Y(V) (fundamental-harmonic balance): the
 * unknowns are the receivers' load amplitudes xₖ, and xₖ = |Vₖ(x)|. Solved by
 * 1. a local solve per receiver: with the rest of the network fixed, receiver k sees a Thevenin
 *    source found from one LU by the Sherman–Morrison update of its diagonal,
 *    Iₖ = E/(Z_s + Zₖₖ(Y)) with E = Iₖ⁰/Wₖₖ, Z_s = 1/Wₖₖ − Zₖₖ⁰, W = Z⁻¹; the scalar equation
 *    ln x + ln|1 + A + B·Y(x)| = ln|E| is increasing in x and is solved by Newton safeguarded by
 *    bisection (the logarithm keeps an LED's exponential knee nearly linear);
 * 2. damped Newton on s = ln x over all receivers together, with the exact Jacobian from the
 *    same LU (∂I/∂xⱼ = −W·eⱼ·∂Zⱼⱼ/∂xⱼ·Iⱼ), step limited to a factor e³ and halved by
 *    backtracking while the residual max|ln|Vₖ| − sₖ| does not fall; a failed line search falls
 *    back to step 1 for all receivers at once.
 * With one nonlinear receiver step 1 is already the exact answer.
 */
import { TanklightInputError, requireFinite, requirePositive } from "../../errors.ts";
import { complexLuFactor, complexLuSolve } from "./complexLu.ts";
import {
  DEFAULT_BRIGHTNESS_REFERENCE,
  DEFAULT_CAUTION_VOLTAGE,
  DEFAULT_LIT_THRESHOLD,
  type LinkNetwork,
  type LinkOptions,
  type ReceiverNetwork,
} from "./network.ts";
import type { LedState, LinkResult, ReceiverState } from "./result.ts";

/** An open load (conductance below this) is taken as this conductance, S: a 1 PΩ leak. */
export const OPEN_LOAD_CONDUCTANCE = 1e-15;
/** Amplitudes below this are taken as zero in the convergence test, V. */
export const AMPLITUDE_FLOOR = 1e-12;

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

const LITTHRESHOLD_SOURCE =
  "trade practice (no source): indicator LEDs are visible indoors from about 0.1–1 mA average current";

/**
 * Solves the link from plain numbers: the linear coupled-circuit matrix at the drive frequency
 * and the nonlinear loads by their describing functions (see the module comment for the method).
 *
 * @param network transmitter, receivers and the full inductance matrix, SI (./network.ts).
 * @param options lit threshold (A, default 0.5 mA, trade practice), brightness reference,
 *   caution voltage, iteration cap, tolerance, what to do on non-convergence.
 * @returns {@link LinkResult}: every element's peak and RMS current and voltage, powers,
 *   efficiency, reflected impedance, LED currents and verdicts, warnings and cautions.
 * @throws TanklightInputError on bad numbers; LinkConvergenceError if the operating point is
 *   not found (unless options.onNonConvergence is "warn").
 * @example one series-tuned 10 µH pair, k = 0.1, 1 V sine, 10 Ω load → power.efficiency ≈ 0.97
 */
export function solveLinkNetwork(network: LinkNetwork, options: LinkOptions = {}): LinkResult {
  const where = "solveLinkNetwork";
  const f = requirePositive(network.frequency, "frequency", "Hz", where);
  const w = 2 * Math.PI * f;
  const rx = network.receivers;
  const n = rx.length + 1;
  const tx = network.transmitter;
  checkNetwork(network, n, where);
  const tol = options.tolerance ?? 1e-10;
  const maxIter = options.maxIterations ?? 80;
  const warnings: string[] = [];

  // ── base matrix (everything but the receivers' load-dependent diagonal) ────────────────
  const baseRe = new Float64Array(n * n);
  const baseIm = new Float64Array(n * n);
  const L = network.inductance;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) if (i !== j) baseIm[i * n + j] = w * L[i]![j]!;
  }
  // transmitter row
  let vthRe = 0;
  let vthIm = 0;
  const drive = tx.drive;
  const c0 = tx.compensation === "none" ? 0 : tx.capacitance!;
  const esr0 = tx.capacitorEsr ?? 0;
  const zc0Re = esr0;
  const zc0Im = c0 > 0 ? -1 / (w * c0) : 0;
  let zsRe = 0;
  let zsIm = 0;
  if (drive.kind === "current") {
    for (let j = 0; j < n; j++) baseIm[j] = 0;
    baseRe[0] = 1;
    vthRe = drive.amplitude;
  } else {
    zsRe = drive.resistance;
    zsIm = drive.reactance;
    let thRe = zsRe;
    let thIm = zsIm;
    vthRe = drive.amplitude;
    if (tx.compensation === "series") {
      thRe += zc0Re;
      thIm += zc0Im;
    } else if (tx.compensation === "parallel") {
      // V_th = V·Zc/(Zs + Zc), Z_th = Zs·Zc/(Zs + Zc)
      const dRe = zsRe + zc0Re;
      const dIm = zsIm + zc0Im;
      const den = dRe * dRe + dIm * dIm;
      const qRe = (zc0Re * dRe + zc0Im * dIm) / den; // Zc/(Zs+Zc)
      const qIm = (zc0Im * dRe - zc0Re * dIm) / den;
      vthRe = drive.amplitude * qRe;
      vthIm = drive.amplitude * qIm;
      thRe = zsRe * qRe - zsIm * qIm;
      thIm = zsRe * qIm + zsIm * qRe;
    }
    baseRe[0] = thRe + tx.resistance;
    baseIm[0] = thIm + w * L[0]![0]!;
  }

  // receivers' fixed data
  const m = rx.length;
  const ycRe = new Float64Array(m);
  const ycIm = new Float64Array(m);
  const zcRe = new Float64Array(m);
  const zcIm = new Float64Array(m);
  const series = new Uint8Array(m);
  for (let k = 0; k < m; k++) {
    const r = rx[k]!;
    const esr = r.capacitorEsr ?? 0;
    zcRe[k] = esr;
    zcIm[k] = -1 / (w * r.capacitance);
    const den = esr * esr + zcIm[k]! * zcIm[k]!;
    ycRe[k] = esr / den;
    ycIm[k] = -zcIm[k]! / den;
    series[k] = r.topology === "series" ? 1 : 0;
    baseRe[(k + 1) * n + k + 1] = r.resistance;
    baseIm[(k + 1) * n + k + 1] = w * L[k + 1]![k + 1]!;
  }
  // nonlinear receivers
  const nl: number[] = [];
  for (let k = 0; k < m; k++) if (!rx[k]!.load.linear) nl.push(k);
  const q = nl.length;

  // ── workspace ──────────────────────────────────────────────────────────────────────────
  const zRe = new Float64Array(n * n);
  const zIm = new Float64Array(n * n);
  const piv = new Int32Array(n);
  const iRe = new Float64Array(n);
  const iIm = new Float64Array(n);
  const yG = new Float64Array(m); // load admittance in use
  const yB = new Float64Array(m);
  const x = new Float64Array(m); // load amplitudes (nonlinear receivers; linear ones unused)
  const vRe = new Float64Array(m); // load voltage phasors
  const vIm = new Float64Array(m);
  const zkkRe = new Float64Array(m); // receiver diagonal in use
  const zkkIm = new Float64Array(m);
  const colRe = new Float64Array(q * n); // W columns of nonlinear receivers
  const colIm = new Float64Array(q * n);

  const setAdmittance = (k: number, amplitude: number): void => {
    const load = rx[k]!.load;
    let g = load.conductance(amplitude);
    const b = load.susceptance ? load.susceptance(amplitude) : 0;
    if (!Number.isFinite(g) || !Number.isFinite(b) || g < 0) {
      throw new TanklightInputError(
        [{ path: `receivers[${k}].load`, message: `describing function must give a finite conductance ≥ 0 S at ${amplitude} V`, value: g }],
        where,
      );
    }
    if (Math.hypot(g, b) < OPEN_LOAD_CONDUCTANCE) g = OPEN_LOAD_CONDUCTANCE;
    yG[k] = g;
    yB[k] = b;
  };

  let factorCount = 0;
  /** builds Z with the current admittances, factors it and solves for the loop currents and load voltages */
  const evaluate = (): void => {
    zRe.set(baseRe);
    zIm.set(baseIm);
    for (let k = 0; k < m; k++) {
      const d = (k + 1) * n + k + 1;
      const [eRe, eIm] = extImpedance(k);
      zkkRe[k] = baseRe[d]! + eRe;
      zkkIm[k] = baseIm[d]! + eIm;
      zRe[d] = zkkRe[k]!;
      zIm[d] = zkkIm[k]!;
    }
    const bad = complexLuFactor(zRe, zIm, n, piv);
    factorCount++;
    if (bad >= 0) {
      throw new TanklightInputError(
        [{ path: bad === 0 ? "transmitter" : `receivers[${bad - 1}]`, message: "the coupled-circuit matrix is singular (a lossless loop exactly at resonance with no load?)", value: bad }],
        where,
      );
    }
    iRe.fill(0);
    iIm.fill(0);
    iRe[0] = vthRe;
    iIm[0] = vthIm;
    complexLuSolve(zRe, zIm, n, piv, iRe, iIm);
    for (let k = 0; k < m; k++) {
      const [zvRe, zvIm] = loadVoltageImpedance(k);
      const ir = iRe[k + 1]!;
      const ii = iIm[k + 1]!;
      vRe[k] = ir * zvRe - ii * zvIm;
      vIm[k] = ir * zvIm + ii * zvRe;
    }
  };
  // Z_ext(Y) of receiver k with the admittance in use
  const extImpedance = (k: number): [number, number] => {
    const g = yG[k]!;
    const b = yB[k]!;
    if (series[k]) {
      const den = g * g + b * b;
      return [zcRe[k]! + g / den, zcIm[k]! - b / den];
    }
    const tRe = ycRe[k]! + g;
    const tIm = ycIm[k]! + b;
    const den = tRe * tRe + tIm * tIm;
    return [tRe / den, -tIm / den];
  };
  // Zv: load voltage = I·Zv (series: 1/Y; parallel: Z_ext)
  const loadVoltageImpedance = (k: number): [number, number] => {
    const g = yG[k]!;
    const b = yB[k]!;
    if (series[k]) {
      const den = g * g + b * b;
      return [g / den, -b / den];
    }
    const tRe = ycRe[k]! + g;
    const tIm = ycIm[k]! + b;
    const den = tRe * tRe + tIm * tIm;
    return [tRe / den, -tIm / den];
  };
  const computeColumns = (): void => {
    for (let c = 0; c < q; c++) {
      const k = nl[c]!;
      const oRe = colRe.subarray(c * n, (c + 1) * n);
      const oIm = colIm.subarray(c * n, (c + 1) * n);
      oRe.fill(0);
      oIm.fill(0);
      oRe[k + 1] = 1;
      complexLuSolve(zRe, zIm, n, piv, oRe, oIm);
    }
  };

  let scalarIterations = 0;
  const next = new Float64Array(q);
  const nextG = new Float64Array(q);
  const nextB = new Float64Array(q);
  /** Jacobi step: each nonlinear receiver solved locally against its Thevenin source (needs evaluate + columns). */
  const localStep = (): void => {
    for (let c = 0; c < q; c++) {
      const k = nl[c]!;
      const wRe = colRe[c * n + k + 1]!;
      const wIm = colIm[c * n + k + 1]!;
      const wd = wRe * wRe + wIm * wIm;
      const invRe = wRe / wd;
      const invIm = -wIm / wd;
      const ir = iRe[k + 1]!;
      const ii = iIm[k + 1]!;
      const eRe = ir * invRe - ii * invIm;
      const eIm = ir * invIm + ii * invRe;
      // Z_loop = Z_s + R + jωL = 1/W − Z_kk⁰ + (R + jωL)
      const d = (k + 1) * n + k + 1;
      const zlRe = invRe - zkkRe[k]! + baseRe[d]!;
      const zlIm = invIm - zkkIm[k]! + baseIm[d]!;
      let aRe = 0;
      let aIm = 0;
      let bRe = zlRe;
      let bIm = zlIm;
      if (series[k]) {
        bRe += zcRe[k]!;
        bIm += zcIm[k]!;
      } else {
        aRe = zlRe * ycRe[k]! - zlIm * ycIm[k]!;
        aIm = zlRe * ycIm[k]! + zlIm * ycRe[k]!;
      }
      const res = solveLocal(rx[k]!, k, Math.hypot(eRe, eIm), 1 + aRe, aIm, bRe, bIm);
      scalarIterations += res.iterations;
      next[c] = res.amplitude;
      nextG[c] = res.g;
      nextB[c] = res.b;
    }
    for (let c = 0; c < q; c++) {
      const k = nl[c]!;
      x[k] = next[c]!;
      yG[k] = nextG[c]!; // the describing function at x, already evaluated by the local solve
      yB[k] = nextB[c]!;
    }
  };

  /** ln x + ln|S(x)| − ln|E| = 0 with S = s0 + B·Y(x); bracketed Newton. */
  const solveLocal = (
    r: ReceiverNetwork,
    k: number,
    eAbs: number,
    s0Re: number,
    s0Im: number,
    bRe: number,
    bIm: number,
  ): { amplitude: number; iterations: number; g: number; b: number } => {
    if (!(eAbs > 0)) return { amplitude: 0, iterations: 0, g: OPEN_LOAD_CONDUCTANCE, b: 0 };
    const load = r.load;
    const lnE = Math.log(eAbs);
    const sAbs = (v: number, out: Float64Array): number => {
      let g = load.conductance(v);
      const b = load.susceptance ? load.susceptance(v) : 0;
      if (!Number.isFinite(g) || !Number.isFinite(b) || g < 0) {
        throw new TanklightInputError(
          [{ path: `receivers[${k}].load`, message: `describing function must give a finite conductance ≥ 0 S at ${v} V`, value: g }],
          where,
        );
      }
      if (Math.hypot(g, b) < OPEN_LOAD_CONDUCTANCE) g = OPEN_LOAD_CONDUCTANCE;
      out[0] = s0Re + bRe * g - bIm * b;
      out[1] = s0Im + bRe * b + bIm * g;
      out[2] = g;
      out[3] = b;
      return Math.hypot(out[0]!, out[1]!);
    };
    const tmp = localTmp;
    const tmp2 = localTmp2;
    const phi = (v: number): number => Math.log(v) + Math.log(sAbs(v, tmp)) - lnE;
    // upper bracket: the amplitude if the load stayed as small as at v → 0, then doubled until φ ≥ 0
    let hi = eAbs / sAbs(0, tmp);
    let its = 0;
    let fhi = phi(hi);
    while (!(fhi >= 0)) {
      hi *= 2;
      fhi = phi(hi);
      if (++its > 200) throw new LinkConvergenceError(`solveLinkNetwork: receiver ${labelOf(r, k)}: no upper bound for the tank amplitude found`, its, []);
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
      sAbs(v + h, tmp2);
      const dgRe = (tmp2[2]! - tmp[2]!) / h;
      const dgIm = (tmp2[3]! - tmp[3]!) / h;
      const dsRe = bRe * dgRe - bIm * dgIm;
      const dsIm = bRe * dgIm + bIm * dgRe;
      const dphi = 1 / v + (sRe * dsRe + sIm * dsIm) / s2;
      if (fv < 0) lo = v;
      else hi = v;
      let vn = v - fv / dphi;
      if (!(dphi > 0) || !(vn > lo && vn < hi)) vn = lo > 0 ? Math.sqrt(lo * hi) : hi / 8;
      const step = Math.abs(vn - v);
      v = vn;
      fv = phi(v);
      if (step <= 1e-12 * v || Math.abs(fv) <= 1e-14 || hi - lo <= 1e-14 * hi) break;
    }
    return { amplitude: v, iterations: its, g: tmp[2]!, b: tmp[3]! };
  };
  const localTmp = new Float64Array(4);
  const localTmp2 = new Float64Array(4);

  // ── iterate ────────────────────────────────────────────────────────────────────────────
  for (let k = 0; k < m; k++) if (rx[k]!.load.linear) setAdmittance(k, 1);
  if (q === 0) evaluate();
  let iterations = 0;
  let converged = q === 0;
  const resid = new Float64Array(q);
  const residualMax = (): number => {
    let worst = 0;
    for (let c = 0; c < q; c++) {
      const k = nl[c]!;
      const va = Math.hypot(vRe[k]!, vIm[k]!);
      const xa = x[k]!;
      const r = Math.abs(va - xa) / (tol * Math.max(va, xa) + AMPLITUDE_FLOOR);
      resid[c] = Math.abs(va - xa);
      worst = Math.max(worst, r);
    }
    return worst;
  };
  // Probe admittance 1/(ωLₖ) for the first local solve: any base point is exact for the
  // Sherman–Morrison update, but a nearly open series load (|Zₖₖ| ≈ 1 PΩ) would cancel digits
  // in Z_s = 1/Wₖₖ − Zₖₖ⁰.
  const probe = (): void => {
    for (const k of nl) {
      yG[k] = 1 / (w * L[k + 1]![k + 1]!);
      yB[k] = 0;
    }
  };
  if (q > 0) {
    probe();
    evaluate();
    computeColumns();
    localStep();
    evaluate();
    iterations = 1;
    const jac = new Float64Array(q * q);
    const rhs = new Float64Array(q);
    const sv = new Float64Array(q);
    const ds = new Float64Array(q);
    const dy = new Float64Array(q * 2);
    const ftrial = new Float64Array(q);
    while (iterations < maxIter) {
      if (residualMax() <= 1) {
        converged = true;
        break;
      }
      iterations++;
      computeColumns();
      if (q === 1) {
        probe();
        evaluate();
        computeColumns();
        localStep();
        evaluate();
        continue;
      }
      // Newton on s = ln x: F_k = ln|V_k| − s_k
      const f0 = logResidual(nl, x, vRe, vIm, rhs);
      for (let c = 0; c < q; c++) {
        const k = nl[c]!;
        const xa = Math.max(x[k]!, AMPLITUDE_FLOOR);
        sv[c] = Math.log(xa);
        // Y'(x) by forward difference
        const h = 1e-7 * xa;
        const load = rx[k]!.load;
        const g1 = load.conductance(xa + h);
        const b1 = load.susceptance ? load.susceptance(xa + h) : 0;
        const g1f = Math.hypot(g1, b1) < OPEN_LOAD_CONDUCTANCE ? OPEN_LOAD_CONDUCTANCE : g1;
        dy[2 * c] = (g1f - yG[k]!) / h;
        dy[2 * c + 1] = (b1 - yB[k]!) / h;
      }
      for (let c = 0; c < q; c++) {
        const k = nl[c]!;
        const va2 = Math.max(vRe[k]! * vRe[k]! + vIm[k]! * vIm[k]!, AMPLITUDE_FLOOR * AMPLITUDE_FLOOR);
        const [zvRe, zvIm] = loadVoltageImpedance(k);
        for (let e = 0; e < q; e++) {
          const j = nl[e]!;
          // dZ/dY of receiver j (both topologies): −Zv_j² ; dZ_jj/dx_j = −Zv_j²·Y'_j
          const [zjRe, zjIm] = loadVoltageImpedance(j);
          const sqRe = zjRe * zjRe - zjIm * zjIm;
          const sqIm = 2 * zjRe * zjIm;
          const dzRe = -(sqRe * dy[2 * e]! - sqIm * dy[2 * e + 1]!);
          const dzIm = -(sqRe * dy[2 * e + 1]! + sqIm * dy[2 * e]!);
          // dI_k/dx_j = −W[k, j]·dZ_jj·I_j
          const wRe = colRe[e * n + k + 1]!;
          const wIm = colIm[e * n + k + 1]!;
          const ijRe = iRe[j + 1]!;
          const ijIm = iIm[j + 1]!;
          const pRe = dzRe * ijRe - dzIm * ijIm;
          const pIm = dzRe * ijIm + dzIm * ijRe;
          const diRe = -(wRe * pRe - wIm * pIm);
          const diIm = -(wRe * pIm + wIm * pRe);
          let dvRe = diRe * zvRe - diIm * zvIm;
          let dvIm = diRe * zvIm + diIm * zvRe;
          if (j === k) {
            // + I_k·dZv/dY·Y' with dZv/dY = −Zv²
            const ikRe = iRe[k + 1]!;
            const ikIm = iIm[k + 1]!;
            const dzvRe = -(sqRe * dy[2 * e]! - sqIm * dy[2 * e + 1]!);
            const dzvIm = -(sqRe * dy[2 * e + 1]! + sqIm * dy[2 * e]!);
            dvRe += ikRe * dzvRe - ikIm * dzvIm;
            dvIm += ikRe * dzvIm + ikIm * dzvRe;
          }
          const xj = Math.max(x[j]!, AMPLITUDE_FLOOR);
          jac[c * q + e] = ((vRe[k]! * dvRe + vIm[k]! * dvIm) * xj) / va2 - (c === e ? 1 : 0);
        }
        rhs[c] = -rhs[c]!;
      }
      const ok = solveRealInPlace(jac, rhs, q, ds);
      let accepted = false;
      if (ok) {
        let big = 0;
        for (let c = 0; c < q; c++) big = Math.max(big, Math.abs(ds[c]!));
        let alpha = big > 3 ? 3 / big : 1;
        for (let tries = 0; tries < 8 && !accepted; tries++) {
          for (let c = 0; c < q; c++) {
            const k = nl[c]!;
            x[k] = Math.exp(sv[c]! + alpha * ds[c]!);
            setAdmittance(k, x[k]!);
          }
          evaluate();
          const f1 = logResidual(nl, x, vRe, vIm, ftrial);
          if (f1 <= (1 - 1e-4 * alpha) * f0 || residualMax() <= 1) accepted = true;
          else alpha /= 2;
        }
      }
      if (!accepted) {
        for (let c = 0; c < q; c++) {
          const k = nl[c]!;
          x[k] = Math.exp(sv[c]!);
          setAdmittance(k, x[k]!);
        }
        evaluate();
        computeColumns();
        localStep();
        evaluate();
      }
    }
    if (!converged && residualMax() <= 1) converged = true;
  }
  if (!converged) {
    const parts = nl.map((k, c) => `${labelOf(rx[k]!, k)}: |V| − x = ${resid[c]!.toExponential(2)} V`);
    const msg = `solveLinkNetwork: the nonlinear operating point did not converge in ${iterations} iterations (${parts.join("; ")}); try a smaller step in the sweep, check the load models, or raise maxIterations`;
    if ((options.onNonConvergence ?? "throw") === "throw") throw new LinkConvergenceError(msg, iterations, Array.from(resid));
    warnings.push(msg);
  }
  void factorCount;
  return assemble(network, options, w, n, iRe, iIm, yG, yB, vRe, vIm, zcRe, zcIm, ycRe, ycIm, series, vthRe, vthIm, zsRe, zsIm, zc0Re, zc0Im, converged, iterations, scalarIterations, warnings);
}

function logResidual(nl: readonly number[], x: Float64Array, vRe: Float64Array, vIm: Float64Array, out: Float64Array): number {
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

/** Gaussian elimination with partial pivoting on a small dense real system (destroys a, b). */
function solveRealInPlace(a: Float64Array, b: Float64Array, n: number, out: Float64Array): boolean {
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i * n + k]!) > Math.abs(a[p * n + k]!)) p = i;
    if (!(Math.abs(a[p * n + k]!) > 0)) return false;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t = a[k * n + j]!;
        a[k * n + j] = a[p * n + j]!;
        a[p * n + j] = t;
      }
      const t = b[k]!;
      b[k] = b[p]!;
      b[p] = t;
    }
    for (let i = k + 1; i < n; i++) {
      const l = a[i * n + k]! / a[k * n + k]!;
      for (let j = k; j < n; j++) a[i * n + j] = a[i * n + j]! - l * a[k * n + j]!;
      b[i] = b[i]! - l * b[k]!;
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < n; j++) s -= a[i * n + j]! * out[j]!;
    out[i] = s / a[i * n + i]!;
  }
  for (let i = 0; i < n; i++) if (!Number.isFinite(out[i]!)) return false;
  return true;
}

function labelOf(r: ReceiverNetwork, k: number): string {
  return r.label ?? `receiver ${k + 1}`;
}

function checkNetwork(net: LinkNetwork, n: number, where: string): void {
  const L = net.inductance;
  if (!Array.isArray(L) || L.length !== n || L.some((row) => !Array.isArray(row) || row.length !== n)) {
    throw new TanklightInputError(
      [{ path: "inductance", message: `must be a ${n}×${n} matrix (transmitter + ${n - 1} receivers)`, value: L }],
      where,
    );
  }
  for (let i = 0; i < n; i++) {
    requirePositive(L[i]![i]!, `inductance[${i}][${i}]`, "H", where);
    for (let j = 0; j < n; j++) {
      const v = requireFinite(L[i]![j]!, `inductance[${i}][${j}]`, "H", where);
      const t = L[j]![i]!;
      if (Math.abs(v - t) > 1e-9 * Math.max(Math.abs(v), Math.abs(t))) {
        throw new TanklightInputError(
          [{ path: `inductance[${i}][${j}]`, message: `must equal inductance[${j}][${i}] (reciprocity)`, value: v, expected: `${t} H` }],
          where,
        );
      }
      if (i !== j && Math.abs(v) >= Math.sqrt(L[i]![i]! * L[j]![j]!)) {
        throw new TanklightInputError(
          [{ path: `inductance[${i}][${j}]`, message: "|M| must be below √(LᵢLⱼ) (coupling factor < 1)", value: v }],
          where,
        );
      }
    }
  }
  const tx = net.transmitter;
  nonNeg(tx.resistance, "transmitter.resistance", "Ω", where);
  if (tx.compensation !== "none") requirePositive(tx.capacitance ?? NaN, "transmitter.capacitance", "F", where);
  if (tx.capacitorEsr !== undefined) nonNeg(tx.capacitorEsr, "transmitter.capacitorEsr", "Ω", where);
  const d = tx.drive;
  nonNeg(d.amplitude, "transmitter.drive.amplitude", d.kind === "current" ? "A" : "V", where);
  if (d.kind === "voltage") {
    nonNeg(d.resistance, "transmitter.drive.resistance", "Ω", where);
    requireFinite(d.reactance, "transmitter.drive.reactance", "Ω", where);
    if (tx.compensation === "parallel" && d.resistance === 0 && d.reactance === 0 && (tx.capacitorEsr ?? 0) === 0) {
      // fine: ideal source across the tank
    }
  }
  net.receivers.forEach((r, k) => {
    nonNeg(r.resistance, `receivers[${k}].resistance`, "Ω", where);
    requirePositive(r.capacitance, `receivers[${k}].capacitance`, "F", where);
    if (r.capacitorEsr !== undefined) nonNeg(r.capacitorEsr, `receivers[${k}].capacitorEsr`, "Ω", where);
    if (r.topology !== "series" && r.topology !== "parallel") {
      throw new TanklightInputError([{ path: `receivers[${k}].topology`, message: "must be 'series' or 'parallel'", value: r.topology }], where);
    }
    if (!r.load || typeof r.load.conductance !== "function") {
      throw new TanklightInputError([{ path: `receivers[${k}].load`, message: "must have a conductance(amplitude) describing function", value: r.load }], where);
    }
  });
}

function nonNeg(x: number, field: string, unit: string, where: string): void {
  requireFinite(x, field, unit, where);
  if (x < 0) throw new TanklightInputError([{ path: field, message: `must be ≥ 0 ${unit}`, value: x }], where);
}

const SQRT1_2 = Math.SQRT1_2;

function assemble(
  net: LinkNetwork,
  options: LinkOptions,
  w: number,
  n: number,
  iRe: Float64Array,
  iIm: Float64Array,
  yG: Float64Array,
  yB: Float64Array,
  vRe: Float64Array,
  vIm: Float64Array,
  zcRe: Float64Array,
  zcIm: Float64Array,
  ycRe: Float64Array,
  ycIm: Float64Array,
  series: Uint8Array,
  vthRe: number,
  vthIm: number,
  zsRe: number,
  zsIm: number,
  zc0Re: number,
  zc0Im: number,
  converged: boolean,
  iterations: number,
  scalarIterations: number,
  warnings: string[],
): LinkResult {
  void vthIm;
  const L = net.inductance;
  const tx = net.transmitter;
  const threshold = options.litThreshold ?? DEFAULT_LIT_THRESHOLD;
  const brightRef = options.brightnessReference ?? DEFAULT_BRIGHTNESS_REFERENCE;
  const cautionV = options.cautionVoltage ?? DEFAULT_CAUTION_VOLTAGE;
  const cautions: string[] = [];
  const f = w / (2 * Math.PI);
  // transmitter
  const i0Re = iRe[0]!;
  const i0Im = iIm[0]!;
  let mRe = 0; // Σ jωM₀ⱼIⱼ
  let mIm = 0;
  for (let j = 1; j < n; j++) {
    const x = w * L[0]![j]!;
    mRe += -x * iIm[j]!;
    mIm += x * iRe[j]!;
  }
  const l0 = L[0]![0]!;
  const coilVRe = tx.resistance * i0Re - w * l0 * i0Im + mRe;
  const coilVIm = tx.resistance * i0Im + w * l0 * i0Re + mIm;
  const i0a2 = i0Re * i0Re + i0Im * i0Im;
  const refl = i0a2 > 0 ? { re: (mRe * i0Re + mIm * i0Im) / i0a2, im: (mIm * i0Re - mRe * i0Im) / i0a2 } : { re: 0, im: 0 };
  let capVRe = 0;
  let capVIm = 0;
  let capIRe = 0;
  let capIIm = 0;
  let srcIRe = i0Re;
  let srcIIm = i0Im;
  let termVRe = coilVRe;
  let termVIm = coilVIm;
  const esr0 = tx.capacitorEsr ?? 0;
  if (tx.compensation === "series") {
    capIRe = i0Re;
    capIIm = i0Im;
    capVRe = zc0Re * i0Re - zc0Im * i0Im;
    capVIm = zc0Re * i0Im + zc0Im * i0Re;
    termVRe = coilVRe + capVRe;
    termVIm = coilVIm + capVIm;
  } else if (tx.compensation === "parallel") {
    capVRe = coilVRe;
    capVIm = coilVIm;
    const den = zc0Re * zc0Re + zc0Im * zc0Im;
    capIRe = (coilVRe * zc0Re + coilVIm * zc0Im) / den;
    capIIm = (coilVIm * zc0Re - coilVRe * zc0Im) / den;
    srcIRe = i0Re + capIRe;
    srcIIm = i0Im + capIIm;
  }
  const srcIa2 = srcIRe * srcIRe + srcIIm * srcIIm;
  const drive = tx.drive;
  let input: number;
  let driverLoss = 0;
  if (drive.kind === "voltage") {
    input = 0.5 * drive.amplitude * srcIRe; // ½Re(V·I*), V real
    driverLoss = 0.5 * srcIa2 * drive.resistance;
  } else {
    input = 0.5 * (termVRe * srcIRe + termVIm * srcIIm);
  }
  void zsRe;
  void zsIm;
  void vthRe;
  const txCoilLoss = 0.5 * i0a2 * tx.resistance;
  const txCapLoss = 0.5 * (capIRe * capIRe + capIIm * capIIm) * esr0;
  const inZ =
    srcIa2 > 0
      ? { re: (termVRe * srcIRe + termVIm * srcIIm) / srcIa2, im: (termVIm * srcIRe - termVRe * srcIIm) / srcIa2 }
      : { re: Infinity, im: 0 };
  if (!Number.isFinite(inZ.re)) inZ.re = 0;
  const coilV = Math.hypot(coilVRe, coilVIm);
  const capV = Math.hypot(capVRe, capVIm);
  const txLabel = tx.label ?? "transmitter";
  checkPartVoltage(txLabel + " capacitor", capV, tx.capacitorRating, warnings);
  checkSelfResonance(txLabel + " coil", f, tx.selfResonance, warnings);
  caution(txLabel + " coil", coilV, cautionV, cautions);
  if (tx.compensation !== "none") caution(txLabel + " capacitor", capV, cautionV, cautions);

  // receivers
  const receivers: ReceiverState[] = [];
  let delivered = 0;
  let rxCoil = 0;
  let rxCap = 0;
  net.receivers.forEach((r, k) => {
    const ir = iRe[k + 1]!;
    const ii = iIm[k + 1]!;
    let eRe = 0; // EMF = −Σ jωM_kj I_j
    let eIm = 0;
    for (let j = 0; j < n; j++) {
      if (j === k + 1) continue;
      const x = w * L[k + 1]![j]!;
      eRe += x * iIm[j]!;
      eIm += -x * iRe[j]!;
    }
    const lk = L[k + 1]![k + 1]!;
    const cvRe = r.resistance * ir - w * lk * ii - eRe; // coil terminal voltage (drop along the loop)
    const cvIm = r.resistance * ii + w * lk * ir - eIm;
    const vl = Math.hypot(vRe[k]!, vIm[k]!);
    let capV: number;
    let capI: number;
    if (series[k]) {
      capI = Math.hypot(ir, ii);
      capV = capI * Math.hypot(zcRe[k]!, zcIm[k]!);
    } else {
      capV = vl;
      capI = vl * Math.hypot(ycRe[k]!, ycIm[k]!);
    }
    const ia2 = ir * ir + ii * ii;
    const coilLoss = 0.5 * ia2 * r.resistance;
    const capLoss = 0.5 * capI * capI * (r.capacitorEsr ?? 0);
    const loadPower = 0.5 * yG[k]! * vl * vl;
    const loadI = vl * Math.hypot(yG[k]!, yB[k]!);
    const ledList = r.load.ledCurrents ? r.load.ledCurrents(vl) : [];
    const leds: LedState[] = ledList.map((d) => ({
      label: d.label,
      averageCurrent: d.current,
      relativeBrightness: d.relativeBrightness ?? Math.max(d.current, 0) / brightRef,
      lit: d.current >= threshold,
    }));
    const label = labelOf(r, k);
    checkPartVoltage(label + " capacitor", capV, r.capacitorRating, warnings);
    checkSelfResonance(label + " coil", f, r.selfResonance, warnings);
    caution(label + " tank", Math.max(capV, Math.hypot(cvRe, cvIm)), cautionV, cautions);
    delivered += loadPower;
    rxCoil += coilLoss;
    rxCap += capLoss;
    const coilVa = Math.hypot(cvRe, cvIm);
    receivers.push({
      label,
      emf: Math.hypot(eRe, eIm),
      coilCurrent: Math.sqrt(ia2),
      coilCurrentRms: Math.sqrt(ia2) * SQRT1_2,
      coilCurrentPhasor: { re: ir, im: ii },
      coilVoltage: coilVa,
      coilVoltageRms: coilVa * SQRT1_2,
      capacitorVoltage: capV,
      capacitorVoltageRms: capV * SQRT1_2,
      capacitorCurrent: capI,
      capacitorCurrentRms: capI * SQRT1_2,
      loadVoltage: vl,
      loadVoltageRms: vl * SQRT1_2,
      loadCurrent: loadI,
      loadCurrentRms: loadI * SQRT1_2,
      loadPower,
      coilLoss,
      capacitorLoss: capLoss,
      leds,
      lit: leds.some((d) => d.lit),
      allLit: leds.length > 0 && leds.every((d) => d.lit),
    });
  });
  const i0 = Math.sqrt(i0a2);
  const srcI = Math.sqrt(srcIa2);
  const termV = Math.hypot(termVRe, termVIm);
  const capI0 = Math.hypot(capIRe, capIIm);
  return {
    frequency: f,
    converged,
    iterations,
    scalarIterations,
    transmitter: {
      label: txLabel,
      coilCurrent: i0,
      coilCurrentRms: i0 * SQRT1_2,
      coilCurrentPhasor: { re: i0Re, im: i0Im },
      coilVoltage: coilV,
      coilVoltageRms: coilV * SQRT1_2,
      capacitorVoltage: capV,
      capacitorVoltageRms: capV * SQRT1_2,
      capacitorCurrent: capI0,
      capacitorCurrentRms: capI0 * SQRT1_2,
      sourceCurrent: srcI,
      sourceCurrentRms: srcI * SQRT1_2,
      sourceVoltage: termV,
      sourceVoltageRms: termV * SQRT1_2,
      inputImpedance: inZ,
      reflectedImpedance: refl,
      coilLoss: txCoilLoss,
      capacitorLoss: txCapLoss,
      driverLoss,
    },
    receivers,
    power: {
      input,
      delivered,
      driver: driverLoss,
      transmitterCoil: txCoilLoss,
      transmitterCapacitor: txCapLoss,
      receiverCoils: rxCoil,
      receiverCapacitors: rxCap,
      efficiency: input > 0 ? delivered / input : 0,
    },
    litThreshold: threshold,
    litThresholdSource: options.litThreshold === undefined ? LITTHRESHOLD_SOURCE : "set by the user",
    drive: { label: drive.label, assumptions: drive.assumptions },
    warnings,
    cautions,
  };
}

function checkPartVoltage(what: string, peak: number, rating: number | undefined, warnings: string[]): void {
  if (rating !== undefined && peak > rating) {
    warnings.push(`${what}: peak voltage ${peak.toPrecision(3)} V exceeds its rating ${rating} V (overvoltage)`);
  }
}

function checkSelfResonance(what: string, f: number, srf: number | undefined, warnings: string[]): void {
  if (srf !== undefined && f > srf / 3) {
    warnings.push(
      `${what}: drive frequency ${f.toPrecision(4)} Hz is beyond a third of its self-resonance ${srf.toPrecision(4)} Hz; its inductance and resistance are no longer the low-frequency values`,
    );
  }
}

function caution(what: string, peak: number, limit: number, cautions: string[]): void {
  if (peak > limit) {
    cautions.push(
      `${what}: ${peak.toPrecision(3)} V peak (${(peak * SQRT1_2).toPrecision(3)} V RMS) exceeds ${limit} V peak; high tank voltages can shock or burn: insulate and rate the parts for it, and defer to local electrical codes, regulations and licensed practice`,
    );
  }
}

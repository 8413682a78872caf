/**
 * The harmonic-balance equations and their Newton solution (Kundert, White &
 * Sangiovanni-Vincentelli 1990, ch. 5–6: Newton's method on the harmonic coefficients with the
 * Jacobian built from conversion matrices of the sampled small-signal conductances).
 *
 * Unknowns: the Fourier coefficients of each port voltage, v_p(θ) = V₀ + Σ_{h≤H} Re(V_h e^{jhθ}),
 * stored per port as [V₀, Re V₁, Im V₁, …, Re V_H, Im V_H]. Residual, harmonic by harmonic:
 *   R_p,h = V_p,h − λ·E_p,h − Σ_q T_pq,h · I_q,h(v_q),
 * with I_q,h the exact DFT of the port current evaluated in time at N samples and (E, T) the
 * linear network's multi-port form (ports.ts). Jacobian: ∂I_h/∂V_k from the two-sided Fourier
 * coefficients γ_d of the sampled conductance g(θ) = di/dv (γ_{h−k} + γ_{h+k} for Re V_k,
 * j(γ_{h−k} − γ_{h+k}) for Im V_k, 2γ_h for V₀), plus a rank-one term for loads with a
 * constant internal state (the reservoir). It is the exact derivative of the discrete residual,
 * so Newton converges quadratically near the solution. Steps are damped by backtracking with
 * Deuflhard's natural monotonicity test (Deuflhard, *Newton Methods for Nonlinear Problems*,
 * Springer 2004, §3.3: the simplified Newton correction J⁻¹r at the trial point, with the
 * iteration's own factors, must shrink by 1 − α/4), which is affine invariant: a residual-norm
 * (Armijo) test took steps of 1/128 for ≈ 35 iterations on a hard-clipping InGaN LED, whose
 * exponential current dominates ‖r‖; λ scales the sources for continuation (source stepping).
 */
import { luFactorCore, luSolve } from "../../math/lu.ts";
import { complexLuFactorCore, complexLuSolveCore } from "../../math/complexLu.ts";
import { takeFrom, type HarmonicPorts } from "./ports.ts";
import { analyze, project, synthesize, twoSided, type SpectrumTables } from "./spectrum.ts";
import type { TimeLoad } from "./timeLoad.ts";

/** The state and workspace of one harmonic-balance problem. */
export class HarmonicSystem {
  readonly ports: HarmonicPorts;
  readonly tables: SpectrumTables;
  readonly H: number;
  readonly N: number;
  readonly P: number;
  /** unknowns per port, 2H + 1 */
  readonly B: number;
  readonly loads: TimeLoad[];
  /** when set for a port, the load is replaced by this constant conductance (S) */
  readonly frozen: Float64Array;
  readonly isFrozen: Uint8Array;
  /** port voltage samples, currents and conductances per port: [p·N + s] */
  readonly v: Float64Array;
  readonly i: Float64Array;
  readonly g: Float64Array;
  /** port current coefficients, same layout as the unknowns */
  readonly cur: Float64Array;
  private readonly vs: Float64Array[];
  private readonly is: Float64Array[];
  private readonly gs: Float64Array[];
  private readonly jac: Float64Array;
  private readonly piv: Int32Array;
  private readonly gRe: Float64Array;
  private readonly gIm: Float64Array;
  private readonly dRe: Float64Array;
  private readonly dIm: Float64Array;
  private readonly uCoef: Float64Array;
  private readonly wr: Float64Array;
  private readonly wdz: Float64Array;
  private readonly wzt: Float64Array;
  private readonly wrt: Float64Array;
  private readonly wnat: Float64Array;
  /** the unknowns and source level of the last {@link residual} call (the state v, i, g, cur hold) */
  private readonly zAt: Float64Array;
  private lambdaAt = NaN;
  private frozenAt = false;
  newtonIterations = 0;
  factorizations = 0;

  /**
   * @param ports the reduced network; tables transforms with N samples (rows up to 2·order make
   *   them fastest); loads one per port.
   */
  constructor(ports: HarmonicPorts, tables: SpectrumTables, loads: TimeLoad[]) {
    this.ports = ports;
    this.tables = tables;
    this.H = ports.order;
    this.N = tables.samples;
    this.P = ports.ports;
    this.B = 2 * this.H + 1;
    this.loads = loads;
    const { P, N, B, H } = this;
    // one allocation for the whole workspace (typed arrays beyond 64 bytes each cost a backing store)
    const Z = P * B;
    const ws = new Float64Array(P + 3 * P * N + Z * Z + 2 * (4 * H + 1) + 2 * (H + 1) + B + 7 * Z);
    const cur = { buf: ws, at: 0 };
    this.frozen = takeFrom(cur, P);
    this.isFrozen = new Uint8Array(P);
    this.v = takeFrom(cur, P * N);
    this.i = takeFrom(cur, P * N);
    this.g = takeFrom(cur, P * N);
    this.vs = [];
    this.is = [];
    this.gs = [];
    for (let p = 0; p < P; p++) {
      this.vs.push(this.v.subarray(p * N, (p + 1) * N));
      this.is.push(this.i.subarray(p * N, (p + 1) * N));
      this.gs.push(this.g.subarray(p * N, (p + 1) * N));
    }
    this.cur = takeFrom(cur, Z);
    this.jac = takeFrom(cur, Z * Z);
    this.piv = new Int32Array(Z);
    this.gRe = takeFrom(cur, 4 * H + 1);
    this.gIm = takeFrom(cur, 4 * H + 1);
    this.dRe = takeFrom(cur, H + 1);
    this.dIm = takeFrom(cur, H + 1);
    this.uCoef = takeFrom(cur, B);
    this.wr = takeFrom(cur, Z);
    this.wdz = takeFrom(cur, Z);
    this.wzt = takeFrom(cur, Z);
    this.wrt = takeFrom(cur, Z);
    this.wnat = takeFrom(cur, Z);
    this.zAt = takeFrom(cur, Z);
  }

  /** Whether the port waveforms and currents held are those of z at source level λ with the true loads (the last {@link residual} call). */
  holds(z: Float64Array, lambda: number): boolean {
    if (lambda !== this.lambdaAt || this.frozenAt || this.isFrozen.includes(1)) return false;
    for (let j = 0; j < z.length; j++) if (z[j] !== this.zAt[j]) return false;
    return true;
  }

  /** Number of real unknowns. */
  get size(): number {
    return this.P * this.B;
  }

  /** Evaluates the loads at z and writes the residual into r; returns its largest entry, V. */
  residual(z: Float64Array, lambda: number, r: Float64Array): number {
    const { P, B, H, tables } = this;
    const pt = this.ports;
    this.zAt.set(z);
    this.lambdaAt = lambda;
    this.frozenAt = this.isFrozen.includes(1);
    for (let p = 0; p < P; p++) {
      const v = this.vs[p]!;
      synthesize(tables, H, z, p * B, v);
      if (this.isFrozen[p]) {
        const G = this.frozen[p]!;
        const ip = this.is[p]!;
        const gp = this.gs[p]!;
        for (let s = 0; s < v.length; s++) {
          ip[s] = G * v[s]!;
          gp[s] = G;
        }
      } else {
        this.loads[p]!.evaluate(v, this.is[p]!, this.gs[p]!);
      }
      analyze(tables, H, this.is[p]!, this.cur, p * B);
    }
    let worst = 0;
    for (let p = 0; p < P; p++) {
      for (let h = 0; h <= H; h++) {
        let sRe = lambda * pt.eRe[h * P + p]!;
        let sIm = lambda * pt.eIm[h * P + p]!;
        for (let q = 0; q < P; q++) {
          const tr = pt.tRe[(h * P + p) * P + q]!;
          const ti = pt.tIm[(h * P + p) * P + q]!;
          const cr = h === 0 ? this.cur[q * B]! : this.cur[q * B + 2 * h - 1]!;
          const ci = h === 0 ? 0 : this.cur[q * B + 2 * h]!;
          sRe += tr * cr - ti * ci;
          sIm += tr * ci + ti * cr;
        }
        if (h === 0) {
          const x = z[p * B]! - sRe;
          r[p * B] = x;
          worst = Math.max(worst, Math.abs(x));
        } else {
          const xr = z[p * B + 2 * h - 1]! - sRe;
          const xi = z[p * B + 2 * h]! - sIm;
          r[p * B + 2 * h - 1] = xr;
          r[p * B + 2 * h] = xi;
          worst = Math.max(worst, Math.abs(xr), Math.abs(xi));
        }
      }
    }
    return worst;
  }

  /**
   * Builds the Jacobian at the state of the last {@link residual} call and solves J·dz = −r
   * in place (r becomes dz). Returns false when J is singular or the step is not finite.
   */
  solveStep(r: Float64Array): boolean {
    const { P, B, H, tables } = this;
    const pt = this.ports;
    const Z = P * B;
    const J = this.jac;
    J.fill(0);
    for (let i = 0; i < Z; i++) J[i * Z + i] = 1;
    const gRe = this.gRe;
    const gIm = this.gIm;
    const dRe = this.dRe;
    const dIm = this.dIm;
    const D = 2 * H; // γ_d at index d + D, d = −2H…2H
    for (let q = 0; q < P; q++) {
      twoSided(tables, D, this.gs[q]!, gRe.subarray(D), gIm.subarray(D));
      for (let d = 1; d <= D; d++) {
        gRe[D - d] = gRe[D + d]!;
        gIm[D - d] = -gIm[D + d]!;
      }
      const r1 = this.isFrozen[q] ? undefined : this.loads[q]!.rank1;
      const u = this.uCoef;
      if (r1) analyze(tables, H, r1.u, u, 0);
      for (let k = 0; k <= H; k++) {
        for (let c = 0; c < (k === 0 ? 1 : 2); c++) {
          // dI_q,h / d(column unknown), h = 0…H
          const wv = r1 ? project(tables, r1.w, k, c === 0 ? 0 : 1) : 0;
          for (let h = 0; h <= H; h++) {
            let re: number;
            let im: number;
            if (k === 0) {
              re = h === 0 ? gRe[D]! : 2 * gRe[D + h]!;
              im = h === 0 ? 0 : 2 * gIm[D + h]!;
            } else if (h === 0) {
              re = c === 0 ? gRe[D + k]! : gIm[D + k]!;
              im = 0;
            } else {
              const a1 = gRe[D + h - k]!;
              const b1 = gIm[D + h - k]!;
              const a2 = gRe[D + h + k]!;
              const b2 = gIm[D + h + k]!;
              if (c === 0) {
                re = a1 + a2;
                im = b1 + b2;
              } else {
                re = b2 - b1;
                im = a1 - a2;
              }
            }
            if (r1) {
              re += (h === 0 ? u[0]! : u[2 * h - 1]!) * wv;
              im += (h === 0 ? 0 : u[2 * h]!) * wv;
            }
            dRe[h] = re;
            dIm[h] = im;
          }
          const col = q * B + (k === 0 ? 0 : 2 * k - 1 + c);
          for (let p = 0; p < P; p++) {
            for (let h = 0; h <= H; h++) {
              const tr = pt.tRe[(h * P + p) * P + q]!;
              const ti = pt.tIm[(h * P + p) * P + q]!;
              const xr = tr * dRe[h]! - ti * dIm[h]!;
              const xi = tr * dIm[h]! + ti * dRe[h]!;
              if (h === 0) {
                J[(p * B) * Z + col] = J[(p * B) * Z + col]! - xr;
              } else {
                const row = p * B + 2 * h - 1;
                J[row * Z + col] = J[row * Z + col]! - xr;
                J[(row + 1) * Z + col] = J[(row + 1) * Z + col]! - xi;
              }
            }
          }
        }
      }
    }
    for (let i = 0; i < Z; i++) r[i] = -r[i]!;
    for (let i = 0; i < Z * Z; i++) if (!Number.isFinite(J[i]!)) return false;
    if (luFactorCore(J, Z, this.piv) >= 0) return false;
    this.factorizations++;
    luSolve(J, Z, this.piv, r);
    for (let i = 0; i < Z; i++) if (!Number.isFinite(r[i]!)) return false;
    return true;
  }

  /** Solves J·dz = −r in place with the factors of the last {@link solveStep} (another right-hand side, same Jacobian). */
  solveAgain(r: Float64Array): boolean {
    const Z = this.size;
    for (let i = 0; i < Z; i++) r[i] = -r[i]!;
    luSolve(this.jac, Z, this.piv, r);
    for (let i = 0; i < Z; i++) if (!Number.isFinite(r[i]!)) return false;
    return true;
  }

  /**
   * The solution with every port frozen at a constant conductance G_p (`frozen`), which is
   * linear and harmonic by harmonic: (1 − T_h·G)·V_h = λ·E_h, one P×P complex solve per
   * harmonic, written into z. Only for time-invariant ports (no switch): a switch couples the
   * harmonics.
   */
  solveFrozen(z: Float64Array, lambda: number): void {
    const { P, B, H } = this;
    const pt = this.ports;
    const aRe = new Float64Array(P * P);
    const aIm = new Float64Array(P * P);
    const bRe = new Float64Array(P);
    const bIm = new Float64Array(P);
    const piv = new Int32Array(P);
    for (let h = 0; h <= H; h++) {
      for (let p = 0; p < P; p++) {
        bRe[p] = lambda * pt.eRe[h * P + p]!;
        bIm[p] = h === 0 ? 0 : lambda * pt.eIm[h * P + p]!;
        for (let q = 0; q < P; q++) {
          const g = this.frozen[q]!;
          aRe[p * P + q] = (p === q ? 1 : 0) - pt.tRe[(h * P + p) * P + q]! * g;
          aIm[p * P + q] = h === 0 ? 0 : -pt.tIm[(h * P + p) * P + q]! * g;
        }
      }
      if (complexLuFactorCore(aRe, aIm, P, piv) >= 0) {
        bRe.fill(0);
        bIm.fill(0);
      } else complexLuSolveCore(aRe, aIm, P, piv, bRe, bIm);
      for (let p = 0; p < P; p++) {
        if (h === 0) z[p * B] = bRe[p]!;
        else {
          z[p * B + 2 * h - 1] = bRe[p]!;
          z[p * B + 2 * h] = bIm[p]!;
        }
      }
    }
  }

  /**
   * Damped Newton from z (updated in place) at source level λ.
   * @returns converged flag, iterations, last residual (V, max entry) and scale (V).
   */
  newton(z: Float64Array, lambda: number, tol: number, maxIter: number): { converged: boolean; iterations: number; residual: number } {
    const Z = this.size;
    const r = this.wr;
    const dz = this.wdz;
    const zt = this.wzt;
    const rt = this.wrt;
    let res = this.residual(z, lambda, r);
    let norm = l2(r);
    for (let it = 1; it <= maxIter; it++) {
      this.newtonIterations++;
      dz.set(r);
      if (!this.solveStep(dz)) return { converged: false, iterations: it, residual: res };
      let alpha = 1;
      let accepted = false;
      let natMax = Infinity;
      let theta = Infinity;
      let stepMax = 0;
      for (let j = 0; j < Z; j++) stepMax = Math.max(stepMax, Math.abs(dz[j]!));
      const dzNorm = l2(dz);
      const nat = this.wnat;
      for (let tries = 0; tries < 30; tries++) {
        for (let j = 0; j < Z; j++) zt[j] = z[j]! + alpha * dz[j]!;
        const resT = this.residual(zt, lambda, rt);
        const normT = l2(rt);
        // Deuflhard's natural monotonicity test: the simplified Newton correction at the trial
        // point, with this iteration's factors, must shrink (affine invariant, unlike ‖r‖);
        // the residual itself only has to stay finite
        nat.set(rt);
        luSolve(this.jac, Z, this.piv, nat);
        const natNorm = l2(nat);
        if (Number.isFinite(normT) && Number.isFinite(natNorm) && natNorm <= (1 - alpha / 4) * dzNorm) {
          z.set(zt);
          r.set(rt);
          res = resT;
          norm = normT;
          accepted = true;
          natMax = 0;
          for (let j = 0; j < Z; j++) natMax = Math.max(natMax, Math.abs(nat[j]!));
          theta = natNorm / dzNorm;
          break;
        }
        alpha /= 2;
      }
      const scale = this.scale(z);
      if (!accepted) {
        // no descent: converged to round-off, or stuck
        this.residual(z, lambda, r);
        return { converged: res <= tol * scale * 10, iterations: it, residual: res };
      }
      if (alpha * stepMax <= tol * scale && res <= Math.sqrt(tol) * scale) return { converged: true, iterations: it, residual: res };
      // Deuflhard's termination (Newton Methods for Nonlinear Problems, §2.1.2): after a full
      // step that contracted quadratically (Θ = ‖simplified correction‖/‖step‖ ≤ 0.1), the
      // simplified Newton correction at the new point estimates its remaining error
      if (alpha === 1 && theta <= 0.1 && natMax <= tol * scale && res <= Math.sqrt(tol) * scale) return { converged: true, iterations: it, residual: res };
      if (res <= tol * scale * 1e-3) return { converged: true, iterations: it, residual: res };
    }
    return { converged: false, iterations: maxIter, residual: res };
  }

  /** Largest port voltage coefficient, V (floored at 1 mV): the scale of the convergence test. */
  scale(z: Float64Array): number {
    let m = 1e-3;
    for (let j = 0; j < z.length; j++) m = Math.max(m, Math.abs(z[j]!));
    return m;
  }
}

function l2(r: Float64Array): number {
  let s = 0;
  for (let j = 0; j < r.length; j++) s += r[j]! * r[j]!;
  return Math.sqrt(s);
}

/**
 * A token's harmonic-balance steady state tabulated against the EMF induced in its coil.
 *
 * With one transmitter and one token, the token sees the rest of the link only through the EMF
 * e = −jωM·I₀ that the transmitter current induces in its coil; driven by a sinusoidal EMF of
 * amplitude x, its steady state (tank waveform, LED currents, coil current) depends on x alone
 * (the EMF's phase is a time shift; its sign a half-period shift, which leaves every LED's
 * average current unchanged). So the token's harmonic balance (order H, all of its harmonics and
 * DC kept) is solved once per table node, against x, and a pose needs only a lookup and the
 * transmitter's loop equation (./linkTable.ts).
 *
 * The table: the token's coil admittance Y(x) = I₁/e at the fundamental and each LED's average
 * current, with their slopes d/dx from the harmonic-balance sensitivity (dz/dx = J⁻¹·E, one more
 * solve with the converged Jacobian), interpolated by cubic Hermite polynomials on each
 * interval. Nodes are placed adaptively: an interval is halved until the interpolant built
 * from its two ends agrees, at its midpoint, with the harmonic-balance solve there to
 * {@link ADMITTANCE_TOLERANCE} relative on Y and {@link LED_TOLERANCE} on each LED current
 * (floor 1 % of the lit threshold); that midpoint then becomes a node too, so the largest
 * deviation recorded at the accepted midpoints ({@link TokenTable.deviation}) is a conservative
 * estimate of the final table's error (a cubic's error falls 16× when its interval is halved).
 * The table grows on demand in fixed chunks [0, x₀], [x₀, 2x₀], [2x₀, 4x₀], …, each built whole
 * from the previous one's last node, so its content does not depend on the order of the
 * lookups (the same numbers in any thread).
 *
 * What it leaves out: the EMF's own harmonics (the transmitter current's harmonics, h·I₀,h
 * against I₀,₁ — small behind a tuned transmitter tank; ./linkTable.ts measures them per pose).
 */
import type { ReceiverNetwork, TransmitterNetwork } from "../link/network.ts";
import { LinkConvergenceError } from "../link/localSolve.ts";
import { TanklightInputError } from "../../errors.ts";
import { harmonicPorts, type HarmonicPorts } from "./ports.ts";
import { analyze, spectrumTables, synthesize } from "./spectrum.ts";
import { timeLoad, type TimeLoad } from "./timeLoad.ts";
import { HarmonicSystem } from "./newton.ts";

/** Relative interpolation tolerance on the token's coil admittance at every interval midpoint. */
export const ADMITTANCE_TOLERANCE = 1e-4;
/** Interpolation tolerance on each LED's average current, relative (floor 1 % of the lit threshold). */
export const LED_TOLERANCE = 1e-3;
/** Deepest halving of a chunk's quarter (2⁻¹⁴ of it): beyond that the table gives up (LinkConvergenceError). */
const MAX_DEPTH = 16;

/** The interpolated response at one EMF amplitude (written by {@link TokenTable.at}). */
export interface TokenPoint {
  /** coil admittance Y = I₁/e at the fundamental, S, and dY/dx, S/V */
  yRe: number;
  yIm: number;
  dyRe: number;
  dyIm: number;
  /** each LED's average current, A */
  readonly leds: Float64Array;
  /** ∂Y/∂μ and each LED current's ∂/∂μ, μ = M² (the transmitter's reflection at the harmonics h ≥ 2), per H² */
  yMuRe: number;
  yMuIm: number;
  readonly ledsMu: Float64Array;
}

/** A token's steady state against the EMF amplitude (see the module comment). */
export interface TokenTable {
  readonly order: number;
  readonly samples: number;
  readonly ledLabels: readonly string[];
  /** interpolated response at EMF amplitude x (V peak, ≥ 0) into out (the table grows to cover x) */
  at(x: number, out: TokenPoint): void;
  /** a point record sized for this table */
  point(): TokenPoint;
  /** nodes solved so far (each one harmonic-balance solve) */
  nodes(): number;
  /** largest deviation at the accepted midpoints: relative on Y, and on the LED currents (floor 1 % of the lit threshold) */
  deviation(): { readonly admittance: number; readonly led: number };
}

interface Node {
  readonly x: number;
  readonly z: Float64Array;
  readonly dz: Float64Array;
  readonly y: readonly [number, number];
  readonly dy: readonly [number, number];
  readonly led: Float64Array;
  readonly dled: Float64Array;
  readonly yMu: readonly [number, number];
  readonly ledMu: Float64Array;
}

/**
 * Builds the (initially empty) table of a token.
 * @param frequency drive frequency, Hz; inductance the token coil's self inductance, H;
 *   receiver the token as the link network has it (its load a model with a token load).
 * @param options order H (default 15), samples N (default 8H), lit threshold (A, for the LED floor).
 * @param coupledTo the voltage-driven transmitter (and its self inductance, H) whose impedance at
 *   the harmonics h ≥ 2 reflects into the token as (hωM)²/Z₀,h: tabulated as a first-order term
 *   in μ = M² (absent: a current-driven transmitter, which reflects nothing there).
 * @example tokenTable(2e5, 30e-6, receiver, { order: 15 }).at(1, point) writes Y(1 V) and the LED currents there
 */
export function tokenTable(
  frequency: number,
  inductance: number,
  receiver: ReceiverNetwork,
  options: { readonly order: number; readonly samples: number; readonly litThreshold: number },
  coupledTo?: { readonly transmitter: TransmitterNetwork; readonly inductance: number },
): TokenTable {
  const token = receiver.load.token;
  if (token === undefined || receiver.load.linear) {
    throw new TanklightInputError([{ path: "receiver.load", message: "a token table needs a nonlinear token load evaluable in time", value: receiver.load.label }], "tokenTable");
  }
  const H = options.order;
  const N = options.samples;
  const w = 2 * Math.PI * frequency;
  // a unit current source in a coil coupled with ωM = 1 Ω: the token's EMF is e = −j·λ (V), λ the source scale
  const m = 1 / w;
  const ports: HarmonicPorts = harmonicPorts(
    {
      frequency,
      inductance: [
        [(4 * m * m) / inductance, m],
        [m, inductance],
      ],
      transmitter: { resistance: 0, compensation: "none", drive: { kind: "current", amplitude: 1, label: "EMF of the token table", assumptions: [] } },
      receivers: [receiver],
    },
    H,
    [(_h, out) => out.fill(0)],
    [true],
    () => undefined,
  );
  const tables = spectrumTables(N);
  const load: TimeLoad = timeLoad(token, N);
  const sys = new HarmonicSystem(ports, tables, [load]);
  const B = sys.B;
  const size = ports.size;
  const loop1 = ports.index.loop(1);
  const ocRe = ports.xRe[size + loop1]!;
  const ocIm = ports.xIm[size + loop1]!;
  const xtRe = ports.xtRe[size + loop1]!;
  const xtIm = ports.xtIm[size + loop1]!;
  // ∂T_h/∂μ (μ = M²) at h ≥ 2: the port impedance with the transmitter loop closed through its
  // own impedance, by a difference at a tiny coupling (T is rational in μ: relative error ~ μ_δ)
  const tpRe = new Float64Array(H + 1);
  const tpIm = new Float64Array(H + 1);
  if (coupledTo) {
    const md = 1e-4 * Math.sqrt(coupledTo.inductance * inductance);
    const pd = harmonicPorts(
      { frequency, inductance: [[coupledTo.inductance, md], [md, inductance]], transmitter: coupledTo.transmitter, receivers: [receiver] },
      H,
      [(_h, out) => out.fill(0)],
      [true],
      () => undefined,
    );
    for (let h = 2; h <= H; h++) {
      tpRe[h] = (pd.tRe[h]! - ports.tRe[h]!) / (md * md);
      tpIm[h] = (pd.tIm[h]! - ports.tIm[h]!) / (md * md);
    }
  }
  const reflects = coupledTo !== undefined;
  const floor = 0.01 * options.litThreshold;
  const r = new Float64Array(B);
  const dv = new Float64Array(N);
  const di = new Float64Array(N);
  const dcur = new Float64Array(B);
  const vp = new Float64Array(N);
  const labels = load.leds(new Float64Array(N)).map((l) => l.label);
  const nl = labels.length;
  const nodes: Node[] = [];
  let chunks = 0;
  let devY = 0;
  let devI = 0;

  /**
   * The fundamental of the port current's change for a change dz of the port voltage (at the
   * state of the last residual): analyze(g·δv + u·(w·δv)); leaves δv in `dv`. Returns [re, im].
   */
  const portSlope = (d: Float64Array): [number, number] => {
    synthesize(tables, H, d, 0, dv);
    const g = sys.g;
    const r1 = load.rank1;
    let wdv = 0;
    if (r1) for (let s = 0; s < N; s++) wdv += r1.w[s]! * dv[s]!;
    for (let s = 0; s < N; s++) di[s] = g[s]! * dv[s]! + (r1 ? r1.u[s]! * wdv : 0);
    analyze(tables, H, di, dcur, 0);
    return [dcur[1]!, dcur[2]!];
  };
  /** Each LED current's change along `dv` from samples v: central difference (the average is smooth in v; error O(ε²)). */
  const ledSlope = (v: Float64Array, out: Float64Array): void => {
    let dvMax = 0;
    for (let s = 0; s < N; s++) dvMax = Math.max(dvMax, Math.abs(dv[s]!));
    out.fill(0);
    if (!(dvMax > 0)) return;
    const eps = 1e-4 / dvMax;
    for (let s = 0; s < N; s++) vp[s] = v[s]! + eps * dv[s]!;
    const up = load.leds(vp).map((l) => l.current);
    for (let s = 0; s < N; s++) vp[s] = v[s]! - eps * dv[s]!;
    const dn = load.leds(vp).map((l) => l.current);
    for (let i = 0; i < nl; i++) out[i] = (up[i]! - dn[i]!) / (2 * eps);
  };

  /** One harmonic-balance solve at EMF amplitude x from the start z; its values and slopes. */
  const solve = (x: number, start: Float64Array): Node | undefined => {
    const z = start.slice();
    const out = sys.newton(z, x, 1e-9, 60);
    if (!out.converged) return undefined;
    sys.residual(z, x, r); // loads, port currents and Jacobian state at the solution
    const c1Re = x * ocRe + xtRe * sys.cur[1]! - xtIm * sys.cur[2]!;
    const c1Im = x * ocIm + xtRe * sys.cur[2]! + xtIm * sys.cur[1]!;
    // dz/dx = J⁻¹·E (R = z − x·E − T·I(z)); solveStep solves J·d = −r in place
    const dz = new Float64Array(B);
    dz[0] = -ports.eRe[0]!;
    for (let h = 1; h <= H; h++) {
      dz[2 * h - 1] = -ports.eRe[h]!;
      dz[2 * h] = -ports.eIm[h]!;
    }
    if (!sys.solveStep(dz)) return undefined;
    const dc = portSlope(dz);
    const dc1Re = ocRe + xtRe * dc[0] - xtIm * dc[1];
    const dc1Im = ocIm + xtRe * dc[1] + xtIm * dc[0];
    // Y = I₁/e = j·I₁/x; dY/dx = j·(x·dI₁ − I₁)/x²
    const y: [number, number] = [-c1Im / x, c1Re / x];
    const dy: [number, number] = [-(x * dc1Im - c1Im) / (x * x), (x * dc1Re - c1Re) / (x * x)];
    const v = sys.v.subarray(0, N);
    const led = Float64Array.from(load.leds(v), (l) => l.current);
    synthesize(tables, H, dz, 0, dv);
    const dled = new Float64Array(nl);
    ledSlope(v, dled);
    // the transmitter's reflection at h ≥ 2, to first order in μ: J·dz/dμ = T′·I
    const yMu: [number, number] = [0, 0];
    const ledMu = new Float64Array(nl);
    if (reflects) {
      const dzMu = new Float64Array(B);
      for (let h = 2; h <= H; h++) {
        const cr = sys.cur[2 * h - 1]!;
        const ci = sys.cur[2 * h]!;
        dzMu[2 * h - 1] = -(tpRe[h]! * cr - tpIm[h]! * ci);
        dzMu[2 * h] = -(tpRe[h]! * ci + tpIm[h]! * cr);
      }
      if (!sys.solveAgain(dzMu)) return undefined;
      const c = portSlope(dzMu);
      const mRe = xtRe * c[0] - xtIm * c[1];
      const mIm = xtRe * c[1] + xtIm * c[0];
      yMu[0] = -mIm / x;
      yMu[1] = mRe / x;
      ledSlope(sys.v.subarray(0, N), ledMu);
    }
    if (![...y, ...dy, ...yMu].every(Number.isFinite) || !led.every(Number.isFinite) || !dled.every(Number.isFinite) || !ledMu.every(Number.isFinite)) return undefined;
    return { x, z, dz, y, dy, led, dled, yMu, ledMu };
  };

  /**
   * A node at x, continued from node a: Newton starts from the cubic Hermite prediction between
   * a and b when b is given (error O(h⁴): usually one or two iterations), else from the tangent
   * at a; substeps from a if Newton fails from there.
   */
  const solveFrom = (a: Node, x: number, b?: Node): Node => {
    const pred = (from: Node, to: number): Float64Array => {
      const z = from.z.slice();
      for (let j = 0; j < B; j++) z[j] = z[j]! + (to - from.x) * from.dz[j]!;
      return z;
    };
    let n = solve(x, b ? between(a, b, x) : pred(a, x));
    for (let parts = 2; !n && parts <= 64; parts *= 2) {
      let last: Node | undefined = a;
      for (let k = 1; k <= parts && last; k++) last = solve(a.x + ((x - a.x) * k) / parts, pred(last, a.x + ((x - a.x) * k) / parts));
      n = last;
    }
    if (!n) throw new LinkConvergenceError(`tokenTable: harmonic balance of the token did not converge at an EMF of ${x.toPrecision(4)} V (order ${H}, ${N} samples)`, 0, [sys.residual(pred(a, x), x, r)]);
    return n;
  };

  const hw = new Float64Array(4); // the four Hermite weights of the last lookup (scratch)

  /** The harmonic coefficients at x by cubic Hermite interpolation between nodes a and b. */
  const between = (a: Node, b: Node, x: number): Float64Array => {
    hermiteBasis(a.x, b.x, x, hw);
    const h00 = hw[0]!, h10 = hw[1]!, h01 = hw[2]!, h11 = hw[3]!;
    const z = new Float64Array(B);
    for (let j = 0; j < B; j++) z[j] = h00 * a.z[j]! + h10 * a.dz[j]! + h01 * b.z[j]! + h11 * b.dz[j]!;
    return z;
  };

  const point = (): TokenPoint => ({ yRe: 0, yIm: 0, dyRe: 0, dyIm: 0, leds: new Float64Array(nl), yMuRe: 0, yMuIm: 0, ledsMu: new Float64Array(nl) });
  const tmp = point();

  /** Hermite interpolation between nodes a and b at x. */
  const hermite = (a: Node, b: Node, x: number, out: TokenPoint): void => {
    hermiteBasis(a.x, b.x, x, hw);
    const h00 = hw[0]!, h10 = hw[1]!, h01 = hw[2]!, h11 = hw[3]!;
    const hx = b.x - a.x;
    const t = (x - a.x) / hx;
    const t2 = t * t;
    const d00 = (6 * t2 - 6 * t) / hx;
    const d10 = 3 * t2 - 4 * t + 1;
    const d01 = (-6 * t2 + 6 * t) / hx;
    const d11 = 3 * t2 - 2 * t;
    out.yRe = h00 * a.y[0] + h10 * a.dy[0] + h01 * b.y[0] + h11 * b.dy[0];
    out.yIm = h00 * a.y[1] + h10 * a.dy[1] + h01 * b.y[1] + h11 * b.dy[1];
    out.dyRe = d00 * a.y[0] + d10 * a.dy[0] + d01 * b.y[0] + d11 * b.dy[0];
    out.dyIm = d00 * a.y[1] + d10 * a.dy[1] + d01 * b.y[1] + d11 * b.dy[1];
    for (let i = 0; i < nl; i++) out.leds[i] = h00 * a.led[i]! + h10 * a.dled[i]! + h01 * b.led[i]! + h11 * b.dled[i]!;
    // the first-order reflection terms: linear between the nodes (a small correction of a small term)
    out.yMuRe = (1 - t) * a.yMu[0] + t * b.yMu[0];
    out.yMuIm = (1 - t) * a.yMu[1] + t * b.yMu[1];
    for (let i = 0; i < nl; i++) out.ledsMu[i] = (1 - t) * a.ledMu[i]! + t * b.ledMu[i]!;
  };

  /** Refines [a, b] (both solved) until its midpoint agrees; appends the nodes after a, b last. */
  const refine = (a: Node, b: Node, depth: number, outNodes: Node[]): void => {
    const xm = 0.5 * (a.x + b.x);
    const m = solveFrom(a, xm, b);
    hermite(a, b, xm, tmp);
    const yAbs = Math.hypot(m.y[0], m.y[1]);
    const ey = Math.hypot(tmp.yRe - m.y[0], tmp.yIm - m.y[1]) / yAbs;
    let el = 0;
    for (let i = 0; i < nl; i++) el = Math.max(el, Math.abs(tmp.leds[i]! - m.led[i]!) / Math.max(Math.abs(m.led[i]!), floor));
    if ((ey <= ADMITTANCE_TOLERANCE && el <= LED_TOLERANCE) || depth >= MAX_DEPTH) {
      if (depth >= MAX_DEPTH && (ey > ADMITTANCE_TOLERANCE || el > LED_TOLERANCE)) {
        throw new LinkConvergenceError(`tokenTable: the token's response is not smooth enough to tabulate near an EMF of ${xm.toPrecision(4)} V`, depth, [ey, el]);
      }
      devY = Math.max(devY, ey);
      devI = Math.max(devI, el);
      outNodes.push(m, b);
      return;
    }
    refine(a, m, depth + 1, outNodes);
    refine(m, b, depth + 1, outNodes);
  };

  // the first node: x → 0 (the linear token); Y and the LED currents are even in x (slopes 0)
  const x0 = unitEmf();
  const first = solve(1e-9 * x0, new Float64Array(B));
  if (!first) throw new LinkConvergenceError("tokenTable: the token's small-signal solve failed", 0, [0]);
  nodes.push({ ...first, x: 0, dy: [0, 0], dled: new Float64Array(nl), led: new Float64Array(nl), yMu: [0, 0], ledMu: new Float64Array(nl) });

  /** Chunk k's upper end, V: x₀·2^(k−1) (chunk 0 is [0, x₀]). */
  const chunkTop = (k: number): number => x0 * 2 ** Math.max(0, k - 1);

  function buildChunk(): void {
    const a = nodes[nodes.length - 1]!;
    const top = chunkTop(chunks + 1);
    const b = solveFrom(a, top);
    const added: Node[] = [];
    refine(a, b, 0, added);
    nodes.push(...added);
    chunks++;
  }

  /** The EMF at which the linear token's tank reaches 0.5 V: the scale of the first chunk. */
  function unitEmf(): number {
    // open-circuit port voltage per volt of EMF at the fundamental, with the small-signal load
    const z0 = new Float64Array(B);
    sys.isFrozen[0] = 1;
    const g0 = new Float64Array(N);
    const i0 = new Float64Array(N);
    load.evaluate(new Float64Array(N), i0, g0);
    sys.frozen[0] = g0[0]!;
    sys.newton(z0, 1, 1e-12, 3);
    sys.isFrozen[0] = 0;
    const gain = Math.hypot(z0[1]!, z0[2]!);
    return gain > 0 && Number.isFinite(gain) ? 0.5 / gain : 1;
  }

  const at = (x: number, out: TokenPoint): void => {
    const u = Math.abs(x);
    while (nodes.length < 2 || nodes[nodes.length - 1]!.x < u) buildChunk();
    let lo = 0;
    let hi = nodes.length - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (nodes[mid]!.x <= u) lo = mid;
      else hi = mid;
    }
    hermite(nodes[lo]!, nodes[hi]!, u, out);
  };

  return {
    order: H,
    samples: N,
    ledLabels: labels,
    at,
    point,
    nodes: () => nodes.length,
    deviation: () => ({ admittance: devY, led: devI }),
  };
}

/**
 * The cubic Hermite weights at x between nodes x0 and x1, written into w: values h00 (at x0),
 * h01 (at x1) and slopes h10, h11 (scaled by x1 − x0), in the order [h00, h10, h01, h11].
 */
function hermiteBasis(x0: number, x1: number, x: number, w: Float64Array): void {
  const hx = x1 - x0;
  const t = (x - x0) / hx;
  const t2 = t * t;
  const t3 = t2 * t;
  w[0] = 2 * t3 - 3 * t2 + 1;
  w[1] = (t3 - 2 * t2 + t) * hx;
  w[2] = -2 * t3 + 3 * t2;
  w[3] = (t3 - t2) * hx;
}

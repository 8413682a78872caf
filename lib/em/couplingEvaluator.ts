/**
 * Fast mutual inductance and coupling factor of one coil pair over many poses (sweeps,
 * coverage maps): both coils' turns lumped into a few representative loops, with an error
 * estimate from two lumping orders and a fall-back to the exact filament sum.
 */
import * as z from "../zod.ts";
import { dimensionless, frequency, inductance, lazySchema } from "../schema.ts";
import { GEOMETRY_LIMITS, checkCoil as checkCoilArg, optionsArg } from "./inputs.ts";
import { aOverRhoKernel } from "./loopKernel.ts";
import { filamentMutual, filamentProbe } from "./filamentMutual.ts";
import { conductorRadius } from "./mutualInductance.ts";
import { selfInductance } from "./selfInductance.ts";
import { poseFrame, type Frame } from "./frames.ts";
import { coaxialTurns, groupLevels, momentLumps, type Lumps, type Turn } from "./turnLumps.ts";
import { gaussLumps, gaussLumpSource, type GaussLumpSource } from "./gaussLumps.ts";
import { polygonCoupling, type PolygonCouplingResult } from "./polygonCoupling.ts";
import type { Coil, Filament, Pose } from "./types.ts";

/** Options of {@link couplingEvaluator}. */
export interface CouplingEvaluatorOptions {
  /** relative error target of M, default 1e-3 */
  readonly relTol?: number;
  /**
   * absolute error floor, H, for poses where M is small (near its zero crossings); default
   * 1e-2·relTol·M₀, where M₀ is the lumped coils' mutual inductance with the receiver at the
   * transmitter's centre (the natural maximum of a coverage map)
   */
  readonly absTol?: number;
  /** frequency for the self-inductances used by coupling(), Hz (default DC) */
  readonly frequency?: number;
}

/** One evaluation with its provenance. */
export interface CouplingEvaluation {
  /** M, H */
  readonly mutual: number;
  /** k = M/√(L₁L₂) */
  readonly coupling: number;
  /** error estimate of M, H */
  readonly error: number;
  /** "lumped" (representative loops) or "exact" (every filament pair) */
  readonly method: "lumped" | "exact";
  /** e.g. overlapping conductors */
  readonly warnings: readonly string[];
}

/** A coupling evaluator configured for one transmitter–receiver pair. */
export interface CouplingEvaluator {
  /** M for the given poses, H (never throws on overlap: see evaluate().warnings) */
  mutual(poseTx: Pose, poseRx: Pose): number;
  /** k = M/√(L₁L₂) for the given poses */
  coupling(poseTx: Pose, poseRx: Pose): number;
  /** M, k, the error estimate, the method used and warnings */
  evaluate(poseTx: Pose, poseRx: Pose): CouplingEvaluation;
  /** self-inductances used by coupling(), H */
  readonly selfTx: number;
  readonly selfRx: number;
  /** how many evaluations used each method so far */
  readonly stats: { lumped: number; exact: number };
}

/** Most trapezoidal nodes per ring (8, 16, … this). */
const MAX_NODES = 256;
/**
 * The trapezoidal nodes added at each doubling, by node count N = 8·2^i: all 8 nodes for N = 8,
 * the N/2 odd ones after that; cos, sin and weight (1 each). The `half` tables serve a ring
 * whose integrand is mirror-symmetric, f(−θ) = f(θ): only the nodes with 0 ≤ θ ≤ π, the ones
 * strictly inside weighted 2. Computed once at load, never written again.
 */
interface NodeTable { readonly c: Float64Array; readonly s: Float64Array; readonly w: Float64Array }
const nodeTable = (n: number, half: boolean): NodeTable => {
  const first = n === 8;
  const m = first ? 8 : n / 2;
  const t: number[] = [];
  for (let j = 0; j < m; j++) t.push(first ? (2 * Math.PI * j) / 8 : ((2 * j + 1) * Math.PI) / m);
  const keep = half ? t.filter((x) => x <= Math.PI + 1e-12) : t;
  return {
    c: Float64Array.from(keep, Math.cos),
    s: Float64Array.from(keep, Math.sin),
    w: Float64Array.from(keep, (x) => (!half || x === 0 || Math.abs(x - Math.PI) < 1e-12 ? 1 : 2)),
  };
};
const NODES: ReadonlyMap<number, NodeTable> = new Map([8, 16, 32, 64, 128, 256].map((n) => [n, nodeTable(n, false)] as const));
const HALF_NODES: ReadonlyMap<number, NodeTable> = new Map([8, 16, 32, 64, 128, 256].map((n) => [n, nodeTable(n, true)] as const));

/** What one ring integral returns: the evaluator's explicit workspace (one per evaluator). */
interface RingResult {
  /** ∮A·dl over the ring from the lumps t1, and from t0 alongside */
  v1: number;
  v0: number;
  /** the rule's own error estimate (∞ when it did not converge) */
  err: number;
  /** closest node-to-lump-wire distance², m² */
  minA2: number;
}

/** Safety factor on the order-1 lumping error estimates (checked against the exact sum in tests and bench). */
const LUMP_SAFETY = 3;
/** Level B keeps the transmitter lumped when its lumping error is below this share of the tolerance. */
const TX_LUMP_SHARE = 0.25;
/** Share of relTol given to each filament pair on the exact path (their errors add up). */
const PAIR_SHARE = 0.3;
/** Level G is tried only where its predicted convergence rate per order is at most this. */
const G_MAX_RATE = 0.5;
/** Level G's largest number of transmitter × receiver lumps (beyond it, level B is cheaper). */
const G_BUDGET = 400;
/** Nodes per receiver turn when looking for overlapping conductors, and their cos/sin (read only). */
const OVERLAP_NODES = 256;
const OVERLAP_COS = Float64Array.from({ length: OVERLAP_NODES }, (_, j) => Math.cos((2 * Math.PI * j) / OVERLAP_NODES));
const OVERLAP_SIN = Float64Array.from({ length: OVERLAP_NODES }, (_, j) => Math.sin((2 * Math.PI * j) / OVERLAP_NODES));
/** Lumps are trusted only while the nearest wire is farther than GUARD × the lumped coil's extent. */
const GUARD = 2;

/**
 * ∮ A_tx · dl over one receiver loop (tx frame: centre c, unit normal n, radius r), with A_tx
 * the sum over the transmitter's lumps `t1` (and separately over `t0`), by the nested periodic
 * trapezoidal rule (8, 16, … 256 nodes; stop from 16 nodes on when the error estimate of T_2N,
 * |T_2N − T_N|² / |T_N − T_N/2| (or |T_2N − T_N| while the differences grow or before 32 nodes),
 * is ≤ qtol·scale).
 * The ring's θ = 0 lies along the horizontal unit vector (px, py, 0) projected onto its plane
 * (or ẑ projected, when n is nearly along (px, py)); when `mirror` is true the loop is symmetric about the vertical plane through
 * (px, py, 0) and the transmitter's axis (n and c in that plane), f(−θ) = f(θ), and only the
 * nodes 0 ≤ θ ≤ π are evaluated — the same sums at half the cost.
 * Results in `ring`: v1 (over t1), v0 (over t0), err, minA2 (closest node-to-lump-wire distance²).
 */
function ringIntegral(
  cx: number, cy: number, cz: number, nx: number, ny: number, nz: number, r: number, px: number, py: number, mirror: boolean,
  t1: Lumps, t0: Lumps | undefined, qtol: number, floor: number, ring: RingResult,
): void {
  // θ = 0 along (px, py, 0) projected onto the ring's plane, or along ẑ projected when n is
  // nearly horizontal along (px, py): both lie in the mirror plane
  const pn = px * nx + py * ny;
  let ux: number, uy: number, uz: number;
  if (Math.abs(pn) < 0.9) { ux = px - pn * nx; uy = py - pn * ny; uz = -pn * nz; } else { ux = -nz * nx; uy = -nz * ny; uz = 1 - nz * nz; }
  const un = r / Math.sqrt(ux * ux + uy * uy + uz * uz);
  ux *= un; uy *= un; uz *= un; // r·u
  const vx = ny * uz - nz * uy, vy = nz * ux - nx * uz, vz = nx * uy - ny * ux; // r·v
  const n1 = t1.r.length;
  let minA2 = Infinity;
  let maxA2 = 0;
  let s1 = 0, s0 = 0, prev = 0, prevDiff = 0, n = 8;
  for (;;) {
    const { c, s, w } = (mirror ? HALF_NODES : NODES).get(n)!;
    let abs = 0;
    for (let j = 0; j < c.length; j++) {
      const co = c[j]!, si = s[j]!, wj = w[j]!;
      const wx = cx + co * ux + si * vx, wy = cy + co * uy + si * vy, wz = cz + co * uz + si * vz;
      const tx = -si * ux + co * vx, ty = -si * uy + co * vy;
      const rho = Math.sqrt(wx * wx + wy * wy);
      const geo = wx * ty - wy * tx; // (ẑ × w)·dP/dt
      let a1 = 0;
      for (let k = 0; k < n1; k++) {
        const dz = wz - t1.z[k]!;
        const dm = t1.r[k]! - rho;
        const z2 = dz * dz;
        const al2 = dm * dm + z2;
        if (al2 < minA2) minA2 = al2;
        if (al2 > maxA2) maxA2 = al2;
        if (al2 === 0) { ring.minA2 = 0; ring.v1 = ring.v0 = 0; ring.err = Infinity; return; }
        a1 += t1.w[k]! * aOverRhoKernel(t1.r[k]!, rho, z2, al2);
      }
      const f1 = wj * a1 * geo;
      s1 += f1;
      abs += Math.abs(f1);
      if (t0) {
        const dz = wz - t0.z[0]!;
        const dm = t0.r[0]! - rho;
        const al2 = dm * dm + dz * dz;
        if (al2 > 0) s0 += wj * t0.w[0]! * aOverRhoKernel(t0.r[0]!, rho, dz * dz, al2) * geo;
      }
    }
    const v = ((2 * Math.PI) / n) * s1;
    if (n > 8) {
      const diff = Math.abs(v - prev);
      // error of T_2N: |T_2N − T_N|·(|T_2N − T_N| / |T_N − T_N/2|) — the last ratio per doubling
      // kept, not squared as a geometric rate would; no credit before 16 nodes, where the
      // ratio was seen to mislead (a flat-spiral pair: 150× low with the squared form)
      const est = prevDiff > diff ? (diff * diff) / prevDiff : diff;
      const scale = Math.max(Math.abs(v), 1e-3 * ((2 * Math.PI) / (n / 2)) * abs, floor);
      // converged only when the node spacing 2πr/N is also below the closest approach to a
      // lump wire (a narrower peak can hide between the nodes of both rules)
      // (where the distance varies along the ring by more than 2×; per lump the variation is larger still)
      const resolved = maxA2 <= 4 * minA2 || n * n * minA2 >= 4 * Math.PI * Math.PI * r * r;
      const converged = n >= 16 && est <= qtol * scale && resolved;
      if (converged || n >= MAX_NODES) {
        ring.v1 = v;
        ring.v0 = ((2 * Math.PI) / n) * s0;
        ring.err = converged ? est : Infinity;
        ring.minA2 = minA2;
        return;
      }
      if (n >= 16) prevDiff = diff;
    }
    prev = v;
    n *= 2;
  }
}

/** The rotation of a pose with neither axis nor spin (read only, never written). */
const IDENTITY = Float64Array.of(1, 0, 0, 0, 1, 0, 0, 0, 1);

/**
 * poseFrame without its allocations for the commonest pose, `{ position: [x, y, z] }` of finite
 * numbers with no axis or the axis [0, 0, a > 0] and no spin (poseFrame's rotation is then the
 * identity exactly); every other pose, and every bad one, goes through poseFrame.
 */
/** A coordinate within ±GEOMETRY_LIMITS.maxLength (a module function: frameOf runs per pose). */
function inRange(x: unknown): boolean {
  return typeof x === "number" && x >= -GEOMETRY_LIMITS.maxLength && x <= GEOMETRY_LIMITS.maxLength;
}

function frameOf(pose: Pose, field: string): Frame {
  if (pose !== null && typeof pose === "object" && (pose.spin === undefined || pose.spin === 0)) {
    const a = pose.axis;
    if (a !== undefined && !(Array.isArray(a) && a.length === 3 && a[0] === 0 && a[1] === 0 && a[2] > 0 && a[2] < Infinity)) return poseFrame(pose, "couplingEvaluator", field);
    const p = pose.position;
    let known = true;
    for (const k in pose) if (k !== "position" && k !== "axis" && k !== "spin") known = false;
    if (known && Array.isArray(p) && p.length === 3 && inRange(p[0]) && inRange(p[1]) && inRange(p[2])) return { R: IDENTITY, position: p };
  }
  // everything else (a typo, a quantity string, a tilt) through the full check
  return poseFrame(pose, "couplingEvaluator", field);
}

/** The options: strict keys (a typo names the nearest one), quantity strings ("200 kHz", "1 nH"). */
const CouplingOptionsSpec = lazySchema(() =>
  z.strictObject({
    relTol: dimensionless({ positive: true, max: 0.5 }).optional(),
    absTol: inductance({ nonNegative: true, max: 1 }).optional(),
    frequency: frequency({ nonNegative: true, max: 1e12 }).optional(),
  }),
);
/** options already in SI: known keys, numbers in range (the fast path of optionsArg) */
const siOptions = (o: Record<string, unknown>): boolean => {
  for (const k in o) if (k !== "relTol" && k !== "absTol" && k !== "frequency") return false;
  const r = o["relTol"], a = o["absTol"], f = o["frequency"];
  return (r === undefined || (typeof r === "number" && r > 0 && r <= 0.5)) && (a === undefined || (typeof a === "number" && a >= 0 && a <= 1)) && (f === undefined || (typeof f === "number" && f >= 0 && f <= 1e12));
};

/**
 * A coupling evaluator for one transmitter–receiver pair, built once and evaluated at many
 * poses — much faster than pairing every filament (a 20-turn transmitter and a 30-turn token:
 * 600 filament pairs per pose) and agreeing with it to `relTol`.
 *
 * Method. A coil made of coaxial circles (any roundCoil, solenoid or circular flatSpiral) is
 * lumped into representative loops by matching moments of its turn distribution in (r², z):
 * order 0 is one loop at the means; order 1 the tensor product of two-point Gauss rules in u = r²
 * and z (turnLumps.ts: exact for every moment of degree ≤ 3 in each coordinate).
 * M is the line integral of the transmitter lumps' closed-form vector potential (Smythe 1950
 * §7.10) around the receiver lumps — Stokes' form of integrating the transmitter's field over
 * the receiver's discs — by the nested periodic trapezoidal rule (its own error estimate).
 *
 * Level A: both coils at order 1. Lumping error falls by (extent/D)² per order (D the
 * smallest distance from a receiver node to a transmitter lump wire), so each coil's order-1
 * error is estimated as 3·(extent/D)²·|M(order 1) − M(order 0)|. Accepted when the sum of
 * estimates ≤ max(relTol·|M|, absTol) and D > 2 extents.
 * Level B (near the winding, near zero crossings): every transmitter turn exact; the receiver
 * refined as a bisection tree of turn groups (1, 2, 4, … loops, the last one loop per turn:
 * exact), the error of each level by Richardson's rule |M_ℓ − M_{ℓ−1}|/3 (error ∝ group size²)
 * times a safety factor 3.
 * Level C: per-pair adaptive line integrals (mutualInductance's method) where a receiver turn
 * grazes a transmitter wire. Where one coil is made of polygons (rectLoop, rectSpiral, PCB
 * traces) and the other of polygons or coaxial circles, the straight-conductor fast path of
 * polygonCoupling.ts takes the place of levels A–B (closed-form segment formulas, the same
 * lumping and error estimate) and level C remains its fall-back. Other coils (tilted or
 * off-centre circles, mixed filaments) always use level C.
 *
 * @param tx transmitter coil (own frame). @param rx receiver coil (own frame).
 * @param options `{ relTol? = 1e-3, absTol? (H), frequency? (Hz, for L₁, L₂) }`.
 * @returns `{ mutual(poseTx, poseRx), coupling(poseTx, poseRx), evaluate(poseTx, poseRx), selfTx, selfRx, stats }`.
 * @example const ev = couplingEvaluator(tx, token); ev.coupling({ position: [0,0,0] }, { position: [0.01, 0, 0.02] })
 * @see mutualInductance (one pose, exact), couplingFactor
 */
export function couplingEvaluator(tx: Coil, rx: Coil, options: CouplingEvaluatorOptions = {}): CouplingEvaluator {
  // One function on purpose (≈ 300 lines): a factory whose closures share the coils' lump levels, Gauss tables and per-pose scratch
  // (levels A–C below); split into modules they would pass a dozen arrays on every pose of a coverage map.
  checkCoilArg(tx, "tx", "couplingEvaluator");
  checkCoilArg(rx, "rx", "couplingEvaluator");
  options = optionsArg(CouplingOptionsSpec, options, "options", "couplingEvaluator", siOptions) as CouplingEvaluatorOptions;
  const relTol = options.relTol ?? 1e-3;
  // the self-inductances only when coupling() or selfTx/selfRx is first asked for (a 120-turn
  // token's costs more than a thousand poses; mutual-only users such as solveLink never need them)
  const fOpt = options.frequency === undefined ? {} : { frequency: options.frequency };
  let selves: { tx: number; rx: number; norm: number } | undefined;
  const self = (): { tx: number; rx: number; norm: number } => {
    if (selves === undefined) {
      const a = selfInductance(tx, fOpt), b = selfInductance(rx, fOpt);
      selves = { tx: a, rx: b, norm: 1 / Math.sqrt(a * b) };
    }
    return selves;
  };
  const txTurns = coaxialTurns(tx.filaments);
  const rxTurns = coaxialTurns(rx.filaments);
  const clearance = conductorRadius(tx.conductor) + conductorRadius(rx.conductor);
  const stats = { lumped: 0, exact: 0 };
  const fast = txTurns !== undefined && rxTurns !== undefined;
  // straight conductors: closed-form fast path (polygonCoupling.ts), exact sum where it declines
  const poly = fast ? undefined : polygonCoupling(tx, rx, relTol, options.absTol);
  const polyOut: PolygonCouplingResult = { mutual: 0, error: 0, method: "exact", minDist2: Infinity };
  const txLevels = fast ? groupLevels(txTurns) : [];
  const rxLevels = fast ? groupLevels(rxTurns) : [];
  const t0 = txLevels[0]!;
  const t1 = fast ? momentLumps(txTurns) : t0;
  const rx0 = rxLevels[0]!;
  const rx1 = fast ? momentLumps(rxTurns) : rx0;
  const tExact = txLevels[txLevels.length - 1]!;
  const rxTotal = fast ? Math.abs(rxLevels[0]!.w[0]!) : 1;
  const txBox = fast ? turnBox(txTurns) : turnBox([]);
  // Gauss lumps of both coils by order (level G), built on first use
  const txG: GaussLumpSource | undefined = fast ? gaussLumpSource(txTurns, t0.extent) : undefined;
  const rxG: GaussLumpSource | undefined = fast ? gaussLumpSource(rxTurns, rx0.extent) : undefined;
  // level A's order-1 lumps keep the moments of a product distribution only (layers with the
  // same turn heights): a partly filled last layer goes to level G, which keeps each layer
  const lumpable = (txG?.product ?? false) && (rxG?.product ?? false);
  // Gauss lumps by order (pr, pz), built on first use and shared by every later pose
  const gaussCache = new Map<string, { tx: Lumps; rx: Lumps }>();
  const gaussPair = (pr: number, pz: number): { tx: Lumps; rx: Lumps } => {
    const key = `${pr},${pz}`;
    let g = gaussCache.get(key);
    if (g === undefined) {
      g = { tx: gaussLumps(txG!, pr, pz), rx: gaussLumps(rxG!, pr, pz) };
      gaussCache.set(key, g);
    }
    return g;
  };

  // this evaluator's workspace: the last ring integral's results
  const ring: RingResult = { v1: 0, v0: 0, err: 0, minA2: Infinity };

  let absTol = options.absTol ?? 0;
  if (options.absTol === undefined && fast) {
    ringIntegral(0, 0, t0.z[0]!, 0, 0, 1, rxLevels[0]!.r[0]!, 1, 0, true, t0, undefined, 1e-8, 0, ring);
    absTol = 1e-2 * relTol * Math.abs(ring.v1 * rxLevels[0]!.w[0]!);
  }
  // ring quadrature target: a tenth of the overall tolerance (its own estimate joins the error sum)
  const qtol = 0.1 * relTol;

  let lastError = 0;
  let lastMethod: "lumped" | "exact" = "exact";
  let lastWarnings: string[] = [];

  // receiver origin and axis in the transmitter's frame (set per pose)
  let ox = 0, oy = 0, oz = 0, nx = 0, ny = 0, nz = 1;
  // the rings' θ = 0 direction (horizontal unit vector) and whether the pose is mirror-symmetric
  let px = 1, py = 0, mirror = false;
  const sums = { m: 0, m0: 0, err: 0, minA2: Infinity };
  /** Σ over the receiver lumps `rl` of w·∮A·dl, transmitter lumps `tl` (and `tl0` alongside). */
  const sumRings = (rl: Lumps, tl: Lumps, tl0: Lumps | undefined): void => {
    let m = 0, m0 = 0, err = 0, minA2 = Infinity;
    const floor = absTol / rxTotal;
    for (let k = 0; k < rl.r.length; k++) {
      const h = rl.z[k]!;
      ringIntegral(ox + h * nx, oy + h * ny, oz + h * nz, nx, ny, nz, rl.r[k]!, px, py, mirror, tl, tl0, qtol, floor, ring);
      m += rl.w[k]! * ring.v1;
      m0 += rl.w[k]! * ring.v0;
      err += Math.abs(rl.w[k]!) * ring.err;
      if (ring.minA2 < minA2) minA2 = ring.minA2;
    }
    sums.m = m; sums.m0 = m0; sums.err = err; sums.minA2 = minA2;
  };

  const exact = (fTx: Frame, fRx: Frame): number => {
    // receiver filaments in the transmitter's frame: x_tx = R_txᵀ(R_rx p + p_rx − p_tx)
    const Rt = fTx.R, Rr = fRx.R;
    const M = new Float64Array(9);
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) M[3 * i + j] = Rt[i]! * Rr[j]! + Rt[3 + i]! * Rr[3 + j]! + Rt[6 + i]! * Rr[6 + j]!;
    const d = [fRx.position[0] - fTx.position[0], fRx.position[1] - fTx.position[1], fRx.position[2] - fTx.position[2]];
    const t = [0, 1, 2].map((i) => Rt[i]! * d[0]! + Rt[3 + i]! * d[1]! + Rt[6 + i]! * d[2]!);
    const map = (p: readonly number[]): [number, number, number] => [
      M[0]! * p[0]! + M[1]! * p[1]! + M[2]! * p[2]! + t[0]!,
      M[3]! * p[0]! + M[4]! * p[1]! + M[5]! * p[2]! + t[1]!,
      M[6]! * p[0]! + M[7]! * p[1]! + M[8]! * p[2]! + t[2]!,
    ];
    const dir = (p: readonly number[]): [number, number, number] => {
      const q = [M[0]! * p[0]! + M[1]! * p[1]! + M[2]! * p[2]!, M[3]! * p[0]! + M[4]! * p[1]! + M[5]! * p[2]!, M[6]! * p[0]! + M[7]! * p[1]! + M[8]! * p[2]!];
      const l = Math.hypot(q[0]!, q[1]!, q[2]!);
      return [q[0]! / l, q[1]! / l, q[2]! / l];
    };
    // each pair to PAIR_SHARE·relTol of its own value: the pair errors add up to at most
    // PAIR_SHARE·relTol·Σ|M_pair|, which is the error this path reports
    const pairTol = PAIR_SHARE * relTol;
    let sum = 0;
    let sumAbs = 0;
    let min2 = Infinity;
    const probe = filamentProbe();
    for (const g of rx.filaments) {
      const gw: Filament = g.kind === "circle"
        ? { kind: "circle", center: map(g.center), axis: dir(g.axis), radius: g.radius, turns: g.turns }
        : { kind: "path", points: g.points.map(map), turns: g.turns };
      for (const f of tx.filaments) {
        const ft: Filament = f.kind === "circle" ? { ...f, axis: dir0(f.axis) } : f;
        const mp = f.turns * g.turns * filamentMutual(ft, gw, pairTol, probe);
        sum += mp;
        sumAbs += Math.abs(mp);
        if (probe.minDistance2 < min2) min2 = probe.minDistance2;
      }
    }
    finish(sum, pairTol * sumAbs, "exact", min2);
    return sum;
  };

  const finish = (m: number, err: number, method: "lumped" | "exact", minA2: number): void => {
    lastError = err;
    lastMethod = method;
    lastWarnings = [];
    if (Math.sqrt(minA2) < clearance) {
      lastWarnings.push(
        `the coils' conductors overlap at this pose (filaments ${(Math.sqrt(minA2) * 1e3).toPrecision(3)} mm apart, wire radii sum ${(clearance * 1e3).toPrecision(3)} mm): the filament value is not physical`,
      );
    }
    stats[method]++;
    void m;
  };

  // made once, not per pose: a closure per call costs far more than its test under tsx (each gets a name set)
  const accept = (e: number, m: number): boolean => e <= Math.max(relTol * Math.abs(m), absTol);
  const mutual = (poseTx: Pose, poseRx: Pose): number => {
    // one piece on purpose: the per-pose choice among levels A, B and C, cheapest first, reads in order
    const fTx = frameOf(poseTx, "poseTx");
    const fRx = frameOf(poseRx, "poseRx");
    if (!fast) {
      if (poly?.evaluate(fTx, fRx, polyOut)) {
        finish(polyOut.mutual, polyOut.error, polyOut.method, polyOut.minDist2);
        return polyOut.mutual;
      }
      return exact(fTx, fRx);
    }
    const Rt = fTx.R, Rr = fRx.R;
    const nW0 = Rr[2]!, nW1 = Rr[5]!, nW2 = Rr[8]!;
    nx = Rt[0]! * nW0 + Rt[3]! * nW1 + Rt[6]! * nW2;
    ny = Rt[1]! * nW0 + Rt[4]! * nW1 + Rt[7]! * nW2;
    nz = Rt[2]! * nW0 + Rt[5]! * nW1 + Rt[8]! * nW2;
    const dx = fRx.position[0] - fTx.position[0], dy = fRx.position[1] - fTx.position[1], dz = fRx.position[2] - fTx.position[2];
    ox = Rt[0]! * dx + Rt[3]! * dy + Rt[6]! * dz;
    oy = Rt[1]! * dx + Rt[4]! * dy + Rt[7]! * dz;
    oz = Rt[2]! * dx + Rt[5]! * dy + Rt[8]! * dz;
    // the vertical plane through the transmitter's axis and the receiver's centre is a mirror
    // plane of the pose when the receiver's axis lies in it too (any flat token, any tilt
    // towards or away from the axis): rings start in that plane and use half the nodes
    const rho0 = Math.sqrt(ox * ox + oy * oy), nh = Math.sqrt(nx * nx + ny * ny);
    if (rho0 > 0) { px = ox / rho0; py = oy / rho0; } else if (nh > 0) { px = nx / nh; py = ny / nh; } else { px = 1; py = 0; }
    mirror = px * ny - py * nx === 0;

    // level A, combination form (the sparse-grid combination technique: Griebel, Schneider &
    // Zenger 1992): M ≈ M₀₁ + M₁₀ − M₀₀ from the receiver's order-0 ring against both transmitter
    // orders and the receiver's order-1 rings against the transmitter's order-0 loop — each coil's
    // order-1 correction applied once, for 1 + |t1| + |rx1| kernel calls per node instead of
    // |rx1|·(|t1| + 1) + |t1|. It leaves out the cross term M₁₁ − M₁₀ − M₀₁ + M₀₀ (one coil's
    // correction seen through the other's lumping), estimated as the larger correction times the
    // larger lumping factor plus the product of both factors times M (measured over the bench's
    // map and a 10 × 10 token grid: at most 0.33 of this estimate, 0.16 of the tolerance).
    sumRings(rx0, t1, t0);
    const m01 = sums.m, m00 = sums.m0;
    let errA = sums.err, minA2 = sums.minA2;
    sumRings(rx1, t0, undefined);
    const m10 = sums.m;
    errA += sums.err;
    if (sums.minA2 < minA2) minA2 = sums.minA2;
    const D = Math.sqrt(minA2);
    // order-1 lumping error ≈ (extent/D)²·(order-0 error) for each coil, with a safety factor
    const lRx = Math.min(1, (LUMP_SAFETY * rx0.extent * rx0.extent) / (D * D));
    const lTx = Math.min(1, (LUMP_SAFETY * t0.extent * t0.extent) / (D * D));
    const dTx = Math.abs(m01 - m00), dRx = Math.abs(m10 - m00);
    const lumpOk = lumpable && D > GUARD * Math.max(rx0.extent, t0.extent);
    const mC = m01 + m10 - m00;
    // a floor on each coil's order-1 error that does not lean on its order-0 error, which can
    // vanish by accident (M with an inflection across the turns): (extent/D)⁴·|M|, the size of the
    // first term the order-1 rule leaves out (a solenoid beside a round token: 2.1× low without it)
    const gRx = (rx0.extent * rx0.extent) / (D * D), gTx = (t0.extent * t0.extent) / (D * D);
    const eFloor = (gRx * gRx + gTx * gTx) * Math.abs(mC);
    const eC = dRx * lRx + dTx * lTx + Math.max(dTx, dRx) * Math.max(lRx, lTx) + lRx * lTx * Math.abs(mC) + eFloor + errA;
    if (lumpOk && accept(eC, mC)) {
      finish(mC, eC, "lumped", minA2);
      return mC;
    }
    // level A, full tensor form: both coils at order 1 — tried only where each coil's own
    // lumping estimate (which the full form keeps) is within twice the tolerance; elsewhere the
    // combination value stands in for it below (overlap answer, level B's lumped transmitter)
    let mA = mC, eTx = dTx * lTx, errA1 = errA;
    if (lumpOk && dRx * lRx + dTx * lTx + errA <= 2 * Math.max(relTol * Math.abs(mC), absTol)) {
      sumRings(rx1, t1, undefined);
      mA = sums.m;
      errA1 = sums.err + errA;
      if (sums.minA2 < minA2) minA2 = sums.minA2;
      const eRx = Math.abs(mA - m01) * lRx;
      eTx = Math.abs(mA - m10) * lTx;
      // the combination and tensor forms differ by the cross term M₁₁ − M₁₀ − M₀₁ + M₀₀; where a
      // coil's order-0 error vanishes by accident (M has an inflection across its turns) the
      // (extent/D)² ratio estimates miss the order-1 error and this difference shows it (a
      // solenoid under a spiral token: 14× low without it, in the seeded sweep)
      const eA = eRx + eTx + errA1 + Math.abs(mA - mC) + eFloor;
      if (accept(eA, mA)) {
        finish(mA, eA, "lumped", minA2);
        return mA;
      }
    }
    // overlapping conductors (a receiver turn closer to a transmitter turn than the wire radii
    // sum): no filament value is physical, so the level-A value with its warning, at once — the
    // levels below would spend their whole budget on a grazing ring
    const d2 = closestApproach2(txBox, rxTurns!, ox, oy, oz, nx, ny, nz, clearance);
    if (Math.sqrt(d2) < clearance) {
      finish(mA, Math.abs(mA - m01) + Math.abs(mA - m10) + errA1, "lumped", d2);
      return mA;
    }
    // level G: both coils as Gauss rules of their turn distributions (gaussLumps.ts), refined
    // one side at a time (radial or axial order + 1, whichever side's error estimate is larger).
    // A p-point Gauss rule of a function analytic within distance d of its interval (half-length
    // h) converges like q^p with q = ρ⁻², ρ = d/h + √(1 + (d/h)²) (the Bernstein ellipse of
    // semi-minor axis d/h; Trefethen 2008, SIAM Rev. 50(1), Thm. 4.5), so a side's remaining
    // error after a refinement that changed M by δ (the one before by δ′) is at most
    // max(δ, q·δ′)/(1 − q): the measured change, or what the rate allows when it fell suspiciously
    // fast. d is the closest approach of the ring nodes to the lump wires, h the larger coil's
    // half-span on that side; level G is skipped where the rate is too slow to pay (q > G_MAX_RATE).
    const hR = Math.max(txG?.halfSpanR ?? 0, rxG?.halfSpanR ?? 0), hZ = Math.max(txG?.halfSpanZ ?? 0, rxG?.halfSpanZ ?? 0);
    const rate = (h: number): number => {
      if (h === 0) return 0;
      const x = D / h, rho = x + Math.sqrt(1 + x * x);
      return 1 / (rho * rho);
    };
    const qR = rate(hR), qZ = rate(hZ);
    if (txG && rxG && qR <= G_MAX_RATE && qZ <= G_MAX_RATE) {
      const capR = Math.max(txG.capR, rxG.capR), capZ = Math.max(txG.capZ, rxG.capZ);
      let pr = 1, pz = 1;
      const g1 = gaussPair(pr, pz);
      sumRings(g1.rx, g1.tx, undefined);
      let m = sums.m;
      const side = { r: { last: Infinity, prev: Infinity, n: 0, q: qR }, z: { last: Infinity, prev: Infinity, n: 0, q: qZ } };
      const estimate = (t: { last: number; prev: number; n: number; q: number }): number =>
        t.n < 2 || t.last > t.prev ? Infinity : Math.max(t.last, t.q * t.prev) / (1 - t.q);
      while (Number.isFinite(sums.err)) {
        const doneR = pr >= capR, doneZ = pz >= capZ;
        const eR = doneR ? 0 : estimate(side.r), eZ = doneZ ? 0 : estimate(side.z);
        const e = eR + eZ + sums.err;
        if (accept(e, m)) {
          finish(m, e, doneR && doneZ ? "exact" : "lumped", sums.minA2);
          return m;
        }
        if (doneR && doneZ) break;
        // refine the side with the larger estimate (an unrefined side counts as infinite; ties: z)
        const refineZ = doneR || (!doneZ && (side.z.n <= side.r.n ? eZ >= eR : eZ > eR));
        if (refineZ) pz++; else pr++;
        const g = gaussPair(pr, pz);
        if (g.tx.r.length * g.rx.r.length > G_BUDGET) break;
        sumRings(g.rx, g.tx, undefined);
        const t = refineZ ? side.z : side.r;
        t.prev = t.last;
        t.last = Math.abs(sums.m - m);
        t.n++;
        m = sums.m;
      }
    }
    // level B: the receiver refined group by group, against the transmitter's order-1 lumps when
    // their own error estimate is well inside the tolerance and they are far from every ring
    // (a neighbouring token: only the receiver's lumping fails), else against every turn
    const txLumped = lumpable && D > GUARD * t0.extent && eTx <= TX_LUMP_SHARE * Math.max(relTol * Math.abs(mA), absTol);
    const tB = txLumped ? t1 : tExact;
    const eB = txLumped ? eTx : 0;
    const far = (a2: number, extent: number): boolean => Math.sqrt(a2) > GUARD * (txLumped ? Math.max(extent, t0.extent) : extent);
    sumRings(rxLevels[0]!, tB, undefined);
    let prev = sums.m;
    for (let l = 1; l < rxLevels.length; l++) {
      // a ring that the trapezoidal rule cannot resolve grazes a wire; finer levels put rings
      // closer to the real turns, so go straight to the per-pair adaptive sum
      if (!Number.isFinite(sums.err)) break;
      const rl = rxLevels[l]!;
      sumRings(rl, tB, undefined);
      const last = l === rxLevels.length - 1;
      // Richardson's |M_ℓ − M_{ℓ−1}|/3 with a safety factor 3: |M_ℓ − M_{ℓ−1}|
      const e = (last ? sums.err : Math.abs(sums.m - prev) + sums.err) + eB;
      if (far(sums.minA2, rl.extent) && accept(e, sums.m)) {
        finish(sums.m, e, last && !txLumped ? "exact" : "lumped", sums.minA2);
        return sums.m;
      }
      prev = sums.m;
    }
    // the ring quadrature did not converge (a receiver turn grazes a transmitter wire without
    // touching it): per-pair adaptive, to relTol
    return exact(fTx, fRx);
  };

  return {
    mutual,
    coupling: (a, b) => mutual(a, b) * self().norm,
    evaluate: (a, b) => {
      const m = mutual(a, b);
      // k on first read: the self-inductances are computed only when someone asks for k
      return { mutual: m, get coupling() { return m * self().norm; }, error: lastError, method: lastMethod, warnings: lastWarnings };
    },
    get selfTx() {
      return self().tx;
    },
    get selfRx() {
      return self().rx;
    },
    stats,
  };
}

/** A coil's coaxial turns with their bounding box in (r, z), for closestApproach2. */
interface TurnBox { readonly turns: readonly Turn[]; readonly rMin: number; readonly rMax: number; readonly zMin: number; readonly zMax: number }
function turnBox(turns: readonly Turn[]): TurnBox {
  return {
    turns,
    rMin: Math.min(...turns.map((t) => t.r)), rMax: Math.max(...turns.map((t) => t.r)),
    zMin: Math.min(...turns.map((t) => t.z)), zMax: Math.max(...turns.map((t) => t.z)),
  };
}

/**
 * Smallest squared distance, m², between the receiver's turns (sampled at OVERLAP_NODES points
 * each; its frame: origin o, axis n in the transmitter's frame) and the transmitter's turns
 * (coaxial circles r, z), where it is below `within`²; points farther than `within` from the
 * transmitter turns' bounding box in (ρ, z) are skipped (they cannot be closer to a turn), so the
 * result is exact below `within` and some value ≥ `within`² otherwise. Sampling can only
 * over-estimate the distance, so a value below the conductors' clearance proves an overlap.
 */
function closestApproach2(tx: TurnBox, rx: readonly Turn[], ox: number, oy: number, oz: number, nx: number, ny: number, nz: number, within: number): number {
  let ux: number, uy: number, uz: number;
  if (Math.abs(nx) < 0.9) { ux = 1 - nx * nx; uy = -nx * ny; uz = -nx * nz; } else { ux = -ny * nx; uy = 1 - ny * ny; uz = -ny * nz; }
  const un = 1 / Math.sqrt(ux * ux + uy * uy + uz * uz);
  ux *= un; uy *= un; uz *= un;
  const vx = ny * uz - nz * uy, vy = nz * ux - nx * uz, vz = nx * uy - ny * ux;
  let min2 = within * within;
  const hz = Math.sqrt(Math.max(0, 1 - nz * nz)); // a ring of radius r spans ±r·hz in height
  for (const g of rx) {
    const cx = ox + g.z * nx, cy = oy + g.z * ny, cz = oz + g.z * nz;
    // the whole ring lies within ρ_c ± r, z_c ± r·hz: skip it when that box is too far
    const rc = Math.sqrt(cx * cx + cy * cy);
    const gr = Math.max(0, tx.rMin - (rc + g.r), rc - g.r - tx.rMax);
    const gz = Math.max(0, tx.zMin - (cz + g.r * hz), cz - g.r * hz - tx.zMax);
    if (gr * gr + gz * gz >= min2) continue;
    for (let j = 0; j < OVERLAP_NODES; j++) {
      const co = g.r * OVERLAP_COS[j]!, si = g.r * OVERLAP_SIN[j]!;
      const px = cx + co * ux + si * vx, py = cy + co * uy + si * vy, pz = cz + co * uz + si * vz;
      const rho = Math.sqrt(px * px + py * py);
      const br = rho < tx.rMin ? tx.rMin - rho : rho > tx.rMax ? rho - tx.rMax : 0;
      const bz = pz < tx.zMin ? tx.zMin - pz : pz > tx.zMax ? pz - tx.zMax : 0;
      if (br * br + bz * bz >= min2) continue;
      for (const f of tx.turns) {
        const d2 = (rho - f.r) * (rho - f.r) + (pz - f.z) * (pz - f.z);
        if (d2 < min2) min2 = d2;
      }
    }
  }
  return min2;
}

function dir0(a: readonly [number, number, number]): [number, number, number] {
  const l = Math.hypot(a[0], a[1], a[2]);
  return [a[0] / l, a[1] / l, a[2] / l];
}

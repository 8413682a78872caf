/**
 * Mutual inductance of two circular filaments in any relative position: one line integral,
 * over filament b, of filament a's closed-form vector potential.
 */
import * as z from "../zod.ts";
import { lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import { checkLoop, optionsArg } from "./inputs.ts";
import { integrateAdaptive } from "../math/quadrature.ts";
import { aOverRhoKernel } from "./loopKernel.ts";
import type { Vec3 } from "./types.ts";

/** A circular filament in world coordinates (the circle variant of `Filament`; `turns` is ignored). */
export interface CircleFilament {
  readonly center: Vec3;
  /** unit normal (normalised here if it is not), current counter-clockwise about it */
  readonly axis: Vec3;
  /** radius, m, > 0 */
  readonly radius: number;
}

/** Options of {@link loopMutualInductance}. */
export interface LoopMutualOptions {
  /** relative error target, default 1e-10 (absolute floor 1e-4·relTol of ∮|A·dl|, for pairs whose M cancels to ≈ 0) */
  readonly relTol?: number;
}

/** Default relative tolerance of the line integral. */
export const LOOP_MUTUAL_TOL = 1e-10;
/** Largest trapezoidal rule tried before the split adaptive Gauss–Kronrod path. */
const MAX_TRAPEZOID = 512;
/** Smallest accepted trapezoidal rule. */
const MIN_NODES = 16;
/**
 * Lower bound on the half-width σ of the strip of analyticity of the integrand, as a fraction
 * of asinh(δ/r_b) (δ: closest approach of b to a's wire). Measured with the exact singularities
 * (roots of the degree-4 trigonometric polynomial α²β²) over 25,000 random and near-touching
 * poses: σ ≥ 0.76·asinh(δ/r_b) (scripts/gen_robust_fixtures.py prints the check); 0.6 leaves margin.
 */
const SIGMA_FRACTION = 0.6;
/** The rule must resolve the closest approach: σ·N/2 ≥ this before a peaked integrand is accepted. */
const MIN_SIGMA_N = 3;
/** Upper bound on the intervals of the adaptive path (each costs 15 kernel evaluations a split). */
const MAX_INTERVALS = 4000;
const TWO_PI = 2 * Math.PI;

/** cos/sin of the odd nodes (2j+1)π/(N/2) added when the rule doubles to N (N = 8 … 512), built once at load. */
const ODD_NODES: ReadonlyMap<number, { readonly c: Float64Array; readonly s: Float64Array }> = (() => {
  const m = new Map<number, { c: Float64Array; s: Float64Array }>();
  for (let n = 8; n <= MAX_TRAPEZOID; n *= 2) {
    const half = n / 2;
    const c = new Float64Array(half);
    const s = new Float64Array(half);
    for (let j = 0; j < half; j++) {
      const t = ((2 * j + 1) * Math.PI) / half;
      c[j] = Math.cos(t);
      s[j] = Math.sin(t);
    }
    m.set(n, { c, s });
  }
  return m;
})();

/**
 * What {@link circleMutualCore} found besides the value (an out-parameter: the caller owns it,
 * so the hot path allocates nothing and no state lives in the module).
 */
export interface CircleMutualStats {
  /** smallest squared distance from an evaluated point of b to a's wire, m² */
  minDistance2: number;
  /** the error estimate of the value, H */
  error: number;
  /** kernel evaluations */
  evaluations: number;
}

/** A fresh {@link CircleMutualStats} record. */
export function circleMutualStats(): CircleMutualStats {
  return { minDistance2: Infinity, error: 0, evaluations: 0 };
}

function intersecting(): never {
  throw new TanklightInputError(
    [{ path: "a, b", message: "the circle filaments intersect; their filament mutual inductance is not defined", value: "intersecting filaments" }],
    "loopMutualInductance",
  );
}

/**
 * Core of the circle–circle mutual inductance on plain numbers (per turn, H). Axes must be
 * unit vectors; no validation (hot path). Writes the closest approach, the error estimate and
 * the evaluation count to `stats`.
 *
 * Quadrature (the integrand is periodic and analytic in the strip |Im t| < σ, so the
 * trapezoidal rule T_N has error ≈ A·e^{−σN}; Trefethen & Weideman 2014, SIAM Rev. 56(3) §3):
 * nested doubling from 4 nodes. σ is bounded from below by the geometry: the singularities
 * are where b's complexified point reaches a's wire, and |Im t| ≥ SIGMA_FRACTION·asinh(δ/r_b)
 * for the closest approach δ; δ itself is bounded from below by the closest node, less what
 * the squared distance can dip between nodes ((α²)″ ≤ 2r_b² + 2α·r_b, because the Hessian of
 * (a − ρ)² + z² is ≤ 2). The error of T_N is then estimated from the last two differences,
 * each carried forward at that rate: max(|T_N − T_{N/2}|·e^{−σN/2}, |T_{N/2} − T_{N/4}|·e^{−3σN/4})
 * — two levels, so a difference that vanishes by chance (the error oscillates in sign with N)
 * cannot fake convergence, and a pre-asymptotic agreement (T_16 ≈ T_32 while both are off)
 * is not taken for the squared error of the next level. When 512 nodes cannot reach the
 * tolerance at that rate (b passes very close to a's wire), the period is split at every
 * local minimum of the distance to a's wire (the near-crossing angles, refined by golden
 * section) and each piece is integrated by adaptive Gauss–Kronrod 7/15 (QUADPACK QAG): each
 * near-singularity then sits at a piece's end, where bisection resolves it, and no peak can
 * hide inside a piece.
 */
export function circleMutualCore(
  cax: number, cay: number, caz: number, nax: number, nay: number, naz: number, ra: number,
  cbx: number, cby: number, cbz: number, nbx: number, nby: number, nbz: number, rb: number,
  tol: number, stats: CircleMutualStats,
): number {
  // One function on purpose (≈ 110 lines): the hot kernel of every inclined-circle pair, on flat scalar arguments with no
  // allocation; each level of the nested trapezoid updates the same running sums, error and closest-approach bound.
  // in-plane orthonormal basis (u_b, v_b) of b: u_b ⟂ n_b, v_b = n_b × u_b
  let ux: number, uy: number, uz: number;
  if (Math.abs(nbx) < 0.9) {
    ux = 1 - nbx * nbx; uy = -nbx * nby; uz = -nbx * nbz; // x̂ − (n·x̂)n
  } else {
    ux = -nby * nbx; uy = 1 - nby * nby; uz = -nby * nbz; // ŷ − (n·ŷ)n
  }
  const un = 1 / Math.sqrt(ux * ux + uy * uy + uz * uz);
  ux *= un; uy *= un; uz *= un;
  const vx = nby * uz - nbz * uy;
  const vy = nbz * ux - nbx * uz;
  const vz = nbx * uy - nby * ux;
  const d0x = cbx - cax, d0y = cby - cay, d0z = cbz - caz;
  // w(t) = d0 + rb(cos t·u + sin t·v);  n_a × w = D + rb(cos t·X + sin t·Y);  z = n_a·w
  const Dx = nay * d0z - naz * d0y, Dy = naz * d0x - nax * d0z, Dz = nax * d0y - nay * d0x;
  const Xx = rb * (nay * uz - naz * uy), Xy = rb * (naz * ux - nax * uz), Xz = rb * (nax * uy - nay * ux);
  const Yx = rb * (nay * vz - naz * vy), Yy = rb * (naz * vx - nax * vz), Yz = rb * (nax * vy - nay * vx);
  const z0 = nax * d0x + nay * d0y + naz * d0z;
  const zu = rb * (nax * ux + nay * uy + naz * uz);
  const zv = rb * (nax * vx + nay * vy + naz * vz);
  // (n_a × w)·dP/dt = rb·[−s·D·u + c·D·v + rb·(n_a·n_b)]  (the X·u and Y·v terms vanish)
  const Du = rb * (Dx * ux + Dy * uy + Dz * uz);
  const Dv = rb * (Dx * vx + Dy * vy + Dz * vz);
  const Nn = rb * rb * (nax * nbx + nay * nby + naz * nbz);
  let minA2 = Infinity;
  let maxA2 = 0;
  const f = (c: number, s: number): number => {
    const px = Dx + c * Xx + s * Yx;
    const py = Dy + c * Xy + s * Yy;
    const pz = Dz + c * Xz + s * Yz;
    const rho = Math.sqrt(px * px + py * py + pz * pz);
    const z = z0 + c * zu + s * zv;
    const z2 = z * z;
    const dm = ra - rho;
    const alpha2 = dm * dm + z2;
    if (alpha2 < minA2) {
      minA2 = alpha2;
      if (alpha2 === 0) intersecting();
    }
    if (alpha2 > maxA2) maxA2 = alpha2;
    return aOverRhoKernel(ra, rho, z2, alpha2) * (c * Dv - s * Du + Nn);
  };

  // nested trapezoidal rule: N nodes t_k = 2πk/N; each doubling adds the odd nodes
  let sum = f(1, 0) + f(-1, 0) + f(0, 1) + f(0, -1);
  let n = 4;
  let t2 = NaN; // T_{N/4}
  let t1 = NaN; // T_{N/2}
  let value = (TWO_PI / n) * sum;
  let abs = 0;
  let evaluations = 4;
  let scale = 0;
  while (n < MAX_TRAPEZOID) {
    const n2 = 2 * n;
    const { c, s } = ODD_NODES.get(n2)!;
    let add = 0;
    abs = 0;
    for (let j = 0; j < n; j++) {
      const v = f(c[j]!, s[j]!);
      add += v;
      abs += Math.abs(v);
    }
    sum += add;
    evaluations += n;
    n = n2;
    t2 = t1;
    t1 = value;
    value = (TWO_PI / n) * sum;
    // ∮|A·dl| estimated from the new (odd) nodes: the floor for pairs whose M cancels to ≈ 0
    scale = Math.max(Math.abs(value), 1e-4 * (TWO_PI / (n / 2)) * abs);
    if (n < MIN_NODES) continue;
    // closest approach bounded from below: the closest node less the largest dip between nodes
    const h = Math.PI / n; // half the node spacing
    const delta2 = minA2 - (rb * rb + rb * Math.sqrt(minA2)) * h * h;
    // not peaked (the distance to a's wire varies < 4× over the nodes): no narrow dip can hide
    // between nodes, and the closest node is within 2× of the closest approach
    const peaky = maxA2 > 4 * minA2;
    const bound = delta2 > 0 ? Math.sqrt(delta2) : 0;
    const delta = peaky ? bound : Math.max(bound, 0.5 * Math.sqrt(minA2));
    const sigma = SIGMA_FRACTION * Math.asinh(delta / rb);
    const d1 = Math.abs(value - t1);
    const d2 = Math.abs(t1 - t2);
    const error = Math.max(d1 * Math.exp(-sigma * (n / 2)), d2 * Math.exp(-sigma * ((3 * n) / 4)));
    if (error <= tol * scale && (!peaky || sigma * (n / 2) >= MIN_SIGMA_N)) {
      stats.minDistance2 = minA2;
      stats.error = error;
      stats.evaluations = evaluations;
      return value;
    }
    // at this rate even MAX_TRAPEZOID nodes will not reach the tolerance: split and go adaptive now
    if ((peaky && sigma * MAX_TRAPEZOID < 2 * MIN_SIGMA_N) || d1 * Math.exp(-sigma * (MAX_TRAPEZOID - n / 2)) > tol * scale) break;
  }
  // squared distance to a's wire at angle t (no kernel: the cheap scan of the adaptive path)
  const dist2 = (t: number): number => {
    const c = Math.cos(t), s = Math.sin(t);
    const px = Dx + c * Xx + s * Yx, py = Dy + c * Xy + s * Yy, pz = Dz + c * Xz + s * Yz;
    const dm = ra - Math.sqrt(px * px + py * py + pz * pz);
    const z = z0 + c * zu + s * zv;
    return dm * dm + z * z;
  };
  const near = nearPass(f, dist2, tol * scale, stats, evaluations);
  stats.minDistance2 = Math.min(stats.minDistance2, minA2);
  return near;
}

/**
 * The adaptive path of {@link circleMutualCore}: the period split at every local minimum of
 * the squared distance to a's wire (found on 256 samples, refined by golden section), each
 * piece by adaptive Gauss–Kronrod 7/15 to its share of the absolute tolerance.
 */
function nearPass(
  f: (c: number, s: number) => number,
  dist2: (t: number) => number,
  absTol: number,
  stats: CircleMutualStats,
  evaluations: number,
): number {
  const SAMPLES = 256;
  const step = TWO_PI / SAMPLES;
  const d = new Float64Array(SAMPLES);
  for (let k = 0; k < SAMPLES; k++) d[k] = dist2(k * step);
  const cuts: number[] = [];
  let closest = Infinity;
  for (let k = 0; k < SAMPLES; k++) {
    const prev = d[(k + SAMPLES - 1) % SAMPLES]!, here = d[k]!, next = d[(k + 1) % SAMPLES]!;
    if (here <= prev && here < next) {
      const t = goldenMin(dist2, (k - 1) * step, (k + 1) * step);
      cuts.push(t);
      closest = Math.min(closest, dist2(t));
    }
  }
  if (cuts.length === 0) cuts.push(0); // constant distance (coaxial): any start
  cuts.sort((x, y) => x - y);
  const first = cuts[0]!;
  cuts.push(first + TWO_PI);
  const g = (t: number): number => f(Math.cos(t), Math.sin(t));
  let value = 0;
  let error = 0;
  const pieces = cuts.length - 1;
  for (let i = 0; i < pieces; i++) {
    const res = integrateAdaptive(g, cuts[i]!, cuts[i + 1]!, { relTol: 0, absTol: absTol / pieces, maxIntervals: MAX_INTERVALS });
    value += res.value;
    error += res.error;
    evaluations += res.evaluations;
  }
  stats.minDistance2 = closest;
  stats.error = error;
  stats.evaluations = evaluations;
  return value;
}

const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** The minimiser of a unimodal function on [lo, hi] by golden section (60 steps: to rounding). */
function goldenMin(g: (t: number) => number, lo: number, hi: number): number {
  let a = lo, b = hi;
  let x1 = b - GOLDEN * (b - a), x2 = a + GOLDEN * (b - a);
  let g1 = g(x1), g2 = g(x2);
  for (let i = 0; i < 60 && b - a > 1e-15 * (1 + Math.abs(a)); i++) {
    if (g1 <= g2) {
      b = x2; x2 = x1; g2 = g1;
      x1 = b - GOLDEN * (b - a); g1 = g(x1);
    } else {
      a = x1; x1 = x2; g1 = g2;
      x2 = a + GOLDEN * (b - a); g2 = g(x2);
    }
  }
  return 0.5 * (a + b);
}

/** The options of {@link loopMutualInductance} as a strict schema. */
const LoopMutualOptionsSpec = lazySchema(() => z.strictObject({
  relTol: z.number({ error: "must be a number in (0, 1)" }).gt(0, { error: "must be a number in (0, 1)" }).lt(1, { error: "must be a number in (0, 1)" }).optional(),
}));

/** Fast check of valid options: only `relTol`, a number in (0, 1). */
const relTolOnly = (o: Record<string, unknown>): boolean => {
  for (const k in o) if (k !== "relTol") return false;
  const t = o["relTol"];
  return t === undefined || (typeof t === "number" && t > 0 && t < 1);
};

const normalised = (v: Vec3): [number, number, number] => {
  const n = Math.hypot(v[0], v[1], v[2]);
  return [v[0] / n, v[1] / n, v[2] / n];
};

/**
 * Mutual inductance of two circular filaments in any relative position (offset, tilted,
 * crossed), per turn: M = ∮_b A_a · dl_b, with a's vector potential in closed form
 * (A_φ, Smythe 1950 §7.10; the single-integral method of Grover 1944, Proc. IRE 32, and
 * Babic, Sirois, Akyel & Girardi 2010, IEEE Trans. Magn. 46(9):3591) evaluated by the
 * cancellation-free AGM kernel (loopKernel.ts).
 *
 * Quadrature: the integrand is periodic and analytic, so the trapezoidal rule converges
 * geometrically; it doubles from 4 nodes and estimates its error from the last two differences
 * carried forward at a rate bounded from the closest approach to a's wire (see
 * {@link circleMutualCore}); where b passes so close to a's wire that 512 nodes cannot reach
 * the tolerance, the period is split at the near-crossing angles and each piece integrated by
 * adaptive Gauss–Kronrod 7/15. Accuracy: relative error ≤ 1e-9 at the default relTol at every
 * pose whose filaments do not touch (relative to max(|M|, 1e-4·∮|A·dl|); checked against mpmath
 * at crossing, coplanar, near-touching and linked poses and a random-pose sweep,
 * tests/em/loopMutualHard.test.ts).
 *
 * @param a circle filament `{ center, axis, radius }` (m; axis any non-zero vector, normalised;
 *   current counter-clockwise about it). A `Filament` of kind "circle" is accepted; its
 *   `turns` is ignored — the result is per turn pair (mutualInductance weights by turns).
 * @param b second circle filament, same form.
 * @param options `{ relTol }`, default 1e-10.
 * @returns M, H; sign follows the axes (reversing either axis flips it). Reciprocal: M(a,b) = M(b,a).
 *   Throws TanklightInputError for coincident or intersecting filaments.
 * @example loopMutualInductance({center:[0,0,0],axis:[0,0,1],radius:0.04},
 *   {center:[0.02,0,0.03],axis:[Math.sin(π/6),0,Math.cos(π/6)],radius:0.006}) // → 8.5897360765e-10 H
 * @see coaxialLoopMutualInductance, mutualInductance
 */
export function loopMutualInductance(a: CircleFilament, b: CircleFilament, options: LoopMutualOptions = {}): number {
  const where = "loopMutualInductance";
  a = checkLoop(a, "a", where);
  b = checkLoop(b, "b", where);
  const na = normalised(a.axis);
  const nb = normalised(b.axis);
  const tol = optionsArg(LoopMutualOptionsSpec, options, "options", where, relTolOnly).relTol ?? LOOP_MUTUAL_TOL;
  const stats = circleMutualStats();
  const M = circleMutualCore(
    a.center[0], a.center[1], a.center[2], na[0], na[1], na[2], a.radius,
    b.center[0], b.center[1], b.center[2], nb[0], nb[1], nb[2], b.radius, tol, stats,
  );
  if (!Number.isFinite(M) || stats.minDistance2 <= 1e-24 * a.radius * a.radius) {
    throw new TanklightInputError(
      [{ path: "a, b", message: "the circle filaments intersect or coincide; their filament mutual inductance is not defined", value: "touching filaments" }],
      "loopMutualInductance",
    );
  }
  return M;
}

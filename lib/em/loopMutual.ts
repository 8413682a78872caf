/**
 * Mutual inductance of two circular filaments in any relative position: one line integral,
 * over filament b, of filament a's closed-form vector potential.
 */
import { TanklightInputError } from "../errors.ts";
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
/** Largest trapezoidal rule tried before the adaptive Gauss–Kronrod fallback. */
const MAX_TRAPEZOID = 512;
/** Smallest accepted trapezoidal rule (compared with the rule of half as many nodes). */
const MIN_NODES = 16;
const TWO_PI = 2 * Math.PI;

// cos/sin of the odd nodes (2j+1)π/N for N = 8·2^i: the new nodes when the rule doubles to N
const oddNodes = new Map<number, { c: Float64Array; s: Float64Array }>();
function nodesOf(n: number): { c: Float64Array; s: Float64Array } {
  let e = oddNodes.get(n);
  if (!e) {
    const half = n / 2;
    const c = new Float64Array(half);
    const s = new Float64Array(half);
    for (let j = 0; j < half; j++) {
      const t = ((2 * j + 1) * Math.PI) / half;
      c[j] = Math.cos(t);
      s[j] = Math.sin(t);
    }
    e = { c, s };
    oddNodes.set(n, e);
  }
  return e;
}

/**
 * Working state of the line integral (module-level so the hot path allocates nothing).
 * After each call of {@link circleMutualCore}: `minDistance2` = smallest squared distance
 * from a node on b to a's wire, m²; `error` = the error estimate, H; `evaluations`.
 */
export const circleMutualState = { minDistance2: Infinity, error: 0, evaluations: 0 };

function intersecting(): never {
  circleMutualState.minDistance2 = 0;
  throw new TanklightInputError(
    [{ path: "a, b", message: "the circle filaments intersect; their filament mutual inductance is not defined", value: "intersecting filaments" }],
    "loopMutualInductance",
  );
}

/**
 * Core of the circle–circle mutual inductance on plain numbers (per turn, H). Axes must be
 * unit vectors. Periodic trapezoidal rule with nested doubling from 8 nodes; when it has not
 * converged at 512 nodes (b passes close to a's wire) adaptive Gauss–Kronrod 7/15 over one
 * period starting at the node nearest to the wire. Sets {@link circleMutualState}.
 */
export function circleMutualCore(
  cax: number, cay: number, caz: number, nax: number, nay: number, naz: number, ra: number,
  cbx: number, cby: number, cbz: number, nbx: number, nby: number, nbz: number, rb: number,
  tol: number,
): number {
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
  let abs = 0;
  {
    const { c, s } = nodesOf(8);
    for (let j = 0; j < 4; j++) sum += f(c[j]!, s[j]!);
  }
  let n = 8;
  let prev = (TWO_PI / n) * sum;
  let evaluations = 8;
  const sq = Math.sqrt(tol);
  while (n < MAX_TRAPEZOID) {
    const n2 = 2 * n;
    const { c, s } = nodesOf(n2);
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
    const value = (TWO_PI / n) * sum;
    // ∮|A·dl| estimated from the new (odd) nodes: the floor for pairs whose M cancels to ≈ 0
    const scale = Math.max(Math.abs(value), 1e-4 * (TWO_PI / (n / 2)) * abs);
    const diff = Math.abs(value - prev);
    // exponential convergence of the trapezoidal rule on an analytic periodic integrand
    // (Trefethen & Weideman 2014, SIAM Rev. 56(3) §3): e_2N ≈ e_N²/C, so |T_2N − T_N| ≤ 0.1·√tol·scale
    // puts e_2N two orders below tol·scale; n ≥ MIN_NODES keeps out of the pre-asymptotic range.
    // and only once the node spacing 2π·rb/N is below the closest approach to a's wire: a peak
    // narrower than the spacing can hide between the nodes of both rules (false convergence)
    // (the spacing rule applies where the distance to a's wire varies along b by more than 2×)
    const peaky = maxA2 > 4 * minA2;
    if (n >= MIN_NODES && diff <= 0.1 * sq * scale && (!peaky || n * n * minA2 >= TWO_PI * TWO_PI * rb * rb)) {
      circleMutualState.minDistance2 = minA2;
      circleMutualState.error = (diff * diff) / scale;
      circleMutualState.evaluations = evaluations;
      return value;
    }
    prev = value;
    // the spacing rule alone will need more than MAX_TRAPEZOID nodes: go adaptive now
    if (peaky && MAX_TRAPEZOID * MAX_TRAPEZOID * minA2 < TWO_PI * TWO_PI * rb * rb) break;
  }
  // near pass: adaptive Gauss–Kronrod over one period starting where b is closest to a's wire
  let tStar = 0;
  let best = Infinity;
  for (let k = 0; k < 64; k++) {
    const t = (TWO_PI * k) / 64;
    const c = Math.cos(t), s = Math.sin(t);
    const px = Dx + c * Xx + s * Yx, py = Dy + c * Xy + s * Yy, pz = Dz + c * Xz + s * Yz;
    const dm = ra - Math.sqrt(px * px + py * py + pz * pz);
    const z = z0 + c * zu + s * zv;
    const d2 = dm * dm + z * z;
    if (d2 < best) { best = d2; tStar = t; }
  }
  const res = integrateAdaptive((t) => f(Math.cos(t), Math.sin(t)), tStar, tStar + TWO_PI, {
    relTol: tol,
    absTol: tol * 1e-4 * (TWO_PI / (n / 2)) * abs,
    maxIntervals: 4000,
  });
  circleMutualState.minDistance2 = minA2;
  circleMutualState.error = res.error;
  circleMutualState.evaluations = evaluations + res.evaluations;
  return res.value;
}

function unit(v: Vec3, field: string): [number, number, number] {
  const [x, y, z] = v;
  const n = Math.hypot(x, y, z);
  if (!(Number.isFinite(n) && n > 0)) {
    throw new TanklightInputError([{ path: field, message: "must be a finite non-zero vector", value: v, expected: "non-zero direction" }], "loopMutualInductance");
  }
  return [x / n, y / n, z / n];
}

function checkCircle(f: CircleFilament, name: string): void {
  if (!f || !Array.isArray(f.center) || f.center.length !== 3 || !f.center.every(Number.isFinite)) {
    throw new TanklightInputError([{ path: `${name}.center`, message: "must be three finite coordinates in m", value: f?.center }], "loopMutualInductance");
  }
  if (!(Number.isFinite(f.radius) && f.radius > 0)) {
    throw new TanklightInputError([{ path: `${name}.radius`, message: "must be a finite number > 0 m", value: f.radius, expected: "> 0 m" }], "loopMutualInductance");
  }
}

/**
 * Mutual inductance of two circular filaments in any relative position (offset, tilted,
 * crossed), per turn: M = ∮_b A_a · dl_b, with a's vector potential in closed form
 * (A_φ, Smythe 1950 §7.10; the single-integral method of Grover 1944, Proc. IRE 32, and
 * Babic, Sirois, Akyel & Girardi 2010, IEEE Trans. Magn. 46(9):3591) evaluated by the
 * cancellation-free AGM kernel (loopKernel.ts).
 *
 * Quadrature: the integrand is periodic and analytic, so the trapezoidal rule (the Gauss rule
 * for trigonometric polynomials) converges geometrically; it doubles from 16 nodes until two
 * levels agree (error estimate from the geometric rate). When b passes so close to a's wire
 * that 512 nodes do not suffice, adaptive Gauss–Kronrod 7/15 over one period takes over.
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
  checkCircle(a, "a");
  checkCircle(b, "b");
  const na = unit(a.axis, "a.axis");
  const nb = unit(b.axis, "b.axis");
  const tol = options.relTol ?? LOOP_MUTUAL_TOL;
  if (!(tol > 0 && tol < 1)) {
    throw new TanklightInputError([{ path: "options.relTol", message: "must be in (0, 1)", value: tol }], "loopMutualInductance");
  }
  const M = circleMutualCore(
    a.center[0], a.center[1], a.center[2], na[0], na[1], na[2], a.radius,
    b.center[0], b.center[1], b.center[2], nb[0], nb[1], nb[2], b.radius, tol,
  );
  if (!Number.isFinite(M) || circleMutualState.minDistance2 <= 1e-24 * a.radius * a.radius) {
    throw new TanklightInputError(
      [{ path: "a, b", message: "the circle filaments intersect or coincide; their filament mutual inductance is not defined", value: "touching filaments" }],
      "loopMutualInductance",
    );
  }
  return M;
}

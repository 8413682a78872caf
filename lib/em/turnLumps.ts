/**
 * Representative loops of a coil made of coaxial circles (lumping by moments of the turn
 * distribution in (r², z)), shared by the fast coupling evaluators. Private to lib/em.
 */
import type { Filament } from "./types.ts";

/** Representative loops of a set of coaxial circles (own frame, axis z): radius, height, weight. */
export interface Lumps {
  readonly r: Float64Array;
  readonly z: Float64Array;
  readonly w: Float64Array;
  /** largest distance, in the (r, z) half-plane, of a member turn from its representative loop, m */
  readonly extent: number;
}

export interface Turn { readonly r: number; readonly z: number; readonly w: number }

/** The circles of a coil as weighted (r, z) turns if they are all coaxial with its z axis. */
export function coaxialTurns(filaments: readonly Filament[]): Turn[] | undefined {
  const out: Turn[] = [];
  for (const f of filaments) {
    if (f.kind !== "circle") return undefined;
    const [ax, ay, az] = f.axis;
    const al = Math.hypot(ax, ay, az);
    if (Math.abs(ax) > 1e-12 * al || Math.abs(ay) > 1e-12 * al || f.center[0] !== 0 || f.center[1] !== 0) return undefined;
    out.push({ r: f.radius, z: f.center[2], w: Math.sign(az) * f.turns });
  }
  const W = out.reduce((a, t) => a + t.w, 0);
  // the lumping rules need weights of one sign (a coil wound back on itself goes to the exact sum)
  if (W === 0 || out.some((t) => t.w * W < 0)) return undefined;
  return out;
}

/** One representative loop of a group: weight Σw at the means of r² and z (moments of order ≤ 1). */
export function lumpOf(group: readonly Turn[]): Turn & { extent: number } {
  let W = 0, U = 0, Z = 0;
  for (const t of group) { W += t.w; U += t.w * t.r * t.r; Z += t.w * t.z; }
  const r = Math.sqrt(U / W), z = Z / W;
  let extent = 0;
  for (const t of group) extent = Math.max(extent, Math.hypot(t.r - r, t.z - z));
  return { r, z, w: W, extent };
}

export function toLumps(list: readonly (Turn & { extent: number })[]): Lumps {
  return {
    r: Float64Array.from(list, (t) => t.r),
    z: Float64Array.from(list, (t) => t.z),
    w: Float64Array.from(list, (t) => t.w),
    extent: list.reduce((a, t) => Math.max(a, t.extent), 0),
  };
}

/**
 * Levels of a bisection tree of the turns: level ℓ has up to 2^ℓ groups, each lumped into one
 * loop; a group is split across its larger extent (r or z) at the median turn. The last level
 * has one loop per turn (exact).
 */
export function groupLevels(turns: readonly Turn[]): Lumps[] {
  let groups: Turn[][] = [turns.slice()];
  const levels: Lumps[] = [toLumps(groups.map(lumpOf))];
  while (groups.some((g) => g.length > 1)) {
    const next: Turn[][] = [];
    for (const g of groups) {
      if (g.length === 1) { next.push(g); continue; }
      const rs = g.map((t) => t.r), zs = g.map((t) => t.z);
      const byR = Math.max(...rs) - Math.min(...rs) > Math.max(...zs) - Math.min(...zs);
      const sorted = g.slice().sort((a, b) => (byR ? a.r - b.r : a.z - b.z));
      const h = Math.ceil(sorted.length / 2);
      next.push(sorted.slice(0, h), sorted.slice(h));
    }
    groups = next;
    levels.push(toLumps(groups.map(lumpOf)));
  }
  return levels;
}

/**
 * Two-point Gauss rule of a weighted sample x (total weight W): nodes x̄ + a, x̄ + b and weights
 * that reproduce its moments of degree ≤ 3 — the roots of the degree-2 orthogonal polynomial
 * t² − (μ₃/σ²)t − σ² (central moments σ², μ₃; Golub & Welsch 1969 for the general rule). A
 * sample with σ = 0 gives one point. Equal weights at x̄ ± σ would miss μ₃: the squared radii of
 * an evenly pitched flat spiral are skewed, and that rule was 68× less accurate there.
 */
function gauss2(xs: readonly number[], ws: readonly number[], W: number): { x: number[]; w: number[] } {
  let mean = 0;
  for (let i = 0; i < xs.length; i++) mean += ws[i]! * xs[i]!;
  mean /= W;
  let v = 0, m3 = 0;
  for (let i = 0; i < xs.length; i++) { const d = xs[i]! - mean; v += ws[i]! * d * d; m3 += ws[i]! * d * d * d; }
  v /= W; m3 /= W;
  if (!(v > 1e-24 * mean * mean)) return { x: [mean], w: [W] };
  const b = m3 / v, disc = Math.sqrt(b * b + 4 * v);
  const a = (b - disc) / 2, c = (b + disc) / 2;
  const wa = (W * c) / (c - a);
  return { x: [mean + a, mean + c], w: [wa, W - wa] };
}

/**
 * Order-1 lumps of the transmitter: the tensor product of two-point Gauss rules in u = r² and in
 * z (gauss2; a coordinate without spread collapses to one point), which reproduces every moment of
 * degree ≤ 3 in each coordinate of a product distribution.
 */
export function momentLumps(turns: readonly Turn[]): Lumps {
  const c = lumpOf(turns);
  const ws = turns.map((t) => t.w);
  const gu = gauss2(turns.map((t) => t.r * t.r), ws, c.w);
  const gz = gauss2(turns.map((t) => t.z), ws, c.w);
  const list: (Turn & { extent: number })[] = [];
  for (let i = 0; i < gu.x.length; i++) {
    for (let j = 0; j < gz.x.length; j++) list.push({ r: Math.sqrt(gu.x[i]!), z: gz.x[j]!, w: (gu.w[i]! * gz.w[j]!) / c.w, extent: c.extent });
  }
  return toLumps(list);
}

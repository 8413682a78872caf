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
 * Order-1 lumps of the transmitter: the 2 × 2 tensor product of the two-point rules ū ± σ_u,
 * z̄ ± σ_z in u = r² and z (weights ¼ of the turns each; a rule with σ = 0 collapses to one
 * point), which reproduces every moment of total degree ≤ 3 of a product distribution.
 */
export function momentLumps(turns: readonly Turn[]): Lumps {
  const c = lumpOf(turns);
  const uBar = c.r * c.r;
  let Vu = 0, Vz = 0;
  for (const t of turns) { Vu += t.w * (t.r * t.r - uBar) ** 2; Vz += t.w * (t.z - c.z) ** 2; }
  const su = Math.sqrt(Math.max(0, Vu / c.w)), sz = Math.sqrt(Math.max(0, Vz / c.w));
  const us = su > 1e-12 * uBar ? [uBar - su, uBar + su] : [uBar];
  const zs = sz > 0 ? [c.z - sz, c.z + sz] : [c.z];
  const list: (Turn & { extent: number })[] = [];
  for (const u of us) for (const z of zs) list.push({ r: Math.sqrt(u), z, w: c.w / (us.length * zs.length), extent: c.extent });
  return toLumps(list);
}

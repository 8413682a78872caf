/**
 * Gauss lumps of a coil made of coaxial circles: its turn distribution in (u = r², z) replaced
 * by the nodes of a Gauss rule of that discrete distribution, so that every sum over the turns
 * of a function smooth across the winding (the coupling to a coil beside it) converges
 * geometrically in the number of nodes instead of as (extent/distance)² per halving of
 * the groups. Private to lib/em (couplingEvaluator's close-pair level).
 */
import { discreteGaussRule } from "../math/discreteGauss.ts";
import type { Lumps, Turn } from "./turnLumps.ts";

/** What {@link gaussLumps} needs of a coil, prepared once. */
export interface GaussLumpSource {
  /** distinct radii and heights, ascending */
  readonly rs: readonly number[];
  readonly zs: readonly number[];
  /** weight of turn (rs[i], zs[j]) at i·zs.length + j (0 where there is none) */
  readonly grid: Float64Array;
  /** the weights are a product aᵢ·bⱼ (layers with identical turn positions: any full roundCoil) */
  readonly product: boolean;
  /** largest distance of a turn from the coil's weighted centre in (r, z), m */
  readonly extent: number;
  /** half the spread of the turns' radii / heights, m */
  readonly halfSpanR: number;
  readonly halfSpanZ: number;
  /** the orders from which gaussLumps keeps the radii / the heights exactly */
  readonly capR: number;
  readonly capZ: number;
}

/** Prepares the turns of a coil for {@link gaussLumps}. */
export function gaussLumpSource(turns: readonly Turn[], extent: number): GaussLumpSource {
  const rs = [...new Set(turns.map((t) => t.r))].sort((a, b) => a - b);
  const zs = [...new Set(turns.map((t) => t.z))].sort((a, b) => a - b);
  const ri = new Map(rs.map((r, i) => [r, i]));
  const zi = new Map(zs.map((z, j) => [z, j]));
  const grid = new Float64Array(rs.length * zs.length);
  for (const t of turns) grid[ri.get(t.r)! * zs.length + zi.get(t.z)!]! += t.w;
  const a = new Float64Array(rs.length), b = new Float64Array(zs.length);
  let total = 0;
  for (let i = 0; i < rs.length; i++) for (let j = 0; j < zs.length; j++) { const w = grid[i * zs.length + j]!; a[i]! += w; b[j]! += w; total += w; }
  let product = true;
  for (let i = 0; i < rs.length && product; i++) {
    for (let j = 0; j < zs.length; j++) {
      if (Math.abs(grid[i * zs.length + j]! * total - a[i]! * b[j]!) > 1e-12 * Math.abs(a[i]! * b[j]!)) { product = false; break; }
    }
  }
  // exact from: product — the distinct values of that side; lines — the line side always,
  // the other side from the longest line
  let longest = 0;
  const byLayer = rs.length <= zs.length;
  for (let i = 0; i < (byLayer ? rs.length : zs.length); i++) {
    let n = 0;
    for (let k = 0; k < (byLayer ? zs.length : rs.length); k++) if (grid[byLayer ? i * zs.length + k : k * zs.length + i] !== 0) n++;
    longest = Math.max(longest, n);
  }
  const capR = product ? rs.length : byLayer ? 1 : longest;
  const capZ = product ? zs.length : byLayer ? longest : 1;
  const halfSpanR = 0.5 * (rs[rs.length - 1]! - rs[0]!), halfSpanZ = 0.5 * (zs[zs.length - 1]! - zs[0]!);
  return { rs, zs, grid, product, extent, halfSpanR, halfSpanZ, capR, capZ };
}

/**
 * The coil's Gauss lumps of orders (pr, pz): a pr-point rule across the radii (in u = r², so
 * the dipole and every moment of degree ≤ 2pr − 1 in u are kept) and a pz-point rule across
 * the heights. A product distribution gets the tensor rule; any other keeps each line of turns
 * (each layer when there are fewer radii than heights, else each flat ring) and applies the
 * rule along it. An order at or above the side's `cap` keeps that side's turns exactly.
 */
export function gaussLumps(src: GaussLumpSource, pr: number, pz: number): Lumps {
  const { rs, zs, grid } = src;
  const nr = rs.length, nz = zs.length;
  const r: number[] = [], z: number[] = [], w: number[] = [];
  const u = rs.map((v) => v * v);
  // the points of one line with a non-zero weight (a zero weight is no point of the measure)
  const line = (xs: readonly number[], ws: ArrayLike<number>) => {
    const px: number[] = [], pw: number[] = [];
    for (let k = 0; k < xs.length; k++) if (ws[k] !== 0) { px.push(xs[k]!); pw.push(ws[k]!); }
    return { px, pw };
  };
  if (src.product) {
    const a = new Float64Array(nr), b = new Float64Array(nz);
    let total = 0;
    for (let i = 0; i < nr; i++) for (let j = 0; j < nz; j++) { const v = grid[i * nz + j]!; a[i]! += v; b[j]! += v; total += v; }
    const gu = discreteGaussRule(u, a, pr), gz = discreteGaussRule(zs, b, pz);
    for (let i = 0; i < gu.x.length; i++) {
      for (let j = 0; j < gz.x.length; j++) { r.push(Math.sqrt(gu.x[i]!)); z.push(gz.x[j]!); w.push((gu.w[i]! * gz.w[j]!) / total); }
    }
  } else if (nr <= nz) {
    for (let i = 0; i < nr; i++) {
      const { px, pw } = line(zs, grid.subarray(i * nz, (i + 1) * nz));
      const g = discreteGaussRule(px, pw, pz);
      for (let j = 0; j < g.x.length; j++) { r.push(rs[i]!); z.push(g.x[j]!); w.push(g.w[j]!); }
    }
  } else {
    for (let j = 0; j < nz; j++) {
      const { px, pw } = line(u, Float64Array.from(rs, (_, i) => grid[i * nz + j]!));
      const g = discreteGaussRule(px, pw, pr);
      for (let i = 0; i < g.x.length; i++) { r.push(Math.sqrt(g.x[i]!)); z.push(zs[j]!); w.push(g.w[i]!); }
    }
  }
  return { r: Float64Array.from(r), z: Float64Array.from(z), w: Float64Array.from(w), extent: src.extent };
}

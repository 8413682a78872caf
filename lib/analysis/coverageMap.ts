/**
 * coverageMap(system, region, options): the LED current and the lit/unlit verdict of a token
 * over a line, a plane or a volume of positions, with adaptive refinement near the lit boundary
 * and near zero crossings of the mutual inductance, dead zones as polygons, the lit fraction,
 * the weakest point and the DC supply current at every point.
 *
 * Method. Coarse grid first (every node a full nonlinear link solve through ./probe.ts). A grid
 * edge is flagged when its two nodes differ in verdict or when the transmitter–token mutual
 * inductance M changes sign along it for any of the token's orientations (a flat token beyond
 * a winding's edge sees reversed flux, so |M| — and the LED — passes through zero on a thin
 * line that a coarse grid can step over; with several transmitters M is their net coupling
 * Σᵢ Mᵢ·Re(Iᵢ/I₀), which crosses zero where neighbouring coils' fields cancel — the dead line
 * on the symmetry plane of two coils in anti-phase). Every cell with a flagged edge is solved again on a
 * fine sub-grid of step ≤ `resolution`; a fine sub-grid that finds a change on a side shared
 * with an unrefined cell flags that cell too, so refinement follows a dead line across the map.
 * Dead zones are the marching-squares loops (./contours.ts) of the margin ln(I/I_lit) over the
 * coarse cells and the fine sub-grids, closed along the region's border; the lit fraction is
 * 1 − (dead area)/(region area).
 *
 * Resolution guarantee. Along every grid line, every unlit stretch that contains a coarse node,
 * that lies between two coarse nodes of different verdict, or that contains a sign change of M
 * between two neighbouring coarse nodes, is sampled at the fine step and its ends are located to
 * within one fine step (≤ `resolution`, default step/8); a dead band narrower than the fine step
 * is found as a sign change of M but its width is then only bounded by that step. Not
 * guaranteed: an unlit island wholly inside one coarse cell with all four corners lit and no sign
 * change of M on its edges (a dip of |M| without a zero, or two zeros within one cell) — keep the
 * coarse step below half the smallest feature of the field (the token radius is a safe choice).
 */
import * as z from "../zod.ts";
import type { Vec3 } from "../em/types.ts";
import type { LinkSystem } from "../circuit/link.ts";
import { length, parseInput, lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import { marchingSquares } from "./contours.ts";
import { makeProbe, probeModel, type ModelStatement, type Probe, type ProbeValues } from "./probe.ts";
import { probeSpec } from "./probeSpec.ts";
import { parseRegion, tokenAxes, type GridAxis, type OrientationInput, type RegionInput } from "./region.ts";
import { progressCounter, type ProgressCallback } from "./progress.ts";
import { supplyVerdict, type SupplyInput, type SupplyVerdict } from "./supplyBudget.ts";
import { checkThreads, pointEvaluator, type PointEvaluator, type ThreadsOption } from "./pool.ts";

/** Relative closeness within which two LED currents count as a tie for the weakest point. */
const WEAKEST_TIE = 1e-9;

/** Options of {@link coverageMap}. */
export interface CoverageOptions {
  /** which receiver of the system is the token that moves (default 0) */
  readonly token?: number;
  /** keep the system's other receivers at their poses (default false: the token alone) */
  readonly others?: boolean;
  /** token orientation: flat (default), `{ tilt: "20 deg", about: [1, 0, 0] }`, or a list (worst counts) */
  readonly orientation?: OrientationInput;
  /** average LED current at which the token counts as lit, A (default 0.5 mA, trade practice) */
  readonly litThreshold?: number;
  /** refine near the lit boundary and near zero crossings of M (default true) */
  readonly refine?: boolean;
  /** fine step of the refinement, m or "1 mm" (default: the coarse step / 8) */
  readonly resolution?: number | string;
  /** worker threads: a count (default 1: this thread) or a running pool from taskPool(); results are identical for any count */
  readonly threads?: ThreadsOption;
  /** called as points are solved */
  readonly onProgress?: ProgressCallback;
  /** a supply to judge the highest supply current of the map against */
  readonly supply?: SupplyInput;
  /**
   * steady-state model, as solveLink's `model`: "fundamental" (default, the describing function),
   * "auto" or "harmonic" (harmonic balance: far slower per point; docs/methods/harmonic-balance.md)
   */
  readonly model?: "fundamental" | "harmonic" | "auto";
}

/** A dead zone: a polygon in a plane, or an interval on a line. */
export type DeadZone =
  | {
      readonly kind: "polygon";
      /** vertices in world coordinates, m (closed: the last joins the first) */
      readonly vertices: readonly Vec3[];
      /** signed area, m²: > 0 a dead region's outline, < 0 a lit island inside a dead region */
      readonly area: number;
      /** index along the stacking axis of a volume (0 for a plane) */
      readonly slice: number;
    }
  | { readonly kind: "interval"; readonly from: Vec3; readonly to: Vec3; readonly length: number };

/** The result of {@link coverageMap}: a typed grid and its summary (SI units). */
export interface CoverageMap {
  /** the ranged axes, x before y before z; values stored with the first axis fastest */
  readonly axes: readonly GridAxis[];
  /** the fixed coordinates, m */
  readonly fixed: Readonly<Partial<Record<"x" | "y" | "z", number>>>;
  readonly shape: readonly number[];
  /** units of the grids */
  readonly units: { readonly position: "m"; readonly ledCurrent: "A"; readonly mutual: "H"; readonly supplyCurrent: "A" };
  /** the token's dimmest LED's average current, worst over the orientations, A (index i₀ + n₀·(i₁ + n₁·i₂)) */
  readonly ledCurrent: Float64Array;
  /** 1 where lit (ledCurrent ≥ litThreshold) */
  readonly lit: Uint8Array;
  /** transmitter–token mutual inductance at each node for each orientation, H: mutual[node·orientations + o] */
  readonly mutual: Float64Array;
  /** the token axes used (unit vectors) */
  readonly orientations: readonly Vec3[];
  /** DC supply current with the token at each node (highest over the orientations), A; absent without a DC supply */
  readonly supplyCurrent?: Float64Array;
  readonly litThreshold: number;
  /** lit share of the region's length, area or volume (from the refined dead zones) */
  readonly litFraction: number;
  /** the lowest LED current found (coarse and refined points) and where: among points within 1e-9 of it, the first evaluated */
  readonly weakest: { readonly position: Vec3; readonly current: number };
  readonly deadZones: readonly DeadZone[];
  /** the fine step used, m (the coarse step when not refined) */
  readonly resolution: number;
  /** what the refinement guarantees, in words */
  readonly guarantee: string;
  /** full link solves done: coarse nodes × orientations + refined nodes × orientations */
  readonly solves: number;
  /** coarse cells (or intervals) that were refined */
  readonly refinedCells: number;
  /** the highest DC supply current over every point solved, A, and the verdict against options.supply */
  readonly supply?: { readonly voltage: number; readonly maxCurrent: number; readonly verdict?: SupplyVerdict };
  /** with `options.model` "harmonic" or "auto": how the poses were solved and the error band */
  readonly model?: ModelStatement;
  readonly warnings: readonly string[];
}

const OptionsSchema = lazySchema(() => z.object({
  resolution: length().optional(),
  litThreshold: z.number().positive().finite().optional(),
  model: z.enum(["fundamental", "harmonic", "auto"]).optional(),
}));

/** Floor of the margin ln(I/I_lit) (I → 0): −ln 10⁶. */
const MARGIN_FLOOR = 1e-6;

/**
 * LED current and lit/unlit over a line, plane or volume of token positions (see the module
 * comment for the method and the resolution guarantee).
 *
 * @param system a link system (solveLink's input, one transmitter or several with their own or
 *   shared drives, solved with the model `options.model` names as solveLink does: coils on a
 *   shared drive stay on the describing function);
 *   `options.token` names the receiver that moves (its own pose is ignored), the others are left
 *   out unless `options.others`.
 * @param region `{ x, y, z }`, each a coordinate or `{ from, to, points | step }` (m or "90 mm"):
 *   one range a line, two a plane, three a volume (planes of the first two, stacked along the third).
 * @param options see {@link CoverageOptions}.
 * @returns {@link CoverageMap}: typed grids with axes and units, lit fraction, weakest point,
 *   dead zones, supply current; SI units.
 * @example (await coverageMap(system, { x: { from: 0, to: "90 mm", step: "10 mm" }, y: 0, z: "5 mm" })).deadZones.length // → 2 (a dark ring at the 50 mm winding radius, and beyond 74 mm)
 */
export async function coverageMap(system: LinkSystem, region: RegionInput, options: CoverageOptions = {}): Promise<CoverageMap> {
  const where = "coverageMap";
  const opts = parseInput(OptionsSchema, { resolution: options.resolution, litThreshold: options.litThreshold, model: options.model }, where);
  checkThreads(options.threads, where);
  const grid = parseRegion(region, where);
  const axesList = tokenAxes(options.orientation, where);
  const spec = probeSpec(system, { token: options.token ?? 0, others: options.others ?? false, axes: axesList, ...(opts.litThreshold !== undefined ? { litThreshold: opts.litThreshold } : {}), ...(opts.model !== undefined ? { model: opts.model } : {}) }, where);
  const evaluator = await pointEvaluator(spec, options.threads, () => makeProbe(spec));
  try {
    const map = await runMap(grid.axes, grid.fixed, spec.litThreshold, axesList, spec.supplyVoltage, evaluator, options, opts.resolution, where);
    if (spec.model === undefined) return { ...map, warnings: [...map.warnings, ...fundamentalValidity(map, makeProbe(spec))] };
    const statement = probeModel(spec);
    return statement ? { ...map, model: statement } : map;
  } finally {
    await evaluator.close();
  }
}

interface Ctx {
  readonly na: number;
  readonly threshold: number;
  readonly evaluator: PointEvaluator;
  readonly progress: ReturnType<typeof progressCounter>;
  weakest: { position: Vec3; current: number };
  maxSupply: number;
  solves: number;
  unconverged: number;
}

/**
 * The describing function's validity where the map couples strongest (largest |M|: the tank
 * clips hardest there): solveLink's "fundamental" warnings at that pose, each LED outside its
 * validity named, with the pose. One extra solve and one harmonic-balance step per map.
 */
function fundamentalValidity(map: CoverageMap, probe: Probe): string[] {
  const na = map.orientations.length;
  let best = -1;
  for (let k = 0; k < map.mutual.length; k++) if (best < 0 || Math.abs(map.mutual[k]!) > Math.abs(map.mutual[best]!)) best = k;
  if (best < 0) return [];
  let p = Math.floor(best / na);
  const coords = map.axes.map((a) => {
    const c = a.values[p % a.values.length]!;
    p = Math.floor(p / a.values.length);
    return c;
  });
  const position = world(map.fixed, map.axes.map((a) => a.name), coords);
  const at = position.map((c) => (1e3 * c).toFixed(1)).join(", ");
  return probe.validity(position, map.orientations[best % na]!).map((w) => `at the map's strongest coupling (${at}) mm: ${w}`);
}

function world(fixed: Readonly<Partial<Record<"x" | "y" | "z", number>>>, names: readonly ("x" | "y" | "z")[], coords: readonly number[]): Vec3 {
  const p = { x: fixed.x ?? 0, y: fixed.y ?? 0, z: fixed.z ?? 0 };
  names.forEach((n, i) => (p[n] = coords[i]!));
  return [p.x, p.y, p.z];
}

/** Evaluates positions (in this thread or shared across the pool: ./pool.ts), reporting progress. */
async function evaluatePositions(ctx: Ctx, positions: Float64Array): Promise<ProbeValues> {
  const count = positions.length / 3;
  const values = await ctx.evaluator.evaluate(positions, (units) => ctx.progress.done(units));
  const { current, supply, unconverged } = values;
  ctx.solves += count * ctx.na;
  ctx.unconverged += unconverged;
  for (let p = 0; p < count; p++) {
    // ties (symmetric points, equal but for the last bits, which differ between JavaScript
    // engines) keep the first point in evaluation order: Node and Deno report the same place
    if (current[p]! < ctx.weakest.current * (1 - WEAKEST_TIE)) ctx.weakest = { position: [positions[3 * p]!, positions[3 * p + 1]!, positions[3 * p + 2]!], current: current[p]! };
    else if (current[p]! < ctx.weakest.current) ctx.weakest = { position: ctx.weakest.position, current: current[p]! };
    if (supply[p]! > ctx.maxSupply) ctx.maxSupply = supply[p]!;
  }
  return values;
}

async function runMap(
  axes: readonly GridAxis[],
  fixed: Readonly<Partial<Record<"x" | "y" | "z", number>>>,
  threshold: number,
  orientations: readonly Vec3[],
  supplyVoltage: number | undefined,
  evaluator: PointEvaluator,
  options: CoverageOptions,
  resolutionIn: number | undefined,
  where: string,
): Promise<CoverageMap> {
  const na = orientations.length;
  const shape = axes.map((a) => a.values.length);
  const total = shape.reduce((a, b) => a * b, 1);
  const names = axes.map((a) => a.name);
  const ctx: Ctx = {
    na,
    threshold,
    evaluator,
    progress: progressCounter(options.onProgress),
    weakest: { position: [0, 0, 0], current: Infinity },
    maxSupply: 0,
    solves: 0,
    unconverged: 0,
  };
  ctx.progress.add(total);
  const step = Math.min(...axes.map((a) => Math.abs(a.values[1]! - a.values[0]!)));
  const resolution = options.refine === false ? step : Math.min(step, resolutionIn ?? step / 8);
  if (!(resolution > 0)) throw new TanklightInputError([{ path: "resolution", message: "must be > 0 m", value: resolutionIn }], where);

  // ── coarse grid, in tiles of whole rows ───────────────────────────────────────
  const ledCurrent = new Float64Array(total);
  const mutual = new Float64Array(total * na);
  const supplyCurrent = new Float64Array(total);
  const n0 = shape[0]!;
  const rowsPerTile = Math.max(1, Math.floor(65536 / n0));
  const rows = total / n0;
  for (let r0 = 0; r0 < rows; r0 += rowsPerTile) {
    const r1 = Math.min(rows, r0 + rowsPerTile);
    const v = await evaluatePositions(ctx, gridPositions(axes, fixed, r0 * n0, r1 * n0));
    ledCurrent.set(v.current, r0 * n0);
    mutual.set(v.mutual, r0 * n0 * na);
    supplyCurrent.set(v.supply, r0 * n0);
  }
  const lit = new Uint8Array(total);
  for (let i = 0; i < total; i++) lit[i] = ledCurrent[i]! >= threshold ? 1 : 0;

  // ── refinement and dead zones ──────────────────────────────────────────────────
  const deadZones: DeadZone[] = [];
  let deadMeasure = 0;
  let refinedCells = 0;
  const refine = options.refine !== false;
  if (axes.length === 1) {
    const r = await refineLine(ctx, axes[0]!, (u) => world(fixed, names, [u]), { current: ledCurrent, mutual, resolution: refine ? resolution : Infinity });
    deadZones.push(...r.zones);
    deadMeasure = r.deadLength;
    refinedCells = r.refined;
  } else {
    const [nu, nv] = [shape[0]!, shape[1]!];
    const slices = axes.length === 3 ? shape[2]! : 1;
    for (let w = 0; w < slices; w++) {
      const wValue = axes.length === 3 ? [axes[2]!.values[w]!] : [];
      const r = await refinePlane(
        ctx,
        axes[0]!,
        axes[1]!,
        (u, v) => world(fixed, names, [u, v, ...wValue]),
        {
          current: ledCurrent.subarray(w * nu * nv, (w + 1) * nu * nv),
          mutual: mutual.subarray(w * nu * nv * na, (w + 1) * nu * nv * na),
          resolution: refine ? resolution : Infinity,
        },
        w,
      );
      deadZones.push(...r.zones);
      deadMeasure += r.deadArea;
      refinedCells += r.refined;
    }
  }
  const measure = axes.reduce((m, a) => m * Math.abs(a.values[a.values.length - 1]! - a.values[0]!), 1);
  const stackStep = axes.length === 3 ? Math.abs(axes[2]!.values[1]! - axes[2]!.values[0]!) : 1;
  // a volume: each slice stands for its share of the stacking axis (trapezoid weights)
  let litFraction: number;
  if (axes.length === 3) {
    const n2 = shape[2]!;
    const areaPlane = measure / Math.abs(axes[2]!.values[n2 - 1]! - axes[2]!.values[0]!);
    let dead = 0;
    for (let w = 0; w < n2; w++) {
      const weight = w === 0 || w === n2 - 1 ? 0.5 : 1;
      dead += weight * deadZones.filter((d) => d.kind === "polygon" && d.slice === w).reduce((a, d) => a + (d as { area: number }).area, 0);
    }
    litFraction = 1 - (dead * stackStep) / (areaPlane * stackStep * (n2 - 1));
  } else {
    litFraction = 1 - deadMeasure / measure;
  }
  litFraction = Math.min(1, Math.max(0, litFraction));

  const warnings: string[] = [];
  if (ctx.unconverged > 0) warnings.push(`${ctx.unconverged} of ${ctx.solves} link solves did not converge; their LED currents are the solver's last iterate`);
  const guarantee = refine
    ? `unlit stretches along grid lines that contain a node, lie between nodes of different verdict, or contain a sign change of M between neighbouring nodes are located to within ${fmtMm(resolution)}; an unlit island inside one ${fmtMm(step)} cell with lit corners and no sign change of M on its edges can be missed`
    : `no refinement: verdicts at the ${fmtMm(step)} grid nodes only; features smaller than a cell can be missed`;
  let supply: CoverageMap["supply"];
  if (supplyVoltage !== undefined) {
    supply = {
      voltage: supplyVoltage,
      maxCurrent: ctx.maxSupply,
      ...(options.supply !== undefined ? { verdict: supplyVerdict({ voltage: supplyVoltage, current: ctx.maxSupply }, options.supply) } : {}),
    };
  } else if (options.supply !== undefined) {
    warnings.push("the transmitter's drive names no DC supply voltage, so no supply verdict");
  }
  return {
    axes,
    fixed,
    shape,
    units: { position: "m", ledCurrent: "A", mutual: "H", supplyCurrent: "A" },
    ledCurrent,
    lit,
    mutual,
    orientations,
    ...(supplyVoltage !== undefined ? { supplyCurrent } : {}),
    litThreshold: threshold,
    litFraction,
    weakest: ctx.weakest,
    deadZones,
    resolution: refine ? resolution : step,
    guarantee,
    solves: ctx.solves,
    refinedCells,
    ...(supply !== undefined ? { supply } : {}),
    warnings,
  };
}

function fmtMm(x: number): string {
  return `${Number((x * 1e3).toPrecision(3))} mm`;
}

/**
 * World positions [x, y, z, …] of the grid nodes from index `from` to `to` (exclusive), the
 * first axis fastest — written straight into one array (the main thread's share of a map: no
 * per-node arrays).
 */
function gridPositions(axes: readonly GridAxis[], fixed: Readonly<Partial<Record<"x" | "y" | "z", number>>>, from: number, to: number): Float64Array {
  const out = new Float64Array((to - from) * 3);
  const [x, y, z] = [fixed.x ?? 0, fixed.y ?? 0, fixed.z ?? 0];
  for (let q = 0; q < out.length; q += 3) {
    out[q] = x;
    out[q + 1] = y;
    out[q + 2] = z;
  }
  let stride = 1;
  for (const a of axes) {
    const d = a.name === "x" ? 0 : a.name === "y" ? 1 : 2;
    const n = a.values.length;
    // index along this axis: ⌊idx/stride⌋ mod n, stepped (no division per node)
    let i = Math.floor(from / stride) % n;
    let left = stride - (from % stride);
    for (let q = d; q < out.length; q += 3) {
      out[q] = a.values[i]!;
      if (--left === 0) {
        left = stride;
        if (++i === n) i = 0;
      }
    }
    stride *= n;
  }
  return out;
}

function margin(current: number, threshold: number): number {
  return Math.log(Math.max(current, MARGIN_FLOOR * threshold) / threshold);
}

/** True when two nodes differ in verdict or M changes sign between them for any orientation. */
function changes(ca: number, cb: number, ma: ArrayLike<number>, oa: number, mb: ArrayLike<number>, ob: number, na: number, threshold: number): boolean {
  if (ca >= threshold !== cb >= threshold) return true;
  for (let t = 0; t < na; t++) if (ma[oa + t]! < 0 !== mb[ob + t]! < 0) return true;
  return false;
}

/** The coarse grid's values handed to the refinement, and the fine step (Infinity: no refinement). */
interface Coarse {
  readonly current: Float64Array;
  readonly mutual: Float64Array;
  readonly resolution: number;
}

/** Fine steps per coarse step h so that each is ≤ resolution (1 without refinement). */
function fineSteps(h: number, resolution: number): number {
  return Number.isFinite(resolution) ? Math.max(1, Math.ceil(Math.abs(h) / resolution - 1e-9)) : 1;
}

// ── a line ──────────────────────────────────────────────────────────────────────
async function refineLine(ctx: Ctx, axis: GridAxis, at: (u: number) => Vec3, coarse: Coarse): Promise<{ zones: DeadZone[]; deadLength: number; refined: number }> {
  const { current, mutual } = coarse;
  const u = axis.values;
  const n = u.length;
  const na = ctx.na;
  const s = fineSteps(u[1]! - u[0]!, coarse.resolution);
  // samples in order: coarse nodes plus fine samples inside flagged intervals
  const flagged: number[] = [];
  for (let i = 0; i + 1 < n; i++) {
    if (s > 1 && changes(current[i]!, current[i + 1]!, mutual, i * na, mutual, (i + 1) * na, na, ctx.threshold)) flagged.push(i);
  }
  const positions = new Float64Array(flagged.length * (s - 1) * 3);
  let q = 0;
  for (const i of flagged) {
    for (let k = 1; k < s; k++) {
      const p = at(u[i]! + ((u[i + 1]! - u[i]!) * k) / s);
      positions[q++] = p[0];
      positions[q++] = p[1];
      positions[q++] = p[2];
    }
  }
  ctx.progress.add(positions.length / 3);
  const fine = positions.length > 0 ? await evaluatePositions(ctx, positions) : undefined;
  const su: number[] = [];
  const sc: number[] = [];
  let f = 0;
  for (let i = 0; i < n; i++) {
    su.push(u[i]!);
    sc.push(current[i]!);
    if (f < flagged.length && flagged[f] === i) {
      for (let k = 1; k < s; k++) {
        su.push(u[i]! + ((u[i + 1]! - u[i]!) * k) / s);
        sc.push(fine!.current[f * (s - 1) + k - 1]!);
      }
      f++;
    }
  }
  const zones: DeadZone[] = [];
  let deadLength = 0;
  let start: number | undefined;
  const cross = (a: number, b: number): number => {
    const fa = margin(sc[a]!, ctx.threshold);
    const fb = margin(sc[b]!, ctx.threshold);
    const t = fa === fb ? 0.5 : fa / (fa - fb);
    return su[a]! + t * (su[b]! - su[a]!);
  };
  for (let i = 0; i < su.length; i++) {
    const dead = sc[i]! < ctx.threshold;
    if (dead && start === undefined) start = i === 0 ? su[0]! : cross(i - 1, i);
    if (start !== undefined && (!dead || i === su.length - 1)) {
      const end = dead ? su[i]! : cross(i - 1, i);
      zones.push({ kind: "interval", from: at(start), to: at(end), length: Math.abs(end - start) });
      deadLength += Math.abs(end - start);
      start = undefined;
    }
  }
  return { zones, deadLength, refined: flagged.length };
}

// ── a plane ─────────────────────────────────────────────────────────────────────
async function refinePlane(
  ctx: Ctx,
  axisU: GridAxis,
  axisV: GridAxis,
  at: (u: number, v: number) => Vec3,
  coarse: Coarse,
  slice: number,
): Promise<{ zones: DeadZone[]; deadArea: number; refined: number }> {
  const { current, mutual } = coarse;
  const U = axisU.values;
  const V = axisV.values;
  const nu = U.length;
  const nv = V.length;
  const na = ctx.na;
  const th = ctx.threshold;
  const hu = (U[nu - 1]! - U[0]!) / (nu - 1);
  const hv = (V[nv - 1]! - V[0]!) / (nv - 1);
  const su = fineSteps(hu, coarse.resolution);
  const sv = fineSteps(hv, coarse.resolution);
  const NI = (nu - 1) * su;
  const NJ = (nv - 1) * sv;
  const cells = (nu - 1) * (nv - 1);
  const flagged = new Uint8Array(cells);
  const done = new Uint8Array(cells);
  // fine nodes: key I + (NI + 1)·J → slot; values in growable arrays
  const slot = new Map<number, number>();
  const fineCur: number[] = [];
  const fineM: number[] = [];
  const isCoarse = (I: number, J: number): boolean => I % su === 0 && J % sv === 0;
  const nodeCur = (I: number, J: number): number =>
    isCoarse(I, J) ? current[I / su + nu * (J / sv)]! : fineCur[slot.get(I + (NI + 1) * J)!]!;
  const nodeM = (I: number, J: number): [ArrayLike<number>, number] =>
    isCoarse(I, J) ? [mutual, (I / su + nu * (J / sv)) * na] : [fineM, slot.get(I + (NI + 1) * J)! * na];
  const nodeChange = (I1: number, J1: number, I2: number, J2: number): boolean => {
    const [ma, oa] = nodeM(I1, J1);
    const [mb, ob] = nodeM(I2, J2);
    return changes(nodeCur(I1, J1), nodeCur(I2, J2), ma, oa, mb, ob, na, th);
  };
  let queue: number[] = [];
  if (su > 1 || sv > 1) {
    for (let j = 0; j < nv - 1; j++) {
      for (let i = 0; i < nu - 1; i++) {
        const I = i * su;
        const J = j * sv;
        if (
          nodeChange(I, J, I + su, J) ||
          nodeChange(I, J + sv, I + su, J + sv) ||
          nodeChange(I, J, I, J + sv) ||
          nodeChange(I + su, J, I + su, J + sv)
        ) {
          flagged[i + (nu - 1) * j] = 1;
          queue.push(i + (nu - 1) * j);
        }
      }
    }
  }
  while (queue.length > 0) {
    // the fine nodes these cells need, each once
    const need: number[] = [];
    const wanted = new Set<number>();
    for (const c of queue) {
      const i = c % (nu - 1);
      const j = (c - i) / (nu - 1);
      for (let b = 0; b <= sv; b++) {
        for (let a = 0; a <= su; a++) {
          const I = i * su + a;
          const J = j * sv + b;
          const key = I + (NI + 1) * J;
          if (isCoarse(I, J) || slot.has(key) || wanted.has(key)) continue;
          wanted.add(key);
          need.push(key);
        }
      }
    }
    const positions = new Float64Array(need.length * 3);
    need.forEach((key, k) => {
      const I = key % (NI + 1);
      const J = (key - I) / (NI + 1);
      const p = at(U[0]! + (I * hu) / su, V[0]! + (J * hv) / sv);
      positions[3 * k] = p[0];
      positions[3 * k + 1] = p[1];
      positions[3 * k + 2] = p[2];
    });
    ctx.progress.add(need.length);
    const vals = need.length > 0 ? await evaluatePositions(ctx, positions) : undefined;
    need.forEach((key, k) => {
      slot.set(key, fineCur.length);
      fineCur.push(vals!.current[k]!);
      for (let t = 0; t < na; t++) fineM.push(vals!.mutual[k * na + t]!);
    });
    for (const c of queue) done[c] = 1;
    // a change on a side shared with an unrefined cell refines that cell too
    const next: number[] = [];
    const flag = (i: number, j: number): void => {
      if (i < 0 || j < 0 || i >= nu - 1 || j >= nv - 1) return;
      const c = i + (nu - 1) * j;
      if (flagged[c]) return;
      flagged[c] = 1;
      next.push(c);
    };
    for (const c of queue) {
      const i = c % (nu - 1);
      const j = (c - i) / (nu - 1);
      const I0 = i * su;
      const J0 = j * sv;
      let bottom = false, top = false, left = false, right = false;
      for (let a = 0; a < su; a++) {
        bottom ||= nodeChange(I0 + a, J0, I0 + a + 1, J0);
        top ||= nodeChange(I0 + a, J0 + sv, I0 + a + 1, J0 + sv);
      }
      for (let b = 0; b < sv; b++) {
        left ||= nodeChange(I0, J0 + b, I0, J0 + b + 1);
        right ||= nodeChange(I0 + su, J0 + b, I0 + su, J0 + b + 1);
      }
      if (bottom) flag(i, j - 1);
      if (top) flag(i, j + 1);
      if (left) flag(i - 1, j);
      if (right) flag(i + 1, j);
    }
    queue = next;
  }
  // ── dead zones: marching squares over coarse cells, fine sub-grids and a border ring ──
  const inside = (I: number, J: number): boolean => I >= 0 && J >= 0 && I <= NI && J <= NJ;
  // the coarse nodes' margins once: a coarse cell whose corners agree in sign holds no segment
  // (marching squares skips it the same way), so most cells are passed over without a visit
  const coarseMargin = new Float64Array(nu * nv);
  for (let k = 0; k < nu * nv; k++) coarseMargin[k] = margin(current[k]!, th);
  const mixed = (i: number, j: number): boolean => {
    const k = i + nu * j;
    const dead = coarseMargin[k]! < 0;
    return coarseMargin[k + 1]! < 0 !== dead || coarseMargin[k + nu]! < 0 !== dead || coarseMargin[k + nu + 1]! < 0 !== dead;
  };
  const field = {
    value: (I: number, J: number): number => (!inside(I, J) ? 1 : isCoarse(I, J) ? coarseMargin[I / su + nu * (J / sv)]! : margin(nodeCur(I, J), th)),
    u: (I: number): number => U[0]! + (Math.min(NI, Math.max(0, I)) * hu) / su,
    v: (J: number): number => V[0]! + (Math.min(NJ, Math.max(0, J)) * hv) / sv,
    key: (I: number, J: number): number => I + 1 + (NI + 3) * (J + 1),
  };
  const cellDone = (i: number, j: number): boolean => done[i + (nu - 1) * j] === 1;
  const loops = marchingSquares((quad) => {
    for (let j = 0; j < nv - 1; j++) {
      for (let i = 0; i < nu - 1; i++) {
        const I0 = i * su;
        const J0 = j * sv;
        if (!cellDone(i, j)) {
          if (mixed(i, j)) quad(I0, J0, I0 + su, J0 + sv);
          continue;
        }
        for (let b = 0; b < sv; b++) for (let a = 0; a < su; a++) quad(I0 + a, J0 + b, I0 + a + 1, J0 + b + 1);
      }
    }
    // border ring: zero-width quads to lit nodes outside close every loop along the border
    for (let i = 0; i < nu - 1; i++) {
      for (const [j, Jin, Jout] of [[0, 0, -1], [nv - 2, NJ, NJ + 1]] as const) {
        const stepI = cellDone(i, j) ? 1 : su;
        for (let I = i * su; I < (i + 1) * su; I += stepI) {
          if (Jout < Jin) quad(I, Jout, I + stepI, Jin);
          else quad(I, Jin, I + stepI, Jout);
        }
      }
    }
    for (let j = 0; j < nv - 1; j++) {
      for (const [i, Iin, Iout] of [[0, 0, -1], [nu - 2, NI, NI + 1]] as const) {
        const stepJ = cellDone(i, j) ? 1 : sv;
        for (let J = j * sv; J < (j + 1) * sv; J += stepJ) {
          if (Iout < Iin) quad(Iout, J, Iin, J + stepJ);
          else quad(Iin, J, Iout, J + stepJ);
        }
      }
    }
    quad(-1, -1, 0, 0);
    quad(NI, -1, NI + 1, 0);
    quad(-1, NJ, 0, NJ + 1);
    quad(NI, NJ, NI + 1, NJ + 1);
  }, field);
  // marching squares works in index order; a decreasing axis mirrors the plane and flips the sign
  const orientation = Math.sign(hu) * Math.sign(hv);
  const zones: DeadZone[] = [];
  let deadArea = 0;
  for (const l of loops) {
    const area = l.area * orientation;
    deadArea += area;
    zones.push({ kind: "polygon", vertices: l.points.map(([u, v]) => at(u, v)), area, slice });
  }
  let refined = 0;
  for (let c = 0; c < cells; c++) refined += done[c]!;
  return { zones, deadArea, refined };
}

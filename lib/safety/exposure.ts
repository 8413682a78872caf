/**
 * exposureCheck: the transmitters' magnetic field over the space people can reach against the
 * reference levels of ICNIRP 2010, ICNIRP 2020 (whole body and local), ICNIRP 1998 and IEEE
 * C95.1-2019, and the induced internal electric field against ICNIRP 2010's basic restriction.
 * An estimate from our own field model, not a compliance assessment.
 */
import * as z from "../zod.ts";
import { parseInput, length, lazySchema } from "../schema.ts";
import { requireObject } from "../errors.ts";
import { GEOMETRY_LIMITS } from "../em/inputs.ts";
import { MU0 } from "../constants.ts";
import type { Pose, Vec3 } from "../em/types.ts";
import { parseSafetyDesign, type SafetyDesign, type SafetyDesignParsed } from "./design.ts";
import { fieldPhasors, type FieldPhasors, type FieldSource } from "./fieldGrid.ts";
import { coilReach, windingTop } from "./geometry.ts";
import { RMS_CONVENTION, decibels, rmsFromPeak, rmsOfPhasorVector } from "./rms.ts";
import {
  EXPOSURE_STANDARDS,
  basicRestriction,
  referenceLevel,
  type ExposureStandardId,
  type Population,
  type SourceStatus,
} from "./referenceLevels.ts";

/** Highest grid height above the surface, m: a person is not found 1 km above a table (and the grid stays within the field sums' range). */
const MAX_GRID_HEIGHT = 1000;
/** an increasing pair [min, max] of world coordinates, within the field sums' ±1000 km (GEOMETRY_LIMITS) */
const range = lazySchema(() =>
  z.tuple([length({ positive: false, min: -GEOMETRY_LIMITS.maxLength, max: GEOMETRY_LIMITS.maxLength }), length({ positive: false, min: -GEOMETRY_LIMITS.maxLength, max: GEOMETRY_LIMITS.maxLength })])
    .refine((r) => r[1] > r[0], { error: "must be an increasing pair [min, max] in m" }));

/** Options of {@link exposureCheck}. */
export const ExposureOptionsInput = lazySchema(() => z.strictObject({
  /** accessible x range (world), m; default: the transmitters' footprint plus 0.1 m each side */
  x: range.optional(),
  /** accessible y range (world), m; default as x */
  y: range.optional(),
  /** heights above the surface, m: [lowest, highest]; default [0, 0.3] */
  height: z.tuple([length({ nonNegative: true, max: MAX_GRID_HEIGHT }), length({ positive: true, max: MAX_GRID_HEIGHT })]).refine((r) => r[1] > r[0], { error: "must be an increasing pair [lowest, highest] in m" }).optional(),
  /** grid points along x, y and height; default 41, 41, 11 */
  nx: z.int().min(2).max(1001).optional(),
  ny: z.int().min(2).max(1001).optional(),
  nz: z.int().min(2).max(1001).optional(),
  /** conducting discs for the basic restriction: default a hand (radius 0.05 m) and a torso (0.15 m) */
  discs: z.array(z.strictObject({ label: z.string(), radius: length() })).optional(),
  /** disc centres per side on the surface (default 11: the flux through a hand-sized disc changes slowly with its centre) */
  discGrid: z.int().min(2).max(201).optional(),
}));
export type ExposureOptions = z.input<typeof ExposureOptionsInput>;

/**
 * Default conducting discs: a hand (radius 5 cm) and a torso cross-section (radius 15 cm) —
 * trade practice (no source), sizes of an adult palm and chest seen face-on.
 */
export const DEFAULT_DISCS = [
  { label: "hand", radius: 0.05 },
  { label: "torso", radius: 0.15 },
] as const;

/** A reference level compared with the field where people can reach. */
export interface ReferenceLevelVerdict {
  readonly standard: ExposureStandardId;
  readonly population: Population;
  /** "meets", "exceeds", or "not covered" (no row of the table at this frequency) */
  readonly verdict: "meets" | "exceeds" | "not covered";
  /** the limit, T RMS, and as H, A/m RMS (absent when not covered) */
  readonly limit?: number;
  readonly limitH?: number;
  readonly row?: string;
  readonly status?: SourceStatus;
  /** worst accessible field / limit */
  readonly ratio?: number;
  /** 20·log10(limit / worst field), dB (negative when exceeded) */
  readonly marginDb?: number;
  /**
   * lowest grid height above the surface from which the level is met at every accessible point
   * of every higher level, m (conservative to one grid spacing: the level below fails); 0 when
   * met everywhere; undefined when not met even at the top of the assessed space.
   */
  readonly compliantAbove?: number;
  readonly text: string;
}

/** The induced internal field of a conducting disc compared with the basic restriction. */
export interface BasicRestrictionVerdict {
  readonly disc: string;
  /** disc radius, m */
  readonly radius: number;
  readonly population: Population;
  /** largest rim field over the disc positions, V/m RMS */
  readonly internalField: number;
  /** where the disc centre was, m (world), lying on the surface */
  readonly at: Vec3;
  /** flux through the disc there, Wb RMS */
  readonly flux: number;
  readonly limit?: number;
  readonly row?: string;
  readonly ratio?: number;
  readonly marginDb?: number;
  readonly verdict: "meets" | "exceeds" | "not covered";
  readonly text: string;
}

/** What exposureCheck returns (fields RMS; see `convention`). */
export interface ExposureCheck {
  readonly frequency: number;
  /** the worst accessible point: position (world, m), height above the surface (m), B and H RMS */
  readonly worst: { readonly point: Vec3; readonly height: number; readonly flux: number; readonly fieldStrength: number };
  /** largest B (T RMS) over each level of the grid, by height above the surface */
  readonly profile: readonly { readonly height: number; readonly flux: number }[];
  readonly referenceLevels: readonly ReferenceLevelVerdict[];
  readonly basicRestriction: readonly BasicRestrictionVerdict[];
  /** which assessment governs, in one plain sentence per population */
  readonly governs: readonly string[];
  /** the grid that was assessed, in words */
  readonly grid: string;
  readonly convention: string;
  readonly model: string;
  readonly warnings: readonly string[];
  readonly disclaimer: string;
}

/** Printed with every exposure result. */
export const EXPOSURE_DISCLAIMER =
  "An estimate from tanklight's field model of the unperturbed field, not a compliance assessment; exposure compliance is decided by measurement or dosimetry under the rules that apply where the product is used (local codes, regulations and licensed practice).";

/**
 * Internal-field model: a homogeneous conducting disc of radius r facing the field; Faraday's
 * law on its rim gives E = ω·Φ/(2πr) (uniform field: E = ωBr/2) — the circular-loop model used
 * to relate reference levels to basic restrictions (ICNIRP 1998, "induced current density in a
 * loop of radius R", from memory (unverified); Faraday's law: Griffiths, Introduction to
 * Electrodynamics, §7.2).
 */
export const DISC_MODEL =
  "homogeneous conducting disc facing the field, lying on the surface; Faraday's law on its rim: E = ω·Φ/(2πr) (Griffiths §7.2; the loop model behind the low-frequency reference levels)";

const fmtT = (b: number): string => (b >= 1e-3 ? `${(b * 1e3).toPrecision(3)} mT` : `${(b * 1e6).toPrecision(3)} µT`);
const fmtM = (x: number): string => `${(x * 1e3).toPrecision(3)} mm`;

interface Grid {
  readonly xs: Float64Array;
  readonly ys: Float64Array;
  readonly heights: Float64Array;
  readonly nx: number;
  readonly ny: number;
}

function linspace(a: number, b: number, n: number): Float64Array {
  return Float64Array.from({ length: n }, (_, i) => a + ((b - a) * i) / (n - 1));
}

function sourcesOf(d: SafetyDesignParsed): FieldSource[] {
  return d.transmitters.map((t) => ({ coil: t.coil, pose: (t.pose as Pose | undefined) ?? { position: [0, 0, 0] }, current: t.current, phase: t.phase ?? 0 }));
}

function gridOf(o: z.output<typeof ExposureOptionsInput>, sources: readonly FieldSource[]): Grid {
  let x0 = Infinity, x1 = -Infinity, y0 = Infinity, y1 = -Infinity;
  for (const s of sources) {
    const r = coilReach(s.coil);
    const [px, py] = s.pose.position;
    x0 = Math.min(x0, px - r); x1 = Math.max(x1, px + r);
    y0 = Math.min(y0, py - r); y1 = Math.max(y1, py + r);
  }
  const margin = 0.1;
  const xr = o.x ?? [x0 - margin, x1 + margin];
  const yr = o.y ?? [y0 - margin, y1 + margin];
  const hr = o.height ?? [0, 0.3];
  const nx = o.nx ?? 41, ny = o.ny ?? 41, nz = o.nz ?? 11;
  // level points: the nx·ny plane, repeated at each height
  const xs = new Float64Array(nx * ny), ys = new Float64Array(nx * ny);
  const gx = linspace(xr[0], xr[1], nx), gy = linspace(yr[0], yr[1], ny);
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) { xs[j * nx + i] = gx[i]!; ys[j * nx + i] = gy[j]!; }
  return { xs, ys, heights: linspace(hr[0], hr[1], nz), nx, ny };
}

/**
 * The lowest grid height from which every level's maximum stays ≤ limit (conservative: the
 * true height lies between it and the grid level below), or undefined when the top level fails.
 */
function compliantAbove(profile: readonly { height: number; flux: number }[], limit: number): number | undefined {
  let k = profile.length;
  while (k > 0 && profile[k - 1]!.flux <= limit) k--;
  return k === profile.length ? undefined : profile[k]!.height;
}

function verdictText(ratio: number, what: string): { verdict: "meets" | "exceeds"; text: string; marginDb: number } {
  const marginDb = -decibels(ratio, 1);
  if (ratio <= 1) return { verdict: "meets", marginDb, text: `meets ${what} with a margin of ×${(1 / ratio).toPrecision(3)} (${marginDb.toFixed(1)} dB)` };
  return { verdict: "exceeds", marginDb, text: `EXCEEDS ${what} by ×${ratio.toPrecision(3)} (${(-marginDb).toFixed(1)} dB)` };
}

/** Flux (phasor, Wb peak) through horizontal discs of radius r at each centre, by polar Gauss–Legendre × trapezoid cubature. */
function discFluxes(sources: readonly FieldSource[], cx: Float64Array, cy: Float64Array, z: number, r: number): { re: Float64Array; im: Float64Array } {
  // 8-point Gauss–Legendre on [0, r] in the radius (weight ρ dρ), 16 equally spaced angles (exact for trigonometric polynomials to degree 15)
  const GL_X = [-0.9602898564975363, -0.7966664774136267, -0.5255324099163290, -0.1834346424956498, 0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363];
  const GL_W = [0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.3626837833783620, 0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763];
  const NA = 16;
  const per = GL_X.length * NA;
  const n = cx.length;
  const xs = new Float64Array(n * per), ys = new Float64Array(n * per), w = new Float64Array(per);
  for (let a = 0; a < GL_X.length; a++) {
    const rho = 0.5 * r * (GL_X[a]! + 1);
    for (let b = 0; b < NA; b++) {
      const th = (2 * Math.PI * b) / NA;
      const q = a * NA + b;
      w[q] = 0.5 * r * GL_W[a]! * rho * ((2 * Math.PI) / NA);
      for (let c = 0; c < n; c++) { xs[c * per + q] = cx[c]! + rho * Math.cos(th); ys[c * per + q] = cy[c]! + rho * Math.sin(th); }
    }
  }
  const f = fieldPhasors(sources, { xs, ys, zs: Float64Array.of(z) });
  const re = new Float64Array(n), im = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    let sr = 0, si = 0;
    for (let q = 0; q < per; q++) { sr += w[q]! * f.re[2][c * per + q]!; si += w[q]! * f.im[2][c * per + q]!; }
    re[c] = sr; im[c] = si;
  }
  return { re, im };
}

/**
 * The transmitters' magnetic field over the space people can reach, against the reference
 * levels of ICNIRP 2010 (Tables 3–4), ICNIRP 2020 (Tables 5–6, whole body and local, above
 * 100 kHz), ICNIRP 1998 (Tables 6–7) and IEEE C95.1-2019 for the operating frequency, and the
 * internal electric field induced in a hand- and a torso-sized conducting disc against ICNIRP
 * 2010's basic restriction (Table 2) — both verdicts side by side, with which governs.
 *
 * Field: lib/em's model (circles by the closed form of Simpson et al. 2001, segments by
 * Biot–Savart) at each transmitter's operating current (peak, with its phase), summed as
 * phasors over a grid of nx × ny × nz points: the accessible box above the surface (default:
 * the footprint plus 0.1 m each side, 0–0.3 m above the surface, 41 × 41 × 11). Peak to RMS in
 * one place (rms.ts). Internal field: {@link DISC_MODEL}, discs lying on the surface.
 *
 * @param design see {@link SafetyDesign} (or build one with designFromLink).
 * @param options grid, discs (see {@link ExposureOptionsInput}).
 * @returns {@link ExposureCheck}: worst point, per-height profile, one verdict per standard
 *   and population with its margin and the height above which it is met, the basic-restriction
 *   verdicts, which governs, conventions, warnings and a disclaimer.
 * @example exposureCheck({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil: tx, current: 1 }] }).worst.flux // → 5.8632e-4 (T RMS, on the surface over the winding)
 */
export function exposureCheck(design: SafetyDesign, options: ExposureOptions = {}): ExposureCheck {
  const where = "exposureCheck";
  const d = parseSafetyDesign(design, where);
  requireObject(options, "options", where);
  const o = parseInput(ExposureOptionsInput, options, where);
  const f = d.frequency;
  const sources = sourcesOf(d);
  const warnings: string[] = [];
  const top = Math.max(...sources.map((s) => windingTop(s.coil, s.pose)));
  if (d.surfaceHeight <= top) {
    warnings.push(`the surface (z = ${fmtM(d.surfaceHeight)}) is not above the winding's top (z = ${fmtM(top)}): the field at the surface is that of the bare wire`);
  }
  const g = gridOf(o, sources);
  const n = g.nx * g.ny;
  const zs = g.heights.map((h) => d.surfaceHeight + h);
  const B = fieldPhasors(sources, { xs: g.xs, ys: g.ys, zs });

  const { profile, worst } = fieldScan(B, g, zs);
  const referenceLevels = referenceLevelVerdicts(worst.flux, profile, f, g.heights);
  const nd = o.discGrid ?? 11;
  const basic = basicRestrictionVerdicts(sources, g, d.surfaceHeight, f, nd, o.discs ?? DEFAULT_DISCS);

  const governs = (["public", "occupational"] as const).map((pop) => governsSentence(pop, referenceLevels, basic, f));
  return {
    frequency: f,
    worst,
    profile,
    referenceLevels,
    basicRestriction: basic,
    governs,
    grid: `${g.nx} × ${g.ny} × ${g.heights.length} points: x ${fmtM(g.xs[0]!)}…${fmtM(g.xs[g.nx - 1]!)}, y ${fmtM(g.ys[0]!)}…${fmtM(g.ys[n - 1]!)}, ${fmtM(g.heights[0]!)}…${fmtM(g.heights[g.heights.length - 1]!)} above the surface; discs centred on a ${nd} × ${nd} grid on the surface`,
    convention: RMS_CONVENTION,
    model: `field: lib/em (loop closed form, Simpson et al. 2001; segments by Biot–Savart) at each transmitter's operating current, summed as phasors; internal field: ${DISC_MODEL}`,
    warnings,
    disclaimer: EXPOSURE_DISCLAIMER,
  };
}

/** The RMS flux density at every grid point: the largest per height (the profile) and the worst point. */
function fieldScan(B: FieldPhasors, g: Grid, zs: ArrayLike<number>): { profile: { height: number; flux: number }[]; worst: ExposureCheck["worst"] } {
  const n = g.nx * g.ny;
  const profile: { height: number; flux: number }[] = [];
  let worstIdx = 0, worstB = -1;
  for (let k = 0; k < g.heights.length; k++) {
    let m = 0;
    for (let i = 0; i < n; i++) {
      const j = k * n + i;
      const r2 = B.re[0][j]! ** 2 + B.re[1][j]! ** 2 + B.re[2][j]! ** 2;
      const i2 = B.im[0][j]! ** 2 + B.im[1][j]! ** 2 + B.im[2][j]! ** 2;
      const b = rmsOfPhasorVector(r2, i2);
      if (b > m) m = b;
      if (b > worstB) { worstB = b; worstIdx = j; }
    }
    profile.push({ height: g.heights[k]!, flux: m });
  }
  const wk = Math.floor(worstIdx / n), wi = worstIdx % n;
  const worst = { point: [g.xs[wi]!, g.ys[wi]!, zs[wk]!] as Vec3, height: g.heights[wk]!, flux: worstB, fieldStrength: worstB / MU0 };

  return { profile, worst };
}

/** One verdict per carried standard and population: the worst point against its reference level, and the height above which it is met. */
function referenceLevelVerdicts(worstB: number, profile: readonly { height: number; flux: number }[], f: number, heights: ArrayLike<number>): ReferenceLevelVerdict[] {
  const referenceLevels: ReferenceLevelVerdict[] = [];
  for (const s of EXPOSURE_STANDARDS) {
    for (const pop of ["public", "occupational"] as const) {
      const lv = referenceLevel(s.id, pop, f);
      if (!lv) {
        referenceLevels.push({ standard: s.id, population: pop, verdict: "not covered", text: `${s.id} (${pop}): no row of the carried tables covers ${(f / 1e3).toPrecision(4)} kHz` });
        continue;
      }
      const ratio = worstB / lv.flux;
      const v = verdictText(ratio, `${lv.row} (${fmtT(lv.flux)} RMS)`);
      const above = compliantAbove(profile, lv.flux);
      const where2 = above === undefined ? `; not met anywhere up to ${fmtM(heights[heights.length - 1]!)} above the surface` : above > 0 ? `; met from ${fmtM(above)} above the surface (grid level; the one below fails)` : "";
      referenceLevels.push({
        standard: s.id, population: pop, verdict: v.verdict, limit: lv.flux, limitH: lv.fieldStrength, row: lv.row, status: lv.status,
        ratio, marginDb: v.marginDb, ...(above !== undefined ? { compliantAbove: above } : {}),
        text: `${s.id} (${pop}, ${lv.status}): worst ${fmtT(worstB)} RMS ${v.text}${where2}`,
      });
    }
  }

  return referenceLevels;
}

/** Basic restriction: discs lying on the surface, centres on an nd × nd sub-grid of the accessible plane; one verdict per disc and population. */
function basicRestrictionVerdicts(sources: readonly FieldSource[], g: Grid, surfaceHeight: number, f: number, nd: number, discs: readonly { readonly label: string; readonly radius: number }[]): BasicRestrictionVerdict[] {
  const n = g.nx * g.ny;
  const gx = linspace(g.xs[0]!, g.xs[g.nx - 1]!, nd), gy = linspace(g.ys[0]!, g.ys[n - 1]!, nd);
  const cx = new Float64Array(nd * nd), cy = new Float64Array(nd * nd);
  for (let j = 0; j < nd; j++) for (let i = 0; i < nd; i++) { cx[j * nd + i] = gx[i]!; cy[j * nd + i] = gy[j]!; }
  const basic: BasicRestrictionVerdict[] = [];
  const w = 2 * Math.PI * f;
  for (const disc of discs) {
    const phi = discFluxes(sources, cx, cy, surfaceHeight + g.heights[0]!, disc.radius);
    let best = 0, bi = 0;
    for (let c = 0; c < cx.length; c++) {
      const a = Math.hypot(phi.re[c]!, phi.im[c]!);
      if (a > best) { best = a; bi = c; }
    }
    const fluxRms = rmsFromPeak(best);
    const e = (w * fluxRms) / (2 * Math.PI * disc.radius);
    const at: Vec3 = [cx[bi]!, cy[bi]!, surfaceHeight + g.heights[0]!];
    for (const pop of ["public", "occupational"] as const) {
      const br = basicRestriction(pop, f);
      if (!br) {
        basic.push({ disc: disc.label, radius: disc.radius, population: pop, internalField: e, at, flux: fluxRms, verdict: "not covered", text: `${disc.label} disc: ${e.toPrecision(3)} V/m RMS; ICNIRP 2010 Table 2 does not cover ${(f / 1e3).toPrecision(4)} kHz` });
        continue;
      }
      const ratio = e / br.field;
      const v = verdictText(ratio, `${br.row} (${br.field.toPrecision(3)} V/m RMS)`);
      basic.push({
        disc: disc.label, radius: disc.radius, population: pop, internalField: e, at, flux: fluxRms, limit: br.field, row: br.row, ratio, marginDb: v.marginDb, verdict: v.verdict,
        text: `${disc.label}-sized disc (r = ${fmtM(disc.radius)}, ${pop}): induced field ${e.toPrecision(3)} V/m RMS ${v.text}`,
      });
    }
  }

  return basic;
}

function governsSentence(pop: Population, levels: readonly ReferenceLevelVerdict[], basic: readonly BasicRestrictionVerdict[], f: number): string {
  const who = pop === "public" ? "General public" : "Occupational";
  const rl = levels.find((l) => l.standard === "ICNIRP 2010" && l.population === pop);
  const br = basic.filter((b) => b.population === pop && b.verdict !== "not covered");
  const rf = f >= 100e3 ? " Above 100 kHz the ICNIRP 2020 levels (heating) apply in addition and must be met on their own." : "";
  if (!rl || rl.verdict === "not covered" || br.length === 0) return `${who}: ICNIRP 2010 does not cover ${(f / 1e3).toPrecision(4)} kHz; only the other tables apply.${rf}`;
  const brOk = br.every((b) => b.verdict === "meets");
  if (rl.verdict === "meets") return `${who}: the ICNIRP 2010 reference level is met at every accessible point, so its basic restriction is met too (the levels are derived to ensure it).${rf}`;
  if (brOk) {
    return `${who}: the field exceeds the ICNIRP 2010 reference level near the transmitter, but the induced internal field of the disc model stays within the basic restriction. The basic restriction governs — the reference level assumes a field uniform over the body and is conservative for a small, local source — but the disc model is an estimate: claiming compliance needs a dosimetric assessment.${rf}`;
  }
  return `${who}: both the ICNIRP 2010 reference level and the basic restriction (disc model) are exceeded where people can reach: the design does not meet ICNIRP 2010 at this current; lower the current, raise the surface or keep people away.${rf}`;
}

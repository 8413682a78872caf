/**
 * One candidate of searchDesign, evaluated: coils built from the candidate's numbers, tanks
 * tuned with E-series parts, every transmitter coil on its own half bridge from the named supply
 * (an array's coils at their layout's drive phases), then four margins, natural logarithms of a
 * ratio, ≥ 0 when met:
 *   coverage = ln(I_q / I_lit), I_q the LED current met on the required share of the region's area
 *              (the weakest point for a share of 1), worst over the LED colours and tilts;
 *   supply   = ln(0.8·I_rated / I_DC), I_DC the largest DC draw over the token's positions and no
 *              token at all (80 % derating, trade practice, no source);
 *   exposure = (dB margin − required dB)·ln10/20, the chosen verdict of exposureCheck (lib/safety):
 *              ICNIRP 2010's basic restriction in a hand- and a torso-sized disc, or a reference level;
 *   emission = (dB margin − required dB)·ln10/20, the smallest margin of emissionEstimate's rules.
 * The smallest margin is the score and the binding constraint.
 *
 * Coverage. One coil: the LED current along a radius of the region at the token's height
 * (bracketing and bisection, ./findRange.ts, so a dark ring is found), read at the radii of the
 * region's points. An array: the LED current at every point of a grid over the region whose
 * lines include every coil's centre and every seam between coils (where phased arrays put their
 * nulls), spacing at most a quarter of the pitch (7–17 lines a side); searchDesign re-checks its
 * finalists with coverageMap's refinement, which finds dead lines thinner than the grid.
 *
 * Safety operating point: the transmitters' currents with no token, or with a token at the
 * region's centre if that is larger (a token's reflected load lowers a tuned transmitter's
 * current, but a detuned pair can raise it). An array's emission is emissionEstimate's for the
 * actual phases (the coils' dipole fields superposed from their own centres, so alternate and
 * quadrature phasing are credited with their lower far field); where that model does not apply it
 * takes every coil in phase, and the emission text says which.
 * Plain data in and out, so worker threads can evaluate candidates.
 */
import { roundCoil } from "../em/builders/roundCoil.ts";
import { selfInductance } from "../em/selfInductance.ts";
import type { Coil, Vec3 } from "../em/types.ts";
import { nearestStandardValue, type ESeries } from "../circuit/eseries.ts";
import { ledPreset, type LedColour } from "../circuit/loads/ledPresets.ts";
import type { Led } from "../circuit/loads/led.ts";
import type { TokenLoad } from "../circuit/loads/types.ts";
import { solveLink, type LinkSystem } from "../circuit/link.ts";
import { designFromLink, type SafetyDesign } from "../safety/design.ts";
import { exposureCheck, type ExposureCheck } from "../safety/exposure.ts";
import { emissionEstimate, type EmissionEstimate } from "../safety/emission.ts";
import { cautions as safetyCautions } from "../safety/cautions.ts";
import type { ExposureStandardId, Population } from "../safety/referenceLevels.ts";
import { makeProbe } from "./probe.ts";
import { probeSpec } from "./probeSpec.ts";
import { rangeWith } from "./findRange.ts";
import { SUPPLY_DERATING } from "./supplyBudget.ts";

/** How an array's coils are phased: all in phase; alternate 0°/180° like a chessboard; 0°/90° like a chessboard. */
export type Phasing = "in phase" | "alternate" | "quadrature";

/** An array layout: rows × columns of equal coils, centres `pitch` apart, centred on the region. */
export interface Layout {
  readonly rows: number;
  readonly columns: number;
  /** centre-to-centre distance along x (between columns) and y (between rows), m (0 for one coil) */
  readonly pitchX: number;
  readonly pitchY: number;
  readonly phasing: Phasing;
}

/** The numbers that make one design. */
export interface Candidate {
  /** transmitter mean radius, m */
  readonly radius: number;
  /** transmitter turns (a flat winding: one turn per layer, layers outward) */
  readonly turns: number;
  /** transmitter wire diameter, m */
  readonly wire: number;
  /** drive frequency, Hz */
  readonly frequency: number;
  readonly tokenTurns: number;
  /** one coil (1 × 1) or an array */
  readonly layout: Layout;
}

/** Which requirement a margin belongs to. */
export type Constraint = "coverage" | "supply" | "exposure" | "emission";

/** The safety requirements as plain data. */
export interface SafetyProblem {
  readonly population: Population;
  /** "basic restriction": ICNIRP 2010 Table 2 in hand- and torso-sized discs; "reference level": the named standard's table */
  readonly assess: "basic restriction" | "reference level";
  readonly standard: ExposureStandardId;
  /** margin the exposure verdict must keep, dB */
  readonly exposureMarginDb: number;
  /** the emission rules that apply (ids of EMISSION_RULES) */
  readonly emissionRules: readonly string[];
  /** margin the emission estimate must keep, dB */
  readonly emissionMarginDb: number;
}

/** The fixed part of the problem, as plain SI numbers. */
export interface DesignProblem {
  /** the region: a rectangle centred on the origin, or a disc */
  readonly cover: { readonly width: number; readonly depth: number } | { readonly radius: number };
  /** region points as radii from the centre, sorted (one coil's axisymmetric coverage), m */
  readonly radii: readonly number[];
  readonly reach: number;
  readonly share: number;
  readonly barrier: number;
  readonly token: { readonly innerRadius: number; readonly layers: number; readonly wire: number; readonly size?: number };
  readonly colours: readonly LedColour[];
  readonly supplyVoltage: number;
  readonly supplyRating: number;
  readonly tilt: number;
  readonly litThreshold: number;
  readonly series: ESeries;
  readonly onResistance: number;
  readonly safety: SafetyProblem;
}

/** An evaluated design (SI). */
export interface DesignEvaluation {
  readonly candidate: Candidate;
  readonly transmitterCapacitance: number;
  readonly tokenCapacitance: number;
  readonly tokenHeight: number;
  readonly transmitterInductance: number;
  readonly tokenInductance: number;
  /** outer radius of each transmitter winding, m */
  readonly transmitterOuterRadius: number;
  /** LED current met on the required share of the area (worst colour), A */
  readonly coveredCurrent: number;
  /** the weakest point's LED current, where (x, y at the token height, m) and colour */
  readonly weakest: { readonly current: number; readonly at: readonly [number, number]; readonly colour: LedColour };
  /** largest DC supply current, A */
  readonly supplyCurrent: number;
  /** the safety operating point: largest transmitter coil current, A peak, and tank capacitor voltage, V peak */
  readonly coilCurrent: number;
  readonly tankVoltage: number;
  /** the exposure and emission verdicts in words (with their dB margins) */
  readonly exposure: string;
  readonly emission: string;
  /** margins as natural logs of a ratio; exposure and emission also in dB beyond the required margin */
  readonly margins: { readonly coverage: number; readonly supply: number; readonly exposure: number; readonly emission: number };
  readonly score: number;
  readonly binding: Constraint;
  /** the plain-language cautions for this design (lib/safety cautions: implants, metal, voltage, small parts, radio) */
  readonly cautions: readonly string[];
}

/** Natural-log margin per dB of an amplitude ratio: ln(10)/20. */
export const NEPER_PER_DB = Math.LN10 / 20;

/** The transmitters' centres of a layout, row by row, m. */
export function layoutCentres(l: Layout): [number, number][] {
  const out: [number, number][] = [];
  for (let r = 0; r < l.rows; r++) for (let c = 0; c < l.columns; c++) out.push([(c - (l.columns - 1) / 2) * l.pitchX, (r - (l.rows - 1) / 2) * l.pitchY]);
  return out;
}

/** The drive phase of the coil at row r, column c, rad. */
export function layoutPhase(l: Layout, r: number, c: number): number {
  const odd = (r + c) % 2 === 1;
  switch (l.phasing) {
    case "in phase":
      return 0;
    case "alternate":
      return odd ? Math.PI : 0;
    case "quadrature":
      return odd ? Math.PI / 2 : 0;
  }
}

/** Builds the transmitter winding of a candidate (flat: one turn per layer, layers outward). */
export function transmitterCoil(c: Candidate): Coil {
  return roundCoil({ meanRadius: c.radius, turns: c.turns, layers: c.turns, wire: { diameter: c.wire, insulation: 0.03e-3 } });
}

/** The token coil of a candidate. */
export function tokenCoil(c: Candidate, p: DesignProblem): Coil {
  return roundCoil({ innerRadius: p.token.innerRadius, turns: c.tokenTurns, layers: p.token.layers, wire: { diameter: p.token.wire, insulation: 0.01e-3 } });
}

/**
 * One token-load object per preset LED (the LED objects are themselves built once per colour), so
 * the link solver's tabulated describing function — kept per load object — is built once per
 * thread, not once per candidate. A WeakMap keyed by the immutable LED.
 */
const ledLoads = new WeakMap<Led, TokenLoad>();
function ledLoad(colour: LedColour): TokenLoad {
  const led = ledPreset(colour);
  let load = ledLoads.get(led);
  if (!load) {
    load = { kind: "led", led };
    ledLoads.set(led, load);
  }
  return load;
}

/** Clearance kept between neighbouring windings of an array, m (trade practice, no source: a few mm for insulation and mounting). */
export const ARRAY_CLEARANCE = 2e-3;

/**
 * The link system of a candidate with one token of `colour` at `position` (or none), SI.
 * @throws Error when an array's windings would touch (outer diameter + clearance > pitch).
 */
export function candidateSystem(c: Candidate, p: DesignProblem, parts: { tx: Coil; token: Coil; C1: number; C2: number }, colour: LedColour | undefined, position: Vec3): LinkSystem {
  const l = c.layout;
  const outer = parts.tx.shape?.kind === "roundCoil" ? parts.tx.shape.outerRadius : c.radius;
  if ((l.columns > 1 && 2 * outer + ARRAY_CLEARANCE > l.pitchX) || (l.rows > 1 && 2 * outer + ARRAY_CLEARANCE > l.pitchY)) {
    throw new Error(`windings of ${(outer * 1e3).toFixed(1)} mm outer radius touch at ${(l.pitchX * 1e3).toFixed(0)} × ${(l.pitchY * 1e3).toFixed(0)} mm pitch`);
  }
  const receivers: LinkSystem["receivers"] =
    colour === undefined ? [] : [{ coil: parts.token, pose: { position }, topology: "parallel", capacitor: { capacitance: parts.C2 }, load: ledLoad(colour) }];
  const drive = { kind: "halfBridge" as const, supply: p.supplyVoltage, onResistance: p.onResistance };
  if (l.rows * l.columns === 1) {
    return { frequency: c.frequency, transmitter: { coil: parts.tx, compensation: "series", capacitor: { capacitance: parts.C1 }, drive }, receivers };
  }
  const centres = layoutCentres(l);
  return {
    frequency: c.frequency,
    transmitters: centres.map(([x, y], i) => ({
      label: `coil ${Math.floor(i / l.columns) + 1}.${(i % l.columns) + 1}`,
      coil: parts.tx,
      pose: { position: [x, y, 0] as Vec3 },
      compensation: "series" as const,
      capacitor: { capacitance: parts.C1 },
      drive,
      phase: layoutPhase(l, Math.floor(i / l.columns), i % l.columns),
    })),
    receivers,
  };
}

/** Grid lines of an array's coverage grid along one side: uniform, plus the coils' centres and the seams between them. */
function gridLines(half: number, count: number, pitch: number): number[] {
  const n = Math.max(7, Math.min(17, Math.ceil((2 * half) / (pitch / 4)) + 1));
  const lines = Array.from({ length: n }, (_, i) => -half + (2 * half * i) / (n - 1));
  for (let k = 0; k < count; k++) {
    const centre = (k - (count - 1) / 2) * pitch;
    lines.push(centre);
    if (k > 0) lines.push(centre - pitch / 2);
  }
  return [...new Set(lines.filter((v) => Math.abs(v) <= half + 1e-12).map((v) => Math.round(v * 1e9) / 1e9))].sort((a, b) => a - b);
}

/** The array's grid points at the token height: x, y pairs inside the region. */
function arrayPoints(p: DesignProblem, l: Layout): [number, number][] {
  const hx = "radius" in p.cover ? p.cover.radius : p.cover.width / 2;
  const hy = "radius" in p.cover ? p.cover.radius : p.cover.depth / 2;
  const xs = gridLines(hx, l.columns, l.columns > 1 ? l.pitchX : 2 * hx);
  const ys = gridLines(hy, l.rows, l.rows > 1 ? l.pitchY : 2 * hy);
  const out: [number, number][] = [];
  for (const y of ys) for (const x of xs) if (!("radius" in p.cover) || Math.hypot(x, y) <= p.cover.radius + 1e-12) out.push([x, y]);
  return out;
}

/** LED current met on `share` of the points (the weakest for a share of 1). */
export function shareCurrent(currents: readonly number[], share: number): number {
  const s = [...currents].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((1 - share) * s.length))]!;
}

/**
 * Builds and evaluates one candidate design (see the module comment for the margins).
 * @param c the candidate's numbers; @param p the problem (see DesignProblem).
 * @throws Error when the coils cannot be built (a winding that does not fit, touching coils).
 */
export function evaluateDesign(c: Candidate, p: DesignProblem): DesignEvaluation {
  const w = 2 * Math.PI * c.frequency;
  const tx = transmitterCoil(c);
  const token = tokenCoil(c, p);
  const L1 = selfInductance(tx, { frequency: c.frequency });
  const L2 = selfInductance(token, { frequency: c.frequency });
  const C1 = nearestStandardValue(1 / (w * w * L1), p.series);
  const C2 = nearestStandardValue(1 / (w * w * L2), p.series);
  const parts = { tx, token, C1, C2 };
  const height = p.barrier + (token.shape?.kind === "roundCoil" ? token.shape.windingHeight / 2 : 0);
  const { coveredCurrent, weakest, supplyCurrent: tokenSupply } = candidateCoverage(c, p, parts, height);
  // safety at the larger of: no token, a token at the centre
  const bare = candidateSystem(c, p, parts, undefined, [0, 0, height]);
  const loaded = candidateSystem(c, p, parts, p.colours[0], [0, 0, height]);
  const solBare = solveLink(bare);
  const solLoaded = solveLink(loaded);
  const peak = (sol: typeof solBare): number => Math.max(...(sol.transmitters ?? [sol.transmitter]).map((t) => t.coilCurrent));
  const opSolution = peak(solLoaded) > peak(solBare) ? solLoaded : solBare;
  const supplyCurrent = Math.max(tokenSupply, Math.max(0, solBare.power.input) / p.supplyVoltage);
  const tokenSize = p.token.size ?? 2 * (token.shape?.kind === "roundCoil" ? token.shape.outerRadius : p.token.innerRadius);
  // the token as it is at the centre (its tank, LED and size for the cautions); the transmitters at the larger current
  const withToken = designFromLink(loaded, solLoaded, { surfaceHeight: p.barrier, tokenSize });
  const safetyDesign = opSolution === solLoaded ? withToken : { ...withToken, transmitters: designFromLink(bare, solBare, { surfaceHeight: p.barrier }).transmitters };
  const safety = safetyMargins(safetyDesign, p.safety);
  const coverage = Math.log(Math.max(coveredCurrent, 1e-6 * p.litThreshold) / p.litThreshold);
  const supply = Math.log((SUPPLY_DERATING * p.supplyRating) / Math.max(supplyCurrent, 1e-12));
  const margins = { coverage, supply, exposure: safety.exposure, emission: safety.emission };
  const binding = (Object.keys(margins) as Constraint[]).reduce((a, b) => (margins[b] < margins[a] ? b : a));
  return {
    candidate: c,
    transmitterCapacitance: C1,
    tokenCapacitance: C2,
    tokenHeight: height,
    transmitterInductance: L1,
    tokenInductance: L2,
    transmitterOuterRadius: tx.shape?.kind === "roundCoil" ? tx.shape.outerRadius : c.radius,
    coveredCurrent,
    weakest,
    supplyCurrent,
    coilCurrent: peak(opSolution),
    tankVoltage: Math.max(...(opSolution.transmitters ?? [opSolution.transmitter]).map((t) => t.capacitorVoltage)),
    exposure: safety.exposureText,
    emission: safety.emissionText,
    margins,
    score: margins[binding],
    binding,
    cautions: safetyCautions(safetyDesign, { exposure: safety.exposureCheck, emission: safety.emissionEstimate }).map((k) => k.text),
  };
}

/**
 * The candidate's coverage for every LED colour: the LED current met on `share` of the region,
 * the weakest point, and the largest supply current with a token present. One transmitter: a
 * range scan along x read at the region's radii; an array: the grid of region points.
 */
function candidateCoverage(c: Candidate, p: DesignProblem, parts: { tx: Coil; token: Coil; C1: number; C2: number }, height: number): Pick<DesignEvaluation, "coveredCurrent" | "weakest" | "supplyCurrent"> {
  const single = c.layout.rows * c.layout.columns === 1;
  let coveredCurrent = Infinity;
  let weakest: DesignEvaluation["weakest"] = { current: Infinity, at: [0, 0], colour: p.colours[0]! };
  let supplyCurrent = 0;
  const s = Math.sin(p.tilt);
  const ct = Math.cos(p.tilt);
  const axes: Vec3[] = p.tilt > 0 ? [[0, 0, 1], [0, s, ct], [s, 0, ct], [-s, 0, ct], [0, -s, ct]] : [[0, 0, 1]];
  const points = single ? [] : arrayPoints(p, c.layout);
  for (const colour of p.colours) {
    const system = candidateSystem(c, p, parts, colour, [0, 0, height]);
    const probe = makeProbe(probeSpec(system, { axes, litThreshold: p.litThreshold }, "searchDesign"));
    if (single) {
      const r = rangeWith(probe, [0, 0, height], [1, 0, 0], p.reach, p.reach / 40, Math.max(2e-4, p.reach / 1000));
      const curve = r.curve;
      // LED current at each region point's radius: linear between solved points, zero inside a dark stretch
      const at = (radius: number): number => {
        for (let k = 0; k + 1 < r.boundaries.length; k += 1) {
          const a = r.boundaries[k]!;
          const b = r.boundaries[k + 1]!;
          if (radius > a && radius < b && interpolate(curve, (a + b) / 2) < p.litThreshold) return 0;
        }
        return interpolate(curve, radius);
      };
      coveredCurrent = Math.min(coveredCurrent, shareCurrent(p.radii.map(at), p.share));
      for (const pt of curve) if (pt.current < weakest.current) weakest = { current: pt.current, at: [pt.distance, 0], colour };
      for (const radius of [0, p.reach]) supplyCurrent = Math.max(supplyCurrent, probe.at([radius, 0, height], [0, 0, 1]).supply);
    } else {
      const positions = new Float64Array(points.length * 3);
      points.forEach(([x, y], i) => positions.set([x, y, height], 3 * i));
      const v = probe.evaluate(positions);
      const currents = Array.from(v.current);
      coveredCurrent = Math.min(coveredCurrent, shareCurrent(currents, p.share));
      currents.forEach((I, i) => {
        if (I < weakest.current) weakest = { current: I, at: points[i]!, colour };
      });
      for (const d of v.supply) supplyCurrent = Math.max(supplyCurrent, d);
    }
  }
  return { coveredCurrent, weakest, supplyCurrent };
}

/** The exposure grid of the search: 13 × 13 points over the footprint plus 0.1 m, 3 heights up to 0.3 m, 5 × 5 disc centres (a coarse version of exposureCheck's default, for speed; the worst field is on the surface over a winding, which the grid's lowest level holds). */
export const SEARCH_EXPOSURE_GRID = { nx: 13, ny: 13, nz: 3, discGrid: 5 } as const;

function safetyMargins(
  design: SafetyDesign,
  s: SafetyProblem,
): { exposure: number; emission: number; exposureText: string; emissionText: string; exposureCheck: ExposureCheck; emissionEstimate: EmissionEstimate } {
  const ex = exposureCheck(design, SEARCH_EXPOSURE_GRID);
  let exposure = Infinity;
  let exposureText = "";
  if (s.assess === "basic restriction") {
    const rows = ex.basicRestriction.filter((b) => b.population === s.population && b.marginDb !== undefined);
    const worst = rows.reduce<(typeof rows)[number] | undefined>((a, b) => (a === undefined || b.marginDb! < a.marginDb! ? b : a), undefined);
    if (worst) {
      exposure = (worst.marginDb! - s.exposureMarginDb) * NEPER_PER_DB;
      exposureText = `${worst.text} (ICNIRP 2010 basic restriction; required margin ${s.exposureMarginDb} dB)`;
    } else exposureText = `the basic restriction (ICNIRP 2010 Table 2) does not cover ${(design.frequency as number) / 1e3} kHz: not assessed`;
  } else {
    const row = ex.referenceLevels.find((r) => r.standard === s.standard && r.population === s.population);
    if (row && row.marginDb !== undefined) {
      exposure = (row.marginDb - s.exposureMarginDb) * NEPER_PER_DB;
      exposureText = `${row.text} (required margin ${s.exposureMarginDb} dB)`;
    } else exposureText = row ? row.text : `${s.standard}: not carried`;
  }
  // an array: the coils' fields superposed with their actual phases, or the in-phase bound where
  // that model does not apply (emissionEstimate decides and says which)
  const em = emissionEstimate(design);
  const credited = em.array ? ` — ${em.array.method}: ${em.array.text}` : "";
  const rules = em.limits.filter((l) => s.emissionRules.includes(l.rule));
  const worstRule = rules.reduce<(typeof rules)[number] | undefined>((a, b) => (a === undefined || b.marginDb < a.marginDb ? b : a), undefined);
  const emission = worstRule ? (worstRule.marginDb - s.emissionMarginDb) * NEPER_PER_DB : Infinity;
  const emissionText = worstRule ? `${worstRule.text}${credited} (required margin ${s.emissionMarginDb} dB)` : `no chosen emission rule covers ${(em.frequency / 1e3).toPrecision(4)} kHz: not assessed`;
  return { exposure, emission, exposureText, emissionText, exposureCheck: ex, emissionEstimate: em };
}

function interpolate(curve: readonly { distance: number; current: number }[], x: number): number {
  let lo = 0;
  let hi = curve.length - 1;
  if (x <= curve[0]!.distance) return curve[0]!.current;
  if (x >= curve[hi]!.distance) return curve[hi]!.current;
  while (hi - lo > 1) {
    const m = (lo + hi) >> 1;
    if (curve[m]!.distance <= x) lo = m;
    else hi = m;
  }
  const a = curve[lo]!;
  const b = curve[hi]!;
  const t = b.distance > a.distance ? (x - a.distance) / (b.distance - a.distance) : 0;
  return a.current + t * (b.current - a.current);
}

/**
 * searchDesign(requirements, space, options): which transmitter (one coil or an array), frequency
 * and token to build.
 *
 * Family searched: round, flat transmitter windings (one turn per layer, layers outward),
 * series-tuned with an E-series capacitor, each on its own half bridge from the named supply —
 * one coil, or rows × columns of equal coils tiling the region (pitch given or filling the region,
 * drive phases in phase, alternating 0°/180° or 0°/90° like a chessboard); a wound token (your
 * former radius, layers and wire; turns searched) with an E-series capacitor and its LED. Each
 * candidate is scored by ./designEval.ts: the smallest of the coverage, supply, exposure and
 * emission margins (natural logs, ≥ 0 when met); the smallest one is the binding constraint.
 *
 * Method: a coarse grid over the space (each layout × phasing × up to 2–3 levels of radius,
 * turns, frequency and token turns, fewer levels when the budget is small), then compass search
 * (a pattern search: Kolda, Lewis & Torczon, "Optimization by direct search", SIAM Review
 * 45(3):385–482, 2003) from the best two grid points — each coordinate (radius, turns, frequency,
 * token turns, rows, columns, pitch) stepped ± its step and the other phasings tried, a better
 * point taken at once, steps halved when no neighbour improves; integers stop at a step of 1,
 * radius, pitch and frequency at 1 % of their range. Derivative-free because the score jumps
 * (E-series capacitors, integer turns, coil counts). The finalists are then re-checked with
 * coverageMap's refinement (dead lines thinner than the search grid; to `finalResolution`, 1 mm by
 * default, within the `maxRefineSolves` cost guard), re-ranked, and returned.
 */
import * as z from "../zod.ts";
import { frequency as frequencyQ, length, parseInput, angle, current as currentQ, lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import type { ESeries } from "../circuit/eseries.ts";
import type { LedColour } from "../circuit/loads/ledPresets.ts";
import { DEFAULT_LIT_THRESHOLD } from "../circuit/link/network.ts";
import { EMISSION_RULES } from "../safety/emissionLimits.ts";
import { EXPOSURE_STANDARDS, type ExposureStandardId } from "../safety/referenceLevels.ts";
import { SupplyInput, USB_SUPPLIES, SUPPLY_DERATING } from "./supplyBudget.ts";
import {
  candidateSystem,
  evaluateDesign,
  NEPER_PER_DB,
  tokenCoil,
  transmitterCoil,
  shareCurrent,
  type Candidate,
  type Constraint,
  type DesignEvaluation,
  type DesignProblem,
  type Layout,
  type Phasing,
} from "./designEval.ts";
import { coverageMap } from "./coverageMap.ts";
import { progressCounter, type ProgressCallback } from "./progress.ts";
import { checkThreads, taskPool, type TaskPool, type ThreadsOption } from "./pool.ts";

const colour = lazySchema(() => z.enum(["red", "orange", "yellow", "green-gap", "green-ingan", "blue", "white"]));
const range = <T extends z.ZodType<number, number | string>>(q: T) => z.strictObject({ min: q, max: q });
const intRange = (max: number) => z.strictObject({ min: z.number().int().min(1).max(max), max: z.number().int().min(1).max(max) });
const PHASINGS = ["in phase", "alternate", "quadrature"] as const satisfies readonly Phasing[];
const RULE_IDS = EMISSION_RULES.map((r) => r.id) as [string, ...string[]];
const STANDARD_IDS = EXPOSURE_STANDARDS.map((s) => s.id) as [ExposureStandardId, ...ExposureStandardId[]];

/** Default margin the exposure and emission estimates must keep: 6 dB (they are estimates, not compliance tests; trade practice, no source). */
export const DEFAULT_SAFETY_MARGIN_DB = 6;

/** What the design must do (quantities with units). */
export const RequirementsInput = lazySchema(() => z.strictObject({
  /** the area tokens may be put on, centred over the transmitter (or the array): a rectangle or a disc */
  cover: z.union([z.strictObject({ width: length(), depth: length() }), z.strictObject({ radius: length() })]),
  /** barrier between the transmitter winding and the token's underside (the touchable surface), m */
  barrier: length({ nonNegative: true }),
  /** the token's coil: former radius, layers (default 4), wire diameter (default 0.1 mm); its outer size for the small-parts caution (default: the winding's outer diameter) */
  token: z.strictObject({ innerRadius: length(), layers: z.number().int().min(1).max(30).optional(), wire: length().optional(), size: length().optional() }),
  /** LED colours that must all light */
  colours: z.array(colour).min(1),
  /** the supply and its current budget */
  supply: SupplyInput,
  /** allowed drive frequency band */
  frequency: range(frequencyQ()),
  /** share of the area that must light (default 1: everywhere) */
  litShare: z.number().gt(0).max(1).optional(),
  /** the token may lie tilted up to this angle (default 0: flat) */
  tilt: angle({ nonNegative: true }).optional(),
  /** lit threshold, A (default 0.5 mA, trade practice) */
  litThreshold: currentQ({ positive: true }).optional(),
  /**
   * exposure verdict that must pass (lib/safety exposureCheck): population (default "public"),
   * assessment (default "basic restriction": ICNIRP 2010 Table 2 in hand- and torso-sized discs;
   * or "reference level" of `standard`, default "ICNIRP 2010"), margin in dB (default 6)
   */
  exposure: z
    .strictObject({
      population: z.enum(["public", "occupational"]).optional(),
      assess: z.enum(["basic restriction", "reference level"]).optional(),
      standard: z.enum(STANDARD_IDS).optional(),
      margin: z.number().min(0).max(60).optional(),
    })
    .optional(),
  /** emission estimate that must pass (lib/safety emissionEstimate): the rules of your market (default: every rule carried) and a margin in dB (default 6) */
  emission: z.strictObject({ rules: z.array(z.enum(RULE_IDS)).min(1).optional(), margin: z.number().min(0).max(60).optional() }).optional(),
}));
/** What searchDesign accepts as requirements. */
export type RequirementsInput = z.input<typeof RequirementsInput>;

/** Most coils along one side of a searched array. */
export const MAX_ARRAY_SIDE = 6;

/** The search space. */
export const DesignSpaceInput = lazySchema(() => z.strictObject({
  /** transmitter mean radius range, m (an array's coils are shrunk to fit their pitch, 2 mm apart) */
  radius: range(length()),
  /** transmitter turns */
  turns: intRange(200),
  /** transmitter wire diameters to try, m */
  wire: z.array(length()).min(1),
  /** token turns */
  tokenTurns: intRange(5000),
  /** E-series for both capacitors (default E12) */
  series: z.enum(["E6", "E12", "E24"]).optional(),
  /**
   * array layouts to try (default: one coil): rows and columns, the centre-to-centre pitch
   * (default: the region's width / columns and depth / rows, so the coils tile it), and the
   * drive phasings (default all three; one coil has no phasing)
   */
  layout: z
    .strictObject({
      rows: intRange(MAX_ARRAY_SIDE),
      columns: intRange(MAX_ARRAY_SIDE),
      pitch: range(length()).optional(),
      phasing: z.array(z.enum(PHASINGS)).min(1).optional(),
    })
    .optional(),
}));
/** What searchDesign accepts as a search space. */
export type DesignSpaceInput = z.input<typeof DesignSpaceInput>;

/** Options of {@link searchDesign}. */
export interface SearchOptions {
  /** how many designs to return (default 3) */
  readonly keep?: number;
  /** evaluation budget of the grid and compass search (default 120) */
  readonly maxEvaluations?: number;
  /** half-bridge switch on-resistance, Ω (default 0.05) */
  readonly onResistance?: number;
  readonly threads?: ThreadsOption;
  /** progress: done/total designs (grid, compass search, then the finalists' refined maps) and an estimate of the time left */
  readonly onProgress?: ProgressCallback;
  /**
   * finest step of an array finalist's refined coverage map, m or "1 mm" (default 1 mm): dead
   * lines down to about this width are found. The cost grows as (map step / resolution)², so it
   * is guarded by `maxRefineSolves`.
   */
  readonly finalResolution?: number | string;
  /**
   * cost guard of that refinement: the most refined link solves a finalist's map may take per LED
   * colour (default 20,000 — about 3 s of one thread for a 3 × 3 array with five tilts). When the
   * solves projected for `finalResolution` exceed it, the map goes to the finest step that fits,
   * and the result says so (`refined.limitedBy`).
   */
  readonly maxRefineSolves?: number;
}

/** One returned design. */
export interface DesignResult extends DesignEvaluation {
  /** why it ranks below the winner (empty for the winner) */
  readonly lostBecause: string;
  /** a one-line description with units */
  readonly summary: string;
  /** the finalist check: coverageMap with refinement over the region (arrays), its lit share and weakest LED current, A */
  readonly refined?: {
    readonly litShare: number;
    readonly weakest: number;
    /** the finest step reached, m (the coarsest over the colours) */
    readonly resolution: number;
    /** when the cost guard stopped short of `finalResolution`: why, in words */
    readonly limitedBy?: string;
  };
}

/** The result of {@link searchDesign}. */
export interface DesignSearch {
  /** best first */
  readonly designs: readonly DesignResult[];
  /** true when the best design meets every requirement */
  readonly feasible: boolean;
  /** when infeasible: the binding requirement and by how much it is missed */
  readonly shortfall?: { readonly requirement: Constraint; readonly message: string };
  readonly evaluations: number;
  readonly method: string;
  /** the recommended design's cautions (implants, metal heating, tank voltage, small parts, radio), each deferring to local codes and licensed practice */
  readonly cautions: readonly string[];
}

const METHOD =
  "coarse grid, then compass (pattern) search — Kolda, Lewis & Torczon, SIAM Review 45(3), 2003 — on radius, turns, frequency, token turns, rows, columns, pitch and phasing; score = min(coverage, supply, exposure, emission margins); finalists re-checked with coverageMap's refinement";

type Req = z.output<typeof RequirementsInput>;
type Space = z.output<typeof DesignSpaceInput>;

/**
 * Searches the space for designs that meet the requirements (see the module comment).
 * @param requirements see {@link RequirementsInput}: region, barrier, token, colours, supply, band,
 *   share, tilt, exposure and emission verdicts. @param space see {@link DesignSpaceInput}.
 * @param options keep (3), maxEvaluations (120), onResistance (0.05 Ω), threads, onProgress.
 * @returns {@link DesignSearch}: the best designs with their four margins, binding constraint,
 *   safety verdicts and cautions, and why each lost to the winner; a shortfall naming the binding
 *   requirement and by how much when nothing meets them.
 * @example (await searchDesign(requirements, space)).designs[0].summary — e.g. "2 × 2 coils, 200 × 200 mm pitch, alternate: r 95 mm, 6 turns of 1 mm wire, …"
 */
export async function searchDesign(requirements: RequirementsInput, space: DesignSpaceInput, options: SearchOptions = {}): Promise<DesignSearch> {
  const where = "searchDesign";
  const req = parseInput(RequirementsInput, requirements, where);
  const sp = parseInput(DesignSpaceInput, space, where);
  checkThreads(options.threads, where);
  const refineOpts = parseInput(RefineOptions, { finalResolution: options.finalResolution, maxRefineSolves: options.maxRefineSolves }, where);
  checkRanges(req, sp, where);
  const problem = problemOf(req, sp, options);
  const budget = options.maxEvaluations ?? 120;
  const keepCount = options.keep ?? 3;
  const threads = typeof options.threads === "object" ? options.threads.threads : (options.threads ?? 1);
  const pool: TaskPool | undefined = threads > 1 ? (typeof options.threads === "object" ? options.threads : await taskPool(threads)) : undefined;
  const owned = pool !== undefined && typeof options.threads !== "object";
  const progress = progressCounter(options.onProgress);
  const finalists = keepCount;
  progress.add(budget + finalists);
  const seen = new Map<string, DesignEvaluation | null>();
  const norm = normaliser(req, sp, problem);
  /** evaluates the candidates not seen yet (in parallel on a pool; results stored in list order, so any thread count gives the same search); a candidate whose coils cannot be built scores −∞ */
  const evaluate = async (raw: Candidate[]): Promise<(DesignEvaluation | null)[]> => {
    const list = raw.map(norm).filter((c): c is Candidate => c !== null);
    const fresh: Candidate[] = [];
    for (const c of list) if (!seen.has(keyOf(c)) && !fresh.some((d) => keyOf(d) === keyOf(c))) fresh.push(c);
    const todo = fresh.slice(0, Math.max(0, budget - seen.size));
    const results = await Promise.all(
      todo.map(async (c) => {
        let r: DesignEvaluation | null;
        try {
          r = pool ? await pool.run<DesignEvaluation>({ kind: "design", candidate: c, problem }) : evaluateDesign(c, problem);
        } catch (e) {
          if (!(e instanceof Error)) throw e;
          r = null; // e.g. a winding that does not fit, touching coils, or a link that does not converge
        }
        progress.done(1);
        return r;
      }),
    );
    todo.forEach((c, i) => seen.set(keyOf(c), results[i]!));
    return list.map((c) => seen.get(keyOf(c)) ?? null);
  };
  try {
    await evaluate(coarseGrid(req, sp, budget));
    const ranked = (): DesignEvaluation[] => [...seen.values()].filter((d): d is DesignEvaluation => d !== null).sort(byScore);
    for (const start of ranked().slice(0, 2)) await compass(start, req, sp, evaluate, () => seen.size < budget);
    const all = ranked();
    progress.add(-(budget - seen.size)); // the search stopped before its budget
    if (all.length === 0) throw new TanklightInputError([{ path: "space", message: "no candidate in the space could be built and solved", value: space }], where);
    // finalists: re-checked with coverageMap's refinement, re-ranked
    const checked: (DesignEvaluation & { refined?: DesignResult["refined"] })[] = [];
    const top = diverse(all, finalists);
    progress.add(-(finalists - top.length));
    for (const d of top) {
      checked.push(await refineFinalist(d, problem, pool, { resolution: refineOpts.finalResolution ?? DEFAULT_FINAL_RESOLUTION, maxSolves: refineOpts.maxRefineSolves ?? DEFAULT_MAX_REFINE_SOLVES }));
      progress.done(1);
    }
    checked.sort(byScore);
    const keep = diverse(checked, keepCount);
    const winner = keep[0]!;
    const designs: DesignResult[] = keep.map((d, i) => ({ ...d, lostBecause: i === 0 ? "" : lostBecause(d, winner), summary: summary(d, problem) }));
    const feasible = winner.score >= 0;
    const shortfall = feasible ? undefined : shortfallOf(winner, problem);
    return {
      designs,
      feasible,
      ...(shortfall ? { shortfall } : {}),
      evaluations: seen.size,
      method: METHOD,
      cautions: [
        ...winner.cautions,
        "The exposure and emission margins here are estimates from tanklight's field and dipole models on a coarse grid, not compliance tests: measure the built design under the rules where it is used and sold.",
      ],
    };
  } finally {
    if (owned) await pool!.close();
  }
}

/** The best n, one per transmitter (layout, coil and frequency) first — designs that differ only in the token's turns come after the others. */
function diverse<T extends DesignEvaluation>(sorted: readonly T[], n: number): T[] {
  const tx = (d: T): string => keyOf({ ...d.candidate, tokenTurns: 0 });
  const firsts = sorted.filter((d, i) => sorted.findIndex((e) => tx(e) === tx(d)) === i);
  const rest = sorted.filter((d) => !firsts.includes(d));
  return [...firsts, ...rest].slice(0, n).sort(byScore);
}

function byScore(a: DesignEvaluation, b: DesignEvaluation): number {
  return b.score - a.score || a.supplyCurrent - b.supplyCurrent;
}

function keyOf(c: Candidate): string {
  const l = c.layout;
  return `${c.radius.toPrecision(6)}|${c.turns}|${c.wire}|${c.frequency.toPrecision(6)}|${c.tokenTurns}|${l.rows}x${l.columns}|${l.pitchX.toPrecision(6)}|${l.pitchY.toPrecision(6)}|${l.phasing}`;
}

function checkRanges(req: Req, sp: Space, where: string): void {
  const bad: { path: string; message: string; value: unknown }[] = [];
  const pairs: [string, { min: number; max: number } | undefined][] = [
    ["requirements.frequency", req.frequency],
    ["space.radius", sp.radius],
    ["space.turns", sp.turns],
    ["space.tokenTurns", sp.tokenTurns],
    ["space.layout.rows", sp.layout?.rows],
    ["space.layout.columns", sp.layout?.columns],
    ["space.layout.pitch", sp.layout?.pitch],
  ];
  for (const [path, r] of pairs) if (r && !(r.max >= r.min)) bad.push({ path, message: "needs max ≥ min", value: r });
  if (bad.length > 0) throw new TanklightInputError(bad, where);
}

/**
 * The problem searchDesign solves, as the plain SI record every candidate is evaluated against
 * (for evaluating a known design the same way: `evaluateDesign(candidate, designProblem(…))`).
 * @example designProblem(requirements, space).safety.assess // → "basic restriction"
 */
export function designProblem(requirements: RequirementsInput, space: DesignSpaceInput, options: SearchOptions = {}): DesignProblem {
  const req = parseInput(RequirementsInput, requirements, "designProblem");
  const sp = parseInput(DesignSpaceInput, space, "designProblem");
  checkRanges(req, sp, "designProblem");
  return problemOf(req, sp, options);
}

function problemOf(req: Req, sp: Space, options: SearchOptions): DesignProblem {
  const supply = typeof req.supply === "string" ? USB_SUPPLIES[req.supply] : { voltage: req.supply.voltage, current: req.supply.current };
  return {
    cover: req.cover,
    ...regionRadii(req.cover),
    share: req.litShare ?? 1,
    barrier: req.barrier,
    token: { innerRadius: req.token.innerRadius, layers: req.token.layers ?? 4, wire: req.token.wire ?? 0.1e-3, ...(req.token.size !== undefined ? { size: req.token.size } : {}) },
    colours: req.colours as LedColour[],
    supplyVoltage: supply.voltage,
    supplyRating: supply.current,
    tilt: req.tilt ?? 0,
    litThreshold: req.litThreshold ?? DEFAULT_LIT_THRESHOLD,
    series: (sp.series ?? "E12") as ESeries,
    onResistance: options.onResistance ?? 0.05,
    safety: {
      population: req.exposure?.population ?? "public",
      assess: req.exposure?.assess ?? "basic restriction",
      standard: req.exposure?.standard ?? "ICNIRP 2010",
      exposureMarginDb: req.exposure?.margin ?? DEFAULT_SAFETY_MARGIN_DB,
      emissionRules: req.emission?.rules ?? RULE_IDS,
      emissionMarginDb: req.emission?.margin ?? DEFAULT_SAFETY_MARGIN_DB,
    },
  };
}

/** Half-extents of the region, m. */
function halves(cover: Req["cover"]): [number, number] {
  return "radius" in cover ? [cover.radius, cover.radius] : [cover.width / 2, cover.depth / 2];
}

/**
 * Puts a candidate in its canonical form: the pitch filled in (the region's extent / count when
 * the space gives none), one coil without phasing, an array's radius shrunk so neighbours keep
 * ARRAY_CLEARANCE; null when the windings cannot fit the pitch at all.
 */
function normaliser(req: Req, sp: Space, p: DesignProblem): (c: Candidate) => Candidate | null {
  const [hx, hy] = halves(req.cover);
  return (c) => {
    const l = c.layout;
    const one = l.rows * l.columns === 1;
    const pitch = sp.layout?.pitch;
    const pitchX = l.columns === 1 ? 0 : pitch ? l.pitchX : (2 * hx) / l.columns;
    const pitchY = l.rows === 1 ? 0 : pitch ? l.pitchY : (2 * hy) / l.rows;
    let radius = c.radius;
    if (!one) {
      const room = Math.min(...[pitchX, pitchY].filter((v) => v > 0));
      const build = c.turns * (c.wire + 0.06e-3); // radial build of the flat winding (designEval's insulation)
      const most = (room - 2e-3) / 2 - build / 2;
      if (!(most >= build / 2 + 1e-3)) return null;
      radius = Math.min(radius, most);
    }
    void p;
    return { ...c, radius, layout: { rows: l.rows, columns: l.columns, pitchX, pitchY, phasing: one ? "in phase" : l.phasing } };
  };
}

/** Levels of each coordinate for the coarse grid, fewer when the layouts × levels exceed half the budget. */
function coarseGrid(req: Req, sp: Space, budget: number): Candidate[] {
  const lin = (a: number, b: number, n: number): number[] => (n === 1 || a === b ? [(a + b) / 2] : Array.from({ length: n }, (_, i) => a + ((b - a) * i) / (n - 1)));
  const ints = (a: number, b: number, n: number): number[] => [...new Set(lin(a, b, n).map(Math.round))];
  const logs = (a: number, b: number, n: number): number[] => (a === b ? [a] : Array.from({ length: n }, (_, i) => a * Math.pow(b / a, (i + 0.5) / n)));
  const layouts: Omit<Layout, "pitchX" | "pitchY">[] = [];
  const lay = sp.layout;
  const rowsR = lay?.rows ?? { min: 1, max: 1 };
  const colsR = lay?.columns ?? { min: 1, max: 1 };
  const phasings = lay?.phasing ?? [...PHASINGS];
  for (let rows = rowsR.min; rows <= rowsR.max; rows++)
    for (let columns = colsR.min; columns <= colsR.max; columns++) for (const phasing of rows * columns === 1 ? (["in phase"] as const) : phasings) layouts.push({ rows, columns, phasing });
  const pitches = lay?.pitch ? lin(lay.pitch.min, lay.pitch.max, 2) : [0];
  // levels: radius, turns, frequency, token turns — cut from 3/3/2/2 until the grid fits half the budget
  const levels = [3, 3, 2, 2];
  const size = (): number => layouts.length * pitches.length * sp.wire.length * levels.reduce((a, b) => a * b, 1);
  for (const i of [3, 2, 0, 1, 3, 2, 0, 1]) if (size() > budget / 2 && levels[i]! > 1) levels[i]! -= 1;
  const grid: Candidate[] = [];
  for (const l of layouts)
    for (const pitch of pitches)
      for (const radius of lin(sp.radius.min, sp.radius.max, levels[0]!))
        for (const turns of ints(sp.turns.min, sp.turns.max, levels[1]!))
          for (const wire of sp.wire)
            for (const frequency of logs(req.frequency.min, req.frequency.max, levels[2]!))
              for (const tokenTurns of ints(sp.tokenTurns.min, sp.tokenTurns.max, levels[3]!)) grid.push({ radius, turns, wire, frequency, tokenTurns, layout: { ...l, pitchX: pitch, pitchY: pitch } });
  return grid;
}

/** Compass search from one start while `more()` allows (see the module comment). */
async function compass(start: DesignEvaluation, req: Req, sp: Space, evaluate: (list: Candidate[]) => Promise<(DesignEvaluation | null)[]>, more: () => boolean): Promise<void> {
  let best = start;
  const lay = sp.layout;
  const steps = {
    radius: (sp.radius.max - sp.radius.min) / 4,
    turns: Math.max(1, Math.round((sp.turns.max - sp.turns.min) / 4)),
    logf: Math.log(req.frequency.max / req.frequency.min) / 4,
    tokenTurns: Math.max(1, Math.round((sp.tokenTurns.max - sp.tokenTurns.min) / 4)),
    pitch: lay?.pitch ? (lay.pitch.max - lay.pitch.min) / 4 : 0,
  };
  const minRadius = (sp.radius.max - sp.radius.min) / 100;
  const minLogf = Math.log(req.frequency.max / req.frequency.min) / 100;
  const minPitch = lay?.pitch ? (lay.pitch.max - lay.pitch.min) / 100 : 0;
  const clamp = (x: number, a: number, b: number): number => Math.min(b, Math.max(a, x));
  while (more()) {
    const c = best.candidate;
    const l = c.layout;
    const around: Candidate[] = [];
    for (const s of [-1, 1]) {
      if (steps.radius > minRadius) around.push({ ...c, radius: clamp(c.radius + s * steps.radius, sp.radius.min, sp.radius.max) });
      around.push({ ...c, turns: clamp(c.turns + s * steps.turns, sp.turns.min, sp.turns.max) });
      if (steps.logf > minLogf) around.push({ ...c, frequency: clamp(c.frequency * Math.exp(s * steps.logf), req.frequency.min, req.frequency.max) });
      around.push({ ...c, tokenTurns: clamp(c.tokenTurns + s * steps.tokenTurns, sp.tokenTurns.min, sp.tokenTurns.max) });
      if (lay) {
        around.push({ ...c, layout: { ...l, rows: clamp(l.rows + s, lay.rows.min, lay.rows.max) } });
        around.push({ ...c, layout: { ...l, columns: clamp(l.columns + s, lay.columns.min, lay.columns.max) } });
        if (lay.pitch && steps.pitch > minPitch) {
          const pitch = clamp((l.pitchX || l.pitchY) + s * steps.pitch, lay.pitch.min, lay.pitch.max);
          around.push({ ...c, layout: { ...l, pitchX: pitch, pitchY: pitch } });
        }
      }
    }
    if (lay && l.rows * l.columns > 1) for (const phasing of lay.phasing ?? PHASINGS) if (phasing !== l.phasing) around.push({ ...c, layout: { ...l, phasing } });
    const results = await evaluate(around);
    const better = results.filter((r): r is DesignEvaluation => r !== null && r.score > best.score + 1e-9).sort(byScore)[0];
    if (better) {
      best = better;
      continue;
    }
    const done = steps.radius <= minRadius && steps.turns === 1 && steps.logf <= minLogf && steps.tokenTurns === 1 && steps.pitch <= minPitch;
    if (done) break;
    steps.radius /= 2;
    steps.logf /= 2;
    steps.pitch /= 2;
    steps.turns = Math.max(1, Math.floor(steps.turns / 2));
    steps.tokenTurns = Math.max(1, Math.floor(steps.tokenTurns / 2));
  }
}

/** Side of the finalists' coverage maps (points a side); their screening refinement: a quarter of the step, at least SCREEN_RESOLUTION. */
const FINAL_MAP_POINTS = 17;
/** The screening refinement's finest step, m: 4 mm (cheap; it finds which cells need the final one). */
const SCREEN_RESOLUTION = 4e-3;
/** Default finest step of a finalist's refined map, m. */
export const DEFAULT_FINAL_RESOLUTION = 1e-3;
/** Default cost guard: refined link solves per finalist map and colour. */
export const DEFAULT_MAX_REFINE_SOLVES = 20_000;

const RefineOptions = lazySchema(() => z.object({
  finalResolution: length({ positive: true, max: 1 }).optional(),
  maxRefineSolves: z.number().int().min(0).max(10_000_000).optional(),
}));

/**
 * Re-checks an array finalist with coverageMap over the region (17 × 17), in two passes: a
 * screening map refined to a quarter of the step (at least 4 mm) near the lit boundary and where
 * the net coupling changes sign, then — where `guard.resolution` is finer — the map refined to
 * that step. The second pass's cost is projected from the cells the screen refined (each cell
 * (⌈step/resolution⌉ + 1)² solves per orientation); past `guard.maxSolves` the step is the finest
 * that fits, and `limitedBy` says so. With a share of 1 its weakest current bounds the coverage
 * margin; with a smaller share a refined lit share below the required one makes the margin
 * ln(lit share / required share). One coil: the search's radial scan already bisects its dark
 * rings, so it is returned as it is.
 */
export async function refineFinalist(
  d: DesignEvaluation,
  p: DesignProblem,
  pool: TaskPool | undefined,
  guard: { readonly resolution: number; readonly maxSolves: number } = { resolution: DEFAULT_FINAL_RESOLUTION, maxSolves: DEFAULT_MAX_REFINE_SOLVES },
): Promise<DesignEvaluation & { refined?: DesignResult["refined"] }> {
  const c = d.candidate;
  if (c.layout.rows * c.layout.columns === 1) return d;
  const [hx, hy] = "radius" in p.cover ? [p.cover.radius, p.cover.radius] : [p.cover.width / 2, p.cover.depth / 2];
  const tx = transmitterCoil(c);
  const token = tokenCoil(c, p);
  const parts = { tx, token, C1: d.transmitterCapacitance, C2: d.tokenCapacitance };
  const step = (2 * Math.min(hx, hy)) / (FINAL_MAP_POINTS - 1);
  const screen = Math.max(step / 4, SCREEN_RESOLUTION);
  // the search's five axes: flat, and tilted by ±tilt about x and about y
  const t = p.tilt;
  const orientation = t > 0 ? [{ tilt: 0 }, { tilt: t, about: [1, 0, 0] as const }, { tilt: -t, about: [1, 0, 0] as const }, { tilt: t, about: [0, 1, 0] as const }, { tilt: -t, about: [0, 1, 0] as const }] : undefined;
  const axes = orientation?.length ?? 1;
  let litShare = 1;
  let weakest = Infinity;
  let resolution = 0;
  let limitedBy: string | undefined;
  for (const colour of p.colours) {
    const system = candidateSystem(c, p, parts, colour, [0, 0, d.tokenHeight]);
    const mapAt = (res: number) =>
      coverageMap(
        system,
        { x: { from: -hx, to: hx, points: FINAL_MAP_POINTS }, y: { from: -hy, to: hy, points: FINAL_MAP_POINTS }, z: d.tokenHeight },
        { resolution: res, litThreshold: p.litThreshold, ...(orientation ? { orientation } : {}), ...(pool ? { threads: pool } : {}) },
      );
    let map = await mapAt(screen);
    let res = screen;
    if (guard.resolution < screen && map.refinedCells > 0) {
      const cost = (r: number): number => map.refinedCells * (Math.ceil(step / r - 1e-9) + 1) ** 2 * axes;
      res = guard.resolution;
      if (cost(res) > guard.maxSolves) {
        // the finest step whose projected solves fit the guard
        const perSide = Math.floor(Math.sqrt(guard.maxSolves / (map.refinedCells * axes))) - 1;
        res = perSide >= 1 ? Math.max(guard.resolution, step / perSide) : screen;
        limitedBy = `the refinement stopped at ${Number((res * 1e3).toPrecision(3))} mm, not ${Number((guard.resolution * 1e3).toPrecision(3))} mm: ${map.refinedCells} cells to refine would have taken about ${Math.round(cost(guard.resolution))} link solves, over maxRefineSolves (${guard.maxSolves})`;
      }
      if (res < screen) map = await mapAt(res);
      else res = screen;
    }
    resolution = Math.max(resolution, res);
    // a disc region: the map's lit share over the square is an estimate of the disc's (stated in the doc)
    litShare = Math.min(litShare, map.litFraction);
    weakest = Math.min(weakest, p.share === 1 ? map.weakest.current : shareCurrent(Array.from(map.ledCurrent), p.share));
  }
  let coverage = Math.min(d.margins.coverage, Math.log(Math.max(weakest, 1e-6 * p.litThreshold) / p.litThreshold));
  if (p.share < 1 && litShare < p.share) coverage = Math.min(coverage, Math.log(litShare / p.share));
  const margins = { ...d.margins, coverage };
  const binding = (Object.keys(margins) as Constraint[]).reduce((a, b) => (margins[b] < margins[a] ? b : a));
  return { ...d, coveredCurrent: Math.min(d.coveredCurrent, weakest), margins, binding, score: margins[binding], refined: { litShare, weakest, resolution, ...(limitedBy ? { limitedBy } : {}) } };
}

/** The region as sorted radii of a 41 × 41 grid of its points (a disc: points inside it), and its reach. */
function regionRadii(cover: { width: number; depth: number } | { radius: number }): { radii: number[]; reach: number } {
  const radii: number[] = [];
  const n = 41;
  if ("radius" in cover) {
    for (let i = 0; i < n; i++)
      for (let j = 0; j < n; j++) {
        const x = cover.radius * (2 * i / (n - 1) - 1);
        const y = cover.radius * (2 * j / (n - 1) - 1);
        const r = Math.hypot(x, y);
        if (r <= cover.radius) radii.push(r);
      }
    return { radii: radii.sort((a, b) => a - b), reach: cover.radius };
  }
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) radii.push(Math.hypot(cover.width * (i / (n - 1) - 0.5), cover.depth * (j / (n - 1) - 0.5)));
  return { radii: radii.sort((a, b) => a - b), reach: Math.hypot(cover.width, cover.depth) / 2 };
}

function mA(a: number): string {
  return a >= 1 ? `${a.toPrecision(3)} A` : `${(a * 1e3).toPrecision(3)} mA`;
}

function dB(neper: number): string {
  return `${(neper / NEPER_PER_DB).toFixed(1)} dB`;
}

function layoutText(c: Candidate): string {
  const l = c.layout;
  if (l.rows * l.columns === 1) return "one coil";
  return `${l.rows} × ${l.columns} coils at ${(l.pitchX * 1e3).toFixed(0)} × ${(l.pitchY * 1e3).toFixed(0)} mm pitch, ${l.phasing}`;
}

function summary(d: DesignEvaluation, p: DesignProblem): string {
  const c = d.candidate;
  return (
    `${layoutText(c)}: r ${(c.radius * 1e3).toPrecision(3)} mm, ${c.turns} turns of ${(c.wire * 1e3).toPrecision(2)} mm wire, ${(d.transmitterCapacitance * 1e9).toPrecision(2)} nF (${p.series}), ` +
    `half bridge${c.layout.rows * c.layout.columns > 1 ? "s" : ""} ${p.supplyVoltage} V at ${(c.frequency / 1e3).toPrecision(3)} kHz; token ${c.tokenTurns} turns, ${(d.tokenCapacitance * 1e9).toPrecision(2)} nF; ` +
    `LED ${mA(d.coveredCurrent)} on the required share (lit ≥ ${mA(p.litThreshold)}), supply ${mA(d.supplyCurrent)} of ${mA(SUPPLY_DERATING * p.supplyRating)} allowed, ` +
    `exposure margin ${marginText("exposure", d.margins.exposure)}, emission ${marginText("emission", d.margins.emission)} beyond the required; tank ${d.tankVoltage.toPrecision(3)} V peak; binding: ${d.binding}`
  );
}

function marginText(k: Constraint, m: number): string {
  if (!Number.isFinite(m)) return "not assessed";
  return k === "exposure" || k === "emission" ? dB(m) : m.toFixed(3);
}

/** What a margin means in the requirement's own terms. */
function constraintText(d: DesignEvaluation, k: Constraint, p: DesignProblem): string {
  switch (k) {
    case "coverage":
      return `LED current ${mA(d.coveredCurrent)} on the required share against the ${mA(p.litThreshold)} lit threshold`;
    case "supply":
      return `draws ${mA(d.supplyCurrent)} against ${mA(SUPPLY_DERATING * p.supplyRating)} (80 % of the supply's ${mA(p.supplyRating)})`;
    case "exposure":
      return `exposure ${marginText(k, d.margins.exposure)} beyond the required ${p.safety.exposureMarginDb} dB margin: ${d.exposure}`;
    case "emission":
      return `emission ${marginText(k, d.margins.emission)} beyond the required ${p.safety.emissionMarginDb} dB margin: ${d.emission}`;
  }
}

function lostBecause(d: DesignEvaluation, w: DesignEvaluation): string {
  const gap = w.score - d.score;
  const unit = d.binding === "exposure" || d.binding === "emission" ? ` (${dB(gap)})` : "";
  const mine = d.binding === "coverage" ? `LED current ${mA(d.coveredCurrent)} on the required share against the winner's ${mA(w.coveredCurrent)}` : d.binding === "supply" ? `it draws ${mA(d.supplyCurrent)} against the winner's ${mA(w.supplyCurrent)}` : d.binding === "exposure" ? `its exposure margin is ${marginText("exposure", d.margins.exposure)}, the winner's ${marginText("exposure", w.margins.exposure)}` : `its emission margin is ${marginText("emission", d.margins.emission)}, the winner's ${marginText("emission", w.margins.emission)}`;
  const safety = d.binding === "exposure" || d.binding === "emission" ? " — lost on safety" : "";
  return `its binding margin, ${d.binding}, is ${gap.toFixed(3)} (natural log${unit}) below the winner's score${safety}: ${mine}`;
}

function shortfallOf(d: DesignEvaluation, p: DesignProblem): { requirement: Constraint; message: string } {
  const k = d.binding;
  const by =
    k === "coverage"
      ? `${(100 * (1 - d.coveredCurrent / p.litThreshold)).toFixed(0)} % short of the lit threshold`
      : k === "supply"
        ? `${(d.supplyCurrent / (SUPPLY_DERATING * p.supplyRating)).toFixed(2)}× the budget`
        : `${(-d.margins[k] / NEPER_PER_DB).toFixed(1)} dB short of the required ${k === "exposure" ? p.safety.exposureMarginDb : p.safety.emissionMarginDb} dB margin`;
  const advice =
    k === "coverage"
      ? "widen the space (more coils, more turns), lower the barrier, enlarge the token or use a bigger supply"
      : k === "supply"
        ? "allow more turns (less current per ampere-turn), fewer coils, or a bigger supply"
        : k === "exposure"
          ? "allow a thicker barrier, fewer ampere-turns, or check the verdict with a finer exposure assessment"
          : "allow a band with a higher limit for your market, fewer ampere-turns, or smaller coils";
  return {
    requirement: k,
    message: `no design in the space meets the ${k} requirement — it binds: the best design ${constraintText(d, k, p)}, ${by}; ${advice}`,
  };
}

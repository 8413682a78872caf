/**
 * searchDesign(requirements, space, options): which transmitter, frequency and token to build.
 *
 * Family searched: one round, flat transmitter winding (one turn per layer, layers outward),
 * series-tuned with an E-series capacitor and driven by a half bridge from the named supply; a
 * wound token (your former radius, layers and wire; turns searched) with an E-series capacitor
 * and its LED. Each candidate is scored by ./designEval.ts: the smaller of the coverage margin and
 * the supply margin (natural logs, ≥ 0 when met); the smaller one is the binding constraint.
 *
 * Method: a coarse grid over the space (3 radii × 3 turn counts × each wire × 2 frequencies × 2
 * token turn counts), then compass search (a pattern search: Kolda, Lewis & Torczon, "Optimization
 * by direct search", SIAM Review 45(3):385–482, 2003) from the best few grid points — each
 * coordinate stepped ± its step, a better point is taken at once, steps halve when no neighbour
 * improves, integers stop at a step of 1 turn; radius and frequency stop at 1 % of their range.
 * Derivative-free because the score jumps (E-series capacitors, integer turns).
 */
import { z } from "zod";
import { frequency as frequencyQ, length, parseInput, angle, current as currentQ, lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import { standardValues, type ESeries } from "../circuit/eseries.ts";
import type { LedColour } from "../circuit/loads/ledPresets.ts";
import { DEFAULT_LIT_THRESHOLD } from "../circuit/link/network.ts";
import { SupplyInput, USB_SUPPLIES, SUPPLY_DERATING } from "./supplyBudget.ts";
import { evaluateDesign, type Candidate, type DesignEvaluation, type DesignProblem } from "./designEval.ts";
import { progressCounter, type ProgressCallback } from "./progress.ts";
import { checkThreads, taskPool, type TaskPool, type ThreadsOption } from "./pool.ts";

const colour = lazySchema(() => z.enum(["red", "orange", "yellow", "green-gap", "green-ingan", "blue", "white"]));
const range = <T extends z.ZodType<number, number | string>>(q: T) => z.strictObject({ min: q, max: q });
const intRange = lazySchema(() => z.strictObject({ min: z.number().int().min(1), max: z.number().int().min(1) }));

/** What the design must do (quantities with units). */
export const RequirementsInput = lazySchema(() => z.strictObject({
  /** the area tokens may be put on, centred over the transmitter: a rectangle or a disc */
  cover: z.union([z.strictObject({ width: length(), depth: length() }), z.strictObject({ radius: length() })]),
  /** barrier between the transmitter winding and the token's underside, m */
  barrier: length({ nonNegative: true }),
  /** the token's coil: former radius, layers (default 4) and wire diameter (default 0.1 mm) */
  token: z.strictObject({ innerRadius: length(), layers: z.number().int().min(1).max(30).optional(), wire: length().optional() }),
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
}));
/** What searchDesign accepts as requirements. */
export type RequirementsInput = z.input<typeof RequirementsInput>;

/** The search space. */
export const DesignSpaceInput = lazySchema(() => z.strictObject({
  /** transmitter mean radius range, m */
  radius: range(length()),
  /** transmitter turns */
  turns: intRange,
  /** transmitter wire diameters to try, m */
  wire: z.array(length()).min(1),
  /** token turns */
  tokenTurns: intRange,
  /** E-series for both capacitors (default E12) */
  series: z.enum(["E6", "E12", "E24"]).optional(),
}));
/** What searchDesign accepts as a search space. */
export type DesignSpaceInput = z.input<typeof DesignSpaceInput>;

/** Options of {@link searchDesign}. */
export interface SearchOptions {
  /** how many designs to return (default 3) */
  readonly keep?: number;
  /** evaluation budget (default 120) */
  readonly maxEvaluations?: number;
  /** half-bridge switch on-resistance, Ω (default 0.05) */
  readonly onResistance?: number;
  readonly threads?: ThreadsOption;
  readonly onProgress?: ProgressCallback;
}

/** One returned design. */
export interface DesignResult extends DesignEvaluation {
  /** "coverage" or "supply": the margin that is smallest */
  readonly binding: "coverage" | "supply";
  /** why it ranks below the winner (empty for the winner) */
  readonly lostBecause: string;
  /** a one-line description with units */
  readonly summary: string;
}

/** The result of {@link searchDesign}. */
export interface DesignSearch {
  /** best first */
  readonly designs: readonly DesignResult[];
  /** true when the best design meets every requirement */
  readonly feasible: boolean;
  /** when infeasible: the binding requirement and by how much it is missed */
  readonly shortfall?: { readonly requirement: "coverage" | "supply"; readonly message: string };
  readonly evaluations: number;
  readonly method: string;
  readonly cautions: readonly string[];
}

const METHOD =
  "coarse grid, then compass (pattern) search — Kolda, Lewis & Torczon, SIAM Review 45(3), 2003 — on radius, turns, frequency and token turns; score = min(coverage margin, supply margin)";

/**
 * Searches the space for designs that meet the requirements (see the module comment).
 * @param requirements see {@link RequirementsInput}; @param space see {@link DesignSpaceInput}.
 * @param options keep (3), maxEvaluations (120), onResistance (0.05 Ω), threads, onProgress.
 * @returns {@link DesignSearch}: the best designs with margins, binding constraint and why each
 *   lost; a shortfall when nothing meets the requirements.
 * @example (await searchDesign(requirements, space)).designs[0].summary — e.g. "r 120 mm, 9 turns of 1 mm wire at 150 kHz; token 80 turns, …"
 */
export async function searchDesign(requirements: RequirementsInput, space: DesignSpaceInput, options: SearchOptions = {}): Promise<DesignSearch> {
  const where = "searchDesign";
  const req = parseInput(RequirementsInput, requirements, where);
  const sp = parseInput(DesignSpaceInput, space, where);
  checkThreads(options.threads, where);
  const bad: { path: string; message: string; value: unknown }[] = [];
  if (!(req.frequency.max >= req.frequency.min)) bad.push({ path: "requirements.frequency", message: "needs max ≥ min", value: req.frequency });
  if (!(sp.radius.max >= sp.radius.min)) bad.push({ path: "space.radius", message: "needs max ≥ min", value: sp.radius });
  if (!(sp.turns.max >= sp.turns.min)) bad.push({ path: "space.turns", message: "needs max ≥ min", value: sp.turns });
  if (!(sp.tokenTurns.max >= sp.tokenTurns.min)) bad.push({ path: "space.tokenTurns", message: "needs max ≥ min", value: sp.tokenTurns });
  if (bad.length > 0) throw new TanklightInputError(bad, where);
  const supply = typeof req.supply === "string" ? USB_SUPPLIES[req.supply] : { voltage: req.supply.voltage, current: req.supply.current, label: req.supply.label ?? "bench supply" };
  const problem: DesignProblem = {
    ...regionRadii(req.cover),
    share: req.litShare ?? 1,
    barrier: req.barrier,
    token: { innerRadius: req.token.innerRadius, layers: req.token.layers ?? 4, wire: req.token.wire ?? 0.1e-3 },
    colours: req.colours as LedColour[],
    supplyVoltage: supply.voltage,
    supplyRating: supply.current,
    tilt: req.tilt ?? 0,
    litThreshold: req.litThreshold ?? DEFAULT_LIT_THRESHOLD,
    series: (sp.series ?? "E12") as ESeries,
    onResistance: options.onResistance ?? 0.05,
  };
  void standardValues;
  const budget = options.maxEvaluations ?? 120;
  const threads = typeof options.threads === "object" ? options.threads.threads : (options.threads ?? 1);
  const pool: TaskPool | undefined = threads > 1 ? (typeof options.threads === "object" ? options.threads : await taskPool(threads)) : undefined;
  const owned = pool !== undefined && typeof options.threads !== "object";
  const progress = progressCounter(options.onProgress);
  const seen = new Map<string, DesignEvaluation | null>();
  const keyOf = (c: Candidate): string => `${c.radius.toPrecision(6)}|${c.turns}|${c.wire}|${c.frequency.toPrecision(6)}|${c.tokenTurns}`;
  /** evaluates the candidates not seen yet (in parallel on a pool); a candidate whose coils cannot be built scores −∞ */
  const evaluate = async (list: Candidate[]): Promise<(DesignEvaluation | null)[]> => {
    const fresh = list.filter((c, i) => !seen.has(keyOf(c)) && list.findIndex((d) => keyOf(d) === keyOf(c)) === i).slice(0, Math.max(0, budget - seen.size));
    progress.add(fresh.length);
    await Promise.all(
      fresh.map(async (c) => {
        let r: DesignEvaluation | null;
        try {
          r = pool ? await pool.run<DesignEvaluation>({ kind: "design", candidate: c, problem }) : evaluateDesign(c, problem);
        } catch (e) {
          if (!(e instanceof Error)) throw e;
          r = null; // e.g. a winding that does not fit, or a link that does not converge
        }
        seen.set(keyOf(c), r);
        progress.done(1);
      }),
    );
    return list.map((c) => seen.get(keyOf(c)) ?? null);
  };
  try {
    // ── coarse grid ─────────────────────────────────────────────────────────────
    const lin = (a: number, b: number, n: number): number[] => (n === 1 || a === b ? [a] : Array.from({ length: n }, (_, i) => a + ((b - a) * i) / (n - 1)));
    const ints = (a: number, b: number, n: number): number[] => [...new Set(lin(a, b, n).map(Math.round))];
    const logs = (a: number, b: number, n: number): number[] => (a === b ? [a] : Array.from({ length: n }, (_, i) => a * Math.pow(b / a, (i + 0.5) / n)));
    const grid: Candidate[] = [];
    for (const radius of lin(sp.radius.min, sp.radius.max, 3))
      for (const turns of ints(sp.turns.min, sp.turns.max, 3))
        for (const wire of sp.wire)
          for (const frequency of logs(req.frequency.min, req.frequency.max, 2))
            for (const tokenTurns of ints(sp.tokenTurns.min, sp.tokenTurns.max, 2)) grid.push({ radius, turns, wire, frequency, tokenTurns });
    await evaluate(grid);
    // ── compass search from the best few ───────────────────────────────────────
    const ranked = (): DesignEvaluation[] => [...seen.values()].filter((d): d is DesignEvaluation => d !== null).sort((a, b) => b.score - a.score || a.supplyCurrent - b.supplyCurrent);
    const starts = ranked().slice(0, 2);
    for (const start of starts) {
      let best = start;
      const steps = {
        radius: (sp.radius.max - sp.radius.min) / 4,
        turns: Math.max(1, Math.round((sp.turns.max - sp.turns.min) / 4)),
        logf: Math.log(req.frequency.max / req.frequency.min) / 4,
        tokenTurns: Math.max(1, Math.round((sp.tokenTurns.max - sp.tokenTurns.min) / 4)),
      };
      const minRadius = (sp.radius.max - sp.radius.min) / 100;
      const minLogf = Math.log(req.frequency.max / req.frequency.min) / 100;
      while (seen.size < budget) {
        const c = best.candidate;
        const clamp = (x: number, a: number, b: number): number => Math.min(b, Math.max(a, x));
        const around: Candidate[] = [];
        for (const s of [-1, 1]) {
          if (steps.radius > minRadius) around.push({ ...c, radius: clamp(c.radius + s * steps.radius, sp.radius.min, sp.radius.max) });
          around.push({ ...c, turns: clamp(c.turns + s * steps.turns, sp.turns.min, sp.turns.max) });
          if (steps.logf > minLogf) around.push({ ...c, frequency: clamp(c.frequency * Math.exp(s * steps.logf), req.frequency.min, req.frequency.max) });
          around.push({ ...c, tokenTurns: clamp(c.tokenTurns + s * steps.tokenTurns, sp.tokenTurns.min, sp.tokenTurns.max) });
        }
        const results = await evaluate(around);
        const better = results.filter((r): r is DesignEvaluation => r !== null && r.score > best.score + 1e-9).sort((a, b) => b.score - a.score)[0];
        if (better) {
          best = better;
          continue;
        }
        const done = steps.radius <= minRadius && steps.turns === 1 && steps.logf <= minLogf && steps.tokenTurns === 1;
        if (done) break;
        steps.radius /= 2;
        steps.logf /= 2;
        steps.turns = Math.max(1, Math.floor(steps.turns / 2));
        steps.tokenTurns = Math.max(1, Math.floor(steps.tokenTurns / 2));
      }
    }
    const all = ranked();
    if (all.length === 0) throw new TanklightInputError([{ path: "space", message: "no candidate in the space could be built and solved", value: space }], where);
    const keep = all.slice(0, options.keep ?? 3);
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
        "Tank voltages of a series-tuned transmitter can reach tens to hundreds of volts: rate the capacitor for it and insulate; defer to local electrical codes and licensed practice.",
        "Check exposure near the transmitter (people with implanted medical devices), heating of metal objects placed on it, and radio-emission rules for the product before building; this search does not assess them.",
      ],
    };
  } finally {
    if (owned) await pool!.close();
  }
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
  return `${(a * 1e3).toPrecision(3)} mA`;
}

function summary(d: DesignEvaluation, p: DesignProblem): string {
  const c = d.candidate;
  return (
    `transmitter r ${(c.radius * 1e3).toPrecision(3)} mm, ${c.turns} turns of ${(c.wire * 1e3).toPrecision(2)} mm wire, ${(d.transmitterCapacitance * 1e9).toPrecision(2)} nF (${p.series}), ` +
    `half bridge ${p.supplyVoltage} V at ${(c.frequency / 1e3).toPrecision(3)} kHz; token ${c.tokenTurns} turns, ${(d.tokenCapacitance * 1e9).toPrecision(2)} nF; ` +
    `LED ${mA(d.coveredCurrent)} on the required share (lit ≥ ${mA(p.litThreshold)}), supply ${mA(d.supplyCurrent)} of ${mA(SUPPLY_DERATING * p.supplyRating)} allowed; binding: ${d.binding}`
  );
}

function lostBecause(d: DesignEvaluation, w: DesignEvaluation): string {
  const gap = (w.score - d.score).toFixed(3);
  if (d.binding === "coverage") return `its binding margin, coverage, is ${gap} (natural log) below the winner's score: LED current ${mA(d.coveredCurrent)} on the required share against the winner's ${mA(w.coveredCurrent)}`;
  return `its binding margin, supply, is ${gap} (natural log) below the winner's score: it draws ${mA(d.supplyCurrent)} against the winner's ${mA(w.supplyCurrent)}`;
}

function shortfallOf(d: DesignEvaluation, p: DesignProblem): { requirement: "coverage" | "supply"; message: string } {
  if (d.binding === "coverage") {
    return {
      requirement: "coverage",
      message: `no design in the space lights the required share: the best gives ${mA(d.coveredCurrent)} there against the ${mA(p.litThreshold)} lit threshold (${(100 * (1 - d.coveredCurrent / p.litThreshold)).toFixed(0)} % short) while drawing ${mA(d.supplyCurrent)}; widen the space, lower the barrier, enlarge the token or use a bigger supply`,
    };
  }
  return {
    requirement: "supply",
    message: `no design in the space stays within the supply: the best draws ${mA(d.supplyCurrent)} against ${mA(SUPPLY_DERATING * p.supplyRating)} (80 % of ${mA(p.supplyRating)}), ${(d.supplyCurrent / (SUPPLY_DERATING * p.supplyRating)).toFixed(2)}× the budget`,
  };
}

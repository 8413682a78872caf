/**
 * One, two or three standard parts in series or parallel that hit a target value.
 *
 * Method: exhaustive search over the parts of the chosen E-series in the decades that can
 * contribute, organised so that the last part of every combination is the standard value
 * nearest to what the others leave (binary search): O(N) for pairs and O(N²) for triples
 * (N parts per searched range). Combination rules: capacitors add in parallel and add
 * reciprocally in series; resistors and inductors (no mutual coupling) the other way round.
 */
import * as z from "../zod.ts";
import { dimensionless, oneOf, parseArgs, wholeNumber, lazySchema } from "../schema.ts";
import { ESeriesSchema, standardValuesBetween, type ESeries } from "./eseries.ts";

/** What is being combined: decides which connection adds. */
export type PartKind = "capacitor" | "resistor" | "inductor";

/** Which connections to consider. */
export type CombinationTopology = "series" | "parallel" | "any";

/** Options of {@link bestCombination}. */
export const CombinationOptions = lazySchema(() => z.strictObject({
  /** most parts in a combination, 1–3; default 2 */
  maxParts: z.custom<1 | 2 | 3>((v) => v === 1 || v === 2 || v === 3, { error: "must be 1, 2 or 3" }).optional(),
  /** connections allowed; "any" also allows the mixed three-part forms; default "any" */
  topology: oneOf(["series", "parallel", "any"] as const).optional(),
  /** part kind; default "capacitor" */
  kind: oneOf(["capacitor", "resistor", "inductor"] as const).optional(),
  /** keep only combinations within this relative error (e.g. 0.01); default: keep all */
  tolerance: dimensionless({ positive: true }).optional(),
  /** how many results; default 5 */
  count: wholeNumber(1, 1000, "the ranked list is for reading, not for enumeration").optional(),
  /** "accuracy" (default): by |error|, then part count; "fewestParts": by part count, then |error| */
  prefer: oneOf(["accuracy", "fewestParts"] as const).optional(),
}));
/** What {@link bestCombination} accepts as options. */
export type CombinationOptions = z.input<typeof CombinationOptions>;

const CombinationArgs = lazySchema(() => z.strictObject({
  x: z.number({ error: "must be a finite number > 0 (the target, in the parts' SI unit)" }).positive({ error: "must be a finite number > 0" }).refine(Number.isFinite, { error: "must be a finite number > 0" }),
  series: ESeriesSchema,
  options: CombinationOptions.optional(),
}));

/** One combination of standard parts. */
export interface Combination {
  /** combined value, same unit as the target */
  readonly value: number;
  /** relative error (value − target)/target, signed */
  readonly error: number;
  /** the parts, ascending */
  readonly parts: readonly number[];
  /** "single", "series", "parallel", "parallel pair in series with one", "series pair in parallel with one" */
  readonly topology: string;
}

type Op = "add" | "rec";

/**
 * The best one-, two- or three-part combinations of standard values for a target.
 *
 * @param x target value, > 0 (F for capacitors, Ω, H).
 * @param series IEC 60063 series ("E3" … "E192").
 * @param options maxParts (1–3, default 2), topology ("series" | "parallel" | "any"),
 *   kind ("capacitor" default | "resistor" | "inductor"), tolerance, count (default 5), prefer.
 * @returns combinations ranked by |relative error| then part count (or the reverse with
 *   prefer: "fewestParts"), at most `count`.
 * @example bestCombination(5.6e-9 + 1.2e-9, "E12", { maxParts: 2 })[0] // → 6.8e-9 single part, error 0
 * @example bestCombination(3.0e-9, "E6", { maxParts: 2, topology: "parallel" })[0].parts // → [1.5e-9, 1.5e-9]
 */
export function bestCombination(target: number, seriesName: ESeries, opts: CombinationOptions = {}): Combination[] {
  const args = parseArgs(CombinationArgs, [target, seriesName, opts], "bestCombination");
  const x = args.x;
  const series = args.series;
  const options = args.options ?? {};
  const maxParts = options.maxParts ?? 2;
  const topology = options.topology ?? "any";
  const kind = options.kind ?? "capacitor";
  const count = options.count ?? 5;
  // which connection adds values directly
  const parallelOp: Op = kind === "capacitor" ? "add" : "rec";
  const seriesOp: Op = kind === "capacitor" ? "rec" : "add";
  // parts that can matter: additive forms need parts ≤ x; reciprocal forms parts ≥ x.
  // Parts outside [x/100, 100·x] change a result by ≲ 1 %, which a closer-spaced series
  // does better with fewer parts (trade practice: nobody trims a tank with a 1 % part).
  const cand = standardValuesBetween(series, x * 1e-2, x * 1e2);
  let out: Combination[] = [];
  const keep = Math.max(200, 20 * count);
  let limit = Infinity; // |error| of the worst kept combination after the last prune
  const prune = () => {
    out.sort((a, b) => Math.abs(a.error) - Math.abs(b.error) || a.parts.length - b.parts.length);
    out = out.slice(0, keep);
    limit = out.length >= keep ? Math.abs(out[out.length - 1]!.error) : Infinity;
  };
  const few: Combination[] = []; // one- and two-part combinations: O(N), never pruned
  const push = (value: number, parts: number[], topo: string) => {
    const error = (value - x) / x;
    if (parts.length < 3) {
      few.push({ value, error, parts: [...parts].sort((a, b) => a - b), topology: topo });
      return;
    }
    // three-part combinations: keep only the most accurate (the ranking's head and every
    // three-part candidate a fewest-parts ranking could need after fewer-part ones)
    if (Math.abs(error) > limit) return; // cannot enter the kept list
    out.push({ value, error, parts: [...parts].sort((a, b) => a - b), topology: topo });
    if (out.length > 4 * keep) prune();
  };
  // one part
  const n1 = nearestIndex(cand, x);
  for (const k of [n1 - 1, n1, n1 + 1]) if (k >= 0 && k < cand.length) push(cand[k]!, [cand[k]!], "single");
  const allow = (t: "series" | "parallel") => topology === "any" || topology === t;
  const opName = (op: Op) => (op === parallelOp ? "parallel" : "series");
  if (maxParts >= 2) {
    for (const op of ["add", "rec"] as Op[]) {
      if (!allow(opName(op))) continue;
      for (const [a, b] of pairsFor(cand, x, op)) push(combine(op, a, b), [a, b], opName(op));
    }
  }
  if (maxParts >= 3) {
    for (const op of ["add", "rec"] as Op[]) {
      if (!allow(opName(op))) continue;
      // three parts, same connection: choose c, then the best pair for the rest
      for (const c of cand) {
        const rest = remainder(op, x, c);
        if (!(rest > 0)) continue;
        for (const [a, b] of pairsFor(cand, rest, op, 1)) {
          if (a > c || b > c) continue; // count each set once (c the largest in value order)
          push(combine(op, combine(op, a, b), c), [a, b, c], opName(op));
        }
      }
    }
    if (topology === "any") {
      // mixed: (a op1 b) op2 c with op1 ≠ op2
      for (const [op1, op2] of [["add", "rec"], ["rec", "add"]] as [Op, Op][]) {
        for (const c of cand) {
          const rest = remainder(op2, x, c);
          if (!(rest > 0)) continue;
          for (const [a, b] of pairsFor(cand, rest, op1, 1)) {
            push(combine(op2, combine(op1, a, b), c), [a, b, c], `${opName(op1)} pair in ${opName(op2)} with one`);
          }
        }
      }
    }
  }
  return ranked(few.concat(out), options.tolerance, options.prefer, count);
}

/**
 * The combinations within the tolerance (if any), each set of parts and topology once, ranked by
 * |error| then part count (prefer "fewestParts": the reverse), the first `count`.
 */
function ranked(all: readonly Combination[], tol: number | undefined, prefer: CombinationOptions["prefer"], count: number): Combination[] {
  const kept = (tol === undefined ? all : all.filter((c) => Math.abs(c.error) <= tol * (1 + 1e-12)));
  const unique = new Map<string, Combination>();
  for (const c of kept) {
    const key = `${c.topology}|${c.parts.map((p) => p.toPrecision(4)).join(",")}`;
    if (!unique.has(key)) unique.set(key, c);
  }
  const list = [...unique.values()];
  const byErr = (a: Combination, b: Combination) => Math.abs(a.error) - Math.abs(b.error);
  list.sort((a, b) => {
    const e = byErr(a, b);
    const p = a.parts.length - b.parts.length;
    if (prefer === "fewestParts") return p !== 0 ? p : e;
    return Math.abs(e) > 1e-12 * (Math.abs(a.error) + Math.abs(b.error)) ? e : p;
  });
  return list.slice(0, count);
}

function combine(op: Op, a: number, b: number): number {
  return op === "add" ? a + b : (a * b) / (a + b);
}

/** The value r with combine(op, r, c) = x (≤ 0 when impossible). */
function remainder(op: Op, x: number, c: number): number {
  if (op === "add") return x - c;
  return c > x ? 1 / (1 / x - 1 / c) : -1;
}

/** Best pairs (a, b) with combine(op, a, b) ≈ target: for each a, the nearest standard b (and its neighbours). */
function pairsFor(cand: readonly number[], target: number, op: Op, keepPerA = 2): [number, number][] {
  const pairs: [number, number][] = [];
  for (const a of cand) {
    const r = remainder(op, target, a);
    if (!(r > 0)) continue;
    if (r < a * (1 - 1e-12)) continue; // order a ≤ b
    const k = nearestIndex(cand, r);
    const ks = keepPerA === 1 ? [k] : [k - 1, k, k + 1];
    for (const j of ks) {
      if (j >= 0 && j < cand.length && cand[j]! >= a * (1 - 1e-12)) pairs.push([a, cand[j]!]);
    }
  }
  return pairs;
}

/** Index of the value nearest to v in ratio, in an ascending array. */
function nearestIndex(arr: readonly number[], v: number): number {
  let lo = 0;
  let hi = arr.length - 1;
  while (hi - lo > 1) {
    const m = (lo + hi) >> 1;
    if (arr[m]! <= v) lo = m;
    else hi = m;
  }
  return Math.abs(Math.log(arr[lo]! / v)) <= Math.abs(Math.log(arr[hi]! / v)) ? lo : hi;
}

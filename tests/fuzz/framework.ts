/**
 * A small fuzz framework for public functions (issue 11): from one valid call it derives bad
 * and extreme inputs field by field, calls the function with each, and classifies the outcome.
 *
 * - **bad** inputs (NaN, ±∞, null, wrong types, unknown or prototype keys, typos of a valid key)
 *   must give a *clear* error: a TanklightInputError whose message names the public function
 *   and the user's field (the mutated key, or the argument's name from `params`); a typo's
 *   message also names the key meant, quoted ("did you mean 'axis'?").
 * - **extreme** inputs (0, −1, huge and tiny numbers, a missing key, an empty list, random junk
 *   from fast-check) may be legal: they must give a clear error or a finite result (no NaN
 *   anywhere in it), within the time budget.
 * Never allowed: another error type (a TypeError from inside), NaN in a result, a bad input
 * silently accepted, a call over its time budget (counted as a hang).
 *
 * Use: `fuzzSuite("em", cases)` in a `tests/fuzz/<area>.fuzz.test.ts`; see DEVELOPERS.md.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { TanklightInputError } from "../../lib/errors.ts";

/** One public function under fuzz. */
export interface FuzzCase {
  /** the public name as a user calls it; the error message must contain it (or `where`) */
  readonly name: string;
  /** calls the function under test with one argument list */
  readonly call: (...args: never[]) => unknown;
  /** one valid argument list; every bad input is derived from it */
  readonly valid: readonly unknown[];
  /** the user's names of the positional arguments; an error about argument i must name params[i] */
  readonly params?: readonly string[];
  /** the prefix the error message carries when it is not `name` (e.g. the builder a wrapper calls); a list when errors about different arguments come from different names */
  readonly where?: string | readonly string[];
  /** hand-written bad argument lists; each must give a clear error */
  readonly bad?: readonly (readonly unknown[])[];
  /** hand-written extreme argument lists (huge sizes …); each must give a clear error or a finite result */
  readonly extreme?: readonly (readonly unknown[])[];
  /** paths of free-text fields (labels): prototype words and "" are legal there (dotted, like `skip`) */
  readonly text?: readonly string[];
  /** paths not to mutate (dotted, from the argument index: "0.filaments"); arrays beyond 3 items mutate only their first */
  readonly skip?: readonly string[];
  /** time budget of one call, ms (default 2000); a slower call counts as a hang */
  readonly budgetMs?: number;
  /** ±∞ is a documented answer of this function (e.g. ellipticK(1)); NaN never is */
  readonly allowInfinite?: boolean;
  /** error classes other than TanklightInputError that are documented answers to extreme input */
  readonly allowErrors?: readonly (abstract new (...a: never[]) => Error)[];
  /** fast-check runs of random junk per argument (default 20) */
  readonly junkRuns?: number;
  /** the function takes any value (a formatter such as describeValue): every derived input is extreme, none bad */
  readonly anyValue?: boolean;
}

/** How one call ended. */
export type Outcome = "clear error" | "unclear error" | "NaN" | "accepted" | "hang" | "finite";

/** One derived input and what it must do. */
interface Probe {
  readonly label: string;
  readonly args: readonly unknown[];
  readonly kind: "bad" | "extreme";
  /** words the error message must contain (besides the function name) */
  readonly mustName: readonly string[];
}

/** Counts of one suite, printed at the end: outcomes of bad and of extreme inputs. */
export interface FuzzCounts {
  readonly bad: Record<Outcome, number>;
  readonly extreme: Record<Outcome, number>;
  readonly failures: string[];
}

const zero = (): Record<Outcome, number> => ({ "clear error": 0, "unclear error": 0, NaN: 0, accepted: 0, hang: 0, finite: 0 });
const newCounts = (): FuzzCounts => ({ bad: zero(), extreme: zero(), failures: [] });

const BAD_NUMBER: readonly [string, unknown][] = [
  ["NaN", NaN], ["Infinity", Infinity], ["-Infinity", -Infinity], ["null", null], ["'banana'", "banana"],
  ["true", true], ["{}", {}], ["[]", []], ["'12 parsecs'", "12 parsecs"],
];
/** an element of a typed array can hold only numbers: null is stored as 0 and a word as NaN */
const BAD_TYPED: readonly [string, unknown][] = [["NaN", NaN], ["Infinity", Infinity], ["-Infinity", -Infinity]];
const EXTREME_NUMBER: readonly [string, unknown][] = [
  ["0", 0], ["-1", -1], ["1e300", 1e300], ["-1e300", -1e300], ["1e-300", 1e-300], ["1e9", 1e9], ["2.5", 2.5],
];
const BAD_STRING: readonly [string, unknown][] = [
  ["null", null], ["{}", {}], ["NaN", NaN],
];
/** string values that are wrong for a unit, a kind or a name, but legal free text */
const BAD_WORD: readonly [string, unknown][] = [["'toString'", "toString"], ["'__proto__'", "__proto__"], ["''", ""]];
const EXTREME_STRING: readonly [string, unknown][] = [["'banana'", "banana"], ["42", 42]];
const BAD_OBJECT: readonly [string, unknown][] = [["null", null], ["'banana'", "banana"], ["42", 42], ["true", true]];
const BAD_ARRAY: readonly [string, unknown][] = [["null", null], ["'banana'", "banana"], ["{}", {}], ["42", 42]];

type Path = readonly (string | number)[];

/** A copy of `root` with the value at `path` replaced (or the key deleted when `del`). */
function replaced(root: readonly unknown[], path: Path, value: unknown, del = false): unknown[] {
  const copy = (v: unknown): unknown =>
    Array.isArray(v) ? [...v] : ArrayBuffer.isView(v) ? (v as unknown as Float64Array).slice() : v !== null && typeof v === "object" ? { ...v } : v;
  const out = [...root];
  let parent: Record<string | number, unknown> = out as unknown as Record<string | number, unknown>;
  for (let i = 0; i < path.length - 1; i++) {
    const k = path[i]!;
    parent[k] = copy(parent[k]);
    parent = parent[k] as Record<string | number, unknown>;
  }
  const last = path[path.length - 1]!;
  if (del) delete parent[last];
  else if (ArrayBuffer.isView(parent)) parent[last] = value;
  else Object.defineProperty(parent, last, { value, enumerable: true, writable: true, configurable: true });
  return out;
}

/** A plausible typo of a key: two neighbouring letters swapped (or a letter dropped). */
function typoOf(key: string): string {
  if (key.length >= 4) return key.slice(0, 1) + key[2] + key[1] + key.slice(3);
  return key.length > 1 ? key.slice(0, -1) : key + key;
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  return v !== null && typeof v === "object" && !Array.isArray(v) && !ArrayBuffer.isView(v);
}

/** Every probe derived from the valid argument list. */
function probes(c: FuzzCase): Probe[] {
  const out: Probe[] = [];
  const skip = new Set(c.skip ?? []);
  const text = new Set(c.text ?? []);
  const argName = (i: number): string[] => (c.params?.[i] === undefined ? [] : [c.params[i]!]);
  const walk = (value: unknown, path: Path, named: string[], typed = false): void => {
    if (skip.has(path.join("."))) return;
    const at = `${path.join(".")}`;
    const add = (kind: Probe["kind"], label: string, args: unknown[], mustName = named) =>
      out.push({ kind: c.anyValue ? "extreme" : kind, label: `${at} = ${label}`, args, mustName: kind === "bad" && !c.anyValue ? mustName : [] });
    if (typeof value === "number") {
      for (const [l, v] of typed ? BAD_TYPED : BAD_NUMBER) add("bad", l, replaced(c.valid, path, v));
      for (const [l, v] of EXTREME_NUMBER) add("extreme", l, replaced(c.valid, path, v));
    } else if (typeof value === "string") {
      for (const [l, v] of BAD_STRING) add("bad", l, replaced(c.valid, path, v));
      for (const [l, v] of BAD_WORD) add(text.has(at) ? "extreme" : "bad", l, replaced(c.valid, path, v));
      for (const [l, v] of EXTREME_STRING) add("extreme", l, replaced(c.valid, path, v));
    } else if (typeof value === "boolean") {
      add("bad", "'yes'", replaced(c.valid, path, "yes"));
      add("bad", "null", replaced(c.valid, path, null));
    } else if (Array.isArray(value) || ArrayBuffer.isView(value)) {
      for (const [l, v] of BAD_ARRAY) add("bad", l, replaced(c.valid, path, v));
      add("extreme", "[]", replaced(c.valid, path, []));
      const items = Array.from(value as ArrayLike<unknown>);
      const upto = items.length > 3 ? 1 : items.length;
      // an integer typed array stores NaN, ±∞ and words as 0: nothing there to mutate
      const integers = value instanceof Int32Array || value instanceof Uint32Array || value instanceof Int16Array || value instanceof Uint8Array;
      if (!integers) for (let i = 0; i < upto; i++) walk(items[i], [...path, i], named, ArrayBuffer.isView(value));
    } else if (isPlainObject(value)) {
      for (const [l, v] of BAD_OBJECT) add("bad", l, replaced(c.valid, path, v));
      const keys = Object.keys(value);
      for (const key of keys) {
        const typo = typoOf(key);
        if (!keys.includes(typo)) add("bad", `typo '${typo}' of '${key}'`, replaced(c.valid, [...path, typo], value[key]), [typo, `'${key}'`]);
        add("extreme", `without '${key}'`, replaced(c.valid, [...path, key], undefined, true));
      }
      add("bad", "extra key 'toString'", replaced(c.valid, [...path, "toString"], 1), ["toString"]);
      add("bad", "extra key '__proto__'", replaced(c.valid, [...path, "__proto__"], { polluted: 1 }), ["__proto__"]);
      add("bad", "extra key 'frobnicate'", replaced(c.valid, [...path, "frobnicate"], 1), ["frobnicate"]);
      for (const key of keys) walk(value[key], [...path, key], [key]);
    }
  };
  c.valid.forEach((v, i) => {
    walk(v, [i], argName(i));
    out.push({ kind: "extreme", label: `argument ${i} missing`, args: replaced(c.valid, [i], undefined), mustName: [] });
  });
  for (const args of c.bad ?? []) out.push({ kind: "bad", label: `hand-written ${fc.stringify(args).slice(0, 60)}`, args, mustName: [] });
  for (const args of c.extreme ?? []) out.push({ kind: "extreme", label: `hand-written ${fc.stringify(args).slice(0, 60)}`, args, mustName: [] });
  return out;
}

/** Scans a result for NaN (and ±∞ unless allowed); functions and long arrays are sampled. */
function nonFinite(value: unknown, allowInfinite: boolean, depth = 0): boolean {
  if (typeof value === "number") return Number.isNaN(value) || (!allowInfinite && !Number.isFinite(value));
  if (value === null || typeof value !== "object" || depth > 6) return false;
  if (ArrayBuffer.isView(value)) {
    const a = value as unknown as ArrayLike<number>;
    for (let i = 0; i < a.length; i++) if (typeof a[i] === "number" && nonFinite(a[i], allowInfinite)) return true;
    return false;
  }
  for (const v of Object.values(value)) if (nonFinite(v, allowInfinite, depth + 1)) return true;
  return false;
}

/**
 * Calls one probe (awaiting a returned promise) and classifies the outcome.
 * @returns the outcome and, for a failure, a line saying why.
 */
export async function classify(c: FuzzCase, args: readonly unknown[], kind: "bad" | "extreme", mustName: readonly string[]): Promise<{ outcome: Outcome; why?: string }> {
  const t0 = performance.now();
  let result: unknown;
  let error: unknown;
  let threw = false;
  try {
    result = (c.call as (...a: unknown[]) => unknown)(...args);
    // an async function's answer (renderSvg …): its value or its rejection
    if (result instanceof Promise) result = await result;
  } catch (e) {
    threw = true;
    error = e;
  }
  const ms = performance.now() - t0;
  if (ms > (c.budgetMs ?? 2000)) return { outcome: "hang", why: `took ${ms.toFixed(0)} ms` };
  if (threw) {
    if (error instanceof TanklightInputError) {
      const msg = error.message;
      const where = typeof c.where === "string" ? [c.where] : c.where ?? [c.name];
      if (!where.some((w) => msg.includes(w))) return { outcome: "unclear error", why: `message does not name ${where.join(" or ")}: ${msg}` };
      const missing = mustName.filter((w) => !msg.includes(w));
      if (missing.length > 0) return { outcome: "unclear error", why: `message does not name '${missing.join("', '")}': ${msg}` };
      return { outcome: "clear error" };
    }
    if (kind === "extreme" && (c.allowErrors ?? []).some((cls) => error instanceof cls)) return { outcome: "clear error" };
    const e = error as Error;
    return { outcome: "unclear error", why: `${e?.name ?? typeof e}: ${e?.message ?? String(e)}` };
  }
  if (nonFinite(result, c.allowInfinite ?? false)) return { outcome: "NaN", why: "result holds NaN or ±∞" };
  if (kind === "bad") return { outcome: "accepted", why: "bad input accepted without an error" };
  return { outcome: "finite" };
}

function tally(counts: FuzzCounts, c: FuzzCase, label: string, kind: "bad" | "extreme", r: { outcome: Outcome; why?: string }): void {
  counts[kind][r.outcome]++;
  if (r.outcome !== "clear error" && r.outcome !== "finite") counts.failures.push(`${c.name}(${label}): ${r.outcome} — ${r.why ?? ""}`);
}

function addInto(total: FuzzCounts, counts: FuzzCounts): void {
  for (const kind of ["bad", "extreme"] as const) for (const o of Object.keys(total[kind]) as Outcome[]) total[kind][o] += counts[kind][o];
  total.failures.push(...counts.failures);
}

/** The printed line: "fuzz em: 40 functions; 3120 bad inputs → 3120 clear errors; …". */
export function countsLine(area: string, functions: number, t: FuzzCounts): string {
  const n = (r: Record<Outcome, number>): number => Object.values(r).reduce((a, b) => a + b, 0);
  const all = (o: Outcome): number => t.bad[o] + t.extreme[o];
  return (
    `fuzz ${area}: ${functions} functions; ${n(t.bad)} bad inputs → ${t.bad["clear error"]} clear errors; ` +
    `${n(t.extreme)} extreme inputs → ${t.extreme["clear error"]} clear errors, ${t.extreme.finite} finite results; ` +
    `${all("unclear error")} unclear errors, ${all("NaN")} NaN, ${t.bad.accepted} silently accepted, ${all("hang")} hangs`
  );
}

/**
 * Runs every derived probe and fast-check junk for each case, prints the counts, and fails
 * the test on any unclear error, NaN, silently accepted bad input or hang.
 * @param area the suite's name in the printed counts, e.g. "em".
 * @param cases the functions under fuzz.
 */
export function fuzzSuite(area: string, cases: readonly FuzzCase[]): void {
  describe(`fuzz ${area}`, () => {
    const total = newCounts();
    for (const c of cases) {
      it(`${c.name}: every bad input a clear TanklightInputError, never a TypeError, NaN or hang`, async () => {
        const counts = newCounts();
        // the valid call itself must work
        const base = await classify(c, c.valid, "extreme", []);
        expect(base.outcome, `${c.name}(valid input): ${base.why ?? ""}`).toBe("finite");
        for (const p of probes(c)) tally(counts, c, p.label, p.kind, await classify(c, p.args, p.kind, p.mustName));
        // random junk in place of each argument (fast-check: strings, numbers, objects with odd keys …)
        const junkRuns = c.junkRuns ?? 20;
        for (let i = 0; i < c.valid.length; i++) {
          await fc.assert(
            fc.asyncProperty(fc.anything({ withNullPrototype: true, withObjectString: true, withBoxedValues: true, withSparseArray: true }), async (junk) => {
              const args = replaced(c.valid, [i], junk);
              const r = await classify(c, args, "extreme", []);
              tally(counts, c, `argument ${i} = ${fc.stringify(junk).slice(0, 60)}`, "extreme", r);
              return true;
            }),
            { numRuns: junkRuns, seed: 20261202 + i },
          );
        }
        addInto(total, counts);
        // the failures in full (vitest abbreviates arrays in its assertion message)
        if (counts.failures.length > 0) console.log(counts.failures.slice(0, 12).join("\n"));
        expect(counts.failures.slice(0, 12), `${c.name}: ${counts.failures.length} failures`).toEqual([]);
      });
    }
    it("prints its counts", () => {
      console.log(countsLine(area, cases.length, total));
      expect(total.bad["clear error"] + total.extreme["clear error"] + total.extreme.finite).toBeGreaterThan(0);
    });
  });
}

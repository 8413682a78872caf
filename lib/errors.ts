/**
 * The one error type for bad user input (docs/design.md §3, docs/style.md §8).
 * Structured first: `issues` lists every problem; the message is readable second.
 */

/** One problem with one input field. */
export interface InputIssue {
  /** dotted path of the field, e.g. "coil.radius" */
  readonly path: string;
  /** what is wrong, in words, e.g. "expected a length like '12 mm'" */
  readonly message: string;
  /** the value received, as given */
  readonly value: unknown;
  /** what was expected, e.g. "length > 0 m" */
  readonly expected?: string;
  /** what the value turned out to be, printed after it in parentheses, e.g. "a frequency" */
  readonly detail?: string;
}

/** Thrown when user input is invalid; its message names the field, the value and the rule. */
export class TanklightInputError extends Error {
  readonly issues: readonly InputIssue[];
  constructor(issues: readonly InputIssue[], where?: string) {
    const text = issues
      .map((i) => issueText(i))
      .join("; ");
    super(where ? `${where}: ${text}` : text);
    this.name = "TanklightInputError";
    this.issues = issues;
  }
}

/**
 * One issue as text: "coil.radius: expected a length like '12 mm', got '5 kHz' (a frequency)".
 * @example formatIssue({ path: "coil.radius", message: "must be > 0 m", value: -0.01 }) // → "coil.radius: must be > 0 m, got -0.01"
 */
export function formatIssue(issue: InputIssue): string {
  checkIssue(issue);
  return issueText(issue);
}

/** The keys an InputIssue may carry (formatIssue refuses others, naming the nearest). */
const ISSUE_KEYS: readonly string[] = Object.freeze(["path", "message", "value", "expected", "detail"]);

/** formatIssue's input check: an object with string path and message, optional string expected/detail, no other key. */
function checkIssue(issue: unknown): void {
  const fail = (path: string, message: string, value: unknown): never => {
    throw new TanklightInputError([{ path, message, value }], "formatIssue");
  };
  if (typeof issue !== "object" || issue === null || Array.isArray(issue)) return fail("issue", "must be an object { path, message, value, expected?, detail? }", issue);
  const record = issue as Record<string, unknown>;
  for (const key of Object.keys(record)) if (!ISSUE_KEYS.includes(key)) fail(`issue.${key}`, unknownKeyMessage(key, ISSUE_KEYS), record[key]);
  for (const key of ["path", "message"]) if (typeof record[key] !== "string") fail(`issue.${key}`, "must be a string", record[key]);
  for (const key of ["expected", "detail"]) if (record[key] !== undefined && typeof record[key] !== "string") fail(`issue.${key}`, "must be a string or absent", record[key]);
}

/** One issue as text, unchecked (the error constructor's issues are built by library code). */
function issueText(issue: InputIssue): string {
  const detail = issue.detail ? ` (${issue.detail})` : "";
  return `${issue.path ? issue.path + ": " : ""}${issue.message}, got ${describeValue(issue.value)}${detail}`;
}

/**
 * A short, quoted rendering of a received value for error messages.
 * @example describeValue("5 kHz") // → "'5 kHz'";  describeValue(null) // → "null"
 */
export function describeValue(value: unknown): string {
  if (typeof value === "string") return value.length > 80 ? `'${value.slice(0, 77)}...' (${value.length} characters)` : `'${value}'`;
  if (typeof value === "number") return Number.isNaN(value) ? "NaN" : String(value);
  if (value === undefined) return "nothing";
  if (value === null) return "null";
  try {
    const s = JSON.stringify(value);
    return s.length > 80 ? s.slice(0, 77) + "..." : s;
  } catch {
    return String(value);
  }
}

/**
 * Guard for hot paths: throws TanklightInputError unless x is a finite number > 0.
 * @example requirePositive(0.01, "radius", "m", "loopField") // → 0.01
 */
export function requirePositive(x: number, field: string, unit: string, where: string): number {
  if (!(typeof x === "number" && Number.isFinite(x) && x > 0)) {
    throw new TanklightInputError(
      [{ path: field, message: `must be a finite number > 0 ${unit}`, value: x, expected: `> 0 ${unit}` }],
      where,
    );
  }
  return x;
}

/**
 * Guard for hot paths: throws TanklightInputError unless x is a finite number ≥ 0 (the one
 * non-negative guard; a distance from an axis, a frequency that may be DC).
 * @example requireNonNegative(0, "f", "Hz", "roundWireAcFactor") // → 0
 */
export function requireNonNegative(x: number, field: string, unit: string, where: string): number {
  if (!(typeof x === "number" && Number.isFinite(x) && x >= 0)) {
    const u = unit === "" ? "" : ` ${unit}`;
    throw new TanklightInputError(
      [{ path: field, message: `must be a finite number ≥ 0${u}`, value: x, expected: `≥ 0${u}` }],
      where,
    );
  }
  return x;
}

/**
 * Guard for hot paths: throws TanklightInputError unless x is a finite number (any sign).
 * @example requireFinite(0.2, "radius", "m", "myBuilder") // → 0.2;  requireFinite(NaN, "radius", "m", "myBuilder") // → throws TanklightInputError
 */
export function requireFinite(x: number, field: string, unit: string, where: string): number {
  if (!(typeof x === "number" && Number.isFinite(x))) {
    throw new TanklightInputError(
      [{ path: field, message: `must be a finite number in ${unit}`, value: x, expected: `finite ${unit}` }],
      where,
    );
  }
  return x;
}

/**
 * Guard for an entry's record argument: throws TanklightInputError unless `value` is a non-null,
 * non-array object (a network, a result, an options record), so a null or a number gives a
 * clear error naming the argument instead of a TypeError from inside. `optional`: undefined passes.
 * @example requireObject(null, "network", "solveLinkNetwork") // → throws TanklightInputError
 */
export function requireObject(value: unknown, field: string, where: string, optional = false): void {
  if (optional && value === undefined) return;
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw new TanklightInputError([{ path: field, message: "must be an object", value }], where);
  }
}

/**
 * Runs `fn`; a TanklightInputError thrown inside (by a helper the public function calls) is
 * re-thrown under the public function's name, its issues kept, each path prefixed with
 * `pathPrefix` (e.g. "options.").
 * @example underName("awgWire", () => awgDiameter(99)) // throws "awgWire: gauge: …"
 */
export function underName<T>(where: string, fn: () => T, pathPrefix = ""): T {
  try {
    return fn();
  } catch (e) {
    if (!(e instanceof TanklightInputError)) throw e;
    const issues = e.issues.map((i) => ({ ...i, path: pathPrefix + i.path }));
    throw new TanklightInputError(issues, where);
  }
}

/**
 * Exhaustiveness guard for a `switch` over a union: `default: return assertNever(x, …)`
 * compiles only when every variant has a case (x is then `never`), so a new variant fails to
 * type-check at every place that must handle it. At run time (an object that escaped the
 * types) it throws a TanklightInputError naming the field and the value (its `kind` when it
 * has one).
 * @param value the narrowed switch subject (type `never`).
 * @param field the user's field, e.g. "load.kind".
 * @param where the public function, e.g. "tokenResponse".
 * @param message what was expected, in words (default "is not a known kind").
 * @example assertNever({ kind: "zener" } as never, "load.kind", "tokenResponse") // → throws TanklightInputError "tokenResponse: load.kind: is not a known kind, got 'zener'"
 */
export function assertNever(value: never, field: string, where: string, message = "is not a known kind"): never {
  const v = value as unknown;
  const shown = v !== null && typeof v === "object" && "kind" in v ? (v as { kind: unknown }).kind : v;
  throw new TanklightInputError([{ path: field, message, value: shown }], where);
}

// ── unknown keys: "did you mean" ─────────────────────────────────────────────

/**
 * Edit distance of two strings (optimal string alignment: insert, delete, substitute, or swap
 * two neighbouring characters, each costing 1), case-insensitive.
 * @example editDistance("axsi", "axis") // → 1
 */
export function editDistance(a: string, b: string): number {
  const s = a.toLowerCase();
  const t = b.toLowerCase();
  const rows: number[][] = [];
  for (let i = 0; i <= s.length; i++) {
    const row = [i];
    for (let j = 1; j <= t.length; j++) {
      if (i === 0) { row.push(j); continue; }
      const prev = rows[i - 1]!;
      let d = Math.min(prev[j]! + 1, row[j - 1]! + 1, prev[j - 1]! + (s[i - 1] === t[j - 1] ? 0 : 1));
      if (i > 1 && j > 1 && s[i - 1] === t[j - 2] && s[i - 2] === t[j - 1]) d = Math.min(d, rows[i - 2]![j - 2]! + 1);
      row.push(d);
    }
    rows.push(row);
  }
  return rows[s.length]![t.length]!;
}

/**
 * The valid key nearest to a mistyped one, or undefined when none is close: at most 1 edit
 * for keys of up to 4 characters, 2 up to 8, 3 beyond (or a match ignoring case).
 * @param key the key the user wrote, e.g. "axsi".
 * @param valid the keys the object accepts.
 * @example nearestKey("axsi", ["position", "axis", "spin"]) // → "axis"
 * @example nearestKey("colour", ["position", "axis"]) // → undefined
 */
export function nearestKey(key: string, valid: readonly string[]): string | undefined {
  const limit = key.length <= 4 ? 1 : key.length <= 8 ? 2 : 3;
  let best: string | undefined;
  let bestD = Infinity;
  for (const v of valid) {
    const d = editDistance(key, v);
    if (d < bestD) { bestD = d; best = v; }
  }
  return bestD <= limit ? best : undefined;
}

/**
 * The message for an unknown key: "unknown field; did you mean 'axis'?" or, with no close
 * key, "unknown field (accepted: position, axis, spin)".
 */
export function unknownKeyMessage(key: string, valid: readonly string[]): string {
  const near = nearestKey(key, valid);
  if (near !== undefined) {
    // a short typo may be as near to several keys ("n" to x, nx, ny): name them all
    const d = editDistance(key, near);
    const all = valid.filter((v) => editDistance(key, v) === d).map((v) => `'${v}'`);
    return `unknown field; did you mean ${all.length === 1 ? all[0] : `${all.slice(0, -1).join(", ")} or ${all[all.length - 1]}`}?`;
  }
  return valid.length > 0 ? `unknown field (accepted: ${valid.join(", ")})` : "unknown field";
}

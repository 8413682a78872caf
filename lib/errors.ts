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
      .map((i) => formatIssue(i))
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

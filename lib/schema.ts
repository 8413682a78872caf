/**
 * zod schemas for user inputs that carry units (docs/design.md §3, docs/style.md §10): a quantity field
 * accepts an SI number or a string with a unit ("12 mm") and yields the SI number; range rules
 * (positive, bounds) are part of the schema; `parseInput` turns every problem into one
 * TanklightInputError with dotted paths.
 *
 * Schemas are parsed once at the edge (builders, scenario specs); hot paths take the plain
 * numbers they return.
 */
import * as z from "./zod.ts";
import { TanklightInputError, editDistance, nearestKey, unknownKeyMessage, type InputIssue } from "./errors.ts";

export { editDistance, nearestKey, unknownKeyMessage };
import { DIMENSIONS, formatQuantity, parseQuantity, type Dimension } from "./units.ts";

/** Range rules of a quantity field, in SI units of its dimension. */
export interface QuantityOptions {
  /** require > 0 */
  readonly positive?: boolean;
  /** require ≥ 0 */
  readonly nonNegative?: boolean;
  /** require ≥ min (SI) */
  readonly min?: number;
  /** require ≤ max (SI) */
  readonly max?: number;
  /** the example shown in messages, e.g. "12 mm" (default: the dimension's example) */
  readonly example?: string;
}

/** The metadata every quantity schema carries (`schema.meta()`), for docs and messages. */
export interface QuantityMeta {
  readonly unit: string;
  readonly dimension: Dimension;
  readonly example: string;
  /** the range rule in words, e.g. "> 0 m"; "" when any finite value is allowed */
  readonly rule: string;
}

/** A quantity schema: input `number | string`, output the SI number. */
export type QuantitySchema = z.ZodType<number, number | string>;

/** Words for a range rule, in SI units: "> 0 m", "≥ 0 Hz and ≤ 1 MHz". */
function ruleText(dimension: Dimension, opts: QuantityOptions): string {
  const unit = DIMENSIONS[dimension].unit;
  const show = (x: number): string => formatQuantity(x, unit, 4);
  const parts: string[] = [];
  // the sign rule is not printed when min already implies it ("≥ 100 kHz", not "> 0 Hz and ≥ 100 kHz")
  const min = opts.min;
  if (opts.positive && !(min !== undefined && min > 0)) parts.push(`> ${show(0)}`);
  else if (!opts.positive && opts.nonNegative && !(min !== undefined && min >= 0)) parts.push(`≥ ${show(0)}`);
  if (opts.min !== undefined) parts.push(`≥ ${show(opts.min)}`);
  if (opts.max !== undefined) parts.push(`≤ ${show(opts.max)}`);
  return parts.join(" and ");
}

/**
 * A zod schema for one physical quantity: accepts an SI number or a string with a unit
 * (rules of {@link parseQuantity}), checks the range rules, and outputs the SI number.
 * Its issues read "expected a length like '12 mm'" or "must be > 0 m"; `parseInput` adds the
 * path and the received value. Carries `.meta({ unit, dimension, example, rule })`.
 *
 * Optional fields: `length().optional()`; a default given as a string must be parsed, so use
 * `.prefault("12 mm")` (zod v4: `.default()` skips parsing and must be given in SI).
 *
 * @param dimension the physical dimension (decides the SI unit of the output).
 * @param opts range rules in SI units, and the example used in messages.
 * @returns a zod schema, input `number | string`, output number (SI).
 * @example parseInput(quantity("length", { positive: true }), "12 mm", "f") // → 0.012
 */
export function quantity(dimension: Dimension, opts: QuantityOptions = {}): QuantitySchema {
  checkDimension(dimension);
  checkOptions(opts, "quantity");
  const info = DIMENSIONS[dimension];
  const example = opts.example ?? info.example;
  const rule = ruleText(dimension, opts);
  const unit = info.unit;
  const show = (x: number): string => formatQuantity(x, unit);
  const schema = z.custom<number | string>(() => true).transform((value, ctx): number => {
    let x: number;
    try {
      x = parseQuantity(value, dimension);
    } catch (e) {
      if (!(e instanceof TanklightInputError)) throw e;
      const first = e.issues[0];
      let message = first?.message ?? `expected ${info.noun}`;
      if (opts.example !== undefined) message = message.replace(`'${info.example}'`, `'${example}'`);
      ctx.issues.push({
        code: "custom",
        message,
        input: value,
        params: { detail: first?.detail, expected: rule ? `${info.noun} ${rule}` : info.noun },
      });
      return z.NEVER;
    }
    const broken =
      (opts.positive && !(x > 0)) ||
      (opts.nonNegative && !(x >= 0)) ||
      (opts.min !== undefined && !(x >= opts.min)) ||
      (opts.max !== undefined && !(x <= opts.max));
    if (broken) {
      ctx.issues.push({
        code: "custom",
        message: `must be ${rule}`,
        input: value,
        params: {
          detail: typeof value === "string" ? `= ${show(x)}` : undefined,
          expected: `${info.noun} ${rule}`,
        },
      });
      return z.NEVER;
    }
    return x;
  });
  const meta: QuantityMeta = { unit, dimension, example, rule };
  return schema.meta({ ...meta }) as unknown as QuantitySchema;
}

/** quantity()'s dimension: an own key of DIMENSIONS ("toString" is none). */
function checkDimension(dimension: unknown): void {
  if (typeof dimension !== "string" || !Object.hasOwn(DIMENSIONS, dimension)) {
    throw new TanklightInputError([{ path: "dimension", message: `must be one of ${Object.keys(DIMENSIONS).join(", ")}`, value: dimension }], "quantity");
  }
}

/** The keys of QuantityOptions (others are refused, naming the nearest). */
const OPTION_KEYS: readonly string[] = Object.freeze(["positive", "nonNegative", "min", "max", "example"]);

/**
 * The options of a schema builder (a programming error otherwise): a record of the QuantityOptions keys only,
 * booleans for the sign rules, finite SI numbers with min ≤ max, a string example.
 */
function checkOptions(opts: unknown, where: string): void {
  const issues: InputIssue[] = [];
  if (opts === null || typeof opts !== "object" || Array.isArray(opts)) {
    throw new TanklightInputError([{ path: "opts", message: "must be an object { positive?, nonNegative?, min?, max?, example? }", value: opts }], where);
  }
  const o = opts as Record<string, unknown>;
  for (const key of Object.keys(o)) if (!OPTION_KEYS.includes(key)) issues.push({ path: `opts.${key}`, message: unknownKeyMessage(key, OPTION_KEYS), value: o[key] });
  for (const key of ["positive", "nonNegative"]) {
    if (o[key] !== undefined && typeof o[key] !== "boolean") issues.push({ path: `opts.${key}`, message: "must be true, false or absent", value: o[key] });
  }
  if (o["example"] !== undefined && typeof o["example"] !== "string") issues.push({ path: "opts.example", message: "must be a string like '12 mm' or absent", value: o["example"] });
  for (const key of ["min", "max"]) {
    const v = o[key];
    if (v !== undefined && !(typeof v === "number" && Number.isFinite(v))) {
      issues.push({ path: `opts.${key}`, message: "must be a finite number in SI units", value: v });
    }
  }
  if (issues.length === 0 && typeof o["min"] === "number" && typeof o["max"] === "number" && o["min"] > o["max"]) {
    issues.push({ path: "opts.min", message: `must be ≤ opts.max (${o["max"]})`, value: o["min"] });
  }
  if (issues.length > 0) throw new TanklightInputError(issues, where);
}

/**
 * The metadata of a schema made by {@link quantity}, or undefined.
 * @example quantityMeta(schema.length()).unit // → "m"
 */
export function quantityMeta(schema: z.ZodType): QuantityMeta | undefined {
  checkSchema(schema, "quantityMeta");
  const m = schema.meta() as Partial<QuantityMeta> | undefined;
  if (m === undefined || typeof m.dimension !== "string" || typeof m.unit !== "string") return undefined;
  return m as QuantityMeta;
}

// ── schemas built on first use ───────────────────────────────────────────────

/**
 * A module-level schema that is built on first use, so that importing the library builds no
 * schema (issue 12: import cost): `export const PoseSpec = lazySchema(() => z.strictObject({ … }))`.
 * The value stands for the schema itself (a Proxy forwarding every property to it): the first
 * access (`.safeParse`, `.shape`, `.extend`, nesting inside another schema) runs `build` once,
 * and every later use gets that same, never-changing schema. Names, types, messages and
 * metadata (`.describe`, `.meta`, also in `z.toJSONSchema`) stay as with the eager schema.
 * @param build makes the schema (or a plain object of schemas); called at most once.
 * @example schema.lazySchema(() => quantity("length")).parse("12 mm") // → 0.012
 */
export function lazySchema<T extends object>(build: () => T): T {
  let built: T | undefined;
  const real = (): T => {
    if (built === undefined) {
      built = build();
      // z.toJSONSchema and the registry look metadata up by object: give the stand-in the schema's
      const meta = "_zod" in built ? z.globalRegistry.get(built as unknown as z.ZodType) : undefined;
      if (meta !== undefined) z.globalRegistry.add(standIn as unknown as z.ZodType, meta);
    }
    return built;
  };
  const standIn: T = new Proxy({} as T, {
    get: (_, key) => Reflect.get(real(), key),
    set: (_, key, value) => Reflect.set(real(), key, value),
    has: (_, key) => Reflect.has(real(), key),
    ownKeys: () => Reflect.ownKeys(real()),
    // reported configurable: a Proxy may not report a non-configurable key its (empty) target lacks
    getOwnPropertyDescriptor: (_, key) => {
      const d = Reflect.getOwnPropertyDescriptor(real(), key);
      return d === undefined ? undefined : { ...d, configurable: true };
    },
    defineProperty: (_, key, d) => Reflect.defineProperty(real(), key, d),
    deleteProperty: (_, key) => Reflect.deleteProperty(real(), key),
    getPrototypeOf: () => Reflect.getPrototypeOf(real()),
  });
  return standIn;
}

// ── shorthands ───────────────────────────────────────────────────────────────
// Sizes of things and circuit element values are positive by default (a coil radius, a wire
// diameter, a frequency, an inductance, a capacitance, a time step): zero or negative has no
// physical meaning there. Resistance, conductance, power, energy: ≥ 0. Signed by default:
// voltage, current, charge, angle, field components, plain numbers, and positions (vec3).
// Temperature is absolute and ≥ 0 K by parseQuantity itself.
// Options add to the default: `length({ max: 0.1 })` is still > 0. The sign rule is replaced
// only when the options name one: `length({ nonNegative: true })` allows 0,
// `length({ positive: false })` allows any sign.

/** The shorthand's default sign rule, unless the options give their own. */
function withDefaultSign(sign: "positive" | "nonNegative" | "any", opts: QuantityOptions): QuantityOptions {
  // a non-object opts is passed on for quantity() to refuse by name
  if (opts === null || typeof opts !== "object" || opts.positive !== undefined || opts.nonNegative !== undefined || sign === "any") return opts;
  return sign === "positive" ? { ...opts, positive: true } : { ...opts, nonNegative: true };
}

/** Length in m, > 0 by default ("12 mm", "0.5 mil"). */
export const length = (opts: QuantityOptions = {}): QuantitySchema => quantity("length", withDefaultSign("positive", opts));
/** Area in m², > 0 by default ("1.5 mm^2"). */
export const area = (opts: QuantityOptions = {}): QuantitySchema => quantity("area", withDefaultSign("positive", opts));
/** Frequency in Hz, > 0 by default ("217 kHz"). */
export const frequency = (opts: QuantityOptions = {}): QuantitySchema => quantity("frequency", withDefaultSign("positive", opts));
/** Inductance in H, > 0 by default ("24 uH"). */
export const inductance = (opts: QuantityOptions = {}): QuantitySchema => quantity("inductance", withDefaultSign("positive", opts));
/** Capacitance in F, > 0 by default ("4.7 nF"). */
export const capacitance = (opts: QuantityOptions = {}): QuantitySchema => quantity("capacitance", withDefaultSign("positive", opts));
/** Resistance in Ω, ≥ 0 by default (a zero series resistance is a legal ideal part) ("0.5 ohm"). */
export const resistance = (opts: QuantityOptions = {}): QuantitySchema => quantity("resistance", withDefaultSign("nonNegative", opts));
/** Conductance in S, ≥ 0 by default ("20 mS"). */
export const conductance = (opts: QuantityOptions = {}): QuantitySchema => quantity("conductance", withDefaultSign("nonNegative", opts));
/** Voltage in V, any sign by default ("3.3 V"). */
export const voltage = (opts: QuantityOptions = {}): QuantitySchema => quantity("voltage", withDefaultSign("any", opts));
/** Current in A, any sign by default ("150 mA"). */
export const current = (opts: QuantityOptions = {}): QuantitySchema => quantity("current", withDefaultSign("any", opts));
/** Power in W, ≥ 0 by default ("2 W"). */
export const power = (opts: QuantityOptions = {}): QuantitySchema => quantity("power", withDefaultSign("nonNegative", opts));
/** Energy in J, ≥ 0 by default ("5 mJ"). */
export const energy = (opts: QuantityOptions = {}): QuantitySchema => quantity("energy", withDefaultSign("nonNegative", opts));
/** Charge in C, any sign by default ("10 nC"). */
export const charge = (opts: QuantityOptions = {}): QuantitySchema => quantity("charge", withDefaultSign("any", opts));
/** Angle in rad, any sign by default ("30 deg"). */
export const angle = (opts: QuantityOptions = {}): QuantitySchema => quantity("angle", withDefaultSign("any", opts));
/** Absolute temperature in K, ≥ 0 K always ("25 degC" → 298.15). */
export const temperature = (opts: QuantityOptions = {}): QuantitySchema => quantity("temperature", withDefaultSign("any", opts));
/** Resistivity in Ω·m, > 0 by default ("1.72e-8 ohm m"). */
export const resistivity = (opts: QuantityOptions = {}): QuantitySchema => quantity("resistivity", withDefaultSign("positive", opts));
/** Flux density in T, any sign by default ("27 uT"). */
export const fluxDensity = (opts: QuantityOptions = {}): QuantitySchema => quantity("fluxDensity", withDefaultSign("any", opts));
/** Magnetic field strength in A/m, any sign by default ("21 A/m"). */
export const fieldStrength = (opts: QuantityOptions = {}): QuantitySchema => quantity("fieldStrength", withDefaultSign("any", opts));
/** Time in s, > 0 by default ("10 us"). */
export const time = (opts: QuantityOptions = {}): QuantitySchema => quantity("time", withDefaultSign("positive", opts));
/** Plain number, any sign by default ("0.5", "5 %"). */
export const dimensionless = (opts: QuantityOptions = {}): QuantitySchema => quantity("dimensionless", withDefaultSign("any", opts));

/** Output and input types of {@link vec3}. */
export type Vec3Schema = z.ZodType<readonly [number, number, number], readonly [number | string, number | string, number | string]>;

/**
 * A point or offset [x, y, z] in m; each element a length ("12 mm", 0.003), any sign by
 * default (positions lie on both sides of the origin).
 * @param opts range rules applied to each element, SI (default none).
 * @example parseInput(vec3(), ["1 mm", 0, "-2 cm"], "pose.position") // → [0.001, 0, -0.02]
 */
export function vec3(opts: QuantityOptions = {}): Vec3Schema {
  checkOptions(opts, "vec3");
  const c = quantity("length", opts);
  return z.tuple([c, c, c]).readonly() as unknown as Vec3Schema;
}

/** Output and input types of {@link unitVector}. */
export type UnitVectorSchema = z.ZodType<readonly [number, number, number], readonly [number, number, number]>;

/**
 * A direction [x, y, z] (plain finite numbers, not all zero), returned normalized to length 1:
 * the axis of a pose. A zero vector is an error.
 * @example parseInput(unitVector(), [0, 3, 4], "pose.axis") // → [0, 0.6, 0.8]
 */
export function unitVector(): UnitVectorSchema {
  const finite = z.number().refine(Number.isFinite, { error: "expected a finite number" });
  return z
    .tuple([finite, finite, finite])
    .transform((v, ctx) => {
      const n = Math.hypot(v[0], v[1], v[2]);
      if (!(n > 0) || !Number.isFinite(n)) {
        ctx.issues.push({ code: "custom", message: "expected a direction (not all zero)", input: v });
        return z.NEVER;
      }
      return [v[0] / n, v[1] / n, v[2] / n] as const;
    })
    .readonly() as unknown as UnitVectorSchema;
}

/**
 * Validate a positional argument list with one strict object schema whose keys are the
 * arguments' names in order: `f(L, f, options)` checks `{ inductance: L, frequency: f,
 * options }`, so every message names the user's argument ("inductance", "options.series").
 * An argument left out (undefined) is absent from the object (optional fields apply).
 * More arguments than the schema names are an error.
 * @param schema a `z.strictObject` with one field per positional argument, in order.
 * @param args the arguments as received (e.g. `[L, f, options]`).
 * @param where the public function's name, prefixed to the message.
 * @returns the parsed object (quantities in SI numbers).
 * @example parseArgs(z.strictObject({ inductance: inductance(), frequency: frequency() }), ["100 uH", 2e5], "tune") // → { inductance: 0.0001, frequency: 200000 }
 */
export function parseArgs<S extends z.ZodRawShape>(schema: z.ZodObject<S>, args: readonly unknown[], where: string): z.output<z.ZodObject<S>> {
  const names = Object.keys(schema.shape);
  if (args.length > names.length) {
    throw new TanklightInputError(
      [{ path: `argument ${names.length + 1}`, message: `${where} takes at most ${names.length} arguments (${names.join(", ")})`, value: args[names.length] }],
      where,
    );
  }
  const input: Record<string, unknown> = {};
  names.forEach((name, i) => {
    if (args[i] !== undefined) input[name] = args[i];
  });
  return parseInput(schema, input, where) as z.output<z.ZodObject<S>>;
}

/**
 * A zod schema for one word out of a fixed list (a series name, a colour, a kind): looked up
 * in a Set, so prototype words ("toString", "__proto__") are refused like any other unknown
 * word, with the nearest valid one suggested ("did you mean 'E12'?") or the list.
 * @param values the accepted words.
 * @example parseInput(oneOf(["E6", "E12"] as const), "E12x", "standardValues") // throws "standardValues: must be one of E6, E12; did you mean 'E12'?, got 'E12x'"
 */
export function oneOf<const T extends readonly string[]>(values: T): z.ZodType<T[number], unknown> {
  const accepted = new Set<string>(values);
  return z.custom<T[number]>(() => true).transform((v, ctx): T[number] => {
    if (typeof v === "string" && accepted.has(v)) return v as T[number];
    // suggest a word only when it is the one nearest ("E7" is as near to E3 as to E6: no guess)
    const near = typeof v === "string" ? nearestKey(v, values) : undefined;
    const tie = near !== undefined && values.filter((x) => editDistance(v as string, x) === editDistance(v as string, near)).length > 1;
    ctx.issues.push({
      code: "custom",
      message: `must be one of ${values.join(", ")}${near !== undefined && !tie ? `; did you mean '${near}'?` : ""}`,
      input: v,
      params: { expected: values.join(" | ") },
    });
    return z.NEVER;
  }) as unknown as z.ZodType<T[number], unknown>;
}

/**
 * A zod schema for a whole number in [min, max]; a larger value's message states the limit
 * and why it exists ("≤ 100000 (each point solves the whole link)").
 * @example parseInput(wholeNumber(2, 100000, "each point solves the whole link"), 1e9, "frequencySweep") // throws "…must be a whole number ≥ 2 and ≤ 100000 (each point solves the whole link)…"
 */
export function wholeNumber(min: number, max?: number, why?: string): z.ZodNumber {
  const message = max === undefined ? `must be a whole number ≥ ${min}` : `must be a whole number ≥ ${min} and ≤ ${max}${why ? ` (${why})` : ""}`;
  const base = z.number({ error: message }).int({ error: message }).min(min, { error: message });
  return max === undefined ? base : base.max(max, { error: message });
}

// ── running a schema ─────────────────────────────────────────────────────────

/** A zod path as a dotted string: ["coils", 0, "radius"] → "coils[0].radius". */
function dottedPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const key of path) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out === "" ? String(key) : `.${String(key)}`;
  }
  return out;
}

/** The received value at a path of the raw input, or undefined when the path does not exist. */
function valueAt(input: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = input;
  for (const key of path) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<PropertyKey, unknown>)[key];
  }
  return v;
}

/** True when a union branch failed on the form itself (its discriminator or its type), not on a field. */
function branchMismatch(issues: readonly z.core.$ZodIssue[]): boolean {
  return issues.some(
    (i) =>
      (i.path.length === 0 && i.code !== "unrecognized_keys") ||
      (i.path.length === 1 && i.code === "invalid_value") ||
      (i.path.length === 1 && i.code === "invalid_union" && i.errors.length === 0),
  );
}

/** A short description of what one union branch wanted, from its form-level issues. */
function branchWanted(issues: readonly z.core.$ZodIssue[]): string {
  const literal = issues.find((i) => i.path.length === 1 && i.code === "invalid_value");
  if (literal !== undefined && literal.code === "invalid_value") {
    return `${String(literal.path[0])} ${literal.values.map((v) => JSON.stringify(v)).join(" or ")}`;
  }
  const top = issues.find((i) => i.path.length === 0);
  return top === undefined ? "another form" : cleanMessage(top);
}

/** zod's own texts without the parts parseInput adds itself ("Invalid input: …, received string"). */
function cleanMessage(issue: z.core.$ZodIssue): string {
  if (issue.code === "custom") return issue.message;
  return issue.message.replace(/^(Invalid input|Invalid option|Too small|Too big): /, "").replace(/, received \w+$/, "");
}

// ── unknown keys: "did you mean" (editDistance, nearestKey, unknownKeyMessage live in lib/errors.ts) ──

type SchemaDef = { type: string; [k: string]: unknown };
const defOf = (s: unknown): SchemaDef | undefined => (s as { _zod?: { def?: SchemaDef } } | undefined)?._zod?.def;

/** The keys an object schema accepts at a path of the input (through wrappers, arrays, tuples, unions). */
function keysAt(schema: unknown, path: readonly PropertyKey[]): string[] {
  const def = defOf(schema);
  if (def === undefined) return [];
  switch (def.type) {
    case "optional": case "nullable": case "readonly": case "default": case "prefault": case "catch": case "nonoptional":
      return keysAt(def["innerType"], path);
    case "pipe":
      return keysAt(def["in"], path);
    case "lazy":
      return keysAt((def["getter"] as () => unknown)(), path);
    case "union": {
      const all = (def["options"] as unknown[]).flatMap((o) => keysAt(o, path));
      return [...new Set(all)];
    }
    case "object": {
      const shape = def["shape"] as Record<string, unknown>;
      if (path.length === 0) return Object.keys(shape);
      const next = shape[String(path[0])];
      return next === undefined ? [] : keysAt(next, path.slice(1));
    }
    case "array":
      return path.length === 0 ? [] : keysAt(def["element"], path.slice(1));
    case "tuple": {
      if (path.length === 0) return [];
      const items = def["items"] as unknown[];
      return keysAt(items[Number(path[0])] ?? def["rest"], path.slice(1));
    }
    case "record":
      return path.length === 0 ? [] : keysAt(def["valueType"], path.slice(1));
    default:
      return [];
  }
}

/**
 * One zod issue as our InputIssues: one per unknown key; a union's issues are those of the one
 * branch whose form matched (its discriminator or type), else one issue listing the forms.
 */
function toInputIssues(issue: z.core.$ZodIssue, input: unknown, schema: unknown, prefix: readonly PropertyKey[] = []): InputIssue[] {
  const full = [...prefix, ...issue.path];
  if (issue.code === "unrecognized_keys") {
    const valid = keysAt(schema, full);
    return issue.keys.map((key) => ({
      path: dottedPath([...full, key]),
      message: unknownKeyMessage(key, valid),
      value: valueAt(input, [...full, key]),
    }));
  }
  if (issue.code === "invalid_union") {
    const options = (issue as { options?: readonly unknown[] }).options;
    if (issue.errors.length === 0 && options !== undefined) {
      // discriminated union with an unknown discriminator value
      return [{ path: dottedPath(full), message: `expected one of ${options.map((o) => JSON.stringify(o)).join(", ")}`, value: valueAt(input, full) }];
    }
    const matching = issue.errors.filter((branch) => !branchMismatch(branch));
    const best = matching.length === 1 ? matching[0] : undefined;
    if (best !== undefined) return best.flatMap((i) => toInputIssues(i, input, schema, full));
    const wanted = [...new Set(issue.errors.map(branchWanted))];
    return [
      {
        path: dottedPath(full),
        message: `matches none of the accepted forms (${wanted.join("; ")})`,
        value: valueAt(input, full),
      },
    ];
  }
  const value = "input" in issue && issue.input !== undefined ? issue.input : valueAt(input, full);
  const params = (issue as { params?: { detail?: string; expected?: string } }).params;
  return [
    {
      path: dottedPath(full),
      message: cleanMessage(issue),
      value,
      ...(params?.expected === undefined ? {} : { expected: params.expected }),
      ...(params?.detail === undefined ? {} : { detail: params.detail }),
    },
  ];
}

/**
 * Validate and convert user input with a schema; on failure throw one TanklightInputError
 * listing every issue with its dotted path, the received value and the expectation:
 * `roundCoil: coil.radius: expected a length like '12 mm', got '5 kHz' (a frequency)`.
 *
 * @param schema a zod schema (typically built from {@link quantity} fields).
 * @param input the raw user input.
 * @param where the public function or builder name, prefixed to the message.
 * @returns the parsed output (quantities in SI numbers).
 * @throws TanklightInputError with `issues[]` (path, message, value, expected, detail).
 * @example parseInput(z.object({ radius: schema.length() }), { radius: "12 mm" }, "roundCoil") // → { radius: 0.012 }
 */
export function parseInput<T>(schema: z.ZodType<T>, input: unknown, where: string): T {
  checkSchema(schema, "parseInput");
  if (typeof where !== "string") throw new TanklightInputError([{ path: "where", message: "must be the public function's name (a string)", value: where }], "parseInput");
  let result: z.ZodSafeParseResult<T>;
  try {
    result = schema.safeParse(input, { reportInput: true });
  } catch (e) {
    // A TanklightInputError thrown inside a hand-written transform (parseQuantity called
    // directly, a builder called from a schema) escapes zod without its path; keep its issues
    // and add the function's name. Use quantity() fields to get the dotted path as well.
    if (e instanceof TanklightInputError) throw new TanklightInputError(e.issues, where);
    throw e;
  }
  if (result.success) return result.data;
  const issues = result.error.issues.flatMap((i) => toInputIssues(i, input, schema));
  throw new TanklightInputError(issues, where);
}

/** A zod schema (the `schema` argument of parseInput and quantityMeta), else a TanklightInputError naming `where`. */
function checkSchema(schema: unknown, where: string): void {
  const s = schema as { safeParse?: unknown; meta?: unknown } | null | undefined;
  if (typeof s !== "object" || s === null || typeof s.safeParse !== "function" || typeof s.meta !== "function") {
    throw new TanklightInputError([{ path: "schema", message: "must be a zod schema (built with z.… or the helpers of tanklight/advanced)", value: schema }], where);
  }
}

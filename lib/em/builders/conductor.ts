/**
 * Conductor helpers: round magnet wire, AWG wire, litz and PCB traces as plain `Conductor`
 * records (lib/em/types.ts). Lengths accept SI numbers (m) or quantity strings ("0.5 mm").
 */
import * as z from "../../zod.ts";
import { TanklightInputError, underName } from "../../errors.ts";
import { dimensionless, length, parseInput, lazySchema } from "../../schema.ts";
import { parseQuantity } from "../../units.ts";
import { awgDiameter } from "../classicFormulas.ts";
import { MATERIALS } from "../materials.ts";
import type { Conductor } from "../types.ts";
import { IssueList, SIZE_LIMITS, count, isPositiveInteger, metres } from "./common.ts";
import { checkConductor } from "../inputs.ts";

/** A round solid wire. */
export type RoundWire = Extract<Conductor, { kind: "round" }>;
/** A litz bundle. */
export type LitzWire = Extract<Conductor, { kind: "litz" }>;
/** A flat PCB trace. */
export type PcbTrace = Extract<Conductor, { kind: "trace" }>;

/** A length as an SI number (m) or a quantity string. */
export type LengthInput = number | string;

/** Options of {@link roundWire} and {@link awgWire}. Give `insulation` or `outerDiameter`, not both. */
export interface RoundWireOptions {
  /** radial thickness of the insulation (enamel build per side), m, ≥ 0 */
  readonly insulation?: LengthInput;
  /** diameter over the insulation, m, ≥ bare diameter */
  readonly outerDiameter?: LengthInput;
  /** material name (default "copper") */
  readonly material?: string;
}

const lengthOrString = lazySchema(() => z.union([z.number(), z.string()], { error: "expected a length like '0.5 mm' or a number in m" }));
/** Strict shape of {@link RoundWireOptions} (the values are checked by the builder). */
const RoundWireOptionsShape = lazySchema(() => z.strictObject({ insulation: lengthOrString.optional(), outerDiameter: lengthOrString.optional(), material: z.string().optional() }));
/** Strict shape of {@link LitzWireOptions}. */
const LitzWireOptionsShape = lazySchema(() => z.strictObject({
  outerDiameter: lengthOrString.optional(),
  strandInsulation: lengthOrString.optional(),
  fillFactor: dimensionless().optional(),
  material: z.string().optional(),
}));
/** Strict shape of the options of {@link pcbTrace}. */
const TraceOptionsShape = lazySchema(() => z.strictObject({ material: z.string().optional() }));
/** Options given as `undefined` mean none; anything else must be an options object (paths start with "opts."). */
function readOptions<T>(shape: z.ZodType<T>, opts: unknown, where: string): T {
  return underName(where, () => parseInput(shape.optional(), opts, where) ?? ({} as T), "opts.");
}

/** Density of annealed copper, kg/m³ (IEC 60028:1925, the International Annealed Copper Standard: 8.89 g/cm³ at 20 °C). */
export const COPPER_DENSITY = 8890;
/** One avoirdupois ounce, kg (exact by the 1959 international yard and pound agreement). */
const OUNCE = 0.028349523125;
/** One square foot, m² (exact: 0.3048² m²). */
const SQUARE_FOOT = 0.09290304;

/**
 * Thickness of PCB copper of a given weight in ounces per square foot: t = w·oz/(ft²·ρ_Cu).
 * With ρ_Cu = 8890 kg/m³ (IEC 60028) 1 oz/ft² gives 34.3 µm; fabricators quote "35 µm" or
 * "1.37 mil ≈ 34.8 µm" as nominal (trade practice, no source) and finished copper varies by
 * about ±10 % (trade practice, no source) — measure a board where it matters.
 * @param ounces copper weight, oz/ft², > 0.
 * @returns thickness, m.
 * @example copperWeightThickness(1) // → 3.4325e-5
 */
export function copperWeightThickness(ounces: number): number {
  if (!(Number.isFinite(ounces) && ounces > 0)) {
    throw new TanklightInputError(
      [{ path: "ounces", message: "must be a copper weight > 0 oz/ft²", value: ounces, expected: "> 0" }],
      "copperWeightThickness",
    );
  }
  return (ounces * OUNCE) / (SQUARE_FOOT * COPPER_DENSITY);
}

/** Record an issue unless `name` is a material of lib/em/materials.ts (case-insensitive); returns the name or "copper". */
function checkMaterial(issues: IssueList, name: string | undefined, path: string): string {
  if (name === undefined) return "copper";
  if (typeof name !== "string" || !Object.hasOwn(MATERIALS, name.toLowerCase())) {
    issues.add(path, `is not a known material (known: ${Object.keys(MATERIALS).join(", ")})`, name);
  }
  return name;
}

function readLength(issues: IssueList, value: unknown, path: string, rule: "positive" | "nonNegative"): number | undefined {
  if (typeof value !== "number" && typeof value !== "string") {
    issues.add(path, "expected a length like '0.5 mm' or a number in m", value, rule === "positive" ? "> 0 m" : "≥ 0 m");
    return undefined;
  }
  let x: number;
  try {
    x = parseQuantity(value, "length", path);
  } catch (e) {
    if (e instanceof TanklightInputError) {
      issues.issues.push(...e.issues);
      return undefined;
    }
    throw e;
  }
  if (rule === "positive" ? !(x > 0) : !(x >= 0)) {
    issues.add(path, `must be ${rule === "positive" ? "> 0" : "≥ 0"} m`, value, rule === "positive" ? "> 0 m" : "≥ 0 m");
    return undefined;
  }
  return x;
}

function outerOf(issues: IssueList, bare: number | undefined, opts: RoundWireOptions, prefix: string): number | undefined {
  if (opts.insulation !== undefined && opts.outerDiameter !== undefined) {
    issues.add(`${prefix}insulation`, "give insulation or outerDiameter, not both", opts.insulation);
    return undefined;
  }
  if (opts.outerDiameter !== undefined) {
    const od = readLength(issues, opts.outerDiameter, `${prefix}outerDiameter`, "positive");
    if (od !== undefined && bare !== undefined && od < bare) {
      issues.add(`${prefix}outerDiameter`, `must be ≥ the bare diameter ${metres(bare)}`, opts.outerDiameter, `≥ ${metres(bare)}`);
      return undefined;
    }
    return od;
  }
  if (opts.insulation !== undefined) {
    const t = readLength(issues, opts.insulation, `${prefix}insulation`, "nonNegative");
    return t === undefined || bare === undefined ? undefined : bare + 2 * t;
  }
  return bare;
}

/**
 * A round solid wire: bare diameter d and outer diameter over the insulation
 * (d + 2·insulation, or given; bare wire when neither is given).
 * @param diameter bare conductor diameter, m (or "0.5 mm"), > 0.
 * @param opts insulation (radial build, m) or outerDiameter (m); material (default "copper").
 * @returns `{ kind: "round", diameter, outerDiameter, material }`, SI.
 * @example roundWire("0.5 mm", { insulation: "20 um" }) // → { kind: "round", diameter: 5e-4, outerDiameter: 5.4e-4, material: "copper" }
 */
export function roundWire(diameter: LengthInput, options?: RoundWireOptions): RoundWire {
  const opts = readOptions(RoundWireOptionsShape, options, "roundWire");
  const issues = new IssueList("roundWire");
  const d = readLength(issues, diameter, "diameter", "positive");
  const od = outerOf(issues, d, opts, "");
  const mat = checkMaterial(issues, opts.material, "material");
  issues.throwIfAny();
  return { kind: "round", diameter: d!, outerDiameter: od!, material: mat };
}

/**
 * A round solid wire of American Wire Gauge n, bare diameter per ASTM B258
 * (d = 0.127 mm × 92^((36 − n)/39); see {@link awgDiameter}).
 * @param gauge AWG number, integer −3…56, or "4/0", "3/0", "2/0", "1/0" (= −3, −2, −1, 0).
 * @param opts as {@link roundWire}.
 * @example awgWire(30).diameter // → 2.5464e-4 (0.2546 mm; ASTM B258 rounds to 0.0100 in)
 */
export function awgWire(gauge: number | string, options?: RoundWireOptions): RoundWire {
  const opts = readOptions(RoundWireOptionsShape, options, "awgWire");
  const d = underName("awgWire", () => awgDiameter(gauge));
  const issues = new IssueList("awgWire");
  const od = outerOf(issues, d, opts, "");
  const mat = checkMaterial(issues, opts.material, "material");
  issues.throwIfAny();
  return { kind: "round", diameter: d, outerDiameter: od!, material: mat };
}

/** Options of {@link litzWire}. */
export interface LitzWireOptions {
  /** bundle diameter over the serving, m; estimated from the strands when omitted */
  readonly outerDiameter?: LengthInput;
  /** radial insulation build of one strand, m (default 0: enough for an estimate of the bundle) */
  readonly strandInsulation?: LengthInput;
  /**
   * fraction of the bundle's cross-section filled by insulated strands, used only to estimate
   * outerDiameter; default 0.7 — trade practice (no source); hexagonal packing caps it at 0.9069
   */
  readonly fillFactor?: number;
  readonly material?: string;
}

/**
 * A litz bundle of `strands` insulated strands. Bundle diameter, when not given, is estimated as
 * D = d_s,outer·√(strands / fillFactor) (the strands' total outer cross-section divided by the fill
 * factor) — an estimate; pass the maker's figure when you have it.
 * @param strands number of strands, integer ≥ 1.
 * @param strandDiameter bare strand diameter, m, > 0.
 * @example litzWire(100, "0.071 mm", { outerDiameter: "1 mm" }).strands // → 100
 */
export function litzWire(strands: number, strandDiameter: LengthInput, options?: LitzWireOptions): LitzWire {
  const opts = readOptions(LitzWireOptionsShape, options, "litzWire");
  const issues = new IssueList("litzWire");
  if (!(typeof strands === "number" && isPositiveInteger(strands) && strands <= SIZE_LIMITS.strands.max)) {
    issues.add("strands", `must be a whole number ≥ 1 and ≤ ${SIZE_LIMITS.strands.max} (${SIZE_LIMITS.strands.why})`, strands, `integer 1…${SIZE_LIMITS.strands.max}`);
  }
  const ds = readLength(issues, strandDiameter, "strandDiameter", "positive");
  const fill = opts.fillFactor ?? 0.7;
  if (!(typeof fill === "number" && fill > 0 && fill <= Math.PI / (2 * Math.sqrt(3)))) {
    issues.add("fillFactor", "must be in (0, 0.9069] (hexagonal packing limit π/(2√3))", fill, "0 < fill ≤ 0.9069");
  }
  let od: number | undefined;
  if (opts.outerDiameter !== undefined) {
    od = readLength(issues, opts.outerDiameter, "outerDiameter", "positive");
  } else {
    const ins = opts.strandInsulation === undefined ? 0 : readLength(issues, opts.strandInsulation, "strandInsulation", "nonNegative");
    if (ds !== undefined && ins !== undefined) od = (ds + 2 * ins) * Math.sqrt(strands / fill);
  }
  if (od !== undefined && ds !== undefined && isPositiveInteger(strands) && od < ds * Math.sqrt(strands)) {
    issues.add("outerDiameter", `is too small to hold ${strands} strands of ${metres(ds)}`, opts.outerDiameter, `≥ ${metres(ds * Math.sqrt(strands))}`);
  }
  const mat = checkMaterial(issues, opts.material, "material");
  issues.throwIfAny();
  return { kind: "litz", strands, strandDiameter: ds!, outerDiameter: od!, material: mat };
}

/**
 * A flat PCB trace of given width and copper thickness. The thickness is a length or a copper
 * weight such as "1 oz" (oz per square foot; see {@link copperWeightThickness}).
 * @param width trace width, m, > 0.
 * @param thickness copper thickness, m, > 0, or "<n> oz".
 * @example pcbTrace("0.5 mm", "1 oz").thickness // → 3.4325e-5
 */
export function pcbTrace(width: LengthInput, thickness: LengthInput, options?: { readonly material?: string }): PcbTrace {
  const opts = readOptions(TraceOptionsShape, options, "pcbTrace");
  const issues = new IssueList("pcbTrace");
  const w = readLength(issues, width, "width", "positive");
  let t: number | undefined;
  const oz = typeof thickness === "string" ? /^\s*([0-9]*\.?[0-9]+)\s*oz\s*$/i.exec(thickness) : null;
  if (oz !== null) {
    const ounces = Number(oz[1]);
    if (ounces > 0) t = copperWeightThickness(ounces);
    else issues.add("thickness", "copper weight must be > 0 oz", thickness, "> 0 oz");
  } else {
    t = readLength(issues, thickness, "thickness", "positive");
  }
  const mat = checkMaterial(issues, opts.material, "material");
  issues.throwIfAny();
  return { kind: "trace", width: w!, thickness: t!, material: mat };
}

/**
 * Width a conductor occupies in a winding (outer diameter of wire or litz, width of a trace), m.
 * @example conductorFootprint(roundWire("0.5 mm")) // → 0.0005 (m)
 */
export function conductorFootprint(c: Conductor): number {
  checkConductor(c, "c", "conductorFootprint");
  return c.kind === "trace" ? c.width : c.outerDiameter;
}

// ── conductor fields of the builders' input ──────────────────────────────────

const OUNCES = /^\s*([0-9]*\.?[0-9]+)\s*oz\s*$/i;

/** Copper thickness: a length, or a copper weight "<n> oz" (oz/ft², see {@link copperWeightThickness}). */
function copperThickness(): z.ZodType<number, number | string> {
  return z.preprocess((v) => {
    if (typeof v === "string") {
      const m = OUNCES.exec(v);
      if (m !== null && Number(m[1]) > 0) return copperWeightThickness(Number(m[1]));
    }
    return v;
  }, length()) as unknown as z.ZodType<number, number | string>;
}

/** The `wire` field of a builder: a plain spec `{ diameter, insulation? | outerDiameter? }`, or a record from roundWire/awgWire/litzWire. */
export const WireInput = lazySchema(() => z.strictObject({
  kind: z.enum(["round", "litz"]).optional(),
  diameter: length().optional(),
  insulation: length({ nonNegative: true }).optional(),
  outerDiameter: length().optional(),
  strands: count(1, "strands").optional(),
  strandDiameter: length().optional(),
  material: z.string().optional(),
}));

/** The `trace` field of a builder: `{ width, thickness }` (thickness a length or "1 oz"), or a record from pcbTrace. */
export const TraceInput = lazySchema(() => z.strictObject({
  kind: z.literal("trace").optional(),
  width: length(),
  thickness: copperThickness(),
  material: z.string().optional(),
}));

/** zod fields shared by every builder: exactly one of wire, awg, trace. */
export const conductorFields = lazySchema(() => ({
  wire: WireInput.optional(),
  awg: z.union([z.number(), z.string()]).optional(),
  trace: TraceInput.optional(),
}));

/** Parsed conductor fields. */
export interface ConductorFields {
  readonly wire?: z.output<typeof WireInput> | undefined;
  readonly awg?: number | string | undefined;
  readonly trace?: z.output<typeof TraceInput> | undefined;
}

/**
 * The Conductor named by a builder's parsed `wire` | `awg` | `trace` field; records problems
 * (none or several given, litz without its sizes, outer diameter below the bare one) in `issues`.
 * @param allowTrace false for wound coils (roundCoil, solenoid), which take wire only.
 */
export function resolveConductor(f: ConductorFields, issues: IssueList, allowTrace: boolean): Conductor | undefined {
  const given = (["wire", "awg", "trace"] as const).filter((k) => f[k] !== undefined);
  if (given.length !== 1) {
    const options = allowTrace ? "wire, awg or trace" : "wire or awg";
    issues.add(given.length === 0 ? "wire" : given.join("/"), `give exactly one of ${options}`, given.length === 0 ? undefined : given.join(", "));
    return undefined;
  }
  const field = given[0]!;
  const material = (m: string | undefined): string => checkMaterial(issues, m, `${field}.material`);
  if (f.trace !== undefined) {
    if (!allowTrace) {
      issues.add("trace", "a wound coil takes wire or awg, not a PCB trace", f.trace);
      return undefined;
    }
    return { kind: "trace", width: f.trace.width, thickness: f.trace.thickness, material: material(f.trace.material) };
  }
  if (f.awg !== undefined) {
    try {
      const d = awgDiameter(f.awg);
      return { kind: "round", diameter: d, outerDiameter: d, material: "copper" };
    } catch {
      issues.add("awg", "must be an AWG number −3…56 or '4/0'…'1/0'", f.awg, "integer −3…56");
      return undefined;
    }
  }
  const w = f.wire!;
  if (w.kind === "litz" || w.strands !== undefined) {
    let ok = true;
    for (const k of ["strands", "strandDiameter", "outerDiameter"] as const) {
      if (w[k] === undefined) {
        issues.add(`wire.${k}`, "litz wire needs strands, strandDiameter and outerDiameter (or use litzWire())", undefined);
        ok = false;
      }
    }
    if (!ok) return undefined;
    return { kind: "litz", strands: w.strands!, strandDiameter: w.strandDiameter!, outerDiameter: w.outerDiameter!, material: material(w.material) };
  }
  if (w.diameter === undefined) {
    issues.add("wire.diameter", "round wire needs its bare diameter", undefined, "length > 0 m");
    return undefined;
  }
  if (w.insulation !== undefined && w.outerDiameter !== undefined && Math.abs(w.diameter + 2 * w.insulation - w.outerDiameter) > 1e-12) {
    issues.add("wire.insulation", "give insulation or outerDiameter, not both", w.insulation);
    return undefined;
  }
  const od = w.outerDiameter ?? w.diameter + 2 * (w.insulation ?? 0);
  if (od < w.diameter) {
    issues.add("wire.outerDiameter", `must be ≥ the bare diameter ${metres(w.diameter)}`, od, `≥ ${metres(w.diameter)}`);
    return undefined;
  }
  return { kind: "round", diameter: w.diameter, outerDiameter: od, material: material(w.material) };
}

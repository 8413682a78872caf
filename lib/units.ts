/**
 * Quantities at the edge: parse "12 mm", "217 kHz", "4.7 nF" into SI numbers, and format SI
 * numbers back into engineering notation (docs/design.md §3, "SI inside, strings at the edge").
 *
 * Parsing reads the unit with the small unit algebra of lib/unitAlgebra.ts (a vocabulary of
 * SI, CGS and inch units, products, quotients, powers) and checks its dimension. Units are
 * parsed once at the boundary; hot paths never call these functions.
 * The rules (which strings are accepted, what a bare number means) are documented in
 * docs/methods/units.md.
 */
import { TanklightInputError, unknownKeyMessage } from "./errors.ts";
import { reduceUnit, sameDims, UnitSyntaxError, type BaseDims, type ReducedUnit } from "./unitAlgebra.ts";

/** Physical dimension of an input quantity; decides the SI unit it is converted to. */
export type Dimension =
  | "length"
  | "area"
  | "frequency"
  | "inductance"
  | "capacitance"
  | "resistance"
  | "conductance"
  | "voltage"
  | "current"
  | "power"
  | "energy"
  | "charge"
  | "angle"
  | "temperature"
  | "resistivity"
  | "fluxDensity"
  | "fieldStrength"
  | "time"
  | "dimensionless";

/** A quantity as a user may give it: an SI number, or a string with a unit ("12 mm"). */
export type QuantityInput = number | string;

/** What we know about one dimension: its SI unit and how to talk about it in messages. */
export interface DimensionInfo {
  /** the SI unit every parsed value is returned in, as printed ("Ω·m", "m²", "" for none) */
  readonly unit: string;
  /** the same unit as typed in a quantity string ("ohm m"), used in hints */
  readonly mathUnit: string;
  /** the dimension in words with its article, for messages: "a length", "an inductance" */
  readonly noun: string;
  /** a typical input string, shown in messages: "12 mm" */
  readonly example: string;
}

/** The dimension table: SI unit, words and an example for every {@link Dimension}. */
export const DIMENSIONS: Readonly<Record<Dimension, DimensionInfo>> = {
  length: { unit: "m", mathUnit: "m", noun: "a length", example: "12 mm" },
  area: { unit: "m²", mathUnit: "m^2", noun: "an area", example: "1.5 mm^2" },
  frequency: { unit: "Hz", mathUnit: "Hz", noun: "a frequency", example: "217 kHz" },
  inductance: { unit: "H", mathUnit: "H", noun: "an inductance", example: "24 uH" },
  capacitance: { unit: "F", mathUnit: "F", noun: "a capacitance", example: "4.7 nF" },
  resistance: { unit: "Ω", mathUnit: "ohm", noun: "a resistance", example: "0.5 ohm" },
  conductance: { unit: "S", mathUnit: "S", noun: "a conductance", example: "20 mS" },
  voltage: { unit: "V", mathUnit: "V", noun: "a voltage", example: "3.3 V" },
  current: { unit: "A", mathUnit: "A", noun: "a current", example: "150 mA" },
  power: { unit: "W", mathUnit: "W", noun: "a power", example: "2 W" },
  energy: { unit: "J", mathUnit: "J", noun: "an energy", example: "5 mJ" },
  charge: { unit: "C", mathUnit: "C", noun: "a charge", example: "10 nC" },
  angle: { unit: "rad", mathUnit: "rad", noun: "an angle", example: "30 deg" },
  temperature: { unit: "K", mathUnit: "K", noun: "a temperature", example: "25 degC" },
  resistivity: { unit: "Ω·m", mathUnit: "ohm m", noun: "a resistivity", example: "1.72e-8 ohm m" },
  fluxDensity: { unit: "T", mathUnit: "T", noun: "a flux density", example: "27 uT" },
  fieldStrength: { unit: "A/m", mathUnit: "A/m", noun: "a field strength", example: "21 A/m" },
  time: { unit: "s", mathUnit: "s", noun: "a time", example: "10 us" },
  dimensionless: { unit: "", mathUnit: "", noun: "a plain number", example: "0.5" },
};

const DIMENSION_NAMES = Object.keys(DIMENSIONS) as Dimension[];

// ── dimensions in base units ─────────────────────────────────────────────────
/** Base dimensions (m, kg, s, A, K, rad) of each {@link Dimension}'s SI unit. */
const BASE_DIMS: Readonly<Record<Dimension, BaseDims>> = {
  length: [1, 0, 0, 0, 0, 0],
  area: [2, 0, 0, 0, 0, 0],
  frequency: [0, 0, -1, 0, 0, 0],
  inductance: [2, 1, -2, -2, 0, 0],
  capacitance: [-2, -1, 4, 2, 0, 0],
  resistance: [2, 1, -3, -2, 0, 0],
  conductance: [-2, -1, 3, 2, 0, 0],
  voltage: [2, 1, -3, -1, 0, 0],
  current: [0, 0, 0, 1, 0, 0],
  power: [2, 1, -3, 0, 0, 0],
  energy: [2, 1, -2, 0, 0, 0],
  charge: [0, 0, 1, 1, 0, 0],
  angle: [0, 0, 0, 0, 0, 1],
  temperature: [0, 0, 0, 0, 1, 0],
  resistivity: [3, 1, -3, -2, 0, 0],
  fluxDensity: [0, 1, -2, -1, 0, 0],
  fieldStrength: [-1, 0, 0, 1, 0, 0],
  time: [0, 0, 1, 0, 0, 0],
  dimensionless: [0, 0, 0, 0, 0, 0],
};

/** The dimension of a reduced unit among ours, or undefined when it is none of them. */
function dimensionOf(u: ReducedUnit): Dimension | undefined {
  for (const d of DIMENSION_NAMES) {
    if (sameDims(u.dims, BASE_DIMS[d])) return d;
  }
  return undefined;
}

// ── parsing ──────────────────────────────────────────────────────────────────

/** A leading decimal number: sign, digits with optional point, optional exponent. */
const NUMBER_PREFIX = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+))(?:[eE]([+-]?\d+))?/;

/**
 * Common spellings per dimension, for "did you mean" hints when a unit is unknown only
 * because of its case ("khz" → "kHz"; "mohm" and "Mohm" are both offered, never guessed).
 */
const COMMON_UNITS: readonly string[] = [
  "m", "mm", "cm", "um", "nm", "km", "mil", "inch",
  "Hz", "kHz", "MHz", "GHz",
  "H", "mH", "uH", "nH",
  "F", "mF", "uF", "nF", "pF",
  "ohm", "mohm", "kohm", "Mohm",
  "S", "mS", "uS",
  "V", "mV", "kV", "A", "mA", "uA", "W", "mW", "kW", "J", "mJ", "C", "nC",
  "T", "mT", "uT", "nT", "gauss", "A/m",
  "s", "ms", "us", "ns", "deg", "rad", "degC", "degF", "K",
];

/** The common units equal to `text` up to case, quoted and joined: "'kHz'", "'mohm' or 'Mohm'". */
function caseHint(text: string): string | undefined {
  const lower = text.toLowerCase();
  const hits = COMMON_UNITS.filter((u) => u.toLowerCase() === lower && u !== text);
  if (hits.length === 0) return undefined;
  return `units are case-sensitive: ${hits.map((u) => `'${u}'`).join(" or ")}?`;
}

/** "4.7n F" → "write the prefix with its unit: '4.7 nF'?" when joining them gives a known unit. */
function separatedPrefixHint(mantissa: string, exponent: string | undefined, unitText: string): string | undefined {
  const m = /^(da|[qryzafpnumkhMGTPEZYRQ]) (\S+)$/.exec(unitText);
  if (m === null) return undefined;
  const joined = `${m[1]}${m[2]}`;
  try {
    reduceUnit(joined);
  } catch {
    return undefined;
  }
  return `write the prefix with its unit: '${mantissa}${exponent === undefined ? "" : "e" + exponent} ${joined}'?`;
}

/** Dimensionless unit words, with their factor (exact by definition). */
const PLAIN_FACTORS: Readonly<Record<string, number>> = { "%": 0.01, ppm: 1e-6 };

/**
 * Rewrite the Unicode spellings people paste (µ, Ω, °C, ², ·, −) into the ASCII the unit reader knows.
 * Only symbols are rewritten; words pass unchanged.
 */
function normalizeUnitText(text: string): string {
  return text
    .replace(/\u2212/g, "-") // minus sign → hyphen-minus
    .replace(/[\u00B5\u03BC]/g, "u") // micro sign, Greek mu → u
    .replace(/[\u03A9\u2126]/g, "ohm") // Greek capital omega, ohm sign → ohm
    .replace(/\u00B0\s*C/g, "degC")
    .replace(/\u00B0\s*F/g, "degF")
    .replace(/\u00B0/g, "deg")
    .replace(/\u00B2/g, "^2")
    .replace(/\u00B3/g, "^3")
    .replace(/[\u00B7\u22C5]/g, " ") // middle dot, dot operator → product
    .replace(/\s+/g, " "); // no-break, thin and other Unicode spaces → one space
}

/**
 * Two spellings people type that we do not read, with what to type instead: a decimal comma
 * ("4,7 nF" → '4.7 nF'; "1,000 mm" is refused the same way, as the comma could be either a
 * decimal comma or a thousands separator) and the letter-for-decimal-point marking printed on
 * parts (IEC 60062 style: "2n2" → '2.2 nF', "4k7" → '4.7 kΩ', "4R7" → '4.7 Ω'). Both are refused
 * rather than guessed: the marking leaves the unit to the reader, and a comma is ambiguous.
 */
function localNotationHint(text: string, dimension: Dimension): string | undefined {
  const comma = /^([+-]?\d+),(\d+)(.*)$/.exec(text);
  if (comma !== null) {
    const rest = (comma[3] ?? "").trim();
    const unit = rest === "" ? DIMENSIONS[dimension].mathUnit : rest;
    const u = unit === "" ? "" : " " + unit;
    const grouped = (comma[2] ?? "").length === 3 ? ` (decimal comma) or '${comma[1]}${comma[2]}${u}' (digit grouping)` : "";
    return `a comma in the number; write a decimal point and no separators: '${comma[1]}.${comma[2]}${u}'${grouped}`;
  }
  const marking = /^([+-]?\d+)([pnumkMGRr])(\d+)\s*(.*)$/.exec(text);
  if (marking !== null) {
    const letter = marking[2] ?? "";
    const prefix = letter === "R" || letter === "r" ? "" : letter;
    const rest = (marking[4] ?? "").trim();
    const unit = rest === "" ? DIMENSIONS[dimension].mathUnit : rest;
    if (unit === "") return undefined;
    return `a part marking with the prefix as decimal point; write '${marking[1]}.${marking[3]} ${prefix}${unit}'`;
  }
  return undefined;
}

/** Build the one error parseQuantity throws. */
function quantityError(
  field: string | undefined,
  value: unknown,
  dimension: Dimension,
  message: string,
  detail?: string,
): TanklightInputError {
  const info = DIMENSIONS[dimension];
  return new TanklightInputError(
    [
      {
        path: field ?? "value",
        message,
        value,
        expected: info.unit === "" ? info.noun : `${info.noun} in ${info.unit} or a string like '${info.example}'`,
        ...(detail === undefined ? {} : { detail }),
      },
    ],
    "parseQuantity",
  );
}

const DIMENSION_LIST = (): string => Object.keys(DIMENSIONS).join(", ");

/** A dimension argument: one of the own keys of DIMENSIONS ("toString" is none). */
function checkDimension(dimension: unknown, field: string, where: string): void {
  if (typeof dimension === "string" && Object.hasOwn(DIMENSIONS, dimension)) return;
  throw new TanklightInputError([{ path: field, message: `must be one of ${DIMENSION_LIST()}`, value: dimension }], where);
}

function expectation(dimension: Dimension): string {
  const info = DIMENSIONS[dimension];
  return `expected ${info.noun} like '${info.example}'`;
}

/**
 * Convert a quantity given as an SI number or as a string with a unit into the SI number.
 *
 * Rules (docs/methods/units.md): a `number` is taken as already in SI units (m, Hz, H, F, Ω,
 * V, A, W, rad, K, Ω·m, T, A/m, s …) and must be finite. A string is a decimal number followed
 * by a unit, with or without a space: "12 mm", "4.7nF", "4.7 nanofarad", "0.5 mil",
 * "25 degC", "25 °C", "30 deg", "1.72e-8 ohm m", "100 µT", "3 A/m". The unit must have the
 * requested dimension. A bare number string ("12") is accepted only for "dimensionless";
 * for any other dimension it is an error, since "12" could mean 12 m or 12 mm. Temperatures
 * are absolute (°C and °F are converted with their offsets) and must be ≥ 0 K. No arithmetic,
 * no comma decimals, no separated prefixes ("4.7n F" is rejected: "n" is no unit).
 * Signs are not checked here (a position may be negative); schemas add sign and range rules.
 *
 * @param value SI number, or string "<number> <unit>".
 * @param dimension the physical dimension expected (decides the SI unit of the result).
 * @param field dotted path of the input field, used in the error ("coil.radius").
 * @returns the value in SI units of `dimension`.
 * @throws TanklightInputError naming the field, the expectation and the value:
 *   `coil.radius: expected a length like '12 mm', got '5 kHz' (a frequency)`.
 * @example parseQuantity("4.7 nF", "capacitance") // → 4.7e-9
 * @example parseQuantity("25 degC", "temperature") // → 298.15
 * @example parseQuantity("0.5 mil", "length") // → 1.27e-5 (1 mil = 0.001 in = 25.4 µm exactly)
 */
export function parseQuantity(value: QuantityInput, dimension: Dimension, field?: string): number {
  // One function on purpose (≈ 80 lines): a parser read top to bottom — each check in the order the text is read, each
  // with its own message — and the unit's scale applied on the decimal mantissa; the unit grammar lives in unitAlgebra.ts.
  checkDimension(dimension, "dimension", "parseQuantity");
  if (field !== undefined && typeof field !== "string") {
    throw new TanklightInputError([{ path: "field", message: "must be the field's name (a string) or absent", value: field }], "parseQuantity");
  }
  if (typeof value === "number") {
    if (!Number.isFinite(value)) {
      throw quantityError(field, value, dimension, `${expectation(dimension)} (a finite number)`);
    }
    if (dimension === "temperature" && value < 0) {
      throw quantityError(field, value, dimension, "must be ≥ 0 K (absolute temperature)");
    }
    return value;
  }
  if (typeof value !== "string") {
    throw quantityError(field, value, dimension, expectation(dimension));
  }
  const text = normalizeUnitText(value.trim());
  const notation = localNotationHint(text, dimension);
  if (notation !== undefined) {
    throw quantityError(field, value, dimension, expectation(dimension), notation);
  }
  const match = NUMBER_PREFIX.exec(text);
  if (match === null) {
    throw quantityError(field, value, dimension, expectation(dimension), "no leading number");
  }
  const mantissa = match[1] ?? "";
  const exponent = Number(match[2] ?? "0");
  // "1/s", "1/K": a reciprocal of one unit symbol is read as its power −1
  const unitText = text
    .slice(match[0].length)
    .trim()
    .replace(/^1\s*\/\s*([A-Za-z]+)$/, "$1^-1");
  const plain = Number(`${mantissa}e${exponent}`);

  let result: number;
  if (unitText === "") {
    if (dimension !== "dimensionless") {
      throw quantityError(
        field,
        value,
        dimension,
        expectation(dimension),
        `no unit; write e.g. '${mantissa}${match[2] === undefined ? "" : "e" + match[2]} ${DIMENSIONS[dimension].mathUnit}' or pass the number for SI`,
      );
    }
    result = plain;
  } else if (Object.hasOwn(PLAIN_FACTORS, unitText)) {
    if (dimension !== "dimensionless") {
      throw quantityError(field, value, dimension, expectation(dimension), "a plain number");
    }
    result = scaleDecimal(mantissa, exponent, PLAIN_FACTORS[unitText] ?? 1);
  } else {
    let u: ReducedUnit;
    try {
      u = reduceUnit(unitText);
    } catch (e) {
      if (e instanceof UnitSyntaxError && e.reason === "number") {
        // a number inside the unit text ("5 5 mm", "5 2mm"): one number only
        throw quantityError(field, value, dimension, expectation(dimension), "more than one number");
      }
      const hint = caseHint(unitText) ?? separatedPrefixHint(mantissa, match[2], unitText);
      throw quantityError(field, value, dimension, expectation(dimension), `unknown unit '${unitText}'${hint === undefined ? "" : "; " + hint}`);
    }
    const found = dimensionOf(u);
    if (found !== dimension) {
      const what = found === undefined ? `unit '${unitText}' is not ${DIMENSIONS[dimension].noun}` : found === "dimensionless" ? "a plain number" : DIMENSIONS[found].noun;
      throw quantityError(field, value, dimension, expectation(dimension), what);
    }
    // Offset scales (degC, degF): T/K = (t + offset)·factor.
    result = u.offset === undefined ? scaleDecimal(mantissa, exponent, u.factor) : (plain + u.offset) * u.factor;
  }
  if (!Number.isFinite(result)) {
    throw quantityError(field, value, dimension, `${expectation(dimension)} (a finite number)`, "overflows");
  }
  if (result === 0 && Number(mantissa) !== 0) {
    throw quantityError(field, value, dimension, `${expectation(dimension)} (a representable number)`, "underflows to 0");
  }
  if (dimension === "temperature" && result < 0) {
    throw quantityError(field, value, dimension, "must be ≥ 0 K (absolute temperature)", `${Number(result.toPrecision(12))} K`);
  }
  return result;
}

/**
 * mantissa·10^exponent·factor, correctly rounded when the factor is a power of ten (every SI
 * prefix, also products such as µΩ·cm): the decimal string is shifted instead of multiplying
 * by an inexact 1e-9, so "4.7 nF" gives exactly the double nearest 4.7e-9.
 */
function scaleDecimal(mantissa: string, exponent: number, factor: number): number {
  const p = Math.round(Math.log10(factor));
  if (Number.isFinite(p) && Math.abs(factor / 10 ** p - 1) < 1e-12) {
    return Number(`${mantissa}e${exponent + p}`);
  }
  return Number(`${mantissa}e${exponent}`) * factor;
}

/**
 * Is `value` acceptable for `dimension`? The same rules as {@link parseQuantity}, without throwing.
 * @example isQuantity("5 kHz", "length") // → false
 */
export function isQuantity(value: unknown, dimension: Dimension): boolean {
  checkDimension(dimension, "dimension", "isQuantity");
  if (typeof value !== "number" && typeof value !== "string") return false;
  try {
    parseQuantity(value, dimension);
    return true;
  } catch {
    return false;
  }
}

// ── formatting ───────────────────────────────────────────────────────────────

/** SI prefixes from quecto (10⁻³⁰) to quetta (10³⁰), index 10 = none (SI Brochure 2019, Table 7; ronna/quetta/ronto/quecto added 2022). */
const PREFIXES = ["q", "r", "y", "z", "a", "f", "p", "n", "µ", "m", "", "k", "M", "G", "T", "P", "E", "Z", "Y", "R", "Q"] as const;
const PREFIX_OFFSET = 10;

/**
 * Units printed without an SI prefix, by our choice: levels and ratios (dB…, %, ppm) are not
 * scalable quantities; angles and temperatures read better unprefixed ("298 K", "25.0 °C").
 */
const UNPREFIXED = new Set(["", "%", "ppm", "°C", "°", "deg", "degC", "dB", "dBm", "dBµA/m", "dBµV/m", "dBuA/m", "dBuV/m", "rad", "sr", "K", "°F"]);

/** Options of {@link formatQuantity}. */
export interface FormatOptions {
  /** significant figures, integer 1–17, default 3 */
  readonly digits?: number;
  /**
   * the resolution of the number, in SI units of `unit` (≥ 0, default 0): a value whose
   * magnitude is below it prints as "0 <unit>" — e.g. `floor: 1e-9` for an LED current that a
   * solver computed to 1 nA, so a token out of reach shows "0 A" instead of "718 yA"
   */
  readonly floor?: number;
}

/**
 * Format an SI number in engineering notation with an SI prefix: one to three integer
 * digits, `digits` significant figures, prefix between quecto and quetta.
 *
 * Rules: x = 0 prints "0 <unit>"; negatives keep their sign ("-4.70 nF"); ±∞ prints "∞ <unit>"
 * / "-∞ <unit>"; outside the prefix range (≥ 1000 Q or < 1 q) the plain exponent form is used
 * ("1.00e+33 Hz"). A unit in the unprefixed set (%, ppm, dB…, °C, °, deg, rad, K, "") is
 * printed in plain fixed notation between 1e-3 and 1e6 and in exponent form outside. The
 * prefix attaches to the first unit factor; when that factor carries a power ("m²", "m^2",
 * "m³") the prefix is scaled accordingly (1.5e-6 m² → "1.50 mm²"). Pass the SI unit without
 * a prefix ("m", not "mm"). Output parses back with {@link parseQuantity} where the unit is one
 * it knows. Values below `floor` in magnitude print as 0 (a stated resolution: numbers far
 * below what the computation resolves, such as 7e-22 A from a token out of reach, are noise,
 * not a reading).
 *
 * @param x value in SI units of `unit`, not NaN; or a quantity string ("12 mH") when `unit` is
 *   the SI unit of one of the {@link DIMENSIONS} (it is parsed with {@link parseQuantity} first).
 * @param unit SI unit symbol, e.g. "F", "Hz", "Ω", "A/m", "m²"; "" for a plain number.
 * @param digits significant figures, integer 1–17, default 3; or `{ digits?, floor? }`.
 * @returns the formatted string.
 * @example formatQuantity(4.7e-9, "F") // → "4.70 nF"
 * @example formatQuantity(217000, "Hz") // → "217 kHz"
 * @example formatQuantity(0, "F") // → "0 F"
 * @example formatQuantity("12 mH", "H") // → "12.0 mH"
 * @example formatQuantity(7.18e-22, "A", { floor: 1e-12 }) // → "0 A"
 */
export function formatQuantity(x: number | string, unit: string, digits: number | FormatOptions = 3): string {
  const opts = formatOptions(digits);
  const figures = opts.digits === undefined ? 3 : opts.digits;
  if (!(Number.isInteger(figures) && figures >= 1 && figures <= 17)) {
    throw new TanklightInputError(
      [{ path: "digits", message: "must be an integer from 1 to 17", value: figures, expected: "1–17" }],
      "formatQuantity",
    );
  }
  const floor = opts.floor === undefined ? 0 : opts.floor;
  if (!(typeof floor === "number" && Number.isFinite(floor) && floor >= 0)) {
    throw new TanklightInputError(
      [{ path: "floor", message: `must be a finite number ≥ 0 in ${unit || "SI units"}`, value: floor, expected: "≥ 0" }],
      "formatQuantity",
    );
  }
  if (typeof unit !== "string") {
    throw new TanklightInputError(
      [{ path: "unit", message: "must be an SI unit symbol such as 'H', 'Hz' or '' for a plain number", value: unit }],
      "formatQuantity",
    );
  }
  if (typeof x === "string") x = parseForFormat(x, unit);
  if (typeof x !== "number" || Number.isNaN(x)) {
    throw new TanklightInputError(
      [{ path: "x", message: `must be a number in ${unit || "SI units"}`, value: x, expected: "not NaN" }],
      "formatQuantity",
    );
  }
  if (Math.abs(x) < floor) x = 0;
  return formatNumber(x, unit, figures);
}

/** formatQuantity's third argument: a digit count, or `{ digits?, floor? }` (strict keys). */
function formatOptions(digits: unknown): FormatOptions {
  if (typeof digits === "number") return { digits };
  if (digits === undefined) return {};
  if (typeof digits !== "object" || digits === null || Array.isArray(digits)) {
    throw new TanklightInputError([{ path: "digits", message: "must be a number of significant figures or { digits?, floor? }", value: digits }], "formatQuantity");
  }
  for (const key of Reflect.ownKeys(digits)) {
    if (key !== "digits" && key !== "floor") {
      throw new TanklightInputError([{ path: `options.${String(key)}`, message: unknownKeyMessage(String(key), ["digits", "floor"]).replace("field", "option"), value: (digits as Record<PropertyKey, unknown>)[key] }], "formatQuantity");
    }
  }
  return digits as FormatOptions;
}

/** A quantity string given to formatQuantity: parsed in the dimension whose SI unit is `unit`, or refused. */
function parseForFormat(x: string, unit: string): number {
  const dimension = DIMENSION_NAMES.find((d) => DIMENSIONS[d].unit === unit);
  if (dimension === undefined) {
    throw new TanklightInputError(
      [
        {
          path: "x",
          message: `a quantity string is read only when unit is the SI unit of a known dimension (${DIMENSION_NAMES.filter((d) => DIMENSIONS[d].unit !== "")
            .map((d) => `'${DIMENSIONS[d].unit}'`)
            .join(", ")}); pass the number in ${unit} instead`,
          value: x,
          expected: `a number in ${unit}`,
        },
      ],
      "formatQuantity",
    );
  }
  try {
    return parseQuantity(x, dimension, "x");
  } catch (e) {
    if (e instanceof TanklightInputError) throw new TanklightInputError(e.issues, "formatQuantity");
    throw e;
  }
}

/** formatQuantity's body for a checked number. */
function formatNumber(x: number, unit: string, digits: number): string {
  const space = unit === "" ? "" : " ";
  if (x === Infinity) return `∞${space}${unit}`;
  if (x === -Infinity) return `-∞${space}${unit}`;
  if (x === 0) return `0${space}${unit}`;

  // Decimal digits and exponent of x rounded to `digits` significant figures, taken from
  // toExponential (correctly rounded, exact exponent): no log10 or division roundings, so
  // 999.96 becomes 1.00e3 and takes "k", and 9.99…e-31 never slips to "0.999… q".
  const { sign, figures, exponent } = decimalDigits(x, digits);

  if (UNPREFIXED.has(unit)) {
    const body = exponent >= -3 && exponent < 6 ? sign + placePoint(figures, exponent) : exponentForm(x, digits);
    return `${body}${space}${unit}`;
  }

  const power = leadingPower(unit);
  // prefix step: one prefix = 10^(3·power) in the value
  const step = Math.floor(exponent / (3 * power));
  const index = step + PREFIX_OFFSET;
  if (index < 0 || index >= PREFIXES.length) {
    return `${exponentForm(x, digits)}${space}${unit}`;
  }
  const mantissa = sign + placePoint(figures, exponent - 3 * power * step);
  return `${mantissa} ${PREFIXES[index]}${unit}`;
}

/** x ≠ 0 rounded to `digits` significant figures: sign, the digit string, the decimal exponent. */
function decimalDigits(x: number, digits: number): { sign: string; figures: string; exponent: number } {
  const [mant = "0", exp = "0"] = Math.abs(x).toExponential(digits - 1).split("e");
  return { sign: x < 0 ? "-" : "", figures: mant.replace(".", ""), exponent: Number(exp) };
}

/** Digits d₀d₁d₂… with value d₀.d₁d₂…·10^e written in fixed notation ("470", e = 0 → "4.70"). */
function placePoint(figures: string, e: number): string {
  if (e < 0) return `0.${"0".repeat(-e - 1)}${figures}`;
  const whole = figures.slice(0, e + 1).padEnd(e + 1, "0");
  const fraction = figures.slice(e + 1);
  return fraction === "" ? whole : `${whole}.${fraction}`;
}

/** The power of the first factor of a unit symbol: "m²" → 2, "m^3/s" → 3, "A/m" → 1. */
function leadingPower(unit: string): number {
  const first = /^[^\s·*/^²³]+(\^(\d)|²|³)?/.exec(unit);
  if (first === null || first[1] === undefined) return 1;
  if (first[1] === "²") return 2;
  if (first[1] === "³") return 3;
  return Number(first[2] ?? "1") || 1;
}

/** Exponent form with `digits` significant figures: "1.23e+33". */
function exponentForm(x: number, digits: number): string {
  return x.toExponential(digits - 1);
}

/**
 * The SI unit symbol of a dimension, as formatQuantity expects it.
 * @example siUnit("resistance") // → "Ω"
 */
export function siUnit(dimension: Dimension): string {
  checkDimension(dimension, "dimension", "siUnit");
  return DIMENSIONS[dimension].unit;
}

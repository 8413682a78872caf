/**
 * The unit vocabulary and unit algebra behind `parseQuantity` (lib/units.ts): a table of unit
 * symbols and names with their SI factor and base dimensions, SI prefixes, and a reader for
 * products, quotients and integer powers of units ("ohm m", "A/m", "mm^2", "uohm·cm").
 *
 * Written for this library instead of loading a general unit library at import: the whole
 * vocabulary is a few dozen entries and reading one unit takes microseconds, while the general
 * library cost seconds to import (docs/methods/units.md §1, "Vocabulary").
 *
 * Sources: SI Brochure, 9th ed. (2019), Table 7 (prefixes; ronna, quetta, ronto, quecto by
 * Resolution 3 of the 27th CGPM, 2022), Table 8 (degree, minute, hour); SI Brochure 8th ed.
 * (2006) Table 9 (gauss, oersted); NIST SP 811 (2008) App. B.8 (inch, mil, foot, °F).
 */

/** Exponents of the base dimensions, in the order m, kg, s, A, K, rad (the radian is kept as a base). */
export type BaseDims = readonly [number, number, number, number, number, number];

/** One entry of the vocabulary. */
interface UnitDef {
  /** value of one unit in SI base units (m, kg, s, A, K, rad and their products) */
  readonly factor: number;
  readonly dims: BaseDims;
  /** for temperatures on a shifted scale: T/K = (t + offset)·factor */
  readonly offset?: number;
  /** which prefixes the unit takes: symbols take short ones ("kHz"), names long ones ("kilohertz") */
  readonly prefixes: "short" | "long" | "any" | "none";
}

/** SI prefixes by symbol, as powers of ten ("u" is micro, as µ is rewritten to u before reading). */
const SHORT_PREFIXES: Readonly<Record<string, number>> = {
  q: -30, r: -27, y: -24, z: -21, a: -18, f: -15, p: -12, n: -9, u: -6, m: -3, c: -2, d: -1,
  da: 1, h: 2, k: 3, M: 6, G: 9, T: 12, P: 15, E: 18, Z: 21, Y: 24, R: 27, Q: 30,
};

/** SI prefixes by name. */
const LONG_PREFIXES: Readonly<Record<string, number>> = {
  quecto: -30, ronto: -27, yocto: -24, zepto: -21, atto: -18, femto: -15, pico: -12, nano: -9,
  micro: -6, milli: -3, centi: -2, deci: -1, deca: 1, deka: 1, hecto: 2, kilo: 3, mega: 6,
  giga: 9, tera: 12, peta: 15, exa: 18, zetta: 21, yotta: 24, ronna: 27, quetta: 30,
};

const D = (m: number, kg: number, s: number, A: number, K: number, rad: number): BaseDims => [m, kg, s, A, K, rad];
const LENGTH = D(1, 0, 0, 0, 0, 0);
const MASS = D(0, 1, 0, 0, 0, 0);
const TIME = D(0, 0, 1, 0, 0, 0);
const CURRENT = D(0, 0, 0, 1, 0, 0);
const TEMPERATURE = D(0, 0, 0, 0, 1, 0);
const ANGLE = D(0, 0, 0, 0, 0, 1);
const FREQUENCY = D(0, 0, -1, 0, 0, 0);
const FORCE = D(1, 1, -2, 0, 0, 0);
const ENERGY = D(2, 1, -2, 0, 0, 0);
const POWER = D(2, 1, -3, 0, 0, 0);
const CHARGE = D(0, 0, 1, 1, 0, 0);
const VOLTAGE = D(2, 1, -3, -1, 0, 0);
const RESISTANCE = D(2, 1, -3, -2, 0, 0);
const CONDUCTANCE = D(-2, -1, 3, 2, 0, 0);
const CAPACITANCE = D(-2, -1, 4, 2, 0, 0);
const INDUCTANCE = D(2, 1, -2, -2, 0, 0);
const FLUX = D(2, 1, -2, -1, 0, 0);
const FLUX_DENSITY = D(0, 1, -2, -1, 0, 0);
const FIELD_STRENGTH = D(-1, 0, 0, 1, 0, 0);
const PRESSURE = D(-1, 1, -2, 0, 0, 0);

/** Adds a symbol (short prefixes) and its names (long prefixes) for one unit. */
function both(symbols: readonly string[], names: readonly string[], factor: number, dims: BaseDims): [string, UnitDef][] {
  return [
    ...symbols.map((s): [string, UnitDef] => [s, { factor, dims, prefixes: "short" }]),
    ...names.map((n): [string, UnitDef] => [n, { factor, dims, prefixes: "long" }]),
  ];
}

function plain(names: readonly string[], factor: number, dims: BaseDims, offset?: number): [string, UnitDef][] {
  return names.map((n): [string, UnitDef] => [n, { factor, dims, prefixes: "none", ...(offset === undefined ? {} : { offset }) }]);
}

const INCH = 0.0254; // exactly (1959 agreement; NIST SP 811 App. B.8)

/** The vocabulary: symbol or name → definition. Units are case-sensitive. */
const UNITS: ReadonlyMap<string, UnitDef> = new Map<string, UnitDef>([
  // SI base and derived units (SI Brochure 2019, Tables 2 and 4)
  ...both(["m"], ["meter", "meters", "metre", "metres"], 1, LENGTH),
  ...both(["g"], ["gram", "grams"], 1e-3, MASS),
  ...both(["s"], ["second", "seconds"], 1, TIME),
  ...both(["A"], ["ampere", "amperes", "amp", "amps"], 1, CURRENT),
  ...both(["K"], ["kelvin"], 1, TEMPERATURE),
  ...both(["rad"], ["radian", "radians"], 1, ANGLE),
  ...both(["Hz"], ["hertz"], 1, FREQUENCY),
  ...both(["N"], ["newton", "newtons"], 1, FORCE),
  ...both(["Pa"], ["pascal", "pascals"], 1, PRESSURE),
  ...both(["J"], ["joule", "joules"], 1, ENERGY),
  ...both(["W"], ["watt", "watts"], 1, POWER),
  ...both(["C"], ["coulomb", "coulombs"], 1, CHARGE),
  ...both(["V"], ["volt", "volts"], 1, VOLTAGE),
  ["ohm", { factor: 1, dims: RESISTANCE, prefixes: "any" }], // "kohm" and "kiloohm"
  ...both([], ["ohms"], 1, RESISTANCE),
  ...both(["S"], ["siemens"], 1, CONDUCTANCE),
  ...both(["F"], ["farad", "farads"], 1, CAPACITANCE),
  ...both(["H"], ["henry", "henrys", "henries"], 1, INDUCTANCE),
  ...both(["Wb"], ["weber", "webers"], 1, FLUX),
  ...both(["T"], ["tesla", "teslas"], 1, FLUX_DENSITY),
  // the gauss (CGS): 1 G = 1e-4 T; prefixes allowed ("mgauss"); the oersted: 1 Oe = 10³/(4π) A/m
  ...both(["gauss"], [], 1e-4, FLUX_DENSITY),
  ...plain(["oersted", "Oe"], 1000 / (4 * Math.PI), FIELD_STRENGTH),
  // non-SI units accepted for use with the SI (SI Brochure 2019, Table 8)
  ...plain(["min", "minute", "minutes"], 60, TIME),
  ...plain(["h", "hour", "hours"], 3600, TIME),
  ...plain(["deg", "degree", "degrees"], Math.PI / 180, ANGLE),
  ...plain(["Wh"], 3600, ENERGY),
  // temperatures on shifted scales (SI Brochure §2.3.1; NIST SP 811 App. B.8)
  ...plain(["degC", "celsius"], 1, TEMPERATURE, 273.15),
  ...plain(["degF", "fahrenheit"], 1 / 1.8, TEMPERATURE, 459.67),
  // inch-based lengths (NIST SP 811 App. B.8)
  ...plain(["in", "inch", "inches"], INCH, LENGTH),
  ...plain(["mil", "mils", "thou"], 2.54e-5, LENGTH), // 0.001 in, exactly
  ...plain(["ft", "foot", "feet"], 0.3048, LENGTH), // 12 in, exactly
]);

/** A product of units, reduced: its SI factor, base dimensions and (temperatures only) scale offset. */
export interface ReducedUnit {
  readonly factor: number;
  readonly dims: BaseDims;
  /** set only for a single temperature unit on a shifted scale (degC, degF) */
  readonly offset?: number;
}

/** Why a unit text could not be read; `more than one number` when a digit stands where a unit should. */
export class UnitSyntaxError extends Error {
  constructor(readonly reason: "unknown" | "number") {
    super(reason);
  }
}

/** One unit word with an optional prefix: "kHz", "nanofarad", "mm". Undefined when unknown. */
export function lookUpUnit(word: string): UnitDef | undefined {
  const exact = UNITS.get(word);
  if (exact !== undefined) return exact;
  // longest prefix first ("da" before "d"); the rest must be a unit that takes that kind of prefix
  for (const [table, kind] of [[LONG_PREFIXES, "long"], [SHORT_PREFIXES, "short"]] as const) {
    for (const p of Object.keys(table)) {
      if (word.length > p.length && word.startsWith(p)) {
        const base = UNITS.get(word.slice(p.length));
        if (base !== undefined && (base.prefixes === kind || base.prefixes === "any")) {
          return { factor: base.factor * Number(`1e${table[p] ?? 0}`), dims: base.dims, prefixes: "none" };
        }
      }
    }
  }
  return undefined;
}

/** The largest power accepted on one unit factor ("m^2", "s^-1"); more is surely a typo. */
const MAX_POWER = 9;

/**
 * Reads a unit expression: unit words separated by blanks or "*" (a product), "/" (divides by
 * the next word only, as in "A/m"), each with an optional integer power "^2", "^-1" or a
 * trailing digit ("mm2"). Throws UnitSyntaxError when a word is unknown or a number stands
 * where a word should.
 * @example reduceUnit("uohm cm") // → { factor: 1e-8 (±1 ulp), dims: [3, 1, -3, -2, 0, 0] }
 */
export function reduceUnit(text: string): ReducedUnit {
  const token = /\s*([*/]?)\s*([A-Za-z]+)(?:\^\s*([+-]?\d+)|(\d))?/y;
  let factor = 1;
  const dims = [0, 0, 0, 0, 0, 0];
  let offset: number | undefined;
  let count = 0;
  let pos = 0;
  const end = text.trimEnd().length;
  while (pos < end) {
    token.lastIndex = pos;
    const m = token.exec(text);
    if (m === null) {
      const rest = text.slice(pos).trimStart();
      throw new UnitSyntaxError(/^[*/]?\s*[\d.]/.test(rest) ? "number" : "unknown");
    }
    pos = token.lastIndex;
    const def = lookUpUnit(m[2] ?? "");
    if (def === undefined) throw new UnitSyntaxError("unknown");
    let power = Number(m[3] ?? m[4] ?? "1");
    if (!(Math.abs(power) <= MAX_POWER) || power === 0) throw new UnitSyntaxError("unknown");
    if (m[1] === "/") power = -power;
    factor *= def.factor ** power;
    for (let i = 0; i < 6; i++) dims[i]! += def.dims[i]! * power;
    offset = def.offset;
    count++;
  }
  if (count === 0) throw new UnitSyntaxError("unknown");
  // an offset scale means something only for one temperature unit on its own ("25 degC")
  const single = count === 1 && offset !== undefined;
  return { factor, dims: dims as unknown as BaseDims, ...(single ? { offset } : {}) };
}

/** Do two unit dimensions agree? */
export function sameDims(a: BaseDims, b: BaseDims): boolean {
  for (let i = 0; i < 6; i++) if (a[i] !== b[i]) return false;
  return true;
}

var __create = Object.create;
var __defProp = Object.defineProperty;
var __getOwnPropDesc = Object.getOwnPropertyDescriptor;
var __getOwnPropNames = Object.getOwnPropertyNames;
var __getProtoOf = Object.getPrototypeOf;
var __hasOwnProp = Object.prototype.hasOwnProperty;
var __commonJS = (cb, mod) => function __require() {
  try {
    return mod || (0, cb[__getOwnPropNames(cb)[0]])((mod = { exports: {} }).exports, mod), mod.exports;
  } catch (e) {
    throw mod = 0, e;
  }
};
var __export = (target, all) => {
  for (var name in all)
    __defProp(target, name, { get: all[name], enumerable: true });
};
var __copyProps = (to, from, except, desc) => {
  if (from && typeof from === "object" || typeof from === "function") {
    for (let key of __getOwnPropNames(from))
      if (!__hasOwnProp.call(to, key) && key !== except)
        __defProp(to, key, { get: () => from[key], enumerable: !(desc = __getOwnPropDesc(from, key)) || desc.enumerable });
  }
  return to;
};
var __toESM = (mod, isNodeMode, target) => (target = mod != null ? __create(__getProtoOf(mod)) : {}, __copyProps(
  // If the importer is in node compatibility mode or this is not an ESM
  // file that has been converted to a CommonJS file using a Babel-
  // compatible transform (i.e. "__esModule" has not been set), then set
  // "default" to the CommonJS "module.exports" for node compatibility.
  isNodeMode || !mod || !mod.__esModule ? __defProp(target, "default", { value: mod, enumerable: true }) : target,
  mod
));

// lib/errors.ts
var TanklightInputError = class extends Error {
  issues;
  constructor(issues, where) {
    const text = issues.map((i) => formatIssue(i)).join("; ");
    super(where ? `${where}: ${text}` : text);
    this.name = "TanklightInputError";
    this.issues = issues;
  }
};
function formatIssue(issue) {
  const detail = issue.detail ? ` (${issue.detail})` : "";
  return `${issue.path ? issue.path + ": " : ""}${issue.message}, got ${describeValue(issue.value)}${detail}`;
}
function describeValue(value) {
  if (typeof value === "string") return `'${value}'`;
  if (typeof value === "number") return Number.isNaN(value) ? "NaN" : String(value);
  if (value === void 0) return "nothing";
  if (value === null) return "null";
  try {
    const s = JSON.stringify(value);
    return s.length > 80 ? s.slice(0, 77) + "..." : s;
  } catch {
    return String(value);
  }
}
function requirePositive(x, field, unit2, where) {
  if (!(typeof x === "number" && Number.isFinite(x) && x > 0)) {
    throw new TanklightInputError(
      [{ path: field, message: `must be a finite number > 0 ${unit2}`, value: x, expected: `> 0 ${unit2}` }],
      where
    );
  }
  return x;
}
function requireFinite(x, field, unit2, where) {
  if (!(typeof x === "number" && Number.isFinite(x))) {
    throw new TanklightInputError(
      [{ path: field, message: `must be a finite number in ${unit2}`, value: x, expected: `finite ${unit2}` }],
      where
    );
  }
  return x;
}

// lib/constants.ts
var VACUUM_PERMEABILITY = {
  value: 125663706212e-17,
  unit: "H/m",
  source: "CODATA 2018 recommended value"
};
var VACUUM_PERMITTIVITY = {
  value: 88541878128e-22,
  unit: "F/m",
  source: "CODATA 2018 recommended value"
};
var SPEED_OF_LIGHT = { value: 299792458, unit: "m/s", source: "SI definition (exact)" };
var ELEMENTARY_CHARGE = { value: 1602176634e-28, unit: "C", source: "SI definition (exact)" };
var BOLTZMANN = { value: 1380649e-29, unit: "J/K", source: "SI definition (exact)" };
var PLANCK = { value: 662607015e-42, unit: "J\xB7s", source: "SI definition (exact)" };
var ZERO_CELSIUS = { value: 273.15, unit: "K", source: "SI definition (exact)" };
var MU0 = VACUUM_PERMEABILITY.value;
var EPS0 = VACUUM_PERMITTIVITY.value;
function thermalVoltage(kelvin2) {
  return BOLTZMANN.value * kelvin2 / ELEMENTARY_CHARGE.value;
}

// lib/unitAlgebra.ts
var SHORT_PREFIXES = {
  q: -30,
  r: -27,
  y: -24,
  z: -21,
  a: -18,
  f: -15,
  p: -12,
  n: -9,
  u: -6,
  m: -3,
  c: -2,
  d: -1,
  da: 1,
  h: 2,
  k: 3,
  M: 6,
  G: 9,
  T: 12,
  P: 15,
  E: 18,
  Z: 21,
  Y: 24,
  R: 27,
  Q: 30
};
var LONG_PREFIXES = {
  quecto: -30,
  ronto: -27,
  yocto: -24,
  zepto: -21,
  atto: -18,
  femto: -15,
  pico: -12,
  nano: -9,
  micro: -6,
  milli: -3,
  centi: -2,
  deci: -1,
  deca: 1,
  deka: 1,
  hecto: 2,
  kilo: 3,
  mega: 6,
  giga: 9,
  tera: 12,
  peta: 15,
  exa: 18,
  zetta: 21,
  yotta: 24,
  ronna: 27,
  quetta: 30
};
var D = (m, kg, s, A, K, rad) => [m, kg, s, A, K, rad];
var LENGTH = D(1, 0, 0, 0, 0, 0);
var MASS = D(0, 1, 0, 0, 0, 0);
var TIME = D(0, 0, 1, 0, 0, 0);
var CURRENT = D(0, 0, 0, 1, 0, 0);
var TEMPERATURE = D(0, 0, 0, 0, 1, 0);
var ANGLE = D(0, 0, 0, 0, 0, 1);
var FREQUENCY = D(0, 0, -1, 0, 0, 0);
var FORCE = D(1, 1, -2, 0, 0, 0);
var ENERGY = D(2, 1, -2, 0, 0, 0);
var POWER = D(2, 1, -3, 0, 0, 0);
var CHARGE = D(0, 0, 1, 1, 0, 0);
var VOLTAGE = D(2, 1, -3, -1, 0, 0);
var RESISTANCE = D(2, 1, -3, -2, 0, 0);
var CONDUCTANCE = D(-2, -1, 3, 2, 0, 0);
var CAPACITANCE = D(-2, -1, 4, 2, 0, 0);
var INDUCTANCE = D(2, 1, -2, -2, 0, 0);
var FLUX = D(2, 1, -2, -1, 0, 0);
var FLUX_DENSITY = D(0, 1, -2, -1, 0, 0);
var FIELD_STRENGTH = D(-1, 0, 0, 1, 0, 0);
var PRESSURE = D(-1, 1, -2, 0, 0, 0);
function both(symbols, names, factor, dims) {
  return [
    ...symbols.map((s) => [s, { factor, dims, prefixes: "short" }]),
    ...names.map((n) => [n, { factor, dims, prefixes: "long" }])
  ];
}
function plain(names, factor, dims, offset) {
  return names.map((n) => [n, { factor, dims, prefixes: "none", ...offset === void 0 ? {} : { offset } }]);
}
var INCH = 0.0254;
var UNITS = new Map([
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
  ["ohm", { factor: 1, dims: RESISTANCE, prefixes: "any" }],
  // "kohm" and "kiloohm"
  ...both([], ["ohms"], 1, RESISTANCE),
  ...both(["S"], ["siemens"], 1, CONDUCTANCE),
  ...both(["F"], ["farad", "farads"], 1, CAPACITANCE),
  ...both(["H"], ["henry", "henrys", "henries"], 1, INDUCTANCE),
  ...both(["Wb"], ["weber", "webers"], 1, FLUX),
  ...both(["T"], ["tesla", "teslas"], 1, FLUX_DENSITY),
  // the gauss (CGS): 1 G = 1e-4 T; prefixes allowed ("mgauss"); the oersted: 1 Oe = 10³/(4π) A/m
  ...both(["gauss"], [], 1e-4, FLUX_DENSITY),
  ...plain(["oersted", "Oe"], 1e3 / (4 * Math.PI), FIELD_STRENGTH),
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
  ...plain(["mil", "mils", "thou"], INCH / 1e3, LENGTH),
  ...plain(["ft", "foot", "feet"], 0.3048, LENGTH)
  // 12 in, exactly
]);
var UnitSyntaxError = class extends Error {
  constructor(reason) {
    super(reason);
    this.reason = reason;
  }
  reason;
};
function lookUpUnit(word) {
  const exact = UNITS.get(word);
  if (exact !== void 0) return exact;
  for (const [table, kind] of [[LONG_PREFIXES, "long"], [SHORT_PREFIXES, "short"]]) {
    for (const p of Object.keys(table)) {
      if (word.length > p.length && word.startsWith(p)) {
        const base = UNITS.get(word.slice(p.length));
        if (base !== void 0 && (base.prefixes === kind || base.prefixes === "any")) {
          return { factor: base.factor * Number(`1e${table[p] ?? 0}`), dims: base.dims, prefixes: "none" };
        }
      }
    }
  }
  return void 0;
}
var MAX_POWER = 9;
function reduceUnit(text) {
  const token = /\s*([*/]?)\s*([A-Za-z]+)(?:\^\s*([+-]?\d+)|(\d))?/y;
  let factor = 1;
  const dims = [0, 0, 0, 0, 0, 0];
  let offset;
  let count2 = 0;
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
    if (def === void 0) throw new UnitSyntaxError("unknown");
    let power2 = Number(m[3] ?? m[4] ?? "1");
    if (!(Math.abs(power2) <= MAX_POWER) || power2 === 0) throw new UnitSyntaxError("unknown");
    if (m[1] === "/") power2 = -power2;
    factor *= def.factor ** power2;
    for (let i = 0; i < 6; i++) dims[i] += def.dims[i] * power2;
    offset = def.offset;
    count2++;
  }
  if (count2 === 0) throw new UnitSyntaxError("unknown");
  const single = count2 === 1 && offset !== void 0;
  return { factor, dims, ...single ? { offset } : {} };
}
function sameDims(a, b) {
  for (let i = 0; i < 6; i++) if (a[i] !== b[i]) return false;
  return true;
}

// lib/units.ts
var DIMENSIONS = {
  length: { unit: "m", mathUnit: "m", noun: "a length", example: "12 mm" },
  area: { unit: "m\xB2", mathUnit: "m^2", noun: "an area", example: "1.5 mm^2" },
  frequency: { unit: "Hz", mathUnit: "Hz", noun: "a frequency", example: "217 kHz" },
  inductance: { unit: "H", mathUnit: "H", noun: "an inductance", example: "24 uH" },
  capacitance: { unit: "F", mathUnit: "F", noun: "a capacitance", example: "4.7 nF" },
  resistance: { unit: "\u03A9", mathUnit: "ohm", noun: "a resistance", example: "0.5 ohm" },
  conductance: { unit: "S", mathUnit: "S", noun: "a conductance", example: "20 mS" },
  voltage: { unit: "V", mathUnit: "V", noun: "a voltage", example: "3.3 V" },
  current: { unit: "A", mathUnit: "A", noun: "a current", example: "150 mA" },
  power: { unit: "W", mathUnit: "W", noun: "a power", example: "2 W" },
  energy: { unit: "J", mathUnit: "J", noun: "an energy", example: "5 mJ" },
  charge: { unit: "C", mathUnit: "C", noun: "a charge", example: "10 nC" },
  angle: { unit: "rad", mathUnit: "rad", noun: "an angle", example: "30 deg" },
  temperature: { unit: "K", mathUnit: "K", noun: "a temperature", example: "25 degC" },
  resistivity: { unit: "\u03A9\xB7m", mathUnit: "ohm m", noun: "a resistivity", example: "1.72e-8 ohm m" },
  fluxDensity: { unit: "T", mathUnit: "T", noun: "a flux density", example: "27 uT" },
  fieldStrength: { unit: "A/m", mathUnit: "A/m", noun: "a field strength", example: "21 A/m" },
  time: { unit: "s", mathUnit: "s", noun: "a time", example: "10 us" },
  dimensionless: { unit: "", mathUnit: "", noun: "a plain number", example: "0.5" }
};
var DIMENSION_NAMES = Object.keys(DIMENSIONS);
var BASE_DIMS = {
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
  dimensionless: [0, 0, 0, 0, 0, 0]
};
function dimensionOf(u) {
  for (const d of DIMENSION_NAMES) {
    if (sameDims(u.dims, BASE_DIMS[d])) return d;
  }
  return void 0;
}
var NUMBER_PREFIX = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+))(?:[eE]([+-]?\d+))?/;
var COMMON_UNITS = [
  "m",
  "mm",
  "cm",
  "um",
  "nm",
  "km",
  "mil",
  "inch",
  "Hz",
  "kHz",
  "MHz",
  "GHz",
  "H",
  "mH",
  "uH",
  "nH",
  "F",
  "mF",
  "uF",
  "nF",
  "pF",
  "ohm",
  "mohm",
  "kohm",
  "Mohm",
  "S",
  "mS",
  "uS",
  "V",
  "mV",
  "kV",
  "A",
  "mA",
  "uA",
  "W",
  "mW",
  "kW",
  "J",
  "mJ",
  "C",
  "nC",
  "T",
  "mT",
  "uT",
  "nT",
  "gauss",
  "A/m",
  "s",
  "ms",
  "us",
  "ns",
  "deg",
  "rad",
  "degC",
  "degF",
  "K"
];
function caseHint(text) {
  const lower = text.toLowerCase();
  const hits = COMMON_UNITS.filter((u) => u.toLowerCase() === lower && u !== text);
  if (hits.length === 0) return void 0;
  return `units are case-sensitive: ${hits.map((u) => `'${u}'`).join(" or ")}?`;
}
function separatedPrefixHint(mantissa, exponent, unitText) {
  const m = /^(da|[qryzafpnumkhMGTPEZYRQ]) (\S+)$/.exec(unitText);
  if (m === null) return void 0;
  const joined = `${m[1]}${m[2]}`;
  try {
    reduceUnit(joined);
  } catch {
    return void 0;
  }
  return `write the prefix with its unit: '${mantissa}${exponent === void 0 ? "" : "e" + exponent} ${joined}'?`;
}
var PLAIN_FACTORS = { "%": 0.01, ppm: 1e-6 };
function normalizeUnitText(text) {
  return text.replace(/\u2212/g, "-").replace(/[\u00B5\u03BC]/g, "u").replace(/[\u03A9\u2126]/g, "ohm").replace(/\u00B0\s*C/g, "degC").replace(/\u00B0\s*F/g, "degF").replace(/\u00B0/g, "deg").replace(/\u00B2/g, "^2").replace(/\u00B3/g, "^3").replace(/[\u00B7\u22C5]/g, " ").replace(/\s+/g, " ");
}
function localNotationHint(text, dimension) {
  const comma = /^([+-]?\d+),(\d+)(.*)$/.exec(text);
  if (comma !== null) {
    const rest = (comma[3] ?? "").trim();
    const unit2 = rest === "" ? DIMENSIONS[dimension].mathUnit : rest;
    const u = unit2 === "" ? "" : " " + unit2;
    const grouped = (comma[2] ?? "").length === 3 ? ` (decimal comma) or '${comma[1]}${comma[2]}${u}' (digit grouping)` : "";
    return `a comma in the number; write a decimal point and no separators: '${comma[1]}.${comma[2]}${u}'${grouped}`;
  }
  const marking = /^([+-]?\d+)([pnumkMGRr])(\d+)\s*(.*)$/.exec(text);
  if (marking !== null) {
    const letter = marking[2] ?? "";
    const prefix = letter === "R" || letter === "r" ? "" : letter;
    const rest = (marking[4] ?? "").trim();
    const unit2 = rest === "" ? DIMENSIONS[dimension].mathUnit : rest;
    if (unit2 === "") return void 0;
    return `a part marking with the prefix as decimal point; write '${marking[1]}.${marking[3]} ${prefix}${unit2}'`;
  }
  return void 0;
}
function quantityError(field, value, dimension, message, detail) {
  const info = DIMENSIONS[dimension];
  return new TanklightInputError([
    {
      path: field ?? "",
      message,
      value,
      expected: info.unit === "" ? info.noun : `${info.noun} in ${info.unit} or a string like '${info.example}'`,
      ...detail === void 0 ? {} : { detail }
    }
  ]);
}
function expectation(dimension) {
  const info = DIMENSIONS[dimension];
  return `expected ${info.noun} like '${info.example}'`;
}
function parseQuantity(value, dimension, field) {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) {
      throw quantityError(field, value, dimension, `${expectation(dimension)} (a finite number)`);
    }
    if (dimension === "temperature" && value < 0) {
      throw quantityError(field, value, dimension, "must be \u2265 0 K (absolute temperature)");
    }
    return value;
  }
  if (typeof value !== "string") {
    throw quantityError(field, value, dimension, expectation(dimension));
  }
  const text = normalizeUnitText(value.trim());
  const notation = localNotationHint(text, dimension);
  if (notation !== void 0) {
    throw quantityError(field, value, dimension, expectation(dimension), notation);
  }
  const match = NUMBER_PREFIX.exec(text);
  if (match === null) {
    throw quantityError(field, value, dimension, expectation(dimension), "no leading number");
  }
  const mantissa = match[1] ?? "";
  const exponent = Number(match[2] ?? "0");
  const unitText = text.slice(match[0].length).trim().replace(/^1\s*\/\s*([A-Za-z]+)$/, "$1^-1");
  const plain2 = Number(`${mantissa}e${exponent}`);
  let result;
  if (unitText === "") {
    if (dimension !== "dimensionless") {
      throw quantityError(
        field,
        value,
        dimension,
        expectation(dimension),
        `no unit; write e.g. '${mantissa}${match[2] === void 0 ? "" : "e" + match[2]} ${DIMENSIONS[dimension].mathUnit}' or pass the number for SI`
      );
    }
    result = plain2;
  } else if (Object.hasOwn(PLAIN_FACTORS, unitText)) {
    if (dimension !== "dimensionless") {
      throw quantityError(field, value, dimension, expectation(dimension), "a plain number");
    }
    result = scaleDecimal(mantissa, exponent, PLAIN_FACTORS[unitText] ?? 1);
  } else {
    let u;
    try {
      u = reduceUnit(unitText);
    } catch (e) {
      if (e instanceof UnitSyntaxError && e.reason === "number") {
        throw quantityError(field, value, dimension, expectation(dimension), "more than one number");
      }
      const hint = caseHint(unitText) ?? separatedPrefixHint(mantissa, match[2], unitText);
      throw quantityError(field, value, dimension, expectation(dimension), `unknown unit '${unitText}'${hint === void 0 ? "" : "; " + hint}`);
    }
    const found = dimensionOf(u);
    if (found !== dimension) {
      const what = found === void 0 ? `unit '${unitText}' is not ${DIMENSIONS[dimension].noun}` : found === "dimensionless" ? "a plain number" : DIMENSIONS[found].noun;
      throw quantityError(field, value, dimension, expectation(dimension), what);
    }
    result = u.offset === void 0 ? scaleDecimal(mantissa, exponent, u.factor) : (plain2 + u.offset) * u.factor;
  }
  if (!Number.isFinite(result)) {
    throw quantityError(field, value, dimension, `${expectation(dimension)} (a finite number)`, "overflows");
  }
  if (result === 0 && Number(mantissa) !== 0) {
    throw quantityError(field, value, dimension, `${expectation(dimension)} (a representable number)`, "underflows to 0");
  }
  if (dimension === "temperature" && result < 0) {
    throw quantityError(field, value, dimension, "must be \u2265 0 K (absolute temperature)", `${Number(result.toPrecision(12))} K`);
  }
  return result;
}
function scaleDecimal(mantissa, exponent, factor) {
  const p = Math.round(Math.log10(factor));
  if (Number.isFinite(p) && Math.abs(factor / 10 ** p - 1) < 1e-12) {
    return Number(`${mantissa}e${exponent + p}`);
  }
  return Number(`${mantissa}e${exponent}`) * factor;
}
function isQuantity(value, dimension) {
  if (typeof value !== "number" && typeof value !== "string") return false;
  try {
    parseQuantity(value, dimension);
    return true;
  } catch {
    return false;
  }
}
var PREFIXES = ["q", "r", "y", "z", "a", "f", "p", "n", "\xB5", "m", "", "k", "M", "G", "T", "P", "E", "Z", "Y", "R", "Q"];
var PREFIX_OFFSET = 10;
var UNPREFIXED = /* @__PURE__ */ new Set(["", "%", "ppm", "\xB0C", "\xB0", "deg", "degC", "dB", "dBm", "dB\xB5A/m", "dB\xB5V/m", "dBuA/m", "dBuV/m", "rad", "sr", "K", "\xB0F"]);
function formatQuantity(x, unit2, digits = 3) {
  if (!(Number.isInteger(digits) && digits >= 1 && digits <= 17)) {
    throw new TanklightInputError(
      [{ path: "digits", message: "must be an integer from 1 to 17", value: digits, expected: "1\u201317" }],
      "formatQuantity"
    );
  }
  if (Number.isNaN(x)) {
    throw new TanklightInputError(
      [{ path: "x", message: `must be a number in ${unit2 || "SI units"}`, value: x, expected: "not NaN" }],
      "formatQuantity"
    );
  }
  const space = unit2 === "" ? "" : " ";
  if (x === Infinity) return `\u221E${space}${unit2}`;
  if (x === -Infinity) return `-\u221E${space}${unit2}`;
  if (x === 0) return `0${space}${unit2}`;
  const { sign, figures, exponent } = decimalDigits(x, digits);
  if (UNPREFIXED.has(unit2)) {
    const body = exponent >= -3 && exponent < 6 ? sign + placePoint(figures, exponent) : exponentForm(x, digits);
    return `${body}${space}${unit2}`;
  }
  const power2 = leadingPower(unit2);
  const step = Math.floor(exponent / (3 * power2));
  const index = step + PREFIX_OFFSET;
  if (index < 0 || index >= PREFIXES.length) {
    return `${exponentForm(x, digits)}${space}${unit2}`;
  }
  const mantissa = sign + placePoint(figures, exponent - 3 * power2 * step);
  return `${mantissa} ${PREFIXES[index]}${unit2}`;
}
function decimalDigits(x, digits) {
  const [mant = "0", exp = "0"] = Math.abs(x).toExponential(digits - 1).split("e");
  return { sign: x < 0 ? "-" : "", figures: mant.replace(".", ""), exponent: Number(exp) };
}
function placePoint(figures, e) {
  if (e < 0) return `0.${"0".repeat(-e - 1)}${figures}`;
  const whole = figures.slice(0, e + 1).padEnd(e + 1, "0");
  const fraction = figures.slice(e + 1);
  return fraction === "" ? whole : `${whole}.${fraction}`;
}
function leadingPower(unit2) {
  const first = /^[^\s·*/^²³]+(\^(\d)|²|³)?/.exec(unit2);
  if (first === null || first[1] === void 0) return 1;
  if (first[1] === "\xB2") return 2;
  if (first[1] === "\xB3") return 3;
  return Number(first[2] ?? "1") || 1;
}
function exponentForm(x, digits) {
  return x.toExponential(digits - 1);
}
function siUnit(dimension) {
  return DIMENSIONS[dimension].unit;
}

// lib/schema.ts
var schema_exports = {};
__export(schema_exports, {
  angle: () => angle,
  area: () => area,
  capacitance: () => capacitance,
  charge: () => charge,
  conductance: () => conductance,
  current: () => current,
  dimensionless: () => dimensionless,
  energy: () => energy,
  fieldStrength: () => fieldStrength,
  fluxDensity: () => fluxDensity,
  frequency: () => frequency,
  inductance: () => inductance,
  length: () => length,
  parseInput: () => parseInput,
  power: () => power,
  quantity: () => quantity,
  quantityMeta: () => quantityMeta,
  resistance: () => resistance,
  resistivity: () => resistivity,
  temperature: () => temperature,
  time: () => time,
  unitVector: () => unitVector,
  vec3: () => vec3,
  voltage: () => voltage
});
import { z } from "zod";
function ruleText(dimension, opts) {
  const unit2 = DIMENSIONS[dimension].unit;
  const show = (x) => formatQuantity(x, unit2, 4);
  const parts = [];
  const min = opts.min;
  if (opts.positive && !(min !== void 0 && min > 0)) parts.push(`> ${show(0)}`);
  else if (!opts.positive && opts.nonNegative && !(min !== void 0 && min >= 0)) parts.push(`\u2265 ${show(0)}`);
  if (opts.min !== void 0) parts.push(`\u2265 ${show(opts.min)}`);
  if (opts.max !== void 0) parts.push(`\u2264 ${show(opts.max)}`);
  return parts.join(" and ");
}
function quantity(dimension, opts = {}) {
  const info = DIMENSIONS[dimension];
  checkOptions(opts);
  const example = opts.example ?? info.example;
  const rule = ruleText(dimension, opts);
  const unit2 = info.unit;
  const show = (x) => formatQuantity(x, unit2);
  const schema = z.custom(() => true).transform((value, ctx) => {
    let x;
    try {
      x = parseQuantity(value, dimension);
    } catch (e) {
      if (!(e instanceof TanklightInputError)) throw e;
      const first = e.issues[0];
      let message = first?.message ?? `expected ${info.noun}`;
      if (opts.example !== void 0) message = message.replace(`'${info.example}'`, `'${example}'`);
      ctx.issues.push({
        code: "custom",
        message,
        input: value,
        params: { detail: first?.detail, expected: rule ? `${info.noun} ${rule}` : info.noun }
      });
      return z.NEVER;
    }
    const broken = opts.positive && !(x > 0) || opts.nonNegative && !(x >= 0) || opts.min !== void 0 && !(x >= opts.min) || opts.max !== void 0 && !(x <= opts.max);
    if (broken) {
      ctx.issues.push({
        code: "custom",
        message: `must be ${rule}`,
        input: value,
        params: {
          detail: typeof value === "string" ? `= ${show(x)}` : void 0,
          expected: `${info.noun} ${rule}`
        }
      });
      return z.NEVER;
    }
    return x;
  });
  const meta = { unit: unit2, dimension, example, rule };
  return schema.meta({ ...meta });
}
function checkOptions(opts) {
  const issues = [];
  for (const key of ["min", "max"]) {
    const v = opts[key];
    if (v !== void 0 && !(typeof v === "number" && Number.isFinite(v))) {
      issues.push({ path: key, message: "must be a finite number in SI units", value: v });
    }
  }
  if (issues.length === 0 && opts.min !== void 0 && opts.max !== void 0 && opts.min > opts.max) {
    issues.push({ path: "min", message: `must be \u2264 max (${opts.max})`, value: opts.min });
  }
  if (issues.length > 0) throw new TanklightInputError(issues, "quantity");
}
function quantityMeta(schema) {
  const m = schema.meta();
  if (m === void 0 || typeof m.dimension !== "string" || typeof m.unit !== "string") return void 0;
  return m;
}
function withDefaultSign(sign, opts) {
  if (opts.positive !== void 0 || opts.nonNegative !== void 0 || sign === "any") return opts;
  return sign === "positive" ? { ...opts, positive: true } : { ...opts, nonNegative: true };
}
var length = (opts = {}) => quantity("length", withDefaultSign("positive", opts));
var area = (opts = {}) => quantity("area", withDefaultSign("positive", opts));
var frequency = (opts = {}) => quantity("frequency", withDefaultSign("positive", opts));
var inductance = (opts = {}) => quantity("inductance", withDefaultSign("positive", opts));
var capacitance = (opts = {}) => quantity("capacitance", withDefaultSign("positive", opts));
var resistance = (opts = {}) => quantity("resistance", withDefaultSign("nonNegative", opts));
var conductance = (opts = {}) => quantity("conductance", withDefaultSign("nonNegative", opts));
var voltage = (opts = {}) => quantity("voltage", withDefaultSign("any", opts));
var current = (opts = {}) => quantity("current", withDefaultSign("any", opts));
var power = (opts = {}) => quantity("power", withDefaultSign("nonNegative", opts));
var energy = (opts = {}) => quantity("energy", withDefaultSign("nonNegative", opts));
var charge = (opts = {}) => quantity("charge", withDefaultSign("any", opts));
var angle = (opts = {}) => quantity("angle", withDefaultSign("any", opts));
var temperature = (opts = {}) => quantity("temperature", withDefaultSign("any", opts));
var resistivity = (opts = {}) => quantity("resistivity", withDefaultSign("positive", opts));
var fluxDensity = (opts = {}) => quantity("fluxDensity", withDefaultSign("any", opts));
var fieldStrength = (opts = {}) => quantity("fieldStrength", withDefaultSign("any", opts));
var time = (opts = {}) => quantity("time", withDefaultSign("positive", opts));
var dimensionless = (opts = {}) => quantity("dimensionless", withDefaultSign("any", opts));
function vec3(opts = {}) {
  const c = quantity("length", opts);
  return z.tuple([c, c, c]).readonly();
}
function unitVector() {
  const finite = z.number().refine(Number.isFinite, { error: "expected a finite number" });
  return z.tuple([finite, finite, finite]).transform((v, ctx) => {
    const n = Math.hypot(v[0], v[1], v[2]);
    if (!(n > 0) || !Number.isFinite(n)) {
      ctx.issues.push({ code: "custom", message: "expected a direction (not all zero)", input: v });
      return z.NEVER;
    }
    return [v[0] / n, v[1] / n, v[2] / n];
  }).readonly();
}
function dottedPath(path) {
  let out = "";
  for (const key of path) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out === "" ? String(key) : `.${String(key)}`;
  }
  return out;
}
function valueAt(input, path) {
  let v = input;
  for (const key of path) {
    if (v === null || typeof v !== "object") return void 0;
    v = v[key];
  }
  return v;
}
function branchMismatch(issues) {
  return issues.some(
    (i) => i.path.length === 0 && i.code !== "unrecognized_keys" || i.path.length === 1 && i.code === "invalid_value" || i.path.length === 1 && i.code === "invalid_union" && i.errors.length === 0
  );
}
function branchWanted(issues) {
  const literal = issues.find((i) => i.path.length === 1 && i.code === "invalid_value");
  if (literal !== void 0 && literal.code === "invalid_value") {
    return `${String(literal.path[0])} ${literal.values.map((v) => JSON.stringify(v)).join(" or ")}`;
  }
  const top = issues.find((i) => i.path.length === 0);
  return top === void 0 ? "another form" : cleanMessage(top);
}
function cleanMessage(issue) {
  if (issue.code === "custom") return issue.message;
  return issue.message.replace(/^(Invalid input|Invalid option|Too small|Too big): /, "").replace(/, received \w+$/, "");
}
function toInputIssues(issue, input, prefix = []) {
  const full = [...prefix, ...issue.path];
  if (issue.code === "unrecognized_keys") {
    return issue.keys.map((key) => ({
      path: dottedPath([...full, key]),
      message: "unknown field",
      value: valueAt(input, [...full, key])
    }));
  }
  if (issue.code === "invalid_union") {
    const options = issue.options;
    if (issue.errors.length === 0 && options !== void 0) {
      return [{ path: dottedPath(full), message: `expected one of ${options.map((o) => JSON.stringify(o)).join(", ")}`, value: valueAt(input, full) }];
    }
    const matching = issue.errors.filter((branch) => !branchMismatch(branch));
    const best = matching.length === 1 ? matching[0] : void 0;
    if (best !== void 0) return best.flatMap((i) => toInputIssues(i, input, full));
    const wanted = [...new Set(issue.errors.map(branchWanted))];
    return [
      {
        path: dottedPath(full),
        message: `matches none of the accepted forms (${wanted.join("; ")})`,
        value: valueAt(input, full)
      }
    ];
  }
  const value = "input" in issue && issue.input !== void 0 ? issue.input : valueAt(input, full);
  const params = issue.params;
  return [
    {
      path: dottedPath(full),
      message: cleanMessage(issue),
      value,
      ...params?.expected === void 0 ? {} : { expected: params.expected },
      ...params?.detail === void 0 ? {} : { detail: params.detail }
    }
  ];
}
function parseInput(schema, input, where) {
  let result;
  try {
    result = schema.safeParse(input, { reportInput: true });
  } catch (e) {
    if (e instanceof TanklightInputError) throw new TanklightInputError(e.issues, where);
    throw e;
  }
  if (result.success) return result.data;
  const issues = result.error.issues.flatMap((i) => toInputIssues(i, input));
  throw new TanklightInputError(issues, where);
}

// lib/em/builders/common.ts
import { z as z2 } from "zod";
var IssueList = class {
  constructor(where) {
    this.where = where;
  }
  where;
  issues = [];
  /** Record one problem with one field. */
  add(path, message, value, expected) {
    this.issues.push(expected === void 0 ? { path, message, value } : { path, message, value, expected });
  }
  /** Throw a TanklightInputError listing every recorded problem (no-op when there is none). */
  throwIfAny() {
    if (this.issues.length > 0) throw new TanklightInputError(this.issues, this.where);
  }
};
function isPositiveInteger(x) {
  return Number.isInteger(x) && x >= 1;
}
function metres(x) {
  return `${Number(x.toPrecision(6))} m`;
}
function circleTurn(radius, z3) {
  return { kind: "circle", center: [0, 0, z3], axis: [0, 0, 1], radius, turns: 1 };
}
function roundedRectangle(halfWidth, halfHeight, r, z3, cornerSegments) {
  const points = [];
  const corners = [
    [halfWidth - r, -halfHeight + r, -Math.PI / 2],
    [halfWidth - r, halfHeight - r, 0],
    [-halfWidth + r, halfHeight - r, Math.PI / 2],
    [-halfWidth + r, -halfHeight + r, Math.PI]
  ];
  for (const [cx, cy, start] of corners) {
    if (r === 0) {
      points.push([cx, cy, z3]);
      continue;
    }
    for (let k = 0; k <= cornerSegments; k++) {
      const phi = start + k / cornerSegments * (Math.PI / 2);
      points.push([cx + r * Math.cos(phi), cy + r * Math.sin(phi), z3]);
    }
  }
  return points;
}
function roundedRectanglePerimeter(halfWidth, halfHeight, r) {
  return 4 * (halfWidth + halfHeight) - (8 - 2 * Math.PI) * r;
}
function archimedeanArcLength(r0, r1, pitch) {
  const b = pitch / (2 * Math.PI);
  const f = (r) => {
    const h = Math.hypot(r, b);
    return r * h + b * b * Math.log(r + h);
  };
  return (f(r1) - f(r0)) / (2 * b);
}
function count(min = 1) {
  const message = `must be a whole number \u2265 ${min}`;
  return z2.number({ error: message }).int({ error: message }).min(min, { error: message });
}

// lib/em/classicFormulas.ts
var INCH2 = 0.0254;
var MICROHENRY = 1e-6;
function check(where, path, x, rule = "positive") {
  const ok = typeof x === "number" && Number.isFinite(x) && (rule === "positive" ? x > 0 : x >= 0);
  if (!ok) {
    const expected = rule === "positive" ? "a finite number > 0" : "a finite number \u2265 0";
    throw new TanklightInputError([{ path, message: `must be ${expected}`, value: x, expected }], where);
  }
}
var AWG_NAMED = {
  "0000": -3,
  "4/0": -3,
  "000": -2,
  "3/0": -2,
  "00": -1,
  "2/0": -1,
  "0": 0,
  "1/0": 0
};
function awgDiameter(gauge) {
  let n;
  if (typeof gauge === "number") n = gauge;
  else if (typeof gauge === "string") {
    const s = gauge.trim().toUpperCase().replace(/^AWG\s*/, "").replace(/\s*AWG$/, "");
    n = Object.hasOwn(AWG_NAMED, s) ? AWG_NAMED[s] : /^-?\d+$/.test(s) ? Number(s) : void 0;
  }
  if (n === void 0 || !Number.isInteger(n) || n < -3 || n > 56) {
    throw new TanklightInputError(
      [{ path: "gauge", message: "must be an AWG number \u22123\u202656 or '4/0'\u2026'1/0'", value: gauge, expected: "integer \u22123\u202656" }],
      "awgDiameter"
    );
  }
  return 127e-6 * Math.pow(92, (36 - n) / 39);
}
function nagaokaCoefficient(radius, length2) {
  check("nagaokaCoefficient", "radius", radius);
  check("nagaokaCoefficient", "length", length2);
  const fourA2 = 4 * radius * radius;
  const l2 = length2 * length2;
  const k2 = fourA2 / (fourA2 + l2);
  const kp2 = l2 / (fourA2 + l2);
  const k = Math.sqrt(k2);
  const kp = Math.sqrt(kp2);
  const { K, KminusE } = ellipticKAndKMinusE(k2, kp2);
  const E = K - KminusE;
  const eMinusK = E - 1 + kp2 / (1 + k);
  return 4 / (3 * Math.PI * kp) * (kp2 / k2 * KminusE + eMinusK);
}
function ellipticKAndKMinusE(m, m1) {
  let a = 1;
  let b = Math.sqrt(m1);
  let c = Math.sqrt(m);
  let sum = 0.5 * m;
  let weight = 0.5;
  for (let i = 0; i < 40; i++) {
    const an = 0.5 * (a + b);
    const cn = c * c / (4 * an);
    b = Math.sqrt(a * b);
    a = an;
    c = cn;
    weight *= 2;
    sum += weight * c * c;
    if (c <= 1e-17 * a) break;
  }
  const K = Math.PI / (2 * a);
  return { K, KminusE: K * sum };
}
function lundinNagaokaCoefficient(radius, length2) {
  check("lundinNagaokaCoefficient", "radius", radius);
  check("lundinNagaokaCoefficient", "length", length2);
  const x = 2 * radius / length2;
  const f1 = (z4) => (1 + z4 * (0.383901 + 0.017108 * z4)) / (1 + 0.258952 * z4);
  const f2 = (z4) => z4 * (0.093842 + z4 * (2029e-6 - 801e-6 * z4));
  if (x <= 1) return f1(x * x) - 4 * x / (3 * Math.PI);
  const z3 = 1 / (x * x);
  return 2 / (Math.PI * x) * ((Math.log(4 * x) - 0.5) * f1(z3) + f2(z3));
}
function currentSheetInductance(radius, length2, turns) {
  check("currentSheetInductance", "turns", turns);
  return nagaokaCoefficient(radius, length2) * MU0 * Math.PI * radius * radius * turns * turns / length2;
}
function wheeler1982Inductance(radius, length2, turns) {
  check("wheeler1982Inductance", "radius", radius);
  check("wheeler1982Inductance", "length", length2);
  check("wheeler1982Inductance", "turns", turns);
  const d = 2 * radius;
  const u = length2 / d;
  const tail = 1 / (2.3004 + 3.437 * u + 1.7636 * u * u - 0.47 / Math.pow(0.755 + 1 / u, 1.44));
  return MU0 * d * turns * turns / 2 * (Math.log1p(Math.PI / (2 * u)) + tail);
}
function wheelerSingleLayerInductance(meanRadius, length2, turns) {
  check("wheelerSingleLayerInductance", "meanRadius", meanRadius);
  check("wheelerSingleLayerInductance", "length", length2);
  check("wheelerSingleLayerInductance", "turns", turns);
  const a = meanRadius / INCH2;
  const b = length2 / INCH2;
  return a * a * turns * turns / (9 * a + 10 * b) * MICROHENRY;
}
function wheelerMultilayerInductance(meanRadius, length2, depth, turns) {
  check("wheelerMultilayerInductance", "meanRadius", meanRadius);
  check("wheelerMultilayerInductance", "length", length2);
  check("wheelerMultilayerInductance", "depth", depth, "nonNegative");
  check("wheelerMultilayerInductance", "turns", turns);
  const a = meanRadius / INCH2;
  const b = length2 / INCH2;
  const c = depth / INCH2;
  return 0.8 * a * a * turns * turns / (6 * a + 9 * b + 10 * c) * MICROHENRY;
}
function wheelerFlatSpiralInductance(meanRadius, depth, turns) {
  check("wheelerFlatSpiralInductance", "meanRadius", meanRadius);
  check("wheelerFlatSpiralInductance", "depth", depth);
  check("wheelerFlatSpiralInductance", "turns", turns);
  const a = meanRadius / INCH2;
  const c = depth / INCH2;
  return a * a * turns * turns / (8 * a + 11 * c) * MICROHENRY;
}
var MOHAN_WHEELER = {
  square: [2.34, 2.75],
  hexagonal: [2.33, 3.82],
  octagonal: [2.25, 3.55]
};
var MOHAN_SHEET = {
  square: [1.27, 2.07, 0.18, 0.13],
  hexagonal: [1.09, 2.23, 0, 0.17],
  octagonal: [1.07, 2.29, 0, 0.19],
  circle: [1, 2.46, 0, 0.2]
};
function spiralMeans(where, turns, dOut, dIn) {
  check(where, "turns", turns);
  check(where, "outerDiameter", dOut);
  check(where, "innerDiameter", dIn, "nonNegative");
  if (!(dIn < dOut)) {
    throw new TanklightInputError(
      [{ path: "innerDiameter", message: "must be smaller than outerDiameter", value: dIn, expected: `< ${dOut} m` }],
      where
    );
  }
  return { dAvg: (dOut + dIn) / 2, rho: (dOut - dIn) / (dOut + dIn) };
}
function mohanModifiedWheelerInductance(turns, outerDiameter, innerDiameter, outline) {
  const { dAvg, rho } = spiralMeans("mohanModifiedWheelerInductance", turns, outerDiameter, innerDiameter);
  const coef = MOHAN_WHEELER[outline];
  if (coef === void 0) {
    throw new TanklightInputError(
      [{ path: "outline", message: "must be 'square', 'hexagonal' or 'octagonal'", value: outline }],
      "mohanModifiedWheelerInductance"
    );
  }
  return coef[0] * MU0 * turns * turns * dAvg / (1 + coef[1] * rho);
}
function mohanCurrentSheetInductance(turns, outerDiameter, innerDiameter, outline) {
  const { dAvg, rho } = spiralMeans("mohanCurrentSheetInductance", turns, outerDiameter, innerDiameter);
  const c = MOHAN_SHEET[outline];
  if (c === void 0) {
    throw new TanklightInputError(
      [{ path: "outline", message: "must be 'square', 'hexagonal', 'octagonal' or 'circle'", value: outline }],
      "mohanCurrentSheetInductance"
    );
  }
  return MU0 * turns * turns * dAvg * c[0] / 2 * (Math.log(c[1] / rho) + c[2] * rho + c[3] * rho * rho);
}
function groverRectangleInductance(width, height, wireRadius, opts = {}) {
  const where = "groverRectangleInductance";
  check(where, "width", width);
  check(where, "height", height);
  check(where, "wireRadius", wireRadius);
  const y = opts.internal ?? 0.25;
  check(where, "internal", y, "nonNegative");
  const a = width;
  const b = height;
  const g = Math.hypot(a, b);
  const bracket = a * Math.log(2 * a * b / (wireRadius * (a + g))) + b * Math.log(2 * a * b / (wireRadius * (b + g))) - 2 * (a + b) + 2 * g + y * (a + b);
  return MU0 / Math.PI * bracket;
}
function rosaB(turns) {
  if (!(Number.isInteger(turns) && turns >= 1)) {
    throw new TanklightInputError([{ path: "turns", message: "must be an integer \u2265 1", value: turns }], "rosaB");
  }
  let sum = 0;
  for (let k = 1; k < turns; k++) {
    const lnG = ((k + 1) ** 2 * Math.log(k + 1) + (k > 1 ? (k - 1) ** 2 * Math.log(k - 1) : 0) - 2 * k * k * Math.log(k)) / 2 - 1.5;
    sum += (turns - k) * (lnG - Math.log(k));
  }
  return sum === 0 ? 0 : -2 / turns * sum;
}
function rosaRoundWireCorrection(radius, turns, pitch, wireDiameter) {
  const where = "rosaRoundWireCorrection";
  check(where, "radius", radius);
  check(where, "pitch", pitch);
  check(where, "wireDiameter", wireDiameter);
  const A = 1.25 - Math.log(2 * pitch / wireDiameter);
  return MU0 * radius * turns * (A + rosaB(turns));
}

// lib/em/materials.ts
var COPPER = {
  name: "copper",
  resistivity20: 17241e-12,
  temperatureCoefficient20: 393e-5,
  relativePermeability: 1,
  source: "IEC 60028 (International Annealed Copper Standard): \u03C1\u2082\u2080 = 1/58 \u03A9\xB7mm\xB2/m, \u03B1\u2082\u2080 = 0.00393 /K"
};
var ALUMINIUM = {
  name: "aluminium",
  resistivity20: 28264e-12,
  temperatureCoefficient20: 403e-5,
  relativePermeability: 1,
  source: "IEC 60889 hard-drawn aluminium, 61 % IACS (from memory, unverified): \u03C1\u2082\u2080 = 0.028264 \u03A9\xB7mm\xB2/m, \u03B1\u2082\u2080 = 0.00403 /K"
};
var MATERIALS = {
  copper: COPPER,
  aluminium: ALUMINIUM,
  aluminum: ALUMINIUM
};
var REFERENCE_TEMPERATURE = 293.15;
function material(material2) {
  if (material2 === void 0) return COPPER;
  if (typeof material2 !== "string") return material2;
  const m = MATERIALS[material2.toLowerCase()];
  if (!m) {
    throw new TanklightInputError(
      [{ path: "material", message: `is not a known material (known: ${Object.keys(MATERIALS).join(", ")})`, value: material2 }],
      "material"
    );
  }
  return m;
}
function resistivityAt(m, temperature2 = REFERENCE_TEMPERATURE) {
  if (!(typeof temperature2 === "number" && Number.isFinite(temperature2) && temperature2 >= 150 && temperature2 <= 700)) {
    throw new TanklightInputError(
      [{
        path: "temperature",
        message: "must be a conductor temperature in kelvin between 150 K and 700 K (20 \xB0C = 293.15 K)",
        value: temperature2,
        expected: "150 K \u2264 T \u2264 700 K"
      }],
      "resistivityAt"
    );
  }
  return m.resistivity20 * (1 + m.temperatureCoefficient20 * (temperature2 - REFERENCE_TEMPERATURE));
}

// lib/em/loopKernel.ts
var M_SPLIT = 0.7;
var HALF_PI = Math.PI / 2;
var AGM_STOP = 1e-9;
var MU0_OVER_PI = MU0 / Math.PI;
var agmK = 0;
function agmScaledSum(m, m1) {
  let an = 1;
  let bn = Math.sqrt(m1);
  let g = 1 / (2 * (1 + bn));
  let T = g * g;
  let w = 1;
  for (let i = 0; i < 30; i++) {
    const an1 = 0.5 * (an + bn);
    bn = Math.sqrt(an * bn);
    an = an1;
    if (m * g <= AGM_STOP * an) break;
    g = m * g * g / (2 * (an + bn));
    w *= 2;
    T += w * g * g;
  }
  agmK = HALF_PI / an;
  return T;
}
var K_A_OVER_RHO = 0;
var K_B_RHO = 1;
var K_B_Z = 2;
var K_ALPHA2 = 3;
function loopKernel(a, rho, z3, out, wantField) {
  const dm = a - rho;
  const dp = a + rho;
  const z22 = z3 * z3;
  const alpha2 = dm * dm + z22;
  out[K_ALPHA2] = alpha2;
  if (alpha2 === 0) return false;
  const beta2 = dp * dp + z22;
  const m1 = alpha2 / beta2;
  const m = 4 * a * rho / beta2;
  const T = agmScaledSum(m, m1);
  const K = agmK;
  const beta = Math.sqrt(beta2);
  const beta3 = beta2 * beta;
  out[K_A_OVER_RHO] = 8 * MU0_OVER_PI * a * a * K * T / beta3;
  if (!wantField) return true;
  const E = K * (1 - 0.5 * m - m * m * T);
  if (m <= M_SPLIT) {
    const i3 = K * m * (0.5 + m * T - 2 * T) / m1;
    const pre = MU0_OVER_PI * a / beta3;
    out[K_B_RHO] = pre * z3 * i3;
    out[K_B_Z] = pre * (a * E / m1 - rho * i3);
  } else {
    const r2 = rho * rho + z22;
    const pre = 0.5 * MU0_OVER_PI / beta;
    out[K_B_Z] = pre * (K + (a * a - r2) * E / alpha2);
    out[K_B_RHO] = pre * z3 / rho * ((a * a + r2) * E / alpha2 - K);
  }
  return true;
}
function coaxialKernel(ra2, rb2, d) {
  const dm = ra2 - rb2;
  const dp = ra2 + rb2;
  const d2 = d * d;
  const alpha2 = dm * dm + d2;
  if (alpha2 === 0) return Infinity;
  const beta2 = dp * dp + d2;
  const m1 = alpha2 / beta2;
  const m = 4 * ra2 * rb2 / beta2;
  const T = agmScaledSum(m, m1);
  return MU0 * m * m * Math.sqrt(beta2) * agmK * T;
}
function aOverRhoKernel(a, rho, z22, alpha2) {
  const dp = a + rho;
  const beta2 = dp * dp + z22;
  const m1 = alpha2 / beta2;
  const m = 4 * a * rho / beta2;
  const T = agmScaledSum(m, m1);
  return 8 * MU0_OVER_PI * a * a * agmK * T / (beta2 * Math.sqrt(beta2));
}

// lib/em/loopField.ts
var scratch = new Float64Array(4);
function loopField(radius, current2, rho, z3) {
  requirePositive(radius, "radius", "m", "loopField");
  requireFinite(current2, "current", "A", "loopField");
  requireFinite(z3, "z", "m", "loopField");
  if (!(Number.isFinite(rho) && rho >= 0)) {
    throw new TanklightInputError(
      [{ path: "rho", message: "must be a finite distance \u2265 0 m", value: rho, expected: "\u2265 0 m" }],
      "loopField"
    );
  }
  if (!loopKernel(radius, rho, z3, scratch, true)) {
    throw new TanklightInputError(
      [{ path: "rho, z", message: "the point lies on the filament, where its field is infinite", value: [rho, z3], expected: "a point off the wire" }],
      "loopField"
    );
  }
  return { bRho: rho === 0 ? 0 : current2 * scratch[K_B_RHO], bZ: current2 * scratch[K_B_Z] };
}

// lib/math/quadrature.ts
var ruleCache = /* @__PURE__ */ new Map();
var NODE_TOLERANCE = 1e-15;
function gaussLegendre(n) {
  if (!(Number.isInteger(n) && n >= 1 && n <= 1e4)) {
    throw new TanklightInputError(
      [{ path: "n", message: "must be an integer in [1, 10000]", value: n, expected: "integer \u2265 1" }],
      "gaussLegendre"
    );
  }
  const cached = ruleCache.get(n);
  if (cached) return cached;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  if (n === 1) {
    weights[0] = 2;
  } else {
    const half = Math.floor((n + 1) / 2);
    for (let i = 0; i < half; i++) {
      let x = (1 - (n - 1) / (8 * n * n * n)) * Math.cos(Math.PI * (4 * i + 3) / (4 * n + 2));
      let p = 0;
      let dp = 1;
      let delta = 0;
      for (let iter = 0; iter < 100; iter++) {
        let p02 = 1;
        let p12 = x;
        for (let k = 2; k <= n; k++) {
          const p22 = ((2 * k - 1) * x * p12 - (k - 1) * p02) / k;
          p02 = p12;
          p12 = p22;
        }
        p = p12;
        dp = n * (p02 - x * p12) / ((1 - x) * (1 + x));
        delta = p / dp;
        if (Math.abs(delta) <= NODE_TOLERANCE) break;
        x -= delta;
      }
      const omx2 = (1 - x) * (1 + x);
      const d2p = (2 * x * dp - n * (n + 1) * p) / omx2;
      const omr2 = omx2 + 2 * x * delta - delta * delta;
      const dpr = dp - d2p * delta;
      const w = 2 / (omr2 * dpr * dpr);
      x -= delta;
      nodes[i] = -x;
      nodes[n - 1 - i] = x;
      weights[i] = w;
      weights[n - 1 - i] = w;
    }
    if (n % 2 === 1) nodes[(n - 1) / 2] = 0;
  }
  const rule = { nodes, weights };
  ruleCache.set(n, rule);
  return rule;
}
function requireLimits(a, b, where) {
  if (!Number.isFinite(a) || !Number.isFinite(b)) {
    throw new TanklightInputError(
      [{ path: Number.isFinite(a) ? "b" : "a", message: "integration limit must be finite", value: Number.isFinite(a) ? b : a }],
      where
    );
  }
}
function integrateGaussLegendre(f, a, b, n) {
  requireLimits(a, b, "integrateGaussLegendre");
  const { nodes, weights } = gaussLegendre(n);
  const half = 0.5 * (b - a);
  const mid = 0.5 * (a + b);
  let s = 0;
  for (let i = 0; i < n; i++) s += weights[i] * f(mid + half * nodes[i]);
  return s * half;
}
var XGK = [
  0.9914553711208126,
  0.9491079123427585,
  0.8648644233597691,
  0.7415311855993945,
  0.5860872354676911,
  0.4058451513773972,
  0.20778495500789848,
  0
];
var WGK = [
  0.022935322010529224,
  0.06309209262997856,
  0.10479001032225019,
  0.14065325971552592,
  0.1690047266392679,
  0.19035057806478542,
  0.20443294007529889,
  0.20948214108472782
];
var WG = [
  0.1294849661688697,
  0.27970539148927664,
  0.3818300505051189,
  0.4179591836734694
];
var EPS = Number.EPSILON;
var qkValue = 0;
var qkError = 0;
function kronrod15(f, a, b) {
  const c = 0.5 * (a + b);
  const h = 0.5 * (b - a);
  const fv = new Float64Array(15);
  const fc = f(c);
  fv[14] = fc;
  let k = fc * WGK[7];
  let g = fc * WG[3];
  let kAbs = Math.abs(k);
  for (let j = 0; j < 7; j++) {
    const dx = h * XGK[j];
    const f1 = f(c - dx);
    const f2 = f(c + dx);
    fv[2 * j] = f1;
    fv[2 * j + 1] = f2;
    k += WGK[j] * (f1 + f2);
    kAbs += WGK[j] * (Math.abs(f1) + Math.abs(f2));
    if (j % 2 === 1) g += WG[(j - 1) / 2] * (f1 + f2);
  }
  if (!Number.isFinite(k)) {
    throw new TanklightInputError(
      [{ path: "f", message: `integrand is not finite on [${a}, ${b}]`, value: k, expected: "finite values" }],
      "integrateAdaptive"
    );
  }
  const mean = 0.5 * k;
  let asc = WGK[7] * Math.abs(fc - mean);
  for (let j = 0; j < 7; j++) asc += WGK[j] * (Math.abs(fv[2 * j] - mean) + Math.abs(fv[2 * j + 1] - mean));
  const ah = Math.abs(h);
  let err = Math.abs((k - g) * h);
  asc *= ah;
  kAbs *= ah;
  if (asc !== 0 && err !== 0) err = asc * Math.min(1, Math.pow(200 * err / asc, 1.5));
  if (kAbs > Number.MIN_VALUE / (50 * EPS)) err = Math.max(50 * EPS * kAbs, err);
  qkValue = k * h;
  qkError = err;
}
function integrateAdaptive(f, a, b, options = {}) {
  const absTol = options.absTol ?? 1e-12;
  const relTol = options.relTol ?? 1e-10;
  const maxIntervals = options.maxIntervals ?? 2e3;
  requireLimits(a, b, "integrateAdaptive");
  if (!(absTol >= 0 && Number.isFinite(absTol))) {
    throw new TanklightInputError([{ path: "absTol", message: "must be a finite number \u2265 0", value: absTol }], "integrateAdaptive");
  }
  if (!(relTol >= 0 && Number.isFinite(relTol))) {
    throw new TanklightInputError([{ path: "relTol", message: "must be a finite number \u2265 0", value: relTol }], "integrateAdaptive");
  }
  if (!(Number.isInteger(maxIntervals) && maxIntervals >= 1)) {
    throw new TanklightInputError([{ path: "maxIntervals", message: "must be an integer \u2265 1", value: maxIntervals }], "integrateAdaptive");
  }
  if (a === b) return { value: 0, error: 0, evaluations: 0, converged: true };
  const lo = [a];
  const hi = [b];
  kronrod15(f, a, b);
  const val = [qkValue];
  const err = [qkError];
  let evaluations = 15;
  let value = qkValue;
  let error = qkError;
  while (error > Math.max(absTol, relTol * Math.abs(value)) && lo.length < maxIntervals) {
    let worst = 0;
    for (let i = 1; i < err.length; i++) if (err[i] > err[worst]) worst = i;
    const pa = lo[worst];
    const pb = hi[worst];
    const mid = 0.5 * (pa + pb);
    if (mid === pa || mid === pb) break;
    kronrod15(f, pa, mid);
    const lv = qkValue;
    const le = qkError;
    kronrod15(f, mid, pb);
    evaluations += 30;
    value += lv + qkValue - val[worst];
    error += le + qkError - err[worst];
    hi[worst] = mid;
    val[worst] = lv;
    err[worst] = le;
    lo.push(mid);
    hi.push(pb);
    val.push(qkValue);
    err.push(qkError);
  }
  value = 0;
  error = 0;
  for (let i = 0; i < val.length; i++) {
    value += val[i];
    error += err[i];
  }
  return { value, error, evaluations, converged: error <= Math.max(absTol, relTol * Math.abs(value)) };
}

// lib/em/loopMutual.ts
var LOOP_MUTUAL_TOL = 1e-10;
var MAX_TRAPEZOID = 512;
var MIN_NODES = 16;
var TWO_PI = 2 * Math.PI;
var oddNodes = /* @__PURE__ */ new Map();
function nodesOf(n) {
  let e = oddNodes.get(n);
  if (!e) {
    const half = n / 2;
    const c = new Float64Array(half);
    const s = new Float64Array(half);
    for (let j = 0; j < half; j++) {
      const t = (2 * j + 1) * Math.PI / half;
      c[j] = Math.cos(t);
      s[j] = Math.sin(t);
    }
    e = { c, s };
    oddNodes.set(n, e);
  }
  return e;
}
var circleMutualState = { minDistance2: Infinity, error: 0, evaluations: 0 };
function intersecting() {
  circleMutualState.minDistance2 = 0;
  throw new TanklightInputError(
    [{ path: "a, b", message: "the circle filaments intersect; their filament mutual inductance is not defined", value: "intersecting filaments" }],
    "loopMutualInductance"
  );
}
function circleMutualCore(cax, cay, caz, nax, nay, naz, ra2, cbx, cby, cbz, nbx, nby, nbz, rb2, tol) {
  let ux, uy, uz;
  if (Math.abs(nbx) < 0.9) {
    ux = 1 - nbx * nbx;
    uy = -nbx * nby;
    uz = -nbx * nbz;
  } else {
    ux = -nby * nbx;
    uy = 1 - nby * nby;
    uz = -nby * nbz;
  }
  const un = 1 / Math.sqrt(ux * ux + uy * uy + uz * uz);
  ux *= un;
  uy *= un;
  uz *= un;
  const vx = nby * uz - nbz * uy;
  const vy = nbz * ux - nbx * uz;
  const vz = nbx * uy - nby * ux;
  const d0x = cbx - cax, d0y = cby - cay, d0z = cbz - caz;
  const Dx = nay * d0z - naz * d0y, Dy = naz * d0x - nax * d0z, Dz = nax * d0y - nay * d0x;
  const Xx = rb2 * (nay * uz - naz * uy), Xy = rb2 * (naz * ux - nax * uz), Xz = rb2 * (nax * uy - nay * ux);
  const Yx = rb2 * (nay * vz - naz * vy), Yy = rb2 * (naz * vx - nax * vz), Yz = rb2 * (nax * vy - nay * vx);
  const z0 = nax * d0x + nay * d0y + naz * d0z;
  const zu = rb2 * (nax * ux + nay * uy + naz * uz);
  const zv = rb2 * (nax * vx + nay * vy + naz * vz);
  const Du = rb2 * (Dx * ux + Dy * uy + Dz * uz);
  const Dv = rb2 * (Dx * vx + Dy * vy + Dz * vz);
  const Nn = rb2 * rb2 * (nax * nbx + nay * nby + naz * nbz);
  let minA2 = Infinity;
  let maxA2 = 0;
  const f = (c, s) => {
    const px = Dx + c * Xx + s * Yx;
    const py = Dy + c * Xy + s * Yy;
    const pz = Dz + c * Xz + s * Yz;
    const rho = Math.sqrt(px * px + py * py + pz * pz);
    const z3 = z0 + c * zu + s * zv;
    const z22 = z3 * z3;
    const dm = ra2 - rho;
    const alpha2 = dm * dm + z22;
    if (alpha2 < minA2) {
      minA2 = alpha2;
      if (alpha2 === 0) intersecting();
    }
    if (alpha2 > maxA2) maxA2 = alpha2;
    return aOverRhoKernel(ra2, rho, z22, alpha2) * (c * Dv - s * Du + Nn);
  };
  let sum = f(1, 0) + f(-1, 0) + f(0, 1) + f(0, -1);
  let abs = 0;
  {
    const { c, s } = nodesOf(8);
    for (let j = 0; j < 4; j++) sum += f(c[j], s[j]);
  }
  let n = 8;
  let prev = TWO_PI / n * sum;
  let evaluations = 8;
  const sq = Math.sqrt(tol);
  while (n < MAX_TRAPEZOID) {
    const n2 = 2 * n;
    const { c, s } = nodesOf(n2);
    let add = 0;
    abs = 0;
    for (let j = 0; j < n; j++) {
      const v = f(c[j], s[j]);
      add += v;
      abs += Math.abs(v);
    }
    sum += add;
    evaluations += n;
    n = n2;
    const value = TWO_PI / n * sum;
    const scale = Math.max(Math.abs(value), 1e-4 * (TWO_PI / (n / 2)) * abs);
    const diff = Math.abs(value - prev);
    const peaky = maxA2 > 4 * minA2;
    if (n >= MIN_NODES && diff <= 0.1 * sq * scale && (!peaky || n * n * minA2 >= TWO_PI * TWO_PI * rb2 * rb2)) {
      circleMutualState.minDistance2 = minA2;
      circleMutualState.error = diff * diff / scale;
      circleMutualState.evaluations = evaluations;
      return value;
    }
    prev = value;
    if (peaky && MAX_TRAPEZOID * MAX_TRAPEZOID * minA2 < TWO_PI * TWO_PI * rb2 * rb2) break;
  }
  let tStar = 0;
  let best = Infinity;
  for (let k = 0; k < 64; k++) {
    const t = TWO_PI * k / 64;
    const c = Math.cos(t), s = Math.sin(t);
    const px = Dx + c * Xx + s * Yx, py = Dy + c * Xy + s * Yy, pz = Dz + c * Xz + s * Yz;
    const dm = ra2 - Math.sqrt(px * px + py * py + pz * pz);
    const z3 = z0 + c * zu + s * zv;
    const d2 = dm * dm + z3 * z3;
    if (d2 < best) {
      best = d2;
      tStar = t;
    }
  }
  const res = integrateAdaptive((t) => f(Math.cos(t), Math.sin(t)), tStar, tStar + TWO_PI, {
    relTol: tol,
    absTol: tol * 1e-4 * (TWO_PI / (n / 2)) * abs,
    maxIntervals: 4e3
  });
  circleMutualState.minDistance2 = minA2;
  circleMutualState.error = res.error;
  circleMutualState.evaluations = evaluations + res.evaluations;
  return res.value;
}
function unit(v, field) {
  const [x, y, z3] = v;
  const n = Math.hypot(x, y, z3);
  if (!(Number.isFinite(n) && n > 0)) {
    throw new TanklightInputError([{ path: field, message: "must be a finite non-zero vector", value: v, expected: "non-zero direction" }], "loopMutualInductance");
  }
  return [x / n, y / n, z3 / n];
}
function checkCircle(f, name) {
  if (!f || !Array.isArray(f.center) || f.center.length !== 3 || !f.center.every(Number.isFinite)) {
    throw new TanklightInputError([{ path: `${name}.center`, message: "must be three finite coordinates in m", value: f?.center }], "loopMutualInductance");
  }
  if (!(Number.isFinite(f.radius) && f.radius > 0)) {
    throw new TanklightInputError([{ path: `${name}.radius`, message: "must be a finite number > 0 m", value: f.radius, expected: "> 0 m" }], "loopMutualInductance");
  }
}
function loopMutualInductance(a, b, options = {}) {
  checkCircle(a, "a");
  checkCircle(b, "b");
  const na = unit(a.axis, "a.axis");
  const nb = unit(b.axis, "b.axis");
  const tol = options.relTol ?? LOOP_MUTUAL_TOL;
  if (!(tol > 0 && tol < 1)) {
    throw new TanklightInputError([{ path: "options.relTol", message: "must be in (0, 1)", value: tol }], "loopMutualInductance");
  }
  const M = circleMutualCore(
    a.center[0],
    a.center[1],
    a.center[2],
    na[0],
    na[1],
    na[2],
    a.radius,
    b.center[0],
    b.center[1],
    b.center[2],
    nb[0],
    nb[1],
    nb[2],
    b.radius,
    tol
  );
  if (!Number.isFinite(M) || circleMutualState.minDistance2 <= 1e-24 * a.radius * a.radius) {
    throw new TanklightInputError(
      [{ path: "a, b", message: "the circle filaments intersect or coincide; their filament mutual inductance is not defined", value: "touching filaments" }],
      "loopMutualInductance"
    );
  }
  return M;
}

// lib/em/frames.ts
function finiteVec(v, path, where) {
  if (!Array.isArray(v) || v.length !== 3 || !v.every((x) => typeof x === "number" && Number.isFinite(x))) {
    throw new TanklightInputError([{ path, message: "must be three finite numbers", value: v, expected: "[x, y, z]" }], where);
  }
  return v;
}
function poseFrame(pose, where = "poseFrame", field = "pose") {
  if (!pose || typeof pose !== "object") {
    throw new TanklightInputError([{ path: field, message: "must be a pose { position, axis?, spin? }", value: pose }], where);
  }
  const position = finiteVec(pose.position, `${field}.position`, where);
  let nx = 0, ny = 0, nz = 1;
  if (pose.axis !== void 0) {
    const a = finiteVec(pose.axis, `${field}.axis`, where);
    const len = Math.hypot(a[0], a[1], a[2]);
    if (!(len > 0)) {
      throw new TanklightInputError([{ path: `${field}.axis`, message: "must be a non-zero direction", value: pose.axis, expected: "non-zero vector" }], where);
    }
    nx = a[0] / len;
    ny = a[1] / len;
    nz = a[2] / len;
  }
  const spin = pose.spin ?? 0;
  if (!(typeof spin === "number" && Number.isFinite(spin))) {
    throw new TanklightInputError([{ path: `${field}.spin`, message: "must be a finite angle in rad", value: spin }], where);
  }
  const A = new Float64Array(9);
  A[2] = nx;
  A[5] = ny;
  A[6] = -nx;
  A[7] = -ny;
  A[8] = nz;
  if (nz >= 0) {
    const k = 1 / (1 + nz);
    A[0] = 1 - k * nx * nx;
    A[1] = -k * nx * ny;
    A[3] = -k * nx * ny;
    A[4] = 1 - k * ny * ny;
  } else {
    const h = Math.hypot(nx, ny);
    const cx = h > 1e-100 ? nx / h : 0;
    const cy = h > 1e-100 ? ny / h : 1;
    const w = 1 - nz;
    A[0] = 1 - w * cx * cx;
    A[1] = -w * cx * cy;
    A[3] = -w * cx * cy;
    A[4] = 1 - w * cy * cy;
  }
  const c = Math.cos(spin);
  const s = Math.sin(spin);
  const R = new Float64Array(9);
  for (let i = 0; i < 3; i++) {
    const a0 = A[3 * i], a1 = A[3 * i + 1], a2 = A[3 * i + 2];
    R[3 * i] = a0 * c + a1 * s;
    R[3 * i + 1] = -a0 * s + a1 * c;
    R[3 * i + 2] = a2;
  }
  return { R, position };
}
function rotate(R, v) {
  return [
    R[0] * v[0] + R[1] * v[1] + R[2] * v[2],
    R[3] * v[0] + R[4] * v[1] + R[5] * v[2],
    R[6] * v[0] + R[7] * v[1] + R[8] * v[2]
  ];
}
function rotateBack(R, v) {
  return [
    R[0] * v[0] + R[3] * v[1] + R[6] * v[2],
    R[1] * v[0] + R[4] * v[1] + R[7] * v[2],
    R[2] * v[0] + R[5] * v[1] + R[8] * v[2]
  ];
}
function toWorld(frame2, p) {
  const r = rotate(frame2.R, p);
  return [r[0] + frame2.position[0], r[1] + frame2.position[1], r[2] + frame2.position[2]];
}
function toCoil(frame2, x) {
  return rotateBack(frame2.R, [x[0] - frame2.position[0], x[1] - frame2.position[1], x[2] - frame2.position[2]]);
}
function filamentToWorld(f, frame2) {
  if (f.kind === "circle") {
    const n = rotate(frame2.R, f.axis);
    const l = Math.hypot(n[0], n[1], n[2]);
    return { kind: "circle", center: toWorld(frame2, f.center), axis: [n[0] / l, n[1] / l, n[2] / l], radius: f.radius, turns: f.turns };
  }
  return { kind: "path", points: f.points.map((p) => toWorld(frame2, p)), turns: f.turns };
}
function worldFilaments(coil, pose, where = "worldFilaments", field = "pose") {
  const frame2 = poseFrame(pose, where, field);
  return coil.filaments.map((f) => filamentToWorld(f, frame2));
}

// lib/em/polygonMutual.ts
var MU0_OVER_4PI = MU0 / (4 * Math.PI);
var POLYGON_MUTUAL_TOL = 1e-10;
var polygonMutualState = { minDistance2: Infinity };
function segmentLog(t, d2, L) {
  const u = L - t;
  const R1 = Math.sqrt(t * t + d2);
  const R2 = Math.sqrt(u * u + d2);
  const e1 = t > 0 ? d2 / (R1 + t) : R1 - t;
  const e2 = u > 0 ? d2 / (R2 + u) : R2 - u;
  return Math.log((R1 + R2 + L) / (e1 + e2));
}
function overlapError(where) {
  throw new TanklightInputError(
    [{ path: "filaments", message: "two filament segments overlap (collinear and sharing length) or a node lies on a wire; their filament mutual inductance is infinite", value: "overlapping filaments" }],
    where
  );
}
function segmentMutual(p12, q1, p22, q2, tol = POLYGON_MUTUAL_TOL) {
  const ax = q1[0] - p12[0], ay = q1[1] - p12[1], az = q1[2] - p12[2];
  const bx = q2[0] - p22[0], by = q2[1] - p22[1], bz = q2[2] - p22[2];
  const L1 = Math.sqrt(ax * ax + ay * ay + az * az);
  const L2 = Math.sqrt(bx * bx + by * by + bz * bz);
  if (L1 === 0 || L2 === 0) return 0;
  const s1x = ax / L1, s1y = ay / L1, s1z = az / L1;
  const cosang = (s1x * bx + s1y * by + s1z * bz) / L2;
  if (Math.abs(cosang) < 1e-15) return 0;
  let minD2 = Infinity;
  const f = (l) => {
    const r = l / L2;
    const x = p22[0] + r * bx - p12[0], y = p22[1] + r * by - p12[1], z3 = p22[2] + r * bz - p12[2];
    const t = x * s1x + y * s1y + z3 * s1z;
    const cx = y * s1z - z3 * s1y, cy = z3 * s1x - x * s1z, cz = x * s1y - y * s1x;
    const d2 = cx * cx + cy * cy + cz * cz;
    const u = L1 - t;
    const dist2 = d2 + (t < 0 ? t * t : u < 0 ? u * u : 0);
    if (dist2 < minD2) minD2 = dist2;
    if (d2 === 0 && t >= 0 && u >= 0) overlapError("segmentMutual");
    return segmentLog(t, d2, L1);
  };
  const res = integrateAdaptive(f, 0, L2, { relTol: tol, absTol: tol * 1e-3 * L2, maxIntervals: 4e3 });
  polygonMutualState.minDistance2 = minD2;
  return MU0_OVER_4PI * cosang * res.value;
}
function circleSegmentMutual(center, axis, radius, p, q, tol = POLYGON_MUTUAL_TOL) {
  const bx = q[0] - p[0], by = q[1] - p[1], bz = q[2] - p[2];
  const L = Math.sqrt(bx * bx + by * by + bz * bz);
  if (L === 0) return 0;
  const sx = bx / L, sy = by / L, sz = bz / L;
  const [nx, ny, nz] = axis;
  const kx = sy * nz - sz * ny, ky = sz * nx - sx * nz, kz = sx * ny - sy * nx;
  let minD2 = Infinity;
  const f = (l) => {
    const wx = p[0] + l * sx - center[0], wy = p[1] + l * sy - center[1], wz = p[2] + l * sz - center[2];
    const z3 = wx * nx + wy * ny + wz * nz;
    const cx = ny * wz - nz * wy, cy = nz * wx - nx * wz, cz = nx * wy - ny * wx;
    const rho = Math.sqrt(cx * cx + cy * cy + cz * cz);
    const dm = radius - rho;
    const alpha2 = dm * dm + z3 * z3;
    if (alpha2 < minD2) minD2 = alpha2;
    if (alpha2 === 0) overlapError("circleSegmentMutual");
    return aOverRhoKernel(radius, rho, z3 * z3, alpha2) * (wx * kx + wy * ky + wz * kz);
  };
  const res = integrateAdaptive(f, 0, L, { relTol: tol, absTol: tol * 1e-3 * MU0 * L, maxIntervals: 4e3 });
  polygonMutualState.minDistance2 = minD2;
  return res.value;
}
function straightWireSelfInductance(l, r, Y) {
  return MU0 / (2 * Math.PI) * l * (Math.log(2 * l / r) - 1 + Y);
}

// lib/em/filamentMutual.ts
var lastMinDistance2 = Infinity;
function filamentMutual(a, b, tol = LOOP_MUTUAL_TOL) {
  if (a.kind === "circle" && b.kind === "circle") {
    const [p, q] = a.radius >= b.radius ? [a, b] : [b, a];
    const m = circleMutualCore(
      p.center[0],
      p.center[1],
      p.center[2],
      p.axis[0],
      p.axis[1],
      p.axis[2],
      p.radius,
      q.center[0],
      q.center[1],
      q.center[2],
      q.axis[0],
      q.axis[1],
      q.axis[2],
      q.radius,
      tol
    );
    lastMinDistance2 = circleMutualState.minDistance2;
    return m;
  }
  if (a.kind === "path" && b.kind === "path") {
    let sum2 = 0;
    let min2 = Infinity;
    for (let i = 0; i < a.points.length; i++) {
      const p12 = a.points[i], q1 = a.points[(i + 1) % a.points.length];
      for (let j = 0; j < b.points.length; j++) {
        sum2 += segmentMutual(p12, q1, b.points[j], b.points[(j + 1) % b.points.length], tol);
        if (polygonMutualState.minDistance2 < min2) min2 = polygonMutualState.minDistance2;
      }
    }
    lastMinDistance2 = min2;
    return sum2;
  }
  const c = a.kind === "circle" ? a : b;
  const path = a.kind === "path" ? a : b;
  let sum = 0;
  let min = Infinity;
  for (let j = 0; j < path.points.length; j++) {
    sum += circleSegmentMutual(c.center, c.axis, c.radius, path.points[j], path.points[(j + 1) % path.points.length], tol);
    if (polygonMutualState.minDistance2 < min) min = polygonMutualState.minDistance2;
  }
  lastMinDistance2 = min;
  return sum;
}
function lastFilamentDistance2() {
  return lastMinDistance2;
}

// lib/em/selfInductance.ts
var Y_BLEND_POWER = 4.8;
function internalInductanceFactor(x) {
  return 0.25 / Math.pow(1 + Math.pow(x / 2, Y_BLEND_POWER), 1 / Y_BLEND_POWER);
}
function ownWireGeometry(c, frequency2) {
  switch (c.kind) {
    case "round": {
      const r = c.diameter / 2;
      if (frequency2 === void 0 || frequency2 === 0) return { r, Y: 0.25 };
      const rho = resistivityAt(material(c.material));
      const delta = Math.sqrt(rho / (Math.PI * frequency2 * MU0));
      return { r, Y: internalInductanceFactor(r / delta) };
    }
    case "litz":
      return { r: c.outerDiameter / 2, Y: 0.25 };
    case "trace":
      return { r: 0.2235 * (c.width + c.thickness) * Math.exp(0.25), Y: 0.25 };
  }
}
function ownTurnInductance(f, r, Y) {
  if (f.kind === "circle") {
    return MU0 * f.radius * (Math.log(8 * f.radius / r) - 2 + Y);
  }
  const pts = f.points;
  const n = pts.length;
  let L = 0;
  for (let i = 0; i < n; i++) {
    const p = pts[i], q = pts[(i + 1) % n];
    const l = Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]);
    if (l > 0) L += straightWireSelfInductance(l, r, Y);
    for (let j = i + 1; j < n; j++) {
      L += 2 * segmentMutual(p, q, pts[j], pts[(j + 1) % n]);
    }
  }
  return L;
}
function selfInductanceDetail(coil, options = {}) {
  const where = "selfInductance";
  if (!coil || !Array.isArray(coil.filaments) || coil.filaments.length === 0 || !coil.conductor) {
    throw new TanklightInputError([{ path: "coil", message: "must be a Coil with at least one filament and a conductor", value: coil }], where);
  }
  const f = options.frequency;
  if (f !== void 0 && !(Number.isFinite(f) && f >= 0)) {
    throw new TanklightInputError([{ path: "options.frequency", message: "must be a finite frequency \u2265 0 Hz", value: f, expected: "\u2265 0 Hz" }], where);
  }
  const { r, Y } = ownWireGeometry(coil.conductor, f);
  const warnings = [];
  const fil = coil.filaments.map(
    (x) => x.kind === "circle" ? { ...x, axis: normalise(x.axis) } : x
  );
  let own = 0;
  for (const x of fil) {
    own += x.turns * x.turns * ownTurnInductance(x, r, Y);
    if (x.kind === "circle" && x.radius < 5 * r) {
      warnings.push(`a turn of radius ${x.radius} m is less than 5 wire radii: the thin-wire own term \u03BC\u2080a(ln(8a/r) \u2212 2 + Y) loses accuracy`);
    }
    if (x.turns !== 1) {
      warnings.push(`a filament stands for ${x.turns} turns: its own term counts them as coincident turns (N\xB2\xB7own-turn inductance), an upper estimate`);
    }
  }
  let mutual = 0;
  for (let i = 0; i < fil.length; i++) {
    for (let j = i + 1; j < fil.length; j++) {
      mutual += 2 * fil[i].turns * fil[j].turns * filamentMutual(fil[i], fil[j]);
    }
  }
  return { value: own + mutual, ownTerms: own, mutualTerms: mutual, Y, warnings: [...new Set(warnings)] };
}
function normalise(v) {
  const l = Math.hypot(v[0], v[1], v[2]);
  return [v[0] / l, v[1] / l, v[2] / l];
}
function selfInductance(coil, options = {}) {
  return selfInductanceDetail(coil, options).value;
}

// lib/math/kelvin.ts
var SQRT1_2 = Math.SQRT1_2;
var KELVIN_CROSSOVER = 26;
var UNSCALED_MAX = 1e3;
function scaledJ(nu, x, out) {
  if (x < KELVIN_CROSSOVER) seriesJ(nu, x, out);
  else hankelJ(nu, x, out);
}
function seriesJ(nu, x, out) {
  const q = x * x / 4;
  let fact = 1;
  for (let j = 2; j <= nu; j++) fact /= j;
  let t = fact;
  let re = 0;
  let im = 0;
  for (let k = 0; k < 400; k++) {
    switch (k & 3) {
      case 0:
        re += t;
        break;
      case 1:
        im += t;
        break;
      case 2:
        re -= t;
        break;
      default:
        im -= t;
    }
    t *= q / ((k + 1) * (k + 1 + nu));
    if (t < 1e-18 * Math.max(Math.abs(re), Math.abs(im), 1e-300) && k > 2) break;
  }
  const mag = Math.pow(x / 2, nu) * Math.exp(-x * SQRT1_2);
  const ang = 3 * Math.PI * nu / 4;
  const c = Math.cos(ang) * mag;
  const s = Math.sin(ang) * mag;
  out[0] = re * c - im * s;
  out[1] = re * s + im * c;
}
function hankelJ(nu, x, out) {
  const mu = 4 * nu * nu;
  const wr = -SQRT1_2 / x;
  const wi = -SQRT1_2 / x;
  const mr = wi;
  const mi = -wr;
  let pr = 1;
  let pi = 0;
  let a = 1;
  let sMr = 1, sMi = 0, sPr = 1, sPi = 0;
  let lastMag = Infinity;
  for (let k = 1; k < 200; k++) {
    a *= (mu - (2 * k - 1) * (2 * k - 1)) / (k * 8);
    const nr = pr * mr - pi * mi;
    const ni = pr * mi + pi * mr;
    pr = nr;
    pi = ni;
    const tr = a * pr;
    const ti = a * pi;
    const mag = Math.abs(tr) + Math.abs(ti);
    if (mag === 0) break;
    if (mag > lastMag) break;
    lastMag = mag;
    sMr += tr;
    sMi += ti;
    if (k & 1) {
      sPr -= tr;
      sPi -= ti;
    } else {
      sPr += tr;
      sPi += ti;
    }
    if (mag < 1e-17) break;
  }
  const theta = x * SQRT1_2 + (nu / 2 + 0.25) * Math.PI;
  const ct = Math.cos(theta);
  const st = Math.sin(theta);
  const damp = Math.exp(-x * Math.SQRT2);
  const re = ct * sMr - st * sMi + damp * (ct * sPr + st * sPi);
  const im = ct * sMi + st * sMr + damp * (ct * sPi - st * sPr);
  const amp = 0.5 * Math.sqrt(2 / (Math.PI * x));
  const cr = Math.cos(-3 * Math.PI / 8) * amp;
  const ci = Math.sin(-3 * Math.PI / 8) * amp;
  out[0] = re * cr - im * ci;
  out[1] = re * ci + im * cr;
}
var p0 = [0, 0];
var p1 = [0, 0];
var p2 = [0, 0];
function checkX(x, where, max) {
  if (!(typeof x === "number" && Number.isFinite(x) && x >= 0 && x <= max)) {
    throw new TanklightInputError(
      [{ path: "x", message: `must be a finite number in [0, ${max}]`, value: x, expected: `0 \u2264 x \u2264 ${max}` }],
      where
    );
  }
}
function kelvinScaled(x) {
  checkX(x, "kelvinScaled", Number.MAX_VALUE);
  return assemble(x, 1);
}
function kelvin(x) {
  checkX(x, "kelvin", UNSCALED_MAX);
  return assemble(x, Math.exp(x * SQRT1_2));
}
function assemble(x, scale) {
  scaledJ(0, x, p0);
  scaledJ(1, x, p1);
  scaledJ(2, x, p2);
  return {
    ber: p0[0] * scale,
    bei: p0[1] * scale,
    berp: (p1[0] + p1[1]) * SQRT1_2 * scale,
    beip: (p1[1] - p1[0]) * SQRT1_2 * scale,
    ber1: p1[0] * scale,
    bei1: p1[1] * scale,
    ber2: p2[0] * scale,
    bei2: p2[1] * scale
  };
}
function ber(x) {
  return kelvin(x).ber;
}
function bei(x) {
  return kelvin(x).bei;
}
function berPrime(x) {
  return kelvin(x).berp;
}
function beiPrime(x) {
  return kelvin(x).beip;
}
function kelvinScaledInto(x, out) {
  scaledJ(0, x, p0);
  scaledJ(1, x, p1);
  scaledJ(2, x, p2);
  out[0] = p0[0];
  out[1] = p0[1];
  out[2] = p1[0];
  out[3] = p1[1];
  out[4] = p2[0];
  out[5] = p2[1];
}

// lib/em/losses/roundWireAcFactor.ts
var buf = new Float64Array(6);
function acFactorFromQ(q) {
  if (q === 0) return 1;
  kelvinScaledInto(q, buf);
  const br = buf[0], bi = buf[1];
  const b1r = buf[2], b1i = buf[3];
  const dr = (b1r + b1i) * Math.SQRT1_2;
  const di = (b1i - b1r) * Math.SQRT1_2;
  return q / 2 * (br * di - bi * dr) / (dr * dr + di * di);
}
function roundWireAcFactor(radius, f, resistivity2) {
  requirePositive(radius, "radius", "m", "roundWireAcFactor");
  requirePositive(resistivity2, "resistivity", "\u03A9\xB7m", "roundWireAcFactor");
  if (!(typeof f === "number" && Number.isFinite(f) && f >= 0)) {
    throw new TanklightInputError([{ path: "f", message: "must be a finite number \u2265 0 Hz", value: f, expected: "\u2265 0 Hz" }], "roundWireAcFactor");
  }
  if (f === 0) return 1;
  const delta = Math.sqrt(resistivity2 / (Math.PI * f * MU0));
  return acFactorFromQ(Math.SQRT2 * radius / delta);
}
function roundWireInternalInductanceFactor(radius, f, resistivity2) {
  requirePositive(radius, "radius", "m", "roundWireInternalInductanceFactor");
  requirePositive(resistivity2, "resistivity", "\u03A9\xB7m", "roundWireInternalInductanceFactor");
  if (!(typeof f === "number" && Number.isFinite(f) && f >= 0)) {
    throw new TanklightInputError([{ path: "f", message: "must be a finite number \u2265 0 Hz", value: f, expected: "\u2265 0 Hz" }], "roundWireInternalInductanceFactor");
  }
  if (f === 0) return 0.25;
  const q = Math.SQRT2 * radius / Math.sqrt(resistivity2 / (Math.PI * f * MU0));
  if (q < 0.05 * Math.SQRT2) return 0.25 - q * q * q * q / 1536;
  kelvinScaledInto(q, buf);
  const br = buf[0], bi = buf[1];
  const b1r = buf[2], b1i = buf[3];
  const dr = (b1r + b1i) * Math.SQRT1_2;
  const di = (b1i - b1r) * Math.SQRT1_2;
  return (br * dr + bi * di) / (q * (dr * dr + di * di));
}

// lib/em/losses/proximity.ts
var buf2 = new Float64Array(6);
function proximityG(gamma) {
  if (gamma === 0) return 0;
  if (gamma < 1e-3) return Math.PI * gamma ** 4 / 8;
  kelvinScaledInto(gamma, buf2);
  const br = buf2[0], bi = buf2[1];
  const b1r = buf2[2], b1i = buf2[3];
  const b2r = buf2[4], b2i = buf2[5];
  const dr = (b1r + b1i) * Math.SQRT1_2;
  const di = (b1i - b1r) * Math.SQRT1_2;
  return -2 * Math.PI * gamma * (b2r * dr + b2i * di) / (br * br + bi * bi);
}
function roundWireProximityFactor(diameter, f, resistivity2) {
  requirePositive(diameter, "diameter", "m", "roundWireProximityFactor");
  requirePositive(resistivity2, "resistivity", "\u03A9\xB7m", "roundWireProximityFactor");
  if (!(Number.isFinite(f) && f >= 0)) {
    throw new TanklightInputError([{ path: "f", message: "must be a finite number \u2265 0 Hz", value: f }], "roundWireProximityFactor");
  }
  if (f === 0) return 0;
  const delta = Math.sqrt(resistivity2 / (Math.PI * f * MU0));
  return resistivity2 * proximityG(diameter / (delta * Math.SQRT2));
}
var RING_SAMPLES = 24;
function turnFieldsPerAmpere(coil) {
  const fs = coil.filaments;
  const n = fs.length;
  const h2 = new Float64Array(n);
  const hz2 = new Float64Array(n);
  const hr2 = new Float64Array(n);
  const length2 = new Float64Array(n);
  const warnings = [];
  const circles = [];
  for (const f of fs) {
    if (f.kind !== "circle") {
      throw new TanklightInputError(
        [{ path: "coil.filaments", message: "polygon (path) filaments: proximity loss is not modelled yet", value: f.kind, expected: "circle filaments" }],
        "turnFieldsPerAmpere"
      );
    }
    circles.push(f);
  }
  if (circles.some((c) => c.turns > 1)) {
    warnings.push("some filaments stand for several turns: the proximity effect among the turns of one filament is not modelled");
  }
  const coaxial = circles.every((c) => Math.abs(c.center[0]) < 1e-12 && Math.abs(c.center[1]) < 1e-12 && Math.abs(c.axis[0]) < 1e-12 && Math.abs(c.axis[1]) < 1e-12);
  for (let i = 0; i < n; i++) length2[i] = circles[i].turns * 2 * Math.PI * circles[i].radius;
  if (coaxial) {
    for (let i = 0; i < n; i++) {
      const ci = circles[i];
      let br = 0;
      let bz = 0;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        const cj = circles[j];
        const s = cj.axis[2] >= 0 ? 1 : -1;
        const b = loopField(cj.radius, cj.turns, ci.radius, s * (ci.center[2] - cj.center[2]));
        br += b.bRho;
        bz += s * b.bZ;
      }
      hr2[i] = br * br / (MU0 * MU0);
      hz2[i] = bz * bz / (MU0 * MU0);
      h2[i] = hr2[i] + hz2[i];
    }
    return { h2, hz2, hr2, length: length2, warnings };
  }
  for (let i = 0; i < n; i++) {
    const ci = circles[i];
    const [ui, vi, wi] = frame(ci.axis);
    let sum2 = 0;
    let sumZ2 = 0;
    for (let k = 0; k < RING_SAMPLES; k++) {
      const phi = 2 * Math.PI * (k + 0.5) / RING_SAMPLES;
      const c = Math.cos(phi), s = Math.sin(phi);
      const radial = [ui[0] * c + vi[0] * s, ui[1] * c + vi[1] * s, ui[2] * c + vi[2] * s];
      const tangent = [-ui[0] * s + vi[0] * c, -ui[1] * s + vi[1] * c, -ui[2] * s + vi[2] * c];
      const p = [ci.center[0] + ci.radius * radial[0], ci.center[1] + ci.radius * radial[1], ci.center[2] + ci.radius * radial[2]];
      const B = [0, 0, 0];
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        const cj = circles[j];
        const [uj, vj, wj] = frame(cj.axis);
        const d = [p[0] - cj.center[0], p[1] - cj.center[1], p[2] - cj.center[2]];
        const z3 = dot(d, wj);
        const x = dot(d, uj), y = dot(d, vj);
        const rho = Math.hypot(x, y);
        const b = loopField(cj.radius, cj.turns, rho, z3);
        const ex = rho > 0 ? x / rho : 1, ey = rho > 0 ? y / rho : 0;
        for (let q = 0; q < 3; q++) B[q] = B[q] + b.bRho * (ex * uj[q] + ey * vj[q]) + b.bZ * wj[q];
      }
      const bt = dot(B, tangent);
      const bAx = dot(B, wi);
      sum2 += (dot(B, B) - bt * bt) / (MU0 * MU0);
      sumZ2 += bAx * bAx / (MU0 * MU0);
    }
    h2[i] = sum2 / RING_SAMPLES;
    hz2[i] = sumZ2 / RING_SAMPLES;
    hr2[i] = Math.max(0, h2[i] - hz2[i]);
  }
  return { h2, hz2, hr2, length: length2, warnings };
}
function dot(a, b) {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}
function frame(axis) {
  const len = Math.hypot(axis[0], axis[1], axis[2]);
  const w = [axis[0] / len, axis[1] / len, axis[2] / len];
  const h = Math.abs(w[2]) < 0.9 ? [0, 0, 1] : [1, 0, 0];
  const u0 = [h[1] * w[2] - h[2] * w[1], h[2] * w[0] - h[0] * w[2], h[0] * w[1] - h[1] * w[0]];
  const ul = Math.hypot(u0[0], u0[1], u0[2]);
  const u = [u0[0] / ul, u0[1] / ul, u0[2] / ul];
  const v = [w[1] * u[2] - w[2] * u[1], w[2] * u[0] - w[0] * u[2], w[0] * u[1] - w[1] * u[0]];
  return [u, v, w];
}

// lib/em/losses/litz.ts
function litzResistancePerLength(strands, strandDiameter, bundleDiameter, f, resistivity2) {
  const rs = strandDiameter / 2;
  const dc = resistivity2 / (strands * Math.PI * rs * rs);
  if (f === 0) return { dc, skin: 0, internalProximity: 0, externalFactor: 0 };
  const delta = Math.sqrt(resistivity2 / (Math.PI * f * MU0));
  const q = Math.SQRT2 * rs / delta;
  const skin = dc * (acFactorFromQ(q) - 1);
  const G = resistivity2 * proximityG(strandDiameter / (delta * Math.SQRT2));
  const Rb = bundleDiameter / 2;
  const internalProximity = 2 * strands * G / (8 * Math.PI * Math.PI * Rb * Rb);
  const externalFactor = 2 * strands * G;
  return { dc, skin, internalProximity, externalFactor };
}

// lib/em/losses/trace.ts
function slabSkinFactor(Delta) {
  if (Delta < 0.01) return 1 + 4 * Delta ** 4 / 45;
  if (Delta > 20) return Delta;
  return Delta * (Math.sinh(2 * Delta) + Math.sin(2 * Delta)) / (Math.cosh(2 * Delta) - Math.cos(2 * Delta));
}
function traceResistancePerLength(width, thickness, f, resistivity2) {
  const dc = resistivity2 / (width * thickness);
  if (f === 0) return { dc, skin: 0, normalFactor: 0, tangentialFactor: 0, beyondThinStrip: false };
  const delta = Math.sqrt(resistivity2 / (Math.PI * f * MU0));
  const skin = dc * (slabSkinFactor(thickness / (2 * delta)) - 1);
  const sigma = 1 / resistivity2;
  const w = 2 * Math.PI * f;
  const k = 2 * sigma * w * w * MU0 * MU0 / 24;
  return {
    dc,
    skin,
    normalFactor: k * width ** 3 * thickness,
    tangentialFactor: k * thickness ** 3 * width,
    beyondThinStrip: width * thickness > 2 * delta * delta
  };
}

// lib/math/elliptic.ts
var HALF_PI2 = Math.PI / 2;
var AGM_TOLERANCE = 1e-8;
var SUM_TOLERANCE = 1e-12;
var LEGENDRE_BELOW_M1 = 0.01;
var agmK2 = 0;
var agmS = 0;
function agm(m, m1) {
  let a = 1;
  let b = Math.sqrt(m1);
  let sum = 0.5 * m;
  let weight = 0.5;
  for (let i = 0; i < 40; i++) {
    const c = 0.5 * (a - b);
    const an = 0.5 * (a + b);
    b = Math.sqrt(a * b);
    a = an;
    weight *= 2;
    sum += weight * c * c;
    if (Math.abs(c) <= AGM_TOLERANCE * a) break;
  }
  agmK2 = HALF_PI2 / a;
  agmS = sum;
}
function pair(m, m1) {
  agm(m, m1);
  const K = agmK2;
  if (m1 >= LEGENDRE_BELOW_M1) return { K, E: K * (1 - agmS) };
  agm(m1, m);
  return { K, E: HALF_PI2 / agmK2 + K * agmS };
}
function domainError(where, field, value) {
  return new TanklightInputError(
    [{ path: field, message: "must be a finite number in [0, 1]", value, expected: "0 \u2264 value \u2264 1" }],
    where
  );
}
function ellipticKEComplement(m1) {
  if (!(m1 >= 0 && m1 <= 1)) throw domainError("ellipticKEComplement", "m1", m1);
  if (m1 === 0) return { K: Infinity, E: 1 };
  return pair(1 - m1, m1);
}
function ellipticKEInto(m, m1, out, offset = 0) {
  if (!(m >= 0 && m <= 1)) throw domainError("ellipticKEInto", "m", m);
  if (!(m1 >= 0 && m1 <= 1)) throw domainError("ellipticKEInto", "m1", m1);
  if (!(Math.abs(m + m1 - 1) <= SUM_TOLERANCE)) {
    throw new TanklightInputError(
      [{ path: "m1", message: `must equal 1 \u2212 m to within ${SUM_TOLERANCE} (m = ${m})`, value: m1, expected: "m + m1 = 1" }],
      "ellipticKEInto"
    );
  }
  if (m1 === 0) {
    out[offset] = Infinity;
    out[offset + 1] = 1;
    return;
  }
  agm(m, m1);
  const K = agmK2;
  out[offset] = K;
  if (m1 >= LEGENDRE_BELOW_M1) {
    out[offset + 1] = K * (1 - agmS);
  } else {
    agm(m1, m);
    out[offset + 1] = HALF_PI2 / agmK2 + K * agmS;
  }
}
function ellipticKE(m) {
  if (!(m >= 0 && m <= 1)) throw domainError("ellipticKE", "m", m);
  if (m === 1) return { K: Infinity, E: 1 };
  return pair(m, 1 - m);
}
function ellipticK(m) {
  if (!(m >= 0 && m <= 1)) throw domainError("ellipticK", "m", m);
  if (m === 1) return Infinity;
  agm(m, 1 - m);
  return agmK2;
}
function ellipticE(m) {
  if (!(m >= 0 && m <= 1)) throw domainError("ellipticE", "m", m);
  if (m === 1) return 1;
  return pair(m, 1 - m).E;
}

// lib/em/selfCapacitance.ts
var MEDHURST_TABLE = [
  [0.1, 0.96],
  [0.2, 0.7],
  [0.3, 0.6],
  [0.5, 0.5],
  [0.8, 0.46],
  [1, 0.46],
  [1.5, 0.47],
  [2, 0.5],
  [3, 0.61],
  [4, 0.72],
  [5, 0.81],
  [7, 1.01],
  [10, 1.32],
  [15, 1.86],
  [20, 2.36],
  [30, 3.4],
  [50, 5.8]
];
var ENAMEL_PERMITTIVITY = 3.5;
var FR4_PERMITTIVITY = 4.4;
function medhurstCoefficient(lengthOverDiameter) {
  const x = lengthOverDiameter;
  if (!(Number.isFinite(x) && x > 0)) {
    throw new TanklightInputError([{ path: "lengthOverDiameter", message: "must be a finite number > 0", value: x }], "medhurstCoefficient");
  }
  const T = MEDHURST_TABLE;
  const n = T.length;
  let i = 0;
  while (i < n - 2 && x > T[i + 1][0]) i++;
  const [x0, h0] = T[i];
  const [x1, h1] = T[i + 1];
  const t = Math.log(x / x0) / Math.log(x1 / x0);
  const H = h0 * Math.pow(h1 / h0, t);
  return { H, extrapolated: x < T[0][0] || x > T[n - 1][0] };
}
function turnToTurnCapacitancePerLength(conductorDiameter, outerDiameter, pitch, epsR = ENAMEL_PERMITTIVITY) {
  if (pitch > outerDiameter * 1.02 || outerDiameter <= conductorDiameter) {
    const ratio = Math.max(pitch / Math.max(outerDiameter, conductorDiameter), 1.0001);
    return Math.PI * EPS0 / Math.acosh(ratio);
  }
  const L = Math.log(outerDiameter / conductorDiameter);
  const theta = Math.acos(Math.max(-1, 1 - L / epsR));
  return EPS0 * (epsR * theta / L + 1 / Math.tan(theta / 2) - 1 / Math.tan(Math.PI / 12));
}
function coplanarStripCapacitancePerLength(width, gap, epsR = FR4_PERMITTIVITY) {
  const k = gap / (gap + 2 * width);
  const k2 = k * k;
  return EPS0 * ((1 + epsR) / 2) * (ellipticK(1 - k2) / ellipticK(k2));
}
var ASSUMED_FILM_RATIO = 1.1;
function conductorSizes(c) {
  switch (c.kind) {
    case "round":
      return { d: c.diameter, od: c.outerDiameter > c.diameter * 1.001 ? c.outerDiameter : c.diameter * ASSUMED_FILM_RATIO };
    case "litz":
      return { d: c.outerDiameter * 0.9, od: c.outerDiameter };
    case "trace":
      return { d: c.width, od: c.width };
  }
}
function medhurst(length2, diameter, warnings) {
  const { H, extrapolated } = medhurstCoefficient(length2 / diameter);
  if (extrapolated) {
    warnings.push(`Medhurst's table covers 0.1 \u2264 \u2113/D \u2264 50; \u2113/D = ${(length2 / diameter).toPrecision(3)} is extrapolated`);
  }
  return H * diameter * 1e-10;
}
function selfCapacitanceDetail(coil) {
  const warnings = [];
  const s = coil.shape;
  const { d, od } = conductorSizes(coil.conductor);
  if (coil.conductor.kind === "round" && !(coil.conductor.outerDiameter > coil.conductor.diameter * 1.001)) {
    warnings.push(`wire given without insulation: an enamel film of outer diameter ${ASSUMED_FILM_RATIO} \xD7 bare is assumed for the capacitance`);
  }
  if (s?.kind === "solenoid") {
    const C = medhurst(s.length, 2 * s.radius, warnings);
    return { value: C, model: "medhurst", external: C, internal: 0, warnings };
  }
  if (s?.kind === "roundCoil") {
    if (s.layers <= 1) {
      const C = medhurst(s.windingHeight, 2 * s.meanRadius, warnings);
      return { value: C, model: "medhurst", external: C, internal: 0, warnings };
    }
    const NL = s.layers;
    const rMid = s.meanRadius;
    const cPrime = turnToTurnCapacitancePerLength(d, od, Math.max(s.radialPitch, od));
    const Cll = s.turnsPerLayer * cPrime * 2 * Math.PI * rMid;
    const internal2 = 4 * (NL - 1) / (3 * NL * NL) * Cll;
    const external2 = medhurst(s.windingHeight, 2 * s.outerRadius, warnings);
    warnings.push("multi-layer self-capacitance: Massarini & Kazimierczuk 1997 cell model (formula from memory) with the layer energy method; expect \xB150 %");
    return { value: internal2 + external2, model: "multilayer", external: external2, internal: internal2, warnings };
  }
  const radii = s?.kind === "flatSpiral" ? Array.from({ length: Math.max(1, Math.round(s.turns)) }, (_, i) => s.innerRadius + s.conductorWidth / 2 + (i + 0.5) * s.pitch) : coil.filaments.map((f) => f.kind === "circle" ? f.radius : equivalentRadius(f.points));
  const sorted = [...radii].sort((a, b) => a - b);
  const outer = sorted[sorted.length - 1] ?? 0;
  if (!(outer > 0)) {
    throw new TanklightInputError([{ path: "coil.filaments", message: "a coil needs at least one filament with a size", value: coil.filaments.length }], "selfCapacitance");
  }
  const N = Math.max(coil.turns, 1);
  let internal = 0;
  const isTrace = coil.conductor.kind === "trace";
  for (let i = 1; i < sorted.length; i++) {
    const pitch = sorted[i] - sorted[i - 1];
    if (!(pitch > 0)) continue;
    const rMid = (sorted[i] + sorted[i - 1]) / 2;
    const cPrime = isTrace && coil.conductor.kind === "trace" ? coplanarStripCapacitancePerLength(coil.conductor.width, Math.max(pitch - coil.conductor.width, 1e-6)) : turnToTurnCapacitancePerLength(d, od, Math.max(pitch, od));
    internal += cPrime * 2 * Math.PI * rMid / (N * N);
  }
  const external = 0.96 * 2 * outer * 1e-10;
  warnings.push(
    `self-capacitance of a ${s?.kind ?? "custom"} coil is an estimate (inter-turn energy method + Medhurst at \u2113/D = 0.1), not a published model: expect a factor of 2 either way`
  );
  return { value: internal + external, model: "interTurnEstimate", external, internal, warnings };
}
function equivalentRadius(points) {
  let a = 0;
  for (let k = 0; k < points.length; k++) {
    const p = points[k], q = points[(k + 1) % points.length];
    a += p[0] * q[1] - q[0] * p[1];
  }
  return Math.sqrt(Math.abs(a) / 2 / Math.PI);
}
function selfCapacitance(coil) {
  return selfCapacitanceDetail(coil).value;
}
var srfCache = /* @__PURE__ */ new WeakMap();
function selfResonance(coil) {
  const cached = srfCache.get(coil);
  if (cached !== void 0) return cached;
  const C = selfCapacitance(coil);
  const L0 = selfInductance(coil);
  const f0 = 1 / (2 * Math.PI * Math.sqrt(L0 * C));
  const L1 = selfInductance(coil, { frequency: f0 });
  const f1 = 1 / (2 * Math.PI * Math.sqrt(L1 * C));
  srfCache.set(coil, f1);
  return f1;
}
function selfResonanceWarning(coil, f) {
  const fsr = selfResonance(coil);
  if (f > fsr / 3) {
    return `frequency ${f.toPrecision(4)} Hz is above a third of the coil's estimated self-resonance ${fsr.toPrecision(3)} Hz: the lumped L and R are no longer accurate`;
  }
  return void 0;
}

// lib/math/random.ts
var MASK64 = (1n << 64n) - 1n;
function splitMix64(state) {
  const s = state + 0x9e3779b97f4a7c15n & MASK64;
  let z3 = s;
  z3 = (z3 ^ z3 >> 30n) * 0xbf58476d1ce4e5b9n & MASK64;
  z3 = (z3 ^ z3 >> 27n) * 0x94d049bb133111ebn & MASK64;
  z3 = z3 ^ z3 >> 31n;
  return [s, z3];
}
function createRandom(seed) {
  if (!(Number.isSafeInteger(seed) && seed >= 0)) {
    throw new TanklightInputError(
      [{ path: "seed", message: "must be an integer in [0, 2^53 \u2212 1]", value: seed, expected: "integer \u2265 0" }],
      "createRandom"
    );
  }
  let sm = BigInt(seed);
  const words = new Uint32Array(4);
  for (let i = 0; i < 2; i++) {
    const [next, out] = splitMix64(sm);
    sm = next;
    words[2 * i] = Number(out & 0xffffffffn);
    words[2 * i + 1] = Number(out >> 32n);
  }
  return xoshiro128ss(words[0], words[1], words[2], words[3], seed);
}
function createRandomFromState(state) {
  const ok = state.length === 4 && state.every((w) => Number.isInteger(w) && w >= 0 && w <= 4294967295) && state.some((w) => w !== 0);
  if (!ok) {
    throw new TanklightInputError(
      [{ path: "state", message: "must be four integers in [0, 2^32), not all zero", value: state, expected: "[s0, s1, s2, s3]" }],
      "createRandomFromState"
    );
  }
  return xoshiro128ss(state[0], state[1], state[2], state[3], -1);
}
function xoshiro128ss(w0, w1, w2, w3, seed) {
  let s0 = w0 | 0;
  let s1 = w1 | 0;
  let s2 = w2 | 0;
  let s3 = w3 | 0;
  if ((s0 | s1 | s2 | s3) === 0) s0 = 1;
  let spare = 0;
  let hasSpare = false;
  function nextUint32() {
    const t5 = Math.imul(s1, 5);
    const result = Math.imul(t5 << 7 | t5 >>> 25, 9) >>> 0;
    const t = s1 << 9;
    s2 ^= s0;
    s3 ^= s1;
    s1 ^= s2;
    s0 ^= s3;
    s2 ^= t;
    s3 = s3 << 11 | s3 >>> 21;
    return result;
  }
  function uniform() {
    const a = nextUint32() >>> 5;
    const b = nextUint32() >>> 6;
    return (a * 67108864 + b) / 9007199254740992;
  }
  return {
    seed,
    nextUint32,
    uniform,
    uniformIn(low, high) {
      return low + (high - low) * uniform();
    },
    normal(mean = 0, sd = 1) {
      if (hasSpare) {
        hasSpare = false;
        return mean + sd * spare;
      }
      let u;
      let v;
      let s;
      do {
        u = 2 * uniform() - 1;
        v = 2 * uniform() - 1;
        s = u * u + v * v;
      } while (s >= 1 || s === 0);
      const factor = Math.sqrt(-2 * Math.log(s) / s);
      spare = v * factor;
      hasSpare = true;
      return mean + sd * u * factor;
    }
  };
}

// lib/circuit/loads/led.ts
var DEFAULT_T = 298.15;
var DEFAULT_TEMPCO = -2e-3;
var DEFAULT_LEAKAGE = 1e-12;
function wOfLog(y) {
  if (y < -30) {
    const x = Math.exp(y);
    return x * (1 - x);
  }
  if (y > 1e8) {
    let w2 = y - Math.log(y);
    w2 = y - Math.log(w2);
    return y - Math.log(w2);
  }
  let w;
  if (y < 1.5) {
    const l = Math.log1p(Math.exp(y));
    w = l * (1 - Math.log1p(l) / (2 + l));
  } else {
    const ly = Math.log(y);
    w = y - ly + ly / y;
  }
  for (let k = 0; k < 8; k++) {
    const z3 = y - w - Math.log(w);
    const w1 = 1 + w;
    const q = 2 * w1 * (w1 + 2 / 3 * z3);
    const eps = z3 / w1 * (q - z3) / (q - 2 * z3);
    w *= 1 + eps;
    if (Math.abs(eps) < 1e-4) break;
  }
  return w;
}
function junctionW(v, lnIs, is, nvt, rs) {
  return wOfLog(lnIs + Math.log(rs / nvt) + (v + is * rs) / nvt);
}
function checkPositive(x, field, unit2, where) {
  if (typeof x !== "number" || !Number.isFinite(x) || x <= 0) {
    throw new TanklightInputError(
      [{ path: field, message: `must be a finite number > 0 ${unit2}`, value: x, expected: `> 0 ${unit2}` }],
      where
    );
  }
  return x;
}
function fitShockley(points, temperature2 = DEFAULT_T, idealityFactor = 2, where = "fitShockley") {
  if (!Array.isArray(points) || points.length < 2 || points.length > 3) {
    throw new TanklightInputError(
      [{ path: "points", message: "must hold two or three (current, voltage) points", value: points, expected: "2 or 3 points" }],
      where
    );
  }
  points.forEach((p, k) => {
    checkPositive(p?.current, `points[${k}].current`, "A", where);
    checkPositive(p?.voltage, `points[${k}].voltage`, "V", where);
  });
  const sorted = [...points].sort((a, b) => a.current - b.current);
  for (let k = 1; k < sorted.length; k++) {
    if (!(sorted[k].current > sorted[k - 1].current) || !(sorted[k].voltage > sorted[k - 1].voltage)) {
      throw new TanklightInputError(
        [{ path: "points", message: "voltage must rise with current and the currents must differ", value: points, expected: "increasing (current, voltage)" }],
        where
      );
    }
  }
  const vt = thermalVoltage(temperature2);
  let x;
  if (sorted.length === 3) {
    const A = sorted.map((p) => [Math.log(p.current), 1, p.current]);
    const rhs = sorted.map((p) => p.voltage);
    const s = solve3(A, rhs);
    const a = s[0];
    x = [-s[1] / a, a / vt, s[2]];
  } else {
    const a = idealityFactor * vt;
    const [p02, p12] = [sorted[0], sorted[1]];
    const r2 = (p12.voltage - p02.voltage - a * Math.log(p12.current / p02.current)) / (p12.current - p02.current);
    x = [(p02.current * r2 + a * Math.log(p02.current) - p02.voltage) / a, idealityFactor, r2];
  }
  const free = sorted.length === 3 ? [0, 1, 2] : [0, 2];
  for (let it = 0; it < 30; it++) {
    const [lnIs2, n2, r2] = x;
    const is = Math.exp(lnIs2);
    const res = [];
    const J = [];
    for (const p of sorted) {
      const u = Math.log1p(p.current / is);
      res.push(n2 * vt * u + p.current * r2 - p.voltage);
      const dIs = n2 * vt * (-p.current / is) / (1 + p.current / is);
      J.push([dIs, vt * u, p.current]);
    }
    const Jr = J.map((row) => free.map((c) => row[c]));
    const step = free.length === 3 ? solve3(Jr, res) : solve2(Jr, res);
    let maxStep = 0;
    free.forEach((c, k) => {
      x[c] = x[c] - step[k];
      maxStep = Math.max(maxStep, Math.abs(step[k]) / Math.max(1, Math.abs(x[c])));
    });
    if (maxStep < 1e-15) break;
  }
  const [lnIs, n, r] = x;
  if (!(n > 0) || !Number.isFinite(n) || !(r > 0) || !Number.isFinite(lnIs)) {
    throw new TanklightInputError(
      [{
        path: "points",
        message: `these points imply n = ${n.toPrecision(4)}, r_s = ${r.toPrecision(4)} \u03A9; a Shockley junction needs n > 0 and r_s > 0 (check the points, or give two points and an ideality factor)`,
        value: points,
        expected: "points of a real diode"
      }],
      where
    );
  }
  return { saturationCurrent: Math.exp(lnIs), idealityFactor: n, seriesResistance: r };
}
function solve3(A, b) {
  const M = A.map((row, i) => [...row, b[i]]);
  for (let c = 0; c < 3; c++) {
    let p = c;
    for (let r = c + 1; r < 3; r++) if (Math.abs(M[r][c]) > Math.abs(M[p][c])) p = r;
    [M[c], M[p]] = [M[p], M[c]];
    for (let r = c + 1; r < 3; r++) {
      const f = M[r][c] / M[c][c];
      for (let k = c; k < 4; k++) M[r][k] = M[r][k] - f * M[c][k];
    }
  }
  const xs = [0, 0, 0];
  for (let r = 2; r >= 0; r--) {
    let s = M[r][3];
    for (let k = r + 1; k < 3; k++) s -= M[r][k] * xs[k];
    xs[r] = s / M[r][r];
  }
  return xs;
}
function solve2(A, b) {
  const [a, c] = A[0];
  const [d, e] = A[1];
  const det = a * e - c * d;
  return [(b[0] * e - c * b[1]) / det, (a * b[1] - d * b[0]) / det];
}
function resolveSpec(spec, where) {
  if (spec === null || typeof spec !== "object") {
    throw new TanklightInputError([{ path: "spec", message: "must be an object", value: spec }], where);
  }
  const tRef = spec.referenceTemperature ?? DEFAULT_T;
  checkPositive(tRef, "referenceTemperature", "K", where);
  if ("points" in spec && spec.points !== void 0) {
    if (spec.idealityFactor !== void 0) checkPositive(spec.idealityFactor, "idealityFactor", "", where);
    return { p: fitShockley(spec.points, tRef, spec.idealityFactor ?? 2, where), points: spec.points };
  }
  const s = spec;
  checkPositive(s.saturationCurrent, "saturationCurrent", "A", where);
  checkPositive(s.idealityFactor, "idealityFactor", "", where);
  checkPositive(s.seriesResistance, "seriesResistance", "\u03A9", where);
  return { p: { saturationCurrent: s.saturationCurrent, idealityFactor: s.idealityFactor, seriesResistance: s.seriesResistance } };
}
function makeJunction(spec, where, defaultLabel, defaultSource) {
  const { p, points } = resolveSpec(spec, where);
  const tRef = spec.referenceTemperature ?? DEFAULT_T;
  const temperature2 = spec.temperature ?? tRef;
  checkPositive(temperature2, "temperature", "K", where);
  const tc = spec.temperatureCoefficient ?? DEFAULT_TEMPCO;
  requireFinite(tc, "temperatureCoefficient", "V/K", where);
  const leakage = spec.leakage ?? DEFAULT_LEAKAGE;
  if (!(Number.isFinite(leakage) && leakage >= 0)) {
    throw new TanklightInputError([{ path: "leakage", message: "must be a finite number \u2265 0 S", value: leakage }], where);
  }
  const n = p.idealityFactor;
  const rs = p.seriesResistance;
  let is = p.saturationCurrent;
  const vtRef = thermalVoltage(tRef);
  const vt = thermalVoltage(temperature2);
  const iRef = spec.referenceCurrent ?? (points ? Math.max(...points.map((q) => q.current)) : 0.02);
  checkPositive(iRef, "referenceCurrent", "A", where);
  if (temperature2 !== tRef) {
    const vfRef = n * vtRef * Math.log1p(iRef / is) + iRef * rs;
    const vf = vfRef + tc * (temperature2 - tRef);
    const junctionDrop = vf - iRef * rs;
    if (!(junctionDrop > 0)) {
      throw new TanklightInputError(
        [{ path: "temperature", message: "moves the forward voltage below the series-resistance drop; outside the model", value: temperature2 }],
        where
      );
    }
    is = iRef / Math.expm1(junctionDrop / (n * vt));
  }
  const nvt = n * vt;
  const lnIs = Math.log(is);
  const current2 = (v) => {
    const w = junctionW(v, lnIs, is, nvt, rs);
    return nvt / rs * w - is + leakage * v;
  };
  const conductance2 = (v) => {
    const w = junctionW(v, lnIs, is, nvt, rs);
    return w / (rs * (1 + w)) + leakage;
  };
  const voltage2 = (i) => {
    requireFinite(i, "i", "A", `${where}.voltage`);
    let v = i > -is * (1 - 1e-9) ? nvt * Math.log1p(i / is) + i * rs : leakage > 0 ? (i + is) / leakage : -Infinity;
    if (!Number.isFinite(v)) {
      throw new TanklightInputError(
        [{ path: "i", message: `a junction without leakage cannot carry less than \u2212I_s = ${-is} A`, value: i }],
        `${where}.voltage`
      );
    }
    for (let k = 0; k < 50; k++) {
      const dv = (current2(v) - i) / conductance2(v);
      v -= dv;
      if (Math.abs(dv) <= 1e-15 * Math.max(1, Math.abs(v))) break;
    }
    return v;
  };
  return {
    label: spec.label ?? defaultLabel,
    source: spec.source ?? (points ? "fitted to the given forward points" : defaultSource),
    is,
    n,
    rs,
    temperature: temperature2,
    thermalVoltage: vt,
    leakage,
    ...points ? { points } : {},
    current: current2,
    conductance: conductance2,
    voltage: voltage2
  };
}
function led(spec) {
  const j = makeJunction(spec, "led", spec?.colour ? `${spec.colour} LED` : "LED", "Shockley parameters given by the caller");
  const ratedCurrent = spec.ratedCurrent ?? 0.02;
  checkPositive(ratedCurrent, "ratedCurrent", "A", "led");
  return { kind: "led", ...j, ...spec.colour ? { colour: spec.colour } : {}, ratedCurrent };
}
function diode(spec) {
  const j = makeJunction(spec, "diode", "diode", "Shockley parameters given by the caller");
  return { kind: "diode", ...j };
}

// lib/circuit/loads/halfWave.ts
var JunctionBranch = class {
  nvt;
  rs;
  is;
  lnIs;
  /** ln of the W argument at u = 0: ln(I_s·r/nV_T) + I_s·r/nV_T */
  y0;
  invNvt;
  i = 0;
  g = 0;
  constructor(is, nvt, rs) {
    this.is = is;
    this.nvt = nvt;
    this.rs = rs;
    this.lnIs = Math.log(is);
    this.y0 = this.lnIs + Math.log(rs / nvt) + is * rs / nvt;
    this.invNvt = 1 / nvt;
  }
  evalAt(u) {
    const w = wOfLog(this.y0 + u * this.invNvt);
    this.i = this.nvt / this.rs * w;
    this.g = w / (this.rs * (1 + w));
  }
  voltageAt(current2) {
    return this.nvt * (Math.log(current2) - this.lnIs) + (current2 - this.is) * this.rs;
  }
  singularVoltage() {
    return this.nvt * (-1 - this.lnIs - Math.log(this.rs / this.nvt)) - this.is * this.rs;
  }
};
var StringBranch = class {
  nvt;
  rs;
  a1;
  i1;
  a2;
  i2;
  lnIeff;
  ieff;
  i = 0;
  g = 0;
  constructor(a1, i1, a2, i2, r) {
    this.a1 = a1;
    this.i1 = i1;
    this.a2 = a2;
    this.i2 = i2;
    this.rs = r;
    this.nvt = a1 + a2;
    this.lnIeff = (a1 * Math.log(i1) + a2 * Math.log(i2)) / (a1 + a2);
    this.ieff = Math.exp(this.lnIeff);
  }
  singularVoltage() {
    return this.nvt * (-1 - this.lnIeff - Math.log(this.rs / this.nvt)) - this.ieff * this.rs;
  }
  voltageAt(i) {
    return this.a1 * Math.log1p(i / this.i1) + this.a2 * Math.log1p(i / this.i2) + this.rs * i;
  }
  evalAt(u) {
    if (u <= 0) {
      this.i = 0;
      this.g = 1 / (this.a1 / this.i1 + this.a2 / this.i2 + this.rs);
      return;
    }
    const w = wOfLog(this.lnIeff + Math.log(this.rs / this.nvt) + (u + this.ieff * this.rs) / this.nvt);
    let i = Math.max(0, this.nvt / this.rs * w - this.ieff);
    let dvdi = 1;
    for (let k = 0; k < 30; k++) {
      const f = this.voltageAt(i) - u;
      dvdi = this.a1 / (this.i1 + i) + this.a2 / (this.i2 + i) + this.rs;
      let next = i - f / dvdi;
      if (next < 0) next = 0.5 * i;
      const done = Math.abs(next - i) <= 1e-15 * Math.max(i, 1e-300) + 1e-300;
      i = next;
      if (done) break;
    }
    this.i = i;
    this.g = 1 / (this.a1 / (this.i1 + i) + this.a2 / (this.i2 + i) + this.rs);
  }
};
var TAIL_FRACTION = 1e-14;
var GRADING = 4;
var FIRST_PANEL = 2;
var NODES = 12;
function halfWaveIntegrals(br, A, offset, out) {
  for (let k = 0; k < 6; k++) out[k] = 0;
  const up = A - offset;
  br.evalAt(up);
  const ip = br.i;
  out[5] = ip;
  if (!(ip > 0)) return;
  const uLow = br.voltageAt(TAIL_FRACTION * ip);
  const thLow = angleOf((uLow + offset) / A);
  const half = Math.PI / 2;
  const zr = (br.singularVoltage() + offset) / A;
  const zi = Math.PI * br.nvt / A;
  complexAsin(zr, zi);
  const centre = Math.min(half, Math.max(thLow, asinRe));
  const d = Math.max(Math.min(Math.abs(asinIm), Math.sqrt(br.nvt / A)), 1e-12);
  let right = centre;
  let width = FIRST_PANEL * d;
  while (right > thLow) {
    let left2 = right - width;
    if (left2 - thLow < width) left2 = thLow;
    panel(br, A, offset, left2, right, out);
    right = left2;
    width *= GRADING;
  }
  let left = centre;
  width = FIRST_PANEL * d;
  while (left < half) {
    let r = left + width;
    if (half - r < width) r = half;
    panel(br, A, offset, left, r, out);
    left = r;
    width *= GRADING;
  }
  for (let k = 0; k < 5; k++) out[k] = 2 * out[k];
}
var asinRe = 0;
var asinIm = 0;
function complexAsin(x, y) {
  const wr = 1 - (x * x - y * y);
  const wi = -2 * x * y;
  const m = Math.hypot(wr, wi);
  const sr = Math.sqrt(Math.max(0, (m + wr) / 2));
  const si = (wi < 0 ? -1 : 1) * Math.sqrt(Math.max(0, (m - wr) / 2));
  const ar = sr - y;
  const ai = x + si;
  asinRe = Math.atan2(ai, ar);
  asinIm = -Math.log(Math.hypot(ar, ai));
}
function angleOf(s) {
  if (s <= 0) return 0;
  if (s >= 1) return Math.PI / 2;
  return Math.asin(s);
}
function panel(br, A, offset, a, b, out) {
  if (!(b > a)) return;
  const { nodes, weights } = gaussLegendre(NODES);
  const h = 0.5 * (b - a);
  const m = 0.5 * (a + b);
  let s1 = 0, s0 = 0, g2 = 0, g1 = 0, g0 = 0;
  for (let k = 0; k < NODES; k++) {
    const th = m + h * nodes[k];
    const s = Math.sin(th);
    br.evalAt(A * s - offset);
    const w = weights[k];
    const i = br.i;
    const g = br.g;
    s1 += w * i * s;
    s0 += w * i;
    g2 += w * g * s * s;
    g1 += w * g * s;
    g0 += w * g;
  }
  out[0] = out[0] + h * s1;
  out[1] = out[1] + h * s0;
  out[2] = out[2] + h * g2;
  out[3] = out[3] + h * g1;
  out[4] = out[4] + h * g0;
}
function reverseHalfIntegrals(br, A, out) {
  const { nodes, weights } = gaussLegendre(16);
  const h = Math.PI / 4;
  let s1 = 0, s0 = 0, g2 = 0;
  for (let k = 0; k < 16; k++) {
    const th = h + h * nodes[k];
    const s = Math.sin(th);
    br.evalAt(-A * s);
    const w = weights[k];
    s1 += w * br.i * s;
    s0 += w * br.i;
    g2 += w * br.g * s * s;
  }
  out[0] = 2 * h * s1;
  out[1] = 2 * h * s0;
  out[2] = 2 * h * g2;
}

// lib/circuit/loads/rectifier.ts
var branchCache = /* @__PURE__ */ new WeakMap();
function bridgeBranch(diode2, led2, seriesResistance = 0) {
  return new StringBranch(
    2 * diode2.n * diode2.thermalVoltage,
    diode2.is,
    led2.n * led2.thermalVoltage,
    led2.is,
    2 * diode2.rs + led2.rs + seriesResistance
  );
}
function cachedBranch(key, make) {
  const hit = branchCache.get(key);
  if (hit) return hit;
  const b = make();
  branchCache.set(key, b);
  return b;
}
var scratch2 = new Float64Array(6);
function reservoirSteadyState(diode2, led2, amplitude, seriesResistance = 0, capacitance2, frequency2, branch) {
  const where = "reservoirSteadyState";
  if (!(Number.isFinite(amplitude) && amplitude >= 0)) {
    throw new TanklightInputError([{ path: "amplitude", message: "must be a finite number \u2265 0 V", value: amplitude }], where);
  }
  if (!(Number.isFinite(seriesResistance) && seriesResistance >= 0)) {
    throw new TanklightInputError([{ path: "seriesResistance", message: "must be a finite number \u2265 0 \u03A9", value: seriesResistance }], where);
  }
  const br = branch ?? new JunctionBranch(diode2.is, diode2.n * diode2.thermalVoltage, diode2.rs + seriesResistance);
  const gl = diode2.leakage;
  if (amplitude === 0) {
    return { reservoirVoltage: 0, ledCurrent: 0, fundamentalCurrent: 0, peakDiodeCurrent: 0, slope: diode2.conductance(0), warnings: [] };
  }
  const A = amplitude;
  const h = (V2) => {
    halfWaveIntegrals(br, A, V2, scratch2);
    return scratch2[1] / (2 * Math.PI) - diode2.is - gl * V2 - led2.current(V2);
  };
  let lo = 0;
  let hi = A;
  let V = 0.5 * A;
  let hv = h(V);
  for (let it = 0; it < 100; it++) {
    if (hv > 0) lo = V;
    else hi = V;
    const dh = -scratch2[4] / (2 * Math.PI) - gl - led2.conductance(V);
    let next = V - hv / dh;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - V) <= 1e-13 * A || hi - lo <= 1e-14 * A) {
      V = next;
      hv = h(V);
      break;
    }
    V = next;
    hv = h(V);
  }
  const i1 = scratch2[0] / Math.PI + gl * A;
  const ledCurrent = led2.current(V);
  const dAvgdA = scratch2[3] / (2 * Math.PI);
  const dAvgdV = scratch2[4] / (2 * Math.PI) + gl + led2.conductance(V);
  const dV = dAvgdA / dAvgdV;
  const slope = (scratch2[2] - dV * scratch2[3]) / Math.PI + gl;
  const warnings = [];
  let ripple;
  if (capacitance2 !== void 0 && frequency2 !== void 0) {
    ripple = ledCurrent / (frequency2 * capacitance2);
    if (ripple > 0.1 * V) {
      warnings.push(
        `reservoir ripple \u2248 ${ripple.toPrecision(3)} V is more than 10 % of the reservoir voltage ${V.toPrecision(3)} V: the large-capacitor charge balance overstates the steadiness; use a larger capacitor or the transient engine`
      );
    }
  }
  return {
    reservoirVoltage: V,
    ledCurrent,
    fundamentalCurrent: i1,
    peakDiodeCurrent: scratch2[5],
    slope,
    ...ripple !== void 0 ? { ripple } : {},
    warnings
  };
}
function currentFedBridge(diode2, loadResistance, currentAmplitude) {
  requirePositive(loadResistance, "loadResistance", "\u03A9", "currentFedBridge");
  requirePositive(currentAmplitude, "currentAmplitude", "A", "currentFedBridge");
  const vo = loadResistance * 2 * currentAmplitude / Math.PI;
  const r = integrateAdaptive((th) => {
    const s = Math.sin(th);
    return (vo + 2 * diode2.voltage(currentAmplitude * s)) * s;
  }, 0, Math.PI, { absTol: 0, relTol: 1e-12 });
  const v1 = 2 / Math.PI * r.value;
  return { outputVoltage: vo, fundamentalVoltage: v1, equivalentResistance: v1 / currentAmplitude };
}
function steigerwaldEquivalentResistance(loadResistance, filter) {
  requirePositive(loadResistance, "loadResistance", "\u03A9", "steigerwaldEquivalentResistance");
  if (filter === "capacitor") return 8 * loadResistance / (Math.PI * Math.PI);
  if (filter === "inductor") return Math.PI * Math.PI * loadResistance / 8;
  throw new TanklightInputError([{ path: "filter", message: "must be 'capacitor' or 'inductor'", value: filter }], "steigerwaldEquivalentResistance");
}

// lib/circuit/loads/describingFunction.ts
var fwd = new Float64Array(6);
var rev = new Float64Array(6);
function junctionBranch(j) {
  return cachedBranch(j, () => new JunctionBranch(j.is, j.n * j.thermalVoltage, j.rs));
}
function evalJunction(j, A, r) {
  if (r.j === j && r.A === A) return;
  const br = junctionBranch(j);
  halfWaveIntegrals(br, A, 0, fwd);
  reverseHalfIntegrals(br, A, rev);
  r.i1 = fwd[0] - rev[0];
  r.slope = fwd[2] + rev[2];
  r.avg = (fwd[1] + rev[1]) / (2 * Math.PI) - j.is;
  r.peak = fwd[5] - j.is + j.leakage * A;
  r.j = j;
  r.A = A;
}
var ra = { j: null, A: NaN, i1: 0, slope: 0, avg: 0, peak: 0 };
var rb = { j: null, A: NaN, i1: 0, slope: 0, avg: 0, peak: 0 };
function checkAmplitude(amplitude, where) {
  if (!(typeof amplitude === "number" && Number.isFinite(amplitude) && amplitude >= 0)) {
    throw new TanklightInputError(
      [{ path: "amplitude", message: "must be a finite number \u2265 0 V (peak)", value: amplitude, expected: "\u2265 0 V" }],
      where
    );
  }
}
function badLoad(path, message, value, where) {
  throw new TanklightInputError([{ path, message, value }], where);
}
function isJunction(j) {
  const x = j;
  return !!x && typeof x.is === "number" && x.is > 0 && typeof x.rs === "number" && x.rs > 0 && typeof x.n === "number" && x.n > 0 && typeof x.thermalVoltage === "number";
}
function checkLoad(load, where) {
  if (load === null || typeof load !== "object" || typeof load.kind !== "string") {
    badLoad("load", "must be a TokenLoad object with a kind", load, where);
  }
  switch (load.kind) {
    case "resistor":
      if (!(typeof load.resistance === "number" && Number.isFinite(load.resistance) && load.resistance > 0)) badLoad("load.resistance", "must be a finite number > 0 \u03A9", load.resistance, where);
      return;
    case "led":
      if (!isJunction(load.led)) badLoad("load.led", "must be an LED from led()/ledPreset()", load.led, where);
      return;
    case "antiParallel":
    case "parallelSameDirection":
      if (!isJunction(load.a)) badLoad("load.a", "must be an LED from led()/ledPreset()", load.a, where);
      if (!isJunction(load.b)) badLoad("load.b", "must be an LED from led()/ledPreset()", load.b, where);
      return;
    case "bridge":
    case "halfWaveReservoir":
      if (!isJunction(load.diode)) badLoad("load.diode", "must be a diode from diode()/diodePreset()", load.diode, where);
      if (!isJunction(load.led)) badLoad("load.led", "must be an LED from led()/ledPreset()", load.led, where);
      if (load.seriesResistance !== void 0 && !(Number.isFinite(load.seriesResistance) && load.seriesResistance >= 0)) {
        badLoad("load.seriesResistance", "must be a finite number \u2265 0 \u03A9", load.seriesResistance, where);
      }
      return;
    default:
      return;
  }
}
var resp = { current: 0, slope: 0 };
function fundamentalInto(load, A, where) {
  switch (load.kind) {
    case "resistor": {
      const g = 1 / load.resistance;
      resp.current = g * A;
      resp.slope = g;
      return;
    }
    case "led": {
      const l = load.led;
      if (A === 0) {
        resp.current = 0;
        resp.slope = l.conductance(0);
        return;
      }
      evalJunction(l, A, ra);
      resp.current = ra.i1 / Math.PI + l.leakage * A;
      resp.slope = ra.slope / Math.PI + l.leakage;
      return;
    }
    case "antiParallel":
    case "parallelSameDirection": {
      if (A === 0) {
        resp.current = 0;
        resp.slope = load.a.conductance(0) + load.b.conductance(0);
        return;
      }
      evalJunction(load.a, A, ra);
      evalJunction(load.b, A, rb);
      resp.current = (ra.i1 + rb.i1) / Math.PI + (load.a.leakage + load.b.leakage) * A;
      resp.slope = (ra.slope + rb.slope) / Math.PI + load.a.leakage + load.b.leakage;
      return;
    }
    case "bridge": {
      const br = bridgeOf(load);
      if (A === 0) {
        br.evalAt(0);
        resp.current = 0;
        resp.slope = br.g;
        return;
      }
      halfWaveIntegrals(br, A, 0, fwd);
      resp.current = 2 * fwd[0] / Math.PI;
      resp.slope = 2 * fwd[2] / Math.PI;
      return;
    }
    case "halfWaveReservoir": {
      const st = reservoirSteadyState(load.diode, load.led, A, load.seriesResistance ?? 0, void 0, void 0, reservoirBranch(load));
      resp.current = st.fundamentalCurrent;
      resp.slope = st.slope;
      return;
    }
    default: {
      const kind = load.kind;
      throw new TanklightInputError([{ path: "load.kind", message: "is not a known token load", value: kind }], where);
    }
  }
}
function bridgeOf(load) {
  return cachedBranch(load, () => bridgeBranch(load.diode, load.led, load.seriesResistance ?? 0));
}
function reservoirBranch(load) {
  return cachedBranch(
    load,
    () => new JunctionBranch(load.diode.is, load.diode.n * load.diode.thermalVoltage, load.diode.rs + (load.seriesResistance ?? 0))
  );
}
function fundamentalConductance(load, amplitude) {
  checkLoad(load, "fundamentalConductance");
  checkAmplitude(amplitude, "fundamentalConductance");
  fundamentalInto(load, amplitude, "fundamentalConductance");
  return amplitude === 0 ? resp.slope : resp.current / amplitude;
}
function fundamentalCurrentSlope(load, amplitude) {
  checkLoad(load, "fundamentalCurrentSlope");
  checkAmplitude(amplitude, "fundamentalCurrentSlope");
  fundamentalInto(load, amplitude, "fundamentalCurrentSlope");
  return resp.slope;
}
function loadResponse(load, amplitude) {
  checkLoad(load, "loadResponse");
  checkAmplitude(amplitude, "loadResponse");
  fundamentalInto(load, amplitude, "loadResponse");
  return { current: resp.current, slope: resp.slope };
}
function ledEntry(role, l, avg, peak) {
  return { role, label: l.label, current: avg, peakCurrent: peak, relativeBrightness: avg / l.ratedCurrent };
}
function averageLoadCurrent(load, amplitude) {
  const where = "averageLoadCurrent";
  checkLoad(load, where);
  checkAmplitude(amplitude, where);
  const A = amplitude;
  switch (load.kind) {
    case "resistor":
      return [];
    case "led": {
      if (A === 0) return [ledEntry("led", load.led, 0, 0)];
      evalJunction(load.led, A, ra);
      return [ledEntry("led", load.led, ra.avg, ra.peak)];
    }
    case "antiParallel":
    case "parallelSameDirection": {
      if (A === 0) return [ledEntry("a", load.a, 0, 0), ledEntry("b", load.b, 0, 0)];
      evalJunction(load.a, A, ra);
      evalJunction(load.b, A, rb);
      return [ledEntry("a", load.a, ra.avg, ra.peak), ledEntry("b", load.b, rb.avg, rb.peak)];
    }
    case "bridge": {
      if (A === 0) return [ledEntry("led", load.led, 0, 0)];
      const br = bridgeOf(load);
      halfWaveIntegrals(br, A, 0, fwd);
      return [ledEntry("led", load.led, fwd[1] / Math.PI, fwd[5])];
    }
    case "halfWaveReservoir": {
      const st = reservoirSteadyState(load.diode, load.led, A, load.seriesResistance ?? 0, void 0, void 0, reservoirBranch(load));
      return [ledEntry("led", load.led, st.ledCurrent, st.ledCurrent)];
    }
    default: {
      const kind = load.kind;
      throw new TanklightInputError([{ path: "load.kind", message: "is not a known token load", value: kind }], where);
    }
  }
}
function describingFunctionReference(current2, amplitude, relTol = 1e-12) {
  checkAmplitude(amplitude, "describingFunctionReference");
  const A = amplitude;
  const opts = { absTol: 0, relTol, maxIntervals: 2e4 };
  const parts = [0, Math.PI / 2, Math.PI, 3 * Math.PI / 2, 2 * Math.PI];
  let s = 0, c = 0, a = 0;
  for (let k = 0; k < 4; k++) {
    const lo = parts[k];
    const hi = parts[k + 1];
    s += integrateAdaptive((th) => current2(A * Math.sin(th)) * Math.sin(th), lo, hi, opts).value;
    c += integrateAdaptive((th) => current2(A * Math.sin(th)) * Math.cos(th), lo, hi, opts).value;
    a += integrateAdaptive((th) => current2(A * Math.sin(th)), lo, hi, opts).value;
  }
  return { inPhase: s / Math.PI, quadrature: c / Math.PI, average: a / (2 * Math.PI) };
}

// lib/circuit/link/tokenLoad.ts
var tables = /* @__PURE__ */ new WeakMap();
function buildTable(load, maxA, h) {
  const n = Math.ceil(maxA / h);
  const y = new Float64Array(n);
  const d = new Float64Array(n);
  const first = averageLoadCurrent(load, h);
  const avg = first.map(() => new Float64Array(n));
  const brightness = first.map(() => new Float64Array(n));
  for (let j = 0; j < n; j++) {
    const a = (j + 1) * h;
    const i1 = fundamentalConductance(load, a) * a;
    const s = fundamentalCurrentSlope(load, a);
    y[j] = Math.log(i1 / a);
    d[j] = s / i1 - 1 / a;
    averageLoadCurrent(load, a).forEach((e, k) => {
      avg[k][j] = e.current;
      brightness[k][j] = e.relativeBrightness;
    });
  }
  return { h, n, y, d, avg, labels: first.map((e) => e.label), brightness };
}
function tokenLoadModel(load, options = {}) {
  const label = loadLabel(load);
  const exact = {
    label,
    linear: load.kind === "resistor",
    conductance: (amplitude) => fundamentalConductance(load, amplitude),
    ledCurrents: (amplitude) => averageLoadCurrent(load, amplitude).map((e) => ({ label: e.label, current: e.current, relativeBrightness: e.relativeBrightness }))
  };
  if (!options.tabulate || load.kind === "resistor") return exact;
  const maxA = options.maxAmplitude ?? 12;
  const h = options.step ?? 5e-3;
  if (!(maxA > 0 && Number.isFinite(maxA)) || !(h > 0 && h < maxA)) {
    throw new TanklightInputError([{ path: "options", message: "need maxAmplitude > step > 0 V", value: options }], "tokenLoadModel");
  }
  const key = `${maxA}|${h}`;
  let byKey = tables.get(load);
  if (!byKey) {
    byKey = /* @__PURE__ */ new Map();
    tables.set(load, byKey);
  }
  let t = byKey.get(key);
  if (!t) {
    t = buildTable(load, maxA, h);
    byKey.set(key, t);
  }
  const tab = t;
  const top = tab.n * h;
  return {
    label,
    conductance(a) {
      if (!(a >= h && a < top)) return fundamentalConductance(load, a);
      const u = a / h - 1;
      const j = Math.min(Math.floor(u), tab.n - 2);
      const s = u - j;
      const s2 = s * s;
      const s3 = s2 * s;
      const y0 = tab.y[j];
      const y1 = tab.y[j + 1];
      const lnG = (2 * s3 - 3 * s2 + 1) * y0 + (s3 - 2 * s2 + s) * h * tab.d[j] + (-2 * s3 + 3 * s2) * y1 + (s3 - s2) * h * tab.d[j + 1];
      return Math.exp(lnG);
    },
    ledCurrents(a) {
      if (!(a >= h && a < top)) return exact.ledCurrents(a);
      const u = a / h - 1;
      const j = Math.min(Math.floor(u), tab.n - 2);
      const s = u - j;
      return tab.labels.map((lab, k) => {
        const p = tab.avg[k];
        const b = tab.brightness[k];
        const c0 = p[j];
        const c1 = p[j + 1];
        const cur = c0 > 0 && c1 > 0 ? Math.exp((1 - s) * Math.log(c0) + s * Math.log(c1)) : (1 - s) * c0 + s * c1;
        const scale = c0 !== 0 ? b[j] / c0 : 0;
        return { label: lab, current: cur, relativeBrightness: scale !== 0 ? cur * scale : (1 - s) * b[j] + s * b[j + 1] };
      });
    }
  };
}
function loadLabel(load) {
  switch (load.kind) {
    case "resistor":
      return `resistor ${load.resistance} \u03A9`;
    case "led":
      return load.led.label ?? "LED";
    case "antiParallel":
      return `anti-parallel ${load.a.label ?? "LED"} + ${load.b.label ?? "LED"}`;
    case "parallelSameDirection":
      return `parallel ${load.a.label ?? "LED"} + ${load.b.label ?? "LED"}`;
    case "bridge":
      return `bridge + ${load.led.label ?? "LED"}`;
    case "halfWaveReservoir":
      return `half-wave reservoir + ${load.led.label ?? "LED"}`;
    default:
      return "load";
  }
}

// lib/math/lu.ts
var LU_PIVOT_RTOL = 4 * Number.EPSILON;
var SingularMatrixError = class extends TanklightInputError {
  /** 0-based column (and elimination step) whose pivot vanished */
  pivotIndex;
  constructor(pivotIndex, pivot, where) {
    super(
      [
        {
          path: `matrix column ${pivotIndex}`,
          message: "matrix is singular (zero pivot at this column)",
          value: pivot,
          expected: "a non-zero pivot"
        }
      ],
      where
    );
    this.name = "SingularMatrixError";
    this.pivotIndex = pivotIndex;
  }
};
function checkDims(a, n, where) {
  if (!(Number.isInteger(n) && n >= 1)) {
    throw new TanklightInputError([{ path: "n", message: "must be an integer \u2265 1", value: n }], where);
  }
  if (a.length < n * n) {
    throw new TanklightInputError(
      [{ path: "a.length", message: `must be \u2265 n\xB2 = ${n * n}`, value: a.length }],
      where
    );
  }
}
function luFactor(a, n, pivots) {
  checkDims(a, n, "luFactor");
  if (pivots.length < n) {
    throw new TanklightInputError([{ path: "pivots.length", message: `must be \u2265 n = ${n}`, value: pivots.length }], "luFactor");
  }
  for (let i = 0; i < n * n; i++) {
    if (!Number.isFinite(a[i])) {
      throw new TanklightInputError(
        [{ path: `matrix[${Math.floor(i / n)}][${i % n}]`, message: "entries must be finite", value: a[i] }],
        "luFactor"
      );
    }
  }
  for (let k = 0; k < n; k++) {
    let p = k;
    let big = Math.abs(a[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]);
      if (v > big) {
        big = v;
        p = i;
      }
    }
    let scale = big;
    for (let i = 0; i < k; i++) scale = Math.max(scale, Math.abs(a[i * n + k]));
    if (big === 0 || big <= LU_PIVOT_RTOL * n * scale) {
      throw new SingularMatrixError(k, big, "luFactor");
    }
    pivots[k] = p;
    if (p !== k) {
      const rk2 = k * n;
      const rp = p * n;
      for (let j = 0; j < n; j++) {
        const t = a[rk2 + j];
        a[rk2 + j] = a[rp + j];
        a[rp + j] = t;
      }
    }
    const rk = k * n;
    const inv = 1 / a[rk + k];
    for (let i = k + 1; i < n; i++) {
      const ri = i * n;
      const l = a[ri + k] * inv;
      a[ri + k] = l;
      if (l !== 0) {
        for (let j = k + 1; j < n; j++) a[ri + j] = a[ri + j] - l * a[rk + j];
      }
    }
  }
}
function luSolve(a, n, pivots, b) {
  checkDims(a, n, "luSolve");
  if (b.length < n) {
    throw new TanklightInputError([{ path: "b.length", message: `must be \u2265 n = ${n}`, value: b.length }], "luSolve");
  }
  for (let k = 0; k < n; k++) {
    const p = pivots[k];
    if (p !== k) {
      const t = b[k];
      b[k] = b[p];
      b[p] = t;
    }
  }
  for (let i = 1; i < n; i++) {
    const ri = i * n;
    let s = b[i];
    for (let j = 0; j < i; j++) s -= a[ri + j] * b[j];
    b[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    const ri = i * n;
    let s = b[i];
    for (let j = i + 1; j < n; j++) s -= a[ri + j] * b[j];
    b[i] = s / a[ri + i];
  }
}
function solveLinear(a, b) {
  const n = b.length;
  if (a.length !== n * n) {
    throw new TanklightInputError(
      [{ path: "a.length", message: `must equal b.length\xB2 = ${n * n}`, value: a.length }],
      "solveLinear"
    );
  }
  const lu = Float64Array.from(a);
  const x = Float64Array.from(b);
  const piv = new Int32Array(n);
  luFactor(lu, n, piv);
  luSolve(lu, n, piv, x);
  return x;
}

export {
  __commonJS,
  __toESM,
  TanklightInputError,
  formatIssue,
  describeValue,
  requirePositive,
  requireFinite,
  VACUUM_PERMEABILITY,
  VACUUM_PERMITTIVITY,
  SPEED_OF_LIGHT,
  ELEMENTARY_CHARGE,
  BOLTZMANN,
  PLANCK,
  ZERO_CELSIUS,
  MU0,
  EPS0,
  thermalVoltage,
  DIMENSIONS,
  parseQuantity,
  isQuantity,
  formatQuantity,
  siUnit,
  quantity,
  quantityMeta,
  length,
  frequency,
  capacitance,
  resistance,
  voltage,
  current,
  power,
  angle,
  temperature,
  vec3,
  unitVector,
  parseInput,
  schema_exports,
  IssueList,
  isPositiveInteger,
  metres,
  circleTurn,
  roundedRectangle,
  roundedRectanglePerimeter,
  archimedeanArcLength,
  count,
  INCH2 as INCH,
  MICROHENRY,
  awgDiameter,
  nagaokaCoefficient,
  lundinNagaokaCoefficient,
  currentSheetInductance,
  wheeler1982Inductance,
  wheelerSingleLayerInductance,
  wheelerMultilayerInductance,
  wheelerFlatSpiralInductance,
  mohanModifiedWheelerInductance,
  mohanCurrentSheetInductance,
  groverRectangleInductance,
  rosaB,
  rosaRoundWireCorrection,
  COPPER,
  ALUMINIUM,
  MATERIALS,
  REFERENCE_TEMPERATURE,
  material,
  resistivityAt,
  K_A_OVER_RHO,
  K_B_RHO,
  K_B_Z,
  loopKernel,
  coaxialKernel,
  aOverRhoKernel,
  loopField,
  gaussLegendre,
  integrateGaussLegendre,
  integrateAdaptive,
  loopMutualInductance,
  poseFrame,
  rotate,
  toCoil,
  filamentToWorld,
  worldFilaments,
  filamentMutual,
  lastFilamentDistance2,
  internalInductanceFactor,
  selfInductanceDetail,
  selfInductance,
  kelvinScaled,
  kelvin,
  ber,
  bei,
  berPrime,
  beiPrime,
  acFactorFromQ,
  roundWireAcFactor,
  roundWireInternalInductanceFactor,
  proximityG,
  roundWireProximityFactor,
  turnFieldsPerAmpere,
  litzResistancePerLength,
  slabSkinFactor,
  traceResistancePerLength,
  ellipticKEComplement,
  ellipticKEInto,
  ellipticKE,
  ellipticK,
  ellipticE,
  MEDHURST_TABLE,
  medhurstCoefficient,
  selfCapacitanceDetail,
  selfCapacitance,
  selfResonance,
  selfResonanceWarning,
  createRandom,
  createRandomFromState,
  wOfLog,
  fitShockley,
  led,
  diode,
  reservoirSteadyState,
  currentFedBridge,
  steigerwaldEquivalentResistance,
  fundamentalConductance,
  fundamentalCurrentSlope,
  loadResponse,
  averageLoadCurrent,
  describingFunctionReference,
  tokenLoadModel,
  LU_PIVOT_RTOL,
  SingularMatrixError,
  luFactor,
  luSolve,
  solveLinear
};

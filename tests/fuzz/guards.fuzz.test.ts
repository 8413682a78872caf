/**
 * Fuzz: the input-guard helpers and schema building blocks of tanklight/advanced (lib/errors.ts,
 * lib/schema.ts, thermalVoltage of lib/constants.ts) — bad and extreme arguments give a clear
 * TanklightInputError naming the function and the argument, or a finite result
 * (framework: tests/fuzz/framework.ts).
 *
 * The require* guards take the caller's labels (field, unit, where: string literals in library
 * code) after the value: only the value is the user's, so only it is mutated by name; junk in
 * place of a label must still give a clear error or the value back. parseInput and the schema
 * builders are called the way library code calls them, on a user's value.
 */
import { z } from "zod";
import { fuzzSuite } from "./framework.ts";
import { requirePositive, requireNonNegative, requireFinite, describeValue, formatIssue, quantity, quantityMeta, parseInput, vec3, unitVector, schema } from "../../lib/advanced.ts";
import { thermalVoltage } from "../../lib/mod.ts";

const coilSpec = z.strictObject({ radius: schema.length(), turns: z.number().int().min(1).max(1000), wire: z.strictObject({ diameter: schema.length() }) });
const labels = ["1", "2", "3"];

fuzzSuite("guards", [
  { name: "requirePositive", where: "loopField", call: requirePositive, valid: [0.01, "radius", "m", "loopField"], params: ["radius"], skip: labels },
  { name: "requireNonNegative", where: "loopField", call: requireNonNegative, valid: [0, "rho", "m", "loopField"], params: ["rho"], skip: labels },
  { name: "requireFinite", where: "loopField", call: requireFinite, valid: [-0.02, "z", "m", "loopField"], params: ["z"], skip: labels },
  // a formatter: any value is legal and must give a string
  { name: "describeValue", call: describeValue, valid: [{ radius: "5 kHz", turns: [1, 2] }], anyValue: true, extreme: [["x".repeat(100000)], [Symbol("s")], [10n], [() => 1]] },
  {
    name: "formatIssue", call: formatIssue, params: ["issue"],
    valid: [{ path: "coil.radius", message: "expected a length like '12 mm'", value: "5 kHz", expected: "length > 0 m", detail: "a frequency" }],
    text: ["0.path", "0.message", "0.expected", "0.detail"],
    // the received value may be anything (it is what the user gave)
    skip: ["0.value"],
  },
  { name: "quantity", call: (dimension: never, opts: never) => parseInput(quantity(dimension, opts), "12 mm", "x"), valid: ["length", { positive: true, min: 1e-3, max: 1, example: "5 mm" }], params: ["dimension", "opts"], text: ["1.example"] },
  { name: "quantityMeta", call: quantityMeta, valid: [schema.frequency({ min: 1e3 })], params: ["schema"], skip: ["0"], bad: [[null], [42], ["length"], [{}], [{ meta: 1 }]], extreme: [[z.number()]] },
  // errors about the input name the caller ("roundCoil"), about the schema argument parseInput
  {
    name: "parseInput", where: ["roundCoil", "parseInput"], call: parseInput, valid: [coilSpec, { radius: "12 mm", turns: 10, wire: { diameter: 4e-4 } }, "roundCoil"], params: ["schema"], skip: ["0", "2"],
    extreme: [[coilSpec, { radius: "1e300 m", turns: 1, wire: { diameter: "1 mm" } }, "roundCoil"]],
  },
  { name: "parseInput(where)", where: "parseInput", call: (where: never) => parseInput(coilSpec, { radius: 0.01, turns: 1, wire: { diameter: 1e-3 } }, where), valid: ["roundCoil"], params: ["where"], text: ["0"] },
  // the schemas as a pose's fields, parsed under the name the library code gives
  { name: "vec3", call: (position: never, opts: never) => parseInput(z.strictObject({ position: vec3(opts) }), { position }, "vec3"), valid: [["1 mm", 0, "-2 cm"], { min: -1, max: 1 }], params: ["position", "opts"] },
  { name: "unitVector", where: "pose", call: (axis: never) => parseInput(z.strictObject({ axis: unitVector() }), { axis }, "pose"), valid: [[0, 3, 4]], params: ["axis"], extreme: [[[0, 0, 0]], [[1e300, 1e300, 0]], [[1e-300, 0, 0]]] },
  { name: "thermalVoltage", call: thermalVoltage, valid: [298.15], params: ["temperature"], extreme: [["25 degC"], ["300 K"], [1e9]] },
]);

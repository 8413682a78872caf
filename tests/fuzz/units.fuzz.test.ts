/**
 * Fuzz: quantities at the edge (lib/units.ts) — parseQuantity, formatQuantity, isQuantity,
 * siUnit. Bad and extreme arguments give a clear TanklightInputError naming the function and the
 * argument, or a finite result (framework: tests/fuzz/framework.ts). The spellings people type
 * and the library refuses on purpose (a part marking "2n2", a decimal comma "4,7 nF") must be
 * refused with the spelling to use instead.
 */
import { describe, expect, it } from "vitest";
import { fuzzSuite } from "./framework.ts";
import { formatQuantity, isQuantity, parseQuantity, siUnit } from "../../lib/mod.ts";

fuzzSuite("units", [
  {
    name: "parseQuantity", call: parseQuantity, valid: ["4.7 nF", "capacitance"], params: ["value", "dimension", "field"],
    bad: [["4.7 nF", "capacitance", 5], ["4.7 nF", "capacitance", {}], ["2n2", "capacitance"], ["4,7 nF", "capacitance"], ["12 mH", "capacitance"], ["1e400 m", "length"], ["1e-400 m", "length"], ["-5 K", "temperature"], ["5 m".repeat(5000), "length"]],
    extreme: [["1e300 m", "length"], ["1e-300 m", "length"], ["-12 mm", "length"], ["5 %", "dimensionless"], ["25 °C", "temperature"]],
  },
  {
    name: "formatQuantity", call: formatQuantity, valid: [4.7e-9, "F", { digits: 3, floor: 1e-12 }], params: ["x", "unit", "digits"], text: ["1"],
    // x = ±∞ prints "∞ F" by design (a lossless part's Q): x is mutated by hand
    skip: ["0"],
    bad: [["12 mH", "Hz"], ["12 mH", "m/s"], [NaN, "A"], [null, "A"], ["banana", "A"], [{}, "A"]],
    extreme: [["12 mH", "H"], [7.18e-22, "A"], [7.18e-22, "A", { floor: 1e-12 }], [1e300, "A"], [-1e-300, "V"], [Infinity, "Ω"], [1.5e-6, "m²"]],
  },
  // any value may be asked about (false is the answer for junk); the dimension must be one
  { name: "isQuantity", call: isQuantity, valid: ["5 kHz", "frequency"], params: ["value", "dimension"], skip: ["0"], extreme: [[null, "length"], [{}, "length"], ["2n2", "capacitance"]] },
  { name: "siUnit", call: siUnit, valid: ["resistance"], params: ["dimension"] },
]);

describe("spellings refused on purpose say what to type", () => {
  it('"2n2" and "4,7 nF" are refused with the spelling to use', () => {
    expect(() => parseQuantity("2n2", "capacitance", "C")).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: parseQuantity: C: expected a capacitance like '4.7 nF', got '2n2' (a part marking with the prefix as decimal point; write '2.2 nF')]`);
    expect(() => parseQuantity("4,7 nF", "capacitance", "C")).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: parseQuantity: C: expected a capacitance like '4.7 nF', got '4,7 nF' (a comma in the number; write a decimal point and no separators: '4.7 nF')]`);
  });
  it("formatQuantity reads a quantity string in the unit's dimension and floors noise", () => {
    expect(formatQuantity("12 mH", "H")).toBe("12.0 mH");
    expect(formatQuantity(7.18e-22, "A", { floor: 1e-12 })).toBe("0 A");
    expect(() => formatQuantity(1, "A", { digits: 3, flor: 1 } as never)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: formatQuantity: options.flor: unknown option; did you mean 'floor'?, got 1]`);
  });
  it("a long input is shown shortened in the message", () => {
    expect(() => parseQuantity("5 m".repeat(5000), "length")).toThrow(/\.\.\.' \(15000 characters\)/);
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { formatQuantity, isQuantity, parseQuantity, siUnit, DIMENSIONS, type Dimension } from "../lib/units.ts";
import { TanklightInputError } from "../lib/errors.ts";
import { expectRelClose } from "./helpers/expectRelClose.ts";
import { expectOutside } from "./helpers/validation.ts";

// Tolerance regimes of this file:
//  - "exact": decimal SI-prefix conversions are correctly rounded (the decimal string is
//    shifted, not multiplied by an inexact 1e-9), so we compare with toBe.
//  - "one rounding": conversions with a non-decimal factor (deg → rad, inch-based units,
//    offsets of °C/°F) take one or two floating-point roundings: rtol 4e-16 ≈ 2 ulp.
const ONE_ROUNDING = 4e-16;

describe("parseQuantity: numbers are SI", () => {
  it("returns a finite number unchanged, any sign", () => {
    expect(parseQuantity(0.012, "length")).toBe(0.012);
    expect(parseQuantity(-0.5, "length")).toBe(-0.5);
    expect(parseQuantity(0, "capacitance")).toBe(0);
    expect(parseQuantity(1e300, "length")).toBe(1e300);
    expect(parseQuantity(5e-324, "capacitance")).toBe(5e-324);
  });

  it("rejects NaN, Infinity and -Infinity with the field name", () => {
    expect(() => parseQuantity(NaN, "length", "coil.radius")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: coil.radius: expected a length like '12 mm' (a finite number), got NaN]`,
    );
    expect(() => parseQuantity(Infinity, "frequency", "f")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: f: expected a frequency like '217 kHz' (a finite number), got Infinity]`,
    );
    expect(() => parseQuantity(-Infinity, "capacitance", "c")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: c: expected a capacitance like '4.7 nF' (a finite number), got -Infinity]`,
    );
  });
});

describe("parseQuantity: strings with units", () => {
  it("converts SI-prefixed strings exactly (correctly rounded decimal)", () => {
    // exact regime: "4.7 nF" must be the double nearest 4.7e-9, the same as the literal
    expect(parseQuantity("12 mm", "length")).toBe(0.012);
    expect(parseQuantity("217 kHz", "frequency")).toBe(217e3);
    expect(parseQuantity("4.7 nF", "capacitance")).toBe(4.7e-9);
    expect(parseQuantity("4.7nF", "capacitance")).toBe(4.7e-9);
    expect(parseQuantity("4.7 nanofarad", "capacitance")).toBe(4.7e-9);
    expect(parseQuantity("  4.7 nF  ", "capacitance")).toBe(4.7e-9);
    expect(parseQuantity("24 uH", "inductance")).toBe(24e-6);
    expect(parseQuantity("24 µH", "inductance")).toBe(24e-6); // micro sign U+00B5
    expect(parseQuantity("24 μH", "inductance")).toBe(24e-6); // Greek mu U+03BC
    expect(parseQuantity("0.5 ohm", "resistance")).toBe(0.5);
    expect(parseQuantity("2.2 kΩ", "resistance")).toBe(2200);
    expect(parseQuantity("2.2 kohm", "resistance")).toBe(2200);
    expect(parseQuantity("1.72e-8 ohm m", "resistivity")).toBe(1.72e-8);
    expect(parseQuantity("1.72e-8 Ω·m", "resistivity")).toBe(1.72e-8);
    expect(parseQuantity("1.72 uohm cm", "resistivity")).toBe(1.72e-8);
    expect(parseQuantity("100 uT", "fluxDensity")).toBe(1e-4);
    expect(parseQuantity("3 A/m", "fieldStrength")).toBe(3);
    expect(parseQuantity("1.5 mm^2", "area")).toBe(1.5e-6);
    expect(parseQuantity("1.5 mm²", "area")).toBe(1.5e-6);
    expect(parseQuantity("150 mA", "current")).toBe(0.15);
    expect(parseQuantity("-3.3 V", "voltage")).toBe(-3.3);
    expect(parseQuantity("−3.3 V", "voltage")).toBe(-3.3); // Unicode minus U+2212
    expect(parseQuantity("10 us", "time")).toBe(1e-5);
    expect(parseQuantity("20 mS", "conductance")).toBe(0.02);
    expect(parseQuantity("10 nC", "charge")).toBe(1e-8);
    expect(parseQuantity("5 mJ", "energy")).toBe(0.005);
    expect(parseQuantity("2 W", "power")).toBe(2);
    expect(parseQuantity("1e3 mm", "length")).toBe(1);
    expect(parseQuantity(".5 mm", "length")).toBe(0.0005);
    expect(parseQuantity("+5 mm", "length")).toBe(0.005);
    expect(parseQuantity("5 1/s", "frequency")).toBe(5);
    expect(parseQuantity("5 1/ms", "frequency")).toBe(5000);
  });

  it("reads the mil as 0.001 inch = 25.4 µm exactly", () => {
    // source: international yard and pound agreement (1959): 1 in = 25.4 mm exactly;
    // the mil (thou) is 0.001 in (NIST SP 811, 2008, App. B.8: mil = 2.54e-5 m exactly).
    expectOutside({ quantity: "0.5 mil in m", source: "source: NIST SP 811 (2008) App. B.8, mil = 2.54e-5 m exactly", ours: parseQuantity("0.5 mil", "length"), reference: 1.27e-5, rtol: ONE_ROUNDING, unit: "m" });
    expectOutside({ quantity: "1 inch in m", source: "source: NIST SP 811 (2008) App. B.8, in = 2.54e-2 m exactly", ours: parseQuantity("1 inch", "length"), reference: 0.0254, rtol: ONE_ROUNDING, unit: "m" });
  });

  it("reads Celsius and Fahrenheit as absolute temperatures", () => {
    // source: SI Brochure 9th ed. (2019) §2.3.1: t/°C = T/K − 273.15 exactly
    expectOutside({ quantity: "25 °C in K", source: "source: SI Brochure 2019 §2.3.1 (T = t + 273.15 K)", ours: parseQuantity("25 °C", "temperature"), reference: 298.15, rtol: ONE_ROUNDING, unit: "K" });
    expectRelClose(parseQuantity("25 degC", "temperature"), 298.15, ONE_ROUNDING, "25 degC");
    expectRelClose(parseQuantity("0 degC", "temperature"), 273.15, ONE_ROUNDING, "0 degC");
    // source: NIST SP 811 (2008) App. B.8 (degree Fahrenheit): T/K = (t/°F + 459.67)/1.8
    expectOutside({ quantity: "77 °F in K", source: "source: NIST SP 811 (2008) App. B.8, T = (t_F + 459.67)/1.8", ours: parseQuantity("77 °F", "temperature"), reference: (77 + 459.67) / 1.8, rtol: 1e-15, unit: "K" });
    expect(parseQuantity("300 K", "temperature")).toBe(300);
  });

  it("reads degrees as radians", () => {
    // 90° = π/2 by definition of the degree (SI Brochure 2019, Table 8: 1° = (π/180) rad)
    expectRelClose(parseQuantity("90 deg", "angle"), Math.PI / 2, ONE_ROUNDING, "90 deg");
    expectRelClose(parseQuantity("90°", "angle"), Math.PI / 2, ONE_ROUNDING, "90°");
    expectRelClose(parseQuantity("30 deg", "angle"), Math.PI / 6, ONE_ROUNDING, "30 deg");
    expect(parseQuantity("0.25 rad", "angle")).toBe(0.25);
  });

  it("accepts no-break, thin and narrow no-break spaces between number and unit", () => {
    expect(parseQuantity("12\u00A0mm", "length")).toBe(0.012);
    expect(parseQuantity("12\u2009mm", "length")).toBe(0.012);
    expect(parseQuantity("1.72e-8\u202FΩ\u00A0m", "resistivity")).toBe(1.72e-8);
  });

  it("accepts huge and tiny values that stay finite and nonzero", () => {
    expect(parseQuantity("1e300 m", "length")).toBe(1e300);
    expect(parseQuantity("1e-30 F", "capacitance")).toBe(1e-30);
    expect(parseQuantity("1 qF", "capacitance")).toBe(1e-30);
  });

  it("accepts bare number strings, % and ppm only for dimensionless", () => {
    expect(parseQuantity("12", "dimensionless")).toBe(12);
    expect(parseQuantity("5 %", "dimensionless")).toBe(0.05);
    expect(parseQuantity("20 ppm", "dimensionless")).toBe(2e-5);
    expect(parseQuantity(" 0.5 ", "dimensionless")).toBe(0.5);
  });

  it("accepts the gauss and the oersted (CGS units, defined in SI)", () => {
    expect(parseQuantity("1 gauss", "fluxDensity")).toBe(1e-4);
    expect(parseQuantity("100 mgauss", "fluxDensity")).toBe(1e-5);
    // source: SI Brochure, 8th ed. (2006), Table 9 (CGS units): 1 Oe ≙ (10³/4π) A/m. Reference value
    // 10³/(4π) = 79.5774715459476678844… (mpmath, 30 digits), rounded to the nearest double.
    // Tolerance: one rounding in the definition string (≤ 1 ulp ≈ 1.8e-16 relative).
    expectOutside({ quantity: "1 Oe in A/m", source: "source: SI Brochure 8th ed. (2006) Table 9, Oe ≙ (10³/4π) A/m", ours: parseQuantity("1 Oe", "fieldStrength"), reference: 79.57747154594767, rtol: 4e-16, unit: "A/m" });
    expect(parseQuantity("2 oersted", "fieldStrength")).toBe(2 * parseQuantity("1 Oe", "fieldStrength"));
  });
});

describe("parseQuantity: rejected strings", () => {
  it("rejects a unit of the wrong dimension and says what it was", () => {
    expect(() => parseQuantity("5 kHz", "length", "coil.radius")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: coil.radius: expected a length like '12 mm', got '5 kHz' (a frequency)]`,
    );
    expect(() => parseQuantity("5 kg", "length", "coil.radius")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: coil.radius: expected a length like '12 mm', got '5 kg' (unit 'kg' is not a length)]`,
    );
    expect(() => parseQuantity("30 deg", "dimensionless", "k")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: k: expected a plain number like '0.5', got '30 deg' (an angle)]`,
    );
  });

  it("rejects a bare number string where a unit is needed", () => {
    expect(() => parseQuantity("12", "length", "coil.radius")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: coil.radius: expected a length like '12 mm', got '12' (no unit; write e.g. '12 m' or pass the number for SI)]`,
    );
  });

  it("rejects empty, blank, unknown-unit and malformed strings", () => {
    expect(() => parseQuantity("", "length", "r")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: r: expected a length like '12 mm', got '' (no leading number)]`,
    );
    expect(() => parseQuantity("   ", "length", "r")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: r: expected a length like '12 mm', got '   ' (no leading number)]`,
    );
    expect(() => parseQuantity("5 furlongs", "length", "r")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: r: expected a length like '12 mm', got '5 furlongs' (unknown unit 'furlongs')]`,
    );
    expect(() => parseQuantity("4.7n F", "capacitance", "c")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: c: expected a capacitance like '4.7 nF', got '4.7n F' (unknown unit 'n F'; write the prefix with its unit: '4.7 nF'?)]`,
    );
    expect(() => parseQuantity("5 5 mm", "length", "r")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: r: expected a length like '12 mm', got '5 5 mm' (more than one number)]`,
    );
    expect(() => parseQuantity("5 2mm", "length", "r")).toThrow(TanklightInputError);
    expect(() => parseQuantity("mm", "length", "r")).toThrow(TanklightInputError);
    expect(() => parseQuantity("NaN mm", "length", "r")).toThrow(TanklightInputError);
    expect(() => parseQuantity("Infinity m", "length", "r")).toThrow(TanklightInputError);
    expect(() => parseQuantity("1,5 mm", "length", "r")).toThrow(TanklightInputError);
    expect(() => parseQuantity("2 mm + 3 mm", "length", "r")).toThrow(TanklightInputError);
    expect(() => parseQuantity("sqrt(2) mm", "length", "r")).toThrow(TanklightInputError);
  });

  it("hints at the right case when a unit is unknown only by its case", () => {
    expect(() => parseQuantity("217 khz", "frequency", "f")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: f: expected a frequency like '217 kHz', got '217 khz' (unknown unit 'khz'; units are case-sensitive: 'kHz'?)]`,
    );
    expect(() => parseQuantity("1 MOHM", "resistance", "r")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: r: expected a resistance like '0.5 ohm', got '1 MOHM' (unknown unit 'MOHM'; units are case-sensitive: 'mohm' or 'Mohm'?)]`,
    );
  });

  it("rejects strings that overflow or underflow the double range", () => {
    expect(() => parseQuantity("1e400 m", "length", "r")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: r: expected a length like '12 mm' (a finite number), got '1e400 m' (overflows)]`,
    );
    expect(() => parseQuantity("1e-400 F", "capacitance", "c")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: c: expected a capacitance like '4.7 nF' (a representable number), got '1e-400 F' (underflows to 0)]`,
    );
  });

  it("rejects temperatures below absolute zero", () => {
    expect(() => parseQuantity("-300 degC", "temperature", "ambient")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: ambient: must be ≥ 0 K (absolute temperature), got '-300 degC' (-26.85 K)]`,
    );
    expect(() => parseQuantity(-1, "temperature", "ambient")).toThrow(TanklightInputError);
  });

  it("rejects values that are neither number nor string", () => {
    expect(() => parseQuantity(null as unknown as number, "length", "r")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: parseQuantity: r: expected a length like '12 mm', got null]`,
    );
  });

  it("puts the field, the value and the expectation into issues[]", () => {
    try {
      parseQuantity("5 kHz", "length", "coil.radius");
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(TanklightInputError);
      expect((e as TanklightInputError).issues).toEqual([
        {
          path: "coil.radius",
          message: "expected a length like '12 mm'",
          value: "5 kHz",
          expected: "a length in m or a string like '12 mm'",
          detail: "a frequency",
        },
      ]);
    }
  });
});

describe("parseQuantity: properties", () => {
  it("a number printed with an SI prefix parses back to itself (exact decimal regime)", () => {
    const prefixes: [string, number][] = [["p", -12], ["n", -9], ["u", -6], ["m", -3], ["", 0], ["k", 3], ["M", 6]];
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: 0, max: prefixes.length - 1 }), (digits, i) => {
        const [p, e] = prefixes[i] ?? ["", 0];
        const text = `${digits / 1000} ${p}F`;
        return parseQuantity(text, "capacitance") === Number(`${digits / 1000}e${e}`);
      }),
    );
  });

  it("a prefix equals the matching power of ten, exactly (\"1.5 kHz\" = \"1.5e3 Hz\")", () => {
    const table: [string, number, string, Dimension][] = [
      ["p", -12, "F", "capacitance"], ["n", -9, "H", "inductance"], ["u", -6, "T", "fluxDensity"],
      ["m", -3, "m", "length"], ["k", 3, "Hz", "frequency"], ["M", 6, "ohm", "resistance"], ["G", 9, "Hz", "frequency"],
    ];
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
        fc.integer({ min: 0, max: table.length - 1 }),
        fc.constantFrom("", " ", "  "),
        (x, i, gap) => {
          const [p, e, u, d] = table[i] ?? ["", 0, "m", "length"];
          const text = String(x);
          return parseQuantity(`${text}${gap}${p}${u}`, d) === parseQuantity(`${text}e${e} ${u}`, d);
        },
      ),
    );
  });

  it("any string either parses to a finite number or throws TanklightInputError (never another error)", () => {
    const dims = Object.keys(DIMENSIONS) as Dimension[];
    const unitish = fc.constantFrom("mm", "kHz", "nF", "ohm m", "deg", "degC", "%", "A/m", "µT", "Ω", "(", "^", "e", "/", "*", "1/0", "mm^-999", "m^1e9");
    const text = fc.oneof(
      fc.string(),
      fc.tuple(fc.double(), fc.constantFrom("", " "), unitish).map(([x, g, u]) => `${x}${g}${u}`),
      fc.array(unitish, { maxLength: 4 }).map((a) => a.join(" ")),
    );
    fc.assert(
      fc.property(text, fc.constantFrom(...dims), (s, d) => {
        try {
          return Number.isFinite(parseQuantity(s, d));
        } catch (e) {
          return e instanceof TanklightInputError && e.issues.length === 1 && e.issues[0]?.value === s;
        }
      }),
      { numRuns: 2000 },
    );
  });

  it("isQuantity agrees with parseQuantity", () => {
    expect(isQuantity("12 mm", "length")).toBe(true);
    expect(isQuantity("5 kHz", "length")).toBe(false);
    expect(isQuantity(NaN, "length")).toBe(false);
    expect(isQuantity({}, "length")).toBe(false);
  });

  it("every dimension's example parses to its own dimension", () => {
    for (const d of Object.keys(DIMENSIONS) as Dimension[]) {
      expect(isQuantity(DIMENSIONS[d].example, d), d).toBe(true);
    }
  });
});

describe("formatQuantity", () => {
  it("prints engineering notation with an SI prefix and 3 significant figures", () => {
    expect(formatQuantity(4.7e-9, "F")).toBe("4.70 nF");
    expect(formatQuantity(0.012, "m")).toBe("12.0 mm");
    expect(formatQuantity(217000, "Hz")).toBe("217 kHz");
    expect(formatQuantity(1, "V")).toBe("1.00 V");
    expect(formatQuantity(24e-6, "H")).toBe("24.0 µH");
    expect(formatQuantity(1.72e-8, "Ω·m")).toBe("17.2 nΩ·m");
    expect(formatQuantity(21, "A/m")).toBe("21.0 A/m");
    expect(formatQuantity(4.7e-9, "F", 2)).toBe("4.7 nF");
    expect(formatQuantity(4.7e-9, "F", 5)).toBe("4.7000 nF");
  });

  it("handles zero, negatives, rounding across a prefix, and infinities", () => {
    expect(formatQuantity(0, "F")).toBe("0 F");
    expect(formatQuantity(-4.7e-9, "F")).toBe("-4.70 nF");
    expect(formatQuantity(999.96, "Hz")).toBe("1.00 kHz");
    expect(formatQuantity(0.9999, "V")).toBe("1.00 V");
    expect(formatQuantity(Infinity, "H")).toBe("∞ H");
    expect(formatQuantity(-Infinity, "H")).toBe("-∞ H");
  });

  it("falls back to exponent form beyond quecto and quetta", () => {
    expect(formatQuantity(1e30, "Hz")).toBe("1.00 QHz");
    expect(formatQuantity(1e33, "Hz")).toBe("1.00e+33 Hz");
    expect(formatQuantity(1e-30, "F")).toBe("1.00 qF");
    expect(formatQuantity(1e-33, "F")).toBe("1.00e-33 F");
  });

  it("scales the prefix by the power of the first unit factor", () => {
    expect(formatQuantity(1.5e-6, "m²")).toBe("1.50 mm²");
    expect(formatQuantity(1.5e-6, "m^2")).toBe("1.50 mm^2");
    expect(formatQuantity(2e-9, "m³")).toBe("2.00 mm³");
  });

  it("does not prefix %, dB, °C, deg, rad, K or plain numbers", () => {
    expect(formatQuantity(25, "°C")).toBe("25.0 °C");
    expect(formatQuantity(0.5, "")).toBe("0.500");
    expect(formatQuantity(12345678, "")).toBe("1.23e+7");
    expect(formatQuantity(3.5, "%")).toBe("3.50 %");
    expect(formatQuantity(-15, "dBµA/m")).toBe("-15.0 dBµA/m");
    expect(formatQuantity(0.0005, "rad")).toBe("5.00e-4 rad");
    expect(formatQuantity(298.15, "K")).toBe("298 K");
  });

  it("rejects NaN and bad digit counts", () => {
    expect(() => formatQuantity(NaN, "F")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: formatQuantity: x: must be a number in F, got NaN]`,
    );
    expect(() => formatQuantity(1, "F", 0)).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: formatQuantity: digits: must be an integer from 1 to 17, got 0]`,
    );
  });

  it("prints 1–3 integer digits and exactly `digits` significant figures (digits ≥ 3), or the exponent form", () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }).filter((x) => x !== 0), fc.integer({ min: 3, max: 17 }), (x, digits) => {
        const s = formatQuantity(x, "F", digits);
        const m = /^(-?)(\d{1,3})(?:\.(\d+))? [qryzafpnµmkMGTPEZYRQ]?F$/.exec(s);
        if (m === null) return /^-?\d(\.\d+)?e[+-]\d+ F$/.test(s) && (Math.abs(x) >= 1e33 || Math.abs(x) < 1e-30);
        const figures = ((m[2] ?? "") + (m[3] ?? "")).replace(/^0+/, "");
        return (m[2] ?? "0") !== "0" && figures.length === digits;
      }),
      { numRuns: 3000 },
    );
    // the double just below 1e-30 stays below quecto at 17 digits (no "0.99… qF")
    expect(formatQuantity(9.999999999999999e-31, "F", 17)).toBe("9.9999999999999991e-31 F");
    expect(formatQuantity(9.999999999999999e-31, "F")).toBe("1.00 qF");
    expect(formatQuantity(1e5, "Hz", 1)).toBe("100 kHz"); // digits < 3: trailing zeros of the integer part show
  });

  it("round-trips through parseQuantity within the printed precision", () => {
    // regime "printed precision": 6 significant figures printed → rtol 5e-6 (half a unit in the 6th digit)
    fc.assert(
      fc.property(fc.double({ min: 1e-15, max: 1e12, noNaN: true }), fc.boolean(), (x, neg) => {
        const v = neg ? -x : x;
        const back = parseQuantity(formatQuantity(v, "F", 6), "capacitance");
        return Math.abs(back - v) <= 5e-6 * Math.abs(v);
      }),
    );
  });
});

describe("formatQuantity: strings and a stated floor", () => {
  it("formats a quantity string when the unit is the SI unit of a dimension", () => {
    expect(formatQuantity("12 mH", "H")).toBe("12.0 mH");
    expect(formatQuantity("217 kHz", "Hz", 4)).toBe("217.0 kHz");
    expect(formatQuantity("0.5", "")).toBe("0.500");
  });

  it("refuses a quantity string it cannot read in that unit, saying what to pass", () => {
    expect(() => formatQuantity("12 mH", "Hz")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: formatQuantity: x: expected a frequency like '217 kHz', got '12 mH' (an inductance)]`,
    );
    expect(() => formatQuantity("-15 dBuA/m", "dBµA/m")).toThrow(/pass the number in dBµA\/m instead/);
    expect(() => formatQuantity(null as unknown as number, "H")).toThrow(TanklightInputError);
  });

  it("prints values below the stated floor as 0, and keeps everything above it", () => {
    // a token out of reach: 7.18e-22 A is far below any current a solver resolves
    expect(formatQuantity(7.18e-22, "A", { floor: 1e-12 })).toBe("0 A");
    expect(formatQuantity(-7.18e-22, "A", { floor: 1e-12 })).toBe("0 A");
    expect(formatQuantity(2.5e-12, "A", { floor: 1e-12 })).toBe("2.50 pA");
    expect(formatQuantity(4.7e-9, "F", { digits: 2 })).toBe("4.7 nF");
    expect(() => formatQuantity(1, "A", { floor: -1 })).toThrow(TanklightInputError);
    expect(() => formatQuantity(1, "A", { floor: NaN })).toThrow(TanklightInputError);
  });
});

describe("types", () => {
  it("has the documented signatures", () => {
    expectTypeOf(parseQuantity).parameters.toEqualTypeOf<[number | string, Dimension, (string | undefined)?]>();
    expectTypeOf(parseQuantity).returns.toEqualTypeOf<number>();
    expectTypeOf(formatQuantity).returns.toEqualTypeOf<string>();
    expectTypeOf(siUnit).parameter(0).toEqualTypeOf<Dimension>();
    expectTypeOf<"length">().toMatchTypeOf<Dimension>();
    expect(siUnit("resistance")).toBe("Ω");
  });
});

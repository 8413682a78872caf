import { describe, expect, expectTypeOf, it } from "vitest";
import { z } from "zod";
import fc from "fast-check";
import {
  angle,
  capacitance,
  frequency,
  length,
  parseInput,
  quantity,
  quantityMeta,
  resistance,
  temperature,
  unitVector,
  vec3,
  voltage,
  editDistance,
  nearestKey,
  type QuantitySchema,
} from "../lib/schema.ts";
import { TanklightInputError } from "../lib/errors.ts";
import { parseQuantity } from "../lib/units.ts";
import { expectRelClose } from "./helpers/expectRelClose.ts";

const CoilInput = z
  .object({
    coil: z.object({ radius: length(), turns: z.number().int().positive() }),
    frequency: frequency(),
    position: vec3(),
    tuning: capacitance().optional(),
    gap: length().prefault("3 mm"),
  })
  .strict();

describe("quantity schemas", () => {
  it("convert strings and numbers to SI", () => {
    const out = parseInput(
      CoilInput,
      { coil: { radius: "12 mm", turns: 5 }, frequency: "217 kHz", position: [0, "1 mm", "-2 cm"] },
      "roundCoil",
    );
    expect(out).toEqual({ coil: { radius: 0.012, turns: 5 }, frequency: 217e3, position: [0, 0.001, -0.02], gap: 0.003 });
  });

  it("length() is positive by default; options widen or narrow the range", () => {
    expect(() => parseInput(length(), 0, "f")).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: f: must be > 0 m, got 0]`);
    expect(parseInput(length({ positive: false }), "-5 mm", "f")).toBe(-0.005);
    expect(parseInput(length({ nonNegative: true }), 0, "f")).toBe(0);
    expect(() => parseInput(length({ positive: true, max: 0.1 }), "20 cm", "f")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: f: must be > 0 m and ≤ 100.0 mm, got '20 cm' (= 200 mm)]`,
    );
    expect(() => parseInput(frequency({ min: 100e3, max: 1e6 }), "50 kHz", "drive")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: drive: must be ≥ 100.0 kHz and ≤ 1.000 MHz, got '50 kHz' (= 50.0 kHz)]`,
    );
  });

  it("options add to a shorthand's sign rule unless they name one", () => {
    expect(() => parseInput(length({ max: 0.1 }), 0, "gap")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: gap: must be > 0 m and ≤ 100.0 mm, got 0]`,
    );
    expect(parseInput(length({ nonNegative: true, max: 0.1 }), 0, "gap")).toBe(0);
    expect(parseInput(resistance({ max: 10 }), 0, "esr")).toBe(0);
    expect(() => parseInput(resistance({ max: 10 }), -1, "esr")).toThrow(TanklightInputError);
  });

  it("rejects non-finite or crossed range options when the schema is built", () => {
    expect(() => quantity("length", { min: NaN })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: quantity: opts.min: must be a finite number in SI units, got NaN]`,
    );
    expect(() => quantity("length", { min: 2, max: 1 })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: quantity: opts.min: must be ≤ opts.max (1), got 2]`,
    );
  });

  it("signed shorthands accept negatives; resistance accepts zero", () => {
    expect(parseInput(voltage(), "-3.3 V", "v")).toBe(-3.3);
    expectRelClose(parseInput(angle(), "-90 deg", "tilt"), -Math.PI / 2, 4e-16, "angle"); // one rounding (π/180 factor)
    expect(parseInput(resistance(), 0, "esr")).toBe(0);
    expect(() => parseInput(resistance(), "-1 ohm", "esr")).toThrow(TanklightInputError);
    expectRelClose(parseInput(temperature(), "25 °C", "t"), 298.15, 4e-16, "temperature"); // one rounding (offset)
  });

  it("an example option changes the example in messages", () => {
    expect(() => parseInput(length({ positive: true, example: "0.4 mm" }), "5 kHz", "wire.diameter")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: wire.diameter: expected a length like '0.4 mm', got '5 kHz' (a frequency)]`,
    );
  });

  it("carry meta with unit and dimension", () => {
    expect(quantityMeta(length())).toEqual({ unit: "m", dimension: "length", example: "12 mm", rule: "> 0 m" });
    expect(quantityMeta(capacitance())?.unit).toBe("F");
    expect(quantityMeta(z.number())).toBeUndefined();
  });
});

describe("vec3 and unitVector", () => {
  it("vec3 reads three lengths of any sign; options apply to each element", () => {
    expect(parseInput(vec3(), ["1 mm", 0, "-2 cm"], "pose.position")).toEqual([0.001, 0, -0.02]);
    expect(() => parseInput(vec3({ nonNegative: true }), ["1 mm", "-1 mm", 0], "p")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: p: [1]: must be ≥ 0 m, got '-1 mm' (= -1.00 mm)]`,
    );
    expect(() => parseInput(vec3(), [1, 2], "p")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: p: expected array to have >=3 items, got [1,2]]`,
    );
    expect(() => parseInput(vec3(), [1, 2, 3, 4], "p")).toThrow(TanklightInputError);
  });

  it("unitVector normalizes and rejects zero, NaN and infinite components", () => {
    // exact regime: [0, 3, 4]/5 — 0.6 and 0.8 are the correctly rounded quotients
    expect(parseInput(unitVector(), [0, 3, 4], "pose.axis")).toEqual([0, 0.6, 0.8]);
    const big = parseInput(unitVector(), [1e300, 1e300, 0], "pose.axis");
    expectRelClose(Math.hypot(...big), 1, 2.3e-16, "norm after normalizing huge components (one rounding)");
    expect(() => parseInput(unitVector(), [0, 0, 0], "pose.axis")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: pose.axis: expected a direction (not all zero), got [0,0,0]]`,
    );
    expect(() => parseInput(unitVector(), [NaN, 0, 1], "pose.axis")).toThrow(TanklightInputError);
    expect(() => parseInput(unitVector(), [0, 0, Infinity], "pose.axis")).toThrow(TanklightInputError);
  });
});

describe("parseInput", () => {
  it("lists every issue with its dotted path, value and expectation", () => {
    const bad = {
      coil: { radius: "5 kHz", turns: 0 },
      frequency: -3,
      position: [0, "1 mm", Infinity],
      tuning: "4.7n F",
      extra: 1,
    };
    expect(() => parseInput(CoilInput, bad, "roundCoil")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: roundCoil: coil.radius: expected a length like '12 mm', got '5 kHz' (a frequency); coil.turns: expected number to be >0, got 0; frequency: must be > 0 Hz, got -3; position[2]: expected a length like '12 mm' (a finite number), got Infinity; tuning: expected a capacitance like '4.7 nF', got '4.7n F' (unknown unit 'n F'; write the prefix with its unit: '4.7 nF'?); extra: unknown field (accepted: coil, frequency, position, tuning, gap), got 1]`,
    );
    try {
      parseInput(CoilInput, bad, "roundCoil");
      expect.unreachable();
    } catch (e) {
      const issues = (e as TanklightInputError).issues;
      expect(issues.map((i) => i.path)).toEqual(["coil.radius", "coil.turns", "frequency", "position[2]", "tuning", "extra"]);
      expect(issues[0]).toEqual({
        path: "coil.radius",
        message: "expected a length like '12 mm'",
        value: "5 kHz",
        expected: "a length > 0 m",
        detail: "a frequency",
      });
    }
  });

  it("reports missing fields and wrong types", () => {
    expect(() => parseInput(CoilInput, {}, "roundCoil")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: roundCoil: coil: expected object, got nothing; frequency: expected a frequency like '217 kHz', got nothing; position: expected tuple, got nothing]`,
    );
    expect(() => parseInput(CoilInput, "hello", "roundCoil")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: roundCoil: expected object, got 'hello']`,
    );
    expect(() => parseInput(frequency(), { value: 3 }, "f")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: f: expected a frequency like '217 kHz', got {"value":3}]`,
    );
  });

  it("rejects NaN, ±Infinity, empty and blank strings in every quantity", () => {
    for (const bad of [NaN, Infinity, -Infinity, "", "   ", "12", "mm"]) {
      expect(() => parseInput(length(), bad, "r"), String(bad)).toThrow(TanklightInputError);
    }
  });

  it("names the path inside arrays of objects", () => {
    const S = z.object({ tokens: z.array(z.object({ radius: length() })) });
    expect(() => parseInput(S, { tokens: [{ radius: "5 mm" }, { radius: "5 V" }] }, "layout")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: layout: tokens[1].radius: expected a length like '12 mm', got '5 V' (a voltage)]`,
    );
  });

  it("reports a union through the branch whose form matched, else lists the forms", () => {
    const Drive = z.union([
      z.strictObject({ kind: z.literal("sine"), amplitude: voltage({ nonNegative: true }) }),
      z.strictObject({ kind: z.literal("bridge"), supply: voltage({ positive: true }), onResistance: resistance().optional() }),
      z.custom<{ kind: "ready" }>((d) => typeof d === "object" && d !== null && (d as { kind?: unknown }).kind === "ready", {
        message: "expected a ready drive",
      }),
    ]);
    const S = z.object({ transmitter: z.object({ drive: Drive }) });
    expect(() => parseInput(S, { transmitter: { drive: { kind: "sine", amplitude: "5 kHz" } } }, "link")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: link: transmitter.drive.amplitude: expected a voltage like '3.3 V', got '5 kHz' (a frequency)]`,
    );
    expect(() => parseInput(S, { transmitter: { drive: { kind: "bridge" } } }, "link")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: link: transmitter.drive.supply: expected a voltage like '3.3 V', got nothing]`,
    );
    expect(() => parseInput(S, { transmitter: { drive: { kind: "pulse" } } }, "link")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: link: transmitter.drive: matches none of the accepted forms (kind "sine"; kind "bridge"; expected a ready drive), got {"kind":"pulse"}]`,
    );
    const D = z.object({
      drive: z.discriminatedUnion("kind", [
        z.strictObject({ kind: z.literal("sine"), amplitude: voltage() }),
        z.strictObject({ kind: z.literal("bridge"), supply: voltage() }),
      ]),
      compensation: z.enum(["series", "parallel"]),
    });
    expect(() => parseInput(D, { drive: { kind: "pulse" }, compensation: "both" }, "link")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: link: drive.kind: expected one of "sine", "bridge", got 'pulse'; compensation: expected one of "series"|"parallel", got 'both']`,
    );
  });

  it("adds the function name to a TanklightInputError thrown inside a hand-written transform", () => {
    const S = z.object({ r: z.string().transform((v) => parseQuantity(v, "length", "r")) });
    expect(() => parseInput(S, { r: "5 kHz" }, "tokenBuilder")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: tokenBuilder: r: expected a length like '12 mm', got '5 kHz' (a frequency)]`,
    );
  });

  it("reports exactly one issue per bad field, at its path (property)", () => {
    const S = z.object({ a: length(), b: frequency(), c: capacitance(), d: voltage() });
    const good = { a: "12 mm", b: "217 kHz", c: "4.7 nF", d: "-3.3 V" };
    const bad = fc.constantFrom<unknown>("5 kg", "", "  ", NaN, Infinity, -Infinity, "12", "5 furlongs", null, {}, [], "1e400 m", undefined);
    fc.assert(
      fc.property(fc.record({ a: fc.boolean(), b: fc.boolean(), c: fc.boolean(), d: fc.boolean() }), bad, (which, value) => {
        const input: Record<string, unknown> = { ...good };
        for (const k of Object.keys(which) as (keyof typeof which)[]) if (which[k]) input[k] = value;
        const expected = (Object.keys(which) as (keyof typeof which)[]).filter((k) => which[k]);
        try {
          parseInput(S, input, "prop");
          return expected.length === 0;
        } catch (e) {
          if (!(e instanceof TanklightInputError)) return false;
          return JSON.stringify(e.issues.map((i) => i.path)) === JSON.stringify(expected) && e.message.startsWith("prop: ");
        }
      }),
      { numRuns: 300 },
    );
  });

  it("lets non-input errors through unchanged", () => {
    const S = z.number().transform(() => {
      throw new RangeError("boom");
    });
    expect(() => parseInput(S, 1, "x")).toThrow(RangeError);
  });
});

describe("types", () => {
  it("infers number outputs and number | string inputs", () => {
    expectTypeOf(length()).toEqualTypeOf<QuantitySchema>();
    expectTypeOf<z.output<QuantitySchema>>().toEqualTypeOf<number>();
    expectTypeOf<z.input<QuantitySchema>>().toEqualTypeOf<number | string>();
    type Out = z.output<typeof CoilInput>;
    expectTypeOf<Out["coil"]["radius"]>().toEqualTypeOf<number>();
    expectTypeOf<Out["position"]>().toEqualTypeOf<readonly [number, number, number]>();
    expectTypeOf<Out["tuning"]>().toEqualTypeOf<number | undefined>();
    // a quantity field is a required key of the input; .optional() makes it optional
    const S = z.object({ r: length(), c: capacitance().optional() });
    expectTypeOf<z.input<typeof S>>().toEqualTypeOf<{ r: number | string; c?: number | string | undefined }>();
    expectTypeOf<z.output<typeof S>>().toEqualTypeOf<{ r: number; c?: number | undefined }>();
    expectTypeOf(parseInput(length(), "1 m", "x")).toEqualTypeOf<number>();
    expectTypeOf(quantity).returns.toEqualTypeOf<QuantitySchema>();
    expectTypeOf<z.output<ReturnType<typeof unitVector>>>().toEqualTypeOf<readonly [number, number, number]>();
  });
});

describe("unknown keys: did you mean", () => {
  const Pose = z.strictObject({ position: vec3(), axis: unitVector().optional(), spin: angle().optional() });
  it("editDistance counts a swap of neighbours as one edit", () => {
    expect(editDistance("axsi", "axis")).toBe(1);
    expect(editDistance("positon", "position")).toBe(1);
    expect(editDistance("Spin", "spin")).toBe(0);
    expect(editDistance("", "abc")).toBe(3);
  });
  it("nearestKey suggests only a close key", () => {
    expect(nearestKey("axsi", ["position", "axis", "spin"])).toBe("axis");
    expect(nearestKey("colour", ["position", "axis", "spin"])).toBeUndefined();
  });
  it("parseInput names the unknown key and the nearest valid one, also inside arrays and unions", () => {
    expect(() => parseInput(Pose, { position: [0, 0, 0.02], axsi: [1, 0, 0] }, "couplingFactor")).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: couplingFactor: axsi: unknown field; did you mean 'axis'?, got [1,0,0]]`);
    expect(() => parseInput(z.array(Pose), [{ position: [0, 0, 0] }, { positon: [0, 0, 0], position: [0, 0, 1] }], "f")).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: f: [1].positon: unknown field; did you mean 'position'?, got [0,0,0]]`);
    const U = z.union([z.strictObject({ kind: z.literal("a"), radius: length() }), z.strictObject({ kind: z.literal("b"), width: length() })]);
    expect(() => parseInput(U, { kind: "a", radius: 1, radus: 2 }, "f")).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: f: radus: unknown field; did you mean 'radius'?, got 2]`);
    expect(() => parseInput(Pose, { position: [0, 0, 0], toString: 1 }, "f")).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: f: toString: unknown field (accepted: position, axis, spin), got 1]`);
  });
});

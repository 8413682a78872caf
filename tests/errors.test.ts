import { describe, expect, expectTypeOf, it } from "vitest";
import { TanklightInputError, describeValue, formatIssue, requireFinite, requirePositive, type InputIssue } from "../lib/errors.ts";

describe("TanklightInputError", () => {
  it("is an Error whose message names the function, the field, the rule and the value", () => {
    const e = new TanklightInputError([{ path: "radius", message: "must be > 0 m", value: -0.01 }], "loopField");
    expect(e).toBeInstanceOf(Error);
    expect(e.name).toBe("TanklightInputError");
    expect(e.message).toMatchInlineSnapshot(`"loopField: radius: must be > 0 m, got -0.01"`);
    expect(e.issues).toHaveLength(1);
  });

  it("joins several issues and prints a detail after the value", () => {
    const e = new TanklightInputError([
      { path: "coil.radius", message: "expected a length like '12 mm'", value: "5 kHz", detail: "a frequency" },
      { path: "", message: "expected object", value: null },
    ]);
    expect(e.message).toMatchInlineSnapshot(`"coil.radius: expected a length like '12 mm', got '5 kHz' (a frequency); expected object, got null"`);
  });
});

describe("describeValue", () => {
  it("quotes strings and renders the other kinds readably", () => {
    expect(describeValue("5 kHz")).toBe("'5 kHz'");
    expect(describeValue(NaN)).toBe("NaN");
    expect(describeValue(-Infinity)).toBe("-Infinity");
    expect(describeValue(undefined)).toBe("nothing");
    expect(describeValue(null)).toBe("null");
    expect(describeValue([1, "a"])).toBe('[1,"a"]');
    expect(describeValue({ a: "x".repeat(100) })).toHaveLength(80);
    const cyclic: Record<string, unknown> = {};
    cyclic.self = cyclic;
    expect(describeValue(cyclic)).toBe("[object Object]");
  });

  it("formatIssue prints one issue as the error message does", () => {
    expect(formatIssue({ path: "f", message: "must be > 0 Hz", value: 0 })).toBe("f: must be > 0 Hz, got 0");
  });
});

describe("hot-path guards", () => {
  it("requirePositive returns a finite positive number and rejects the rest", () => {
    expect(requirePositive(0.01, "radius", "m", "loopField")).toBe(0.01);
    expect(() => requirePositive(-0.01, "radius", "m", "loopField")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: loopField: radius: must be a finite number > 0 m, got -0.01]`,
    );
    for (const bad of [0, -0, NaN, Infinity, -Infinity]) {
      expect(() => requirePositive(bad, "radius", "m", "loopField"), String(bad)).toThrow(TanklightInputError);
    }
  });

  it("requireFinite accepts any finite number and rejects NaN and ±Infinity", () => {
    expect(requireFinite(-3, "z", "m", "loopField")).toBe(-3);
    expect(requireFinite(0, "z", "m", "loopField")).toBe(0);
    expect(() => requireFinite(NaN, "z", "m", "loopField")).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: loopField: z: must be a finite number in m, got NaN]`,
    );
    expect(() => requireFinite(Infinity, "z", "m", "loopField")).toThrow(TanklightInputError);
  });
});

describe("types", () => {
  it("keeps the documented signatures", () => {
    expectTypeOf(requirePositive).parameters.toEqualTypeOf<[number, string, string, string]>();
    expectTypeOf(requirePositive).returns.toEqualTypeOf<number>();
    expectTypeOf(requireFinite).returns.toEqualTypeOf<number>();
    expectTypeOf<TanklightInputError["issues"]>().toEqualTypeOf<readonly InputIssue[]>();
    expectTypeOf<InputIssue["path"]>().toEqualTypeOf<string>();
  });
});

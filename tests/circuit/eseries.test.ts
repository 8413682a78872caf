import { describe, expect, expectTypeOf, it } from "vitest";
import { readFileSync } from "node:fs";
import { standardValues, nearestStandardValue, standardValuesBetween, type ESeries } from "../../lib/circuit/eseries.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

const iec = JSON.parse(readFileSync(new URL("../fixtures/circuit/iec60063-spot-values.json", import.meta.url), "utf8")) as Record<string, { values: number[] }> & { source: string };

/** the rounding rule of IEC 60063: 10^(i/N) to 2 significant digits (N ≤ 24) or 3 (N ≥ 48) */
function rule(series: ESeries): number[] {
  const n = Number(series.slice(1));
  const digits = n <= 24 ? 10 : 100;
  return Array.from({ length: n }, (_, i) => Math.round(10 ** (i / n) * digits) / digits);
}

describe("standardValues(series): IEC 60063 tables", () => {
  it("E24 and E12 equal the published tables", () => {
    // source: IEC 60063 (E24 as in docs/references.md, checked); exact decimal values
    expect(standardValues("E24")).toEqual(iec.E24!.values);
    expect(standardValues("E12")).toEqual(iec.E12!.values);
    for (const [k, v] of iec.E24!.values.entries()) {
      expectOutside({ quantity: `E24[${k}]`, source: "source: IEC 60063 E24 (docs/references.md, checked)", ours: standardValues("E24")[k]!, reference: v, rtol: 0 });
    }
  });

  it("E96 spot values", () => {
    for (const v of iec.E96spot!.values) {
      // from memory (unverified): catalogue E96 values
      expect(standardValues("E96")).toContain(v);
    }
  });

  it("E3…E24 follow the rounding rule except exactly the listed E24 exceptions", () => {
    const exceptions = new Set(iec.E24exceptions!.values);
    for (const s of ["E3", "E6", "E12", "E24"] as ESeries[]) {
      const r = rule(s);
      const t = standardValues(s);
      expect(t).toHaveLength(r.length);
      t.forEach((v, i) => {
        if (v !== r[i]) expect(exceptions.has(v), `${s}[${i}] = ${v}, rule ${r[i]}`).toBe(true);
        else expect(exceptions.has(v) && s === "E24").toBe(false);
      });
    }
    // every listed exception does differ from the rule
    const r24 = rule("E24");
    const t24 = standardValues("E24");
    const differing = t24.filter((v, i) => v !== r24[i]);
    expect(differing).toEqual(iec.E24exceptions!.values);
  });

  it("E48 and E96 follow the three-digit rule with no exception; E192 with only 9.20", () => {
    expect(standardValues("E48")).toEqual(rule("E48"));
    expect(standardValues("E96")).toEqual(rule("E96"));
    const r = rule("E192");
    const diff = standardValues("E192").filter((v, i) => v !== r[i]);
    expect(diff).toEqual(iec.E192exceptions!.values); // memory (unverified), docs/references.md
  });

  it("each series is a subset of the next finer one up to E24, and of E192 from E48", () => {
    const chain: ESeries[] = ["E3", "E6", "E12", "E24"];
    for (let k = 0; k + 1 < chain.length; k++) for (const v of standardValues(chain[k]!)) expect(standardValues(chain[k + 1]!)).toContain(v);
    for (const v of standardValues("E48")) expect(standardValues("E96")).toContain(v);
    for (const v of standardValues("E96")) expect(standardValues("E192")).toContain(v);
  });

  it("bad series name throws", () => {
    expect(() => standardValues("E7" as ESeries)).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: standardValues: series: must be one of E3, E6, E12, E24, E48, E96, E192, got 'E7']`,
    );
  });
});

describe("nearestStandardValue(x, series)", () => {
  it("picks the nearest value in ratio, across decades, with clean decimals", () => {
    expect(nearestStandardValue(4.5e-9, "E12")).toBe(4.7e-9);
    expect(nearestStandardValue(9.6e3, "E12")).toBe(10e3);
    expect(nearestStandardValue(0.96, "E6")).toBe(1);
    expect(nearestStandardValue(6.333e-9, "E24")).toBe(6.2e-9);
    expect(nearestStandardValue(0.0495, "E96")).toBe(0.0499);
    expect(nearestStandardValue(0.0491, "E96")).toBe(0.0487);
  });

  it("is never farther than half a step of its series (property)", () => {
    for (const s of ["E6", "E24", "E96"] as ESeries[]) {
      const n = Number(s.slice(1));
      for (let x = 1e-12; x < 1e6; x *= 1.0371) {
        const v = nearestStandardValue(x, s);
        // the largest gap in an E-series (with its rounded values) is below 10^(1.6/N)
        expect(Math.abs(Math.log10(v / x))).toBeLessThan(0.8 / n);
      }
    }
  });

  it("standardValuesBetween lists a decade inclusively", () => {
    const v = standardValuesBetween("E6", 1e-9, 1e-8);
    expect(v).toEqual([1e-9, 1.5e-9, 2.2e-9, 3.3e-9, 4.7e-9, 6.8e-9, 1e-8]);
    expectRelClose(v[4]!, 4.7e-9, 0, "exact decimal");
  });

  it("types", () => {
    expectTypeOf(standardValues).returns.toEqualTypeOf<readonly number[]>();
    expectTypeOf(nearestStandardValue).parameters.toEqualTypeOf<[number, ESeries]>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { bestCombination, type Combination } from "../../lib/circuit/combination.ts";
import { standardValues } from "../../lib/circuit/eseries.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

describe("bestCombination(x, series, options)", () => {
  it("a target that is a standard value comes back as one part with zero error", () => {
    const r = bestCombination(6.8e-9, "E12");
    expect(r[0]).toMatchObject({ parts: [6.8e-9], topology: "single" });
    expect(r[0]!.error).toBe(0);
  });

  it("two equal capacitors in parallel make twice the value (capacitors add in parallel)", () => {
    const r = bestCombination(3.0e-9, "E6", { maxParts: 2, topology: "parallel" });
    expect(r[0]!.parts).toEqual([1.5e-9, 1.5e-9]);
    expectRelClose(r[0]!.value, 3.0e-9, 1e-15, "1.5 nF ∥ 1.5 nF");
  });

  it("resistors in parallel combine reciprocally: 2 × 1 kΩ ∥ = 500 Ω", () => {
    const r = bestCombination(500, "E12", { maxParts: 2, topology: "parallel", kind: "resistor" });
    expect(r[0]!.parts).toEqual([1000, 1000]);
    expectRelClose(r[0]!.value, 500, 1e-15, "1k ∥ 1k");
  });

  it("capacitors in series combine reciprocally", () => {
    const r = bestCombination(2.35e-9, "E12", { maxParts: 2, topology: "series" });
    expect(r[0]!.parts).toEqual([4.7e-9, 4.7e-9]);
  });

  it("results are ranked by |error| then part count, and every value is recomputable from its parts", () => {
    const x = 6.3326e-9; // 100 µH at 200 kHz
    const r = bestCombination(x, "E24", { maxParts: 3, count: 10 });
    for (let k = 1; k < r.length; k++) expect(Math.abs(r[k]!.error)).toBeGreaterThanOrEqual(Math.abs(r[k - 1]!.error) * (1 - 1e-12));
    for (const c of r) {
      expectRelClose(c.error, (c.value - x) / x, 1e-12, "error definition", 1e-18);
      for (const p of c.parts) expect(standardValues("E24")).toContain(Math.round((p / 10 ** Math.floor(Math.log10(p))) * 10) / 10);
      expectRelClose(recompute(c), 1, 1e-12, `recomputed/stated value, ${c.topology}`);
    }
    // three parts always do at least as well as one or two
    const two = bestCombination(x, "E24", { maxParts: 2 })[0]!;
    expect(Math.abs(r[0]!.error)).toBeLessThanOrEqual(Math.abs(two.error));
  });

  it("exhaustive check: no pair of E12 capacitors in parallel beats the best one found", () => {
    // independent method: brute force over all pairs in three decades
    const x = 8.06e-9;
    const parts: number[] = [];
    for (const d of [1e-10, 1e-9, 1e-8]) for (const m of standardValues("E12")) parts.push(Math.round(m * 10) / 10 * d);
    let best = Infinity;
    for (const a of parts) for (const b of parts) best = Math.min(best, Math.abs((a + b - x) / x));
    const found = bestCombination(x, "E12", { maxParts: 2, topology: "parallel" })[0]!;
    expectRelClose(Math.abs(found.error), best, 1e-9, "best pair error", 1e-15);
  });

  it("tolerance filter and fewest-parts preference", () => {
    const x = 6.3326e-9;
    const r = bestCombination(x, "E12", { maxParts: 3, tolerance: 0.02, prefer: "fewestParts" });
    for (const c of r) expect(Math.abs(c.error)).toBeLessThanOrEqual(0.02);
    for (let k = 1; k < r.length; k++) expect(r[k]!.parts.length).toBeGreaterThanOrEqual(r[k - 1]!.parts.length);
  });

  it("bad options throw", () => {
    expect(() => bestCombination(1e-9, "E12", { maxParts: 4 as 3 })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: bestCombination: options.maxParts: must be 1, 2 or 3, got 4]`,
    );
    expect(() => bestCombination(-1, "E12")).toThrow(/x/);
  });

  it("types", () => {
    expectTypeOf(bestCombination).returns.toEqualTypeOf<Combination[]>();
  });
});

/** value of a combination from its topology string, capacitor rules */
function recompute(c: Combination): number {
  const add = (a: number, b: number) => a + b;
  const rec = (a: number, b: number) => (a * b) / (a + b);
  const [a, b, d] = c.parts as [number, number, number];
  switch (c.topology) {
    case "single": return c.parts[0]! / c.value;
    case "parallel": return c.parts.reduce(add) / c.value;
    case "series": return c.parts.reduce(rec) / c.value;
    default: {
      // mixed: try every assignment of the pair and the single part
      const opts = [[a, b, d], [a, d, b], [b, d, a]] as [number, number, number][];
      const op1 = c.topology.startsWith("parallel") ? add : rec;
      const op2 = c.topology.startsWith("parallel") ? rec : add;
      let bestRatio = Infinity;
      for (const [p, q, s] of opts) {
        const v = op2(op1(p, q), s);
        if (Math.abs(v / c.value - 1) < Math.abs(bestRatio - 1)) bestRatio = v / c.value;
      }
      return bestRatio;
    }
  }
}

describe("bestCombination with many three-part candidates", () => {
  it("fewestParts still finds a single part within tolerance (E192, three parts allowed)", () => {
    const x = 6.3326e-9;
    const r = bestCombination(x, "E192", { maxParts: 3, tolerance: 0.005, prefer: "fewestParts", count: 3 });
    expect(r[0]!.parts).toHaveLength(1);
    expect(Math.abs(r[0]!.error)).toBeLessThanOrEqual(0.005);
    // and the accuracy ranking is headed by a three-part hit far closer than any single part
    const acc = bestCombination(x, "E192", { maxParts: 3, count: 1 })[0]!;
    expect(Math.abs(acc.error)).toBeLessThan(1e-4);
  });
});

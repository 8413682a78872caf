import { describe, expect, it } from "vitest";
import { run } from "../casebook/tokenBatch.ts";
import { expectRelClose } from "./helpers/expectRelClose.ts";

describe("casebook: token-batch (200 hand-wound tokens from stock capacitors)", async () => {
  const { notebook, results: r } = await run();
  const by = Object.fromEntries(r.options.map((o) => [o.label, o]));

  it("each series puts the nominal part where f = 1/(2π√(LC)) says", () => {
    // source: the resonance of an LC tank, f = 1/(2π√(LC)): an error ε in C moves f by (1+ε)^(−1/2) − 1
    for (const o of r.options) {
      const c = o.parts.reduce((a, b) => a + b, 0);
      expectRelClose(1 + o.frequencyError, Math.sqrt(r.idealCapacitance / c), 1e-9);
    }
    expect(by["E6 (±20 %)"]!.parts).toHaveLength(1);
    expect(Math.abs(by["E6 (±20 %)"]!.frequencyError)).toBeGreaterThan(Math.abs(by["E24 (±5 %)"]!.frequencyError));
  });

  it("yield rises with the tighter series, E12 falls short of 99 % and E24 reaches it", () => {
    const e6 = by["E6 (±20 %)"]!, e12 = by["E12 (±10 %)"]!, e24 = by["E24 (±5 %)"]!;
    expect(e6.yield).toBeLessThan(e12.yield);
    expect(e12.yield).toBeLessThan(e24.yield);
    expect(e12.upper).toBeLessThan(0.99);
    expect(e12.yield).toBeGreaterThan(0.9);
    expect(r.recommended).toBe("E24 (±5 %)");
    expect(e24.lower).toBeGreaterThanOrEqual(0.99);
    // every interval holds its estimate (Wilson score interval, Wilson 1927)
    for (const o of r.options) {
      expect(o.lower).toBeLessThanOrEqual(o.yield);
      expect(o.upper).toBeGreaterThanOrEqual(o.yield);
    }
    // the capacitor spread costs the most (it moves the resonance ±5 %, a turn 0.8 %)
    expect(r.sensitivity[0]!.variation).toBe("tokenCapacitor");
  });

  it("an explicit batch solved token by token agrees with toleranceYield within binomial sampling error", () => {
    // independent method: 200 tokens drawn by the scenario's own generator, each solved with
    // solveLink, against toleranceYield's Monte Carlo of the same two variations; the batch is a
    // binomial sample, standard error √(p(1−p)/n)
    const p = r.explicitBatch.modelYield;
    const se = Math.sqrt((p * (1 - p)) / r.explicitBatch.count);
    expect(Math.abs(r.explicitBatch.lit / r.explicitBatch.count - p)).toBeLessThan(3 * se + 1 / r.explicitBatch.count);
  });

  it("fits a USB 2.0 port and shows the histogram and the trade-off", () => {
    expect(r.supply.current).toBeLessThan(0.5); // USB 2.0 specification: 500 mA
    const figures = notebook.cells.filter((c) => c.kind === "figure").map((c) => (c as { name: string }).name);
    expect(figures).toEqual(expect.arrayContaining(["batch-histogram", "batch-tradeoff", "exposure"]));
  });
});

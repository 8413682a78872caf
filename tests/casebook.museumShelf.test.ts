import { describe, expect, it } from "vitest";
import { run } from "../casebook/museumShelf.ts";

describe("casebook: museum-shelf (replica coins and gems, one coil or a row)", async () => {
  const { notebook, results: r } = await run();

  it("one coil lights only part of the shelf and leaves dead zones; a row of coils lights most of it", () => {
    expect(r.single.litShare).toBeLessThan(0.5);
    expect(r.single.deadZones).toBeGreaterThan(0);
    expect(r.array.coils).toBe(5);
    // demo design (every second coil a layer lower, so neighbouring windings do not touch):
    // the row about doubles the lit share and lights about three quarters of the shelf
    expect(r.array.litShare.gem).toBeGreaterThan(1.8 * r.single.litShare);
    expect(r.array.litShare.coin).toBeGreaterThan(0.7);
    // every marked display spot lights a nominal gem with margin (1.5 × the 0.5 mA lit threshold)
    expect(r.array.weakestSpot).toBeGreaterThan(1.5 * 5e-4);
  });

  it("a batch of gems lights on every display spot, visitors' hands stay within the basic restriction, the supply holds", () => {
    expect(r.batch.count).toBe(200);
    expect(r.batch.lower).toBeGreaterThan(0.95);
    // ICNIRP 2010 Table 2 (general public, 1.35e-4·f V/m): the hand-sized disc's induced field below it
    expect(r.hands.handRatio).toBeLessThan(1);
    expect(r.hands.worstFlux).toBeGreaterThan(0);
    expect(r.supply.verdict).toBe("within");
    const figures = notebook.cells.filter((c) => c.kind === "figure").map((c) => (c as { name: string }).name);
    expect(figures).toEqual(expect.arrayContaining(["one-coil", "shelf-array", "gem-batch"]));
  });
});

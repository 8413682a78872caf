import { describe, expect, it } from "vitest";
import { run } from "../casebook/gameBoard.ts";

describe("casebook: game-board (four tiles, 24 pieces, 40 cm)", async () => {
  const { notebook, results: r } = await run();
  const scheme = Object.fromEntries(r.schemes.map((s) => [s.label, s]));

  it("alternate phasing leaves a null on the seams; quadrature lights the whole playing area", () => {
    // source: superposition of the tiles' fields (Biot–Savart): neighbouring edges with equal
    // currents cancel the vertical field midway between them; fields 90° apart cancel only where both vanish
    const alt = scheme["alternate 0°/180°"]!, quad = scheme["quadrature 0°/90°"]!, seq = scheme["one tile at a time (¼ duty each)"]!;
    expect(alt.litShare).toBeLessThan(1);
    expect(alt.weakest).toBeLessThan(1e-6);
    expect(Math.abs(alt.weakestAt[0] * alt.weakestAt[1])).toBeLessThan(1e-9); // on a seam (x = 0 or y = 0)
    expect(quad.litShare).toBe(1);
    expect(r.chosen).toBe("quadrature 0°/90°");
    // switching in turn: a quarter of the time each — its weakest average current is lower
    expect(seq.weakest).toBeLessThan(quad.weakest);
    expect(seq.supply).toBeLessThan(quad.supply);
  });

  it("the 24 pieces of the starting position detune each other by a few per cent and all stay lit", () => {
    expect(r.neighbours).toHaveLength(24);
    for (const n of r.neighbours) {
      expect(Math.abs(n.together / n.alone - 1)).toBeLessThan(0.05);
      expect(n.together).toBeGreaterThan(5e-4);
    }
    expect(r.neighbours.some((n) => n.together !== n.alone)).toBe(true);
  });

  it("a lifted piece, a batch at the weakest point and the supply", () => {
    expect(r.tilt).toHaveLength(7);
    expect(r.batch.count).toBe(200);
    expect(r.batch.lower).toBeGreaterThan(0.95);
    expect(r.supply.verdict).toBe("within");
    const figures = notebook.cells.filter((c) => c.kind === "figure").map((c) => (c as { name: string }).name);
    expect(figures).toEqual(expect.arrayContaining(["board-coverage", "piece-tilt", "batch-at-weakest"]));
  });
});

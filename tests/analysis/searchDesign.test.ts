import { describe, expect, it } from "vitest";
import { searchDesign, TanklightInputError, type Progress } from "../../lib/mod.ts";
import { evaluateDesign, type DesignProblem } from "../../lib/analysis/designEval.ts";

// the pebble drawer's question with a half-bridge transmitter: light a red pebble anywhere within
// 30 mm of the centre, 5 mm above the winding, from a USB 2.0 port (demo data)
const requirements = {
  cover: { radius: "30 mm" },
  barrier: "5 mm",
  token: { innerRadius: "6.5 mm", layers: 6 },
  colours: ["red" as const],
  supply: "usb2" as const,
  frequency: { min: "150 kHz", max: "250 kHz" },
};

describe("searchDesign", () => {
  it("finds a design at least as good as a known one that meets the requirements", async () => {
    const known = { radius: 0.05, turns: 10, wire: 0.8e-3, frequency: 200e3, tokenTurns: 100 };
    const space = { radius: { min: "40 mm", max: "70 mm" }, turns: { min: 4, max: 12 }, wire: ["0.8 mm"], tokenTurns: { min: 100, max: 100 } };
    const seen: Progress[] = [];
    const r = await searchDesign(requirements, space, { maxEvaluations: 30, onProgress: (p) => seen.push(p) });
    // the known design, scored the same way (its radius and frequency are not on the coarse grid)
    const radii: number[] = [];
    for (let i = 0; i < 41; i++) for (let j = 0; j < 41; j++) {
      const rr = Math.hypot(0.03 * (2 * i / 40 - 1), 0.03 * (2 * j / 40 - 1));
      if (rr <= 0.03) radii.push(rr);
    }
    const problem: DesignProblem = {
      radii: radii.sort((a, b) => a - b), reach: 0.03, share: 1, barrier: 0.005,
      token: { innerRadius: 0.0065, layers: 6, wire: 0.1e-3 }, colours: ["red"], supplyVoltage: 5, supplyRating: 0.5,
      tilt: 0, litThreshold: 0.5e-3, series: "E12", onResistance: 0.05,
    };
    const k = evaluateDesign(known, problem);
    expect(k.score).toBeGreaterThan(0); // the known design meets the requirements
    expect(r.feasible).toBe(true);
    expect(r.designs[0]!.score).toBeGreaterThanOrEqual(k.score);
    expect(r.designs.length).toBe(3);
    for (let i = 1; i < r.designs.length; i++) {
      expect(r.designs[i]!.score).toBeLessThanOrEqual(r.designs[0]!.score);
      expect(r.designs[i]!.lostBecause).toMatch(/below the winner/);
    }
    expect(r.designs[0]!.summary).toMatch(/binding: (coverage|supply)/);
    expect(r.evaluations).toBeLessThanOrEqual(30);
    expect(seen[seen.length - 1]!.done).toBe(r.evaluations);
    expect(r.method).toMatch(/compass/);
  }, 600_000);

  it("says which requirement binds, and by how much, when nothing in the space meets them", async () => {
    const r = await searchDesign(
      { ...requirements, cover: { radius: "150 mm" }, barrier: "40 mm" },
      { radius: { min: "40 mm", max: "60 mm" }, turns: { min: 2, max: 4 }, wire: ["0.8 mm"], tokenTurns: { min: 60, max: 60 } },
      { maxEvaluations: 6 },
    );
    expect(r.feasible).toBe(false);
    expect(r.shortfall!.requirement).toBe(r.designs[0]!.binding);
    expect(r.shortfall!.message).toMatch(/short|budget/);
  }, 600_000);

  it("rejects an empty band naming the field", async () => {
    await expect(
      searchDesign({ ...requirements, frequency: { min: "250 kHz", max: "150 kHz" } }, { radius: { min: 0.04, max: 0.05 }, turns: { min: 2, max: 3 }, wire: [0.8e-3], tokenTurns: { min: 60, max: 60 } }),
    ).rejects.toThrow(TanklightInputError);
  });
});

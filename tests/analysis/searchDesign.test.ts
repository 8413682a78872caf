import { describe, expect, it } from "vitest";
import { searchDesign, taskPool, TanklightInputError, type Progress } from "../../lib/mod.ts";
import { evaluateDesign } from "../../lib/analysis/designEval.ts";
import { designProblem, refineFinalist } from "../../lib/analysis/searchDesign.ts";

// the pebble drawer's question with a half-bridge transmitter: light a red pebble anywhere within
// 30 mm of the centre, 5 mm above the winding, from a USB 2.0 port, sold in the US (demo data)
const requirements = {
  cover: { radius: "30 mm" },
  barrier: "5 mm",
  token: { innerRadius: "6.5 mm", layers: 6 },
  colours: ["red" as const],
  supply: "usb2" as const,
  frequency: { min: "150 kHz", max: "250 kHz" },
  emission: { rules: ["47 CFR 15.209"] },
};

// a 240 × 120 mm tray lit from a row of coils, sold in Europe, 120–135 kHz (demo data)
const tray = {
  cover: { width: "240 mm", depth: "120 mm" },
  barrier: "5 mm",
  token: { innerRadius: "6.5 mm", layers: 6, size: "40 mm" },
  colours: ["red" as const],
  supply: "usb-c-3a" as const,
  frequency: { min: "120 kHz", max: "135 kHz" },
  emission: { rules: ["CEPT ERC/REC 70-03 Annex 9"] },
  litShare: 0.95,
};
const traySpace = { radius: { min: "30 mm", max: "60 mm" }, turns: { min: 6, max: 12 }, wire: ["0.8 mm"], tokenTurns: { min: 100, max: 140 }, layout: { rows: { min: 1, max: 1 }, columns: { min: 1, max: 2 } } };

describe("searchDesign", () => {
  it("finds a one-coil design at least as good as a known one that meets the requirements", async () => {
    const known = { radius: 0.05, turns: 16, wire: 0.8e-3, frequency: 150e3, tokenTurns: 100, layout: { rows: 1, columns: 1, pitchX: 0, pitchY: 0, phasing: "in phase" as const } };
    const space = { radius: { min: "40 mm", max: "70 mm" }, turns: { min: 4, max: 20 }, wire: ["0.8 mm"], tokenTurns: { min: 100, max: 100 } };
    const seen: Progress[] = [];
    const r = await searchDesign(requirements, space, { maxEvaluations: 30, onProgress: (p) => seen.push(p) });
    // the known design, scored the same way (its radius and frequency are not on the coarse grid)
    const k = evaluateDesign(known, designProblem(requirements, space));
    expect(k.score).toBeGreaterThan(0); // the known design meets every requirement, safety included
    expect(r.feasible).toBe(true);
    expect(r.designs[0]!.score).toBeGreaterThanOrEqual(k.score);
    expect(r.designs.length).toBe(3);
    for (let i = 1; i < r.designs.length; i++) {
      expect(r.designs[i]!.score).toBeLessThanOrEqual(r.designs[0]!.score);
      expect(r.designs[i]!.lostBecause).toMatch(/below the winner/);
    }
    for (const d of r.designs) {
      expect(d.summary).toMatch(/binding: (coverage|supply|exposure|emission)/);
      expect(Math.min(d.margins.coverage, d.margins.supply, d.margins.exposure, d.margins.emission)).toBe(d.score);
      expect(d.exposure).toMatch(/ICNIRP 2010/);
      expect(d.emission).toMatch(/47 CFR 15\.209/);
    }
    expect(r.evaluations).toBeLessThanOrEqual(30);
    const last = seen[seen.length - 1]!;
    expect(last.done).toBe(last.total);
    expect(seen.every((p) => p.done <= p.total && p.remaining >= 0)).toBe(true);
    expect(r.method).toMatch(/compass/);
    // the cautions of the recommended design: implants, metal heating, small parts, radio; each defers to local codes
    for (const word of [/implanted/, /metal/, /small-parts|choking/, /interfere/]) expect(r.cautions.some((c) => word.test(c))).toBe(true);
    expect(r.cautions.filter((c) => /local codes/.test(c)).length).toBeGreaterThanOrEqual(4);
  }, 600_000);

  it("searches array layouts: 95 % of a tray from a row of two coils, which a known design proves feasible, checked with coverageMap's refinement", async () => {
    const p = designProblem(tray, traySpace, { onResistance: 1 });
    const known = { radius: 0.05, turns: 10, wire: 0.8e-3, frequency: 125e3, tokenTurns: 140, layout: { rows: 1, columns: 2, pitchX: 0.12, pitchY: 0, phasing: "quadrature" as const } };
    const k = await refineFinalist(evaluateDesign(known, p), p, undefined);
    expect(k.score).toBeGreaterThan(0);
    expect(k.refined!.litShare).toBeGreaterThanOrEqual(0.95);
    const r = await searchDesign(tray, traySpace, { maxEvaluations: 24, onResistance: 1 });
    expect(r.feasible).toBe(true);
    expect(r.designs[0]!.score).toBeGreaterThanOrEqual(k.score);
    // one coil cannot light both ends of the tray from its centre: the winner is an array, refined
    expect(r.designs[0]!.candidate.layout.columns).toBe(2);
    expect(r.designs[0]!.refined!.resolution).toBeLessThanOrEqual(0.004);
    expect(r.designs[0]!.refined!.litShare).toBeGreaterThanOrEqual(0.95);
    expect(r.designs[0]!.summary).toMatch(/1 × 2 coils at 120 × 0 mm pitch/);
  }, 600_000);

  it("refines an array finalist to finalResolution (1 mm by default) within its cost guard, and says when the guard stops it short", async () => {
    const p = designProblem(tray, traySpace, { onResistance: 1 });
    const known = evaluateDesign({ radius: 0.05, turns: 10, wire: 0.8e-3, frequency: 125e3, tokenTurns: 140, layout: { rows: 1, columns: 2, pitchX: 0.12, pitchY: 0, phasing: "alternate" as const } }, p);
    const fine = await refineFinalist(known, p, undefined);
    expect(fine.refined!.limitedBy).toBeUndefined();
    expect(fine.refined!.resolution).toBeLessThanOrEqual(0.001);
    const guarded = await refineFinalist(known, p, undefined, { resolution: 0.001, maxSolves: 2000 });
    expect(guarded.refined!.limitedBy).toMatch(/stopped at .* mm, not 1 mm: .* over maxRefineSolves \(2000\)/);
    expect(guarded.refined!.resolution).toBeGreaterThan(0.001);
    expect(guarded.refined!.resolution).toBeLessThanOrEqual(0.004);
    // the dead line on the seam of the 0°/180° pair is found by both: the finer map's lit share within a 4 mm band's share of the coarser
    expect(Math.abs(fine.refined!.litShare - guarded.refined!.litShare)).toBeLessThan(0.004 / 0.12);
  }, 600_000);

  it("gives the same designs on 1 and 2 threads", async () => {
    const one = await searchDesign(tray, traySpace, { maxEvaluations: 8, onResistance: 1 });
    const pool = await taskPool(2);
    try {
      const two = await searchDesign(tray, traySpace, { maxEvaluations: 8, onResistance: 1, threads: pool });
      expect(two.designs.map((d) => [d.candidate, d.score, d.margins])).toEqual(one.designs.map((d) => [d.candidate, d.score, d.margins]));
      expect(two.evaluations).toBe(one.evaluations);
    } finally {
      await pool.close();
    }
  }, 600_000);

  it("says a design lost on safety, and by how much, when an exposure verdict binds", async () => {
    // the ICNIRP 2010 reference level for the public (27 µT) on the surface 5 mm above the winding
    const r = await searchDesign(
      { ...requirements, exposure: { assess: "reference level", standard: "ICNIRP 2010" } },
      { radius: { min: "40 mm", max: "60 mm" }, turns: { min: 6, max: 10 }, wire: ["0.8 mm"], tokenTurns: { min: 100, max: 100 } },
      { maxEvaluations: 6 },
    );
    expect(r.feasible).toBe(false);
    expect(r.shortfall!.requirement).toBe("exposure");
    expect(r.shortfall!.message).toMatch(/exposure requirement — it binds: .* dB short of the required 6 dB margin/);
    expect(r.designs[0]!.binding).toBe("exposure");
    expect(r.designs[0]!.exposure).toMatch(/EXCEEDS ICNIRP 2010/);
    for (const d of r.designs.slice(1)) if (d.binding === "exposure") expect(d.lostBecause).toMatch(/lost on safety/);
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

  it("rejects an empty band and a layout beyond its limits, naming the field", async () => {
    const space = { radius: { min: 0.04, max: 0.05 }, turns: { min: 2, max: 3 }, wire: [0.8e-3], tokenTurns: { min: 60, max: 60 } };
    await expect(searchDesign({ ...requirements, frequency: { min: "250 kHz", max: "150 kHz" } }, space)).rejects.toThrow(/requirements\.frequency/);
    await expect(searchDesign(requirements, { ...space, layout: { rows: { min: 1, max: 9 }, columns: { min: 1, max: 2 } } })).rejects.toThrow(TanklightInputError);
    await expect(searchDesign(requirements, { ...space, layout: { rows: { min: 2, max: 1 }, columns: { min: 1, max: 2 } } })).rejects.toThrow(/space\.layout\.rows/);
  });
});

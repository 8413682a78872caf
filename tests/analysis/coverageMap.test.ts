import { describe, expect, it } from "vitest";
import { coverageMap, solveLink, TanklightInputError } from "../../lib/mod.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { drawer, LID } from "./fixtures.ts";

const ledAt = (sys: Parameters<typeof solveLink>[0]): number => solveLink(sys).receivers[0]!.leds[0]!.averageCurrent;

describe("coverageMap", () => {
  it("agrees point by point with direct solveLink calls (independent method)", async () => {
    const map = await coverageMap(drawer(), { x: { from: -0.08, to: 0.08, points: 5 }, y: { from: 0, to: 0.06, points: 3 }, z: LID }, { refine: false });
    expect(map.shape).toEqual([5, 3]);
    expect(map.units.ledCurrent).toBe("A");
    for (let j = 0; j < 3; j++) {
      for (let i = 0; i < 5; i++) {
        const x = map.axes[0]!.values[i]!;
        const y = map.axes[1]!.values[j]!;
        const direct = ledAt(drawer({ position: [x, y, LID] }));
        // the map tabulates the LED's describing function and takes M from couplingEvaluator
        // (0.1 %); solveLink uses the exact describing function
        expectOutside({
          quantity: `coverageMap LED current at (${x.toFixed(3)}, ${y.toFixed(3)}, ${LID}) m`,
          source: "independent method: solveLink(system) at that pose",
          ours: map.ledCurrent[i + 5 * j]!,
          reference: direct,
          rtol: 2e-3,
          atol: 1e-9, // points in the dark carry nanoamperes
          unit: "A",
        });
        expect(map.lit[i + 5 * j]).toBe(direct >= map.litThreshold ? 1 : 0);
      }
    }
    // the supply current at each point is the link's input power over the supply voltage
    const r = solveLink(drawer({ position: [0, 0, LID] }));
    expectOutside({ quantity: "coverageMap supply current at the centre", source: "independent method: solveLink power.input / 5 V", ours: map.supplyCurrent![2]!, reference: r.power.input / 5, rtol: 2e-3, unit: "A" });
    expect(map.supply!.maxCurrent).toBe(Math.max(...map.supplyCurrent!));
  });

  it("finds a 1 mm dead line that a uniform 1 cm grid misses", async () => {
    // 12 V: the flux through a flat token reverses just outside the 50 mm winding; the LED is
    // dark only where |M| is small, a band about 1 mm wide at z = 5 mm
    const sys = drawer({ supply: 12 });
    const region = { x: { from: 0, to: 0.09, step: 0.01 }, y: 0, z: LID };
    const coarse = await coverageMap(sys, region, { refine: false });
    expect(coarse.deadZones).toHaveLength(0);
    expect(coarse.litFraction).toBe(1);
    const fine = await coverageMap(sys, region, { resolution: "0.1 mm" });
    expect(fine.deadZones).toHaveLength(1);
    const zone = fine.deadZones[0]!;
    if (zone.kind !== "interval") throw new Error("expected an interval");
    expect(zone.length).toBeGreaterThan(0.5e-3);
    expect(zone.length).toBeLessThan(1.5e-3);
    expectRelClose(fine.litFraction, 1 - zone.length / 0.09, 1e-12, "lit fraction along the line (dimensionless share)");
    // independent check at the zone's middle and at the grid nodes either side
    const mid = (zone.from[0] + zone.to[0]) / 2;
    expect(ledAt(drawer({ supply: 12, position: [mid, 0, LID] }))).toBeLessThan(fine.litThreshold);
    expect(ledAt(drawer({ supply: 12, position: [0.05, 0, LID] }))).toBeGreaterThan(fine.litThreshold);
    expect(ledAt(drawer({ supply: 12, position: [0.06, 0, LID] }))).toBeGreaterThan(fine.litThreshold);
    expect(fine.weakest.current).toBeLessThan(1e-6);
    expect(fine.guarantee).toContain("0.1 mm");
  });

  it("finds the same dead ring on a plane as a polygon, refining along it", async () => {
    const sys = drawer({ supply: 12 });
    const map = await coverageMap(sys, { x: { from: 0, to: 0.07, step: 0.01 }, y: { from: 0, to: 0.07, step: 0.01 }, z: LID }, { resolution: "0.5 mm" });
    expect(map.refinedCells).toBeGreaterThan(5);
    const polygons = map.deadZones.flatMap((d) => (d.kind === "polygon" ? [d] : []));
    const radii = (d: (typeof polygons)[number]): number[] => d.vertices.map((v) => Math.hypot(v[0], v[1]));
    // the ring of reversed flux, 50–54 mm from the centre, is one polygon (a quarter ring here);
    // the rest is the dark far corner beyond about 91 mm
    const ring = polygons.filter((d) => Math.max(...radii(d)) < 0.054);
    expect(ring).toHaveLength(1);
    expect(Math.min(...radii(ring[0]!))).toBeGreaterThan(0.05);
    for (const d of polygons) if (d !== ring[0]) expect(Math.min(...radii(d))).toBeGreaterThan(0.09);
    // a quarter ring about 1 mm wide (the line test above): area ≈ (π/2)·r·w, r ≈ 52 mm; wide
    // bounds because the fine step is 0.5 mm
    expect(ring[0]!.area).toBeGreaterThan((Math.PI / 2) * 0.052 * 0.6e-3);
    expect(ring[0]!.area).toBeLessThan((Math.PI / 2) * 0.052 * 1.5e-3);
    const dead = polygons.reduce((a, d) => a + d.area, 0);
    expectRelClose(map.litFraction, 1 - dead / (0.07 * 0.07), 1e-12, "lit fraction over the plane");
  });

  it("takes the worst of a set of tilts at every point", async () => {
    const region = { x: { from: 0, to: 0.04, points: 3 }, y: 0, z: 0.02 };
    const flat = await coverageMap(drawer(), region, { refine: false });
    const tilted = await coverageMap(drawer(), region, { refine: false, orientation: { tilt: "60 deg", about: [0, 1, 0] } });
    const both = await coverageMap(drawer(), region, { refine: false, orientation: [{ tilt: 0 }, { tilt: "60 deg", about: [0, 1, 0] }] });
    for (let i = 0; i < 3; i++) expect(both.ledCurrent[i]).toBe(Math.min(flat.ledCurrent[i]!, tilted.ledCurrent[i]!));
    expect(both.mutual.length).toBe(6);
    expect(tilted.ledCurrent[0]!).toBeLessThan(flat.ledCurrent[0]!);
  });

  it("rejects a region without a range, naming the field", async () => {
    await expect(coverageMap(drawer(), { x: 0, y: 0, z: "5 mm" })).rejects.toThrow(TanklightInputError);
    await expect(coverageMap(drawer(), { x: { from: 0, to: 0.1 }, y: 0, z: 0 })).rejects.toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: coverageMap: region.x: a range needs from ≠ to and exactly one of points or step, got {"from":0,"to":0.1}]`);
  });
});

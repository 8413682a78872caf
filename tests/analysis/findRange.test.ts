import { describe, expect, it } from "vitest";
import { findRange, solveLink } from "../../lib/mod.ts";
import { drawer, LID } from "./fixtures.ts";

const up = { from: [0, 0, LID] as [number, number, number], along: [0, 0, 1] as [number, number, number] };
const side = { from: [0, 0, LID] as [number, number, number], along: [1, 0, 0] as [number, number, number] };

describe("findRange", () => {
  it("brackets the lit boundary to its stated resolution (checked with solveLink either side)", () => {
    const r = findRange(drawer(), up, { resolution: "0.2 mm" });
    expect(r.resolution).toBe(2e-4);
    expect(r.openEnded).toBe(false);
    const at = (s: number): number => solveLink(drawer({ position: [0, 0, LID + s] })).receivers[0]!.leds[0]!.averageCurrent;
    expect(at(r.range)).toBeGreaterThanOrEqual(r.litThreshold * 0.999);
    expect(at(r.range + r.resolution)).toBeLessThan(r.litThreshold);
    // the margin curve is sorted and falls through 1 at the range
    for (let i = 1; i < r.curve.length; i++) expect(r.curve[i]!.distance).toBeGreaterThanOrEqual(r.curve[i - 1]!.distance);
    expect(r.curve[0]!.margin).toBeGreaterThan(1);
  });

  it("grows with drive strength and with token Q", () => {
    const bySupply = [3, 5, 8].map((v) => findRange(drawer({ supply: v }), up).range);
    expect(bySupply[1]!).toBeGreaterThan(bySupply[0]!);
    expect(bySupply[2]!).toBeGreaterThan(bySupply[1]!);
    // token Q = ωL/R: a larger coil resistance lowers Q (the token's own R is about 11 Ω here)
    const byR = [24, 16, 11].map((rOhm) => findRange(drawer({ tokenResistance: rOhm }), up).range);
    expect(byR[1]!).toBeGreaterThan(byR[0]!);
    expect(byR[2]!).toBeGreaterThan(byR[1]!);
  });

  it("reaches further in red than green, and less far sideways at the surface than on the axis", () => {
    const red = findRange(drawer({ colour: "red" }), up).range;
    const green = findRange(drawer({ colour: "green-gap" }), up).range;
    // trade practice (no source): the lowest forward voltage (red) reaches furthest
    expect(red).toBeGreaterThan(green);
    // trade practice (no source): one round transmitter reaches less far sideways at the surface
    // than straight up
    const sideways = findRange(drawer({ colour: "red" }), side, { max: 0.15 });
    expect(sideways.range).toBeLessThan(red);
  });

  it("finds the dark line where M changes sign between two lit scan points", () => {
    // 12 V: lit on both sides of a ≈1 mm dark ring at 51–52 mm; a 1 cm scan steps over it
    const r = findRange(drawer({ supply: 12 }), side, { max: 0.12, step: "10 mm", resolution: "0.05 mm" });
    expect(r.boundaries.length).toBeGreaterThanOrEqual(3);
    expect(r.range).toBeGreaterThan(0.05);
    expect(r.range).toBeLessThan(0.053);
    expect(r.boundaries[1]! - r.boundaries[0]!).toBeLessThan(1.5e-3);
    expect(r.furthest).toBeGreaterThan(0.08);
  });
});

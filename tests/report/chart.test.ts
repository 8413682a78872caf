import { describe, expect, it } from "vitest";
import * as chart from "../../lib/report/chart.ts";
import { levelSegments } from "../../lib/report/contour.ts";
import { displayScale } from "../../lib/report/scale.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { extent, walkSpec } from "./specWalk.ts";

// every axis title ends in a unit in parentheses: "height (mm)", "k (%)", "tokens (count)"
const UNIT_TITLE = /\((p|n|µ|m|k|M)?(m|A|V|T|Hz|s|%|count|×)\)$/;

const grid = Array.from({ length: 11 }, (_, i) => -0.05 + i * 0.01);
const bump = grid.map((y) => grid.map((x) => 2e-3 * Math.exp(-(x * x + y * y) / 1e-3)));

describe("chart builders", () => {
  it("displayScale picks the prefix that puts the largest value between 1 and 1000", () => {
    expect(displayScale(0.12, "m")).toEqual({ factor: 1000, unit: "mm" });
    expect(displayScale(2.5e-4, "A")).toEqual({ factor: 1e6, unit: "µA" });
    expect(displayScale(217e3, "Hz")).toEqual({ factor: 1e-3, unit: "kHz" });
    expect(displayScale(3, "")).toEqual({ factor: 1, unit: "" });
  });

  it("chart.coverage: rect cells with the current in mA, a lit boundary, dead zones, units on both axes", () => {
    const spec = chart.coverage({ x: grid, y: grid, current: bump, threshold: 5e-4, deadZones: [[[0.03, 0.03], [0.04, 0.03], [0.04, 0.04]]] });
    const p = walkSpec(spec);
    expect(p.marks).toEqual(["rect", "rule", "line", "text"]);
    expect(p.titles).toEqual(["x position (mm)", "y position (mm)"]);
    p.titles.forEach((t) => expect(t).toMatch(UNIT_TITLE));
    const cells = p.data[0]!;
    expect(cells).toHaveLength(121);
    // cell edges half a step beyond the outer centres; currents in mA
    expect(extent(cells, "x")).toEqual([-55, 45]);
    expect(extent(cells, "x2")).toEqual([-45, 55]);
    expect(extent(cells, "current")[1]).toBe(2);
    // lit exactly where current ≥ threshold
    expect(cells.filter((c) => c.lit).length).toBe(bump.flat().filter((i) => i >= 5e-4).length);
    // the boundary lies where the Gaussian falls to the threshold: r² = 1e-3·ln 4
    const r = Math.sqrt(1e-3 * Math.log(4)) * 1000;
    for (const s of p.data[1]!) {
      const rr = Math.hypot(s.x as number, s.y as number);
      expect(Math.abs(rr - r)).toBeLessThan(2.5); // linear interpolation on a 10 mm grid
    }
    // the dead zone polygon is closed
    expect(p.data[2]!).toHaveLength(4);
  });

  it("chart.coverage names the offending field on bad input", () => {
    expect(() => chart.coverage({ x: grid, y: grid, current: bump.slice(1), threshold: 5e-4 })).toThrow(TanklightInputError);
    expect(() => chart.coverage({ x: grid, y: grid, current: bump, threshold: -1 })).toThrow(/threshold/);
    expect(() => chart.coverage({ x: [0, Number.NaN], y: grid, current: bump, threshold: 1e-3 })).toThrow(/x\[1\]/);
  });

  it("chart.ledCurrent: one line per colour in that LED's colour, a threshold rule, log current axis", () => {
    const spec = chart.ledCurrent({
      curves: [
        { colour: "red", distance: [0.01, 0.05, 0.1], current: [5e-3, 4e-4, 1e-5] },
        { colour: "green-gap", distance: [0.01, 0.05, 0.1], current: [3e-3, 1e-4, 1e-9] },
      ],
      threshold: 5e-4,
    });
    const p = walkSpec(spec);
    expect(p.marks).toEqual(["line", "rule", "text"]);
    expect(p.titles).toEqual(["height above the transmitter (mm)", "LED average current (mA)"]);
    // 1e-9 A is below threshold/100 and is clipped from the log axis
    expect(p.data[0]!).toHaveLength(5);
    expect(extent(p.data[0]!, "distance")).toEqual([10, 100]);
    expect(p.data[1]![0]!.level).toBe(0.5);
  });

  it("chart.ledCurrent plots a tilt in degrees when asked, without an SI prefix", () => {
    const p = walkSpec(chart.ledCurrent({ curves: [{ colour: "blue", distance: [0, 30, 60], current: [2e-3, 1e-3, 2e-4] }], threshold: 5e-4, distanceName: "tilt", distanceUnit: "°" }));
    expect(p.titles).toEqual(["tilt (°)", "LED average current (mA)"]);
    expect(extent(p.data[0]!, "distance")).toEqual([0, 60]);
  });

  it("chart.coupling: height (log |k|) and offset (signed k) panels in %", () => {
    const spec = chart.coupling({
      byHeight: [{ label: "axis", distance: [0.01, 0.05], k: [0.05, 0.004] }],
      byOffset: [{ label: "5 mm", distance: [0, 0.06], k: [0.05, -0.01] }],
    });
    const p = walkSpec(spec);
    expect(p.marks).toEqual(["line", "line"]);
    expect(p.titles).toEqual(["height above the transmitter (mm)", "coupling factor |k| (%)", "offset from the axis (mm)", "coupling factor k (%)"]);
    expect(extent(p.data[1]!, "k")).toEqual([-1, 5]);
  });

  it("chart.loadLine, chart.waveform, chart.spectrum carry volts, amperes, seconds and hertz", () => {
    const ll = walkSpec(chart.loadLine({ voltage: [0, 1, 2], available: [3e-3, 2e-3, 1e-3], led: [0, 1e-5, 9e-3], operatingPoint: { voltage: 1.8, current: 1.2e-3 } }));
    expect(ll.titles).toEqual(["tank voltage amplitude, peak (V)", "fundamental current, peak (mA)"]);
    expect(ll.marks).toContain("point");
    const t = Float64Array.from({ length: 1000 }, (_, i) => i * 1e-8);
    const wf = walkSpec(chart.waveform({ time: t, samples: t.map((x) => 10 * Math.sin(1e6 * x)), fundamental: t.map((x) => 9 * Math.sin(1e6 * x)), name: "coil current", unit: "A" }));
    expect(wf.titles).toEqual(["time (µs)", "coil current (A)"]);
    expect(wf.data[0]!.length).toBe(1200); // thinned to 600 points a curve, two curves
    expect(extent(wf.data[0]!, "time")).toEqual([0, 9.99]);
    const sp = walkSpec(chart.spectrum({ amplitude: [1, 8, 2, 0.5], frequency: 200e3, name: "switch voltage", unit: "V" }));
    expect(sp.marks).toEqual(["bar", "text"]);
    expect(sp.titles[0]).toBe("frequency (kHz)");
    expect(sp.data[0]!.map((r) => r.level)).toEqual(["0 dB", "-12 dB", "-24 dB"]);
  });

  it("chart.yieldHistogram counts every sample once and splits lit from unlit at the threshold", () => {
    const samples = Array.from({ length: 500 }, (_, i) => 2e-4 + (i / 499) * 2e-3);
    const p = walkSpec(chart.yieldHistogram({ samples, threshold: 5e-4, bins: 20 }));
    const bins = p.data[0]!;
    expect(bins.reduce((s, b) => s + (b.count as number), 0)).toBe(500);
    expect(p.titles).toEqual(["LED average current (mA)", "tokens (count)"]);
    for (const b of bins) expect(b.lit).toBe(((b.start as number) + (b.end as number)) / 2 >= 0.5 ? "lit" : "unlit");
  });

  it("chart.exposure draws the reference-level line where the field crosses it", () => {
    const off = [0, 0.02, 0.04, 0.06], h = [0.01, 0.03, 0.05];
    const field = h.map((z) => off.map((x) => 1e-4 * (0.01 / Math.hypot(x, z)) ** 3));
    const p = walkSpec(chart.exposure({ offset: off, height: h, field, referenceLevel: 27e-6, referenceName: "ICNIRP 2010 public" }));
    expect(p.marks).toEqual(["rect", "rule"]);
    expect(p.titles).toEqual(["offset from the transmitter axis (mm)", "height above the surface (mm)"]);
    expect(p.data[1]!.length).toBeGreaterThan(0);
  });

  it("chart.tradeoff joins the non-dominated designs and labels the chosen one", () => {
    const pts = [
      { label: "A", cost: 0.2, margin: 3 },
      { label: "B", cost: 0.4, margin: 5, chosen: true },
      { label: "C", cost: 0.5, margin: 4 },
    ];
    expect(chart.paretoFront(pts).map((p) => p.label)).toEqual(["A", "B"]);
    const p = walkSpec(chart.tradeoff({ points: pts, cost: { name: "supply current", unit: "A" }, margin: { name: "worst-point margin", unit: "×" } }));
    expect(p.titles.slice(0, 2)).toEqual(["supply current (mA)", "worst-point margin (×)"]);
    expect(p.data[2]!.map((r) => r.label)).toEqual(["B"]);
  });
});

describe("levelSegments (marching squares)", () => {
  it("finds a straight level line exactly for a linear field", () => {
    // independent method: for v = x the level line v = 0.3 is the line x = 0.3, exactly under linear interpolation
    const xs = [0, 0.5, 1], ys = [0, 1, 2];
    const segs = levelSegments(xs, ys, ys.map(() => xs.map((x) => x)), 0.3);
    expect(segs).toHaveLength(2);
    for (const s of segs) {
      expectRelClose(s.x1, 0.3, 1e-12, "x1");
      expectRelClose(s.x2, 0.3, 1e-12, "x2");
    }
  });

  it("returns nothing when the level is not crossed", () => {
    expect(levelSegments([0, 1], [0, 1], [[1, 1], [1, 1]], 2)).toEqual([]);
  });
});

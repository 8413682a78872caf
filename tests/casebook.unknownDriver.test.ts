import { describe, expect, it } from "vitest";
import { run } from "../casebook/unknownDriver.ts";

describe("casebook: unknown-driver (calibration from bench measurements)", () => {
  const { notebook, results } = run();

  it("calibrates the pad's coil current and the lit threshold, both pinned down", () => {
    expect(results.identified).toBe(true);
    // demo measurements were made up from a pad carrying 1.3 A and an eye seeing 0.15 mA (demo data)
    expect(results.coilCurrentInterval[0]).toBeLessThan(1.3);
    expect(results.coilCurrentInterval[1]).toBeGreaterThan(1.3);
    expect(results.litThreshold).toBeGreaterThan(1e-4);
    expect(results.litThreshold).toBeLessThan(2.5e-4);
  });

  it("the calibrated current is one a 5 V driver can make", () => {
    expect(results.plausible).toBe(true);
  });

  it("reproduces the measured edge of the old red pebble and predicts the new one further, with a band", () => {
    expect(Math.abs(results.oldRed.nominal - 0.098)).toBeLessThan(0.003);
    expect(results.newRed.nominal).toBeGreaterThan(results.oldRed.nominal);
    expect(results.newRed.low).toBeLessThan(results.newRed.nominal);
    expect(results.newRed.high).toBeGreaterThan(results.newRed.nominal);
  });

  it("the report has the measured-against-predicted figure and cautions", () => {
    const kinds = notebook.cells.map((c) => c.kind);
    expect(kinds).toContain("figure");
    expect(kinds).toContain("cautions");
  });
});

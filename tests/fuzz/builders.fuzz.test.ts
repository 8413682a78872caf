/**
 * Fuzz: coil builders and conductors (lib/em/builders) — bad and extreme specs give a clear
 * TanklightInputError or a finite coil (framework: tests/fuzz/framework.ts).
 */
import { describe, expect, it } from "vitest";
import { fuzzSuite } from "./framework.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { solenoid } from "../../lib/em/builders/solenoid.ts";
import { flatSpiral } from "../../lib/em/builders/flatSpiral.ts";
import { rectSpiral } from "../../lib/em/builders/rectSpiral.ts";
import { rectLoop } from "../../lib/em/builders/rectLoop.ts";
import { awgWire, copperWeightThickness, litzWire, pcbTrace, roundWire } from "../../lib/em/builders/conductor.ts";

fuzzSuite("builders", [
  { name: "roundCoil", call: roundCoil, valid: [{ innerRadius: "10 mm", turns: 12, layers: 2, wire: { diameter: "0.4 mm", insulation: "0.02 mm" } }] },
  { name: "solenoid", call: solenoid, valid: [{ radius: "10 mm", turns: 8, pitch: "1 mm", wire: { diameter: "0.5 mm" } }] },
  { name: "flatSpiral", call: flatSpiral, valid: [{ innerRadius: "5 mm", turns: 6, pitch: "1 mm", trace: { width: "0.6 mm", thickness: "35 um" } }] },
  { name: "rectSpiral", call: rectSpiral, valid: [{ outerWidth: "40 mm", outerHeight: "30 mm", turns: 4, pitch: "1 mm", trace: { width: "0.5 mm", thickness: "35 um" } }] },
  { name: "rectLoop", call: rectLoop, valid: [{ width: "60 mm", height: "35 mm", wire: { diameter: "0.5 mm" } }] },
  { name: "roundWire", call: roundWire, valid: ["0.4 mm", { insulation: "0.02 mm" }], params: ["diameter"] },
  { name: "awgWire", call: awgWire, valid: [26, {}], params: ["gauge"] },
  { name: "litzWire", call: litzWire, valid: [40, "0.071 mm", {}], params: ["strands", "strandDiameter"] },
  { name: "pcbTrace", call: pcbTrace, valid: ["0.5 mm", "35 um", {}], params: ["width", "thickness"] },
  { name: "copperWeightThickness", call: copperWeightThickness, valid: [1], params: ["ounces"] },
]);

describe("size limits state the limit and why", () => {
  it("roundCoil({ turns: 1e9 }) fails at once instead of building for minutes", () => {
    const t0 = performance.now();
    expect(() => roundCoil({ innerRadius: "10 mm", turns: 1e9, wire: { diameter: "0.4 mm" } })).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: roundCoil: turns: must be a whole number ≥ 1 and ≤ 10000 (each turn is one filament and self-inductance sums turns² filament pairs), got 1000000000]`);
    expect(performance.now() - t0).toBeLessThan(1000);
  });
  it("rectSpiral cornerSegments and flatSpiral vertices are bounded", () => {
    expect(() => rectSpiral({ outerWidth: "40 mm", outerHeight: "30 mm", turns: 4, pitch: "1 mm", cornerRadius: "3 mm", cornerSegments: 1e9, trace: { width: "0.5 mm", thickness: "35 um" } })).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: rectSpiral: cornerSegments: must be a whole number ≥ 1 and ≤ 256 (every field and inductance evaluation pays for each chord), got 1000000000]`);
    expect(() => flatSpiral({ innerRadius: "5 mm", turns: 9000, pitch: "0.1 mm", model: "spiral", segmentsPerTurn: 4096, wire: { diameter: "0.05 mm" } })).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: flatSpiral: segmentsPerTurn: gives 36864000 vertices (turns × segmentsPerTurn), more than 1000000: memory and the time of every field and inductance evaluation grow with the vertex count, got 4096]`);
    expect(() => litzWire(1e9, "0.071 mm")).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: litzWire: strands: must be a whole number ≥ 1 and ≤ 100000 (beyond it no litz wire is made; the strand model loses meaning), got 1000000000]`);
  });
});

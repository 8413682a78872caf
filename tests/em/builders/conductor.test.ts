import { describe, expect, expectTypeOf, it } from "vitest";
import { awgWire, conductorFootprint, copperWeightThickness, litzWire, pcbTrace, roundWire, type RoundWire } from "../../../lib/em/builders/conductor.ts";
import { awgDiameter } from "../../../lib/em/classicFormulas.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

describe("roundWire / awgWire", () => {
  it("outer diameter = bare + 2·insulation, or as given, or bare; copper by default", () => {
    expect(roundWire("0.5 mm", { insulation: "20 um" })).toEqual({ kind: "round", diameter: 5e-4, outerDiameter: 5.4e-4, material: "copper" });
    expect(roundWire(5e-4, { outerDiameter: 5.5e-4, material: "aluminium" }).material).toBe("aluminium");
    expect(roundWire(5e-4).outerDiameter).toBe(5e-4);
    expect(conductorFootprint(roundWire(5e-4, { outerDiameter: 5.5e-4 }))).toBe(5.5e-4);
  });

  it("awgWire uses the ASTM B258 diameter", () => {
    expect(awgWire(30).diameter).toBe(awgDiameter(30));
    expectRelClose(awgWire("4/0", { insulation: "1 mm" }).outerDiameter, 0.011684 + 0.002, 1e-14, "4/0 with 1 mm insulation");
  });

  it("rejects an outer diameter below the bare one and both insulation forms at once", () => {
    expect(() => roundWire("0.5 mm", { outerDiameter: "0.4 mm" })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: roundWire: outerDiameter: must be ≥ the bare diameter 0.0005 m, got '0.4 mm']`,
    );
    expect(() => roundWire("0.5 mm", { outerDiameter: "0.6 mm", insulation: "0.05 mm" })).toThrow(/not both/);
    expect(() => roundWire("5 kHz")).toThrow(TanklightInputError);
  });
});

describe("litzWire", () => {
  it("estimates the bundle as d_s·√(strands/fill) when no outer diameter is given", () => {
    const l = litzWire(100, "0.1 mm", { fillFactor: 0.64 });
    expectRelClose(l.outerDiameter, 1e-4 * Math.sqrt(100 / 0.64), 1e-14, "bundle estimate");
    expect(litzWire(100, "0.1 mm", { outerDiameter: "1.5 mm" }).outerDiameter).toBe(1.5e-3);
  });

  it("rejects a bundle too small for its strands and a fill factor above hexagonal packing", () => {
    expect(() => litzWire(100, "0.1 mm", { outerDiameter: "0.5 mm" })).toThrow(/too small to hold 100 strands/);
    expect(() => litzWire(10, "0.1 mm", { fillFactor: 0.95 })).toThrow(/fillFactor/);
    expect(() => litzWire(2.5, "0.1 mm")).toThrow(/strands/);
  });
});

describe("pcbTrace and copper weight", () => {
  it("1 oz/ft² of copper (density 8.89 g/cm³) is 34.3 µm, near the 35 µm fabricators quote", () => {
    // definition: 1 oz = 28.349523125 g, 1 ft² = 0.09290304 m² (both exact), density 8890 kg/m³ (IEC 60028)
    expectRelClose(copperWeightThickness(1), 0.028349523125 / (0.09290304 * 8890), 1e-15, "definition");
    // trade practice (no source): "1 oz copper = 35 µm" (nominal; finished boards vary ±10 %)
    expectOutside({ quantity: "1 oz copper thickness", source: "trade practice (no source): 35 µm nominal", ours: copperWeightThickness(1), reference: 35e-6, rtol: 0.03, unit: "m" });
    expect(pcbTrace("0.4 mm", "2 oz").thickness).toBe(copperWeightThickness(2));
    expect(pcbTrace(4e-4, "35 um")).toEqual({ kind: "trace", width: 4e-4, thickness: 3.5e-5, material: "copper" });
  });

  it("rejects a non-positive width or weight", () => {
    expect(() => pcbTrace(0, "1 oz")).toThrow(/width/);
    expect(() => pcbTrace("1 mm", "0 oz")).toThrow(/thickness/);
    expect(() => copperWeightThickness(-1)).toThrow(TanklightInputError);
  });

  it("types", () => {
    expectTypeOf(roundWire).returns.toEqualTypeOf<RoundWire>();
    expectTypeOf(pcbTrace).parameter(1).toEqualTypeOf<number | string>();
  });
});

describe("materials", () => {
  it("accept the materials of lib/em/materials.ts and name an unknown one", () => {
    expect(roundWire("0.5 mm", { material: "aluminium" }).material).toBe("aluminium");
    expect(() => roundWire("0.5 mm", { material: "unobtainium" })).toThrow(/material: is not a known material/);
    expect(() => pcbTrace("0.5 mm", "1 oz", { material: "gold?" })).toThrow(/material/);
  });
});

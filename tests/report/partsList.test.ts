import { describe, expect, it } from "vitest";
import { partsList, partVoltages, wireText } from "../../lib/report/partsList.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

describe("partsList", () => {
  it("splits a series capacitor's voltage in inverse proportion to the capacitances (charge conservation)", () => {
    // independent method: series capacitors carry the same charge, Q = C_i·V_i, ΣV_i = V
    const v = partVoltages([82e-9, 270e-9], "series", 10);
    expectRelClose(v[0]! + v[1]!, 10, 1e-12, "sum");
    expectRelClose(v[0]! * 82e-9, v[1]! * 270e-9, 1e-12, "equal charge");
    expect(partVoltages([1e-9, 2e-9], "parallel", 10)).toEqual([10, 10]);
  });

  it("lists each capacitor part with series, tolerance, voltage rating and dielectric; wire with gauge and length; LEDs; the supply", () => {
    const token = roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
    const rows = partsList({
      coils: [{ item: "token coil", coil: token, quantity: 10 }],
      capacitors: [{ item: "token capacitor", parts: [2.2e-9], topology: "single", series: "E12", peakVoltage: 2, quantity: 10 }],
      leds: [{ item: "token LED", colour: "red", quantity: 10 }],
      supply: { item: "supply", voltage: 5, current: 0.6, rating: 0.5 },
    });
    // trade practice (no source): E12 parts are ±10 %; a tank capacitor is rated ≥ 2 × its peak voltage; C0G below 10 nF
    expect(rows[0]!.part).toBe("2.20 nF ±10 % (E12), 6.3 V, class 1 ceramic C0G (NP0)");
    // source: AWG definition (ASTM B258), d = 0.005 in · 92^((36 − n)/39): AWG 38 is 0.1007 mm, within 1 % of 0.1 mm
    expect(rows[1]!.part).toContain("(AWG 38)");
    expect(rows[1]!.notes).toMatch(/^120 turns, 5\.\d\d m of wire each/);
    expect(rows[2]!.part).toBe("red indicator LED");
    expect(rows[3]!.notes).toContain("MORE than its rating");
    expect(wireText({ kind: "litz", strands: 20, strandDiameter: 0.05e-3, outerDiameter: 0.4e-3 })).toBe("litz 20 × 0.05 mm copper, 0.40 mm over serving");
  });
});

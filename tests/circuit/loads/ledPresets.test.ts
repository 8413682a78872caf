import { describe, expect, expectTypeOf, it } from "vitest";
import { ledPreset, diodePreset, LED_PRESET_DATA, type LedColour } from "../../../lib/circuit/loads/ledPresets.ts";
import type { Led } from "../../../lib/circuit/loads/led.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";
import { PLANCK, SPEED_OF_LIGHT, ELEMENTARY_CHARGE } from "../../../lib/constants.ts";

// docs/references.md: LED forward voltage at about 20 mA (reference tables, not a handbook)
const RANGES: Record<LedColour, [number, number]> = {
  red: [1.8, 2.1],
  orange: [2.0, 2.1],
  yellow: [2.1, 2.2],
  "green-gap": [2.0, 2.2], // "about 2.1": taken as ±0.1 V
  "green-ingan": [3.0, 3.5],
  blue: [3.0, 3.3],
  white: [3.0, 3.3],
};

describe("ledPreset(colour)", () => {
  for (const colour of Object.keys(RANGES) as LedColour[]) {
    it(`${colour}: V_F at 20 mA lies in the docs/references.md range and the fit reproduces the preset points`, () => {
      const l = ledPreset(colour);
      const [lo, hi] = RANGES[colour];
      // a range, checked as its midpoint ± half-width
      expectOutside({
        quantity: `${colour} LED V_F at 20 mA`,
        source: "reference tables, not a handbook (docs/references.md, LED forward voltage)",
        ours: l.voltage(20e-3),
        reference: (lo + hi) / 2,
        rtol: (hi - lo) / (lo + hi) + 1e-12,
        unit: "V",
      });
      for (const p of LED_PRESET_DATA[colour].points) {
        // the leakage floor (1e-12 S) shifts V by ~1e-11 V: tolerance 1e-9
        expectRelClose(l.voltage(p.current), p.voltage, 1e-9, `${colour} point ${p.current} A`);
      }
      expect(l.source).toMatch(/references\.md/);
      expect(l.n).toBeGreaterThan(1);
      expect(l.rs).toBeGreaterThan(0);
    });
  }

  it("V_F at 20 mA is not far below the photon energy hc/(qλ) (the ≳ of docs/references.md, memory)", () => {
    for (const colour of Object.keys(RANGES) as LedColour[]) {
      const d = LED_PRESET_DATA[colour];
      const photon = (PLANCK.value * SPEED_OF_LIGHT.value) / (ELEMENTARY_CHARGE.value * d.wavelength);
      // "≳": allow 5 % below (GaP yellow-green is indirect and runs just under its photon energy)
      expect(ledPreset(colour).voltage(20e-3)).toBeGreaterThan(0.95 * photon);
    }
  });

  it("'green' alone is refused, naming both greens", () => {
    expect(() => ledPreset("green" as LedColour)).toThrow(/green-gap.*green-ingan/);
  });

  it("diode presets: Schottky drops less than silicon at every current", () => {
    const s = diodePreset("schottky");
    const si = diodePreset("silicon");
    for (const i of [1e-4, 1e-3, 1e-2, 0.1]) expect(s.voltage(i)).toBeLessThan(si.voltage(i));
    // preset points reproduced (1e-9: leakage floor)
    expectRelClose(si.voltage(10e-3), 0.74, 1e-9, "silicon 10 mA");
    expectRelClose(s.voltage(10e-3), 0.36, 1e-9, "schottky 10 mA");
  });

  it("types", () => {
    expectTypeOf(ledPreset).parameter(0).toEqualTypeOf<LedColour>();
    expectTypeOf(ledPreset).returns.toEqualTypeOf<Led>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { skinDepth } from "../../../lib/em/losses/skinDepth.ts";
import { COPPER } from "../../../lib/em/materials.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

describe("skinDepth(f, resistivity, muR?)", () => {
  it("matches the handbook rule δ_Cu = 6.62/√f cm at 50 Hz, 100 kHz and 1 MHz", () => {
    // from memory (unverified): Terman, Radio Engineers' Handbook 1943, §2 — copper δ = 6.62/√f cm.
    // Tolerance 0.5 %: the handbook constant has 3 digits (±0.08 %) and was computed with a
    // copper resistivity rounded differently from IEC 60028's 1.7241e-8 (ours gives 6.608).
    for (const f of [50, 100e3, 1e6]) {
      expectOutside({
        quantity: `copper skin depth at ${f} Hz`,
        source: "from memory (unverified): Terman 1943 Radio Engineers' Handbook, δ = 6.62/√f cm",
        ours: skinDepth(f, COPPER.resistivity20),
        reference: 0.0662 / Math.sqrt(f),
        rtol: 5e-3,
        unit: "m",
      });
    }
  });

  it("matches a published two-digit table for copper and aluminium (ρ as the table states)", () => {
    // source: launchloop.com "Skin Depth" wiki table (web page; ρ Cu 1.7e-8, Al 2.8e-8 Ω·m, μr 1),
    // values printed to 2 significant digits: tolerance = half a unit in the second digit (≤ 3.4 %).
    const rows: [string, number, number, number][] = [
      ["copper", 1.7e-8, 60, 8.5e-3],
      ["copper", 1.7e-8, 20e3, 0.46e-3],
      ["copper", 1.7e-8, 200e3, 0.15e-3],
      ["aluminium", 2.8e-8, 60, 11e-3],
      ["aluminium", 2.8e-8, 200e3, 0.19e-3],
    ];
    for (const [name, rho, f, ref] of rows) {
      const digitHalf = ref >= 0.01 ? 0.5e-3 : ref >= 1e-3 ? 0.05e-3 : ref >= 0.1e-3 ? 0.005e-3 : 0.0005e-3;
      expectOutside({ quantity: `${name} skin depth at ${f} Hz`, source: "source: launchloop.com Skin Depth table (2 digits)", ours: skinDepth(f, rho), reference: ref, rtol: digitHalf / ref, unit: "m" });
    }
  });

  it("scales as 1/√(f·μr) (identity)", () => {
    const d = skinDepth(1e5, 1.7e-8);
    expectRelClose(skinDepth(4e5, 1.7e-8), d / 2, 1e-15, "4× frequency");
    expectRelClose(skinDepth(1e5, 1.7e-8, 100), d / 10, 1e-15, "μr = 100");
  });

  it("rejects f ≤ 0, a non-positive resistivity and μr < 1", () => {
    expect(() => skinDepth(0, 1.7e-8)).toThrow(TanklightInputError);
    expect(() => skinDepth(1e3, -1)).toThrow(/skinDepth: resistivity: must be > 0 Ω·m/);
    expect(() => skinDepth(1e3, 1.7e-8, 0.5)).toThrow(/muR/);
    expect(() => skinDepth(Number.NaN, 1.7e-8)).toThrow(TanklightInputError);
  });

  it("has the documented types", () => {
    expectTypeOf(skinDepth).parameters.toEqualTypeOf<[f: number | string, resistivity: number | string, muR?: number | string]>();
    expectTypeOf(skinDepth).returns.toEqualTypeOf<number>();
  });
});


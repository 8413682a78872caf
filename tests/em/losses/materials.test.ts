import { describe, expect, it } from "vitest";
import { COPPER, ALUMINIUM, material, resistivityAt } from "../../../lib/em/materials.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

// lib/em/materials.ts (its test sits with the loss tests it serves)
describe("materials", () => {
  it("copper is IEC 60028 annealed copper: 1/58 Ω·mm²/m and 0.00393 /K at 20 °C", () => {
    // source: IEC 60028 (International Annealed Copper Standard), ρ₂₀ = 1/58 Ω·mm²/m; 4-digit value
    expectOutside({ quantity: "annealed copper ρ₂₀", source: "source: IEC 60028, 1/58 Ω·mm²/m", ours: COPPER.resistivity20, reference: 1e-6 / 58, rtol: 3e-5, unit: "Ω·m" });
    expect(COPPER.temperatureCoefficient20).toBe(0.00393);
    expect(material()).toBe(COPPER);
    expect(material("Aluminium")).toBe(ALUMINIUM);
  });

  it("resistivityAt follows ρ₂₀(1 + α₂₀ΔT) and rejects Celsius passed as kelvin", () => {
    expectRelClose(resistivityAt(COPPER, 293.15), 1.7241e-8, 1e-15, "20 °C");
    expectRelClose(resistivityAt(COPPER, 353.15), 1.7241e-8 * (1 + 0.00393 * 60), 1e-15, "80 °C");
    expect(() => resistivityAt(COPPER, 20)).toThrow(/resistivityAt: temperature: must be a conductor temperature in kelvin/);
    expect(() => material("unobtainium")).toThrow(TanklightInputError);
  });
});

/**
 * Conductor materials as plain data: resistivity at 20 °C, its linear temperature coefficient
 * and the relative permeability (docs/design.md §5 "Losses").
 *
 * ρ(T) = ρ₂₀·(1 + α₂₀·(T − 293.15 K)), the linear law that IEC 60028 uses to correct copper
 * resistance to 20 °C. Temperatures are in kelvin (SI), like everything inside the library.
 */

import { TanklightInputError, unknownKeyMessage } from "../errors.ts";

/** A conductor material (plain data). */
export interface Material {
  readonly name: string;
  /** resistivity at 20 °C (293.15 K), Ω·m */
  readonly resistivity20: number;
  /** temperature coefficient of resistance at 20 °C, 1/K */
  readonly temperatureCoefficient20: number;
  /** relative permeability, dimensionless (1 for non-magnetic conductors) */
  readonly relativePermeability: number;
  /** where the numbers come from */
  readonly source: string;
}

/**
 * Annealed copper, the international standard: 1/58 Ω·mm²/m = 1.7241×10⁻⁸ Ω·m at 20 °C,
 * α₂₀ = 0.00393 /K (IEC 60028:1925, the International Annealed Copper Standard).
 */
export const COPPER: Material = {
  name: "copper",
  resistivity20: 1.7241e-8,
  temperatureCoefficient20: 0.00393,
  relativePermeability: 1,
  source: "IEC 60028 (International Annealed Copper Standard): ρ₂₀ = 1/58 Ω·mm²/m, α₂₀ = 0.00393 /K",
};

/**
 * Hard-drawn aluminium wire for electrical purposes, 61 % IACS: ρ₂₀ = 1.7241×10⁻⁸/0.61
 * = 2.8264×10⁻⁸ Ω·m, α₂₀ = 0.00403 /K (IEC 60889:1987 — from memory, unverified).
 */
export const ALUMINIUM: Material = {
  name: "aluminium",
  resistivity20: 2.8264e-8,
  temperatureCoefficient20: 0.00403,
  relativePermeability: 1,
  source: "IEC 60889 hard-drawn aluminium, 61 % IACS (from memory, unverified): ρ₂₀ = 0.028264 Ω·mm²/m, α₂₀ = 0.00403 /K",
};

/** The materials known by name (Conductor.material). */
export const MATERIALS: Readonly<Record<string, Material>> = {
  copper: COPPER,
  aluminium: ALUMINIUM,
  aluminum: ALUMINIUM,
};

/** 20 °C in kelvin, the reference temperature of ρ₂₀ and α₂₀. */
export const REFERENCE_TEMPERATURE = 293.15;

const MATERIAL_KEYS = ["name", "resistivity20", "temperatureCoefficient20", "relativePermeability", "source"];

/**
 * A hand-made Material: exactly the keys of {@link Material}, a name, a resistivity > 0 Ω·m,
 * a temperature coefficient within ±0.1 /K and a relative permeability ≥ 1 (finite numbers).
 */
function checkMaterial(m: unknown, field: string, where: string): Material {
  const o = m as Record<string, unknown>;
  const bad = (path: string, message: string, value: unknown): never => {
    throw new TanklightInputError([{ path, message, value }], where);
  };
  if (typeof m !== "object" || m === null || Array.isArray(m)) return bad(field, "must be a material name or a Material { name, resistivity20, temperatureCoefficient20, relativePermeability, source }", m);
  for (const key of Reflect.ownKeys(o)) if (!MATERIAL_KEYS.includes(key as string)) bad(`${field}.${String(key)}`, unknownKeyMessage(String(key), MATERIAL_KEYS), o[key as string]);
  const num = (k: string, lo: number, hi: number): void => {
    const x = o[k];
    if (!(typeof x === "number" && x >= lo && x <= hi)) bad(`${field}.${k}`, `must be a finite number in [${lo}, ${hi}]`, x);
  };
  if (typeof o["name"] !== "string") bad(`${field}.name`, "must be a string", o["name"]);
  if (typeof o["source"] !== "string") bad(`${field}.source`, "must be a string", o["source"]);
  num("resistivity20", 1e-12, 1e6);
  num("temperatureCoefficient20", -0.1, 0.1);
  num("relativePermeability", 1, 1e6);
  return m as Material;
}

/**
 * Resolves a material by name (default copper), or passes a Material through.
 * @param material a name from MATERIALS ("copper", "aluminium"), a Material, or undefined (→ copper).
 * @returns the Material.
 * @example material("copper").resistivity20 // → 1.7241e-8
 */
export function material(material?: string | Material): Material {
  if (material === undefined) return COPPER;
  if (typeof material !== "string") return checkMaterial(material, "material", "material");
  const key = material.toLowerCase();
  // own keys only: "__proto__", "constructor" are not materials
  const m = Object.hasOwn(MATERIALS, key) ? MATERIALS[key] : undefined;
  if (!m) {
    throw new TanklightInputError(
      [{ path: "material", message: `is not a known material (known: ${Object.keys(MATERIALS).join(", ")})`, value: material }],
      "material",
    );
  }
  return m;
}

/**
 * Resistivity at a temperature, linear in the IEC 60028 temperature coefficient.
 *
 * ρ(T) = ρ₂₀·(1 + α₂₀·(T − 293.15 K)).
 * @param m the material.
 * @param temperature conductor temperature, K, 150 K ≤ T ≤ 700 K (outside this band the linear
 *   law is poor; a value below 150 K is almost surely a Celsius temperature passed as kelvin).
 * @returns resistivity, Ω·m.
 * @example resistivityAt(COPPER, 293.15) // → 1.7241e-8
 * @example resistivityAt(COPPER, 353.15) // → 2.1306e-8 (80 °C)
 */
export function resistivityAt(m: Material, temperature: number = REFERENCE_TEMPERATURE): number {
  if (m !== COPPER && m !== ALUMINIUM) checkMaterial(m, "m", "resistivityAt");
  if (!(typeof temperature === "number" && Number.isFinite(temperature) && temperature >= 150 && temperature <= 700)) {
    throw new TanklightInputError(
      [{
        path: "temperature",
        message: "must be a conductor temperature in kelvin between 150 K and 700 K (20 °C = 293.15 K)",
        value: temperature,
        expected: "150 K ≤ T ≤ 700 K",
      }],
      "resistivityAt",
    );
  }
  return m.resistivity20 * (1 + m.temperatureCoefficient20 * (temperature - REFERENCE_TEMPERATURE));
}

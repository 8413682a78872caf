/**
 * Physical constants with value, unit and source (docs/style.md §11).
 * CODATA 2018 values (NIST, https://physics.nist.gov/constants), unchanged in CODATA 2022
 * for these entries.
 */
import { TanklightInputError, underName } from "./errors.ts";
import { parseQuantity } from "./units.ts";

/** A constant with its provenance. */
export interface Constant {
  readonly value: number;
  readonly unit: string;
  readonly source: string;
}

/** Vacuum magnetic permeability μ₀ = 1.25663706212(19)e-6 N/A² (CODATA 2018; no longer exactly 4π·10⁻⁷ since the 2019 SI). */
export const VACUUM_PERMEABILITY: Constant = {
  value: 1.25663706212e-6,
  unit: "H/m",
  source: "CODATA 2018 recommended value",
};

/** Vacuum electric permittivity ε₀ = 8.8541878128(13)e-12 F/m (CODATA 2018). */
export const VACUUM_PERMITTIVITY: Constant = {
  value: 8.8541878128e-12,
  unit: "F/m",
  source: "CODATA 2018 recommended value",
};

/** Speed of light in vacuum, exact by definition of the metre (SI 2019). */
export const SPEED_OF_LIGHT: Constant = { value: 299_792_458, unit: "m/s", source: "SI definition (exact)" };

/** Elementary charge, exact since the 2019 SI. */
export const ELEMENTARY_CHARGE: Constant = { value: 1.602176634e-19, unit: "C", source: "SI definition (exact)" };

/** Boltzmann constant, exact since the 2019 SI. */
export const BOLTZMANN: Constant = { value: 1.380649e-23, unit: "J/K", source: "SI definition (exact)" };

/** Planck constant, exact since the 2019 SI. */
export const PLANCK: Constant = { value: 6.62607015e-34, unit: "J·s", source: "SI definition (exact)" };

/** 0 °C in kelvin. */
export const ZERO_CELSIUS: Constant = { value: 273.15, unit: "K", source: "SI definition (exact)" };

/** μ₀ as a plain number for hot paths, H/m. */
export const MU0 = VACUUM_PERMEABILITY.value;
/** ε₀ as a plain number for hot paths, F/m. */
export const EPS0 = VACUUM_PERMITTIVITY.value;

/**
 * Thermal voltage kT/q at a temperature, V.
 * @param temperature absolute temperature > 0: K, or a quantity string ("300 K", "25 degC").
 * @example thermalVoltage(298.15) // → 0.025693 V
 * @example thermalVoltage("25 degC") // → 0.025693 V
 */
export function thermalVoltage(temperature: number | string): number {
  const t = typeof temperature === "number" && temperature > 0 && temperature < Infinity ? temperature : kelvinOf(temperature);
  return (BOLTZMANN.value * t) / ELEMENTARY_CHARGE.value;
}

/** thermalVoltage's slow path: a quantity string or a bad value, checked by name. */
function kelvinOf(temperature: unknown): number {
  const t = underName("thermalVoltage", () => parseQuantity(temperature as number | string, "temperature", "temperature"));
  if (!(t > 0)) throw new TanklightInputError([{ path: "temperature", message: "must be > 0 K (absolute temperature)", value: temperature }], "thermalVoltage");
  return t;
}

/**
 * Physical constants with value, unit and source (docs/style.md §11).
 * CODATA 2018 values (NIST, https://physics.nist.gov/constants), unchanged in CODATA 2022
 * for these entries.
 */

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
 * @param kelvin absolute temperature, K, > 0.
 * @example thermalVoltage(298.15) // → 0.025693 V
 */
export function thermalVoltage(kelvin: number): number {
  return (BOLTZMANN.value * kelvin) / ELEMENTARY_CHARGE.value;
}

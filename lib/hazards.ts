/**
 * Hazard thresholds: one constant per hazard, with its value, unit and source — the single
 * home of every caution threshold the library uses (lib/circuit's capacitor and token checks,
 * the link solver's voltage cautions, and lib/safety). An edge file (layer 0) so that every
 * layer can read it. Where a number is a rule of thumb rather than a published limit, its
 * `source` says so; exposure and emission limits live in lib/safety with their table numbers.
 */

/** A caution threshold with its provenance. */
export interface HazardThreshold {
  readonly value: number;
  readonly unit: string;
  /** where the number comes from, in the forms of docs/design.md §6 */
  readonly source: string;
  /** what crossing it means, in plain words */
  readonly meaning: string;
}

/**
 * High tank voltage: 42.4 V peak (30 V RMS of a sine). Above it a tank, coil or capacitor
 * voltage carries a caution. From memory (unverified): the 30 V RMS / 42.4 V peak limit of
 * the lowest energy class of IEC 62368-1 (ES1) and of the older SELV definitions (IEC 60950-1);
 * the code that applies to a product decides.
 */
export const HIGH_VOLTAGE: HazardThreshold = {
  value: 42.4,
  unit: "V peak",
  source: "from memory (unverified): 30 V RMS / 42.4 V peak, the ES1 limit of IEC 62368-1 and SELV of IEC 60950-1",
  meaning: "tank voltages above it can shock or burn; insulate, rate the parts for it and discharge before handling",
};

/**
 * Metal heating: 0.25 W dissipated in a coin-sized object lying on the transmitter. Trade
 * practice (no source): a 24 mm coin in still air (Newton cooling, h ≈ 10 W/(m²·K) over both
 * faces, 9×10⁻⁴ m²) settles about 28 K above ambient at 0.25 W — warm enough to notice and,
 * for longer contact or smaller objects, to hurt.
 */
export const METAL_HEATING_POWER: HazardThreshold = {
  value: 0.25,
  unit: "W",
  source: "trade practice (no source): about 28 K rise of a 24 mm coin in still air",
  meaning: "a metal object on the transmitter heats noticeably; keep metal off the surface or lower the field",
};

/**
 * Winding temperature rise: 40 K above ambient. Trade practice (no source): a 40 K rise over a
 * 25 °C room keeps enamelled wire (class 130 °C or better) far from its limit but makes the
 * surface above a thin barrier warm to the touch.
 */
export const WINDING_TEMPERATURE_RISE: HazardThreshold = {
  value: 40,
  unit: "K",
  source: "trade practice (no source)",
  meaning: "the transmitter winding runs hot; the surface above it may be warm to the touch",
};

/**
 * Small parts: 31.7 mm, the diameter of the small-parts test cylinder. A token that fits
 * through it is a choking hazard for young children. From memory (unverified): the test
 * cylinder of 16 CFR 1501 (US) and EN 71-1 (EU), 1.25 in diameter.
 */
export const SMALL_PART_DIAMETER: HazardThreshold = {
  value: 31.7e-3,
  unit: "m",
  source: "from memory (unverified): small-parts cylinder of 16 CFR 1501 and EN 71-1, 1.25 in",
  meaning: "a token smaller than this can be swallowed or inhaled by a young child",
};

/** All thresholds, for reports and docs. */
export const HAZARD_THRESHOLDS = {
  highVoltage: HIGH_VOLTAGE,
  metalHeatingPower: METAL_HEATING_POWER,
  windingTemperatureRise: WINDING_TEMPERATURE_RISE,
  smallPartDiameter: SMALL_PART_DIAMETER,
} as const;

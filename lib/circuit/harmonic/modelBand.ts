/**
 * What every link result states about its model: which one produced it and how far it can be
 * trusted, plus the part-stress and caution texts the harmonic-balance result shares with the
 * describing-function result.
 */

/** The model behind a link result and its error band. */
export interface ModelBand {
  /**
   * relative error band on the LED average currents and the coil current amplitudes
   * (e.g. 0.01 = ±1 %) against the time-domain steady state of the same circuit
   */
  readonly relative: number;
  /** where the band comes from, in words */
  readonly basis: string;
}

const LIT_THRESHOLD_SOURCE =
  "trade practice (no source): indicator LEDs are visible indoors from about 0.1–1 mA average current";

/** Where the lit threshold comes from: the default's trade practice, or the user. */
export function litThresholdSource(given: number | undefined): string {
  return given === undefined ? LIT_THRESHOLD_SOURCE : "set by the user";
}

/** A warning when a part's peak voltage exceeds its rating (undefined when fine). */
export function partVoltageWarning(what: string, peak: number, rating: number | undefined): string | undefined {
  return rating !== undefined && peak > rating ? `${what}: peak voltage ${peak.toPrecision(3)} V exceeds its rating ${rating} V (overvoltage)` : undefined;
}

/** A warning when the drive frequency is beyond a third of a coil's self-resonance. */
export function selfResonanceWarning(what: string, f: number, srf: number | undefined): string | undefined {
  return srf !== undefined && f > srf / 3
    ? `${what}: drive frequency ${f.toPrecision(4)} Hz is beyond a third of its self-resonance ${srf.toPrecision(4)} Hz; its inductance and resistance are no longer the low-frequency values`
    : undefined;
}

/** The high-voltage caution (it defers to local codes and licensed practice). */
export function voltageCaution(what: string, peak: number, limit: number): string | undefined {
  return peak > limit
    ? `${what}: ${peak.toPrecision(3)} V peak (${(peak * Math.SQRT1_2).toPrecision(3)} V RMS) exceeds ${limit} V peak; high tank voltages can shock or burn: insulate and rate the parts for it, and defer to local electrical codes, regulations and licensed practice`
    : undefined;
}

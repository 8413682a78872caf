/**
 * Part ratings the safety checks compare with when a design gives none: a typical indicator LED,
 * and the winding current density of trade practice.
 */

/**
 * A typical 3–5 mm or 0603–1206 indicator LED: 20 mA rated continuous forward current, 30 mA
 * absolute maximum (AlInGaP and InGaN parts alike). Trade practice (no source): typical
 * datasheet values; the part's own datasheet decides.
 */
export const TYPICAL_INDICATOR_LED = {
  ratedCurrent: 20e-3,
  maximumCurrent: 30e-3,
  source: "trade practice (no source): typical indicator-LED datasheet values, 20 mA rated, 30 mA absolute maximum",
} as const;

/**
 * Winding current density above which a winding in still air runs hot: 5 A/mm² RMS over the
 * copper's DC cross-section. Trade practice (no source): 3–5 A/mm² is the usual design range
 * for small air-cooled windings.
 */
export const WINDING_CURRENT_DENSITY = { value: 5e6, unit: "A/m² RMS", source: "trade practice (no source): 3–5 A/mm² for small windings in still air" } as const;

/** A value against its rating. */
export interface RatingCheck {
  /** what was checked, e.g. "transmitter capacitor voltage" */
  readonly what: string;
  readonly value: number;
  readonly unit: string;
  /** the rating (absent: none given) */
  readonly rating?: number;
  /** value / rating */
  readonly ratio?: number;
  readonly verdict: "within rating" | "over rating" | "over absolute maximum" | "no rating given";
  readonly text: string;
}

/** Formats a number with its unit at 3 significant digits. */
export function fmtValue(x: number, unit: string): string {
  const a = Math.abs(x);
  const [k, p] = a === 0 ? [1, ""] : a >= 1e3 ? [1e-3, "k"] : a >= 1 ? [1, ""] : a >= 1e-3 ? [1e3, "m"] : a >= 1e-6 ? [1e6, "µ"] : [1e9, "n"];
  return `${(x * k).toPrecision(3)} ${p}${unit}`;
}

/**
 * A value against a rating (and optionally an absolute maximum): the verdict, the ratio and a
 * sentence with the margin or the excess.
 * @example checkRating("LED current", 0.502, "A", 0.02, 0.03).verdict // → "over absolute maximum"
 */
export function checkRating(what: string, value: number, unit: string, rating?: number, maximum?: number): RatingCheck {
  if (rating === undefined) return { what, value, unit, verdict: "no rating given", text: `${what}: ${fmtValue(value, unit)} (no rating given)` };
  const ratio = value / rating;
  if (maximum !== undefined && value > maximum) {
    return { what, value, unit, rating, ratio, verdict: "over absolute maximum", text: `${what}: ${fmtValue(value, unit)} EXCEEDS the absolute maximum ${fmtValue(maximum, unit)} (×${(value / maximum).toPrecision(3)}): the part will fail` };
  }
  if (ratio > 1) return { what, value, unit, rating, ratio, verdict: "over rating", text: `${what}: ${fmtValue(value, unit)} EXCEEDS its rating ${fmtValue(rating, unit)} by ×${ratio.toPrecision(3)}` };
  return { what, value, unit, rating, ratio, verdict: "within rating", text: `${what}: ${fmtValue(value, unit)} within its rating ${fmtValue(rating, unit)} (margin ×${(1 / ratio).toPrecision(3)})` };
}

/**
 * Part ratings the safety checks compare with when a design gives none: a typical indicator LED,
 * and the winding current density of trade practice.
 */
import * as z from "../zod.ts";
import { DIMENSIONS, type Dimension } from "../units.ts";
import { parseArgs, quantity } from "../schema.ts";

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
 * Numbers are in `unit`; where `unit` is the SI unit of a dimension ("A", "V", "K") quantity
 * strings are read too ("25 mA"). |value| ≤ 1e100 and ratings in [1e-100, 1e100] (the ratio
 * stays in the double range).
 * @example checkRating("LED current", 0.502, "A", 0.02, 0.03).verdict // → "over absolute maximum"
 * @example checkRating("LED current", "25 mA", "A", "20 mA").verdict // → "over rating"
 */
export function checkRating(what: string, value: number | string, unit: string, rating?: number | string, maximum?: number | string): RatingCheck {
  const plain = typeof what === "string" && typeof unit === "string" && inRange(value, -BOUND, BOUND) && (rating === undefined || inRange(rating, 1 / BOUND, BOUND)) && (maximum === undefined || inRange(maximum, 1 / BOUND, BOUND));
  if (!plain) ({ what, value, unit, rating, maximum } = parseArgs(ratingArgs(unit), [what, value, unit, rating, maximum], "checkRating"));
  return checkRatingCore(what, value as number, unit, rating as number | undefined, maximum as number | undefined);
}

/** Values and ratings beyond ±1e100 would give ratios outside the double range. */
const BOUND = 1e100;
const inRange = (x: unknown, lo: number, hi: number): x is number => typeof x === "number" && x >= lo && x <= hi;

/** checkRating's arguments, checked by name; quantity strings where the unit is a dimension's SI unit. */
function ratingArgs(unit: unknown) {
  const dimension = (Object.keys(DIMENSIONS) as Dimension[]).find((d) => DIMENSIONS[d].unit !== "" && DIMENSIONS[d].unit === unit);
  const why = "(beyond it the ratio leaves the double range)";
  const num = (min: number) =>
    dimension !== undefined
      ? quantity(dimension, { min, max: BOUND })
      : z.number({ error: `must be a finite number in the unit given (a quantity string is read only when unit is an SI unit symbol such as 'A' or 'V'; unit is ${typeof unit === "string" ? `'${unit}'` : "not a string"})` }).min(min, { error: `must be ≥ ${min} ${why}` }).max(BOUND, { error: `must be ≤ ${BOUND} ${why}` });
  return z.strictObject({
    what: z.string({ error: "must be a string naming what is checked" }),
    value: num(-BOUND),
    unit: z.string({ error: "must be a unit symbol (a string)" }),
    rating: num(1 / BOUND).optional(),
    maximum: num(1 / BOUND).optional(),
  });
}

/** checkRating for checked numbers (componentStress's parts). */
export function checkRatingCore(what: string, value: number, unit: string, rating?: number, maximum?: number): RatingCheck {
  if (rating === undefined) return { what, value, unit, verdict: "no rating given", text: `${what}: ${fmtValue(value, unit)} (no rating given)` };
  const ratio = value / rating;
  if (maximum !== undefined && value > maximum) {
    return { what, value, unit, rating, ratio, verdict: "over absolute maximum", text: `${what}: ${fmtValue(value, unit)} EXCEEDS the absolute maximum ${fmtValue(maximum, unit)} (×${(value / maximum).toPrecision(3)}): the part will fail` };
  }
  if (ratio > 1) return { what, value, unit, rating, ratio, verdict: "over rating", text: `${what}: ${fmtValue(value, unit)} EXCEEDS its rating ${fmtValue(rating, unit)} by ×${ratio.toPrecision(3)}` };
  return { what, value, unit, rating, ratio, verdict: "within rating", text: `${what}: ${fmtValue(value, unit)} within its rating ${fmtValue(rating, unit)} (margin ×${(1 / ratio).toPrecision(3)})` };
}

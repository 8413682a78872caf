/**
 * IEC 60063 preferred-number series (E-series) for resistors, capacitors and inductors.
 *
 * Tables (mantissas of one decade, 1 ≤ m < 10):
 * - E3, E6, E12, E24: two significant digits, typed from IEC 60063 (E24 checked against
 *   docs/references.md; E3/E6/E12 are every 8th/4th/2nd E24 value).
 * - E48, E96: three significant digits, the rounding rule round(10^(i/N), 3 digits) with no
 *   exception (docs/references.md). Written out from the rule; E96 also compared, value by value,
 *   with the catalogue series as remembered (identical) — the published table was not at hand.
 * - E192: three digits by the same rule except 920 (the rule gives 919) — the exception is
 *   from memory (unverified), docs/references.md; the published table was not at hand: verify.
 * The rule itself (10^(i/N) rounded) and its listed E24 exceptions (2.7 3.0 3.3 3.6 3.9 4.3 4.7
 * 8.2) are checked against these tables in tests/circuit/eseries.test.ts.
 */
import * as z from "../zod.ts";
import { requirePositive } from "../errors.ts";
import { oneOf, parseInput, lazySchema } from "../schema.ts";

/** The IEC 60063 series names, in order. */
const SERIES_NAMES = ["E3", "E6", "E12", "E24", "E48", "E96", "E192"] as const;

/** The IEC 60063 series names. */
export type ESeries = (typeof SERIES_NAMES)[number];

/** zod schema of a series name (a Set lookup: "toString" is refused like any unknown word). */
export const ESeriesSchema = lazySchema(() => oneOf(SERIES_NAMES));
const SeriesArg = lazySchema(() => z.strictObject({ series: ESeriesSchema }));

const E24 = [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1] as const;
const E12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2] as const;
const E6 = [1.0, 1.5, 2.2, 3.3, 4.7, 6.8] as const;
const E3 = [1.0, 2.2, 4.7] as const;
const E48 = [
  100, 105, 110, 115, 121, 127, 133, 140, 147, 154, 162, 169, 178, 187, 196, 205, 215, 226, 237, 249, 261, 274, 287, 301,
  316, 332, 348, 365, 383, 402, 422, 442, 464, 487, 511, 536, 562, 590, 619, 649, 681, 715, 750, 787, 825, 866, 909, 953,
] as const;
const E96 = [
  100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150, 154, 158, 162, 165, 169, 174,
  178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232, 237, 243, 249, 255, 261, 267, 274, 280, 287, 294, 301, 309,
  316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412, 422, 432, 442, 453, 464, 475, 487, 499, 511, 523, 536, 549,
  562, 576, 590, 604, 619, 634, 649, 665, 681, 698, 715, 732, 750, 768, 787, 806, 825, 845, 866, 887, 909, 931, 953, 976,
] as const;
const E192 = [
  100, 101, 102, 104, 105, 106, 107, 109, 110, 111, 113, 114, 115, 117, 118, 120, 121, 123, 124, 126, 127, 129, 130, 132,
  133, 135, 137, 138, 140, 142, 143, 145, 147, 149, 150, 152, 154, 156, 158, 160, 162, 164, 165, 167, 169, 172, 174, 176,
  178, 180, 182, 184, 187, 189, 191, 193, 196, 198, 200, 203, 205, 208, 210, 213, 215, 218, 221, 223, 226, 229, 232, 234,
  237, 240, 243, 246, 249, 252, 255, 258, 261, 264, 267, 271, 274, 277, 280, 284, 287, 291, 294, 298, 301, 305, 309, 312,
  316, 320, 324, 328, 332, 336, 340, 344, 348, 352, 357, 361, 365, 370, 374, 379, 383, 388, 392, 397, 402, 407, 412, 417,
  422, 427, 432, 437, 442, 448, 453, 459, 464, 470, 475, 481, 487, 493, 499, 505, 511, 517, 523, 530, 536, 542, 549, 556,
  562, 569, 576, 583, 590, 597, 604, 612, 619, 626, 634, 642, 649, 657, 665, 673, 681, 690, 698, 706, 715, 723, 732, 741,
  750, 759, 768, 777, 787, 796, 806, 816, 825, 835, 845, 856, 866, 876, 887, 898, 909, 920, 931, 942, 953, 965, 976, 988,
] as const;

const TABLES: Readonly<Record<ESeries, readonly number[]>> = {
  E3,
  E6,
  E12,
  E24,
  E48: E48.map((x) => x / 100),
  E96: E96.map((x) => x / 100),
  E192: E192.map((x) => x / 100),
};

/** Standard tolerance usually sold with each series (trade practice, no source): E3 ±20 % … E192 ±0.5 %. */
export const SERIES_TOLERANCE: Readonly<Record<ESeries, number>> = {
  E3: 0.2, // historically > 20 %
  E6: 0.2,
  E12: 0.1,
  E24: 0.05,
  E48: 0.02,
  E96: 0.01,
  E192: 0.005,
};

function checkSeries(series: unknown, where: string): ESeries {
  return parseInput(SeriesArg, { series }, where).series;
}

/**
 * The mantissas of an IEC 60063 series over one decade, 1 ≤ m < 10, ascending.
 * @param series "E3" | "E6" | "E12" | "E24" | "E48" | "E96" | "E192".
 * @returns readonly array of N numbers (N = 3 … 192).
 * @example standardValues("E12") // → [1, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]
 * Related: nearestStandardValue, standardValuesBetween, bestCombination.
 */
export function standardValues(series: ESeries): readonly number[] {
  return TABLES[checkSeries(series, "standardValues")];
}

/**
 * Every standard value of a series between lo and hi (inclusive), ascending, in SI units.
 * @param lo, hi bounds (same unit as the values you want), 0 < lo ≤ hi.
 * @example standardValuesBetween("E6", 1e-9, 1e-8) // → [1e-9, 1.5e-9, 2.2e-9, 3.3e-9, 4.7e-9, 6.8e-9, 1e-8]
 */
export function standardValuesBetween(series: ESeries, lo: number, hi: number): number[] {
  const t = TABLES[checkSeries(series, "standardValuesBetween")];
  requirePositive(lo, "lo", "", "standardValuesBetween");
  requirePositive(hi, "hi", "", "standardValuesBetween");
  const out: number[] = [];
  const d0 = Math.floor(Math.log10(lo)) - 1;
  const d1 = Math.ceil(Math.log10(hi)) + 1;
  for (let d = d0; d <= d1; d++) {
    for (const m of t) {
      const v = decade(m, d);
      if (v >= lo * (1 - 1e-12) && v <= hi * (1 + 1e-12)) out.push(v);
    }
  }
  return out;
}

/** m·10^d, formed so that the decimal value is the nearest double (no 4.7·1e-9 rounding noise). */
function decade(m: number, d: number): number {
  // m has at most 3 significant digits: scale to an integer first
  const k = Math.round(m * 100);
  const e = d - 2;
  return e >= 0 ? k * 10 ** e : k / 10 ** -e;
}

/**
 * The standard value of a series nearest to x in ratio (|ln(v/x)| smallest), any decade.
 * @param x target value, > 0 (any unit; F, Ω, H); series an IEC 60063 series.
 * @returns the nearest standard value, same unit.
 * @example nearestStandardValue(4.5e-9, "E12") // → 4.7e-9
 */
export function nearestStandardValue(x: number, series: ESeries): number {
  checkSeries(series, "nearestStandardValue");
  requirePositive(x, "x", "", "nearestStandardValue");
  let best = NaN;
  let bestErr = Infinity;
  for (const v of standardValuesBetween(series, x / 10, x * 10)) {
    const e = Math.abs(Math.log(v / x));
    if (e < bestErr) {
      bestErr = e;
      best = v;
    }
  }
  return best;
}

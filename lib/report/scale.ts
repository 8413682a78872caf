/**
 * Display scales for charts: pick the SI prefix that puts a data set's largest magnitude
 * between 1 and 1000, so an axis reads "height (mm)" with values 0–120 instead of 0–0.12 m.
 */

const PREFIXES: readonly { readonly exponent: number; readonly symbol: string }[] = [
  { exponent: -12, symbol: "p" },
  { exponent: -9, symbol: "n" },
  { exponent: -6, symbol: "µ" },
  { exponent: -3, symbol: "m" },
  { exponent: 0, symbol: "" },
  { exponent: 3, symbol: "k" },
  { exponent: 6, symbol: "M" },
  { exponent: 9, symbol: "G" },
];

/** A display unit: multiply SI values by `factor` to get numbers in `unit`. */
export interface DisplayScale {
  /** SI value × factor = displayed value */
  readonly factor: number;
  /** the prefixed unit, e.g. "mA" */
  readonly unit: string;
}

/**
 * The display scale for SI values of `unit` whose largest magnitude is `maxAbs`.
 * Units without prefixes ("", "%", "dB…", "°", "×", "K") keep factor 1.
 * @example displayScale(0.12, "m") // → { factor: 1000, unit: "mm" }
 * @example displayScale(0, "A") // → { factor: 1, unit: "A" }
 */
export function displayScale(maxAbs: number, unit: string): DisplayScale {
  if (unit === "" || unit === "%" || unit.startsWith("dB") || unit === "°" || unit === "×" || unit === "K" || !(maxAbs > 0) || !Number.isFinite(maxAbs)) {
    return { factor: 1, unit };
  }
  const e = Math.floor(Math.log10(maxAbs) / 3 + 1e-9) * 3;
  const p = PREFIXES.find((x) => x.exponent === Math.max(-12, Math.min(9, e)))!;
  return { factor: 10 ** -p.exponent, unit: `${p.symbol}${unit}` };
}

/** The largest finite magnitude of some numbers (0 for none). */
export function maxAbs(values: Iterable<number>): number {
  let m = 0;
  for (const v of values) if (Number.isFinite(v) && Math.abs(v) > m) m = Math.abs(v);
  return m;
}

/** An axis title with its unit: "height (mm)"; a plain ratio gets "(ratio)" spelled by the caller. */
export function axisTitle(name: string, unit: string): string {
  return unit === "" ? name : `${name} (${unit})`;
}

/** Rounds a displayed number to 4 significant figures so specs (and their SVG) stay small and stable. */
export function tidy(x: number): number {
  return x === 0 || !Number.isFinite(x) ? x : Number(x.toPrecision(4));
}

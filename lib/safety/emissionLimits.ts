/**
 * Radiated-emission limits for inductive devices below 30 MHz, as published (docs/references.md,
 * "Radiated emission"): US 47 CFR 15.209 (electric field at 300 m or 30 m) and CEPT ERC/REC
 * 70-03 Annex 9 (magnetic field at 10 m). Frequencies in Hz; rows hold on closed bands. For
 * estimates only — never a compliance test.
 */
import * as z from "../zod.ts";
import type { SourceStatus } from "./referenceLevels.ts";
import { frequency, lazySchema, oneOf, parseArgs } from "../schema.ts";

/** One row of an emission rule. */
export interface EmissionRow {
  readonly fMin: number;
  readonly fMax: number;
  /** measurement distance, m */
  readonly distance: number;
  /** "E" (dBµV/m) or "H" (dBµA/m) */
  readonly quantity: "E" | "H";
  /** the limit at frequency f, in dBµV/m (E) or dBµA/m (H) */
  readonly limitDb: (f: number) => number;
  readonly published: string;
  readonly status: SourceStatus;
  /** a narrow band with its own limit that replaces the general row inside it */
  readonly specific?: boolean;
}

/** An emission rule and its rows. */
export interface EmissionRule {
  readonly id: "47 CFR 15.209" | "CEPT ERC/REC 70-03 Annex 9";
  readonly citation: string;
  readonly rows: readonly EmissionRow[];
  readonly notes: readonly string[];
}

const kHz = 1e3;
const MHz = 1e6;
const dbuv = (microvolts: number): number => 20 * Math.log10(microvolts);
const octavesAbove = (f: number, f0: number): number => Math.log2(f / f0);

/** The rules carried. */
export const EMISSION_RULES: readonly EmissionRule[] = [
  {
    id: "47 CFR 15.209",
    citation: "US 47 CFR §15.209(a), radiated emission limits, general requirements; §15.31(f)(2) distance extrapolation",
    rows: [
      { fMin: 9 * kHz, fMax: 490 * kHz, distance: 300, quantity: "E", limitDb: (f) => dbuv(2400 / (f / kHz)), published: "2400/F(kHz) µV/m at 300 m", status: "checked" },
      { fMin: 490 * kHz, fMax: 1705 * kHz, distance: 30, quantity: "E", limitDb: (f) => dbuv(24000 / (f / kHz)), published: "24000/F(kHz) µV/m at 30 m", status: "checked" },
      { fMin: 1.705 * MHz, fMax: 30 * MHz, distance: 30, quantity: "E", limitDb: () => dbuv(30), published: "30 µV/m at 30 m", status: "checked" },
    ],
    notes: [
      "§15.209(b): the tighter limit applies at the band edges (here: the row that leaves the smaller margin)",
      "9–90 kHz and 110–490 kHz are measured with an average detector; for a steady carrier average and peak agree",
      "§15.31(f)(2): below 30 MHz a measurement closer than the limit distance is extrapolated at 40 dB/decade",
      "bands with their own rules (for example §15.225 at 13.56 MHz) are not carried",
    ],
  },
  {
    id: "CEPT ERC/REC 70-03 Annex 9",
    citation: "CEPT ERC Recommendation 70-03, Annex 9 (inductive applications), H-field limits at 10 m — the basis of ETSI EN 300 330",
    rows: [
      { fMin: 9 * kHz, fMax: 90 * kHz, distance: 10, quantity: "H", limitDb: (f) => 72 - 3 * Math.max(0, octavesAbove(f, 30 * kHz)), published: "72 dBµA/m at 10 m, falling 3 dB/octave above 30 kHz", status: "checked" },
      { fMin: 90 * kHz, fMax: 119 * kHz, distance: 10, quantity: "H", limitDb: () => 42, published: "42 dBµA/m at 10 m", status: "checked" },
      { fMin: 119 * kHz, fMax: 135 * kHz, distance: 10, quantity: "H", limitDb: (f) => 66 - 3 * octavesAbove(f, 119 * kHz), published: "66 dBµA/m at 10 m, falling 3 dB/octave above 119 kHz", status: "checked" },
      { fMin: 135 * kHz, fMax: 140 * kHz, distance: 10, quantity: "H", limitDb: () => 42, published: "42 dBµA/m at 10 m", status: "checked" },
      { fMin: 140 * kHz, fMax: 148.5 * kHz, distance: 10, quantity: "H", limitDb: () => 37.7, published: "37.7 dBµA/m at 10 m", status: "memory" },
      { fMin: 148.5 * kHz, fMax: 5 * MHz, distance: 10, quantity: "H", limitDb: () => -15, published: "−15 dBµA/m at 10 m in 10 kHz bandwidth (−5 dBµA/m total over a wider bandwidth)", status: "checked" },
      { fMin: 5 * MHz, fMax: 30 * MHz, distance: 10, quantity: "H", limitDb: () => -20, published: "−20 dBµA/m at 10 m", status: "checked" },
      { fMin: 6.765 * MHz, fMax: 6.795 * MHz, distance: 10, quantity: "H", limitDb: () => 42, published: "42 dBµA/m at 10 m (6.78 MHz ISM band)", status: "memory", specific: true },
      { fMin: 13.553 * MHz, fMax: 13.567 * MHz, distance: 10, quantity: "H", limitDb: () => 42, published: "42 dBµA/m at 10 m (13.56 MHz ISM band)", status: "memory", specific: true },
    ],
    notes: [
      "the row that leaves the smaller margin is used on a band edge (our convention, following §15.209(b))",
      "148.5 kHz–5 MHz: −15 dBµA/m applies in any 10 kHz; a steady carrier puts all its power in one 10 kHz",
      "national implementations of the recommendation decide; the 148.5 kHz–5 MHz row was seen only in a national decision",
    ],
  },
];

/**
 * The rows of a rule that hold at f (Hz): both edges of a band included, and a specific narrow
 * band replaces the general rows strictly inside it.
 * @param rule one of EMISSION_RULES, or its id ("47 CFR 15.209").
 * @param f frequency, Hz (or "200 kHz").
 * @example emissionRows(EMISSION_RULES[1], 200e3)[0].limitDb(200e3) // → -15 (dBµA/m at 10 m, CEPT 70-03 Annex 9)
 */
export function emissionRows(rule: EmissionRule | EmissionRule["id"], f: number | string): EmissionRow[] {
  let known = EMISSION_RULES.find((x) => x === rule || x.id === rule);
  if (known === undefined || !(typeof f === "number" && f > 0 && f < Infinity)) {
    const args = parseArgs(EmissionRowsArgs, [EMISSION_RULES.includes(rule as EmissionRule) ? (rule as EmissionRule).id : rule, f], "emissionRows");
    known = EMISSION_RULES.find((x) => x.id === args.rule)!;
    f = args.f;
  }
  const hold = known.rows.filter((r) => f >= r.fMin && f <= r.fMax);
  const inside = hold.filter((r) => r.specific && f > r.fMin && f < r.fMax);
  return inside.length > 0 ? inside : hold;
}

/** emissionRows' arguments when not plain: a carried rule's id and a frequency. */
const EmissionRowsArgs = lazySchema(() => z.strictObject({ rule: oneOf(EMISSION_RULES.map((x) => x.id)), f: frequency() }));

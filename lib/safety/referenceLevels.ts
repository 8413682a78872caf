/**
 * Magnetic-field reference levels (RMS, unperturbed field) of the exposure guidelines for the
 * operating frequency, with their table numbers and how sure we are of each (docs/references.md,
 * "Exposure"). Frequencies in Hz; a row holds on its closed band [fMin, fMax]; at a frequency on
 * the edge between two rows both hold and the lower value is taken. Outside every row a
 * standard is "not covered" at that frequency (not a pass).
 */
import * as z from "../zod.ts";
import { MU0 } from "../constants.ts";
import { frequency as frequencyQ, lazySchema, oneOf, parseArgs } from "../schema.ts";

/** Who is exposed: the general public or workers who know of the exposure (occupational). */
export type Population = "public" | "occupational";

/** The standards carried here. */
export type ExposureStandardId = "ICNIRP 2010" | "ICNIRP 2020 whole body" | "ICNIRP 2020 local" | "ICNIRP 1998" | "IEEE C95.1-2019 head and torso" | "IEEE C95.1-2019 RF";

/** How sure we are of a table: checked against a reproduction of the publication, or recalled. */
export type SourceStatus = "checked" | "memory" | "memory, conflicting";

/** One row of a reference-level table. */
export interface LevelRow {
  /** band, Hz, both edges included */
  readonly fMin: number;
  readonly fMax: number;
  /** the level as published: the quantity and formula, f as the table writes it */
  readonly published: string;
  /** the level as flux density, T RMS, at frequency f (Hz) */
  readonly flux: (f: number) => number;
}

/** One standard's magnetic reference levels. */
export interface ExposureStandard {
  readonly id: ExposureStandardId;
  /** full citation */
  readonly citation: string;
  readonly tables: Readonly<Record<Population, string>>;
  readonly status: SourceStatus;
  /** averaging and application, in words */
  readonly applies: string;
  readonly rows: Readonly<Record<Population, readonly LevelRow[]>>;
}

const kHz = 1e3;
const MHz = 1e6;
/** H (A/m, RMS) to B (T) in free space, B = μ₀H: the published H columns of the RF tables. */
const fromH = (h: number): number => MU0 * h;

/** The reference-level tables, newest guidance first. */
export const EXPOSURE_STANDARDS: readonly ExposureStandard[] = [
  {
    id: "ICNIRP 2010",
    citation: "ICNIRP 2010, Guidelines for limiting exposure to time-varying electric and magnetic fields (1 Hz–100 kHz), Health Phys. 99(6):818–836",
    tables: { occupational: "Table 3", public: "Table 4" },
    status: "checked",
    applies: "RMS, unperturbed field, spatially averaged over the body (nerve stimulation); above 100 kHz the RF levels apply in addition",
    rows: {
      public: [{ fMin: 3 * kHz, fMax: 10 * MHz, published: "B 2.7×10⁻⁵ T (H 21 A/m)", flux: () => 2.7e-5 }],
      occupational: [{ fMin: 3 * kHz, fMax: 10 * MHz, published: "B 1×10⁻⁴ T (H 80 A/m)", flux: () => 1e-4 }],
    },
  },
  {
    id: "ICNIRP 2020 whole body",
    citation: "ICNIRP 2020, Guidelines for limiting exposure to electromagnetic fields (100 kHz to 300 GHz), Health Phys. 118(5):483–524",
    tables: { occupational: "Table 5", public: "Table 5" },
    status: "memory",
    applies: "RMS, averaged over 30 min and over the whole body (heating); compared here with the worst point, which overstates the body average",
    rows: {
      public: [{ fMin: 0.1 * MHz, fMax: 30 * MHz, published: "H 2.2/f_M A/m", flux: (f) => fromH(2.2 / (f / MHz)) }],
      occupational: [{ fMin: 0.1 * MHz, fMax: 30 * MHz, published: "H 4.9/f_M A/m", flux: (f) => fromH(4.9 / (f / MHz)) }],
    },
  },
  {
    id: "ICNIRP 2020 local",
    citation: "ICNIRP 2020, Guidelines for limiting exposure to electromagnetic fields (100 kHz to 300 GHz), Health Phys. 118(5):483–524",
    tables: { occupational: "Table 6", public: "Table 6" },
    status: "checked",
    applies: "RMS, averaged over 6 min, local exposure (heating); compared with the worst accessible point",
    rows: {
      public: [{ fMin: 0.1 * MHz, fMax: 30 * MHz, published: "H 4.9/f_M A/m", flux: (f) => fromH(4.9 / (f / MHz)) }],
      occupational: [{ fMin: 0.1 * MHz, fMax: 30 * MHz, published: "H 10.8/f_M A/m", flux: (f) => fromH(10.8 / (f / MHz)) }],
    },
  },
  {
    id: "ICNIRP 1998",
    citation: "ICNIRP 1998, Guidelines for limiting exposure to time-varying electric, magnetic and electromagnetic fields (up to 300 GHz), Health Phys. 74(4):494–522 (superseded)",
    tables: { occupational: "Table 6", public: "Table 7" },
    status: "memory",
    applies: "RMS, unperturbed field, spatially averaged over the body; superseded by ICNIRP 2010/2020 but still written into some national rules",
    rows: {
      public: [
        { fMin: 3 * kHz, fMax: 150 * kHz, published: "B 6.25 µT", flux: () => 6.25e-6 },
        { fMin: 0.15 * MHz, fMax: 1 * MHz, published: "B 0.92/f_M µT", flux: (f) => 0.92e-6 / (f / MHz) },
        { fMin: 1 * MHz, fMax: 10 * MHz, published: "B 0.92/f_M µT", flux: (f) => 0.92e-6 / (f / MHz) },
      ],
      occupational: [
        { fMin: 0.82 * kHz, fMax: 65 * kHz, published: "B 30.7 µT", flux: () => 30.7e-6 },
        { fMin: 0.065 * MHz, fMax: 1 * MHz, published: "B 2.0/f_M µT", flux: (f) => 2.0e-6 / (f / MHz) },
        { fMin: 1 * MHz, fMax: 10 * MHz, published: "B 2.0/f_M µT", flux: (f) => 2.0e-6 / (f / MHz) },
      ],
    },
  },
  {
    id: "IEEE C95.1-2019 head and torso",
    citation: "IEEE Std C95.1-2019, IEEE Standard for Safety Levels with Respect to Human Exposure to Electric, Magnetic, and Electromagnetic Fields, 0 Hz to 300 GHz",
    tables: { occupational: "ERL table, restricted environment (table number not verified)", public: "ERL table, unrestricted environment (table number not verified)" },
    status: "memory",
    applies: "RMS, exposure reference level of the head and torso (nerve stimulation)",
    rows: {
      public: [{ fMin: 3.35 * kHz, fMax: 5 * MHz, published: "B 205 µT", flux: () => 205e-6 }],
      occupational: [{ fMin: 3.35 * kHz, fMax: 5 * MHz, published: "B 615 µT", flux: () => 615e-6 }],
    },
  },
  {
    id: "IEEE C95.1-2019 RF",
    citation: "IEEE Std C95.1-2019 (as above), RF exposure reference levels",
    tables: { occupational: "RF ERL table, restricted environment (table number not verified)", public: "RF ERL table, unrestricted environment (table number not verified)" },
    status: "memory, conflicting",
    applies:
      "RMS, whole-body time average (heating); recalled as H 16.3/f_M A/m, while a secondary source gives 36.4/f_M A/m (possibly the local level) — read the standard's tables before relying on this row",
    rows: {
      public: [{ fMin: 0.1 * MHz, fMax: 1.34 * MHz, published: "H 16.3/f_M A/m", flux: (f) => fromH(16.3 / (f / MHz)) }],
      occupational: [{ fMin: 0.1 * MHz, fMax: 1.34 * MHz, published: "H 16.3/f_M A/m", flux: (f) => fromH(16.3 / (f / MHz)) }],
    },
  },
];

/** A reference level at one frequency. */
export interface ReferenceLevel {
  readonly standard: ExposureStandardId;
  readonly population: Population;
  /** flux density limit, T RMS */
  readonly flux: number;
  /** the same as H = B/μ₀, A/m RMS */
  readonly fieldStrength: number;
  /** table and row, e.g. "ICNIRP 2010 Table 4, 3 kHz–10 MHz: B 2.7×10⁻⁵ T (H 21 A/m)" */
  readonly row: string;
  readonly status: SourceStatus;
  readonly applies: string;
}

function band(r: LevelRow): string {
  const f = (x: number) => (x >= MHz ? `${+(x / MHz).toPrecision(4)} MHz` : `${+(x / kHz).toPrecision(4)} kHz`);
  return `${f(r.fMin)}–${f(r.fMax)}`;
}

/**
 * The magnetic reference level of a standard for a population at a frequency: the lowest of
 * the rows whose closed band holds f (so exactly on a band edge the stricter row governs), or
 * undefined when no row covers f.
 * @param standard e.g. "ICNIRP 2010".
 * @param population "public" or "occupational".
 * @param frequency Hz, > 0.
 * @example referenceLevel("ICNIRP 2010", "public", 200e3)?.flux // → 2.7e-5 (T RMS, Table 4)
 * @example referenceLevel("ICNIRP 1998", "public", 150e3)?.flux // → 6.133e-6 (edge: 0.92/0.15 µT beats 6.25 µT)
 */
export function referenceLevel(standard: ExposureStandardId, population: Population, frequency: number | string): ReferenceLevel | undefined {
  let s = EXPOSURE_STANDARDS.find((x) => x.id === standard);
  if (s === undefined || !plainArgs(population, frequency)) {
    ({ standard, population, frequency } = parseArgs(ReferenceLevelArgs, [standard, population, frequency], "referenceLevel"));
    s = EXPOSURE_STANDARDS.find((x) => x.id === standard)!;
  }
  let best: { row: LevelRow; flux: number } | undefined;
  for (const row of s.rows[population]) {
    if (frequency < row.fMin || frequency > row.fMax) continue;
    const flux = row.flux(frequency);
    if (!best || flux < best.flux) best = { row, flux };
  }
  if (!best) return undefined;
  return {
    standard,
    population,
    flux: best.flux,
    fieldStrength: best.flux / MU0,
    row: `${s.id.replace(/ (whole body|local|head and torso|RF)$/, "")} ${s.tables[population]}, ${band(best.row)}: ${best.row.published}`,
    status: s.status,
    applies: s.applies,
  };
}

/** The internal-electric-field basic restriction at a frequency, V/m RMS, or undefined outside 3 kHz–10 MHz. */
export interface BasicRestriction {
  readonly population: Population;
  /** internal electric field limit, V/m RMS */
  readonly field: number;
  readonly row: string;
  readonly status: SourceStatus;
}

/**
 * ICNIRP 2010 Table 2 basic restriction on the internal electric field (CNS of the head and all
 * tissues of head and body), 3 kHz–10 MHz: 1.35×10⁻⁴·f V/m (public), 2.7×10⁻⁴·f V/m
 * (occupational), f in Hz, RMS, averaged over a 2×2×2 mm³ contiguous tissue volume.
 * @example basicRestriction("public", 200e3)?.field // → 27 (V/m RMS)
 */
export function basicRestriction(population: Population, frequency: number | string): BasicRestriction | undefined {
  if (!plainArgs(population, frequency)) ({ population, frequency } = parseArgs(BasicRestrictionArgs, [population, frequency], "basicRestriction"));
  if (frequency < 3 * kHz || frequency > 10 * MHz) return undefined;
  const k = population === "public" ? 1.35e-4 : 2.7e-4;
  return {
    population,
    field: k * frequency,
    row: `ICNIRP 2010 Table 2, 3 kHz–10 MHz, ${population === "public" ? "general public" : "occupational"}: ${population === "public" ? "1.35" : "2.7"}×10⁻⁴·f V/m`,
    status: "checked",
  };
}

/** A population word and a frequency in Hz as the exposure check passes them (no parse needed). */
function plainArgs(population: unknown, frequency: unknown): frequency is number {
  return (population === "public" || population === "occupational") && typeof frequency === "number" && frequency > 0 && frequency < Infinity;
}

const population = () => oneOf(["public", "occupational"] as const);
/** referenceLevel's arguments, checked by name when they are not plain (a quantity string, a typo, NaN). */
const ReferenceLevelArgs = lazySchema(() => z.strictObject({ standard: oneOf(EXPOSURE_STANDARDS.map((x) => x.id)), population: population(), frequency: frequencyQ() }));
/** basicRestriction's arguments, likewise. */
const BasicRestrictionArgs = lazySchema(() => z.strictObject({ population: population(), frequency: frequencyQ() }));

/**
 * Capacitor dielectrics: typical dissipation factors (labelled defaults), ESR from the
 * dissipation factor, and the trade's advice for tank capacitors.
 *
 * ESR = tan δ/(ωC) (definition of the dissipation factor of a capacitor in series form,
 * IEC 60384-1 terms — from memory (unverified)). The tan δ values below are typical figures
 * for 100 kHz–1 MHz, from memory (unverified) of manufacturers' data: use a datasheet value
 * when you have one. Trade practice (no source): tanks want stable, low-loss dielectrics —
 * class 1 ceramic (C0G/NP0), polypropylene film, mica; class 2 ceramics (X7R, Y5V) lose
 * capacitance with DC bias, temperature and age and detune the tank, and polyester (PET)
 * film runs warm at tank currents.
 */
import * as z from "../zod.ts";
import { oneOf, parseInput, lazySchema } from "../schema.ts";
import { TanklightInputError, requirePositive } from "../errors.ts";

const DIELECTRIC_NAMES = ["C0G", "mica", "polypropylene", "PPS", "polyester", "X7R", "Y5V"] as const;

/** Dielectric keys. */
export type Dielectric = (typeof DIELECTRIC_NAMES)[number];

/** zod schema of a dielectric key (a Set lookup: prototype words are refused, a near miss suggested). */
export const DielectricSchema = lazySchema(() => oneOf(DIELECTRIC_NAMES));
const DielectricArg = lazySchema(() => z.strictObject({ dielectric: DielectricSchema }));

/** What we hold about one dielectric. */
export interface DielectricData {
  readonly name: string;
  /** typical tan δ at 100 kHz–1 MHz (labelled default) */
  readonly dissipationFactor: number;
  /** typical capacitance change over the working temperature range, relative (±) */
  readonly temperatureStability: number;
  /** recommended for resonant tanks (trade practice) */
  readonly goodForTanks: boolean;
  readonly note: string;
  readonly source: string;
}

const MEM = "typical value, from memory (unverified); use the datasheet's tan δ when known";

/** The dielectric table (plain data). */
export const DIELECTRICS: Readonly<Record<Dielectric, DielectricData>> = {
  C0G: { name: "class 1 ceramic C0G (NP0)", dissipationFactor: 5e-4, temperatureStability: 0.003, goodForTanks: true, note: "0 ± 30 ppm/K, no DC-bias loss; small values only", source: MEM },
  mica: { name: "silver mica", dissipationFactor: 5e-4, temperatureStability: 0.005, goodForTanks: true, note: "stable and low-loss; bulky and costly", source: MEM },
  polypropylene: { name: "polypropylene film (PP)", dissipationFactor: 4e-4, temperatureStability: 0.02, goodForTanks: true, note: "low loss, high voltage, the usual choice for larger tank capacitors; mind the AC rating at high frequency", source: MEM },
  PPS: { name: "polyphenylene sulphide film (PPS)", dissipationFactor: 1.5e-3, temperatureStability: 0.01, goodForTanks: true, note: "stable; loss between PP and PET", source: MEM },
  polyester: { name: "polyester film (PET)", dissipationFactor: 1e-2, temperatureStability: 0.05, goodForTanks: false, note: "lossy at 100 kHz and above: runs warm and lowers Q", source: MEM },
  X7R: { name: "class 2 ceramic X7R", dissipationFactor: 2e-2, temperatureStability: 0.15, goodForTanks: false, note: "capacitance falls with DC bias and age, ±15 % over temperature: detunes the tank", source: MEM },
  Y5V: { name: "class 2 ceramic Y5V", dissipationFactor: 5e-2, temperatureStability: 0.8, goodForTanks: false, note: "+22/−82 % over temperature: unsuitable for tanks", source: MEM },
};

function checkDielectric(d: unknown, where: string): Dielectric {
  return parseInput(DielectricArg, { dielectric: d }, where).dielectric;
}

/** The data of a dielectric. @example dielectric("C0G").dissipationFactor // → 0.0005 */
export function dielectric(d: Dielectric): DielectricData {
  return DIELECTRICS[checkDielectric(d, "dielectric")];
}

/**
 * Equivalent series resistance of a capacitor from its dissipation factor: ESR = tan δ/(ωC).
 * @param dissipationFactor tan δ, ≥ 0 (or a dielectric key for its typical value);
 * @param frequency Hz > 0; capacitance F > 0.
 * @returns Ω.
 * @example esrFromDissipationFactor(4e-4, 200e3, 10e-9) // → 0.031830988618379075 Ω
 */
export function esrFromDissipationFactor(dissipationFactor: number | Dielectric, frequency: number, capacitance: number): number {
  const where = "esrFromDissipationFactor";
  const td = typeof dissipationFactor === "string"
    ? DIELECTRICS[parseInput(z.strictObject({ dissipationFactor: DielectricSchema }), { dissipationFactor }, where).dissipationFactor].dissipationFactor
    : dissipationFactor;
  if (!(Number.isFinite(td) && td >= 0)) {
    throw new TanklightInputError([{ path: "dissipationFactor", message: "must be a finite number ≥ 0", value: td }], where);
  }
  requirePositive(frequency, "frequency", "Hz", where);
  requirePositive(capacitance, "capacitance", "F", where);
  return td / (2 * Math.PI * frequency * capacitance);
}

/** Standard DC voltage ratings of capacitors, V (trade practice, no source). */
export const VOLTAGE_RATINGS: readonly number[] = [6.3, 10, 16, 25, 35, 50, 63, 100, 160, 200, 250, 400, 450, 630, 1000, 1500, 2000, 3000];

/** A recommendation for a tank capacitor. */
export interface CapacitorRecommendation {
  /** dielectrics suited to a tank, best first */
  readonly dielectrics: readonly Dielectric[];
  /** smallest standard DC rating ≥ derating × peak voltage, V (Infinity when none is enough) */
  readonly ratedVoltage: number;
  /** the derating factor used */
  readonly derating: number;
  readonly reasons: readonly string[];
}

/**
 * Recommends dielectric classes and a voltage rating for a tank capacitor.
 * Trade practice (no source): a rating of at least twice the peak working voltage; C0G below
 * about 10 nF, polypropylene film above (C0G parts get scarce and costly above ~10–47 nF).
 * @param peakVoltage peak voltage across the capacitor, V ≥ 0; capacitance F > 0;
 * @param options derating (default 2).
 * @example recommendCapacitor(40, 6.8e-9).ratedVoltage // → 100
 */
export function recommendCapacitor(peakVoltage: number, capacitance: number, opts: { readonly derating?: number } = {}): CapacitorRecommendation {
  const where = "recommendCapacitor";
  const options = parseInput(z.strictObject({ options: z.strictObject({ derating: z.number().optional() }) }), { options: opts }, where).options;
  if (!(Number.isFinite(peakVoltage) && peakVoltage >= 0)) {
    throw new TanklightInputError([{ path: "peakVoltage", message: "must be a finite number ≥ 0 V", value: peakVoltage }], where);
  }
  requirePositive(capacitance, "capacitance", "F", where);
  const derating = options.derating ?? 2;
  requirePositive(derating, "derating", "", where);
  const need = derating * peakVoltage;
  const rated = VOLTAGE_RATINGS.find((v) => v >= need) ?? Infinity;
  const small = capacitance <= 10e-9;
  const dielectrics: Dielectric[] = small ? ["C0G", "polypropylene", "mica"] : ["polypropylene", "C0G", "PPS"];
  const reasons = [
    "stable, low-loss dielectric for a resonant tank (trade practice, no source): class 2 ceramics (X7R, Y5V) drift with bias, temperature and age and detune the tank",
    `rating ≥ ${derating} × the peak voltage ${peakVoltage.toPrecision(3)} V (trade practice, no source)`,
  ];
  if (!Number.isFinite(rated)) reasons.push(`no standard rating reaches ${need.toPrecision(3)} V: split the capacitor into several in series`);
  reasons.push("film capacitors' AC voltage rating falls with frequency: check the datasheet's AC derating curve at the tank frequency");
  return { dielectrics, ratedVoltage: rated, derating, reasons };
}

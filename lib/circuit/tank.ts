/**
 * Tuned tanks: resonance, quality factor, bandwidth and detuning tolerance of an LC tank.
 *
 * Methods: Thomson's formula f₀ = 1/(2π√(LC)); the quality factor of a tank with several
 * small losses as the reciprocal sum 1/Q = Σ 1/Q_k (each loss taken separately: coil
 * Q_L = ωL/R_L, capacitor Q_C = 1/tan δ = 1/(ω·C·ESR), parallel load Q_p = R_p/(ωL));
 * −3 dB bandwidth f₀/Q; the universal resonance curve of a single tuned circuit,
 * |H|/|H₀| = 1/√(1 + Q²(f/f₀ − f₀/f)²) (Terman, "Radio Engineers' Handbook", 1943, §3 —
 * from memory (unverified); the same curve in any circuits text).
 */
import * as z from "../zod.ts";
import { TanklightInputError, requirePositive } from "../errors.ts";
import { inductance, frequency, capacitance, dimensionless, oneOf, parseArgs, parseInput, resistance, wholeNumber, lazySchema } from "../schema.ts";
import { formatQuantity, type QuantityInput } from "../units.ts";
import { bestCombination, type CombinationTopology } from "./combination.ts";
import { ESeriesSchema } from "./eseries.ts";

/**
 * Capacitances sold as parts, F: 0.1 pF (the smallest ceramic chip values) to 10 mF (large
 * electrolytics; tank capacitors stop far lower) — trade practice (no source). A tuning that
 * needs a value outside it cannot be bought and is refused.
 */
export const PURCHASABLE_CAPACITANCE = { min: 0.1e-12, max: 10e-3 } as const;

const LcArgs = lazySchema(() => z.strictObject({ inductance: inductance(), frequency: frequency() }));
const LcFromCArgs = lazySchema(() => z.strictObject({ inductance: inductance(), capacitance: capacitance() }));

/**
 * Capacitance that tunes an inductance to a frequency: C = 1/((2πf)²·L).
 * @param inductance H, > 0 (or "100 uH"); frequency Hz, > 0 (or "200 kHz").
 * @returns capacitance, F.
 * @example resonantCapacitance(100e-6, 200e3) // → 6.332573977646111e-9
 * @example resonantCapacitance("100 uH", "200 kHz") // → 6.332573977646111e-9
 * Related: resonantFrequency, nearestStandardValue, bestCombination.
 */
export function resonantCapacitance(inductance: QuantityInput, frequency: QuantityInput): number {
  const a = parseArgs(LcArgs, [inductance, frequency], "resonantCapacitance");
  return capacitanceFor(a.inductance, a.frequency);
}

/** C = 1/((2πf)²L) for checked SI numbers. */
function capacitanceFor(L: number, f: number): number {
  const w = 2 * Math.PI * f;
  return 1 / (w * w * L);
}

/**
 * Resonant frequency of an LC tank: f₀ = 1/(2π√(LC)).
 * @param inductance H, > 0 (or "100 uH"); capacitance F, > 0 (or "6.8 nF").
 * @returns Hz.
 * @example resonantFrequency(100e-6, 6.8e-9) // → 193003.7180020742
 */
export function resonantFrequency(inductance: QuantityInput, capacitance: QuantityInput): number {
  const a = parseArgs(LcFromCArgs, [inductance, capacitance], "resonantFrequency");
  return 1 / (2 * Math.PI * Math.sqrt(a.inductance * a.capacitance));
}

/** A tank's parts and losses, for {@link tankQuality} (SI numbers or quantity strings). */
export const TankLosses = lazySchema(() => z.strictObject({
  /** inductance, H, > 0 */
  inductance: inductance(),
  /** capacitance, F, > 0 */
  capacitance: capacitance(),
  /** coil series resistance at the operating frequency, Ω ≥ 0 */
  coilResistance: resistance().optional(),
  /** capacitor ESR, Ω ≥ 0 (or give dissipationFactor) */
  capacitorEsr: resistance().optional(),
  /** capacitor dissipation factor tan δ ≥ 0 (alternative to capacitorEsr) */
  dissipationFactor: dimensionless({ nonNegative: true }).optional(),
  /** resistance in parallel with the tank (a linear load), Ω > 0 */
  parallelResistance: resistance({ positive: true }).optional(),
}));
/** What {@link tankQuality} accepts. */
export type TankLosses = z.input<typeof TankLosses>;

/** Quality factor of a tank and its parts. */
export interface TankQuality {
  /** resonant frequency, Hz */
  readonly frequency: number;
  /** loaded Q of the tank: 1/Q = Σ 1/Q_k */
  readonly q: number;
  /** coil Q, ωL/R (Infinity when lossless) */
  readonly coilQ: number;
  /** capacitor Q, 1/tan δ (Infinity when lossless) */
  readonly capacitorQ: number;
  /** parallel-load Q, R_p/(ωL) (Infinity when absent) */
  readonly loadQ: number;
  /** −3 dB bandwidth, Hz */
  readonly bandwidth: number;
  /** equivalent parallel resistance at resonance, Q·ωL, Ω */
  readonly dynamicResistance: number;
  /** characteristic impedance √(L/C), Ω */
  readonly characteristicImpedance: number;
}

/**
 * Quality factor, bandwidth and dynamic resistance of an LC tank at resonance.
 * 1/Q = R_L/(ωL) + tan δ + ωL/R_p (small losses, each referred separately).
 * @param t parts and losses (see {@link TankLosses}); at least one loss must be given.
 * @returns {@link TankQuality}.
 * @example tankQuality({ inductance: 100e-6, capacitance: 6.8e-9, coilResistance: 2 }).q // → 60.63390625908323
 */
export function tankQuality(input: TankLosses): TankQuality {
  const where = "tankQuality";
  const t = parseInput(TankLosses, input, where);
  const f = 1 / (2 * Math.PI * Math.sqrt(t.inductance * t.capacitance));
  const w = 2 * Math.PI * f;
  const wl = w * t.inductance;
  const nonNeg = (x: number | undefined, name: string, unit: string) => {
    if (x === undefined) return 0;
    if (!(Number.isFinite(x) && x >= 0)) {
      throw new TanklightInputError([{ path: name, message: `must be a finite number ≥ 0 ${unit}`, value: x }], where);
    }
    return x;
  };
  const rl = nonNeg(t.coilResistance, "coilResistance", "Ω");
  if (t.capacitorEsr !== undefined && t.dissipationFactor !== undefined) {
    throw new TanklightInputError([{ path: "capacitorEsr", message: "give capacitorEsr or dissipationFactor, not both", value: t.capacitorEsr }], where);
  }
  const tanD = t.dissipationFactor !== undefined
    ? nonNeg(t.dissipationFactor, "dissipationFactor", "")
    : nonNeg(t.capacitorEsr, "capacitorEsr", "Ω") * w * t.capacitance;
  let invQp = 0;
  if (t.parallelResistance !== undefined) {
    requirePositive(t.parallelResistance, "parallelResistance", "Ω", where);
    invQp = wl / t.parallelResistance;
  }
  const invQl = rl / wl;
  const invQ = invQl + tanD + invQp;
  if (!(invQ > 0)) {
    throw new TanklightInputError(
      [{ path: "coilResistance", message: "a tank needs at least one loss (coil resistance, capacitor ESR/tan δ or a parallel resistance)", value: t }],
      where,
    );
  }
  const q = 1 / invQ;
  return {
    frequency: f,
    q,
    coilQ: invQl > 0 ? 1 / invQl : Infinity,
    capacitorQ: tanD > 0 ? 1 / tanD : Infinity,
    loadQ: invQp > 0 ? 1 / invQp : Infinity,
    bandwidth: f / q,
    dynamicResistance: q * wl,
    characteristicImpedance: Math.sqrt(t.inductance / t.capacitance),
  };
}

/**
 * −3 dB bandwidth of a tank: f₀/Q.
 * @param f0 resonant frequency, Hz > 0; q quality factor > 0.
 * @example tankBandwidth(200e3, 50) // → 4000
 */
export function tankBandwidth(f0: number, q: number): number {
  requirePositive(f0, "f0", "Hz", "tankBandwidth");
  requirePositive(q, "q", "", "tankBandwidth");
  return f0 / q;
}

/** How far a tank may be detuned before its response falls by a fraction. */
export interface DetuningWindow {
  /** frequency ratio f/f₀ below resonance where the response has fallen by the fraction */
  readonly lowerRatio: number;
  /** frequency ratio above resonance */
  readonly upperRatio: number;
  /** relative frequency offset allowed, (upper − lower)/2, ≈ x/(2Q) */
  readonly relativeHalfWidth: number;
  /**
   * the matching relative capacitance (or inductance) change: the tank's own resonance moves
   * as f ∝ 1/√C, so C may change by a factor 1/ratio² — here [1/upper² − 1, 1/lower² − 1]
   */
  readonly capacitanceChange: readonly [number, number];
}

/**
 * Detuning a single tuned tank tolerates before its voltage (at fixed drive) falls by
 * `fraction`: |H|/|H₀| = 1/√(1 + Q²(r − 1/r)²) = 1 − fraction, r = f/f₀ (universal resonance curve).
 * Solving: Q(r − 1/r) = ±x, x = √(1/(1 − fraction)² − 1); r = (±x/Q + √(x²/Q² + 4))/2.
 * @param q loaded quality factor, > 0; fraction response drop, 0 < fraction < 1 (e.g. 0.1 for 10 %;
 *   1 − 1/√2 ≈ 0.293 gives the −3 dB points).
 * @returns {@link DetuningWindow}.
 * @example detuningTolerance(50, 1 - Math.SQRT1_2).relativeHalfWidth // → 0.01 (= 1/(2Q))
 */
export function detuningTolerance(q: number, fraction: number): DetuningWindow {
  requirePositive(q, "q", "", "detuningTolerance");
  if (!(q >= 1e-6)) {
    throw new TanklightInputError([{ path: "q", message: "must be ≥ 1e-6 (below it the window spans every frequency and overflows)", value: q }], "detuningTolerance");
  }
  if (!(Number.isFinite(fraction) && fraction > 0 && fraction < 1)) {
    throw new TanklightInputError([{ path: "fraction", message: "must be between 0 and 1 (exclusive)", value: fraction }], "detuningTolerance");
  }
  const x = Math.sqrt(1 / ((1 - fraction) * (1 - fraction)) - 1);
  const a = x / q;
  const root = Math.sqrt(a * a + 4);
  const upper = (a + root) / 2;
  const lower = (-a + root) / 2;
  return {
    lowerRatio: lower,
    upperRatio: upper,
    relativeHalfWidth: (upper - lower) / 2,
    capacitanceChange: [1 / (upper * upper) - 1, 1 / (lower * lower) - 1],
  };
}

/** One way to tune a coil with standard capacitors. */
export interface TuningChoice {
  /** the capacitors, F, ascending */
  readonly parts: readonly number[];
  /** how they are connected ("single", "parallel", "series", or a mixed form) */
  readonly topology: string;
  /** total capacitance, F */
  readonly capacitance: number;
  /** resulting resonant frequency, Hz */
  readonly frequency: number;
  /** (frequency − target)/target */
  readonly frequencyError: number;
}

/** Options of {@link tuneWithStandardParts}. */
export const TuneOptions = lazySchema(() => z.strictObject({
  /** IEC 60063 series of the capacitors, default "E12" */
  series: ESeriesSchema.optional(),
  /** most capacitors in a combination, 1–3, default 2 */
  maxParts: wholeNumber(1, 3, "combinations of up to three parts are searched").optional(),
  /** how many choices, default 5 */
  count: wholeNumber(1, 100, "the ranked list is for reading, not for enumeration").optional(),
  /** connections allowed: "series", "parallel" or "any" */
  topology: oneOf(["series", "parallel", "any"] as const).optional(),
}));
/** What {@link tuneWithStandardParts} accepts as options. */
export type TuneOptions = z.input<typeof TuneOptions>;

const TuneArgs = lazySchema(() => z.strictObject({ inductance: inductance(), frequency: frequency(), options: TuneOptions.optional() }));

/**
 * Tunes a coil to a frequency with standard capacitors: the ideal capacitance
 * 1/((2πf)²L), then the best one-, two- or three-part combinations of an E-series
 * (bestCombination), each with the frequency it actually gives (f ∝ 1/√C: a capacitance
 * error ε moves f by ≈ −ε/2). A tuning that needs a capacitance outside the parts sold
 * ({@link PURCHASABLE_CAPACITANCE}, 0.1 pF … 10 mF) is refused, naming both arguments.
 * @param inductance H > 0 (or "100 uH"); frequency target, Hz > 0 (or "200 kHz");
 * @param options series (default "E12"), maxParts (default 2), count (default 5), topology.
 * @returns `{ capacitance, choices }`, choices ranked by |frequencyError| then part count.
 * @example tuneWithStandardParts(100e-6, 200e3).choices[0] // → 6.8 nF in series with 100 nF: 6.367 nF, 199457.9 Hz (−0.27 %)
 */
export function tuneWithStandardParts(
  inductance: QuantityInput,
  frequency: QuantityInput,
  options: TuneOptions = {},
): { readonly capacitance: number; readonly choices: readonly TuningChoice[] } {
  const where = "tuneWithStandardParts";
  const a = parseArgs(TuneArgs, [inductance, frequency, options], where);
  const L = a.inductance;
  const f = a.frequency;
  const o = a.options ?? {};
  const c = capacitanceFor(L, f);
  if (!(c >= PURCHASABLE_CAPACITANCE.min && c <= PURCHASABLE_CAPACITANCE.max)) {
    throw new TanklightInputError(
      [{
        path: "inductance",
        message: `with frequency ${formatQuantity(f, "Hz")} needs C = ${c.toPrecision(3)} F, outside the capacitors sold (${formatQuantity(PURCHASABLE_CAPACITANCE.min, "F")} … ${formatQuantity(PURCHASABLE_CAPACITANCE.max, "F")}, trade practice); check the units of inductance and frequency`,
        value: inductance,
        expected: `inductance and frequency with 1/((2πf)²L) between ${PURCHASABLE_CAPACITANCE.min} F and ${PURCHASABLE_CAPACITANCE.max} F`,
      }],
      where,
    );
  }
  const combos = bestCombination(c, o.series ?? "E12", {
    maxParts: (o.maxParts ?? 2) as 1 | 2 | 3,
    count: o.count ?? 5,
    kind: "capacitor",
    ...(o.topology ? { topology: o.topology as CombinationTopology } : {}),
  });
  const choices = combos.map((k) => {
    const fr = 1 / (2 * Math.PI * Math.sqrt(L * k.value));
    return { parts: k.parts, topology: k.topology, capacitance: k.value, frequency: fr, frequencyError: (fr - f) / f };
  });
  return { capacitance: c, choices };
}

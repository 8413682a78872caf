/**
 * Tolerance windows: the band of resonant frequencies a batch of tanks built from toleranced
 * parts produces — worst case (all extremes) and statistical (Monte Carlo with a seeded
 * generator, plus the first-order root-sum-square estimate).
 *
 * f₀ = 1/(2π√(LC)) ⇒ δf/f ≈ −½(δL/L + δC/C); with independent parts
 * σ_f/f ≈ ½·√(σ_L² + σ_C²) (first-order propagation of uncertainty, JCGM 100:2008 "GUM"
 * eq. 10 — from memory (unverified)). A tolerance ±t is read as a uniform distribution on
 * [−t, t] (σ = t/√3: parts sorted into bins, trade practice) or as a normal one with t = 3σ.
 */
import { mean, quantileSorted, sampleStandardDeviation } from "simple-statistics";
import { createRandom } from "../math/random.ts";
import * as z from "../zod.ts";
import { capacitance, inductance, oneOf, parseInput, quantity, wholeNumber, lazySchema } from "../schema.ts";

/** Relative part tolerance, e.g. 0.05 (or "5 %") for ±5 %, 0 ≤ t < 1. */
const relativeTolerance = () =>
  quantity("dimensionless", { nonNegative: true, example: "5 %" }).pipe(
    z.number().lt(1, { error: "must be a relative tolerance in [0, 1), e.g. 0.05 for ±5 %" }),
  );

/** Monte Carlo draws: each is one resonant frequency, kept and sorted (memory and sort time). */
export const MAX_TOLERANCE_SAMPLES = 10_000_000;

/** Inputs of {@link resonantFrequencyWindow} (SI numbers or quantity strings). */
export const ToleranceInput = lazySchema(() => z.strictObject({
  /** nominal inductance, H, > 0 */
  inductance: inductance(),
  /** nominal capacitance, F, > 0 */
  capacitance: capacitance(),
  /** relative inductance tolerance, e.g. 0.05 for ±5 %, 0 ≤ t < 1 */
  inductanceTolerance: relativeTolerance(),
  /** relative capacitance tolerance, e.g. 0.05 for ±5 %, 0 ≤ t < 1 */
  capacitanceTolerance: relativeTolerance(),
  /** how a ±t tolerance is distributed: "uniform" (default) or "normal" (t = 3σ) */
  distribution: oneOf(["uniform", "normal"] as const).optional(),
  /** Monte Carlo draws, default 20000, 100 … 1e7 */
  samples: wholeNumber(100, MAX_TOLERANCE_SAMPLES, "each draw is kept and sorted: memory and time grow with it").optional(),
  /** seed of the generator (lib/math/random.ts createRandom), default 1 */
  seed: wholeNumber(0, Number.MAX_SAFE_INTEGER, "the generator's seed range").optional(),
  /** central fraction of the batch the statistical band covers, default 0.99, 0 < coverage < 1 */
  coverage: z.number({ error: "must be a number between 0 and 1 (exclusive)" }).gt(0, { error: "must be between 0 and 1 (exclusive)" }).lt(1, { error: "must be between 0 and 1 (exclusive)" }).optional(),
}));
/** What {@link resonantFrequencyWindow} accepts. */
export type ToleranceInput = z.input<typeof ToleranceInput>;

/** The band of resonant frequencies. */
export interface FrequencyWindow {
  /** nominal f₀, Hz */
  readonly nominal: number;
  /** worst case: every part at an extreme, Hz */
  readonly worstCase: { readonly min: number; readonly max: number };
  /** Monte Carlo: mean, standard deviation and the central `coverage` band, Hz */
  readonly statistical: {
    readonly mean: number;
    readonly sd: number;
    readonly lower: number;
    readonly upper: number;
    readonly coverage: number;
    readonly samples: number;
    readonly seed: number;
  };
  /** first-order estimate σ_f = f₀·½√(σ_L² + σ_C²), Hz */
  readonly linearisedSd: number;
}

/**
 * Resonant-frequency band of a batch of LC tanks with toleranced parts.
 * @param input see {@link ToleranceInput}.
 * @returns {@link FrequencyWindow} (Hz).
 * @example resonantFrequencyWindow({ inductance: 100e-6, capacitance: 6.8e-9, inductanceTolerance: 0.05, capacitanceTolerance: 0.05 }).worstCase.min // → 183813.0647638802 (= f₀/1.05)
 */
export function resonantFrequencyWindow(spec: ToleranceInput): FrequencyWindow {
  const input = parseInput(ToleranceInput, spec, "resonantFrequencyWindow");
  const tl = input.inductanceTolerance;
  const tc = input.capacitanceTolerance;
  const dist = input.distribution ?? "uniform";
  const n = input.samples ?? 20000;
  const coverage = input.coverage ?? 0.99;
  const seed = input.seed ?? 1;
  const L = input.inductance;
  const C = input.capacitance;
  const f = (l: number, c: number) => 1 / (2 * Math.PI * Math.sqrt(l * c));
  const nominal = f(L, C);
  const rng = createRandom(seed);
  const draw = (t: number): number => {
    if (t === 0) return 0;
    if (dist === "uniform") return rng.uniformIn(-t, t);
    // normal with t = 3σ, truncated at ±t (parts outside tolerance are rejected at test)
    for (;;) {
      const x = rng.normal(0, t / 3);
      if (Math.abs(x) <= t) return x;
    }
  };
  const fs = new Float64Array(n);
  for (let k = 0; k < n; k++) fs[k] = f(L * (1 + draw(tl)), C * (1 + draw(tc)));
  const sorted = Array.from(fs).sort((a, b) => a - b);
  const tail = (1 - coverage) / 2;
  const sigma = (t: number) => (dist === "uniform" ? t / Math.sqrt(3) : t / 3);
  return {
    nominal,
    worstCase: { min: f(L * (1 + tl), C * (1 + tc)), max: f(L * (1 - tl), C * (1 - tc)) },
    statistical: {
      mean: mean(sorted),
      sd: sampleStandardDeviation(sorted),
      lower: quantileSorted(sorted, tail),
      upper: quantileSorted(sorted, 1 - tail),
      coverage,
      samples: n,
      seed,
    },
    linearisedSd: nominal * 0.5 * Math.sqrt(sigma(tl) ** 2 + sigma(tc) ** 2),
  };
}

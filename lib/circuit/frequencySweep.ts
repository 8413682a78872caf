/**
 * A link solved over a range of drive frequencies: transmitter current, input power, power to
 * the loads and efficiency against frequency, with the peaks located. Strongly coupled tanks
 * show frequency splitting: two identical tanks tuned to f₀ with coupling k resonate at
 * f₀/√(1 ± k) (textbook coupled resonators; checked in tests/circuit/linkFrequencySweep.test.ts).
 */
import * as z from "../zod.ts";
import { TanklightInputError, underName } from "../errors.ts";
import { frequency, oneOf, parseArgs, wholeNumber, lazySchema } from "../schema.ts";
import type { LinkNetwork, LinkOptions } from "./link/network.ts";
import { solveLinkNetwork } from "./link/solveNetwork.ts";
import type { LinkResult } from "./link/result.ts";

/**
 * Most frequencies in one sweep: each point solves the whole link (and each peak a few dozen
 * more), and every quantity keeps one number per point.
 */
export const MAX_SWEEP_POINTS = 100_000;
const WHY_POINTS = "each point solves the whole link";

/** The sweep's frequencies: an explicit list, or a range (SI numbers or quantity strings). */
export const SweepFrequencies = lazySchema(() => z.union([
  z.array(frequency()).max(MAX_SWEEP_POINTS, { error: `must hold at most ${MAX_SWEEP_POINTS} frequencies (${WHY_POINTS})` }).readonly(),
  z.strictObject({
    start: frequency(),
    stop: frequency(),
    points: wholeNumber(2, MAX_SWEEP_POINTS, WHY_POINTS),
    spacing: oneOf(["linear", "log"] as const).optional(),
  }),
]));
/** What {@link frequencySweep} accepts as frequencies. */
export type SweepFrequencies = z.input<typeof SweepFrequencies>;

/** The options of {@link frequencySweep}: the link options (checked by the solver) plus `refine`. */
const SweepOptions = lazySchema(() => z.strictObject({
  litThreshold: z.unknown(),
  brightnessReference: z.unknown(),
  cautionVoltage: z.unknown(),
  maxIterations: z.unknown(),
  tolerance: z.unknown(),
  onNonConvergence: z.unknown(),
  refine: z.boolean({ error: "must be true or false" }).optional(),
}));

const SweepArgs = lazySchema(() => z.strictObject({
  network: z.custom<LinkNetwork | ((frequency: number) => LinkNetwork)>(
    (n) => typeof n === "function" || (typeof n === "object" && n !== null && Array.isArray((n as LinkNetwork).receivers) && typeof (n as LinkNetwork).transmitter === "object"),
    { error: "must be a LinkNetwork or a function of frequency giving one" },
  ),
  frequencies: SweepFrequencies,
  options: SweepOptions.partial().optional(),
}));

/** Quantities a peak search can follow. */
export type SweepQuantity = "transmitterCurrent" | "inputPower" | "delivered" | "efficiency";

/** The sweep result: one entry per frequency, SI. */
export interface FrequencySweep {
  readonly frequency: Float64Array;
  /** transmitter coil current, A peak */
  readonly transmitterCurrent: Float64Array;
  /** power from the drive's source, W */
  readonly inputPower: Float64Array;
  /** Σ load power, W */
  readonly delivered: Float64Array;
  readonly efficiency: Float64Array;
  /** each receiver's load amplitude, V peak: loadVoltage[k][i] */
  readonly loadVoltage: readonly Float64Array[];
  /** local maxima of each quantity, Hz (refined by golden-section search when options.refine) */
  readonly peaks: Readonly<Record<SweepQuantity, readonly number[]>>;
  readonly warnings: readonly string[];
}

/**
 * Solves the link at each frequency of a sweep.
 *
 * @param network the link as numbers, or a function giving it at a frequency (use the function
 *   where coil resistances change with frequency; a plain network keeps its resistances and
 *   inductances and only its `frequency` changes).
 * @param frequencies a list of frequencies (Hz, > 0) or { start, stop, points ≥ 2, spacing }.
 * @param options link options, plus `refine` (default true): refine each grid peak to 1e-10
 *   relative by golden-section search between its grid neighbours.
 * @returns {@link FrequencySweep}.
 * @example two identical series tanks at 200 kHz with k = 0.2 → peaks.transmitterCurrent ≈
 *   [182.6 kHz, 223.6 kHz] (= 200 kHz/√1.2, 200 kHz/√0.8)
 */
export function frequencySweep(
  network: LinkNetwork | ((frequency: number) => LinkNetwork),
  frequencies: SweepFrequencies,
  options: LinkOptions & { readonly refine?: boolean } = {},
): FrequencySweep {
  const where = "frequencySweep";
  const args = parseArgs(SweepArgs, [network, frequencies, options], where);
  const fs = sweepFrequencies(args.frequencies);
  const at = typeof network === "function" ? network : (f: number): LinkNetwork => ({ ...network, frequency: f });
  // the solver checks the network and the link options; its messages carry this function's name
  const { refine: _refine, ...linkOptions } = options;
  const solve = (f: number): LinkResult => underName(where, () => solveLinkNetwork(at(f), linkOptions));
  const n = fs.length;
  const out = {
    transmitterCurrent: new Float64Array(n),
    inputPower: new Float64Array(n),
    delivered: new Float64Array(n),
    efficiency: new Float64Array(n),
  };
  let loadVoltage: Float64Array[] = [];
  const warnings = new Set<string>();
  for (let i = 0; i < n; i++) {
    const r = solve(fs[i]!);
    if (i === 0) loadVoltage = r.receivers.map(() => new Float64Array(n));
    out.transmitterCurrent[i] = r.transmitter.coilCurrent;
    out.inputPower[i] = r.power.input;
    out.delivered[i] = r.power.delivered;
    out.efficiency[i] = r.power.efficiency;
    r.receivers.forEach((rx, k) => (loadVoltage[k]![i] = rx.loadVoltage));
    for (const w of r.warnings) warnings.add(w);
  }
  const pick: Record<SweepQuantity, (r: LinkResult) => number> = {
    transmitterCurrent: (r) => r.transmitter.coilCurrent,
    inputPower: (r) => r.power.input,
    delivered: (r) => r.power.delivered,
    efficiency: (r) => r.power.efficiency,
  };
  const refine = options.refine ?? true;
  const peaks = {} as Record<SweepQuantity, number[]>;
  for (const key of Object.keys(pick) as SweepQuantity[]) {
    const ys = out[key];
    const list: number[] = [];
    for (let i = 1; i < n - 1; i++) {
      if (ys[i]! > ys[i - 1]! && ys[i]! >= ys[i + 1]!) {
        list.push(refine ? goldenMax((f) => pick[key](solve(f)), fs[i - 1]!, fs[i + 1]!) : fs[i]!);
      }
    }
    peaks[key] = list;
  }
  return { frequency: fs, ...out, loadVoltage, peaks, warnings: [...warnings] };
}

function sweepFrequencies(spec: z.output<typeof SweepFrequencies>): Float64Array {
  if (Array.isArray(spec)) return Float64Array.from(spec as readonly number[]);
  const r = spec as Exclude<z.output<typeof SweepFrequencies>, readonly number[]>;
  const a = r.start;
  const b = r.stop;
  if (!(b > a)) {
    throw new TanklightInputError(
      [{ path: "frequencies", message: "need stop > start and an integer number of points ≥ 2", value: spec }],
      "frequencySweep",
    );
  }
  const out = new Float64Array(r.points);
  for (let i = 0; i < r.points; i++) {
    const t = i / (r.points - 1);
    out[i] = r.spacing === "log" ? a * Math.pow(b / a, t) : a + (b - a) * t;
  }
  return out;
}

/** Golden-section search for the maximum of a unimodal function on [a, b] (Kiefer 1953). */
function goldenMax(fn: (x: number) => number, a: number, b: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = fn(c);
  let fd = fn(d);
  for (let it = 0; it < 200 && b - a > 1e-11 * Math.abs(b); it++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g * (b - a);
      fc = fn(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g * (b - a);
      fd = fn(d);
    }
  }
  return (a + b) / 2;
}

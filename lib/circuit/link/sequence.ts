/**
 * solveLinkSequence(system, sequence): a transmitter array switched on one coil at a time (a
 * scan) or in groups, each token's brightness the time average over the sequence — so a
 * design can trade peak coil current for coverage.
 *
 * The network of the whole system is built once (linkNetwork: every L, R and M); each step
 * solves the sub-network of its coils with the describing-function solver (solveLinkNetwork),
 * and the LED currents are averaged with the steps' time shares.
 *
 * Perception assumption: brightness follows the time-average LED current when the sequence
 * repeats above about 100 Hz, where the eye no longer sees the flicker (trade practice, no
 * source). Each step is assumed long enough for the tanks to settle (steady state per step:
 * many carrier cycles — a tank's envelope settles in a few times Q/π cycles).
 */
import * as z from "../../zod.ts";
import { TanklightInputError } from "../../errors.ts";
import { frequency, nearestKey, parseArgs, lazySchema } from "../../schema.ts";
import { linkNetwork, SolveLinkOptionsInput, type LinkSystem } from "../link.ts";
import { DEFAULT_LIT_THRESHOLD, networkTransmitters, type LinkNetwork, type LinkOptions, type TransmitterNetwork } from "./network.ts";
import type { LinkResult } from "./result.ts";
import { solveLinkNetwork } from "./solveNetwork.ts";

/**
 * Repetition rate below which a sequenced token visibly flickers, Hz: about 100 Hz (trade
 * practice, no source: LED drivers keep PWM and multiplexing above 100–200 Hz).
 */
export const FLICKER_FUSION_RATE = 100;

/** At most this many steps in one sequence (each is one link solve). */
export const MAX_SEQUENCE_STEPS = 1024;

const STEP_TRANSMITTER = lazySchema(() => z.union([z.number().int().nonnegative(), z.string().min(1)]));

/**
 * A sequence: `steps` — "scan" (each transmitter alone, equal time) or a list of
 * `{ on: [index or label, …], weight? }` (weight: relative duration, default 1); `idle` — what an
 * off coil is: "open" (default: disconnected, it carries no current — a switch in series with
 * the coil) or "held" (its own drive stays connected with zero EMF, so its tank is still a
 * closed loop that couples to the others; a held current of zero is open); `repetitionRate` —
 * how often the whole sequence repeats, Hz (optional: a warning below 100 Hz).
 */
export const LinkSequenceInput = lazySchema(() => z.strictObject({
  steps: z.union([z.literal("scan"), z.array(z.strictObject({ on: z.array(STEP_TRANSMITTER).min(1), weight: z.number().positive().finite().optional() })).min(1).max(MAX_SEQUENCE_STEPS)]),
  idle: z.enum(["open", "held"]).optional(),
  repetitionRate: frequency().optional(),
}));
const SequenceArgs = lazySchema(() => z.strictObject({ system: z.unknown(), sequence: LinkSequenceInput, options: SolveLinkOptionsInput.optional() }));

/** What solveLinkSequence accepts as its sequence. */
export type LinkSequence = z.input<typeof LinkSequenceInput>;

/** One LED averaged over the sequence. */
export interface SequenceLed {
  readonly label: string;
  /** time-average current Σ wₛIₛ, A — what the eye sees above about 100 Hz */
  readonly averageCurrent: number;
  /** the largest step current, A */
  readonly peakCurrent: number;
  /** averageCurrent / brightness reference */
  readonly relativeBrightness: number;
  /** averageCurrent ≥ the lit threshold */
  readonly lit: boolean;
}

/** One token over the sequence. */
export interface SequenceReceiver {
  readonly label: string;
  readonly leds: readonly SequenceLed[];
  /** at least one LED lit on average */
  readonly lit: boolean;
  /** every LED lit on average (false for a load without LEDs) */
  readonly allLit: boolean;
  /** the largest tank voltage of any step, V peak */
  readonly peakLoadVoltage: number;
}

/** One transmitter over the sequence. */
export interface SequenceTransmitter {
  readonly label: string;
  /** share of the time it is driven, 0…1 */
  readonly duty: number;
  /** the largest coil current of any step, A peak */
  readonly peakCoilCurrent: number;
  /** RMS coil current over the whole sequence, √(Σ wₛ I²ₛ,rms), A — what heats the coil */
  readonly coilCurrentRms: number;
  /** the largest capacitor voltage of any step, V peak — what the capacitor must be rated for */
  readonly peakCapacitorVoltage: number;
  /** time-average coil loss, W */
  readonly coilLoss: number;
}

/** One step: which transmitters are on, its share of the time, and its solved link. */
export interface SequenceStep {
  /** labels of the transmitters driven in this step */
  readonly on: readonly string[];
  /** index (in the system) of each transmitter in `result.transmitters`: the driven ones, and with idle "held" the idle ones too */
  readonly present: readonly number[];
  /** indices of the driven transmitters */
  readonly onIndex: readonly number[];
  /** share of the sequence's time, 0…1 (the weights normalised) */
  readonly share: number;
  readonly result: LinkResult;
}

/** What solveLinkSequence returns. */
export interface LinkSequenceResult {
  readonly steps: readonly SequenceStep[];
  readonly receivers: readonly SequenceReceiver[];
  readonly transmitters: readonly SequenceTransmitter[];
  /** time averages of the steps' power flows, W */
  readonly power: { readonly input: number; readonly delivered: number; readonly driver: number; readonly efficiency: number };
  readonly litThreshold: number;
  /** the perception assumption behind the averages, in words */
  readonly perception: string;
  readonly warnings: readonly string[];
  readonly cautions: readonly string[];
}

const PERCEPTION =
  "brightness is the time-average LED current over the sequence: above about 100 Hz repetition the eye averages the flicker (trade practice, no source); each step is taken at its steady state (it lasts many carrier cycles)";

/**
 * Solves a sequenced transmitter array: each step's coils on (the others idle), every token's
 * LED current averaged over the steps with their time shares, each transmitter's duty, peak
 * and RMS current and peak capacitor voltage.
 * @param system a link system with `transmitters` (see solveLink); every coil on a shared drive
 *   switches with the others on that drive.
 * @param sequence `{ steps: "scan" | [{ on: [index | label, …], weight? }, …], idle?: "open" |
 *   "held", repetitionRate? }` (see {@link LinkSequenceInput}).
 * @param options as solveLink's (lit threshold, brightness reference, …); the describing-function
 *   model throughout (`model: "harmonic"` is refused).
 * @returns {@link LinkSequenceResult}: the steps with their link results, the averaged tokens,
 *   the transmitters' duty and stress, the average power, the perception assumption.
 * @throws TanklightInputError naming the field (an unknown transmitter label with the nearest
 *   one; part of a shared drive switched alone).
 * @example solveLinkSequence(system, { steps: "scan" }).steps.length // → 1 (solveLink's one-transmitter example)
 */
export function solveLinkSequence(system: LinkSystem, sequence: LinkSequence, options: LinkOptions & { readonly tabulateLoads?: boolean } = {}): LinkSequenceResult {
  const where = "solveLinkSequence";
  const args = parseArgs(SequenceArgs, [system, sequence, options], where);
  const seq = args.sequence;
  const opts = args.options ?? {};
  if (opts.model === "harmonic") {
    throw new TanklightInputError([{ path: "options.model", message: "a sequence is solved with the describing function ('fundamental')", value: opts.model }], where);
  }
  // the system's errors under this function's name, its paths under "system"
  let built: ReturnType<typeof linkNetwork>;
  try {
    built = linkNetwork(system, { tabulateLoads: opts.tabulateLoads ?? false });
  } catch (e) {
    if (!(e instanceof TanklightInputError)) throw e;
    throw new TanklightInputError(e.issues.map((i) => ({ ...i, path: i.path === "system" || i.path === "" ? "system" : `system.${i.path}` })), where);
  }
  const net = built.network;
  const txs = networkTransmitters(net);
  const labels = txs.map((t, i) => t.label ?? `transmitter ${i + 1}`);
  const idle = seq.idle ?? "open";
  const stepsIn = seq.steps === "scan" ? txs.map((_, i) => ({ on: [i], weight: 1 })) : seq.steps;
  const total = stepsIn.reduce((s, st) => s + (st.weight ?? 1), 0);
  const solveOptions: LinkOptions = {
    ...(opts.litThreshold !== undefined ? { litThreshold: opts.litThreshold } : {}),
    ...(opts.brightnessReference !== undefined ? { brightnessReference: opts.brightnessReference } : {}),
    ...(opts.cautionVoltage !== undefined ? { cautionVoltage: opts.cautionVoltage } : {}),
    ...(opts.maxIterations !== undefined ? { maxIterations: opts.maxIterations } : {}),
    ...(opts.tolerance !== undefined ? { tolerance: opts.tolerance } : {}),
    ...(opts.onNonConvergence !== undefined ? { onNonConvergence: opts.onNonConvergence } : {}),
  };
  const steps: SequenceStep[] = stepsIn.map((st, s) => {
    const on = new Set(st.on.map((x, j) => transmitterIndex(x, labels, `sequence.steps[${s}].on[${j}]`, where)));
    checkSharedTogether(net, on, labels, s, where);
    const { network: sub, present } = stepNetwork(net, on, idle);
    const onIndex = [...on].sort((a, b) => a - b);
    return { on: onIndex.map((i) => labels[i]!), present, onIndex, share: (st.weight ?? 1) / total, result: solveLinkNetwork(sub, solveOptions) };
  });
  return average(steps, net, labels, opts.litThreshold ?? DEFAULT_LIT_THRESHOLD, opts.brightnessReference, built.warnings, seq.repetitionRate);
}

/** A step's `on` entry as a transmitter index: an index, or a label (did-you-mean on a miss). */
function transmitterIndex(x: number | string, labels: readonly string[], path: string, where: string): number {
  if (typeof x === "number") {
    if (x < labels.length) return x;
    throw new TanklightInputError([{ path, message: `must index one of the ${labels.length} transmitters`, value: x, expected: `0…${labels.length - 1}` }], where);
  }
  const i = labels.indexOf(x);
  if (i >= 0) return i;
  const near = nearestKey(x, labels);
  throw new TanklightInputError(
    [{ path, message: `names no transmitter${near !== undefined ? `; did you mean '${near}'?` : ` (transmitters: ${labels.join(", ")})`}`, value: x }],
    where,
  );
}

/** Coils on one shared drive switch together: a step lists all of them or none. */
function checkSharedTogether(net: LinkNetwork, on: ReadonlySet<number>, labels: readonly string[], s: number, where: string): void {
  const txs = networkTransmitters(net);
  (net.sharedDrives ?? []).forEach((sd) => {
    const members = txs.flatMap((t, i) => (t.feed !== undefined && net.sharedDrives![t.feed.drive] === sd ? [i] : []));
    const n = members.filter((i) => on.has(i)).length;
    if (n > 0 && n < members.length) {
      throw new TanklightInputError(
        [{ path: `sequence.steps[${s}].on`, message: `switches part of shared drive '${sd.label}' (${members.map((i) => labels[i]).join(", ")}): the coils on one drive switch together; give them their own drives to switch them apart`, value: [...on].map((i) => labels[i]) }],
        where,
      );
    }
  });
}

/**
 * The network of one step: with idle "open" only the coils that are on (rows and columns of
 * the others dropped); with "held" every coil, an off coil's own voltage drive at zero EMF (an
 * off current-regulated coil, or a shared drive's coils, dropped: they carry no current).
 */
function stepNetwork(net: LinkNetwork, on: ReadonlySet<number>, idle: "open" | "held"): { network: LinkNetwork; present: number[] } {
  const txs = networkTransmitters(net);
  const keep: number[] = [];
  const kept: TransmitterNetwork[] = [];
  txs.forEach((t, i) => {
    if (on.has(i)) {
      keep.push(i);
      kept.push(t);
    } else if (idle === "held" && t.feed === undefined && t.drive.kind === "voltage") {
      keep.push(i);
      kept.push({ ...t, drive: { ...t.drive, amplitude: 0 } });
    }
  });
  const shared = net.sharedDrives ?? [];
  const usedDrives = shared.flatMap((_, g) => (kept.some((t) => t.feed?.drive === g) ? [g] : []));
  const transmitters = kept.map((t) => (t.feed === undefined ? t : { ...t, feed: { drive: usedDrives.indexOf(t.feed.drive), polarity: t.feed.polarity } }));
  const t = txs.length;
  const rows = [...keep, ...net.receivers.map((_, k) => t + k)];
  const L = net.inductance;
  const network: LinkNetwork = {
    frequency: net.frequency,
    inductance: rows.map((i) => rows.map((j) => L[i]![j]!)),
    transmitter: transmitters[0]!,
    transmitters,
    ...(usedDrives.length > 0 ? { sharedDrives: usedDrives.map((g) => shared[g]!) } : {}),
    receivers: net.receivers,
  };
  return { network, present: keep };
}

/** The time averages over the steps. */
function average(
  steps: readonly SequenceStep[],
  net: LinkNetwork,
  labels: readonly string[],
  threshold: number,
  brightnessReference: number | undefined,
  buildWarnings: readonly string[],
  repetitionRate: number | undefined,
): LinkSequenceResult {
  const warnings = new Set<string>(buildWarnings);
  const cautions = new Set<string>();
  for (const st of steps) {
    for (const w of st.result.warnings) warnings.add(`step ${st.on.join(" + ")}: ${w}`);
    for (const c of st.result.cautions) cautions.add(c);
  }
  if (repetitionRate !== undefined && repetitionRate < FLICKER_FUSION_RATE) {
    warnings.add(`the sequence repeats at ${repetitionRate.toPrecision(3)} Hz, below about ${FLICKER_FUSION_RATE} Hz: the tokens will visibly flicker and the averages do not describe what is seen (trade practice, no source)`);
  }
  const receivers: SequenceReceiver[] = net.receivers.map((r, k) => {
    const first = steps[0]!.result.receivers[k]!;
    let peakV = 0;
    for (const st of steps) peakV = Math.max(peakV, st.result.receivers[k]!.loadVoltage);
    const leds = first.leds.map((led, j) => {
      let avg = 0;
      let peak = 0;
      let brightness = 0;
      for (const st of steps) {
        const l = st.result.receivers[k]!.leds[j]!;
        avg += st.share * l.averageCurrent;
        brightness += st.share * l.relativeBrightness;
        peak = Math.max(peak, l.averageCurrent);
      }
      return {
        label: led.label,
        averageCurrent: avg,
        peakCurrent: peak,
        relativeBrightness: brightnessReference !== undefined ? Math.max(avg, 0) / brightnessReference : brightness,
        lit: avg >= threshold,
      };
    });
    return { label: r.label ?? `receiver ${k + 1}`, leds, lit: leds.some((l) => l.lit), allLit: leds.length > 0 && leds.every((l) => l.lit), peakLoadVoltage: peakV };
  });
  const transmitters: SequenceTransmitter[] = labels.map((label, i) => {
    let duty = 0;
    let peakI = 0;
    let ms = 0;
    let peakC = 0;
    let loss = 0;
    for (const st of steps) {
      const at = st.present.indexOf(i);
      if (at < 0) continue;
      const s = st.result.transmitters![at]!;
      if (st.onIndex.includes(i)) duty += st.share;
      peakI = Math.max(peakI, s.coilCurrent);
      ms += st.share * s.coilCurrentRms * s.coilCurrentRms;
      peakC = Math.max(peakC, s.capacitorVoltage);
      loss += st.share * s.coilLoss;
    }
    return { label, duty, peakCoilCurrent: peakI, coilCurrentRms: Math.sqrt(ms), peakCapacitorVoltage: peakC, coilLoss: loss };
  });
  let input = 0;
  let delivered = 0;
  let driver = 0;
  for (const st of steps) {
    input += st.share * st.result.power.input;
    delivered += st.share * st.result.power.delivered;
    driver += st.share * st.result.power.driver;
  }
  return {
    steps,
    receivers,
    transmitters,
    power: { input, delivered, driver, efficiency: input > 0 ? delivered / input : 0 },
    litThreshold: threshold,
    perception: PERCEPTION,
    warnings: [...warnings],
    cautions: [...cautions],
  };
}

/**
 * solveLink(system): the steady state of a driven transmitter and any number of tokens, from
 * coils, poses, parts and loads — "how bright is each of these tokens, here".
 *
 * The system is validated with zod (quantities with units accepted); the coils' inductances
 * (selfInductance at the drive frequency), AC resistances (coilResistance), self-resonances
 * (selfResonance) and every mutual inductance — transmitter–token and token–token
 * (couplingEvaluator, exact where its estimate is not good enough) — come from lib/em; the numeric core (./link/solveNetwork.ts)
 * then solves the coupled-circuit matrix with each load's describing function.
 */
import * as z from "../zod.ts";
import { current, nearestKey, parseArgs, parseInput, voltage, lazySchema, unknownKeyMessage } from "../schema.ts";
import { TanklightInputError, assertNever } from "../errors.ts";
import { couplingEvaluator, type CouplingEvaluator } from "../em/couplingEvaluator.ts";
import { selfInductance } from "../em/selfInductance.ts";
import { coilResistance } from "../em/losses/coilResistance.ts";
import { selfResonance } from "../em/selfCapacitance.ts";
import type { Coil, Pose } from "../em/types.ts";
import {
  classEDesign,
  classEDrive,
  currentDrive,
  fullBridgeDrive,
  halfBridgeDrive,
  parallelTankDrive,
  sineDrive,
  type DriveEquivalent,
} from "./drive.ts";
import type { TokenLoad } from "./loads/types.ts";
import { LinkSystemInput, systemTransmitters, type DriveParsed, type LinkSystem } from "./link/schema.ts";
import { networkTransmitters, type LinkLoadModel, type LinkNetwork, type SharedDriveNetwork, type TransmitterNetwork } from "./link/network.ts";
import type { DriveState, LinkResult, TransmitterState } from "./link/result.ts";
import { solveLinkNetwork } from "./link/solveNetwork.ts";
import { solveLinkModel, type ModelOptions } from "./harmonic/modelChoice.ts";
import type { HarmonicDetail } from "./harmonic/result.ts";
import type { ModelBand } from "./harmonic/modelBand.ts";
import { tokenLoadModel } from "./link/tokenLoad.ts";

export type { LinkSystem } from "./link/schema.ts";

/** The link as numbers plus what was learned on the way (coupling factors, EM warnings). */
export interface LinkNetworkBuild {
  readonly network: LinkNetwork;
  /** coupling factors kᵢⱼ = Mᵢⱼ/√(LᵢLⱼ), index 0 = transmitter */
  readonly coupling: readonly (readonly number[])[];
  readonly warnings: readonly string[];
}

/**
 * What solveLink returns: the link result plus the model that produced it and its error band,
 * the coupling factors and the network it solved (harmonic balance adds `harmonic`).
 */
export interface LinkSolution extends LinkResult {
  /**
   * "fundamental" (describing function), "harmonic" (harmonic balance) or "periodic" (the
   * transient engine's periodic steady state for the LED currents, coil currents and input
   * power: model "auto" with a hard-switched single switch; docs/methods/harmonic-balance.md)
   */
  readonly model: "fundamental" | "harmonic" | "periodic";
  /** relative error band on LED average currents and coil currents, and where it comes from */
  readonly errorBand: ModelBand;
  /** every harmonic, waveform peaks and the truncation indicator (harmonic balance only) */
  readonly harmonic?: HarmonicDetail;
  /** coupling factors kᵢⱼ: the transmitters first (index 0 with one), then the receivers */
  readonly coupling: readonly (readonly number[])[];
  /** the numeric network that was solved (inductance matrix, resistances, parts) */
  readonly network: LinkNetwork;
  /** every transmitter's state, in the system's order (one: the same as `transmitter`) */
  readonly transmitters: readonly TransmitterState[];
  /** every drive: each transmitter's own drive, then the shared ones */
  readonly drives: readonly DriveState[];
}

interface CoilNumbers {
  readonly inductance: number;
  readonly resistance: number;
  readonly selfResonance?: number;
}
const coilCache = new WeakMap<Coil, Map<string, CoilNumbers>>();

/**
 * Mutual inductances come from one couplingEvaluator per pair of coil objects (lib/em), built
 * once and reused: tokens of one design share their coil object, so a drawer of twelve tokens
 * needs two evaluators. It falls back to the exact filament sum wherever its own error
 * estimate exceeds MUTUAL_RTOL — 0.1 %, the evaluator's own default, far below the spread of
 * the loss models and LED presets that the link also depends on.
 */
const MUTUAL_RTOL = 1e-3;
const evaluatorCache = new WeakMap<Coil, WeakMap<Coil, CouplingEvaluator>>();
function evaluatorFor(a: Coil, b: Coil): CouplingEvaluator {
  let inner = evaluatorCache.get(a);
  if (inner === undefined) {
    inner = new WeakMap();
    evaluatorCache.set(a, inner);
  }
  let ev = inner.get(b);
  if (ev === undefined) {
    ev = couplingEvaluator(a, b, { relTol: MUTUAL_RTOL });
    inner.set(b, ev);
  }
  return ev;
}

/**
 * Mutual inductances of coil pairs in the same orientation (flat tokens on a board, tiles of an
 * array) depend only on their offset: one evaluation serves every pair of the same two coil
 * objects at that offset (a board's squares repeat offsets — 24 pieces on an 8 × 8 board have
 * at most 225 token–token offsets against 276 pairs, and any later arrangement reuses them).
 * Keyed per evaluator by the orientation and the offset rounded to {@link OFFSET_QUANTUM}; the
 * value is the evaluator's at the first pose pair met (a neighbouring offset within the quantum
 * changes M by about quantum/distance, 1e-8 relative at 1 cm — far inside MUTUAL_RTOL). Two
 * copies of one coil give M(Δ) = M(−Δ) (reciprocity), so the offset's sign is folded. At most
 * OFFSET_CACHE_SIZE offsets per pair (oldest dropped first).
 */
const OFFSET_QUANTUM = 1e-10;
const OFFSET_CACHE_SIZE = 4096;
interface PairMutual {
  readonly mutual: number;
  readonly warnings: readonly string[];
}
const offsetCache = new WeakMap<CouplingEvaluator, Map<string, PairMutual>>();
function pairMutual(a: Coil, pa: Pose, b: Coil, pb: Pose): PairMutual {
  const ev = evaluatorFor(a, b);
  const axA = pa.axis ?? Z_AXIS;
  const axB = pb.axis ?? Z_AXIS;
  if (axA[0] !== axB[0] || axA[1] !== axB[1] || axA[2] !== axB[2] || (pa.spin ?? 0) !== (pb.spin ?? 0)) {
    return ev.evaluate(pa, pb);
  }
  let q = [pb.position[0] - pa.position[0], pb.position[1] - pa.position[1], pb.position[2] - pa.position[2]].map((d) => Math.round(d / OFFSET_QUANTUM));
  if (a === b) {
    // fold the sign: M(Δ) = M(−Δ) for two copies of one coil
    const first = q.find((v) => v !== 0) ?? 0;
    if (first < 0) q = q.map((v) => -v);
  }
  const key = `${axA[0]},${axA[1]},${axA[2]},${pa.spin ?? 0}|${q[0]},${q[1]},${q[2]}`;
  let cache = offsetCache.get(ev);
  if (cache === undefined) {
    cache = new Map();
    offsetCache.set(ev, cache);
  }
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  const r = ev.evaluate(pa, pb);
  const made: PairMutual = { mutual: r.mutual, warnings: r.warnings };
  if (cache.size >= OFFSET_CACHE_SIZE) cache.delete(cache.keys().next().value!);
  cache.set(key, made);
  return made;
}
const Z_AXIS = [0, 0, 1] as const;

/** Same position, axis and spin (defaults applied). */
function samePose(a: Pose, b: Pose): boolean {
  const ax = a.axis ?? Z_AXIS;
  const bx = b.axis ?? Z_AXIS;
  return (
    a.position[0] === b.position[0] && a.position[1] === b.position[1] && a.position[2] === b.position[2] &&
    ax[0] === bx[0] && ax[1] === bx[1] && ax[2] === bx[2] && (a.spin ?? 0) === (b.spin ?? 0)
  );
}

/**
 * Whether two coils are the same winding: one object, or two built alike (the same filaments,
 * conductor and shape), as two tokens made by one builder call each are.
 */
function sameWinding(a: Coil, b: Coil): boolean {
  if (a === b) return true;
  if (a.turns !== b.turns || a.filaments.length !== b.filaments.length) return false;
  return JSON.stringify([a.filaments, a.conductor, a.shape ?? null]) === JSON.stringify([b.filaments, b.conductor, b.shape ?? null]);
}

/** L, R and the self-resonance of a coil at a frequency and temperature, memoised per coil object. */
function coilNumbers(coil: Coil, f: number, temperature: number | undefined, warnings: string[], label: string): CoilNumbers {
  const key = `${f}|${temperature ?? ""}`;
  let byKey = coilCache.get(coil);
  if (!byKey) {
    byKey = new Map();
    coilCache.set(coil, byKey);
  }
  const hit = byKey.get(key);
  if (hit) return hit;
  const inductance = selfInductance(coil, { frequency: f });
  const resistance = coilResistance(coil, f, temperature !== undefined ? { temperature } : {});
  let srf: number | undefined;
  try {
    srf = selfResonance(coil);
  } catch (e) {
    warnings.push(`${label}: self-resonance not estimated (${(e as Error).message})`);
  }
  const made: CoilNumbers = { inductance, resistance, ...(srf !== undefined ? { selfResonance: srf } : {}) };
  byKey.set(key, made);
  return made;
}

function driveOf(d: DriveParsed, f: number, l1: number, compensation: string, warnings: string[], label: string, at: string): DriveEquivalent {
  if (d.kind === "parallelTank" && compensation !== "parallel") {
    warnings.push(`${label}: the parallel-tank drive assumes a parallel-compensated transmitter (got '${compensation}')`);
  }
  if (d.kind === "classE" && compensation !== "series") {
    warnings.push(`${label}: the class-E equivalent assumes a series load network (got '${compensation}' compensation)`);
  }
  switch (d.kind) {
    case "sine":
      return sineDrive(d.amplitude, d.outputResistance ?? 0);
    case "halfBridge":
      return halfBridgeDrive(d.supply, d.onResistance ?? 0);
    case "fullBridge":
      return fullBridgeDrive(d.supply, d.onResistance ?? 0);
    case "currentRegulated":
      return currentDrive(d.amplitude);
    case "parallelTank":
      return parallelTankDrive(d.supply, d.onResistance ?? 0);
    case "classE": {
      const design = classEDesign({ supply: d.supply, frequency: f, power: d.power, inductance: l1 });
      warnings.push(...design.warnings);
      return classEDrive(design, d.onResistance ?? 0);
    }
    case "voltage":
    case "current":
      return d; // already an equivalent (sineDrive(), classEDrive(), …)
    default:
      return assertNever(d, `${at}.kind`, "solveLink", "is not a known drive");
  }
}

/**
 * A shared drive's equivalent: the sources that do not depend on one coil (sine, bridges,
 * current-regulated, ready equivalents). The class-E and single-switch parallel-tank drives are
 * designed around one transmitter tank and are refused.
 */
function sharedDriveOf(d: DriveParsed, f: number, at: string, warnings: string[]): DriveEquivalent {
  if (d.kind === "classE" || d.kind === "parallelTank") {
    throw new TanklightInputError(
      [{ path: `${at}.kind`, message: `a ${d.kind} drive is designed around one transmitter tank and cannot be shared; give each coil its own, or share a sine, bridge or current-regulated drive`, value: d.kind }],
      "solveLink",
    );
  }
  return driveOf(d, f, 0, "series", warnings, at, at);
}

/** Connection of a coil on a shared drive from its phase: 0 → +1, 180° → −1 (anything else is refused). */
function polarityOf(phase: number | undefined, at: string): 1 | -1 {
  if (phase === undefined) return 1;
  const r = ((phase % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
  if (Math.min(r, 2 * Math.PI - r) < 1e-9) return 1;
  if (Math.abs(r - Math.PI) < 1e-9) return -1;
  throw new TanklightInputError(
    [{ path: `${at}.phase`, message: "a coil on a shared drive carries the drive's own phase: give 0 or 180° (the way round it is connected), or give the coil its own drive", value: phase, expected: "0 or '180 deg'" }],
    "solveLink",
  );
}

function loadModelOf(load: TokenLoad | LinkLoadModel, tabulate: boolean, path: string): LinkLoadModel {
  if (typeof (load as LinkLoadModel).conductance === "function") return load as LinkLoadModel;
  try {
    return tokenLoadModel(load as TokenLoad, { tabulate });
  } catch (e) {
    if (e instanceof TanklightInputError) {
      // the load's own checks name "load.…": name the receiver's field instead
      throw new TanklightInputError(e.issues.map((i) => ({ ...i, path: i.path.startsWith("load") ? path + i.path.slice(4) : `${path}.${i.path}` })), "solveLink");
    }
    throw e;
  }
}

function esrOf(c: { capacitance: number; esr?: number | undefined; dissipationFactor?: number | undefined }, w: number): number {
  if (c.esr !== undefined) return c.esr;
  if (c.dissipationFactor !== undefined) return c.dissipationFactor / (w * c.capacitance); // ESR = tan δ/(ωC)
  return 0;
}

const ORIGIN: Pose = { position: [0, 0, 0] };

/**
 * Builds the numeric link network from a system of coils, poses, parts and loads: self
 * inductances and AC resistances of every coil at the drive frequency, every mutual inductance
 * (transmitter–receiver and receiver–receiver), capacitor ESRs and the drive's equivalent.
 * @param system see {@link solveLink}.
 * @param options.tabulateLoads tabulate each token load's describing function once (fast
 *   sweeps; ≈ 1e-8 relative in G, see tokenLoadModel) — default false (exact).
 * @returns `{ network, coupling, warnings }`.
 * @example linkNetwork(system).coupling[0].length // → 2 (transmitter and one receiver)
 */
export function linkNetwork(system: LinkSystem, options: { readonly tabulateLoads?: boolean } = {}): LinkNetworkBuild {
  if (typeof options !== "object" || options === null || Array.isArray(options) || Object.keys(options).some((k) => k !== "tabulateLoads") || !(options.tabulateLoads === undefined || typeof options.tabulateLoads === "boolean")) {
    const key = typeof options === "object" && options !== null ? Object.keys(options).find((k) => k !== "tabulateLoads") : undefined;
    throw new TanklightInputError(
      [key !== undefined
        ? { path: `options.${key}`, message: unknownKeyMessage(key, ["tabulateLoads"]), value: (options as Record<string, unknown>)[key] }
        : { path: typeof options === "object" && options !== null ? "options.tabulateLoads" : "options", message: "must be { tabulateLoads?: boolean }", value: options }],
      "linkNetwork",
    );
  }
  if (typeof system !== "object" || system === null || Array.isArray(system)) {
    throw new TanklightInputError([{ path: "system", message: "expected a link system { frequency, transmitter or transmitters, receivers }", value: system }], "solveLink");
  }
  const s = parseInput(LinkSystemInput, system, "solveLink");
  const f = s.frequency;
  const w = 2 * Math.PI * f;
  const warnings: string[] = [];
  const txs = systemTransmitters(s);
  const several = s.transmitters !== undefined;
  const at = (i: number): string => (several ? `transmitters[${i}]` : "transmitter");
  const txLabels = txs.map((tx, i) => tx.label ?? (txs.length === 1 ? "transmitter" : `transmitter ${i + 1}`));
  const txNums = txs.map((tx, i) => coilNumbers(tx.coil, f, s.temperature, warnings, txLabels[i]!));
  const coils: { coil: Coil; pose: Pose; label: string; path: string; L: number }[] = txs.map((tx, i) => ({
    coil: tx.coil,
    pose: (tx.pose as Pose | undefined) ?? ORIGIN,
    label: txLabels[i]!,
    path: at(i),
    L: txNums[i]!.inductance,
  }));
  const rxNums = s.receivers.map((r, k) => {
    const label = r.label ?? `receiver ${k + 1}`;
    const num = coilNumbers(r.coil, f, s.temperature, warnings, label);
    coils.push({ coil: r.coil, pose: r.pose as Pose, label, path: `receivers[${k}]`, L: num.inductance });
    return num;
  });
  const L = mutualMatrix(coils, warnings);
  const coupling = L.map((row, i) => row.map((m, j) => (i === j ? 1 : m / Math.sqrt(L[i]![i]! * L[j]![j]!))));
  const sharedSpecs = s.sharedDrives ?? [];
  const names = sharedSpecs.map((d) => d.name);
  const sharedDrives: SharedDriveNetwork[] = sharedSpecs.map((d, g) => ({
    label: d.name,
    drive: sharedDriveOf(d.drive, f, `sharedDrives[${g}].drive`, warnings),
    wiring: d.wiring,
    ...(d.phase !== undefined ? { phase: d.phase } : {}),
  }));
  const transmitters = txs.map((tx, i) => transmitterNetwork(tx, { at: at(i), label: txLabels[i]!, num: txNums[i]!, f, names, sharedDrives, warnings }));
  sharedSpecs.forEach((d, g) => {
    if (!transmitters.some((t) => t.feed?.drive === g)) warnings.push(`sharedDrives[${g}] '${d.name}' feeds no transmitter`);
  });
  const network: LinkNetwork = {
    frequency: f,
    inductance: L,
    transmitter: transmitters[0]!,
    ...(several ? { transmitters } : {}),
    ...(sharedDrives.length > 0 ? { sharedDrives } : {}),
    receivers: s.receivers.map((r, k) => ({
      label: r.label ?? `receiver ${k + 1}`,
      resistance: r.resistance ?? rxNums[k]!.resistance,
      topology: r.topology,
      capacitance: r.capacitor.capacitance,
      capacitorEsr: esrOf(r.capacitor, w),
      ...(r.capacitor.rating !== undefined ? { capacitorRating: r.capacitor.rating } : {}),
      ...(rxNums[k]!.selfResonance !== undefined ? { selfResonance: rxNums[k]!.selfResonance } : {}),
      load: loadModelOf(r.load, options.tabulateLoads ?? false, `receivers[${k}].load`),
    })),
  };
  return { network, coupling, warnings };
}

/**
 * What {@link transmitterNetwork} needs besides the transmitter: `at` its path in the system for
 * errors ("transmitter" or "transmitters[i]"), its label, its coil's numbers, the drive frequency
 * `f` (Hz), the shared drives' names and networks in the system's order, the warnings to add to.
 */
interface TransmitterContext {
  readonly at: string; readonly label: string; readonly num: CoilNumbers; readonly f: number;
  readonly names: readonly string[]; readonly sharedDrives: readonly SharedDriveNetwork[]; readonly warnings: string[];
}

/** A transmitter's network entry: its resistance, capacitor and self-resonance, and its own drive's equivalent or its feed from a shared drive. */
function transmitterNetwork(tx: ReturnType<typeof systemTransmitters>[number], c: TransmitterContext): TransmitterNetwork {
  const cap0 = tx.capacitor;
  if (tx.compensation !== "none" && cap0 === undefined) {
    throw new TanklightInputError(
      [{ path: `${c.at}.capacitor`, message: `a ${tx.compensation}-compensated transmitter needs its capacitor`, value: undefined, expected: "{ capacitance: '100 nF', … }" }],
      "solveLink",
    );
  }
  let drive: DriveEquivalent;
  let feed: TransmitterNetwork["feed"];
  if (typeof tx.drive === "string") {
    const g = c.names.indexOf(tx.drive);
    if (g < 0) {
      const near = nearestKey(tx.drive, c.names);
      const hint = near !== undefined ? `; did you mean '${near}'?` : c.names.length > 0 ? ` (shared drives: ${c.names.join(", ")})` : " (the system has no sharedDrives)";
      throw new TanklightInputError([{ path: `${c.at}.drive`, message: `names no shared drive${hint}`, value: tx.drive }], "solveLink");
    }
    drive = c.sharedDrives[g]!.drive;
    feed = { drive: g, polarity: polarityOf(tx.phase, c.at) };
  } else {
    drive = driveOf(tx.drive, c.f, c.num.inductance, tx.compensation, c.warnings, c.label, `${c.at}.drive`);
  }
  return {
    label: c.label,
    resistance: tx.resistance ?? c.num.resistance,
    compensation: tx.compensation,
    ...(cap0 !== undefined
      ? {
          capacitance: cap0.capacitance,
          capacitorEsr: esrOf(cap0, 2 * Math.PI * c.f),
          ...(cap0.rating !== undefined ? { capacitorRating: cap0.rating } : {}),
        }
      : {}),
    ...(c.num.selfResonance !== undefined ? { selfResonance: c.num.selfResonance } : {}),
    drive,
    ...(feed !== undefined ? { feed } : tx.phase !== undefined && tx.phase !== 0 ? { phase: tx.phase } : {}),
  };
}

/**
 * The inductance matrix of a set of posed coils: self inductances on the diagonal, every
 * mutual inductance off it (one couplingEvaluator per pair of coil objects). Two coils whose
 * windings intersect (two tokens at one pose) are an input error naming both.
 */
function mutualMatrix(coils: readonly { coil: Coil; pose: Pose; label: string; path: string; L: number }[], warnings: string[]): number[][] {
  const n = coils.length;
  const L = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? coils[i]!.L : 0)));
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const a = coils[i]!;
      const b = coils[j]!;
      // two copies of one coil at one pose (two tokens in one place); concentric coils of different sizes are legal
      if (samePose(a.pose, b.pose) && sameWinding(a.coil, b.coil)) {
        throw new TanklightInputError(
          [{ path: `${a.path}.pose`, message: `${a.label} and ${b.label} (${b.path}) are the same coil at the same pose: two of them cannot occupy one place; move one of them`, value: a.pose.position, expected: `a pose apart from ${b.path}.pose` }],
          "solveLink",
        );
      }
      let m: PairMutual;
      try {
        m = pairMutual(a.coil, a.pose, b.coil, b.pose);
      } catch (e) {
        if (!(e instanceof TanklightInputError)) throw e;
        throw new TanklightInputError(
          [{ path: `${a.path}.pose`, message: `${a.label} and ${b.label} (${b.path}) overlap: their windings intersect, so no mutual inductance exists (${e.message}); move one of them`, value: a.pose.position, expected: `a pose apart from ${b.path}.pose` }],
          "solveLink",
        );
      }
      if (!(Math.abs(m.mutual) < Math.sqrt(a.L * b.L))) {
        throw new TanklightInputError(
          [{ path: `${a.path}.pose`, message: `${a.label} and ${b.label} (${b.path}) overlap: their coupling factor comes out at ${(m.mutual / Math.sqrt(a.L * b.L)).toPrecision(4)} (a real pair is below 1); move one of them`, value: a.pose.position, expected: `a pose apart from ${b.path}.pose` }],
          "solveLink",
        );
      }
      for (const wtext of m.warnings) warnings.push(`${a.label} – ${b.label}: ${wtext}`);
      L[i]![j] = m.mutual;
      L[j]![i] = m.mutual;
    }
  }
  return L;
}

/** Options of {@link solveLink}: verdicts, iteration, model choice and load tabulation. */
export type SolveLinkOptions = ModelOptions & { readonly tabulateLoads?: boolean };

/**
 * The options of solveLink as a strict schema: a mistyped key is an error naming the nearest
 * valid one; quantities accept units ("1 mA", "30 V").
 */
export const SolveLinkOptionsInput = lazySchema(() => z.strictObject({
  litThreshold: current({ positive: true }).optional(),
  brightnessReference: current({ positive: true }).optional(),
  cautionVoltage: voltage({ positive: true }).optional(),
  maxIterations: z.number().int().min(1).max(10_000).optional(),
  tolerance: z.number().positive().max(0.01).optional(),
  onNonConvergence: z.enum(["throw", "warn"]).optional(),
  tabulateLoads: z.boolean().optional(),
  model: z.enum(["fundamental", "harmonic", "auto"]).optional(),
  order: z.number().int().min(1).max(200).optional(),
  /** samples per period of harmonic balance: at most 65 536 (memory and time grow with samples × order) */
  samples: z.number().int().min(4).max(65_536).optional(),
}));

const SolveLinkArgs = lazySchema(() => z.strictObject({ system: z.unknown(), options: SolveLinkOptionsInput.optional() }));

/**
 * Steady state of a driven transmitter and any number of tokens at the drive frequency: every
 * element's current and voltage (peak and RMS), capacitor voltages, power delivered and lost in
 * each coil, capacitor and the driver, efficiency, the reflected impedance at the transmitter,
 * each LED's average current, relative brightness and lit/unlit verdict, coupling factors,
 * warnings and cautions.
 *
 * Method: coupled-circuit (loop) impedance matrix at the drive frequency with transmitter–token
 * and token–token mutual inductances from lib/em; nonlinear loads by their describing functions,
 * solved by damped Newton on the tokens' tank amplitudes (./link/solveNetwork.ts) — or, where
 * the fundamental is not enough, by harmonic balance over the drive frequency and its harmonics
 * (./harmonic/, Kundert, White & Sangiovanni-Vincentelli 1990). `options.model` chooses:
 * "auto" keeps the describing function where one harmonic-balance step from it
 * changes no LED current and not the transmitter current by more than 0.5 %, and runs harmonic
 * balance elsewhere (rectifying or hard-clipping loads, the single-switch drive); "fundamental"
 * and "harmonic" force one. The result names its `model` and `errorBand`.
 *
 * @param system.frequency drive frequency, Hz or "200 kHz".
 * @param system.transmitter `{ coil, pose? (default origin, +z), compensation: "series" |
 *   "parallel" | "none", capacitor?: { capacitance, esr? | dissipationFactor?, rating? }, drive,
 *   phase? (default 0), resistance? (override, Ω) }`; drive as a spec (`{ kind: "halfBridge",
 *   supply: "12 V" }`, `"fullBridge"`, `"sine"`, `"currentRegulated"`, `"parallelTank"`,
 *   `"classE"`), an equivalent from sineDrive(), classEDrive(), …, or the name of a shared drive.
 * @param system.transmitters several transmitters, each as `transmitter` (give one of the two;
 *   `transmitter: x` is the same as `transmitters: [x]`). Every transmitter–transmitter and
 *   transmitter–token mutual inductance is in the network.
 * @param system.sharedDrives drives that several transmitters share: `{ name, drive, wiring:
 *   "series" | "parallel", phase? }`; a transmitter with `drive: name` hangs on it (its `phase`
 *   then 0 or 180°: the way round it is connected).
 * @param system.receivers each `{ label?, coil, pose, topology: "series" | "parallel",
 *   capacitor, load: TokenLoad | LinkLoadModel, resistance? }`.
 * @param system.temperature conductor temperature for the coil resistances, K (default 20 °C).
 * @param options lit threshold (A; default 0.5 mA — trade practice: 0.1–1 mA visible indoors),
 *   brightness reference, caution voltage, iteration cap, what to do on non-convergence,
 *   `tabulateLoads` (default false) to tabulate the loads' describing functions for sweeps,
 *   `model` ("fundamental" default, "auto", "harmonic"), and harmonic balance's `order` (default 15)
 *   and `samples`.
 * @returns {@link LinkSolution} (SI; amplitudes peak, RMS named): `transmitters` and `drives` list
 *   each coil's and each drive's state; `transmitter` is the first transmitter.
 * @throws TanklightInputError naming the field on bad input; LinkConvergenceError if the
 *   operating point is not found (unless options.onNonConvergence is "warn").
 * @example
 *   // drawerTx: 5 turns, mean radius 50 mm; pebble: 120 turns in 6 layers on 6.5 mm (pebble drawer)
 *   solveLink({ frequency: "200 kHz", transmitter: { coil: drawerTx, compensation: "parallel",
 *     capacitor: { capacitance: "56 nF" }, drive: { kind: "parallelTank", supply: "5 V" } },
 *     receivers: [{ coil: pebble, pose: { position: [0, 0, "30 mm"] }, topology: "parallel",
 *     capacitor: { capacitance: "2.2 nF" }, load: { kind: "led", led: ledPreset("red") } }] })
 *     .receivers[0].leds[0].lit // → true
 */
export function solveLink(system: LinkSystem, options: SolveLinkOptions = {}): LinkSolution {
  // options checked as the named second argument, so a message says "options…"
  const opts = (parseArgs(SolveLinkArgs, [system, options], "solveLink").options ?? {}) as SolveLinkOptions;
  const built = linkNetwork(system, { tabulateLoads: opts.tabulateLoads ?? false });
  const net = built.network;
  const txs = networkTransmitters(net);
  const own = net.sharedDrives === undefined && txs.every((t) => t.feed === undefined);
  // several transmitters on their own drives: "harmonic" and "auto" by the model choice (harmonic balance handles them)
  if (own && (txs.length === 1 || (opts.model ?? "fundamental") !== "fundamental")) {
    const r = solveLinkModel(net, opts);
    return { ...r, transmitters: r.transmitters ?? [r.transmitter], drives: r.drives ?? [ownDrive(r.transmitter, net, r.power.input)], warnings: [...built.warnings, ...r.warnings], coupling: built.coupling, network: net };
  }
  if (opts.model === "harmonic") {
    throw new TanklightInputError(
      [{ path: "model", message: "harmonic balance solves transmitters on their own drives; solve coils on a shared drive with 'fundamental' or 'auto' (which then keeps the describing function)", value: opts.model }],
      "solveLink",
    );
  }
  const r = solveLinkNetwork(net, opts);
  const errorBand: ModelBand = {
    relative: Infinity,
    basis: "describing function (fundamental only); its error is not estimated by the default model over several transmitters (model 'auto' estimates it when every transmitter has its own drive) nor for coils on a shared drive",
  };
  return {
    ...r,
    transmitters: r.transmitters!,
    drives: r.drives!,
    model: "fundamental",
    errorBand,
    warnings: [...built.warnings, ...r.warnings, `describing function used with its error not estimated (${txs.length} transmitters${net.sharedDrives ? ", shared drive" : ""}); typical LED tokens under a sine-like tank current are within a few per cent of the time-domain steady state, a rectifying or hard-clipping load can be further off`],
    coupling: built.coupling,
    network: net,
  };
}

/** The drive record of a one-transmitter result (the harmonic-balance result has none of its own). */
function ownDrive(t: TransmitterState, net: LinkNetwork, input: number): DriveState {
  return {
    label: t.label,
    description: net.transmitter.drive.label,
    wiring: "own",
    transmitters: [t.label],
    sourceCurrent: t.sourceCurrent,
    sourceCurrentRms: t.sourceCurrentRms,
    sourceVoltage: t.sourceVoltage,
    sourceVoltageRms: t.sourceVoltageRms,
    inputImpedance: t.inputImpedance,
    inputPower: input,
    driverLoss: t.driverLoss,
  };
}

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
import { parseInput } from "../schema.ts";
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
import { LinkSystemInput, type LinkSystem, type LinkSystemParsed } from "./link/schema.ts";
import type { LinkLoadModel, LinkNetwork, LinkOptions } from "./link/network.ts";
import type { LinkResult } from "./link/result.ts";
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
  /** "fundamental" (describing function) or "harmonic" (harmonic balance) */
  readonly model: "fundamental" | "harmonic";
  /** relative error band on LED average currents and coil currents, and where it comes from */
  readonly errorBand: ModelBand;
  /** every harmonic, waveform peaks and the truncation indicator (harmonic balance only) */
  readonly harmonic?: HarmonicDetail;
  /** coupling factors kᵢⱼ, index 0 = transmitter, 1… the receivers */
  readonly coupling: readonly (readonly number[])[];
  /** the numeric network that was solved (inductance matrix, resistances, parts) */
  readonly network: LinkNetwork;
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

function driveOf(
  d: LinkSystemParsed["transmitter"]["drive"],
  f: number,
  l1: number,
  compensation: string,
  warnings: string[],
): DriveEquivalent {
  if (d.kind === "parallelTank" && compensation !== "parallel") {
    warnings.push(`transmitter: the parallel-tank drive assumes a parallel-compensated transmitter (got '${compensation}')`);
  }
  if (d.kind === "classE" && compensation !== "series") {
    warnings.push(`transmitter: the class-E equivalent assumes a series load network (got '${compensation}' compensation)`);
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
      return assertNever(d, "transmitter.drive.kind", "solveLink", "is not a known drive");
  }
}

function loadModelOf(load: TokenLoad | LinkLoadModel, tabulate: boolean): LinkLoadModel {
  return typeof (load as LinkLoadModel).conductance === "function"
    ? (load as LinkLoadModel)
    : tokenLoadModel(load as TokenLoad, { tabulate });
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
  const s = parseInput(LinkSystemInput, system, "solveLink");
  const f = s.frequency;
  const w = 2 * Math.PI * f;
  const warnings: string[] = [];
  const tx = s.transmitter;
  const txLabel = tx.label ?? "transmitter";
  const txNum = coilNumbers(tx.coil, f, s.temperature, warnings, txLabel);
  const coils: { coil: Coil; pose: Pose; label: string; L: number }[] = [
    { coil: tx.coil, pose: (tx.pose as Pose | undefined) ?? ORIGIN, label: txLabel, L: txNum.inductance },
  ];
  const rxNums = s.receivers.map((r, k) => {
    const label = r.label ?? `receiver ${k + 1}`;
    const num = coilNumbers(r.coil, f, s.temperature, warnings, label);
    coils.push({ coil: r.coil, pose: r.pose as Pose, label, L: num.inductance });
    return num;
  });
  const n = coils.length;
  const L = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? coils[i]!.L : 0)));
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const a = coils[i]!;
      const b = coils[j]!;
      const m = evaluatorFor(a.coil, b.coil).evaluate(a.pose, b.pose);
      for (const wtext of m.warnings) warnings.push(`${a.label} – ${b.label}: ${wtext}`);
      L[i]![j] = m.mutual;
      L[j]![i] = m.mutual;
    }
  }
  const coupling = L.map((row, i) => row.map((m, j) => (i === j ? 1 : m / Math.sqrt(L[i]![i]! * L[j]![j]!))));
  const cap0 = tx.capacitor;
  if (tx.compensation !== "none" && cap0 === undefined) {
    throw new TanklightInputError(
      [{ path: "transmitter.capacitor", message: `a ${tx.compensation}-compensated transmitter needs its capacitor`, value: undefined, expected: "{ capacitance: '100 nF', … }" }],
      "solveLink",
    );
  }
  const network: LinkNetwork = {
    frequency: f,
    inductance: L,
    transmitter: {
      label: txLabel,
      resistance: tx.resistance ?? txNum.resistance,
      compensation: tx.compensation,
      ...(cap0 !== undefined
        ? {
            capacitance: cap0.capacitance,
            capacitorEsr: esrOf(cap0, w),
            ...(cap0.rating !== undefined ? { capacitorRating: cap0.rating } : {}),
          }
        : {}),
      ...(txNum.selfResonance !== undefined ? { selfResonance: txNum.selfResonance } : {}),
      drive: driveOf(tx.drive, f, txNum.inductance, tx.compensation, warnings),
    },
    receivers: s.receivers.map((r, k) => ({
      label: r.label ?? `receiver ${k + 1}`,
      resistance: r.resistance ?? rxNums[k]!.resistance,
      topology: r.topology,
      capacitance: r.capacitor.capacitance,
      capacitorEsr: esrOf(r.capacitor, w),
      ...(r.capacitor.rating !== undefined ? { capacitorRating: r.capacitor.rating } : {}),
      ...(rxNums[k]!.selfResonance !== undefined ? { selfResonance: rxNums[k]!.selfResonance } : {}),
      load: loadModelOf(r.load, options.tabulateLoads ?? false),
    })),
  };
  return { network, coupling, warnings };
}

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
 *   resistance? (override, Ω) }`; drive as a spec (`{ kind: "halfBridge", supply: "12 V" }`,
 *   `"fullBridge"`, `"sine"`, `"currentRegulated"`, `"parallelTank"`, `"classE"`) or an equivalent
 *   from sineDrive(), classEDrive(), ….
 * @param system.receivers each `{ label?, coil, pose, topology: "series" | "parallel",
 *   capacitor, load: TokenLoad | LinkLoadModel, resistance? }`.
 * @param system.temperature conductor temperature for the coil resistances, K (default 20 °C).
 * @param options lit threshold (A; default 0.5 mA — trade practice: 0.1–1 mA visible indoors),
 *   brightness reference, caution voltage, iteration cap, what to do on non-convergence,
 *   `tabulateLoads` (default false) to tabulate the loads' describing functions for sweeps,
 *   `model` ("fundamental" default, "auto", "harmonic"), and harmonic balance's `order` (default 15)
 *   and `samples`.
 * @returns {@link LinkSolution} (SI; amplitudes peak, RMS named).
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
export function solveLink(system: LinkSystem, options: ModelOptions & { readonly tabulateLoads?: boolean } = {}): LinkSolution {
  const built = linkNetwork(system, { tabulateLoads: options.tabulateLoads ?? false });
  const r = solveLinkModel(built.network, options);
  return { ...r, warnings: [...built.warnings, ...r.warnings], coupling: built.coupling, network: built.network };
}

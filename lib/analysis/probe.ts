/**
 * A token probe: the link of one system solved with one of its tokens moved to many poses,
 * fast. The network (self inductances, resistances, parts, drive) is built once with
 * `linkNetwork`; per pose only the moving token's mutual inductances change, computed with
 * `couplingEvaluator` (lib/em), and the small coupled-circuit network is solved with the
 * nonlinear link solver (`solveLinkNetwork`). No full `solveLink` rebuild per point.
 *
 * The probe's description (`ProbeSpec`, made by ./probeSpec.ts) is plain data — coils, numbers
 * and loads encoded by ./loadCodec.ts — so worker threads can rebuild the same probe and give
 * identical numbers. This module imports only the numeric core (no schemas, no unit parser), so
 * a worker thread starts quickly.
 */
import { couplingEvaluator, type CouplingEvaluator } from "../em/couplingEvaluator.ts";
import type { Coil, Pose, Vec3 } from "../em/types.ts";
import type { LinkLoadModel, LinkNetwork, ReceiverNetwork, SharedDriveNetwork, TransmitterNetwork } from "../circuit/link/network.ts";
import { solveLinkOperatingPoint } from "../circuit/link/solveNetwork.ts";
import { validateNetwork } from "../circuit/link/validateNetwork.ts";
import { coilCurrents, inputPower } from "../circuit/link/assembleResult.ts";
import type { LinkWorkspace } from "../circuit/link/operatingPoint.ts";
import { solveLinkModel } from "../circuit/harmonic/modelChoice.ts";
import { ADMITTANCE_TOLERANCE, LED_TOLERANCE } from "../circuit/harmonic/tokenTable.ts";
import type { ModelBand } from "../circuit/harmonic/modelBand.ts";
import { EMF_HARMONICS_LIMIT, linkTable, linkTableRefusal, type LinkTable, type LinkTablePoint } from "../circuit/harmonic/linkTable.ts";
import { DEFAULT_HARMONIC_ORDER, defaultSamples } from "../circuit/harmonic/solveHarmonic.ts";
import { LinkConvergenceError } from "../circuit/link/localSolve.ts";
import { tokenLoadModel } from "../circuit/link/tokenLoad.ts";
import { decodeLoad, type LoadData } from "./loadCodec.ts";

/** Relative accuracy of the per-pose mutual inductances (couplingEvaluator relTol), the link solver's own choice. */
export const PROBE_MUTUAL_RTOL = 1e-3;

/** Plain-data description of a probe (structured-clone safe when `models` is absent). */
export interface ProbeSpec {
  readonly frequency: number;
  /** the network's transmitter and receivers without their loads (SI numbers) */
  readonly inductance: readonly (readonly number[])[];
  readonly transmitter: LinkNetwork["transmitter"];
  readonly receivers: readonly Omit<ReceiverNetwork, "load">[];
  /** each receiver's load as data, or null where the system gave a ready load model */
  readonly loads: readonly (LoadData | null)[];
  /** the coils, referenced by index below */
  readonly coils: readonly Coil[];
  readonly txCoil: number;
  readonly txPose: Pose;
  /** index of the moving token among the receivers */
  readonly token: number;
  readonly tokenCoil: number;
  /**
   * a system of several transmitters (absent: the one `transmitter` at `txCoil`, `txPose`):
   * every transmitter as numbers, its coil index and pose, and the shared drives. The
   * inductance matrix then has these transmitters first (the network `linkNetwork` builds).
   */
  readonly array?: {
    readonly transmitters: readonly TransmitterNetwork[];
    readonly sharedDrives?: readonly SharedDriveNetwork[];
    readonly coils: readonly number[];
    readonly poses: readonly Pose[];
  };
  /** the other receivers present: receiver index, coil index, pose */
  readonly others: readonly { readonly receiver: number; readonly coil: number; readonly pose: Pose }[];
  /** token axes to try at every position (unit vectors); the worst one counts */
  readonly axes: readonly Vec3[];
  /** lit threshold, A */
  readonly litThreshold: number;
  /** the drive's DC supply voltage, V (undefined for sine and current-regulated drives) */
  readonly supplyVoltage?: number;
  /** the steady-state model, as solveLink's `model` (default "fundamental": the describing function) */
  readonly model?: LinkModelName;
}

/** solveLink's model names (docs/methods/harmonic-balance.md). */
export type LinkModelName = "fundamental" | "harmonic" | "auto";

/** What the probe returns for a batch of positions (one entry per position; mutual per position × axis). */
export interface ProbeValues {
  /** the dimmest LED's average current, worst over the axes, A */
  readonly current: Float64Array;
  /**
   * transmitter–token mutual inductance, H: mutual[p·axes + a]. With several transmitters the
   * net coupling Σᵢ Mᵢ·Re(Iᵢ/I_r), I_r the first transmitter's current (the first that carries
   * any): the flux linkage in phase with that coil, per ampere of it (zero where the coils' fields
   * cancel through the token, e.g. on the symmetry plane of an anti-phase pair).
   */
  readonly mutual: Float64Array;
  /** DC supply current, highest over the axes, A (0 when the drive has no DC supply) */
  readonly supply: Float64Array;
  /** how many solves did not converge (their values are the solver's last iterate) */
  readonly unconverged: number;
}

/** What a worker answers to a probe task that carries no spec for a probe it has not built (./worker.ts); the sender then sends the spec (./pool.ts). */
export const MISSING_PROBE = "tanklight worker: no probe built for";

/** True when the spec can be sent to worker threads (every load given as data). */
export function transferable(spec: ProbeSpec): boolean {
  return spec.loads.every((l) => l !== null);
}

/** The spec without its in-thread load models (for posting to a worker). */
export function portableSpec(spec: ProbeSpec & { readonly models?: unknown }): ProbeSpec {
  const { models: _m, ...rest } = spec;
  return rest;
}

/**
 * Coupling evaluators memoised per pair of coil objects (like the link solver's own): a user's
 * repeated maps and ranges of one design build each evaluator once. A WeakMap keyed by the coil
 * objects, so nothing outlives the coils.
 */
const evaluators = new WeakMap<Coil, WeakMap<Coil, CouplingEvaluator>>();
function evaluatorFor(a: Coil, b: Coil): CouplingEvaluator {
  let inner = evaluators.get(a);
  if (!inner) {
    inner = new WeakMap();
    evaluators.set(a, inner);
  }
  let e = inner.get(b);
  if (!e) {
    e = couplingEvaluator(a, b, { relTol: PROBE_MUTUAL_RTOL });
    inner.set(b, e);
  }
  return e;
}

/**
 * The net coupling of several transmitters to the token, H: Σᵢ Mᵢ·Re(Iᵢ/I_r) with I_r the
 * current of the first transmitter that carries any (its own term exactly M_r), so the sign
 * convention is the same at every pose; 0 with every coil current zero.
 */
function netMutual(ms: readonly number[], re: Float64Array, im: Float64Array): number {
  let ref = 0;
  while (ref < ms.length && re[ref] === 0 && im[ref] === 0) ref++;
  if (ref === ms.length) return 0;
  const d = re[ref]! * re[ref]! + im[ref]! * im[ref]!;
  let m = 0;
  for (let i = 0; i < ms.length; i++) m += i === ref ? ms[i]! : (ms[i]! * (re[i]! * re[ref]! + im[i]! * im[ref]!)) / d;
  return m;
}

/**
 * Whether a probe's poses are solved from a token table (lib/circuit/harmonic/linkTable.ts):
 * one transmitter on its own drive, the token alone, a load harmonic balance can evaluate in
 * time, and a drive other than the single switch.
 */
function tableApplies(spec: ProbeSpec, receivers: readonly ReceiverNetwork[]): boolean {
  if (spec.array !== undefined || spec.others.length > 0) return false;
  const net: LinkNetwork = { frequency: spec.frequency, inductance: spec.inductance, transmitter: spec.transmitter, receivers };
  return linkTableRefusal(net) === undefined;
}

/** The model a map or range was solved with, in words, and its error band (results asked with a `model`). */
export interface ModelStatement {
  /** the model asked for */
  readonly model: LinkModelName;
  /** how every pose was solved */
  readonly method: string;
  /** relative band on each LED's average current against the time-domain steady state */
  readonly errorBand: ModelBand;
}

/**
 * How a probe with a model solves its poses, and the band (docs/methods/harmonic-balance.md).
 * @example probeModel(spec).method // "harmonic balance of the token tabulated against its induced EMF …"
 */
export function probeModel(spec: ProbeSpec & { readonly models?: readonly LinkLoadModel[] }): ModelStatement | undefined {
  const model = spec.model;
  if (model === undefined || model === "fundamental") return undefined;
  const loads = spec.loads.map((l, i) => spec.models?.[i] ?? tokenLoadModel(decodeLoad(l!), { tabulate: true }));
  const receivers: ReceiverNetwork[] = spec.receivers.map((r, i) => ({ ...r, load: loads[i]! }));
  if (tableApplies(spec, receivers)) {
    return {
      model,
      method: `harmonic balance (order ${DEFAULT_HARMONIC_ORDER}) of the token tabulated once against its induced EMF — each interval's midpoint held to ${ADMITTANCE_TOLERANCE} on the token's admittance and ${LED_TOLERANCE} on each LED current — and per pose the transmitter's loop equation; poses whose drive harmonics exceed ${100 * EMF_HARMONICS_LIMIT} % of the token's EMF are solved directly`,
      errorBand: {
        relative: 0.01,
        basis: "harmonic balance's validated band against the transient steady state (1 %); the table measured within 0.12 % of the direct harmonic-balance solve (tests/circuit/harmonic/linkTable.test.ts)",
      },
    };
  }
  return {
    model,
    method: `solveLink's model '${model}' at every pose`,
    errorBand: { relative: 0.01, basis: "as solveLink states at each pose (1 % where harmonic balance is validated; wider for a hard-switched single switch, which solveLink widens and warns about)" },
  };
}

/** A ready probe: evaluates batches of token positions. */
export interface Probe {
  readonly spec: ProbeSpec;
  /** positions as [x, y, z, x, y, z, …] (m) */
  evaluate(positions: Float64Array): ProbeValues;
  /**
   * The describing function's validity at one pose: solveLink's "fundamental" warnings there
   * (each LED outside its validity named; docs/methods/harmonic-balance.md), empty when valid.
   */
  validity(position: Vec3, axis: Vec3): readonly string[];
  /** the worst-LED current at one pose (position and axis), A, and the mutual inductance, H */
  at(position: Vec3, axis: Vec3): { readonly current: number; readonly mutual: number; readonly supply: number; readonly converged: boolean };
}

/**
 * Makes a probe from its spec: one couplingEvaluator per coil pair, the loads' describing
 * functions tabulated once (tokenLoadModel tabulate), then per pose M and a nonlinear solve.
 */
export function makeProbe(spec: ProbeSpec & { readonly models?: readonly LinkLoadModel[] }): Probe {
  // in this thread the system's own tabulated loads; in a worker the same loads rebuilt from data
  const models: LinkLoadModel[] = spec.loads.map((l, i) => spec.models?.[i] ?? tokenLoadModel(decodeLoad(l!), { tabulate: true }));
  const array = spec.array;
  const receivers: ReceiverNetwork[] = spec.receivers.map((r, i) => ({ ...r, load: models[i]! }));
  const options = { litThreshold: spec.litThreshold, onNonConvergence: "warn" as const };
  const networkAt = probeNetworks(spec, receivers);
  const fromTable = spec.model !== undefined && spec.model !== "fundamental" && tableApplies(spec, receivers) ? tableSolver(spec) : undefined;
  const fundamental = fundamentalSolver(spec, options);
  const at = (position: Vec3, axis: Vec3): { current: number; mutual: number; supply: number; converged: boolean } => {
    const { net, ms } = networkAt(position, axis);
    const t = fromTable ? fromTable(net, ms[0]!) : undefined;
    if (t) return { ...t, mutual: ms[0]!, converged: true };
    // (coils on a shared drive: the describing function, as solveLink)
    if (array?.sharedDrives !== undefined || spec.model === undefined || spec.model === "fundamental") return fundamental(net, ms);
    // the same solver solveLink uses for that model, so a map agrees with solveLink point by point
    const r = solveLinkModel(net, { ...options, model: spec.model });
    let current = Infinity;
    for (const led of r.receivers[spec.token]!.leds) current = Math.min(current, led.averageCurrent);
    const supply = spec.supplyVoltage !== undefined ? Math.max(0, r.power.input) / spec.supplyVoltage : 0;
    const txs = r.transmitters ?? [r.transmitter];
    const mutual = array ? netMutual(ms, Float64Array.from(txs, (x) => x.coilCurrentPhasor.re), Float64Array.from(txs, (x) => x.coilCurrentPhasor.im)) : ms[0]!;
    return { current: Math.max(0, current), mutual, supply, converged: r.converged };
  };
  const validity = (position: Vec3, axis: Vec3): readonly string[] =>
    array
      ? ["describing function used with its error not estimated (several transmitters), as solveLink does"]
      : solveLinkModel(networkAt(position, axis).net, { ...options, model: "fundamental" }).warnings.filter((w) => w.startsWith("describing function"));
  return { spec, at, validity, evaluate: (positions) => evaluatePositions(spec, at, positions) };
}

type PoseValues = { current: number; mutual: number; supply: number; converged: boolean };

/**
 * The link network with the token at a pose: the spec's inductance matrix with the token's row
 * and column from one couplingEvaluator per coil pair, and each transmitter's mutual `ms`, H.
 * Per pose: plain loops, no closures made per call (under tsx each gets its name set, which
 * cost a tenth of a map).
 */
function probeNetworks(spec: ProbeSpec, receivers: ReceiverNetwork[]): (position: Vec3, axis: Vec3) => { net: LinkNetwork; ms: number[] } {
  const ev = (a: number, b: number): CouplingEvaluator => evaluatorFor(spec.coils[a]!, spec.coils[b]!);
  const array = spec.array;
  const evTxs = array ? array.coils.map((c) => ev(c, spec.tokenCoil)) : [ev(spec.txCoil, spec.tokenCoil)];
  const txPoses = array ? array.poses : [spec.txPose];
  const evOthers = spec.others.map((o) => ev(o.coil, spec.tokenCoil));
  const nt = evTxs.length;
  const t = spec.token + nt;
  return (position: Vec3, axis: Vec3): { net: LinkNetwork; ms: number[] } => {
    const pose: Pose = { position, axis };
    const L: number[][] = [];
    for (const row of spec.inductance) L.push(row.slice());
    const ms: number[] = [];
    for (let i = 0; i < nt; i++) {
      const m = evTxs[i]!.mutual(txPoses[i]!, pose);
      ms.push(m);
      L[i]![t] = m;
      L[t]![i] = m;
    }
    for (let j = 0; j < spec.others.length; j++) {
      const o = spec.others[j]!;
      const m = evOthers[j]!.mutual(o.pose, pose);
      L[o.receiver + nt]![t] = m;
      L[t]![o.receiver + nt] = m;
    }
    const net: LinkNetwork = array
      ? { frequency: spec.frequency, inductance: L, transmitter: array.transmitters[0]!, transmitters: array.transmitters, ...(array.sharedDrives ? { sharedDrives: array.sharedDrives } : {}), receivers }
      : { frequency: spec.frequency, inductance: L, transmitter: spec.transmitter, receivers };
    return { net, ms };
  };
}

/**
 * Harmonic balance ("harmonic", "auto") of one transmitter and the token alone: the token's
 * harmonic balance tabulated against its induced EMF once, then per pose the transmitter's loop
 * equation (lib/circuit/harmonic/linkTable.ts); the table is built on first use and grown as
 * needed. A pose the table cannot answer (no convergence, drive harmonics past the limit) gives
 * undefined: the caller solves it directly.
 */
function tableSolver(spec: ProbeSpec): (net: LinkNetwork, mutual: number) => { current: number; supply: number } | undefined {
  let table: { readonly link: LinkTable; readonly point: LinkTablePoint } | undefined;
  return (net: LinkNetwork, mutual: number): { current: number; supply: number } | undefined => {
    try {
      if (!table) {
        const link = linkTable(net, { order: DEFAULT_HARMONIC_ORDER, samples: defaultSamples(DEFAULT_HARMONIC_ORDER), litThreshold: spec.litThreshold });
        table = { link, point: link.point() };
      }
      table.link.solve(mutual, table.point);
    } catch (e) {
      if (e instanceof LinkConvergenceError) return undefined; // this pose by the direct solve
      throw e;
    }
    // the drive's harmonics reach the token as EMF harmonics the table leaves out: past the limit, the direct solve
    if (table.point.emfHarmonics > EMF_HARMONICS_LIMIT) return undefined;
    let current = Infinity;
    for (const c of table.point.leds) current = Math.min(current, c);
    const supply = spec.supplyVoltage !== undefined ? Math.max(0, table.point.input) / spec.supplyVoltage : 0;
    return { current: Math.max(0, current), supply };
  };
}

/**
 * The describing function (several transmitters too, as solveLink): solveLinkNetwork's own
 * checks and operating point — the same numbers — read for the token's LEDs, the input power
 * and the coil currents only, without its result record, on one workspace reused pose to pose.
 */
function fundamentalSolver(spec: ProbeSpec, options: { readonly litThreshold: number; readonly onNonConvergence: "warn" }): (net: LinkNetwork, ms: readonly number[]) => PoseValues {
  const array = spec.array;
  let ws: LinkWorkspace | undefined;
  return (net: LinkNetwork, ms: readonly number[]): PoseValues => {
    validateNetwork(net, "solveLinkNetwork");
    const solved = solveLinkOperatingPoint(net, options, ws);
    ws = solved.ws;
    const tokenLoad = net.receivers[spec.token]!.load;
    const k = spec.token;
    let current = Infinity;
    for (const led of tokenLoad.ledCurrents!(Math.hypot(ws.vRe[k]!, ws.vIm[k]!))) current = Math.min(current, led.current);
    const supply = spec.supplyVoltage !== undefined ? Math.max(0, inputPower(ws)) / spec.supplyVoltage : 0;
    const coil = array ? coilCurrents(ws) : undefined;
    return { current: Math.max(0, current), mutual: coil ? netMutual(ms, coil.re, coil.im) : ms[0]!, supply, converged: solved.converged };
  };
}

/** A batch of positions [x, y, z, …] (m): per position the worst LED current and the largest supply current over the spec's axes. */
function evaluatePositions(spec: ProbeSpec, at: (position: Vec3, axis: Vec3) => PoseValues, positions: Float64Array): ProbeValues {
  const count = positions.length / 3;
  const na = spec.axes.length;
  const current = new Float64Array(count);
  const mutual = new Float64Array(count * na);
  const supply = new Float64Array(count);
  let unconverged = 0;
  for (let p = 0; p < count; p++) {
    const pos: Vec3 = [positions[3 * p]!, positions[3 * p + 1]!, positions[3 * p + 2]!];
    let worst = Infinity;
    let most = 0;
    for (let a = 0; a < na; a++) {
      const v = at(pos, spec.axes[a]!);
      worst = Math.min(worst, v.current);
      most = Math.max(most, v.supply);
      mutual[p * na + a] = v.mutual;
      if (!v.converged) unconverged++;
    }
    current[p] = worst;
    supply[p] = most;
  }
  return { current, mutual, supply, unconverged };
}

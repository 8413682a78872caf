/**
 * The per-sample solver of toleranceYield: one token's link rebuilt from changed physical parts
 * and solved (nonlinear) for each sample of a batch. Plain-data spec (made by ./yieldSpec.ts), so
 * worker threads rebuild the same model; imports only the numeric core.
 *
 * A sample changes parts, never matrix entries by hand:
 * - capacitors: C·(1 + δ); an ESR given as a dissipation factor follows as tan δ/(ωC);
 * - windings: a different turn count is a different coil, built by the user's builder, with its
 *   own L and R (selfInductance, coilResistance) and its own M (couplingEvaluator) — prepared
 *   per turn count in the calling thread;
 * - the LED: a forward-voltage shift ΔV is the same junction with I_s·e^(−ΔV/(nV_T)) (the whole
 *   forward curve moves by ΔV); the describing function is tabulated once per level of a ΔV grid
 *   (`vfStep`) and interpolated linearly in ΔV between levels (in ln G and ln I);
 * - placement and tilt: the pose changes and M follows from couplingEvaluator (to every
 *   transmitter of an array);
 * - supply: every drive's equivalent source scales with the supply voltage.
 * Each transmitter of an array has its own capacitor and winding draws; the M between two
 * transmitters follows their winding variants.
 */
import { couplingEvaluator, type CouplingEvaluator } from "../em/couplingEvaluator.ts";
import type { Coil, Pose, Vec3 } from "../em/types.ts";
import type { LinkLoadModel, LinkNetwork, ReceiverNetwork, SharedDriveNetwork, TransmitterNetwork } from "../circuit/link/network.ts";
import { solveLinkOperatingPoint } from "../circuit/link/solveNetwork.ts";
import type { LinkWorkspace } from "../circuit/link/operatingPoint.ts";
import { inputPower } from "../circuit/link/assembleResult.ts";
import { validateNetwork } from "../circuit/link/validateNetwork.ts";
import { solveLinkModel, type LinkModel } from "../circuit/harmonic/modelChoice.ts";
import { tokenLoadModel } from "../circuit/link/tokenLoad.ts";
import { decodeLoad, type JunctionData, type LoadData } from "./loadCodec.ts";
import { PROBE_MUTUAL_RTOL } from "./probe.ts";
import { thermalVoltage } from "../constants.ts";

/** Draws per sample of a one-transmitter system, in this order (see DRAW_NAMES). */
export const DRAWS = 12;
/** What each draw of a sample is (each further transmitter adds its capacitor and winding after these). */
export const DRAW_NAMES = [
  "tokenCapacitor",
  "transmitterCapacitor",
  "transmitterTurns",
  "tokenTurns",
  "ledForwardVoltage",
  "ledBrightness",
  "placementX",
  "placementY",
  "height",
  "tilt",
  "tiltAzimuth",
  "supply",
] as const;

/**
 * Draws per sample with t transmitters: the 12 of DRAW_NAMES, then a capacitor and a winding draw
 * for each transmitter after the first.
 * @example drawsPerSample(1) // → 12
 */
export function drawsPerSample(t: number): number {
  return DRAWS + 2 * (t - 1);
}

/** The draw column of transmitter i's capacitor (relative deviation). */
export function capacitorColumn(i: number): number {
  return i === 0 ? 1 : DRAWS + 2 * (i - 1);
}

/** The draw column of transmitter i's winding variant (index into its levels). */
export function turnsColumn(i: number): number {
  return i === 0 ? 2 : DRAWS + 2 * (i - 1) + 1;
}

/** One winding variant: its coil, inductance (H) and resistance (Ω) at the drive frequency. */
export interface WindingLevel {
  readonly turns: number;
  readonly coil: Coil;
  readonly inductance: number;
  readonly resistance: number;
}

/** One transmitter of the yield model: its nominal network part, winding variants and pose. */
export interface YieldTransmitter {
  readonly network: TransmitterNetwork;
  /** the capacitor's dissipation factor when its ESR came from one */
  readonly dissipation?: number;
  /** winding variants, the nominal one at index (length − 1)/2 */
  readonly levels: readonly WindingLevel[];
  readonly pose: Pose;
}

/** Plain-data description of the yield model. */
export interface YieldSpec {
  readonly frequency: number;
  readonly transmitters: readonly YieldTransmitter[];
  /** true when the system listed `transmitters` (the network then lists them too) */
  readonly listed?: boolean;
  readonly sharedDrives?: readonly SharedDriveNetwork[];
  /**
   * M between transmitters i < j (pairs in order (0,1), (0,2), …, (1,2), …) for every pair of their
   * winding variants, H: pairMutual[pair][a·levels_j + b]
   */
  readonly pairMutual: readonly (readonly number[])[];
  readonly receiver: Omit<ReceiverNetwork, "load">;
  readonly receiverDissipation?: number;
  readonly load: LoadData;
  readonly tokenLevels: readonly WindingLevel[];
  readonly tokenPose: { readonly position: Vec3; readonly axis: Vec3 };
  /** M of transmitter i's variants with the token's at the nominal pose, H: tokenMutual[i][a·tokenLevels + b] */
  readonly tokenMutual: readonly (readonly number[])[];
  /** true when placement or tilt vary (M per sample) */
  readonly posed: boolean;
  /** forward-voltage grid, V */
  readonly vfStep: number;
  readonly litThreshold: number;
  readonly supplyVoltage?: number;
  /** tabulation of the load's describing function (highest amplitude V, step V) */
  readonly table: { readonly maxAmplitude: number; readonly step: number };
  /** the steady-state model per sample, as solveLink's */
  readonly model: LinkModel;
}

/** Results for a batch of samples. */
export interface YieldValues {
  /** the dimmest LED's average current, A */
  readonly current: Float64Array;
  /** 1 where lit: current × brightness factor ≥ lit threshold */
  readonly lit: Uint8Array;
  /** DC supply current, A (0 without a DC supply) */
  readonly supply: Float64Array;
  readonly unconverged: number;
  /** samples solved by harmonic balance (the others by the describing function) */
  readonly harmonic: number;
}

function shifted(j: JunctionData, dv: number): JunctionData {
  if (j.kind !== "led" || dv === 0) return j;
  return { ...j, is: j.is * Math.exp(-dv / (j.n * thermalVoltage(j.temperature))) };
}

/**
 * The load between two forward-voltage grid levels: ln G and ln(LED current) interpolated
 * linearly in ΔV (the LED's exponential region makes both nearly linear in ΔV); at a grid level
 * (t = 0) it is that level's model itself.
 */
function between(a: LinkLoadModel, b: LinkLoadModel, t: number): LinkLoadModel {
  if (t === 0) return a;
  const mix = (x: number, y: number): number => (x > 0 && y > 0 ? Math.exp((1 - t) * Math.log(x) + t * Math.log(y)) : (1 - t) * x + t * y);
  return {
    label: a.label,
    conductance: (v) => mix(a.conductance(v), b.conductance(v)),
    ledCurrents: (v) => {
      const la = a.ledCurrents!(v);
      const lb = b.ledCurrents!(v);
      return la.map((e, k) => ({ label: e.label, current: mix(e.current, lb[k]!.current) }));
    },
  };
}

function shiftLoad(load: LoadData, dv: number): LoadData {
  switch (load.kind) {
    case "led":
      return { ...load, led: shifted(load.led, dv) };
    case "antiParallel":
    case "parallelSameDirection":
      return { ...load, a: shifted(load.a, dv), b: shifted(load.b, dv) };
    case "bridge":
    case "halfWaveReservoir":
      return { ...load, led: shifted(load.led, dv) };
    case "resistor":
      return load;
  }
}

/** A ready yield model: evaluates batches of samples (draws laid out drawsPerSample(t) per sample). */
export interface YieldModel {
  evaluate(draws: Float64Array): YieldValues;
  /** the link network of one sample's draws (as solved) */
  network(draws: Float64Array): LinkNetwork;
}

/** A drive's equivalent on a supply changed by the relative deviation `supply` (its source scales with it). */
function scaledDrive(drive: TransmitterNetwork["drive"], supply: number): TransmitterNetwork["drive"] {
  return supply === 0 ? drive : { ...drive, amplitude: drive.amplitude * (1 + supply) };
}

/** Tilts the unit axis a by θ about the horizontal direction at azimuth φ (Rodrigues' rotation). */
function tilted(a: Vec3, th: number, ph: number): Vec3 {
  const [ax, ay, az] = a;
  const kx = Math.cos(ph);
  const ky = Math.sin(ph);
  const c = Math.cos(th);
  const sn = Math.sin(th);
  const kdot = kx * ax + ky * ay;
  return [ax * c + ky * az * sn + kx * kdot * (1 - c), ay * c - kx * az * sn + ky * kdot * (1 - c), az * c + (kx * ay - ky * ax) * sn];
}

/**
 * Builds the model: load tables per forward-voltage level and coupling evaluators per winding
 * pair, on demand. Each sample is a network of the system's layout with changed part values,
 * solved as solveLink solves it (the describing function: solveLinkNetwork's iteration, checked
 * once here for the layout; "harmonic"/"auto": solveLinkModel).
 */
export function makeYieldModel(spec: YieldSpec): YieldModel {
  const networkOf = sampleNetworks(spec, sampleLoads(spec));
  // the layout (and the nominal part values) checked once; samples change values only
  validateNetwork(networkOf(nominalDraws(spec)), "toleranceYield");
  return { network: networkOf, evaluate: (draws) => evaluateSamples(spec, networkOf, draws) };
}

/**
 * The token load at a forward-voltage shift dv, V: a tabulated load per grid level vfStep (built
 * on first use), linear in between; for harmonic balance with the exact shifted junction too.
 */
function sampleLoads(spec: YieldSpec): (dv: number) => LinkLoadModel {
  const loads = new Map<number, LinkLoadModel>();
  const loadAt = (level: number): LinkLoadModel => {
    let m = loads.get(level);
    if (!m) {
      m = tokenLoadModel(decodeLoad(shiftLoad(spec.load, level * spec.vfStep)), { tabulate: true, ...spec.table });
      loads.set(level, m);
    }
    return m;
  };
  const fundamental = spec.model === "fundamental";
  return (dv: number): LinkLoadModel => {
    const u = dv / spec.vfStep;
    const q = Math.floor(u);
    const t = u - q;
    if (t === 0) return loadAt(q);
    const m = between(loadAt(q), loadAt(q + 1), t);
    // harmonic balance evaluates the load in time: the exact shifted junction
    return fundamental ? m : { ...m, token: decodeLoad(shiftLoad(spec.load, dv)) };
  };
}

/**
 * One sample's network from its draws: the system's layout with the drawn capacitors, windings,
 * supply, LED shift and (when the pose varies) the token's mutual inductances, from coupling
 * evaluators per winding pair made on first use. Called once per sample: no closures made per
 * sample (under keepNames each costs a defineProperty).
 */
function sampleNetworks(spec: YieldSpec, loadFor: (dv: number) => LinkLoadModel): (d: Float64Array) => LinkNetwork {
  const w = 2 * Math.PI * spec.frequency;
  const txs = spec.transmitters;
  const t = txs.length;
  const nTok = spec.tokenLevels.length;
  const evs = new Map<string, CouplingEvaluator>();
  const evFor = (i: number, a: number, b: number): CouplingEvaluator => {
    const key = `${i}|${a}|${b}`;
    let e = evs.get(key);
    if (!e) {
      e = couplingEvaluator(txs[i]!.levels[a]!.coil, spec.tokenLevels[b]!.coil, { relTol: PROBE_MUTUAL_RTOL });
      evs.set(key, e);
    }
    return e;
  };
  const rx0 = spec.receiver;
  const posed = (i: number, li: number, ri: number, d: Float64Array, axis: Vec3): number => {
    const p = spec.tokenPose.position;
    return evFor(i, li, ri).mutual(txs[i]!.pose, { position: [p[0] + d[6]!, p[1] + d[7]!, p[2] + d[8]!], axis });
  };
  return (d: Float64Array): LinkNetwork => {
    const ri = d[3]!;
    const rxl = spec.tokenLevels[ri]!;
    const supply = d[11]!;
    const L: number[][] = [];
    for (let i = 0; i <= t; i++) L.push(new Array<number>(t + 1));
    const transmitters: TransmitterNetwork[] = [];
    const axis = spec.posed ? tilted(spec.tokenPose.axis, d[9]!, d[10]!) : undefined;
    for (let i = 0; i < t; i++) {
      const x = txs[i]!;
      const li = d[turnsColumn(i)]!;
      const lv = x.levels[li]!;
      const tx0 = x.network;
      const c1 = tx0.capacitance !== undefined ? tx0.capacitance * (1 + d[capacitorColumn(i)]!) : undefined;
      transmitters.push({
        ...tx0,
        resistance: lv.resistance,
        drive: scaledDrive(tx0.drive, supply),
        ...(c1 !== undefined ? { capacitance: c1 } : {}),
        ...(c1 !== undefined && x.dissipation !== undefined ? { capacitorEsr: x.dissipation / (w * c1) } : {}),
      });
      L[i]![i] = lv.inductance;
      const m = axis !== undefined ? posed(i, li, ri, d, axis) : spec.tokenMutual[i]![li * nTok + ri]!;
      L[i]![t] = m;
      L[t]![i] = m;
    }
    let pair = 0;
    for (let i = 0; i < t; i++) {
      for (let j = i + 1; j < t; j++) {
        const m = spec.pairMutual[pair++]![d[turnsColumn(i)]! * txs[j]!.levels.length + d[turnsColumn(j)]!]!;
        L[i]![j] = m;
        L[j]![i] = m;
      }
    }
    L[t]![t] = rxl.inductance;
    const c2 = rx0.capacitance * (1 + d[0]!);
    const receiver: ReceiverNetwork = {
      ...rx0,
      resistance: rxl.resistance,
      capacitance: c2,
      ...(spec.receiverDissipation !== undefined ? { capacitorEsr: spec.receiverDissipation / (w * c2) } : {}),
      load: loadFor(d[4]!),
    };
    let shared: SharedDriveNetwork[] | undefined;
    if (spec.sharedDrives) {
      shared = [];
      for (const sd of spec.sharedDrives) shared.push({ ...sd, drive: scaledDrive(sd.drive, supply) });
    }
    return {
      frequency: spec.frequency,
      inductance: L,
      transmitter: transmitters[0]!,
      ...(spec.listed ? { transmitters } : {}),
      ...(shared ? { sharedDrives: shared } : {}),
      receivers: [receiver],
    };
  };
}

/** Solves each sample's network as solveLink would and returns its weakest LED current, lit flag and supply current. */
function evaluateSamples(spec: YieldSpec, networkOf: (d: Float64Array) => LinkNetwork, draws: Float64Array): YieldValues {
  const fundamental = spec.model === "fundamental";
  const options = { litThreshold: spec.litThreshold, onNonConvergence: "warn" as const };
  const stride = drawsPerSample(spec.transmitters.length);
  const count = draws.length / stride;
  const current = new Float64Array(count);
  const lit = new Uint8Array(count);
  const supply = new Float64Array(count);
  let unconverged = 0;
  let harmonic = 0;
  let ws: LinkWorkspace | undefined;
  for (let s = 0; s < count; s++) {
    const d = draws.subarray(s * stride, (s + 1) * stride);
    const net = networkOf(d);
    let cur = Infinity;
    let power: number;
    let converged: boolean;
    if (fundamental) {
      const solved = solveLinkOperatingPoint(net, options, ws);
      ws = solved.ws;
      for (const led of net.receivers[0]!.load.ledCurrents!(Math.hypot(ws.vRe[0]!, ws.vIm[0]!))) cur = Math.min(cur, led.current);
      power = inputPower(ws);
      converged = solved.converged;
    } else {
      const r = solveLinkModel(net, { ...options, model: spec.model });
      for (const led of r.receivers[0]!.leds) cur = Math.min(cur, led.averageCurrent);
      power = r.power.input;
      converged = r.converged;
      if (r.model !== "fundamental") harmonic++; // harmonic balance, or the periodic steady state of a hard-switched single switch
    }
    cur = Math.max(0, cur);
    current[s] = cur;
    lit[s] = cur * d[5]! >= spec.litThreshold ? 1 : 0;
    supply[s] = spec.supplyVoltage !== undefined ? Math.max(0, power) / (spec.supplyVoltage * (1 + d[11]!)) : 0;
    if (!converged) unconverged++;
  }
  return { current, lit, supply, unconverged, harmonic };
}

/** The nominal draws of a spec (no variation): every deviation 0, every winding its nominal variant, brightness 1. */
export function nominalDraws(spec: YieldSpec): Float64Array {
  const d = new Float64Array(drawsPerSample(spec.transmitters.length));
  spec.transmitters.forEach((x, i) => (d[turnsColumn(i)] = (x.levels.length - 1) / 2));
  d[3] = (spec.tokenLevels.length - 1) / 2;
  d[5] = 1;
  return d;
}

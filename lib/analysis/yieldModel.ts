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
 * - placement and tilt: the pose changes and M follows from couplingEvaluator;
 * - supply: the drive's equivalent source scales with the supply voltage.
 */
import { couplingEvaluator, type CouplingEvaluator } from "../em/couplingEvaluator.ts";
import type { Coil, Pose, Vec3 } from "../em/types.ts";
import type { LinkLoadModel, ReceiverNetwork, TransmitterNetwork } from "../circuit/link/network.ts";
import { solveLinkNetwork } from "../circuit/link/solveNetwork.ts";
import { tokenLoadModel } from "../circuit/link/tokenLoad.ts";
import { decodeLoad, type JunctionData, type LoadData } from "./loadCodec.ts";
import { PROBE_MUTUAL_RTOL } from "./probe.ts";
import { thermalVoltage } from "../constants.ts";

/** Draws per sample, in this order (see DRAW_NAMES). */
export const DRAWS = 12;
/** What each draw of a sample is. */
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

/** One winding variant: its coil, inductance (H) and resistance (Ω) at the drive frequency. */
export interface WindingLevel {
  readonly turns: number;
  readonly coil: Coil;
  readonly inductance: number;
  readonly resistance: number;
}

/** Plain-data description of the yield model. */
export interface YieldSpec {
  readonly frequency: number;
  readonly transmitter: TransmitterNetwork;
  /** the transmitter capacitor's dissipation factor when its ESR came from one */
  readonly transmitterDissipation?: number;
  readonly receiver: Omit<ReceiverNetwork, "load">;
  readonly receiverDissipation?: number;
  readonly load: LoadData;
  /** winding variants, the nominal one at index (length − 1)/2 */
  readonly transmitterLevels: readonly WindingLevel[];
  readonly tokenLevels: readonly WindingLevel[];
  readonly txPose: Pose;
  readonly tokenPose: { readonly position: Vec3; readonly axis: Vec3 };
  /** M at the nominal pose for each (transmitter level, token level), H: mutualTable[i·tokenLevels + j] */
  readonly mutualTable: readonly number[];
  /** true when placement or tilt vary (M per sample) */
  readonly posed: boolean;
  /** forward-voltage grid, V */
  readonly vfStep: number;
  readonly litThreshold: number;
  readonly supplyVoltage?: number;
  /** tabulation of the load's describing function (highest amplitude V, step V) */
  readonly table: { readonly maxAmplitude: number; readonly step: number };
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

/** A ready yield model: evaluates batches of samples (draws laid out DRAWS per sample). */
export interface YieldModel {
  evaluate(draws: Float64Array): YieldValues;
}

/** Builds the model: load tables per forward-voltage level and coupling evaluators per winding pair, on demand. */
export function makeYieldModel(spec: YieldSpec): YieldModel {
  const w = 2 * Math.PI * spec.frequency;
  const loads = new Map<number, LinkLoadModel>();
  const loadAt = (level: number): LinkLoadModel => {
    let m = loads.get(level);
    if (!m) {
      m = tokenLoadModel(decodeLoad(shiftLoad(spec.load, level * spec.vfStep)), { tabulate: true, ...spec.table });
      loads.set(level, m);
    }
    return m;
  };
  const loadFor = (dv: number): LinkLoadModel => {
    const u = dv / spec.vfStep;
    const q = Math.floor(u);
    const t = u - q;
    return t === 0 ? loadAt(q) : between(loadAt(q), loadAt(q + 1), t);
  };
  const evs = new Map<number, CouplingEvaluator>();
  const nTok = spec.tokenLevels.length;
  const evFor = (i: number, j: number): CouplingEvaluator => {
    let e = evs.get(i * nTok + j);
    if (!e) {
      e = couplingEvaluator(spec.transmitterLevels[i]!.coil, spec.tokenLevels[j]!.coil, { relTol: PROBE_MUTUAL_RTOL });
      evs.set(i * nTok + j, e);
    }
    return e;
  };
  const options = { litThreshold: spec.litThreshold, onNonConvergence: "warn" as const };
  const tx0 = spec.transmitter;
  const rx0 = spec.receiver;
  return {
    evaluate(draws: Float64Array): YieldValues {
      const count = draws.length / DRAWS;
      const current = new Float64Array(count);
      const lit = new Uint8Array(count);
      const supply = new Float64Array(count);
      let unconverged = 0;
      for (let s = 0; s < count; s++) {
        const d = draws.subarray(s * DRAWS, (s + 1) * DRAWS);
        const ti = d[2]!;
        const ri = d[3]!;
        const txl = spec.transmitterLevels[ti]!;
        const rxl = spec.tokenLevels[ri]!;
        let m: number;
        if (spec.posed) {
          const p = spec.tokenPose.position;
          const [ax, ay, az] = spec.tokenPose.axis;
          // tilt θ about the horizontal direction at azimuth φ (Rodrigues' rotation of the nominal axis)
          const th = d[9]!;
          const ph = d[10]!;
          const kx = Math.cos(ph);
          const ky = Math.sin(ph);
          const c = Math.cos(th);
          const sn = Math.sin(th);
          const kdot = kx * ax + ky * ay;
          const axis: Vec3 = [
            ax * c + ky * az * sn + kx * kdot * (1 - c),
            ay * c - kx * az * sn + ky * kdot * (1 - c),
            az * c + (kx * ay - ky * ax) * sn,
          ];
          m = evFor(ti, ri).mutual(spec.txPose, { position: [p[0] + d[6]!, p[1] + d[7]!, p[2] + d[8]!], axis });
        } else {
          m = spec.mutualTable[ti * nTok + ri]!;
        }
        const c1 = tx0.capacitance !== undefined ? tx0.capacitance * (1 + d[1]!) : undefined;
        const c2 = rx0.capacitance * (1 + d[0]!);
        const drive = d[11] === 0 ? tx0.drive : { ...tx0.drive, amplitude: tx0.drive.amplitude * (1 + d[11]!) };
        const transmitter: TransmitterNetwork = {
          ...tx0,
          resistance: txl.resistance,
          drive,
          ...(c1 !== undefined ? { capacitance: c1 } : {}),
          ...(c1 !== undefined && spec.transmitterDissipation !== undefined ? { capacitorEsr: spec.transmitterDissipation / (w * c1) } : {}),
        };
        const receiver: ReceiverNetwork = {
          ...rx0,
          resistance: rxl.resistance,
          capacitance: c2,
          ...(spec.receiverDissipation !== undefined ? { capacitorEsr: spec.receiverDissipation / (w * c2) } : {}),
          load: loadFor(d[4]!),
        };
        const r = solveLinkNetwork(
          { frequency: spec.frequency, inductance: [[txl.inductance, m], [m, rxl.inductance]], transmitter, receivers: [receiver] },
          options,
        );
        let cur = Infinity;
        for (const led of r.receivers[0]!.leds) cur = Math.min(cur, led.averageCurrent);
        cur = Math.max(0, cur);
        current[s] = cur;
        lit[s] = cur * d[5]! >= spec.litThreshold ? 1 : 0;
        supply[s] = spec.supplyVoltage !== undefined ? Math.max(0, r.power.input) / (spec.supplyVoltage * (1 + d[11]!)) : 0;
        if (!r.converged) unconverged++;
      }
      return { current, lit, supply, unconverged };
    },
  };
}

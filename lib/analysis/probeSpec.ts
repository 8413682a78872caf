/**
 * probeSpec(system, options): the plain-data description of a token probe (./probe.ts), built
 * from a link system in the calling thread: the network from `linkNetwork` (self inductances,
 * resistances, parts, drive), the coils for the coupling evaluators, and the loads as data.
 */
import type { Coil, Pose, Vec3 } from "../em/types.ts";
import { linkNetwork, type LinkSystem } from "../circuit/link.ts";
import { LinkSystemInput, systemTransmitters } from "../circuit/link/schema.ts";
import type { LinkLoadModel } from "../circuit/link/network.ts";
import { DEFAULT_LIT_THRESHOLD } from "../circuit/link/network.ts";
import { parseInput } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import { encodeLoad, isTokenLoad } from "./loadCodec.ts";
import { supplyVoltageOf } from "./supplyBudget.ts";
import type { LinkModelName, ProbeSpec } from "./probe.ts";

const ORIGIN: Pose = { position: [0, 0, 0] };

/** Options of {@link probeSpec}. */
export interface ProbeOptions {
  /** index of the token that moves (default 0) */
  readonly token?: number;
  /** keep the other receivers of the system at their poses (default false: the token alone) */
  readonly others?: boolean;
  /** token axes to try (default [[0, 0, 1]], flat) */
  readonly axes?: readonly Vec3[];
  /** lit threshold, A (default DEFAULT_LIT_THRESHOLD, 0.5 mA) */
  readonly litThreshold?: number;
  /** steady-state model as solveLink's `model` (default "fundamental") */
  readonly model?: LinkModelName;
}

/**
 * Builds the plain description of a probe from a link system (validated as solveLink does).
 * @param system a {@link LinkSystem}; the moving token's own pose is ignored.
 * @param options token index, others present, axes, lit threshold.
 */
export function probeSpec(system: LinkSystem, options: ProbeOptions, where: string): ProbeSpec & { readonly models: readonly LinkLoadModel[] } {
  const parsed = parseInput(LinkSystemInput, system, where);
  const txs = systemTransmitters(parsed);
  const tx = txs[0]!;
  if (parsed.sharedDrives !== undefined) {
    if (options.model === "harmonic") {
      throw new TanklightInputError(
        [{ path: "model", message: "harmonic balance solves transmitters on their own drives; map coils on a shared drive with 'fundamental' or 'auto' (which then keeps the describing function, as solveLink does)", value: options.model }],
        where,
      );
    }
  }
  const k = options.token ?? 0;
  if (!(Number.isInteger(k) && k >= 0 && k < parsed.receivers.length)) {
    throw new TanklightInputError(
      [{ path: "token", message: `must index one of the system's ${parsed.receivers.length} receivers`, value: k, expected: `integer 0…${parsed.receivers.length - 1}` }],
      where,
    );
  }
  const keep = options.others ? parsed.receivers.map((_, i) => i) : [k];
  const sys = { ...(system as object), receivers: keep.map((i) => (system as { receivers: readonly unknown[] }).receivers[i]) } as LinkSystem;
  const built = linkNetwork(sys, { tabulateLoads: true });
  const net = built.network;
  const coils: Coil[] = [];
  const coilIndex = (c: Coil): number => {
    const i = coils.indexOf(c);
    if (i >= 0) return i;
    coils.push(c);
    return coils.length - 1;
  };
  const txCoil = coilIndex(tx.coil);
  const txCoils = txs.map((t) => coilIndex(t.coil));
  const receivers = keep.map((i) => parsed.receivers[i]!);
  const token = keep.indexOf(k);
  const tokenCoil = coilIndex(receivers[token]!.coil);
  const others = receivers.flatMap((r, i) => (i === token ? [] : [{ receiver: i, coil: coilIndex(r.coil), pose: r.pose as Pose }]));
  const loads = receivers.map((r) => (isTokenLoad(r.load) ? encodeLoad(r.load) : null));
  const models = net.receivers.map((r) => r.load);
  const token0 = net.receivers[token]!;
  if (!token0.load.ledCurrents || token0.load.ledCurrents(1).length === 0) {
    throw new TanklightInputError([{ path: `receivers[${k}].load`, message: "the moving token needs at least one LED (lit/unlit is an LED's verdict)", value: token0.load.label }], where);
  }
  // one DC supply voltage over every drive in use (else none: the supply current is not mapped)
  const driveSpecs = [...txs.flatMap((t) => (typeof t.drive === "string" ? [] : [t.drive])), ...(parsed.sharedDrives ?? []).filter((d) => txs.some((t) => t.drive === d.name)).map((d) => d.drive)];
  const volts = driveSpecs.map(supplyVoltageOf);
  const supplyVoltage = volts.every((v) => v !== undefined && v === volts[0]) ? volts[0] : undefined;
  const array = net.transmitters !== undefined || net.sharedDrives !== undefined
    ? {
        array: {
          transmitters: net.transmitters ?? [net.transmitter],
          ...(net.sharedDrives !== undefined ? { sharedDrives: net.sharedDrives } : {}),
          coils: txCoils,
          poses: txs.map((t) => (t.pose as Pose | undefined) ?? ORIGIN),
        },
      }
    : {};
  return {
    frequency: net.frequency,
    inductance: net.inductance,
    transmitter: net.transmitter,
    receivers: net.receivers.map(({ load: _load, ...rest }) => rest),
    loads,
    coils,
    txCoil,
    txPose: (tx.pose as Pose | undefined) ?? ORIGIN,
    token,
    tokenCoil,
    ...array,
    others,
    axes: options.axes ?? [[0, 0, 1]],
    litThreshold: options.litThreshold ?? DEFAULT_LIT_THRESHOLD,
    ...(supplyVoltage !== undefined ? { supplyVoltage } : {}),
    // (coils on a shared drive keep the describing function, as solveLink)
    ...(options.model !== undefined && options.model !== "fundamental" && net.sharedDrives === undefined ? { model: options.model } : {}),
    models,
  };
}


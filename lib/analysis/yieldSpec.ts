/**
 * The variations of toleranceYield (zod schema with units) and the yield model's plain-data
 * spec built from a system in the calling thread: the nominal network, winding variants with
 * their own L, R and M, and the random draws of every sample from one seeded generator.
 */
import { z } from "zod";
import { angle, length, parseInput, quantity, voltage, lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import { createRandom } from "../math/random.ts";
import type { Coil, Pose, Vec3 } from "../em/types.ts";
import { couplingEvaluator } from "../em/couplingEvaluator.ts";
import { selfInductance } from "../em/selfInductance.ts";
import { coilResistance } from "../em/losses/coilResistance.ts";
import { linkNetwork, type LinkSystem } from "../circuit/link.ts";
import { LinkSystemInput, soleTransmitter } from "../circuit/link/schema.ts";
import { DEFAULT_LIT_THRESHOLD } from "../circuit/link/network.ts";
import { encodeLoad, isTokenLoad, type LoadData } from "./loadCodec.ts";
import { supplyVoltageOf } from "./supplyBudget.ts";
import { PROBE_MUTUAL_RTOL } from "./probe.ts";
import { DRAWS, DRAW_NAMES, type WindingLevel, type YieldSpec } from "./yieldModel.ts";

const distribution = lazySchema(() => z.enum(["uniform", "normal"]));
/** A spread: ±tolerance (a number or quantity), uniform by default ("normal": tolerance = 3σ, truncated there). */
function spread(dim: "dimensionless" | "voltage" | "length" | "angle") {
  const q = dim === "dimensionless" ? quantity("dimensionless", { nonNegative: true, max: 0.9 }) : dim === "voltage" ? voltage({ nonNegative: true }) : dim === "length" ? length({ nonNegative: true }) : angle({ nonNegative: true });
  return z.union([q, z.strictObject({ tolerance: q, distribution: distribution.optional() })]);
}
const winding = lazySchema(() => z.strictObject({
  /** ± turns, integer; every count in between equally likely */
  spread: z.number().int().min(0).max(50),
  /** builds the coil with a given number of turns (the nominal coil's own builder and spec) */
  build: z.custom<(turns: number) => Coil>((f) => typeof f === "function", { message: "expected a function turns → Coil" }),
}));

/** The variations of a batch (all optional; relative tolerances as fractions, e.g. 0.05 for ±5 %). */
export const VariationsInput = lazySchema(() => z.strictObject({
  /** token tank capacitor, relative */
  tokenCapacitor: spread("dimensionless").optional(),
  /** transmitter capacitor, relative */
  transmitterCapacitor: spread("dimensionless").optional(),
  /** winding spread of the token coil: ± turns, rebuilt by your builder */
  tokenTurns: winding.optional(),
  transmitterTurns: winding.optional(),
  /** LED forward-voltage spread, V ("preset": by colour, see LED_SPREAD_PRESETS) */
  ledForwardVoltage: z.union([z.literal("preset"), spread("voltage")]).optional(),
  /** LED brightness (light per mA) spread, relative ("preset": by colour) */
  ledBrightness: z.union([z.literal("preset"), spread("dimensionless")]).optional(),
  /** placement spread in x and in y (each), m */
  placement: spread("length").optional(),
  /** height spread, m */
  height: spread("length").optional(),
  /** tilt spread, rad or "10 deg" (about a random horizontal direction) */
  tilt: spread("angle").optional(),
  /** supply voltage, relative */
  supply: spread("dimensionless").optional(),
}));
/** What toleranceYield accepts as variations. */
export type VariationsInput = z.input<typeof VariationsInput>;

/**
 * LED spreads by colour — from memory (unverified): forward-voltage bins of ±0.2 V for AlInGaP and
 * GaP parts and ±0.3 V for InGaN (the register gives ±0.2–0.4 V by bin), and intensity bins about
 * 1.6–2× wide (±30 %). Check the datasheet's binning table of the part you buy.
 */
export const LED_SPREAD_PRESETS: Readonly<Record<string, { readonly forwardVoltage: number; readonly brightness: number }>> = {
  red: { forwardVoltage: 0.2, brightness: 0.3 },
  orange: { forwardVoltage: 0.2, brightness: 0.3 },
  yellow: { forwardVoltage: 0.2, brightness: 0.3 },
  "green-gap": { forwardVoltage: 0.2, brightness: 0.3 },
  "green-ingan": { forwardVoltage: 0.3, brightness: 0.3 },
  blue: { forwardVoltage: 0.3, brightness: 0.3 },
  white: { forwardVoltage: 0.3, brightness: 0.3 },
};

type Spread = { tolerance: number; distribution: "uniform" | "normal" } | undefined;
const asSpread = (s: number | { tolerance: number; distribution?: "uniform" | "normal" | undefined } | undefined): Spread =>
  s === undefined ? undefined : typeof s === "number" ? { tolerance: s, distribution: "uniform" } : { tolerance: s.tolerance, distribution: s.distribution ?? "uniform" };

/** The parsed variations, each a spread or undefined, plus the winding builders. */
export interface ParsedVariations {
  readonly spreads: Readonly<Record<(typeof DRAW_NAMES)[number], Spread>>;
  readonly tokenTurns?: { spread: number; build: (turns: number) => Coil };
  readonly transmitterTurns?: { spread: number; build: (turns: number) => Coil };
}

/** Options of the spec build. */
export interface YieldSpecOptions {
  readonly token?: number;
  readonly litThreshold?: number;
  /** forward-voltage grid of the load tables, V (default 20 mV) */
  readonly vfStep?: number;
}

/**
 * Parses the variations and builds the yield model's spec for the system's token.
 * @returns the spec, the parsed variations and the list of active variation names.
 */
export function yieldSpec(system: LinkSystem, variations: VariationsInput, options: YieldSpecOptions, where: string): { spec: YieldSpec; parsed: ParsedVariations; active: string[] } {
  const v = parseInput(VariationsInput, variations, where);
  const sys = parseInput(LinkSystemInput, system, where);
  const tx = soleTransmitter(sys, where);
  const k = options.token ?? 0;
  const rx = sys.receivers[k];
  if (rx === undefined) {
    throw new TanklightInputError([{ path: "token", message: `must index one of the system's ${sys.receivers.length} receivers`, value: k }], where);
  }
  if (!isTokenLoad(rx.load)) {
    throw new TanklightInputError([{ path: `receivers[${k}].load`, message: "toleranceYield needs the load as a TokenLoad ({ kind: 'led', led }, …) so its LED can be varied", value: "a load model" }], where);
  }
  const load: LoadData = encodeLoad(rx.load);
  const colour = ledColour(load);
  const preset = colour !== undefined ? LED_SPREAD_PRESETS[colour] : undefined;
  const presetOf = (key: "forwardVoltage" | "brightness", field: string): Spread => {
    if (!preset) {
      throw new TanklightInputError([{ path: field, message: `no preset spread for this LED colour (${colour ?? "none"}); give a tolerance`, value: "preset" }], where);
    }
    return { tolerance: preset[key], distribution: "uniform" };
  };
  const spreads: Record<(typeof DRAW_NAMES)[number], Spread> = {
    tokenCapacitor: asSpread(v.tokenCapacitor),
    transmitterCapacitor: asSpread(v.transmitterCapacitor),
    transmitterTurns: undefined,
    tokenTurns: undefined,
    ledForwardVoltage: v.ledForwardVoltage === "preset" ? presetOf("forwardVoltage", "ledForwardVoltage") : asSpread(v.ledForwardVoltage),
    ledBrightness: v.ledBrightness === "preset" ? presetOf("brightness", "ledBrightness") : asSpread(v.ledBrightness),
    placementX: asSpread(v.placement),
    placementY: asSpread(v.placement),
    height: asSpread(v.height),
    tilt: asSpread(v.tilt),
    tiltAzimuth: undefined,
    supply: asSpread(v.supply),
  };
  const single = { ...(system as object), receivers: [(system as { receivers: readonly unknown[] }).receivers[k]] } as LinkSystem;
  const net = linkNetwork(single).network;
  const f = net.frequency;
  const w = 2 * Math.PI * f;
  const temperature = sys.temperature !== undefined ? { temperature: sys.temperature } : {};
  const levels = (coil: Coil, nominalL: number, nominalR: number, wv: { spread: number; build: (turns: number) => Coil } | undefined, field: string): WindingLevel[] => {
    if (!wv || wv.spread === 0) return [{ turns: coil.turns, coil, inductance: nominalL, resistance: nominalR }];
    const r0 = coilResistance(coil, f, temperature);
    const out: WindingLevel[] = [];
    for (let dt = -wv.spread; dt <= wv.spread; dt++) {
      const turns = coil.turns + dt;
      if (turns < 1) throw new TanklightInputError([{ path: `${field}.spread`, message: `leaves fewer than 1 turn (nominal ${coil.turns})`, value: wv.spread }], where);
      if (dt === 0) {
        out.push({ turns, coil, inductance: nominalL, resistance: nominalR });
        continue;
      }
      const c = wv.build(turns);
      // an override of the nominal resistance carries over as the same ratio to the model's value
      out.push({ turns, coil: c, inductance: selfInductance(c, { frequency: f }), resistance: (nominalR / r0) * coilResistance(c, f, temperature) });
    }
    return out;
  };
  const txLevels = levels(tx.coil, net.inductance[0]![0]!, net.transmitter.resistance, v.transmitterTurns, "transmitterTurns");
  const tokLevels = levels(rx.coil, net.inductance[1]![1]!, net.receivers[0]!.resistance, v.tokenTurns, "tokenTurns");
  const txPose = (tx.pose as Pose | undefined) ?? { position: [0, 0, 0] };
  const tokenPose = { position: rx.pose.position as Vec3, axis: ((rx.pose as Pose).axis ?? [0, 0, 1]) as Vec3 };
  const posed = [spreads.placementX, spreads.height, spreads.tilt].some((s) => s !== undefined && s.tolerance > 0);
  const mutualTable: number[] = [];
  txLevels.forEach((a, i) =>
    tokLevels.forEach((b, j) => {
      const nominal = i === (txLevels.length - 1) / 2 && j === (tokLevels.length - 1) / 2;
      mutualTable.push(nominal && !posed ? net.inductance[0]![1]! : couplingEvaluator(a.coil, b.coil, { relTol: PROBE_MUTUAL_RTOL }).mutual(txPose, rx.pose as Pose));
    }),
  );
  const { load: _l, ...receiver } = net.receivers[0]!;
  const supplyVoltage = supplyVoltageOf(tx.drive);
  const dissipation = (c: { esr?: number | undefined; dissipationFactor?: number | undefined } | undefined): number | undefined =>
    c && c.esr === undefined && c.dissipationFactor !== undefined ? c.dissipationFactor : undefined;
  const txD = dissipation(tx.capacitor);
  const rxD = dissipation(rx.capacitor);
  void w;
  const spec: YieldSpec = {
    frequency: f,
    transmitter: net.transmitter,
    ...(txD !== undefined ? { transmitterDissipation: txD } : {}),
    receiver,
    ...(rxD !== undefined ? { receiverDissipation: rxD } : {}),
    load,
    transmitterLevels: txLevels,
    tokenLevels: tokLevels,
    txPose,
    tokenPose,
    mutualTable,
    posed,
    vfStep: options.vfStep ?? 0.02,
    litThreshold: options.litThreshold ?? DEFAULT_LIT_THRESHOLD,
    ...(supplyVoltage !== undefined ? { supplyVoltage } : {}),
    table: { maxAmplitude: 8, step: 5e-3 },
  };
  const active = DRAW_NAMES.filter((n) => spreads[n] !== undefined && spreads[n]!.tolerance > 0 && n !== "placementY") as string[];
  if (txLevels.length > 1) active.push("transmitterTurns");
  if (tokLevels.length > 1) active.push("tokenTurns");
  return {
    spec,
    parsed: {
      spreads,
      ...(v.tokenTurns ? { tokenTurns: v.tokenTurns } : {}),
      ...(v.transmitterTurns ? { transmitterTurns: v.transmitterTurns } : {}),
    },
    active,
  };
}

function ledColour(load: LoadData): string | undefined {
  switch (load.kind) {
    case "led":
    case "bridge":
    case "halfWaveReservoir":
      return load.led.colour;
    case "antiParallel":
    case "parallelSameDirection":
      return load.a.colour;
    case "resistor":
      return undefined;
  }
}

/**
 * A drawer of samples: `next(count)` returns the draws of the next `count` samples — every
 * dimension drawn for every sample in a fixed order from one xoshiro128** stream
 * (lib/math/random.ts), so a sample's draws do not depend on how the batch is split.
 */
export function sampleDrawer(spec: YieldSpec, parsed: ParsedVariations, seed: number): (count: number) => Float64Array {
  const rng = createRandom(seed);
  const nTx = spec.transmitterLevels.length;
  const nTok = spec.tokenLevels.length;
  const deviate = (s: Spread): number => {
    // always consume the same stream: one uniform for a uniform spread, a normal draw otherwise
    if (s === undefined) {
      rng.uniform();
      return 0;
    }
    if (s.distribution === "uniform") return s.tolerance * (2 * rng.uniform() - 1);
    for (;;) {
      const x = rng.normal(0, s.tolerance / 3);
      if (Math.abs(x) <= s.tolerance) return x;
    }
  };
  const sp = parsed.spreads;
  return (count: number): Float64Array => {
    const out = new Float64Array(count * DRAWS);
    for (let i = 0; i < count; i++) {
      const d = out.subarray(i * DRAWS, (i + 1) * DRAWS);
      d[0] = deviate(sp.tokenCapacitor);
      d[1] = deviate(sp.transmitterCapacitor);
      d[2] = Math.min(nTx - 1, Math.floor(rng.uniform() * nTx));
      d[3] = Math.min(nTok - 1, Math.floor(rng.uniform() * nTok));
      d[4] = deviate(sp.ledForwardVoltage);
      d[5] = 1 + deviate(sp.ledBrightness);
      d[6] = deviate(sp.placementX);
      d[7] = deviate(sp.placementY);
      d[8] = deviate(sp.height);
      d[9] = deviate(sp.tilt);
      d[10] = 2 * Math.PI * rng.uniform();
      d[11] = deviate(sp.supply);
    }
    return out;
  };
}

/** The nominal value of each draw (what a sample without that variation has). */
export function nominalDraws(spec: YieldSpec): Float64Array {
  const d = new Float64Array(DRAWS);
  d[2] = (spec.transmitterLevels.length - 1) / 2;
  d[3] = (spec.tokenLevels.length - 1) / 2;
  d[5] = 1;
  return d;
}

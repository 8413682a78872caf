/**
 * The variations of toleranceYield (zod schema with units) and the yield model's plain-data
 * spec built from a system in the calling thread: the nominal network, winding variants with
 * their own L, R and M, and the random draws of every sample from one seeded generator.
 */
import * as z from "../zod.ts";
import { angle, length, parseInput, quantity, voltage, lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import { createRandom } from "../math/random.ts";
import type { Coil, Pose, Vec3 } from "../em/types.ts";
import { couplingEvaluator } from "../em/couplingEvaluator.ts";
import { selfInductance } from "../em/selfInductance.ts";
import { coilResistance } from "../em/losses/coilResistance.ts";
import { linkNetwork, type LinkSystem } from "../circuit/link.ts";
import { LinkSystemInput, systemTransmitters, type LinkSystemParsed, type TransmitterParsed } from "../circuit/link/schema.ts";
import { DEFAULT_LIT_THRESHOLD, networkTransmitters } from "../circuit/link/network.ts";
import type { LinkModel } from "../circuit/harmonic/modelChoice.ts";
import { encodeLoad, isTokenLoad, type LoadData } from "./loadCodec.ts";
import { supplyVoltageOf } from "./supplyBudget.ts";
import { PROBE_MUTUAL_RTOL } from "./probe.ts";
import { DRAW_NAMES, capacitorColumn, drawsPerSample, turnsColumn, type WindingLevel, type YieldSpec } from "./yieldModel.ts";

const ORIGIN: Pose = { position: [0, 0, 0] };

const distribution = lazySchema(() => z.enum(["uniform", "normal"]));
/** A spread: ±tolerance (a number or quantity), uniform by default ("normal": tolerance = 3σ, truncated there). */
function spread(dim: "dimensionless" | "voltage" | "length" | "angle") {
  const q = dim === "dimensionless" ? quantity("dimensionless", { nonNegative: true, max: 0.9 }) : dim === "voltage" ? voltage({ nonNegative: true }) : dim === "length" ? length({ nonNegative: true }) : angle({ nonNegative: true });
  return z.union([q, z.strictObject({ tolerance: q, distribution: distribution.optional() })]);
}
const winding = lazySchema(() => z.strictObject({
  /** ± turns, integer; every count in between equally likely */
  spread: z.number().int().min(0).max(50),
  /**
   * builds the coil with a given number of turns (the nominal coil's own builder and spec); for
   * the transmitters of an array it also gets the transmitter's index (−1 for the token)
   */
  build: z.custom<(turns: number, transmitter: number) => Coil>((f) => typeof f === "function", { message: "expected a function turns → Coil" }),
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
  readonly tokenTurns?: Winding;
  readonly transmitterTurns?: Winding;
}

/** Options of the spec build. */
export interface YieldSpecOptions {
  readonly token?: number;
  readonly litThreshold?: number;
  /** forward-voltage grid of the load tables, V (default 50 mV) */
  readonly vfStep?: number;
  /** steady-state model, as solveLink's (default "fundamental") */
  readonly model?: LinkModel;
}

type Winding = { spread: number; build: (turns: number, transmitter: number) => Coil };

/**
 * Parses the variations and builds the yield model's spec for the system's token: every
 * transmitter with its own winding variants (and the M between each pair of variants), the
 * token's, and the M of every transmitter variant with every token variant at the nominal pose.
 * @returns the spec, the parsed variations and the list of active variations with their draw columns.
 */
export function yieldSpec(system: LinkSystem, variations: VariationsInput, options: YieldSpecOptions, where: string): { spec: YieldSpec; parsed: ParsedVariations; active: ActiveVariation[] } {
  const v = parseInput(VariationsInput, variations, where);
  const sys = parseInput(LinkSystemInput, system, where);
  const txs = systemTransmitters(sys);
  const k = options.token ?? 0;
  const rx = sys.receivers[k];
  if (rx === undefined) {
    throw new TanklightInputError([{ path: "token", message: `must index one of the system's ${sys.receivers.length} receivers`, value: k }], where);
  }
  if (!isTokenLoad(rx.load)) {
    throw new TanklightInputError([{ path: `receivers[${k}].load`, message: "toleranceYield needs the load as a TokenLoad ({ kind: 'led', led }, …) so its LED can be varied", value: "a load model" }], where);
  }
  // harmonic balance solves any number of transmitters on their own drives, not coils on a shared drive
  const shared = sys.sharedDrives !== undefined;
  if (shared && options.model === "harmonic") {
    throw new TanklightInputError(
      [{ path: "model", message: "harmonic balance solves transmitters on their own drives; run coils on a shared drive with 'fundamental' or 'auto' (which then keeps the describing function, as solveLink does)", value: options.model }],
      where,
    );
  }
  const load: LoadData = encodeLoad(rx.load);
  const spreads = parseSpreads(v, load, where);
  const single = { ...(system as object), receivers: [(system as { receivers: readonly unknown[] }).receivers[k]] } as LinkSystem;
  const net = linkNetwork(single).network;
  const f = net.frequency;
  const t = txs.length;
  const levels = windingLevels(f, sys.temperature, where);
  const txNets = networkTransmitters(net);
  const txLevels = txs.map((tx, i) => levels(tx.coil, net.inductance[i]![i]!, txNets[i]!.resistance, v.transmitterTurns, "transmitterTurns", i));
  const tokLevels = levels(rx.coil, net.inductance[t]![t]!, net.receivers[0]!.resistance, v.tokenTurns, "tokenTurns", -1);
  const txPoses = txs.map((tx) => (tx.pose as Pose | undefined) ?? ORIGIN);
  const tokenPose = { position: rx.pose.position as Vec3, axis: ((rx.pose as Pose).axis ?? [0, 0, 1]) as Vec3 };
  const posed = [spreads.placementX, spreads.height, spreads.tilt].some((s) => s !== undefined && s.tolerance > 0);
  const { load: _l, ...receiver } = net.receivers[0]!;
  const supplyVoltage = commonSupplyVoltage(txs, sys.sharedDrives);
  const rxD = dissipation(rx.capacitor);
  const spec: YieldSpec = {
    frequency: f,
    transmitters: txs.map((tx, i) => {
      const d = dissipation(tx.capacitor);
      return { network: txNets[i]!, ...(d !== undefined ? { dissipation: d } : {}), levels: txLevels[i]!, pose: txPoses[i]! };
    }),
    ...(net.transmitters !== undefined ? { listed: true } : {}),
    ...(net.sharedDrives !== undefined ? { sharedDrives: net.sharedDrives } : {}),
    pairMutual: pairMutualTables(txLevels, txPoses, net.inductance),
    receiver,
    ...(rxD !== undefined ? { receiverDissipation: rxD } : {}),
    load,
    tokenLevels: tokLevels,
    tokenPose,
    tokenMutual: tokenMutualTables(txLevels, txPoses, tokLevels, rx.pose as Pose, posed ? undefined : net.inductance),
    posed,
    vfStep: options.vfStep ?? 0.05,
    litThreshold: options.litThreshold ?? DEFAULT_LIT_THRESHOLD,
    ...(supplyVoltage !== undefined ? { supplyVoltage } : {}),
    table: { maxAmplitude: 8, step: 5e-3 },
    // coils on a shared drive: the describing function, as solveLink ("auto" keeps it there)
    model: shared ? "fundamental" : (options.model ?? "fundamental"),
  };
  return {
    spec,
    parsed: {
      spreads,
      ...(v.tokenTurns ? { tokenTurns: v.tokenTurns } : {}),
      ...(v.transmitterTurns ? { transmitterTurns: v.transmitterTurns } : {}),
    },
    active: activeVariations(spreads, txs, txLevels, tokLevels),
  };
}

/** Each variation as a spread (or undefined); "preset" LED spreads looked up by the load's LED colour. */
function parseSpreads(v: z.output<typeof VariationsInput>, load: LoadData, where: string): Record<(typeof DRAW_NAMES)[number], Spread> {
  const colour = ledColour(load);
  const preset = colour !== undefined ? LED_SPREAD_PRESETS[colour] : undefined;
  const presetOf = (key: "forwardVoltage" | "brightness", field: string): Spread => {
    if (!preset) {
      throw new TanklightInputError([{ path: field, message: `no preset spread for this LED colour (${colour ?? "none"}); give a tolerance`, value: "preset" }], where);
    }
    return { tolerance: preset[key], distribution: "uniform" };
  };
  return {
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
}

/**
 * The winding variants of a coil at frequency f: a coil's own L and R from its rebuilt coil; an
 * override of the nominal resistance carries over as the same ratio to the model's value.
 * Transmitters with one coil object share their variants (remembered by the returned function).
 */
function windingLevels(f: number, temperatureK: number | undefined, where: string) {
  const temperature = temperatureK !== undefined ? { temperature: temperatureK } : {};
  const built = new Map<Coil, WindingLevel[]>();
  return (coil: Coil, nominalL: number, nominalR: number, wv: Winding | undefined, field: string, index: number): WindingLevel[] => {
    if (!wv || wv.spread === 0) return [{ turns: coil.turns, coil, inductance: nominalL, resistance: nominalR }];
    const known = built.get(coil);
    if (known && known[wv.spread]!.inductance === nominalL && known[wv.spread]!.resistance === nominalR) return known;
    const r0 = coilResistance(coil, f, temperature);
    const out: WindingLevel[] = [];
    for (let dt = -wv.spread; dt <= wv.spread; dt++) {
      const turns = coil.turns + dt;
      if (turns < 1) throw new TanklightInputError([{ path: `${field}.spread`, message: `leaves fewer than 1 turn (nominal ${coil.turns})`, value: wv.spread }], where);
      if (dt === 0) {
        out.push({ turns, coil, inductance: nominalL, resistance: nominalR });
        continue;
      }
      const c = wv.build(turns, index);
      out.push({ turns, coil: c, inductance: selfInductance(c, { frequency: f }), resistance: (nominalR / r0) * coilResistance(c, f, temperature) });
    }
    built.set(coil, out);
    return out;
  };
}

const middle = (n: number): number => (n - 1) / 2;
const variantMutual = (a: WindingLevel, pa: Pose, b: WindingLevel, pb: Pose): number =>
  couplingEvaluator(a.coil, b.coil, { relTol: PROBE_MUTUAL_RTOL }).mutual(pa, pb);

/** Transmitter pairs i < j: M for every pair of their variants (the nominal pair: the link's own, from `inductance`). */
function pairMutualTables(txLevels: readonly WindingLevel[][], txPoses: readonly Pose[], inductance: readonly (readonly number[])[]): number[][] {
  const pairMutual: number[][] = [];
  const t = txLevels.length;
  for (let i = 0; i < t; i++) {
    for (let j = i + 1; j < t; j++) {
      const table: number[] = [];
      txLevels[i]!.forEach((a, ai) =>
        txLevels[j]!.forEach((b, bj) => {
          table.push(ai === middle(txLevels[i]!.length) && bj === middle(txLevels[j]!.length) ? inductance[i]![j]! : variantMutual(a, txPoses[i]!, b, txPoses[j]!));
        }),
      );
      pairMutual.push(table);
    }
  }
  return pairMutual;
}

/**
 * Each transmitter's variants with the token's at the nominal pose; the nominal pair takes the
 * link's own M from `inductance` (undefined when the pose varies: then every pair is evaluated).
 */
function tokenMutualTables(txLevels: readonly WindingLevel[][], txPoses: readonly Pose[], tokLevels: readonly WindingLevel[], tokenPose: Pose, inductance: readonly (readonly number[])[] | undefined): number[][] {
  const t = txLevels.length;
  return txLevels.map((lv, i) => {
    const table: number[] = [];
    lv.forEach((a, ai) =>
      tokLevels.forEach((b, bj) => {
        const nominal = ai === middle(lv.length) && bj === middle(tokLevels.length);
        table.push(nominal && inductance !== undefined ? inductance[i]![t]! : variantMutual(a, txPoses[i]!, b, tokenPose));
      }),
    );
    return table;
  });
}

/** One DC supply voltage over every drive in use (else undefined: no supply current). */
function commonSupplyVoltage(txs: readonly TransmitterParsed[], sharedDrives: LinkSystemParsed["sharedDrives"]): number | undefined {
  const driveSpecs = [...txs.flatMap((x) => (typeof x.drive === "string" ? [] : [x.drive])), ...(sharedDrives ?? []).filter((d) => txs.some((x) => x.drive === d.name)).map((d) => d.drive)];
  const volts = driveSpecs.map(supplyVoltageOf);
  return volts.length > 0 && volts.every((x) => x !== undefined && x === volts[0]) ? volts[0] : undefined;
}

/** A capacitor's tan δ when it is given without an ESR (then the model varies the ESR with C). */
const dissipation = (c: { esr?: number | undefined; dissipationFactor?: number | undefined } | undefined): number | undefined =>
  c && c.esr === undefined && c.dissipationFactor !== undefined ? c.dissipationFactor : undefined;

/** The variations that are switched on, each with the draw columns it owns. */
function activeVariations(spreads: Readonly<Record<(typeof DRAW_NAMES)[number], Spread>>, txs: readonly TransmitterParsed[], txLevels: readonly WindingLevel[][], tokLevels: readonly WindingLevel[]): ActiveVariation[] {
  const t = txs.length;
  const active: ActiveVariation[] = [];
  const column = (name: (typeof DRAW_NAMES)[number]): number => DRAW_NAMES.indexOf(name);
  const on = (s: Spread): boolean => s !== undefined && s.tolerance > 0;
  if (on(spreads.tokenCapacitor)) active.push({ variation: "tokenCapacitor", columns: [column("tokenCapacitor")] });
  if (on(spreads.transmitterCapacitor)) {
    txs.forEach((tx, i) => {
      if (tx.compensation !== "none") active.push({ variation: t === 1 ? "transmitterCapacitor" : `transmitterCapacitor[${i}]`, columns: [capacitorColumn(i)] });
    });
  }
  for (const name of ["ledForwardVoltage", "ledBrightness"] as const) if (on(spreads[name])) active.push({ variation: name, columns: [column(name)] });
  if (on(spreads.placementX)) active.push({ variation: "placement", columns: [column("placementX"), column("placementY")] });
  if (on(spreads.height)) active.push({ variation: "height", columns: [column("height")] });
  if (on(spreads.tilt)) active.push({ variation: "tilt", columns: [column("tilt"), column("tiltAzimuth")] });
  if (on(spreads.supply)) active.push({ variation: "supply", columns: [column("supply")] });
  txLevels.forEach((lv, i) => {
    if (lv.length > 1) active.push({ variation: t === 1 ? "transmitterTurns" : `transmitterTurns[${i}]`, columns: [turnsColumn(i)] });
  });
  if (tokLevels.length > 1) active.push({ variation: "tokenTurns", columns: [column("tokenTurns")] });
  return active;
}

/** An active variation: its name in results and the draw columns it owns (the first is ranked). */
export interface ActiveVariation {
  readonly variation: string;
  readonly columns: readonly number[];
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
 * A drawer of samples: `next(count)` returns the draws of the next `count` samples
 * (drawsPerSample(transmitters) each) — every dimension drawn for every sample in a fixed order
 * from one xoshiro128** stream
 * (lib/math/random.ts), so a sample's draws do not depend on how the batch is split.
 */
export function sampleDrawer(spec: YieldSpec, parsed: ParsedVariations, seed: number): (count: number) => Float64Array {
  const rng = createRandom(seed);
  const nTok = spec.tokenLevels.length;
  const t = spec.transmitters.length;
  const stride = drawsPerSample(t);
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
  const level = (n: number): number => Math.min(n - 1, Math.floor(rng.uniform() * n));
  const sp = parsed.spreads;
  return (count: number): Float64Array => {
    const out = new Float64Array(count * stride);
    for (let i = 0; i < count; i++) {
      const d = out.subarray(i * stride, (i + 1) * stride);
      d[0] = deviate(sp.tokenCapacitor);
      d[1] = deviate(sp.transmitterCapacitor);
      d[2] = level(spec.transmitters[0]!.levels.length);
      d[3] = level(nTok);
      d[4] = deviate(sp.ledForwardVoltage);
      d[5] = 1 + deviate(sp.ledBrightness);
      d[6] = deviate(sp.placementX);
      d[7] = deviate(sp.placementY);
      d[8] = deviate(sp.height);
      d[9] = deviate(sp.tilt);
      d[10] = 2 * Math.PI * rng.uniform();
      d[11] = deviate(sp.supply);
      // further transmitters: their own capacitor and winding (after the first's, so one transmitter draws as before)
      for (let x = 1; x < t; x++) {
        d[capacitorColumn(x)] = deviate(sp.transmitterCapacitor);
        d[turnsColumn(x)] = level(spec.transmitters[x]!.levels.length);
      }
    }
    return out;
  };
}

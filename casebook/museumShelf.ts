/**
 * Casebook — "Museum shelf": replica coins and gems that glow anywhere on a shelf.
 *
 * A museum shop displays lit replica coins (a flat 40-turn coil, a yellow LED) and small gems
 * (an 80-turn coil on a 4 mm former, a blue LED) on a 60 cm × 20 cm shelf board, 10 mm thick.
 * Visitors pick them up and put them back anywhere. Does one coil under the shelf light all of
 * it? Where are the dead zones? If not, how many coils, phased how? What fraction of a batch of
 * gems lights everywhere, what field do visitors' hands meet, and what supply does it take?
 *
 * Demo data: the shelf, the coils, the replicas and the parts are our own invention.
 */
import {
  addSafetySections,
  chart,
  coverageMap,
  DEFAULT_LIT_THRESHOLD,
  designFromLink,
  formatQuantity,
  ledPreset,
  notebook,
  partsList,
  roundCoil,
  safetyReport,
  selfInductance,
  solveLink,
  supplyVerdict,
  tuneWithStandardParts,
  wilsonInterval,
  type LedColour,
  type LinkSystem,
  type Notebook,
  type Vec3,
} from "../lib/mod.ts";
import type { ScenarioOptions } from "./scenarios.ts";

/** What the run computes (SI units). */
export interface MuseumShelfResults {
  readonly frequency: number;
  /** one coil under the shelf's centre: lit share of the shelf (coverageMap) and its dead zones */
  readonly single: { readonly litShare: number; readonly deadZones: number; readonly weakest: number };
  /** the array: lit share and weakest LED current over the shelf, per replica */
  readonly array: { readonly coils: number; readonly spots: number; readonly weakestSpot: number; readonly litShare: Readonly<Record<"coin" | "gem", number>>; readonly weakest: Readonly<Record<"coin" | "gem", number>> };
  readonly batch: { readonly lit: number; readonly count: number; readonly lower: number; readonly upper: number };
  /** worst accessible flux density, T RMS, and the ICNIRP 2010 public basic-restriction ratio of a hand */
  readonly hands: { readonly worstFlux: number; readonly handRatio: number };
  readonly supply: { readonly current: number; readonly verdict: string };
}

const SUPPLY = 5;
const LOWER = 0.004; // m: every second coil of the row sits one board layer lower, so neighbouring windings cross without touching
const GEM_TURNS = 120;
const ON_RESISTANCE = 0.5; // Ω per switch (demo)
const Z = 0.013; // m: a replica's coil centre above the coils (10 mm shelf, 3 mm into the replica)
const SHELF = { x: 0.3, y: 0.06 }; // m: half-width and half-depth of the shelf (60 cm × 12 cm)
const q = formatQuantity;
const pct = (x: number, digits = 1): string => `${(100 * x).toFixed(digits)} %`;

/** Runs the scenario: returns the worked notebook and its numbers. */
export async function run(options: ScenarioOptions = {}): Promise<{ notebook: Notebook; results: MuseumShelfResults }> {
  const nb = notebook("Museum shelf", {
    subtitle: "Replica coins and gems that glow anywhere on a 60 cm shelf: one coil or an array, yield, hands, supply",
    note: "Demo data: the shelf, the coils, the replicas and the parts are our own invention, not a product.",
    log: options.log,
  });
  const coil = roundCoil({ meanRadius: "60 mm", turns: 8, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
  const buildGem = (turns: number) => roundCoil({ innerRadius: "5 mm", turns, layers: 6, wire: { diameter: "0.08 mm", insulation: "0.008 mm" } });
  const replicas = {
    coin: { coil: roundCoil({ innerRadius: "7 mm", turns: 40, layers: 2, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } }), colour: "yellow" as LedColour, size: 0.025 },
    gem: { coil: buildGem(GEM_TURNS), colour: "red" as LedColour, size: 0.016 },
  };
  const F0 = 200e3;
  const gemTank = tuneWithStandardParts(selfInductance(replicas.gem.coil, { frequency: F0 }), F0, { series: "E24", maxParts: 1 }).choices[0]!;
  const f = gemTank.frequency; // the shelf runs at the gems' resonance; the coins are tuned to it with two E24 parts
  const coinTank = tuneWithStandardParts(selfInductance(replicas.coin.coil, { frequency: f }), f, { series: "E24", maxParts: 2 }).choices[0]!;
  const tank = { coin: coinTank, gem: gemTank };
  const coilTank = tuneWithStandardParts(selfInductance(coil, { frequency: f }), f, { series: "E12", maxParts: 2 }).choices[0]!;
  const transmitter = (x: number, phaseDeg: number, i: number) => ({
    label: `coil ${i + 1}`,
    coil,
    pose: { position: [x, 0, i % 2 === 1 ? -LOWER : 0] as Vec3 },
    compensation: "series" as const,
    capacitor: { capacitance: coilTank.capacitance, dissipationFactor: 1e-3, rating: 100 },
    drive: { kind: "halfBridge" as const, supply: SUPPLY, onResistance: ON_RESISTANCE },
    phase: (phaseDeg * Math.PI) / 180,
  });
  const receiver = (kind: "coin" | "gem", at: Vec3, over: { capacitance?: number; coil?: ReturnType<typeof buildGem> } = {}) => ({
    label: kind,
    coil: over.coil ?? replicas[kind].coil,
    pose: { position: at },
    topology: "parallel" as const,
    capacitor: { capacitance: over.capacitance ?? tank[kind].capacitance, dissipationFactor: 1e-3, rating: 50 },
    load: { kind: "led" as const, led: ledPreset(replicas[kind].colour) },
  });
  nb.text(
    `Shelf 60 cm × 12 cm, 10 mm thick. Coils: 8 turns of 0.8 mm wire, 60 mm mean radius, series-tuned, each on a half bridge from ${SUPPLY} V (${ON_RESISTANCE} Ω per switch).`,
    `In the row, every second coil sits ${q(LOWER, "m")} lower (the next board layer): coils ${q(0.12, "m")} apart with a 60 mm radius would otherwise touch, and touching windings have no physical mutual inductance.`,
    `Replica coin: 40 turns of 0.1 mm wire in 2 layers on a 7 mm former, a yellow LED. Gem: 120 turns of 0.08 mm wire in 6 layers on a 5 mm former, a red LED.`,
    `The shelf runs at the gems' E24-tuned resonance, ${q(f, "Hz")}. Lit: ≥ ${q(DEFAULT_LIT_THRESHOLD, "A")} (trade practice for an indicator LED seen indoors).`,
  );

  // ── 1. One coil ─────────────────────────────────────────────────────────────
  nb.heading("1. One coil under the middle of the shelf");
  nb.step("coverage map of the shelf with one coil");
  const one: LinkSystem = { frequency: f, transmitter: transmitter(0, 0, 0), receivers: [receiver("gem", [0, 0, Z])] };
  const map = await coverageMap(one, { x: { from: -SHELF.x, to: SHELF.x, step: "20 mm" }, y: { from: -SHELF.y, to: SHELF.y, step: "20 mm" }, z: Z });
  const xs = Array.from(map.axes[0]!.values);
  const ys = Array.from(map.axes[1]!.values);
  const rows = ys.map((_y, r) => xs.map((_x, c) => map.ledCurrent[c + xs.length * r]!));
  const zones = map.deadZones.flatMap((d) => (d.kind === "polygon" && d.area > 0 ? [d.vertices.map((v) => [v[0], v[1]] as [number, number])] : []));
  nb.figure(
    "one-coil",
    chart.coverage({ title: "A gem on the shelf over one coil", x: xs, y: ys, current: rows, threshold: DEFAULT_LIT_THRESHOLD, deadZones: zones, yName: "depth" }),
    "LED current of a gem anywhere on the shelf over one 60 mm coil (coverageMap, refined at the lit boundary); outlined: dead zones",
  );
  nb.text(
    `One coil lights ${pct(map.litFraction)} of the shelf (coverageMap: ${map.guarantee}). It leaves ${zones.length} dead zone${zones.length === 1 ? "" : "s"}: the ring over its`,
    "winding, where the vertical field changes sign, and both ends of the shelf, beyond its reach. A bigger coil would reach further but",
    "weaken the field everywhere (the same ampere-turns spread over more area): a row of coils is the usual answer.",
  );

  // ── 2. An array ─────────────────────────────────────────────────────────────
  nb.heading("2. A row of coils");
  const COUNT = 5;
  const PITCH = (2 * SHELF.x) / COUNT;
  const centres = Array.from({ length: COUNT }, (_, i) => -SHELF.x + PITCH / 2 + i * PITCH);
  const phases = centres.map((_c, i) => (i % 2) * 90); // neighbours in quadrature: their fields cannot cancel together
  const row = (pieces: ReturnType<typeof receiver>[]): LinkSystem => ({ frequency: f, transmitters: centres.map((x, i) => transmitter(x, phases[i]!, i)), receivers: pieces });
  const tick = nb.step("maps of the shelf with the row of coils");
  // coverageMap with the five coils in one network, every node a full link solve (no refinement:
  // both replicas are judged on the same 20 mm grid)
  const region = { x: { from: -SHELF.x, to: SHELF.x, step: "20 mm" }, y: { from: -SHELF.y, to: SHELF.y, step: "20 mm" }, z: Z };
  const arrayMap = async (kind: "coin" | "gem", k: number) => {
    tick(k, 2);
    return await coverageMap(row([receiver(kind, [0, 0, Z])]), region, { refine: false });
  };
  const cover = { coin: await arrayMap("coin", 1), gem: await arrayMap("gem", 2) };
  const gx = Array.from(cover.gem.axes[0]!.values);
  const gy = Array.from(cover.gem.axes[1]!.values);
  const maps = { coin: gy.map((_y, r) => gx.map((_x, c) => cover.coin.ledCurrent[c + gx.length * r]!)), gem: gy.map((_y, r) => gx.map((_x, c) => cover.gem.ledCurrent[c + gx.length * r]!)) };
  const share = (m: number[][]) => m.flat().filter((v) => v >= DEFAULT_LIT_THRESHOLD).length / m.flat().length;
  const weakest = (m: number[][]) => Math.min(...m.flat());
  nb.figure(
    "shelf-array",
    chart.coverage({ title: `A gem on the shelf over a row of ${COUNT} coils, neighbours 90° apart`, x: gx, y: gy, current: maps.gem, threshold: DEFAULT_LIT_THRESHOLD, yName: "depth" }),
    `LED current of a gem anywhere on the shelf over ${COUNT} coils ${q(PITCH, "m")} apart, neighbours driven 90° apart`,
  );
  nb.table(
    ["replica", "lit share of the shelf", "weakest LED current"],
    (["coin", "gem"] as const).map((k) => [`${k} (${replicas[k].colour} LED)`, pct(share(maps[k])), { value: weakest(maps[k]), unit: "A" }]),
    `a ${gx.length} × ${gy.length} grid over the shelf (20 mm steps), every point a full link solve with the ${COUNT} coils`,
  );
  // display spots: the coils' centres and the points midway between them, on the shelf's middle line
  const spots = [...centres, ...centres.slice(1).map((c) => c - PITCH / 2)].sort((a, b) => a - b);
  const spotCurrent = spots.map((x) => solveLink(row([receiver("gem", [x, 0, Z])])).receivers[0]!.leds[0]!.averageCurrent);
  nb.text(
    `${COUNT} coils ${q(PITCH, "m")} apart light ${pct(share(maps.gem))} of the shelf for a gem (one coil: ${pct(map.litFraction)}). Neighbours driven 90° apart keep the`,
    "seams between coils lit — a flat replica there sees two fields in quadrature, which cannot cancel together — but the rings right over each",
    "winding and the shelf's front and back edges stay dark where the neighbour's field is too weak to fill them. So the shelf gets marked",
    `display spots: the coils' centres and the points between them (${spots.length} spots), where the gem's LED carries at least ${q(Math.min(...spotCurrent), "A")}.`,
  );

  // ── 3. Batch yield of the gems ────────────────────────────────────────────────
  nb.heading("3. What fraction of a batch of gems lights on every spot");
  const weakSpot = spots[spotCurrent.indexOf(Math.min(...spotCurrent))]!;
  const weakPoint: Vec3 = [weakSpot, 0, Z];
  let seed = 77;
  const rnd = (): number => {
    seed = (seed + 0x6d2b79f5) >>> 0; // mulberry32 (public domain)
    let t = seed;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const BATCH = 200;
  const coils = new Map<number, ReturnType<typeof buildGem>>();
  const currents: number[] = [];
  nb.step("200 gems at the weakest display spot");
  for (let i = 0; i < BATCH; i++) {
    const turns = GEM_TURNS + Math.floor(rnd() * 5) - 2;
    const g = coils.get(turns) ?? buildGem(turns);
    coils.set(turns, g);
    currents.push(solveLink(row([receiver("gem", weakPoint, { capacitance: gemTank.capacitance * (1 + 0.05 * (2 * rnd() - 1)), coil: g })])).receivers[0]!.leds[0]!.averageCurrent);
  }
  const lit = currents.filter((c) => c >= DEFAULT_LIT_THRESHOLD).length;
  const interval = wilsonInterval(lit, BATCH);
  nb.figure(
    "gem-batch",
    chart.yieldHistogram({ title: "200 gems at the weakest display spot", samples: currents, threshold: DEFAULT_LIT_THRESHOLD }),
    "LED current of 200 gems (E24 capacitor ±5 %, ±2 turns, drawn and each solved over the row of coils) on the display spot where the nominal gem is weakest",
  );
  nb.text(
    `${lit} of ${BATCH} gems light on the spot at x = ${q(weakPoint[0], "m")}, the weakest display spot for the nominal gem: ${pct(lit / BATCH)}, 95 % Wilson interval`,
    `${pct(interval.lower)} … ${pct(interval.upper)}. (The batch functions take one transmitter; with ${COUNT} coils the gems were drawn and solved one by one, seeded.)`,
  );

  // ── 4. Visitors' hands, supply ─────────────────────────────────────────────────
  const full = row([receiver("coin", [spots[0]!, 0, Z]), receiver("gem", [spots[2]!, 0, Z]), receiver("coin", [spots[4]!, 0, Z]), receiver("gem", [spots[6]!, 0, Z])]);
  const solved = solveLink(full);
  const verdict = supplyVerdict({ voltage: SUPPLY, current: solved.power.input / SUPPLY }, { kind: "bench", voltage: SUPPLY, current: 4, label: "5 V 4 A adapter" });
  nb.heading("4. Supply");
  nb.text(`The row of coils with four replicas on the shelf ${verdict.message}, verdict: ${verdict.verdict} (${verdict.ratingSource}).`);
  nb.step("exposure for visitors' hands, emission, stress and metal heating");
  const safety = safetyReport(designFromLink(full, solved, { surfaceHeight: 0.01, tokenSize: [0.025, 0.014, 0.025, 0.014] }));
  const safetyCautions = addSafetySections(nb, safety);
  const hand = safety.exposure.basicRestriction.find((b) => b.population === "public" && /hand/.test(b.text));
  nb.text(
    `Visitors' hands rest on the shelf: the worst accessible field is ${q(safety.exposure.worst.flux, "T")} RMS at the shelf's surface; the field induced in a hand-sized disc`,
    `there is ${hand?.ratio !== undefined ? `${(100 * hand.ratio).toFixed(0)} % of` : "compared with"} the ICNIRP 2010 general-public basic restriction (an estimate; see the exposure section).`,
  );
  if (safety.attention.length > 0) nb.text("Needs attention:", ...safety.attention.map((a) => `- ${a}`));
  nb.parts(
    partsList({
      coils: [
        { item: "shelf coil", coil, quantity: 3 },
        { item: "replica coin coil", coil: replicas.coin.coil },
        { item: "gem coil", coil: replicas.gem.coil },
      ],
      capacitors: [
        { item: "shelf coil tank capacitor", parts: coilTank.parts, topology: coilTank.topology, series: "E12", peakVoltage: Math.max(...(solved.transmitters ?? [solved.transmitter]).map((t) => t.capacitorVoltage)), quantity: 3 },
        { item: "coin tank capacitor", parts: coinTank.parts, topology: coinTank.topology, series: "E24", peakVoltage: solved.receivers[0]!.capacitorVoltage },
        { item: "gem tank capacitor", parts: gemTank.parts, topology: gemTank.topology, series: "E24", peakVoltage: solved.receivers[1]!.capacitorVoltage },
      ],
      leds: [
        { item: "coin LED", colour: "yellow" },
        { item: "gem LED", colour: "blue" },
      ],
      supply: { item: "supply", voltage: SUPPLY, current: verdict.current, rating: verdict.rating },
    }),
  );
  nb.cautions([
    "Replica gems of 16 mm are small enough to swallow: keep the shelf out of young children's reach or use larger replicas.",
    ...new Set([...solved.cautions, ...safetyCautions]),
  ]);

  return {
    notebook: nb,
    results: {
      frequency: f,
      single: { litShare: map.litFraction, deadZones: zones.length, weakest: map.weakest.current },
      array: { coils: COUNT, spots: spots.length, weakestSpot: Math.min(...spotCurrent), litShare: { coin: share(maps.coin), gem: share(maps.gem) }, weakest: { coin: weakest(maps.coin), gem: weakest(maps.gem) } },
      batch: { lit, count: BATCH, lower: interval.lower, upper: interval.upper },
      hands: { worstFlux: safety.exposure.worst.flux, handRatio: hand?.ratio ?? Number.NaN },
      supply: { current: verdict.current, verdict: verdict.verdict },
    },
  };
}

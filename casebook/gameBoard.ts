/**
 * Casebook — "Game board": 24 glowing pieces on a 40 cm board.
 *
 * A draughts set whose 24 pieces glow wherever they stand: each piece hides a 60-turn coil on a
 * 10 mm former, one capacitor and a red LED. Under the 40 cm × 40 cm board (8 mm thick) lie four
 * 190 mm square spiral tiles, each on its own half bridge from 5 V. How should the tiles be
 * phased — or switched in turn — so that no square is dark, how much do 24 neighbours detune
 * each other, does a piece still glow when a player lifts and tilts it, and what fraction of a
 * batch of pieces lights everywhere on the board?
 *
 * Demo data: the board, the tiles, the pieces and the parts are our own invention.
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
  qualityFactor,
  rectSpiral,
  roundCoil,
  safetyReport,
  searchDesign,
  selfInductance,
  solveLink,
  solveLinkSequence,
  supplyVerdict,
  tuneWithStandardParts,
  wilsonInterval,
  type DesignSearch,
  type LinkSystem,
  type Notebook,
  type Vec3,
} from "../lib/mod.ts";
import type { ScenarioOptions } from "./scenarios.ts";

/** One way of running the four tiles, over the whole board. */
export interface DriveScheme {
  readonly label: string;
  /** lit share of the map's points */
  readonly litShare: number;
  /** weakest LED current on the map, A, and where */
  readonly weakest: number;
  readonly weakestAt: readonly [number, number];
  /** DC supply current, A (the four drives, the piece at the board's centre) */
  readonly supply: number;
}

/** What the run computes (SI units). */
export interface GameBoardResults {
  readonly frequency: number;
  readonly schemes: readonly DriveScheme[];
  readonly chosen: string;
  /** per piece of the starting position: LED current alone on the board and among the 24, A */
  readonly neighbours: readonly { square: string; alone: number; together: number }[];
  /** LED current of a lifted piece against its tilt, A */
  readonly tilt: readonly { degrees: number; current: number }[];
  /** the batch at the board's weakest point */
  readonly batch: { readonly lit: number; readonly count: number; readonly lower: number; readonly upper: number };
  readonly supply: { readonly current: number; readonly verdict: string };
  /** "what should I build instead": searchDesign over round coils and arrays of them */
  readonly search: DesignSearch;
}

const SUPPLY = 5;
const BOARD = 0.4; // m, square
const PIECE_Z = 0.012; // m: a standing piece's coil centre above the tiles (8 mm board, 4 mm into the piece)
const TILE_CENTRES: readonly (readonly [number, number])[] = [[-0.1, -0.1], [0.1, -0.1], [-0.1, 0.1], [0.1, 0.1]];
const q = formatQuantity;
/** share of the playing area the searched design must light, and the search's evaluation budget */
const SEARCH_SHARE = 0.95;
const SEARCH_BUDGET = 40;
const pct = (x: number, digits = 1): string => `${(100 * x).toFixed(digits)} %`;

/** Runs the scenario: returns the worked notebook and its numbers. */
export async function run(options: ScenarioOptions = {}): Promise<{ notebook: Notebook; results: GameBoardResults }> {
  const nb = notebook("Game board", {
    subtitle: "24 glowing pieces on a 40 cm board: tile phasing, neighbours, tilt and batch yield",
    note: "Demo data: the board, the tiles, the pieces and the parts are our own invention, not a product.",
    log: options.log,
  });
  const tile = rectSpiral({ outerWidth: "190 mm", outerHeight: "190 mm", turns: 4, pitch: "8 mm", wire: { diameter: "1 mm" } });
  const build = (turns: number) => roundCoil({ innerRadius: "10 mm", turns, layers: 4, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
  const piece = build(60);
  const L2 = selfInductance(piece, { frequency: 200e3 });
  const pieceTank = tuneWithStandardParts(L2, 200e3, { series: "E24", maxParts: 1 }).choices[0]!;
  const f = pieceTank.frequency;
  const tileTank = tuneWithStandardParts(selfInductance(tile, { frequency: f }), f, { series: "E12", maxParts: 2 }).choices[0]!;
  const onResistance = 2; // Ω per switch: a small half-bridge driver (demo)

  /** the board: tiles with their phases (deg) — or only one tile driven (sequencing), the others held low — and pieces */
  const system = (phases: readonly number[] | { only: number }, pieces: readonly { at: Vec3; axis?: Vec3; capacitance?: number; coil?: typeof piece }[]): LinkSystem => ({
    frequency: f,
    transmitters: TILE_CENTRES.map(([x, y], i) => ({
      label: `tile ${i + 1}`,
      coil: tile,
      pose: { position: [x, y, 0] },
      compensation: "series",
      capacitor: { capacitance: tileTank.capacitance, dissipationFactor: 1e-3, rating: 100 },
      // a tile that is off in its time slot: its half bridge holds the low switch on (0 V behind R_on)
      drive: Array.isArray(phases) || (phases as { only: number }).only === i ? { kind: "halfBridge", supply: SUPPLY, onResistance } : { kind: "sine", amplitude: 0, outputResistance: onResistance },
      phase: Array.isArray(phases) ? (phases[i]! * Math.PI) / 180 : 0,
    })),
    receivers: pieces.map((p, k) => ({
      label: `piece ${k + 1}`,
      coil: p.coil ?? piece,
      pose: { position: p.at, ...(p.axis ? { axis: p.axis } : {}) },
      topology: "parallel",
      capacitor: { capacitance: p.capacitance ?? pieceTank.capacitance, dissipationFactor: 1e-3, rating: 50 },
      load: { kind: "led", led: ledPreset("red") },
    })),
  });
  const ledOf = (s: LinkSystem): number[] => solveLink(s).receivers.map((r) => r.leds[0]!.averageCurrent);

  nb.text(
    `Four 190 mm square spirals (4 turns of 1 mm wire, L = ${q(selfInductance(tile, { frequency: f }), "H")}, Q = ${qualityFactor(tile, f).toFixed(0)}) under an 8 mm board, each series-tuned and on its own half bridge`,
    `from ${SUPPLY} V (${onResistance} Ω per switch). Pieces: 60 turns of 0.1 mm wire in 4 layers on a 10 mm former, an E24 capacitor (${q(pieceTank.capacitance, "F")}) and a red LED;`,
    `the board runs at the pieces' resonance, ${q(f, "Hz")}. Lit: ≥ ${q(DEFAULT_LIT_THRESHOLD, "A")} (trade practice for an indicator LED seen indoors).`,
  );

  // ── 1. Phasing or sequencing ─────────────────────────────────────────────────
  nb.heading("1. Phasing the tiles, or switching them in turn");
  // the playing area: the 8 × 8 squares of 50 mm, a piece's centre at most 175 mm from the board's centre
  const N = 15;
  const PLAY = 0.175;
  const grid = Array.from({ length: N }, (_, i) => -PLAY + (i * 2 * PLAY) / (N - 1));
  const schemes: { label: string; phases: readonly number[] | "sequence" }[] = [
    { label: "all in phase", phases: [0, 0, 0, 0] },
    { label: "alternate 0°/180°", phases: [0, 180, 180, 0] },
    { label: "quadrature 0°/90°", phases: [0, 90, 90, 0] },
    { label: "one tile at a time (¼ duty each)", phases: "sequence" },
  ];
  const tick = nb.step("maps of the board for each scheme");
  // the phased schemes: coverageMap over the grid with the four tiles in one network (every
  // node a full link solve; no refinement, so every scheme is judged on the same points)
  const region = { x: { from: -PLAY, to: PLAY, points: N }, y: { from: -PLAY, to: PLAY, points: N }, z: PIECE_Z };
  // switching in turn: solveLinkSequence, each tile alone a quarter of the time, the others held
  // low by their half bridges (a closed tank that still couples); the LED's average over the slots
  const sequenced = (pieces: Parameters<typeof system>[1]) => solveLinkSequence(system([0, 0, 0, 0], pieces), { steps: "scan", idle: "held" });
  const maps: number[][][] = [];
  const results: DriveScheme[] = [];
  for (const [si, sc] of schemes.entries()) {
    tick(si + 1, schemes.length);
    if (sc.phases !== "sequence") {
      const m = await coverageMap(system(sc.phases, [{ at: [0, 0, PIECE_Z] }]), region, { refine: false });
      maps.push(grid.map((_y, r) => grid.map((_x, c) => m.ledCurrent[c + N * r]!)));
      const litShare = m.lit.reduce((a, v) => a + v, 0) / (N * N);
      const supply = solveLink(system(sc.phases, [{ at: [0, 0, PIECE_Z] }])).power.input / SUPPLY;
      results.push({ label: sc.label, litShare, weakest: m.weakest.current, weakestAt: [m.weakest.position[0], m.weakest.position[1]], supply });
      continue;
    }
    const m = grid.map((y) => grid.map((x) => sequenced([{ at: [x, y, PIECE_Z] }]).receivers[0]!.leds[0]!.averageCurrent));
    maps.push(m);
    let weakest = Infinity;
    let at: [number, number] = [0, 0];
    let lit = 0;
    m.forEach((row, r) =>
      row.forEach((v, c) => {
        if (v >= DEFAULT_LIT_THRESHOLD) lit++;
        // mirror-image squares differ only in the last bits, which differ between JavaScript
        // engines: a new weakest must be lower by more than 1e-9 (as coverageMap's), so Node and
        // Deno name the same square
        if (v < weakest * (1 - 1e-9)) {
          weakest = v;
          at = [grid[c]!, grid[r]!];
        } else if (v < weakest) weakest = v;
      }),
    );
    // the sequence's time-average input power: one drive on at a time
    const supply = sequenced([{ at: [0, 0, PIECE_Z] }]).power.input / SUPPLY;
    results.push({ label: sc.label, litShare: lit / (N * N), weakest, weakestAt: at, supply });
  }
  nb.table(
    ["scheme", "lit share of the board", "weakest LED current", "where (x, y)", "supply current (piece at the centre)"],
    results.map((r) => [r.label, pct(r.litShare), { value: r.weakest, unit: "A" }, `${q(r.weakestAt[0], "m")}, ${q(r.weakestAt[1], "m")}`, { value: r.supply, unit: "A" }]),
    `one piece standing anywhere on a ${N} × ${N} grid over the playing area (${q(2 * PLAY, "m")} square, 25 mm steps: square centres and corners; every point a full link solve with the four tiles)`,
  );
  const full = results.filter((r) => r.litShare === 1);
  const chosenScheme = (full.length > 0 ? full : results).reduce((a, b) => (b.weakest > a.weakest ? b : a));
  const ci = results.indexOf(chosenScheme);
  nb.figure(
    "board-coverage",
    chart.coverage({ title: `Where a piece glows: ${chosenScheme.label}`, x: grid, y: grid, current: maps[ci]!, threshold: DEFAULT_LIT_THRESHOLD }),
    "LED current of one piece standing anywhere on the board with the chosen scheme; dark cells are below the lit threshold, the pale line is the lit boundary",
  );
  const inPhase = results[0]!;
  nb.figure(
    "board-coverage-in-phase",
    chart.coverage({ title: "The same board with all tiles in phase", x: grid, y: grid, current: maps[0]!, threshold: DEFAULT_LIT_THRESHOLD }),
    "the same map with every tile in phase, for comparison",
  );
  // the alternating scheme refined: coverageMap follows the sign change of the net coupling
  // along the seams on a 3 mm sub-grid and outlines the dead lines as polygons
  const altIndex = schemes.findIndex((sc) => sc.label === "alternate 0°/180°");
  const altMap = await coverageMap(system(schemes[altIndex]!.phases as readonly number[], [{ at: [0, 0, PIECE_Z] }]), region, { resolution: "3 mm" });
  const altZones = altMap.deadZones.flatMap((d) => (d.kind === "polygon" && d.area > 0 ? [d.vertices.map((v) => [v[0], v[1]] as [number, number])] : []));
  nb.figure(
    "board-coverage-alternate",
    chart.coverage({ title: "Tiles alternating 0°/180°: dead lines on the seams", x: grid, y: grid, current: maps[altIndex]!, threshold: DEFAULT_LIT_THRESHOLD, deadZones: altZones }),
    `the alternating scheme, refined to 3 mm where the net coupling changes sign (coverageMap); outlined: its dead zones, ${pct(1 - altMap.litFraction)} of the playing area`,
  );
  nb.text(
    `Lit share: ${results.map((r) => `${r.label} ${pct(r.litShare)}`).join(", ")}.`,
    "Between tiles in phase, the neighbouring edges carry opposite currents and their fields add over the seam (pointing down): the vertical field changes",
    "sign inside each tile, near its edge. Alternating 0°/180° makes the neighbouring edges carry the same current and puts the null on the seam itself:",
    `refined to 3 mm, coverageMap outlines ${altZones.length} dead zone${altZones.length === 1 ? "" : "s"} along the seams, ${pct(1 - altMap.litFraction)} of the playing area (${altMap.solves} solves).`,
    "In quadrature a flat piece sees two fields 90° apart, which can cancel only where both vanish. Switching the tiles in turn avoids nulls between tiles",
    "but lights each piece a quarter of the time: its average current is a quarter of what one tile gives.",
    `Chosen by the map (${full.length > 0 ? "every point lit, then" : "no scheme lights every point: "} the highest weakest current): **${chosenScheme.label}**, weakest ${q(chosenScheme.weakest, "A")} at (${q(chosenScheme.weakestAt[0], "m")}, ${q(chosenScheme.weakestAt[1], "m")}).`,
  );
  const chosenPhases = schemes[ci]!.phases;
  const boardSystem = (pieces: Parameters<typeof system>[1]): LinkSystem => (chosenPhases === "sequence" ? system({ only: 0 }, pieces) : system(chosenPhases, pieces));

  // ── 2. Neighbours ────────────────────────────────────────────────────────────
  nb.heading("2. Twenty-four neighbours detune each other");
  const squares: { square: string; at: Vec3 }[] = [];
  for (let row = 0; row < 8; row++) {
    if (row >= 3 && row <= 4) continue;
    for (let col = 0; col < 8; col++) {
      if ((row + col) % 2 === 0) squares.push({ square: `${"abcdefgh"[col]}${row + 1}`, at: [-0.175 + col * 0.05, -0.175 + row * 0.05, PIECE_Z] });
    }
  }
  nb.step("the starting position: 24 pieces together and each alone");
  const together = ledOf(boardSystem(squares.map((s) => ({ at: s.at }))));
  const alone = squares.map((s) => ledOf(boardSystem([{ at: s.at }]))[0]!);
  const neighbours = squares.map((s, i) => ({ square: s.square, alone: alone[i]!, together: together[i]! }));
  const change = neighbours.map((n) => n.together / n.alone - 1);
  const worstIdx = change.reduce((w, c, i) => (Math.abs(c) > Math.abs(change[w]!) ? i : w), 0);
  nb.table(
    ["square", "alone on the board", "among the 24", "change"],
    neighbours
      .map((n, i) => ({ n, c: change[i]! }))
      // changes equal to 1e-9 (mirror-image squares) keep board order, the same under Node and Deno
      .sort((a, b) => Math.round(Math.abs(b.c) * 1e9) - Math.round(Math.abs(a.c) * 1e9))
      .slice(0, 6)
      .map(({ n, c }) => [n.square, { value: n.alone, unit: "A" }, { value: n.together, unit: "A" }, `${c >= 0 ? "+" : "−"}${pct(Math.abs(c))}`]),
    "the six pieces of the starting position (5 cm squares, dark squares of rows 1–3 and 6–8) that change most when all 24 stand together",
  );
  nb.text(
    `Pieces 7 cm apart (diagonal neighbours) couple weakly, but each is a resonant tank: together they shift one another's resonance and share the field.`,
    `The largest change is ${change[worstIdx]! >= 0 ? "+" : "−"}${pct(Math.abs(change[worstIdx]!))} (square ${neighbours[worstIdx]!.square}); every piece stays ${together.every((t) => t >= DEFAULT_LIT_THRESHOLD) ? "lit" : "— not every piece stays lit"}.`,
  );

  // ── 3. A piece picked up ──────────────────────────────────────────────────────
  nb.heading("3. A piece lifted and tilted");
  const lift: Vec3 = [chosenScheme.weakestAt[0], chosenScheme.weakestAt[1], 0.03];
  const tilts = [0, 15, 30, 45, 60, 75, 90];
  const tiltRows = tilts.map((d) => {
    const a = (d * Math.PI) / 180;
    return { degrees: d, current: ledOf(boardSystem([{ at: lift, axis: [Math.sin(a), 0, Math.cos(a)] }]))[0]! };
  });
  const centreLift = tilts.map((d) => {
    const a = (d * Math.PI) / 180;
    return ledOf(boardSystem([{ at: [-0.1, -0.1, 0.03], axis: [Math.sin(a), 0, Math.cos(a)] }]))[0]!;
  });
  nb.figure(
    "piece-tilt",
    chart.ledCurrent({
      title: "A piece lifted 3 cm and tilted",
      curves: [
        { colour: "red", label: "over the weakest point", distance: tilts, current: tiltRows.map((t) => t.current) },
        { colour: "red-dark", label: "over a tile's centre", distance: tilts, current: centreLift },
      ],
      threshold: DEFAULT_LIT_THRESHOLD,
      distanceName: "tilt of the piece",
      distanceUnit: "°",
    }),
    "LED current of a piece held 30 mm above the board against its tilt: over a tile's centre the field is vertical and tilting dims it; elsewhere it has a horizontal part as well",
  );
  const lastLit = tiltRows.filter((t) => t.current >= DEFAULT_LIT_THRESHOLD).map((t) => t.degrees);
  const centreLit = tilts.filter((_d, i) => centreLift[i]! >= DEFAULT_LIT_THRESHOLD);
  nb.text(
    `Held 3 cm up over the board's weakest point the piece ${lastLit.length > 0 ? `glows at tilts of ${lastLit.map((d) => `${d}°`).join(", ")}` : "is dark at every tilt"};`,
    `over a tile's centre it ${centreLit.length > 0 ? `glows up to ${centreLit[centreLit.length - 1]}°` : "is dark too"}. A piece in the hand is a bonus, not a promise.`,
  );

  // ── 4. Batch yield ───────────────────────────────────────────────────────────
  nb.heading("4. What fraction of a batch lights everywhere");
  const BATCH = 200;
  let seed = 4242 >>> 0;
  const rnd = (): number => {
    seed = (seed + 0x6d2b79f5) >>> 0; // mulberry32 (public domain)
    let t = seed;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const coils = new Map<number, typeof piece>();
  const weakPoint: Vec3 = [chosenScheme.weakestAt[0], chosenScheme.weakestAt[1], PIECE_Z];
  nb.step("a batch of 200 pieces at the weakest point");
  let litCount = 0;
  const currents: number[] = [];
  for (let i = 0; i < BATCH; i++) {
    const c = pieceTank.capacitance * (1 + 0.05 * (2 * rnd() - 1)); // E24, ±5 %
    const turns = 60 + Math.floor(rnd() * 5) - 2; // wound by machine count ±2
    const coil = coils.get(turns) ?? build(turns);
    coils.set(turns, coil);
    const I = ledOf(boardSystem([{ at: weakPoint, capacitance: c, coil }]))[0]!;
    currents.push(I);
    if (I >= DEFAULT_LIT_THRESHOLD) litCount++;
  }
  const interval = wilsonInterval(litCount, BATCH);
  nb.figure(
    "batch-at-weakest",
    chart.yieldHistogram({ title: "200 pieces at the board's weakest point", samples: currents, threshold: DEFAULT_LIT_THRESHOLD }),
    "LED current of 200 pieces (E24 capacitor ±5 %, ±2 turns, drawn and each solved on the board) at the weakest point of the chosen scheme",
  );
  nb.text(
    `${litCount} of ${BATCH} pieces light at the board's weakest point (${pct(litCount / BATCH)}, 95 % Wilson interval ${pct(interval.lower)} … ${pct(interval.upper)}).`,
    "The nominal map's weakest point stands for the board: a piece lit there is taken as lit everywhere at its standing height (an assumption — a",
    "detuned piece's own weakest point could lie elsewhere, but the map's other points give the nominal piece more current).",
    "The batch analysis functions take one transmitter; with four tiles the pieces were drawn and solved one by one (seeded).",
  );

  // ── 5. Supply and safety ──────────────────────────────────────────────────────
  const centre = solveLink(boardSystem([{ at: [0, 0, PIECE_Z] }]));
  const worstDraw = Math.max(chosenScheme.supply, solveLink(boardSystem(squares.map((s) => ({ at: s.at })))).power.input / SUPPLY);
  const verdict = supplyVerdict({ voltage: SUPPLY, current: worstDraw }, { kind: "bench", voltage: SUPPLY, current: 3, label: "5 V 3 A adapter" });
  nb.heading("5. Supply");
  nb.text(`All four tiles with the 24 pieces on the board: the board ${verdict.message}.`);
  nb.step("exposure, emission, stress and metal heating");
  const lying = boardSystem([{ at: [-0.1, -0.1, 0.01] }]);
  const safety = safetyReport(designFromLink(lying, solveLink(lying), { surfaceHeight: 0.008, tokenSize: 0.035 }));
  const safetyCautions = addSafetySections(nb, safety);
  if (safety.attention.length > 0) nb.text("Needs attention:", ...safety.attention.map((a) => `- ${a}`));
  nb.parts(
    partsList({
      coils: [
        { item: "board tile", coil: tile, quantity: 4 },
        { item: "piece coil", coil: piece, quantity: 24 },
      ],
      capacitors: [
        { item: "tile tank capacitor", parts: tileTank.parts, topology: tileTank.topology, series: "E12", peakVoltage: Math.max(...(centre.transmitters ?? [centre.transmitter]).map((t) => t.capacitorVoltage)), quantity: 4 },
        { item: "piece tank capacitor", parts: pieceTank.parts, topology: pieceTank.topology, series: "E24", peakVoltage: solveLink(lying).receivers[0]!.capacitorVoltage, quantity: 24 },
      ],
      leds: [{ item: "piece LED", colour: "red", quantity: 24 }],
      supply: { item: "supply", voltage: SUPPLY, current: verdict.current, rating: verdict.rating },
    }),
  );

  // ── 6. What to build instead ─────────────────────────────────────────────────
  nb.heading("6. What should I build instead?");
  nb.step("searchDesign: round coils and arrays of them, with the safety verdicts as requirements");
  const search = await searchDesign(
    {
      cover: { width: 2 * PLAY, depth: 2 * PLAY },
      barrier: "8 mm",
      token: { innerRadius: "10 mm", layers: 4, wire: "0.1 mm", size: "35 mm" },
      colours: ["red"],
      supply: { kind: "bench", voltage: SUPPLY, current: 3, label: "5 V 3 A adapter" },
      frequency: { min: "100 kHz", max: "250 kHz" },
      litShare: SEARCH_SHARE,
      exposure: { population: "public", assess: "basic restriction", margin: 6 },
      emission: { rules: ["47 CFR 15.209"], margin: 6 },
    },
    {
      radius: { min: "40 mm", max: "170 mm" },
      turns: { min: 6, max: 40 },
      wire: ["1 mm"],
      tokenTurns: { min: 40, max: 100 },
      layout: { rows: { min: 2, max: 3 }, columns: { min: 2, max: 3 }, phasing: ["quadrature", "alternate"] },
    },
    { maxEvaluations: SEARCH_BUDGET, onResistance, threads: 2 },
  );
  const best = search.designs[0]!;
  const layoutOf = (d: (typeof search.designs)[number]): string => {
    const l = d.candidate.layout;
    return l.rows * l.columns === 1 ? "one coil" : `${l.rows} × ${l.columns}, ${q(l.pitchX, "m")} pitch, ${l.phasing}`;
  };
  const db = (neper: number): string => (Number.isFinite(neper) ? `${(neper / (Math.LN10 / 20)).toFixed(1)} dB` : "not assessed");
  nb.table(
    ["rank", "coils", "each coil", "frequency", "piece turns", "lit on the required share", "supply", "exposure margin", "emission margin", "binds", "why it lost"],
    search.designs.map((d, i) => [
      String(i + 1),
      layoutOf(d),
      `r ${q(d.candidate.radius, "m")}, ${d.candidate.turns} turns`,
      { value: d.candidate.frequency, unit: "Hz" },
      String(d.candidate.tokenTurns),
      { value: d.coveredCurrent, unit: "A" },
      { value: d.supplyCurrent, unit: "A" },
      db(d.margins.exposure),
      db(d.margins.emission),
      d.binding,
      i === 0 ? "—" : d.lostBecause.split(":")[0]!,
    ]),
    `searchDesign (${search.evaluations} designs: coarse grid, then compass search; finalists re-mapped with coverageMap's refinement). Requirements: ${pct(SEARCH_SHARE, 0)} of the playing area lit, the 5 V 3 A adapter within 80 %, ICNIRP 2010's basic restriction for the public and the US emission rule (47 CFR 15.209: a game sold in the US) each with 6 dB to spare; space: 2 × 2 to 3 × 3 round coils tiling the board, in quadrature or alternating, 6–40 turns of 1 mm wire, 100–250 kHz, pieces of 40–100 turns. Exposure and emission margins are beyond the required 6 dB.`,
  );
  nb.text(
    search.feasible
      ? `Build instead: **${best.summary}**.`
      : `Nothing in the searched space meets every requirement: ${search.shortfall!.message}. The closest: ${best.summary}.`,
    `The four square tiles of this board light ${pct(chosenScheme.litShare)} of the grid in ${chosenScheme.label} from ${q(worstDraw, "A")}; emission and exposure were not part of their choice.`,
    `Exposure: ${best.exposure}. Emission: ${best.emission}.`,
    "The search's field and emission figures are estimates on coarse grids, not compliance tests; the design it recommends still needs its own map, yield and safety report (sections 1–5 for the tiles) and measurement.",
  );
  nb.cautions([
    "Game pieces of 35 mm pass the small-parts cylinder but their LEDs and capacitors must stay sealed inside: a broken piece is a small-parts hazard for young children.",
    ...new Set([...centre.cautions, ...safetyCautions, ...search.cautions]),
  ]);

  return {
    notebook: nb,
    results: {
      frequency: f,
      schemes: results,
      chosen: chosenScheme.label,
      neighbours,
      tilt: tiltRows,
      batch: { lit: litCount, count: BATCH, lower: interval.lower, upper: interval.upper },
      supply: { current: verdict.current, verdict: verdict.verdict },
      search,
    },
  };
}

/**
 * Casebook — "The pebble drawer": will every pebble glow, wherever a visitor puts it?
 *
 * A museum's hands-on drawer holds a dozen sealed resin "pebbles". Each hides a token: a
 * small wound coil, one capacitor and one LED (red or green). Under the drawer's 5 mm lid
 * sits one hand-sized transmitter coil, switched by a single transistor from a 5 V USB
 * supply. Visitors stack pebbles and hold them up to the light: how high does a pebble still
 * glow, how far from the centre can it slide, and does the colour matter?
 *
 * The run follows the chain the library computes: coil geometry → L, R, Q and
 * self-resonance from the models (no Q typed by hand) → capacitors from the E12 series →
 * the LED's operating point at every height and offset → the true waveform of the single
 * switch drive and how far the fast (describing-function) model can be trusted there.
 *
 * Demo data: the drawer, the coils and the parts are our own example, chosen as a real kit
 * could have them; only the physics is sourced (docs/methods.md).
 */
import {
  addSafetySections,
  addToken,
  chart,
  designFromLink,
  safetyReport,
  notebook,
  partsList,
  type Notebook,
  coilResistance,
  couplingFactor,
  DEFAULT_LIT_THRESHOLD,
  findRange,
  formatQuantity,
  ledPreset,
  mutualInductance,
  qualityFactor,
  roundCoil,
  selfInductance,
  selfResonance,
  simulate,
  singleSwitchDrive,
  solveLink,
  tokenLoadLine,
  tuneWithStandardParts,
  waveformHarmonics,
  type LedColour,
  type LinkSystem,
} from "../lib/mod.ts";
import type { ScenarioOptions } from "./scenarios.ts";

/** What the run computes, for the tests and for anyone reusing the numbers (SI units). */
export interface PebbleDrawerResults {
  readonly frequency: number;
  readonly transmitter: { inductance: number; resistance: number; quality: number; selfResonance: number; capacitance: number };
  readonly token: { inductance: number; resistance: number; quality: number; selfResonance: number; capacitance: number };
  /** on-axis LED average current by height, A */
  readonly profile: readonly { height: number; red: number; green: number }[];
  /** on-axis range at the lit threshold, m */
  readonly axialRange: Readonly<Record<"red" | "green", number>>;
  /** on-axis range of a red pebble at the just-visible end of the band (0.1 mA), m */
  readonly faintRange: number;
  /** sideways range lying on the lid, m */
  readonly sidewaysRange: Readonly<Record<"red" | "green", number>>;
  readonly litThreshold: number;
  readonly waveform: {
    /** switch-node peak / supply */
    peakOverSupply: number;
    /** total harmonic distortion of the switch-node voltage */
    distortion: number;
    /** LED average current at the check pose: transient engine and fast model, A */
    ledTransient: number;
    ledFast: number;
    checkHeight: number;
  };
  /** DC supply current, A: fast model at the check pose, time-domain run there, fast model on the lid */
  readonly supply: { fast: number; transient: number; onLid: number };
  /** peak voltage across the transmitter capacitor in the time-domain run, V */
  readonly transmitterCapacitorPeak: number;
  /** worst accessible RMS flux density, T, and the findings that need attention */
  readonly safety: {
    worstFlux: number;
    /** height above the lid from which the ICNIRP 2010 general-public reference level is met, m */
    publicLevelMetAbove: number;
    /** largest induced-field / basic-restriction ratio of the public discs (< 1: met) */
    basicRestrictionRatio: number;
    attention: readonly string[];
  };
  readonly cautions: readonly string[];
}

const SUPPLY = 5; // V, a USB supply (demo)
const LID = 0.005; // m: a pebble lying on the lid has its coil centre 5 mm above the winding
const COLOURS: Readonly<Record<"red" | "green", LedColour>> = { red: "red", green: "green-gap" };

/** Runs the scenario: returns the worked notebook and its numbers. */
export function run(options: ScenarioOptions = {}): { notebook: Notebook; results: PebbleDrawerResults } {
  const nb = notebook("The pebble drawer", {
    subtitle: "Will every pebble glow, wherever a visitor puts it?",
    note: "Demo data: the drawer, the coils and the parts are our own example, chosen as a real kit could have them; only the physics is sourced (docs/methods.md).",
    log: options.log,
  });
  const q = formatQuantity;

  // ── 1. Coils, from geometry ──────────────────────────────────────────────
  const tx = roundCoil({ meanRadius: "50 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
  const token = roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
  const target = 200e3; // Hz, the design frequency (demo)
  const L2 = selfInductance(token, { frequency: target });
  const tokenTuning = tuneWithStandardParts(L2, target, { series: "E12", maxParts: 1 });
  const tokenChoice = tokenTuning.choices[0]!;
  const C2 = tokenChoice.capacitance;
  const f = 1 / (2 * Math.PI * Math.sqrt(L2 * C2)); // the drawer is driven at the pebbles' resonance
  const L1 = selfInductance(tx, { frequency: f });
  // the single switch turns on at zero voltage when the transmitter tank rings about 1.3× faster
  // than the switching frequency (docs/methods/transient.md): tune it there with E12 parts
  const txTuning = tuneWithStandardParts(L1, 1.3 * f, { series: "E12", maxParts: 2 });
  const txChoice = txTuning.choices[0]!;
  const C1 = txChoice.capacitance;
  const txNumbers = {
    inductance: L1,
    resistance: coilResistance(tx, f),
    quality: qualityFactor(tx, f),
    selfResonance: selfResonance(tx),
    capacitance: C1,
  };
  const tokenNumbers = {
    inductance: L2,
    resistance: coilResistance(token, f),
    quality: qualityFactor(token, f),
    selfResonance: selfResonance(token),
    capacitance: C2,
  };
  const partsText = (c: typeof txChoice) => c.parts.map((p) => q(p, "F")).join(c.topology === "series" ? " in series with " : " ∥ ");
  nb.text("A 5 V single-switch transmitter under a 5 mm lid; resin pebbles with a 120-turn coil, one capacitor and one red or green LED.");
  nb.heading("1. Coils and tanks, from geometry");
  nb.table(
    ["", "transmitter", "pebble"],
    [
      ["winding", "5 turns, 0.8 mm wire, mean radius 50 mm", "120 turns in 6 layers, 0.1 mm wire, former radius 6.5 mm"],
      ["inductance", { value: L1, unit: "H" }, { value: L2, unit: "H" }],
      [`AC resistance at ${q(f, "Hz")}`, { value: txNumbers.resistance, unit: "Ω" }, { value: tokenNumbers.resistance, unit: "Ω" }],
      ["quality factor Q", Math.round(txNumbers.quality), Math.round(tokenNumbers.quality)],
      ["self-resonance", { value: txNumbers.selfResonance, unit: "Hz" }, { value: tokenNumbers.selfResonance, unit: "Hz" }],
      ["tank capacitor (E12)", `${q(C1, "F")} = ${partsText(txChoice)}`, `${q(C2, "F")} = ${partsText(tokenChoice)}`],
    ],
  );
  nb.text(
    `The pebble's E12 capacitor puts its resonance at ${q(f, "Hz")}; the drawer is switched there.`,
    `The transmitter capacitor rings the tank at ${q(1 / (2 * Math.PI * Math.sqrt(L1 * C1)), "Hz")}, about 1.3× the switching`,
    "frequency, where the single switch turns on at zero voltage. Q and resistance come from the",
    "loss models (skin and proximity effect), not from a guess.",
  );

  // ── 2. Brightness against height and offset ───────────────────────────────
  const system = (colour: LedColour, x: number, z: number): LinkSystem => ({
    frequency: f,
    transmitter: {
      coil: tx,
      compensation: "parallel",
      capacitor: { capacitance: C1, dissipationFactor: 1e-3 },
      drive: { kind: "parallelTank", supply: SUPPLY, onResistance: 0.05 },
    },
    receivers: [
      {
        coil: token,
        pose: { position: [x, 0, z] },
        topology: "parallel",
        capacitor: { capacitance: C2, dissipationFactor: 1e-3, rating: 50 },
        load: { kind: "led", led: ledPreset(colour) },
      },
    ],
  });
  const ledCurrent = (colour: LedColour, x: number, z: number): number =>
    solveLink(system(colour, x, z)).receivers[0]!.leds[0]!.averageCurrent;
  const threshold = DEFAULT_LIT_THRESHOLD;

  const tick = nb.step("brightness by height and offset");
  const heights = [0.005, 0.01, 0.02, 0.03, 0.04, 0.06, 0.08, 0.1, 0.12];
  const profile = heights.map((z, i) => {
    tick(i + 1, heights.length);
    return { height: z, red: ledCurrent("red", 0, z), green: ledCurrent(COLOURS.green, 0, z) };
  });

  // how far a pebble still glows: findRange scans outward and bisects each lit/unlit boundary
  // to 0.1 mm (bracketing and bisection; a sign change of M between scan points is a dark line)
  const axial = (colour: LedColour, litThreshold = threshold): number =>
    LID + findRange(system(colour, 0, 0), { from: [0, 0, LID], along: [0, 0, 1] }, { max: 0.3, litThreshold }).range;
  const axialRange = { red: axial("red"), green: axial(COLOURS.green) };
  // sliding on the lid: the lit patch around the centre ends where the flux first fails
  const sideways = (colour: LedColour): number =>
    findRange(system(colour, 0, 0), { from: [0, 0, LID], along: [1, 0, 0] }, { max: 0.2 }).range;
  const sidewaysRange = { red: sideways("red"), green: sideways(COLOURS.green) };
  // the just-visible end of the trade's visibility band (0.1 mA): how far a pebble glows faintly
  const faintThreshold = 0.1e-3;
  const faintRange = axial("red", faintThreshold);
  const near = solveLink(system("red", 0, LID));

  nb.heading("2. How bright, how far");
  nb.text(`LED average current on the axis above the centre (lit: ≥ ${q(threshold, "A")}, trade practice for an indicator LED seen indoors):`);
  nb.table(
    ["height", "red LED", "green (GaP) LED"],
    profile.map((p) => [
      { value: p.height, unit: "m" },
      `${q(p.red, "A")}${p.red >= threshold ? "" : " (dark)"}`,
      `${q(p.green, "A")}${p.green >= threshold ? "" : " (dark)"}`,
    ]),
  );
  nb.figure(
    "led-current-by-height",
    chart.ledCurrent({
      title: "Pebble LED current above the drawer's centre",
      curves: [
        { colour: "red", label: "red LED", distance: heights, current: profile.map((p) => p.red) },
        { colour: "green", label: "green (GaP) LED", distance: heights, current: profile.map((p) => p.green) },
      ],
      threshold,
    }),
    "LED average current against height on the axis; the dashed line is the lit threshold",
  );
  const offsets = Array.from({ length: 13 }, (_, i) => i * 0.01);
  const kAt = (x: number, z: number): number => couplingFactor(tx, { position: [0, 0, 0] }, token, { position: [x, 0, z] });
  nb.figure(
    "coupling",
    chart.coupling({
      title: "Coupling between the drawer coil and a pebble",
      byHeight: [{ label: "on the axis", distance: heights, k: heights.map((z) => kAt(0, z)) }],
      byOffset: [{ label: "lying on the lid", distance: offsets, k: offsets.map((x) => kAt(x, LID)) }],
    }),
    "coupling factor against height on the axis (left) and against sideways offset for a pebble lying on the lid (right): the sign change near the 50 mm winding radius is the dark ring",
  );
  nb.text(
    `- On the axis a red pebble glows up to ${q(axialRange.red, "m")}, a green one up to ${q(axialRange.green, "m")} (findRange, to 0.1 mm):`,
    "  the lower forward voltage of the red LED clamps its tank lower and starts conducting in a weaker field.",
    `  Just visible (${q(faintThreshold, "A")}), a red pebble still glows faintly at ${q(faintRange, "m")}.`,
    `- Lying on the lid, a red pebble stays lit out to ${q(sidewaysRange.red, "m")} from the centre (green ${q(sidewaysRange.green, "m")});`,
    "  near the winding radius the flux through a flat pebble reverses and passes through zero,",
    "  so a dark ring lies at the drawer's 50 mm winding radius. Keep the display area inside it.",
    `- Right on the lid over the centre the pebble's tank swings ${q(near.receivers[0]!.capacitorVoltage, "V")} peak and the transmitter`,
    `  capacitor ${q(near.transmitter.capacitorVoltage, "V")} peak; the transmitter coil carries ${q(near.transmitter.coilCurrentRms, "A")} RMS.`,
  );

  // ── 3. The LED on the pebble's tank (load line) ───────────────────────────
  const checkHeight = 0.03;
  const at = solveLink(system("red", 0, checkHeight));
  const M = mutualInductance(tx, { position: [0, 0, 0] }, token, { position: [0, 0, checkHeight] });
  const line = tokenLoadLine({
    frequency: f,
    mutualInductance: M,
    transmitterCurrent: at.transmitter.coilCurrent,
    inductance: L2,
    resistance: tokenNumbers.resistance,
    capacitance: C2,
    load: { kind: "led", led: ledPreset("red") },
  });
  nb.heading("3. Where the LED settles on the pebble's tank");
  nb.figure(
    "load-line",
    chart.loadLine({
      title: `Red pebble ${q(checkHeight, "m")} above the centre`,
      voltage: line.voltage,
      available: line.available,
      led: line.load,
      operatingPoint: { voltage: at.receivers[0]!.loadVoltage, current: at.receivers[0]!.loadCurrent },
      colour: "red",
    }),
    "the current the tank can still give the LED at each voltage amplitude, against the LED's own fundamental current; the solver's operating point sits where they cross",
  );
  nb.text(
    `The coil's EMF, seen through its own impedance, is a current source of ${q(line.norton, "A")} peak in parallel with the tank.`,
    `The LED takes almost nothing until its forward voltage and then clamps the tank near ${q(at.receivers[0]!.loadVoltage, "V")} peak:`,
    "a stronger field raises the LED current, hardly the voltage.",
  );

  // ── 4. The true waveform ──────────────────────────────────────────────────
  const drive = singleSwitchDrive({
    supply: SUPPLY,
    frequency: f,
    coilInductance: L1,
    coilResistance: txNumbers.resistance,
    tankCapacitance: C1,
    onResistance: 0.05,
  });
  const tok = addToken(drive.circuit, {
    coupledTo: drive.coil,
    mutualInductance: M,
    inductance: L2,
    resistance: tokenNumbers.resistance,
    capacitance: C2,
    load: { kind: "led", led: ledPreset("red") },
  });
  const stepsPerCycle = 200;
  nb.step("time-domain run of the single-switch drive");
  const sim = simulate(tok.circuit, { stop: 800 / f, stepsPerCycle, frequency: f, untilSteady: true, keepCycles: 2 });
  const vsw = sim.nodeVoltages["switch"]!;
  const h = waveformHarmonics(sim.time, vsw, { frequency: f });
  const iled = sim.currents[tok.leds.led!]!;
  const isup = sim.currents["Vsupply"]!;
  let ledTransient = 0;
  let supplyTransient = 0;
  for (let i = iled.length - stepsPerCycle; i < iled.length; i++) {
    ledTransient += iled[i]! / stepsPerCycle;
    supplyTransient += isup[i]! / stepsPerCycle;
  }
  supplyTransient = Math.abs(supplyTransient);
  const ledFast = ledCurrent("red", 0, checkHeight);
  // the transmitter capacitor sits across the coil, from the supply to the switch node
  let tankPeak = 0;
  for (const v of vsw) tankPeak = Math.max(tankPeak, Math.abs(v - SUPPLY));
  const w = 2 * Math.PI * f;
  const fundamental = sim.time.map((t) => h.dc + h.amplitude[1]! * Math.cos(w * t + h.phase[1]!));
  nb.heading("4. The real waveform of the single switch");
  nb.text(
    `Time-domain run (${sim.steady?.cycles ?? "?"} cycles to steady state, ${stepsPerCycle} steps a cycle) of the 5 V switch,`,
    `the transmitter tank and one red pebble ${q(checkHeight, "m")} above the centre:`,
  );
  nb.figure(
    "switch-waveform",
    chart.waveform({ title: "Switch-node voltage, two cycles in steady state", time: sim.time, samples: vsw, fundamental, name: "switch-node voltage", unit: "V" }),
    "the switch node against time (solid) with its fundamental plus mean (dashed): a half-sine while the switch is open, flat while it is closed",
  );
  nb.figure(
    "switch-spectrum",
    chart.spectrum({ title: "Harmonics of the switch-node voltage", amplitude: h.amplitude, frequency: f, name: "switch-node voltage", unit: "V" }),
    "peak amplitude of each harmonic, labelled in dB relative to the fundamental",
  );
  nb.text(
    `- the switch node swings to ${q(h.peak, "V")} peak, ${(h.peak / SUPPLY).toFixed(2)}× the supply, and is far from a sine`,
    `  (total harmonic distortion ${(100 * h.distortion).toFixed(0)} %);`,
    `- the pebble's LED carries ${q(ledTransient, "A")} on average; the fast model used for the maps above says`,
    `  ${q(ledFast, "A")} (${(100 * (ledFast / ledTransient - 1)).toFixed(1).replace("-", "−")} %). The maps are as good as that difference.`,
    `- the transmitter capacitor sees ${q(tankPeak, "V")} peak in the time-domain run, against ${q(at.transmitter.capacitorVoltage, "V")} in the fast model:`,
    "  the parts list rates it for the larger.",
  );

  // ── 5. Supply ──────────────────────────────────────────────────────────
  const supplyFast = at.power.input / SUPPLY;
  const supplyNear = near.power.input / SUPPLY;
  nb.heading("5. Supply");
  nb.table(
    ["case", "DC supply current", "power"],
    [
      ["one red pebble at 30 mm, fast model (input power / supply)", { value: supplyFast, unit: "A" }, { value: at.power.input, unit: "W" }],
      ["one red pebble at 30 mm, time-domain run (mean supply current)", { value: supplyTransient, unit: "A" }, { value: supplyTransient * SUPPLY, unit: "W" }],
      ["one red pebble on the lid over the centre, fast model", { value: supplyNear, unit: "A" }, { value: near.power.input, unit: "W" }],
    ],
  );
  nb.text(
    `The fast model counts the power of the drive's fundamental only; the time-domain run of the real switch draws ${((supplyTransient / supplyFast - 1) * 100).toFixed(0)} % more.`,
    "The budget below takes the larger.",
    "",
    `A USB 2.0 port gives 500 mA at 5 V (USB 2.0 specification); the drawer draws ${q(Math.max(supplyFast, supplyNear, supplyTransient), "A")} at most here,`,
    "almost all of it lost in the transmitter coil and switch: the pebbles take milliwatts.",
  );

  // ── 6. Safety: exposure, emission, stress, metal heating ─────────────────────
  nb.step("exposure, emission, stress and metal heating");
  const lidTop = 0.003; // m: the lid's top surface over the winding, where hands and coins land (demo)
  const safety = safetyReport(designFromLink(system("red", 0, LID), near, { surfaceHeight: lidTop }));
  const safetyCautions = addSafetySections(nb, safety, { coil: tx, current: near.transmitter.coilCurrent, surfaceHeight: lidTop, reach: 0.1 });
  nb.text(
    "In words: right on the lid over the winding the field is above the general-public reference level, a few centimetres up it is below it, and the",
    "induced field in a hand on the lid stays well inside the basic restriction the level protects. For a hands-on exhibit that is a finding to take to",
    "a dosimetric assessment or to design away (a thicker lid, a lower coil current), not one to ignore.",
  );

  // ── 7. Parts and cautions ─────────────────────────────────────────────────
  nb.parts(
    partsList({
      coils: [
        { item: "transmitter coil", coil: tx },
        { item: "pebble coil", coil: token, quantity: 12 },
      ],
      capacitors: [
        { item: "transmitter tank capacitor", parts: txChoice.parts, topology: txChoice.topology, series: "E12", peakVoltage: Math.max(tankPeak, near.transmitter.capacitorVoltage) },
        { item: "pebble tank capacitor", parts: tokenChoice.parts, topology: tokenChoice.topology, series: "E12", peakVoltage: near.receivers[0]!.capacitorVoltage, quantity: 12 },
      ],
      leds: [
        { item: "pebble LED", colour: "red", quantity: 6 },
        { item: "pebble LED", colour: "green (GaP)", quantity: 6 },
      ],
      supply: { item: "supply", voltage: SUPPLY, current: Math.max(supplyFast, supplyNear, supplyTransient), rating: 0.5 },
    }),
  );
  const cautions = [...new Set([...near.cautions, ...safetyCautions])];
  nb.cautions(cautions);

  return {
    notebook: nb,
    results: {
      frequency: f,
      transmitter: txNumbers,
      token: tokenNumbers,
      profile,
      axialRange,
      faintRange,
      sidewaysRange,
      litThreshold: threshold,
      waveform: { peakOverSupply: h.peak / SUPPLY, distortion: h.distortion, ledTransient, ledFast, checkHeight },
      supply: { fast: supplyFast, transient: supplyTransient, onLid: supplyNear },
      transmitterCapacitorPeak: tankPeak,
      safety: {
        worstFlux: safety.exposure.worst.flux,
        publicLevelMetAbove: safety.exposure.referenceLevels.find((l) => l.standard === "ICNIRP 2010" && l.population === "public")?.compliantAbove ?? Infinity,
        basicRestrictionRatio: Math.max(...safety.exposure.basicRestriction.filter((b) => b.population === "public").map((b) => b.ratio ?? Infinity)),
        attention: safety.attention,
      },
      cautions,
    },
  };
}

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
  addToken,
  coilResistance,
  DEFAULT_LIT_THRESHOLD,
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
  tuneWithStandardParts,
  waveformHarmonics,
  type LedColour,
  type LinkSystem,
} from "../lib/mod.ts";

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
  readonly cautions: readonly string[];
}

const SUPPLY = 5; // V, a USB supply (demo)
const LID = 0.005; // m: a pebble lying on the lid has its coil centre 5 mm above the winding
const COLOURS: Readonly<Record<"red" | "green", LedColour>> = { red: "red", green: "green-gap" };

/** Runs the scenario: returns the worked notebook (Markdown) and its numbers. */
export function run(): { notebook: string; results: PebbleDrawerResults } {
  const nb: string[] = [];
  const q = formatQuantity;

  // ── 1. Coils, from geometry ──────────────────────────────────────────────
  const tx = roundCoil({ meanRadius: "50 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
  const token = roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
  const target = 200e3; // Hz, the design frequency (demo)
  const L2 = selfInductance(token, { frequency: target });
  const tokenTuning = tuneWithStandardParts(L2, target, { series: "E12", maxParts: 1 });
  const C2 = tokenTuning.choices[0]!.capacitance;
  const f = 1 / (2 * Math.PI * Math.sqrt(L2 * C2)); // the drawer is driven at the pebbles' resonance
  const L1 = selfInductance(tx, { frequency: f });
  // the single switch turns on at zero voltage when the transmitter tank rings about 1.3× faster
  // than the switching frequency (docs/methods/transient.md): tune it there with E12 parts
  const txTuning = tuneWithStandardParts(L1, 1.3 * f, { series: "E12", maxParts: 2 });
  const C1 = txTuning.choices[0]!.capacitance;
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
  nb.push(
    "# The pebble drawer",
    "",
    "Will every pebble glow, wherever a visitor puts it? A 5 V single-switch transmitter under a",
    "5 mm lid; resin pebbles with a 120-turn coil, one capacitor and one red or green LED. (Demo data.)",
    "",
    "## 1. Coils and tanks, from geometry",
    "",
    "| | transmitter | pebble |",
    "|---|---:|---:|",
    `| winding | 5 turns, 0.8 mm wire, mean radius 50 mm | 120 turns in 6 layers, 0.1 mm wire, former radius 6.5 mm |`,
    `| inductance | ${q(L1, "H")} | ${q(L2, "H")} |`,
    `| AC resistance at ${q(f, "Hz")} | ${q(txNumbers.resistance, "Ω")} | ${q(tokenNumbers.resistance, "Ω")} |`,
    `| quality factor Q | ${txNumbers.quality.toFixed(0)} | ${tokenNumbers.quality.toFixed(0)} |`,
    `| self-resonance | ${q(txNumbers.selfResonance, "Hz")} | ${q(tokenNumbers.selfResonance, "Hz")} |`,
    `| tank capacitor (E12) | ${q(C1, "F")} | ${q(C2, "F")} |`,
    "",
    `The pebble's E12 capacitor puts its resonance at ${q(f, "Hz")}; the drawer is switched there.`,
    `The transmitter capacitor rings the tank at ${q(1 / (2 * Math.PI * Math.sqrt(L1 * C1)), "Hz")}, about 1.3× the switching`,
    "frequency, where the single switch turns on at zero voltage. Q and resistance come from the",
    "loss models (skin and proximity effect), not from a guess.",
    "",
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

  const heights = [0.005, 0.01, 0.02, 0.03, 0.04, 0.06, 0.08, 0.1, 0.12];
  const profile = heights.map((z) => ({ height: z, red: ledCurrent("red", 0, z), green: ledCurrent(COLOURS.green, 0, z) }));

  const bisect = (lit: (s: number) => boolean, lo: number, hi: number): number => {
    while (hi - lo > 2e-4) {
      const m = 0.5 * (lo + hi);
      if (lit(m)) lo = m;
      else hi = m;
    }
    return lo;
  };
  const axialRange = {
    red: bisect((z) => ledCurrent("red", 0, z) >= threshold, LID, 0.3),
    green: bisect((z) => ledCurrent(COLOURS.green, 0, z) >= threshold, LID, 0.3),
  };
  // sliding on the lid: first step outward in 2 mm steps, then bisect the edge of the lit patch
  const sideways = (colour: LedColour): number => {
    let x = 0;
    while (x < 0.2 && ledCurrent(colour, x + 2e-3, LID) >= threshold) x += 2e-3;
    return bisect((s) => ledCurrent(colour, s, LID) >= threshold, x, x + 2e-3);
  };
  const sidewaysRange = { red: sideways("red"), green: sideways(COLOURS.green) };
  // the just-visible end of the trade's visibility band (0.1 mA): how far a pebble glows faintly
  const faintThreshold = 0.1e-3;
  const faintRange = bisect((z) => ledCurrent("red", 0, z) >= faintThreshold, LID, 0.3);
  const near = solveLink(system("red", 0, LID));

  nb.push(
    "## 2. How bright, how far",
    "",
    `LED average current on the axis above the centre (lit: ≥ ${q(threshold, "A")}, trade practice for an`,
    "indicator LED seen indoors):",
    "",
    "| height | red LED | green (GaP) LED |",
    "|---:|---:|---:|",
    ...profile.map((p) => `| ${q(p.height, "m")} | ${q(p.red, "A")}${p.red >= threshold ? "" : " (dark)"} | ${q(p.green, "A")}${p.green >= threshold ? "" : " (dark)"} |`),
    "",
    `- On the axis a red pebble glows up to ${q(axialRange.red, "m")}, a green one up to ${q(axialRange.green, "m")}:`,
    "  the lower forward voltage of the red LED clamps its tank lower and starts conducting in a weaker field.",
    `  Just visible (${q(faintThreshold, "A")}), a red pebble still glows faintly at ${q(faintRange, "m")}.`,
    `- Lying on the lid, a red pebble stays lit out to ${q(sidewaysRange.red, "m")} from the centre (green ${q(sidewaysRange.green, "m")});`,
    "  near the winding radius the flux through a flat pebble reverses and passes through zero,",
    "  so a dark ring lies at the drawer's 50 mm winding radius. Keep the display area inside it.",
    `- Right on the lid over the centre the pebble's tank swings ${q(near.receivers[0]!.capacitorVoltage, "V")} peak and the transmitter`,
    `  capacitor ${q(near.transmitter.capacitorVoltage, "V")} peak; the transmitter coil carries ${q(near.transmitter.coilCurrentRms, "A")} RMS.`,
    "",
  );

  // ── 3. The true waveform ──────────────────────────────────────────────────
  const checkHeight = 0.03;
  const drive = singleSwitchDrive({
    supply: SUPPLY,
    frequency: f,
    coilInductance: L1,
    coilResistance: txNumbers.resistance,
    tankCapacitance: C1,
    onResistance: 0.05,
  });
  const M = mutualInductance(tx, { position: [0, 0, 0] }, token, { position: [0, 0, checkHeight] });
  const tok = addToken(drive.circuit, {
    coupledTo: drive.coil,
    mutualInductance: M,
    inductance: L2,
    resistance: tokenNumbers.resistance,
    capacitance: C2,
    load: { kind: "led", led: ledPreset("red") },
  });
  const stepsPerCycle = 200;
  const sim = simulate(tok.circuit, { stop: 800 / f, stepsPerCycle, frequency: f, untilSteady: true, keepCycles: 2 });
  const h = waveformHarmonics(sim.time, sim.nodeVoltages["switch"]!, { frequency: f });
  const iled = sim.currents[tok.leds.led!]!;
  let ledTransient = 0;
  for (let i = iled.length - stepsPerCycle; i < iled.length; i++) ledTransient += iled[i]! / stepsPerCycle;
  const ledFast = ledCurrent("red", 0, checkHeight);
  nb.push(
    "## 3. The real waveform of the single switch",
    "",
    `Time-domain run (${sim.steady?.cycles ?? "?"} cycles to steady state, ${stepsPerCycle} steps a cycle) of the 5 V switch,`,
    `the transmitter tank and one red pebble ${q(checkHeight, "m")} above the centre:`,
    "",
    `- the switch node swings to ${q(h.peak, "V")} peak, ${(h.peak / SUPPLY).toFixed(2)}× the supply, and is far from a sine`,
    `  (total harmonic distortion ${(100 * h.distortion).toFixed(0)} %): a half-sine while the switch is open, flat while it is closed;`,
    `- the pebble's LED carries ${q(ledTransient, "A")} on average; the fast model used for the maps above says`,
    `  ${q(ledFast, "A")} (${(100 * (ledFast / ledTransient - 1)).toFixed(1).replace("-", "−")} %). The maps are as good as that difference.`,
    "",
  );

  // ── 4. Cautions ─────────────────────────────────────────────────────────
  const cautions = [
    ...near.cautions,
    "Pebbles are small enough to swallow: a hands-on exhibit for young children needs pebbles too big to fit a small-parts gauge, and the local toy-safety rules apply.",
    "People with implanted medical devices: keep the transmitter's field away from them and follow the device makers' and local guidance; this run does not assess exposure.",
    "Coins, keys and foil on the lid heat up in the field; the drawer should not be left powered unattended without a check of metal heating.",
    "Any transmitter radiates: radio-emission rules for inductive devices apply to the product; these numbers are design estimates, not a compliance test.",
  ];
  nb.push("## Cautions", "", ...cautions.map((c) => `- ${c}`), "", "Defer to local codes, regulations and licensed practice.");

  return {
    notebook: nb.join("\n"),
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
      cautions,
    },
  };
}

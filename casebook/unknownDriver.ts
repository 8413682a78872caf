/**
 * Casebook — "How far will a new pebble reach on a pad whose driver nobody documented?"
 *
 * A maker has a sealed glow pad from an earlier job: a hand-sized coil they can see (5 turns
 * of 0.8 mm wire, 50 mm mean radius, visible through the base) driven by an unmarked board
 * from a 5 V adapter. Nobody knows the current in the coil. They do have two pebbles of the
 * old design (a red and a green one) and a scope. On the bench they measured:
 * - the height above the pad's centre at which each pebble stops glowing (ruler, ±3 mm);
 * - the red pebble's tank voltage on the scope at 20 cm, where its LED is dark (±5 %).
 * From these the run calibrates the coil current and the lit threshold the maker's eye used,
 * checks the current is one a 5 V driver can make, and predicts — with an uncertainty — how
 * far a new, larger pebble will glow on the same pad, before anyone winds one.
 *
 * Demo data: the pad, the pebbles and every "measured" number are our own invention, not a
 * product or a real bench session.
 */
import {
  addSafetySections,
  calibrate,
  designFromLink,
  solveLink,
  chart,
  coilResistance,
  drivePlausibility,
  formatQuantity,
  ledPreset,
  notebook,
  partsList,
  predictRange,
  roundCoil,
  safetyReport,
  selfInductance,
  type CalibrationDesign,
  type LinkSystem,
  type Measurement,
  type Notebook,
} from "../lib/mod.ts";

/** What the run computes (SI). */
export interface UnknownDriverResults {
  /** calibrated coil current amplitude, A peak, and its 95 % interval */
  readonly coilCurrent: number;
  readonly coilCurrentInterval: readonly [number, number];
  /** calibrated lit threshold, A */
  readonly litThreshold: number;
  readonly identified: boolean;
  readonly plausible: boolean;
  /** safety findings that need attention at the calibrated current (empty: none) */
  readonly safetyAttention: readonly string[];
  /** predicted axial reach of the old red pebble and the new one, m: nominal and 95 % band */
  readonly oldRed: { readonly nominal: number; readonly low: number; readonly high: number };
  readonly newRed: { readonly nominal: number; readonly low: number; readonly high: number };
}

const q = (x: number, unit: string): string => formatQuantity(x, unit);

/** Runs the scenario: returns the worked notebook and its numbers. */
export function run(): { notebook: Notebook; results: UnknownDriverResults } {
  const pad = roundCoil({ meanRadius: "50 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
  const oldPebble = roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
  const newPebble = roundCoil({ innerRadius: "9 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
  const pebble = (coil: typeof oldPebble, capacitance: string, colour: "red" | "green-gap") =>
    ({ coil, topology: "parallel", capacitor: { capacitance }, load: { kind: "led", led: ledPreset(colour) } }) as const;
  const design: CalibrationDesign = {
    frequency: "200 kHz",
    transmitter: { label: "glow pad", coil: pad },
    tokens: {
      "old red": pebble(oldPebble, "2.2 nF", "red"),
      "old green": pebble(oldPebble, "2.2 nF", "green-gap"),
      "new red": pebble(newPebble, "1.5 nF", "red"),
    },
  };
  const measurements: Measurement[] = [
    { kind: "edge", token: "old red", pose: { position: [0, 0, "98 mm"] }, uncertainty: "3 mm" },
    { kind: "edge", token: "old green", pose: { position: [0, 0, "95 mm"] }, uncertainty: "3 mm" },
    { kind: "tankAmplitude", token: "old red", pose: { position: [0, 0, "200 mm"] }, value: "0.60 V", uncertainty: "0.03 V" },
  ];
  const cal = calibrate(design, measurements, ["coilCurrent", "litThreshold"]);

  const nb = notebook("How far will a new pebble reach on a pad whose driver nobody documented?", {
    note: "Demo data: the pad, the pebbles and every measured number are our own invention.",
  });
  nb.heading("1. What is known, what was measured");
  nb.table(
    ["", "glow pad", "old pebble", "new pebble (not built)"],
    [
      ["winding", "5 turns, 0.8 mm wire, mean radius 50 mm", "120 turns in 6 layers, 0.1 mm wire, former radius 6.5 mm", "same wire and turns, former radius 9 mm"],
      ["tank capacitor", "unknown (sealed)", { value: 2.2e-9, unit: "F" }, { value: 1.5e-9, unit: "F" }],
      ["drive", "unmarked board, 5 V adapter, about 200 kHz", "—", "—"],
    ],
  );
  nb.table(
    ["measurement", "token", "where", "value", "uncertainty"],
    [
      ["stops glowing (moving up)", "old red", "on the axis", { value: 0.098, unit: "m" }, { value: 0.003, unit: "m" }],
      ["stops glowing (moving up)", "old green", "on the axis", { value: 0.095, unit: "m" }, { value: 0.003, unit: "m" }],
      ["tank voltage amplitude (scope)", "old red", "20 cm up, LED dark", { value: 0.6, unit: "V" }, { value: 0.03, unit: "V" }],
    ],
    "Bench measurements (demo data)",
  );

  nb.heading("2. Calibration");
  nb.text(
    "Unknowns: the pad's coil current amplitude and the LED current at which the maker's eye",
    "called a pebble lit. Method: weighted least squares (Levenberg–Marquardt), 95 % intervals",
    "from the fit's covariance; a parameter the data do not pin down would be reported as such.",
  );
  nb.table(
    ["parameter", "result"],
    (["coilCurrent", "litThreshold"] as const).map((u) => [u, cal.parameters[u].verdict]),
  );
  nb.text(...cal.summary.filter((s) => s.startsWith("transmitter") || s.startsWith("fit") || s.startsWith("verdict")), ...cal.warnings);
  const edgeRows = cal.residuals.filter((r) => r.kind === "edge");
  const edgeHeights = [0.098, 0.095];
  nb.figure(
    "measured-vs-predicted",
    chart.measuredPredicted({
      title: "Where the pebbles stop glowing: bench against calibrated model",
      quantity: "edge height",
      unit: "m",
      labels: edgeRows.map((r) => r.token ?? ""),
      measured: edgeHeights,
      predicted: edgeRows.map((r, i) => edgeHeights[i]! + r.predicted),
    }),
    "measured against calibrated edge heights; the dashed line is perfect agreement",
  );

  const f = 200e3;
  const plaus = drivePlausibility(
    cal.values.coilCurrent,
    { inductance: selfInductance(pad, { frequency: f }), resistance: coilResistance(pad, f), frequency: f },
    { supply: 5, currentLimit: 1 },
  );
  nb.heading("3. Supply: is that a current a 5 V driver can make?");
  nb.text(
    `The coil's voltage amplitude ωLI is ${q(plaus.coilVoltage, "V")}; a single switch fed from 5 V`,
    `swings its tank to at most about ${q(plaus.maxCoilVoltage, "V")} (3.562 × supply, the class-E peak switch`,
    `voltage — Sokal & Sokal 1975). The coil's own loss is ${q(plaus.coilLoss, "W")} against the adapter's`,
    `${q(plaus.maxPower, "W")} (5 V, 1 A assumed). Verdict: ${plaus.plausible ? "plausible" : "not plausible — " + plaus.reasons.join("; ")}.`,
  );

  nb.heading("4. Prediction for the new pebble");
  // predictRange measures from its start pose (5 mm: a pebble lying on the pad): add it back for heights
  const LYING = 0.005;
  const height = (r: { nominal: number; low: number; high: number }) => ({ nominal: LYING + r.nominal, low: LYING + r.low, high: LYING + r.high });
  const oldRed = height(predictRange(cal, "old red", { from: { position: [0, 0, LYING] } }, { samples: 40, seed: 7 }));
  const newRed = height(predictRange(cal, "new red", { from: { position: [0, 0, LYING] } }, { samples: 40, seed: 7 }));
  nb.table(
    ["pebble", "glows up to (height above the pad)", "95 % band (from the calibration)"],
    [
      ["old red (measured 98 mm)", { value: oldRed.nominal, unit: "m" }, `${q(oldRed.low, "m")} … ${q(oldRed.high, "m")}`],
      ["new red (not built)", { value: newRed.nominal, unit: "m" }, `${q(newRed.low, "m")} … ${q(newRed.high, "m")}`],
    ],
    "How far each red pebble glows above the pad's centre (Monte Carlo over the fitted parameters, 40 samples)",
  );
  nb.text(
    `The larger former catches more of the pad's flux: the new pebble should glow up to about ${q(newRed.nominal, "m")},`,
    `${q(newRed.nominal - oldRed.nominal, "m")} further than the old one. The band is the calibration's uncertainty only;`,
    "winding and capacitor tolerances of a real batch widen it (see the tolerance-yield functions).",
  );
  // the new pebble's parts; the tank clamps near the red LED's forward voltage (about 2 V), so
  // the capacitor sees about 2 V peak on the pad (the rating rule adds its own margin)
  nb.parts(
    partsList({
      coils: [{ item: "new pebble coil", coil: newPebble }],
      capacitors: [{ item: "new pebble tank capacitor", parts: [1.5e-9], topology: "single", series: "E12", peakVoltage: 2.2 }],
      leds: [{ item: "new pebble LED", colour: "red" }],
      // the calibration knows the coil's loss, not the unmarked driver's: the supply line shows that floor
      supply: { item: "existing pad's 5 V adapter (coil loss only; the driver's own loss is unknown)", voltage: 5, current: plaus.coilLoss / 5, rating: 1 },
    }),
  );
  // ── 5. Exposure, emission, component stress and metal heating at the calibrated current ──
  // the new red pebble lying on the pad, with the pad's coil held at the calibrated current
  // (a current-regulated drive: the unmarked board's own circuit is unknown)
  const onPad: LinkSystem = {
    frequency: f,
    transmitter: { label: "glow pad", coil: pad, compensation: "none", drive: { kind: "currentRegulated", amplitude: cal.values.coilCurrent } },
    receivers: [{ label: "new red pebble", ...pebble(newPebble, "1.5 nF", "red"), capacitor: { capacitance: "1.5 nF", rating: 50 }, pose: { position: [0, 0, LYING] } }],
  };
  const lying = solveLink(onPad);
  const safety = safetyReport(designFromLink(onPad, lying, { surfaceHeight: LYING - 0.002, tokenSize: 0.03 }));
  nb.heading("5. Safety at the calibrated current (estimates, not a compliance test)");
  nb.text(
    "With the coil current now known, the pad's field can be assessed where people reach (the space above",
    `the pad's 3 mm top, demo), its emission against the rules, the new pebble's parts lying on the pad (LED ${q(lying.receivers[0]!.leds[0]!.averageCurrent, "A")},`,
    `tank ${q(lying.receivers[0]!.capacitorVoltage, "V")} peak) and the metal a visitor might put down. The driver's own switch and capacitor are sealed: their stress is not assessed.`,
  );
  const safetyCautions = addSafetySections(nb, safety, { coil: pad, current: cal.values.coilCurrent, surfaceHeight: LYING - 0.002, reach: 0.1 });
  if (safety.attention.length > 0) nb.text("Needs attention:", ...safety.attention.map((a) => `- ${a}`));
  nb.cautions([
    "A calibrated model is only as good as the bench numbers behind it: check a built pebble against the prediction before ordering a batch.",
    ...safetyCautions,
  ]);

  return {
    notebook: nb,
    results: {
      coilCurrent: cal.values.coilCurrent,
      coilCurrentInterval: cal.parameters.coilCurrent.interval ?? [NaN, NaN],
      litThreshold: cal.values.litThreshold,
      identified: cal.identified,
      plausible: plaus.plausible,
      safetyAttention: safety.attention,
      oldRed: { nominal: oldRed.nominal, low: oldRed.low, high: oldRed.high },
      newRed: { nominal: newRed.nominal, low: newRed.low, high: newRed.high },
    },
  };
}

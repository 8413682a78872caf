/**
 * Casebook — "The resin pendant": a pendant glows on its display stand.
 *
 * A jeweller casts a 20 mm resin pendant around a tiny coil (60 turns of 0.08 mm wire on a
 * 3 mm former), one capacitor and an LED. It rests in a shallow dish on a display stand whose
 * base hides a 20-turn transmitter coil, driven by a half bridge from 5 V. The pendant lies
 * about 12 mm above the winding — but customers pick it up and put it back tilted. Which
 * frequency suits so small a coil, which LED colour, how much tilt does it forgive, and what
 * happens with a two-colour pendant (two LEDs back to back, one per half-cycle), where the
 * fundamental-only model is not the right one?
 *
 * Demo data: the stand, the pendant and the parts are our own invention, not a product.
 */
import {
  addSafetySections,
  addToken,
  bridgeDrive,
  coilResistance,
  mutualInductance,
  periodicSteadyState,
  antiParallelPair,
  chart,
  DEFAULT_LIT_THRESHOLD,
  designFromLink,
  findRange,
  formatQuantity,
  ledPreset,
  notebook,
  partsList,
  qualityFactor,
  roundCoil,
  safetyReport,
  selfInductance,
  selfResonance,
  solveLink,
  supplyVerdict,
  tuneWithStandardParts,
  type LedColour,
  type LinkSystem,
  type Notebook,
  type TokenLoad,
  type TuningChoice,
} from "../lib/mod.ts";
import type { ScenarioOptions } from "./scenarios.ts";

/** What the run computes (SI units; angles in degrees). */
export interface ResinPendantResults {
  /** the frequencies compared, with the pendant's Q, its red LED current at rest, its reach and the supply current */
  readonly frequencies: readonly { target: number; frequency: number; tokenQ: number; restCurrent: number; reach: number; supplyCurrent: number; emissionMarginDb: number }[];
  /** the frequency chosen, Hz */
  readonly chosen: number;
  /** LED current at rest and reach on the axis per colour at the chosen frequency, A and m */
  readonly colours: readonly { colour: LedColour; restCurrent: number; reach: number }[];
  /** largest tilt at which the red pendant at rest stays lit, degrees */
  readonly tiltLimit: number;
  readonly blueTiltLimit: number;
  /** LED current against tilt, red, A */
  readonly tilt: readonly { degrees: number; current: number }[];
  /** the bi-colour pendant at rest: each LED's average current by the fundamental model and by harmonic balance, A */
  readonly bicolour: {
    /** the transient engine's periodic steady state, A */
    readonly transient: readonly number[];
    /** harmonic balance with lossless capacitors (the circuit the engine solves), A */
    readonly sameCircuit: readonly number[];
    readonly fundamental: readonly number[];
    readonly harmonic: readonly number[];
    readonly model: string;
    readonly band: number;
    readonly fundamentalEstimate: number;
  };
  readonly supply: { readonly current: number; readonly verdict: string };
  readonly safetyAttention: readonly string[];
}

const SUPPLY = 5; // V (demo: a USB supply)
const REST = 0.012; // m: the pendant's coil centre above the winding, resting in the dish (demo)
const DISH = 0.006; // m: the dish's top surface above the winding, where fingers and coins land (demo)
/** A pendant on display should glow plainly, not just visibly: 2 mA average (a demo design choice, four times the library's 0.5 mA lit threshold). */
const DISPLAY = 2e-3;
const q = formatQuantity;
/** a signed percentage, "+0.1 %" / "−4.4 %" */
const pct = (x: number, digits = 1): string => `${x >= 0 ? "+" : "−"}${Math.abs(100 * x).toFixed(digits)} %`;

/** Runs the scenario: returns the worked notebook and its numbers. */
export function run(options: ScenarioOptions = {}): { notebook: Notebook; results: ResinPendantResults } {
  const nb = notebook("The resin pendant", {
    subtitle: "A tiny coil on a display stand: frequency, colour, tilt and a two-colour pendant",
    note: "Demo data: the stand, the pendant and the parts are our own invention, not a product.",
    log: options.log,
  });
  const stand = roundCoil({ meanRadius: "15 mm", turns: 20, layers: 2, wire: { diameter: "0.25 mm", insulation: "0.02 mm" } });
  const pendant = roundCoil({ innerRadius: "3 mm", turns: 60, layers: 4, wire: { diameter: "0.08 mm", insulation: "0.008 mm" } });
  const onResistance = 1.5; // Ω per switch: a small logic-level half bridge (demo)

  interface Tuned { frequency: number; token: TuningChoice; stand: TuningChoice }
  const tune = (target: number): Tuned => {
    const token = tuneWithStandardParts(selfInductance(pendant, { frequency: target }), target, { series: "E12", maxParts: 1 }).choices[0]!;
    const f = token.frequency; // the stand is switched at the pendant's own resonance
    const standTank = tuneWithStandardParts(selfInductance(stand, { frequency: f }), f, { series: "E12", maxParts: 2 }).choices[0]!;
    return { frequency: f, token, stand: standTank };
  };
  const system = (t: Tuned, load: TokenLoad, z: number, tiltDeg = 0, tanDelta = 1e-3): LinkSystem => {
    const a = (tiltDeg * Math.PI) / 180;
    return {
      frequency: t.frequency,
      transmitter: {
        label: "stand coil",
        coil: stand,
        compensation: "series",
        capacitor: { capacitance: t.stand.capacitance, dissipationFactor: tanDelta, rating: 100 },
        drive: { kind: "halfBridge", supply: SUPPLY, onResistance },
      },
      receivers: [
        {
          label: "pendant",
          coil: pendant,
          pose: { position: [0, 0, z], axis: [Math.sin(a), 0, Math.cos(a)] },
          topology: "parallel",
          capacitor: { capacitance: t.token.capacitance, dissipationFactor: tanDelta, rating: 50 },
          load,
        },
      ],
    };
  };
  const single = (colour: LedColour): TokenLoad => ({ kind: "led", led: ledPreset(colour) });
  const litCurrent = (s: LinkSystem): number => Math.min(...solveLink(s).receivers[0]!.leds.map((l) => l.averageCurrent));
  const reach = (t: Tuned, load: TokenLoad): number => REST + findRange(system(t, load, 0), { from: [0, 0, REST], along: [0, 0, 1] }, { max: 0.1, litThreshold: DISPLAY }).range;

  nb.text(
    "A 20 mm resin pendant with a 60-turn coil on a 3 mm former rests in a dish 12 mm above a 20-turn stand coil (15 mm mean radius),",
    `driven by a half bridge from ${SUPPLY} V (${onResistance} Ω per switch). On display the pendant should glow plainly: ${q(DISPLAY, "A")} average LED current`,
    `(our design choice, four times the ${q(DEFAULT_LIT_THRESHOLD, "A")} at which an indicator LED is just seen indoors, trade practice).`,
  );

  // ── 1. Frequency ────────────────────────────────────────────────────────
  nb.heading("1. Which frequency suits a tiny coil");
  const targets = [125e3, 200e3, 400e3, 800e3, 1.5e6];
  const tick = nb.step("frequency choice");
  const freqRows = targets.map((target, i) => {
    tick(i + 1, targets.length);
    const t = tune(target);
    const at = solveLink(system(t, single("red"), REST));
    const emission = safetyReport(designFromLink(system(t, single("red"), REST), at, { surfaceHeight: DISH }), { metalObjects: [] }).emission;
    const fcc = emission.limits.find((l) => /15\.209/.test(l.text));
    return {
      target,
      frequency: t.frequency,
      tokenQ: qualityFactor(pendant, t.frequency),
      restCurrent: at.receivers[0]!.leds[0]!.averageCurrent,
      reach: reach(t, single("red")),
      supplyCurrent: at.power.input / SUPPLY,
      emissionMarginDb: fcc?.marginDb ?? Number.NaN,
      tuned: t,
    };
  });
  nb.table(
    ["target", "pendant resonance (E12)", "pendant Q", "red LED at rest", "red: display brightness up to", "supply current", "47 CFR 15.209 estimate margin"],
    freqRows.map((r) => [
      { value: r.target, unit: "Hz" },
      { value: r.frequency, unit: "Hz" },
      Number(r.tokenQ.toFixed(1)),
      { value: r.restCurrent, unit: "A" },
      { value: r.reach, unit: "m" },
      { value: r.supplyCurrent, unit: "A" },
      Number.isFinite(r.emissionMarginDb) ? `${r.emissionMarginDb.toFixed(1)} dB` : "—",
    ]),
    "the pendant tuned with one E12 capacitor near each target; the stand series-tuned to it with up to two E12 parts",
  );
  // the choice: the longest reach among the frequencies whose emission estimate meets 15.209
  const allowed = freqRows.filter((r) => r.emissionMarginDb > 0);
  const best = (allowed.length > 0 ? allowed : freqRows).reduce((a, b) => (b.reach > a.reach ? b : a));
  const t = best.tuned;
  const f = t.frequency;
  nb.text(
    `A coil this small has little inductance and thin wire: its Q is ${freqRows[0]!.tokenQ.toFixed(0)} at ${q(freqRows[0]!.frequency, "Hz")} and climbs to ${freqRows[freqRows.length - 1]!.tokenQ.toFixed(0)}`,
    `at ${q(freqRows[freqRows.length - 1]!.frequency, "Hz")} (the pendant's self-resonance is ${q(selfResonance(pendant), "Hz")}). A higher Q lets the tank build up more voltage from the same`,
    "field, but the stand coil's current falls as its AC resistance rises and the induced voltage is ω·M·I: the reach peaks, then flattens.",
    `Chosen: ${q(f, "Hz")} — the longest reach among the frequencies whose emission estimate meets 47 CFR 15.209 (an estimate, not a test).`,
  );

  // ── 2. Colour ───────────────────────────────────────────────────────────
  nb.heading("2. Which LED colour");
  const colours: LedColour[] = ["red", "yellow", "green-ingan", "blue", "white"];
  const heights = [0.006, 0.009, 0.012, 0.016, 0.02, 0.025, 0.03, 0.035, 0.04, 0.05];
  const tickC = nb.step("colours");
  const colourRows = colours.map((c, i) => {
    tickC(i + 1, colours.length);
    return { colour: c, restCurrent: litCurrent(system(t, single(c), REST)), reach: reach(t, single(c)), curve: heights.map((z) => litCurrent(system(t, single(c), z))) };
  });
  nb.table(
    ["LED", "current at rest (12 mm)", "display brightness up to (on the axis)"],
    colourRows.map((r) => [r.colour, { value: r.restCurrent, unit: "A" }, { value: r.reach, unit: "m" }]),
  );
  nb.figure(
    "colours-by-height",
    chart.ledCurrent({
      title: `Pendant LED current above the stand at ${q(f, "Hz")}`,
      curves: colourRows.map((r) => ({ colour: r.colour, distance: heights, current: r.curve })),
      threshold: DISPLAY,
    }),
    "LED average current against height on the axis for five LED colours; the dashed line is the display brightness",
  );
  nb.text(
    "The tank clamps near the LED's forward voltage: a red LED (about 1.8–2 V) starts conducting in a weaker field than a blue or white",
    "one (about 2.8–3 V), so at the same stand current the red pendant reaches furthest and the blue and white ones need to sit closer.",
  );

  // ── 3. Tilt ─────────────────────────────────────────────────────────────
  nb.heading("3. How much tilt the pendant forgives");
  const tilts = [0, 10, 20, 30, 40, 50, 60, 70, 80, 90];
  const tiltCurves = (["red", "blue"] as const).map((c) => ({ colour: c, current: tilts.map((d) => litCurrent(system(t, single(c), REST, d))) }));
  // the tilt at which a pendant drops below display brightness: bisection on the angle to 0.1°
  const tiltLimitOf = (colour: LedColour): number => {
    let lo = 0;
    let hi = 90;
    if (litCurrent(system(t, single(colour), REST, hi)) >= DISPLAY) return hi;
    while (hi - lo > 0.1) {
      const mid = (lo + hi) / 2;
      if (litCurrent(system(t, single(colour), REST, mid)) >= DISPLAY) lo = mid;
      else hi = mid;
    }
    return lo;
  };
  const tiltLimit = tiltLimitOf("red");
  const blueTiltLimit = tiltLimitOf("blue");
  nb.figure(
    "tilt",
    chart.ledCurrent({
      title: "Pendant tilted in its dish",
      subtitle: `coil centre ${q(REST, "m")} above the stand coil, on its axis`,
      curves: tiltCurves.map((c) => ({ colour: c.colour, distance: tilts, current: c.current })),
      threshold: DISPLAY,
      distanceName: "tilt of the pendant",
      distanceUnit: "°",
    }),
    "LED average current against the pendant's tilt: on the axis the flux through the coil falls about as the cosine of the tilt",
  );
  nb.text(
    `On the axis the stand's field is vertical and the flux through the pendant's coil falls about as cos(tilt). The red pendant keeps its display brightness up to`,
    `${tiltLimit.toFixed(1)}° of tilt, the blue one up to ${blueTiltLimit.toFixed(1)}° (bisection to 0.1°). Shape the dish so the pendant cannot lie steeper than that.`,
  );

  // ── 4. A bi-colour pendant ───────────────────────────────────────────────
  nb.heading("4. A two-colour pendant: two LEDs back to back");
  const pair = antiParallelPair(ledPreset("red"), ledPreset("blue"));
  const sysPair = system(t, pair, REST);
  const fund = solveLink(sysPair, { model: "fundamental" });
  const harm = solveLink(sysPair, { model: "harmonic" });
  const auto = solveLink(sysPair, { model: "auto" });
  const leds = harm.receivers[0]!.leds;
  nb.table(
    ["LED", "fundamental model (describing function)", "harmonic balance", "difference"],
    leds.map((l, i) => {
      const a = fund.receivers[0]!.leds[i]!.averageCurrent;
      return [l.label ?? `LED ${i + 1}`, { value: a, unit: "A" }, { value: l.averageCurrent, unit: "A" }, pct(a / l.averageCurrent - 1)];
    }),
    `red and blue LEDs back to back across the pendant's tank, at rest, ${q(f, "Hz")}`,
  );
  nb.text(
    "Back to back, the red LED conducts on one half-cycle and the blue one on the other at a higher voltage: the tank voltage is no longer",
    "symmetric, and its even harmonics and offset are what the fundamental-only model leaves out. Harmonic balance keeps them.",
    `Asked to choose ("auto"), the solver put the fundamental model's error band at ±${(100 * fund.errorBand.relative).toFixed(0)} % here and answered with the ${auto.model} model`,
    `(band ±${(100 * auto.errorBand.relative).toFixed(1)} %: ${auto.errorBand.basis}).`,
  );

  // independent method: the transient engine's periodic steady state (shooting) of the same circuit
  nb.step("time-domain check of the two-colour pendant");
  const drive = bridgeDrive({
    supply: SUPPLY,
    frequency: f,
    bridge: "half",
    coilInductance: selfInductance(stand, { frequency: f }),
    coilResistance: coilResistance(stand, f),
    tankCapacitance: t.stand.capacitance,
    onResistance,
  });
  const tok = addToken(drive.circuit, {
    coupledTo: drive.coil,
    mutualInductance: mutualInductance(stand, { position: [0, 0, 0] }, pendant, { position: [0, 0, REST] }),
    inductance: selfInductance(pendant, { frequency: f }),
    resistance: coilResistance(pendant, f),
    capacitance: t.token.capacitance,
    load: pair,
  });
  const steps = 200;
  const pss = periodicSteadyState(tok.circuit, { frequency: f, stepsPerCycle: steps });
  const average = (name: string): number => {
    const i = pss.currents[name]!;
    let sum = 0;
    for (let k = i.length - steps; k < i.length; k++) sum += i[k]!;
    return sum / steps;
  };
  const transient = [average(tok.leds.a!), average(tok.leds.b!)];
  // the engine's capacitors are lossless: compare with harmonic balance of the same circuit (tan δ = 0)
  const same = solveLink(system(t, pair, REST, 0, 0), { model: "harmonic" }).receivers[0]!.leds.map((l) => l.averageCurrent);
  nb.text(
    `Checked in the time domain (the transient engine's periodic steady state, ${steps} steps a cycle, the half bridge's real square wave):`,
    `red ${q(transient[0]!, "A")}, blue ${q(transient[1]!, "A")}. Harmonic balance of the same circuit (its capacitors lossless, as the engine's are)`,
    `differs by ${pct(same[0]! / transient[0]! - 1)} and ${pct(same[1]! / transient[1]! - 1)}; the describing function by ${pct(fund.receivers[0]!.leds[1]!.averageCurrent / transient[1]! - 1, 0)} on the blue LED.`,
    "The table's capacitor losses (tan δ = 10⁻³) take the rest of the difference.",
  );

  // ── 5. Supply ────────────────────────────────────────────────────────────
  const at = solveLink(system(t, single("red"), REST));
  const verdict = supplyVerdict({ voltage: SUPPLY, current: at.power.input / SUPPLY }, "usb2");
  nb.heading("5. Supply");
  nb.text(
    `The stand coil carries ${q(at.transmitter.coilCurrentRms, "A")} RMS; the stand ${verdict.message} (${verdict.ratingSource}).`,
    "The pendant itself takes milliwatts: almost all of it heats the stand coil and the half bridge's switches.",
  );

  // ── 6. Safety ────────────────────────────────────────────────────────────
  nb.step("exposure, emission, stress and metal heating");
  const safety = safetyReport(designFromLink(system(t, single("red"), REST), at, { surfaceHeight: DISH, tokenSize: 0.02 }));
  const safetyCautions = addSafetySections(nb, safety, { coil: stand, current: at.transmitter.coilCurrent, surfaceHeight: DISH, reach: 0.05 });
  if (safety.attention.length > 0) nb.text("Needs attention:", ...safety.attention.map((a) => `- ${a}`));

  nb.parts(
    partsList({
      coils: [
        { item: "stand coil", coil: stand },
        { item: "pendant coil", coil: pendant },
      ],
      capacitors: [
        { item: "stand tank capacitor", parts: t.stand.parts, topology: t.stand.topology, series: "E12", peakVoltage: at.transmitter.capacitorVoltage },
        { item: "pendant tank capacitor", parts: t.token.parts, topology: t.token.topology, series: "E12", peakVoltage: solveLink(system(t, single("red"), 0.006)).receivers[0]!.capacitorVoltage },
      ],
      leds: [{ item: "pendant LED (two-colour version: red and blue back to back)", colour: "red" }],
      supply: { item: "supply", voltage: SUPPLY, current: verdict.current, rating: verdict.rating },
    }),
  );
  nb.cautions([
    "A 20 mm pendant is a small part: keep it, and loose pendants on the stand, away from young children.",
    ...new Set([...at.cautions, ...safetyCautions]),
  ]);

  return {
    notebook: nb,
    results: {
      frequencies: freqRows.map(({ tuned: _t, ...r }) => r),
      chosen: f,
      colours: colourRows.map(({ curve: _c, ...r }) => r),
      tiltLimit,
      blueTiltLimit,
      tilt: tilts.map((d, i) => ({ degrees: d, current: tiltCurves[0]!.current[i]! })),
      bicolour: {
        transient,
        sameCircuit: same,
        fundamental: fund.receivers[0]!.leds.map((l) => l.averageCurrent),
        harmonic: leds.map((l) => l.averageCurrent),
        model: auto.model,
        band: auto.errorBand.relative,
        fundamentalEstimate: fund.errorBand.relative,
      },
      supply: { current: verdict.current, verdict: verdict.verdict },
      safetyAttention: safety.attention,
    },
  };
}

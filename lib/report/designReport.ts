/**
 * The full report of a design file: coils and tanks from geometry, the barrier, brightness and
 * range by LED colour, coupling, the LED's load line, the real drive waveform (single switch),
 * the supply budget, the parts list and the cautions — the same notebook whether the design
 * comes from a JSON file (`npm run casebook -- --design file.json`) or from a casebook scenario
 * that wraps one.
 */
import { tuneWithStandardParts, type TuningChoice } from "../circuit/tank.ts";
import { ledPreset, type LedColour } from "../circuit/loads/ledPresets.ts";
import { DEFAULT_LIT_THRESHOLD } from "../circuit/link/network.ts";
import { solveLink } from "../circuit/link.ts";
import type { LinkSystem } from "../circuit/link/schema.ts";
import { addToken } from "../circuit/transient/token.ts";
import { singleSwitchDrive } from "../circuit/transient/drives.ts";
import { simulate } from "../circuit/transient/simulate.ts";
import { waveformHarmonics } from "../circuit/transient/harmonics.ts";
import { flatSpiral } from "../em/builders/flatSpiral.ts";
import { rectSpiral } from "../em/builders/rectSpiral.ts";
import { roundCoil } from "../em/builders/roundCoil.ts";
import { solenoid } from "../em/builders/solenoid.ts";
import { coilResistance } from "../em/losses/coilResistance.ts";
import { qualityFactor } from "../em/losses/qualityFactor.ts";
import { skinDepth } from "../em/losses/skinDepth.ts";
import { couplingFactor, mutualInductance } from "../em/mutualInductance.ts";
import { selfInductance } from "../em/selfInductance.ts";
import { selfResonance } from "../em/selfCapacitance.ts";
import type { Coil } from "../em/types.ts";
import { TanklightInputError } from "../errors.ts";
import { formatQuantity as q } from "../units.ts";
import { designFromLink } from "../safety/design.ts";
import { safetyReport, type SafetyReport } from "../safety/safetyReport.ts";
import * as chart from "./chart.ts";
import { addSafetySections } from "./safetySection.ts";
import type { Design } from "./designFile.ts";
import { tokenLoadLine } from "./loadLine.ts";
import { notebook, type Notebook } from "./notebook.ts";
import { partsList, wireText } from "./partsList.ts";

/** The key numbers of a design run (SI). */
export interface DesignResults {
  readonly frequency: number;
  readonly transmitter: { inductance: number; resistance: number; quality: number; capacitance: number };
  readonly token: { inductance: number; resistance: number; quality: number; capacitance: number };
  /** on-axis range at the lit threshold by LED colour, m (the surface gap when even that is dark) */
  readonly axialRange: Readonly<Record<string, number>>;
  /** how far from the centre a token lying on the surface stays lit, by colour, m */
  readonly sidewaysRange: Readonly<Record<string, number>>;
  /** LED average current on the axis at each tabulated height, A, by colour */
  readonly profile: { readonly heights: readonly number[]; readonly current: Readonly<Record<string, readonly number[]>> };
  /** skin depth in the barrier at the drive frequency, m, and the barrier thickness, m */
  readonly barrier: { readonly skinDepth: number; readonly thickness: number };
  /** DC supply current budgeted (the larger of the fast model and the time-domain run), A */
  readonly supplyCurrent: number;
  /** time-domain check (single switch only) */
  readonly waveform?: { readonly peakOverSupply: number; readonly distortion: number; readonly ledFast: number; readonly ledTransient: number; readonly supplyTransient: number };
  /** the safety report (exposure, emission, stress, metal heating, cautions) */
  readonly safety: SafetyReport;
  readonly cautions: readonly string[];
}

type CoilSpec = Design["transmitter"]["coil"];

/** Builds a coil from its design-file spec; builder errors get the JSON path prefix. */
function buildCoil(spec: CoilSpec, path: string): Coil {
  const { shape, ...rest } = spec as CoilSpec & Record<string, unknown>;
  try {
    switch (shape) {
      case "roundCoil": return roundCoil(rest as Parameters<typeof roundCoil>[0]);
      case "flatSpiral": return flatSpiral(rest as Parameters<typeof flatSpiral>[0]);
      case "rectSpiral": return rectSpiral(rest as Parameters<typeof rectSpiral>[0]);
      case "solenoid": return solenoid(rest as Parameters<typeof solenoid>[0]);
    }
  } catch (e) {
    if (e instanceof TanklightInputError) {
      throw new TanklightInputError(e.issues.map((i) => ({ ...i, path: i.path ? `${path}.${i.path}` : path })), "design file");
    }
    throw e;
  }
  throw new TanklightInputError([{ path: `${path}.shape`, message: "unknown coil shape", value: shape }], "design file");
}

/** The winding in words. */
function windingText(c: Coil): string {
  const s = c.shape;
  const mm = (x: number) => q(x, "m");
  let form = "custom winding";
  if (s?.kind === "roundCoil") form = `round, ${s.layers} layer${s.layers > 1 ? "s" : ""}, radius ${mm(s.innerRadius)}–${mm(s.outerRadius)}`;
  else if (s?.kind === "flatSpiral") form = `flat spiral, radius ${mm(s.innerRadius)}–${mm(s.outerRadius)}`;
  else if (s?.kind === "rectSpiral") form = `rectangular spiral ${mm(s.outerWidth)} × ${mm(s.outerHeight)}`;
  else if (s?.kind === "solenoid") form = `solenoid, radius ${mm(s.radius)}, length ${mm(s.length)}`;
  return `${c.turns} turns, ${form}; ${wireText(c.conductor)}`;
}

const partsText = (c: TuningChoice): string => c.parts.map((p) => q(p, "F")).join(c.topology === "series" ? " in series with " : c.topology === "parallel" ? " ∥ " : ", ") + (c.parts.length > 2 ? ` (${c.topology})` : "");

/** Largest s in [lo, hi] with lit(s), by bisection to `resolution`, m (lo when even lo is dark). */
function edge(lit: (s: number) => boolean, lo: number, hi: number, resolution = 2e-4): number {
  if (!lit(lo)) return lo;
  if (lit(hi)) return hi;
  while (hi - lo > resolution) {
    const m = 0.5 * (lo + hi);
    if (lit(m)) lo = m;
    else hi = m;
  }
  return lo;
}

/**
 * Runs a validated design and returns its notebook and key numbers.
 * @param design from parseDesign / parseDesignText.
 * @param options log: progress lines of the long steps.
 * @example designReport(parseDesignText(readFileSync("casebook/designs/through-the-books.json", "utf8"))).notebook // the same report as the through-the-books scenario
 */
export function designReport(design: Design, options: { readonly log?: (line: string) => void } = {}): { notebook: Notebook; results: DesignResults } {
  // One function on purpose (≈ 200 lines): a notebook written top to bottom like the casebook scenarios — each section is a
  // few lines of calls and reads in the order of the report.
  const nb = notebook(design.title, { subtitle: design.question, note: design.dataNote, log: options.log });
  for (const p of design.story ?? []) nb.text(p);
  const threshold = design.litThreshold ?? DEFAULT_LIT_THRESHOLD;
  const supplyV = design.supply.voltage;
  const gap = design.surface.gap;

  // ── coils and tanks ──
  const tx = buildCoil(design.transmitter.coil, "transmitter.coil");
  const token = buildCoil(design.token.coil, "token.coil");
  const L2 = selfInductance(token, { frequency: design.token.tuneTo });
  const tokenChoice = tuneWithStandardParts(L2, design.token.tuneTo, { series: design.token.capacitorSeries, maxParts: design.token.capacitorParts }).choices[0]!;
  const C2 = tokenChoice.capacitance;
  const f = 1 / (2 * Math.PI * Math.sqrt(L2 * C2));
  const L1 = selfInductance(tx, { frequency: f });
  const single = design.transmitter.drive === "singleSwitch";
  // single switch: tank tuned about 1.3× above the switching frequency for zero-voltage turn-on
  // (docs/methods/transient.md); half bridge: series tank at the drive frequency
  const txChoice = tuneWithStandardParts(L1, (single ? 1.3 : 1) * f, { series: design.transmitter.capacitorSeries, maxParts: design.transmitter.capacitorParts }).choices[0]!;
  const C1 = txChoice.capacitance;
  const R1 = coilResistance(tx, f), R2 = coilResistance(token, f);
  const Q1 = qualityFactor(tx, f), Q2 = qualityFactor(token, f);
  nb.heading("1. Coils and tanks, from geometry");
  nb.table(
    ["", "transmitter", "token"],
    [
      ["winding", windingText(tx), windingText(token)],
      ["inductance", { value: L1, unit: "H" }, { value: L2, unit: "H" }],
      [`AC resistance at ${q(f, "Hz")}`, { value: R1, unit: "Ω" }, { value: R2, unit: "Ω" }],
      ["quality factor Q", Math.round(Q1), Math.round(Q2)],
      ["self-resonance", { value: selfResonance(tx), unit: "Hz" }, { value: selfResonance(token), unit: "Hz" }],
      [`tank capacitor (${design.transmitter.capacitorSeries} / ${design.token.capacitorSeries})`, `${q(C1, "F")} = ${partsText(txChoice)}`, `${q(C2, "F")} = ${partsText(tokenChoice)}`],
    ],
  );
  nb.text(
    `The token's capacitor puts its resonance at ${q(f, "Hz")} (asked: ${q(design.token.tuneTo, "Hz")}); the transmitter is driven there` +
      (single ? `, its tank ringing at ${q(1 / (2 * Math.PI * Math.sqrt(L1 * C1)), "Hz")} so the single switch turns on at zero voltage.` : " with a series tank tuned to it."),
  );

  // ── the barrier ──
  const b = design.surface.barrier;
  const delta = skinDepth(f, b.resistivity);
  nb.heading("2. What lies between");
  nb.text(
    `${b.thickness >= 0 ? q(b.thickness, "m") : ""} of ${b.material} (resistivity ${q(b.resistivity, "Ω·m")}). Its skin depth at ${q(f, "Hz")} is ${q(delta, "m")}, ` +
      (delta > 100 * b.thickness
        ? `${(delta / b.thickness).toExponential(1)} times its thickness: eddy currents in it are negligible and, being non-magnetic, it leaves the field as it is. Only the distance it adds counts.`
        : delta > b.thickness
          ? "not much larger than its thickness: it absorbs part of the field and heats; expect less range than computed here."
          : "smaller than its thickness: it screens the field. A conducting barrier like this one stops the link and heats up."),
  );

  // ── brightness and range ──
  const colours = design.token.leds as LedColour[];
  const system = (colour: LedColour, x: number, z: number): LinkSystem => ({
    frequency: f,
    transmitter: single
      ? { coil: tx, compensation: "parallel", capacitor: { capacitance: C1, dissipationFactor: 1e-3 }, drive: { kind: "parallelTank", supply: supplyV, onResistance: 0.05 } }
      : { coil: tx, compensation: "series", capacitor: { capacitance: C1, dissipationFactor: 1e-3 }, drive: { kind: "halfBridge", supply: supplyV, onResistance: 0.05 } },
    receivers: [{ coil: token, pose: { position: [x, 0, z] }, topology: "parallel", capacitor: { capacitance: C2, dissipationFactor: 1e-3 }, load: { kind: "led", led: ledPreset(colour) } }],
  });
  const solve = (colour: LedColour, x: number, z: number) => solveLink(system(colour, x, z), { litThreshold: threshold });
  const ledAt = (colour: LedColour, x: number, z: number): number => solve(colour, x, z).receivers[0]!.leds[0]!.averageCurrent;
  const heights = design.surface.heights ?? Array.from({ length: 11 }, (_, i) => gap * (1 + 0.5 * i));
  const tick = nb.step("LED current by height and colour");
  const current: Record<string, number[]> = {};
  colours.forEach((c, i) => {
    current[c] = heights.map((z) => ledAt(c, 0, z));
    tick(i + 1, colours.length);
  });
  const far = Math.max(...heights) * 3;
  const axialRange: Record<string, number> = {};
  const sidewaysRange: Record<string, number> = {};
  for (const c of colours) {
    axialRange[c] = edge((z) => ledAt(c, 0, z) >= threshold, gap, far);
    sidewaysRange[c] = edge((x) => ledAt(c, x, gap) >= threshold, 0, design.surface.reach * 3);
  }
  nb.heading("3. How bright, how far");
  nb.text(`LED average current on the axis above the centre (lit: ≥ ${q(threshold, "A")}):`);
  nb.table(
    ["height", ...colours.map((c) => `${c} LED`)],
    heights.map((z, i) => [{ value: z, unit: "m" }, ...colours.map((c) => `${q(current[c]![i]!, "A")}${current[c]![i]! >= threshold ? "" : " (dark)"}`)]),
  );
  nb.figure(
    "led-current-by-height",
    chart.ledCurrent({ title: "LED current above the transmitter's centre", curves: colours.map((c) => ({ colour: c, label: `${c} LED`, distance: heights, current: current[c]! })), threshold }),
    "LED average current against height on the axis, by LED colour; the dashed line is the lit threshold",
  );
  nb.table(
    ["LED", "lit up to (on the axis)", "lit out to (lying on the surface)", "display area reach"],
    colours.map((c) => [
      `${c} LED`,
      axialRange[c]! >= far ? `beyond ${q(far, "m")}` : axialRange[c]! <= gap && ledAt(c, 0, gap) < threshold ? "dark on the surface" : { value: axialRange[c]!, unit: "m" },
      sidewaysRange[c]! >= 3 * design.surface.reach ? `beyond ${q(3 * design.surface.reach, "m")}` : { value: sidewaysRange[c]!, unit: "m" },
      { value: design.surface.reach, unit: "m" },
    ]),
    `ranges at the lit threshold, to ${q(2e-4, "m")}`,
  );
  nb.text(
    ...colours.map((c) => {
      const up = axialRange[c]! - gap, out = sidewaysRange[c]!;
      const onTop = ledAt(c, 0, gap) >= threshold;
      return `- ${c} LED: ${onTop ? `lit on the surface over the centre, with ${q(up, "m")} to spare above it` : "dark even on the surface over the centre"}; ` +
        `lying on the surface it stays lit out to ${q(out, "m")} from the centre, ${out >= design.surface.reach ? "covering" : "short of"} the ${q(design.surface.reach, "m")} display area.`;
    }),
    "",
    "The field falls roughly as the cube of the distance once the token is beyond the transmitter's radius: a few centimetres more height costs more than any barrier that does not conduct.",
  );
  const offsets = Array.from({ length: 13 }, (_, i) => (i / 12) * design.surface.reach * 1.5);
  const kAt = (x: number, z: number): number => couplingFactor(tx, { position: [0, 0, 0] }, token, { position: [x, 0, z] });
  nb.figure(
    "coupling",
    chart.coupling({
      title: "Coupling between transmitter and token",
      byHeight: [{ label: "on the axis", distance: heights, k: heights.map((z) => kAt(0, z)) }],
      byOffset: [{ label: "lying on the surface", distance: offsets, k: offsets.map((x) => kAt(x, gap)) }],
    }),
    "coupling factor against height on the axis (left) and against offset for a token lying on the surface (right)",
  );

  // ── load line at the surface ──
  const first = colours[0]!;
  const onSurface = solve(first, 0, gap);
  const M = mutualInductance(tx, { position: [0, 0, 0] }, token, { position: [0, 0, gap] });
  const line = tokenLoadLine({ frequency: f, mutualInductance: M, transmitterCurrent: onSurface.transmitter.coilCurrent, inductance: L2, resistance: R2, capacitance: C2, load: { kind: "led", led: ledPreset(first) } });
  nb.heading("4. Where the LED settles on the token's tank");
  nb.figure(
    "load-line",
    chart.loadLine({
      title: `${first} LED token lying on the surface over the centre`,
      voltage: line.voltage, available: line.available, led: line.load,
      operatingPoint: { voltage: onSurface.receivers[0]!.loadVoltage, current: onSurface.receivers[0]!.loadCurrent },
      colour: first,
    }),
    "current the tank can give the LED at each voltage amplitude against the LED's fundamental current; they cross at the operating point",
  );
  nb.text(`Norton current of the token coil ${q(line.norton, "A")} peak; the LED clamps the tank at ${q(onSurface.receivers[0]!.loadVoltage, "V")} peak and takes ${q(onSurface.receivers[0]!.leds[0]!.averageCurrent, "A")} on average.`);

  // ── the real waveform (single switch) ──
  let waveform: DesignResults["waveform"];
  let tankPeak = onSurface.transmitter.capacitorVoltage;
  if (single) {
    nb.step("time-domain run of the single-switch drive");
    const drive = singleSwitchDrive({ supply: supplyV, frequency: f, coilInductance: L1, coilResistance: R1, tankCapacitance: C1, onResistance: 0.05 });
    const tok = addToken(drive.circuit, { coupledTo: drive.coil, mutualInductance: M, inductance: L2, resistance: R2, capacitance: C2, load: { kind: "led", led: ledPreset(first) } });
    const spc = 200;
    const sim = simulate(tok.circuit, { stop: 800 / f, stepsPerCycle: spc, frequency: f, untilSteady: true, keepCycles: 2 });
    const vsw = sim.nodeVoltages["switch"]!;
    const h = waveformHarmonics(sim.time, vsw, { frequency: f });
    const iled = sim.currents[tok.leds.led!]!, isup = sim.currents["Vsupply"]!;
    let ledT = 0, supT = 0;
    for (let i = iled.length - spc; i < iled.length; i++) { ledT += iled[i]! / spc; supT += isup[i]! / spc; }
    supT = Math.abs(supT);
    for (const v of vsw) tankPeak = Math.max(tankPeak, Math.abs(v - supplyV));
    const w = 2 * Math.PI * f;
    const ledF = onSurface.receivers[0]!.leds[0]!.averageCurrent;
    waveform = { peakOverSupply: h.peak / supplyV, distortion: h.distortion, ledFast: ledF, ledTransient: ledT, supplyTransient: supT };
    nb.heading("5. The real waveform of the single switch");
    nb.figure(
      "switch-waveform",
      chart.waveform({ title: "Switch-node voltage, two cycles in steady state", time: sim.time, samples: vsw, fundamental: sim.time.map((t) => h.dc + h.amplitude[1]! * Math.cos(w * t + h.phase[1]!)), name: "switch-node voltage", unit: "V" }),
      "the switch node (solid) and its fundamental plus mean (dashed)",
    );
    nb.figure("switch-spectrum", chart.spectrum({ title: "Harmonics of the switch-node voltage", amplitude: h.amplitude, frequency: f, name: "switch-node voltage", unit: "V" }), "peak amplitude of each harmonic, labelled in dB relative to the fundamental");
    nb.text(
      `- the switch node peaks at ${q(h.peak, "V")}, ${(h.peak / supplyV).toFixed(2)}× the supply, with ${(100 * h.distortion).toFixed(0)} % total harmonic distortion;`,
      `- the token's LED carries ${q(ledT, "A")} in the time-domain run against ${q(ledF, "A")} in the fast model (${(100 * (ledF / ledT - 1)).toFixed(1)} %);`,
      `- the transmitter capacitor sees ${q(tankPeak, "V")} peak; the parts list rates it for that.`,
    );
  }

  // ── supply ──
  const fastSupply = onSurface.power.input / supplyV;
  const supplyCurrent = Math.max(fastSupply, waveform?.supplyTransient ?? 0);
  nb.heading(`${single ? 6 : 5}. Supply`);
  nb.table(
    ["case", "DC supply current", "power"],
    [
      [`one ${first} token on the surface, fast model (input power / supply)`, { value: fastSupply, unit: "A" }, { value: onSurface.power.input, unit: "W" }],
      ...(waveform ? [[`the same, time-domain run (mean supply current)`, { value: waveform.supplyTransient, unit: "A" }, { value: waveform.supplyTransient * supplyV, unit: "W" }] as const] : []),
    ],
  );
  nb.text(`Budget: ${q(supplyCurrent, "A")} from a ${q(supplyV, "V")} supply rated ${q(design.supply.rating, "A")} — ${supplyCurrent <= design.supply.rating ? `${((100 * supplyCurrent) / design.supply.rating).toFixed(0)} % of its rating` : "MORE than its rating: choose a larger supply or a weaker drive"}.`);

  // ── safety ──
  const touch = design.surface.touchHeight ?? Math.max(0.001, gap - 0.002);
  nb.step("exposure, emission, stress and metal heating");
  const safety = safetyReport(designFromLink(system(first, 0, gap), onSurface, { surfaceHeight: touch }));
  const safetyCautions = addSafetySections(nb, safety, { coil: tx, current: onSurface.transmitter.coilCurrent, surfaceHeight: touch, reach: Math.max(design.surface.reach, 0.05) });

  nb.parts(
    partsList({
      coils: [{ item: "transmitter coil", coil: tx }, { item: "token coil", coil: token, quantity: design.token.count }],
      capacitors: [
        { item: "transmitter tank capacitor", parts: txChoice.parts, topology: txChoice.topology, series: design.transmitter.capacitorSeries, peakVoltage: tankPeak },
        { item: "token tank capacitor", parts: tokenChoice.parts, topology: tokenChoice.topology, series: design.token.capacitorSeries, peakVoltage: onSurface.receivers[0]!.capacitorVoltage, quantity: design.token.count },
      ],
      leds: colours.map((c) => ({ item: "token LED", colour: c, quantity: Math.ceil(design.token.count / colours.length) })),
      supply: { item: "supply", voltage: supplyV, current: supplyCurrent, rating: design.supply.rating },
    }),
  );
  const cautions = [...new Set([...onSurface.cautions, ...safetyCautions])];
  nb.cautions(cautions);
  return {
    notebook: nb,
    results: {
      frequency: f,
      transmitter: { inductance: L1, resistance: R1, quality: Q1, capacitance: C1 },
      token: { inductance: L2, resistance: R2, quality: Q2, capacitance: C2 },
      axialRange, sidewaysRange, profile: { heights, current },
      barrier: { skinDepth: delta, thickness: b.thickness },
      supplyCurrent, waveform, safety, cautions,
    },
  };
}

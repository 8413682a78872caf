/**
 * Sequenced transmitter arrays (issue 13): each step is checked against solveLink of the same
 * coils driven together (independent path: a fresh system through the whole solver), and the
 * averages against the steps' numbers combined here.
 */
import { describe, expect, it } from "vitest";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { solveLink, type LinkSystem } from "../../lib/circuit/link.ts";
import { solveLinkSequence } from "../../lib/circuit/link/sequence.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { selfInductance } from "../../lib/em/selfInductance.ts";
import { ledPreset } from "../../lib/circuit/loads/ledPresets.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import type { Vec3 } from "../../lib/em/types.ts";

// demo parts (not a published design): three 40 mm pads in a row and two LED tokens
const pad = roundCoil({ meanRadius: "40 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
const token = roundCoil({ innerRadius: "5 mm", turns: 60, layers: 3, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
const w = 2 * Math.PI * 200e3;
const Cpad = 1 / (w * w * selfInductance(pad, { frequency: 200e3 }));
const Ctok = 1 / (w * w * selfInductance(token, { frequency: 200e3 }));
type Tx = NonNullable<LinkSystem["transmitters"]>[number];
const padAt = (label: string, x: number, drive: Tx["drive"] = { kind: "halfBridge", supply: "12 V", onResistance: "0.1 Ω" }): Tx => ({
  label,
  coil: pad,
  pose: { position: [x, 0, 0] },
  compensation: "series",
  capacitor: { capacitance: Cpad, dissipationFactor: 1e-3 },
  drive,
});
const tokenAt = (p: Vec3): LinkSystem["receivers"][number] => ({
  coil: token,
  pose: { position: p },
  topology: "parallel",
  capacitor: { capacitance: Ctok, dissipationFactor: 1e-3 },
  load: { kind: "led", led: ledPreset("red") },
});
const receivers = [tokenAt([-0.03, 0.01, 0.02]), tokenAt([0.045, 0, 0.025])];
const pads = [padAt("A", -0.09), padAt("B", 0), padAt("C", 0.09)];
const system: LinkSystem = { frequency: "200 kHz", transmitters: pads, receivers };

describe("solveLinkSequence", () => {
  it("a scan averages each token's LED current over the one-coil steps (idle coils open)", () => {
    const seq = solveLinkSequence(system, { steps: "scan" });
    expect(seq.steps.map((s) => s.on)).toEqual([["A"], ["B"], ["C"]]);
    const alone = pads.map((p) => solveLink({ frequency: "200 kHz", transmitters: [p], receivers }));
    seq.steps.forEach((st, s) => {
      expect(st.share).toBe(1 / 3);
      // the step is the same link as the coil driven alone (an open coil carries no current)
      st.result.receivers.forEach((r, k) => expectRelClose(r.leds[0]!.averageCurrent, alone[s]!.receivers[k]!.leds[0]!.averageCurrent, 1e-12, `step ${s} token ${k}`));
    });
    seq.receivers.forEach((r, k) => {
      const mean = alone.reduce((a, x) => a + x.receivers[k]!.leds[0]!.averageCurrent, 0) / 3;
      const peak = Math.max(...alone.map((x) => x.receivers[k]!.leds[0]!.averageCurrent));
      expectRelClose(r.leds[0]!.averageCurrent, mean, 1e-12, `token ${k} average`);
      expectRelClose(r.leds[0]!.peakCurrent, peak, 1e-12, `token ${k} peak`);
      expect(r.leds[0]!.lit).toBe(mean >= seq.litThreshold);
    });
    seq.transmitters.forEach((t, i) => {
      expectRelClose(t.duty, 1 / 3, 1e-15, "duty of one coil in a 3-step scan");
      const a = alone[i]!.transmitters[0]!;
      expectRelClose(t.coilCurrentRms, a.coilCurrentRms * Math.sqrt(1 / 3), 1e-12, "RMS over the sequence");
      expectRelClose(t.peakCapacitorVoltage, a.capacitorVoltage, 1e-12, "peak capacitor voltage");
    });
    expectRelClose(seq.power.input, alone.reduce((a, x) => a + x.power.input, 0) / 3, 1e-12, "average input power");
    expect(seq.perception).toMatch(/100 Hz.*trade practice, no source/);
  });

  it("groups with weights; idle coils held at zero EMF stay in the network", () => {
    const seq = solveLinkSequence(system, { steps: [{ on: ["A", "C"], weight: 3 }, { on: [1] }], idle: "held" });
    expect(seq.steps.map((s) => s.share)).toEqual([0.75, 0.25]);
    const zero = { kind: "sine" as const, amplitude: 0, outputResistance: "0.1 Ω" };
    // held: the idle bridge holds its output with one switch on (R_on = 0.1 Ω) — a 0 V source behind 0.1 Ω
    const ac = solveLink({ frequency: "200 kHz", transmitters: [pads[0]!, padAt("B", 0, zero), pads[2]!], receivers });
    const b = solveLink({ frequency: "200 kHz", transmitters: [padAt("A", -0.09, zero), pads[1]!, padAt("C", 0.09, zero)], receivers });
    ac.transmitters.forEach((t, i) => expectRelClose(seq.steps[0]!.result.transmitters![i]!.coilCurrent, t.coilCurrent, 1e-12, `step AC coil ${i}`));
    b.transmitters.forEach((t, i) => expectRelClose(seq.steps[1]!.result.transmitters![i]!.coilCurrent, t.coilCurrent, 1e-12, `step B coil ${i}`));
    // the held coil B carries an induced current in step AC
    expect(seq.steps[0]!.result.transmitters![1]!.coilCurrent).toBeGreaterThan(0);
    seq.receivers.forEach((r, k) =>
      expectRelClose(r.leds[0]!.averageCurrent, 0.75 * ac.receivers[k]!.leds[0]!.averageCurrent + 0.25 * b.receivers[k]!.leds[0]!.averageCurrent, 1e-12, `token ${k} weighted average`),
    );
    expect(seq.transmitters.map((t) => t.duty)).toEqual([0.75, 0.25, 0.75]);
  });

  it("names what it refuses; warns of visible flicker below 100 Hz", () => {
    expect(() => solveLinkSequence(system, { steps: [{ on: ["D"] }] })).toThrow(TanklightInputError);
    expect(() => solveLinkSequence(system, { steps: [{ on: ["a"] }] })).toThrow(/steps\[0\]\.on\[0\].*did you mean 'A'/);
    expect(() => solveLinkSequence(system, { steps: [{ on: [5] }] })).toThrow(/steps\[0\]\.on\[0\]/);
    expect(() => solveLinkSequence(system, { step: "scan" } as never)).toThrow(/did you mean 'steps'/);
    const shared: LinkSystem = {
      frequency: "200 kHz",
      sharedDrives: [{ name: "bus", drive: { kind: "fullBridge", supply: "12 V" }, wiring: "series" }],
      transmitters: [padAt("A", -0.09, "bus"), padAt("B", 0, "bus"), padAt("C", 0.09)],
      receivers,
    };
    expect(() => solveLinkSequence(shared, { steps: "scan" })).toThrow(/part of shared drive 'bus'.*switch together/);
    const ok = solveLinkSequence(shared, { steps: [{ on: ["A", "B"] }, { on: ["C"] }], repetitionRate: "50 Hz" });
    expect(ok.warnings.join(" ")).toMatch(/50\.0 Hz, below about 100 Hz: the tokens will visibly flicker/);
    expect(() => solveLinkSequence(system, { steps: "scan" }, { model: "harmonic" } as never)).toThrow(/options\.model/);
  });
});

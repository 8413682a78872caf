/**
 * Harmonic balance over several transmitters on their own drives (issue 14): two series-tuned
 * transmitter coils coupled to each other and to one parallel-tuned token, against the transient
 * engine's periodic steady state of the same circuit (independent method: shooting, Aprille &
 * Trick 1972, 400 steps a cycle), and against the describing function where that is exact (a
 * resistive token, sine drives). Demo values.
 */
import { describe, expect, it } from "vitest";
import { solveLinkHarmonic } from "../../../lib/circuit/harmonic/solveHarmonic.ts";
import { solveLinkModel } from "../../../lib/circuit/harmonic/modelChoice.ts";
import { solveLinkNetwork } from "../../../lib/circuit/link/solveNetwork.ts";
import type { LinkNetwork } from "../../../lib/circuit/link/network.ts";
import { tokenLoadModel } from "../../../lib/circuit/link/tokenLoad.ts";
import { fullBridgeDrive, sineDrive } from "../../../lib/circuit/drive.ts";
import { periodicSteadyState } from "../../../lib/circuit/transient/shooting.ts";
import { addToken } from "../../../lib/circuit/transient/token.ts";
import { sineWaveform } from "../../../lib/circuit/transient/waveforms.ts";
import { bridgeDrive } from "../../../lib/circuit/transient/drives.ts";
import { waveformHarmonics } from "../../../lib/circuit/transient/harmonics.ts";
import type { CircuitElement, TransientCircuit } from "../../../lib/circuit/transient/circuit.ts";
import type { TokenLoad } from "../../../lib/circuit/loads/types.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { F, LOADS } from "./circuits.ts";

const W = 2 * Math.PI * F;
const L1 = 10e-6; // each transmitter coil
const R1 = 1.5;
const C1 = 1 / (W * W * L1);
const L2 = 30e-6; // the token
const R2 = 1.2;
const C2 = 1 / (W * W * L2);
const RON = 0.05;

/** Two transmitters: coupling between them k12 (neighbours on a board: negative), to the token k1, k2. */
interface Case {
  readonly drives: readonly ["sine" | "fullBridge", number, number][]; // kind, level (V), phase (rad)
  readonly k12: number;
  readonly k1: number;
  readonly k2: number;
  readonly load: TokenLoad;
}

function networkOf(c: Case, load = tokenLoadModel(c.load)): LinkNetwork {
  const m12 = c.k12 * L1;
  const m1 = c.k1 * Math.sqrt(L1 * L2);
  const m2 = c.k2 * Math.sqrt(L1 * L2);
  // the transient bridge's leg A is high for the first half period: a square wave whose
  // fundamental is sin ωt = cos(ωt − π/2), so its phase here is −π/2 (every harmonic h turns by −hπ/2)
  const transmitters = c.drives.map(([kind, level, phase], i) => ({
    label: `pad ${i + 1}`,
    resistance: R1,
    compensation: "series" as const,
    capacitance: C1,
    drive: kind === "sine" ? sineDrive(level) : fullBridgeDrive(level, RON),
    ...(kind === "fullBridge" ? { phase: phase - Math.PI / 2 } : phase !== 0 ? { phase } : {}),
  }));
  return {
    frequency: F,
    inductance: [
      [L1, m12, m1],
      [m12, L1, m2],
      [m1, m2, L2],
    ],
    transmitter: transmitters[0]!,
    transmitters,
    receivers: [{ resistance: R2, topology: "parallel", capacitance: C2, load }],
  };
}

/** The same circuit for the transient engine: each transmitter's source and series tank, the three couplings, the token. */
function circuitOf(c: Case): { circuit: TransientCircuit; coils: string[]; leds: string[] } {
  const elements: CircuitElement[] = [];
  const coils: string[] = [];
  c.drives.forEach(([kind, level, phase], i) => {
    const p = `t${i + 1}`;
    if (kind === "sine") {
      elements.push(
        { kind: "voltageSource", name: `${p}.V`, plus: `${p}.s`, minus: "ground", waveform: sineWaveform({ amplitude: level, frequency: F, phase }) },
        { kind: "resistor", name: `${p}.R`, a: `${p}.s`, b: `${p}.c`, resistance: R1 },
        { kind: "capacitor", name: `${p}.C`, a: `${p}.c`, b: `${p}.top`, capacitance: C1 },
        { kind: "inductor", name: `${p}.L`, a: `${p}.top`, b: "ground", inductance: L1 },
      );
      coils.push(`${p}.L`);
    } else {
      if (phase !== 0) throw new Error("test circuit: the bridge runs at phase 0");
      const d = bridgeDrive({ supply: level, frequency: F, bridge: "full", coilInductance: L1, coilResistance: R1, tankCapacitance: C1, onResistance: RON });
      // rename the bridge's elements and nodes so that two can sit in one circuit
      const ren = (x: string): string => (x === "ground" ? x : `${p}.${x}`);
      for (const e of d.circuit.elements) elements.push(renamed(e, ren));
      coils.push(ren(d.coil));
    }
  });
  elements.push({ kind: "coupling", name: "M12", inductors: [coils[0]!, coils[1]!], k: c.k12 });
  const tok = addToken({ elements }, { coupledTo: coils[0]!, k: c.k1, inductance: L2, resistance: R2, capacitance: C2, load: c.load });
  const circuit: TransientCircuit = { elements: [...tok.circuit.elements, { kind: "coupling", name: "M2t", inductors: [coils[1]!, tok.coil], k: c.k2 }] };
  const leds = (["led", "a", "b"] as const).filter((x) => tok.leds[x] !== undefined).map((x) => tok.leds[x]!);
  return { circuit, coils: [...coils, tok.coil], leds };
}

/** An element with its own name and every node name passed through `ren`. */
function renamed(e: CircuitElement, ren: (x: string) => string): CircuitElement {
  const out: Record<string, unknown> = { ...e, name: ren(e.name) };
  for (const key of ["a", "b", "plus", "minus", "anode", "cathode", "control"] as const) {
    const v = (e as unknown as Record<string, unknown>)[key];
    if (typeof v === "string") out[key] = ren(v);
  }
  const inductors = (e as { inductors?: readonly [string, string] }).inductors;
  if (inductors) out.inductors = [ren(inductors[0]), ren(inductors[1])];
  return out as unknown as CircuitElement;
}

function periodic(c: Case) {
  const { circuit, coils, leds } = circuitOf(c);
  const n = 400;
  const pss = periodicSteadyState(circuit, { frequency: F, stepsPerCycle: n, tolerance: 1e-10 });
  expect(pss.shooting.converged).toBe(true);
  const avg = (a: ArrayLike<number>): number => {
    let s = 0;
    for (let i = a.length - n; i < a.length; i++) s += a[i]!;
    return s / n;
  };
  return {
    coils: coils.map((x) => waveformHarmonics(pss.time, Array.from(pss.currents[x]!), { frequency: F, count: 1 }).amplitude[1]!),
    leds: leds.map((x) => avg(pss.currents[x]!)),
  };
}

const SRC = "independent method: transient engine's periodic steady state of the same circuit (shooting, 400 steps a cycle)";
const pair = LOADS["red + InGaN green back to back"]!;

describe("harmonic balance over two transmitters on their own drives", () => {
  const cases: [string, Case][] = [
    ["sine 2 V and sine 1.5 V at 90°, k12 −0.03, bi-colour token", { drives: [["sine", 2, 0], ["sine", 1.5, Math.PI / 2]], k12: -0.03, k1: 0.05, k2: 0.03, load: pair }],
    ["full bridge 3 V and sine 1 V, k12 −0.03, bi-colour token", { drives: [["fullBridge", 3, 0], ["sine", 1, 0]], k12: -0.03, k1: 0.04, k2: 0.04, load: pair }],
  ];
  for (const [name, c] of cases) {
    it(`${name}: each LED's average current and each coil current amplitude within 1 % of the periodic steady state`, () => {
      const hb = solveLinkHarmonic(networkOf(c));
      expect(hb.converged).toBe(true);
      const ref = periodic(c);
      const txs = hb.transmitters!;
      expect(txs.length).toBe(2);
      expect(hb.drives!.length).toBe(2);
      txs.forEach((t, i) => expectOutside({ quantity: `${t.label} coil current, ${name}`, source: SRC, ours: t.coilCurrent, reference: ref.coils[i]!, rtol: 0.01, unit: "A" }));
      expectOutside({ quantity: `token coil current, ${name}`, source: SRC, ours: hb.receivers[0]!.coilCurrent, reference: ref.coils[2]!, rtol: 0.01, unit: "A" });
      hb.receivers[0]!.leds.forEach((l, i) => {
        expect(ref.leds[i]!).toBeGreaterThan(1e-4); // both LEDs conduct: the check has something to check
        expectOutside({ quantity: `${l.label} average current, ${name}`, source: SRC, ours: l.averageCurrent, reference: ref.leds[i]!, rtol: 0.01, unit: "A" });
      });
      // the power balance over the period holds across both drives
      const p = hb.power;
      expect(Math.abs(p.delivered + p.driver + p.transmitterCoil + p.transmitterCapacitor + p.receiverCoils + p.receiverCapacitors - p.input)).toBeLessThan(2e-3 * p.input);
    });
  }

  it("agrees with the describing function where that is exact (resistive token, sine drives, 1e-9)", () => {
    const c: Case = { drives: [["sine", 2, 0], ["sine", 1.5, 2.1]], k12: -0.03, k1: 0.05, k2: 0.03, load: { kind: "resistor", resistance: 150 } };
    const net = networkOf(c);
    const hb = solveLinkHarmonic(net);
    const df = solveLinkNetwork(net);
    const src = "independent method: describing-function solver (exact for a linear load under sine drives)";
    hb.transmitters!.forEach((t, i) => expectOutside({ quantity: `${t.label} coil current`, source: src, ours: t.coilCurrent, reference: df.transmitters![i]!.coilCurrent, rtol: 1e-9, unit: "A" }));
    expectOutside({ quantity: "token tank amplitude", source: src, ours: hb.receivers[0]!.loadVoltage, reference: df.receivers[0]!.loadVoltage, rtol: 1e-9, unit: "V" });
    expectOutside({ quantity: "input power", source: src, ours: hb.power.input, reference: df.power.input, rtol: 1e-9, unit: "W" });
    hb.drives!.forEach((d, i) => expectOutside({ quantity: `${d.label} input power`, source: src, ours: d.inputPower, reference: df.drives![i]!.inputPower, rtol: 1e-9, unit: "W" }));
  });

  it("'auto' over the array runs harmonic balance where the describing function is off, and says so", () => {
    const c = cases[0]![1];
    const auto = solveLinkModel(networkOf(c), { model: "auto" });
    expect(auto.model).toBe("harmonic");
    const fundamental = solveLinkModel(networkOf(c), { model: "fundamental" });
    expect(fundamental.errorBand.relative).toBeGreaterThanOrEqual(1); // the InGaN green LED: outside its validity
    expect(fundamental.warnings.join(" ")).toMatch(/green/i);
  });

  it("refuses coils on a shared drive, naming the field", () => {
    const c = cases[0]![1];
    const net = networkOf(c);
    const shared: LinkNetwork = { ...net, sharedDrives: [{ label: "bus", drive: sineDrive(2), wiring: "series" }], transmitters: net.transmitters!.map((t) => ({ ...t, feed: { drive: 0, polarity: 1 } })) };
    expect(() => solveLinkHarmonic(shared)).toThrow(TanklightInputError);
    expect(() => solveLinkHarmonic(shared)).toThrow(/sharedDrives.*own drives/);
  });
});

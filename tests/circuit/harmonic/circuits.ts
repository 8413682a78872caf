/**
 * One circuit, two engines: a transmitter (sine source into a series tank, full bridge into a
 * series tank, or the single switch under a parallel tank) coupled to one parallel-tuned token,
 * as a transient circuit and as the link network the frequency-domain solvers take. Used by the
 * harmonic-balance checks against the transient engine's periodic steady state. Demo values.
 */
import { simulate } from "../../../lib/circuit/transient/simulate.ts";
import { addToken } from "../../../lib/circuit/transient/token.ts";
import { sineWaveform } from "../../../lib/circuit/transient/waveforms.ts";
import { bridgeDrive, singleSwitchDrive } from "../../../lib/circuit/transient/drives.ts";
import { waveformHarmonics } from "../../../lib/circuit/transient/harmonics.ts";
import type { TransientCircuit } from "../../../lib/circuit/transient/circuit.ts";
import type { TokenLoad } from "../../../lib/circuit/loads/types.ts";
import type { LinkNetwork } from "../../../lib/circuit/link/network.ts";
import { tokenLoadModel } from "../../../lib/circuit/link/tokenLoad.ts";
import { fullBridgeDrive, parallelTankDrive, sineDrive } from "../../../lib/circuit/drive.ts";
import { ledPreset, diodePreset } from "../../../lib/circuit/loads/ledPresets.ts";

export type DriveKind = "sine" | "fullBridge" | "singleSwitch";

/** The token loads the harmonic-balance checks run over, by name. */
const red = ledPreset("red");
const green = ledPreset("green-ingan");
const schottky = diodePreset("schottky");
export const LOADS: Record<string, TokenLoad> = {
  "red LED": { kind: "led", led: red },
  "red + InGaN green back to back": { kind: "antiParallel", a: red, b: green },
  "red + GaP green, same direction": { kind: "parallelSameDirection", a: red, b: ledPreset("green-gap") },
  "Schottky bridge + red LED": { kind: "bridge", diode: schottky, led: red },
  "half-wave reservoir 10 µF + red LED": { kind: "halfWaveReservoir", diode: schottky, led: red, capacitance: 10e-6 },
};

export const F = 200e3;
const W = 2 * Math.PI * F;
const L2 = 30e-6;
const R2 = 1.2;
const C2 = 1 / (W * W * L2);
const RON = 0.05;

/** Transmitter numbers per drive kind (the single switch: a low-inductance tank tuned 1.3× above f for zero-voltage turn-on). */
function txOf(kind: DriveKind, txResistance?: number): { L1: number; R1: number; C1: number } {
  if (kind === "singleSwitch") {
    const L1 = 1.6e-6;
    return { L1, R1: 0.05, C1: 1 / ((1.3 * W) ** 2 * L1) };
  }
  const L1 = 10e-6;
  return { L1, R1: txResistance ?? 1.5, C1: 1 / (W * W * L1) };
}

/** The link network of the circuit (SI numbers), for solveLinkNetwork / solveLinkHarmonic; `txResistance` (Ω) overrides the sine or bridge transmitter coil's 1.5 Ω. */
export function networkOf(kind: DriveKind, level: number, k: number, load: TokenLoad, txResistance?: number): LinkNetwork {
  const { L1, R1, C1 } = txOf(kind, txResistance);
  const M = k * Math.sqrt(L1 * L2);
  const drive = kind === "sine" ? sineDrive(level) : kind === "fullBridge" ? fullBridgeDrive(level, RON) : parallelTankDrive(level, RON);
  return {
    frequency: F,
    inductance: [
      [L1, M],
      [M, L2],
    ],
    transmitter: { resistance: R1, compensation: kind === "singleSwitch" ? "parallel" : "series", capacitance: C1, drive },
    receivers: [{ resistance: R2, topology: "parallel", capacitance: C2, load: tokenLoadModel(load) }],
  };
}

/** The transient circuit of the same link, with the token's names. */
export function circuitOf(kind: DriveKind, level: number, k: number, load: TokenLoad, txResistance?: number) {
  const { L1, R1, C1 } = txOf(kind, txResistance);
  let base: TransientCircuit;
  let coil: string;
  if (kind === "sine") {
    base = {
      elements: [
        { kind: "voltageSource", name: "Vs", plus: "s", minus: "ground", waveform: sineWaveform({ amplitude: level, frequency: F }) },
        { kind: "resistor", name: "R1", a: "s", b: "c", resistance: R1 },
        { kind: "capacitor", name: "C1", a: "c", b: "top1", capacitance: C1 },
        { kind: "inductor", name: "Ltx", a: "top1", b: "ground", inductance: L1 },
      ],
    };
    coil = "Ltx";
  } else if (kind === "fullBridge") {
    const d = bridgeDrive({ supply: level, frequency: F, bridge: "full", coilInductance: L1, coilResistance: R1, tankCapacitance: C1, onResistance: RON });
    base = d.circuit;
    coil = d.coil;
  } else {
    const d = singleSwitchDrive({ supply: level, frequency: F, coilInductance: L1, coilResistance: R1, tankCapacitance: C1, onResistance: RON });
    base = d.circuit;
    coil = d.coil;
  }
  const tok = addToken(base, { coupledTo: coil, k, inductance: L2, resistance: R2, capacitance: C2, load });
  return { tok, coil };
}

/** The transient engine's steady state of that circuit: coil current fundamental, tank fundamental, each LED's average current. */
export function transientSteady(kind: DriveKind, level: number, k: number, load: TokenLoad, stepsPerCycle = 400, txResistance?: number) {
  const { tok, coil } = circuitOf(kind, level, k, load, txResistance);
  const r = simulate(tok.circuit, { stop: 4000 / F, stepsPerCycle, frequency: F, untilSteady: { tolerance: 1e-7 }, keepCycles: 1 });
  const avg = (name: string): number => {
    const i = r.currents[name]!;
    let s = 0;
    for (let j = 0; j < stepsPerCycle; j++) s += i[j]!;
    return s / stepsPerCycle;
  };
  const roles = (["led", "a", "b"] as const).filter((x) => tok.leds[x] !== undefined);
  return {
    reached: r.steady?.reached ?? false,
    coilCurrent: waveformHarmonics(r.time, r.currents[coil]!, { frequency: F }).amplitude[1]!,
    tankFundamental: waveformHarmonics(r.time, r.nodeVoltages[tok.top]!, { frequency: F }).amplitude[1]!,
    leds: roles.map((x) => avg(tok.leds[x]!)),
  };
}

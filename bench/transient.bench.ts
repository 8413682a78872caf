/**
 * Transient-engine workloads (issue 7). Target: 400 cycles at 200 kHz with 200 steps a cycle
 * of a single-switch drive + transmitter tank + one coupled LED token in ≤ 1 s.
 */
import type { Workload } from "./harness.ts";
import { simulate } from "../lib/circuit/transient/simulate.ts";
import { singleSwitchDrive } from "../lib/circuit/transient/drives.ts";
import { addToken } from "../lib/circuit/transient/token.ts";
import { ledPreset } from "../lib/circuit/loads/ledPresets.ts";

const f = 200e3;
const w = 2 * Math.PI * f;
const L1 = 10e-6;
const L2 = 30e-6;
const drive = singleSwitchDrive({ supply: 5, frequency: f, coilInductance: L1, coilResistance: 0.2, tankCapacitance: 1 / (w * w * L1) / 1.69 });
const withToken = addToken(drive.circuit, {
  coupledTo: drive.coil, k: 0.05, inductance: L2, resistance: 2, capacitance: 1 / (w * w * L2), load: { kind: "led", led: ledPreset("red") },
});

export const workloads: Workload[] = [
  {
    name: "simulate: single-switch drive + Tx tank + red-LED token",
    size: "400 cycles × 200 steps",
    target: 1,
    minTime: 3,
    fn: () => simulate(withToken.circuit, { stop: 400 / f, stepsPerCycle: 200, frequency: f }),
  },
  {
    name: "simulate: same drive, no token (linear, cached LU)",
    size: "400 cycles × 200 steps",
    minTime: 2,
    fn: () => simulate(drive.circuit, { stop: 400 / f, stepsPerCycle: 200, frequency: f }),
  },
];

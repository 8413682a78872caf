/**
 * Steady-state workloads (issue 14): harmonic balance against the describing function for one
 * LED token (target: HB with 9 harmonics ≤ 20× the describing function's time, same run), and a
 * 121 × 61 map with model "auto" over a bi-colour token (red + InGaN green back to back) on a
 * 5 V full bridge (target ≤ 1 s): the analysis layer's token probe, as coverageMap runs it —
 * probe set-up (link network, tabulated describing functions), the mutual inductance of every
 * pose (couplingEvaluator, memoised per coil pair across calls as in a user's session), and the
 * token's harmonic balance tabulated against its induced EMF, built afresh in every call
 * (lib/circuit/harmonic/linkTable.ts). And the pebble drawer's switch + parallel tank + red
 * LED token (token Q 50) to a steady state of tolerance 1e-9, both at 200 steps a cycle and
 * both judged by the same measure (each state variable's change against its peak,
 * steadyState.ts): plain time stepping (untilSteady, 30 cycles; its detector's estimate of the
 * remaining distance ≤ 1e-9) against shooting (periodicSteadyState; the Newton step that would
 * follow ≤ 1e-9) — from rest, and as the library runs it for this drive (switchPeriodic: the
 * describing-function solution as Newton's starting state, its solve timed too), target ≥ 5×
 * faster.
 */
import type { Workload } from "./harness.ts";
import { solveLinkNetwork } from "../lib/circuit/link/solveNetwork.ts";
import type { LinkNetwork } from "../lib/circuit/link/network.ts";
import { tokenLoadModel } from "../lib/circuit/link/tokenLoad.ts";
import { solveLinkHarmonic } from "../lib/circuit/harmonic/solveHarmonic.ts";
import { sineDrive } from "../lib/circuit/drive.ts";
import { ledPreset } from "../lib/circuit/loads/ledPresets.ts";
import { roundCoil } from "../lib/em/builders/roundCoil.ts";
import { selfInductance } from "../lib/em/selfInductance.ts";
import type { LinkSystem } from "../lib/circuit/link.ts";
import { makeProbe } from "../lib/analysis/probe.ts";
import { probeSpec } from "../lib/analysis/probeSpec.ts";
import { singleSwitchDrive } from "../lib/circuit/transient/drives.ts";
import { addToken } from "../lib/circuit/transient/token.ts";
import { simulate } from "../lib/circuit/transient/simulate.ts";
import { periodicSteadyState } from "../lib/circuit/transient/shooting.ts";
import { switchPeriodic } from "../lib/circuit/harmonic/switchPeriodic.ts";
import { parallelTankDrive } from "../lib/circuit/drive.ts";

const f = 200e3;
const w = 2 * Math.PI * f;
const red = { kind: "led" as const, led: ledPreset("red") };
const bicolour = { kind: "antiParallel" as const, a: ledPreset("red"), b: ledPreset("green-ingan") };

// one token, one pose: 10 µH series-tuned transmitter, 30 µH parallel-tuned token, k = 0.05, sine 1 V
const L1 = 10e-6;
const L2 = 30e-6;
const M = 0.05 * Math.sqrt(L1 * L2);
const one: LinkNetwork = {
  frequency: f,
  inductance: [[L1, M], [M, L2]],
  transmitter: { resistance: 1.5, compensation: "series", capacitance: 1 / (w * w * L1), drive: sineDrive(1) },
  receivers: [{ resistance: 1.2, topology: "parallel", capacitance: 1 / (w * w * L2), load: tokenLoadModel(red, { tabulate: true }) }],
};

// the map: a 5-turn, 50 mm transmitter, series-tuned, on a 5 V full bridge; a pebble token (120 turns) with a red + green pair
const tx = roundCoil({ meanRadius: 0.05, turns: 5, wire: { diameter: 0.8e-3, insulation: 0.03e-3 } });
const token = roundCoil({ innerRadius: 0.0065, turns: 120, layers: 6, wire: { diameter: 0.1e-3, insulation: 0.01e-3 } });
const mapSystem: LinkSystem = {
  frequency: f,
  transmitter: { coil: tx, compensation: "series", capacitor: { capacitance: 1 / (w * w * selfInductance(tx, { frequency: f })) }, drive: { kind: "fullBridge", supply: 5, onResistance: 0.05 } },
  receivers: [{ coil: token, pose: { position: [0, 0, 0.005] }, topology: "parallel", capacitor: { capacitance: 1 / (w * w * selfInductance(token, { frequency: f })) }, load: bicolour }],
};
const mapPositions = new Float64Array(3 * 121 * 61);
for (let iz = 0, p = 0; iz < 61; iz++) {
  for (let ix = 0; ix < 121; ix++, p++) {
    mapPositions[3 * p] = (ix - 60) * 1e-3;
    mapPositions[3 * p + 2] = 0.005 + iz * 1e-3;
  }
}

// the pebble drawer's drive: single switch, 1.6 µH parallel tank tuned 1.3× the drive, red LED token
const L1d = 1.6e-6;
const drawerDrive = singleSwitchDrive({ supply: 5, frequency: f, coilInductance: L1d, coilResistance: 0.05, tankCapacitance: 1 / ((1.3 * w) ** 2 * L1d), onResistance: 0.05 });
const drawer = addToken(drawerDrive.circuit, { coupledTo: "Ltx", k: 0.05, inductance: L2, resistance: (w * L2) / 50, capacitance: 1 / (w * w * L2), load: red }).circuit;
// the same circuit as a link network (switchPeriodic builds the circuit above from it)
const Md = 0.05 * Math.sqrt(L1d * L2);
const drawerNet: LinkNetwork = {
  frequency: f,
  inductance: [[L1d, Md], [Md, L2]],
  transmitter: { resistance: 0.05, compensation: "parallel", capacitance: 1 / ((1.3 * w) ** 2 * L1d), drive: parallelTankDrive(5, 0.05) },
  receivers: [{ resistance: (w * L2) / 50, topology: "parallel", capacitance: 1 / (w * w * L2), load: tokenLoadModel(red, { tabulate: true }) }],
};

export const workloads: Workload[] = [
  { name: "steady: describing function, 1 red LED token", size: "1 pose (M given)", fn: () => solveLinkNetwork(one) },
  {
    name: "steady: harmonic balance, 1 red LED token, 9 harmonics",
    size: "1 pose, 72 samples",
    against: "steady: describing function, 1 red LED token",
    maxSlowdown: 20,
    fn: () => solveLinkHarmonic(one, { order: 9 }),
  },
  {
    name: "steady: 121×61 map, model auto, bi-colour token",
    size: "7381 poses: coupling + tabulated harmonic balance",
    target: 1,
    minTime: 2,
    rounds: 5,
    fn: () => {
      const values = makeProbe(probeSpec(mapSystem, { model: "auto" }, "bench")).evaluate(mapPositions);
      let lit = 0;
      for (const c of values.current) if (c >= 5e-4) lit++;
      return lit;
    },
  },
  {
    name: "steady: drawer switch + tank + LED token, plain stepping to 1e-9",
    size: "200 steps a cycle, 30 cycles",
    fn: () => simulate(drawer, { stop: 1000 / f, stepsPerCycle: 200, frequency: f, untilSteady: { tolerance: 1e-9 }, keepCycles: 1 }).steady!.cycles,
  },
  {
    name: "steady: drawer switch + tank + LED token, shooting from rest",
    size: "200 steps a cycle, 6 periods",
    against: "steady: drawer switch + tank + LED token, plain stepping to 1e-9",
    fn: () => periodicSteadyState(drawer, { frequency: f, stepsPerCycle: 200, tolerance: 1e-9 }).shooting.periods,
  },
  {
    name: "steady: drawer switch + tank + LED token, shooting (switchPeriodic)",
    size: "DF start, 4 periods",
    against: "steady: drawer switch + tank + LED token, plain stepping to 1e-9",
    targetRatio: 5,
    fn: () => switchPeriodic(drawerNet, 200)!.periods,
  },
];

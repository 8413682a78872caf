/**
 * Link solver workloads (issue 6 targets): one transmitter + one LED token, nonlinear solve per
 * pose after set-up ≤ 20 µs; one transmitter + 12 LED tokens with all mutual couplings ≤ 5 ms
 * (the solve, with the inductance matrix given), both with the LED's describing function
 * tabulated once (set-up); the exact-call variant is printed for comparison. The full solveLink with the EM layer computing
 * every mutual inductance is printed beside it for information.
 */
import type { Workload } from "./harness.ts";
import { solveLinkNetwork } from "../lib/circuit/link/solveNetwork.ts";
import type { LinkNetwork } from "../lib/circuit/link/network.ts";
import { tokenLoadModel } from "../lib/circuit/link/tokenLoad.ts";
import { solveLink, linkNetwork, type LinkSystem } from "../lib/circuit/link.ts";
import { parallelTankDrive } from "../lib/circuit/drive.ts";
import { ledPreset } from "../lib/circuit/loads/ledPresets.ts";
import { roundCoil } from "../lib/em/builders/roundCoil.ts";

const tx = roundCoil({ meanRadius: 0.05, turns: 5, wire: { diameter: 0.8e-3, insulation: 0.03e-3 } });
const token = roundCoil({ innerRadius: 0.0065, turns: 120, layers: 6, wire: { diameter: 0.1e-3, insulation: 0.01e-3 } });
const red = { kind: "led" as const, led: ledPreset("red") };
const f = 196.9e3;
const sys = (n: number, columns = 4): LinkSystem => ({
  frequency: f,
  transmitter: { coil: tx, compensation: "parallel", capacitor: { capacitance: 106.8e-9 }, drive: { kind: "parallelTank", supply: 5, onResistance: 0.05 } },
  receivers: Array.from({ length: n }, (_, i) => ({
    coil: token,
    pose: { position: [0.016 * (i % columns) - 0.024, 0.016 * Math.floor(i / columns) - 0.016, 0.01] as [number, number, number] },
    topology: "parallel" as const,
    capacitor: { capacitance: 2.2e-9 },
    load: red,
  })),
});

// set-up: the red LED's describing function tabulated once (tokenLoadModel tabulate option)
const fast = tokenLoadModel(red, { tabulate: true });
// one token's network; per pose only M changes (1024 poses along the axis)
const one = linkNetwork(sys(1)).network;
const M = Array.from({ length: 1024 }, (_, i) => one.inductance[0]![1]! * Math.pow(0.02, i / 1023));
const nets: LinkNetwork[] = M.map((m) => ({
  ...one,
  inductance: [
    [one.inductance[0]![0]!, m],
    [m, one.inductance[1]![1]!],
  ],
  transmitter: { ...one.transmitter, drive: parallelTankDrive(5, 0.05) },
  receivers: [{ ...one.receivers[0]!, load: fast }],
}));
let i = 0;
const exactRed = tokenLoadModel(red);
const twelveExact = linkNetwork(sys(12)).network;
const twelve: LinkNetwork = { ...twelveExact, receivers: twelveExact.receivers.map((r) => ({ ...r, load: fast })) };

export const workloads: Workload[] = [
  { name: "link: 1 Tx + 1 red LED token, nonlinear solve", size: "1 pose (M given)", target: 20e-6, fn: () => solveLinkNetwork(nets[i++ & 1023]!) },
  { name: "link: 1 Tx + 12 LED tokens, all couplings", size: "13×13 coupled, 12 Newton unknowns", target: 5e-3, fn: () => solveLinkNetwork(twelve) },
  { name: "link: 1 Tx + 1 red LED token, exact describing function", size: "1 pose (M given)", fn: () => solveLinkNetwork({ ...nets[i & 1023]!, receivers: [{ ...nets[i++ & 1023]!.receivers[0]!, load: exactRed }] }) },
  { name: "solveLink incl. EM: 1 Tx + 12 tokens (78 mutuals)", size: "system → result", minTime: 1, target: 0.05, fn: () => solveLink(sys(12)) },
  { name: "solveLink incl. EM: 1 Tx + 100 tokens 16 mm apart (5050 mutuals)", size: "system → result", rounds: 3, warmup: 0, target: 0.5, fn: () => solveLink(sys(100, 10)) },
];

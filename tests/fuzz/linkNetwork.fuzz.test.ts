/**
 * Fuzz: the link solver's internals of lib/mod.ts and lib/advanced.ts (issue 11) — linkNetwork,
 * solveLinkNetwork, summarizeLink, tokenLoadModel.
 * Bad and extreme arguments give a clear TanklightInputError naming the function and the
 * argument, or a finite result (framework: tests/fuzz/framework.ts). The network and the
 * result are what the library built (their inner fields are library data: `skip`), but null,
 * junk and a missing one are still tried. Demo parts: one pad and one LED token.
 */
import { fuzzSuite } from "./framework.ts";
import { linkNetwork, solveLinkNetwork, summarizeLink, roundCoil, ledPreset } from "../../lib/mod.ts";
import { tokenLoadModel } from "../../lib/advanced.ts";

const pad = roundCoil({ meanRadius: "20 mm", turns: 3, wire: { diameter: "0.5 mm" } });
const token = roundCoil({ innerRadius: "4 mm", turns: 20, wire: { diameter: "0.1 mm" } });
const system = {
  frequency: "200 kHz",
  transmitter: { label: "pad", coil: pad, compensation: "series", capacitor: { capacitance: "470 nF" }, drive: { kind: "halfBridge", supply: "5 V" } },
  receivers: [{ label: "token", coil: token, pose: { position: [0, 0, "10 mm"] }, topology: "parallel", capacitor: { capacitance: "10 nF" }, load: { kind: "led", led: ledPreset("red") } }],
};
const built = linkNetwork(system as never);
const result = solveLinkNetwork(built.network);
const ledLoad = { kind: "led", led: ledPreset("red") };

fuzzSuite("link internals", [
  // linkNetwork is solveLink's first half: its messages carry solveLink's name as well
  {
    name: "linkNetwork", where: ["linkNetwork", "solveLink"], call: linkNetwork, valid: [system, { tabulateLoads: true }], params: ["system", "options"],
    skip: ["0.transmitter.coil", "0.receivers.0.coil", "0.receivers.0.load.led"], text: ["0.transmitter.label", "0.receivers.0.label"],
  },
  { name: "solveLinkNetwork", call: solveLinkNetwork, valid: [built.network, { litThreshold: 5e-4, maxIterations: 50, tolerance: 1e-9, onNonConvergence: "warn" }], params: ["network", "options"], skip: ["0"] },
  { name: "summarizeLink", call: summarizeLink, valid: [result, 3], params: ["result", "digits"], skip: ["0"] },
  { name: "tokenLoadModel", call: tokenLoadModel, valid: [ledLoad, { tabulate: true, maxAmplitude: 6, step: 0.01 }], params: ["load", "options"], skip: ["0.led"] },
]);

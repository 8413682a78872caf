/**
 * Fuzz: the steady-state engines of the link (issue 11) — solveLinkHarmonic, solveLinkModel,
 * fundamentalCheck. Bad and extreme arguments give a clear TanklightInputError naming the
 * function and the argument, or a finite result (framework: tests/fuzz/framework.ts). The network
 * and the describing-function result are what the library built (their inner fields are library
 * data: `skip`), but null, junk and a missing one are still tried. Demo parts: one pad and one
 * red + InGaN-green token (the load harmonic balance is for).
 */
import { fuzzSuite } from "./framework.ts";
import { linkNetwork, solveLinkNetwork, solveLinkHarmonic, solveLinkModel, roundCoil, ledPreset, antiParallelPair } from "../../lib/mod.ts";
import { fundamentalCheck } from "../../lib/advanced.ts";

const pad = roundCoil({ meanRadius: "20 mm", turns: 3, wire: { diameter: "0.5 mm" } });
const token = roundCoil({ innerRadius: "4 mm", turns: 20, wire: { diameter: "0.1 mm" } });
const system = {
  frequency: "200 kHz",
  transmitter: { label: "pad", coil: pad, compensation: "series", capacitor: { capacitance: "470 nF" }, drive: { kind: "halfBridge", supply: "5 V" } },
  receivers: [{ label: "token", coil: token, pose: { position: [0, 0, "10 mm"] }, topology: "parallel", capacitor: { capacitance: "10 nF" }, load: antiParallelPair(ledPreset("red"), ledPreset("green-ingan")) }],
};
const { network } = linkNetwork(system as never);
const df = solveLinkNetwork(network);

fuzzSuite("steady-state engines", [
  { name: "solveLinkHarmonic", call: solveLinkHarmonic, valid: [network, { order: 5, samples: 48, tolerance: 1e-9 }], params: ["network", "options"], skip: ["0"] },
  { name: "solveLinkModel", where: ["solveLinkModel", "solveLink"], call: solveLinkModel, valid: [network, { model: "auto", order: 5 }], params: ["network", "options"], skip: ["0"] },
  { name: "fundamentalCheck", call: fundamentalCheck, valid: [network, df, 5e-4], params: ["network", "df", "litThreshold"], skip: ["0", "1"] },
]);

/**
 * Fuzz: the link solver with several transmitters and sequences (issue 13) — bad and extreme
 * systems, sequences and options give a clear TanklightInputError or a finite result
 * (framework: tests/fuzz/framework.ts). Demo parts: two small pads and one LED token.
 */
import { fuzzSuite } from "./framework.ts";
import { solveLink } from "../../lib/circuit/link.ts";
import { solveLinkSequence } from "../../lib/circuit/link/sequence.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { ledPreset } from "../../lib/circuit/loads/ledPresets.ts";

const pad = roundCoil({ meanRadius: "20 mm", turns: 3, wire: { diameter: "0.5 mm" } });
const token = roundCoil({ innerRadius: "4 mm", turns: 20, wire: { diameter: "0.1 mm" } });
const tx = (x: string, drive: unknown, phase?: string) => ({
  label: `pad ${x}`,
  coil: pad,
  pose: { position: [x, 0, 0] },
  compensation: "series",
  capacitor: { capacitance: "470 nF" },
  drive,
  ...(phase !== undefined ? { phase } : {}),
});
const system = {
  frequency: "200 kHz",
  sharedDrives: [{ name: "bus", drive: { kind: "sine", amplitude: "3 V", outputResistance: "0.5 Ω" }, wiring: "parallel" }],
  transmitters: [tx("-25 mm", { kind: "halfBridge", supply: "5 V" }, "90 deg"), tx("25 mm", "bus")],
  receivers: [{ label: "token", coil: token, pose: { position: [0, 0, "10 mm"] }, topology: "parallel", capacitor: { capacitance: "10 nF" }, load: { kind: "led", led: ledPreset("red") } }],
};

fuzzSuite("link", [
  {
    name: "solveLink",
    call: solveLink as never,
    valid: [system, { litThreshold: "0.5 mA" }],
    params: ["system", "options"],
    text: ["0.transmitters.0.label", "0.transmitters.1.label", "0.receivers.0.label", "0.sharedDrives.0.name", "0.transmitters.1.drive"],
    skip: ["0.transmitters.0.coil", "0.transmitters.1.coil", "0.receivers.0.coil", "0.receivers.0.load"],
    budgetMs: 5000,
    // errorBand.relative is ∞ where the describing function's error is not estimated (several transmitters: documented)
    allowInfinite: true,
  },
  {
    name: "solveLinkSequence",
    call: solveLinkSequence as never,
    valid: [system, { steps: [{ on: [0], weight: 2 }, { on: ["pad 25 mm"] }], idle: "held", repetitionRate: "200 Hz" }, {}],
    params: ["system", "sequence", "options"],
    text: ["0.transmitters.0.label", "0.transmitters.1.label", "0.receivers.0.label", "0.sharedDrives.0.name", "0.transmitters.1.drive", "1.steps.1.on.0"],
    skip: ["0.transmitters.0.coil", "0.transmitters.1.coil", "0.receivers.0.coil", "0.receivers.0.load", "0.transmitters", "0.receivers", "0.sharedDrives", "0.frequency"],
    budgetMs: 5000,
  },
]);

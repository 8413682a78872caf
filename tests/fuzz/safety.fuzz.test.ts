/**
 * Fuzz: the safety checks of lib/mod.ts (lib/safety, and the supply budget of lib/analysis) —
 * bad and extreme designs, options and arguments give a clear TanklightInputError naming the
 * function and the user's field, or a finite result; never a TypeError, NaN or a hang
 * (framework: tests/fuzz/framework.ts). Demo parts: a drawer pad and a pebble token (demo
 * data). Coils made by the builders, the solveLink solution and results passed from one check
 * to another are library objects passed along: their inner fields are not mutated (`skip`),
 * but null, junk and a missing one still are. The exposure grid is kept small (nx, ny, nz) so a
 * call stays in milliseconds; a probe without them runs the default 41 × 41 × 11 grid.
 */
import { fuzzSuite } from "./framework.ts";
import {
  roundCoil, ledPreset, solveLink, designFromLink, referenceLevel, basicRestriction, exposureCheck, emissionEstimate, dipoleField,
  emissionRows, EMISSION_RULES, metalHeating, componentStress, checkRating, cautions, safetyReport, supplyBudget, supplyVerdict,
  type SafetyDesign,
} from "../../lib/mod.ts";

const pad = roundCoil({ meanRadius: "50 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
const pebble = roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
const system = {
  frequency: "200 kHz",
  transmitter: { coil: pad, compensation: "parallel", capacitor: { capacitance: "56 nF", rating: "50 V" }, drive: { kind: "parallelTank", supply: "5 V" } },
  receivers: [{ label: "pebble", coil: pebble, pose: { position: [0, 0, "30 mm"] }, topology: "parallel", capacitor: { capacitance: "2.2 nF" }, load: { kind: "led", led: ledPreset("red") } }],
} as const;
const solution = solveLink(system as never);
const design: SafetyDesign = {
  frequency: "200 kHz",
  surfaceHeight: "4 mm",
  transmitters: [{ label: "pad", coil: pad, pose: { position: [0, 0, 0] }, current: "1.2 A", phase: 0, capacitor: { capacitance: "56 nF", voltage: "30 V", rating: "50 V", currentRating: "2 A" }, switchPeakVoltage: "16 V", switchRating: "30 V", coilLoss: "0.1 W" }],
  receivers: [{ label: "pebble", capacitor: { capacitance: "2.2 nF", voltage: "3 V" }, leds: [{ label: "red", averageCurrent: "5 mA", ratedCurrent: "20 mA", maximumCurrent: "30 mA" }], size: "25 mm" }],
};
const grid = { x: ["-60 mm", "60 mm"], y: [-0.06, 0.06], height: [0, "0.1 m"], nx: 5, ny: 5, nz: 3, discs: [{ label: "hand", radius: "5 cm" }], discGrid: 3 };
const coin = { kind: "disc", label: "coin", radius: "12 mm", thickness: "1.5 mm", metal: "copper", position: [0, 0, "4 mm"] };
const exposure = exposureCheck(design, grid as never);
const emission = emissionEstimate(design);
const metal = [metalHeating(design, coin as never)];
/** the design's labels are free text; its coils are the builders' */
const designText = (i: number) => [`${i}.transmitters.0.label`, `${i}.receivers.0.label`, `${i}.receivers.0.leds.0.label`];
const designSkip = (i: number) => [`${i}.transmitters.0.coil`];
/** the checks that grid the field (exposure, metal, the report) take the same design schema, fuzzed field by field through componentStress and emissionEstimate: here only its top level and their own options */
const designTop = (i: number) => [`${i}.transmitters`, `${i}.receivers`];
const k200 = (2 * Math.PI * 200e3) / 299792458;

fuzzSuite("safety", [
  {
    name: "designFromLink", call: designFromLink, valid: [system, solution, { surfaceHeight: "4 mm", tokenSize: "25 mm", switchRating: "30 V", capacitorCurrentRating: "2 A" }],
    extreme: [[system, solution, { surfaceHeight: 0, tokenSize: [0.02] }], [system, solution, { surfaceHeight: 0, tokenSize: [0.02, 0.03] }]],
    params: ["system", "solution", "opts"], skip: ["0.transmitter.coil", "0.receivers.0.coil", "0.receivers.0.load", "1"], text: ["0.receivers.0.label"],
  },
  { name: "referenceLevel", call: referenceLevel, valid: ["ICNIRP 2010", "public", "200 kHz"], params: ["standard", "population", "frequency"] },
  { name: "basicRestriction", call: basicRestriction, valid: ["occupational", 200e3], params: ["population", "frequency"] },
  { name: "exposureCheck", call: exposureCheck, valid: [design, grid], params: ["design", "options"], skip: designTop(0), text: [...designText(0), "1.discs.0.label"], budgetMs: 4000 },
  { name: "emissionEstimate", call: emissionEstimate, valid: [design], params: ["design"], skip: designSkip(0), text: designText(0) },
  { name: "dipoleField", call: dipoleField, valid: [0.1, "10 m", k200], params: ["moment", "r", "k"] },
  { name: "emissionRows", call: emissionRows, valid: [EMISSION_RULES[1], "200 kHz"], params: ["rule", "f"], skip: ["0"], extreme: [["47 CFR 15.209", 200e3], ["CEPT ERC/REC 70-03 Annex 9", 13.56e6]] },
  { name: "metalHeating", call: metalHeating, valid: [design, coin], params: ["design", "object"], skip: designTop(0), text: [...designText(0), "1.label"] },
  { name: "componentStress", call: componentStress, valid: [design], params: ["design"], skip: designSkip(0), text: designText(0) },
  { name: "checkRating", call: checkRating, valid: ["LED current", "25 mA", "A", "20 mA", 0.03], params: ["what", "value", "unit", "rating", "maximum"], text: ["0"] },
  { name: "cautions", call: cautions, valid: [design, { exposure, emission, metal }], params: ["design", "context"], skip: [...designTop(0), "1.exposure", "1.emission", "1.metal"], text: designText(0) },
  {
    name: "safetyReport", call: safetyReport, valid: [design, { exposure: grid, metalObjects: [coin] }], params: ["design", "options"],
    skip: designTop(0), text: ["1.exposure.discs.0.label", "1.metalObjects.0.label"], budgetMs: 4000,
  },
  {
    name: "supplyBudget", call: supplyBudget, valid: [system, { kind: "bench", voltage: "5 V", current: "1 A", label: "bench" }, { litThreshold: "0.5 mA" }],
    params: ["system", "supply", "options"], skip: ["0.transmitter.coil", "0.receivers.0.coil", "0.receivers.0.load"], text: ["0.receivers.0.label", "1.label"], extreme: [[system, "usb2"]],
    // errorBand.relative is ∞ where the describing function's error is not estimated (documented)
    allowInfinite: true,
  },
  { name: "supplyVerdict", call: supplyVerdict, valid: [{ voltage: 5, current: "0.2 A" }, "usb2"], params: ["draw", "supply"] },
]);

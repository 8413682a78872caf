/**
 * Fuzz: the public circuit functions of lib/mod.ts and lib/advanced.ts (issue 11) — parts,
 * tanks, loads, drives, the transient engine — except the link solver's own entries
 * (solveLink, linkNetwork, solveLinkNetwork, summarizeLink, tokenLoadModel: their suite
 * belongs with the link arrays) and the steady-state engines (solveLinkHarmonic,
 * solveLinkModel, fundamentalCheck, periodicSteadyState: owned with their engines).
 * Every bad input must give a clear TanklightInputError naming the function and the user's
 * field; extreme input a clear error or a finite result; never a TypeError, NaN or a hang
 * (framework: tests/fuzz/framework.ts). Junctions (LEDs, diodes) built by led()/ledPreset()
 * are library objects passed along, not typed by a person: their inner fields are not mutated
 * (`skip`), but null, junk and a missing junction still are.
 */
import { fuzzSuite } from "./framework.ts";
import { TransientConvergenceError } from "../../lib/circuit/transient/errors.ts";
import {
  resonantCapacitance, resonantFrequency, tankQuality, tankBandwidth, detuningTolerance, tuneWithStandardParts,
  standardValues, standardValuesBetween, nearestStandardValue, bestCombination, resonantFrequencyWindow, capacitorStress,
  dielectric, esrFromDissipationFactor, recommendCapacitor, led, diode, fitShockley, ledPreset, diodePreset,
  singleLed, antiParallelPair, sameDirectionPair, bridgeRectifier, halfWaveReservoir, resistorLoad,
  fundamentalConductance, loadResponse, averageLoadCurrent, reservoirSteadyState, currentFedBridge,
  steigerwaldEquivalentResistance, tokenResponse, sineDrive, halfBridgeDrive, fullBridgeDrive, currentDrive,
  parallelTankDrive, classEDesign, classEDrive, maxLinkEfficiency, optimalLoad, frequencySweep, simulate,
  voltageBetween, sineWaveform, stepWaveform, periodicGate, waveformHarmonics, singleSwitchDrive, bridgeDrive, addToken,
  type LinkNetwork,
} from "../../lib/mod.ts";
import { fundamentalCurrentSlope, describingFunctionReference } from "../../lib/advanced.ts";

const red = ledPreset("red");
const blue = ledPreset("blue");
const schottky = diodePreset("schottky");
const ledLoad = { kind: "led", led: red } as const;
const L = 100e-6;
const f = 200e3;
const C = 1 / ((2 * Math.PI * f) ** 2 * L);
const drive = singleSwitchDrive({ supply: 5, frequency: 1e3, coilInductance: 1e-3, coilResistance: 1, tankCapacitance: 25.3e-6 });
const rc = {
  elements: [
    { kind: "voltageSource", name: "V1", plus: "in", minus: "ground", waveform: () => 1 },
    { kind: "resistor", name: "R1", a: "in", b: "out", resistance: 1 },
    { kind: "capacitor", name: "C1", a: "out", b: "ground", capacitance: 1e-6 },
  ],
} as const;
const rcResult = simulate(rc, { stop: 1e-6, step: 1e-8 });
const cosine = (n: number) => ({
  time: Float64Array.from({ length: n }, (_, i) => i * 5e-8),
  samples: Float64Array.from({ length: n }, (_, i) => Math.cos((Math.PI * i) / 100)),
});
const wave = cosine(201);
// two identical series tanks at 200 kHz, k = 0.1 (as tests/circuit/linkFrequencySweep.test.ts)
const network: LinkNetwork = {
  frequency: f,
  inductance: [[L, 0.1 * L], [0.1 * L, L]],
  transmitter: { resistance: 1, compensation: "series", capacitance: C, drive: sineDrive(1) },
  receivers: [{ resistance: 1, topology: "series", capacitance: C, load: { conductance: () => 1 / 50, linear: true, label: "50 Ω" } }],
} as unknown as LinkNetwork;
const junctionSkips = (i: number) => [`${i}`];

fuzzSuite("circuit", [
  // tanks and parts
  { name: "resonantCapacitance", call: resonantCapacitance, valid: ["100 uH", "200 kHz"], params: ["inductance", "frequency"] },
  { name: "resonantFrequency", call: resonantFrequency, valid: [100e-6, 6.8e-9], params: ["inductance", "capacitance"] },
  // a lossless part's Q is Infinity (documented)
  { name: "tankQuality", call: tankQuality, valid: [{ inductance: "100 uH", capacitance: 6.8e-9, coilResistance: 2, dissipationFactor: 1e-3 }], allowInfinite: true },
  { name: "tankBandwidth", call: tankBandwidth, valid: [200e3, 50], params: ["f0", "q"] },
  { name: "detuningTolerance", call: detuningTolerance, valid: [50, 0.1], params: ["q", "fraction"] },
  { name: "tuneWithStandardParts", call: tuneWithStandardParts, valid: ["100 uH", "200 kHz", { series: "E12", maxParts: 2 }], params: ["inductance", "frequency", "options"] },
  { name: "standardValues", call: standardValues, valid: ["E12"], params: ["series"] },
  { name: "standardValuesBetween", call: standardValuesBetween, valid: ["E6", 1e-9, 1e-8], params: ["series", "lo", "hi"] },
  { name: "nearestStandardValue", call: nearestStandardValue, valid: [4.5e-9, "E12"], params: ["x", "series"] },
  { name: "bestCombination", call: bestCombination, valid: [3e-9, "E6", { maxParts: 2, topology: "parallel" }], params: ["x", "series", "options"] },
  { name: "resonantFrequencyWindow", call: resonantFrequencyWindow, valid: [{ inductance: "100 uH", capacitance: "6.8 nF", inductanceTolerance: 0.05, capacitanceTolerance: "5 %", samples: 1000 }], budgetMs: 4000 },
  { name: "capacitorStress", call: capacitorStress, valid: [{ capacitance: "6.8 nF", frequency: "200 kHz", voltageAmplitude: "30 V", dielectric: "C0G" }] },
  { name: "dielectric", call: dielectric, valid: ["C0G"], params: ["dielectric"] },
  { name: "esrFromDissipationFactor", call: esrFromDissipationFactor, valid: [1e-3, 200e3, 6.8e-9], params: ["dissipationFactor", "frequency", "capacitance"] },
  // ratedVoltage is Infinity when no standard rating is enough (documented)
  { name: "recommendCapacitor", call: recommendCapacitor, valid: [30, 6.8e-9, { derating: 2 }], params: ["peakVoltage", "capacitance", "options"], allowInfinite: true },
  // junctions and loads
  { name: "led", call: led, valid: [{ points: [{ current: "1 mA", voltage: "1.75 V" }, { current: "20 mA", voltage: 2.0 }], colour: "red" }], text: ["0.colour"] },
  { name: "diode", call: diode, valid: [{ saturationCurrent: 1e-9, idealityFactor: 1.9, seriesResistance: 0.1, label: "D1" }], text: ["0.label"] },
  { name: "fitShockley", call: fitShockley, valid: [[{ current: 1e-3, voltage: 1.75 }, { current: 5e-3, voltage: 1.85 }, { current: 20e-3, voltage: 2.0 }], 298.15], params: ["points", "temperature"] },
  { name: "ledPreset", call: ledPreset, valid: ["red", { temperature: "40 degC" }], params: ["colour", "options"] },
  { name: "diodePreset", call: diodePreset, valid: ["schottky", {}], params: ["kind", "options"] },
  { name: "singleLed", call: singleLed, valid: [red], skip: junctionSkips(0) },
  { name: "antiParallelPair", call: antiParallelPair, valid: [red, blue], skip: [...junctionSkips(0), ...junctionSkips(1)] },
  { name: "sameDirectionPair", call: sameDirectionPair, valid: [red, blue], skip: [...junctionSkips(0), ...junctionSkips(1)] },
  { name: "bridgeRectifier", call: bridgeRectifier, valid: [schottky, red, 10], params: ["diode", "led", "seriesResistance"], skip: [...junctionSkips(0), ...junctionSkips(1)] },
  { name: "halfWaveReservoir", call: halfWaveReservoir, valid: [schottky, red, 10e-6, { seriesResistance: 4.7 }], params: ["diode", "led", "capacitance", "options"], skip: [...junctionSkips(0), ...junctionSkips(1)] },
  { name: "resistorLoad", call: resistorLoad, valid: [100], params: ["resistance"] },
  { name: "fundamentalConductance", call: fundamentalConductance, valid: [ledLoad, 2], params: ["load", "amplitude"], skip: ["0.led"] },
  { name: "fundamentalCurrentSlope", call: fundamentalCurrentSlope, valid: [ledLoad, 2], params: ["load", "amplitude"], skip: ["0.led"] },
  { name: "loadResponse", call: loadResponse, valid: [ledLoad, 2], params: ["load", "amplitude"], skip: ["0.led"] },
  { name: "averageLoadCurrent", call: averageLoadCurrent, valid: [ledLoad, 2.2], params: ["load", "amplitude"], skip: ["0.led"] },
  { name: "describingFunctionReference", call: describingFunctionReference, valid: [(v: number) => v / 100, 1, 1e-10], params: ["current", "amplitude", "relTol"], budgetMs: 4000 },
  { name: "reservoirSteadyState", call: reservoirSteadyState, valid: [schottky, red, 3, 4.7], params: ["diode", "led", "amplitude", "seriesResistance"], skip: [...junctionSkips(0), ...junctionSkips(1)] },
  { name: "currentFedBridge", call: currentFedBridge, valid: [schottky, 1000, 0.01], params: ["diode", "loadResistance", "currentAmplitude"], skip: junctionSkips(0), budgetMs: 4000 },
  { name: "steigerwaldEquivalentResistance", call: steigerwaldEquivalentResistance, valid: [100, "capacitor"], params: ["loadResistance", "filter"] },
  { name: "tokenResponse", call: tokenResponse, valid: [{ emf: "0.2 V", frequency: "200 kHz", inductance: "100 uH", coilResistance: 5, capacitance: C, load: ledLoad }], skip: ["0.load.led"] },
  // drives
  { name: "sineDrive", call: sineDrive, valid: ["10 V", 50], params: ["amplitude", "outputResistance"] },
  { name: "halfBridgeDrive", call: halfBridgeDrive, valid: ["12 V", 0.1], params: ["supply", "onResistance"] },
  { name: "fullBridgeDrive", call: fullBridgeDrive, valid: [12, "0.1 ohm"], params: ["supply", "onResistance"] },
  { name: "currentDrive", call: currentDrive, valid: ["1.5 A"], params: ["amplitude"] },
  { name: "parallelTankDrive", call: parallelTankDrive, valid: ["5 V", 0.05], params: ["supply", "onResistance"] },
  { name: "classEDesign", call: classEDesign, valid: [{ supply: "5 V", frequency: "200 kHz", power: "2 W", inductance: "24 uH" }] },
  { name: "classEDrive", call: classEDrive, valid: [classEDesign({ supply: 5, frequency: 200e3, power: 2 }), 0.1], params: ["design", "onResistance"], skip: ["0"] },
  // link limits and the sweep
  { name: "maxLinkEfficiency", call: maxLinkEfficiency, valid: [0.1, 100, 80], params: ["k", "q1", "q2"] },
  { name: "optimalLoad", call: optimalLoad, valid: [0.1, 100, 100, 0.5, { topology: "parallel", reactance: 200 }], params: ["k", "q1", "q2", "r2", "options"] },
  { name: "frequencySweep", call: frequencySweep, valid: [network, { start: "150 kHz", stop: "250 kHz", points: 21 }, { refine: false }], params: ["network", "frequencies", "options"], skip: ["0"], budgetMs: 4000 },
  // transient
  { name: "sineWaveform", call: sineWaveform, valid: [{ amplitude: 2, frequency: 1e5, phase: 0.3 }] },
  { name: "stepWaveform", call: stepWaveform, valid: [5, { at: 1e-3, before: 0 }], params: ["level", "opts"] },
  { name: "periodicGate", call: periodicGate, valid: [{ frequency: 1e5, duty: 0.5, delay: 0 }] },
  { name: "singleSwitchDrive", call: singleSwitchDrive, valid: [{ supply: "5 V", frequency: "200 kHz", coilInductance: "10 uH", tankCapacitance: "63 nF", duty: 0.5, arrangement: "parallel-tank" }] },
  { name: "bridgeDrive", call: bridgeDrive, valid: [{ supply: 12, frequency: 200e3, bridge: "full", coilInductance: 10e-6, tankCapacitance: 63.3e-9, onResistance: 0.05 }] },
  {
    name: "addToken", call: addToken, params: ["base", "spec"], skip: ["0", "1.load.led"],
    valid: [drive.circuit, { coupledTo: "Ltx", k: 0.05, inductance: 30e-6, resistance: 2, capacitance: 21e-9, load: ledLoad, name: "t1" }],
    text: ["1.name"],
  },
  {
    name: "simulate", call: simulate, params: ["circuit", "options"], skip: ["0"], budgetMs: 5000,
    valid: [drive.circuit, { stop: 5e-3, stepsPerCycle: 20, frequency: 1e3, keepCycles: 1 }],
    allowErrors: [TransientConvergenceError],
  },
  { name: "voltageBetween", call: voltageBetween, valid: [rcResult, "out", "ground"], params: ["result", "a", "b"], skip: ["0"] },
  { name: "waveformHarmonics", call: waveformHarmonics, valid: [wave.time, wave.samples, { frequency: 1e5, count: 5 }], params: ["time", "samples", "opts"] },
]);

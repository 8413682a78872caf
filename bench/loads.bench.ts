import type { Workload } from "./harness.ts";
import { fundamentalConductance, averageLoadCurrent, fundamentalCurrentSlope } from "../lib/circuit/loads/describingFunction.ts";
import { ledPreset, diodePreset } from "../lib/circuit/loads/ledPresets.ts";
import { antiParallelPair, bridgeRectifier, halfWaveReservoir, singleLed } from "../lib/circuit/loads/tokenCircuits.ts";
import { bestCombination } from "../lib/circuit/combination.ts";

const pair = antiParallelPair(ledPreset("red"), ledPreset("green-gap"));
const single = singleLed(ledPreset("red"));
const bridge = bridgeRectifier(diodePreset("schottky"), ledPreset("white"), 22);
const reservoir = halfWaveReservoir(diodePreset("schottky"), ledPreset("red"), 10e-6);
// amplitudes spread over the working range (below, at and above the knee)
const amps = Array.from({ length: 256 }, (_, j) => 1.6 + (j / 256) * 2.4);
let i = 0;

export const workloads: Workload[] = [
  {
    name: "fundamentalConductance + averageLoadCurrent, anti-parallel pair",
    size: "1 amplitude, both calls",
    target: 20e-6,
    fn: () => {
      const A = amps[i++ & 255]!;
      return fundamentalConductance(pair, A) + averageLoadCurrent(pair, A)[0]!.current;
    },
  },
  {
    name: "fundamentalConductance, anti-parallel pair (no reuse)",
    size: "1 amplitude",
    fn: () => fundamentalConductance(pair, amps[i++ & 255]! + 1e-9 * i),
  },
  {
    name: "fundamentalCurrentSlope, single LED",
    size: "1 amplitude",
    fn: () => fundamentalCurrentSlope(single, amps[i++ & 255]! + 1e-9 * i),
  },
  {
    name: "fundamentalConductance, bridge + LED",
    size: "1 amplitude",
    fn: () => fundamentalConductance(bridge, 2 + amps[i++ & 255]!),
  },
  {
    name: "fundamentalConductance, half-wave reservoir (charge balance)",
    size: "1 amplitude",
    fn: () => fundamentalConductance(reservoir, amps[i++ & 255]!),
  },
  {
    name: "bestCombination E24, up to 3 parts",
    size: "1 target",
    minTime: 1,
    fn: () => bestCombination(6.3326e-9 * (1 + (i++ & 15) * 0.01), "E24", { maxParts: 3 }),
  },
];

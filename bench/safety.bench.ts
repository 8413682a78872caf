/**
 * Safety benchmarks (issue 15): exposureCheck over a 41 × 41 × 11 grid of accessible points
 * above a 20-turn, 4-layer round transmitter (target ≤ 50 ms), with the basic-restriction discs
 * (hand and torso, 11 × 11 centres) included as in a default call; and the same over a planar
 * rectangular spiral, whose segments take the point-by-point path.
 */
import type { Workload } from "./harness.ts";
import type { Coil } from "../lib/em/types.ts";
import { roundCoil } from "../lib/em/builders/roundCoil.ts";
import { rectSpiral } from "../lib/em/builders/rectSpiral.ts";
import { exposureCheck } from "../lib/safety/exposure.ts";

const round = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
const rect = rectSpiral({ outerWidth: 0.2, outerHeight: 0.2, turns: 6, pitch: 0.003, trace: { width: 0.002, thickness: 35e-6 } });
const design = (coil: Coil) => ({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil, current: 1 }] });
const grid = { nx: 41, ny: 41, nz: 11 };

export const workloads: Workload[] = [
  { name: "exposureCheck, round 20-turn transmitter", size: "41×41×11 points + discs", fn: () => exposureCheck(design(round), grid), target: 0.05 },
  { name: "exposureCheck, round transmitter, field grid only", size: "41×41×11 points", fn: () => exposureCheck(design(round), { ...grid, discs: [] }) },
  { name: "exposureCheck, 6-turn 200 mm rectangular spiral", size: "41×41×11 points + discs", fn: () => exposureCheck(design(rect), grid), minTime: 2 },
];

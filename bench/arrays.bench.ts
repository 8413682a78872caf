/**
 * Straight conductors and transmitter arrays (issue 13): a 41 × 41 coupling map of a round token
 * over a 400 mm × 400 mm 4-turn rectangular spiral and over a 2 × 2 array of 200 mm spirals,
 * by couplingEvaluator's straight-conductor fast path; checked once against the filament-by-
 * filament sum on a subsample (agreement and time ratio printed).
 */
import type { Workload } from "./harness.ts";
import { formatSeconds } from "./harness.ts";
import { couplingEvaluator } from "../lib/em/couplingEvaluator.ts";
import { mutualInductanceChecked } from "../lib/em/mutualInductance.ts";
import { rectSpiral } from "../lib/em/builders/rectSpiral.ts";
import { roundCoil } from "../lib/em/builders/roundCoil.ts";
import type { Coil, Pose } from "../lib/em/types.ts";

const token = roundCoil({ innerRadius: 0.006, turns: 30, wire: { diameter: 1e-4 } });
const board = rectSpiral({ outerWidth: 0.4, outerHeight: 0.4, turns: 4, pitch: 0.01, wire: { diameter: 1e-3 } });
const tile = rectSpiral({ outerWidth: 0.2, outerHeight: 0.2, turns: 4, pitch: 0.01, wire: { diameter: 1e-3 } });
const P0: Pose = { position: [0, 0, 0] };
const tilePoses: Pose[] = [[-0.1, -0.1], [0.1, -0.1], [-0.1, 0.1], [0.1, 0.1]].map(([x, y]) => ({ position: [x!, y!, 0] }));

// 41 × 41 token positions over the 400 mm board, 10 mm above its plane (a 10 mm barrier)
const poses: Pose[] = [];
for (let iy = 0; iy < 41; iy++) for (let ix = 0; ix < 41; ix++) poses.push({ position: [-0.2 + ix * 0.01, -0.2 + iy * 0.01, 0.01] });

const evBoard = couplingEvaluator(board, token);
const evTile = couplingEvaluator(tile, token);
const boardMap = new Float64Array(poses.length);
const arrayMap = new Float64Array(poses.length * 4);
const runBoard = (): Float64Array => {
  for (let k = 0; k < poses.length; k++) boardMap[k] = evBoard.mutual(P0, poses[k]!);
  return boardMap;
};
const runArray = (): Float64Array => {
  for (let k = 0; k < poses.length; k++) for (let t = 0; t < 4; t++) arrayMap[4 * k + t] = evTile.mutual(tilePoses[t]!, poses[k]!);
  return arrayMap;
};

/** One reference run on every `step`-th pose: worst deviation (|M| > 1 % of max) and time ratio. */
function check(label: string, run: () => Float64Array, coil: Coil, txPoses: readonly Pose[], step: number): void {
  run(); // warm-up (JIT)
  const t0 = performance.now();
  const fast = run();
  const tFast = (performance.now() - t0) / 1000;
  const t1 = performance.now();
  let worst = 0, counted = 0, refCalls = 0;
  const max = Math.max(...Array.from(fast, Math.abs));
  for (let k = 0; k < poses.length; k += step) {
    txPoses.forEach((tp, t) => {
      const ref = mutualInductanceChecked(coil, tp, token, poses[k]!).value;
      refCalls++;
      if (Math.abs(ref) > 0.01 * max) {
        counted++;
        worst = Math.max(worst, Math.abs(fast[txPoses.length * k + t]! - ref) / Math.abs(ref));
      }
    });
  }
  const tRefAll = (((performance.now() - t1) / 1000) * (poses.length * txPoses.length)) / refCalls;
  console.log(
    `${label}: fast ${formatSeconds(tFast)} (second run), filament-by-filament ≈ ${formatSeconds(tRefAll)} ` +
      `(extrapolated from ${refCalls} poses), ratio ${(tRefAll / tFast).toFixed(0)}×; worst deviation ${(worst * 100).toFixed(4)} % ` +
      `over ${counted} checked poses with |M| > 1 % of max (target ≤ 0.1 % ${worst <= 1e-3 ? "met" : "MISSED"})`,
  );
}

check("rect spiral 400 mm map 41×41", runBoard, board, [P0], 7);
check("2×2 array of 200 mm spirals map 41×41", runArray, tile, tilePoses, 29);

export const workloads: Workload[] = [
  {
    name: "coupling map, token over 400 mm 4-turn rect spiral",
    size: "41×41 poses",
    target: 0.1,
    minTime: 2,
    fn: runBoard,
  },
  {
    name: "coupling map, token over 2×2 array of 200 mm spirals",
    size: "41×41 poses × 4 coils",
    target: 0.3,
    minTime: 2,
    fn: runArray,
  },
];

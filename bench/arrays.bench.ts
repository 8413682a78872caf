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
import { solveLink, type LinkSystem } from "../lib/circuit/link.ts";
import { selfInductance } from "../lib/em/selfInductance.ts";
import { ledPreset } from "../lib/circuit/loads/ledPresets.ts";

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

// solveLink on a 400 mm game board (demo data): 2 × 2 array of the 200 mm spirals (centres
// 202 mm apart, each series-tuned on its own 12 V full bridge) and 24 LED pieces (the 6.5 mm,
// 120-turn token of bench/link.bench.ts, parallel-tuned) on the squares of an 8 × 8 board of
// 50 mm squares, 10 mm above the coils. Every call a different arrangement (40, seeded), so the
// link's offset cache (lib/circuit/link.ts) serves the repeated square-to-square offsets but
// no arrangement is solved twice in a row; "random positions" places the 24 tokens anywhere
// (no offset repeats: every mutual inductance evaluated).
const piece = roundCoil({ innerRadius: 0.0065, turns: 120, layers: 6, wire: { diameter: 0.1e-3, insulation: 0.01e-3 } });
const fw = 2 * Math.PI * 200e3;
const red = { kind: "led" as const, led: ledPreset("red") };
const Ctile = 1 / (fw * fw * selfInductance(tile, { frequency: 200e3 }));
const Cpiece = 1 / (fw * fw * selfInductance(piece, { frequency: 200e3 }));
let seed = 12345;
const rnd = (): number => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
type P3 = [number, number, number];
function onSquares(): P3[] {
  const sq = Array.from({ length: 64 }, (_, i) => i);
  for (let i = 63; i > 0; i--) {
    const j = Math.floor(rnd() * (i + 1));
    [sq[i], sq[j]] = [sq[j]!, sq[i]!];
  }
  return sq.slice(0, 24).map((s) => [-0.175 + 0.05 * (s % 8), -0.175 + 0.05 * Math.floor(s / 8), 0.01]);
}
function anywhere(): P3[] {
  const out: P3[] = [];
  while (out.length < 24) {
    const p: P3 = [-0.18 + 0.36 * rnd(), -0.18 + 0.36 * rnd(), 0.01];
    if (out.every((q) => Math.hypot(q[0] - p[0], q[1] - p[1]) > 0.02)) out.push(p);
  }
  return out;
}
const boardSystem = (pos: P3[]): LinkSystem => ({
  frequency: 200e3,
  transmitters: [[-0.101, -0.101], [0.101, -0.101], [-0.101, 0.101], [0.101, 0.101]].map(([x, y]) => ({
    coil: tile,
    pose: { position: [x!, y!, 0] as P3 },
    compensation: "series" as const,
    capacitor: { capacitance: Ctile, dissipationFactor: 1e-3 },
    drive: { kind: "fullBridge" as const, supply: 12, onResistance: 0.05 },
  })),
  receivers: pos.map((p) => ({ coil: piece, pose: { position: p }, topology: "parallel" as const, capacitor: { capacitance: Cpiece, dissipationFactor: 1e-3 }, load: red })),
});
const boards = Array.from({ length: 40 }, () => boardSystem(onSquares()));
const scattered = Array.from({ length: 400 }, () => boardSystem(anywhere()));
let nb = 0;
let ns = 0;

export const workloads: Workload[] = [
  {
    name: "solveLink: 4 Tx (2×2 of 200 mm) + 24 LED pieces on board squares, tabulated loads",
    size: "28 coils, 378 mutuals, 24 Newton unknowns",
    target: 5e-3,
    // warm-up long enough to meet each of the 40 arrangements (the board's offsets) once
    warmup: 2,
    fn: () => solveLink(boards[nb++ % boards.length]!, { tabulateLoads: true }),
  },
  {
    name: "solveLink: same, exact describing function (the default)",
    size: "28 coils, 378 mutuals, 24 Newton unknowns",
    fn: () => solveLink(boards[nb++ % boards.length]!),
  },
  {
    name: "solveLink: 4 Tx + 24 LED tokens at random positions (no offset reuse), tabulated loads",
    size: "28 coils, 378 mutuals evaluated",
    rounds: 7,
    fn: () => solveLink(scattered[ns++ % scattered.length]!, { tabulateLoads: true }),
  },
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

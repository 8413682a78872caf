/**
 * EM core benchmarks (issue 3): coaxial and general circle-pair mutual inductance per call, and
 * the coupling map of a transmitter roundCoil and a token roundCoil by the fast evaluator,
 * checked once against the filament-by-filament sum (agreement and time ratio printed).
 */
import type { Workload } from "./harness.ts";
import { formatSeconds } from "./harness.ts";
import { coaxialLoopMutualInductance } from "../lib/em/coaxialMutual.ts";
import { loopMutualInductance, type CircleFilament } from "../lib/em/loopMutual.ts";
import { couplingEvaluator } from "../lib/em/couplingEvaluator.ts";
import { mutualInductanceChecked } from "../lib/em/mutualInductance.ts";
import { roundCoil } from "../lib/em/builders/roundCoil.ts";
import type { Pose } from "../lib/em/types.ts";

// ── per-call workloads ───────────────────────────────────────────────────────
const ds = Float64Array.from({ length: 1024 }, (_, j) => 1e-3 + j * 1e-4);
let i = 0;

const a: CircleFilament = { center: [0, 0, 0], axis: [0, 0, 1], radius: 0.04 };
const tilt = Math.PI / 6;
const bs: CircleFilament[] = Array.from({ length: 64 }, (_, j) => ({
  center: [0.02 + j * 1e-6, 0, 0.03],
  axis: [Math.sin(tilt), 0, Math.cos(tilt)],
  radius: 0.006,
}));
let jb = 0;

// ── coupling map (issue 3): 121 × 61 poses, x −60…60 mm, z 2…122 mm ─────────────
const tx = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
const token = roundCoil({ innerRadius: 0.006, turns: 30, wire: { diameter: 1e-4 } });
const P0: Pose = { position: [0, 0, 0] };
const poses: Pose[] = [];
for (let iz = 0; iz < 61; iz++) for (let ix = 0; ix < 121; ix++) poses.push({ position: [-0.06 + ix * 0.001, 0, 0.002 + iz * 0.002] });
const ev = couplingEvaluator(tx, token);
const fastMap = new Float64Array(poses.length);
const runFastMap = (): Float64Array => {
  for (let k = 0; k < poses.length; k++) fastMap[k] = ev.coupling(P0, poses[k]!);
  return fastMap;
};

{
  // one reference run, filament by filament (600 pairs per pose, line integrals at 1e-10)
  runFastMap(); // warm-up (JIT)
  const t0 = performance.now();
  runFastMap();
  const tFast = (performance.now() - t0) / 1000;
  const norm = 1 / Math.sqrt(ev.selfTx * ev.selfRx);
  const t1 = performance.now();
  const ref = poses.map((p) => mutualInductanceChecked(tx, P0, token, p).value * norm);
  const tRef = (performance.now() - t1) / 1000;
  const kMax = Math.max(...ref.map(Math.abs));
  let worst = 0;
  let counted = 0;
  ref.forEach((k, n) => {
    if (Math.abs(k) > 0.01 * kMax) {
      counted++;
      worst = Math.max(worst, Math.abs(fastMap[n]! - k) / Math.abs(k));
    }
  });
  console.log(
    `coupling map 121×61: fast ${formatSeconds(tFast)} (second run), filament-by-filament ${formatSeconds(tRef)}, ` +
      `ratio ${(tRef / tFast).toFixed(1)}×; worst deviation ${(worst * 100).toFixed(3)} % over ${counted} poses with |k| > 1 % of max ` +
      `(max k = ${kMax.toPrecision(4)}; target ≤ 0.5 % ${worst <= 5e-3 ? "met" : "MISSED"}); methods used over both runs: ${JSON.stringify(ev.stats)}`,
  );
}

export const workloads: Workload[] = [
  {
    name: "coaxialLoopMutualInductance",
    size: "1 evaluation",
    target: 100e-9,
    fn: () => coaxialLoopMutualInductance(0.04, 0.006, ds[i++ & 1023]!),
  },
  {
    name: "loopMutualInductance 40/6 mm, offset 20, height 30, tilt 30°",
    size: "1 evaluation, relTol 1e-9",
    target: 3e-6,
    fn: () => loopMutualInductance(a, bs[jb++ & 63]!, { relTol: 1e-9 }),
  },
  {
    name: "coupling map, couplingEvaluator (roundCoil 40 mm/20 t → 6 mm/30 t)",
    size: "121×61 poses",
    target: 0.5,
    minTime: 2,
    fn: runFastMap,
  },
];

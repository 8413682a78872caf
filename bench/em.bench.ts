/**
 * EM core benchmarks: coaxial and general circle-pair mutual inductance per call, and the
 * coupling map of a transmitter roundCoil and a token roundCoil by the fast evaluator beside
 * the same map by a straightforward vectorised-array peer (bench/couplingMapPeer.ts), with the
 * agreement of both and of the exact filament sum printed once.
 */
import type { Workload } from "./harness.ts";
import { coaxialLoopMutualInductance } from "../lib/em/coaxialMutual.ts";
import { loopMutualInductance, type CircleFilament } from "../lib/em/loopMutual.ts";
import { couplingEvaluator } from "../lib/em/couplingEvaluator.ts";
import { mutualInductanceChecked } from "../lib/em/mutualInductance.ts";
import { roundCoil } from "../lib/em/builders/roundCoil.ts";
import type { Pose } from "../lib/em/types.ts";
import { peerMap, peerTurns } from "./couplingMapPeer.ts";

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

// ── coupling map: 121 × 61 poses, x −60…60 mm, z 2…122 mm ───────────────────
// The bench's transmitter (40 mm, 20 turns in 4 layers) and a 6 mm, 30-turn token: 600 filament pairs.
const tx = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
const token = roundCoil({ innerRadius: 0.006, turns: 30, wire: { diameter: 1e-4 } });
const P0: Pose = { position: [0, 0, 0] };
const xs = Array.from({ length: 121 }, (_, ix) => -0.06 + ix * 0.001);
const hs = Array.from({ length: 61 }, (_, iz) => 0.002 + iz * 0.002);
const poses: Pose[] = [];
for (const h of hs) for (const x of xs) poses.push({ position: [x, 0, h] });
const ev = couplingEvaluator(tx, token);
const fastMap = new Float64Array(poses.length);
const runFastMap = (): Float64Array => {
  for (let k = 0; k < poses.length; k++) fastMap[k] = ev.mutual(P0, poses[k]!);
  return fastMap;
};
const txTurns = peerTurns(tx.filaments);
const rxTurns = peerTurns(token.filaments);
const runPeerMap = (): Float64Array => peerMap(txTurns, rxTurns, xs, hs, 1e-3);

{
  // agreement of the three: library, peer, and (on a coarse subgrid) the exact filament sum
  runFastMap();
  const peer = runPeerMap();
  const mMax = Math.max(...fastMap.map(Math.abs));
  let worstPeer = 0;
  let worstExact = 0;
  let counted = 0;
  // poses where the conductors overlap (evaluate() warns; the filament value is not physical and
  // the evaluator answers cheaply): counted apart, checked against their own reported error
  let overlapping = 0;
  let overlapWithinError = 0;
  for (let n = 0; n < poses.length; n++) {
    const r = ev.evaluate(P0, poses[n]!);
    if (r.warnings.length > 0) {
      overlapping++;
      if (Math.abs(r.mutual - peer[n]!) <= r.error) overlapWithinError++;
      continue;
    }
    if (Math.abs(fastMap[n]!) <= 0.01 * mMax) continue;
    worstPeer = Math.max(worstPeer, Math.abs(fastMap[n]! - peer[n]!) / Math.abs(peer[n]!));
    if (n % 37 === 0) {
      const ref = mutualInductanceChecked(tx, P0, token, poses[n]!).value;
      worstExact = Math.max(worstExact, Math.abs(fastMap[n]! - ref) / Math.abs(ref));
      counted++;
    }
  }
  console.log(
    `coupling map 121×61: library vs peer worst ${(worstPeer * 100).toFixed(3)} % (|M| > 1 % of max, conductors apart); ` +
      `library vs exact filament sum worst ${(worstExact * 100).toFixed(3)} % over ${counted} poses (relTol 0.1 %); ` +
      `${overlapping} poses with overlapping conductors (not compared; ${overlapWithinError} within their reported error of the peer)`,
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
    name: "coupling map, peer: vectorised arrays (bench/couplingMapPeer.ts)",
    size: "121×61 poses",
    rounds: 3,
    warmup: 0,
    fn: runPeerMap,
  },
  {
    name: "coupling map, couplingEvaluator (40 mm/20 t → 6 mm/30 t)",
    size: "121×61 poses",
    target: 0.1,
    minTime: 2,
    against: "coupling map, peer: vectorised arrays (bench/couplingMapPeer.ts)",
    targetRatio: 10,
    fn: runFastMap,
  },
];

import { describe, expect, it } from "vitest";
import { couplingEvaluator } from "../../lib/em/couplingEvaluator.ts";
import { mutualInductanceChecked } from "../../lib/em/mutualInductance.ts";
import { rectSpiral } from "../../lib/em/builders/rectSpiral.ts";
import { rectLoop } from "../../lib/em/builders/rectLoop.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import type { Coil, Pose, Vec3 } from "../../lib/em/types.ts";
import { poseFrame, toWorld } from "../../lib/em/frames.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

const P0: Pose = { position: [0, 0, 0] };
const board = rectSpiral({ outerWidth: 0.2, outerHeight: 0.14, turns: 3, pitch: 0.008, wire: { diameter: 8e-4 } });
const token = roundCoil({ innerRadius: 0.006, turns: 12, layers: 2, wire: { diameter: 1.5e-4 } });
const rectToken = rectSpiral({ outerWidth: 0.02, outerHeight: 0.014, turns: 3, pitch: 6e-4, trace: { width: 3e-4, thickness: 35e-6 } });

/** Poses over the board: interior, over the winding, outside it, tilted and spun. */
function poses(): Pose[] {
  const out: Pose[] = [];
  for (const x of [0, 0.04, 0.085, 0.094, 0.1, 0.13]) {
    for (const z of [0.004, 0.012, 0.04]) {
      out.push({ position: [x, 0.013, z] });
      out.push({ position: [x, -0.05, z], axis: [Math.sin(0.5), 0.2, Math.cos(0.5)], spin: 0.3 });
    }
  }
  return out;
}

function checkAgainstExact(tx: Coil, rx: Coil, label: string, txPose: Pose = P0): { lumped: number; exact: number } {
  const ev = couplingEvaluator(tx, rx);
  const list = poses();
  const ref = list.map((p) => mutualInductanceChecked(tx, txPose, rx, p).value);
  const max = Math.max(...ref.map(Math.abs));
  list.forEach((p, i) => {
    const r = ev.evaluate(txPose, p);
    // independent method: the filament-by-filament sum (adaptive line integrals per pair, mutualInductance);
    // contract: relTol 1e-3, or 2e-5 of the map's largest |M| near zero crossings (the evaluator's absTol rule)
    expectRelClose(r.mutual, ref[i]!, 1e-3, `${label} at ${JSON.stringify(p)} (${r.method})`, 2e-5 * max);
    // the error estimate is of the right size: seen up to 1.5× below the actual error at tilted
    // poses 4 mm above the winding (still 25× inside relTol there), hence the factor 2
    expect(Math.abs(r.mutual - ref[i]!)).toBeLessThanOrEqual(Math.max(2 * r.error, 2e-5 * max));
  });
  return ev.stats;
}

describe("couplingEvaluator: straight-conductor fast path", () => {
  it("round token over a rectangular spiral agrees with the exact filament sum within relTol", () => {
    const stats = checkAgainstExact(board, token, "round token / rect spiral");
    expect(stats.lumped).toBeGreaterThan(3 * stats.exact);
  });

  it("rectangular PCB token over a rectangular spiral (closed-form segment pairs) agrees with the exact sum", () => {
    checkAgainstExact(board, rectToken, "rect token / rect spiral");
  });

  it("rectangular token over a round transmitter (the exact sum: the pad is larger than the token)", () => {
    const pad = roundCoil({ innerRadius: 0.06, turns: 10, layers: 2, wire: { diameter: 6e-4 } });
    checkAgainstExact(pad, rectToken, "rect token / round pad");
  });

  it("a moved and rotated transmitter gives the relative pose's value", () => {
    const ev = couplingEvaluator(board, token);
    const txPose: Pose = { position: [0.3, -0.1, 0.05], axis: [0, Math.sin(0.4), Math.cos(0.4)], spin: 0.7 };
    const rel: Vec3 = [0.02, 0.03, 0.01];
    const f = poseFrame(txPose);
    // the receiver at the transmitter-frame point rel with the transmitter's own axis and spin
    const world = toWorld(f, rel);
    const a = ev.mutual(P0, { position: rel });
    const b = ev.mutual(txPose, { position: world, axis: txPose.axis!, spin: 0.7 });
    expectRelClose(b, a, 1e-9, "frame invariance");
  });

  it("a round transmitter as a 256-sided polygon couples to a token as the circle path does", () => {
    const pad = roundCoil({ innerRadius: 0.05, turns: 1, wire: { diameter: 1e-3 } });
    const f = pad.filaments[0]!;
    if (f.kind !== "circle") throw new Error("expected a circle");
    const n = 256;
    const points: Vec3[] = Array.from({ length: n }, (_, i) => [f.radius * Math.cos((2 * Math.PI * i) / n), f.radius * Math.sin((2 * Math.PI * i) / n), f.center[2]]);
    const gon: Coil = { ...pad, filaments: [{ kind: "path", points, turns: 1 }] };
    const evC = couplingEvaluator(pad, token), evP = couplingEvaluator(gon, token);
    for (const p of [[0, 0, 0.01], [0.03, 0.01, 0.02], [0.07, 0, 0.01]] as Vec3[]) {
      const ref = evC.mutual(P0, { position: p });
      // independent method: the round-coil path (elliptic-integral potential); the inscribed 256-gon is
      // smaller by O((π/n)²) ≈ 1.5e-4, plus both evaluators' 1e-3 tolerances (estimates far smaller here)
      expectOutside({ quantity: `token at [${p.join(", ")}] over a 256-gon vs the circle`, source: "independent method: round-coil evaluator path", ours: evP.mutual(P0, { position: p }), reference: ref, rtol: 1e-3, unit: "H" });
    }
  });

  it("a single rectangular loop against a coaxial one: the evaluator matches Grover's closed form", () => {
    const a = 0.1, b = 0.06, d = 0.02;
    const loopA = rectLoop({ width: a, height: b, awg: 20 });
    const ev = couplingEvaluator(loopA, loopA);
    const g = Math.sqrt(a * a + b * b + d * d), ad = Math.hypot(a, d), bd = Math.hypot(b, d);
    const ref = (4e-7 * Math.PI / Math.PI) * (a * Math.log(((a + ad) * bd) / ((a + g) * d)) + b * Math.log(((b + bd) * ad) / ((b + g) * d)) + 2 * (g - ad - bd + d));
    // from memory (unverified): Grover 1946, equal coaxial rectangles (confirmed by the double integral in straightMutual.test.ts); μ₀ CODATA vs 4π·1e-7: 1e-9
    expectOutside({ quantity: "coaxial rectLoops 100×60 mm at 20 mm", source: "from memory (unverified): Grover 1946, equal coaxial rectangles", ours: ev.mutual(P0, { position: [0, 0, d] }), reference: ref, rtol: 1e-8, unit: "H" });
  });
});

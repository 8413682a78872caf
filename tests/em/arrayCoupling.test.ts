import { describe, expect, it } from "vitest";
import { arrayCoupling } from "../../lib/em/arrayCoupling.ts";
import { mutualInductanceChecked } from "../../lib/em/mutualInductance.ts";
import { rectSpiral } from "../../lib/em/builders/rectSpiral.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import type { Pose } from "../../lib/em/types.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

const tile = rectSpiral({ outerWidth: 0.08, outerHeight: 0.08, turns: 2, pitch: 0.006, wire: { diameter: 8e-4 } });
const token = roundCoil({ innerRadius: 0.005, turns: 10, wire: { diameter: 1.5e-4 } });
const tx = [[-0.04, -0.04], [0.04, -0.04], [-0.04, 0.04], [0.04, 0.04]].map(([x, y]) => ({ coil: tile, pose: { position: [x!, y!, 0] } as Pose }));

describe("arrayCoupling", () => {
  it("gives each transmitter's M to the token, equal to the exact filament sum within relTol, one evaluator per coil", () => {
    const arr = arrayCoupling(tx, token);
    expect(new Set(arr.evaluators).size).toBe(1);
    const out = new Float64Array(4);
    for (const p of [[0.01, 0.02, 0.008], [0, 0, 0.015], [0.07, -0.03, 0.01]]) {
      const pose: Pose = { position: p as [number, number, number] };
      expect(arr.mutual(pose, out)).toBe(out);
      tx.forEach((t, i) => {
        // independent method: filament-by-filament sum; relTol 1e-3 (or 1e-5 of the centre value where M is small)
        const ref = mutualInductanceChecked(tile, t.pose, token, pose).value;
        expectRelClose(out[i]!, ref, 1e-3, `transmitter ${i} at ${p}`, 1e-5 * Math.abs(arr.evaluators[0]!.mutual({ position: [0, 0, 0] }, { position: [0, 0, 0] })));
      });
    }
  });

  it("by symmetry, a token over the array's centre sees four equal M", () => {
    const m = arrayCoupling(tx, token).mutual({ position: [0, 0, 0.01] });
    for (let i = 1; i < 4; i++) expectRelClose(m[i]!, m[0]!, 1e-9, `transmitter ${i}`);
  });

  it("rejects an empty array and a bad pose, naming the field", () => {
    expect(() => arrayCoupling([], token)).toThrow(/transmitters/);
    expect(() => arrayCoupling([{ coil: tile, pose: { position: [0, NaN, 0] } }], token)).toThrow(/transmitters\[0\]\.pose\.position/);
  });
});

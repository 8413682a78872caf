import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { poseFrame, rotate, toCoil, toWorld, worldFilaments, type Frame } from "../../lib/em/frames.ts";
import type { Pose } from "../../lib/em/types.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { singleTurn } from "./helpers.ts";

const unitAxis = fc.tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true })).filter(([x, y, z]) => Math.hypot(x, y, z) > 1e-3);

describe("poseFrame", () => {
  it("maps the coil's +z onto the pose axis and is a proper rotation for any axis and spin", () => {
    fc.assert(
      fc.property(unitAxis, fc.double({ min: -10, max: 10, noNaN: true }), (axis, spin) => {
        const { R } = poseFrame({ position: [0, 0, 0], axis, spin });
        const l = Math.hypot(...axis);
        const z = rotate(R, [0, 0, 1]);
        for (let k = 0; k < 3; k++) expectRelClose(z[k]!, axis[k]! / l, 0, "R·ẑ = axis", 1e-14);
        // orthonormal with determinant +1 (rounding: 1e-14)
        for (let i = 0; i < 3; i++) {
          for (let j = 0; j < 3; j++) {
            let s = 0;
            for (let k = 0; k < 3; k++) s += R[3 * i + k]! * R[3 * j + k]!;
            expectRelClose(s, i === j ? 1 : 0, 0, `RRᵀ[${i}][${j}]`, 1e-14);
          }
        }
        const det = R[0]! * (R[4]! * R[8]! - R[5]! * R[7]!) - R[1]! * (R[3]! * R[8]! - R[5]! * R[6]!) + R[2]! * (R[3]! * R[7]! - R[4]! * R[6]!);
        expectRelClose(det, 1, 1e-14, "det R");
      }),
    );
  });

  it("turns the coil by spin about its own axis and is continuous near the −z axis", () => {
    const { R } = poseFrame({ position: [0, 0, 0], spin: Math.PI / 2 });
    const x = rotate(R, [1, 0, 0]);
    expectRelClose(x[1], 1, 1e-15, "spin π/2 takes x̂ to ŷ");
    const a = poseFrame({ position: [0, 0, 0], axis: [0, 1e-9, -1] }).R;
    const b = poseFrame({ position: [0, 0, 0], axis: [0, 0, -1] }).R;
    for (let k = 0; k < 9; k++) expectRelClose(a[k]!, b[k]!, 0, `R[${k}] near −z`, 1e-8);
  });

  it("round-trips points between the coil frame and the world", () => {
    const frame: Frame = poseFrame({ position: [0.1, -0.2, 0.3], axis: [1, 2, 3], spin: 0.7 });
    const p = [0.01, 0.02, -0.03] as const;
    const q = toCoil(frame, toWorld(frame, p));
    for (let k = 0; k < 3; k++) expectRelClose(q[k]!, p[k]!, 1e-14, "round trip");
    const w = worldFilaments(singleTurn(0.01, 1e-3), { position: [0, 0, 0.5], axis: [1, 0, 0] })[0]!;
    expect(w.kind === "circle" && w.center[2] === 0.5 && Math.abs(w.axis[0] - 1) < 1e-15).toBe(true);
  });

  it("rejects a zero or non-finite axis, NaN positions and spins", () => {
    expect(() => poseFrame({ position: [0, 0, 0], axis: [0, 0, 0] })).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: poseFrame: pose.axis: expected a direction (not all zero), got [0,0,0]]`);
    expect(() => poseFrame({ position: [0, Number.NaN, 0] })).toThrow(/position/);
    expect(() => poseFrame({ position: [0, 0, 0], spin: Infinity })).toThrow(/spin/);
  });

  it("has the documented signature", () => {
    expectTypeOf(poseFrame).parameter(0).toEqualTypeOf<Pose>();
    expectTypeOf(poseFrame).returns.toEqualTypeOf<Frame>();
  });
});

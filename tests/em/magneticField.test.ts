import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { magneticField } from "../../lib/em/magneticField.ts";
import { loopField } from "../../lib/em/loopField.ts";
import { poseFrame, rotate, toCoil } from "../../lib/em/frames.ts";
import type { Coil, Pose, Vec3 } from "../../lib/em/types.ts";
import { MU0 } from "../../lib/constants.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { expectOutside } from "../helpers/validation.ts";
import { handRoundCoil, polygonTurn, singleTurn } from "./helpers.ts";

describe("magneticField", () => {
  it("equals loopField in the coil's own frame, rotated into the world, for any pose", () => {
    const coil = singleTurn(0.02, 1e-3);
    fc.assert(
      fc.property(
        fc.tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: 0.1, max: 1, noNaN: true })),
        fc.tuple(fc.double({ min: -0.05, max: 0.05, noNaN: true }), fc.double({ min: -0.05, max: 0.05, noNaN: true }), fc.double({ min: 0.005, max: 0.05, noNaN: true })),
        fc.double({ min: -3, max: 3, noNaN: true }),
        (axis, point, spin) => {
          const pose: Pose = { position: [0.01, -0.02, 0.003], axis, spin };
          const B = magneticField(coil, pose, 2, point);
          const frame = poseFrame(pose);
          const p = toCoil(frame, point);
          const rho = Math.hypot(p[0], p[1]);
          const f = loopField(0.02, 2, rho, p[2]);
          const local: Vec3 = rho > 0 ? [(f.bRho * p[0]) / rho, (f.bRho * p[1]) / rho, f.bZ] : [0, 0, f.bZ];
          const ref = rotate(frame.R, local);
          const mag = Math.hypot(...ref);
          for (let k = 0; k < 3; k++) expectRelClose(B[k]!, ref[k]!, 0, `component ${k}`, 1e-13 * mag);
        },
      ),
    );
  });

  it("sums the turns: a wound coil's centre field is Σ μ₀I a²/(2(a²+z²)^{3/2})", () => {
    const coil = handRoundCoil(0.04, 5, 4, 5e-4);
    let ref = 0;
    for (const f of coil.filaments) if (f.kind === "circle") ref += (MU0 * f.radius ** 2) / (2 * (f.radius ** 2 + f.center[2] ** 2) ** 1.5);
    // source: Griffiths 1999, Example 5.6, summed over the 20 turns; rounding only
    expectOutside({ quantity: "20-turn coil centre B", source: "source: Griffiths 1999, Example 5.6 (summed over turns)", ours: magneticField(coil, { position: [0, 0, 0] }, 1, [0, 0, 0])[2], reference: ref, rtol: 1e-14, unit: "T" });
  });

  it("a 2000-gon turn gives the circle's field (polygon segments, Biot–Savart)", () => {
    const n = 2000;
    const r = 0.03;
    // inscribed polygon: the field converges as O(1/n²) to the circle's; use the circle of equal area-ish mean radius
    const poly = polygonTurn(r, n, 1e-3);
    const circle = singleTurn(r, 1e-3);
    for (const p of [[0, 0, 0.01], [0.01, 0.005, 0.02], [0.05, 0, 0.01]] as Vec3[]) {
      const a = magneticField(poly, { position: [0, 0, 0] }, 1, p);
      const b = magneticField(circle, { position: [0, 0, 0] }, 1, p);
      const mag = Math.hypot(...b);
      // independent method (segments vs elliptic integrals); polygon error ≈ (π/n)²/… ≈ 3e-6
      for (let k = 0; k < 3; k++) expectRelClose(a[k]!, b[k]!, 0, `2000-gon vs circle, comp ${k}`, 1e-5 * mag);
    }
  });

  it("is divergence-free (central differences), for a tilted wound coil", () => {
    const coil = handRoundCoil(0.01, 3, 2, 1e-3);
    const pose: Pose = { position: [0.002, 0.001, 0], axis: [0.3, 0.1, 1], spin: 0.2 };
    for (const x of [[0.005, 0.003, 0.02], [0.03, -0.01, 0.004]] as Vec3[]) {
      const h = 1e-6;
      let div = 0;
      for (let k = 0; k < 3; k++) {
        const xp = [...x] as [number, number, number];
        const xm = [...x] as [number, number, number];
        xp[k] = xp[k]! + h;
        xm[k] = xm[k]! - h;
        div += (magneticField(coil, pose, 1, xp)[k]! - magneticField(coil, pose, 1, xm)[k]!) / (2 * h);
      }
      const B = Math.hypot(...magneticField(coil, pose, 1, x));
      // independent method: ∇·B = 0; difference error ~ B·(rounding/h + h²/L²) ⇒ compare to B/L with L = 1 cm
      expectRelClose(div, 0, 0, "∇·B", 1e-6 * (B / 0.01));
    }
  });

  it("rejects points on the winding and bad input", () => {
    const coil: Coil = singleTurn(0.02, 1e-3);
    expect(() => magneticField(coil, { position: [0, 0, 0] }, 1, [0.02, 0, 0])).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: magneticField: point: lies on a filament of the coil, where the filament field is infinite, got [0.02,0,0]]`);
    expect(() => magneticField(coil, { position: [0, 0, 0] }, Number.NaN, [0, 0, 0])).toThrow(/current/);
    expect(() => magneticField(coil, { position: [0, 0, 0], axis: [0, 0, 0] }, 1, [0, 0, 0])).toThrow(/axis/);
  });

  it("has the documented signature", () => {
    expectTypeOf(magneticField).parameters.toEqualTypeOf<[Coil, Pose, number | string, Vec3]>();
    expectTypeOf(magneticField).returns.toEqualTypeOf<Vec3>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { coaxialLoopMutualInductance } from "../../lib/em/coaxialMutual.ts";
import { loopVectorPotential } from "../../lib/em/vectorPotential.ts";
import { MU0 } from "../../lib/constants.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import fixture from "../fixtures/em/coaxialMutual.json" with { type: "json" };

describe("coaxialLoopMutualInductance", () => {
  it("matches Maxwell's formula at 50 digits, from touching (m → 1) to 2500 radii apart", () => {
    for (const c of fixture.cases as { ra: number; rb: number; d: number; M: number }[]) {
      // 1e-14: the AGM sum has no cancellation in either limit, so only rounding remains
      expectOutside({ quantity: `M(ra=${c.ra}, rb=${c.rb}, d=${c.d})`, source: `source: ${fixture.source}`, ours: coaxialLoopMutualInductance(c.ra, c.rb, c.d), reference: c.M, rtol: 1e-14, unit: "H" });
    }
  });

  it("tends to the dipole limit mu0 π a² b² / (2 d³) at large d", () => {
    const a = 0.04;
    const b = 0.006;
    for (const d of [4, 40, 400, 4e4]) {
      // the leading correction is O((a² + b²)/d²): 1e-3 at d = 4 (≈ 1.6e-4), tighter further out
      const rtol = 3 * (a * a + b * b) / (d * d) + 1e-14;
      // source: Maxwell 1873 §701, far-field limit k → 0 of the coaxial formula (two magnetic dipoles on a common axis)
      expectOutside({ quantity: `M dipole limit (d=${d})`, source: "source: Maxwell 1873 §701, k → 0 limit", ours: coaxialLoopMutualInductance(a, b, d), reference: (MU0 * Math.PI * a * a * b * b) / (2 * d ** 3), rtol, unit: "H" });
    }
  });

  it("coaxialLoopMutualInductance(ra, rb, d) is symmetric in ra and rb and even in d", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 1, noNaN: true }), fc.double({ min: 1e-4, max: 1, noNaN: true }), fc.double({ min: -2, max: 2, noNaN: true }), (ra, rb, d) => {
        fc.pre(Math.abs(ra - rb) + Math.abs(d) > 1e-9);
        const m = coaxialLoopMutualInductance(ra, rb, d);
        expectRelClose(coaxialLoopMutualInductance(rb, ra, d), m, 1e-14, "reciprocity");
        expectRelClose(coaxialLoopMutualInductance(ra, rb, -d), m, 1e-15, "even in d");
        expect(m).toBeGreaterThan(0);
      }),
    );
  });

  it("equals the flux 2πρA_φ of one loop's vector potential through the other", () => {
    for (const [ra, rb, d] of [[0.04, 0.006, 0.03], [0.01, 0.02, 0.001], [0.1, 0.1, 1]] as const) {
      // independent form: Smythe's A_phi (same kernel, different formula path); rounding only
      expectRelClose(2 * Math.PI * rb * loopVectorPotential(ra, 1, rb, d), coaxialLoopMutualInductance(ra, rb, d), 1e-14, `(${ra}, ${rb}, ${d})`);
    }
  });

  it("rejects coincident filaments and bad radii", () => {
    expect(() => coaxialLoopMutualInductance(0.01, 0.01, 0)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: coaxialLoopMutualInductance: ra, rb, d: the filaments coincide (ra = rb and d = 0): their filament mutual inductance is infinite; use selfInductance with a wire radius, got [0.01,0.01,0]]`);
    expect(() => coaxialLoopMutualInductance(0, 0.01, 0.1)).toThrow(/ra/);
    expect(() => coaxialLoopMutualInductance(0.01, 0.01, Infinity)).toThrow(/d/);
  });

  it("has the documented signature", () => {
    expectTypeOf(coaxialLoopMutualInductance).parameters.toEqualTypeOf<[number, number, number]>();
    expectTypeOf(coaxialLoopMutualInductance).returns.toEqualTypeOf<number>();
  });
});

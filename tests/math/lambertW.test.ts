import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { lambertW, lambertWOfLog, lambertWOfLogCore } from "../../lib/math/lambertW.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import mp from "../fixtures/math/lambertw-mpmath.json" with { type: "json" };
import mpLog from "../fixtures/math/lambertw-of-log-mpmath.json" with { type: "json" };

// Tolerance regimes (relative to W):
// - "regular" and "huge" x: RTOL = 1e-15. Fritsch's iteration converges to within a rounding
//   or two of the exact W of the exact double x (measured worst 3.1e-16).
// - "branch" (x within 1e-3 of −1/e): the same 1e-15. The branch series in p = √(2(ex + 1))
//   with 1/e split into two doubles keeps the distance to the branch point exact, so even
//   x one ulp above −1/e (W = −1 + 1.5e-8) comes out to rounding (measured worst 2.4e-16).
// - Identity w·e^w = x: 4e-15, see the property test.
const RTOL = 1e-15;
const SOURCE = "reference library: mpmath 1.3 lambertw at 40 digits (tests/fixtures/math/lambertw-mpmath.json)";

describe("lambertW(x) — principal branch W₀", () => {
  it("W(1) is the omega constant 0.5671432904097838… and W(e) = 1", () => {
    // source: Corless et al. 1996, Adv. Comput. Math. 5, §1 (Ω = W(1) = 0.567143290409783872999968…);
    // W(e) = 1 follows from the definition (1·e¹ = e). The double nearest Ω is 0.5671432904097838.
    expectOutside({ quantity: "W(1) (omega constant)", source: "source: Corless et al. 1996, Adv. Comput. Math. 5, §1", ours: lambertW(1), reference: 0.5671432904097838, rtol: RTOL });
    expectRelClose(lambertW(Math.E), 1, 2 * RTOL, "W(e) = 1 (definition; Math.E is e rounded, so W differs by ≤ ulp/2)");
  });

  it("matches mpmath at 17 digits across the whole domain, near −1/e, tiny and huge x", () => {
    // reference library: mpmath (Python) via the committed fixture
    const regimes = new Set(mp.cases.map((c) => c.regime));
    expect([...regimes].sort()).toEqual(["branch", "huge", "regular"]);
    for (const c of mp.cases) {
      expectOutside({ quantity: `W(${c.x}) [${c.regime}]`, source: SOURCE, ours: lambertW(c.x), reference: c.W, rtol: RTOL });
    }
  });

  it("lambertWOfLog(y) = W(e^y) matches mpmath for y from −700 to 1e300", () => {
    // reference library: mpmath lambertw(exp(y)) via the committed fixture
    for (const c of mpLog.cases) {
      expectOutside({ quantity: `W(exp(${c.y}))`, source: "reference library: mpmath 1.3 lambertw(exp(y)) (tests/fixtures/math/lambertw-of-log-mpmath.json)", ours: lambertWOfLog(c.y), reference: c.W, rtol: RTOL });
    }
  });

  it("lambertWOfLogCore(y), the unchecked hot-path form, is lambertWOfLog(y) from y = 1 on", () => {
    for (const c of mpLog.cases) if (c.y >= 1) expect(lambertWOfLogCore(c.y)).toBe(lambertWOfLog(c.y));
  });

  it("lambertWOfLogCore(y) agrees with lambertW(e^y) over the diode range y ∈ [−60, 700] (independent paths)", () => {
    // independent method: lambertW's own start and iteration on the formed argument e^y.
    // e^y carries ≤ 1.1e-16 relative rounding and dW/W = (dx/x)/(1 + W), so the paths agree
    // to a few ulps above y = 1 (1e-15); below, the core's log form cancels ln w against y and
    // keeps ≲ 4e-15 (1e-14), which is why lambertWOfLog takes lambertW(e^y) there
    for (let y = -60; y < 700; y += 0.0731) {
      expectRelClose(lambertWOfLogCore(y), lambertW(Math.exp(y)), y < 1 ? 1e-14 : 1e-15, `y = ${y}`);
    }
  });

  it("lambertWOfLog(ln x) agrees with lambertW(x) where both apply (independent paths)", () => {
    for (const x of [1e-3, 0.5, 3, 100, 1e10, 1e250]) {
      // ln x carries ≤ 1.1e-16 relative rounding; dW/W = dy/(1 + W), so agreement to ~4e-16
      expectRelClose(lambertWOfLog(Math.log(x)), lambertW(x), 2e-15, `x = ${x}`);
    }
  });

  it("satisfies w·e^w = x over −1/e < x < 1e300 (property, fast-check)", () => {
    // Identity check, evaluated in floating point. For w ≤ 1 the residual of w·e^w carries a few
    // ulp of its own rounding: 4e-15 relative. For w > 1, e^w multiplies the rounding of w by
    // |w| (w = 130 → 1e-14), so there the identity is checked in its well-conditioned log form
    // ln w + w = ln x, whose rounding is ≤ 2 ulp: 1e-15 relative.
    const check = (x: number): void => {
      const w = lambertW(x);
      expect(w).toBeGreaterThanOrEqual(-1);
      if (x === 0) expect(w).toBe(0);
      else if (w <= 1) expectRelClose(w * Math.exp(w), x, 4e-15, `w·e^w at x = ${x}`);
      else expectRelClose(Math.log(w) + w, Math.log(x), 1e-15, `ln w + w at x = ${x}`);
    };
    fc.assert(fc.property(fc.double({ min: -0.36, max: 1e300, noNaN: true }), check), { numRuns: 2000, seed: 11 });
    fc.assert(fc.property(fc.double({ min: -0.36787944117144233, max: -0.36, noNaN: true }), check), { numRuns: 500, seed: 12 });
    // a log-uniform sweep over the positive range, where fc.double rarely lands
    for (let e = -300; e <= 300; e += 0.37) check(10 ** e);
  });

  it("is increasing (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -0.36, max: 1e6, noNaN: true }), fc.double({ min: 1e-6, max: 1, noNaN: true }), (x, dx) => {
        expect(lambertW(x + dx)).toBeGreaterThan(lambertW(x));
      }),
      { numRuns: 300, seed: 5 },
    );
  });

  it("edge values: W(0) = 0, W(−1/e) = −1 at the double nearest −1/e, W(max double) finite", () => {
    expect(lambertW(0)).toBe(0);
    expect(lambertW(-0.36787944117144233)).toBe(-1);
    expect(Number.isFinite(lambertW(Number.MAX_VALUE))).toBe(true);
    expect(lambertW(Number.MIN_VALUE)).toBe(Number.MIN_VALUE); // W(x) = x − x² + … for tiny x
  });

  it("rejects NaN, ±Infinity and x below −1/e with TanklightInputError", () => {
    for (const bad of [Number.NaN, Infinity, -Infinity, -0.3678794411714424, -1]) {
      expect(() => lambertW(bad)).toThrow(TanklightInputError);
    }
    for (const bad of [Number.NaN, Infinity, -Infinity]) expect(() => lambertWOfLog(bad)).toThrow(TanklightInputError);
    expect(() => lambertW(-1)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: lambertW: x: must be a finite number ≥ −1/e (−0.36787944117144233), got -1]`);
  });

  it("has the documented types", () => {
    expectTypeOf(lambertW).toEqualTypeOf<(x: number) => number>();
    expectTypeOf(lambertWOfLog).toEqualTypeOf<(y: number) => number>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { roundWireAcFactor, roundWireInternalInductanceFactor } from "../../../lib/em/losses/roundWireAcFactor.ts";
import { skinDepth } from "../../../lib/em/losses/skinDepth.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";
import exact from "../../fixtures/losses/round_wire_ac_factor.json" with { type: "json" };

const RHO = 1.7241e-8;
const F = 100e3;
const DELTA = skinDepth(F, RHO);

describe("roundWireAcFactor(radius, f, resistivity)", () => {
  it("equals the exact complex-Bessel solution from r/δ = 0.001 to 1000 within 1e-12", () => {
    // Regime: everywhere. The fixture comes from Re[(ka/2)J0(ka)/J1(ka)] with mpmath (an
    // independent route from our Kelvin-function form); measured worst error 5e-14 (r/δ = 1000).
    for (const c of exact.cases) {
      expectOutside({
        quantity: `R_ac/R_dc at r/δ = ${c.rOverDelta}`,
        source: "reference library: mpmath besselj, exact round-wire solution (Ramo, Whinnery & Van Duzer §5.14)",
        ours: roundWireAcFactor(c.rOverDelta * DELTA, F, RHO),
        reference: c.factor,
        rtol: 1e-12,
      });
    }
  });

  it("follows the low-frequency series 1 + x⁴/48 − … (x = r/δ) for x ≤ 0.5", () => {
    // source: standard low-frequency expansion R/R0 = 1 + x⁴/48 − x⁸/2880… (x = r/δ), e.g.
    // Ramo, Whinnery & Van Duzer §5.14 (from memory); the issue quotes 1 + x⁴/48.
    // Regime x ≤ 0.5: the omitted x⁸/2880 term is ≤ 1.4e-6 relative to the excess x⁴/48.
    for (const x of [0.05, 0.1, 0.2, 0.5]) {
      const excess = roundWireAcFactor(x * DELTA, F, RHO) - 1;
      expectOutside({ quantity: `(R_ac/R_dc − 1) at r/δ = ${x}`, source: "source: low-frequency series 1 + x⁴/48 (issue 4; RWV §5.14)", ours: excess, reference: x ** 4 / 48, rtol: 2 * (x ** 4 / 2880) / (x ** 4 / 48) + 1e-9 });
    }
  });

  it("follows the high-frequency asymptote r/2δ + 1/4 + 3δ/32r for r/δ ≥ 10", () => {
    // source: standard asymptotic expansion of the Kelvin ratio (docs/references.md, "standard (memory)");
    // the next term is O((δ/r)²) absolute, i.e. O((δ/r)³) relative: tolerance 0.02·(δ/r)³.
    for (const x of [10, 30, 100, 1000]) {
      const ref = x / 2 + 0.25 + 3 / (32 * x);
      expectOutside({ quantity: `R_ac/R_dc at r/δ = ${x}`, source: "source: asymptote r/2δ + 1/4 + 3δ/(32r) (docs/references.md)", ours: roundWireAcFactor(x * DELTA, F, RHO), reference: ref, rtol: 0.02 / (x * x * x) + 2e-13 });
    }
  });

  it("is exactly 1 at DC and increases monotonically with frequency", () => {
    expect(roundWireAcFactor(0.25e-3, 0, RHO)).toBe(1);
    let last = 1;
    for (let f = 1e3; f < 1e8; f *= 1.5) {
      const v = roundWireAcFactor(0.25e-3, f, RHO);
      expect(v).toBeGreaterThanOrEqual(last);
      last = v;
    }
    expectRelClose(roundWireAcFactor(0.25e-3, 200e3, RHO), 1.1504241913449067, 1e-12, "doc example 0.5 mm copper at 200 kHz");
  });

  it("roundWireInternalInductanceFactor equals the exact internal inductance (Y = 1/4 at DC → δ/2r)", () => {
    // reference library: mpmath — Y = Im[(ka/2)J0(ka)/J1(ka)]/(a/δ)², the same exact solution;
    // measured worst error ~1e-13, tolerance 1e-11 for the cancellation in ber·ber′ + bei·bei′ at small q.
    for (const c of exact.cases) {
      expectOutside({
        quantity: `internal inductance factor Y at r/δ = ${c.rOverDelta}`,
        source: "reference library: mpmath besselj, exact round-wire internal impedance",
        ours: roundWireInternalInductanceFactor(c.rOverDelta * DELTA, F, RHO),
        reference: c.internalY,
        rtol: 1e-11,
      });
    }
    expect(roundWireInternalInductanceFactor(1e-3, 0, RHO)).toBe(0.25);
    expectRelClose(roundWireInternalInductanceFactor(0.25e-3, 200e3, RHO), 0.2314057165937073, 1e-12, "doc example");
  });

  it("rejects bad input", () => {
    expect(() => roundWireAcFactor(0, 1e3, RHO)).toThrow(TanklightInputError);
    expect(() => roundWireAcFactor(1e-3, -1, RHO)).toThrow(/roundWireAcFactor: f: must be a finite number ≥ 0 Hz/);
    expect(() => roundWireAcFactor(1e-3, 1e3, Number.NaN)).toThrow(TanklightInputError);
  });

  it("has the documented types", () => {
    expectTypeOf(roundWireAcFactor).parameters.toEqualTypeOf<[radius: number, f: number, resistivity: number]>();
    expectTypeOf(roundWireAcFactor).returns.toEqualTypeOf<number>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { dowellDelta, dowellFactor } from "../../../lib/em/losses/dowell.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";
import fx from "../../fixtures/losses/dowell_layer_factor.json" with { type: "json" };

describe("dowellFactor(Δ, m) and dowellDelta(d, p, f, ρ)", () => {
  it("evaluate Dowell 1966's layer formula to 1e-13 (mpmath, 40 digits)", () => {
    // source: Dowell, Proc. IEE 113(8), 1966 — formula evaluated by the generator at 40 digits;
    // our double-precision evaluation keeps ~1e-15 (measured), 1e-13 leaves room for libm.
    for (const c of fx.cases) {
      expectOutside({ quantity: `F_R(Δ = ${c.Delta}, m = ${c.m})`, source: "source: Dowell 1966 formula (mpmath evaluation)", ours: dowellFactor(c.Delta, c.m), reference: c.factor, rtol: 1e-13 });
    }
  });

  it("matches its low-frequency expansion 1 + (5m² − 1)Δ⁴/45", () => {
    // independent method: Taylor expansion of the closed form; omitted terms O(Δ⁸·m²) ≤ 1e-6 relative
    // to the Δ⁴ term at Δ = 0.03
    for (const m of [1, 3, 6]) {
      const D = 0.03;
      expectRelClose(dowellFactor(D, m) - 1, ((5 * m * m - 1) * D ** 4) / 45, 1e-3, `m = ${m}`);
    }
  });

  it("computes Δ = (h/δ)√η with h = (√π/2)d, η = h/p and rejects bad input", () => {
    const d = 0.5e-3, p = 0.55e-3, f = 200e3, rho = 1.7241e-8;
    const delta = Math.sqrt(rho / (Math.PI * f * 1.25663706212e-6));
    const h = (Math.sqrt(Math.PI) / 2) * d;
    expectRelClose(dowellDelta(d, p, f, rho), (h / delta) * Math.sqrt(h / p), 1e-14, "Δ");
    expect(dowellFactor(0, 3)).toBe(1);
    expect(() => dowellFactor(-1, 2)).toThrow(TanklightInputError);
    expect(() => dowellFactor(1, 0.5)).toThrow(/dowellFactor: layers: must be a finite number from 1 to 10000/);
    expectTypeOf(dowellFactor).returns.toEqualTypeOf<number>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { ber, bei, beiPrime, berPrime, kelvin, kelvinScaled, KELVIN_CROSSOVER, type KelvinValues } from "../../lib/math/kelvin.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import mp from "../fixtures/losses/kelvin_mpmath.json" with { type: "json" };
import as from "../fixtures/losses/kelvin_abramowitz_stegun.json" with { type: "json" };

// Tolerance regime: ber and bei oscillate through zero, so a relative error per function is
// meaningless near a zero. We measure every error against the modulus of the complex value it
// is part of (|ber + i bei|, |ber′ + i bei′|, |ber₂ + i bei₂|): the series loses up to ~3
// digits just below the crossover (x = 26) and Hankel's expansion is exact to rounding above
// it, so 1e-13 of the modulus holds everywhere in 0 ≤ x ≤ 500 (measured worst 4e-14).
const RTOL_MODULUS = 1e-13;

describe("kelvin(x)", () => {
  it("matches mpmath ber, bei, ber′, bei′, ber₂, bei₂ on 0 ≤ x ≤ 500 to 1e-13 of the modulus", () => {
    for (const c of mp.cases) {
      const k = kelvin(c.x);
      const m0 = Math.hypot(c.ber, c.bei);
      const m1 = Math.hypot(c.berp, c.beip);
      const m2 = Math.hypot(c.ber2, c.bei2);
      const pairs: [string, number, number, number][] = [
        ["ber", k.ber, c.ber, m0],
        ["bei", k.bei, c.bei, m0],
        ["ber′", k.berp, c.berp, m1],
        ["bei′", k.beip, c.beip, m1],
        ["ber₂", k.ber2, c.ber2, m2],
        ["bei₂", k.bei2, c.bei2, m2],
      ];
      for (const [name, ours, ref, modulus] of pairs) {
        // at x = 0 the derivative and order-2 moduli are 0: both sides are exactly 0 there
        expectOutside({
          quantity: `${name}(${c.x})`,
          source: "reference library: mpmath 1.3 ber/bei (fixture tests/fixtures/losses/kelvin_mpmath.json)",
          ours,
          reference: ref,
          rtol: 0,
          atol: RTOL_MODULUS * modulus + (modulus === 0 ? 1e-300 : 0),
        });
      }
    }
  });

  it("agrees with A&S Table 9.12 spot values to the printed decimals", () => {
    // source: Abramowitz & Stegun 1964, Table 9.12 — values as recalled (from memory, unverified
    // against the printed page) and confirmed by mpmath in the generator; half a unit in the last
    // printed decimal is the table's own rounding.
    for (const c of as.cases) {
      const k = kelvin(c.x);
      const half = 0.5 * 10 ** -c.decimals;
      const src = "source: A&S 1964 Table 9.12 (from memory, agrees with mpmath)";
      expectOutside({ quantity: `ber(${c.x})`, source: src, ours: k.ber, reference: c.ber, rtol: 0, atol: half });
      expectOutside({ quantity: `bei(${c.x})`, source: src, ours: k.bei, reference: c.bei, rtol: 0, atol: half });
      if ("berp" in c && typeof c.berp === "number" && "beip" in c && typeof c.beip === "number") {
        expectOutside({ quantity: `ber′(${c.x})`, source: src, ours: k.berp, reference: c.berp, rtol: 0, atol: half });
        expectOutside({ quantity: `bei′(${c.x})`, source: src, ours: k.beip, reference: c.beip, rtol: 0, atol: half });
      }
    }
  });

  it("is continuous across the series/asymptotic crossover", () => {
    // independent method: the series just below x = 26, carried across the step h by its own
    // derivative (second-order remainder ~h²·|f″| ≈ 1e-18 of the modulus), meets the Hankel
    // value at x = 26 to within the two regimes' error budgets (1e-13 each)
    const h = 1e-9;
    const below = kelvin(KELVIN_CROSSOVER - h);
    const above = kelvin(KELVIN_CROSSOVER);
    const mod = Math.hypot(above.ber, above.bei);
    expect(Math.abs(below.ber + h * below.berp - above.ber)).toBeLessThan(2e-13 * mod);
    expect(Math.abs(below.bei + h * below.beip - above.bei)).toBeLessThan(2e-13 * mod);
  });

  it("has ber′, bei′ equal to finite differences of ber, bei, and ber·bei′ − bei·ber′ > 0", () => {
    // independent method: central difference of ber, bei (step 1e-5, truncation error ~1e-10 relative)
    for (const x of [0.7, 3.3, 9.1, 24.5, 31, 80]) {
      const h = 1e-5;
      const kp = kelvinScaled(x + h);
      const km = kelvinScaled(x - h);
      const k = kelvinScaled(x);
      // d/dx[e^{−x/√2} ber] = e^{−x/√2}(ber′ − ber/√2)
      const dber = (kp.ber - km.ber) / (2 * h);
      const dbei = (kp.bei - km.bei) / (2 * h);
      const mod = Math.hypot(k.berp, k.beip);
      expect(Math.abs(dber - (k.berp - k.ber * Math.SQRT1_2))).toBeLessThan(1e-8 * mod);
      expect(Math.abs(dbei - (k.beip - k.bei * Math.SQRT1_2))).toBeLessThan(1e-8 * mod);
      // ber·bei′ − bei·ber′ is the real-wire AC-factor numerator: positive for x > 0
      expect(k.ber * k.beip - k.bei * k.berp).toBeGreaterThan(0);
    }
  });

  it("has the known values at x = 0 and the small-x series", () => {
    const k0 = kelvin(0);
    expect([k0.ber, k0.bei, k0.berp, k0.beip, k0.ber2, k0.bei2].map((v) => v + 0)).toEqual([1, 0, 0, 0, 0, 0]);
    // source: A&S 1964 eq. 9.9.10: ber x = 1 − (x/2)⁴/(2!)² + …, bei x = (x/2)² − …
    const x = 0.01;
    expectRelClose(ber(x), 1 - (x / 2) ** 4 / 4, 1e-15, "ber small x");
    expectRelClose(bei(x), (x / 2) ** 2 - (x / 2) ** 6 / 36, 1e-15, "bei small x");
    expectRelClose(berPrime(x), -(x ** 3) / 16, 1e-9, "ber′ small x");
    expectRelClose(beiPrime(x), x / 2, 1e-9, "bei′ small x");
  });

  it("kelvinScaled stays finite far beyond the unscaled range; kelvin rejects x > 1000 and bad input", () => {
    const s = kelvinScaled(1e5);
    // modulus of the scaled value → 1/√(2πx) (A&S 9.10.1 leading term)
    expectRelClose(Math.hypot(s.ber, s.bei), 1 / Math.sqrt(2 * Math.PI * 1e5), 1e-5, "scaled modulus, x = 1e5");
    expect(() => kelvin(1001)).toThrow(TanklightInputError);
    expect(() => kelvin(-1)).toThrow(/kelvin: x: must be a finite number in \[0, 1000\], got -1/);
    expect(() => kelvin(Number.NaN)).toThrow(TanklightInputError);
    expect(() => kelvinScaled(Number.POSITIVE_INFINITY)).toThrow(TanklightInputError);
  });

  it("has the documented types", () => {
    expectTypeOf(kelvin).parameter(0).toEqualTypeOf<number>();
    expectTypeOf(kelvin).returns.toEqualTypeOf<KelvinValues>();
    expectTypeOf(ber).returns.toEqualTypeOf<number>();
    expectTypeOf(bei).returns.toEqualTypeOf<number>();
  });
});

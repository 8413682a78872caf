import { describe, expect, expectTypeOf, it } from "vitest";
import { tokenResponse, type TokenResponse } from "../../../lib/circuit/loads/tokenResponse.ts";
import { fundamentalConductance } from "../../../lib/circuit/loads/describingFunction.ts";
import { ledPreset, diodePreset } from "../../../lib/circuit/loads/ledPresets.ts";
import { antiParallelPair, bridgeRectifier, halfWaveReservoir, resistorLoad, sameDirectionPair, singleLed } from "../../../lib/circuit/loads/tokenCircuits.ts";
import { resonantCapacitance } from "../../../lib/circuit/tank.ts";
import type { TokenLoad } from "../../../lib/circuit/loads/types.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

const f = 200e3, L = 100e-6, R = 5;
const C = resonantCapacitance(L, f);

describe("tokenResponse: a token's tank amplitude and LED currents for a given induced EMF", () => {
  it("with a resistor load it equals the linear phasor solution (independent method)", () => {
    const RL = 3000, e = 0.7, esr = 0.05;
    const r = tokenResponse({ emf: e, frequency: f, inductance: L, coilResistance: R, capacitance: C * 1.03, capacitorEsr: esr, load: resistorLoad(RL) });
    // closed form: V = e·Z_p/(Z_L + Z_p), Z_p = (ESR + 1/(jωC)) ∥ R_L
    const w = 2 * Math.PI * f;
    const zc = { re: esr, im: -1 / (w * C * 1.03) };
    // Z_p = zc·RL/(zc + RL)
    const num = { re: zc.re * RL, im: zc.im * RL };
    const den = { re: zc.re + RL, im: zc.im };
    const dd = den.re ** 2 + den.im ** 2;
    const zp = { re: (num.re * den.re + num.im * den.im) / dd, im: (num.im * den.re - num.re * den.im) / dd };
    const tot = { re: R + zp.re, im: w * L + zp.im };
    const amp = (e * Math.hypot(zp.re, zp.im)) / Math.hypot(tot.re, tot.im);
    // bisection to 1e-14 relative
    expectRelClose(r.amplitude, amp, 1e-12, "tank amplitude");
    expectRelClose(r.coilCurrent, e / Math.hypot(tot.re, tot.im), 1e-12, "coil current");
    expectRelClose(r.loadPower, (0.5 * amp * amp) / RL, 1e-12, "load power");
  });

  const loads: [string, TokenLoad][] = [
    ["single LED", singleLed(ledPreset("red"))],
    ["anti-parallel", antiParallelPair(ledPreset("red"), ledPreset("green-gap"))],
    ["same direction", sameDirectionPair(ledPreset("yellow"), ledPreset("blue"))],
    ["bridge", bridgeRectifier(diodePreset("schottky"), ledPreset("white"), 10)],
    ["half-wave reservoir", halfWaveReservoir(diodePreset("schottky"), ledPreset("red"), 10e-6, { seriesResistance: 4.7 })],
    ["resistor", resistorLoad(2000)],
  ];
  for (const [name, load] of loads) {
    it(`${name}: the operating point satisfies the tank's KCL and the LED currents are finite`, () => {
      for (const e of [0.05, 0.3, 1]) {
        const r = tokenResponse({ emf: e, frequency: f, inductance: L, coilResistance: R, capacitance: C, load });
        const w = 2 * Math.PI * f;
        const g = fundamentalConductance(load, r.amplitude);
        // residual of A·|1 + Z_L(jωC + G)| = |e| (identity, bisection to 1e-14)
        const re = 1 + R * g - w * L * w * C;
        const im = R * w * C + w * L * g;
        expectRelClose(r.amplitude * Math.hypot(re, im), e, 1e-12, `${name}, e = ${e}`);
        for (const l of r.leds) {
          expect(Number.isFinite(l.current)).toBe(true);
          expect(l.current).toBeGreaterThan(-1e-9);
        }
      }
    });
  }

  it("a stronger EMF never lowers the LED current (monotone drive)", () => {
    const load = singleLed(ledPreset("green-gap"));
    let last = -1;
    for (let e = 0.01; e < 2; e *= 1.5) {
      const c = tokenResponse({ emf: e, frequency: f, inductance: L, coilResistance: R, capacitance: C, load }).leds[0]!.current;
      expect(c).toBeGreaterThanOrEqual(last);
      last = c;
    }
  });

  it("zero EMF gives zero amplitude; bad input throws", () => {
    expect(tokenResponse({ emf: 0, frequency: f, inductance: L, coilResistance: R, capacitance: C, load: resistorLoad(10) }).amplitude).toBe(0);
    expect(() => tokenResponse({ emf: -1, frequency: f, inductance: L, coilResistance: R, capacitance: C, load: resistorLoad(10) })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: tokenResponse: emf: must be ≥ 0 V and ≤ 1.000 MV, got -1]`,
    );
  });

  it("types", () => {
    expectTypeOf(tokenResponse).returns.toEqualTypeOf<TokenResponse>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { readFileSync } from "node:fs";
import { led, diode, fitShockley, type Led, type Diode, type JunctionSpec } from "../../../lib/circuit/loads/led.ts";
import { ledPreset } from "../../../lib/circuit/loads/ledPresets.ts";
import { lambertW, lambertWOfLog } from "../../../lib/math/lambertW.ts";
import type { DiodeModel } from "../../../lib/circuit/types.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";
import { thermalVoltage } from "../../../lib/constants.ts";

const fixture = JSON.parse(
  readFileSync(new URL("../../fixtures/circuit/shockley-current.json", import.meta.url), "utf8"),
) as { source: string; cases: { set: string; saturationCurrent: number; idealityFactor: number; seriesResistance: number; temperature: number; voltage: number; current: number }[] };

/** brute-force bisection of the implicit equation v = nV_T ln(1 + i/I_s) + i r_s on the junction voltage */
function bisectCurrent(is: number, nvt: number, rs: number, v: number): number {
  let lo = Math.min(v, 0) - 1;
  let hi = v + 2 * is * rs + 1e-300;
  for (let k = 0; k < 2000 && hi - lo > 0; k++) {
    const mid = 0.5 * (lo + hi);
    if (mid === lo || mid === hi) break;
    if (mid + is * Math.expm1(mid / nvt) * rs - v < 0) lo = mid;
    else hi = mid;
  }
  return is * Math.expm1(0.5 * (lo + hi) / nvt);
}

describe("led(spec): Shockley junction with series resistance, exact by Lambert W", () => {
  it("current(v) matches the mpmath bisection fixture (leakage off)", () => {
    for (const c of fixture.cases) {
      const l = led({ saturationCurrent: c.saturationCurrent, idealityFactor: c.idealityFactor, seriesResistance: c.seriesResistance, referenceTemperature: c.temperature, leakage: 0 });
      // regimes: forward (|i| ≫ I_s) 1e-12 relative (W to ~4e-15, times the conditioning of
      // (nV_T/r)W − I_s); reverse (i ≈ −I_s) the same relative to I_s
      expectOutside({
        quantity: `junction current, ${c.set}, v = ${c.voltage} V`,
        source: "independent method: implicit equation bisected at 40 digits by mpmath (scripts/gen_circuit_fixtures.py)",
        ours: l.current(c.voltage),
        reference: c.current,
        rtol: 1e-12,
        atol: 1e-12 * c.saturationCurrent,
        unit: "A",
      });
    }
  });

  it("current(v) of every preset equals brute-force bisection of the implicit equation", () => {
    for (const colour of ["red", "green-gap", "green-ingan", "blue", "white"] as const) {
      const l = ledPreset(colour);
      for (let v = -3; v <= 6; v += 0.0137) {
        const ref = bisectCurrent(l.is, l.n * l.thermalVoltage, l.rs, v) + l.leakage * v;
        // double-precision bisection resolves the junction voltage to 1 ulp; 1e-11 relative
        // covers the exp amplification by v/nV_T ≈ 60, with an absolute floor of 1e-3·I_s near i = 0
        expectRelClose(l.current(v), ref, 1e-11, `${colour} at ${v} V`, 1e-3 * l.is + 1e-15 * Math.abs(ref));
      }
    }
  });

  it("voltage(i) is the inverse of current(v)", () => {
    const l = ledPreset("green-ingan");
    for (const i of [1e-9, 1e-6, 1e-4, 1e-3, 0.02, 0.5, 10]) {
      // Newton polish to 1e-15; the round trip loses a few ulps through the exponential
      expectRelClose(l.current(l.voltage(i)), i, 1e-12, `i = ${i}`);
    }
  });

  it("current is finite and conductance > 0 for every finite v, including ±1e300 (DiodeModel contract)", () => {
    const l = ledPreset("red");
    fc.assert(
      fc.property(fc.double({ min: -1e300, max: 1e300, noNaN: true }), (v) => {
        const i = l.current(v);
        const g = l.conductance(v);
        return Number.isFinite(i) && Number.isFinite(g) && g > 0;
      }),
      { numRuns: 2000 },
    );
    expect(Number.isFinite(l.current(1e300))).toBe(true);
    expect(l.conductance(-1e300)).toBeGreaterThan(0);
  });

  it("reverse bias: current → −I_s plus the leakage floor", () => {
    const l = led({ saturationCurrent: 1e-18, idealityFactor: 2, seriesResistance: 10, leakage: 1e-12 });
    // identity of the model: −I_s − g_leak·|v| (exp(−5/0.05) underflows the junction term)
    expectRelClose(l.current(-5), -1e-18 - 5e-12, 1e-12, "reverse current");
  });

  it("conductance(v) equals the derivative of current(v)", () => {
    const l = ledPreset("blue");
    for (const v of [-1, 0, 1.5, 2.6, 2.9, 3.2, 5, 30]) {
      const h = 1e-6;
      const fd = (l.current(v + h) - l.current(v - h)) / (2 * h);
      // central difference, truncation O(h²·i‴) ≲ 1e-7 relative at h = 1 µV
      expectRelClose(l.conductance(v), fd, 1e-6, `v = ${v}`, 1e-15);
    }
  });

  it("a three-point fit reproduces its datasheet-style points", () => {
    const points = [{ current: 1e-3, voltage: 1.8 }, { current: 5e-3, voltage: 1.92 }, { current: 30e-3, voltage: 2.2 }];
    const l = led({ points, leakage: 0 });
    // exact fit (three equations, three unknowns) refined by Newton: 1e-12 relative
    for (const p of points) expectRelClose(l.voltage(p.current), p.voltage, 1e-12, `V at ${p.current} A`);
  });

  it("a two-point fit holds the ideality factor and reproduces both points", () => {
    const points = [{ current: 2e-3, voltage: 0.65 }, { current: 50e-3, voltage: 0.85 }];
    const d = diode({ points, idealityFactor: 1.8, leakage: 0 });
    expect(d.n).toBe(1.8);
    for (const p of points) expectRelClose(d.voltage(p.current), p.voltage, 1e-12, `V at ${p.current} A`);
  });

  it("fitShockley recovers known parameters from points computed with them", () => {
    // independent method: generate points from chosen (I_s, n, r_s), fit, compare
    const is = 3e-20, n = 2.4, rs = 9;
    const nvt = n * thermalVoltage(298.15);
    const pts = [0.5e-3, 4e-3, 25e-3].map((i) => ({ current: i, voltage: nvt * Math.log1p(i / is) + i * rs }));
    const p = fitShockley(pts, 298.15);
    expectRelClose(p.idealityFactor, n, 1e-9, "n");
    expectRelClose(p.seriesResistance, rs, 1e-8, "r_s");
    expectRelClose(p.saturationCurrent, is, 1e-7, "I_s (exponentially sensitive to n)");
  });

  it("forward voltage falls by about 2 mV/K at the reference current", () => {
    const cold = ledPreset("red");
    const hot = ledPreset("red", { temperature: 298.15 + 50 });
    expectOutside({
      quantity: "red LED V_F(20 mA) temperature coefficient",
      source: "from memory (unverified): about −2 mV/K (docs/references.md)",
      ours: (hot.voltage(20e-3) - cold.voltage(20e-3)) / 50,
      reference: -0.002,
      rtol: 1e-6, // the model holds this coefficient by construction; the check pins that it does
      unit: "V/K",
    });
    // away from the reference current the shift differs but keeps its sign
    expect(hot.voltage(1e-3)).toBeLessThan(cold.voltage(1e-3));
  });

  it("bad input throws TanklightInputError naming the function, field and value", () => {
    expect(() => led({ points: [{ current: 1e-3, voltage: 2 }] })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: led: points: must hold two or three (current, voltage) points, got [{"current":0.001,"voltage":2}]]`,
    );
    expect(() => led({ saturationCurrent: -1, idealityFactor: 2, seriesResistance: 5 })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: led: saturationCurrent: must be > 0 A, got -1]`,
    );
    // points whose curvature needs a negative series resistance
    expect(() => led({ points: [{ current: 1e-3, voltage: 1.8 }, { current: 5e-3, voltage: 2.1 }, { current: 20e-3, voltage: 2.2 }] })).toThrow(/r_s/);
  });

  it("types: led/diode satisfy DiodeModel", () => {
    expectTypeOf(led).parameter(0).toMatchTypeOf<JunctionSpec>();
    expectTypeOf(led).returns.toMatchTypeOf<DiodeModel>();
    expectTypeOf(diode).returns.toMatchTypeOf<DiodeModel>();
    expectTypeOf<Led["voltage"]>().toEqualTypeOf<(i: number) => number>();
    expectTypeOf<Diode["kind"]>().toEqualTypeOf<"diode">();
  });
});

describe("properties of the junction model", () => {
  it("current(v) is strictly increasing and voltage(current(v)) = v (fast-check)", () => {
    const l = ledPreset("yellow");
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), fc.double({ min: 1e-6, max: 1, noNaN: true }), (v, dv) => {
        const ok = l.current(v + dv) > l.current(v);
        // inverse: relative 1e-12 in forward bias; in reverse the current is flat (−I_s − g·v)
        // and v is recovered through the leakage term only to ~1e-9 V
        const back = l.voltage(l.current(v));
        return ok && Math.abs(back - v) <= 1e-9 * Math.max(1, Math.abs(v));
      }),
      { numRuns: 500 },
    );
  });
});

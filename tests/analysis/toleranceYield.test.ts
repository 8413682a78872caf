import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { roundCoil, solveLink, taskPool, toleranceYield, TanklightInputError, type TaskPool } from "../../lib/mod.ts";
import { expectOutside } from "../helpers/validation.ts";
import { drawer } from "./fixtures.ts";

// a token 45 mm above the centre: lit with a modest margin (≈ 0.73 mA against 0.5 mA)
const sys = drawer({ position: [0, 0, 0.045] });
let pool: TaskPool;
beforeAll(async () => {
  pool = await taskPool(2);
});
afterAll(async () => {
  await pool.close();
});

describe("toleranceYield", () => {
  it("with zero spread reproduces the nominal design exactly", async () => {
    const y = await toleranceYield(sys, { tokenCapacitor: 0, supply: 0 }, { samples: 40, seed: 5 });
    expect(y.ledCurrent.min).toBe(y.nominal.ledCurrent);
    expect(y.ledCurrent.max).toBe(y.nominal.ledCurrent);
    expect(y.litFraction).toBe(1);
    // independent method: solveLink with the exact describing function; the yield model tabulates
    // it (5 mV nodes) and interpolates the LED's average current linearly in ln I between nodes
    const direct = solveLink(sys).receivers[0]!.leds[0]!.averageCurrent;
    expectOutside({ quantity: "toleranceYield nominal LED current", source: "independent method: solveLink(system)", ours: y.nominal.ledCurrent, reference: direct, rtol: 1e-3, unit: "A" });
  });

  it("gives the same yield for the same seed on 1 and 2 threads", async () => {
    const variations = { tokenCapacitor: 0.1, ledForwardVoltage: "preset" as const, ledBrightness: "preset" as const, supply: 0.05 };
    const one = await toleranceYield(sys, variations, { samples: 1200, seed: 11 });
    const two = await toleranceYield(sys, variations, { samples: 1200, seed: 11, threads: pool });
    expect(two.lit).toBe(one.lit);
    expect(two.ledCurrent).toEqual(one.ledCurrent);
    expect(two.sensitivity).toEqual(one.sensitivity);
    const other = await toleranceYield(sys, variations, { samples: 1200, seed: 12 });
    expect(other.ledCurrent.p50).not.toBe(one.ledCurrent.p50);
  });

  it("has a known truth when only the brightness varies, and its interval covers it and shrinks as 1/√n", async () => {
    // lit ⇔ I₀·b ≥ I_lit with b uniform on [0.7, 1.3] ⇒ yield = (1.3 − I_lit/I₀)/0.6 exactly;
    // with I_lit = 1.1·I₀ the truth is 1/3
    const i0 = (await toleranceYield(sys, {}, { samples: 10 })).nominal.ledCurrent;
    const litThreshold = 1.1 * i0;
    const truth = (1.3 - litThreshold / i0) / 0.6;
    const small = await toleranceYield(sys, { ledBrightness: 0.3 }, { samples: 400, seed: 3, litThreshold });
    const big = await toleranceYield(sys, { ledBrightness: 0.3 }, { samples: 6400, seed: 3, litThreshold });
    for (const y of [small, big]) {
      expect(y.interval.lower).toBeLessThanOrEqual(truth);
      expect(y.interval.upper).toBeGreaterThanOrEqual(truth);
      expect(y.interval.method).toBe("Wilson score interval (Wilson 1927)");
    }
    const ratio = (small.interval.upper - small.interval.lower) / (big.interval.upper - big.interval.lower);
    expect(ratio).toBeGreaterThan(3.6); // √16 = 4
    expect(ratio).toBeLessThan(4.4);
  });

  it("ranks the variation that costs the most yield first", async () => {
    const build = (turns: number) => roundCoil({ innerRadius: 0.0065, turns, layers: 6, wire: { diameter: 0.1e-3, insulation: 0.01e-3 } });
    // threshold at 0.8·I₀: the brightness spread alone loses (0.8 − 0.7)/0.6 ≈ 17 % of the batch
    const i0 = (await toleranceYield(sys, {}, { samples: 10 })).nominal.ledCurrent;
    const y = await toleranceYield(
      sys,
      { ledBrightness: 0.3, tokenCapacitor: 0.01, tokenTurns: { spread: 1, build } },
      { samples: 300, seed: 2, sensitivity: "one-at-a-time", litThreshold: 0.8 * i0 },
    );
    expect(y.sensitivity[0]!.variation).toBe("ledBrightness");
    expect(y.sensitivity[0]!.yieldLoss!).toBeGreaterThan(0.1);
    const cap = y.sensitivity.find((e) => e.variation === "tokenCapacitor")!;
    expect(cap.yieldLoss!).toBeLessThan(y.sensitivity[0]!.yieldLoss!);
    expect(y.sensitivityMethod).toMatch(/one-at-a-time/);
  });

  it("rejects bad input naming the field", async () => {
    await expect(toleranceYield(sys, { tokenCapacitor: -0.1 })).rejects.toThrow(TanklightInputError);
    await expect(toleranceYield(sys, {}, { samples: 3 })).rejects.toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: toleranceYield: samples: must be an integer ≥ 10, got 3]`);
  });
});

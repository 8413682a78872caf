import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { led, ledPreset, roundCoil, solveLink, taskPool, toleranceYield, TanklightInputError, type LinkSystem, type TaskPool } from "../../lib/mod.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { DRAWS, makeYieldModel } from "../../lib/analysis/yieldModel.ts";
import { sampleDrawer, yieldSpec } from "../../lib/analysis/yieldSpec.ts";
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

  it("its Wilson interval covers the known truth at about the stated rate over many seeds", async () => {
    // the brightness-only batch of the test above (truth exactly 1/3) run with 300 seeds of 100
    // samples: 95 % intervals should cover the truth in ≈ 285 of 300 runs (binomial sd ≈ 3.8);
    // Wilson's coverage at this n stays close to nominal (from memory (unverified): Brown, Cai &
    // DasGupta, Statistical Science 16(2), 2001)
    const i0 = (await toleranceYield(sys, {}, { samples: 10 })).nominal.ledCurrent;
    const litThreshold = 1.1 * i0;
    const truth = (1.3 - litThreshold / i0) / 0.6;
    const reps = 300;
    let covered = 0;
    for (let seed = 1; seed <= reps; seed++) {
      const y = await toleranceYield(sys, { ledBrightness: 0.3 }, { samples: 100, seed, litThreshold });
      if (y.interval.lower <= truth && truth <= y.interval.upper) covered++;
    }
    expect(Math.abs(covered / reps - 0.95)).toBeLessThan(0.035); // ≈ 2.8 sd (measured: 282 of 300)
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

describe("toleranceYield with a steady-state model", () => {
  // a red + InGaN green pair back to back (demo token): the describing function leaves the green
  // LED dark at a drive where harmonic balance lights it (issue 14, docs/validation-transient.md)
  const bicolour = (position: readonly [number, number, number]): LinkSystem => {
    const s = drawer({ position }) as { receivers: readonly Record<string, unknown>[] } & LinkSystem;
    return { ...s, receivers: [{ ...s.receivers[0]!, load: { kind: "antiParallel", a: ledPreset("red"), b: ledPreset("green-ingan") } }] } as LinkSystem;
  };
  const dimmest = (s: LinkSystem, model: "fundamental" | "harmonic" | "auto"): number => Math.max(0, Math.min(...solveLink(s, { model }).receivers[0]!.leds.map((l) => l.averageCurrent)));

  it("model 'auto' follows solveLink({ model: 'auto' }) sample by sample; the describing function calls the batch dark", async () => {
    const sys = bicolour([0, 0, 0.02]);
    // harmonic balance gives the green LED ≈ 0.17 mA here (the red ≈ 1.4 mA): lit at a 0.1 mA threshold
    const litThreshold = 1e-4;
    const auto = await toleranceYield(sys, { tokenCapacitor: 0 }, { samples: 10, seed: 1, model: "auto", litThreshold });
    // the same network solved by the same model choice; harmonic balance converges from another
    // start (a tabulated against an exact describing function) to the same point: measured within 1e-12
    expectOutside({ quantity: "bi-colour token, dimmest LED (auto)", source: "independent method: solveLink(system, { model: 'auto' })", ours: auto.nominal.ledCurrent, reference: dimmest(sys, "auto"), rtol: 1e-9, unit: "A" });
    expect(auto.model).toEqual({ requested: "auto", fundamentalSamples: 0, harmonicSamples: 10 });
    expect(auto.litFraction).toBe(1);
    const fundamental = await toleranceYield(sys, { tokenCapacitor: 0 }, { samples: 10, seed: 1, litThreshold });
    expect(fundamental.litFraction).toBe(0); // the green LED at nanoamperes
    expect(fundamental.nominal.ledCurrent).toBeLessThan(1e-3 * auto.nominal.ledCurrent);
    expect(fundamental.model.requested).toBe("fundamental");
    expect(fundamental.warnings.some((w) => w.startsWith("at the nominal design: describing function"))).toBe(true);
  });

  it("varied samples under model 'harmonic' lie between solveLink's at the capacitor's tolerance limits", async () => {
    const sys = bicolour([0, 0, 0.02]);
    const y = await toleranceYield(sys, { tokenCapacitor: 0.05 }, { samples: 10, seed: 4, model: "harmonic" });
    expect(y.model.harmonicSamples).toBe(10);
    // the extremes of the batch: capacitor −5 % and +5 % bracket every sample's current
    const at = (dc: number): number => {
      const s = sys as { receivers: readonly Record<string, unknown>[] } & LinkSystem;
      return dimmest({ ...s, receivers: [{ ...s.receivers[0]!, capacitor: { capacitance: 2.2e-9 * (1 + dc), dissipationFactor: 1e-3 } }] } as LinkSystem, "harmonic");
    };
    const [lo, hi] = [at(-0.05), at(0.05)].sort((a, b) => a - b) as [number, number];
    expect(y.ledCurrent.min).toBeGreaterThanOrEqual(lo * (1 - 1e-6));
    expect(y.ledCurrent.max).toBeLessThanOrEqual(hi * (1 + 1e-6));
    await expect(toleranceYield(sys, {}, { samples: 10, model: "exact" as never })).rejects.toThrow(/model/);
  });
});

describe("toleranceYield's forward-voltage spread", () => {
  it("shifts the whole forward curve by ΔV, and its tables stay within 3e-4 of the exact per-sample solve", () => {
    // a sample's LED is the junction with I_s·e^(−ΔV/(n·V_T)): at every current its voltage is ΔV higher
    const nominal = ledPreset("red");
    const shift = (dv: number) => led({ saturationCurrent: nominal.is * Math.exp(-dv / (nominal.n * nominal.thermalVoltage)), idealityFactor: nominal.n, seriesResistance: nominal.rs, colour: "red" });
    for (const i of [1e-4, 1e-3, 2e-2]) expectRelClose(shift(0.15).voltage(i) - shift(0).voltage(i), 0.15, 1e-6, `ΔV at ${i} A`);
    // each sample against solveLink with that sample's LED and the exact describing function
    // (independent path: no amplitude table, no interpolation in ΔV). Regimes: the amplitude
    // table's LED current (linear in ln I between 5 mV nodes, measured ≈ 1e-4 at ΔV = 0) and the
    // interpolation between 50 mV levels of ΔV (measured: 1.2e-4 in all, as at 20 mV; 2.6e-4 at 100 mV)
    const sysAt = (l: ReturnType<typeof led>): LinkSystem => {
      const s = sys as { receivers: readonly Record<string, unknown>[] } & LinkSystem;
      return { ...s, receivers: [{ ...s.receivers[0]!, load: { kind: "led", led: l } }] } as LinkSystem;
    };
    const { spec, parsed } = yieldSpec(sys, { ledForwardVoltage: 0.2 }, {}, "test");
    const draws = sampleDrawer(spec, parsed, 9)(24);
    const values = makeYieldModel(spec).evaluate(draws);
    let worst = 0;
    for (let s = 0; s < 24; s++) {
      const dv = draws[s * DRAWS + 4]!;
      const exact = solveLink(sysAt(shift(dv))).receivers[0]!.leds[0]!.averageCurrent;
      worst = Math.max(worst, Math.abs(values.current[s]! - exact) / exact);
    }
    expect(worst).toBeGreaterThan(0); // a table, not the exact solve
    expectOutside({ quantity: "V_F-spread sample LED current, worst of 24", source: "independent method: solveLink with the shifted LED, exact describing function", ours: 1 + worst, reference: 1, rtol: 3e-4 });
  });
});

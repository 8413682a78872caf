import { describe, expect, it } from "vitest";
import { coilResistance, ledPreset, roundCoil, selfInductance, TanklightInputError } from "../../lib/mod.ts";
import { calibrate, drivePlausibility, predictRange, predictToken, type Measurement } from "../../lib/analysis/calibrate.ts";
import { edgeAlong, parseCalibrationDesign, tokenOutcome, type CalibrationParameters } from "../../lib/analysis/calibrationModel.ts";
import { createRandom } from "../../lib/math/random.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { expectOutside } from "../helpers/validation.ts";

// A hand-sized transmitter and a small pebble token (the pebble-drawer coils: demo data).
const tx = roundCoil({ meanRadius: "50 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
const pebble = roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
const token = (colour: "red" | "green-gap") => ({ coil: pebble, topology: "parallel" as const, capacitor: { capacitance: "2.2 nF" }, load: { kind: "led" as const, led: ledPreset(colour) } });
const design = { frequency: "200 kHz", transmitter: { coil: tx }, tokens: { red: token("red"), green: token("green-gap") } };
const parsed = parseCalibrationDesign(design, "test");
const TRUTH: CalibrationParameters = { coilCurrent: 1.2, tokenQ: 1, litThreshold: 1e-4, frequencyOffset: 0 };

/** Where the truth puts the edge moving along `along` from `from` (m from `from`). */
function trueEdge(tok: string, from: [number, number, number], along: [number, number, number]): number {
  return edgeAlong(parsed, tok, { position: from }, along, TRUTH, { step: 0.002, minOffset: -0.9 * Math.hypot(...from), maxOffset: 1, tolerance: 1e-9 }, "test").offset;
}

describe("calibrate: synthetic round trips", () => {
  it("recovers the coil current from exact edge positions (independent method: edges generated from the model with a known current)", () => {
    const axial = 0.05 + trueEdge("red", [0, 0, 0.05], [0, 0, 1]);
    const green = 0.05 + trueEdge("green", [0, 0, 0.05], [0, 0, 1]);
    const cal = calibrate(
      design,
      [
        { kind: "edge", token: "red", pose: { position: [0, 0, axial] }, uncertainty: "1 mm" },
        { kind: "edge", token: "green", pose: { position: [0, 0, green] }, uncertainty: "1 mm" },
      ],
      ["coilCurrent"],
      { assume: { litThreshold: TRUTH.litThreshold } },
    );
    expect(cal.parameters.coilCurrent.status).toBe("fitted");
    expectRelClose(cal.parameters.coilCurrent.estimate!, TRUTH.coilCurrent, 1e-4, "fitted coil current");
    expect(cal.chiSquared).toBeLessThan(1e-4);
    expect(cal.identified).toBe(true);
    expectRelClose(cal.ampereTurns!, TRUTH.coilCurrent * 5, 1e-4, "ampere-turns = current × 5 turns");
  });

  it("the 95 % interval covers the true coil current at about its stated rate over 60 noisy data sets", () => {
    // tank amplitudes at three poses beyond the lit edge (LED dark, so V ∝ I) with 3 % noise
    // (a scope's accuracy, trade practice (no source))
    const poses: [number, number, number][] = [[0, 0, 0.2], [0, 0, 0.25], [0.05, 0, 0.22]];
    const exact = poses.map((p) => tokenOutcome(parsed, "red", { position: p }, TRUTH, "test").tankAmplitude);
    let covered = 0;
    const n = 60;
    const widths: number[] = [];
    for (let seed = 1; seed <= n; seed++) {
      const rnd = createRandom(seed);
      const data: Measurement[] = poses.map((p, i) => {
        const sigma = 0.03 * exact[i]!;
        return { kind: "tankAmplitude", token: "red", pose: { position: p }, value: exact[i]! + sigma * rnd.normal(), uncertainty: sigma };
      });
      const cal = calibrate(design, data, ["coilCurrent"], { assume: { litThreshold: TRUTH.litThreshold } });
      const iv = cal.parameters.coilCurrent.interval!;
      if (iv[0] <= TRUTH.coilCurrent && TRUTH.coilCurrent <= iv[1]) covered++;
      widths.push(Math.log(iv[1] / iv[0]));
    }
    // Binomial(60, 0.95): mean 57, sd 1.7; fewer than 52 covered would be 3 sd low.
    expect(covered).toBeGreaterThanOrEqual(52);
    expect(covered).toBeLessThanOrEqual(60);
    // Independent method: three points of 3 % noise on a quantity ∝ I (LED dark) give
    // σ(ln I) ≈ 0.03/√3, so the 95 % width in ln I is about 2 × 1.96 × 0.0173 = 0.068.
    const mean = widths.reduce((a, b) => a + b, 0) / n;
    expectRelClose(mean, (2 * 1.96 * 0.03) / Math.sqrt(3), 0.15, "mean ln-width of the interval");
  });

  it("lit/unlit observations bracket one unknown, and the bracket holds the truth", () => {
    const edge = 0.05 + trueEdge("red", [0, 0, 0.05], [0, 0, 1]);
    const cal = calibrate(
      design,
      [
        { kind: "lit", token: "red", pose: { position: [0, 0, edge - 0.01] }, lit: true },
        { kind: "lit", token: "red", pose: { position: [0, 0, edge + 0.01] }, lit: false },
      ],
      ["coilCurrent"],
      { assume: { litThreshold: TRUTH.litThreshold } },
    );
    const p = cal.parameters.coilCurrent;
    expect(p.status).toBe("bracketed");
    expect(p.interval![0]).toBeLessThan(TRUTH.coilCurrent);
    expect(p.interval![1]).toBeGreaterThan(TRUTH.coilCurrent);
    expect(cal.residuals.every((r) => r.agrees)).toBe(true);
  });
});

describe("calibrate: says when the data do not pin the unknowns down", () => {
  it("one measurement, two unknowns: no number, a verdict that says why", () => {
    const cal = calibrate(design, [{ kind: "edge", token: "red", pose: { position: [0, 0, "100 mm"] }, uncertainty: "5 mm" }], ["coilCurrent", "litThreshold"]);
    expect(cal.identified).toBe(false);
    expect(cal.parameters.coilCurrent.status).toBe("notIdentifiable");
    expect(cal.parameters.coilCurrent.estimate).toBeUndefined();
    expect(cal.parameters.litThreshold.verdict).toMatch(/not enough to fit/);
    expect(() => predictToken(cal, "red", { position: [0, 0, 0.05] })).toThrow(/not identified/);
  });

  it("coil current and token Q from tank amplitudes below the LED clamp trade off exactly (V ∝ I·Q): not identifiable", () => {
    const poses: [number, number, number][] = [[0, 0, 0.2], [0, 0, 0.25], [0.02, 0, 0.22]];
    const data: Measurement[] = poses.map((p) => {
      const v = tokenOutcome(parsed, "red", { position: p }, TRUTH, "test").tankAmplitude;
      return { kind: "tankAmplitude", token: "red", pose: { position: p }, value: v, uncertainty: 0.02 * v };
    });
    const cal = calibrate(design, data, ["coilCurrent", "tokenQ"], { assume: { litThreshold: TRUTH.litThreshold } });
    expect(cal.identified).toBe(false);
    expect(cal.parameters.tokenQ.status).toBe("notIdentifiable");
  });

  it("lit/unlit observations that contradict each other are reported, not averaged", () => {
    const cal = calibrate(
      design,
      [
        { kind: "lit", token: "red", pose: { position: [0, 0, 0.15] }, lit: true },
        { kind: "lit", token: "red", pose: { position: [0, 0, 0.05] }, lit: false },
      ],
      ["coilCurrent"],
    );
    expect(cal.parameters.coilCurrent.status).toBe("notIdentifiable");
    expect(cal.parameters.coilCurrent.verdict).toMatch(/contradict/);
  });
});

describe("calibrate: the trade facts", () => {
  // trade practice (no source): a hand-sized transmitter near 200 kHz driven from 5 V lights small
  // LC+LED tokens up to about 10–11 cm above its centre and about 7–9 cm sideways at the surface;
  // "lit" here is just visible indoors, 0.1 mA (trade practice (no source)).
  const cal = calibrate(
    design,
    [
      { kind: "edge", token: "red", pose: { position: [0, 0, "105 mm"] }, uncertainty: "5 mm" },
      { kind: "edge", token: "red", pose: { position: ["80 mm", 0, "5 mm"] }, along: [1, 0, 0], uncertainty: "10 mm" },
    ],
    ["coilCurrent"],
    { assume: { litThreshold: "0.1 mA" } },
  );

  it("calibrate to a coil current a 5 V single-switch driver can make", () => {
    expect(cal.parameters.coilCurrent.status).toBe("fitted");
    const L = selfInductance(tx, { frequency: 200e3 });
    const R = coilResistance(tx, 200e3);
    // bounds: coil voltage ≤ 3.562 × 5 V (source: Sokal & Sokal 1975, class-E peak switch voltage);
    // coil loss ≤ 5 V × 0.5 A (source: USB 2.0 specification, 500 mA)
    const p = drivePlausibility(cal.parameters.coilCurrent.interval![1], { inductance: L, resistance: R, frequency: 200e3 }, { supply: 5, currentLimit: 0.5 });
    expect(p.reasons).toEqual([]);
    expect(p.plausible).toBe(true);
    expectOutside({
      quantity: "calibrated transmitter ampere-turns (peak) from the trade's 10.5 cm / 8 cm ranges",
      source: "trade practice (no source): 10–11 cm on axis, 7–9 cm sideways, 5 V hand-sized coil; plausible if 0.5–30 A·turns",
      ours: cal.ampereTurns!,
      reference: 5.5,
      rtol: 0.5,
      unit: "A",
    });
  });

  it("the calibrated model predicts red reaching further than green (trade practice, no source)", () => {
    const red = predictRange(cal, "red", { from: { position: [0, 0, "5 mm"] } }, { samples: 20 });
    const green = predictRange(cal, "green", { from: { position: [0, 0, "5 mm"] } }, { samples: 20 });
    expect(red.nominal).toBeGreaterThan(green.nominal);
    expect(red.low).toBeLessThanOrEqual(red.median);
    expect(red.median).toBeLessThanOrEqual(red.high);
  });

  it("a new token design is predicted with an uncertainty", () => {
    const bigger = { ...token("red"), coil: roundCoil({ innerRadius: "9 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } }), capacitor: { capacitance: "1.5 nF" } };
    const r = predictRange(cal, bigger, { from: { position: [0, 0, "5 mm"] } }, { samples: 20 });
    expect(r.nominal).toBeGreaterThan(0.01);
    expect(r.high).toBeGreaterThan(r.low);
  });
});

describe("calibrate: bad input", () => {
  it("names the field: unknown token, unknown kind, a typo in a measurement", () => {
    expect(() => calibrate(design, [{ kind: "edge", token: "blue", pose: { position: [0, 0, 0.1] }, uncertainty: 0.005 }], ["coilCurrent"])).toThrow(/measurements\[0\]\.token/);
    expect(() => calibrate(design, [{ kind: "guess" } as never], ["coilCurrent"])).toThrow(TanklightInputError);
    expect(() => calibrate(design, [{ kind: "edge", token: "red", pose: { position: [0, 0, 0.1] }, uncertainty: 0.005, uncertainy: 1 } as never], ["coilCurrent"])).toThrow(TanklightInputError);
    expect(() => calibrate(design, [], ["coilCurrent"])).toThrow(TanklightInputError);
    expect(() => calibrate(design, [{ kind: "frequency", value: "200 kHz", uncertainty: "1 kHz" }], ["tokenQ"])).toThrow(/coilCurrent/);
  });
});

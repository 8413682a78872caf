/**
 * The circuit layer's input boundary (issue 11): quantity strings where a person types one,
 * strict options (a typo names the key and the nearest valid one), prototype words refused,
 * impossible results refused or floored, bounds that state their reason.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { resonantCapacitance, tuneWithStandardParts, PURCHASABLE_CAPACITANCE } from "../../lib/circuit/tank.ts";
import { standardValues } from "../../lib/circuit/eseries.ts";
import { ledPreset, diodePreset } from "../../lib/circuit/loads/ledPresets.ts";
import { averageLoadCurrent, AVERAGE_CURRENT_FLOOR } from "../../lib/circuit/loads/describingFunction.ts";
import { tokenResponse } from "../../lib/circuit/loads/tokenResponse.ts";
import { halfBridgeDrive, sineDrive } from "../../lib/circuit/drive.ts";
import { singleSwitchDrive } from "../../lib/circuit/transient/drives.ts";
import { simulate } from "../../lib/circuit/transient/simulate.ts";
import { frequencySweep } from "../../lib/circuit/frequencySweep.ts";
import { capacitorStress } from "../../lib/circuit/stress.ts";

const message = (f: () => unknown): string => {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(TanklightInputError);
    return (e as Error).message;
  }
  throw new Error("did not throw");
};

describe("quantity strings are read where a person types one", () => {
  it("tuneWithStandardParts('100 uH', '200 kHz') is the SI call, bit for bit", () => {
    expect(tuneWithStandardParts("100 uH", "200 kHz")).toEqual(tuneWithStandardParts(100e-6, 200e3));
    expect(resonantCapacitance("100 uH", "200 kHz")).toBe(resonantCapacitance(100e-6, 200e3));
  });
  it("drive supplies take '5 V'", () => {
    expect(halfBridgeDrive("12 V")).toEqual(halfBridgeDrive(12));
    expect(sineDrive("2 V", "50 ohm")).toEqual(sineDrive(2, 50));
    const a = singleSwitchDrive({ supply: "5 V", frequency: "200 kHz", coilInductance: "10 uH", tankCapacitance: "63 nF" });
    const b = singleSwitchDrive({ supply: 5, frequency: 200e3, coilInductance: 10e-6, tankCapacitance: 63e-9 });
    expect(a.circuit.elements.map((e) => e.name)).toEqual(b.circuit.elements.map((e) => e.name));
    expect(a.frequency).toBe(b.frequency);
  });
});

describe("typos and prototype words name the key and the nearest valid one", () => {
  it("options of tuneWithStandardParts, simulate, singleSwitchDrive, capacitorStress, tokenResponse", () => {
    expect(message(() => tuneWithStandardParts(1e-4, 2e5, { serie: "E12" } as never))).toMatch(/tuneWithStandardParts: options\.serie: unknown field; did you mean 'series'\?/);
    const drive = singleSwitchDrive({ supply: 5, frequency: 200e3, coilInductance: 10e-6, tankCapacitance: 63e-9 });
    expect(message(() => simulate(drive.circuit, { stop: 1e-5, stpe: 1e-7 } as never))).toMatch(/simulate: stpe: unknown field; did you mean 'step'\?/);
    expect(message(() => singleSwitchDrive({ supply: 5, frequency: 200e3, coilInductance: 10e-6, tankCapacitance: 63e-9, dutty: 0.4 } as never))).toMatch(/dutty: unknown field; did you mean 'duty'/);
    expect(message(() => capacitorStress({ capacitance: 1e-9, frequency: 1e5, voltageAmplitude: 3, dielectric: "c0g" as never }))).toMatch(/dielectric: must be one of .*did you mean 'C0G'/);
    expect(message(() => tokenResponse({ emf: 0.2, frequency: 2e5, inductance: 1e-4, coilResistance: 5, capacitance: 6.3e-9, load: { kind: "led", led: ledPreset("red") }, capacitorESR: 0 } as never))).toMatch(/tokenResponse: capacitorESR: unknown field; did you mean 'capacitorEsr'/);
  });
  it("ledPreset('toString'), standardValues('__proto__'), diodePreset('constructor') are refused", () => {
    expect(message(() => ledPreset("toString" as never))).toMatch(/^ledPreset: colour: must be one of red,/);
    expect(message(() => ledPreset("rde" as never))).toMatch(/did you mean 'red'/);
    expect(message(() => standardValues("__proto__" as never))).toMatch(/^standardValues: series: must be one of E3/);
    expect(message(() => diodePreset("constructor" as never))).toMatch(/^diodePreset: kind: must be one of schottky, silicon/);
  });
});

describe("impossible results are refused or floored", () => {
  it("tuneWithStandardParts(1e30, 2e5) is refused naming its own arguments and the purchasable range", () => {
    const m = message(() => tuneWithStandardParts(1e30, 2e5));
    expect(m).toMatch(/^tuneWithStandardParts: inductance: with frequency 200 kHz needs C = 6\.33e-43 F, outside the capacitors sold \(100 fF … 10\.0 mF/);
    expect(m).not.toMatch(/resonantCapacitance/);
    expect(message(() => tuneWithStandardParts(0, 2e5))).toMatch(/^tuneWithStandardParts: inductance: must be > 0 H/);
    expect(message(() => tuneWithStandardParts(1e-4, Number.NaN))).toMatch(/^tuneWithStandardParts: frequency:/);
    // the range's edges are purchasable
    const L = 1e-4;
    const fAt = (c: number) => 1 / (2 * Math.PI * Math.sqrt(L * c));
    expect(tuneWithStandardParts(L, fAt(PURCHASABLE_CAPACITANCE.min) * (1 - 1e-9)).choices.length).toBeGreaterThan(0);
  });

  it("an LED's average current is never negative: tiny values snap to 0 below 1e-9·I_s", () => {
    const red = ledPreset("red");
    // −4.9e-31 A before the floor (round-off of a difference of terms of size I_s)
    expect(averageLoadCurrent({ kind: "led", led: red }, 1e-12)[0]!.current).toBe(0);
    fc.assert(
      fc.property(fc.double({ min: -15, max: 0.5, noNaN: true }), fc.constantFrom("red", "blue", "white", "green-gap"), (lg, colour) => {
        const l = ledPreset(colour);
        const A = 10 ** lg;
        const loads = [{ kind: "led", led: l }, { kind: "antiParallel", a: l, b: red }] as const;
        const floor = AVERAGE_CURRENT_FLOOR * Math.min(l.is, red.is);
        return loads.every((load) => averageLoadCurrent(load, A).every((e) => (e.current === 0 || e.current >= floor) && e.peakCurrent >= 0));
      }),
      { numRuns: 300 },
    );
    // above the floor nothing changes: 2.2 V gives averageLoadCurrent's documented value
    expectRelClose(averageLoadCurrent({ kind: "led", led: red }, 2.2)[0]!.current, 0.008489958975518656, 1e-12, "red LED at 2.2 V");
  });
});

describe("sizes that cost time or memory are bounded, with the reason", () => {
  it("frequencySweep points: 1e9 is refused at once", () => {
    const t0 = performance.now();
    const m = message(() => frequencySweep((() => ({})) as never, { start: "150 kHz", stop: "250 kHz", points: 1e9 }));
    expect(m).toMatch(/^frequencySweep: frequencies\.points: must be a whole number ≥ 2 and ≤ 100000 \(each point solves the whole link\)/);
    expect(performance.now() - t0).toBeLessThan(1000);
  });
});

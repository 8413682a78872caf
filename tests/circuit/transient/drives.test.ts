import { describe, expect, expectTypeOf, it } from "vitest";
import { bridgeDrive, singleSwitchDrive, type DriveCircuit } from "../../../lib/circuit/transient/drives.ts";
import { simulate, voltageBetween } from "../../../lib/circuit/transient/simulate.ts";
import { waveformHarmonics } from "../../../lib/circuit/transient/harmonics.ts";
import { addToken } from "../../../lib/circuit/transient/token.ts";
import { classEDesign, CLASS_E, parallelTankDrive } from "../../../lib/circuit/drive.ts";
import { ledPreset } from "../../../lib/circuit/loads/ledPresets.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";
import { expectOutside } from "../../helpers/validation.ts";

const f = 200e3;
const V = 5;
const SPC = 400;

/**
 * An optimum class-E drive for 2 W from 5 V at 200 kHz, built from the design relations
 * (lib/circuit/drive.ts classEDesign: R = 0.5768 V²/P, C₁ = 0.1836/(ωR), X = 1.1525 R), with a
 * series network of loaded Q `q`, run to steady state. Returns the last cycle.
 */
function classE(q: number) {
  const R = classEDesign({ supply: V, frequency: f, power: 2 }).resistance;
  const L = (q * R) / (2 * Math.PI * f);
  const d = classEDesign({ supply: V, frequency: f, power: 2, inductance: L });
  const drive = singleSwitchDrive({
    supply: V, frequency: f, arrangement: "class-e", coilInductance: L,
    tankCapacitance: d.seriesCapacitance!, shuntCapacitance: d.shuntCapacitance, loadResistance: d.resistance,
    onResistance: 1e-3, chokeInductance: 30 * L,
  });
  const r = simulate(drive.circuit, { stop: 3000 / f, stepsPerCycle: SPC, frequency: f, untilSteady: { tolerance: 1e-5 }, keepCycles: 1 });
  const v = r.nodeVoltages.switch!;
  const h = waveformHarmonics(r.time, v, { frequency: f });
  const hl = waveformHarmonics(r.time, r.currents.Ltx!, { frequency: f });
  let p = 0;
  const il = r.currents.Ltx!;
  for (let i = 0; i < SPC; i++) p += (il[i]! ** 2 * d.resistance) / SPC;
  let maxSlope = 0;
  for (let i = 1; i < v.length; i++) maxSlope = Math.max(maxSlope, Math.abs(v[i]! - v[i - 1]!));
  // the switch closes at t = nT: the last sample of the kept cycle
  const vOn = v[v.length - 1]!;
  const slopeOn = v[v.length - 1]! - v[v.length - 2]!;
  return { r, d, peak: h.peak, fundamental: h.amplitude[1]!, loadCurrent: hl.amplitude[1]!, power: p, vOn, slopeOn, maxSlope, distortion: h.distortion };
}

describe("single-switch drive, class-E arrangement built from the optimum design relations", () => {
  const q10 = classE(10);
  const q20 = classE(20);

  it("reaches steady state", () => {
    expect(q10.r.steady?.reached).toBe(true);
    expect(q20.r.steady?.reached).toBe(true);
  });

  it("switch voltage peaks at about 3.56 × the supply (Sokal & Sokal 1975)", () => {
    // The published relations hold for infinite loaded Q; at finite Q the peak exceeds it by
    // O(1/Q) (measured: 3.75 V_DD at Q = 10, 3.65 at Q = 20). Regime "Q = 20": 3 % allows that
    // first-order term (≈ 2.5 %).
    expectOutside({
      quantity: "class-E peak switch voltage / V_DD, loaded Q = 20",
      source: "source: Sokal & Sokal, IEEE JSSC SC-10(3), 1975 (3.562 V_DD, infinite loaded Q)",
      ours: q20.peak / V, reference: 3.562, rtol: 0.03,
    });
    // Regime "extrapolated to Q → ∞": Richardson extrapolation in 1/Q from Q = 10 and 20
    // removes the first-order term; 1 % covers the O(1/Q²) rest, the finite choke (30 L) and R_on.
    expectOutside({
      quantity: "class-E peak switch voltage / V_DD, extrapolated to infinite loaded Q",
      source: "source: Sokal & Sokal, IEEE JSSC SC-10(3), 1975; Raab, IEEE TCAS 24(12), 1977",
      ours: (2 * q20.peak - q10.peak) / V, reference: 3.562, rtol: 0.01,
    });
  });

  it("switches at zero voltage and zero slope (the optimum's defining property)", () => {
    // source: Sokal & Sokal 1975 (optimum class E: v = 0 and dv/dt = 0 at turn-on).
    // Regime "Q = 20": the O(1/Q) residue leaves ≈ 0.6 % of the peak and a slope ≈ 6 % of the
    // largest slope; bounds 2 % and 10 %.
    expect(Math.abs(q20.vOn)).toBeLessThan(0.02 * q20.peak);
    expect(Math.abs(q20.slopeOn)).toBeLessThan(0.1 * q20.maxSlope);
  });

  it("delivers the design power and the published fundamental and load current", () => {
    const x = (a: number, b: number) => 2 * b - a; // Richardson extrapolation in 1/Q (Q = 10, 20)
    // Regime "extrapolated": 1 % as above.
    expectOutside({
      quantity: "class-E output power, extrapolated to infinite loaded Q (design 2 W from 5 V)",
      source: "source: Sokal & Sokal 1975 / Raab 1977, R = 0.5768 V_DD²/P",
      ours: x(q10.power, q20.power), reference: 2, rtol: 0.01, unit: "W",
    });
    expectOutside({
      quantity: "class-E load current amplitude × R / V_DD, extrapolated",
      source: "source: Raab 1977 (fundamental across R = 4/√(π²+4) V_DD = 1.0741 V_DD)",
      ours: (x(q10.loadCurrent, q20.loadCurrent) * q20.d.resistance) / V, reference: CLASS_E.fundamentalFactor, rtol: 0.01,
    });
    // the equivalent source used by the frequency-domain link (classEDrive): the switch-node
    // fundamental 1.0741·√(1 + 1.1525²)·V_DD ≈ 1.639 V_DD
    expectOutside({
      quantity: "class-E switch-node fundamental / V_DD, extrapolated",
      source: "source: Raab 1977 (I·(R + jX) at the optimum, X = 1.1525 R)",
      ours: x(q10.fundamental, q20.fundamental) / V,
      reference: CLASS_E.fundamentalFactor * Math.hypot(1, CLASS_E.excessReactanceFactor), rtol: 0.01,
    });
    // and the waveform is far from a sine (trade practice: substantial harmonics)
    expect(q20.distortion).toBeGreaterThan(0.3);
  });
});

describe("single-switch drive, parallel-tank arrangement (the common low-cost form) with a coupled LED token", () => {
  const w = 2 * Math.PI * f;
  const L1 = 10e-6;
  // tank tuned 1.3 × above the switching frequency: near zero-voltage turn-on at 50 % duty
  const drive = singleSwitchDrive({ supply: V, frequency: f, coilInductance: L1, coilResistance: 0.2, tankCapacitance: 1 / (w * w * L1) / 1.69 });
  const L2 = 30e-6;
  const tok = addToken(drive.circuit, {
    coupledTo: drive.coil, k: 0.05, inductance: L2, resistance: 2, capacitance: 1 / (w * w * L2), load: { kind: "led", led: ledPreset("red") },
  });
  const r = simulate(tok.circuit, { stop: 600 / f, stepsPerCycle: 200, frequency: f, untilSteady: true });

  it("the switch-node voltage peaks at several times the supply, with substantial harmonics", () => {
    expect(r.steady?.reached).toBe(true);
    const h = waveformHarmonics(r.time, r.nodeVoltages.switch!, { frequency: f });
    // trade practice (no source): a single-switch drive's coil voltage swings to a few times
    // the supply (half-sine of peak ≈ π·V_DD for 50 % duty and zero-voltage switching)
    expect(h.peak / V).toBeGreaterThan(2.5);
    expect(h.peak / V).toBeLessThan(4.5);
    expect(h.distortion).toBeGreaterThan(0.2);
    // the token lights: its LED carries an average current of milliamperes
    const iled = r.currents[tok.leds.led!]!;
    let avg = 0;
    for (let i = iled.length - 201; i < iled.length - 1; i++) avg += iled[i]! / 200;
    expect(avg).toBeGreaterThan(1e-3);
  });
});

describe("parallel-tank single-switch drive against its fundamental equivalent", () => {
  it("near zero-voltage switching the coil voltage's fundamental is about π·V_DD/2 (parallelTankDrive)", () => {
    const w = 2 * Math.PI * f;
    const L1 = 10e-6;
    // tank resonance 1.29 × the switching frequency: near zero-voltage turn-on for this coil
    // resistance (0.5 Ω, unloaded); found by scanning the tuning (1.25 → +7 % of V_DD, 1.3 → −7 %)
    const d = singleSwitchDrive({ supply: V, frequency: f, coilInductance: L1, coilResistance: 0.5, tankCapacitance: 1 / (w * w * L1) / 1.29 ** 2 });
    const r = simulate(d.circuit, { stop: 2000 / f, stepsPerCycle: SPC, frequency: f, untilSteady: { tolerance: 1e-6 }, keepCycles: 1 });
    const vs = r.nodeVoltages.switch!;
    expect(Math.abs(vs[vs.length - 1]!)).toBeLessThan(0.05 * V);
    const h = waveformHarmonics(r.time, voltageBetween(r, "supply", "switch"), { frequency: f });
    // independent method: the equivalent of lib/circuit/drive.ts (half-sine of peak π·V_DD,
    // fundamental πV_DD/2, Fourier series of a half-wave rectified sine). 3 %: the true
    // off-state swing is not an exact half sine (the coil current ramps while the switch is
    // closed, and ZVS is only approximate); measured ≈ 1 %.
    expectOutside({ quantity: "parallel-tank single-switch drive, coil-voltage fundamental", source: "independent method: parallelTankDrive equivalent (half-wave sine Fourier series)", ours: h.amplitude[1]!, reference: parallelTankDrive(V).amplitude, rtol: 0.03, unit: "V" });
  });
});

describe("bridge drives: square wave into a series-tuned transmitter", () => {
  const L = 10e-6;
  const R = 1;
  const ron = 0.05;
  const C = 1 / ((2 * Math.PI * f) ** 2 * L);
  const run = (d: DriveCircuit) => {
    const r = simulate(d.circuit, { stop: 2000 / f, stepsPerCycle: SPC, frequency: f, untilSteady: { tolerance: 1e-7 }, keepCycles: 1 });
    return waveformHarmonics(r.time, r.currents.Ltx!, { frequency: f });
  };
  it("full bridge: coil current fundamental = (4V/π)/(R + 2R_on) at resonance", () => {
    const h = run(bridgeDrive({ supply: V, frequency: f, bridge: "full", coilInductance: L, coilResistance: R, tankCapacitance: C, onResistance: ron }));
    // source: Fourier series of a square wave (fundamental 4/π of the amplitude), textbook.
    // Regime "400 steps a cycle, Q ≈ 11": trapezoidal detuning ≈ 2Q·(ωh)²/12 < 1e-3 → 2e-3.
    expectOutside({ quantity: "full-bridge coil current fundamental", source: "source: square-wave Fourier series (4/π), textbook", ours: h.amplitude[1]!, reference: (4 * V) / Math.PI / (R + 2 * ron), rtol: 2e-3, unit: "A" });
  });
  it("half bridge: coil current fundamental = (2V/π)/(R + R_on) at resonance", () => {
    const h = run(bridgeDrive({ supply: V, frequency: f, bridge: "half", coilInductance: L, coilResistance: R, tankCapacitance: C, onResistance: ron }));
    expectOutside({ quantity: "half-bridge coil current fundamental", source: "source: square-wave Fourier series (4/π of V/2), textbook", ours: h.amplitude[1]!, reference: (2 * V) / Math.PI / (R + ron), rtol: 2e-3, unit: "A" });
  });
  it("types", () => {
    expectTypeOf(bridgeDrive).returns.toEqualTypeOf<DriveCircuit>();
    expectTypeOf(singleSwitchDrive).returns.toEqualTypeOf<DriveCircuit>();
  });
  it("bad input is refused with the field named", () => {
    expect(() => bridgeDrive({ supply: V, frequency: f, bridge: "quarter" as "half", coilInductance: L, tankCapacitance: C })).toThrow(/bridge: must be one of half, full/);
    expect(() => singleSwitchDrive({ supply: -1, frequency: f, coilInductance: L, tankCapacitance: C })).toThrow(/supply/);
  });
});

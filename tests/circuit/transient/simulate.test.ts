import { describe, expect, expectTypeOf, it } from "vitest";
import { simulate, voltageBetween, type SimulateOptions, type TransientResult } from "../../../lib/circuit/transient/simulate.ts";
import type { TransientCircuit } from "../../../lib/circuit/transient/circuit.ts";
import { sineWaveform, stepWaveform } from "../../../lib/circuit/transient/waveforms.ts";
import { waveformHarmonics } from "../../../lib/circuit/transient/harmonics.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { TransientConvergenceError } from "../../../lib/circuit/transient/errors.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";
import { expectOutside } from "../../helpers/validation.ts";

/** Series R–L–C driven by a 1 V step; the capacitor voltage is node "m". */
function seriesRlc(R: number, L: number, C: number): TransientCircuit {
  return {
    elements: [
      { kind: "voltageSource", name: "V1", plus: "in", minus: "ground", waveform: stepWaveform(1) },
      { kind: "resistor", name: "R1", a: "in", b: "x", resistance: R },
      { kind: "inductor", name: "L1", a: "x", b: "m", inductance: L },
      { kind: "capacitor", name: "C1", a: "m", b: "ground", capacitance: C },
    ],
  };
}

/** Largest |v_C(t) − closed form| over a run. */
function rlcStepError(R: number, L: number, C: number, stepsPerPeriod: number, periods: number): number {
  const a = R / (2 * L);
  const w0 = 1 / Math.sqrt(L * C);
  const wd = Math.sqrt(w0 * w0 - a * a);
  const T = (2 * Math.PI) / wd;
  const r = simulate(seriesRlc(R, L, C), { stop: periods * T, step: T / stepsPerPeriod });
  const v = r.nodeVoltages.m!;
  let err = 0;
  for (let i = 0; i < v.length; i++) {
    const t = r.time[i]!;
    // source: textbook series RLC step response, underdamped case (e.g. Nilsson & Riedel,
    // Electric Circuits, ch. 8): v_C = V[1 − e^{−αt}(cos ω_d t + (α/ω_d) sin ω_d t)]
    const exact = 1 - Math.exp(-a * t) * (Math.cos(wd * t) + (a / wd) * Math.sin(wd * t));
    err = Math.max(err, Math.abs(v[i]! - exact));
  }
  return err;
}

describe("simulate: integration accuracy", () => {
  it("series RLC step response matches its closed form (underdamped)", () => {
    // R = 10 Ω, L = 1 mH, C = 1 µF: α = 5000 /s, ω₀ = 31 623 rad/s, ζ = 0.16
    const err = rlcStepError(10, 1e-3, 1e-6, 200, 6);
    // regime "200 steps a period": trapezoidal phase error (ωh)²/12 ≈ 8e-5 rad a radian over
    // 6 periods ≈ 3e-3 rad on a swing of ≈ 0.6 V → ≈ 2e-3 V worst case; 1e-3 V bound is
    // the measured 4e-4 with margin.
    expectOutside({
      quantity: "series RLC step response, max |v_C − closed form| (1 V step, 200 steps/period)",
      source: "source: textbook series RLC step response, underdamped (Nilsson & Riedel, Electric Circuits, ch. 8)",
      ours: err,
      reference: 0,
      rtol: 0,
      atol: 1e-3,
      unit: "V",
    });
  });

  it("the global error falls as h² (trapezoidal rule is second order)", () => {
    const e1 = rlcStepError(10, 1e-3, 1e-6, 200, 3);
    const e2 = rlcStepError(10, 1e-3, 1e-6, 400, 3);
    // independent-method check: order of convergence; ratio 4 for a second-order method,
    // within ±15 % (the backward-Euler first step adds an O(h²) term of its own)
    expectRelClose(e1 / e2, 4, 0.15, "error ratio for h → h/2");
  });

  it("an LC tank conserves energy under trapezoidal integration (after the backward-Euler start)", () => {
    const L = 10e-6;
    const C = 100e-9;
    const w = 1 / Math.sqrt(L * C);
    const T = (2 * Math.PI) / w;
    const spp = 100;
    const h = T / spp;
    const r = simulate(
      {
        elements: [
          { kind: "capacitor", name: "C1", a: "top", b: "ground", capacitance: C, initialVoltage: 1 },
          { kind: "inductor", name: "L1", a: "top", b: "ground", inductance: L },
        ],
      },
      { stop: 1000 * T, step: h },
    );
    const v = r.nodeVoltages.top!;
    const i = r.currents.L1!;
    const energy = (k: number) => 0.5 * C * v[k]! ** 2 + 0.5 * L * i[k]! ** 2;
    const e0 = 0.5 * C * 1;
    // independent check (closed form of the integrator): one backward-Euler step multiplies
    // the oscillator's energy by exactly 1/(1 + (ωh)²)
    expectRelClose(energy(1), e0 / (1 + (w * h) ** 2), 1e-9, "energy after the backward-Euler start step");
    // then the trapezoidal rule (a Cayley transform) keeps it to rounding over 1000 cycles
    const e1 = energy(1);
    let worst = 0;
    for (let k = 1; k < v.length; k += 97) worst = Math.max(worst, Math.abs(energy(k) - e1) / e1);
    worst = Math.max(worst, Math.abs(energy(v.length - 1) - e1) / e1);
    expect(worst).toBeLessThan(1e-9);
  });

  it("a 1 V step into RC reaches 1 − 1/e after one time constant", () => {
    const r = simulate(
      {
        elements: [
          { kind: "voltageSource", name: "V1", plus: "in", minus: "ground", waveform: () => 1 },
          { kind: "resistor", name: "R1", a: "in", b: "out", resistance: 1 },
          { kind: "capacitor", name: "C1", a: "out", b: "ground", capacitance: 1e-6 },
        ],
      },
      { stop: 1e-6, step: 1e-9 },
    );
    // source: textbook RC charging v = V(1 − e^{−t/RC}); h = τ/1000: trapezoidal error ≈ 1e-7
    expectOutside({ quantity: "RC charge at t = RC", source: "source: textbook RC step response v = V(1 − e^{−t/RC})", ours: r.nodeVoltages.out!.at(-1)!, reference: 1 - Math.exp(-1), rtol: 1e-6, unit: "V" });
    // the t = 0 sample: the capacitor still holds 0 V, the source node is already at 1 V
    expect(Math.abs(r.nodeVoltages.out![0]!)).toBeLessThan(1e-3);
    expectRelClose(r.nodeVoltages.in![0]!, 1, 1e-12, "source node at t = 0");
  });
});

// ---------------------------------------------------------------------------------------
// Coupled tanks against an independent phasor solution
// ---------------------------------------------------------------------------------------

type C2 = [number, number];
const cadd = (a: C2, b: C2): C2 => [a[0] + b[0], a[1] + b[1]];
const cmul = (a: C2, b: C2): C2 => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const cdiv = (a: C2, b: C2): C2 => {
  const d = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
};
const cabs = (a: C2) => Math.hypot(a[0], a[1]);

const link = {
  f: 200e3,
  V: 10, // source amplitude, V peak
  R1: 1.5, L1: 10e-6, R2: 1.2, L2: 30e-6, RL: 2000, k: 0.08,
  get w() { return 2 * Math.PI * this.f; },
  get C1() { return 1 / (this.w ** 2 * this.L1); },
  get C2() { return 1 / (this.w ** 2 * this.L2) * 0.97; }, // slightly detuned on purpose
  get M() { return this.k * Math.sqrt(this.L1 * this.L2); },
};

function coupledTanks(): TransientCircuit {
  const p = link;
  return {
    elements: [
      { kind: "voltageSource", name: "Vs", plus: "s", minus: "ground", waveform: sineWaveform({ amplitude: p.V, frequency: p.f }) },
      { kind: "resistor", name: "R1", a: "s", b: "c", resistance: p.R1 },
      { kind: "capacitor", name: "C1", a: "c", b: "top1", capacitance: p.C1 },
      { kind: "inductor", name: "L1", a: "top1", b: "ground", inductance: p.L1 },
      { kind: "inductor", name: "L2", a: "top2", b: "ground", inductance: p.L2, resistance: p.R2 },
      { kind: "capacitor", name: "C2", a: "top2", b: "ground", capacitance: p.C2 },
      { kind: "resistor", name: "RL", a: "top2", b: "ground", resistance: p.RL },
      { kind: "coupling", name: "M12", inductors: ["L1", "L2"], k: p.k },
    ],
  };
}

/** Phasor solution: series-tuned transmitter, parallel-tuned receiver with a resistor load. */
function phasorTanks(): { i1: C2; vTop2: C2 } {
  const p = link;
  const w = p.w;
  const z1: C2 = [p.R1, w * p.L1 - 1 / (w * p.C1)];
  const zm: C2 = [0, w * p.M];
  const zload = cdiv([1, 0], [1 / p.RL, w * p.C2]);
  const z2 = cadd([p.R2, w * p.L2], zload);
  // V = z1·I1 + zm·I2;  0 = zm·I1 + z2·I2  →  I1 = V / (z1 − zm²/z2)
  const zin = cadd(z1, cmul([-1, 0], cdiv(cmul(zm, zm), z2)));
  const i1 = cdiv([p.V, 0], zin);
  const i2 = cmul([-1, 0], cdiv(cmul(zm, i1), z2));
  // i2 flows top2 → ground through L2, so the load carries −i2: V = −z_load·i2
  const vTop2 = cmul([-1, 0], cmul(zload, i2));
  return { i1, vTop2 };
}

function runTanks(stepsPerCycle: number): TransientResult {
  return simulate(coupledTanks(), {
    stop: 3000 / link.f, stepsPerCycle, frequency: link.f, untilSteady: { tolerance: 1e-7 }, keepCycles: 2,
  });
}

describe("simulate: linear coupled tanks", () => {
  const ref = phasorTanks();
  const r400 = runTanks(400);
  const r200 = runTanks(200);

  it("reaches steady state", () => {
    expect(r400.steady?.reached).toBe(true);
    expect(r400.warnings).toEqual([]);
  });

  it("the steady state agrees with the phasor solution of the coupled tanks (independent method)", () => {
    const hv = waveformHarmonics(r400.time, r400.nodeVoltages.top2!, { frequency: link.f, count: 3 });
    const hi = waveformHarmonics(r400.time, r400.currents.L1!, { frequency: link.f, count: 3 });
    // regime "400 steps a cycle": trapezoidal frequency warp (ωh)²/12 ≈ 2e-5, times the
    // receiver's sensitivity to detuning (≈ 2Q, Q ≈ 15–25) → ≤ 1e-3; steady-state residue 1e-7.
    expectRelClose(hv.amplitude[1]!, cabs(ref.vTop2), 1e-3, "receiver tank amplitude vs phasor");
    expectRelClose(hi.amplitude[1]!, cabs(ref.i1), 1e-3, "transmitter current amplitude vs phasor");
    // phase of the receiver tank voltage (rad), absolute tolerance 2e-3 rad for the same reason
    const dphi = Math.atan2(Math.sin(hv.phase[1]! - Math.atan2(ref.vTop2[1], ref.vTop2[0])), Math.cos(hv.phase[1]! - Math.atan2(ref.vTop2[1], ref.vTop2[0])));
    expect(Math.abs(dphi)).toBeLessThan(2e-3);
    // a linear circuit driven by a sine makes no harmonics
    expect(hv.amplitude[2]! / hv.amplitude[1]!).toBeLessThan(1e-6);
  });

  it("its error against the phasor solution falls about fourfold when the step halves", () => {
    const amp = (r: TransientResult) => waveformHarmonics(r.time, r.nodeVoltages.top2!, { frequency: link.f }).amplitude[1]!;
    const e200 = Math.abs(amp(r200) - cabs(ref.vTop2));
    const e400 = Math.abs(amp(r400) - cabs(ref.vTop2));
    // independent-method check of the order; ratio 4 ± 25 % (steady-state residue and
    // rounding add a small constant)
    expectRelClose(e200 / e400, 4, 0.25, "error ratio 200 → 400 steps a cycle");
  });
});

// ---------------------------------------------------------------------------------------
// Errors and options
// ---------------------------------------------------------------------------------------

describe("simulate: clear errors naming the elements", () => {
  const opts: SimulateOptions = { stop: 1e-6, step: 1e-8 };
  it("a floating node names the node and its elements", () => {
    const c: TransientCircuit = {
      elements: [
        { kind: "voltageSource", name: "V1", plus: "a", minus: "ground", waveform: () => 1 },
        { kind: "resistor", name: "R1", a: "a", b: "ground", resistance: 10 },
        { kind: "currentSource", name: "I1", from: "ground", to: "island", waveform: () => 1e-3 },
        { kind: "capacitor", name: "Cx", a: "island", b: "island2", capacitance: 1e-9 },
      ],
    };
    expect(() => simulate(c, opts)).toThrow(TanklightInputError);
    expect(() => simulate(c, opts)).toThrow(/floating nodes "island", "island2".*I1, Cx/);
  });

  it("a loop of voltage sources names every source in the loop", () => {
    const c: TransientCircuit = {
      elements: [
        { kind: "voltageSource", name: "Va", plus: "a", minus: "ground", waveform: () => 1 },
        { kind: "voltageSource", name: "Vb", plus: "b", minus: "a", waveform: () => 1 },
        { kind: "voltageSource", name: "Vc", plus: "b", minus: "ground", waveform: () => 2 },
        { kind: "resistor", name: "R1", a: "b", b: "ground", resistance: 1 },
      ],
    };
    expect(() => simulate(c, opts)).toThrow(/loop of voltage sources: (?=[^(]*Va)(?=[^(]*Vb)(?=[^(]*Vc)/);
  });

  it("bad element values and options name the field and the value", () => {
    const c: TransientCircuit = { elements: [{ kind: "resistor", name: "R1", a: "a", b: "ground", resistance: -5 }] };
    expect(() => simulate(c, opts)).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: simulate: circuit.elements[0] (R1).resistance: must be a finite number > 0 Ω, got -5]`,
    );
    const ok: TransientCircuit = { elements: [{ kind: "resistor", name: "R1", a: "a", b: "ground", resistance: 5 }] };
    expect(() => simulate(ok, { stop: 1e-6 })).toThrow(/step: give step, or stepsPerCycle with frequency/);
    expect(() => simulate(ok, { stop: 1e-6, step: 1e-8, untilSteady: true })).toThrow(/frequency: is needed with untilSteady/);
    expect(() => simulate(ok, { stop: Number.NaN, step: 1e-8 })).toThrow(/stop/);
  });

  it("couplings: unknown inductors, |k| ≥ 1 and non-positive-definite sets are refused", () => {
    const base = [
      { kind: "inductor", name: "L1", a: "a", b: "ground", inductance: 1e-6 },
      { kind: "inductor", name: "L2", a: "b", b: "ground", inductance: 1e-6 },
      { kind: "inductor", name: "L3", a: "c", b: "ground", inductance: 1e-6 },
    ] as const;
    expect(() => simulate({ elements: [...base, { kind: "coupling", name: "K1", inductors: ["L1", "Lx"], k: 0.5 }] }, opts)).toThrow(/K1\)\.inductors: must name two inductors/);
    expect(() => simulate({ elements: [...base, { kind: "coupling", name: "K1", inductors: ["L1", "L2"], k: 1 }] }, opts)).toThrow(/\|k\| < 1/);
    expect(() =>
      simulate(
        {
          elements: [
            ...base,
            { kind: "coupling", name: "K12", inductors: ["L1", "L2"], k: 0.9 },
            { kind: "coupling", name: "K23", inductors: ["L2", "L3"], k: 0.9 },
            { kind: "coupling", name: "K13", inductors: ["L1", "L3"], k: -0.9 },
          ],
        },
        opts,
      ),
    ).toThrow(/K12, K23, K13 give an inductance matrix that is not positive definite/);
  });

  it("a singular matrix names the unknown that cannot be determined", () => {
    const c: TransientCircuit = {
      elements: [
        { kind: "currentSource", name: "I1", from: "ground", to: "a", waveform: () => 1 },
        { kind: "inductor", name: "L1", a: "a", b: "ground", inductance: 1e-6 },
        { kind: "inductor", name: "L2", a: "a", b: "ground", inductance: 1e-6 },
        { kind: "coupling", name: "K", inductors: ["L1", "L2"], k: 1 - 1e-15 },
      ],
    };
    expect(() => simulate(c, opts)).toThrow(/singular circuit matrix at t = 0 s: the current of L2 is not determined/);
  });

  it("Newton failure after repeated step halving throws TransientConvergenceError naming the diodes", () => {
    // a pathological "diode" whose current jumps at 0 V while claiming a tiny slope: Newton cycles
    const jumpy = { current: (v: number) => (v > 0 ? 1 : -1), conductance: () => 1e-3, label: "jumpy" };
    const c: TransientCircuit = {
      elements: [
        { kind: "voltageSource", name: "V1", plus: "a", minus: "ground", waveform: sineWaveform({ amplitude: 1, frequency: 1e6 }) },
        { kind: "resistor", name: "R1", a: "a", b: "b", resistance: 1 },
        { kind: "diode", name: "D1", anode: "b", cathode: "ground", model: jumpy },
      ],
    };
    expect(() => simulate(c, { stop: 1e-6, step: 1e-8 })).toThrow(TransientConvergenceError);
    expect(() => simulate(c, { stop: 1e-6, step: 1e-8 })).toThrow(/nonlinear elements: D1/);
  });

  it("duplicate names are refused", () => {
    expect(() =>
      simulate({ elements: [
        { kind: "resistor", name: "R1", a: "a", b: "ground", resistance: 5 },
        { kind: "resistor", name: "R1", a: "a", b: "ground", resistance: 5 },
      ] }, opts),
    ).toThrow(/duplicates another element's name/);
  });
});

describe("simulate: outputs and options", () => {
  const c: TransientCircuit = {
    elements: [
      { kind: "voltageSource", name: "V1", plus: "in", minus: "ground", waveform: sineWaveform({ amplitude: 1, frequency: 1e5 }) },
      { kind: "resistor", name: "R1", a: "in", b: "out", resistance: 100 },
      { kind: "resistor", name: "R2", a: "out", b: "ground", resistance: 100 },
    ],
  };

  it("keepCycles keeps the last whole cycles; progress reaches 1; currents follow the stated signs", () => {
    const seen: number[] = [];
    const r = simulate(c, { stop: 10e-5, stepsPerCycle: 50, frequency: 1e5, keepCycles: 2, progress: (x) => seen.push(x) });
    expect(r.time.length).toBe(101);
    expectRelClose(r.time[0]!, 8e-5, 1e-9, "first kept sample");
    expect(seen.at(-1)).toBe(1);
    // divider: out = in/2; the source delivers in/200 A out of its plus terminal
    const out = r.nodeVoltages.out!;
    const vin = r.nodeVoltages.in!;
    const is = r.currents.V1!;
    for (const k of [0, 13, 77]) {
      expectRelClose(out[k]!, vin[k]! / 2, 1e-12, "divider", 1e-15);
      expectRelClose(is[k]!, vin[k]! / 200, 1e-12, "source current sign", 1e-15);
      expectRelClose(r.currents.R1![k]!, (vin[k]! - out[k]!) / 100, 1e-12, "resistor current a → b", 1e-15);
    }
    const vb = voltageBetween(r, "in", "out");
    expectRelClose(vb[5]!, vin[5]! - out[5]!, 1e-15, "voltageBetween", 1e-15);
  });

  it("types: simulate(circuit, options) → TransientResult", () => {
    expectTypeOf(simulate).parameters.toEqualTypeOf<[TransientCircuit, SimulateOptions]>();
    expectTypeOf(simulate).returns.toEqualTypeOf<TransientResult>();
    expectTypeOf<TransientResult["time"]>().toEqualTypeOf<Float64Array>();
  });
});

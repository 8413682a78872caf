import { describe, expect, expectTypeOf, it } from "vitest";
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { complex, lusolve, matrix, type Complex, type Matrix } from "mathjs";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { LinkConvergenceError, solveLinkNetwork } from "../../lib/circuit/link/solveNetwork.ts";
import type { LinkNetwork, ReceiverNetwork } from "../../lib/circuit/link/network.ts";
import type { LinkResult } from "../../lib/circuit/link/result.ts";
import { currentDrive, sineDrive } from "../../lib/circuit/drive.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { resistorLoad, stubLedLoad } from "./linkStubs.ts";

const f = 200e3;
const w = 2 * Math.PI * f;
const L1 = 24e-6;
const L2 = 180e-6;
const tuned = (l: number): number => 1 / (w * w * l);

function pair(k: number, rx: Partial<ReceiverNetwork> & Pick<ReceiverNetwork, "load">, drive = sineDrive(5, 0.5)): LinkNetwork {
  const m = k * Math.sqrt(L1 * L2);
  return {
    frequency: f,
    inductance: [
      [L1, m],
      [m, L2],
    ],
    transmitter: { resistance: 0.25, compensation: "series", capacitance: tuned(L1), capacitorEsr: 0.02, drive },
    receivers: [{ resistance: 6.5, topology: "parallel", capacitance: tuned(L2), capacitorEsr: 0.4, ...rx }],
  };
}

/** Σ of every loss, computed here from the phasor currents and the element values (not from the result's power fields). */
function independentLosses(net: LinkNetwork, r: LinkResult): number {
  const tx = net.transmitter;
  let p = 0;
  const i0 = r.transmitter.coilCurrent;
  p += 0.5 * i0 * i0 * tx.resistance;
  p += 0.5 * r.transmitter.capacitorCurrent ** 2 * (tx.capacitorEsr ?? 0);
  if (tx.drive.kind === "voltage") p += 0.5 * r.transmitter.sourceCurrent ** 2 * tx.drive.resistance;
  net.receivers.forEach((rx, k) => {
    const s = r.receivers[k]!;
    p += 0.5 * s.coilCurrent ** 2 * rx.resistance;
    p += 0.5 * s.capacitorCurrent ** 2 * (rx.capacitorEsr ?? 0);
    p += 0.5 * s.loadVoltage * s.loadCurrent; // load current is in phase (real describing function)
  });
  return p;
}

describe("solveLinkNetwork: linear loads", () => {
  it("the reflected impedance at the transmitter is (ωM)²/Z₂ (series and parallel receivers)", () => {
    // source: textbook coupled-circuit theory (reflected impedance Z_r = (ωM)²/Z₂), any
    // circuits text. rtol 1e-12: both sides are a few complex operations in double precision.
    for (const topology of ["series", "parallel"] as const) {
      const rl = 470;
      const net = pair(0.08, { topology, load: resistorLoad(rl) });
      const r = solveLinkNetwork(net);
      const c2 = tuned(L2);
      const zc = { re: 0.4, im: -1 / (w * c2) };
      let z2re: number;
      let z2im: number;
      if (topology === "series") {
        z2re = 6.5 + zc.re + rl;
        z2im = w * L2 + zc.im;
      } else {
        // Z_ext = 1/(1/Z_C + 1/R_L)
        const d = zc.re * zc.re + zc.im * zc.im;
        const yre = zc.re / d + 1 / rl;
        const yim = -zc.im / d;
        const yd = yre * yre + yim * yim;
        z2re = 6.5 + yre / yd;
        z2im = w * L2 - yim / yd;
      }
      const wm2 = (w * 0.08 * Math.sqrt(L1 * L2)) ** 2;
      const zd = z2re * z2re + z2im * z2im;
      const ref = { re: (wm2 * z2re) / zd, im: (-wm2 * z2im) / zd };
      const src = "source: textbook coupled-circuit theory, Z_r = (ωM)²/Z₂";
      expectOutside({ quantity: `reflected resistance, ${topology} receiver`, source: src, ours: r.transmitter.reflectedImpedance.re, reference: ref.re, rtol: 1e-12, unit: "Ω" });
      expectOutside({ quantity: `reflected reactance, ${topology} receiver`, source: src, ours: r.transmitter.reflectedImpedance.im, reference: ref.im, rtol: 1e-10, atol: 1e-12 * Math.abs(ref.re), unit: "Ω" });
    }
  });

  it("a three-coil network with all couplings matches an independent 40-digit mpmath solution", () => {
    const fx = JSON.parse(readFileSync(new URL("../fixtures/link/coupled-3coil.json", import.meta.url), "utf8")) as {
      cases: {
        frequency: number;
        inductance: number[][];
        resistance: number[];
        capacitance: number[];
        esr: number[];
        loadResistance: (number | null)[];
        sourceAmplitude: number;
        sourceResistance: number;
        current: [number, number][];
        parallelLoadVoltage: number;
        inputPower: number;
      }[];
    };
    const c = fx.cases[0]!;
    const net: LinkNetwork = {
      frequency: c.frequency,
      inductance: c.inductance,
      transmitter: {
        resistance: c.resistance[0]!,
        compensation: "series",
        capacitance: c.capacitance[0]!,
        capacitorEsr: c.esr[0]!,
        drive: sineDrive(c.sourceAmplitude, c.sourceResistance),
      },
      receivers: [
        { resistance: c.resistance[1]!, topology: "series", capacitance: c.capacitance[1]!, capacitorEsr: c.esr[1]!, load: resistorLoad(c.loadResistance[1]!) },
        { resistance: c.resistance[2]!, topology: "parallel", capacitance: c.capacitance[2]!, capacitorEsr: c.esr[2]!, load: resistorLoad(c.loadResistance[2]!) },
      ],
    };
    const r = solveLinkNetwork(net);
    const src = "independent method: mpmath lu_solve at 40 digits (scripts/gen_link_fixtures.py)";
    // rtol 1e-11: a 3×3 complex elimination in double precision with condition number ≈ 1e3
    const phasors = [r.transmitter.coilCurrentPhasor, ...r.receivers.map((x) => x.coilCurrentPhasor)];
    phasors.forEach((p, i) => {
      const [re, im] = c.current[i]!;
      expectOutside({ quantity: `3-coil loop current ${i} (re)`, source: src, ours: p.re, reference: re, rtol: 1e-11, atol: 1e-13, unit: "A" });
      expectOutside({ quantity: `3-coil loop current ${i} (im)`, source: src, ours: p.im, reference: im, rtol: 1e-11, atol: 1e-13, unit: "A" });
    });
    expectOutside({ quantity: "3-coil parallel load voltage", source: src, ours: r.receivers[1]!.loadVoltage, reference: c.parallelLoadVoltage, rtol: 1e-11, unit: "V" });
    expectOutside({ quantity: "3-coil input power", source: src, ours: r.power.input, reference: c.inputPower, rtol: 1e-11, unit: "W" });
  });

  it("power balance: input = Σ losses + load power to 1e-9 relative (independent sum from the element currents)", () => {
    // independent check: the losses are summed here from currents and element values
    for (const topology of ["series", "parallel"] as const) {
      for (const compensation of ["series", "parallel", "none"] as const) {
        const base = pair(0.15, { topology, load: resistorLoad(topology === "series" ? 40 : 3300) });
        const net: LinkNetwork = { ...base, transmitter: { ...base.transmitter, compensation } };
        const r = solveLinkNetwork(net);
        expectRelClose(independentLosses(net, r), r.power.input, 1e-9, `power balance ${compensation}-compensated Tx, ${topology} Rx`);
        const sum =
          r.power.driver + r.power.transmitterCoil + r.power.transmitterCapacitor + r.power.receiverCoils + r.power.receiverCapacitors + r.power.delivered;
        expectRelClose(sum, r.power.input, 1e-9, "the result's own power fields add up");
      }
    }
  });

  it("a current-regulated transmitter holds its coil current; a parallel tank on an ideal source sees the source across the coil", () => {
    const r = solveLinkNetwork(pair(0.1, { load: resistorLoad(1000) }, currentDrive(1.2)));
    expectRelClose(r.transmitter.coilCurrent, 1.2, 1e-14, "coil current = regulated amplitude");
    const base = pair(0.1, { load: resistorLoad(1000) }, sineDrive(7));
    const rp = solveLinkNetwork({ ...base, transmitter: { ...base.transmitter, compensation: "parallel", capacitorEsr: 0 } });
    expectRelClose(rp.transmitter.coilVoltage, 7, 1e-12, "coil terminal voltage = source amplitude");
    const z = Math.hypot(0.25 + rp.transmitter.reflectedImpedance.re, w * L1 + rp.transmitter.reflectedImpedance.im);
    expectRelClose(rp.transmitter.coilCurrent, 7 / z, 1e-12, "I₁ = V/|R₁ + jωL₁ + Z_r|");
  });

  it("reports RMS as peak/√2 and efficiency as delivered/input", () => {
    const r = solveLinkNetwork(pair(0.1, { load: resistorLoad(2200) }));
    expectRelClose(r.transmitter.coilCurrentRms, r.transmitter.coilCurrent / Math.SQRT2, 1e-15, "RMS");
    expectRelClose(r.receivers[0]!.capacitorVoltageRms, r.receivers[0]!.capacitorVoltage / Math.SQRT2, 1e-15, "RMS");
    expectRelClose(r.power.efficiency, r.power.delivered / r.power.input, 1e-15, "efficiency");
    expect(r.iterations).toBe(0);
    expect(r.converged).toBe(true);
  });
});

describe("solveLinkNetwork: nonlinear loads (describing function)", () => {
  const led = stubLedLoad();

  it("the solved amplitude is a fixed point: re-solving with the load frozen at G(x) gives |V| = x", () => {
    for (const topology of ["parallel", "series"] as const) {
      for (const amp of [0.3, 2, 20]) {
        const net = pair(0.05, { topology, load: led }, sineDrive(amp, 0.5));
        const r = solveLinkNetwork(net);
        const x = r.receivers[0]!.loadVoltage;
        const g = led.conductance(x);
        const frozen = solveLinkNetwork(pair(0.05, { topology, load: { label: "frozen", linear: true, conductance: () => g } }, sineDrive(amp, 0.5)));
        // independent re-solve (linear); rtol 1e-9: the Newton tolerance is 1e-10 on x
        expectRelClose(frozen.receivers[0]!.loadVoltage, x, 1e-9, `fixed point, ${topology}, drive ${amp} V`);
        expectRelClose(independentLosses(net, r), r.power.input, 1e-9, `power balance with the LED, ${topology}, ${amp} V`);
        expect(r.converged).toBe(true);
        expect(r.iterations).toBeGreaterThan(0);
      }
    }
  });

  it("an LED clamps its tank: ten times the drive moves the open-circuit amplitude 10× but the LED's by < 1.5×", () => {
    // between 0.1 V and 1 V of drive the open-circuit tank amplitude goes from ≈ 4 V to ≈ 42 V;
    // the stub LED (I_s = 1e-18 A, n = 2, R_s = 10 Ω) holds its tank near its forward voltage
    const lo = solveLinkNetwork(pair(0.05, { load: led }, sineDrive(0.1, 0.5)));
    const hi = solveLinkNetwork(pair(0.05, { load: led }, sineDrive(1, 0.5)));
    const open = solveLinkNetwork(pair(0.05, { load: resistorLoad(1e12) }, sineDrive(0.1, 0.5)));
    expect(open.receivers[0]!.loadVoltage).toBeGreaterThan(2 * lo.receivers[0]!.loadVoltage);
    const ratio = hi.receivers[0]!.loadVoltage / lo.receivers[0]!.loadVoltage;
    expect(ratio).toBeGreaterThan(1);
    expect(ratio).toBeLessThan(1.5);
    expect(hi.receivers[0]!.leds[0]!.averageCurrent).toBeGreaterThan(10 * lo.receivers[0]!.leds[0]!.averageCurrent);
  });

  it("twelve coupled LED tokens with all mutual couplings converge to a joint fixed point", () => {
    const n = 12;
    const L = Array.from({ length: n + 1 }, () => new Array<number>(n + 1).fill(0));
    L[0]![0] = L1;
    for (let i = 1; i <= n; i++) {
      L[i]![i] = L2;
      const m = (0.02 + 0.004 * i) * Math.sqrt(L1 * L2);
      L[0]![i] = m;
      L[i]![0] = m;
      for (let j = 1; j < i; j++) {
        const mm = (i - j === 1 ? 0.06 : 0.01 / (i - j)) * L2; // neighbours side by side: k = 0.06
        L[i]![j] = -mm;
        L[j]![i] = -mm;
      }
    }
    const receivers = Array.from({ length: n }, (_, i) => ({
      label: `token ${i + 1}`,
      resistance: 6.5,
      topology: "parallel" as const,
      capacitance: tuned(L2) * (1 + 0.01 * (i % 3)),
      capacitorEsr: 0.4,
      load: led,
    }));
    const net: LinkNetwork = {
      frequency: f,
      inductance: L,
      transmitter: { resistance: 0.25, compensation: "series", capacitance: tuned(L1), drive: sineDrive(6, 0.3) },
      receivers,
    };
    const r = solveLinkNetwork(net);
    expect(r.converged).toBe(true);
    // joint fixed point: freeze every load at its G(x) and re-solve linearly
    const frozen = solveLinkNetwork({
      ...net,
      receivers: receivers.map((rx, k) => {
        const g = led.conductance(r.receivers[k]!.loadVoltage);
        return { ...rx, load: { label: "frozen", linear: true, conductance: () => g } };
      }),
    });
    r.receivers.forEach((s, k) => expectRelClose(frozen.receivers[k]!.loadVoltage, s.loadVoltage, 1e-9, `token ${k + 1}`));
    expectRelClose(independentLosses(net, r), r.power.input, 1e-9, "power balance, 12 tokens");
  });

  it("converges and balances power over random couplings, drives, detunings and topologies (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.002, max: 0.4, noNaN: true }),
        fc.double({ min: 0.01, max: 40, noNaN: true }),
        fc.double({ min: 0.9, max: 1.1, noNaN: true }),
        fc.constantFrom("series" as const, "parallel" as const),
        fc.constantFrom("series" as const, "parallel" as const, "none" as const),
        (k, amp, detune, topology, compensation) => {
          const base = pair(k, { topology, load: led, capacitance: tuned(L2) * detune }, sineDrive(amp, 0.5));
          const net: LinkNetwork = { ...base, transmitter: { ...base.transmitter, compensation } };
          const r = solveLinkNetwork(net);
          expect(r.converged).toBe(true);
          expectRelClose(independentLosses(net, r), r.power.input, 1e-9, "power balance");
          const x = r.receivers[0]!.loadVoltage;
          const g = led.conductance(x);
          const frozen = solveLinkNetwork({ ...net, receivers: [{ ...net.receivers[0]!, load: { label: "frozen", linear: true, conductance: () => g } }] });
          expectRelClose(frozen.receivers[0]!.loadVoltage, x, 1e-9, "fixed point");
        },
      ),
      { numRuns: 150, seed: 6 },
    );
  });

  it("several tokens with strong mutual couplings converge to a joint fixed point (property)", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 4 }),
        fc.array(fc.double({ min: -0.3, max: 0.3, noNaN: true }), { minLength: 16, maxLength: 16 }),
        fc.double({ min: 0.05, max: 20, noNaN: true }),
        (n, ks, amp) => {
          const L: number[][] = Array.from({ length: n + 1 }, (_, i) => Array.from({ length: n + 1 }, (_, j) => (i === j ? (i === 0 ? L1 : L2) : 0)));
          let c = 0;
          for (let i = 0; i <= n; i++) {
            for (let j = i + 1; j <= n; j++) {
              // |k| ≤ 0.3 pairwise, scaled so the matrix stays positive definite (Σ|k| < 1 per row)
              const k = ks[c++ % ks.length]! / n;
              const m = k * Math.sqrt(L[i]![i]! * L[j]![j]!);
              L[i]![j] = m;
              L[j]![i] = m;
            }
          }
          const net: LinkNetwork = {
            frequency: f,
            inductance: L,
            transmitter: { resistance: 0.25, compensation: "series", capacitance: tuned(L1), drive: sineDrive(amp, 0.5) },
            receivers: Array.from({ length: n }, (_, i) => ({ resistance: 6.5, topology: (i % 2 ? "series" : "parallel") as "series" | "parallel", capacitance: tuned(L2), capacitorEsr: 0.4, load: led })),
          };
          const r = solveLinkNetwork(net);
          expect(r.converged).toBe(true);
          expectRelClose(independentLosses(net, r), r.power.input, 1e-9, "power balance");
          const frozen = solveLinkNetwork({
            ...net,
            receivers: net.receivers.map((rx, k) => {
              const g = led.conductance(r.receivers[k]!.loadVoltage);
              return { ...rx, load: { label: "frozen", linear: true, conductance: () => g } };
            }),
          });
          // rtol 1e-8: each amplitude meets 1e-10 on its own; through strong token–token coupling
          // the frozen re-solve of all together amplifies that by the system's sensitivity (≲ 100)
          r.receivers.forEach((s, k) => expectRelClose(frozen.receivers[k]!.loadVoltage, s.loadVoltage, 1e-8, `token ${k + 1}`, 1e-11));
        },
      ),
      { numRuns: 80, seed: 11 },
    );
  });

  it("tokens side by side detune each other: the token–token coupling changes both, symmetrically", () => {
    const m01 = 0.04 * Math.sqrt(L1 * L2);
    const twin = (k12: number): LinkNetwork => ({
      frequency: f,
      inductance: [
        [L1, m01, m01],
        [m01, L2, k12 * L2],
        [m01, k12 * L2, L2],
      ],
      transmitter: { resistance: 0.25, compensation: "series", capacitance: tuned(L1), drive: sineDrive(2, 0.5) },
      receivers: [0, 1].map(() => ({ resistance: 6.5, topology: "parallel" as const, capacitance: tuned(L2), capacitorEsr: 0.4, load: led })),
    });
    const apart = solveLinkNetwork(twin(0));
    const close = solveLinkNetwork(twin(-0.08)); // coplanar neighbours: negative mutual
    // identical tokens in identical positions: identical amplitudes (symmetry), to the tolerance
    expectRelClose(close.receivers[0]!.loadVoltage, close.receivers[1]!.loadVoltage, 1e-9, "symmetry");
    // the neighbour's coupling detunes each tank: its LED current changes by more than 1 %
    const a = apart.receivers[0]!.leds[0]!.averageCurrent;
    const b = close.receivers[0]!.leds[0]!.averageCurrent;
    expect(Math.abs(b / a - 1)).toBeGreaterThan(0.01);
    expect(close.converged).toBe(true);
  });

  it("non-convergence throws a LinkConvergenceError naming the receiver (never NaN), or warns on request", () => {
    // a pathological load that is open below 1 V and 1 Ω above (a discontinuous clamp):
    // open, the tank rises far above 1 V; loaded, it falls below — no amplitude is consistent
    const bad = { label: "step clamp", conductance: (v: number) => (v < 1 ? 1e-9 : 1) };
    const net = pair(0.1, { load: bad }, sineDrive(20, 0.5));
    expect(() => solveLinkNetwork(net, { maxIterations: 6 })).toThrow(LinkConvergenceError);
    expect(() => solveLinkNetwork(net, { maxIterations: 6 })).toThrow(/receiver 1: \|V\| − x = /);
    const r = solveLinkNetwork(net, { maxIterations: 6, onNonConvergence: "warn" });
    expect(r.converged).toBe(false);
    expect(r.warnings.join(" ")).toMatch(/did not converge/);
    expect(Number.isFinite(r.receivers[0]!.loadVoltage)).toBe(true);
    expect(Number.isFinite(r.power.efficiency)).toBe(true);
  });

  it("a describing function that returns NaN is an input error, not a NaN result", () => {
    const nan = { label: "broken", conductance: () => Number.NaN };
    expect(() => solveLinkNetwork(pair(0.1, { load: nan }))).toThrow(TanklightInputError);
  });
});

describe("solveLinkNetwork: verdicts, warnings and cautions", () => {
  it("LED verdicts follow the threshold the user sets; the default is labelled trade practice", () => {
    const r = solveLinkNetwork(pair(0.05, { load: stubLedLoad("red") }, sineDrive(2, 0.5)));
    const i = r.receivers[0]!.leds[0]!.averageCurrent;
    expect(r.litThreshold).toBe(0.5e-3);
    expect(r.litThresholdSource).toMatch(/trade practice/);
    expect(r.receivers[0]!.leds[0]!.lit).toBe(i >= 0.5e-3);
    const strict = solveLinkNetwork(pair(0.05, { load: stubLedLoad("red") }, sineDrive(2, 0.5)), { litThreshold: i * 1.01 });
    expect(strict.receivers[0]!.lit).toBe(false);
    const lax = solveLinkNetwork(pair(0.05, { load: stubLedLoad("red") }, sineDrive(2, 0.5)), { litThreshold: i * 0.99 });
    expect(lax.receivers[0]!.lit).toBe(true);
    expectRelClose(lax.receivers[0]!.leds[0]!.relativeBrightness, i / 20e-3, 1e-15, "brightness relative to 20 mA");
  });

  it("warns on capacitor overvoltage and self-resonance, and cautions on high tank voltage", () => {
    const base = pair(0.05, { load: resistorLoad(10e3), capacitorRating: 5, selfResonance: 500e3 }, sineDrive(10, 0.1));
    const r = solveLinkNetwork({ ...base, transmitter: { ...base.transmitter, capacitorRating: 16 } });
    const text = r.warnings.join("\n");
    expect(text).toMatch(/receiver 1 capacitor: peak voltage .* exceeds its rating 5 V/);
    expect(text).toMatch(/transmitter capacitor: peak voltage .* exceeds its rating 16 V/);
    expect(text).toMatch(/beyond a third of its self-resonance/);
    expect(r.cautions.join(" ")).toMatch(/local electrical codes/);
  });

  it("rejects an asymmetric matrix, a coupling ≥ 1 and negative resistances", () => {
    const ok = pair(0.1, { load: resistorLoad(100) });
    expect(() => solveLinkNetwork({ ...ok, inductance: [[L1, 1e-6], [2e-6, L2]] })).toThrow(/reciprocity/);
    const m = 1.01 * Math.sqrt(L1 * L2);
    expect(() => solveLinkNetwork({ ...ok, inductance: [[L1, m], [m, L2]] })).toThrow(/coupling factor < 1/);
    expect(() => solveLinkNetwork({ ...ok, transmitter: { ...ok.transmitter, resistance: -1 } })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: solveLinkNetwork: transmitter.resistance: must be ≥ 0 Ω, got -1]`,
    );
    expect(() => solveLinkNetwork({ ...ok, inductance: [[L1]] })).toThrow(/2×2 matrix/);
  });

  it("has typed signatures", () => {
    expectTypeOf(solveLinkNetwork).parameter(0).toEqualTypeOf<LinkNetwork>();
    expectTypeOf(solveLinkNetwork).returns.toEqualTypeOf<LinkResult>();
  });
});

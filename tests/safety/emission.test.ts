import { describe, expect, it } from "vitest";
import { emissionEstimate, dipoleField, FREE_SPACE_IMPEDANCE } from "../../lib/safety/emission.ts";
import { EMISSION_RULES, emissionRows } from "../../lib/safety/emissionLimits.ts";
import { magneticField } from "../../lib/em/magneticField.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { MU0 } from "../../lib/constants.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { ringCoil } from "./helpers.ts";

const c0 = 299_792_458;
const rule = (id: string) => EMISSION_RULES.find((r) => r.id === id)!;

describe("emissionEstimate: dipole moment and field at 10, 30 and 300 m", () => {
  it("the dipole field at large distance agrees with the filament (Biot–Savart) model, on the axis and broadside", () => {
    // independent method: closed-form loop field (Simpson et al. 2001) of a 20-turn, 4-layer coil, quasi-static (k = 0);
    // a loop departs from its dipole limit by (3/2)(a/r)² on the axis (a ≈ 0.042 m here), hence rtol 2·(0.05/r)²
    const coil = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
    const m = emissionEstimate({ frequency: 200e3, surfaceHeight: 0.01, transmitters: [{ coil, current: 1 }] }).moment;
    for (const r of [2, 10]) {
      const axis = Math.hypot(...magneticField(coil, { position: [0, 0, 0] }, 1, [0, 0, r])) / MU0;
      const side = Math.hypot(...magneticField(coil, { position: [0, 0, 0] }, 1, [r, 0, 0])) / MU0;
      expectOutside({ quantity: `dipole H on the axis at ${r} m, k → 0`, source: "independent method: filament model (loop closed form, Simpson et al. 2001)", ours: dipoleField(m, r, 0).value, reference: axis, rtol: 2 * (0.05 / r) ** 2, unit: "A/m" });
      expectOutside({ quantity: `dipole H broadside at ${r} m, k → 0`, source: "independent method: filament model (loop closed form, Simpson et al. 2001)", ours: (m / (4 * Math.PI * r ** 3)), reference: side, rtol: 2 * (0.05 / r) ** 2, unit: "A/m" });
    }
  });

  it("far away the broadside field is the radiation field m·k²/(4πr)", () => {
    // source: Cochran & Heinrich, Applications of Maxwell's Equations, §7.5 (small loop, far zone); Balanis, Antenna Theory, §5.2
    const k = (2 * Math.PI * 13.56e6) / c0, r = 3000;
    const h = dipoleField(1, r, k);
    expect(h.direction).toBe("broadside");
    expectOutside({ quantity: "small-loop far field, kr ≈ 850", source: "source: Cochran & Heinrich §7.5, far-zone H_θ = m·k²·sinθ/(4πr)", ours: h.value, reference: (k * k) / (4 * Math.PI * r), rtol: 2e-6, unit: "A/m" });
  });

  it("moment N·I·A of a ring, transition at λ/2π, dB units, and the plane-wave conversion of 51.5 dB", () => {
    const a = 0.05, N = 12, I = 3, f = 217e3;
    const e = emissionEstimate({ frequency: f, surfaceHeight: 0.01, transmitters: [{ coil: ringCoil(a, N), current: I }] });
    expectRelClose(e.moment, N * I * Math.PI * a * a, 1e-14, "m = N·I·A");
    expectRelClose(e.momentRms, (N * I * Math.PI * a * a) / Math.SQRT2, 1e-14, "m RMS");
    expectRelClose(e.transition, c0 / (2 * Math.PI * f), 1e-14, "λ/2π");
    expect(e.transition).toBeGreaterThan(219); // 220 m at 217 kHz
    const at10 = e.fields[0]!;
    expectRelClose(at10.dBuAm, 20 * Math.log10(at10.fieldStrength / 1e-6), 1e-14, "dBµA/m");
    expectOutside({ quantity: "plane-wave conversion 20·log10(Z0)", source: "from memory (unverified): H[dBµA/m] = E[dBµV/m] − 51.5 dB", ours: at10.dBuVm - at10.dBuAm, reference: 51.5, rtol: 1e-3, unit: "dB" });
    expectRelClose(FREE_SPACE_IMPEDANCE, 376.730313, 1e-6, "Z0 = μ0·c");
    expect(e.fields.map((x) => x.distance)).toEqual([10, 30, 300]);
    expect(e.fields[2]!.kr).toBeGreaterThan(1);
    expect(e.disclaimer).toMatch(/estimate.*not a compliance test/);
  });

  it("arrays: moments add with their phases; coils in anti-phase cancel and the estimate warns it is too low", () => {
    const ring = ringCoil(0.05, 10);
    const one = emissionEstimate({ frequency: 200e3, surfaceHeight: 0.01, transmitters: [{ coil: ring, current: 1 }] }).moment;
    const quad = emissionEstimate({ frequency: 200e3, surfaceHeight: 0.01, transmitters: [{ coil: ring, current: 1 }, { coil: ring, current: 1, phase: Math.PI / 2, pose: { position: [0.2, 0, 0] } }] });
    // parallel moments in quadrature: m(1 + j) swings along one line with amplitude √2·m
    expectRelClose(quad.moment, Math.SQRT2 * one, 1e-12, "two equal parallel moments in quadrature");
    const crossed = emissionEstimate({ frequency: 200e3, surfaceHeight: 0.01, transmitters: [{ coil: ring, current: 1 }, { coil: ring, current: 1, phase: Math.PI / 2, pose: { position: [0.2, 0, 0], axis: [1, 0, 0] } }] });
    expectRelClose(crossed.moment, one, 1e-12, "crossed moments in quadrature: a circle of radius m");
    const anti = emissionEstimate({ frequency: 200e3, surfaceHeight: 0.01, transmitters: [{ coil: ring, current: 1 }, { coil: ring, current: 1, phase: Math.PI, pose: { position: [0.2, 0, 0] } }] });
    expect(anti.moment).toBeLessThan(1e-12 * one);
    expect(anti.warnings.join(" ")).toMatch(/cancel to 0\.0 % .* superposition/);
    expect(anti.array!.method).toBe("superposition");
  });

  it("arrays: the field is the superposition of each coil's dipole field — in phase 2×, quadrature √2×, and an anti-phase pair as Biot–Savart gives it", () => {
    const ring = ringCoil(0.05, 10);
    const f = 200e3;
    const pair = (phase: number) => emissionEstimate({ frequency: f, surfaceHeight: 0.01, transmitters: [{ coil: ring, current: 1, pose: { position: [-0.06, 0, 0] } }, { coil: ring, current: 1, phase, pose: { position: [0.06, 0, 0] } }] });
    const one = emissionEstimate({ frequency: f, surfaceHeight: 0.01, transmitters: [{ coil: ring, current: 1 }] }).fields[0]!.fieldStrength;
    // two coils 0.12 m apart seen from 10 m: within (d/r)² of one dipole of the summed moment
    expectRelClose(pair(0).fields[0]!.fieldStrength, 2 * one, 1e-3, "in phase: twice one coil");
    expectRelClose(pair(Math.PI / 2).fields[0]!.fieldStrength, Math.SQRT2 * one, 1e-3, "quadrature: √2 × one coil");
    // anti-phase: the largest field over directions at 10 m against the exact loops' static field
    // (Biot–Savart, magneticField; kr = 0.042, so the static field is the near field to (kr)² ≈ 0.2 %)
    const anti = pair(Math.PI);
    let exact = 0;
    const n = 400;
    const golden = Math.PI * (3 - Math.sqrt(5));
    for (let i = 0; i < n; i++) {
      const z = 1 - (2 * (i + 0.5)) / n, rho = Math.sqrt(1 - z * z);
      const p: [number, number, number] = [10 * rho * Math.cos(golden * i), 10 * rho * Math.sin(golden * i), 10 * z];
      const a = magneticField(ring, { position: [-0.06, 0, 0] }, 1 / Math.SQRT2, p);
      const b = magneticField(ring, { position: [0.06, 0, 0] }, -1 / Math.SQRT2, p);
      exact = Math.max(exact, Math.hypot(a[0] + b[0], a[1] + b[1], a[2] + b[2]) / MU0);
    }
    expect(anti.fields[0]!.fieldStrength).toBeLessThan(0.05 * one); // far below the in-phase bound (−31 dB)
    expectRelClose(anti.fields[0]!.fieldStrength, exact, 0.02, "anti-phase pair at 10 m: superposed dipoles vs Biot–Savart (sampled directions differ)");
  });
});

describe("emission limits: 47 CFR 15.209 and CEPT ERC/REC 70-03 Annex 9", () => {
  it("published values at sample frequencies", () => {
    const fcc = rule("47 CFR 15.209"), cept = rule("CEPT ERC/REC 70-03 Annex 9");
    expectOutside({ quantity: "15.209 at 200 kHz (300 m)", source: "source: 47 CFR 15.209(a), 2400/F(kHz) µV/m", ours: emissionRows(fcc, 200e3)[0]!.limitDb(200e3), reference: 20 * Math.log10(12), rtol: 1e-12, unit: "dBµV/m" });
    expectOutside({ quantity: "15.209 at 1 MHz (30 m)", source: "source: 47 CFR 15.209(a), 24000/F(kHz) µV/m", ours: emissionRows(fcc, 1e6)[0]!.limitDb(1e6), reference: 20 * Math.log10(24), rtol: 1e-12, unit: "dBµV/m" });
    expectOutside({ quantity: "15.209 at 6.78 MHz (30 m)", source: "source: 47 CFR 15.209(a), 30 µV/m", ours: emissionRows(fcc, 6.78e6)[0]!.limitDb(6.78e6), reference: 20 * Math.log10(30), rtol: 1e-12, unit: "dBµV/m" });
    expectOutside({ quantity: "70-03 Annex 9 at 125 kHz", source: "source: CEPT ERC/REC 70-03 Annex 9, 66 dBµA/m falling 3 dB/octave above 119 kHz", ours: emissionRows(cept, 125e3)[0]!.limitDb(125e3), reference: 66 - 3 * Math.log2(125 / 119), rtol: 1e-12, unit: "dBµA/m" });
    expectOutside({ quantity: "70-03 Annex 9 at 60 kHz", source: "source: CEPT ERC/REC 70-03 Annex 9, 72 dBµA/m falling 3 dB/octave above 30 kHz", ours: emissionRows(cept, 60e3)[0]!.limitDb(60e3), reference: 69, rtol: 1e-12, unit: "dBµA/m" });
    expectOutside({ quantity: "70-03 Annex 9 at 200 kHz", source: "source: CEPT ERC/REC 70-03 Annex 9, 148.5 kHz–5 MHz: −15 dBµA/m", ours: emissionRows(cept, 200e3)[0]!.limitDb(200e3), reference: -15, rtol: 1e-12, unit: "dBµA/m" });
    expect(emissionRows(cept, 13.56e6).map((r) => r.limitDb(13.56e6))).toEqual([42]);
  });

  it("band edges are exact: on an edge both rows hold and the stricter one is used", () => {
    const fcc = rule("47 CFR 15.209"), cept = rule("CEPT ERC/REC 70-03 Annex 9");
    expect(emissionRows(cept, 90e3).length).toBe(2);
    expect(emissionRows(fcc, 490e3).length).toBe(2);
    expect(emissionRows(fcc, 8999)).toEqual([]);
    expect(emissionRows(cept, 13.553e6).map((r) => r.limitDb(13.553e6)).sort()).toEqual([-20, 42]);
    // emissionEstimate picks the row with the smaller margin
    const e = emissionEstimate({ frequency: 90e3, surfaceHeight: 0.01, transmitters: [{ coil: ringCoil(0.05, 10), current: 1 }] });
    expect(e.limits.find((l) => l.rule.startsWith("CEPT"))!.limitDb).toBe(42);
  });

  it("a violating design says so and by how much; one inside says its margin", () => {
    const coil = ringCoil(0.04, 20);
    const loud = emissionEstimate({ frequency: 200e3, surfaceHeight: 0.01, transmitters: [{ coil, current: 1 }] });
    const cept = loud.limits.find((l) => l.rule.startsWith("CEPT"))!;
    expect(cept.verdict).toBe("exceeds");
    expect(cept.text).toMatch(/EXCEEDS by \d+\.\d dB/);
    expectRelClose(cept.estimateDb, loud.fields[0]!.dBuAm, 1e-14, "CEPT compares H at 10 m");
    const quiet = emissionEstimate({ frequency: 125e3, surfaceHeight: 0.01, transmitters: [{ coil, current: 1 }] });
    const c2 = quiet.limits.find((l) => l.rule.startsWith("CEPT"))!;
    expect(c2.verdict).toBe("meets");
    expect(c2.text).toMatch(/margin \d+\.\d dB/);
    // scaling the current by 10 moves every estimate by 20 dB
    const ten = emissionEstimate({ frequency: 125e3, surfaceHeight: 0.01, transmitters: [{ coil, current: 10 }] });
    expectRelClose(ten.fields[1]!.dBuAm - quiet.fields[1]!.dBuAm, 20, 1e-12, "20 dB per decade of current");
  });
});

import { describe, expect, it } from "vitest";
import { exposureCheck } from "../../lib/safety/exposure.ts";
import { fieldPhasors } from "../../lib/safety/fieldGrid.ts";
import { magneticField } from "../../lib/em/magneticField.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { rectLoop } from "../../lib/em/builders/rectLoop.ts";
import { MU0 } from "../../lib/constants.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { ringCoil } from "./helpers.ts";

const tx = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
const f = 200e3;

describe("fieldPhasors: the tabulated axisymmetric path agrees with magneticField point by point", () => {
  it("within 1e-4 relative of the field magnitude over a plane 5 mm above the winding and higher", () => {
    const xs = Float64Array.from({ length: 60 }, (_, i) => -0.12 + 0.004 * i + 1e-4 * Math.sin(i));
    const ys = Float64Array.from({ length: 60 }, (_, i) => 0.09 - 0.003 * i);
    const zs = Float64Array.of(0.005, 0.02, 0.11);
    const pose = { position: [0.01, -0.02, 0] as const };
    const b = fieldPhasors([{ coil: tx, pose, current: 1.7, phase: 0.3 }], { xs, ys, zs });
    let worst = 0;
    for (let k = 0; k < zs.length; k++) {
      for (let i = 0; i < xs.length; i++) {
        const ref = magneticField(tx, pose, 1.7, [xs[i]!, ys[i]!, zs[k]!]);
        const j = k * xs.length + i;
        const mag = Math.hypot(...ref);
        for (let d = 0 as 0 | 1 | 2; d < 3; d++) {
          worst = Math.max(worst, Math.abs(b.re[d][j]! - Math.cos(0.3) * ref[d]) / mag, Math.abs(b.im[d][j]! - Math.sin(0.3) * ref[d]) / mag);
        }
      }
    }
    expect(worst).toBeLessThan(1e-4);
  });

  it("a coil posed upside down takes the same path and still agrees", () => {
    const pose = { position: [0, 0, 0.02] as const, axis: [0, 0, -1] as const };
    const xs = Float64Array.of(0, 0.03, 0.05), ys = Float64Array.of(0.01, 0, -0.02);
    const b = fieldPhasors([{ coil: tx, pose, current: 1, phase: 0 }], { xs, ys, zs: Float64Array.of(0.03) });
    for (let i = 0; i < 3; i++) {
      const ref = magneticField(tx, pose, 1, [xs[i]!, ys[i]!, 0.03]);
      for (let d = 0 as 0 | 1 | 2; d < 3; d++) expect(Math.abs(b.re[d][i]! - ref[d])).toBeLessThan(1e-4 * Math.hypot(...ref));
    }
  });
});

describe("exposureCheck: the field where people can reach against the reference levels", () => {
  it("on the axis of a ring the worst field equals the closed form μ0NIa²/(2(a²+z²)^{3/2}), as RMS", () => {
    // source: Griffiths, Introduction to Electrodynamics, Example 5.6 (field on the axis of a current loop)
    const a = 0.05, N = 10, I = 2, z0 = 0.06; // at z ≥ a the axis is the strongest point of a plane above a ring
    const r = exposureCheck({ frequency: f, surfaceHeight: z0, transmitters: [{ coil: ringCoil(a, N), current: I }] }, { nx: 41, ny: 41, nz: 3, x: [-0.1, 0.1], y: [-0.1, 0.1], height: [0, 0.04] });
    const closed = (MU0 * N * I * a * a) / (2 * (a * a + z0 * z0) ** 1.5);
    expectOutside({ quantity: "worst B RMS on the axis of a 10-turn, 50 mm ring at 60 mm, 2 A peak", source: "source: Griffiths, Introduction to Electrodynamics, Example 5.6", ours: r.worst.flux, reference: closed / Math.SQRT2, rtol: 1e-9, unit: "T" });
    expect(r.worst.point[0]).toBe(0);
    expect(r.worst.point[1]).toBe(0);
    expect(r.worst.height).toBe(0);
    expect(r.convention).toMatch(/peak.*RMS/);
  });

  it("a violating design says so and by how much; one inside says its margin; both scale with the current", () => {
    const d = (current: number) => ({ frequency: f, surfaceHeight: 0.005, transmitters: [{ coil: tx, current }] });
    const hot = exposureCheck(d(1));
    const cool = exposureCheck(d(0.01));
    const hotPublic = hot.referenceLevels.find((l) => l.standard === "ICNIRP 2010" && l.population === "public")!;
    const coolPublic = cool.referenceLevels.find((l) => l.standard === "ICNIRP 2010" && l.population === "public")!;
    expect(hotPublic.verdict).toBe("exceeds");
    expect(hotPublic.text).toMatch(/EXCEEDS .* by ×\d/);
    expect(coolPublic.verdict).toBe("meets");
    expect(coolPublic.text).toMatch(/margin of ×\d/);
    expectRelClose(hotPublic.ratio! / coolPublic.ratio!, 100, 1e-12, "ratio ∝ current");
    expectRelClose(coolPublic.marginDb!, -20 * Math.log10(coolPublic.ratio!), 1e-12, "margin in dB");
    expect(coolPublic.compliantAbove).toBe(0);
    // the 2020 levels are listed in addition above 100 kHz, and the governing sentence says so
    expect(hot.referenceLevels.some((l) => l.standard === "ICNIRP 2020 local" && l.verdict !== "not covered")).toBe(true);
    expect(hot.governs[0]).toMatch(/ICNIRP 2020/);
    expect(hot.disclaimer).toMatch(/not a compliance assessment/);
  });

  it("from the reported compliance height up the level is met at every accessible point, and the grid level below fails", () => {
    const d = { frequency: f, surfaceHeight: 0.005, transmitters: [{ coil: tx, current: 1 }] };
    const r = exposureCheck(d, { nz: 31, height: [0, 0.3], discs: [] });
    const lv = r.referenceLevels.find((l) => l.standard === "ICNIRP 2010" && l.population === "public")!;
    const h = lv.compliantAbove!;
    expect(h).toBeGreaterThan(0);
    const k = r.profile.findIndex((p) => p.height === h);
    expect(r.profile.slice(k).every((p) => p.flux <= lv.limit!)).toBe(true);
    expect(r.profile[k - 1]!.flux).toBeGreaterThan(lv.limit!);
    const above = exposureCheck(d, { height: [h, 0.3], nz: 11, discs: [] });
    expect(above.worst.flux).toBeLessThanOrEqual(lv.limit!);
  });

  it("basic restriction: in a nearly uniform field the disc model gives E = ωBr/2 (Faraday's law)", () => {
    // source: Faraday's law on a circle in a uniform field, E·2πr = ω·B·πr² (Griffiths §7.2); field at the
    // centre of a 10 m ring μ0I/(2R) (Griffiths Example 5.6 at z = 0); over a 5 cm disc it varies by < 1e-4
    const R = 10, I = 100;
    const r = exposureCheck({ frequency: f, surfaceHeight: 0, transmitters: [{ coil: ringCoil(R), current: I }] }, { x: [-0.01, 0.01], y: [-0.01, 0.01], height: [0, 0.01], nx: 3, ny: 3, nz: 2, discGrid: 3 });
    const hand = r.basicRestriction.find((b) => b.disc === "hand" && b.population === "public")!;
    const B0 = (MU0 * I) / (2 * R);
    expectOutside({ quantity: "internal E of a 5 cm disc in a uniform 200 kHz field", source: "source: Faraday's law, E = ωBr/2 (Griffiths, Introduction to Electrodynamics, §7.2)", ours: hand.internalField, reference: (2 * Math.PI * f * (B0 / Math.SQRT2) * 0.05) / 2, rtol: 2e-4, unit: "V/m" });
    expect(r.warnings.join(" ")).toMatch(/not above the winding/);
  });

  it("both verdicts side by side: a local field over the reference level may still meet the basic restriction, and the sentence says which governs", () => {
    const r = exposureCheck({ frequency: f, surfaceHeight: 0.005, transmitters: [{ coil: tx, current: 1 }] });
    expect(r.referenceLevels.find((l) => l.standard === "ICNIRP 2010" && l.population === "public")!.verdict).toBe("exceeds");
    const hand = r.basicRestriction.find((b) => b.disc === "hand" && b.population === "public")!;
    expect(hand.verdict).toBe("meets");
    expect(r.governs[0]).toMatch(/basic restriction governs/);
    const loud = exposureCheck({ frequency: f, surfaceHeight: 0.005, transmitters: [{ coil: tx, current: 20 }] });
    expect(loud.governs[0]).toMatch(/both .* exceeded/);
  });

  it("phases add as phasors: two identical coils in phase double the field, in quadrature √2, in anti-phase cancel", () => {
    const one = { coil: tx, current: 1 };
    const o = { nx: 11, ny: 11, nz: 3, discs: [] };
    const single = exposureCheck({ frequency: f, surfaceHeight: 0.01, transmitters: [one] }, o).worst.flux;
    const inPhase = exposureCheck({ frequency: f, surfaceHeight: 0.01, transmitters: [one, one] }, o).worst.flux;
    const quad = exposureCheck({ frequency: f, surfaceHeight: 0.01, transmitters: [one, { ...one, phase: Math.PI / 2 }] }, o).worst.flux;
    const anti = exposureCheck({ frequency: f, surfaceHeight: 0.01, transmitters: [one, { ...one, phase: Math.PI }] }, o).worst.flux;
    expectRelClose(inPhase, 2 * single, 1e-12, "in phase");
    expectRelClose(quad, Math.SQRT2 * single, 1e-12, "quadrature");
    expect(anti).toBeLessThan(1e-12 * single);
  });

  it("polygon coils take the point-by-point path and agree with magneticField", () => {
    const sq = rectLoop({ width: 0.1, height: 0.1, wire: { diameter: 5e-4 } });
    const r = exposureCheck({ frequency: f, surfaceHeight: 0.02, transmitters: [{ coil: sq, current: 1 }] }, { nx: 5, ny: 5, nz: 2, x: [-0.1, 0.1], y: [-0.1, 0.1], height: [0, 0.02], discs: [] });
    const b = magneticField(sq, { position: [0, 0, 0] }, 1, r.worst.point);
    expectRelClose(r.worst.flux, Math.hypot(...b) / Math.SQRT2, 1e-12, "worst point, polygon path");
  });

  it("bad input names the field", () => {
    expect(() => exposureCheck({ frequency: "5 mm", surfaceHeight: 0.01, transmitters: [{ coil: tx, current: 1 }] })).toThrow(/frequency/);
    expect(() => exposureCheck({ frequency: f, surfaceHeight: 0.01, transmitters: [] })).toThrow(TanklightInputError);
    expect(() => exposureCheck({ frequency: f, surfaceHeight: 0.01, transmitters: [{ coil: tx, current: 1 }] }, { height: [0.2, 0.1] })).toThrow(/height/);
  });
});

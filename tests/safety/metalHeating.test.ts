import { describe, expect, it } from "vitest";
import { metalHeating, OBJECT_METALS, fieldExcludingDiscPower } from "../../lib/safety/metalHeating.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { MU0 } from "../../lib/constants.ts";
import { METAL_HEATING_POWER } from "../../lib/hazards.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { ringCoil } from "./helpers.ts";

// a nearly uniform axial field: the centre of a 10 m ring (varies by < 1e-6 over a few mm)
const R = 10, I = 100;
const B0 = (MU0 * I) / (2 * R); // peak; source: Griffiths, Introduction to Electrodynamics, Example 5.6 at z = 0
const uniform = (f: number) => ({ frequency: f, surfaceHeight: 0, transmitters: [{ coil: ringCoil(R), current: I }] });

describe("metalHeating: eddy power in a coin, foil or ring on the transmitter", () => {
  it("thin disc, low-frequency limit: P = πσω²B₀²·t·a⁴/16 (B₀ peak)", () => {
    // source: Faraday's law E = ωB₀ρ/2 and Joule heating P = ½∫σE²dV over the disc (the textbook
    // thin-disc eddy-current exercise, e.g. Griffiths §7.2); valid while a·t ≪ 2δ²
    const f = 20e3, a = 0.005, t = 1e-4;
    const r = metalHeating(uniform(f), { kind: "disc", radius: a, thickness: t, metal: "cupronickel" });
    const sigma = 1 / OBJECT_METALS.cupronickel!.resistivity20;
    const w = 2 * Math.PI * f;
    expect(r.regime).toBe("field-penetrating (low frequency)");
    expect(r.regimeParameter).toBeLessThan(0.1);
    // midpoint rule over 48 annuli: relative error 1/(2·48²) ≈ 2e-4
    expectOutside({ quantity: "thin-disc eddy loss, 5 mm cupronickel, 20 kHz, uniform field", source: "source: textbook thin-disc eddy-current loss πσω²B₀²ta⁴/16 (Faraday's law + Joule heating, Griffiths §7.2)", ours: r.lowFrequencyPower, reference: (Math.PI * sigma * w * w * B0 * B0 * t * a ** 4) / 16, rtol: 5e-4, unit: "W" });
    expectRelClose(r.power, r.lowFrequencyPower, 0.02, "deep in the low-frequency regime the combined estimate is the low-frequency one");
  });

  it("a coin far thicker than the skin depth is in the field-excluding regime, where the loss grows as √f, far below the low-frequency formula", () => {
    const coin = { kind: "disc" as const, radius: 0.012, thickness: 1.5e-3, metal: "copper" };
    const a = metalHeating(uniform(200e3), coin), b = metalHeating(uniform(800e3), coin);
    expect(a.regime).toBe("field-excluding (skin effect)");
    expect(a.regimeParameter).toBeGreaterThan(100);
    expect(a.lowFrequencyPower / a.power).toBeGreaterThan(100);
    expectRelClose(b.fieldExcludingPower / a.fieldExcludingPower, 2, 1e-9, "R_s ∝ √f");
    // the face integral's closed form against brute-force quadrature (independent method)
    const h0 = 100, rr = 0.012, t = 1.5e-3, rs = 1e-4, rp = rr - t;
    let s = 0;
    const n = 200000;
    for (let i = 0; i < n; i++) { const rho = ((i + 0.5) * rp) / n; const ht = ((2 * h0) / Math.PI) * rho / Math.sqrt(rr * rr - rho * rho); s += 2 * 0.5 * rs * ht * ht * 2 * Math.PI * rho * (rp / n); }
    const hEdge = ((2 * h0) / Math.PI) * (rp / Math.sqrt(rr * rr - rp * rp));
    expectRelClose(fieldExcludingDiscPower(h0, rr, t, rs), s + 0.5 * rs * hEdge * hEdge * 2 * Math.PI * rr * t, 1e-6, "faces + rim");
  });

  it("a thin ring well inside its resistance-limited regime loses (ωΦ)²/(2R), Φ = B₀πr²", () => {
    // source: Faraday's law and Ohm's law for a closed loop (shorted turn), R = 2πr/(σ·w·t)
    const f = 20e3, r0 = 0.009, wd = 1e-3, th = 2e-4;
    const res = metalHeating(uniform(f), { kind: "ring", radius: r0, width: wd, thickness: th, metal: "stainless steel" });
    const sigma = 1 / OBJECT_METALS["stainless steel"]!.resistivity20;
    const Rr = (2 * Math.PI * r0) / (sigma * wd * th);
    const emf = 2 * Math.PI * f * B0 * Math.PI * r0 * r0;
    expect(res.regime).toBe("field-penetrating (low frequency)");
    expectOutside({ quantity: "shorted-ring loss, 9 mm stainless ring, 20 kHz", source: "source: Faraday + Ohm for a shorted turn, P = EMF²/(2R) (R ≫ ωL)", ours: res.lowFrequencyPower, reference: (emf * emf) / (2 * Rr), rtol: 1e-3, unit: "W" });
    expect(res.power).toBeLessThan(res.lowFrequencyPower);
  });

  it("above the stated power the result cautions, and below it gives its margin", () => {
    const tx = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
    const d = (current: number) => ({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil: tx, current }] });
    const foil = { kind: "disc" as const, radius: 0.03, thickness: 2e-5, metal: "aluminium" };
    const calm = metalHeating(d(0.05), foil);
    expect(calm.verdict).toBe("below threshold");
    expect(calm.text).toMatch(/margin/);
    const hot = metalHeating(d(2), foil);
    expect(hot.verdict).toBe("caution");
    expect(hot.power).toBeGreaterThan(METAL_HEATING_POWER.value);
    expect(hot.text).toMatch(/CAUTION/);
    expectRelClose(hot.power / calm.power, 1600, 1e-9, "P ∝ I²");
  });

  it("an object below the surface or an unknown metal is refused, naming the field", () => {
    const d = uniform(200e3);
    expect(() => metalHeating({ ...d, surfaceHeight: 0.01 }, { kind: "disc", radius: 0.01, thickness: 1e-3, metal: "copper", position: [0, 0, 0] })).toThrow(/object.position/);
    expect(() => metalHeating(d, { kind: "disc", radius: 0.01, thickness: 1e-3, metal: "unobtainium" })).toThrow(/metal/);
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { internalInductanceFactor, selfInductance, selfInductanceDetail } from "../../lib/em/selfInductance.ts";
import { currentSheetInductance, groverRectangleInductance, rosaRoundWireCorrection } from "../../lib/em/classicFormulas.ts";
import { MU0 } from "../../lib/constants.ts";
import type { Coil } from "../../lib/em/types.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { handRoundCoil, polygonTurn, rectTurn, singleTurn } from "./helpers.ts";
import yFixture from "../fixtures/em/internalInductance.json" with { type: "json" };

describe("selfInductance", () => {
  it("one round-wire turn: μ₀a[ln(8a/r) − 2 + Y] with Y = 1/4 at DC", () => {
    const a = 0.04;
    const r = 5e-4;
    // source: Rosa & Grover 1916 / Grover 1946 (round wire loop, uniform current); the own term is this formula
    expectOutside({ quantity: "single turn L (a=40 mm, d=1 mm)", source: "source: Grover 1946, Inductance Calculations, circular ring of round wire", ours: selfInductance(singleTurn(a, 2 * r)), reference: MU0 * a * (Math.log((8 * a) / r) - 1.75), rtol: 1e-15, unit: "H" });
  });

  it("a single-layer coil matches the current sheet (Nagaoka) minus Rosa's round-wire correction", () => {
    // 30 turns of 0.5 mm wire at 0.6 mm pitch on a 10 mm radius: p ≪ a, Rosa's correction valid
    const N = 30;
    const p = 6e-4;
    const d = 5e-4;
    const a = 0.01;
    const coil: Coil = {
      filaments: Array.from({ length: N }, (_, i) => ({ kind: "circle" as const, center: [0, 0, (i - (N - 1) / 2) * p] as const, axis: [0, 0, 1] as const, radius: a, turns: 1 })),
      conductor: { kind: "round", diameter: d, outerDiameter: p },
      turns: N,
      wireLength: 2 * Math.PI * a * N,
    };
    const ref = currentSheetInductance(a, N * p, N) - rosaRoundWireCorrection(a, N, p, d);
    // source: Rosa 1906 (Bull. Bureau of Standards 2:161) correction of the Nagaoka current sheet (Lorenz form);
    // the correction neglects terms of order (p/a)² ≈ 4e-3 of the correction itself: 5e-4 of L (observed 1.1e-4)
    expectOutside({ quantity: "30-turn solenoid L (filament method)", source: "source: Nagaoka 1909 / Rosa 1906 round-wire correction (lib/em/classicFormulas.ts)", ours: selfInductance(coil), reference: ref, rtol: 5e-4, unit: "H" });
  });

  it("a rectangular turn matches Grover's rectangle formula; a polygon turn tends to the circle", () => {
    const r = 5e-4;
    for (const [w, h] of [[0.1, 0.1], [0.1, 0.05], [0.03, 0.02]] as const) {
      // source: Grover 1946, rectangle of round wire (Y = 1/4). Grover builds it from the same partial
      // inductances (straight wires + Neumann mutuals of opposite sides) and drops the same O(r/a) terms,
      // so the two agree to the quadrature tolerance (1e-9), not just to the formula's accuracy
      expectOutside({ quantity: `rectangle L (${w}×${h}, r=0.5 mm)`, source: "source: Grover 1946, rectangle formula (lib/em/classicFormulas.ts)", ours: selfInductance(rectTurn(w, h, 2 * r)), reference: groverRectangleInductance(w, h, r), rtol: 1e-9, unit: "H" });
    }
    // a 256-gon inscribed in a 20 mm circle: independent method (segments vs circle); the polygon's own
    // term differs from the circle's by O(1/n²) in area plus corner effects of order r/side (observed 7e-5)
    expectRelClose(selfInductance(polygonTurn(0.02, 256, 5e-4)), selfInductance(singleTurn(0.02, 5e-4)), 3e-4, "256-gon vs circle");
  });

  it("falls with frequency as Y goes from 1/4 to δ/(2r)", () => {
    const coil = handRoundCoil(0.02, 5, 2, 1e-3);
    const dc = selfInductance(coil);
    const hf = selfInductance(coil, { frequency: 1e7 });
    expect(hf).toBeLessThan(dc);
    // the difference is N·μ₀a·ΔY summed over turns: ΔY ≈ 1/4 − δ/(2r), δ(10 MHz) ≈ 20.9 µm, r = 0.5 mm
    const detail = selfInductanceDetail(coil, { frequency: 1e7 });
    expectRelClose(detail.Y, 0.25 / Math.pow(1 + Math.pow(0.5e-3 / 20.9e-6 / 2, 4.8), 1 / 4.8), 1e-2, "Y at 10 MHz");
  });

  it("the Y blend follows the exact Bessel internal inductance within 0.7 %", () => {
    for (const c of yFixture.cases) {
      // source: exact internal impedance of a round wire (Ramo, Whinnery & Van Duzer 1994 §5.5), mpmath; 0.7 % = the blend's max error
      expectOutside({ quantity: `Y(r/δ = ${c.x})`, source: `source: ${yFixture.source}`, ours: internalInductanceFactor(c.x), reference: c.Y, rtol: 7e-3 });
    }
  });

  it("a PCB-trace turn uses the rectangle's geometric mean distance 0.2235(w + t)", () => {
    const a = 0.02, w = 1e-3, t = 35e-6;
    const coil: Coil = { ...singleTurn(a, 1e-3), conductor: { kind: "trace", width: w, thickness: t } };
    // source: Grover 1946, Inductance Calculations (GMD of a rectangle ≈ 0.2235(w + t)); loop L = μ₀a[ln(8a/g) − 2]
    expectOutside({ quantity: "trace turn L (a=20 mm, 1 mm × 35 µm)", source: "source: Grover 1946, GMD of a rectangle with the ring formula", ours: selfInductance(coil), reference: MU0 * a * (Math.log((8 * a) / (0.2235 * (w + t))) - 2), rtol: 1e-14, unit: "H" });
  });

  it("rejects bad input and warns on thin-wire violations", () => {
    expect(() => selfInductance(singleTurn(0.01, 1e-3), { frequency: -1 })).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: selfInductance: options.frequency: must be ≥ 0 Hz, got -1]`);
    expect(selfInductanceDetail(singleTurn(0.001, 1e-3)).warnings.join()).toMatch(/wire radii/);
  });

  it("has the documented signature", () => {
    expectTypeOf(selfInductance).parameter(0).toEqualTypeOf<Coil>();
    expectTypeOf(selfInductance).returns.toEqualTypeOf<number>();
  });
});

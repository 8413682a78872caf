/**
 * Cross-checks of the filament method (selfInductance of builder coils) against the classic
 * closed forms of lib/em/classicFormulas.ts.
 *
 * The classic single-layer and flat-spiral formulas describe a *current sheet*: the current
 * spread uniformly over the winding's width. A coil of round wire or trace carries it in N
 * separate conductors, and the filament method models exactly that. The two differ by Rosa's
 * correction (Rosa 1906, Bull. Bur. Stand. 2:161), re-derived here from geometric mean distances:
 *   L_filaments − L_sheet = µ0·ā·N·[ln(g_strip/g_own) − B(N)],
 * g_strip = p·e^{−3/2} (a strip of width p, Maxwell), g_own the conductor's own GMD (round wire
 * r·e^{−1/4}; trace 0.2235(w + t), Grover 1946 — the value lib/em/selfInductance.ts uses) and
 * B(N) from rosaB. For round wire ln(g_strip/g_own) = −A with Rosa's A = 5/4 − ln(2p/d).
 * For close-wound solenoids this is −1.5 … −3 % of L: the tests state it and compare with it,
 * instead of widening the tolerance to hide it.
 */
import { describe, expect, it } from "vitest";
import { selfInductance } from "../../lib/em/selfInductance.ts";
import { mutualInductance } from "../../lib/em/mutualInductance.ts";
import { solenoid } from "../../lib/em/builders/solenoid.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { flatSpiral } from "../../lib/em/builders/flatSpiral.ts";
import { rectSpiral } from "../../lib/em/builders/rectSpiral.ts";
import { rectLoop } from "../../lib/em/builders/rectLoop.ts";
import {
  currentSheetInductance,
  groverRectangleInductance,
  lundinNagaokaCoefficient,
  mohanCurrentSheetInductance,
  mohanModifiedWheelerInductance,
  rosaB,
  rosaRoundWireCorrection,
  wheeler1982Inductance,
  wheelerFlatSpiralInductance,
  wheelerMultilayerInductance,
  wheelerSingleLayerInductance,
} from "../../lib/em/classicFormulas.ts";
import { MU0 } from "../../lib/constants.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import annulus from "../fixtures/em-formulas/annulus.json" with { type: "json" };
import multilayer from "../fixtures/em-formulas/multilayer.json" with { type: "json" };

type AnnulusCase = { rIn: number; rOut: number; LOverMu0N2: number };
const ANNULI = annulus.cases as AnnulusCase[];

/** Close-wound solenoids: radius a, turns N, bare d, outer (= pitch) od. */
const SOLENOIDS = [
  { a: 0.01, N: 20, d: 0.45e-3, od: 0.5e-3 },
  { a: 0.005, N: 40, d: 0.2e-3, od: 0.25e-3 },
  { a: 0.02, N: 10, d: 0.9e-3, od: 1e-3 },
  { a: 0.01, N: 60, d: 0.45e-3, od: 0.5e-3 },
  { a: 0.03, N: 10, d: 0.45e-3, od: 0.5e-3 },
] as const;

describe("solenoid against the Nagaoka current sheet", () => {
  for (const s of SOLENOIDS) {
    const coil = solenoid({ radius: s.a, turns: s.N, wire: { diameter: s.d, outerDiameter: s.od } });
    const ell = coil.shape.length;
    const L = selfInductance(coil);
    const sheet = currentSheetInductance(s.a, ell, s.N);
    const rosa = rosaRoundWireCorrection(s.a, s.N, s.od, s.d);
    const tag = `a=${s.a} m, N=${s.N}, D/l=${(2 * s.a) / ell}`;

    it(`${tag}: filaments = sheet − Rosa's round-wire correction (the sheet alone is 1.5–3 % high)`, () => {
      // the stated difference: the raw filament result sits below the sheet by Rosa's correction, 1.5–3 % here
      expect(rosa / sheet).toBeGreaterThan(0.01);
      expect(rosa / sheet).toBeLessThan(0.035);
      // With the correction: 5e-4. Rosa's A and B come from GMD arguments exact to O((p/a)²) in the
      // ring terms; 5e-4 is ~2 % of the correction itself (observed agreement is better than 1e-4).
      // source: Nagaoka 1909 (Lorenz exact form) with Rosa 1906 correction (form from memory, terms re-derived)
      expectOutside({ quantity: `close-wound solenoid L (${tag})`, source: "source: Nagaoka 1909 current sheet (exact Lorenz form) − Rosa 1906 round-wire correction (from memory, re-derived from GMDs)", ours: L, reference: sheet - rosa, rtol: 5e-4, unit: "H" });
      // Lundin's coefficient (±3 ppm) gives the same reference
      const lundinSheet = (lundinNagaokaCoefficient(s.a, ell) * MU0 * Math.PI * s.a * s.a * s.N * s.N) / ell;
      expectOutside({ quantity: `close-wound solenoid L via Lundin (${tag})`, source: "source: Lundin 1985, Proc. IEEE 73(9) − Rosa 1906 correction", ours: L, reference: lundinSheet - rosa, rtol: 5e-4, unit: "H" });
    });

    it(`${tag}: Wheeler 1982 within its 0.1 % of the filament result turned back into a sheet`, () => {
      // the 0.1 % claim plus the 5e-4 of the Rosa step
      expectOutside({ quantity: `Wheeler 1982 vs solenoid (${tag})`, source: "source: Wheeler 1982, Proc. IEEE 70(12), max error 0.1 %", ours: L + rosa, reference: wheeler1982Inductance(s.a, ell, s.N), rtol: 1.5e-3, unit: "H" });
    });

    if (ell > 0.8 * s.a) {
      it(`${tag}: Wheeler 1928 single-layer formula within its stated 1 % (b > 0.8a)`, () => {
        // source: Wheeler 1928, Proc. IRE 16(10): about 1 % for b > 0.8a (inches, µH → SI in the function)
        expectOutside({ quantity: `Wheeler 1928 single layer vs solenoid (${tag})`, source: "source: Wheeler 1928, Proc. IRE 16(10), about 1 % for b > 0.8a", ours: L + rosa, reference: wheelerSingleLayerInductance(s.a, ell, s.N), rtol: 0.01, unit: "H" });
      });
    }
  }
});

describe("roundCoil against the exact uniform-current multilayer coil", () => {
  const cases = multilayer.cases as { rIn: number; rOut: number; length: number; LOverMu0N2: number; richardsonChange: number }[];
  for (const [i, spec] of [
    { innerRadius: 0.007, turns: 156, layers: 12, wire: { diameter: 0.45e-3, outerDiameter: 0.5e-3 } },
    { innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 0.5e-3 } },
  ].entries()) {
    it(`${spec.turns} turns in ${spec.layers} layers: filaments = uniform-current coil + round-wire-in-square-cell correction`, () => {
      const c = roundCoil(spec);
      const ref = cases[i]!;
      expectRelClose(c.shape.innerRadius, ref.rIn, 1e-12, "same window (inner)");
      expectRelClose(c.shape.outerRadius, ref.rOut, 1e-12, "same window (outer)");
      expectRelClose(c.shape.windingHeight, ref.length, 1e-12, "same window (height)");
      const uniform = MU0 * spec.turns * spec.turns * ref.LOverMu0N2;
      // each turn's own GMD: round wire r·e^{−1/4} against its square cell's 0.44705·p (Maxwell); the cells' mutual
      // GMDs equal their centre distances to 4th order, so the own terms carry the whole correction (+0.1 … +0.2 %)
      const p = c.shape.axialPitch;
      const cell = MU0 * c.shape.meanRadius * spec.turns * Math.log((0.44705 * p) / (Math.exp(-0.25) * (spec.wire.diameter / 2)));
      // 5e-4: the correction's O((p/a)²) terms and the reference's extrapolation (≤ 5e-6); observed ≤ 2e-4
      expectOutside({ quantity: `roundCoil ${spec.turns} turns vs uniform-current coil + cell correction`, source: `${multilayer.source}; Maxwell's GMDs for the correction`, ours: selfInductance(c) - cell, reference: uniform, rtol: 5e-4, unit: "H" });
    });
  }
});

describe("roundCoil against Wheeler's multilayer formula", () => {
  it("a 156-turn coil with 6a ≈ 9b ≈ 10c agrees within Wheeler's stated 1 %", () => {
    // a = 10 mm, b = 6.5 mm, c = 6 mm: denominator terms 60, 58.5, 60 (about equal, Wheeler's best case).
    // Expected offset: Wheeler assumes uniform current over the cross-section; round wires in square cells of side p
    // have a smaller own GMD (0.7788·d/2 against 0.44705·p, Maxwell), raising the filament result by
    // µ0·Σa·ln(0.44705p/(0.7788·d/2)) ≈ +0.2 % here (the cells' mutual GMDs equal their centre distances to 4th order).
    const c = roundCoil({ innerRadius: 0.007, turns: 156, layers: 12, wire: { diameter: 0.45e-3, outerDiameter: 0.5e-3 } });
    const s = c.shape;
    const L = selfInductance(c);
    const cell = MU0 * s.meanRadius * 156 * Math.log((0.44705 * 0.5e-3) / (0.7788 * 0.225e-3));
    expect(cell / L).toBeGreaterThan(0.001);
    expect(cell / L).toBeLessThan(0.003);
    // source: Wheeler 1928, Proc. IRE 16(10): multilayer, about 1 % when 6a, 9b, 10c are about equal
    expectOutside({ quantity: "Wheeler 1928 multilayer vs roundCoil (a 10 mm, b 6.5 mm, c 6 mm, N 156)", source: "source: Wheeler 1928, Proc. IRE 16(10), about 1 % when the denominator terms are about equal", ours: L - cell, reference: wheelerMultilayerInductance(s.meanRadius, s.windingHeight, s.outerRadius - s.innerRadius, 156), rtol: 0.01, unit: "H" });
  });
});

/** Planar circular spirals of PCB trace (1 oz): inner edge, turns, pitch, width. */
const SPIRALS = [
  { inner: 0.005, N: 10, p: 0.6e-3, w: 0.4e-3 },
  { inner: 0.01, N: 5, p: 1e-3, w: 0.5e-3 },
  { inner: 0.003, N: 20, p: 0.3e-3, w: 0.2e-3 },
] as const;

describe("flatSpiral against Wheeler's flat-spiral formula and Mohan's circular current sheet", () => {
  for (const sp of SPIRALS) {
    const coil = flatSpiral({ innerRadius: sp.inner, turns: sp.N, pitch: sp.p, trace: { width: sp.w, thickness: "1 oz" } });
    const s = coil.shape;
    const L = selfInductance(coil);
    const t = coil.conductor.kind === "trace" ? coil.conductor.thickness : 0;
    const tag = `inner ${sp.inner} m, N=${sp.N}, p=${sp.p} m, w=${sp.w} m`;
    // ring radii r0 + (i + ½)p; the sheet spans N strips of width p around them
    const r0 = sp.inner + sp.w / 2;
    const meanRing = r0 + (sp.N * sp.p) / 2;
    // filament − sheet (Rosa's correction with the trace's GMD 0.2235(w + t) against the strip's p·e^{−3/2})
    const sheetCorrection = MU0 * meanRing * sp.N * (Math.log((sp.p * Math.exp(-1.5)) / (0.2235 * (sp.w + t))) - rosaB(sp.N));

    it(`${tag}: filaments = exact flat annular sheet + Rosa-type correction (independent double integral)`, () => {
      const sheetCase = ANNULI.find((x) => Math.abs(x.rIn - r0) < 1e-12 && Math.abs(x.rOut - (r0 + sp.N * sp.p)) < 1e-12);
      expect(sheetCase).toBeDefined();
      const sheet = MU0 * sp.N * sp.N * sheetCase!.LOverMu0N2;
      // the correction is −0.2 … +3 % of L here; with it the rings model meets the exact sheet. 5e-4 as for the
      // solenoids: the GMD terms are exact to O((p/a)²) in the ring terms (observed agreement ≤ 2e-4).
      expectOutside({ quantity: `flat spiral L vs exact annular sheet (${tag})`, source: `${annulus.source}; with Rosa's correction (Rosa 1906, re-derived)`, ours: L - sheetCorrection, reference: sheet, rtol: 5e-4, unit: "H" });
    });

    it(`${tag}: Wheeler 1928 flat spiral within its stated 5 % (c > 0.2a) of the sheet-equivalent`, () => {
      const c = s.outerRadius - s.innerRadius;
      expect(c).toBeGreaterThan(0.2 * s.meanRadius);
      // Wheeler's c and a are the sheet's: depth N·p, mean radius r0 + Np/2
      // source: Wheeler 1928, Proc. IRE 16(10): flat spiral, within 5 % for c > 0.2a
      expectOutside({ quantity: `Wheeler 1928 flat spiral vs flatSpiral (${tag})`, source: "source: Wheeler 1928, Proc. IRE 16(10), within 5 % for c > 0.2a", ours: L - sheetCorrection, reference: wheelerFlatSpiralInductance(meanRing, sp.N * sp.p, sp.N), rtol: 0.05, unit: "H" });
    });

    it(`${tag}: Mohan et al. circular current sheet within its typical 2–3 % of the trace coil`, () => {
      // Mohan's expressions are fits to real spirals (field solver), so they compare to the coil itself, not to a sheet.
      // d_in, d_out at the conductor edges of the equivalent rings
      const dIn = 2 * (r0 + sp.p / 2 - sp.w / 2);
      const dOut = 2 * (r0 + (sp.N - 0.5) * sp.p + sp.w / 2);
      // source: Mohan et al. 1999, IEEE JSSC 34(10) eq. (2): typical error 2–3 % (checked); circle coefficients from memory
      expectOutside({ quantity: `Mohan current sheet (circle) vs flatSpiral (${tag})`, source: "source: Mohan et al. 1999, IEEE JSSC 34(10), eq. (2), typical error 2–3 % (circle row from memory)", ours: L, reference: mohanCurrentSheetInductance(sp.N, dOut, dIn, "circle"), rtol: 0.03, unit: "H" });
    });
  }
});

describe("flat annular current sheets (exact double integral) against Mohan's and Wheeler's sheet formulas", () => {
  for (const x of ANNULI.slice(3)) {
    const a = (x.rIn + x.rOut) / 2;
    const c = x.rOut - x.rIn;
    const N = 10;
    const sheet = MU0 * N * N * x.LOverMu0N2;
    const rho = c / (2 * a);
    it(`fill ratio ρ = ${rho.toFixed(2)}: Mohan's circular current-sheet expression`, () => {
      // Mohan's eq. (2) is a current-sheet expression, so its natural reference is the exact sheet. The paper's 2–3 %
      // refers to real spirals; against the sheet we find ≤ 0.5 % over ρ = 0.05 … 0.8 and test at 1 %, which pins the
      // circle-row coefficients recalled from memory (c1 = 1, c2 = 2.46, c3 = 0, c4 = 0.20) to that level.
      expectOutside({ quantity: `Mohan current sheet (circle) vs exact annular sheet, ρ=${rho.toFixed(2)}`, source: "source: Mohan et al. 1999, IEEE JSSC 34(10), eq. (2), circle row (memory); reference: exact sheet double integral (mpmath)", ours: mohanCurrentSheetInductance(N, 2 * x.rOut, 2 * x.rIn, "circle"), reference: sheet, rtol: 0.01, unit: "H" });
    });
    if (c > 0.2 * a * (1 + 1e-9)) {
      it(`c/a = ${(c / a).toFixed(2)}: Wheeler's flat-spiral formula within its stated 5 %`, () => {
        // source: Wheeler 1928, Proc. IRE 16(10): within 5 % for c > 0.2a
        expectOutside({ quantity: `Wheeler 1928 flat spiral vs exact annular sheet, c/a=${(c / a).toFixed(2)}`, source: "source: Wheeler 1928, Proc. IRE 16(10), within 5 % for c > 0.2a", ours: wheelerFlatSpiralInductance(a, c, N), reference: sheet, rtol: 0.05, unit: "H" });
      });
    } else if (c < 0.15 * a) {
      it(`c/a = ${(c / a).toFixed(2)}: Wheeler's flat-spiral formula is not meant for narrow rings (more than 5 % off)`, () => {
        expect(Math.abs(wheelerFlatSpiralInductance(a, c, N) / sheet - 1)).toBeGreaterThan(0.05);
      });
    }
  }
});

describe("flatSpiral: the rings model against the true spiral polygon", () => {
  it("concentric rings at each turn's mean radius agree with the spiral polygon (with its return lead) within 0.5 %", () => {
    // Independent-method check of the rings approximation. Expected difference: the return lead (a radial path one
    // pitch below the plane, ≈ 0.2 % of L by its partial inductance) plus the polygon's chord error; the polygon's
    // straight-segment own terms are thin-wire forms, good while segments are several conductor GMDs long (64 per turn:
    // 0.8–1 mm against a 0.12 mm GMD). 0.5 % covers both; at 16 chords a turn the polygon is 1 % low.
    for (const sp of [SPIRALS[1], { inner: 0.005, N: 6, p: 0.6e-3, w: 0.4e-3 }] as const) {
      const base = { innerRadius: sp.inner, turns: sp.N, pitch: sp.p, trace: { width: sp.w, thickness: "1 oz" } } as const;
      const rings = selfInductance(flatSpiral(base));
      const spiral = selfInductance(flatSpiral({ ...base, model: "spiral", segmentsPerTurn: 64 }));
      expectRelClose(rings, spiral, 5e-3, `rings vs spiral, N=${sp.N}`);
    }
  });
});

describe("rectSpiral against Mohan et al.'s square-spiral expressions", () => {
  for (const sq of [
    { W: 0.03, N: 5, p: 1e-3, w: 0.5e-3 },
    { W: 0.02, N: 10, p: 0.5e-3, w: 0.3e-3 },
  ] as const) {
    it(`square spiral ${sq.W} m, N=${sq.N}: modified Wheeler and current sheet within their typical 2–3 %`, () => {
      const coil = rectSpiral({ outerWidth: sq.W, outerHeight: sq.W, turns: sq.N, pitch: sq.p, trace: { width: sq.w, thickness: "1 oz" } });
      const L = selfInductance(coil);
      const dIn = coil.shape.innerWidth;
      // source: Mohan et al. 1999, IEEE JSSC 34(10) eqs. (1), (2), square rows (checked): typical error 2–3 %
      expectOutside({ quantity: `Mohan modified Wheeler (square) vs rectSpiral ${sq.W} m N=${sq.N}`, source: "source: Mohan et al. 1999, IEEE JSSC 34(10), eq. (1), K1 = 2.34, K2 = 2.75", ours: L, reference: mohanModifiedWheelerInductance(sq.N, sq.W, dIn, "square"), rtol: 0.03, unit: "H" });
      expectOutside({ quantity: `Mohan current sheet (square) vs rectSpiral ${sq.W} m N=${sq.N}`, source: "source: Mohan et al. 1999, IEEE JSSC 34(10), eq. (2), c = 1.27, 2.07, 0.18, 0.13", ours: L, reference: mohanCurrentSheetInductance(sq.N, sq.W, dIn, "square"), rtol: 0.03, unit: "H" });
    });
  }
});

describe("rectLoop against Grover's rectangle formula", () => {
  for (const r of [
    { a: 0.1, b: 0.05, d: 1e-3 },
    { a: 0.05, b: 0.05, d: 0.2e-3 },
    { a: 0.2, b: 0.02, d: 2e-3 },
  ] as const) {
    it(`${r.a} m × ${r.b} m of ${r.d} m wire: equal to rounding (the same thin-wire partial inductances)`, () => {
      // Grover's formula is the sum of the four sides' partial self-inductances minus the opposite sides' mutuals
      // (thin wire, Y = 1/4); the filament method assembles the same terms, so only rounding separates them
      // source: Grover 1946, Inductance Calculations, rectangle of round wire (also Rosa 1908)
      expectOutside({ quantity: `rectangle ${r.a}×${r.b} m, d=${r.d} m`, source: "source: Grover 1946, Inductance Calculations, rectangle formula", ours: selfInductance(rectLoop({ width: r.a, height: r.b, wire: { diameter: r.d } })), reference: groverRectangleInductance(r.a, r.b, r.d / 2), rtol: 1e-12, unit: "H" });
    });
  }
});

describe("polygon turns against circle turns (independent method: the polygon machinery against the circle closed form)", () => {
  const a = 0.02;
  const d = 0.5e-3;
  const circle = solenoid({ radius: a, turns: 1, wire: { diameter: d } });
  const rounded = (cornerSegments: number) =>
    rectSpiral({ outerWidth: 2 * a + d, outerHeight: 2 * a + d, cornerRadius: a + d / 2, turns: 1, pitch: d, cornerSegments, wire: { diameter: d } });

  it("a square with corner radius = half its side is a circle: its L converges to µ0a(ln(8a/r) − 7/4) quadratically in the chord angle", () => {
    const Lc = selfInductance(circle);
    const e16 = selfInductance(rounded(16)) / Lc - 1;
    const e32 = selfInductance(rounded(32)) / Lc - 1;
    // chords of Δθ = 90°/n: the polygon's area and perimeter fall short by O(Δθ²); halving Δθ quarters the error
    expectRelClose(e16 / e32, 4, 0.1, "quadratic convergence");
    // at 32 chords a quarter the shortfall is ≈ 2.7e-4; 5e-4 allows it
    expectRelClose(selfInductance(rounded(32)), Lc, 5e-4, "128-gon vs circle");
  });

  it("polygons circulate in the same sense as circle filaments (counter-clockwise about +z): coaxial pairs couple positively", () => {
    const square = rectLoop({ width: 0.04, height: 0.04, wire: { diameter: d } });
    const here = { position: [0, 0, 0] as const };
    const above = { position: [0, 0, 0.01] as const };
    expect(mutualInductance(square, here, circle, above)).toBeGreaterThan(0);
    // a 40 mm square and a 40 mm circle 10 mm apart link about as much flux as two such circles (square area 4/π larger)
    const ratio = mutualInductance(square, here, circle, above) / mutualInductance(circle, here, circle, above);
    expect(ratio).toBeGreaterThan(1);
    expect(ratio).toBeLessThan(4 / Math.PI);
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { packPolygons, packedPolygonMutual, polygonPairMutual, straightFilamentMutual } from "../../lib/em/straightMutual.ts";
import { segmentMutual, straightWireSelfInductance } from "../../lib/em/polygonMutual.ts";
import { groverRectangleInductance } from "../../lib/em/classicFormulas.ts";
import { integrateAdaptive } from "../../lib/math/quadrature.ts";
import { MU0 } from "../../lib/constants.ts";
import type { Vec3 } from "../../lib/em/types.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

const K = MU0 / (4 * Math.PI);

/**
 * Independent method: Neumann's double integral (μ₀/4π)·ŝ₁·ŝ₂·∬ ds₁ds₂/R by nested adaptive
 * Gauss–Kronrod, no closed form anywhere (the 1/R corner singularity of touching ends is
 * integrable and handled by the adaptive rule).
 */
function neumann(p1: Vec3, q1: Vec3, p2: Vec3, q2: Vec3): number {
  const a = [q1[0] - p1[0], q1[1] - p1[1], q1[2] - p1[2]];
  const b = [q2[0] - p2[0], q2[1] - p2[1], q2[2] - p2[2]];
  const l = Math.hypot(a[0]!, a[1]!, a[2]!), m = Math.hypot(b[0]!, b[1]!, b[2]!);
  const c = (a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!) / (l * m);
  const outer = (s: number): number => {
    const x = p1[0] + (a[0]! * s) / l, y = p1[1] + (a[1]! * s) / l, z = p1[2] + (a[2]! * s) / l;
    return integrateAdaptive((t) => 1 / Math.hypot(x - p2[0] - (b[0]! * t) / m, y - p2[1] - (b[1]! * t) / m, z - p2[2] - (b[2]! * t) / m), 0, m, { relTol: 1e-12, absTol: 1e-15 }).value;
  };
  return K * c * integrateAdaptive(outer, 0, l, { relTol: 1e-11, absTol: 1e-15 }).value;
}

// pairs named by regime; lengths in m
const cases: { name: string; seg: [Vec3, Vec3, Vec3, Vec3] }[] = [
  { name: "touching ends, collinear", seg: [[0, 0, 0], [0.1, 0, 0], [0.1, 0, 0], [0.25, 0, 0]] },
  { name: "collinear with a gap", seg: [[0, 0, 0], [0.1, 0, 0], [0.13, 0, 0], [0.2, 0, 0]] },
  { name: "collinear, opposite directions", seg: [[0, 0, 0], [0.1, 0, 0], [0.3, 0, 0], [0.12, 0, 0]] },
  { name: "touching ends at 60°", seg: [[0, 0, 0], [0.1, 0, 0], [0.1, 0, 0], [0.15, 0.0866, 0]] },
  { name: "touching ends at 150° (a sharp vee)", seg: [[0, 0, 0], [0.1, 0, 0], [0.1, 0, 0], [0.02, 0.03, 0.01]] },
  { name: "parallel, equal, side by side", seg: [[0, 0, 0], [0.1, 0, 0], [0, 0.01, 0], [0.1, 0.01, 0]] },
  { name: "parallel, offset, unequal", seg: [[0, 0, 0], [0.1, 0, 0], [0.06, 0.004, 0.003], [0.21, 0.004, 0.003]] },
  { name: "antiparallel, overlapping span, 1 mm apart", seg: [[0, 0, 0], [0.1, 0, 0], [0.15, 0.001, 0], [0.05, 0.001, 0]] },
  { name: "skew, crossing at 1 mm", seg: [[-0.05, 0, 0], [0.05, 0, 0], [0.01, -0.04, 0.001], [0.03, 0.06, 0.001]] },
  { name: "skew, general", seg: [[0, 0, 0], [0.1, 0, 0], [0.02, 0.03, 0.04], [0.09, 0.11, 0.05]] },
  { name: "coplanar, lines intersect outside both", seg: [[0, 0, 0], [0.1, 0, 0], [0.15, 0.02, 0], [0.3, 0.2, 0]] },
  { name: "skew, one end near the other's line", seg: [[0, 0, 0], [0.1, 0, 0], [0.05, 1e-4, 2e-4], [0.05, 0.07, 0.03]] },
  { name: "far apart (Gauss–Legendre far field)", seg: [[0, 0, 0], [0.01, 0, 0], [0.5, 0.3, 0.2], [0.51, 0.306, 0.19]] },
];

describe("straightFilamentMutual (closed form, Campbell/Grover)", () => {
  it("agrees with the filament double integral for touching, collinear, parallel-offset and skew pairs", () => {
    for (const { name, seg } of cases) {
      // independent method: nested adaptive Neumann integral at 1e-11; the closed form is exact to rounding
      expectOutside({ quantity: `M segments: ${name}`, source: "independent method: Neumann double integral, nested adaptive Gauss–Kronrod", ours: straightFilamentMutual(...seg), reference: neumann(...seg), rtol: 1e-9, unit: "H" });
    }
  });

  it("two equal parallel filaments: Grover's (μ₀/2π)l[ln(l/d + √(1 + l²/d²)) − √(1 + d²/l²) + d/l]", () => {
    for (const [l, d] of [[0.1, 0.01], [1, 0.001], [0.05, 0.2]] as const) {
      const ref = (MU0 / (2 * Math.PI)) * l * (Math.log(l / d + Math.sqrt(1 + (l * l) / (d * d))) - Math.sqrt(1 + (d * d) / (l * l)) + d / l);
      // source: Grover 1946, Inductance Calculations, ch. 5 eq. (1) (also Rosa 1908); exact formula, rounding only
      expectOutside({ quantity: `parallel filaments l=${l} m, d=${d} m`, source: "source: Grover 1946, ch. 5, equal parallel filaments", ours: straightFilamentMutual([0, 0, 0], [l, 0, 0], [0, d, 0], [l, d, 0]), reference: ref, rtol: 1e-12, unit: "H" });
    }
  });

  it("collinear filaments meeting end to end: (μ₀/4π)[(l+m)ln(l+m) − l ln l − m ln m]", () => {
    const l = 0.1, m = 0.15;
    const ref = K * ((l + m) * Math.log(l + m) - l * Math.log(l) - m * Math.log(m));
    // from memory (unverified): Grover 1946 ch. 5, filaments in line; also confirmed by the double integral above
    expectOutside({ quantity: "collinear touching l=0.1, m=0.15 m", source: "from memory (unverified): Grover 1946 ch. 5, collinear filaments", ours: straightFilamentMutual([0, 0, 0], [l, 0, 0], [l, 0, 0], [l + m, 0, 0]), reference: ref, rtol: 1e-13, unit: "H" });
  });

  it("filaments meeting at a point: (μ₀/4π)·2cos ε[l·atanh(m/(l+R)) + m·atanh(l/(m+R))]", () => {
    // both directed away from the common point, ε the angle between them, R the third side
    for (const eps of [0.3, 1.0, 2.0, 2.8]) {
      const l = 0.08, m = 0.05;
      const R = Math.sqrt(l * l + m * m - 2 * l * m * Math.cos(eps));
      const ref = K * 2 * Math.cos(eps) * (l * Math.atanh(m / (l + R)) + m * Math.atanh(l / (m + R)));
      const ours = straightFilamentMutual([0, 0, 0], [l, 0, 0], [0, 0, 0], [m * Math.cos(eps), m * Math.sin(eps), 0]);
      // from memory (unverified): Grover 1946 ch. 6, two filaments meeting at a point
      expectOutside({ quantity: `filaments meeting at ε=${eps}`, source: "from memory (unverified): Grover 1946 ch. 6, filaments meeting at a point", ours, reference: ref, rtol: 1e-12, unit: "H" });
    }
  });

  it("agrees with the adaptive segment-potential integral over random pairs, both signs of every regime", () => {
    const coord = fc.double({ min: -0.1, max: 0.1, noNaN: true });
    const pt = fc.tuple(coord, coord, coord);
    fc.assert(
      fc.property(pt, pt, pt, pt, (p1, q1, p2, q2) => {
        fc.pre(Math.hypot(q1[0] - p1[0], q1[1] - p1[1], q1[2] - p1[2]) > 1e-3 && Math.hypot(q2[0] - p2[0], q2[1] - p2[1], q2[2] - p2[2]) > 1e-3);
        // the adaptive reference samples the wire itself when the segments touch or cross: keep them
        // apart (point-to-segment distance along 401 points of segment 1: within 0.5 mm of the true gap)
        let gap = Infinity;
        const b = [q2[0] - p2[0], q2[1] - p2[1], q2[2] - p2[2]] as const;
        const bb = b[0] * b[0] + b[1] * b[1] + b[2] * b[2];
        for (let i = 0; i <= 400; i++) {
          const u = i / 400;
          const x = [p1[0] + u * (q1[0] - p1[0]) - p2[0], p1[1] + u * (q1[1] - p1[1]) - p2[1], p1[2] + u * (q1[2] - p1[2]) - p2[2]] as const;
          const v = Math.min(1, Math.max(0, (x[0] * b[0] + x[1] * b[1] + x[2] * b[2]) / bb));
          gap = Math.min(gap, Math.hypot(x[0] - v * b[0], x[1] - v * b[1], x[2] - v * b[2]));
        }
        fc.pre(gap > 1e-3);
        const ref = segmentMutual(p1, q1, p2, q2, 1e-12);
        const ours = straightFilamentMutual(p1, q1, p2, q2);
        // independent method (closed-form inner, adaptive outer); absolute floor for near-perpendicular pairs
        expectRelClose(ours, ref, 1e-9, "random pair", 1e-9 * K * 0.1);
      }),
      { numRuns: 300, seed: 13 },
    );
  });

  it("is symmetric, reverses sign with a segment, gives 0 for perpendicular segments", () => {
    const [p1, q1, p2, q2] = cases[9]!.seg;
    const m = straightFilamentMutual(p1, q1, p2, q2);
    expectRelClose(straightFilamentMutual(p2, q2, p1, q1), m, 1e-13, "symmetry");
    expectRelClose(straightFilamentMutual(q1, p1, p2, q2), -m, 1e-13, "reversal");
    expect(straightFilamentMutual([0, 0, 0], [0.1, 0, 0], [0.05, 0.01, 0], [0.05, 0.05, 0])).toBe(0);
  });

  it("is continuous across the nearly-parallel band (closed skew form ↔ adaptive ↔ parallel limit)", () => {
    const at = (eps: number) => straightFilamentMutual([0, 0, 0], [0.1, 0, 0], [0.02, 0.005, 0], [0.02 + 0.1 * Math.cos(eps), 0.005 + 0.1 * Math.sin(eps), 0]);
    const m0 = at(0);
    // dM/dε is finite: the values approach the parallel one linearly in ε
    for (const eps of [1e-11, 1e-8, 1e-5, 9e-4, 1.1e-3]) {
      expectRelClose(at(eps), m0, 20 * eps + 1e-12, `ε = ${eps}`);
      expectRelClose(at(eps), neumann([0, 0, 0], [0.1, 0, 0], [0.02, 0.005, 0], [0.02 + 0.1 * Math.cos(eps), 0.005 + 0.1 * Math.sin(eps), 0]), 1e-9, `ε = ${eps} vs double integral`);
    }
  });

  it("rejects overlapping collinear segments and bad points", () => {
    expect(() => straightFilamentMutual([0, 0, 0], [0.1, 0, 0], [0.05, 0, 0], [0.2, 0, 0])).toThrow(/overlap|share length/);
    expect(() => straightFilamentMutual([0, 0, NaN], [0.1, 0, 0], [0, 1, 0], [1, 1, 0])).toThrow(/p1/);
  });

  it("has the documented signature", () => {
    expectTypeOf(straightFilamentMutual).returns.toEqualTypeOf<number>();
    expectTypeOf(polygonPairMutual).parameters.toEqualTypeOf<[readonly Vec3[], readonly Vec3[]]>();
  });
});

const rect = (a: number, b: number, z = 0, x0 = 0, y0 = 0): Vec3[] => [
  [x0 - a / 2, y0 - b / 2, z], [x0 + a / 2, y0 - b / 2, z], [x0 + a / 2, y0 + b / 2, z], [x0 - a / 2, y0 + b / 2, z],
];

/** Self-inductance of one polygon turn: partial self-inductances of its sides plus the closed-form mutuals between them. */
function polygonSelf(points: Vec3[], r: number, Y: number): number {
  const segs = points.map((p, i) => [p, points[(i + 1) % points.length]!] as const);
  let L = 0;
  segs.forEach(([p, q], i) => {
    L += straightWireSelfInductance(Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]), r, Y);
    segs.forEach(([p2, q2], j) => { if (i !== j) L += straightFilamentMutual(p, q, p2, q2); });
  });
  return L;
}

describe("rectangles (Grover)", () => {
  it("square and rectangular loop self-inductance match Grover's rectangle formula", () => {
    for (const [a, b, r] of [[0.1, 0.1, 5e-4], [0.4, 0.4, 1e-3], [0.2, 0.05, 2.5e-4]] as const) {
      const ours = polygonSelf(rect(a, b), r, 0.25);
      // source: Grover 1946, Inductance Calculations, rectangle formula (groverRectangleInductance); both
      // neglect terms of order ρ/a in the partial self-inductances, so they agree to rounding
      expectOutside({ quantity: `rectangle ${a}×${b} m, ρ=${r} m, L`, source: "source: Grover 1946, rectangle of round wire", ours, reference: groverRectangleInductance(a, b, r), rtol: 1e-12, unit: "H" });
    }
    // square of side a: (2μ₀a/π)(ln(a/ρ) − 0.524) at DC
    const a = 0.1, rho = 5e-4;
    // source: Grover 1946, square of round wire (DC form, constant 0.524 rounded to 3 decimals: 1e-3·… of the bracket)
    expectOutside({ quantity: "square 10 cm, ρ = 0.5 mm", source: "source: Grover 1946, square loop, L = (2μ₀a/π)(ln(a/ρ) − 0.524)", ours: polygonSelf(rect(a, a), rho, 0.25), reference: ((2 * MU0 * a) / Math.PI) * (Math.log(a / rho) - 0.524), rtol: 2e-4, unit: "H" });
  });

  it("two coaxial equal rectangles: Grover's closed form", () => {
    for (const [a, b, d] of [[0.1, 0.1, 0.02], [0.4, 0.2, 0.05], [0.05, 0.03, 0.3]] as const) {
      const g = Math.sqrt(a * a + b * b + d * d);
      const ad = Math.hypot(a, d), bd = Math.hypot(b, d);
      const ref = (MU0 / Math.PI) * (
        a * Math.log(((a + ad) * bd) / ((a + g) * d)) +
        b * Math.log(((b + bd) * ad) / ((b + g) * d)) +
        2 * (g - ad - bd + d));
      const ours = polygonPairMutual(rect(a, b), rect(a, b, d));
      // from memory (unverified): Grover 1946, two equal parallel coaxial rectangles; independent of the code's formulas
      expectOutside({ quantity: `coaxial rectangles ${a}×${b} m at ${d} m`, source: "from memory (unverified): Grover 1946, equal coaxial rectangles", ours, reference: ref, rtol: 1e-11, unit: "H" });
    }
  });

  it("packed sums weight each polygon by its turns and are reciprocal", () => {
    const A = packPolygons([{ points: rect(0.2, 0.1), turns: 3 }]);
    const B = packPolygons([{ points: rect(0.05, 0.05, 0.02, 0.03, 0.01), turns: 2 }]);
    const m1 = polygonPairMutual(rect(0.2, 0.1), rect(0.05, 0.05, 0.02, 0.03, 0.01));
    expectRelClose(packedPolygonMutual(A, B), 6 * m1, 1e-13, "weights");
    expectRelClose(packedPolygonMutual(B, A), 6 * m1, 1e-13, "reciprocity");
  });
});

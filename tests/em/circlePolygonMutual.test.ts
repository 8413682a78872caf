import { describe, expect, expectTypeOf, it } from "vitest";
import { circlePolygonMutual } from "../../lib/em/circlePolygonMutual.ts";
import { polygonPairMutual } from "../../lib/em/straightMutual.ts";
import { circleSegmentMutual } from "../../lib/em/polygonMutual.ts";
import { loopMutualInductance, type CircleFilament } from "../../lib/em/loopMutual.ts";
import { segmentVectorPotential } from "../../lib/em/segmentPotential.ts";
import { addSegmentField } from "../../lib/em/segmentField.ts";
import { integrateAdaptive } from "../../lib/math/quadrature.ts";
import { MU0 } from "../../lib/constants.ts";
import type { Vec3 } from "../../lib/em/types.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

/** A regular n-gon inscribed in a circle (centre, unit normal n, radius r), counter-clockwise about n. */
function ngon(c: CircleFilament, n: number): Vec3[] {
  const [nx, ny, nz] = c.axis;
  const u: Vec3 = Math.abs(nx) < 0.9 ? norm([1 - nx * nx, -nx * ny, -nx * nz]) : norm([-ny * nx, 1 - ny * ny, -ny * nz]);
  const v: Vec3 = [ny * u[2] - nz * u[1], nz * u[0] - nx * u[2], nx * u[1] - ny * u[0]];
  return Array.from({ length: n }, (_, i) => {
    const t = (2 * Math.PI * i) / n;
    return [0, 1, 2].map((k) => c.center[k]! + c.radius * (Math.cos(t) * u[k]! + Math.sin(t) * v[k]!)) as unknown as Vec3;
  });
}
function norm(v: Vec3): Vec3 {
  const l = Math.hypot(...v);
  return [v[0] / l, v[1] / l, v[2] / l];
}

const big: CircleFilament = { center: [0, 0, 0], axis: [0, 0, 1], radius: 0.1 };
const token: CircleFilament = { center: [0.07, 0.02, 0.015], axis: norm([0.3, -0.2, 1]), radius: 0.006 };
const square: Vec3[] = [[-0.1, -0.1, 0], [0.1, -0.1, 0], [0.1, 0.1, 0], [-0.1, 0.1, 0]];

describe("circlePolygonMutual (a circle through the polygon's closed-form segment potential)", () => {
  it("a round coil as a 256-sided polygon agrees with the circle path, converging as 1/n²", () => {
    const ref = loopMutualInductance(big, token, { relTol: 1e-12 });
    const e128 = circlePolygonMutual(token, ngon(big, 128)) / ref - 1;
    const e256 = circlePolygonMutual(token, ngon(big, 256)) / ref - 1;
    // independent method (circle–circle line integral of the elliptic-integral potential); the inscribed
    // 256-gon differs from the circle by O((π/n)²) ≈ 1.5e-4: tolerance 3e-4, and the error falls 4× per doubling
    expectOutside({ quantity: "token over a 256-gon vs over the circle", source: "independent method: circle–circle line integral (loopMutualInductance)", ours: circlePolygonMutual(token, ngon(big, 256)), reference: ref, rtol: 3e-4, unit: "H" });
    expectRelClose(e128 / e256, 4, 0.02, "second-order convergence");
    // both as polygons (closed-form segment pairs): the same limit
    const pp = polygonPairMutual(ngon(token, 256), ngon(big, 256));
    expectOutside({ quantity: "256-gon token over a 256-gon vs circles", source: "independent method: circle–circle line integral (loopMutualInductance)", ours: pp, reference: ref, rtol: 3e-4, unit: "H" });
  });

  it("agrees with the reciprocal route: the polygon's sides through the circle's elliptic-integral potential", () => {
    for (const c of [token, { center: [0.1, 0.003, 0.004], axis: [0, 0, 1], radius: 0.006 } as CircleFilament, { center: [0.02, 0.02, 0.3], axis: norm([1, 0, 1]), radius: 0.05 } as CircleFilament]) {
      let ref = 0;
      for (let i = 0; i < 4; i++) ref += circleSegmentMutual(c.center, c.axis, c.radius, square[i]!, square[(i + 1) % 4]!, 1e-12);
      // independent method: reciprocity (∮_polygon A_circle·dl, adaptive Gauss–Kronrod, polygonMutual.ts)
      expectOutside({ quantity: `circle r=${c.radius} m at [${c.center.join(", ")}] over a 20 cm square`, source: "independent method: reciprocity, circle potential along the square's sides", ours: circlePolygonMutual(c, square), reference: ref, rtol: 1e-9, unit: "H" });
    }
  });

  it("is zero by symmetry for a circle standing upright over the square's centre", () => {
    const v = circlePolygonMutual({ center: [0, 0, 0.03], axis: [1, 0, 0], radius: 0.01 }, square);
    const scale = circlePolygonMutual({ center: [0, 0, 0.03], axis: [0, 0, 1], radius: 0.01 }, square);
    expect(Math.abs(v)).toBeLessThan(1e-12 * Math.abs(scale));
  });

  it("rejects bad input and a circle through the wire", () => {
    expect(() => circlePolygonMutual({ center: [0, 0, 0], axis: [0, 0, 1], radius: -1 }, square)).toThrow(/circle.radius/);
    expect(() => circlePolygonMutual({ center: [0.09, 0, 0], axis: [0, 1, 0], radius: 0.01 }, square)).toThrow(/wire/);
    expect(() => circlePolygonMutual({ center: [0.09, 0, 0.0], axis: [0, 1, 0.001], radius: 0.01 }, square)).toThrow(/wire/);
  });

  it("has the documented signature", () => {
    expectTypeOf(circlePolygonMutual).returns.toEqualTypeOf<number>();
  });
});

describe("segmentVectorPotential", () => {
  it("equals (μ₀I/4π)∫ dl/R along the segment, near, far and on the extension of the wire", () => {
    const p: Vec3 = [0.01, -0.02, 0.005], q: Vec3 = [0.05, 0.03, -0.01];
    const L = Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]);
    for (const x of [[0.02, 0.0, 0.0], [0.03, 0.005, -0.0025 + 1e-6], [1, 2, 3], [0.09, 0.08, -0.025]] as Vec3[]) {
      const ref = (MU0 / (4 * Math.PI)) * 2 * integrateAdaptive((l) => 1 / Math.hypot(x[0] - p[0] - ((q[0] - p[0]) * l) / L, x[1] - p[1] - ((q[1] - p[1]) * l) / L, x[2] - p[2] - ((q[2] - p[2]) * l) / L), 0, L, { relTol: 1e-13, absTol: 0 }).value;
      const A = segmentVectorPotential(p, q, 2, x);
      // independent method: direct quadrature of the Biot–Savart potential μ₀I/(4π)∫dl/R
      expectOutside({ quantity: `segment A at [${x.join(", ")}]`, source: "independent method: adaptive quadrature of ∫dl/R", ours: Math.hypot(...A), reference: ref, rtol: 1e-11, unit: "T·m" });
      expectRelClose((A[0] * (q[0] - p[0]) + A[1] * (q[1] - p[1]) + A[2] * (q[2] - p[2])) / L, ref, 1e-11, "A along ŝ");
    }
  });

  it("approaches the infinite-wire potential difference (μ₀I/2π)ln(d₂/d₁) for a long segment", () => {
    const L = 1000;
    const a1 = segmentVectorPotential([0, 0, -L], [0, 0, L], 1, [0.01, 0, 0])[2];
    const a2 = segmentVectorPotential([0, 0, -L], [0, 0, L], 1, [0.03, 0, 0])[2];
    // source: the infinite straight wire, A_z(d₁) − A_z(d₂) = (μ₀I/2π)ln(d₂/d₁) (any electromagnetics text); (d/L)² = 1e-9
    expectOutside({ quantity: "long wire A(1 cm) − A(3 cm)", source: "source: infinite straight wire potential (μ₀I/2π)ln(d₂/d₁)", ours: a1 - a2, reference: (MU0 / (2 * Math.PI)) * Math.log(3), rtol: 1e-8, unit: "T·m" });
  });

  it("its curl is the segment's Biot–Savart field (central differences)", () => {
    const p: Vec3 = [0, 0, 0], q: Vec3 = [0.04, 0.01, 0.02], x: Vec3 = [0.01, 0.02, -0.005];
    const h = 1e-6;
    const A = (dx: number, dy: number, dz: number) => segmentVectorPotential(p, q, 1, [x[0] + dx, x[1] + dy, x[2] + dz]);
    const d = (k: number, axis: 0 | 1 | 2) => {
      const e = [0, 0, 0] as [number, number, number];
      e[axis] = h;
      return (A(e[0], e[1], e[2])[k]! - A(-e[0], -e[1], -e[2])[k]!) / (2 * h);
    };
    const curl = [d(2, 1) - d(1, 2), d(0, 2) - d(2, 0), d(1, 0) - d(0, 1)];
    const B = new Float64Array(3);
    addSegmentField(p[0], p[1], p[2], q[0], q[1], q[2], 1, x[0], x[1], x[2], B);
    // independent method: closed-form Biot–Savart field (segmentField.ts); central differences O(h²)
    for (let k = 0; k < 3; k++) expectRelClose(curl[k]!, B[k]!, 1e-6, `curl A [${k}]`, 1e-6 * Math.hypot(...B));
  });

  it("rejects a point on the segment and a zero-length segment", () => {
    expect(() => segmentVectorPotential([0, 0, 0], [1, 0, 0], 1, [0.5, 0, 0])).toThrow(/lies on the segment/);
    expect(() => segmentVectorPotential([0, 0, 0], [0, 0, 0], 1, [0.5, 0, 0])).toThrow(/zero length/);
  });
});

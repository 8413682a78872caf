import { describe, expect, it } from "vitest";
import { circleSegmentMutual, segmentMutual, straightWireSelfInductance } from "../../lib/em/polygonMutual.ts";
import { loopMutualInductance } from "../../lib/em/loopMutual.ts";
import { MU0 } from "../../lib/constants.ts";
import type { Vec3 } from "../../lib/em/types.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

describe("segmentMutual / circleSegmentMutual", () => {
  it("two equal parallel filaments: (μ₀/2π)[l·asinh(l/d) − √(l² + d²) + d]", () => {
    for (const [l, d] of [[0.1, 0.01], [0.01, 0.1], [0.05, 1e-4]] as const) {
      const ref = (MU0 / (2 * Math.PI)) * (l * Math.asinh(l / d) - Math.hypot(l, d) + d);
      // source: Grover 1946, Inductance Calculations, ch. 5, two equal parallel filaments (Neumann); 1e-9: quadrature tolerance
      expectOutside({ quantity: `parallel filaments M (l=${l}, d=${d})`, source: "source: Grover 1946, ch. 5, equal parallel filaments", ours: segmentMutual([0, 0, 0], [l, 0, 0], [0, d, 0], [l, d, 0]), reference: ref, rtol: 1e-9, unit: "H" });
    }
  });

  it("is symmetric, antisymmetric in direction, zero for perpendicular segments, finite for segments meeting at a vertex", () => {
    const a: [Vec3, Vec3] = [[0, 0, 0], [0.03, 0.01, 0]];
    const b: [Vec3, Vec3] = [[0.01, 0.02, 0.005], [0.05, -0.01, 0.02]];
    const m = segmentMutual(a[0], a[1], b[0], b[1]);
    expectRelClose(segmentMutual(b[0], b[1], a[0], a[1]), m, 1e-9, "symmetry");
    expectRelClose(segmentMutual(a[0], a[1], b[1], b[0]), -m, 1e-12, "reversal");
    expect(segmentMutual([0, 0, 0], [1, 0, 0], [0, 0, 0], [0, 1, 0])).toBe(0);
    const v = segmentMutual([0, 0, 0], [0.01, 0, 0], [0.01, 0, 0], [0.02, 0.01, 0]);
    expect(Number.isFinite(v) && v > 0).toBe(true);
    expect(() => segmentMutual([0, 0, 0], [1, 0, 0], [0.5, 0, 0], [2, 0, 0])).toThrow(/overlap/);
  });

  it("a circle against a 1000-gon equals the circle–circle line integral (O(1/n²))", () => {
    const center: Vec3 = [0.01, 0, 0.02];
    const axis: Vec3 = [0, 0, 1];
    const R = 0.015;
    const n = 1000;
    const r = 0.01;
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const t0 = (2 * Math.PI * i) / n, t1 = (2 * Math.PI * (i + 1)) / n;
      sum += circleSegmentMutual(center, axis, R, [r * Math.cos(t0), r * Math.sin(t0), 0], [r * Math.cos(t1), r * Math.sin(t1), 0]);
    }
    const ref = loopMutualInductance({ center, axis, radius: R }, { center: [0, 0, 0], axis: [0, 0, 1], radius: r });
    // independent method; the inscribed 1000-gon differs from the circle by ≈ (2π²/3)/n² = 6.6e-6
    expectRelClose(sum, ref, 2e-5, "1000-gon vs circle");
  });

  it("straight wire partial self-inductance is Grover's (μ₀/2π)l[ln(2l/r) − 3/4] at DC", () => {
    // source: Grover 1946, ch. 5 eq. (7): L = 0.002 l [ln(2l/ρ) − 3/4] µH (l, ρ in cm)
    const l = 0.1, r = 5e-4;
    const grover = 0.002 * (l * 100) * (Math.log((2 * l) / r) - 0.75) * 1e-6;
    // Grover's 0.002 µH/cm is μ₀/2π with μ₀ = 4π·10⁻⁷; CODATA μ₀ differs by 5e-10
    expectOutside({ quantity: "straight wire L (10 cm, d = 1 mm)", source: "source: Grover 1946, ch. 5 eq. (7)", ours: straightWireSelfInductance(l, r, 0.25), reference: grover, rtol: 1e-9, unit: "H" });
  });
});

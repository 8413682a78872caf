import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { flatSpiral, type FlatSpiral } from "../../../lib/em/builders/flatSpiral.ts";
import { archimedeanArcLength, polygonPerimeter } from "../../../lib/em/builders/common.ts";
import { integrateAdaptive } from "../../../lib/math/quadrature.ts";
import type { Filament } from "../../../lib/em/types.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

type Circle = Extract<Filament, { kind: "circle" }>;
type Path = Extract<Filament, { kind: "path" }>;

const spec = { innerRadius: "5 mm", turns: 10, pitch: "0.6 mm", trace: { width: "0.4 mm", thickness: "1 oz" } } as const;

describe("flatSpiral geometry", () => {
  it("edges: outer = inner + N·p + w; rings at each turn's mean radius r₀ + (i + ½)p, in the plane z = 0", () => {
    const s = flatSpiral(spec);
    expectRelClose(s.shape.outerRadius, 0.005 + 10 * 6e-4 + 4e-4, 1e-14, "outer edge");
    expectRelClose(s.shape.conductorWidth, 4e-4, 1e-15, "trace width");
    const cs = s.filaments as Circle[];
    expect(cs).toHaveLength(10);
    cs.forEach((c, i) => {
      expectRelClose(c.radius, 0.005 + 2e-4 + (i + 0.5) * 6e-4, 1e-14, `ring ${i}`);
      expect(c.center).toEqual([0, 0, 0]);
    });
    expectRelClose(s.shape.meanRadius, cs.reduce((x, c) => x + c.radius, 0) / 10, 1e-14, "mean radius = mean ring radius");
  });

  it("outerRadius input gives the same coil as the matching innerRadius", () => {
    const a = flatSpiral(spec);
    const b = flatSpiral({ ...spec, innerRadius: undefined, outerRadius: a.shape.outerRadius });
    expectRelClose(b.shape.innerRadius, 0.005, 1e-12, "inner from outer");
  });

  it("wire length equals the Archimedean arc length ∫√(r² + b²)dθ, computed by adaptive quadrature (independent method)", () => {
    const s = flatSpiral(spec);
    const r0 = 0.005 + 2e-4;
    const b = 6e-4 / (2 * Math.PI);
    const q = integrateAdaptive((t) => Math.hypot(r0 + b * t, b), 0, 2 * Math.PI * 10, { relTol: 1e-13, absTol: 0 });
    expectRelClose(s.wireLength, q.value, 1e-12, "closed form vs quadrature");
    // and it is close to N turns of the mean circumference (the spiral's extra length is O((b/r)²))
    expectRelClose(s.wireLength, 10 * 2 * Math.PI * s.shape.meanRadius, 1e-3, "≈ N·2π·r_mean");
  });

  it("spiral model: one closed polygon whose spiral part converges to the arc length, plus the return lead", () => {
    const s = flatSpiral({ ...spec, model: "spiral", segmentsPerTurn: 720 });
    expect(s.filaments).toHaveLength(1);
    const path = s.filaments[0] as Path;
    expect(path.kind).toBe("path");
    expect(path.turns).toBe(1);
    expect(path.points).toHaveLength(10 * 720 + 1 + 2);
    const r0 = 0.005 + 2e-4;
    const r1 = r0 + 10 * 6e-4;
    const lead = 2 * 6e-4 + (r1 - r0); // down, radially in, up
    // chords of 0.5° undershoot the arc by (Δθ)²/24 ≈ 3.2e-6 relative
    expectRelClose(polygonPerimeter(path.points) - lead, archimedeanArcLength(r0, r1, 6e-4), 1e-5, "polygon perimeter");
    expectRelClose(s.wireLength, archimedeanArcLength(r0, r1, 6e-4), 1e-15, "same wire length in both models");
    // the return lead runs one pitch below the plane, so it never touches the spiral
    expectRelClose(path.points.at(-1)![2], -6e-4, 1e-15, "return lead one pitch below the plane");
  });

  it("rejects a pitch narrower than the conductor and a spiral that would cross its centre", () => {
    expect(() => flatSpiral({ ...spec, pitch: "0.3 mm" })).toThrow(/pitch: is narrower than the conductor width 0.0004 m/);
    expect(() => flatSpiral({ ...spec, innerRadius: undefined, outerRadius: "5 mm" })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: flatSpiral: outerRadius: leaves an inner radius of -0.0014 m, smaller than half the conductor width (0.0002 m), got '5 mm']`,
    );
    expect(() => flatSpiral({ ...spec, model: "helix" as "rings" })).toThrow(/model/);
  });

  it("types", () => {
    expectTypeOf(flatSpiral).returns.toEqualTypeOf<FlatSpiral>();
    expectTypeOf<FlatSpiral["shape"]["model"]>().toEqualTypeOf<"rings" | "spiral">();
  });
});

describe("archimedeanArcLength", () => {
  it("reduces to the circumference sum for a tiny pitch and is additive", () => {
    // pitch → 0: N turns between r0 and r1 → Σ 2πr ≈ 2π·N·(r0 + r1)/2
    expectRelClose(archimedeanArcLength(0.01, 0.01001, 1e-6), 10 * 2 * Math.PI * 0.010005, 1e-9, "tiny pitch");
    expectRelClose(archimedeanArcLength(0.01, 0.03, 1e-3), archimedeanArcLength(0.01, 0.02, 1e-3) + archimedeanArcLength(0.02, 0.03, 1e-3), 1e-14, "additive");
  });
});

describe("flatSpiral properties (fast-check)", () => {
  it("rings lie between the edges, one pitch apart; wire length lies between N·2π·r_mean and the same plus the pitch terms", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 0.05, noNaN: true }),
        fc.integer({ min: 1, max: 40 }),
        fc.double({ min: 1e-4, max: 2e-3, noNaN: true }),
        fc.double({ min: 0.2, max: 1, noNaN: true }),
        (inner, turns, pitch, fill) => {
          const w = pitch * fill;
          fc.pre(inner >= w / 2);
          const s = flatSpiral({ innerRadius: inner, turns, pitch, trace: { width: w, thickness: 35e-6 } });
          const cs = s.filaments as Circle[];
          expect(cs).toHaveLength(turns);
          cs.forEach((c, i) => {
            expect(c.radius - w / 2).toBeGreaterThanOrEqual(s.shape.innerRadius * (1 - 1e-12));
            expect(c.radius + w / 2).toBeLessThanOrEqual(s.shape.outerRadius * (1 + 1e-12));
            if (i > 0) expectRelClose(c.radius - cs[i - 1]!.radius, pitch, 1e-9, "ring spacing");
          });
          // ∫√(r² + b²)dθ ≥ ∫r dθ = N·2π·r_mean, and ≤ ∫(r + b²/(2r))dθ
          const mean = 2 * Math.PI * turns * s.shape.meanRadius;
          const b = pitch / (2 * Math.PI);
          const r0 = inner + w / 2;
          expect(s.wireLength).toBeGreaterThanOrEqual(mean * (1 - 1e-12));
          expect(s.wireLength).toBeLessThanOrEqual(mean + (b * b / (2 * r0)) * 2 * Math.PI * turns * (1 + 1e-9));
        },
      ),
      { numRuns: 200 },
    );
  });
});

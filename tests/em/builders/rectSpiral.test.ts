import { describe, expect, expectTypeOf, it } from "vitest";
import { rectSpiral, type RectSpiral } from "../../../lib/em/builders/rectSpiral.ts";
import { rectLoop } from "../../../lib/em/builders/rectLoop.ts";
import { polygonPerimeter } from "../../../lib/em/builders/common.ts";
import type { Filament, Vec3 } from "../../../lib/em/types.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

type Path = Extract<Filament, { kind: "path" }>;

/** Signed area of a polygon's projection on the xy plane (> 0: counter-clockwise seen from +z). */
function signedArea(points: readonly Vec3[]): number {
  let a = 0;
  for (let i = 0; i < points.length; i++) {
    const p = points[i]!;
    const q = points[(i + 1) % points.length]!;
    a += p[0] * q[1] - q[0] * p[1];
  }
  return a / 2;
}

const trace = { width: "0.5 mm", thickness: "35 um" } as const;

describe("rectSpiral", () => {
  it("planar: N nested closed polygons, counter-clockwise, centrelines inset by w/2 + i·p", () => {
    const s = rectSpiral({ outerWidth: "30 mm", outerHeight: "20 mm", turns: 5, pitch: "1 mm", trace });
    expect(s.filaments).toHaveLength(5);
    (s.filaments as Path[]).forEach((f, i) => {
      expect(f.points).toHaveLength(4);
      const d = 0.25e-3 + i * 1e-3;
      expectRelClose(signedArea(f.points), (0.03 - 2 * d) * (0.02 - 2 * d), 1e-12, `area of turn ${i}`);
      expect(f.points.every((p) => p[2] === 0)).toBe(true);
    });
    expectRelClose(s.shape.innerWidth, 0.03 - 8e-3 - 1e-3, 1e-12, "inner width");
    expectRelClose(s.shape.innerHeight, 0.02 - 8e-3 - 1e-3, 1e-12, "inner height");
  });

  it("planar wire length = Σ ring perimeters − p, the length of the true stepping spiral built vertex by vertex", () => {
    const N = 4;
    const p = 1e-3;
    const w = 0.5e-3;
    const s = rectSpiral({ outerWidth: 0.03, outerHeight: 0.02, turns: N, pitch: p, trace });
    // independent construction: start at the outer ring's lower-left corner, go right, up, left, down; each time the
    // path comes back towards its start it stops one pitch short and the next ring begins there.
    let x = -0.015 + w / 2;
    let y = -0.01 + w / 2;
    let X = 0.015 - w / 2;
    let Y = 0.01 - w / 2;
    let len = 0;
    const pts: [number, number][] = [[x, y]];
    for (let i = 0; i < N; i++) {
      const left = x;
      pts.push([X, y], [X, Y], [left, Y]);
      // down to one pitch above the bottom, then (next turn) right along the new bottom
      y = y + p;
      x = left;
      pts.push([x, y]);
      x = left + p;
      X -= p;
      Y -= p;
      if (i < N - 1) pts.push([x, y]);
    }
    for (let k = 1; k < pts.length; k++) len += Math.hypot(pts[k]![0] - pts[k - 1]![0], pts[k]![1] - pts[k - 1]![1]);
    expectRelClose(s.wireLength, len, 1e-12, "stepping spiral");
  });

  it("rounded corners: arcs of radius R − w/2 − i·p; the polygon perimeter converges to the stated length", () => {
    const s = rectSpiral({ outerWidth: "30 mm", outerHeight: "20 mm", turns: 3, pitch: "1 mm", cornerRadius: "3 mm", cornerSegments: 64, trace });
    const perimeters = (s.filaments as Path[]).reduce((sum, f) => sum + polygonPerimeter(f.points), 0);
    // chords of 90°/64 fall short of their arcs by (Δθ)²/24 = 2.5e-5 relative on the corners only
    expectRelClose(s.wireLength + 1e-3, perimeters, 2e-5, "rounded perimeters");
  });

  it("axial stacking: equal outlines one pitch apart along z, centred on z = 0; wire length Σ √(perimeter² + p²)", () => {
    const s = rectSpiral({ outerWidth: "30 mm", outerHeight: "20 mm", turns: 4, pitch: "0.6 mm", stacking: "axial", wire: { diameter: "0.5 mm" } });
    const zs = (s.filaments as Path[]).map((f) => f.points[0]![2]);
    zs.forEach((z, i) => expectRelClose(z, (i - 1.5) * 6e-4, 1e-12, `z of turn ${i}`));
    const per = 2 * (0.0295 + 0.0195);
    expectRelClose(s.wireLength, 4 * Math.hypot(per, 6e-4), 1e-14, "helix-like length");
  });

  it("rejects outlines too small for the turns, too-large corners and narrow pitches", () => {
    expect(() => rectSpiral({ outerWidth: "5 mm", outerHeight: "20 mm", turns: 5, pitch: "1 mm", trace })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: rectSpiral: outerWidth: is too small for 5 turns at 0.001 m pitch of a 0.0005 m conductor, got '5 mm']`,
    );
    expect(() => rectSpiral({ outerWidth: "30 mm", outerHeight: "20 mm", turns: 2, pitch: "1 mm", cornerRadius: "11 mm", trace })).toThrow(/cornerRadius/);
    expect(() => rectSpiral({ outerWidth: "30 mm", outerHeight: "20 mm", turns: 2, pitch: "0.4 mm", trace })).toThrow(/pitch: is narrower/);
  });

  it("types", () => {
    expectTypeOf(rectSpiral).returns.toEqualTypeOf<RectSpiral>();
  });
});

describe("rectLoop", () => {
  it("one counter-clockwise rectangle between conductor centrelines; wire length 2(a + b)", () => {
    const l = rectLoop({ width: "10 cm", height: "5 cm", awg: 18 });
    expect(l.turns).toBe(1);
    const f = l.filaments[0] as Path;
    expect(f.points).toHaveLength(4);
    expectRelClose(signedArea(f.points), 0.005, 1e-14, "area");
    expectRelClose(l.wireLength, 0.3, 1e-15, "length");
    expectRelClose(polygonPerimeter(f.points), 0.3, 1e-15, "polygon perimeter");
    expect(l.shape).toEqual({ kind: "rectLoop", width: 0.1, height: 0.05 });
  });

  it("rejects sides no wider than the conductor", () => {
    expect(() => rectLoop({ width: "0.5 mm", height: "5 cm", wire: { diameter: "1 mm" } })).toThrow(/width: must exceed the conductor width/);
  });
});

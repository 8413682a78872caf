import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { roundCoil, type RoundCoil } from "../../../lib/em/builders/roundCoil.ts";
import { awgWire, litzWire } from "../../../lib/em/builders/conductor.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import type { Filament } from "../../../lib/em/types.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

type Circle = Extract<Filament, { kind: "circle" }>;
const circles = (c: { filaments: readonly Filament[] }): Circle[] => c.filaments.filter((f): f is Circle => f.kind === "circle");

describe("roundCoil geometry", () => {
  const coil = roundCoil({ innerRadius: "40 mm", turns: 22, layers: 4, wire: { diameter: "0.5 mm", insulation: "0.025 mm" } });
  const od = 0.55e-3;
  const s = coil.shape;

  it("has one unit-weight circle filament per turn and the honest turn count", () => {
    expect(coil.turns).toBe(22);
    expect(coil.filaments).toHaveLength(22);
    expect(coil.filaments.every((f) => f.kind === "circle" && f.turns === 1)).toBe(true);
    expect(s.turnsPerLayer).toBe(6);
    expect(s.layers).toBe(4);
  });

  it("states the winding window: outer = inner + (layers − 1)·radialPitch + d_o, height = (n_L − 1)·pitch + d_o", () => {
    expectRelClose(s.innerRadius, 0.04, 1e-15, "inner");
    expectRelClose(s.outerRadius, 0.04 + 3 * od + od, 1e-14, "outer");
    expectRelClose(s.meanRadius, (s.innerRadius + s.outerRadius) / 2, 1e-15, "mean");
    expectRelClose(s.windingHeight, 5 * od + od, 1e-14, "height");
    expectRelClose(s.axialPitch, od, 1e-15, "axial pitch defaults to the outer diameter");
    expectRelClose(s.radialPitch, od, 1e-15, "radial pitch defaults to the outer diameter");
  });

  it("places every turn inside the winding window, no two closer than the wire's outer diameter", () => {
    const cs = circles(coil);
    for (const c of cs) {
      expect(c.radius - od / 2).toBeGreaterThanOrEqual(s.innerRadius - 1e-15);
      expect(c.radius + od / 2).toBeLessThanOrEqual(s.outerRadius + 1e-15);
      expect(Math.abs(c.center[2]) + od / 2).toBeLessThanOrEqual(s.windingHeight / 2 + 1e-15);
      expect(c.center[0]).toBe(0);
      expect(c.center[1]).toBe(0);
      expect(c.axis).toEqual([0, 0, 1]);
    }
    for (let i = 0; i < cs.length; i++) {
      for (let j = i + 1; j < cs.length; j++) {
        const d = Math.hypot(cs[i]!.radius - cs[j]!.radius, cs[i]!.center[2] - cs[j]!.center[2]);
        expect(d).toBeGreaterThanOrEqual(od * (1 - 1e-12));
      }
    }
  });

  it("winds layer by layer, alternating direction; the last, partial layer starts where the previous ended", () => {
    const cs = circles(coil);
    const zs = (layer: number): number[] => cs.slice(layer * 6, layer * 6 + 6).map((c) => c.center[2]);
    expect(zs(0)[0]).toBeLessThan(zs(0)[5]!); // layer 0 runs up
    expect(zs(1)[0]).toBeGreaterThan(zs(1)[5]!); // layer 1 runs down
    // layer 3 (4 turns of 6) starts at the top, where layer 2 (running up) ended
    const last = cs.slice(18);
    expect(last).toHaveLength(4);
    expectRelClose(last[0]!.center[2], zs(2)[5]!, 1e-12, "partial layer starts at the previous layer's end");
    expectRelClose(last[0]!.radius, 0.04 + od / 2 + 3 * od, 1e-14, "layer 3 radius");
  });

  it("wire length is Σ √((2πr)² + s²) over the turns, within (s/2πr)²/2 of Σ 2πr", () => {
    const cs = circles(coil);
    const flat = cs.reduce((sum, c) => sum + 2 * Math.PI * c.radius, 0);
    // each turn's helix rises one pitch (s = od here for both axial and layer steps)
    const helix = cs.reduce((sum, c) => sum + Math.hypot(2 * Math.PI * c.radius, od), 0);
    expectRelClose(coil.wireLength, helix, 1e-14, "helix sum");
    const bound = (od / (2 * Math.PI * 0.04)) ** 2 / 2;
    expect(coil.wireLength / flat - 1).toBeGreaterThan(0);
    expect(coil.wireLength / flat - 1).toBeLessThanOrEqual(bound);
  });

  it("origin sits at the centre of the window: the turns of full layers are symmetric in z", () => {
    const full = roundCoil({ meanRadius: 0.02, turns: 12, layers: 3, wire: { diameter: 3e-4 } });
    const sumZ = circles(full).reduce((sum, c) => sum + c.center[2], 0);
    expect(Math.abs(sumZ)).toBeLessThan(1e-18);
    expectRelClose(full.shape.meanRadius, 0.02, 1e-15, "meanRadius input is honoured");
    expectRelClose(
      circles(full).reduce((sum, c) => sum + c.radius, 0) / 12,
      0.02,
      1e-14,
      "mean radius = mean turn radius for full layers",
    );
  });
});

describe("roundCoil inputs", () => {
  it("accepts SI numbers and quantity strings alike", () => {
    const a = roundCoil({ innerRadius: "6 mm", turns: 30, layers: 3, wire: { diameter: "0.1 mm" } });
    const b = roundCoil({ innerRadius: 0.006, turns: 30, layers: 3, wire: { diameter: 1e-4 } });
    expect(a).toEqual(b);
  });

  it("accepts awg, a conductor record, litz, explicit pitches", () => {
    const c = roundCoil({ innerRadius: "10 mm", turns: 4, awg: 30 });
    expect(c.conductor).toEqual(awgWire(30));
    const litz = litzWire(20, "0.05 mm", { outerDiameter: "0.4 mm" });
    const l = roundCoil({ innerRadius: "10 mm", turns: 5, wire: litz, pitch: "0.5 mm", radialPitch: "0.45 mm" });
    expect(l.conductor.kind).toBe("litz");
    expect(l.shape.axialPitch).toBe(5e-4);
  });

  it("returns a frozen object", () => {
    const c = roundCoil({ innerRadius: "10 mm", turns: 4, awg: 30 });
    expect(Object.isFrozen(c)).toBe(true);
    expect(Object.isFrozen(c.filaments)).toBe(true);
  });

  it("names every bad field", () => {
    expect(() => roundCoil({ innerRadius: "5 kHz", turns: 2.5, wire: { diameter: -1 } })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: roundCoil: innerRadius: expected a length like '12 mm', got '5 kHz' (a frequency); turns: must be a whole number ≥ 1, got 2.5; wire.diameter: must be > 0 m, got -1]`,
    );
    expect(() => roundCoil({ innerRadius: "1 mm", turns: 5, layers: 4, wire: { diameter: "0.5 mm" }, pitch: "0.3 mm" })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: roundCoil: layers: 5 turns in 4 layers of 2 would leave a layer empty, got 4; pitch: is narrower than the wire's outer diameter 0.0005 m, got '0.3 mm']`,
    );
    expect(() => roundCoil({ innerRadius: "0.1 mm", turns: 5, wire: { diameter: "0.5 mm" } })).toThrow(/innerRadius: leaves an inner radius of 0.0001 m/);
    expect(() => roundCoil({ turns: 5, wire: { diameter: "0.5 mm" } })).toThrow(/give exactly one of innerRadius or meanRadius/);
    expect(() => roundCoil({ innerRadius: "5 mm", turns: 5 })).toThrow(/give exactly one of wire or awg/);
    expect(() => roundCoil({ innerRadius: "5 mm", turns: 5, trace: { width: "1 mm", thickness: "1 oz" } })).toThrow(/a wound coil takes wire or awg/);
    expect(() => roundCoil({ innerRadius: "5 mm", turns: 5, awg: 99 })).toThrow(TanklightInputError);
    // a typo is an error, not silently ignored
    expect(() => roundCoil({ radius: "5 mm", turns: 5, awg: 30 } as never)).toThrow(/radius/);
  });
});

describe("roundCoil types", () => {
  it("returns a Coil whose shape is the roundCoil record", () => {
    expectTypeOf(roundCoil).returns.toEqualTypeOf<RoundCoil>();
    expectTypeOf<RoundCoil["shape"]["turnsPerLayer"]>().toEqualTypeOf<number>();
    expectTypeOf(roundCoil).parameter(0).toHaveProperty("innerRadius").toEqualTypeOf<number | string | undefined>();
  });
});

describe("roundCoil properties (fast-check)", () => {
  it("for any valid winding: turn count, window containment, spacing ≥ d_o, wire length ≥ Σ 2πr", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 0.1, noNaN: true }),
        fc.integer({ min: 1, max: 60 }),
        fc.integer({ min: 1, max: 8 }),
        fc.double({ min: 5e-5, max: 2e-3, noNaN: true }),
        fc.double({ min: 1, max: 2, noNaN: true }),
        (inner, turns, layersWanted, od, pitchFactor) => {
          const layers = Math.min(layersWanted, turns);
          const tpl = Math.ceil(turns / layers);
          fc.pre((layers - 1) * tpl < turns); // no empty layer (that input is an error, tested above)
          fc.pre(inner >= od / 2);
          const c = roundCoil({ innerRadius: inner, turns, layers, wire: { diameter: od }, pitch: od * pitchFactor });
          expect(c.filaments).toHaveLength(turns);
          const s = c.shape;
          let flat = 0;
          for (const f of circles(c)) {
            expect(f.radius - od / 2).toBeGreaterThanOrEqual(s.innerRadius * (1 - 1e-12));
            expect(f.radius + od / 2).toBeLessThanOrEqual(s.outerRadius * (1 + 1e-12));
            expect(Math.abs(f.center[2]) + od / 2).toBeLessThanOrEqual((s.windingHeight / 2) * (1 + 1e-12));
            flat += 2 * Math.PI * f.radius;
          }
          expect(c.wireLength).toBeGreaterThanOrEqual(flat);
          expect(c.wireLength).toBeLessThanOrEqual(flat * (1 + ((2 * od) / (2 * Math.PI * inner)) ** 2));
        },
      ),
      { numRuns: 200 },
    );
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { solenoid, type Solenoid } from "../../../lib/em/builders/solenoid.ts";
import type { Filament } from "../../../lib/em/types.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

type Circle = Extract<Filament, { kind: "circle" }>;

describe("solenoid", () => {
  it("close-wound by default: pitch = outer diameter, length = N·pitch, turns at z = (i − (N−1)/2)·pitch", () => {
    const s = solenoid({ radius: "10 mm", turns: 20, wire: { diameter: "0.45 mm", outerDiameter: "0.5 mm" } });
    expect(s.turns).toBe(20);
    expect(s.filaments).toHaveLength(20);
    expectRelClose(s.shape.pitch, 5e-4, 1e-15, "pitch");
    expectRelClose(s.shape.length, 0.01, 1e-14, "length");
    const cs = s.filaments as Circle[];
    cs.forEach((c, i) => {
      expectRelClose(c.radius, 0.01, 1e-15, "every turn at the wire-centre radius");
      expectRelClose(c.center[2], (i - 9.5) * 5e-4, 1e-12, `z of turn ${i}`);
    });
  });

  it("takes the pitch from the length (p = ℓ/N)", () => {
    const s = solenoid({ radius: 0.01, turns: 10, length: "20 mm", awg: 24 });
    expectRelClose(s.shape.pitch, 2e-3, 1e-15, "pitch from length");
  });

  it("wire length is N·√((2πa)² + p²) — the helix", () => {
    const s = solenoid({ radius: "3 mm", turns: 8, pitch: "1 mm", wire: { diameter: "0.8 mm" } });
    expectRelClose(s.wireLength, 8 * Math.hypot(2 * Math.PI * 0.003, 0.001), 1e-14, "helix");
  });

  it("rejects a pitch narrower than the wire and a radius smaller than the wire", () => {
    expect(() => solenoid({ radius: "10 mm", turns: 20, length: "5 mm", wire: { diameter: "0.5 mm" } })).toThrowErrorMatchingInlineSnapshot(
      `[TanklightInputError: solenoid: length: gives a pitch of 0.00025 m, narrower than the wire's outer diameter 0.0005 m, got '5 mm']`,
    );
    expect(() => solenoid({ radius: "0.4 mm", turns: 2, wire: { diameter: "0.5 mm" } })).toThrow(/radius: is smaller than the wire's outer diameter/);
    expect(() => solenoid({ radius: "5 mm", turns: 2, pitch: "1 mm", length: "2 mm", awg: 30 })).toThrow(/give pitch or length, not both/);
  });

  it("returns the solenoid shape type", () => {
    expectTypeOf(solenoid).returns.toEqualTypeOf<Solenoid>();
    expectTypeOf<Solenoid["shape"]["kind"]>().toEqualTypeOf<"solenoid">();
  });
});

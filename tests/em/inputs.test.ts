/**
 * The EM layer's public entries check hand-made input like the builders do (issue 11):
 * strict keys with "did you mean", the user's field names, quantity strings accepted.
 */
import { describe, expect, it } from "vitest";
import { TanklightInputError } from "../../lib/errors.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { couplingFactor, mutualInductance } from "../../lib/em/mutualInductance.ts";
import { selfInductance } from "../../lib/em/selfInductance.ts";
import { magneticField } from "../../lib/em/magneticField.ts";
import { loopMutualInductance } from "../../lib/em/loopMutual.ts";
import { coilResistance } from "../../lib/em/losses/coilResistance.ts";
import { qualityFactor } from "../../lib/em/losses/qualityFactor.ts";
import { skinDepth } from "../../lib/em/losses/skinDepth.ts";
import { selfCapacitance } from "../../lib/em/selfCapacitance.ts";
import type { Coil } from "../../lib/em/types.ts";
import { material } from "../../lib/em/materials.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

const tx = roundCoil({ innerRadius: "20 mm", turns: 10, wire: { diameter: "0.5 mm" } });
const tok = roundCoil({ innerRadius: "6 mm", turns: 20, wire: { diameter: "0.2 mm" } });
const P0 = { position: [0, 0, 0] as const };
const handMade = (radius: number, axis: readonly [number, number, number] = [0, 0, 1]): Coil => ({
  filaments: [{ kind: "circle", center: [0, 0, 0], axis, radius, turns: 1 }],
  conductor: { kind: "round", diameter: 5e-4, outerDiameter: 5.5e-4 },
  turns: 1,
  wireLength: 2 * Math.PI * 0.02,
});

describe("EM inputs are checked at every public entry", () => {
  it("a mistyped pose key is an error naming the nearest valid key (was silently ignored: k = 0.01786)", () => {
    expect(() => couplingFactor(tx, P0, tok, { position: [0, 0, 0.02], axsi: [1, 0, 0] } as never)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: couplingFactor: poseB.axsi: unknown field; did you mean 'axis'?, got [1,0,0]]`);
  });

  it("hand-made filaments are validated like built ones (NaN radius, zero axis)", () => {
    expect(() => selfInductance(handMade(NaN))).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: selfInductance: coil.filaments[0].radius: must be a finite number > 0 m, got NaN]`);
    expect(() => mutualInductance(handMade(0.02, [0, 0, 0]), P0, tok, { position: [0, 0, 0.01] })).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: mutualInductance: a.filaments[0].axis: must be a non-zero direction, got [0,0,0]]`);
    expect(() => loopMutualInductance({ center: [0, 0, 0], axis: [0, 0, 1], raduis: 0.01 } as never, { center: [0, 0, 0.01], axis: [0, 0, 1], radius: 0.01 })).toThrow(/a.raduis: unknown field; did you mean 'radius'\?/);
    expect(() => coilResistance(null as never, 2e5)).toThrow(TanklightInputError);
    expect(() => selfCapacitance({ ...tx, filaments: [] })).toThrow(/selfCapacitance: coil.filaments: must hold at least one filament/);
    expect(() => magneticField({ ...tx, conductor: { kind: "round", diameter: 5e-4, outerDiameter: 5e-4, material: "toString" } }, P0, 1, [0, 0, 0.01])).toThrow(/coil.conductor.material: is not a known material/);
  });

  it("prototype words are not materials", () => {
    expect(() => material("__proto__")).toThrow(/material: material: is not a known material/);
    expect(() => material("constructor")).toThrow(/is not a known material/);
  });

  it("options are strict objects", () => {
    expect(() => selfInductance(tx, { frequncy: 2e5 } as never)).toThrow(/selfInductance: options.frequncy: unknown field; did you mean 'frequency'\?/);
    expect(() => coilResistance(tx, 2e5, { temprature: 300 } as never)).toThrow(/coilResistance: opts.temprature: unknown field; did you mean 'temperature'\?/);
    expect(() => loopMutualInductance(tx.filaments[0] as never, tok.filaments[0] as never, { reltol: 1e-6 } as never)).toThrow(/options.reltol: unknown field; did you mean 'relTol'\?/);
  });

  it("accepts quantity strings where a person would type one", () => {
    expectRelClose(coilResistance(tx, "200 kHz"), coilResistance(tx, 2e5), 1e-15, "coilResistance(c, '200 kHz')");
    expectRelClose(qualityFactor(tx, "200 kHz", { temperature: "20 degC" }), qualityFactor(tx, 2e5), 1e-15, "qualityFactor with strings");
    expectRelClose(skinDepth("200 kHz", "1.7241e-8 ohm m"), skinDepth(2e5, 1.7241e-8), 1e-15, "skinDepth with strings");
    expectRelClose(selfInductance(tx, { frequency: "200 kHz" }), selfInductance(tx, { frequency: 2e5 }), 1e-15, "selfInductance frequency string");
    expectRelClose(couplingFactor(tx, P0, tok, { position: [0, 0, "2 cm"] } as never), couplingFactor(tx, P0, tok, { position: [0, 0, 0.02] }), 1e-15, "pose with a length string");
    expect(magneticField(tx, P0, "150 mA", [0, 0, 0.01])).toEqual(magneticField(tx, P0, 0.15, [0, 0, 0.01]));
    expect(() => coilResistance(tx, "200 kV")).toThrow(/coilResistance: f: expected a frequency/);
  });

  it("errors name the public function the user called, not an internal one", () => {
    expect(() => couplingFactor(tx, P0, tx, P0)).toThrow(/^couplingFactor: poseA, poseB: filament 0 of a and filament 0 of b intersect/);
    expect(() => coilResistance(tx, 2e5, { temperature: 20 })).toThrow(/coilResistance: opts.temperature: must be a conductor temperature in kelvin/);
  });
});

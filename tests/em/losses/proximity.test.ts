import { describe, expect, expectTypeOf, it } from "vitest";
import { proximityG, roundWireProximityFactor, turnFieldsPerAmpere } from "../../../lib/em/losses/proximity.ts";
import { skinDepth } from "../../../lib/em/losses/skinDepth.ts";
import { MU0 } from "../../../lib/constants.ts";
import type { Coil, Filament } from "../../../lib/em/types.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";
import exact from "../../fixtures/losses/proximity_uniform_field.json" with { type: "json" };

const RHO = 1.7241e-8;

describe("proximityG(γ) and roundWireProximityFactor(d, f, ρ)", () => {
  it("equal the exact 2-D eddy loss of a round wire in a uniform transverse field (1e-12)", () => {
    // reference library: mpmath — the exact 2-D solution with I0, I1 of complex argument and the
    // loss by quadrature (scripts/gen_loss_fixtures.py), which also confirms the docs/references.md
    // Kelvin formula to 1e-20. Regime: 0.01 ≤ γ ≤ 30; our Kelvin functions are good to ~1e-13.
    for (const c of exact.cases) {
      expectOutside({
        quantity: `P′σ/Ĥ² at γ = ${c.gamma}`,
        source: "reference library: mpmath, exact 2-D solution (modified Bessel functions, complex argument)",
        ours: proximityG(c.gamma),
        reference: c.exact,
        rtol: 1e-12,
      });
    }
  });

  it("reduces to P′ = πσω²B̂²a⁴/8 at low frequency", () => {
    // independent method: Faraday's law with the unperturbed uniform field B̂ŷ gives E_z = jωB̂x,
    // loss ½σ∫|E|²dA = πσω²B̂²a⁴/8 (derivation in docs/methods/losses.md). Regime d ≪ δ:
    // the next term is O((a/δ)⁴) relative: at d = 0.1 mm, 10 kHz (a/δ = 0.076) below 1e-4.
    const d = 0.1e-3, f = 10e3, a = d / 2;
    const H = 1; // A/m peak
    const sigma = 1 / RHO;
    const w = 2 * Math.PI * f;
    const ours = roundWireProximityFactor(d, f, RHO) * H * H;
    const ref = (Math.PI * sigma * w * w * (MU0 * H) ** 2 * a ** 4) / 8;
    const aOverDelta = a / skinDepth(f, RHO);
    expectRelClose(ours, ref, 2 * aOverDelta ** 4, "low-frequency uniform-field eddy loss");
  });

  it("grows like √f at high frequency (field excluded, surface loss) and is 0 at DC", () => {
    // independent method: for a ≫ δ the wire excludes the field; the surface field is 2Ĥ sin φ
    // (a perfect cylinder), surface loss ½R_s|H_t|² with R_s = ρ/δ integrated over the
    // perimeter: P′ = ½(ρ/δ)·4Ĥ²·πa = 2πaρĤ²/δ. The next term is O(δ/a): rtol 3δ/a.
    const d = 5e-3, f = 10e6, a = d / 2;
    const delta = skinDepth(f, RHO);
    expectRelClose(roundWireProximityFactor(d, f, RHO), (2 * Math.PI * a * RHO) / delta, (3 * delta) / a, "field-excluding limit");
    expect(roundWireProximityFactor(d, 0, RHO)).toBe(0);
    expect(() => roundWireProximityFactor(-1, 1e3, RHO)).toThrow(TanklightInputError);
  });

  it("has the documented types", () => {
    expectTypeOf(roundWireProximityFactor).returns.toEqualTypeOf<number>();
    expectTypeOf(turnFieldsPerAmpere).parameter(0).toEqualTypeOf<Coil>();
  });
});

function ring(radius: number, z: number, axis: [number, number, number] = [0, 0, 1], center: [number, number, number] = [0, 0, z]): Filament {
  return { kind: "circle", center, axis, radius, turns: 1 };
}
function coilOf(filaments: Filament[]): Coil {
  return { filaments, conductor: { kind: "round", diameter: 0.5e-3, outerDiameter: 0.55e-3 }, turns: filaments.length, wireLength: 1 };
}

describe("turnFieldsPerAmpere(coil)", () => {
  it("gives the field of a neighbouring turn as μ₀I/(2πp)-like near field and excludes each turn's own", () => {
    // independent method: two coaxial rings radius 40 mm, 0.55 mm apart: at that distance the
    // other ring is locally a straight wire, H ≈ I/(2πp); the curvature correction is O(p/a·ln)
    // ≈ 1 %: tolerance 2 %.
    const p = 0.55e-3;
    const t = turnFieldsPerAmpere(coilOf([ring(0.04, 0), ring(0.04, p)]));
    expectRelClose(Math.sqrt(t.h2[0]!), 1 / (2 * Math.PI * p), 0.02, "neighbour field");
    expectRelClose(t.h2[0]!, t.h2[1]!, 1e-12, "symmetry");
    expectRelClose(t.length[0]!, 2 * Math.PI * 0.04, 1e-15, "turn length");
  });

  it("gives the same answer by the general (tilted-frame) path as by the coaxial path", () => {
    // independent method: the same physical coil tilted so its axis is x: the general branch samples
    // 24 points around each turn in each source loop's frame; the field is uniform round each
    // turn, so the results must agree to rounding (1e-10)
    const zs = [0, 0.6e-3, 1.2e-3, 1.8e-3];
    const coax = turnFieldsPerAmpere(coilOf(zs.map((z) => ring(0.03, z))));
    const tilted = turnFieldsPerAmpere(coilOf(zs.map((z) => ring(0.03, 0, [1, 0, 0], [z, 0, 0]))));
    for (let i = 0; i < zs.length; i++) {
      expectRelClose(tilted.h2[i]!, coax.h2[i]!, 1e-10, `turn ${i} |H|²`);
      expectRelClose(tilted.hz2[i]!, coax.hz2[i]!, 1e-10, `turn ${i} axial part`);
    }
  });

  it("rejects polygon filaments and warns about multi-turn filaments", () => {
    const path: Filament = { kind: "path", points: [[0, 0, 0], [1, 0, 0], [1, 1, 0]], turns: 1 };
    expect(() => turnFieldsPerAmpere(coilOf([path]))).toThrow(TanklightInputError);
    const t = turnFieldsPerAmpere(coilOf([{ kind: "circle", center: [0, 0, 0], axis: [0, 0, 1], radius: 0.01, turns: 5 }, ring(0.02, 0)]));
    expect(t.warnings.join(" ")).toMatch(/several turns/);
  });
});

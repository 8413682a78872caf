import { describe, expect, expectTypeOf, it } from "vitest";
import {
  MEDHURST_TABLE,
  coplanarStripCapacitancePerLength,
  medhurstCoefficient,
  selfCapacitance,
  selfCapacitanceDetail,
  selfResonance,
  turnToTurnCapacitancePerLength,
} from "../../lib/em/selfCapacitance.ts";
import { selfInductance } from "../../lib/em/selfInductance.ts";
import { solenoid } from "../../lib/em/builders/solenoid.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { flatSpiral } from "../../lib/em/builders/flatSpiral.ts";
import { roundWire } from "../../lib/em/builders/conductor.ts";
import { EPS0 } from "../../lib/constants.ts";
import type { Coil } from "../../lib/em/types.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

const wire = roundWire(0.5e-3, { insulation: 25e-6 });

describe("selfCapacitance(coil) — Medhurst 1947 for single-layer coils", () => {
  it("reproduces Medhurst's tabulated C = H·D for solenoids at tabulated ℓ/D", () => {
    // source: Medhurst, Wireless Engineer 24 (1947) 35–43, 80–92, table of H (pF/cm) by ℓ/D
    // (docs/references.md, "checked"). At a tabulated ratio our interpolation returns the table value,
    // so the only error is rounding of ℓ/D from the builder's geometry: rtol 1e-9.
    const D = 0.04;
    for (const [lOverD, H] of [[0.2, 0.7], [0.5, 0.5], [1, 0.46], [2, 0.5], [5, 0.81]] as const) {
      const turns = 40;
      const pitch = (lOverD * D) / turns;
      if (pitch < wire.outerDiameter) continue;
      const coil = solenoid({ radius: D / 2, turns, pitch, wire });
      expectOutside({
        quantity: `Medhurst self-capacitance, ℓ/D = ${lOverD}, D = 4 cm`,
        source: "source: Medhurst 1947, Wireless Engineer 24, table of H",
        ours: selfCapacitance(coil),
        reference: H * 4 * 1e-12,
        rtol: 1e-9,
        unit: "F",
      });
    }
  });

  it("interpolates between the table's points no further from Medhurst's fitted formula than the table itself is (1 ≤ ℓ/D ≤ 50)", () => {
    // from memory (unverified): Medhurst's empirical fit H = 0.1126·ℓ/D + 0.08 + 0.27·√(D/ℓ),
    // stated for ℓ/D ≥ 1. The recalled fit departs from the table by up to 7.6 % (ℓ/D = 4), so
    // the tolerance at each point is the larger table-vs-fit deviation at the two neighbouring
    // table entries plus 1 % for the interpolation between them (computed, not chosen).
    const fit = (x: number): number => 0.1126 * x + 0.08 + 0.27 * Math.sqrt(1 / x);
    for (const x of [1.2, 2.5, 6, 12, 25, 40]) {
      const i = MEDHURST_TABLE.findIndex(([xt]) => xt > x);
      const [x0, h0] = MEDHURST_TABLE[i - 1]!;
      const [x1, h1] = MEDHURST_TABLE[i]!;
      const rtol = Math.max(Math.abs(h0 / fit(x0) - 1), Math.abs(h1 / fit(x1) - 1)) + 0.01;
      expectOutside({ quantity: `Medhurst H at ℓ/D = ${x}`, source: "from memory (unverified): Medhurst 1947 fitted formula", ours: medhurstCoefficient(x).H, reference: fit(x), rtol, unit: "pF/cm" });
    }
    for (const [x, H] of MEDHURST_TABLE) expectRelClose(medhurstCoefficient(x).H, H, 1e-12, `table node ℓ/D = ${x}`);
    expect(medhurstCoefficient(100).extrapolated).toBe(true);
  });

  it("single-layer roundCoil uses Medhurst with ℓ = winding height and D = 2·mean radius", () => {
    const tx = roundCoil({ meanRadius: 0.04, turns: 20, wire });
    const det = selfCapacitanceDetail(tx);
    expect(det.model).toBe("medhurst");
    expectRelClose(det.value, medhurstCoefficient(tx.shape.windingHeight / 0.08).H * 8e-12, 1e-12, "C = H·D");
  });
});

describe("selfCapacitance(coil) — multi-layer and flat spirals", () => {
  it("turn-to-turn capacitance of touching enamelled wires lies between the bare two-wire line and the film-only bound", () => {
    // independent method (bounds, standard electrostatics): the M&K cell capacitance must exceed
    // that of the same wires at a larger spacing, and stay below the parallel-plate film capacitance
    // of the whole facing half (ε₀ε_r·(π/2)·d/(2t)) — a plausibility band, as the formula is from memory.
    const d = 0.1e-3, od = 0.12e-3;
    const c = turnToTurnCapacitancePerLength(d, od, od);
    const spaced = turnToTurnCapacitancePerLength(d, od, 2 * od);
    expect(c).toBeGreaterThan(spaced);
    expect(c).toBeLessThan(3.5 * EPS0 * (Math.PI / 2) * (d / (od - d)));
    expectRelClose(spaced, (Math.PI * EPS0) / Math.acosh(2), 1e-14, "two-wire line");
  });

  it("multi-layer roundCoil: C_s = 4(N_L − 1)/(3N_L²)·C_ll + Medhurst term (energy method)", () => {
    const tok = roundCoil({ meanRadius: 0.006, turns: 60, layers: 3, wire: roundWire(0.1e-3, { insulation: 10e-6 }) });
    const det = selfCapacitanceDetail(tok);
    expect(det.model).toBe("multilayer");
    const Cll = 20 * turnToTurnCapacitancePerLength(0.1e-3, 0.12e-3, tok.shape.radialPitch) * 2 * Math.PI * 0.006;
    expectRelClose(det.internal, ((4 * 2) / 27) * Cll, 1e-12, "energy method");
    expect(det.warnings.join(" ")).toMatch(/±50 %/);
    // a bare wire (no insulation given) gets an assumed film, and says so
    const bare = roundCoil({ meanRadius: 0.006, turns: 60, layers: 3, wire: roundWire(0.1e-3) });
    const bd = selfCapacitanceDetail(bare);
    expect(bd.warnings.join(" ")).toMatch(/without insulation/);
    expect(bd.value).toBeLessThan(100e-12);
    // trade practice (no source): small multi-layer token coils show tens of pF and resonate at a few MHz
    expect(det.value).toBeGreaterThan(5e-12);
    expect(det.value).toBeLessThan(100e-12);
  });

  it("flat spirals: an estimate with a warning; coplanar strips follow the conformal-mapping limit", () => {
    const sp = flatSpiral({ outerRadius: 0.03, turns: 10, pitch: 1.5e-3, trace: { width: 1e-3, thickness: 35e-6 } });
    const det = selfCapacitanceDetail(sp);
    expect(det.model).toBe("interTurnEstimate");
    expect(det.warnings.join(" ")).toMatch(/factor of 2/);
    expect(det.value).toBeGreaterThan(0);
    // independent method: equal width and gap gives k = 1/3; for wide strips (k → 0) C′ → ε₀ε_eff·(1/π)·ln(16/k²)·…
    // here only the symmetry K(k′)/K(k) = 1 at k² = 1/2 is exact: s/(s+2w) = 1/√2
    const w = 1, s = (2 * w) / (Math.SQRT2 - 1);
    expectRelClose(coplanarStripCapacitancePerLength(w, s, 1), EPS0, 1e-12, "k² = 1/2 → C′ = ε₀ε_eff");
  });

  it("selfResonance(coil) = 1/(2π√(LC)) and the types are as documented", () => {
    const tx = roundCoil({ meanRadius: 0.04, turns: 20, wire });
    const f = selfResonance(tx);
    const L = selfInductance(tx, { frequency: f });
    expectRelClose(f, 1 / (2 * Math.PI * Math.sqrt(L * selfCapacitance(tx))), 1e-6, "definition (one fixed-point step)");
    expect(() => medhurstCoefficient(0)).toThrow(TanklightInputError);
    expectTypeOf(selfCapacitance).parameter(0).toEqualTypeOf<Coil>();
    expectTypeOf(selfCapacitance).returns.toEqualTypeOf<number>();
    expectTypeOf(selfResonance).returns.toEqualTypeOf<number>();
  });
});

import { describe, expect, it } from "vitest";
import { addSegmentField } from "../../lib/em/segmentField.ts";
import { MU0 } from "../../lib/constants.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

const field = (p: number[], q: number[], x: number[], I = 1) => {
  const out = new Float64Array(3);
  const ok = addSegmentField(p[0]!, p[1]!, p[2]!, q[0]!, q[1]!, q[2]!, I, x[0]!, x[1]!, x[2]!, out);
  return { ok, B: out };
};

describe("addSegmentField (straight segment, closed-form Biot–Savart)", () => {
  it("gives μ₀I(sin θ₂ − sin θ₁)/(4πs) around a finite segment", () => {
    for (const [z1, z2, s] of [[-0.1, 0.1, 0.01], [0.02, 0.5, 0.03], [-3, -0.2, 0.001]] as const) {
      const { B } = field([0, 0, z1], [0, 0, z2], [s, 0, 0], 2);
      // sin θ₂ − sin θ₁ = z₂/R₂ − z₁/R₁, rewritten as s²(z₂² − z₁²)/(R₁R₂(z₂R₁ + z₁R₂)) when both ends
      // lie on the same side (the plain difference would cancel and spoil the reference itself)
      const R1 = Math.hypot(z1, s), R2 = Math.hypot(z2, s);
      const sines = z1 * z2 > 0 ? (s * s * (z2 * z2 - z1 * z1)) / (R1 * R2 * (z2 * R1 + z1 * R2)) : z2 / R2 - z1 / R1;
      const ref = ((MU0 * 2) / (4 * Math.PI * s)) * sines;
      // source: Griffiths 1999, Introduction to Electrodynamics, Example 5.5 (field of a straight segment); rounding only
      expectOutside({ quantity: `segment B (z1=${z1}, z2=${z2}, s=${s})`, source: "source: Griffiths 1999, Example 5.5", ours: B[1]!, reference: ref, rtol: 1e-13, unit: "T" });
      expect(Math.abs(B[0]!) + Math.abs(B[2]!)).toBe(0);
    }
  });

  it("is zero on the segment's line outside it and refuses points on the segment", () => {
    expect(field([0, 0, 0], [0, 0, 1], [0, 0, 2]).B.every((b) => b === 0)).toBe(true);
    expect(field([0, 0, 0], [0, 0, 1], [0, 0, 0.5]).ok).toBe(false);
  });

  it("a square loop's centre field is 2√2 μ₀I/(πL)", () => {
    const L = 0.1;
    const pts = [[-L / 2, -L / 2, 0], [L / 2, -L / 2, 0], [L / 2, L / 2, 0], [-L / 2, L / 2, 0]];
    const out = new Float64Array(3);
    for (let i = 0; i < 4; i++) {
      const p = pts[i]!, q = pts[(i + 1) % 4]!;
      addSegmentField(p[0]!, p[1]!, p[2]!, q[0]!, q[1]!, q[2]!, 1, 0, 0, 0, out);
    }
    // source: Griffiths 1999, Problem 5.8(a) (centre of a square loop, side L: B = 2√2 μ₀I/(πL))
    expectOutside({ quantity: "square loop centre B", source: "source: Griffiths 1999, Problem 5.8(a)", ours: out[2]!, reference: (2 * Math.SQRT2 * MU0) / (Math.PI * L), rtol: 1e-14, unit: "T" });
    expectRelClose(out[0]!, 0, 0, "no in-plane component", 1e-20);
  });
});

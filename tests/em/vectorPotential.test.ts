import { describe, expect, expectTypeOf, it } from "vitest";
import { loopVectorPotential } from "../../lib/em/vectorPotential.ts";
import { MU0 } from "../../lib/constants.ts";
import { expectOutside } from "../helpers/validation.ts";
import fixture from "../fixtures/em/loopField.json" with { type: "json" };

describe("loopVectorPotential", () => {
  it("matches Smythe's A_phi at 50 digits, including near the axis and far away", () => {
    for (const c of fixture.cases as { radius: number; rho: number; z: number; aPhi: number }[]) {
      const ours = loopVectorPotential(c.radius, 1, c.rho, c.z);
      if (c.aPhi === 0) {
        expect(ours).toBe(0);
        continue;
      }
      // 1e-13: the AGM sum T has only positive terms, so A_phi keeps full precision where the
      // textbook bracket (1 − k²/2)K − E cancels (it is O(k⁴) on the axis and far away)
      expectOutside({ quantity: `A_phi(a=${c.radius}, rho=${c.rho}, z=${c.z})`, source: `source: ${fixture.source}`, ours, reference: c.aPhi, rtol: 1e-13, unit: "T·m" });
    }
  });

  it("approaches the dipole potential μ₀ m sin θ /(4π r²) far away", () => {
    const a = 0.01, r = 10, theta = 0.8;
    const ref = (MU0 * Math.PI * a * a * Math.sin(theta)) / (4 * Math.PI * r * r);
    // source: Cochran & Heinrich, Applications of Maxwell's Equations §7.5 (dipole); (a/r)² = 1e-6 correction
    expectOutside({ quantity: "A_phi dipole limit", source: "source: Cochran & Heinrich §7.5", ours: loopVectorPotential(a, 1, r * Math.sin(theta), r * Math.cos(theta)), reference: ref, rtol: 1e-5, unit: "T·m" });
  });

  it("rejects bad input", () => {
    expect(() => loopVectorPotential(0, 1, 0, 0)).toThrow(/radius/);
    expect(() => loopVectorPotential(0.01, 1, 0.01, 0)).toThrow(/filament/);
  });

  it("has the documented signature", () => {
    expectTypeOf(loopVectorPotential).parameters.toEqualTypeOf<[number, number, number, number]>();
  });
});

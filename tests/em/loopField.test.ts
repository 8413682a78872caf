import { describe, expect, expectTypeOf, it } from "vitest";
import { loopField, type LoopFieldValue } from "../../lib/em/loopField.ts";
import { loopVectorPotential } from "../../lib/em/vectorPotential.ts";
import { MU0 } from "../../lib/constants.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { integrateGaussLegendre } from "../../lib/math/quadrature.ts";
import fixture from "../fixtures/em/loopField.json" with { type: "json" };

interface Case { radius: number; rho: number; z: number; bRho: number; bZ: number; aPhi: number }
const cases = fixture.cases as Case[];

describe("loopField", () => {
  it("matches the Simpson et al. 2001 closed form at 50 digits everywhere (axis, centre, near the wire, far away)", () => {
    for (const c of cases) {
      const { bRho, bZ } = loopField(c.radius, 1, c.rho, c.z);
      const mag = Math.hypot(c.bRho, c.bZ);
      const nearWire = Math.hypot(c.rho - c.radius, c.z) < 1e-3 * c.radius;
      // Tolerance regimes: away from the wire every component to 2e-13 relative to |B| (the AGM
      // sum keeps full precision on the axis and in the dipole region); within 1e-3·a of the
      // wire the component that is small against 1/distance keeps 1e-11 of |B| (the textbook
      // bracket loses the digits that the 1/α² divergence carries).
      const rtol = nearWire ? 1e-11 : 2e-13;
      const source = `source: ${fixture.source}`;
      expectOutside({ quantity: `B_rho(a=${c.radius}, rho=${c.rho}, z=${c.z})`, source, ours: bRho, reference: c.bRho, rtol: 0, atol: rtol * mag, unit: "T" });
      expectOutside({ quantity: `B_z(a=${c.radius}, rho=${c.rho}, z=${c.z})`, source, ours: bZ, reference: c.bZ, rtol: 0, atol: rtol * mag, unit: "T" });
    }
  });

  it("is relatively exact per component off the wire, including the tiny B_rho near the axis and the far field", () => {
    for (const c of cases) {
      if (Math.hypot(c.rho - c.radius, c.z) < 1e-3 * c.radius) continue;
      const { bRho, bZ } = loopField(c.radius, 1, c.rho, c.z);
      // 1e-12 per component: no cancellation anywhere in the AGM-sum forms (B_rho ∝ ρ near the
      // axis down to ρ = 1e-9 m; B at 1000 radii, where the textbook form loses ~6 digits).
      if (c.bRho !== 0) expectRelClose(bRho, c.bRho, 1e-12, `B_rho at rho=${c.rho}, z=${c.z}`);
      else expect(bRho).toBe(0);
      if (c.bZ !== 0) expectRelClose(bZ, c.bZ, 1e-12, `B_z at rho=${c.rho}, z=${c.z}`);
    }
  });

  it("gives mu0 I a^2 / (2 (a^2 + z^2)^{3/2}) on the axis and mu0 I / (2a) at the centre", () => {
    const a = 0.04;
    const I = 2.5;
    for (const z of [0, 1e-4, 0.01, 0.03, -0.05, 1, 100]) {
      // source: Griffiths, Introduction to Electrodynamics, 3rd ed. 1999, Example 5.6 (field on the axis of a loop)
      expectOutside({ quantity: `on-axis B_z(a=0.04, I=2.5, z=${z})`, source: "source: Griffiths 1999, Introduction to Electrodynamics, Example 5.6", ours: loopField(a, I, 0, z).bZ, reference: (MU0 * I * a * a) / (2 * (a * a + z * z) ** 1.5), rtol: 1e-14, unit: "T" });
      expect(loopField(a, I, 0, z).bRho).toBe(0);
    }
    // source: Griffiths 1999, Example 5.6 at z = 0
    expectOutside({ quantity: "centre B_z(a=0.04, I=2.5)", source: "source: Griffiths 1999, Example 5.6 (z = 0)", ours: loopField(a, I, 0, 0).bZ, reference: (MU0 * I) / (2 * a), rtol: 1e-15, unit: "T" });
  });

  it("approaches the magnetic dipole field mu0 m (2 cos θ, sin θ) / (4π r^3) far away", () => {
    const a = 0.01;
    const I = 1;
    const moment = I * Math.PI * a * a;
    for (const theta of [0.1, 0.7, Math.PI / 2, 2.5]) {
      const r = 10; // a/r = 1e-3: the next multipole term is (a/r)² ≈ 1e-6 relative
      const rho = r * Math.sin(theta);
      const z = r * Math.cos(theta);
      const { bRho, bZ } = loopField(a, I, rho, z);
      const br = bRho * Math.sin(theta) + bZ * Math.cos(theta);
      const bt = bRho * Math.cos(theta) - bZ * Math.sin(theta);
      const scale = (MU0 * moment) / (4 * Math.PI * r ** 3);
      // source: Cochran & Heinrich, Applications of Maxwell's Equations §7.5 (dipole field); 1e-5 covers the (a/r)² correction
      expectOutside({ quantity: `dipole B_r (theta=${theta})`, source: "source: Cochran & Heinrich, Applications of Maxwell's Equations §7.5", ours: br, reference: 2 * scale * Math.cos(theta), rtol: 1e-5, atol: 1e-5 * scale, unit: "T" });
      expectOutside({ quantity: `dipole B_theta (theta=${theta})`, source: "source: Cochran & Heinrich, Applications of Maxwell's Equations §7.5", ours: bt, reference: scale * Math.sin(theta), rtol: 1e-5, atol: 1e-5 * scale, unit: "T" });
    }
  });

  it("obeys Ampère's law: the circulation of B around a path linking the wire is mu0 I (independent method)", () => {
    const a = 0.04;
    const I = 3;
    for (const s of [0.002, 0.01, 0.03]) {
      // circle of radius s in the (ρ, z) half-plane around the wire at (a, 0)
      const circulation = integrateGaussLegendre(
        (t) => {
          const rho = a + s * Math.cos(t);
          const z = s * Math.sin(t);
          const { bRho, bZ } = loopField(a, I, rho, z);
          return (-bRho * Math.sin(t) + bZ * Math.cos(t)) * s;
        },
        0, 2 * Math.PI, 200,
      );
      // the path turns from ρ̂ towards ẑ, so its normal is ρ̂ × ẑ = −φ̂ and it links the current −I.
      // independent method: Gauss–Legendre quadrature of the line integral; 1e-10 is its convergence at 200 nodes
      expectRelClose(circulation, -MU0 * I, 1e-10, `Ampère loop radius ${s}`);
    }
  });

  it("is the curl of the vector potential (central finite differences)", () => {
    const a = 0.04;
    for (const [rho, z] of [[0.01, 0.02], [0.05, -0.01], [0.2, 0.3], [0.039, 0.004]] as const) {
      const h = 1e-6 * Math.max(rho, Math.abs(z));
      const A = (r: number, zz: number) => loopVectorPotential(a, 1, r, zz);
      const bz = ((rho + h) * A(rho + h, z) - (rho - h) * A(rho - h, z)) / (2 * h * rho);
      const brho = -(A(rho, z + h) - A(rho, z - h)) / (2 * h);
      const B = loopField(a, 1, rho, z);
      const mag = Math.hypot(B.bRho, B.bZ);
      // independent method: B = ∇ × A; central differences with h = 1e-6·r carry ~1e-9 of |B| (rounding/h + h²)
      expectRelClose(brho, B.bRho, 0, `B_rho = -dA/dz at (${rho}, ${z})`, 1e-8 * mag);
      expectRelClose(bz, B.bZ, 0, `B_z = (1/rho) d(rho A)/drho at (${rho}, ${z})`, 1e-8 * mag);
    }
  });

  it("scales linearly with the current and is odd in z for B_rho, even for B_z", () => {
    const p = loopField(0.03, 1, 0.02, 0.01);
    const q = loopField(0.03, -4, 0.02, -0.01);
    expectRelClose(q.bRho, 4 * p.bRho, 1e-15, "B_rho(−z, −4I) = 4 B_rho(z, I)");
    expectRelClose(q.bZ, -4 * p.bZ, 1e-15, "B_z(−z, −4I) = −4 B_z(z, I)");
  });

  it("rejects bad input and the point on the wire with a TanklightInputError", () => {
    expect(() => loopField(-0.01, 1, 0, 0)).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: loopField: radius: must be a finite number > 0 m, got -0.01]`);
    expect(() => loopField(0.01, 1, -1, 0)).toThrow(/rho/);
    expect(() => loopField(0.01, Number.NaN, 0, 0)).toThrow(/current/);
    expect(() => loopField(0.01, 1, 0.01, 0)).toThrow(/on the filament/);
  });

  it("has the documented signature", () => {
    expectTypeOf(loopField).parameters.toEqualTypeOf<[number, number, number, number]>();
    expectTypeOf(loopField).returns.toEqualTypeOf<LoopFieldValue>();
  });
});

describe("loopField and loopVectorPotential: lengths beyond the kernel's range (issue 11)", () => {
  it("refuse a radius, rho or z above 1e6 m with the limit and why, instead of returning NaN", () => {
    for (const f of [loopField, loopVectorPotential]) {
      expect(() => f(1e300, 1, 0, 0.03)).toThrow(/radius: must be at most 1000000 m.*overflows/);
      expect(() => f(0.04, 1, 1e300, 0)).toThrow(/rho: must be at most 1000000 m/);
      expect(() => f(0.04, 1, 0, -1e300)).toThrow(/z: must be at most 1000000 m/);
    }
    // at the limit the values stay finite: the on-axis field μ₀Ia²/(2(a²+z²)^{3/2}) (Biot–Savart, closed form)
    const b = loopField(0.04, 1, 0, 1e6).bZ;
    expect(Number.isFinite(b)).toBe(true);
    expectRelClose(b, (MU0 * 0.04 ** 2) / (2 * (0.04 ** 2 + 1e12) ** 1.5), 1e-12);
  });
});

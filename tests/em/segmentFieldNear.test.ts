/**
 * The field and potential of straight segments keep their digits close to the wire (issue 11):
 * against the closed forms evaluated at 50 digits from the same double inputs
 * (scripts/gen_robust_fixtures.py), at 1e-5 … 1e-8 m from a side.
 */
import { describe, expect, it } from "vitest";
import { magneticField } from "../../lib/em/magneticField.ts";
import { segmentVectorPotential } from "../../lib/em/segmentPotential.ts";
import { rectLoop } from "../../lib/em/builders/rectLoop.ts";
import type { Coil, Vec3 } from "../../lib/em/types.ts";
import { expectOutside } from "../helpers/validation.ts";
import fieldFixture from "../fixtures/em/segmentFieldNear.json" with { type: "json" };
import potentialFixture from "../fixtures/em/segmentPotentialNear.json" with { type: "json" };

interface FieldCase { label: string; points: Vec3[]; point: Vec3; distance: number; B: Vec3; orientation: "axis-aligned" | "general" }
interface PotentialCase { label: string; p: Vec3; q: Vec3; point: Vec3; distance: number; A: Vec3 }
const fieldCases = fieldFixture.cases as unknown as FieldCase[];
const potentialCases = potentialFixture.cases as unknown as PotentialCase[];
const P0 = { position: [0, 0, 0] as Vec3 };
const SOURCE = "independent method: closed-form Biot–Savart field of straight segments (Hanson & Hirshman 2002, eq. 8) at 50 digits, mpmath (scripts/gen_robust_fixtures.py)";
const norm = (v: readonly number[]): number => Math.hypot(v[0]!, v[1]!, v[2]!);

/** Tolerance per regime, relative to |B|:
 * - axis-aligned sides: r₁ = x − p and r₂ = x − q are exact in double (Sterbenz), so the only
 *   error left is the formula's rounding — the contract, 1e-12;
 * - a side in general orientation: r₁, r₂ carry rounding of eps·|x| already (the input point is
 *   only known to that), and the field's condition number beside a wire is R/d; the bound is
 *   50·eps·(R/d) — the algorithm adds nothing beyond the input's own rounding. */
function tolerance(c: FieldCase): number {
  if (c.orientation === "axis-aligned") return 1e-12;
  const R = Math.max(...c.points.map((p) => Math.hypot(c.point[0] - p[0], c.point[1] - p[1], c.point[2] - p[2])));
  return Math.max(1e-12, 50 * Number.EPSILON * (R / c.distance));
}

describe("segment field near a wire", () => {
  it("the issue's rectLoop keeps 1e-12 of |B| at 1e-5 … 1e-8 m from its side (was 2e-10 … 5e-6)", () => {
    const coil = rectLoop({ width: 0.06, height: 0.035, wire: { diameter: "0.5 mm" } });
    for (const c of fieldCases.filter((x) => x.orientation === "axis-aligned")) {
      // the builder's filament is the fixture's polygon, bit for bit
      expect(coil.filaments[0]).toMatchObject({ kind: "path", points: c.points });
      const B = magneticField(coil, P0, 1, c.point);
      const scale = norm(c.B);
      for (let k = 0; k < 3; k++) {
        expectOutside({ quantity: `B_${"xyz"[k]} ${c.label}`, source: SOURCE, ours: B[k]!, reference: c.B[k]!, rtol: 1e-12, atol: 1e-12 * scale, unit: "T" });
      }
    }
  });

  it("a polygon in general orientation is as accurate as its rounded inputs allow (50·eps·R/d)", () => {
    for (const c of fieldCases.filter((x) => x.orientation === "general")) {
      const coil: Coil = { filaments: [{ kind: "path", points: c.points, turns: 1 }], conductor: { kind: "round", diameter: 5e-4, outerDiameter: 5.4e-4 }, turns: 1, wireLength: 0.19 };
      const B = magneticField(coil, P0, 1, c.point);
      const scale = norm(c.B);
      const rtol = tolerance(c);
      for (let k = 0; k < 3; k++) {
        expectOutside({ quantity: `B_${"xyz"[k]} ${c.label}`, source: SOURCE, ours: B[k]!, reference: c.B[k]!, rtol, atol: rtol * scale, unit: "T" });
      }
    }
  });

  it("segmentVectorPotential keeps 1e-12 at 1e-5 … 1e-8 m (its log is formed without cancellation)", () => {
    for (const c of potentialCases) {
      const A = segmentVectorPotential(c.p, c.q, 1, c.point);
      const scale = norm(c.A);
      // axis-aligned: exact differences, 1e-12. Skew: the point's rounding eps·R moves d by a
      // relative eps·R/d, and A ∝ ln(4t(L−t)/d²) turns that into 2·eps·(R/d)/ln(L/d); bound 4× that
      const axisAligned = [0, 1, 2].filter((k) => c.p[k] !== c.q[k]).length === 1;
      const R = Math.hypot(c.q[0] - c.p[0], c.q[1] - c.p[1], c.q[2] - c.p[2]);
      const rtol = axisAligned ? 1e-12 : Math.max(1e-12, (8 * Number.EPSILON * (R / c.distance)) / Math.log(R / c.distance));
      for (let k = 0; k < 3; k++) {
        expectOutside({
          quantity: `A_${"xyz"[k]} ${c.label}`,
          source: "independent method: closed-form segment potential (Hanson & Hirshman 2002, eq. 7) at 50 digits, mpmath (scripts/gen_robust_fixtures.py)",
          ours: A[k]!, reference: c.A[k]!, rtol, atol: rtol * scale, unit: "T·m",
        });
      }
    }
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { couplingEvaluator, type CouplingEvaluator } from "../../lib/em/couplingEvaluator.ts";
import { mutualInductanceChecked } from "../../lib/em/mutualInductance.ts";
import { selfInductance } from "../../lib/em/selfInductance.ts";
import type { Coil, Pose } from "../../lib/em/types.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { handRoundCoil } from "./helpers.ts";
import { flatSpiral } from "../../lib/em/builders/flatSpiral.ts";
import { solenoid } from "../../lib/em/builders/solenoid.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";

const tx = handRoundCoil(0.02, 3, 2, 5e-4);
const token = handRoundCoil(0.004, 8, 2, 2e-4);
const P0: Pose = { position: [0, 0, 0] };

describe("couplingEvaluator", () => {
  it("agrees with the filament-by-filament sum within relTol over a map, tilts included (independent of its lumping)", () => {
    const ev = couplingEvaluator(tx, token);
    const poses: Pose[] = [];
    for (let x = -0.035; x <= 0.0351; x += 0.005) {
      for (const z of [0.003, 0.008, 0.02, 0.05]) {
        poses.push({ position: [x, 0.002, z] });
        poses.push({ position: [x, 0, z], axis: [Math.sin(0.6), 0.1, Math.cos(0.6)], spin: 0.4 });
      }
    }
    const ref = poses.map((p) => mutualInductanceChecked(tx, P0, token, p).value);
    const max = Math.max(...ref.map(Math.abs));
    poses.forEach((p, i) => {
      const r = ev.evaluate(P0, p);
      // the contract: relTol = 1e-3 relative, or 1e-2·relTol of the centre coupling where M is small;
      // the 0.5 % of the map target is 5× looser
      expectRelClose(r.mutual, ref[i]!, 1e-3, `pose ${JSON.stringify(p)} (${r.method})`, 2e-5 * max);
    });
    expect(ev.stats.lumped).toBeGreaterThan(ev.stats.exact);
  });

  it("neighbouring tokens (side by side, a few tenths of a millimetre to a few millimetres apart, flat and tilted) agree with the filament-by-filament sum within relTol and within the reported error", () => {
    const pebble = handRoundCoil(0.0065, 12, 4, 1.1e-4); // 48 turns in 4 layers
    const partial = handRoundCoil(0.005, 8, 4, 2e-4, 27); // last layer partly filled: not a product of layers and heights
    const cases: [Coil, Coil, Pose][] = [
      [pebble, pebble, { position: [0.0143, 0, 0] }],
      [pebble, pebble, { position: [0.016, 0, 0] }],
      [pebble, pebble, { position: [0.0112, 0.0112, 0.001] }],
      [pebble, pebble, { position: [0.015, 0.002, -0.0015], axis: [0.2, -0.1, 1] }],
      [pebble, partial, { position: [0.0135, 0, 0.0005] }],
      [partial, partial, { position: [-0.006, -0.0115, -0.0008], axis: [0.13, -0.16, 0.98] }],
      [partial, pebble, { position: [0.0006, 0.0175, 0.0057], axis: [-0.0055, 0.0038, 1] }],
    ];
    for (const [a, b, p] of cases) {
      const r = couplingEvaluator(a, b).evaluate(P0, p);
      const ref = mutualInductanceChecked(a, P0, b, p).value;
      const label = `pose ${JSON.stringify(p)} (${r.method})`;
      expectRelClose(r.mutual, ref, 1e-3, label);
      expect(Math.abs(r.mutual - ref), label).toBeLessThanOrEqual(Math.max(r.error, 1e-9 * Math.abs(ref)));
    }
  });

  it("reports an error at least as large as its true error where the seeded sweep once found it 2–145× low (independent method: the filament-by-filament sum)", () => {
    // the poses come from scripts/coupling_error_sweep.ts (seeds 1 and 5; demo coils of our own)
    const spiralTx = flatSpiral({ innerRadius: 0.01, turns: 8, pitch: 0.002, trace: { width: 0.001, thickness: 35e-6 } });
    const spiralTok = flatSpiral({ innerRadius: 0.003, turns: 5, pitch: 6e-4, trace: { width: 3e-4, thickness: 35e-6 } });
    const sol = solenoid({ radius: 0.015, turns: 8, pitch: 0.001, wire: { diameter: 6e-4 } });
    const cases: [Coil, Pose, number, string][] = [
      // level B's finest level: the ring rule's old estimate was 145× low
      [spiralTx, { position: [0.013227281154455622, 0.011435998943277861, 0.002319854218902481], axis: [-0.009799413767814165, -0.2796948377467631, 0.9600389415162383], spin: 2.23700557352507 }, 1e-5, "spiral, tilted, 2.3 mm up"],
      // level A: the old equal-weight order-1 lumps missed the third moment, 3.9× low
      [spiralTx, { position: [-0.03493721707306492, 0.00719119718181406, 0.030723698038050494], axis: [-0.649682632421849, 0.630779523445318, 0.4242990336207641], spin: 2.7302157487720433 }, 1e-3, "spiral, tilted 65°, 31 mm up"],
      // level A's tensor form: the solenoid's order-0 error vanished by accident; 4.3× outside relTol
      [sol, { position: [0.014572404530868416, 0.019560486286350577, 0.03447192752719832], spin: 0.855044755540636 }, 1e-5, "solenoid, 34 mm up"],
      // level A's combination form: the same accident beside a round token, 2.1× low (seed 4)
      [sol, { position: [-0.04788456853457891, 0.017073581005058916, 0.016273361376033257], spin: 1.2180896971064772 }, 1e-3, "solenoid, round token beside it"],
    ];
    const roundTok = roundCoil({ innerRadius: 0.005, turns: 6, layers: 2, wire: { diameter: 2e-4 } });
    for (const [t, pose, relTol, what] of cases) {
      const tok = what.includes("round token") ? roundTok : spiralTok;
      const ref = mutualInductanceChecked(t, P0, tok, pose).value;
      const r = couplingEvaluator(t, tok, { relTol }).evaluate(P0, pose);
      const dev = Math.abs(r.mutual - ref);
      // the reference is ≤ 1e-9 per filament pair: deviations below 1e-8·|M| are its own
      expect(dev, `${what}: |M − M_ref| ≤ reported error`).toBeLessThanOrEqual(Math.max(r.error, 1e-8 * Math.abs(ref)));
      expect(dev, `${what}: within relTol`).toBeLessThanOrEqual(relTol * Math.abs(ref));
    }
  });

  it("coupling() is mutual()/√(L₁L₂) and a moved transmitter pose gives the same as the relative pose", () => {
    const ev = couplingEvaluator(tx, token);
    const pr: Pose = { position: [0.01, 0, 0.012], axis: [0.2, 0, 1] };
    expectRelClose(ev.coupling(P0, pr), ev.mutual(P0, pr) / Math.sqrt(selfInductance(tx) * selfInductance(token)), 1e-14, "k");
    expectRelClose(ev.selfTx, selfInductance(tx), 1e-15, "L_tx");
    // shift both by the same vector: M unchanged (lumps are evaluated in the transmitter's frame)
    const s = 0.3;
    expectRelClose(ev.mutual({ position: [s, s, s] }, { ...pr, position: [0.01 + s, s, 0.012 + s] }), ev.mutual(P0, pr), 1e-9, "translation");
  });

  it("falls back to the exact sum for coils that are neither coaxial circles nor polygons, and warns on overlapping conductors", () => {
    // a transmitter with one turn tilted off the coil axis (polygons take the straight-conductor path: polygonCoupling.test.ts)
    const tilted: Coil = { ...tx, filaments: [...tx.filaments, { kind: "circle", center: [0, 0, 0.002], axis: [0.3, 0, 1], radius: 0.02, turns: 1 }] };
    const ev = couplingEvaluator(tilted, token);
    const p: Pose = { position: [0.005, 0, 0.01] };
    const r = ev.evaluate(P0, p);
    expect(r.method).toBe("exact");
    expectRelClose(r.mutual, mutualInductanceChecked(tilted, P0, token, p).value, 1e-6, "tilted-turn transmitter");
    const ev2 = couplingEvaluator(tx, token);
    // a token turn standing upright (axis y) whose rim dips into the transmitter's winding window,
    // 0.29 mm from a transmitter wire (the wire radii sum to 0.35 mm): conductors overlap
    const o = ev2.evaluate(P0, { position: [0.0204, 0, 0.0042], axis: [0, 1, 0] });
    expect(Number.isFinite(o.mutual)).toBe(true);
    expect(o.warnings.join()).toMatch(/overlap/);
  });

  it("rejects bad options and coils", () => {
    expect(() => couplingEvaluator(tx, token, { relTol: 0 })).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: couplingEvaluator: options.relTol: must be > 0 and ≤ 0.5000, got 0]`);
    expect(() => couplingEvaluator(tx, { ...token, filaments: [] } as Coil)).toThrow(/rx/);
  });

  it("has the documented signature", () => {
    expectTypeOf(couplingEvaluator).returns.toEqualTypeOf<CouplingEvaluator>();
    expectTypeOf<CouplingEvaluator["mutual"]>().parameters.toEqualTypeOf<[Pose, Pose]>();
  });
});

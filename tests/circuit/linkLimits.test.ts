import { describe, expect, expectTypeOf, it } from "vitest";
import fc from "fast-check";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { maxLinkEfficiency, optimalLoad } from "../../lib/circuit/linkLimits.ts";
import { solveLinkNetwork } from "../../lib/circuit/link/solveNetwork.ts";
import type { LinkNetwork } from "../../lib/circuit/link/network.ts";
import { sineDrive } from "../../lib/circuit/drive.ts";
import { resistorLoad } from "./linkStubs.ts";

const SRC = "source: k²Q₁Q₂/(1+√(1+k²Q₁Q₂))², follows from Kurs et al., Science 317:83–86 (2007) (docs/references.md, checked)";

function seriesPair(k: number, r1: number, r2: number, rl: number, topology: "series" | "parallel" = "series"): LinkNetwork {
  const f = 200e3;
  const w = 2 * Math.PI * f;
  const L1 = 24e-6;
  const L2 = 180e-6;
  const m = k * Math.sqrt(L1 * L2);
  return {
    frequency: f,
    inductance: [
      [L1, m],
      [m, L2],
    ],
    transmitter: { resistance: r1, compensation: "series", capacitance: 1 / (w * w * L1), drive: sineDrive(3) },
    receivers: [{ resistance: r2, topology, capacitance: 1 / (w * w * L2), load: resistorLoad(rl) }],
  };
}

describe("maxLinkEfficiency and optimalLoad", () => {
  it("the solver's efficiency at the optimal series load equals the published maximum", () => {
    const w = 2 * Math.PI * 200e3;
    for (const [k, r1, r2] of [
      [0.05, 0.25, 6.5],
      [0.01, 0.1, 2],
      [0.3, 1, 10],
    ] as const) {
      const q1 = (w * 24e-6) / r1;
      const q2 = (w * 180e-6) / r2;
      const rl = optimalLoad(k, q1, q2, r2);
      const eta = solveLinkNetwork(seriesPair(k, r1, r2, rl)).power.efficiency;
      // rtol 1e-12: exact in coupled-circuit theory for exactly tuned tanks and no source loss
      expectOutside({ quantity: `η at optimal load, k=${k}, Q₁=${q1.toFixed(1)}, Q₂=${q2.toFixed(1)}`, source: SRC, ours: eta, reference: maxLinkEfficiency(k, q1, q2), rtol: 1e-12 });
      // and it is a maximum: 1 % either side is lower
      for (const s of [0.99, 1.01]) expect(solveLinkNetwork(seriesPair(k, r1, r2, rl * s)).power.efficiency).toBeLessThan(eta);
    }
  });

  it("the parallel optimum reaches the maximum to the high-Q approximation of the untuned reactance", () => {
    const w = 2 * Math.PI * 200e3;
    const [k, r1, r2] = [0.05, 0.25, 6.5];
    const x = w * 180e-6;
    const q1 = (w * 24e-6) / r1;
    const q2 = x / r2;
    const rp = optimalLoad(k, q1, q2, r2, { topology: "parallel", reactance: x });
    const eta = solveLinkNetwork(seriesPair(k, r1, r2, rp, "parallel")).power.efficiency;
    // the parallel load adds reactance −R_s·(R_s/X)/(…) ≈ R_s²/X to the loop, which stays
    // untuned: the loss is second order in R_s/X (here R_s/X ≈ 0.06 → a few 1e-3 relative).
    const rs = r2 * Math.sqrt(1 + k * k * q1 * q2);
    const rtol = 2 * (rs / x) ** 2;
    expectOutside({ quantity: "η at optimal parallel load (high-Q regime)", source: SRC, ours: eta, reference: maxLinkEfficiency(k, q1, q2), rtol });
    expect(eta).toBeLessThanOrEqual(maxLinkEfficiency(k, q1, q2));
  });

  it("maxLinkEfficiency stays in [0, 1), rises with k²Q₁Q₂ and ignores the sign of k", () => {
    fc.assert(
      fc.property(fc.double({ min: -0.99, max: 0.99, noNaN: true }), fc.double({ min: 1, max: 1e4, noNaN: true }), fc.double({ min: 1, max: 1e4, noNaN: true }), (k, q1, q2) => {
        const e = maxLinkEfficiency(k, q1, q2);
        return e >= 0 && e < 1 && e === maxLinkEfficiency(-k, q1, q2) && maxLinkEfficiency(k, 2 * q1, q2) >= e;
      }),
    );
    expectRelClose(maxLinkEfficiency(0.1, 100, 100), 100 / (1 + Math.sqrt(101)) ** 2, 1e-15, "k²Q₁Q₂ = 100");
    expect(maxLinkEfficiency(0, 100, 100)).toBe(0);
  });

  it("rejects |k| ≥ 1, non-positive Q and a parallel optimum without a reactance", () => {
    expect(() => maxLinkEfficiency(1, 10, 10)).toThrow(/\|k\| < 1/);
    expect(() => maxLinkEfficiency(0.1, 0, 10)).toThrow(/q1/);
    expect(() => optimalLoad(0.1, 10, 10, 1, { topology: "parallel" })).toThrow(/reactance/);
    expectTypeOf(maxLinkEfficiency).returns.toEqualTypeOf<number>();
    expectTypeOf(optimalLoad).parameter(3).toEqualTypeOf<number>();
  });
});

import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { tokenLoadModel } from "../../lib/circuit/link/tokenLoad.ts";
import { solveLinkNetwork } from "../../lib/circuit/link/solveNetwork.ts";
import { sineDrive } from "../../lib/circuit/drive.ts";
import { ledPreset } from "../../lib/circuit/loads/ledPresets.ts";
import { fundamentalConductance } from "../../lib/circuit/loads/describingFunction.ts";
import type { TokenLoad } from "../../lib/circuit/loads/types.ts";

const red: TokenLoad = { kind: "led", led: ledPreset("red") };
const pair: TokenLoad = { kind: "antiParallel", a: ledPreset("red"), b: ledPreset("green-gap") };

describe("tokenLoadModel", () => {
  it("passes the loads' describing function through exactly by default", () => {
    const m = tokenLoadModel(red);
    expect(m.conductance(2.1)).toBe(fundamentalConductance(red, 2.1));
    expect(tokenLoadModel({ kind: "resistor", resistance: 220 }).linear).toBe(true);
    expect(m.ledCurrents!(2.1)[0]!.label).toMatch(/red/);
  });

  it("the tabulated describing function matches the exact one to 1e-7 relative", () => {
    // independent method: the loads' own cycle integral at each sampled amplitude. Cubic
    // Hermite on ln G with exact slopes, 5 mV grid: error O(h⁴), measured ≈ 1e-8.
    for (const load of [red, pair]) {
      const tab = tokenLoadModel(load, { tabulate: true });
      fc.assert(
        fc.property(fc.double({ min: 0.006, max: 11.9, noNaN: true }), (a) => {
          expectRelClose(tab.conductance(a), fundamentalConductance(load, a), 1e-7, `G(${a})`);
        }),
        { numRuns: 200 },
      );
      // the geometric tail above the grid (12 V … 12.3 kV): Hermite on ln G against ln A, 32 nodes
      // per doubling; independent method: the cycle integral again
      fc.assert(
        fc.property(fc.double({ min: 12, max: 12000, noNaN: true }), (a) => {
          expectRelClose(tab.conductance(a), fundamentalConductance(load, a), 1e-7, `G(${a}) in the tail`);
        }),
        { numRuns: 200 },
      );
      // outside both: the exact function
      expect(tab.conductance(2e4)).toBe(fundamentalConductance(load, 2e4));
      expect(tab.conductance(0.001)).toBe(fundamentalConductance(load, 0.001));
    }
  });

  it("a solve with the tabulated LED agrees with the exact one", () => {
    const f = 200e3;
    const w = 2 * Math.PI * f;
    const [L1, L2] = [6e-6, 300e-6];
    const mk = (load: ReturnType<typeof tokenLoadModel>, m: number) =>
      solveLinkNetwork({
        frequency: f,
        inductance: [
          [L1, m],
          [m, L2],
        ],
        transmitter: { resistance: 0.1, compensation: "parallel", capacitance: 1 / (w * w * L1), drive: sineDrive(7.85, 0.025) },
        receivers: [{ resistance: 10, topology: "parallel", capacitance: 1 / (w * w * L2), load }],
      });
    const exact = tokenLoadModel(red);
    const tab = tokenLoadModel(red, { tabulate: true });
    for (const m of [3e-8, 1e-8, 3e-9, 1e-9]) {
      const a = mk(exact, m).receivers[0]!;
      const b = mk(tab, m).receivers[0]!;
      // rtol 1e-7 on the amplitude: the table's G error, damped by the tank (dV/dG·G/V < 1)
      expectRelClose(b.loadVoltage, a.loadVoltage, 1e-7, `amplitude, M = ${m}`);
      // LED average current: log-linear between nodes, error O(h²) ≈ 2e-4
      expectRelClose(b.leds[0]!.averageCurrent, a.leds[0]!.averageCurrent, 5e-4, `LED current, M = ${m}`, 1e-12);
    }
  });
});

import { describe, expect, it } from "vitest";
import { switchingEdge, EDGE_RESOLUTION } from "../../../lib/circuit/transient/stepControl.ts";
import { simulate } from "../../../lib/circuit/transient/simulate.ts";
import { singleSwitchDrive } from "../../../lib/circuit/transient/drives.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

describe("switchingEdge: bisection for a switching instant", () => {
  it("finds the instant to the asked resolution", () => {
    const edge = 0.3;
    const t = switchingEdge((x) => x >= edge, false, 0, 1, 1e-12);
    expect(t).toBeGreaterThanOrEqual(edge);
    expect(t - edge).toBeLessThanOrEqual(1e-12);
  });

  it("ends when the asked resolution is finer than the spacing of doubles at t (late in a long run)", () => {
    // at t = 0.035 s one double step is 6.9e-18 s; a resolution of 1e-10 of a 50 ns step is
    // 5e-18 s — the bisection used to loop forever here
    const lo = 0.035;
    const hi = lo + 5e-8;
    const edge = lo + 1.234e-8;
    const t = switchingEdge((x) => x >= edge, false, lo, hi, EDGE_RESOLUTION * 5e-8);
    expect(t).toBeGreaterThanOrEqual(edge);
    const below = t - Number.EPSILON * t; // the next double below (or a little further)
    expect(below < edge || t === edge).toBe(true);
  });
});

describe("simulate: event location cannot stall at any time", () => {
  it("the 7000-cycle single-switch run returns, and its last cycle is the settled one", () => {
    // issue 11 reproduction: this run never returned (switching-edge bisection loop on
    // hi − lo > 1e-10·h once one double step of t exceeded that)
    const c = singleSwitchDrive({ supply: 5, frequency: 200e3, coilInductance: 6e-6, coilResistance: 0.1, tankCapacitance: 62e-9 }).circuit;
    const late = simulate(c, { stop: 7000 / 200e3, stepsPerCycle: 100, frequency: 200e3, keepCycles: 1 });
    expect(late.time.length).toBe(101);
    expectRelClose(late.time.at(-1)!, 7000 / 200e3, 1e-12, "last sample time");
    expect(late.stats.switchingEvents).toBe(2 * 7000 - 1);
    // independent check: the tank (Q ≈ 100) has settled long before 1000 cycles, so the last
    // cycle at 7000 cycles must repeat the last cycle at 1000 cycles; measured 9e-13 of the
    // peak (edge instants late in the run are located to one double step, 7e-18 s)
    const early = simulate(c, { stop: 1000 / 200e3, stepsPerCycle: 100, frequency: 200e3, keepCycles: 1 });
    for (const [name, a, b] of [["switch", late.nodeVoltages.switch!, early.nodeVoltages.switch!], ["Ltx", late.currents.Ltx!, early.currents.Ltx!]] as const) {
      let peak = 0;
      let diff = 0;
      for (let i = 0; i < a.length; i++) {
        expect(Number.isFinite(a[i]!)).toBe(true);
        peak = Math.max(peak, Math.abs(b[i]!));
        diff = Math.max(diff, Math.abs(a[i]! - b[i]!));
      }
      expect(diff / peak, name).toBeLessThan(1e-10);
    }
  });
});

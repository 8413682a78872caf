import { describe, expect, expectTypeOf, it } from "vitest";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { frequencySweep, type FrequencySweep } from "../../lib/circuit/frequencySweep.ts";
import type { LinkNetwork } from "../../lib/circuit/link/network.ts";
import { sineDrive } from "../../lib/circuit/drive.ts";
import { resistorLoad } from "./linkStubs.ts";

const f0 = 200e3;
const L = 50e-6;
const C = 1 / ((2 * Math.PI * f0) ** 2 * L);

function identicalTanks(k: number, r: number): LinkNetwork {
  return {
    frequency: f0,
    inductance: [
      [L, k * L],
      [k * L, L],
    ],
    transmitter: { resistance: r, compensation: "series", capacitance: C, drive: sineDrive(1) },
    receivers: [{ resistance: r, topology: "series", capacitance: C, load: resistorLoad(1e-9 + r * 1e-6) }],
  };
}

describe("frequencySweep", () => {
  it("identical coupled tanks split at f₀/√(1 ± k)", () => {
    // source: textbook coupled resonators — normal modes of two identical LC tanks coupled by
    // M = kL at ω = 1/√((L ± M)C). Q = ωL/R ≈ 6e4 here: the peaks of the driven, lossy pair
    // sit within O(1/Q²) ≈ 1e-9 of the lossless modes; rtol 1e-7 covers that and the
    // golden-section refinement (1e-11).
    for (const k of [0.05, 0.2, 0.4]) {
      const r = 1e-3;
      const lo = f0 / Math.sqrt(1 + k);
      const hi = f0 / Math.sqrt(1 - k);
      const s = frequencySweep(identicalTanks(k, r), { start: 0.7 * f0, stop: 1.4 * f0, points: 4001 });
      const peaks = s.peaks.transmitterCurrent;
      expect(peaks.length).toBe(2);
      const src = "source: textbook coupled resonators, f₀/√(1 ± k)";
      expectOutside({ quantity: `lower split frequency, k = ${k}`, source: src, ours: peaks[0]!, reference: lo, rtol: 1e-7, unit: "Hz" });
      expectOutside({ quantity: `upper split frequency, k = ${k}`, source: src, ours: peaks[1]!, reference: hi, rtol: 1e-7, unit: "Hz" });
    }
  });

  it("weakly coupled tanks (k below 1/Q) show one peak at f₀", () => {
    // critical coupling k_c = 1/Q: below it the two modes merge into one response peak
    const r = 2; // Q = ωL/R ≈ 31
    const s = frequencySweep(identicalTanks(0.01, r), { start: 0.8 * f0, stop: 1.2 * f0, points: 401 });
    expect(s.peaks.transmitterCurrent.length).toBe(1);
    // one tuned loop seen through a weak reflected load: the peak is at f₀ to O(k²)
    expectRelClose(s.peaks.transmitterCurrent[0]!, f0, 1e-4, "single peak at f₀");
  });

  it("accepts a list or a frequency-dependent network and reports every quantity per frequency", () => {
    const list = [150e3, 200e3, 250e3];
    const s = frequencySweep((f) => ({ ...identicalTanks(0.1, 0.5), frequency: f }), list, { refine: false });
    expect(Array.from(s.frequency)).toEqual(list);
    expect(s.loadVoltage.length).toBe(1);
    expect(s.loadVoltage[0]!.length).toBe(3);
    for (const arr of [s.transmitterCurrent, s.inputPower, s.delivered, s.efficiency]) {
      expect(arr.every((x) => Number.isFinite(x))).toBe(true);
    }
    const log = frequencySweep(identicalTanks(0.1, 0.5), { start: 1e5, stop: 1e6, points: 3, spacing: "log" }, { refine: false });
    expectRelClose(log.frequency[1]!, Math.sqrt(1e5 * 1e6), 1e-14, "log spacing midpoint");
    expect(() => frequencySweep(identicalTanks(0.1, 0.5), { start: 2e5, stop: 1e5, points: 3 })).toThrow(/stop > start/);
    expectTypeOf(frequencySweep).returns.toEqualTypeOf<FrequencySweep>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { waveformHarmonics, type Harmonics } from "../../../lib/circuit/transient/harmonics.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";
import { expectOutside } from "../../helpers/validation.ts";

function sampled(fn: (t: number) => number, f: number, spc: number, cycles: number, t0 = 0) {
  const n = spc * cycles + 1;
  const time = new Float64Array(n);
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    time[i] = t0 + i / (f * spc);
    x[i] = fn(time[i]!);
  }
  return { time, x };
}

describe("waveformHarmonics", () => {
  it("recovers amplitude and phase of a cosine exactly (cosine reference at t = 0)", () => {
    const f = 1e5;
    const { time, x } = sampled((t) => 0.5 + 2 * Math.cos(2 * Math.PI * f * t + 0.7) + 0.3 * Math.cos(3 * 2 * Math.PI * f * t - 1), f, 64, 3, 1.234e-5);
    const h = waveformHarmonics(time, x, { frequency: f, count: 5, cycles: 2 });
    expectRelClose(h.dc, 0.5, 1e-12, "dc");
    expectRelClose(h.amplitude[1]!, 2, 1e-12, "A1");
    expectRelClose(h.phase[1]!, 0.7, 1e-10, "φ1");
    expectRelClose(h.amplitude[3]!, 0.3, 1e-11, "A3");
    expectRelClose(h.phase[3]!, -1, 1e-10, "φ3");
    expect(h.amplitude[2]!).toBeLessThan(1e-12);
    expectRelClose(h.distortion, 0.15, 1e-10, "distortion");
  });

  it("a square wave has harmonics 4/(πk) for odd k", () => {
    const f = 1e3;
    // samples at the cell midpoints avoid the ambiguous value at the jumps
    const spc = 2000;
    const { time, x } = sampled((t) => (((t * f) % 1) < 0.5 ? 1 : -1), f, spc, 1, 0.25 / (spc * f));
    const h = waveformHarmonics(time, x, { frequency: f, count: 7 });
    for (const k of [1, 3, 5, 7]) {
      // source: Fourier series of a square wave, b_k = 4/(πk) for odd k (textbook).
      // Regime "2000 samples a period": sampling (aliasing) error ≈ (πk/N)²/6 < 1e-4
      expectOutside({ quantity: `square wave harmonic ${k}`, source: "source: Fourier series of a square wave (textbook)", ours: h.amplitude[k]!, reference: 4 / (Math.PI * k), rtol: 1e-4 });
    }
    expect(h.amplitude[2]!).toBeLessThan(1e-9);
  });

  it("refuses a frequency whose period is not a whole number of steps", () => {
    const { time, x } = sampled(Math.sin, 1, 10, 2);
    expect(() => waveformHarmonics(time, x, { frequency: 0.77 })).toThrow(/whole number of steps/);
  });

  it("types", () => {
    expectTypeOf(waveformHarmonics).returns.toEqualTypeOf<Harmonics>();
  });
});

import { describe, expect, expectTypeOf, it } from "vitest";
import { periodicGate, sineWaveform, stepWaveform } from "../../../lib/circuit/transient/waveforms.ts";
import type { Waveform } from "../../../lib/circuit/transient/circuit.ts";
import { expectRelClose } from "../../helpers/expectRelClose.ts";

describe("waveforms and gates", () => {
  it("sineWaveform uses the cosine reference: offset + A·cos(ωt + φ)", () => {
    const s = sineWaveform({ amplitude: 2, frequency: 1e5, phase: Math.PI / 2, offset: 1 });
    expectRelClose(s(0), 1, 1e-15, "t = 0", 1e-15);
    expectRelClose(s(2.5e-6), -1, 1e-12, "quarter period");
  });
  it("stepWaveform holds `before` until `at`", () => {
    const s = stepWaveform(5, { at: 1e-3, before: -1 });
    expect(s(0)).toBe(-1);
    expect(s(1e-3)).toBe(5);
  });
  it("periodicGate is closed for duty·T from each period start (after the delay), inverted on request", () => {
    const g = periodicGate({ frequency: 1e3, duty: 0.25, delay: 1e-4 });
    expect(g(1e-4)).toBe(true);
    expect(g(3.4e-4)).toBe(true);
    expect(g(3.6e-4)).toBe(false);
    expect(g(1.05e-3)).toBe(false);
    expect(g(1.15e-3)).toBe(true);
    const inv = periodicGate({ frequency: 1e3, duty: 0.25, delay: 1e-4, invert: true });
    expect(inv(3.6e-4)).toBe(true);
  });
  it("refuses a duty outside (0, 1) and a non-positive frequency", () => {
    expect(() => periodicGate({ frequency: 1e3, duty: 1 })).toThrow(/duty: must be between 0 and 1/);
    expect(() => sineWaveform({ amplitude: 1, frequency: 0 })).toThrow(/frequency/);
  });
  it("types", () => {
    expectTypeOf(sineWaveform).returns.toEqualTypeOf<Waveform>();
    expectTypeOf(periodicGate).returns.toEqualTypeOf<(t: number) => boolean>();
  });
});

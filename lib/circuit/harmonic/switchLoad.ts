/**
 * The single-switch drive's switch as a time-varying conductance on the sampled period, for
 * harmonic balance: i(t) = g(t)·v(t) with g = 1/R_on while closed (t mod T < duty·T) and 1/R_off
 * while open. A sample that falls exactly on a switching instant takes the mean of the two
 * conductances, which keeps the trapezoidal (sampled) Fourier integral of the jump second-order
 * accurate — the usual treatment of a jump at a node of the trapezoidal rule.
 */
import type { TimeLoad } from "./timeLoad.ts";

/**
 * @param samples N samples per period; onResistance Ω > 0; offResistance Ω; duty 0…1 (closed from t = 0).
 * @returns a linear time-varying {@link TimeLoad} (no LEDs).
 * @example switchLoad(4, 0.05, 1e6, 0.5) // g = [10.0000005, 20, 10.0000005, 1e-6] S
 */
export function switchLoad(samples: number, onResistance: number, offResistance: number, duty: number): TimeLoad {
  const N = samples;
  const gOn = 1 / onResistance;
  const gOff = 1 / offResistance;
  const gate = new Float64Array(N);
  const edge = duty * N;
  for (let s = 0; s < N; s++) {
    if (s === 0 || Math.abs(s - edge) < 1e-9) gate[s] = 0.5 * (gOn + gOff);
    else gate[s] = s < edge ? gOn : gOff;
  }
  return {
    evaluate(v, i, g) {
      for (let s = 0; s < N; s++) {
        g[s] = gate[s]!;
        i[s] = gate[s]! * v[s]!;
      }
    },
    leds: () => [],
  };
}

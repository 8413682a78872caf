/**
 * Test-only loads for the link solver: a resistor and a Shockley LED with series resistance
 * whose describing function is computed here by the periodic trapezoid rule. Kept so the
 * numeric core's tests do not depend on lib/circuit/loads (the real loads are tested with the
 * solver in tests/circuit/linkLoads.test.ts).
 */
import { lambertWOfLog } from "../../lib/math/lambertW.ts";
import type { LinkLoadModel } from "../../lib/circuit/link/network.ts";

export function resistorLoad(r: number): LinkLoadModel {
  return { label: `resistor ${r} Ω`, linear: true, conductance: () => 1 / r };
}

/** i(v) of a Shockley diode with series resistance, exact via Lambert W. */
export function stubLedCurrent(v: number, is = 1e-18, n = 2, rs = 10, vt = 0.025852): number {
  const nvt = n * vt;
  const a = (is * rs) / nvt;
  return (nvt / rs) * lambertWOfLog(Math.log(a) + (v + is * rs) / nvt) - is;
}

/** A stub LED load: fundamental conductance and average current over a sine of peak v. */
export function stubLedLoad(label = "stub LED", is = 1e-18, n = 2, rs = 10): LinkLoadModel {
  const N = 96; // periodic trapezoid: spectrally accurate for this smooth periodic integrand
  return {
    label,
    conductance(v: number): number {
      if (!(v > 0)) return 0;
      let s = 0;
      for (let j = 0; j < N; j++) {
        const c = Math.cos((2 * Math.PI * j) / N);
        s += stubLedCurrent(v * c, is, n, rs) * c;
      }
      return Math.max(0, ((2 / N) * s) / v);
    },
    ledCurrents(v: number) {
      let s = 0;
      for (let j = 0; j < N; j++) s += stubLedCurrent(v * Math.cos((2 * Math.PI * j) / N), is, n, rs);
      return [{ label, current: s / N }];
    },
  };
}

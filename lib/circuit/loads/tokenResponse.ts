/**
 * A token on its own: a parallel tank (coil L with series resistance R, capacitor C with
 * optional ESR) carrying a token load, driven by the EMF induced in its coil. Gives the tank
 * amplitude and each LED's current for a given induced voltage — the token half of the link
 * (the link solver does the same with the transmitter and the other tokens around it).
 *
 * Circuit: the EMF e (peak, in series with the coil) feeds the node across C and the load.
 * KCL with the load's describing function G(A) (real):
 *   (e − V)/(R + jωL) = V·(Y_C + G(|V|)),  Y_C = 1/(ESR + 1/(jωC))
 *   ⇒ |V| = |e| / |1 + Z_L·(Y_C + G(|V|))|,
 * one real equation in the amplitude A = |V|, solved by bisection on
 * h(A) = A·|1 + Z_L(Y_C + G(A))| − |e| (h(0) = −|e|; the bracket is widened until h > 0).
 * Physics-notes.md, "The token": the same as the Norton form I_N = e/Z_L into Y_tank + G.
 */
import type { TokenLoad, LedCurrent } from "./types.ts";
import { averageLoadCurrent, checkLoad, fundamentalConductance } from "./describingFunction.ts";
import * as z from "../../zod.ts";
import { TanklightInputError } from "../../errors.ts";
import { capacitance, frequency, inductance, parseInput, resistance, voltage, lazySchema } from "../../schema.ts";
import { HIGH_VOLTAGE } from "../../hazards.ts";

/** Inputs of {@link tokenResponse}: SI numbers or quantity strings ("0.2 V", "200 kHz", "100 uH"). */
export const TokenResponseInput = lazySchema(() => z.strictObject({
  // upper bounds: far beyond any token, and where the tank arithmetic would overflow
  /** induced EMF amplitude in the token coil, V (peak), 0 … 1 MV */
  emf: voltage({ nonNegative: true, max: 1e6 }),
  /** frequency, Hz, > 0 and ≤ 1 GHz */
  frequency: frequency({ max: 1e9 }),
  /** token coil inductance, H, > 0 and ≤ 1 H */
  inductance: inductance({ max: 1 }),
  /** token coil series resistance at the frequency, Ω, > 0 and ≤ 1 GΩ */
  coilResistance: resistance({ positive: true, max: 1e9 }),
  /** tank capacitance, F, > 0 and ≤ 1 F */
  capacitance: capacitance({ max: 1 }),
  /** capacitor ESR, Ω, 0 … 1 GΩ (default 0) */
  capacitorEsr: resistance({ max: 1e9 }).optional(),
  /** the load across the capacitor (checked by the describing function) */
  load: z.custom<TokenLoad>((l) => typeof l === "object" && l !== null && !Array.isArray(l), {
    error: "must be a TokenLoad ({ kind: 'led', led }, …; see tokenCircuits.ts)",
  }),
}));
/** What {@link tokenResponse} accepts. */
export type TokenResponseInput = z.input<typeof TokenResponseInput>;

/** The token's operating point. */
export interface TokenResponse {
  /** tank (load) voltage amplitude, V (peak) */
  readonly amplitude: number;
  /** the load's describing-function conductance at that amplitude, S */
  readonly loadConductance: number;
  /** power into the load, ½·A²·G, W */
  readonly loadPower: number;
  /** coil current amplitude, A (peak) */
  readonly coilCurrent: number;
  /** each LED's average current and relative brightness */
  readonly leds: readonly LedCurrent[];
  readonly warnings: readonly string[];
}

/**
 * Tank amplitude and LED currents of a token for a given induced EMF (describing function).
 * @param input see {@link TokenResponseInput}.
 * @returns {@link TokenResponse}.
 * @example tokenResponse({ emf: 0.2, frequency: 200e3, inductance: 100e-6, coilResistance: 5,
 *   capacitance: 6.332573977646111e-9, load: { kind: "led", led: ledPreset("red") } }).amplitude // → 1.7905628126747266 V
 */
export function tokenResponse(spec: TokenResponseInput): TokenResponse {
  const where = "tokenResponse";
  const input = parseInput(TokenResponseInput, spec, where);
  checkLoad(input.load, where);
  const esr = input.capacitorEsr ?? 0;
  const w = 2 * Math.PI * input.frequency;
  const zr = input.coilResistance;
  const zi = w * input.inductance;
  // Y_C = 1/(ESR − j/(ωC))
  const xc = -1 / (w * input.capacitance);
  const d = esr * esr + xc * xc;
  const ycr = esr / d;
  const yci = -xc / d;
  const factor = (g: number): number => {
    // |1 + Z_L·(Y_C + g)|
    const yr = ycr + g;
    const re = 1 + zr * yr - zi * yci;
    const im = zr * yci + zi * yr;
    return Math.hypot(re, im);
  };
  const e = input.emf;
  const load = input.load;
  if (e === 0) {
    return { amplitude: 0, loadConductance: fundamentalConductance(load, 0), loadPower: 0, coilCurrent: 0, leds: averageLoadCurrent(load, 0), warnings: [] };
  }
  const h = (A: number) => A * factor(fundamentalConductance(load, A)) - e;
  let lo = 0;
  let hi = e / factor(fundamentalConductance(load, 0));
  for (let k = 0; k < 200 && h(hi) <= 0; k++) {
    lo = hi;
    hi *= 2;
  }
  if (!(h(hi) > 0)) {
    throw new TanklightInputError([{ path: "emf", message: "no operating point found (the load's describing function does not bound the amplitude)", value: e }], where);
  }
  for (let k = 0; k < 200 && hi - lo > 1e-14 * hi; k++) {
    const m = 0.5 * (lo + hi);
    if (h(m) > 0) hi = m;
    else lo = m;
  }
  const A = 0.5 * (lo + hi);
  const g = fundamentalConductance(load, A);
  // coil current |e − V|/|Z_L| = A·|Y_C + G|
  const coilCurrent = A * Math.hypot(ycr + g, yci);
  const warnings: string[] = [];
  if (A > HIGH_VOLTAGE.value) {
    warnings.push(
      `tank amplitude ${A.toPrecision(3)} V peak: high voltage on the token's capacitor; check its rating (capacitorStress) and follow local codes, regulations and licensed practice`,
    );
  }
  return { amplitude: A, loadConductance: g, loadPower: 0.5 * A * A * g, coilCurrent, leds: averageLoadCurrent(load, A), warnings };
}

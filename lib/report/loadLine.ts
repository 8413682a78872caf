/**
 * The numbers behind a token's load-line chart. The coil's EMF jωM·I₁ seen through the coil's
 * own impedance is a Norton current I_N = jωM·I₁/(R₂ + jωL₂) feeding the tank admittance
 * Y_t = jωC₂ + 1/(R₂ + jωL₂) in parallel with the LED. The LED's fundamental current is in
 * phase with the tank voltage V (a memoryless conductance), so |I_N|² = (Re Y_t·V + I_LED)² +
 * (Im Y_t·V)², and the current still available to the LED at amplitude V is
 * √(|I_N|² − (Im Y_t·V)²) − Re Y_t·V (Norton's theorem; any circuits text).
 */
import * as z from "../zod.ts";
import { checkLoad, fundamentalConductance } from "../circuit/loads/describingFunction.ts";
import { capacitance, current, frequency, inductance, lazySchema, parseInput, quantity, resistance, voltage, wholeNumber } from "../schema.ts";
import type { TokenLoad } from "../circuit/loads/types.ts";

/** Inputs, SI: frequency Hz, mutual inductance H, transmitter coil current A peak, token L H, R Ω, C F. */
export interface LoadLineInput {
  readonly frequency: number;
  readonly mutualInductance: number;
  readonly transmitterCurrent: number;
  readonly inductance: number;
  readonly resistance: number;
  readonly capacitance: number;
  readonly load: TokenLoad;
  /** highest tank amplitude to tabulate, V (default: the open-circuit amplitude, at most 6 V) */
  readonly maxVoltage?: number;
  /** points (default 301) */
  readonly points?: number;
}

/** The tabulated load line. */
export interface LoadLine {
  /** Norton current of the coil, A peak */
  readonly norton: number;
  readonly voltage: number[];
  /** current available to the load at each voltage, A peak */
  readonly available: number[];
  /** the load's fundamental current at each voltage, A peak */
  readonly load: number[];
}

/**
 * Tabulates a token's load line.
 * @example tokenLoadLine({ frequency: 2e5, mutualInductance: 1e-7, transmitterCurrent: 1, inductance: 3e-4, resistance: 12, capacitance: 2.2e-9, load: { kind: "led", led: ledPreset("red") } }).norton
 */
export function tokenLoadLine(p: LoadLineInput): LoadLine {
  p = parseInput(LoadLineArgs, { input: p }, "tokenLoadLine").input as LoadLineInput;
  checkLoad(p.load, "tokenLoadLine");
  const w = 2 * Math.PI * p.frequency;
  const zr = p.resistance, zi = w * p.inductance, z2 = zr * zr + zi * zi;
  const norton = (w * Math.abs(p.mutualInductance) * p.transmitterCurrent) / Math.sqrt(z2);
  const g = zr / z2, b = w * p.capacitance - zi / z2;
  const vmax = p.maxVoltage ?? Math.min(norton / Math.hypot(g, b), 6);
  const n = p.points ?? 301;
  const voltage = Array.from({ length: n }, (_, i) => (vmax * i) / (n - 1));
  const available = voltage.map((v) => Math.max(0, Math.sqrt(Math.max(0, norton * norton - (b * v) ** 2)) - g * v));
  const load = voltage.map((v) => fundamentalConductance(p.load, v) * v);
  return { norton, voltage, available, load };
}

/** tokenLoadLine's input (strict; quantity strings accepted). Amplitudes ≤ 1 kV and ≤ 100000 points (each point evaluates the load's describing function). */
const LoadLineArgs = lazySchema(() => z.strictObject({
  input: z.strictObject({
    frequency: frequency({ max: 1e12 }),
    mutualInductance: quantity("inductance", { min: -1, max: 1 }),
    transmitterCurrent: current({ nonNegative: true, max: 1e6 }),
    inductance: inductance({ max: 1 }),
    resistance: resistance({ max: 1e9 }),
    capacitance: capacitance({ max: 1 }),
    load: z.unknown(),
    maxVoltage: voltage({ positive: true, max: 1000 }).optional(),
    points: wholeNumber(2, 100000, "each point evaluates the load's describing function").optional(),
  }),
}));

/**
 * Tank capacitor stress: peak and RMS voltage and current, reactive power, loss in the ESR,
 * and a recommendation of dielectric and voltage rating — for a sinusoidal tank voltage or
 * current (I = ωC·V for a capacitor; RMS = peak/√2; P = I_rms²·ESR).
 */
import * as z from "../zod.ts";
import { TanklightInputError } from "../errors.ts";
import { HIGH_VOLTAGE } from "../hazards.ts";
import { capacitance, current, dimensionless, frequency, parseInput, voltage, lazySchema } from "../schema.ts";
import { DIELECTRICS, DielectricSchema, esrFromDissipationFactor, recommendCapacitor, type CapacitorRecommendation } from "./dielectrics.ts";

/** Inputs of {@link capacitorStress}: give the voltage amplitude or the current amplitude (SI numbers or quantity strings). */
export const CapacitorStressInput = lazySchema(() => z.strictObject({
  /** capacitance, F > 0 */
  capacitance: capacitance(),
  /** frequency, Hz > 0 */
  frequency: frequency(),
  /** peak voltage across the capacitor, V ≥ 0 */
  voltageAmplitude: voltage({ nonNegative: true }).optional(),
  /** peak current through the capacitor, A ≥ 0 */
  currentAmplitude: current({ nonNegative: true }).optional(),
  /** dielectric (for tan δ and the checks), default "C0G" */
  dielectric: DielectricSchema.optional(),
  /** tan δ override (a datasheet value), 0 ≤ tan δ ≤ 1 */
  dissipationFactor: dimensionless({ nonNegative: true, max: 1 }).optional(),
  /** DC voltage rating of the chosen part, V > 0 (checked against derating × peak) */
  ratedVoltage: voltage({ positive: true }).optional(),
}));
/** What {@link capacitorStress} accepts. */
export type CapacitorStressInput = z.input<typeof CapacitorStressInput>;

/** Stress on a tank capacitor. */
export interface CapacitorStress {
  readonly peakVoltage: number;
  readonly rmsVoltage: number;
  readonly peakCurrent: number;
  readonly rmsCurrent: number;
  /** reactive power V_rms·I_rms, var */
  readonly reactivePower: number;
  /** ESR from tan δ, Ω */
  readonly esr: number;
  /** heat in the capacitor, I_rms²·ESR, W */
  readonly dissipatedPower: number;
  readonly recommendation: CapacitorRecommendation;
  readonly warnings: readonly string[];
  /** safety cautions (high voltage) */
  readonly cautions: readonly string[];
}

/**
 * Peak/RMS voltage and current, reactive power and ESR loss of a tank capacitor, with a
 * recommendation of dielectric and rating and warnings where the chosen part falls short.
 * @param input see {@link CapacitorStressInput} (exactly one of voltageAmplitude, currentAmplitude).
 * @example capacitorStress({ capacitance: 6.8e-9, frequency: 200e3, voltageAmplitude: 30 }).peakCurrent // → 0.2563539605329271 A
 */
export function capacitorStress(spec: CapacitorStressInput): CapacitorStress {
  const where = "capacitorStress";
  const input = parseInput(CapacitorStressInput, spec, where);
  const hasV = input.voltageAmplitude !== undefined;
  const hasI = input.currentAmplitude !== undefined;
  if (hasV === hasI) {
    throw new TanklightInputError([{ path: "voltageAmplitude", message: "give exactly one of voltageAmplitude and currentAmplitude", value: { voltageAmplitude: input.voltageAmplitude, currentAmplitude: input.currentAmplitude } }], where);
  }
  const given = (hasV ? input.voltageAmplitude : input.currentAmplitude)!;
  const wc = 2 * Math.PI * input.frequency * input.capacitance;
  const vp = hasV ? given : given / wc;
  const ip = hasV ? given * wc : given;
  const diel = input.dielectric ?? "C0G";
  const tanD = input.dissipationFactor ?? DIELECTRICS[diel].dissipationFactor;
  const esr = esrFromDissipationFactor(tanD, input.frequency, input.capacitance);
  const irms = ip / Math.SQRT2;
  const vrms = vp / Math.SQRT2;
  const recommendation = recommendCapacitor(vp, input.capacitance);
  const warnings: string[] = [];
  if (!DIELECTRICS[diel].goodForTanks) {
    warnings.push(`${DIELECTRICS[diel].name} is not a tank dielectric: ${DIELECTRICS[diel].note}`);
  }
  if (input.ratedVoltage !== undefined) {
    if (input.ratedVoltage < vp) warnings.push(`peak voltage ${vp.toPrecision(3)} V exceeds the part's rating ${input.ratedVoltage} V`);
    else if (input.ratedVoltage < recommendation.derating * vp) warnings.push(`rating ${input.ratedVoltage} V is below ${recommendation.derating} × the peak voltage (trade-practice derating)`);
  }
  const cautions: string[] = [];
  if (vp > HIGH_VOLTAGE.value) {
    cautions.push(
      `tank voltage ${vp.toPrecision(3)} V peak: a resonant tank can hold voltages that shock and burn; insulate it, discharge before handling, and follow local codes, regulations and licensed practice`,
    );
  }
  return {
    peakVoltage: vp,
    rmsVoltage: vrms,
    peakCurrent: ip,
    rmsCurrent: irms,
    reactivePower: vrms * irms,
    esr,
    dissipatedPower: irms * irms * esr,
    recommendation,
    warnings,
    cautions,
  };
}

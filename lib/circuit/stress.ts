/**
 * Tank capacitor stress: peak and RMS voltage and current, reactive power, loss in the ESR,
 * and a recommendation of dielectric and voltage rating — for a sinusoidal tank voltage or
 * current (I = ωC·V for a capacitor; RMS = peak/√2; P = I_rms²·ESR).
 */
import { TanklightInputError, requirePositive } from "../errors.ts";
import { HIGH_VOLTAGE } from "../hazards.ts";
import { DIELECTRICS, esrFromDissipationFactor, recommendCapacitor, type CapacitorRecommendation, type Dielectric } from "./dielectrics.ts";

/** Inputs of {@link capacitorStress}: give the voltage amplitude or the current amplitude. */
export interface CapacitorStressInput {
  /** capacitance, F > 0 */
  readonly capacitance: number;
  /** frequency, Hz > 0 */
  readonly frequency: number;
  /** peak voltage across the capacitor, V ≥ 0 */
  readonly voltageAmplitude?: number;
  /** peak current through the capacitor, A ≥ 0 */
  readonly currentAmplitude?: number;
  /** dielectric (for tan δ and the checks), default "C0G" */
  readonly dielectric?: Dielectric;
  /** tan δ override (a datasheet value), ≥ 0 */
  readonly dissipationFactor?: number;
  /** DC voltage rating of the chosen part, V (checked against derating × peak) */
  readonly ratedVoltage?: number;
}

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
export function capacitorStress(input: CapacitorStressInput): CapacitorStress {
  const where = "capacitorStress";
  requirePositive(input.capacitance, "capacitance", "F", where);
  requirePositive(input.frequency, "frequency", "Hz", where);
  const hasV = input.voltageAmplitude !== undefined;
  const hasI = input.currentAmplitude !== undefined;
  if (hasV === hasI) {
    throw new TanklightInputError([{ path: "voltageAmplitude", message: "give exactly one of voltageAmplitude and currentAmplitude", value: { voltageAmplitude: input.voltageAmplitude, currentAmplitude: input.currentAmplitude } }], where);
  }
  const given = (hasV ? input.voltageAmplitude : input.currentAmplitude)!;
  if (!(Number.isFinite(given) && given >= 0)) {
    throw new TanklightInputError([{ path: hasV ? "voltageAmplitude" : "currentAmplitude", message: "must be a finite number ≥ 0", value: given }], where);
  }
  const wc = 2 * Math.PI * input.frequency * input.capacitance;
  const vp = hasV ? given : given / wc;
  const ip = hasV ? given * wc : given;
  const diel = input.dielectric ?? "C0G";
  if (!(diel in DIELECTRICS)) {
    throw new TanklightInputError([{ path: "dielectric", message: `must be one of ${Object.keys(DIELECTRICS).join(", ")}`, value: diel }], where);
  }
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
    requirePositive(input.ratedVoltage, "ratedVoltage", "V", where);
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

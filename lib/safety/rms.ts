/**
 * The one place where the safety checks turn the library's peak amplitudes into the RMS values
 * that exposure and emission limits are written in (limits: RMS; lib/*: peak, design.md §3).
 */

/** How every safety result states its convention (printed with the numbers). */
export const RMS_CONVENTION =
  "the library's amplitudes are peak; every field, current and voltage compared with a limit is converted once to RMS (peak/√2 for a sinusoid; |B|rms = √((|Re B|² + |Im B|²)/2) for a phasor vector)";

/**
 * RMS of a sinusoid of peak amplitude `peak`: peak/√2.
 * @example rmsFromPeak(1) // → 0.7071067811865476
 */
export function rmsFromPeak(peak: number): number {
  return peak * Math.SQRT1_2;
}

/**
 * RMS magnitude of a time-harmonic vector with phasor components (peak) re + j·im:
 * √(⟨|B(t)|²⟩) = √((|re|² + |im|²)/2). Takes the squared norms.
 * @example rmsOfPhasorVector(1, 0) // → 0.7071067811865476 (a linearly polarised unit peak)
 */
export function rmsOfPhasorVector(reNorm2: number, imNorm2: number): number {
  return rmsFromPeak(Math.sqrt(reNorm2 + imNorm2));
}

/** 20·log10(x / ref), dB; −∞ for x = 0. @example decibels(1e-3, 1e-6) // → 60 */
export function decibels(x: number, ref: number): number {
  return 20 * Math.log10(x / ref);
}

/**
 * Token loads: what sits across a token's tank capacitor. A discriminated union of plain,
 * readonly objects; the describing-function functions (describingFunction.ts) and the
 * transient engine read the same objects.
 */
import type { Diode, Led } from "./led.ts";

/**
 * The loads a token can carry across its tank (voltage v across the tank, peak amplitude A):
 * - `led` — one LED across the tank (conducts on the positive half-cycle).
 * - `antiParallel` — two LEDs back to back: `a` conducts on the positive half, `b` on the negative.
 * - `parallelSameDirection` — two LEDs in parallel pointing the same way (both on the positive half);
 *   the one with the lower forward voltage takes nearly all the current.
 * - `bridge` — four identical diodes (full-wave bridge) feeding one LED, with an optional series
 *   resistor in the DC path; no reservoir capacitor (the LED current follows |v|).
 * - `halfWaveReservoir` — one diode (plus optional series resistor) charging a reservoir
 *   capacitor with the LED across the capacitor: steady light. `frequency` (Hz) is needed only
 *   for the ripple estimate; the describing function uses the large-capacitor charge balance.
 * - `resistor` — a plain resistor (for checks).
 */
export type TokenLoad =
  | { readonly kind: "led"; readonly led: Led }
  | { readonly kind: "antiParallel"; readonly a: Led; readonly b: Led }
  | { readonly kind: "parallelSameDirection"; readonly a: Led; readonly b: Led }
  | { readonly kind: "bridge"; readonly diode: Diode; readonly led: Led; readonly seriesResistance?: number }
  | {
      readonly kind: "halfWaveReservoir";
      readonly diode: Diode;
      readonly led: Led;
      /** reservoir capacitance, F, > 0 */
      readonly capacitance: number;
      /** resistor in series with the diode, Ω, ≥ 0 */
      readonly seriesResistance?: number;
      /** operating frequency, Hz (ripple estimate only) */
      readonly frequency?: number;
    }
  | { readonly kind: "resistor"; readonly resistance: number };

/** The kinds of {@link TokenLoad}. */
export type TokenLoadKind = TokenLoad["kind"];

/** One LED's share of a load's current at a tank amplitude. */
export interface LedCurrent {
  /** which LED of the load: "led", "a" or "b" */
  readonly role: "led" | "a" | "b";
  /** the LED's label, e.g. "red LED (preset)" */
  readonly label: string;
  /** average (DC) current over a cycle, A — what brightness follows */
  readonly current: number;
  /** peak current over the cycle, A */
  readonly peakCurrent: number;
  /**
   * average current / the LED's rated current (20 mA for presets): light output taken as
   * proportional to average current below rated current (from memory (unverified); real LEDs
   * are slightly sub-linear near and above rated current)
   */
  readonly relativeBrightness: number;
}

/**
 * The link solver's numeric core input: a transmitter and any number of receivers as plain SI
 * numbers, with the full inductance matrix (self inductances on the diagonal, mutual
 * inductances off it). `solveLink(system)` (lib/circuit/link.ts) builds this from coils, poses
 * and parts; `solveLinkNetwork(network)` (./solveNetwork.ts) solves it.
 */
import type { DriveEquivalent } from "../drive.ts";
import { HIGH_VOLTAGE } from "../../hazards.ts";
import type { TokenLoad } from "../loads/types.ts";

/**
 * A receiver's load as the link solver sees it: a describing function (fundamental admittance
 * as a function of the peak sinusoidal voltage across it) plus, for reports, each LED's
 * average current.
 */
export interface LinkLoadModel {
  /** a short label, e.g. "red LED" or "resistor 1 kΩ" */
  readonly label: string;
  /** true when the admittance does not depend on the amplitude (a resistor) */
  readonly linear?: boolean;
  /** the token load itself, when the model was built from one: harmonic balance evaluates it in time */
  readonly token?: TokenLoad;
  /** fundamental (in-phase) conductance at peak amplitude v ≥ 0, S, ≥ 0, finite */
  conductance(amplitude: number): number;
  /** fundamental susceptance at peak amplitude v, S (default 0) */
  susceptance?(amplitude: number): number;
  /** average current of each LED of the load at peak amplitude v, A (reports only) */
  ledCurrents?(amplitude: number): readonly {
    readonly label: string;
    readonly current: number;
    /** light relative to the LED's rated current (default: current / options.brightnessReference) */
    readonly relativeBrightness?: number;
  }[];
}

/** Compensation of the transmitter coil by its capacitor. */
export type Compensation = "series" | "parallel" | "none";

/** The transmitter as numbers (SI). */
export interface TransmitterNetwork {
  readonly label?: string;
  /**
   * phase of its own drive's EMF (or held current), rad (default 0): the drive phasor is
   * amplitude·e^{jφ}. Not used on a shared drive (see `feed`).
   */
  readonly phase?: number;
  /**
   * a coil on a shared drive: `drive` indexes `LinkNetwork.sharedDrives`, `polarity` −1 for a
   * coil connected the other way round (its current and field reversed). Absent: the
   * transmitter has its own drive (`drive`, `phase`).
   */
  readonly feed?: { readonly drive: number; readonly polarity: 1 | -1 };
  /** coil AC series resistance at the drive frequency, Ω, ≥ 0 */
  readonly resistance: number;
  readonly compensation: Compensation;
  /** compensation capacitance, F, > 0 (not used for "none") */
  readonly capacitance?: number;
  /** capacitor equivalent series resistance, Ω, ≥ 0 (default 0) */
  readonly capacitorEsr?: number;
  /** capacitor voltage rating, V (compared with the peak voltage; optional) */
  readonly capacitorRating?: number;
  /** coil self-resonant frequency, Hz (optional; a warning above a third of it) */
  readonly selfResonance?: number;
  readonly drive: DriveEquivalent;
}

/** One receiver (token) as numbers (SI). */
export interface ReceiverNetwork {
  readonly label?: string;
  /** coil AC series resistance at the drive frequency, Ω, ≥ 0 */
  readonly resistance: number;
  /** "parallel": C and the load across the coil; "series": coil, C and load in one loop */
  readonly topology: "series" | "parallel";
  /** tank capacitance, F, > 0 */
  readonly capacitance: number;
  /** capacitor ESR, Ω, ≥ 0 (default 0) */
  readonly capacitorEsr?: number;
  /** capacitor voltage rating, V (optional) */
  readonly capacitorRating?: number;
  /** coil self-resonant frequency, Hz (optional) */
  readonly selfResonance?: number;
  readonly load: LinkLoadModel;
}

/**
 * A drive shared by several transmitter coils: its equivalent, and how the coils hang on it —
 * "series" (one string: the same current through every coil's tank) or "parallel" (every tank
 * across the drive's terminals, behind its source impedance).
 */
export interface SharedDriveNetwork {
  readonly label: string;
  readonly drive: DriveEquivalent;
  readonly wiring: "series" | "parallel";
  /** phase of the drive's EMF (or held current), rad (default 0) */
  readonly phase?: number;
}

/**
 * The whole link as numbers. The inductance matrix's first rows and columns are the
 * transmitters (index 0 with one transmitter), then the receivers.
 */
export interface LinkNetwork {
  /** drive frequency, Hz, > 0 */
  readonly frequency: number;
  /** (t+m)×(t+m) symmetric matrix (t transmitters, m receivers): L on the diagonal, M off it, H */
  readonly inductance: readonly (readonly number[])[];
  /** the transmitter of a one-transmitter link; with `transmitters` given, the first of them */
  readonly transmitter: TransmitterNetwork;
  /** several transmitters (absent: the one `transmitter`) */
  readonly transmitters?: readonly TransmitterNetwork[];
  /** drives shared by several transmitters, referenced by `TransmitterNetwork.feed` */
  readonly sharedDrives?: readonly SharedDriveNetwork[];
  readonly receivers: readonly ReceiverNetwork[];
}

/**
 * The transmitters of a network: `transmitters`, or the one `transmitter`.
 * @example networkTransmitters({ frequency: 2e5, inductance: [[1e-5]], transmitter: tx, receivers: [] }).length // → 1
 */
export function networkTransmitters(network: Pick<LinkNetwork, "transmitter" | "transmitters">): readonly TransmitterNetwork[] {
  return network.transmitters ?? [network.transmitter];
}

/** Options of the operating-point solve and the result's verdicts. */
export interface LinkOptions {
  /** average LED current at or above which an LED counts as lit, A (default 0.5 mA) */
  readonly litThreshold?: number;
  /** LED current taken as relative brightness 1, A (default 20 mA) */
  readonly brightnessReference?: number;
  /** peak voltage above which a caution is issued, V (default HIGH_VOLTAGE of lib/hazards.ts, 42.4 V = 30 V RMS) */
  readonly cautionVoltage?: number;
  /** iteration cap of the damped Newton (default 80) */
  readonly maxIterations?: number;
  /** relative tolerance on each tank amplitude (default 1e-10) */
  readonly tolerance?: number;
  /** "throw" (default) or "warn": what to do when the Newton iteration does not converge */
  readonly onNonConvergence?: "throw" | "warn";
}

/**
 * Default lit threshold: 0.5 mA average LED current. Trade practice (no source): indicator LEDs
 * are visible indoors from about 0.1–1 mA; 0.5 mA sits inside that band.
 */
export const DEFAULT_LIT_THRESHOLD = 0.5e-3;
/** Default brightness reference: 20 mA, the usual nominal current of an indicator LED (trade practice, no source). */
export const DEFAULT_BRIGHTNESS_REFERENCE = 20e-3;
/** Default caution voltage, V peak: the one high-voltage threshold, HIGH_VOLTAGE in lib/hazards.ts (42.4 V peak = 30 V RMS). */
export const DEFAULT_CAUTION_VOLTAGE = HIGH_VOLTAGE.value;

/**
 * The link solver's result: every element's current and voltage (peak and RMS), the power
 * flow, each LED's average current and verdict, warnings and cautions. All SI; amplitudes
 * peak unless the name says Rms; phasors e^{jωt} relative to the drive's EMF (or, for a
 * current-regulated drive, to the transmitter coil current).
 */

/** A complex number (phasor or impedance). */
export interface Phasor {
  readonly re: number;
  readonly im: number;
}

/**
 * The fields every tank element (transmitter or receiver) reports: its coil and capacitor,
 * each as peak and RMS, and their losses.
 */
export interface TankState {
  readonly label: string;
  /** coil current, A peak */
  readonly coilCurrent: number;
  readonly coilCurrentRms: number;
  readonly coilCurrentPhasor: Phasor;
  /** voltage across the coil's terminals (its EMF of self and mutual induction plus its loss), V peak */
  readonly coilVoltage: number;
  readonly coilVoltageRms: number;
  /** capacitor voltage (including its ESR drop), V peak (0 without a capacitor) */
  readonly capacitorVoltage: number;
  readonly capacitorVoltageRms: number;
  /** capacitor current, A peak */
  readonly capacitorCurrent: number;
  readonly capacitorCurrentRms: number;
  /** loss in the coil's series resistance, W */
  readonly coilLoss: number;
  /** loss in the capacitor's ESR, W */
  readonly capacitorLoss: number;
}

/** The transmitter's state: its tank, and what the drive sees. */
export interface TransmitterState extends TankState {
  /** current out of the drive's equivalent source, A peak */
  readonly sourceCurrent: number;
  readonly sourceCurrentRms: number;
  /** voltage at the drive's terminals (after its source impedance), V peak */
  readonly sourceVoltage: number;
  readonly sourceVoltageRms: number;
  /** impedance the drive's terminals see, Ω */
  readonly inputImpedance: Phasor;
  /** impedance the receivers add in series with the transmitter coil, Σ jωM₀ⱼIⱼ / I₀, Ω */
  readonly reflectedImpedance: Phasor;
  /** loss in the drive's source resistance, W (0 for a coil on a shared drive: see `drives`) */
  readonly driverLoss: number;
  /**
   * power into the transmitter's terminals ½Re(V·I*), W: its coil and capacitor losses plus
   * what it passes on to the other coils (set by the describing-function solver)
   */
  readonly terminalPower?: number;
}

/**
 * One drive: a transmitter's own, or one shared by several coils. For a shared drive the
 * source current and terminal voltage are the drive's (the string current of a series
 * wiring, the sum of the branch currents of a parallel one); each fed transmitter's
 * `sourceCurrent`/`sourceVoltage` are then its own tank's terminals.
 */
export interface DriveState {
  /** the transmitter's label (own drive) or the shared drive's name */
  readonly label: string;
  /** what the drive's equivalent is, e.g. "full bridge from 12 V (fundamental 4V/π), …" */
  readonly description: string;
  /** "own" (one transmitter) or the shared drive's wiring */
  readonly wiring: "own" | "series" | "parallel";
  /** labels of the transmitters it feeds */
  readonly transmitters: readonly string[];
  /** current out of the drive's equivalent source, A peak */
  readonly sourceCurrent: number;
  readonly sourceCurrentRms: number;
  /** voltage at the drive's terminals (after its source impedance), V peak */
  readonly sourceVoltage: number;
  readonly sourceVoltageRms: number;
  /** impedance the drive's terminals see, Ω */
  readonly inputImpedance: Phasor;
  /** power the drive's ideal source delivers (for a held current: at its terminals), W */
  readonly inputPower: number;
  /** loss in the drive's source resistance, W */
  readonly driverLoss: number;
}

/** One LED of a receiver's load. */
export interface LedState {
  readonly label: string;
  /** average (DC) current, A — what brightness follows */
  readonly averageCurrent: number;
  /** averageCurrent / brightness reference (default 20 mA) */
  readonly relativeBrightness: number;
  /** averageCurrent ≥ the lit threshold */
  readonly lit: boolean;
}

/** One receiver's state: its tank, the load and its LEDs. */
export interface ReceiverState extends TankState {
  /** EMF induced by all other coils, V peak */
  readonly emf: number;
  /** fundamental voltage across the load, V peak (the solved tank amplitude) */
  readonly loadVoltage: number;
  readonly loadVoltageRms: number;
  /** fundamental load current, A peak */
  readonly loadCurrent: number;
  readonly loadCurrentRms: number;
  /** power into the load, W */
  readonly loadPower: number;
  readonly leds: readonly LedState[];
  /** at least one LED lit */
  readonly lit: boolean;
  /** every LED lit (false for a load without LEDs) */
  readonly allLit: boolean;
}

/** The power flow, W. */
export interface LinkPower {
  /** power delivered by the drive's ideal source (before its source resistance), W */
  readonly input: number;
  /** Σ load power, W */
  readonly delivered: number;
  readonly driver: number;
  readonly transmitterCoil: number;
  readonly transmitterCapacitor: number;
  readonly receiverCoils: number;
  readonly receiverCapacitors: number;
  /** delivered / input (0 when no power flows) */
  readonly efficiency: number;
}

/** Everything solveLink / solveLinkNetwork returns. */
export interface LinkResult {
  readonly frequency: number;
  readonly converged: boolean;
  /** outer (Newton or local-solve) iterations */
  readonly iterations: number;
  /** scalar iterations of the per-receiver amplitude solves, total */
  readonly scalarIterations: number;
  /** the transmitter (with several: the first of `transmitters`) */
  readonly transmitter: TransmitterState;
  /** every transmitter, in the system's order (set by the describing-function solver; solveLink always sets it) */
  readonly transmitters?: readonly TransmitterState[];
  /** every drive: each transmitter's own, then the shared ones (set as `transmitters` is) */
  readonly drives?: readonly DriveState[];
  readonly receivers: readonly ReceiverState[];
  /** the power flow, summed over every transmitter and drive */
  readonly power: LinkPower;
  /** the lit threshold used, A, and where the default comes from */
  readonly litThreshold: number;
  readonly litThresholdSource: string;
  readonly drive: { readonly label: string; readonly assumptions: readonly string[] };
  /** physically doubtful but legal input or state */
  readonly warnings: readonly string[];
  /** safety cautions (high tank voltages); they defer to local codes and licensed practice */
  readonly cautions: readonly string[];
}

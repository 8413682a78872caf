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
  readonly transmitter: TransmitterState;
  readonly receivers: readonly ReceiverState[];
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

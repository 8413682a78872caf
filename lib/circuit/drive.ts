/**
 * Transmitter drives and their equivalent fundamental sources for the frequency-domain link
 * solver (lib/circuit/link.ts).
 *
 * Every drive reduces, at the drive frequency, to one of two equivalents:
 * - a voltage source: peak fundamental EMF `amplitude` (V, phase reference 0) behind a source
 *   impedance `resistance + j·reactance` (Ω) — the sine source, the half and full bridge, the
 *   single-switch drives;
 * - a current source: the transmitter coil current is held at `amplitude` (A peak) — the
 *   current-regulated transmitter.
 *
 * Square-wave bridges: a half bridge switches its output between 0 and V_DD, a square wave of
 * amplitude V_DD/2 about V_DD/2 (the DC part is blocked by the series capacitor), so its
 * fundamental is (4/π)(V_DD/2) = 2V_DD/π; a full bridge applies ±V_DD, fundamental 4V_DD/π
 * (Fourier series of a square wave, any circuits text). One switch of a half bridge and two of a
 * full bridge conduct at any instant: source resistance R_on and 2R_on.
 *
 * Single-switch drives (a switch to ground under the transmitter coil and its capacitor, fed
 * from the supply — the common low-cost arrangement): class-E design relations after Sokal &
 * Sokal (IEEE JSSC SC-10(3), 1975) and Raab (IEEE TCAS 24(12), 1977), see {@link classEDesign}
 * and {@link classEDrive}; and the parallel-tank form, see {@link parallelTankDrive}.
 */
import * as z from "../zod.ts";
import { TanklightInputError } from "../errors.ts";
import { current, frequency, inductance, parseArgs, parseInput, power, resistance, voltage, lazySchema } from "../schema.ts";
import type { QuantityInput } from "../units.ts";

/**
 * The fields of each kind of drive, defined once (SI numbers or quantity strings, "12 V",
 * "0.1 ohm"): the drive functions' arguments below (sineDrive(amplitude, outputResistance),
 * halfBridgeDrive(supply, onResistance), …) and the link's drive specs (`DriveInput`,
 * lib/circuit/link/schema.ts) are made of them. `classE` is the link spec's (classEDesign sizes it).
 */
export const DRIVE_FIELDS = lazySchema(() => {
  const supply = voltage({ positive: true });
  const onResistance = resistance().optional();
  return {
    sine: { amplitude: voltage({ nonNegative: true }), outputResistance: resistance().optional() },
    switched: { supply, onResistance },
    current: { amplitude: current({ nonNegative: true }) },
    classE: { supply, power: power({ positive: true }), onResistance },
  };
});

// Argument schemas: messages name the argument.
const SineArgs = lazySchema(() => z.strictObject(DRIVE_FIELDS.sine));
const SupplyArgs = lazySchema(() => z.strictObject(DRIVE_FIELDS.switched));
const CurrentArgs = lazySchema(() => z.strictObject(DRIVE_FIELDS.current));

/** Equivalent fundamental source of a drive, as the link solver sees it (SI, peak). */
export type DriveEquivalent =
  | {
      readonly kind: "voltage";
      /** peak fundamental EMF, V, ≥ 0 (phase reference 0) */
      readonly amplitude: number;
      /** source resistance, Ω, ≥ 0 (its loss is the driver loss) */
      readonly resistance: number;
      /** source reactance at the drive frequency, Ω (0 for all drives here) */
      readonly reactance: number;
      /** what the equivalent assumes, for reports */
      readonly label: string;
      /** where the source sits: "series" (in series with the transmitter network) */
      readonly assumptions: readonly string[];
      /** the drive's real waveform, for harmonic balance (absent: a sinusoidal EMF) */
      readonly waveform?: DriveWaveform;
    }
  | {
      readonly kind: "current";
      /** peak transmitter coil current, A, ≥ 0 */
      readonly amplitude: number;
      readonly label: string;
      readonly assumptions: readonly string[];
    };

/**
 * What a drive really applies, beyond its fundamental equivalent — read by the harmonic-balance
 * solver (lib/circuit/harmonic/), ignored by the describing-function solver:
 * - `square`: the EMF switches between `low` and `high` at 50 % duty (half and full bridge),
 *   aligned so that its fundamental is the equivalent's real amplitude;
 * - `singleSwitch`: a switch from the bottom of a parallel transmitter tank to ground, fed
 *   from `supply` at the top, closed for `duty` of each period from t = 0 (the parallel-tank
 *   single-switch drive); its switch-node waveform is solved with the tank, not assumed.
 */
export type DriveWaveform =
  | { readonly kind: "square"; readonly low: number; readonly high: number }
  | {
      readonly kind: "singleSwitch";
      /** V_DD, V */
      readonly supply: number;
      /** Ω, > 0 */
      readonly onResistance: number;
      /** Ω, > onResistance */
      readonly offResistance: number;
      /** fraction of the period closed, 0 < duty < 1 */
      readonly duty: number;
    };

/** Smallest switch on-resistance the harmonic-balance model of a single switch uses, Ω (an ideal switch has none). */
export const MIN_SWITCH_ON_RESISTANCE = 1e-3;
/** Off-resistance of a drive's switch in harmonic balance, Ω (as the time-domain engine's default). */
export const SWITCH_OFF_RESISTANCE = 1e6;

/**
 * A sine source with output resistance.
 * @param amplitude peak open-circuit voltage, V, ≥ 0.
 * @param outputResistance source resistance, Ω, ≥ 0 (default 0).
 * @returns the voltage-source equivalent (exact: the source is already sinusoidal).
 * @example sineDrive(10, 50).amplitude // → 10
 */
export function sineDrive(amplitudeInput: QuantityInput, outputResistanceInput: QuantityInput = 0): DriveEquivalent {
  const a = parseArgs(SineArgs, [amplitudeInput, outputResistanceInput], "sineDrive");
  const amplitude = a.amplitude;
  const outputResistance = a.outputResistance ?? 0;
  return {
    kind: "voltage",
    amplitude,
    resistance: outputResistance,
    reactance: 0,
    label: `sine source ${fmt(amplitude)} V peak, ${fmt(outputResistance)} Ω`,
    assumptions: ["sinusoidal source: the equivalent is exact"],
  };
}

/**
 * Fundamental of a half-bridge square-wave drive: output switched between 0 and V_DD at 50 %
 * duty, DC blocked by the series capacitor. Fundamental amplitude 2V_DD/π; source resistance
 * R_on (one switch conducts at a time).
 * @param supply V_DD, V, > 0.
 * @param onResistance one switch's on-resistance, Ω, ≥ 0 (default 0).
 * @example halfBridgeDrive(12).amplitude // → 7.639437268410976 (= 24/π)
 */
export function halfBridgeDrive(supplyInput: QuantityInput, onResistanceInput: QuantityInput = 0): DriveEquivalent {
  const { supply, onResistance = 0 } = parseArgs(SupplyArgs, [supplyInput, onResistanceInput], "halfBridgeDrive");
  return {
    kind: "voltage",
    amplitude: (2 * supply) / Math.PI,
    resistance: onResistance,
    reactance: 0,
    label: `half bridge from ${fmt(supply)} V (fundamental 2V/π), R_on ${fmt(onResistance)} Ω`,
    assumptions: [
      "50 % duty square wave between 0 and the supply; DC part blocked by the series capacitor",
      "only the fundamental drives the tank (harmonics see a high-Q tank's high impedance)",
      "switching losses and dead time not modelled",
    ],
    waveform: { kind: "square", low: 0, high: supply },
  };
}

/**
 * Fundamental of a full-bridge square-wave drive: ±V_DD at 50 % duty. Fundamental amplitude
 * 4V_DD/π; source resistance 2R_on (two switches conduct at a time).
 * @param supply V_DD, V, > 0.
 * @param onResistance one switch's on-resistance, Ω, ≥ 0 (default 0).
 * @example fullBridgeDrive(12).amplitude // → 15.278874536821952 (= 48/π)
 */
export function fullBridgeDrive(supplyInput: QuantityInput, onResistanceInput: QuantityInput = 0): DriveEquivalent {
  const { supply, onResistance = 0 } = parseArgs(SupplyArgs, [supplyInput, onResistanceInput], "fullBridgeDrive");
  return {
    kind: "voltage",
    amplitude: (4 * supply) / Math.PI,
    resistance: 2 * onResistance,
    reactance: 0,
    label: `full bridge from ${fmt(supply)} V (fundamental 4V/π), R_on ${fmt(onResistance)} Ω per switch`,
    assumptions: [
      "50 % duty square wave of ±supply",
      "only the fundamental drives the tank (harmonics see a high-Q tank's high impedance)",
      "switching losses and dead time not modelled",
    ],
    waveform: { kind: "square", low: -supply, high: supply },
  };
}

/**
 * A current-regulated transmitter: the coil current is held at `amplitude` whatever the load.
 * @param amplitude peak transmitter coil current, A, ≥ 0.
 * @example currentDrive(1.5).kind // → "current"
 */
export function currentDrive(amplitudeInput: QuantityInput): DriveEquivalent {
  const { amplitude } = parseArgs(CurrentArgs, [amplitudeInput], "currentDrive");
  return {
    kind: "current",
    amplitude,
    label: `regulated coil current ${fmt(amplitude)} A peak`,
    assumptions: ["the regulator holds the coil current's fundamental amplitude; its own loss is not modelled"],
  };
}

// ── class E ────────────────────────────────────────────────────────────────────────────

/**
 * Class-E constants at 50 % duty with a shunt capacitor and high loaded Q, in closed form
 * (Sokal & Sokal 1975; Raab 1977, whose published 4-digit values are checked in
 * tests/circuit/drive.test.ts):
 * - resistance factor K_R = 8/(π²+4) ≈ 0.5768: R = K_R·V²/P;
 * - shunt factor K_C = 8/(π(π²+4)) ≈ 0.1836: C₁ = K_C/(ωR);
 * - excess reactance factor K_X = π(π²−4)/16 ≈ 1.1525: X = K_X·R;
 * - peak switch voltage: max over the off half-cycle of V_DD·π[(θ − 3π/2) − (π/2)cos θ − sin θ],
 *   reached at θ = 2π − 2·atan(π/2), ≈ 3.562 V_DD;
 * - peak switch current 1 + √(1 + π²/4) ≈ 2.862 times I_DC;
 * - fundamental across R: 4/√(π²+4) ≈ 1.0741 V_DD;
 * - minimum loaded Q 1.7879 (Raab 1977; published value, not re-derived here).
 */
export const CLASS_E = (() => {
  const pi = Math.PI;
  const thetaPeak = 2 * pi - 2 * Math.atan(pi / 2);
  const peakVoltage = pi * (thetaPeak - (3 * pi) / 2 - (pi / 2) * Math.cos(thetaPeak) - Math.sin(thetaPeak));
  return {
    resistanceFactor: 8 / (pi * pi + 4),
    shuntFactor: 8 / (pi * (pi * pi + 4)),
    excessReactanceFactor: (pi * (pi * pi - 4)) / 16,
    peakSwitchVoltageFactor: peakVoltage,
    peakSwitchCurrentFactor: 1 + Math.sqrt(1 + (pi * pi) / 4),
    fundamentalFactor: 4 / Math.sqrt(pi * pi + 4),
    minimumLoadedQ: 1.7879,
  } as const;
})();

/** A class-E single-switch drive sized for a supply, frequency and power (all SI). */
export interface ClassEDesign {
  readonly supply: number;
  readonly frequency: number;
  /** output power into R at optimum, W */
  readonly power: number;
  /** the load network's total series resistance at optimum, Ω */
  readonly resistance: number;
  /** shunt capacitance across the switch (including the switch's own), F */
  readonly shuntCapacitance: number;
  /** excess series reactance of the load network above series resonance, Ω */
  readonly excessReactance: number;
  /** that reactance as an inductance, H */
  readonly excessInductance: number;
  /** loaded Q of the series network, ωL/R (when an inductance was given), else undefined */
  readonly loadedQ?: number;
  /** series capacitance that gives the excess reactance with the given inductance, F */
  readonly seriesCapacitance?: number;
  /** supply current, A */
  readonly dcCurrent: number;
  /** peak switch voltage, V */
  readonly peakSwitchVoltage: number;
  /** peak switch current, A */
  readonly peakSwitchCurrent: number;
  /** peak fundamental voltage across R, V */
  readonly loadVoltage: number;
  /** peak current in the series network, A */
  readonly loadCurrent: number;
  readonly warnings: readonly string[];
}

/** What {@link classEDesign} takes: supply, frequency, and power or resistance (SI numbers or quantity strings). */
export const ClassEDesignSpec = lazySchema(() => z.strictObject({
  /** V_DD, V, > 0 */
  supply: voltage({ positive: true }),
  /** switching frequency, Hz, > 0 */
  frequency: frequency(),
  /** output power at optimum, W, > 0 (or give resistance) */
  power: power({ positive: true }).optional(),
  /** the load network's total series resistance, Ω, > 0 (or give power) */
  resistance: resistance({ positive: true }).optional(),
  /** series-network inductance (the transmitter coil), H, > 0 */
  inductance: inductance().optional(),
}));
/** What {@link classEDesign} accepts. */
export type ClassEDesignSpec = z.input<typeof ClassEDesignSpec>;

/** The fields of a {@link ClassEDesign} that {@link classEDrive} reads (any object from classEDesign has them). */
const ClassEDriveArgs = lazySchema(() => z.strictObject({
  design: z.looseObject({
    supply: voltage({ positive: true }),
    frequency: frequency(),
    power: power({ positive: true }),
    resistance: resistance({ positive: true }),
    excessReactance: z.number().refine(Number.isFinite, { error: "must be a finite number of Ω" }),
  }),
  onResistance: resistance().optional(),
}));

/**
 * Sizes an optimum class-E single-switch drive (50 % duty, shunt capacitor, high loaded Q).
 *
 * R = 0.5768·V_DD²/P, C₁ = 0.1836/(ωR), X = 1.1525·R, V_sw,peak = 3.562·V_DD,
 * I_sw,peak = 2.862·I_DC (Sokal & Sokal, IEEE JSSC SC-10(3), 1975; Raab, IEEE TCAS 24(12), 1977).
 *
 * @param spec.supply V_DD, V, > 0.
 * @param spec.frequency switching frequency, Hz, > 0.
 * @param spec.power output power at optimum, W, > 0 — or give `spec.resistance` (Ω, > 0), the
 *   load network's total series resistance, and the power follows.
 * @param spec.inductance optional series-network inductance (the transmitter coil), H, > 0:
 *   adds the loaded Q (warning below 1.7879) and the series capacitance that realises X.
 * @returns the design, SI; `warnings` for a loaded Q below the minimum.
 * @example classEDesign({ supply: 5, frequency: 200e3, power: 2 }).resistance // → 7.2102 Ω
 */
export function classEDesign(spec: ClassEDesignSpec): ClassEDesign {
  const where = "classEDesign";
  const d = parseInput(ClassEDesignSpec, spec, where);
  const v = d.supply;
  const f = d.frequency;
  if ((d.power === undefined) === (d.resistance === undefined)) {
    throw new TanklightInputError(
      [{ path: "power", message: "give exactly one of power (W) and resistance (Ω)", value: spec.power }],
      where,
    );
  }
  const w = 2 * Math.PI * f;
  const r = d.resistance !== undefined ? d.resistance : (CLASS_E.resistanceFactor * v * v) / d.power!;
  const p = (CLASS_E.resistanceFactor * v * v) / r;
  const x = CLASS_E.excessReactanceFactor * r;
  const idc = p / v;
  const warnings: string[] = [];
  let loadedQ: number | undefined;
  let seriesCapacitance: number | undefined;
  if (d.inductance !== undefined) {
    const l = d.inductance;
    loadedQ = (w * l) / r;
    if (loadedQ < CLASS_E.minimumLoadedQ) {
      warnings.push(
        `classEDesign: loaded Q ${loadedQ.toPrecision(3)} is below the class-E minimum ${CLASS_E.minimumLoadedQ} (Raab 1977); the optimum cannot be reached`,
      );
    }
    const xc = w * l - x;
    if (xc > 0) seriesCapacitance = 1 / (w * xc);
    else warnings.push("classEDesign: the coil's reactance is smaller than the excess reactance; no series capacitor realises it");
    if (loadedQ < 5) {
      warnings.push(
        `classEDesign: loaded Q ${loadedQ.toPrecision(3)} is low; the design relations assume a high loaded Q (sinusoidal network current), expect deviations`,
      );
    }
  }
  return {
    supply: v,
    frequency: f,
    power: p,
    resistance: r,
    shuntCapacitance: CLASS_E.shuntFactor / (w * r),
    excessReactance: x,
    excessInductance: x / w,
    ...(loadedQ !== undefined ? { loadedQ } : {}),
    ...(seriesCapacitance !== undefined ? { seriesCapacitance } : {}),
    dcCurrent: idc,
    peakSwitchVoltage: CLASS_E.peakSwitchVoltageFactor * v,
    peakSwitchCurrent: CLASS_E.peakSwitchCurrentFactor * idc,
    loadVoltage: CLASS_E.fundamentalFactor * v,
    loadCurrent: (CLASS_E.fundamentalFactor * v) / r,
    warnings,
  };
}

/**
 * Equivalent fundamental source of an optimum class-E drive, for the frequency-domain solver.
 *
 * At the optimum the switch-node voltage's fundamental is I·(R + jX) with |I| = 1.0741·V_DD/R
 * and X = 1.1525·R, so its amplitude is 1.0741·√(1 + 1.1525²)·V_DD ≈ 1.639·V_DD whatever R is.
 * The equivalent is that fundamental as a voltage source in series with the transmitter's
 * series network, whose capacitor must leave the excess reactance X (use
 * `design.seriesCapacitance`). Switch on-resistance: the loss P·1.365·R_on/R is modelled as a
 * series resistance 1.365·R_on (from memory (unverified): the usual first-order class-E
 * conduction-loss estimate).
 *
 * Assumes: optimum operation (zero-voltage and zero-slope switching), 50 % duty, a loaded Q high
 * enough for a sinusoidal network current, an ideal DC feed choke. Off the nominal load (the
 * reflected impedance of the tokens changes R and X) the real switch waveform loses zero-voltage
 * switching and the fundamental drifts from this value; docs/methods/link.md gives the size of
 * the drift and the transient engine gives the real waveform.
 *
 * @param design from {@link classEDesign}.
 * @param onResistance switch on-resistance, Ω, ≥ 0 (default 0).
 * @example classEDrive(classEDesign({ supply: 5, frequency: 200e3, power: 2 })).amplitude // → 8.195 V
 */
export function classEDrive(designInput: ClassEDesign, onResistanceInput: QuantityInput = 0): DriveEquivalent {
  const { design, onResistance = 0 } = parseArgs(ClassEDriveArgs, [designInput, onResistanceInput], "classEDrive");
  const k = CLASS_E.fundamentalFactor * Math.hypot(1, CLASS_E.excessReactanceFactor);
  return {
    kind: "voltage",
    amplitude: k * design.supply,
    resistance: CLASS_E_ON_RESISTANCE_FACTOR * onResistance,
    reactance: 0,
    label: `class-E single switch from ${fmt(design.supply)} V at ${fmt(design.frequency)} Hz, sized for ${fmt(design.power)} W into ${fmt(design.resistance)} Ω`,
    assumptions: [
      "optimum class-E operation (zero-voltage, zero-slope switching) at 50 % duty",
      "loaded Q high enough for a sinusoidal network current",
      `the transmitter's series network keeps the excess reactance ${fmt(design.excessReactance)} Ω`,
      "off-nominal loads move the real fundamental away from this equivalent (see docs/methods/link.md)",
    ],
  };
}

/** Factor on R_on for the class-E conduction loss, from memory (unverified). */
export const CLASS_E_ON_RESISTANCE_FACTOR = 1.365;

/**
 * Equivalent of the parallel-tank single-switch drive: the transmitter coil with a capacitor
 * across it, fed from the supply at one end and switched to ground at the other, 50 % duty with
 * zero-voltage switching. While the switch is open the switch node swings as a half sine; its
 * average must equal V_DD (the coil has no DC voltage), so the half sine peaks at π·V_DD and its
 * fundamental is π·V_DD/2 (Fourier series of a half-wave rectified sine, fundamental = peak/2).
 * The tank voltage is that fundamental: a zero-impedance source across the parallel tank.
 *
 * Assumes a high-Q tank tuned so that the switch sees zero voltage at turn-on (self-oscillating
 * kits track this); R_on adds its conduction loss through the series resistance `onResistance`/2
 * (closed half the cycle) — an estimate.
 * @param supply V_DD, V, > 0.
 * @param onResistance switch on-resistance, Ω, ≥ 0 (default 0).
 * @example parallelTankDrive(5).amplitude // → 7.853981633974483 (= 5π/2)
 */
export function parallelTankDrive(supplyInput: QuantityInput, onResistanceInput: QuantityInput = 0): DriveEquivalent {
  const { supply, onResistance = 0 } = parseArgs(SupplyArgs, [supplyInput, onResistanceInput], "parallelTankDrive");
  return {
    kind: "voltage",
    amplitude: (Math.PI * supply) / 2,
    resistance: onResistance / 2,
    reactance: 0,
    label: `single switch under a parallel tank from ${fmt(supply)} V (tank fundamental πV/2)`,
    assumptions: [
      "50 % duty, zero-voltage switching, high-Q parallel tank (half-sine swing of peak π·supply)",
      "use with a parallel-compensated transmitter: the source sits across the tank",
      "switch conduction loss estimated as R_on/2 in series",
    ],
    waveform: {
      kind: "singleSwitch",
      supply,
      onResistance: Math.max(onResistance, MIN_SWITCH_ON_RESISTANCE),
      offResistance: SWITCH_OFF_RESISTANCE,
      duty: 0.5,
    },
  };
}

function fmt(x: number): string {
  return Number(x.toPrecision(4)).toString();
}

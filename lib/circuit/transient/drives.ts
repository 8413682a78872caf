/**
 * Ready-made transmitter drive circuits for the time-domain engine: the single-switch drive
 * (a switch to ground under the transmitter coil and its capacitor, fed from the supply — the
 * common low-cost arrangement, in its parallel-tank and its class-E form) and the half and
 * full bridge with a series-tuned transmitter. Each returns the circuit plus the names of the
 * nodes and of the transmitter coil, so a token can be coupled to it (see token.ts).
 *
 * Size a class-E drive with `classEDesign` (lib/circuit/drive.ts, Sokal & Sokal 1975; Raab
 * 1977) and pass its values here; this file only builds circuits.
 */

import * as z from "../../zod.ts";
import { assertNever, TanklightInputError } from "../../errors.ts";
import { capacitance, dimensionless, frequency, inductance, oneOf, parseInput, resistance, voltage, lazySchema } from "../../schema.ts";
import { GROUND, type CircuitElement, type TransientCircuit } from "./circuit.ts";
import { periodicGate, stepWaveform } from "./waveforms.ts";
import { bodyDiodeModel } from "./bodyDiode.ts";

/** A drive circuit with the names a caller needs. */
export interface DriveCircuit {
  readonly circuit: TransientCircuit;
  /** drive frequency, Hz */
  readonly frequency: number;
  /** name of the transmitter coil (an inductor element): couple tokens to it */
  readonly coil: string;
  /** node names: supply, the switch node(s), the transmitter coil's ends */
  readonly nodes: Readonly<Record<string, string>>;
  readonly warnings: readonly string[];
}

/** Default switch on-resistance, Ω (a small logic-level MOSFET, trade practice (no source)). */
export const DEFAULT_ON_RESISTANCE = 0.05;

/** A duty cycle: the fraction of the period a switch is closed, 0 < duty < 1 (or "40 %"). */
const duty = () =>
  dimensionless({ example: "50 %" }).pipe(z.number().gt(0, { error: "must be between 0 and 1 (exclusive)" }).lt(1, { error: "must be between 0 and 1 (exclusive)" }));

/** Options of the single-switch drive: SI numbers or quantity strings ("5 V", "200 kHz", "10 uH"). */
export const SingleSwitchDriveSpec = lazySchema(() => z.strictObject({
  /** supply voltage V_DD, V, > 0 */
  supply: voltage({ positive: true }),
  /** switching frequency, Hz, > 0 */
  frequency: frequency(),
  /** fraction of the period the switch is closed, 0 < duty < 1; default 0.5 */
  duty: duty().optional(),
  /** transmitter coil inductance, H, > 0 */
  coilInductance: inductance(),
  /** transmitter coil series resistance, Ω, ≥ 0; default 0 */
  coilResistance: resistance().optional(),
  /**
   * the transmitter tank capacitor, F, > 0: across the coil ("parallel-tank") or in series
   * with it ("class-e")
   */
  tankCapacitance: capacitance(),
  /**
   * "parallel-tank" (default): supply → coil ∥ capacitor → switch node → switch → ground.
   * "class-e": supply → feed choke → switch node; shunt capacitor and switch to ground; series
   * capacitor + coil (+ load resistance) from the switch node to ground (Sokal & Sokal 1975).
   */
  arrangement: oneOf(["parallel-tank", "class-e"] as const).optional(),
  /** capacitance from the switch node to ground (switch output capacitance; class E: C₁), F ≥ 0 */
  shuntCapacitance: capacitance({ nonNegative: true }).optional(),
  /** class-e feed choke, H; default 50 × coilInductance (large enough to carry near-DC current) */
  chokeInductance: inductance().optional(),
  /** extra series resistance in the coil branch (e.g. the reflected load), Ω ≥ 0; default 0 */
  loadResistance: resistance().optional(),
  /** switch on-resistance, Ω > 0; default 0.05 */
  onResistance: resistance({ positive: true }).optional(),
  /** switch off-resistance, Ω > onResistance; default 1 MΩ */
  offResistance: resistance({ positive: true }).optional(),
  /**
   * give each switch its MOSFET body diode (bodyDiodeModel(), ./bodyDiode.ts), source to drain;
   * default false: it changes the result wherever the switch node dips below ground
   */
  bodyDiode: z.boolean().optional(),
}));
/** What {@link singleSwitchDrive} accepts. */
export type SingleSwitchDriveSpec = z.input<typeof SingleSwitchDriveSpec>;

/** The fields every drive circuit shares, parsed (SI), with the defaults applied. */
type TransmitterFields = Pick<z.output<typeof SingleSwitchDriveSpec>, "supply" | "frequency" | "coilInductance" | "tankCapacitance" | "coilResistance" | "loadResistance" | "onResistance" | "offResistance" | "bodyDiode">;

/**
 * The transmitter coil "Ltx" (L, H; its resistance R, Ω) from node "coilTop" to `end`, through
 * the extra load resistance "Rload" (rLoad, Ω; node "load") when there is one.
 */
function pushCoilBranch(elements: CircuitElement[], nodes: Record<string, string>, end: string, L: number, R: number, rLoad: number): void {
  if (rLoad > 0) {
    elements.push(
      { kind: "inductor", name: "Ltx", a: "coilTop", b: "load", inductance: L, resistance: R },
      { kind: "resistor", name: "Rload", a: "load", b: end, resistance: rLoad },
    );
    nodes.load = "load";
  } else {
    elements.push({ kind: "inductor", name: "Ltx", a: "coilTop", b: end, inductance: L, resistance: R });
  }
}

/** The switch fields every switch of a drive shares: off-resistance and body diode when asked for. */
function switchExtras(spec: TransmitterFields): { offResistance?: number; bodyDiode?: ReturnType<typeof bodyDiodeModel> } {
  return {
    ...(spec.offResistance !== undefined ? { offResistance: spec.offResistance } : {}),
    ...(spec.bodyDiode ? { bodyDiode: bodyDiodeModel() } : {}),
  };
}

/** The shared values with their defaults; the switch's off-resistance must exceed its on-resistance (else it never opens). */
function transmitterValues(spec: TransmitterFields, where: string) {
  const ron = spec.onResistance ?? DEFAULT_ON_RESISTANCE;
  const roff = spec.offResistance;
  if (roff !== undefined && !(roff > ron)) {
    throw new TanklightInputError([{ path: "offResistance", message: `must exceed onResistance (${ron} Ω)`, value: roff, expected: `> ${ron} Ω` }], where);
  }
  return {
    supply: spec.supply, f: spec.frequency, L: spec.coilInductance, C: spec.tankCapacitance,
    R: spec.coilResistance ?? 0, rLoad: spec.loadResistance ?? 0, ron,
  };
}

/**
 * The single-switch drive with its transmitter tank as a circuit (switch closed from t = 0
 * for duty·T of each period). Node names: "supply", "switch", and for class-e "coilTop"
 * (between series capacitor and coil); the coil is the inductor "Ltx".
 * @example singleSwitchDrive({ supply: 5, frequency: 200e3, coilInductance: 10e-6, tankCapacitance: 63e-9 }).coil // → "Ltx"
 */
export function singleSwitchDrive(input: SingleSwitchDriveSpec): DriveCircuit {
  const where = "singleSwitchDrive";
  const spec = parseInput(SingleSwitchDriveSpec, input, where);
  const { supply, f, L, C, R, rLoad, ron } = transmitterValues(spec, where);
  const cShunt = spec.shuntCapacitance ?? 0;
  const arrangement = spec.arrangement ?? "parallel-tank";
  const warnings: string[] = [];
  const gate = periodicGate({ frequency: f, duty: spec.duty ?? 0.5 });
  const sw: CircuitElement = { kind: "switch", name: "S1", a: "switch", b: GROUND, closed: gate, onResistance: ron, ...switchExtras(spec) };
  const elements: CircuitElement[] = [
    { kind: "voltageSource", name: "Vsupply", plus: "supply", minus: GROUND, waveform: stepWaveform(supply) },
  ];
  const nodes: Record<string, string> = { supply: "supply", switch: "switch" };
  if (arrangement === "parallel-tank") {
    elements.push(
      { kind: "inductor", name: "Ltx", a: "supply", b: "switch", inductance: L, resistance: R + rLoad },
      { kind: "capacitor", name: "Ctank", a: "supply", b: "switch", capacitance: C },
      sw,
    );
    nodes.coilTop = "supply";
    nodes.coilBottom = "switch";
  } else if (arrangement === "class-e") {
    const choke = spec.chokeInductance ?? 50 * L;
    elements.push(
      { kind: "inductor", name: "Lchoke", a: "supply", b: "switch", inductance: choke },
      sw,
      { kind: "capacitor", name: "Cseries", a: "switch", b: "coilTop", capacitance: C },
    );
    pushCoilBranch(elements, nodes, GROUND, L, R, rLoad);
    if (R + rLoad === 0) warnings.push("singleSwitchDrive: the class-E coil branch has no resistance; the drive will not settle");
    nodes.coilTop = "coilTop";
  } else {
    return assertNever(arrangement, "arrangement", where, "must be 'parallel-tank' or 'class-e'");
  }
  if (cShunt > 0) elements.push({ kind: "capacitor", name: "Cshunt", a: "switch", b: GROUND, capacitance: cShunt });
  return { circuit: { elements }, frequency: f, coil: "Ltx", nodes, warnings };
}

/** Options of the bridge drive: SI numbers or quantity strings. */
export const BridgeDriveSpec = lazySchema(() => z.strictObject({
  /** supply voltage V_DD, V, > 0 */
  supply: voltage({ positive: true }),
  /** switching frequency, Hz, > 0 */
  frequency: frequency(),
  /** "half": one leg, tank from its midpoint to ground; "full": two legs in antiphase, tank between them */
  bridge: oneOf(["half", "full"] as const),
  /** transmitter coil inductance, H, > 0 */
  coilInductance: inductance(),
  /** transmitter coil series resistance, Ω, ≥ 0; default 0 */
  coilResistance: resistance().optional(),
  /** series tank capacitor, F > 0 (also blocks the half bridge's DC) */
  tankCapacitance: capacitance(),
  /** extra series resistance in the coil branch, Ω ≥ 0; default 0 */
  loadResistance: resistance().optional(),
  /** switch on-resistance, Ω > 0; default 0.05 */
  onResistance: resistance({ positive: true }).optional(),
  /** switch off-resistance, Ω > onResistance; default 1 MΩ */
  offResistance: resistance({ positive: true }).optional(),
  /**
   * give each switch its MOSFET body diode (bodyDiodeModel(), ./bodyDiode.ts), source to drain;
   * default false: it changes the result wherever the switch node dips below ground
   */
  bodyDiode: z.boolean().optional(),
}));
/** What {@link bridgeDrive} accepts. */
export type BridgeDriveSpec = z.input<typeof BridgeDriveSpec>;

/**
 * A half or full bridge (square wave, 50 % duty, complementary switches with no dead time)
 * driving a series-tuned transmitter: leg midpoint(s) "midA" ("midB"), series capacitor to
 * "coilTop", coil "Ltx" to ground (half) or to "midB" (full). No dead time is modelled, so the
 * body diodes (`bodyDiode: true`) conduct only if a leg is driven beyond its rails; the fundamental of the leg voltage is 2V/π (half) or 4V/π (full,
 * across the tank) — Fourier series of a square wave.
 * @example bridgeDrive({ supply: 12, frequency: 200e3, bridge: "full", coilInductance: 10e-6, tankCapacitance: 63.3e-9 }).nodes.midB // → "midB"
 */
export function bridgeDrive(input: BridgeDriveSpec): DriveCircuit {
  const where = "bridgeDrive";
  const spec = parseInput(BridgeDriveSpec, input, where);
  const { supply, f, L, C, R, rLoad, ron } = transmitterValues(spec, where);
  const off = switchExtras(spec);
  const high = periodicGate({ frequency: f, duty: 0.5 });
  const low = periodicGate({ frequency: f, duty: 0.5, invert: true });
  const elements: CircuitElement[] = [
    { kind: "voltageSource", name: "Vsupply", plus: "supply", minus: GROUND, waveform: stepWaveform(supply) },
    { kind: "switch", name: "SAhigh", a: "supply", b: "midA", closed: high, onResistance: ron, ...off },
    { kind: "switch", name: "SAlow", a: "midA", b: GROUND, closed: low, onResistance: ron, ...off },
    { kind: "capacitor", name: "Ctank", a: "midA", b: "coilTop", capacitance: C },
  ];
  const nodes: Record<string, string> = { supply: "supply", midA: "midA", coilTop: "coilTop" };
  const end = spec.bridge === "half" ? GROUND : "midB";
  if (spec.bridge === "full") {
    elements.push(
      { kind: "switch", name: "SBhigh", a: "supply", b: "midB", closed: low, onResistance: ron, ...off },
      { kind: "switch", name: "SBlow", a: "midB", b: GROUND, closed: high, onResistance: ron, ...off },
    );
    nodes.midB = "midB";
  }
  pushCoilBranch(elements, nodes, end, L, R, rLoad);
  return { circuit: { elements }, frequency: f, coil: "Ltx", nodes, warnings: [] };
}

/**
 * The typed circuit description of the time-domain engine: named nodes, and elements as a
 * discriminated union of plain readonly objects (no text netlist). Node "ground" is the
 * reference (0 V); every other node is named by the user.
 *
 * Conventions: SI units; a two-terminal element's current is positive from its first
 * terminal to its second through the element (a → b, anode → cathode, from → to); a voltage
 * source's current is positive when it leaves the plus terminal into the circuit (delivering
 * power when the voltage is positive).
 */

import type { DiodeModel } from "../types.ts";

/** Name of the reference node (0 V). */
export const GROUND = "ground";

/** A time function in SI units: t in s → volts or amperes. Must return finite numbers. */
export type Waveform = (t: number) => number;

/** A linear resistor between nodes a and b, Ω > 0. */
export interface ResistorElement {
  readonly kind: "resistor";
  readonly name: string;
  readonly a: string;
  readonly b: string;
  /** Ω, > 0 */
  readonly resistance: number;
}

/** A linear capacitor between a and b, F > 0, with its voltage v(a) − v(b) at t = 0 (default 0). */
export interface CapacitorElement {
  readonly kind: "capacitor";
  readonly name: string;
  readonly a: string;
  readonly b: string;
  /** F, > 0 */
  readonly capacitance: number;
  /** V, v(a) − v(b) at t = 0; default 0 */
  readonly initialVoltage?: number;
}

/**
 * An inductor from a to b, H > 0, with an optional series (winding) resistance, Ω ≥ 0, and
 * its current a → b at t = 0 (default 0). Couple inductors with `coupling` elements.
 */
export interface InductorElement {
  readonly kind: "inductor";
  readonly name: string;
  readonly a: string;
  readonly b: string;
  /** H, > 0 */
  readonly inductance: number;
  /** series resistance, Ω, ≥ 0; default 0 */
  readonly resistance?: number;
  /** A, current a → b at t = 0; default 0 */
  readonly initialCurrent?: number;
}

/**
 * Magnetic coupling between two inductors (named), given as a coupling factor k
 * (−1 < k < 1) or a mutual inductance M, H (|M| < √(L₁L₂)). Positive k or M: currents
 * entering both `a` terminals produce aiding flux (the dot at `a`).
 */
export type CouplingElement =
  | { readonly kind: "coupling"; readonly name: string; readonly inductors: readonly [string, string]; readonly k: number; readonly mutualInductance?: undefined }
  | { readonly kind: "coupling"; readonly name: string; readonly inductors: readonly [string, string]; readonly mutualInductance: number; readonly k?: undefined };

/** An independent voltage source: v(plus) − v(minus) = waveform(t), V. */
export interface VoltageSourceElement {
  readonly kind: "voltageSource";
  readonly name: string;
  readonly plus: string;
  readonly minus: string;
  readonly waveform: Waveform;
}

/** An independent current source: waveform(t) amperes flow through it from `from` to `to` (into node `to`). */
export interface CurrentSourceElement {
  readonly kind: "currentSource";
  readonly name: string;
  readonly from: string;
  readonly to: string;
  readonly waveform: Waveform;
}

/**
 * A switch between a and b: resistance rOn while closed(t) is true, rOff otherwise. The
 * engine finds each switching instant by bisection of closed(t) inside the step and restarts
 * integration there with a backward-Euler step. Pulses shorter than one step may be missed.
 * With `bodyDiode`, a MOSFET's intrinsic diode sits across it from b (anode, the source) to a
 * (cathode, the drain): it conducts when v(a) falls below v(b) by its forward drop, whatever
 * the gate says — any DiodeModel (`diode()`/`diodePreset()`; the drive builders' `bodyDiode:
 * true` uses ./bodyDiode.ts, a typical small MOSFET's); it is the diode element `<name>.body`,
 * its current listed under that name.
 */
export interface SwitchElement {
  readonly kind: "switch";
  readonly name: string;
  readonly a: string;
  readonly b: string;
  /** gate: true while the switch is closed */
  readonly closed: (t: number) => boolean;
  /** Ω, > 0 */
  readonly onResistance: number;
  /** Ω, > onResistance; default 1 MΩ */
  readonly offResistance?: number;
  /** the body diode, anode b → cathode a (default none) */
  readonly bodyDiode?: DiodeModel;
}

/** A diode or LED (any `DiodeModel`: current(v), conductance(v)) from anode to cathode. */
export interface DiodeElement {
  readonly kind: "diode";
  readonly name: string;
  readonly anode: string;
  readonly cathode: string;
  readonly model: DiodeModel;
}

/** Every element the engine knows. */
export type CircuitElement =
  | ResistorElement
  | CapacitorElement
  | InductorElement
  | CouplingElement
  | VoltageSourceElement
  | CurrentSourceElement
  | SwitchElement
  | DiodeElement;

/** A circuit: its elements; nodes are the names their terminals use ("ground" is 0 V). */
export interface TransientCircuit {
  readonly elements: readonly CircuitElement[];
}

/** The node names an element connects, in terminal order (none for a coupling). */
export function elementNodes(e: CircuitElement): readonly string[] {
  switch (e.kind) {
    case "resistor":
    case "capacitor":
    case "inductor":
    case "switch":
      return [e.a, e.b];
    case "voltageSource":
      return [e.plus, e.minus];
    case "currentSource":
      return [e.from, e.to];
    case "diode":
      return [e.anode, e.cathode];
    case "coupling":
      return [];
  }
}

/**
 * A token (receiver: coil L₂ with its series resistance R₂, tank capacitor C₂ across it, and
 * any `TokenLoad` across C₂ — docs/physics-notes.md "The token") coupled through a mutual
 * inductance to an inductor of an existing circuit, expanded into transient elements.
 *
 * The token's lower tank node is tied to "ground": a single connection carries no current,
 * and it gives the magnetically coupled part the reference node modified nodal analysis
 * needs (otherwise it floats).
 */

import * as z from "../../zod.ts";
import { assertNever, requireFinite, requirePositive, TanklightInputError } from "../../errors.ts";
import { parseInput, lazySchema } from "../../schema.ts";

/** The keys a token spec accepts (values checked in addToken, SI numbers). */
const TokenSpecKeys = lazySchema(() => z.strictObject({
  spec: z.strictObject(
    Object.fromEntries(["name", "coupledTo", "mutualInductance", "k", "inductance", "resistance", "capacitance", "load"].map((k) => [k, z.unknown().optional()])),
    { error: "must be an object { coupledTo, k | mutualInductance, inductance, resistance, capacitance, load }" },
  ),
}));
import type { TokenLoad } from "../loads/types.ts";
import { checkLoad } from "../loads/describingFunction.ts";
import { GROUND, type CircuitElement, type TransientCircuit } from "./circuit.ts";

/** The token and how it couples. SI units. */
export interface TokenSpec {
  /** name prefix of the token's nodes and elements, default "token" */
  readonly name?: string;
  /** the inductor (e.g. the transmitter coil "Ltx") the token couples to */
  readonly coupledTo: string;
  /** mutual inductance to `coupledTo`, H (sign = dot convention); or give `k` */
  readonly mutualInductance?: number;
  /** coupling factor to `coupledTo`, −1 < k < 1 */
  readonly k?: number;
  /** token coil inductance L₂, H > 0 */
  readonly inductance: number;
  /** token coil series resistance R₂, Ω ≥ 0 */
  readonly resistance: number;
  /** tank capacitance C₂ across the coil, F > 0 */
  readonly capacitance: number;
  /** what sits across the tank */
  readonly load: TokenLoad;
}

/** A circuit with a token added, and the names of the token's parts. */
export interface TokenCircuit {
  readonly circuit: TransientCircuit;
  /** the tank's upper node (tank voltage = its voltage to ground) */
  readonly top: string;
  /** the token coil (inductor) name */
  readonly coil: string;
  /** element names of the LEDs by role ("led", "a", "b") — their currents are in result.currents */
  readonly leds: Readonly<Partial<Record<"led" | "a" | "b", string>>>;
}

/**
 * Adds a token coupled to `spec.coupledTo` to `base` (which is not modified).
 * Elements: `<name>.L` (coil), `<name>.C` (tank), `<name>.M` (coupling), and by load kind
 * `<name>.led` | `<name>.a`, `<name>.b` | `<name>.d1…d4` bridge diodes | `<name>.diode`,
 * `<name>.Cres` | `<name>.Rs` | `<name>.R`. Nodes: `<name>.top`, `<name>.dc+`, `<name>.dc−`, `<name>.mid`.
 * @example addToken(drive.circuit, { coupledTo: "Ltx", k: 0.05, inductance: 30e-6, resistance: 2, capacitance: 21e-9, load: { kind: "led", led: ledPreset("red") } }).top // → "token.top"
 */
export function addToken(base: TransientCircuit, spec: TokenSpec): TokenCircuit {
  const where = "addToken";
  if (base === null || typeof base !== "object" || !Array.isArray(base.elements)) {
    throw new TanklightInputError([{ path: "base", message: "must be a circuit { elements: […] } (e.g. singleSwitchDrive(…).circuit)", value: base }], where);
  }
  parseInput(TokenSpecKeys, { spec }, where);
  const p = spec.name === undefined ? "token" : spec.name;
  if (typeof p !== "string" || p === "") throw new TanklightInputError([{ path: "name", message: "must be a non-empty string", value: p }], where);
  const L = requirePositive(spec.inductance, "inductance", "H", where);
  const C = requirePositive(spec.capacitance, "capacitance", "F", where);
  const R = spec.resistance;
  if (!(Number.isFinite(R) && R >= 0)) throw new TanklightInputError([{ path: "resistance", message: "must be a finite number ≥ 0 Ω", value: R }], where);
  if ((spec.k === undefined) === (spec.mutualInductance === undefined)) {
    throw new TanklightInputError([{ path: "k", message: "give exactly one of k and mutualInductance", value: { k: spec.k, mutualInductance: spec.mutualInductance } }], where);
  }
  if (spec.k !== undefined && !(typeof spec.k === "number" && Math.abs(spec.k) < 1)) {
    throw new TanklightInputError([{ path: "k", message: "must be a coupling factor, −1 < k < 1", value: spec.k }], where);
  }
  if (spec.mutualInductance !== undefined) requireFinite(spec.mutualInductance, "mutualInductance", "H", where);
  const target = base.elements.find((e) => e.name === spec.coupledTo);
  if (!target || target.kind !== "inductor") {
    throw new TanklightInputError([{ path: "coupledTo", message: "must name an inductor of the circuit", value: spec.coupledTo }], where);
  }
  const top = `${p}.top`;
  const coupling: CircuitElement =
    spec.k !== undefined
      ? { kind: "coupling", name: `${p}.M`, inductors: [spec.coupledTo, `${p}.L`], k: spec.k }
      : { kind: "coupling", name: `${p}.M`, inductors: [spec.coupledTo, `${p}.L`], mutualInductance: spec.mutualInductance! };
  const tank: CircuitElement[] = [
    { kind: "inductor", name: `${p}.L`, a: top, b: GROUND, inductance: L, resistance: R },
    { kind: "capacitor", name: `${p}.C`, a: top, b: GROUND, capacitance: C },
    coupling,
  ];
  checkLoad(spec.load, where);
  const load = loadElements(spec.load, p, top);
  return { circuit: { elements: [...base.elements, ...tank, ...load.elements] }, top, coil: `${p}.L`, leds: load.leds };
}

/** A series resistance of a load, Ω ≥ 0 (absent: 0). */
function seriesResistanceOf(x: number | undefined, path: string): number {
  const v = x ?? 0;
  if (!(Number.isFinite(v) && v >= 0)) throw new TanklightInputError([{ path, message: "must be a finite number ≥ 0 Ω", value: v }], "addToken");
  return v;
}

/**
 * The elements of a token load between the tank's top node and ground, named `<p>.…`, and
 * the names of its LEDs by role.
 */
function loadElements(load: TokenLoad, p: string, top: string): { elements: CircuitElement[]; leds: Partial<Record<"led" | "a" | "b", string>> } {
  const bottom = GROUND;
  const els: CircuitElement[] = [];
  const leds: Partial<Record<"led" | "a" | "b", string>> = {};
  switch (load?.kind) {
    case "led":
      els.push({ kind: "diode", name: `${p}.led`, anode: top, cathode: bottom, model: load.led });
      leds.led = `${p}.led`;
      break;
    case "antiParallel":
    case "parallelSameDirection": {
      const reversed = load.kind === "antiParallel";
      els.push(
        { kind: "diode", name: `${p}.a`, anode: top, cathode: bottom, model: load.a },
        { kind: "diode", name: `${p}.b`, anode: reversed ? bottom : top, cathode: reversed ? top : bottom, model: load.b },
      );
      leds.a = `${p}.a`;
      leds.b = `${p}.b`;
      break;
    }
    case "bridge":
      els.push(...bridgeElements(load, p, top));
      leds.led = `${p}.led`;
      break;
    case "halfWaveReservoir": {
      const pos = `${p}.dc+`;
      const r = seriesResistanceOf(load.seriesResistance, "load.seriesResistance");
      const cres = requirePositive(load.capacitance, "load.capacitance", "F", "addToken");
      els.push(...throughResistor(p, r, top, { kind: "diode", name: `${p}.diode`, anode: top, cathode: pos, model: load.diode }));
      els.push(
        { kind: "capacitor", name: `${p}.Cres`, a: pos, b: bottom, capacitance: cres },
        { kind: "diode", name: `${p}.led`, anode: pos, cathode: bottom, model: load.led },
      );
      leds.led = `${p}.led`;
      break;
    }
    case "resistor":
      els.push({ kind: "resistor", name: `${p}.R`, a: top, b: bottom, resistance: requirePositive(load.resistance, "load.resistance", "Ω", "addToken") });
      break;
    default:
      return assertNever(load, "load.kind", "addToken", "must be a TokenLoad kind (led, antiParallel, parallelSameDirection, bridge, halfWaveReservoir, resistor)");
  }
  return { elements: els, leds };
}

/** A full-wave bridge of four diodes feeding the LED (through `<p>.Rs` when it has a series resistance). */
function bridgeElements(load: Extract<TokenLoad, { kind: "bridge" }>, p: string, top: string): CircuitElement[] {
  const bottom = GROUND;
  const pos = `${p}.dc+`;
  const neg = `${p}.dc-`;
  const els: CircuitElement[] = [
    { kind: "diode", name: `${p}.d1`, anode: top, cathode: pos, model: load.diode },
    { kind: "diode", name: `${p}.d2`, anode: bottom, cathode: pos, model: load.diode },
    { kind: "diode", name: `${p}.d3`, anode: neg, cathode: top, model: load.diode },
    { kind: "diode", name: `${p}.d4`, anode: neg, cathode: bottom, model: load.diode },
  ];
  const r = seriesResistanceOf(load.seriesResistance, "load.seriesResistance");
  els.push(...throughResistor(p, r, pos, { kind: "diode", name: `${p}.led`, anode: pos, cathode: neg, model: load.led }));
  return els;
}

/** A diode from `from`, through the series resistor `<p>.Rs` and node `<p>.mid` when r > 0. */
function throughResistor(p: string, r: number, from: string, diode: Extract<CircuitElement, { kind: "diode" }>): CircuitElement[] {
  if (!(r > 0)) return [diode];
  return [{ kind: "resistor", name: `${p}.Rs`, a: from, b: `${p}.mid`, resistance: r }, { ...diode, anode: `${p}.mid` }];
}

/**
 * Describing functions of token loads: the fundamental current a load draws at a sinusoidal
 * tank voltage v = A·sin θ, and the average current of each LED (what brightness follows).
 *
 * Method: fundamental-harmonic balance (the describing function of a memoryless nonlinearity,
 * e.g. Gelb & Vander Velde, "Multiple-Input Describing Functions and Nonlinear System Design",
 * 1968, ch. 2): I₁(A) = (1/π)·∫₀^{2π} i(A·sin θ)·sin θ dθ, G(A) = I₁/A. A memoryless load's
 * current is symmetric about the crest, so its cosine term vanishes: G is a real conductance.
 * Average current: (1/2π)·∫₀^{2π} i_LED dθ. Slope dI₁/dA = (1/π)·∫ g(A·sin θ)·sin²θ dθ with
 * g = dI/dV, for the link solver's Newton on the amplitude.
 * Quadrature: the fixed graded composite Gauss–Legendre rule of halfWave.ts.
 *
 * Reversing one LED of a memoryless load leaves its fundamental and its average current
 * unchanged (it just conducts on the other half-cycle). So at a given sinusoidal amplitude an
 * anti-parallel pair and a same-direction pair draw the same fundamental and share it the same
 * way: the lower-V_F LED takes most of it in both. What differs in practice comes from the
 * tank voltage not being a pure sine; the transient engine shows it.
 */
import type { Junction, Led } from "./led.ts";
import type { LedCurrent, TokenLoad } from "./types.ts";
import { JunctionBranch, halfWaveIntegrals, reverseHalfIntegrals, type StringBranch } from "./halfWave.ts";
import { bridgeBranch, cachedBranch, reservoirSteadyState } from "./rectifier.ts";
import { TanklightInputError, assertNever } from "../../errors.ts";
import { unknownKeyMessage } from "../../schema.ts";
import { integrateAdaptive } from "../../math/quadrature.ts";


/**
 * Fundamental current, its slope and per-junction averages for one junction (LED) across the tank,
 * at the last amplitude it was evaluated at (a one-entry memo per junction: averageLoadCurrent
 * right after fundamentalConductance at the same amplitude reuses the pass), with the half-cycle
 * integral buffers that pass writes into.
 */
interface JunctionResult {
  A: number;
  i1: number; // π·I₁ contribution (without leakage)
  slope: number; // π·dI₁/dA contribution (without leakage)
  avg: number; // average current, A
  peak: number; // peak current, A
  readonly fwd: Float64Array;
  readonly rev: Float64Array;
}

function junctionBranch(j: Junction): JunctionBranch {
  return cachedBranch(j, () => new JunctionBranch(j.is, j.n * j.thermalVoltage, j.rs));
}

/** Each junction's last evaluation (a memo keyed by the immutable junction object). */
const lastAmplitude = new WeakMap<Junction, JunctionResult>();

/**
 * One junction's half-cycle integrals at amplitude A, memoised per junction object for its last
 * amplitude (fundamentalConductance and fundamentalCurrentSlope at one A share the work).
 */
function junctionAt(j: Junction, A: number): JunctionResult {
  let r = lastAmplitude.get(j);
  if (r === undefined) {
    r = { A: NaN, i1: 0, slope: 0, avg: 0, peak: 0, fwd: new Float64Array(6), rev: new Float64Array(6) };
    lastAmplitude.set(j, r);
  }
  if (r.A === A) return r;
  const { fwd, rev } = r;
  const br = junctionBranch(j);
  halfWaveIntegrals(br, A, 0, fwd);
  reverseHalfIntegrals(br, A, rev);
  r.i1 = fwd[0]! - rev[0]!;
  r.slope = fwd[2]! + rev[2]!;
  r.avg = (fwd[1]! + rev[1]!) / (2 * Math.PI) - j.is;
  r.peak = fwd[5]! - j.is + j.leakage * A;
  r.A = A;
  return r;
}

function checkAmplitude(amplitude: number, where: string): void {
  if (!(typeof amplitude === "number" && Number.isFinite(amplitude) && amplitude >= 0)) {
    throw new TanklightInputError(
      [{ path: "amplitude", message: "must be a finite number ≥ 0 V (peak)", value: amplitude, expected: "≥ 0 V" }],
      where,
    );
  }
}

function badLoad(path: string, message: string, value: unknown, where: string): never {
  throw new TanklightInputError([{ path, message, value }], where);
}

function isJunction(j: unknown): boolean {
  const x = j as Partial<Junction> | null;
  return !!x && typeof x.is === "number" && x.is > 0 && typeof x.rs === "number" && x.rs > 0 && typeof x.n === "number" && x.n > 0 && typeof x.thermalVoltage === "number";
}

/** The fields each load kind may carry (a Map: prototype words are no kind). */
const LOAD_FIELDS: ReadonlyMap<string, readonly string[]> = new Map([
  ["resistor", ["kind", "resistance"]],
  ["led", ["kind", "led"]],
  ["antiParallel", ["kind", "a", "b"]],
  ["parallelSameDirection", ["kind", "a", "b"]],
  ["bridge", ["kind", "diode", "led", "seriesResistance"]],
  ["halfWaveReservoir", ["kind", "diode", "led", "capacitance", "seriesResistance", "frequency"]],
]);

/** Loads whose keys were checked (a cache keyed by the immutable load objects: the hot path checks each once). */
const keysChecked = new WeakSet<object>();

/**
 * Cheap structural checks of plain-data loads (a few typeof tests and a pass over the keys:
 * fine on the hot path); `where` names the public function. An unknown key is an error that
 * names the nearest valid one.
 */
export function checkLoad(load: TokenLoad, where: string): void {
  if (load === null || typeof load !== "object" || typeof (load as { kind?: unknown }).kind !== "string") {
    badLoad("load", "must be a TokenLoad object with a kind", load, where);
  }
  const fields = LOAD_FIELDS.get(load.kind);
  if (fields === undefined) badLoad("load.kind", `is not a known token load (${[...LOAD_FIELDS.keys()].join(", ")})`, load.kind, where);
  if (!keysChecked.has(load)) {
    for (const key of Object.keys(load)) {
      if (!fields.includes(key)) badLoad(`load.${key}`, unknownKeyMessage(key, fields), (load as unknown as Record<string, unknown>)[key], where);
    }
    keysChecked.add(load);
  }
  switch (load.kind) {
    case "resistor":
      if (!(typeof load.resistance === "number" && Number.isFinite(load.resistance) && load.resistance > 0)) badLoad("load.resistance", "must be a finite number > 0 Ω", load.resistance, where);
      return;
    case "led":
      if (!isJunction(load.led)) badLoad("load.led", "must be an LED from led()/ledPreset()", load.led, where);
      return;
    case "antiParallel":
    case "parallelSameDirection":
      if (!isJunction(load.a)) badLoad("load.a", "must be an LED from led()/ledPreset()", load.a, where);
      if (!isJunction(load.b)) badLoad("load.b", "must be an LED from led()/ledPreset()", load.b, where);
      return;
    case "bridge":
    case "halfWaveReservoir":
      if (!isJunction(load.diode)) badLoad("load.diode", "must be a diode from diode()/diodePreset()", load.diode, where);
      if (!isJunction(load.led)) badLoad("load.led", "must be an LED from led()/ledPreset()", load.led, where);
      if (load.seriesResistance !== undefined && !(Number.isFinite(load.seriesResistance) && load.seriesResistance >= 0)) {
        badLoad("load.seriesResistance", "must be a finite number ≥ 0 Ω", load.seriesResistance, where);
      }
      return;
    default:
      return assertNever(load, "load.kind", where, "is not a known token load");
  }
}

/** Fundamental current I₁ (A, peak, in phase) and its slope dI₁/dA (S) of a load at amplitude A. */
export interface FundamentalResponse {
  /** in-phase fundamental current, A (peak) */
  readonly current: number;
  /** d(current)/d(amplitude), S */
  readonly slope: number;
}

/** The fundamental current (A, peak) and its slope (S) of a load at amplitude A, unchecked, as a fresh record (no shared scratch). */
function fundamentalOf(load: TokenLoad, A: number, where: string): FundamentalResponse {
  switch (load.kind) {
    case "resistor": {
      const g = 1 / load.resistance;
      return { current: g * A, slope: g };
    }
    case "led": {
      const l = load.led;
      if (A === 0) {
        return { current: 0, slope: l.conductance(0) };
      }
      const ra = junctionAt(l, A);
      return { current: ra.i1 / Math.PI + l.leakage * A, slope: ra.slope / Math.PI + l.leakage };
    }
    case "antiParallel":
    case "parallelSameDirection": {
      if (A === 0) {
        return { current: 0, slope: load.a.conductance(0) + load.b.conductance(0) };
      }
      const ra = junctionAt(load.a, A);
      const rb = junctionAt(load.b, A);
      return { current: (ra.i1 + rb.i1) / Math.PI + (load.a.leakage + load.b.leakage) * A, slope: (ra.slope + rb.slope) / Math.PI + load.a.leakage + load.b.leakage };
    }
    case "bridge": {
      const br = bridgeOf(load);
      if (A === 0) {
        br.evalAt(0);
        return { current: 0, slope: br.g };
      }
      const fwd = new Float64Array(6);
      halfWaveIntegrals(br, A, 0, fwd);
      // both half-cycles conduct through the string: I₁ = (2/π)∫₀^π i sin θ dθ
      return { current: (2 * fwd[0]!) / Math.PI, slope: (2 * fwd[2]!) / Math.PI };
    }
    case "halfWaveReservoir": {
      const st = reservoirSteadyState(load.diode, load.led, A, load.seriesResistance ?? 0, undefined, undefined, reservoirBranch(load));
      return { current: st.fundamentalCurrent, slope: st.slope };
    }
    default:
      return assertNever(load, "load.kind", where, "is not a known token load");
  }
}

function bridgeOf(load: Extract<TokenLoad, { kind: "bridge" }>): StringBranch {
  return cachedBranch(load, () => bridgeBranch(load.diode, load.led, load.seriesResistance ?? 0));
}

function reservoirBranch(load: Extract<TokenLoad, { kind: "halfWaveReservoir" }>): JunctionBranch {
  return cachedBranch(
    load,
    () => new JunctionBranch(load.diode.is, load.diode.n * load.diode.thermalVoltage, load.diode.rs + (load.seriesResistance ?? 0)),
  );
}

/**
 * Describing function of a token load: the in-phase fundamental current divided by the
 * amplitude of the sinusoidal tank voltage across it.
 *
 * G(A) = (1/(π·A))·∫₀^{2π} i(A·sin θ)·sin θ dθ (Gelb & Vander Velde 1968, ch. 2).
 * @param load a {@link TokenLoad} (build one with tokenCircuits.ts helpers or as plain data).
 * @param amplitude tank voltage amplitude A, V (peak), ≥ 0; at A = 0 the small-signal conductance.
 * @returns conductance, S, > 0.
 * @example fundamentalConductance({ kind: "resistor", resistance: 1000 }, 5) // → 0.001
 * @example fundamentalConductance({ kind: "led", led: ledPreset("red") }, 2.0) // → 0.003274187758319909 S
 * Related: fundamentalCurrentSlope, averageLoadCurrent, loadResponse.
 */
export function fundamentalConductance(load: TokenLoad, amplitude: number): number {
  checkLoad(load, "fundamentalConductance");
  checkAmplitude(amplitude, "fundamentalConductance");
  const r = fundamentalOf(load, amplitude, "fundamentalConductance");
  return amplitude === 0 ? r.slope : r.current / amplitude;
}

/**
 * Derivative of the fundamental current with respect to the amplitude, dI₁/dA (S): the
 * Newton slope for the link solver. dI₁/dA = (1/π)·∫₀^{2π} g(A·sin θ)·sin²θ dθ, g = dI/dV.
 * @param load token load; amplitude V ≥ 0.
 * @returns S, > 0.
 * @example fundamentalCurrentSlope({ kind: "resistor", resistance: 50 }, 1) // → 0.02
 */
export function fundamentalCurrentSlope(load: TokenLoad, amplitude: number): number {
  checkLoad(load, "fundamentalCurrentSlope");
  checkAmplitude(amplitude, "fundamentalCurrentSlope");
  return fundamentalOf(load, amplitude, "fundamentalCurrentSlope").slope;
}

/**
 * Fundamental current (A, peak, in phase with the tank voltage) and its slope (S) together,
 * in one pass. The returned object is fresh (safe to keep).
 * @example loadResponse({ kind: "resistor", resistance: 100 }, 2) // → { current: 0.02, slope: 0.01 }
 */
export function loadResponse(load: TokenLoad, amplitude: number): FundamentalResponse {
  checkLoad(load, "loadResponse");
  checkAmplitude(amplitude, "loadResponse");
  return fundamentalOf(load, amplitude, "loadResponse");
}

/**
 * Floor of a reported LED current, relative to the LED's saturation current I_s: an average or
 * peak current below AVERAGE_CURRENT_FLOOR·I_s is reported as 0. The true average at a tiny
 * amplitude A is ≈ I_s·(A/(n·V_T))²/4, formed as a difference of terms of size I_s, so its
 * round-off and quadrature error lie near 1e-15·I_s and can be negative (−5e-31 A for a red
 * LED at 1 pV); 1e-9·I_s (about 1e-25 A for the presets, reached below a few µV of tank
 * amplitude) is far above that noise and far below any current that lights an LED.
 */
export const AVERAGE_CURRENT_FLOOR = 1e-9;

function ledEntry(role: LedCurrent["role"], l: Led, avg: number, peak: number): LedCurrent {
  const floor = AVERAGE_CURRENT_FLOOR * l.is;
  const current = avg < floor ? 0 : avg;
  return { role, label: l.label, current, peakCurrent: peak < floor ? 0 : peak, relativeBrightness: current / l.ratedCurrent };
}

/**
 * Average (DC) current of every LED in a token load at tank amplitude A, with its peak current
 * and relative brightness (average current / rated current). Brightness follows the average
 * current, not the fundamental (docs/physics-notes.md, "The token"). Currents below
 * 1e-9·I_s of the LED ({@link AVERAGE_CURRENT_FLOOR}; round-off lies near 1e-15·I_s) are
 * reported as 0, so an average current is never negative.
 * @param load token load; amplitude V (peak) ≥ 0.
 * @returns one entry per LED (none for a resistor): `{ role, label, current, peakCurrent, relativeBrightness }`.
 * @example averageLoadCurrent({ kind: "led", led: ledPreset("red") }, 2.2)[0].current // → 0.008489958975518656 A
 * @example averageLoadCurrent({ kind: "resistor", resistance: 100 }, 2) // → [] (edge: no LED)
 * @example averageLoadCurrent({ kind: "led", led: ledPreset("red") }, 1e-12)[0].current // → 0 (edge: below the floor, not −5e-31)
 */
export function averageLoadCurrent(load: TokenLoad, amplitude: number): readonly LedCurrent[] {
  const where = "averageLoadCurrent";
  checkLoad(load, where);
  checkAmplitude(amplitude, where);
  const A = amplitude;
  switch (load.kind) {
    case "resistor":
      return [];
    case "led": {
      if (A === 0) return [ledEntry("led", load.led, 0, 0)];
      const ra = junctionAt(load.led, A);
      return [ledEntry("led", load.led, ra.avg, ra.peak)];
    }
    case "antiParallel":
    case "parallelSameDirection": {
      if (A === 0) return [ledEntry("a", load.a, 0, 0), ledEntry("b", load.b, 0, 0)];
      const ra = junctionAt(load.a, A);
      const rb = junctionAt(load.b, A);
      return [ledEntry("a", load.a, ra.avg, ra.peak), ledEntry("b", load.b, rb.avg, rb.peak)];
    }
    case "bridge": {
      if (A === 0) return [ledEntry("led", load.led, 0, 0)];
      const br = bridgeOf(load);
      const fwd = new Float64Array(6);
      halfWaveIntegrals(br, A, 0, fwd);
      // the LED conducts on both half-cycles: average = 2·∫₀^π i dθ / 2π
      return [ledEntry("led", load.led, fwd[1]! / Math.PI, fwd[5]!)];
    }
    case "halfWaveReservoir": {
      const st = reservoirSteadyState(load.diode, load.led, A, load.seriesResistance ?? 0, undefined, undefined, reservoirBranch(load));
      return [ledEntry("led", load.led, st.ledCurrent, st.ledCurrent)];
    }
    default:
      return assertNever(load, "load.kind", where, "is not a known token load");
  }
}

/**
 * Reference describing function of any memoryless current law, by adaptive Gauss–Kronrod
 * over the cycle (slow; for checks): fundamental current (A, peak, in phase), quadrature
 * (cosine) component and average current.
 * @param current i(v), A; amplitude V > 0; relTol relative accuracy (default 1e-12).
 * @example describingFunctionReference(v => v / 100, 1).inPhase // → 0.01
 */
export function describingFunctionReference(
  current: (v: number) => number,
  amplitude: number,
  relTol = 1e-12,
): { inPhase: number; quadrature: number; average: number } {
  const where = "describingFunctionReference";
  if (typeof current !== "function") badLoad("current", "must be a function i(v) of the voltage, A", current, where);
  checkAmplitude(amplitude, where);
  if (!(typeof relTol === "number" && relTol >= 1e-15 && relTol <= 0.1)) {
    badLoad("relTol", "must be a number from 1e-15 (double precision's floor: below it the adaptive rule never stops) to 0.1", relTol, where);
  }
  const A = amplitude;
  const opts = { absTol: 0, relTol, maxIntervals: 20000 };
  // split at the crests so the adaptive rule sees each half-cycle's peak at an interval end
  const parts = [0, Math.PI / 2, Math.PI, (3 * Math.PI) / 2, 2 * Math.PI];
  let s = 0, c = 0, a = 0;
  for (let k = 0; k < 4; k++) {
    const lo = parts[k]!;
    const hi = parts[k + 1]!;
    s += integrateAdaptive((th) => current(A * Math.sin(th)) * Math.sin(th), lo, hi, opts).value;
    c += integrateAdaptive((th) => current(A * Math.sin(th)) * Math.cos(th), lo, hi, opts).value;
    a += integrateAdaptive((th) => current(A * Math.sin(th)), lo, hi, opts).value;
  }
  return { inPhase: s / Math.PI, quadrature: c / Math.PI, average: a / (2 * Math.PI) };
}

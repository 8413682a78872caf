/**
 * Rectifier token loads: the full-wave bridge feeding an LED (no reservoir), the half-wave
 * rectifier with a reservoir capacitor (steady light), and — for the cross-check with
 * Steigerwald 1988 — the current-fed full bridge with a capacitor filter.
 *
 * Reservoir rectifier, method: steady-state charge balance with a ripple-free reservoir
 * (capacitor large against the LED's discharge over one period): the reservoir voltage V_c is
 * the one at which the diode's average current over a cycle equals the LED's current,
 *   (1/2π)·∫₀^{2π} i_D(A·sin θ − V_c) dθ = I_LED(V_c),
 * a single monotone equation (left side falls, right side rises with V_c) solved by
 * safeguarded Newton. The diode current pulse is symmetric about the crest, so the
 * fundamental current is in phase with the tank voltage (no reactive part in this limit).
 * Ripple (not in the balance) is estimated as ΔV_pp ≈ I_LED/(f·C) (the capacitor carries the
 * LED for nearly the whole period) and reported with a warning when it exceeds 10 % of V_c.
 */
import type { Diode, Junction, Led } from "./led.ts";
import { JunctionBranch, StringBranch, halfWaveIntegrals } from "./halfWave.ts";
import { TanklightInputError, requirePositive } from "../../errors.ts";
import { integrateAdaptive } from "../../math/quadrature.ts";

const branchCache = new WeakMap<object, JunctionBranch | StringBranch>();

/** The conducting path of a bridge: two diodes, the LED and the series resistor. */
export function bridgeBranch(diode: Junction, led: Junction, seriesResistance = 0): StringBranch {
  return new StringBranch(
    2 * diode.n * diode.thermalVoltage,
    diode.is,
    led.n * led.thermalVoltage,
    led.is,
    2 * diode.rs + led.rs + seriesResistance,
  );
}

/** Cached branch for a load object (loads are immutable plain data). */
export function cachedBranch<T extends JunctionBranch | StringBranch>(key: object, make: () => T): T {
  const hit = branchCache.get(key);
  if (hit) return hit as T;
  const b = make();
  branchCache.set(key, b);
  return b;
}

/** The steady state of a half-wave reservoir rectifier at one tank amplitude. */
export interface ReservoirState {
  /** reservoir (LED) voltage, V */
  readonly reservoirVoltage: number;
  /** LED current = the diode's average current, A */
  readonly ledCurrent: number;
  /** fundamental current drawn from the tank, in phase with its voltage, A (peak) */
  readonly fundamentalCurrent: number;
  /** peak diode current, A */
  readonly peakDiodeCurrent: number;
  /** d(fundamental current)/d(amplitude), S */
  readonly slope: number;
  /** estimated peak-to-peak ripple, V (needs a frequency) */
  readonly ripple?: number;
  readonly warnings: readonly string[];
}


/** A junction from led()/diode()/…Preset(): its parameters positive, its functions present. */
function requireJunction(j: unknown, field: string, where: string): void {
  const x = j as Partial<Junction> | null;
  const ok = x !== null && typeof x === "object" && typeof x.is === "number" && x.is > 0 && typeof x.rs === "number" && x.rs > 0 &&
    typeof x.n === "number" && x.n > 0 && typeof x.thermalVoltage === "number" && typeof x.current === "function" && typeof x.voltage === "function" && typeof x.conductance === "function";
  if (!ok) throw new TanklightInputError([{ path: field, message: "must be a junction from diode()/diodePreset() (or led())", value: j }], where);
}

/**
 * Steady state of a half-wave rectifier (diode + series resistor) charging a reservoir
 * capacitor with an LED across it, at tank amplitude A (charge balance, large reservoir).
 * @param diode rectifier diode; led the LED across the reservoir (any current(v)/conductance(v) load); amplitude V (peak, ≥ 0);
 * @param seriesResistance Ω ≥ 0; capacitance F > 0 and frequency Hz > 0 (ripple estimate only).
 * @returns {@link ReservoirState}.
 * @example reservoirSteadyState(diodePreset("schottky"), ledPreset("red"), 3).reservoirVoltage // → 2.032896911165257 V
 */
export function reservoirSteadyState(
  diode: Diode,
  led: Pick<Led, "current" | "conductance">,
  amplitude: number,
  seriesResistance = 0,
  capacitance?: number,
  frequency?: number,
  branch?: JunctionBranch,
): ReservoirState {
  checkReservoirArgs(diode, led, amplitude, seriesResistance);
  const br = branch ?? new JunctionBranch(diode.is, diode.n * diode.thermalVoltage, diode.rs + seriesResistance);
  const gl = diode.leakage;
  if (amplitude === 0) {
    return { reservoirVoltage: 0, ledCurrent: 0, fundamentalCurrent: 0, peakDiodeCurrent: 0, slope: diode.conductance(0), warnings: [] };
  }
  const A = amplitude;
  const scratch = new Float64Array(6); // the half-cycle integrals at the last V tried
  // h(V) = average diode current − LED current; decreasing in V.
  // Average diode current = (1/2π)(∫ i⁺) − I_s − g_leak·V over the whole cycle.
  const h = (V: number): number => {
    halfWaveIntegrals(br, A, V, scratch);
    return scratch[1]! / (2 * Math.PI) - diode.is - gl * V - led.current(V);
  };
  let lo = 0;
  let hi = A;
  let V = 0.5 * A;
  let hv = h(V);
  for (let it = 0; it < 100; it++) {
    if (hv > 0) lo = V;
    else hi = V;
    const dh = -scratch[4]! / (2 * Math.PI) - gl - led.conductance(V);
    let next = V - hv / dh;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - V) <= 4 * Number.EPSILON * A || hi - lo <= 4 * Number.EPSILON * A) {
      V = next;
      hv = h(V);
      break;
    }
    V = next;
    hv = h(V);
  }
  // scratch now holds the integrals at the solution
  const i1 = scratch[0]! / Math.PI + gl * A;
  const ledCurrent = led.current(V);
  // slope: dI1/dA = (1/π)[∫g sin² − V_c'·∫g sin] + g_leak, with V_c' from the balance
  const dAvgdA = scratch[3]! / (2 * Math.PI);
  const dAvgdV = scratch[4]! / (2 * Math.PI) + gl + led.conductance(V);
  const dV = dAvgdA / dAvgdV;
  const slope = (scratch[2]! - dV * scratch[3]!) / Math.PI + gl;
  const warnings: string[] = [];
  let ripple: number | undefined;
  if (capacitance !== undefined && frequency !== undefined) {
    ripple = ledCurrent / (frequency * capacitance);
    if (ripple > 0.1 * V) {
      warnings.push(
        `reservoir ripple ≈ ${ripple.toPrecision(3)} V is more than 10 % of the reservoir voltage ${V.toPrecision(3)} V: ` +
          "the large-capacitor charge balance overstates the steadiness; use a larger capacitor or the transient engine",
      );
    }
  }
  return {
    reservoirVoltage: V,
    ledCurrent,
    fundamentalCurrent: i1,
    peakDiodeCurrent: scratch[5]!,
    slope,
    ...(ripple !== undefined ? { ripple } : {}),
    warnings,
  };
}

/** reservoirSteadyState's argument checks (the diode a junction, the LED a current(v)/conductance(v) load, A and R finite and ≥ 0). */
function checkReservoirArgs(diode: Diode, led: Pick<Led, "current" | "conductance">, amplitude: number, seriesResistance: number): void {
  const where = "reservoirSteadyState";
  requireJunction(diode, "diode", where);
  if (!(led !== null && typeof led === "object" && typeof led.current === "function" && typeof led.conductance === "function")) {
    throw new TanklightInputError([{ path: "led", message: "must be an LED (or any load with current(v) and conductance(v))", value: led }], where);
  }
  if (!(Number.isFinite(amplitude) && amplitude >= 0)) {
    throw new TanklightInputError([{ path: "amplitude", message: "must be a finite number ≥ 0 V", value: amplitude }], where);
  }
  if (!(Number.isFinite(seriesResistance) && seriesResistance >= 0)) {
    throw new TanklightInputError([{ path: "seriesResistance", message: "must be a finite number ≥ 0 Ω", value: seriesResistance }], where);
  }
}

/** The result of {@link currentFedBridge}. */
export interface CurrentFedBridgeResult {
  /** DC output voltage across the load resistor, V */
  readonly outputVoltage: number;
  /** fundamental of the bridge's input voltage (in phase with the current), V peak */
  readonly fundamentalVoltage: number;
  /** equivalent AC resistance = fundamental voltage / current amplitude, Ω */
  readonly equivalentResistance: number;
}

/**
 * A full bridge with a capacitor filter and load resistor, fed by a sinusoidal current
 * I·sin θ (series-resonant secondary): the case Steigerwald 1988 treats, where
 * R_ac = 8R_L/π² for ideal diodes.
 * Charge balance: the capacitor passes only AC, so the load carries the average of |i|:
 * V_o = R_L·2I/π. The input voltage is sign(i)·(V_o + 2·v_D(|i|)); its fundamental is found by
 * adaptive quadrature over the cycle (diode drops included).
 * @param diode bridge diode; loadResistance Ω > 0; currentAmplitude A > 0.
 * @example currentFedBridge(diodePreset("schottky"), 1000, 0.01).equivalentResistance // → 899.05… Ω (8·1000/π² = 810.6 Ω plus the diode drops at 6.4 V output)
 */
export function currentFedBridge(diode: Junction, loadResistance: number, currentAmplitude: number): CurrentFedBridgeResult {
  requireJunction(diode, "diode", "currentFedBridge");
  requirePositive(loadResistance, "loadResistance", "Ω", "currentFedBridge");
  requirePositive(currentAmplitude, "currentAmplitude", "A", "currentFedBridge");
  const vo = (loadResistance * 2 * currentAmplitude) / Math.PI;
  // fundamental (sine) coefficient: (1/π)∫₀^{2π} v(θ) sin θ dθ = (2/π)∫₀^π (V_o + 2v_D(I sin θ)) sin θ dθ
  const r = integrateAdaptive((th) => {
    const s = Math.sin(th);
    return (vo + 2 * diode.voltage(currentAmplitude * s)) * s;
  }, 0, Math.PI, { absTol: 0, relTol: 1e-12 });
  const v1 = (2 / Math.PI) * r.value;
  return { outputVoltage: vo, fundamentalVoltage: v1, equivalentResistance: v1 / currentAmplitude };
}

/**
 * Steigerwald 1988 first-harmonic equivalent resistance of a full-bridge rectifier:
 * capacitor filter (current-fed) R_ac = 8R_L/π²; inductor filter (voltage-fed) R_ac = π²R_L/8.
 * Source: Steigerwald, IEEE Trans. Power Electron. 3(2), 1988 — from memory (unverified),
 * docs/references.md. It does NOT describe a reservoir capacitor fed by a sinusoidal tank voltage
 * (the parallel-tuned token), where the charge balance gives about R_L/2 instead.
 * @param loadResistance R_L, Ω > 0; filter "capacitor" | "inductor".
 * @example steigerwaldEquivalentResistance(100, "capacitor") // → 81.05694691387022
 */
export function steigerwaldEquivalentResistance(loadResistance: number, filter: "capacitor" | "inductor"): number {
  requirePositive(loadResistance, "loadResistance", "Ω", "steigerwaldEquivalentResistance");
  if (filter === "capacitor") return (8 * loadResistance) / (Math.PI * Math.PI);
  if (filter === "inductor") return (Math.PI * Math.PI * loadResistance) / 8;
  throw new TanklightInputError([{ path: "filter", message: "must be 'capacitor' or 'inductor'", value: filter }], "steigerwaldEquivalentResistance");
}

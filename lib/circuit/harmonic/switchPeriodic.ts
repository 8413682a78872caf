/**
 * The single-switch drive under hard switching, by the transient engine's periodic steady state
 * (shooting, Aprille & Trick 1972: lib/circuit/transient/shooting.ts).
 *
 * Why: when the switch closes on a charged tank capacitor (a tank tuned away from the
 * zero-voltage tuning), the capacitor discharges through R_on within R_on·C — nanoseconds, a
 * thousandth of a period — and the switch-node waveform has a near-jump each cycle. Harmonic
 * balance represents it by a truncated Fourier series, which converges slowly and not
 * monotonically there: for the drive-waveforms casebook's coil tuned 1.6× above the switching
 * frequency the token's LED current is −23 % at order 15, −7 % at order 31, +0.7 % at order 61
 * and +0.4 % at order 121 against the periodic steady state (which changes by 0.14 % from 200 to
 * 400 steps a cycle). Time stepping with breakpoints at the switching instants (TR-BDF2
 * restarts) resolves the jump directly.
 *
 * The circuit: the same numbers as the link network — the switch (R_on, R_off, duty) under the
 * parallel transmitter tank from the supply, one parallel-tuned token coupled by M with its
 * load — built with singleSwitchDrive and addToken. Capacitor ESRs are not in the transient
 * circuit (stated when the network has any).
 */
import type { LinkNetwork } from "../link/network.ts";
import { solveLinkNetwork } from "../link/solveNetwork.ts";
import { singleSwitchDrive } from "../transient/drives.ts";
import { addToken } from "../transient/token.ts";
import { periodicSteadyState } from "../transient/shooting.ts";
import { waveformHarmonics } from "../transient/harmonics.ts";

/** The quantities the periodic steady state gives a link result (SI; amplitudes peak). */
export interface SwitchPeriodic {
  /** each LED's average current, A, in the link result's order */
  readonly leds: readonly number[];
  /** transmitter and token coil current, fundamental amplitude, A */
  readonly transmitterCurrent: number;
  readonly tokenCurrent: number;
  /** mean power from the supply, W */
  readonly input: number;
  /** shooting periods used */
  readonly periods: number;
}

/**
 * Whether the periodic-steady-state route applies: a single-switch drive, one parallel-tuned
 * token whose load can be built in the transient engine.
 * @example switchPeriodicApplies(network) // false for a sine drive
 */
export function switchPeriodicApplies(net: LinkNetwork): boolean {
  const d = net.transmitter.drive;
  if (!(d.kind === "voltage" && d.waveform?.kind === "singleSwitch")) return false;
  if (net.transmitters !== undefined && net.transmitters.length > 1) return false;
  if (net.receivers.length !== 1) return false;
  const r = net.receivers[0]!;
  return r.topology === "parallel" && r.load.token !== undefined && net.transmitter.capacitance !== undefined;
}

/**
 * The periodic steady state of the single switch, its tank and one token (see the module comment).
 * @param net a network for which {@link switchPeriodicApplies} is true.
 * @param stepsPerCycle time steps a period (200 gives the casebook's numbers to ≈ 0.1 %).
 * @returns {@link SwitchPeriodic}, or undefined when the token's LEDs cannot be matched to the result's.
 * @example switchPeriodic(network, 200).leds[0] // the LED's average current, A
 */
export function switchPeriodic(net: LinkNetwork, stepsPerCycle: number): SwitchPeriodic | undefined {
  const tx = net.transmitter;
  const d = tx.drive;
  if (!(d.kind === "voltage" && d.waveform?.kind === "singleSwitch")) return undefined;
  const wf = d.waveform;
  const f = net.frequency;
  const drive = singleSwitchDrive({
    supply: wf.supply,
    frequency: f,
    coilInductance: net.inductance[0]![0]!,
    coilResistance: tx.resistance,
    tankCapacitance: tx.capacitance!,
    onResistance: wf.onResistance,
    offResistance: wf.offResistance,
    duty: wf.duty,
  });
  const r = net.receivers[0]!;
  const tok = addToken(drive.circuit, { coupledTo: drive.coil, mutualInductance: net.inductance[0]![1]!, inductance: net.inductance[1]![1]!, resistance: r.resistance, capacitance: r.capacitance, load: r.load.token! });
  const roles = (["led", "a", "b"] as const).filter((x) => tok.leds[x] !== undefined);
  const seed = describingSeed(net, wf.supply, wf.duty);
  const pss = periodicSteadyState(tok.circuit, { frequency: f, stepsPerCycle, ...(seed ? { initialState: seed } : {}) });
  const n = stepsPerCycle;
  const avg = (a: ArrayLike<number>): number => {
    let s = 0;
    for (let i = a.length - n; i < a.length; i++) s += a[i]!;
    return s / n;
  };
  const fundamental = (a: ArrayLike<number>): number => waveformHarmonics(pss.time, Array.from(a), { frequency: f, count: 1 }).amplitude[1]!;
  const leds = roles.map((x) => avg(pss.currents[tok.leds[x]!]!));
  return {
    leds,
    transmitterCurrent: fundamental(pss.currents[drive.coil]!),
    tokenCurrent: fundamental(pss.currents[tok.coil]!),
    input: wf.supply * Math.abs(avg(pss.currents["Vsupply"]!)),
    periods: pss.shooting.periods,
  };
}

/**
 * A starting state for the shooting method from the describing-function solution
 * (solveLinkNetwork, microseconds), so that Newton starts near the orbit instead of after a
 * warm-up period from rest: the drawer's switch + tank + LED token in 4 periods instead of 6
 * (bench/steady.bench.ts). Each phasor P (cosine reference, the drive equivalent's source real)
 * is put on the switch's time axis — the coil-voltage fundamental of a switch closed from t = 0
 * for duty·T is the half sine of the open interval, centred at (1 + duty)·T/2, inverted: phase
 * −π·duty — and read at t = 0, x(0) = Re(e^{−jπ·duty}·P). The token tank voltage is
 * −I₂/(jωC₂ + G) with G the load's describing-function conductance (load current / load
 * voltage); the transmitter tank capacitor starts at the supply (the switch has just closed).
 * A guess only: a poor one costs Newton iterations, not accuracy; undefined when the
 * describing function does not converge. Element names are those of singleSwitchDrive and
 * addToken (default token name).
 */
function describingSeed(net: LinkNetwork, supply: number, duty: number): Record<string, number> | undefined {
  const df = solveLinkNetwork(net, { onNonConvergence: "warn" });
  if (!df.converged) return undefined;
  const c = Math.cos(Math.PI * duty);
  const s = -Math.sin(Math.PI * duty);
  const at0 = (re: number, im: number): number => c * re - s * im;
  const i1 = df.transmitter.coilCurrentPhasor;
  const rx = df.receivers[0]!;
  const i2 = rx.coilCurrentPhasor;
  const g = rx.loadVoltage > 0 ? rx.loadCurrent / rx.loadVoltage : 0;
  const b = 2 * Math.PI * net.frequency * net.receivers[0]!.capacitance;
  // V₂ = −I₂/(G + jB)
  const d = g * g + b * b;
  const v2re = -(i2.re * g + i2.im * b) / d;
  const v2im = -(i2.im * g - i2.re * b) / d;
  return { Ctank: supply, Ltx: at0(i1.re, i1.im), "token.L": at0(i2.re, i2.im), "token.C": at0(v2re, v2im) };
}

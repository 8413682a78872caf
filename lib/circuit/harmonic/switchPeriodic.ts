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
  const pss = periodicSteadyState(tok.circuit, { frequency: f, stepsPerCycle });
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

/**
 * Harmonic balance for the link: the steady state of the coupled network at the drive
 * frequency and its harmonics 0…H, with every nonlinear token load (and the single-switch
 * drive's switch) evaluated in time on a sampled period and transformed back by an exact DFT,
 * and Newton's method on all harmonics together (Kundert, White & Sangiovanni-Vincentelli,
 * *Steady-State Methods for Simulating Analog and Microwave Circuits*, Kluwer 1990).
 *
 * What it adds to the describing function (fundamental only): the DC term and the even
 * harmonics of loads that rectify (a single LED, back-to-back LEDs of unequal forward voltage,
 * a half-wave reservoir), the odd harmonics of any clipping load, the drive's real harmonic
 * content (square waves), and the single-switch drive's switch-node waveform, solved with the
 * tank instead of assumed.
 *
 * Continuation: Newton starts from the describing-function solution (solveLinkNetwork): first
 * with each token load frozen at its describing-function conductance (a linear problem — one
 * step, which also solves the switch with the tank), then with the true loads. If that fails,
 * source stepping (the drive scaled from a fraction up to 1, each level started from the last).
 */
import { solveLinkNetwork, LinkConvergenceError, checkLinkOptions } from "../link/solveNetwork.ts";
import type { LinkNetwork, LinkOptions } from "../link/network.ts";
import type { LinkResult } from "../link/result.ts";
import { TanklightInputError, requireObject, underName } from "../../errors.ts";
import { harmonicPorts, type EmfSpectrum, type HarmonicPorts } from "./ports.ts";
import { spectrumTables } from "./spectrum.ts";
import { timeLoad, type TimeLoad } from "./timeLoad.ts";
import { switchLoad } from "./switchLoad.ts";
import { HarmonicSystem } from "./newton.ts";
import { assembleHarmonicResult, type HarmonicLinkResult } from "./result.ts";
import type { ModelBand } from "./modelBand.ts";

export type { HarmonicLinkResult, HarmonicDetail } from "./result.ts";

/** Options of {@link solveLinkHarmonic}: the link options plus the harmonic order and sampling. */
export interface HarmonicOptions extends LinkOptions {
  /** highest harmonic H, integer 1…200 (default {@link DEFAULT_HARMONIC_ORDER}) */
  readonly order?: number;
  /** samples per period N, integer ≥ 2H + 2 (default {@link defaultSamples}) */
  readonly samples?: number;
}

/**
 * Default highest harmonic: 15. Against the transient engine's periodic steady state the LED
 * average currents and coil currents agree within 1 % from order 9 on over the validated grid
 * (docs/methods/harmonic-balance.md); 15 leaves margin for harder clipping.
 */
export const DEFAULT_HARMONIC_ORDER = 15;

/**
 * Default samples per period for order H: 8H, at least 32. Measured: with 4H–16H samples the
 * result changes by less than the truncation error of order H itself (docs/methods/harmonic-balance.md).
 */
export function defaultSamples(order: number): number {
  return Math.max(32, 8 * order);
}

/**
 * Steady state of the link by harmonic balance (see the module comment for the method).
 *
 * @param network the link as numbers (./link/network.ts); nonlinear receivers need a load model
 *   built from a token load (tokenLoadModel, or solveLink's default) so it can be evaluated in time.
 * @param options the link options (lit threshold, tolerance default 1e-9 relative, iteration cap
 *   default 60, onNonConvergence), `order` H (default 15) and `samples` N.
 * @returns a {@link HarmonicLinkResult}: the LinkResult fields at the fundamental (amplitudes
 *   peak), LED average currents from the true waveform, plus `harmonic` (every harmonic of the
 *   coil currents and port voltages, waveform peaks, the truncation indicator) and
 *   `model: "harmonic"` with its error band.
 * @throws TanklightInputError for bad numbers or a load that cannot be evaluated in time;
 *   LinkConvergenceError (with the last residual, V) when Newton fails even with continuation.
 * @example
 *   solveLinkHarmonic({ frequency: 200e3, inductance: [[10e-6, 8.7e-7], [8.7e-7, 30e-6]],
 *     transmitter: { resistance: 1.5, compensation: "series", capacitance: 63.3e-9, drive: sineDrive(2) },
 *     receivers: [{ resistance: 1.2, topology: "parallel", capacitance: 21.1e-9,
 *       load: tokenLoadModel(antiParallelPair(ledPreset("red"), ledPreset("green-ingan"))) }] })
 *     .receivers[0].leds[1].averageCurrent // green LED, mA range (the describing function says µA)
 */
export function solveLinkHarmonic(network: LinkNetwork, options: HarmonicOptions = {}): HarmonicLinkResult {
  const where = "solveLinkHarmonic";
  requireObject(network, "network", where);
  const { order: H, samples: N } = checkHarmonicOptions(options, where);
  // the describing-function solution: validates the network and starts the continuation
  const df = underName(where, () => solveLinkNetwork(network, { ...options, onNonConvergence: "warn" }));
  const shared = sharedDriveRefusal(network);
  if (shared !== undefined) throw new TanklightInputError([{ path: "sharedDrives", message: shared, value: network.sharedDrives?.length ?? 0 }], where);
  const rx = network.receivers;
  rx.forEach((r, k) => {
    if (!r.load.linear && r.load.token === undefined) {
      throw new TanklightInputError(
        [{ path: `receivers[${k}].load`, message: "harmonic balance evaluates loads in time: give a token load (or a model from tokenLoadModel), not a describing function alone", value: r.load.label }],
        where,
      );
    }
  });
  const drive = network.transmitter.drive;
  if (drive.kind === "voltage" && drive.waveform?.kind === "singleSwitch" && H >= 6) {
    // the switch's jump makes the spectrum fall slowly (error ∝ 1/order): solve at half the
    // order first, continue to the full order from there, and take the change as the error
    // estimate (for an error ∝ 1/H, x(H/2) − x(H) equals the error of x(H))
    const half = Math.ceil(H / 2);
    const low = solveOrder(network, half, Math.max(2 * half + 2, Math.round((N * half) / H)), options, df, undefined);
    const high = solveOrder(network, H, N, options, df, { z: low.z, order: half });
    const change = resultChange(low.result, high.result);
    // the voltage the switch closes on (just before t = 0): far from zero is hard switching
    const v = high.result.harmonic.switchNode!.voltage;
    const th = (-2 * Math.PI * 2) / N;
    let vOn = v[0]!.re;
    for (let h = 1; h < v.length; h++) vOn += v[h]!.re * Math.cos(h * th) - v[h]!.im * Math.sin(h * th);
    // (the truncated series smooths the corner, so a swing below ground counts too: the tank rang past zero)
    // and the discharge spike of a hard turn-on shows as a large switch-port truncation
    // indicator. Measured against the periodic steady state (tests/circuit/harmonic/modelChoice.test.ts
    // and the drive-waveforms coil at 1.0–1.6×): under zero-voltage switching the indicator is
    // 0.04–0.10, the series reads 0.18–0.23·V_DD at turn-on (its Gibbs smoothing of the corner)
    // and dips to −0.05·V_DD, with LED currents within 0.07 %; hard cases read ≥ 0.36, ≥ 0.34·V_DD
    // or below −0.37·V_DD and are 2–23 % off at order 15
    const hard =
      Math.abs(vOn) > 0.3 * drive.waveform.supply ||
      high.result.harmonic.switchNode!.minimum < -0.3 * drive.waveform.supply ||
      high.result.harmonic.switchNode!.truncation > 0.25;
    const warnings = hard
      ? [
          ...high.result.warnings,
          `the switch closes on ${vOn.toPrecision(3)} V (hard switching, not at zero voltage): the tank capacitor is discharged through the switch each cycle; harmonic balance converges slowly there and its band is widened — tune the transmitter tank for zero-voltage turn-on (about 1.3× the switching frequency for this drive)`,
        ]
      : high.result.warnings;
    const detail = { ...high.result.harmonic, switchNode: { ...high.result.harmonic.switchNode!, hardSwitching: hard } };
    return { ...high.result, harmonic: detail, warnings, errorBand: orderBand(change, H, half, hard) };
  }
  return solveOrder(network, H, N, options, df, undefined).result;
}

/**
 * The options object of the harmonic engines checked under `where`: known link-option keys
 * (a typo names the nearest), the harmonic `order` H (integer 1…200) and `samples` N (integer
 * 2H + 2…100000); undefined takes the default, null is a bad value.
 * @example checkHarmonicOptions({ order: 9 }, "solveLinkHarmonic") // → { order: 9, samples: 72 }
 */
export function checkHarmonicOptions(options: HarmonicOptions, where: string): { order: number; samples: number } {
  requireObject(options, "options", where);
  checkLinkOptions(options, where);
  const H = options.order === undefined ? DEFAULT_HARMONIC_ORDER : options.order;
  if (!(Number.isInteger(H) && H >= 1 && H <= 200)) {
    throw new TanklightInputError([{ path: "order", message: "must be an integer from 1 to 200", value: H, expected: "1…200" }], where);
  }
  const N = options.samples === undefined ? defaultSamples(H) : options.samples;
  if (!(Number.isInteger(N) && N >= 2 * H + 2 && N <= 100000)) {
    throw new TanklightInputError([{ path: "samples", message: `must be an integer ≥ 2·order + 2 = ${2 * H + 2}`, value: N, expected: `≥ ${2 * H + 2}` }], where);
  }
  return { order: H, samples: N };
}

/**
 * Why harmonic balance cannot solve a network, or undefined when it can: it solves every
 * transmitter on its own drive (any number of them, each with its phase), not coils hung on a
 * shared drive.
 * @example sharedDriveRefusal(network) // undefined for transmitters on their own drives
 */
export function sharedDriveRefusal(network: LinkNetwork): string | undefined {
  let shared = (network.sharedDrives?.length ?? 0) > 0;
  for (const t of network.transmitters ?? [network.transmitter]) shared ||= t.feed !== undefined;
  return shared ? "harmonic balance solves transmitters on their own drives; coils on a shared drive keep the describing function" : undefined;
}

/** Harmonic balance at one order and sampling, optionally started from a lower-order solution. */
function solveOrder(
  network: LinkNetwork,
  H: number,
  N: number,
  options: HarmonicOptions,
  df: LinkResult,
  start: { readonly z: Float64Array; readonly order: number } | undefined,
): { result: HarmonicLinkResult; z: Float64Array } {
  const where = "solveLinkHarmonic";
  const tol = options.tolerance ?? 1e-9;
  const maxIter = options.maxIterations ?? 60;
  const rx = network.receivers;
  const nonlinear = rx.map((r) => !r.load.linear);
  const lin = (k: number, h: number, out: Float64Array): void => {
    const load = rx[k]!.load;
    out[0] = load.conductance(1);
    out[1] = (load.susceptance ? load.susceptance(1) : 0) * h; // a linear load's susceptance taken as capacitive
  };
  const ports = harmonicPorts(network, H, emfSpectra(network), nonlinear, lin);
  const tables = spectrumTables(N);
  const loads: TimeLoad[] = [];
  for (let p = 0; p < ports.ports; p++) {
    const k = ports.portReceiver[p]!;
    if (k >= 0) loads.push(timeLoad(rx[k]!.load.token!, N));
    else {
      const wf = network.transmitter.drive.kind === "voltage" ? network.transmitter.drive.waveform : undefined;
      if (wf?.kind !== "singleSwitch") throw new Error("unreachable: switch port without a single-switch drive");
      loads.push(switchLoad(N, wf.onResistance, wf.offResistance, wf.duty));
    }
  }
  const sys = new HarmonicSystem(ports, tables, loads);
  const z = new Float64Array(sys.size);
  if (start) {
    const Bl = 2 * start.order + 1;
    for (let p = 0; p < ports.ports; p++) z.set(start.z.subarray(p * Bl, (p + 1) * Bl), p * sys.B);
  }
  const warnings: string[] = [...df.warnings.filter((w) => !w.startsWith("solveLinkNetwork: the nonlinear operating point did not converge"))];
  let converged = true;
  let iterations = 0;
  let lastResidual = 0;
  if (sys.size > 0) {
    const outcome = solveWithContinuation(sys, z, df, ports, tol, maxIter, start !== undefined);
    converged = outcome.converged;
    iterations = outcome.iterations;
    lastResidual = outcome.residual;
    if (!converged) {
      const msg = `${where}: harmonic balance did not converge (order ${H}, ${N} samples, ${iterations} Newton iterations; last residual ${lastResidual.toExponential(3)} V against a scale of ${sys.scale(z).toExponential(3)} V); try a higher order, more samples, or raise maxIterations`;
      if ((options.onNonConvergence ?? "throw") === "throw") throw new LinkConvergenceError(msg, iterations, [lastResidual]);
      warnings.push(msg);
    }
  }
  return { result: assembleHarmonicResult({ network, options, ports, sys, z, converged, iterations, residual: lastResidual, warnings }), z };
}

/** Largest relative change of an LED average current (floor 5 µA) or of the transmitter current between two results. */
function resultChange(a: LinkResult, b: LinkResult): number {
  let c = Math.abs(a.transmitter.coilCurrent - b.transmitter.coilCurrent) / Math.max(b.transmitter.coilCurrent, 1e-300);
  a.receivers.forEach((r, k) =>
    r.leds.forEach((l, i) => {
      const m = b.receivers[k]!.leds[i]!.averageCurrent;
      c = Math.max(c, Math.abs(l.averageCurrent - m) / Math.max(Math.abs(m), 5e-6));
    }),
  );
  return c;
}

/**
 * The band of a single-switch result from its two orders: 1 % (validated) or the change from
 * half the order, whichever is larger. Under hard switching the convergence is slow and not
 * monotone (measured on a drawer tank tuned 2.6× above the switching frequency: order 8 → 15
 * changes the LED current by 0.7 % while order 15 is 2.0 % from the transient): five times the
 * change there.
 */
function orderBand(change: number, order: number, half: number, hard: boolean): ModelBand {
  const relative = Math.max(0.01, (hard ? 5 : 1) * change);
  const how = `order ${half} differs by ${(100 * change).toPrecision(2)} %`;
  return {
    relative,
    basis:
      relative === 0.01
        ? `harmonic balance, order ${order} (single switch solved with the tank): within 1 % of the transient engine's periodic steady state over the validated grid; ${how}`
        : `harmonic balance, order ${order} (single switch solved with the tank): the switch's jump converges slowly; ${how}${hard ? ", times 5 under hard switching" : ""} (raise the order to narrow it)`,
  };
}

function solveWithContinuation(
  sys: HarmonicSystem,
  z: Float64Array,
  df: LinkResult,
  ports: HarmonicPorts,
  tol: number,
  maxIter: number,
  started: boolean,
): { converged: boolean; iterations: number; residual: number } {
  const P = ports.ports;
  if (started) {
    const first = sys.newton(z, 1, tol, maxIter);
    if (first.converged) return first;
    z.fill(0);
  }
  // 1. loads frozen at their describing-function conductance: a linear problem (switch included)
  for (let p = 0; p < P; p++) {
    const k = ports.portReceiver[p]!;
    if (k < 0) continue;
    const amp = df.receivers[k]!.loadVoltage;
    const load = sysLoadConductance(df, k);
    sys.isFrozen[p] = 1;
    sys.frozen[p] = Number.isFinite(amp) ? load : 0;
  }
  // without a switch the frozen problem is harmonic by harmonic: solved directly
  if (ports.switchPort < 0) sys.solveFrozen(z, 1);
  else sys.newton(z, 1, tol, 3);
  sys.isFrozen.fill(0);
  const start = z.slice();
  // 2. the true loads from there
  let out = sys.newton(z, 1, tol, maxIter);
  let iterations = out.iterations;
  if (out.converged) return { ...out, iterations };
  // 3. source stepping from zero
  z.fill(0);
  let lambda = 0;
  let step = 0.25;
  let last = z.slice();
  while (lambda < 1 && step > 1 / 1024) {
    const next = Math.min(1, lambda + step);
    out = sys.newton(z, next, tol, maxIter);
    iterations += out.iterations;
    if (out.converged) {
      lambda = next;
      last = z.slice();
      step = Math.min(0.5, step * 1.5);
    } else {
      z.set(last);
      step /= 2;
    }
  }
  if (lambda >= 1) return { converged: true, iterations, residual: out.residual };
  z.set(start);
  const r = new Float64Array(sys.size);
  return { converged: false, iterations, residual: Math.max(out.residual, sys.residual(z, 1, r)) };
}

/** The describing-function conductance of receiver k at its solved amplitude, S. */
function sysLoadConductance(df: LinkResult, k: number): number {
  const r = df.receivers[k]!;
  const v = r.loadVoltage;
  return v > 0 ? r.loadCurrent / v : 0;
}

/**
 * Transmitter i's drive EMF phasor at each harmonic (peak; with the transmitter's phase φ = 0 the
 * fundamental is real, as the equivalent's): a sine has only the fundamental; a square wave
 * between `low` and `high` (50 % duty) has the DC (low + high)/2 and the odd harmonics
 * (high − low)/2 · 4/(πh) · (−1)^((h−1)/2) (its Fourier series, aligned so that the fundamental is
 * a cosine). A phase φ is a time shift of the whole waveform: harmonic h turns by h·φ.
 * @param network the link network; i the transmitter's index (default 0).
 * @example emfSpectrum(net)(1, out) // out = [2, 0] for sineDrive(2)
 */
export function emfSpectrum(network: LinkNetwork, i = 0): EmfSpectrum {
  const tx = (network.transmitters ?? [network.transmitter])[i]!;
  const d = tx.drive;
  if (d.kind !== "voltage") return (_h, out) => out.fill(0);
  const wf = d.waveform;
  const phase = tx.phase ?? 0;
  const turn = (h: number, re: number, out: Float64Array): void => {
    if (phase === 0 || re === 0) {
      out[0] = re;
      out[1] = 0;
    } else {
      out[0] = re * Math.cos(h * phase);
      out[1] = re * Math.sin(h * phase);
    }
  };
  if (wf?.kind === "square") {
    const half = (wf.high - wf.low) / 2;
    const mid = (wf.high + wf.low) / 2;
    return (h, out) => {
      if (h === 0) turn(0, mid, out);
      else if (h % 2 === 1) turn(h, ((half * 4) / (Math.PI * h)) * ((h - 1) % 4 === 0 ? 1 : -1), out);
      else turn(h, 0, out);
    };
  }
  return (h, out) => turn(h, h === 1 ? d.amplitude : 0, out);
}

/** Every transmitter's {@link emfSpectrum}, in the network's order. */
export function emfSpectra(network: LinkNetwork): EmfSpectrum[] {
  const out: EmfSpectrum[] = [];
  for (let i = 0; i < (network.transmitters?.length ?? 1); i++) out.push(emfSpectrum(network, i));
  return out;
}

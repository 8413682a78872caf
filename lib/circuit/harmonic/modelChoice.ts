/**
 * Which steady-state model answers a link: the describing function (fundamental only, fast)
 * or harmonic balance (every harmonic up to an order), by the caller's choice or automatically
 * — and, either way, a stated error band.
 *
 * The check that decides (and that gives a describing-function result its band) is one
 * fixed-point (Picard) step of harmonic balance from the describing-function solution: the
 * port voltages that the describing function's own load currents, harmonics included, would
 * produce through the network at every harmonic, v' = E + T·I(v_DF). The change this makes to
 * each LED's average current and to the transmitter current is the first correction the
 * fundamental-only model leaves out — its error estimate at this operating point. A load that
 * clamps the tank (an LED) feeds back against the change, so one step overestimates it: the
 * estimate is conservative. Where every change is below {@link FUNDAMENTAL_ACCEPT} "auto" keeps
 * the describing function; otherwise it runs harmonic balance from there.
 */
import { solveLinkNetwork } from "../link/solveNetwork.ts";
import { validateNetwork } from "../link/validateNetwork.ts";
import type { LinkNetwork } from "../link/network.ts";
import { DEFAULT_LIT_THRESHOLD } from "../link/network.ts";
import type { LinkResult } from "../link/result.ts";
import { TanklightInputError, requireObject, requirePositive } from "../../errors.ts";
import { harmonicPorts } from "./ports.ts";
import { spectrumTables } from "./spectrum.ts";
import { timeLoad } from "./timeLoad.ts";
import { HarmonicSystem } from "./newton.ts";
import { checkHarmonicOptions, emfSpectra, sharedDriveRefusal, solveLinkHarmonic, type HarmonicOptions } from "./solveHarmonic.ts";
import type { HarmonicDetail } from "./result.ts";
import type { ModelBand } from "./modelBand.ts";
import type { HarmonicLinkResult } from "./result.ts";
import { switchPeriodic, switchPeriodicApplies, type SwitchPeriodic } from "./switchPeriodic.ts";

/** The steady-state models: "fundamental" (describing function), "harmonic" (harmonic balance), "auto". */
export type LinkModel = "fundamental" | "harmonic" | "auto";

/** Options of {@link solveLinkModel}: harmonic-balance options plus the model. */
export interface ModelOptions extends HarmonicOptions {
  /** "fundamental", "harmonic" or "auto" (default "fundamental": the analysis functions solve with it, so solveLink agrees with their maps) */
  readonly model?: LinkModel;
}

/**
 * A link result that states its model and error band (harmonic balance adds `harmonic`):
 * "fundamental" the describing function, "harmonic" harmonic balance, "periodic" the transient
 * engine's periodic steady state (shooting) for the LED currents, coil currents and input power,
 * with the other fields from harmonic balance (the single switch under hard switching, "auto").
 */
export type ModelledLinkResult = LinkResult & {
  readonly model: "fundamental" | "harmonic" | "periodic";
  readonly errorBand: ModelBand;
  readonly harmonic?: HarmonicDetail;
};

/**
 * Largest estimated relative error (LED average currents, transmitter current) at which "auto"
 * keeps the describing function: 0.5 %, so that its stated band (twice the estimate, floored at
 * 0.1 %) stays within the 1 % that harmonic balance is validated to.
 */
export const FUNDAMENTAL_ACCEPT = 0.005;

/** Order and samples of the check (an estimate: a modest order is enough). */
const CHECK_ORDER = 9;
const CHECK_SAMPLES = 72;

/** The describing function's estimated error at its solution (see the module comment). */
export interface FundamentalCheck {
  /** largest estimated relative change of an LED's average current or of the transmitter current */
  readonly estimate: number;
  /** LEDs whose estimated change exceeds the acceptance, with it: "receiver 1: green LED (≈ 99 %)" */
  readonly outside: readonly string[];
  /** why no estimate could be made (then estimate is Infinity) */
  readonly reason?: string;
  /** whether harmonic balance can solve this network (false: a load known only by its describing function) */
  readonly harmonicPossible: boolean;
}

/**
 * Estimates the describing function's error at its solution `df` of `network` by one Picard
 * step of harmonic balance.
 * @param network the link network; df its describing-function result (solveLinkNetwork).
 * @param litThreshold lit threshold, A: LED currents are compared with a floor of 1 % of it, so
 *   that a dark LED's tiny current does not count as a large relative error.
 * @returns {@link FundamentalCheck}.
 * @example fundamentalCheck(net, solveLinkNetwork(net)).estimate // ≈ 1e-16 for a resistor token and a sine drive
 */
export function fundamentalCheck(network: LinkNetwork, df: LinkResult, litThreshold = DEFAULT_LIT_THRESHOLD): FundamentalCheck {
  requireObject(network, "network", "fundamentalCheck");
  requireObject(df, "df", "fundamentalCheck");
  if (!Array.isArray(network.receivers)) throw new TanklightInputError([{ path: "network.receivers", message: "must be an array (a network from linkNetwork)", value: network.receivers }], "fundamentalCheck");
  validateNetwork(network, "fundamentalCheck");
  requirePositive(litThreshold, "litThreshold", "A", "fundamentalCheck");
  if (!Array.isArray(df.receivers) || df.receivers.length !== network.receivers.length) {
    throw new TanklightInputError([{ path: "df.receivers", message: "must be the describing-function result of this network (one entry per receiver)", value: df.receivers }], "fundamentalCheck");
  }
  const rx = network.receivers;
  const drive = network.transmitter.drive;
  const shared = sharedDriveRefusal(network);
  if (shared !== undefined) return { estimate: Infinity, outside: [], reason: shared, harmonicPossible: false };
  if (drive.kind === "voltage" && drive.waveform?.kind === "singleSwitch") {
    return { estimate: Infinity, outside: [], reason: "the single-switch drive's switch-node waveform is assumed by the describing function, not solved", harmonicPossible: true };
  }
  const nonlinear = rx.map((r) => !r.load.linear);
  const custom = rx.findIndex((r, k) => nonlinear[k] && r.load.token === undefined);
  if (custom >= 0) {
    return { estimate: Infinity, outside: [], reason: `receiver ${custom + 1}'s load is a describing function only; it cannot be evaluated in time`, harmonicPossible: false };
  }
  const hasHarmonics = drive.kind === "voltage" && drive.waveform !== undefined;
  if (!nonlinear.some(Boolean) && !hasHarmonics) return { estimate: 0, outside: [], harmonicPossible: true };
  const H = CHECK_ORDER;
  const N = CHECK_SAMPLES;
  const lin = (k: number, h: number, out: Float64Array): void => {
    const load = rx[k]!.load;
    out[0] = load.conductance(1);
    out[1] = (load.susceptance ? load.susceptance(1) : 0) * h;
  };
  const ports = harmonicPorts(network, H, emfSpectra(network), nonlinear, lin);
  const P = ports.ports;
  const B = 2 * H + 1;
  if (P === 0) {
    // linear loads with a non-sinusoidal drive: superposition, the harmonics change no fundamental
    return { estimate: 0, outside: [], harmonicPossible: true };
  }
  const loads = Array.from({ length: P }, (_, p) => timeLoad(rx[ports.portReceiver[p]!]!.load.token!, N));
  const sys = new HarmonicSystem(ports, spectrumTables(N), loads);
  // the describing-function solution in harmonic-balance form: loads frozen at G_DF, fundamental only
  const z = new Float64Array(P * B);
  for (let p = 0; p < P; p++) {
    const r = df.receivers[ports.portReceiver[p]!]!;
    sys.isFrozen[p] = 1;
    sys.frozen[p] = r.loadVoltage > 0 ? r.loadCurrent / r.loadVoltage : 0;
  }
  fundamentalOnly(sys, z);
  sys.isFrozen.fill(0);
  const res = new Float64Array(P * B);
  sys.residual(z, 1, res);
  const before = sys.cur.slice();
  const ledsBefore = loads.map((l, p) => l.leds(sys.v.subarray(p * N, (p + 1) * N)));
  const zNew = z.slice();
  for (let j = 0; j < zNew.length; j++) zNew[j] = z[j]! - res[j]!;
  sys.residual(zNew, 1, res);
  const ledsAfter = loads.map((l, p) => l.leds(sys.v.subarray(p * N, (p + 1) * N)));
  const floor = 0.01 * litThreshold;
  let estimate = 0;
  const outside: string[] = [];
  for (let p = 0; p < P; p++) {
    const k = ports.portReceiver[p]!;
    ledsBefore[p]!.forEach((a, i) => {
      const b = ledsAfter[p]![i]!;
      const e = Math.abs(b.current - a.current) / Math.max(Math.abs(a.current), Math.abs(b.current), floor);
      estimate = Math.max(estimate, e);
      if (e > FUNDAMENTAL_ACCEPT) outside.push(`${rx[k]!.label ?? `receiver ${k + 1}`}: ${a.label} (≈ ${(100 * e).toPrecision(2)} %)`);
    });
  }
  // each transmitter's current: the fundamental's change through X_T at h = 1
  const size = ports.size;
  const dfTx = df.transmitters ?? [df.transmitter];
  for (let i = 0; i < ports.transmitters; i++) {
    let dRe = 0;
    let dIm = 0;
    for (let q = 0; q < P; q++) {
      const cr = sys.cur[q * B + 1]! - before[q * B + 1]!;
      const ci = sys.cur[q * B + 2]! - before[q * B + 2]!;
      const tr = ports.xtRe[(1 * size + ports.index.loop(i)) * P + q]!;
      const ti = ports.xtIm[(1 * size + ports.index.loop(i)) * P + q]!;
      dRe += tr * cr - ti * ci;
      dIm += tr * ci + ti * cr;
    }
    const i0 = dfTx[i]!.coilCurrent;
    if (i0 > 0) estimate = Math.max(estimate, Math.hypot(dRe, dIm) / i0);
  }
  return { estimate, outside, harmonicPossible: true };
}

/** Solves the frozen (linear) ports at the fundamental only: (1 − T₁·G)·V₁ = E₁. */
function fundamentalOnly(sys: HarmonicSystem, z: Float64Array): void {
  const { P, B } = sys;
  const pt = sys.ports;
  // P is small (one per nonlinear token): complex Gaussian elimination on a 2P real system
  const n = 2 * P;
  const a = new Float64Array(n * n);
  const b = new Float64Array(n);
  for (let p = 0; p < P; p++) {
    b[2 * p] = pt.eRe[P + p]!;
    b[2 * p + 1] = pt.eIm[P + p]!;
    for (let q = 0; q < P; q++) {
      const g = sys.frozen[q]!;
      const tr = pt.tRe[(P + p) * P + q]! * g;
      const ti = pt.tIm[(P + p) * P + q]! * g;
      const d = p === q ? 1 : 0;
      a[2 * p * n + 2 * q] = d - tr;
      a[2 * p * n + 2 * q + 1] = ti;
      a[(2 * p + 1) * n + 2 * q] = -ti;
      a[(2 * p + 1) * n + 2 * q + 1] = d - tr;
    }
  }
  gauss(a, b, n);
  for (let p = 0; p < P; p++) {
    z[p * B + 1] = b[2 * p]!;
    z[p * B + 2] = b[2 * p + 1]!;
  }
}

function gauss(a: Float64Array, b: Float64Array, n: number): void {
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i * n + k]!) > Math.abs(a[p * n + k]!)) p = i;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t = a[k * n + j]!;
        a[k * n + j] = a[p * n + j]!;
        a[p * n + j] = t;
      }
      const t = b[k]!;
      b[k] = b[p]!;
      b[p] = t;
    }
    const piv = a[k * n + k]!;
    if (piv === 0) continue;
    for (let i = k + 1; i < n; i++) {
      const l = a[i * n + k]! / piv;
      if (l === 0) continue;
      for (let j = k; j < n; j++) a[i * n + j] = a[i * n + j]! - l * a[k * n + j]!;
      b[i] = b[i]! - l * b[k]!;
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < n; j++) s -= a[i * n + j]! * b[j]!;
    const d = a[i * n + i]!;
    b[i] = d === 0 ? 0 : s / d;
  }
}

/**
 * The link's steady state by the model asked for, with its model and error band stated.
 *
 * - "fundamental": the describing function (solveLinkNetwork); its band is twice the
 *   one-step estimate of {@link fundamentalCheck} (at least 0.1 %), and an LED whose estimated
 *   error exceeds 0.5 % is named in a warning.
 * - "harmonic": harmonic balance (solveLinkHarmonic), band 1 % (validated) or from its
 *   truncation indicator.
 * - "auto": the describing function where its estimated error is below 0.5 % (typically
 *   linear or symmetric loads, a sine-like drive, moderate clipping, or LEDs still dark), harmonic
 *   balance everywhere else; a load that can only be described by its describing function
 *   keeps the fundamental model, with a warning.
 *
 * @param network the link as numbers; options link options, `model`, harmonic `order`/`samples`.
 * @returns {@link ModelledLinkResult}.
 * @throws TanklightInputError for a bad model name (and everything the solvers throw).
 * @example a red + InGaN green pair clipping hard under a sine drive: solveLinkModel(net).model is
 *   "harmonic"; a resistor token: "fundamental" with errorBand.relative 0.001
 */
export function solveLinkModel(network: LinkNetwork, options: ModelOptions = {}): ModelledLinkResult {
  requireObject(network, "network", "solveLinkModel");
  checkHarmonicOptions(options, "solveLinkModel");
  // undefined takes the default; null is a bad value
  const model = options.model === undefined ? "fundamental" : options.model;
  if (model !== "fundamental" && model !== "harmonic" && model !== "auto") {
    throw new TanklightInputError([{ path: "model", message: "must be 'fundamental', 'harmonic' or 'auto'", value: model }], "solveLink");
  }
  if (model === "harmonic") return harmonicChecked(network, options, false);
  const df = solveLinkNetwork(network, options);
  const check = fundamentalCheck(network, df, options.litThreshold);
  if (model === "auto" && check.estimate > FUNDAMENTAL_ACCEPT && check.harmonicPossible) {
    return harmonicChecked(network, options, true);
  }
  return fundamentalResult(df, check);
}

/** Steps a cycle of the periodic-steady-state runs, and of the step-doubling check of "auto". */
const PERIODIC_STEPS = 200;

/**
 * Harmonic balance, and for a hard-switched single switch the transient engine's periodic
 * steady state (./switchPeriodic.ts): under "harmonic" it measures harmonic balance's error and
 * widens the band to it; under "auto" it answers ("periodic": its LED currents, coil currents and
 * input power, the band from a step-doubling run at 400 steps a cycle).
 */
function harmonicChecked(network: LinkNetwork, options: ModelOptions, answer: boolean): ModelledLinkResult {
  const hb = solveLinkHarmonic(network, options);
  if (!hb.harmonic.switchNode?.hardSwitching || !switchPeriodicApplies(network)) return hb;
  const p = switchPeriodic(network, PERIODIC_STEPS);
  const leds = hb.receivers[0]!.leds;
  if (!p || p.leds.length !== leds.length) return hb;
  const floor = 0.01 * (options.litThreshold ?? DEFAULT_LIT_THRESHOLD);
  let dev = Math.abs(hb.transmitter.coilCurrent / p.transmitterCurrent - 1);
  leds.forEach((l, i) => (dev = Math.max(dev, Math.abs(l.averageCurrent - p.leds[i]!) / Math.max(Math.abs(p.leds[i]!), floor))));
  if (!answer) {
    const relative = Math.max(hb.errorBand.relative, 1.5 * dev);
    return {
      ...hb,
      errorBand: {
        relative,
        basis: `${hb.errorBand.basis}; under hard switching its convergence is not monotone, so it was checked against the transient engine's periodic steady state (${PERIODIC_STEPS} steps a cycle): ${(100 * dev).toPrecision(2)} % off, band 1.5× that (model "auto" answers from the periodic steady state here)`,
      },
    };
  }
  const fine = switchPeriodic(network, 2 * PERIODIC_STEPS) ?? p;
  return periodicResult(hb, fine, p, options.litThreshold ?? DEFAULT_LIT_THRESHOLD, dev, network);
}

/** The harmonic-balance result with the periodic steady state's LED currents, coil currents and input power. */
function periodicResult(hb: HarmonicLinkResult, p: SwitchPeriodic, coarse: SwitchPeriodic, threshold: number, hbDev: number, network: LinkNetwork): ModelledLinkResult {
  // step doubling: trapezoidal/TR-BDF2 steps are second order, so the 2N run's error is about a
  // third of the change from N; the band takes the whole change (at least 0.2 %)
  const floor = 0.01 * threshold;
  let change = Math.abs(p.transmitterCurrent / coarse.transmitterCurrent - 1);
  p.leds.forEach((c, i) => (change = Math.max(change, Math.abs(c - coarse.leds[i]!) / Math.max(Math.abs(c), floor))));
  const relative = Math.max(0.002, change);
  const scale = (x: number, from: number, to: number): number => (from !== 0 ? (x * to) / from : x);
  const r0 = hb.receivers[0]!;
  const leds = r0.leds.map((l, i) => ({ ...l, averageCurrent: p.leds[i]!, relativeBrightness: scale(l.relativeBrightness, l.averageCurrent, p.leds[i]!), lit: p.leds[i]! >= threshold }));
  const receivers = [{ ...r0, leds, allLit: leds.length > 0 && leds.every((l) => l.lit), coilCurrent: p.tokenCurrent, coilCurrentRms: p.tokenCurrent * Math.SQRT1_2 }, ...hb.receivers.slice(1)];
  const transmitter = { ...hb.transmitter, coilCurrent: p.transmitterCurrent, coilCurrentRms: p.transmitterCurrent * Math.SQRT1_2 };
  const power = { ...hb.power, input: p.input, efficiency: p.input > 0 ? hb.power.delivered / p.input : 0 };
  const esr = (network.transmitter.capacitorEsr ?? 0) > 0 || network.receivers.some((r) => (r.capacitorEsr ?? 0) > 0);
  return {
    ...hb,
    transmitter,
    receivers,
    power,
    model: "periodic",
    errorBand: {
      relative,
      basis: `transient engine's periodic steady state (shooting, ${2 * PERIODIC_STEPS} steps a cycle, breakpoints at the switching instants) for the LED currents, coil currents and input power: the switch closes on a charged tank, where harmonic balance (order ${hb.harmonic.order}, ${(100 * hbDev).toPrecision(2)} % off here) converges slowly; band the change from ${PERIODIC_STEPS} steps (at least 0.2 %); the tank and part voltages, losses and delivered power are harmonic balance's${esr ? "; capacitor ESRs are not in the transient circuit" : ""}`,
    },
  };
}

/** The describing-function result with its band and validity warnings. */
function fundamentalResult(df: LinkResult, check: FundamentalCheck): ModelledLinkResult {
  const warnings = [...df.warnings];
  let band: ModelBand;
  if (check.reason !== undefined) {
    band = { relative: Infinity, basis: `describing function (fundamental only), error not estimated: ${check.reason}` };
    warnings.push(`describing function used where its error cannot be estimated (${check.reason}); use model "harmonic" where it applies`);
  } else {
    const inside = check.outside.length === 0;
    // outside its validity the one-step estimate can fall short (measured: 38 % estimated for a
    // 99 % error of a dark InGaN LED): the band then admits an error of the whole value
    const relative = inside ? Math.max(1e-3, 2 * check.estimate) : Math.max(1, 2 * check.estimate);
    band = {
      relative,
      basis: inside
        ? `describing function (fundamental only): error estimated by one harmonic-balance step at this operating point (${(100 * check.estimate).toPrecision(2)} %), band twice that`
        : `describing function outside its validity (one harmonic-balance step changes an LED current by ${(100 * check.estimate).toPrecision(2)} %): an LED current can be wrong by its whole value`,
    };
    if (!inside) {
      warnings.push(
        `describing function outside its validity for ${check.outside.join("; ")}: the tank waveform is far from a sine there (rectifying or clipping load, or a non-sine drive); use model "harmonic" or "auto"`,
      );
    }
  }
  return { ...df, model: "fundamental", errorBand: band, warnings };
}

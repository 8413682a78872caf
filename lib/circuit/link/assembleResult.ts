/**
 * The link solver's result from a solved workspace: every element's currents and voltages
 * (peak and RMS), the power flow, each LED's verdict, and the warnings and cautions. Plain
 * phasor arithmetic on the loop currents left in the workspace (./operatingPoint.ts).
 */
import {
  DEFAULT_BRIGHTNESS_REFERENCE,
  DEFAULT_CAUTION_VOLTAGE,
  DEFAULT_LIT_THRESHOLD,
  type LinkOptions,
} from "./network.ts";
import { networkTransmitters } from "./network.ts";
import { receiverLabel, type LinkWorkspace } from "./operatingPoint.ts";
import type { DriveEquivalent } from "../drive.ts";
import type { DriveState, LedState, LinkResult, Phasor, ReceiverState, TransmitterState } from "./result.ts";

const LITTHRESHOLD_SOURCE =
  "trade practice (no source): indicator LEDs are visible indoors from about 0.1–1 mA average current";

const SQRT1_2 = Math.SQRT1_2;

/** A solved operating point: the workspace holding it, and how the iteration ended. */
export interface SolvedLink {
  readonly ws: LinkWorkspace;
  readonly converged: boolean;
  readonly iterations: number;
  /** warnings so far (non-convergence); the assembly adds part and self-resonance warnings */
  readonly warnings: string[];
}

/** The verdict settings of {@link LinkOptions} with their defaults applied. */
interface Verdicts {
  readonly threshold: number;
  readonly brightRef: number;
  readonly cautionV: number;
  readonly warnings: string[];
  readonly cautions: string[];
}

/**
 * Builds the {@link LinkResult} of a solved link.
 * @example assembleResult({ ws, converged: true, iterations: 3, warnings: [] }, {}).power.efficiency
 */
export function assembleResult(solved: SolvedLink, options: LinkOptions): LinkResult {
  const { ws } = solved;
  const v: Verdicts = {
    threshold: options.litThreshold ?? DEFAULT_LIT_THRESHOLD,
    brightRef: options.brightnessReference ?? DEFAULT_BRIGHTNESS_REFERENCE,
    cautionV: options.cautionVoltage ?? DEFAULT_CAUTION_VOLTAGE,
    warnings: solved.warnings,
    cautions: [],
  };
  const coil = coilCurrents(ws);
  const txs = networkTransmitters(ws.network);
  const tanks = txs.map((_, i) => transmitterTank(ws, i, coil, v));
  const { transmitters, drives } = driveStates(ws, tanks);
  let input = 0;
  let driver = 0;
  for (const d of drives) {
    input += d.inputPower;
    driver += d.driverLoss;
  }
  let txCoil = 0;
  let txCap = 0;
  for (const t of transmitters) {
    txCoil += t.coilLoss;
    txCap += t.capacitorLoss;
  }
  const receivers: ReceiverState[] = [];
  let delivered = 0;
  let rxCoil = 0;
  let rxCap = 0;
  for (let k = 0; k < ws.m; k++) {
    const r = receiverState(ws, k, coil, v);
    delivered += r.loadPower;
    rxCoil += r.coilLoss;
    rxCap += r.capacitorLoss;
    receivers.push(r);
  }
  const drive = ws.network.transmitter.drive;
  return {
    frequency: ws.w / (2 * Math.PI),
    converged: solved.converged,
    iterations: solved.iterations,
    scalarIterations: ws.scalarIterations,
    transmitter: transmitters[0]!,
    transmitters,
    drives,
    receivers,
    power: {
      input,
      delivered,
      driver,
      transmitterCoil: txCoil,
      transmitterCapacitor: txCap,
      receiverCoils: rxCoil,
      receiverCapacitors: rxCap,
      efficiency: input > 0 ? delivered / input : 0,
    },
    litThreshold: v.threshold,
    litThresholdSource: options.litThreshold === undefined ? LITTHRESHOLD_SOURCE : "set by the user",
    drive: txs.length === 1 ? { label: drive.label, assumptions: drive.assumptions } : severalDrives(ws),
    warnings: v.warnings,
    cautions: v.cautions,
  };
}

/** The `drive` record of a link with several transmitters: every drive's label and assumptions. */
function severalDrives(ws: LinkWorkspace): { label: string; assumptions: readonly string[] } {
  const txs = networkTransmitters(ws.network);
  const shared = ws.network.sharedDrives ?? [];
  const parts: string[] = [];
  const assumptions = new Set<string>();
  txs.forEach((tx, i) => {
    if (tx.feed !== undefined) return;
    parts.push(`${transmitterLabel(ws, i)}: ${tx.drive.label}`);
    for (const a of tx.drive.assumptions) assumptions.add(a);
  });
  shared.forEach((sd) => {
    parts.push(`${sd.label} (${sd.wiring}): ${sd.drive.label}`);
    for (const a of sd.drive.assumptions) assumptions.add(a);
  });
  return { label: parts.join("; "), assumptions: [...assumptions] };
}

/** Every coil's current phasor, A peak: the transmitters' (sign · their unknown), then the receivers'. */
/**
 * Every coil's current phasor, A peak, from a solved workspace: the transmitters first (in the
 * coil's own sense, through their feed's polarity), then the receivers.
 * @example coilCurrents(solveLinkOperatingPoint(net).ws).re[0] // → solveLinkNetwork(net).transmitter.coilCurrentPhasor.re
 */
export function coilCurrents(ws: LinkWorkspace): { re: Float64Array; im: Float64Array } {
  const { t, m, p, base, iRe, iIm } = ws;
  const re = new Float64Array(t + m);
  const im = new Float64Array(t + m);
  for (let i = 0; i < t; i++) {
    const u = base.coilUnknown[i]!;
    const s = base.coilSign[i]!;
    re[i] = s * iRe[u]!;
    im[i] = s * iIm[u]!;
  }
  for (let k = 0; k < m; k++) {
    re[t + k] = iRe[p + k]!;
    im[t + k] = iIm[p + k]!;
  }
  return { re, im };
}

/** A transmitter's label for results: its own, "transmitter" alone, "transmitter i+1" among several. */
function transmitterLabel(ws: LinkWorkspace, i: number): string {
  return networkTransmitters(ws.network)[i]!.label ?? (ws.t === 1 ? "transmitter" : `transmitter ${i + 1}`);
}

/** One transmitter's tank as phasors (coil frame): coil current and voltage, capacitor, terminals. */
interface TransmitterTank extends TransmitterTerminals {
  readonly label: string;
  readonly iRe: number;
  readonly iIm: number;
  readonly coilVRe: number;
  readonly coilVIm: number;
  readonly refl: Phasor;
}

/**
 * Transmitter i: coil voltage RᵢIᵢ + jωLᵢIᵢ + Σ jωMᵢⱼIⱼ (every other coil), its capacitor (series:
 * same current; parallel: same voltage), its terminals and the reflected impedance Σ jωMᵢⱼIⱼ/Iᵢ.
 */
function tankPhasors(ws: LinkWorkspace, i: number, coil: { re: Float64Array; im: Float64Array }): TransmitterTank {
  const { w, t, m } = ws;
  const L = ws.network.inductance;
  const tx = networkTransmitters(ws.network)[i]!;
  const i0Re = coil.re[i]!;
  const i0Im = coil.im[i]!;
  let mRe = 0; // Σ jωMᵢⱼIⱼ
  let mIm = 0;
  for (let j = 0; j < t + m; j++) {
    if (j === i) continue;
    const x = w * L[i]![j]!;
    mRe += -x * coil.im[j]!;
    mIm += x * coil.re[j]!;
  }
  const l0 = L[i]![i]!;
  const coilVRe = tx.resistance * i0Re - w * l0 * i0Im + mRe;
  const coilVIm = tx.resistance * i0Im + w * l0 * i0Re + mIm;
  const i0a2 = i0Re * i0Re + i0Im * i0Im;
  const refl: Phasor = i0a2 > 0 ? { re: (mRe * i0Re + mIm * i0Im) / i0a2, im: (mIm * i0Re - mRe * i0Im) / i0a2 } : { re: 0, im: 0 };
  const terminals = compensation(tx.compensation, ws.base.zcRe[i]!, ws.base.zcIm[i]!, i0Re, i0Im, coilVRe, coilVIm);
  // written out field by field: an object spread here made the whole solve about twice as slow (V8)
  return {
    capVRe: terminals.capVRe,
    capVIm: terminals.capVIm,
    capIRe: terminals.capIRe,
    capIIm: terminals.capIIm,
    srcIRe: terminals.srcIRe,
    srcIIm: terminals.srcIIm,
    termVRe: terminals.termVRe,
    termVIm: terminals.termVIm,
    label: transmitterLabel(ws, i),
    iRe: i0Re,
    iIm: i0Im,
    coilVRe,
    coilVIm,
    refl,
  };
}

/** {@link tankPhasors} plus transmitter i's part warnings and cautions. */
function transmitterTank(ws: LinkWorkspace, i: number, coil: { re: Float64Array; im: Float64Array }, v: Verdicts): TransmitterTank {
  const k = tankPhasors(ws, i, coil);
  const tx = networkTransmitters(ws.network)[i]!;
  const coilV = Math.hypot(k.coilVRe, k.coilVIm);
  const capV = Math.hypot(k.capVRe, k.capVIm);
  checkPartVoltage(k.label + " capacitor", capV, tx.capacitorRating, v.warnings);
  checkSelfResonance(k.label + " coil", ws.w / (2 * Math.PI), tx.selfResonance, v.warnings);
  caution(k.label + " coil", coilV, v.cautionV, v.cautions);
  if (tx.compensation !== "none") caution(k.label + " capacitor", capV, v.cautionV, v.cautions);
  return k;
}

/**
 * The power a drive delivers, W: ½Re(V·I*) of its ideal source (V = amplitude·e^{jφ}) with
 * source current iRe + j·iIm, or of its terminals (vRe + j·vIm) for a held current.
 */
function sourcePower(drive: DriveEquivalent, phase: number, iRe: number, iIm: number, vRe: number, vIm: number): number {
  if (drive.kind !== "voltage") return 0.5 * (vRe * iRe + vIm * iIm);
  return phase === 0 ? 0.5 * drive.amplitude * iRe : 0.5 * drive.amplitude * (Math.cos(phase) * iRe + Math.sin(phase) * iIm);
}

/**
 * The drives' total input power, W — the result's `power.input` (the same sum in the same
 * order) without the rest of the record, for batch runs that need only the supply's draw.
 * @example inputPower(solveLinkOperatingPoint(network).ws) // → solveLinkNetwork(network).power.input
 */
export function inputPower(ws: LinkWorkspace): number {
  const coil = coilCurrents(ws);
  const txs = networkTransmitters(ws.network);
  const tanks = txs.map((_, i) => tankPhasors(ws, i, coil));
  let input = 0;
  txs.forEach((tx, i) => {
    if (tx.feed === undefined) input += sourcePower(tx.drive, tx.phase ?? 0, tanks[i]!.srcIRe, tanks[i]!.srcIIm, tanks[i]!.termVRe, tanks[i]!.termVIm);
  });
  (ws.network.sharedDrives ?? []).forEach((sd, g) => {
    const members = txs.flatMap((tx, i) => (tx.feed?.drive === g ? [i] : []));
    if (members.length === 0) return;
    const src = sharedSource(ws, g, members, tanks);
    input += sourcePower(sd.drive, sd.phase ?? 0, src.iRe, src.iIm, src.vRe, src.vIm);
  });
  return input;
}

/**
 * The transmitters' states and the drives': each transmitter's own drive goes with it
 * ({@link ownDrive}); a shared drive's numbers are its own ({@link sharedDrive}), each coil on it
 * reporting its own tank's terminals.
 */
function driveStates(ws: LinkWorkspace, tanks: readonly TransmitterTank[]): { transmitters: TransmitterState[]; drives: DriveState[] } {
  const txs = networkTransmitters(ws.network);
  const transmitters: TransmitterState[] = [];
  const drives: DriveState[] = [];
  tanks.forEach((k, i) => {
    if (txs[i]!.feed !== undefined) {
      const termP = 0.5 * (k.termVRe * k.srcIRe + k.termVIm * k.srcIIm);
      transmitters.push(transmitterState(ws, i, k, terminalImpedance(k.termVRe, k.termVIm, k.srcIRe, k.srcIIm), 0, termP));
      return;
    }
    const own = ownDrive(ws, i, k);
    transmitters.push(own.state);
    drives.push(own.drive);
  });
  (ws.network.sharedDrives ?? []).forEach((sd, g) => {
    const members = txs.flatMap((tx, i) => (tx.feed?.drive === g ? [i] : []));
    if (members.length > 0) drives.push(sharedDrive(ws, g, members, tanks, transmitters));
  });
  return { transmitters, drives };
}

/**
 * Transmitter i on its own drive: the source power (½Re(V·I*) of the ideal source; of the
 * terminals for a held current), driver loss and input impedance, with its state.
 */
function ownDrive(ws: LinkWorkspace, i: number, k: TransmitterTank): { state: TransmitterState; drive: DriveState } {
  const tx = networkTransmitters(ws.network)[i]!;
  const drive = tx.drive;
  const srcIa2 = k.srcIRe * k.srcIRe + k.srcIIm * k.srcIIm;
  const input = sourcePower(drive, tx.phase ?? 0, k.srcIRe, k.srcIIm, k.termVRe, k.termVIm);
  const driverLoss = drive.kind === "voltage" ? 0.5 * srcIa2 * drive.resistance : 0;
  const inZ = terminalImpedance(k.termVRe, k.termVIm, k.srcIRe, k.srcIIm);
  const state = transmitterState(ws, i, k, inZ, driverLoss, input - driverLoss);
  return {
    state,
    drive: {
      label: state.label,
      description: drive.label,
      wiring: "own",
      transmitters: [state.label],
      sourceCurrent: state.sourceCurrent,
      sourceCurrentRms: state.sourceCurrentRms,
      sourceVoltage: state.sourceVoltage,
      sourceVoltageRms: state.sourceVoltageRms,
      inputImpedance: inZ,
      inputPower: input,
      driverLoss,
    },
  };
}

/**
 * Shared drive g feeding the transmitters `members`: its source current (the string current in
 * series, the sum of the branches' in parallel), terminal voltage, power and driver loss.
 */
function sharedDrive(ws: LinkWorkspace, g: number, members: readonly number[], tanks: readonly TransmitterTank[], transmitters: readonly TransmitterState[]): DriveState {
  const sd = ws.network.sharedDrives![g]!;
  const { iRe, iIm, vRe, vIm } = sharedSource(ws, g, members, tanks);
  const drive = sd.drive;
  const ia2 = iRe * iRe + iIm * iIm;
  const input = sourcePower(drive, sd.phase ?? 0, iRe, iIm, vRe, vIm);
  const driverLoss = drive.kind === "voltage" ? 0.5 * ia2 * drive.resistance : 0;
  const srcI = Math.sqrt(ia2);
  const termV = Math.hypot(vRe, vIm);
  return {
    label: sd.label,
    description: drive.label,
    wiring: sd.wiring,
    transmitters: members.map((i) => transmitters[i]!.label),
    sourceCurrent: srcI,
    sourceCurrentRms: srcI * SQRT1_2,
    sourceVoltage: termV,
    sourceVoltageRms: termV * SQRT1_2,
    inputImpedance: terminalImpedance(vRe, vIm, iRe, iIm),
    inputPower: input,
    driverLoss,
  };
}

/** Shared drive g's source current (the string current in series, the sum of the branches' in parallel) and terminal voltage, as phasors. */
function sharedSource(ws: LinkWorkspace, g: number, members: readonly number[], tanks: readonly TransmitterTank[]): { iRe: number; iIm: number; vRe: number; vIm: number } {
  const txs = networkTransmitters(ws.network);
  let iRe = 0;
  let iIm = 0;
  let vRe = 0;
  let vIm = 0;
  if (ws.network.sharedDrives![g]!.wiring === "series") {
    const u = ws.base.stringUnknown[g]!;
    iRe = ws.iRe[u]!;
    iIm = ws.iIm[u]!;
    for (const i of members) {
      const s = txs[i]!.feed!.polarity;
      vRe += s * tanks[i]!.termVRe;
      vIm += s * tanks[i]!.termVIm;
    }
  } else {
    for (const i of members) {
      const s = txs[i]!.feed!.polarity;
      iRe += s * tanks[i]!.srcIRe;
      iIm += s * tanks[i]!.srcIIm;
    }
    const first = members[0]!;
    const s0 = txs[first]!.feed!.polarity;
    vRe = s0 * tanks[first]!.termVRe;
    vIm = s0 * tanks[first]!.termVIm;
  }
  return { iRe, iIm, vRe, vIm };
}

/** V/I at a pair of terminals, Ω (0 + 0j when no current flows). */
function terminalImpedance(vRe: number, vIm: number, iRe: number, iIm: number): Phasor {
  const ia2 = iRe * iRe + iIm * iIm;
  const inZ = ia2 > 0 ? { re: (vRe * iRe + vIm * iIm) / ia2, im: (vIm * iRe - vRe * iIm) / ia2 } : { re: Infinity, im: 0 };
  if (!Number.isFinite(inZ.re)) inZ.re = 0;
  return inZ;
}

/** The {@link TransmitterState} of transmitter i from its tank phasors. */
function transmitterState(ws: LinkWorkspace, i: number, k: TransmitterTank, inZ: Phasor, driverLoss: number, terminalPower: number): TransmitterState {
  const tx = networkTransmitters(ws.network)[i]!;
  const i0a2 = k.iRe * k.iRe + k.iIm * k.iIm;
  const coilV = Math.hypot(k.coilVRe, k.coilVIm);
  const capV = Math.hypot(k.capVRe, k.capVIm);
  const capI = Math.hypot(k.capIRe, k.capIIm);
  const coilLoss = 0.5 * i0a2 * tx.resistance;
  const capLoss = 0.5 * (k.capIRe * k.capIRe + k.capIIm * k.capIIm) * (tx.capacitorEsr ?? 0);
  const srcI = Math.hypot(k.srcIRe, k.srcIIm);
  const termV = Math.hypot(k.termVRe, k.termVIm);
  const i0 = Math.sqrt(i0a2);
  // The TankState fields are written out here and in receiverState on purpose: one definition
  // (a tankState() helper + Object.assign) measured 7–11 % slower on the one-token solve (bench
  // link, p10 of 600 alternating rounds), an object spread 2–5×. The compiler checks both
  // literals against TankState (result.ts), so they cannot drift apart.
  return {
    label: k.label,
    coilCurrent: i0,
    coilCurrentRms: i0 * SQRT1_2,
    coilCurrentPhasor: { re: k.iRe, im: k.iIm },
    coilVoltage: coilV,
    coilVoltageRms: coilV * SQRT1_2,
    capacitorVoltage: capV,
    capacitorVoltageRms: capV * SQRT1_2,
    capacitorCurrent: capI,
    capacitorCurrentRms: capI * SQRT1_2,
    coilLoss,
    capacitorLoss: capLoss,
    sourceCurrent: srcI,
    sourceCurrentRms: srcI * SQRT1_2,
    sourceVoltage: termV,
    sourceVoltageRms: termV * SQRT1_2,
    inputImpedance: inZ,
    reflectedImpedance: k.refl,
    driverLoss,
    terminalPower,
  };
}

/** Phasors of the transmitter's capacitor, source current and terminal voltage (V, A peak). */
interface TransmitterTerminals {
  readonly capVRe: number;
  readonly capVIm: number;
  readonly capIRe: number;
  readonly capIIm: number;
  readonly srcIRe: number;
  readonly srcIIm: number;
  readonly termVRe: number;
  readonly termVIm: number;
}

/**
 * The transmitter capacitor Z_C₀ with coil current I₀ and coil voltage V₀: in series it carries
 * I₀ and adds its drop to the terminal voltage; in parallel it sees V₀ and adds V₀/Z_C₀ to the
 * source current; without it the source feeds the coil directly.
 */
function compensation(
  kind: "series" | "parallel" | "none",
  zc0Re: number,
  zc0Im: number,
  i0Re: number,
  i0Im: number,
  coilVRe: number,
  coilVIm: number,
): TransmitterTerminals {
  if (kind === "series") {
    const capVRe = zc0Re * i0Re - zc0Im * i0Im;
    const capVIm = zc0Re * i0Im + zc0Im * i0Re;
    return { capVRe, capVIm, capIRe: i0Re, capIIm: i0Im, srcIRe: i0Re, srcIIm: i0Im, termVRe: coilVRe + capVRe, termVIm: coilVIm + capVIm };
  }
  if (kind === "parallel") {
    const den = zc0Re * zc0Re + zc0Im * zc0Im;
    const capIRe = (coilVRe * zc0Re + coilVIm * zc0Im) / den;
    const capIIm = (coilVIm * zc0Re - coilVRe * zc0Im) / den;
    return { capVRe: coilVRe, capVIm: coilVIm, capIRe, capIIm, srcIRe: i0Re + capIRe, srcIIm: i0Im + capIIm, termVRe: coilVRe, termVIm: coilVIm };
  }
  return { capVRe: 0, capVIm: 0, capIRe: 0, capIIm: 0, srcIRe: i0Re, srcIIm: i0Im, termVRe: coilVRe, termVIm: coilVIm };
}

/**
 * Receiver k: its EMF −Σ jωMₖⱼIⱼ, coil terminal voltage, capacitor (series: loop current;
 * parallel: load voltage), load power ½G|V|², and each LED's average current and verdict.
 */
function receiverState(ws: LinkWorkspace, k: number, coil: { re: Float64Array; im: Float64Array }, v: Verdicts): ReceiverState {
  const { w, t, m, tanks } = ws;
  const L = ws.network.inductance;
  const r = ws.network.receivers[k]!;
  const c = t + k;
  const ir = coil.re[c]!;
  const ii = coil.im[c]!;
  let eRe = 0; // EMF = −Σ jωM_kj I_j
  let eIm = 0;
  for (let j = 0; j < t + m; j++) {
    if (j === c) continue;
    const x = w * L[c]![j]!;
    eRe += x * coil.im[j]!;
    eIm += -x * coil.re[j]!;
  }
  const lk = L[c]![c]!;
  const cvRe = r.resistance * ir - w * lk * ii - eRe; // coil terminal voltage (drop along the loop)
  const cvIm = r.resistance * ii + w * lk * ir - eIm;
  const vl = Math.hypot(ws.vRe[k]!, ws.vIm[k]!);
  let capV: number;
  let capI: number;
  if (tanks.series[k]) {
    capI = Math.hypot(ir, ii);
    capV = capI * Math.hypot(tanks.zcRe[k]!, tanks.zcIm[k]!);
  } else {
    capV = vl;
    capI = vl * Math.hypot(tanks.ycRe[k]!, tanks.ycIm[k]!);
  }
  const ia2 = ir * ir + ii * ii;
  const coilLoss = 0.5 * ia2 * r.resistance;
  const capLoss = 0.5 * capI * capI * (r.capacitorEsr ?? 0);
  const g = ws.yG[k]!;
  const loadPower = 0.5 * g * vl * vl;
  const loadI = vl * Math.hypot(g, ws.yB[k]!);
  const ledList = r.load.ledCurrents ? r.load.ledCurrents(vl) : [];
  const leds: LedState[] = ledList.map((d) => ({
    label: d.label,
    averageCurrent: d.current,
    relativeBrightness: d.relativeBrightness ?? Math.max(d.current, 0) / v.brightRef,
    lit: d.current >= v.threshold,
  }));
  const label = receiverLabel(r, k);
  const coilV = Math.hypot(cvRe, cvIm);
  checkPartVoltage(label + " capacitor", capV, r.capacitorRating, v.warnings);
  checkSelfResonance(label + " coil", w / (2 * Math.PI), r.selfResonance, v.warnings);
  caution(label + " tank", Math.max(capV, coilV), v.cautionV, v.cautions);
  const i = Math.sqrt(ia2);
  // TankState fields written out on purpose: see transmitterState
  return {
    label: label,
    coilCurrent: i,
    coilCurrentRms: i * SQRT1_2,
    coilCurrentPhasor: { re: ir, im: ii },
    coilVoltage: coilV,
    coilVoltageRms: coilV * SQRT1_2,
    capacitorVoltage: capV,
    capacitorVoltageRms: capV * SQRT1_2,
    capacitorCurrent: capI,
    capacitorCurrentRms: capI * SQRT1_2,
    coilLoss,
    capacitorLoss: capLoss,
    emf: Math.hypot(eRe, eIm),
    loadVoltage: vl,
    loadVoltageRms: vl * SQRT1_2,
    loadCurrent: loadI,
    loadCurrentRms: loadI * SQRT1_2,
    loadPower,
    leds,
    lit: leds.some((d) => d.lit),
    allLit: leds.length > 0 && leds.every((d) => d.lit),
  };
}

function checkPartVoltage(what: string, peak: number, rating: number | undefined, warnings: string[]): void {
  if (rating !== undefined && peak > rating) {
    warnings.push(`${what}: peak voltage ${peak.toPrecision(3)} V exceeds its rating ${rating} V (overvoltage)`);
  }
}

function checkSelfResonance(what: string, f: number, srf: number | undefined, warnings: string[]): void {
  if (srf !== undefined && f > srf / 3) {
    warnings.push(
      `${what}: drive frequency ${f.toPrecision(4)} Hz is beyond a third of its self-resonance ${srf.toPrecision(4)} Hz; its inductance and resistance are no longer the low-frequency values`,
    );
  }
}

function caution(what: string, peak: number, limit: number, cautions: string[]): void {
  if (peak > limit) {
    cautions.push(
      `${what}: ${peak.toPrecision(3)} V peak (${(peak * SQRT1_2).toPrecision(3)} V RMS) exceeds ${limit} V peak; high tank voltages can shock or burn: insulate and rate the parts for it, and defer to local electrical codes, regulations and licensed practice`,
    );
  }
}

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
import { receiverLabel, type LinkWorkspace } from "./operatingPoint.ts";
import type { LedState, LinkResult, Phasor, ReceiverState, TransmitterState } from "./result.ts";

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
  const { state: transmitter, input } = transmitterState(ws, v);
  const receivers: ReceiverState[] = [];
  let delivered = 0;
  let rxCoil = 0;
  let rxCap = 0;
  for (let k = 0; k < ws.m; k++) {
    const r = receiverState(ws, k, v);
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
    transmitter,
    receivers,
    power: {
      input,
      delivered,
      driver: transmitter.driverLoss,
      transmitterCoil: transmitter.coilLoss,
      transmitterCapacitor: transmitter.capacitorLoss,
      receiverCoils: rxCoil,
      receiverCapacitors: rxCap,
      efficiency: input > 0 ? delivered / input : 0,
    },
    litThreshold: v.threshold,
    litThresholdSource: options.litThreshold === undefined ? LITTHRESHOLD_SOURCE : "set by the user",
    drive: { label: drive.label, assumptions: drive.assumptions },
    warnings: v.warnings,
    cautions: v.cautions,
  };
}

/**
 * The transmitter: coil voltage R₀I₀ + jωL₀I₀ + Σ jωM₀ⱼIⱼ, its capacitor (series: same current;
 * parallel: same voltage), the source current and terminal voltage, input and reflected
 * impedance, and the power the ideal source delivers (½Re(V·I*)).
 */
function transmitterState(ws: LinkWorkspace, v: Verdicts): { state: TransmitterState; input: number } {
  const { n, w, iRe, iIm } = ws;
  const L = ws.network.inductance;
  const tx = ws.network.transmitter;
  const i0Re = iRe[0]!;
  const i0Im = iIm[0]!;
  let mRe = 0; // Σ jωM₀ⱼIⱼ
  let mIm = 0;
  for (let j = 1; j < n; j++) {
    const x = w * L[0]![j]!;
    mRe += -x * iIm[j]!;
    mIm += x * iRe[j]!;
  }
  const l0 = L[0]![0]!;
  const coilVRe = tx.resistance * i0Re - w * l0 * i0Im + mRe;
  const coilVIm = tx.resistance * i0Im + w * l0 * i0Re + mIm;
  const i0a2 = i0Re * i0Re + i0Im * i0Im;
  const refl: Phasor = i0a2 > 0 ? { re: (mRe * i0Re + mIm * i0Im) / i0a2, im: (mIm * i0Re - mRe * i0Im) / i0a2 } : { re: 0, im: 0 };
  const { capVRe, capVIm, capIRe, capIIm, srcIRe, srcIIm, termVRe, termVIm } = compensation(
    tx.compensation, ws.base.zc0Re, ws.base.zc0Im, i0Re, i0Im, coilVRe, coilVIm,
  );
  const srcIa2 = srcIRe * srcIRe + srcIIm * srcIIm;
  const drive = tx.drive;
  // ½Re(V·I*) of the ideal source (V real), or of the terminals for a current drive
  const input = drive.kind === "voltage" ? 0.5 * drive.amplitude * srcIRe : 0.5 * (termVRe * srcIRe + termVIm * srcIIm);
  const driverLoss = drive.kind === "voltage" ? 0.5 * srcIa2 * drive.resistance : 0;
  const inZ =
    srcIa2 > 0
      ? { re: (termVRe * srcIRe + termVIm * srcIIm) / srcIa2, im: (termVIm * srcIRe - termVRe * srcIIm) / srcIa2 }
      : { re: Infinity, im: 0 };
  if (!Number.isFinite(inZ.re)) inZ.re = 0;
  const coilV = Math.hypot(coilVRe, coilVIm);
  const capV = Math.hypot(capVRe, capVIm);
  const capI = Math.hypot(capIRe, capIIm);
  const label = tx.label ?? "transmitter";
  checkPartVoltage(label + " capacitor", capV, tx.capacitorRating, v.warnings);
  checkSelfResonance(label + " coil", w / (2 * Math.PI), tx.selfResonance, v.warnings);
  caution(label + " coil", coilV, v.cautionV, v.cautions);
  if (tx.compensation !== "none") caution(label + " capacitor", capV, v.cautionV, v.cautions);
  const coilLoss = 0.5 * i0a2 * tx.resistance;
  const capLoss = 0.5 * (capIRe * capIRe + capIIm * capIIm) * (tx.capacitorEsr ?? 0);
  const srcI = Math.sqrt(srcIa2);
  const termV = Math.hypot(termVRe, termVIm);
  const i0 = Math.sqrt(i0a2);
  // written out field by field: an object spread here made the whole solve 2–5× slower (V8)
  const state: TransmitterState = {
    label,
    coilCurrent: i0,
    coilCurrentRms: i0 * SQRT1_2,
    coilCurrentPhasor: { re: i0Re, im: i0Im },
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
    reflectedImpedance: refl,
    driverLoss,
  };
  return { state, input };
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
function receiverState(ws: LinkWorkspace, k: number, v: Verdicts): ReceiverState {
  const { n, w, iRe, iIm, tanks } = ws;
  const L = ws.network.inductance;
  const r = ws.network.receivers[k]!;
  const ir = iRe[k + 1]!;
  const ii = iIm[k + 1]!;
  let eRe = 0; // EMF = −Σ jωM_kj I_j
  let eIm = 0;
  for (let j = 0; j < n; j++) {
    if (j === k + 1) continue;
    const x = w * L[k + 1]![j]!;
    eRe += x * iIm[j]!;
    eIm += -x * iRe[j]!;
  }
  const lk = L[k + 1]![k + 1]!;
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
  return {
    label,
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

/**
 * The harmonic-balance result: the describing-function result's fields (so maps, summaries and
 * reports read either) at the fundamental, with the LED currents, powers and part stresses taken
 * from the whole waveform, plus every harmonic of the coil currents and port voltages.
 */
import type { LinkNetwork, LinkOptions } from "../link/network.ts";
import { DEFAULT_BRIGHTNESS_REFERENCE, DEFAULT_CAUTION_VOLTAGE, DEFAULT_LIT_THRESHOLD } from "../link/network.ts";
import type { DriveState, LedState, LinkResult, Phasor, ReceiverState, TransmitterState } from "../link/result.ts";
import type { HarmonicPorts } from "./ports.ts";
import { capacitorAdmittance, capacitorImpedance } from "./ports.ts";
import type { HarmonicSystem } from "./newton.ts";
import { analyze, synthesize } from "./spectrum.ts";
import { litThresholdSource, partVoltageWarning, selfResonanceWarning, voltageCaution, type ModelBand } from "./modelBand.ts";

/** Harmonics 0…H of one quantity: index 0 is the DC value (im 0), index h the peak phasor of harmonic h. */
export type HarmonicPhasors = readonly Phasor[];

/** What harmonic balance adds to a link result. */
export interface HarmonicDetail {
  /** highest harmonic kept, H */
  readonly order: number;
  /** samples per period of the time-domain evaluation, N */
  readonly samples: number;
  /** transmitter coil current (with several: the first's), A, harmonics 0…H */
  readonly transmitterCurrent: HarmonicPhasors;
  /** with several transmitters: every transmitter's coil current, A, harmonics 0…H, in the network's order */
  readonly transmitterCurrents?: readonly HarmonicPhasors[];
  /** transmitter coil current (the first transmitter's), largest |i(t)| over the period, A */
  readonly transmitterCurrentPeak: number;
  /** the single-switch drive's switch-node voltage, when there is one */
  readonly switchNode?: {
    readonly voltage: HarmonicPhasors;
    /** largest v(t), V */
    readonly peak: number;
    /** smallest v(t), V (negative: the switch's body diode would conduct) */
    readonly minimum: number;
    /** total harmonic distortion √(Σ_{h≥2}|V_h|²)/|V₁| over the harmonics kept */
    readonly distortion: number;
    /** the truncation indicator of the switch port (large, ≳ 0.25, under hard switching) */
    readonly truncation: number;
    /** the switch closes on a charged tank (hard switching; set by solveLinkHarmonic's order check) */
    readonly hardSwitching?: boolean;
  };
  readonly receivers: readonly {
    /** load (tank) voltage, V, harmonics 0…H */
    readonly loadVoltage: HarmonicPhasors;
    /** largest and smallest v(t) across the load, V */
    readonly loadVoltagePeak: number;
    readonly loadVoltageMinimum: number;
    /** coil current, A, harmonics 0…H */
    readonly coilCurrent: HarmonicPhasors;
  }[];
  /**
   * truncation indicator: the tank-voltage change the dropped harmonics H+1…2H of each token
   * load's current would make, relative to the fundamental (largest over the tokens)
   */
  readonly truncation: number;
  /** largest residual entry at the solution, V */
  readonly residual: number;
  readonly newtonIterations: number;
}

/** A link result from harmonic balance. */
export interface HarmonicLinkResult extends LinkResult {
  readonly model: "harmonic";
  readonly errorBand: ModelBand;
  readonly harmonic: HarmonicDetail;
}

const SQRT1_2 = Math.SQRT1_2;

interface AssembleInput {
  readonly network: LinkNetwork;
  readonly options: LinkOptions;
  readonly ports: HarmonicPorts;
  readonly sys: HarmonicSystem;
  readonly z: Float64Array;
  readonly converged: boolean;
  readonly iterations: number;
  readonly residual: number;
  readonly warnings: string[];
}

/** Builds the result from the converged harmonic coefficients (one function: every field reads the same reconstruction). */
export function assembleHarmonicResult(a: AssembleInput): HarmonicLinkResult {
  const { network: net, options, ports, sys, z, warnings } = a;
  const H = ports.order;
  const P = ports.ports;
  const B = 2 * H + 1;
  const N = sys.N;
  const size = ports.size;
  const f = net.frequency;
  const w = 2 * Math.PI * f;
  const L = net.inductance;
  const txs = net.transmitters ?? [net.transmitter];
  const t = txs.length;
  const rx = net.receivers;
  const m = rx.length;
  const n = t + m;
  if (P > 0 && !sys.holds(z, 1)) sys.residual(z, 1, new Float64Array(sys.size)); // loads and port currents at z
  // every unknown at every harmonic: x_h = x_oc,h + X_T,h·I_port,h
  const xRe = new Float64Array((H + 1) * size);
  const xIm = new Float64Array((H + 1) * size);
  for (let h = 0; h <= H; h++) {
    for (let i = 0; i < size; i++) {
      let re = ports.xRe[h * size + i]!;
      let im = ports.xIm[h * size + i]!;
      for (let q = 0; q < P; q++) {
        const cr = h === 0 ? sys.cur[q * B]! : sys.cur[q * B + 2 * h - 1]!;
        const ci = h === 0 ? 0 : sys.cur[q * B + 2 * h]!;
        const tr = ports.xtRe[(h * size + i) * P + q]!;
        const ti = ports.xtIm[(h * size + i) * P + q]!;
        re += tr * cr - ti * ci;
        im += tr * ci + ti * cr;
      }
      xRe[h * size + i] = re;
      xIm[h * size + i] = im;
    }
  }
  const X: Expanded = { re: xRe, im: xIm, size, H };
  const S: Synth = { tables: sys.tables, H, N, coef: new Float64Array(B), samples: new Float64Array(N) };

  const threshold = options.litThreshold ?? DEFAULT_LIT_THRESHOLD;
  const brightRef = options.brightnessReference ?? DEFAULT_BRIGHTNESS_REFERENCE;
  const cautionV = options.cautionVoltage ?? DEFAULT_CAUTION_VOLTAGE;
  const cautions: string[] = [];

  // ── transmitters ──
  const txStates: TransmitterState[] = [];
  const drives: DriveState[] = [];
  const txCurrents: HarmonicPhasors[] = [];
  let switchDetail: Omit<NonNullable<HarmonicDetail["switchNode"]>, "truncation"> | undefined;
  let input = 0;
  let driverLoss = 0;
  let txCoilLoss = 0;
  let txCapLoss = 0;
  for (let ti = 0; ti < t; ti++) {
    const tx = txs[ti]!;
    const i0 = series(X, ports.index.loop(ti));
    txCurrents.push(i0);
    // coil voltage RᵢIᵢ + jωLᵢIᵢ + Σ jωMᵢⱼIⱼ (every other coil); mv the mutual part at the fundamental
    const coilV: Phasor[] = [];
    let mv: Phasor = { re: 0, im: 0 };
    for (let h = 0; h <= H; h++) {
      let v = mul(i0[h]!, tx.resistance, h * w * L[ti]![ti]!);
      for (let j = 0; j < n; j++) {
        if (j === ti) continue;
        const e = mul(at(X, h, ports.index.loop(j)), 0, h * w * L[ti]![j]!);
        v = add(v, e);
        if (h === 1) mv = add(mv, e);
      }
      coilV.push(v);
    }
    const drive = tx.drive;
    const wf = drive.kind === "voltage" ? drive.waveform : undefined;
    const c0 = tx.capacitance ?? 0;
    const esr0 = tx.capacitorEsr ?? 0;
    const capI: Phasor[] = [];
    const capV: Phasor[] = [];
    const srcI: Phasor[] = [];
    const termV: Phasor[] = [];
    let inputI = 0;
    let driverI = 0;
    if (wf?.kind === "singleSwitch") {
      const vsw = series(X, ports.index.switchNode);
      for (let h = 0; h <= H; h++) {
        const tank = sub(h === 0 ? { re: wf.supply, im: 0 } : { re: 0, im: 0 }, vsw[h]!);
        const [yr, yi] = capacitorAdmittance(c0, esr0, h * w);
        const ic = mul(tank, yr, yi);
        capI.push(ic);
        capV.push(tank);
        srcI.push(add(i0[h]!, ic));
        termV.push(tank);
      }
      inputI = wf.supply * srcI[0]!.re;
      const p = ports.switchPort;
      const v = sys.v.subarray(p * N, (p + 1) * N);
      const i = sys.i.subarray(p * N, (p + 1) * N);
      let pl = 0;
      for (let s = 0; s < N; s++) pl += v[s]! * i[s]!;
      driverI = pl / N;
      const [hi, lo] = extremes(S, vsw);
      let hs = 0;
      for (let h = 2; h <= H; h++) hs += abs(vsw[h]!) ** 2;
      switchDetail = { voltage: vsw, peak: hi, minimum: lo, distortion: abs(vsw[1]!) > 0 ? Math.sqrt(hs) / abs(vsw[1]!) : Infinity };
    } else {
      for (let h = 0; h <= H; h++) {
        if (tx.compensation === "series") {
          const [zr, zi] = capacitorImpedance(c0, esr0, h * w);
          capI.push(i0[h]!);
          capV.push(mul(i0[h]!, zr, zi));
          srcI.push(i0[h]!);
          termV.push(add(coilV[h]!, capV[h]!));
        } else if (tx.compensation === "parallel") {
          const [yr, yi] = capacitorAdmittance(c0, esr0, h * w);
          const ic = mul(coilV[h]!, yr, yi);
          capI.push(ic);
          capV.push(coilV[h]!);
          srcI.push(add(i0[h]!, ic));
          termV.push(coilV[h]!);
        } else {
          capI.push({ re: 0, im: 0 });
          capV.push({ re: 0, im: 0 });
          srcI.push(i0[h]!);
          termV.push(coilV[h]!);
        }
      }
      if (drive.kind === "voltage") {
        // EMF·I over the period; the source resistance's loss is the driver loss
        const emfV: Phasor[] = [];
        for (let h = 0; h <= H; h++) emfV.push(add(termV[h]!, mul(srcI[h]!, drive.resistance, 0)));
        inputI = power(emfV, srcI);
        driverI = drive.resistance * meanSquare(srcI);
      } else {
        inputI = power(termV, srcI);
      }
    }
    const coilLoss = tx.resistance * meanSquare(i0);
    const capLoss = esr0 * meanSquare(capI);
    input += inputI;
    driverLoss += driverI;
    txCoilLoss += coilLoss;
    txCapLoss += capLoss;
    const txLabel = tx.label ?? (t > 1 ? `transmitter ${ti + 1}` : "transmitter");
    const txCapPeak = peakAbs(S, capV);
    const coilPeak = peakAbs(S, coilV);
    pushIf(warnings, partVoltageWarning(txLabel + " capacitor", txCapPeak, tx.capacitorRating));
    pushIf(warnings, selfResonanceWarning(txLabel + " coil", f, tx.selfResonance));
    pushIf(cautions, voltageCaution(txLabel + " coil", coilPeak, cautionV));
    if (tx.compensation !== "none") pushIf(cautions, voltageCaution(txLabel + " capacitor", txCapPeak, cautionV));
    const i01 = abs(i0[1]!);
    const src1 = abs(srcI[1]!);
    const term1 = abs(termV[1]!);
    const capI01 = abs(capI[1]!);
    const capV01 = abs(capV[1]!);
    const coilV1 = abs(coilV[1]!);
    // input impedance at the fundamental; reflected impedance Σ jωMᵢⱼIⱼ / Iᵢ
    const inZ = div(termV[1]!, srcI[1]!);
    txStates.push({
      label: txLabel,
      coilCurrent: i01,
      coilCurrentRms: i01 * SQRT1_2,
      coilCurrentPhasor: i0[1]!,
      coilVoltage: coilV1,
      coilVoltageRms: coilV1 * SQRT1_2,
      capacitorVoltage: capV01,
      capacitorVoltageRms: capV01 * SQRT1_2,
      capacitorCurrent: capI01,
      capacitorCurrentRms: capI01 * SQRT1_2,
      sourceCurrent: src1,
      sourceCurrentRms: src1 * SQRT1_2,
      sourceVoltage: term1,
      sourceVoltageRms: term1 * SQRT1_2,
      inputImpedance: inZ,
      reflectedImpedance: div(mv, i0[1]!),
      coilLoss,
      capacitorLoss: capLoss,
      driverLoss: driverI,
    });
    drives.push({
      label: txLabel,
      description: drive.label,
      wiring: "own",
      transmitters: [txLabel],
      sourceCurrent: src1,
      sourceCurrentRms: src1 * SQRT1_2,
      sourceVoltage: term1,
      sourceVoltageRms: term1 * SQRT1_2,
      inputImpedance: inZ,
      inputPower: inputI,
      driverLoss: driverI,
    });
  }

  // ── receivers ──
  const receivers: ReceiverState[] = [];
  const rxDetail: HarmonicDetail["receivers"][number][] = [];
  let delivered = 0;
  let rxCoil = 0;
  let rxCap = 0;
  for (let k = 0; k < m; k++) {
    const r = rx[k]!;
    const ik = series(X, ports.index.loop(t + k));
    const vk = series(X, ports.index.voltage(k));
    const p = ports.receiverPort[k]!;
    const emf: Phasor[] = [];
    const cv: Phasor[] = [];
    const capIk: Phasor[] = [];
    const capVk: Phasor[] = [];
    const loadI: Phasor[] = [];
    for (let h = 0; h <= H; h++) {
      let e: Phasor = { re: 0, im: 0 };
      for (let j = 0; j < n; j++) if (j !== t + k) e = sub(e, mul(at(X, h, ports.index.loop(j)), 0, h * w * L[t + k]![j]!));
      emf.push(e);
      cv.push(sub(mul(ik[h]!, r.resistance, h * w * L[t + k]![t + k]!), e));
      if (r.topology === "parallel") {
        const [yr, yi] = capacitorAdmittance(r.capacitance, r.capacitorEsr ?? 0, h * w);
        capIk.push(mul(vk[h]!, yr, yi));
        capVk.push(vk[h]!);
      } else {
        const [zr, zi] = capacitorImpedance(r.capacitance, r.capacitorEsr ?? 0, h * w);
        capIk.push(ik[h]!);
        capVk.push(mul(ik[h]!, zr, zi));
      }
      if (p >= 0) loadI.push(h === 0 ? { re: sys.cur[p * B]!, im: 0 } : { re: sys.cur[p * B + 2 * h - 1]!, im: sys.cur[p * B + 2 * h]! });
      else {
        const G = r.load.conductance(1);
        const Bs = (r.load.susceptance ? r.load.susceptance(1) : 0) * h;
        loadI.push(mul(vk[h]!, G, Bs));
      }
    }
    let loadPower: number;
    let ledList: readonly { label: string; current: number; relativeBrightness?: number }[];
    let vPeak: number;
    let vMin: number;
    if (p >= 0) {
      const v = sys.v.subarray(p * N, (p + 1) * N);
      const i = sys.i.subarray(p * N, (p + 1) * N);
      let pl = 0;
      vPeak = -Infinity;
      vMin = Infinity;
      for (let s = 0; s < N; s++) {
        pl += v[s]! * i[s]!;
        vPeak = Math.max(vPeak, v[s]!);
        vMin = Math.min(vMin, v[s]!);
      }
      loadPower = pl / N;
      ledList = sys.loads[p]!.leds(v);
    } else {
      loadPower = power(vk, loadI);
      [vPeak, vMin] = extremes(S, vk);
      ledList = r.load.ledCurrents ? r.load.ledCurrents(abs(vk[1]!)) : [];
    }
    const leds: LedState[] = [];
    let lit = false;
    let allLit = ledList.length > 0;
    for (const d of ledList) {
      leds.push({ label: d.label, averageCurrent: d.current, relativeBrightness: d.relativeBrightness ?? Math.max(d.current, 0) / brightRef, lit: d.current >= threshold });
      lit ||= d.current >= threshold;
      allLit &&= d.current >= threshold;
    }
    const label = r.label ?? `receiver ${k + 1}`;
    const capPeak = peakAbs(S, capVk);
    pushIf(warnings, partVoltageWarning(label + " capacitor", capPeak, r.capacitorRating));
    pushIf(warnings, selfResonanceWarning(label + " coil", f, r.selfResonance));
    pushIf(cautions, voltageCaution(label + " tank", Math.max(capPeak, peakAbs(S, cv)), cautionV));
    const coilLoss = r.resistance * meanSquare(ik);
    const capLoss = (r.capacitorEsr ?? 0) * meanSquare(capIk);
    delivered += loadPower;
    rxCoil += coilLoss;
    rxCap += capLoss;
    const i1 = abs(ik[1]!);
    const cv1 = abs(cv[1]!);
    const capV1 = abs(capVk[1]!);
    const capI1 = abs(capIk[1]!);
    const vl = abs(vk[1]!);
    const il = abs(loadI[1]!);
    receivers.push({
      label,
      emf: abs(emf[1]!),
      coilCurrent: i1,
      coilCurrentRms: i1 * SQRT1_2,
      coilCurrentPhasor: ik[1]!,
      coilVoltage: cv1,
      coilVoltageRms: cv1 * SQRT1_2,
      capacitorVoltage: capV1,
      capacitorVoltageRms: capV1 * SQRT1_2,
      capacitorCurrent: capI1,
      capacitorCurrentRms: capI1 * SQRT1_2,
      loadVoltage: vl,
      loadVoltageRms: vl * SQRT1_2,
      loadCurrent: il,
      loadCurrentRms: il * SQRT1_2,
      loadPower,
      coilLoss,
      capacitorLoss: capLoss,
      leds,
      lit,
      allLit,
    });
    rxDetail.push({ loadVoltage: vk, loadVoltagePeak: vPeak, loadVoltageMinimum: vMin, coilCurrent: ik });
  }

  // ── truncation indicator: harmonics H+1…2H of the port currents through |T_pp,H|·H/h ──
  let truncation = 0;
  let switchTruncation = 0;
  if (P > 0) {
    const hi = new Float64Array(4 * H + 1);
    for (let p = 0; p < P; p++) {
      analyze(sys.tables, 2 * H, sys.i.subarray(p * N, (p + 1) * N), hi, 0);
      const tpp = Math.hypot(ports.tRe[(H * P + p) * P + p]!, ports.tIm[(H * P + p) * P + p]!);
      let dv = 0;
      for (let h = H + 1; h <= 2 * H && 2 * h < N; h++) dv += (tpp * H * Math.hypot(hi[2 * h - 1]!, hi[2 * h]!)) / h;
      const v1 = Math.hypot(z[p * B + 1]!, z[p * B + 2]!);
      if (!(v1 > 0)) continue;
      // token ports make the indicator; the switch's own jump leaves large dropped harmonics at
      // its node that hardly reach the coil current under zero-voltage switching, so it is kept
      // apart (large under hard switching: the discharge spike)
      if (ports.portReceiver[p]! < 0) switchTruncation = dv / v1;
      else truncation = Math.max(truncation, dv / v1);
    }
  }

  const t1Peak = peakAbs(S, txCurrents[0]!);
  const drive = txs[0]!.drive;
  const wf = drive.kind === "voltage" ? drive.waveform : undefined;
  const band: ModelBand = harmonicBand(truncation, H);
  return {
    model: "harmonic",
    errorBand: band,
    frequency: f,
    converged: a.converged,
    iterations: a.iterations,
    scalarIterations: 0,
    transmitter: txStates[0]!,
    ...(net.transmitters !== undefined ? { transmitters: txStates, drives } : {}),
    receivers,
    power: {
      input,
      delivered,
      driver: driverLoss,
      transmitterCoil: txCoilLoss,
      transmitterCapacitor: txCapLoss,
      receiverCoils: rxCoil,
      receiverCapacitors: rxCap,
      efficiency: input > 0 ? delivered / input : 0,
    },
    litThreshold: threshold,
    litThresholdSource: litThresholdSource(options.litThreshold),
    drive: {
      label: t > 1 ? txs.map((x) => x.drive.label).join("; ") : drive.label,
      assumptions:
        wf?.kind === "singleSwitch"
          ? [`switch-node waveform solved with the tank by harmonic balance (order ${H}); switch R_on ${wf.onResistance} Ω, ${Math.round(wf.duty * 100)} % duty`, "no body diode: a negative switch-node swing is reported in harmonic.switchNode.minimum"]
          : wf?.kind === "square"
            ? [`square-wave EMF with its harmonics up to order ${H} (harmonic balance)`, "switching losses and dead time not modelled"]
            : drive.assumptions,
    },
    warnings,
    cautions,
    harmonic: {
      order: H,
      samples: N,
      transmitterCurrent: txCurrents[0]!,
      transmitterCurrentPeak: t1Peak,
      ...(t > 1 ? { transmitterCurrents: txCurrents } : {}),
      ...(switchDetail ? { switchNode: { ...switchDetail, truncation: switchTruncation } } : {}),
      receivers: rxDetail,
      truncation,
      residual: a.residual,
      newtonIterations: a.sys.newtonIterations,
    },
  };
}

/**
 * The error band of a harmonic-balance result: 1 %, the band measured against the transient
 * engine's periodic steady state over the validated grid (docs/methods/harmonic-balance.md,
 * largest error seen 0.25 %), or a tenth of the truncation indicator where that is larger —
 * measured, the indicator overstates the true error 25–50× (single switch, order 3…41).
 */
function harmonicBand(truncation: number, order: number): ModelBand {
  const validated = 0.01;
  const relative = Math.max(validated, truncation / 10);
  return {
    relative,
    basis:
      relative === validated
        ? `harmonic balance, order ${order}: within 1 % of the transient engine's periodic steady state on LED average and coil currents over the validated grid`
        : `harmonic balance, order ${order}: the dropped harmonics are large (truncation indicator ${truncation.toPrecision(2)}); raise the order`,
  };
}

/** Every unknown at every harmonic, [h·size + i]. */
interface Expanded {
  readonly re: Float64Array;
  readonly im: Float64Array;
  readonly size: number;
  readonly H: number;
}

/** Unknown i at harmonic h as a phasor. */
function at(x: Expanded, h: number, i: number): Phasor {
  return { re: x.re[h * x.size + i]!, im: x.im[h * x.size + i]! };
}

/** Unknown i at every harmonic 0…H. */
function series(x: Expanded, i: number): Phasor[] {
  const out: Phasor[] = [];
  for (let h = 0; h <= x.H; h++) out.push(at(x, h, i));
  return out;
}

function abs(p: Phasor): number {
  return Math.hypot(p.re, p.im);
}
function mul(p: Phasor, re: number, im: number): Phasor {
  return { re: p.re * re - p.im * im, im: p.re * im + p.im * re };
}
function add(p: Phasor, q: Phasor): Phasor {
  return { re: p.re + q.re, im: p.im + q.im };
}
function sub(p: Phasor, q: Phasor): Phasor {
  return { re: p.re - q.re, im: p.im - q.im };
}
function div(p: Phasor, q: Phasor): Phasor {
  const d = q.re * q.re + q.im * q.im;
  return d > 0 ? { re: (p.re * q.re + p.im * q.im) / d, im: (p.im * q.re - p.re * q.im) / d } : { re: 0, im: 0 };
}

/** Mean power of v·i over the period from harmonics: V₀I₀ + ½ΣRe(V_h I_h*). */
function power(v: readonly Phasor[], i: readonly Phasor[]): number {
  let s = v[0]!.re * i[0]!.re;
  for (let h = 1; h < v.length; h++) s += 0.5 * (v[h]!.re * i[h]!.re + v[h]!.im * i[h]!.im);
  return s;
}

/** Mean square over the period from harmonics. */
function meanSquare(i: readonly Phasor[]): number {
  let s = i[0]!.re * i[0]!.re;
  for (let h = 1; h < i.length; h++) s += 0.5 * (i[h]!.re * i[h]!.re + i[h]!.im * i[h]!.im);
  return s;
}

/** A waveform's samples from its harmonics (workspace). */
interface Synth {
  readonly tables: HarmonicSystem["tables"];
  readonly H: number;
  readonly N: number;
  readonly coef: Float64Array;
  readonly samples: Float64Array;
}

/** Largest and smallest value over the sampled period of the waveform with harmonics x. */
function extremes(w: Synth, x: readonly Phasor[]): [number, number] {
  const { H, N, coef, samples } = w;
  coef[0] = x[0]!.re;
  for (let h = 1; h <= H; h++) {
    coef[2 * h - 1] = x[h]!.re;
    coef[2 * h] = x[h]!.im;
  }
  synthesize(w.tables, H, coef, 0, samples);
  let hi = -Infinity;
  let lo = Infinity;
  for (let s = 0; s < N; s++) {
    hi = Math.max(hi, samples[s]!);
    lo = Math.min(lo, samples[s]!);
  }
  return [hi, lo];
}

/** Largest |value| over the sampled period. */
function peakAbs(w: Synth, x: readonly Phasor[]): number {
  const [hi, lo] = extremes(w, x);
  return Math.max(Math.abs(hi), Math.abs(lo));
}

function pushIf(list: string[], s: string | undefined): void {
  if (s !== undefined) list.push(s);
}

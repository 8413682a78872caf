/**
 * The linear part of the link at each harmonic, reduced to the ports where nonlinear or
 * switched elements sit — the "linear subnetwork in the frequency domain" of harmonic balance
 * (Kundert, White & Sangiovanni-Vincentelli, *Steady-State Methods for Simulating Analog and
 * Microwave Circuits*, Kluwer 1990, ch. 5: the circuit is split into a linear part solved
 * phasor by phasor and a nonlinear part evaluated in time).
 *
 * Unknowns at harmonic h (ω_h = h·ω; h = 0 is DC): the coil currents — the transmitters'
 * I₀…I_{t−1}, each on its own drive, then the receivers' — every receiver's load voltage V_k,
 * and — for the single-switch drive (one transmitter) — the switch-node voltage V_sw. Every coil current flows from its dotted end a to b, as in the
 * transient engine (lib/circuit/transient/token.ts): a parallel tank's top and the load's
 * anode side are the coil's end a. This matters once harmonics are kept: reversing a token
 * coil negates its tank waveform, which for a rectifying load with even harmonics present is
 * a different waveform, not a time shift. Equations:
 *   parallel tank: (R_k + jω_hL_k) I_k + Σ_j jω_hM_kj I_j − V_k = 0,  −I_k − (Y_C,k + Y_lin,k) V_k = I_L,k;
 *   series tank (one loop; the load carries I_k): (R_k + jω_hL_k + Z_C,k) I_k + Σ_j jω_hM_kj I_j + V_k = 0,
 *     I_k − Y_lin,k V_k = I_L,k;
 *   transmitter i: voltage drive (Z_s + Rᵢ + jω_hLᵢ [+ Z_C,i]) Iᵢ + Σ jω_hMᵢⱼIⱼ = E_i,h (parallel
 *     compensation through its Thevenin equivalent, as in the describing-function solver; the
 *     sum over every other coil, transmitters included); current drive Iᵢ = I_set·e^{jφ} at
 *     h = 1, 0 elsewhere; single switch (tank between supply and
 *     switch node): (R₀ + jω_hL₀) I₀ + Σ jω_hM₀ⱼIⱼ + V_sw = V_DD·[h = 0] and
 *     I₀ − Y_C₀ V_sw = I_sw − Y_C₀ V_DD·[h = 0].
 * Y_lin is a linear load's admittance (folded in; no port). I_L,k and I_sw are the port
 * currents that the nonlinear elements draw. Solving once per harmonic with the port currents
 * as inputs gives the multi-port Thevenin form V_port = E_h + T_h·I_port and, for the results,
 * every unknown as x = x_oc + X_T·I_port.
 *
 * Shared drives (several coils on one source) are not written here: solveLinkHarmonic refuses them.
 *
 * A capacitor in series blocks DC; it is given its insulation resistance there
 * ({@link DC_INSULATION_RESISTANCE}) so that the DC equations stay regular.
 */
import { complexLuFactorCore as complexLuFactor, complexLuSolveCore as complexLuSolve } from "../../math/complexLu.ts";
import type { LinkNetwork } from "../link/network.ts";
import { TanklightInputError } from "../../errors.ts";

/**
 * DC resistance of a capacitor in the harmonic-balance network, Ω: a film or ceramic
 * capacitor's insulation resistance is of the order of 1–100 GΩ (trade practice, no source);
 * only the DC level of a series tank depends on it.
 */
export const DC_INSULATION_RESISTANCE = 1e9;

/** The reduced network at every harmonic 0…order (split re/im arrays, harmonic-major). */
export interface HarmonicPorts {
  readonly order: number;
  /** number of ports P */
  readonly ports: number;
  /** number of unknowns of the full linear system */
  readonly size: number;
  /** receiver index of each port, or −1 for the switch */
  readonly portReceiver: Int32Array;
  /** port number of each receiver (−1: linear load folded in) */
  readonly receiverPort: Int32Array;
  /** port number of the switch, −1 if none */
  readonly switchPort: number;
  /** number of transmitters t (coils 0…t−1 of the inductance matrix) */
  readonly transmitters: number;
  /** index in x of coil k's current (the transmitters 0…t−1, receiver k at t + k), receiver k's load voltage, the switch voltage */
  readonly index: { readonly loop: (k: number) => number; readonly voltage: (k: number) => number; readonly switchNode: number };
  /** open-circuit port voltages E_h: [h·P + p] */
  readonly eRe: Float64Array;
  readonly eIm: Float64Array;
  /** port transfer impedances T_h: [(h·P + p)·P + q], V per A drawn */
  readonly tRe: Float64Array;
  readonly tIm: Float64Array;
  /** every unknown with no port current: [h·size + i] */
  readonly xRe: Float64Array;
  readonly xIm: Float64Array;
  /** every unknown per unit port current: [(h·size + i)·P + q] */
  readonly xtRe: Float64Array;
  readonly xtIm: Float64Array;
}

/** A drive's EMF at harmonic h as a phasor (peak), for voltage drives: writes [re, im] into out. */
export type EmfSpectrum = (h: number, out: Float64Array) => void;

/**
 * The transmitters of a network for harmonic balance: `transmitters`, or the one `transmitter`;
 * every one on its own drive (a shared drive is refused by the caller).
 */
function ownTransmitters(net: LinkNetwork): readonly LinkNetwork["transmitter"][] {
  return net.transmitters ?? [net.transmitter];
}

/**
 * Builds the harmonic port model of a link network.
 * @param net the link network (SI), as solveLinkNetwork takes it.
 * @param order highest harmonic H, integer ≥ 1.
 * @param emf each transmitter's drive EMF phasor at each harmonic (voltage drives; ignored otherwise).
 * @param nonlinear which receivers are ports (true) rather than linear loads folded in.
 * @param linearAdmittance a folded receiver's load admittance at harmonic h: [G, B] into out.
 * @returns {@link HarmonicPorts}.
 */
export function harmonicPorts(
  net: LinkNetwork,
  order: number,
  emf: readonly EmfSpectrum[],
  nonlinear: readonly boolean[],
  linearAdmittance: (k: number, h: number, out: Float64Array) => void,
): HarmonicPorts {
  const where = "harmonicBalance";
  const w = 2 * Math.PI * net.frequency;
  const txs = ownTransmitters(net);
  const t = txs.length;
  const tx0 = txs[0]!;
  const rx = net.receivers;
  const m = rx.length;
  const n = t + m;
  const wf = tx0.drive.kind === "voltage" ? tx0.drive.waveform : undefined;
  const hasSwitch = wf?.kind === "singleSwitch";
  if (hasSwitch && t > 1) throw new TanklightInputError([{ path: "transmitters", message: "harmonic balance solves the single-switch drive with one transmitter", value: t }], where);
  const size = n + m + (hasSwitch ? 1 : 0);
  const receiverPort = new Int32Array(m).fill(-1);
  const portReceiver: number[] = [];
  for (let k = 0; k < m; k++) {
    if (nonlinear[k]) {
      receiverPort[k] = portReceiver.length;
      portReceiver.push(k);
    }
  }
  const switchPort = hasSwitch ? portReceiver.length : -1;
  if (hasSwitch) portReceiver.push(-1);
  const P = portReceiver.length;
  const loop = (k: number): number => k; // coil k in the inductance matrix's order: transmitters, then receivers
  const voltage = (k: number): number => n + k; // receiver k (0-based)
  const switchNode = hasSwitch ? n + m : -1;
  const portIndex = portReceiver.map((k) => (k >= 0 ? voltage(k) : switchNode));

  const H = order;
  // one backing store for every table and the work arrays
  const all = new Float64Array((H + 1) * (2 * P + 2 * P * P + 2 * size + 2 * size * P) + 2 * size * size + 2 * size + 2);
  const cur = { buf: all, at: 0 };
  const eRe = takeFrom(cur, (H + 1) * P);
  const eIm = takeFrom(cur, (H + 1) * P);
  const tRe = takeFrom(cur, (H + 1) * P * P);
  const tIm = takeFrom(cur, (H + 1) * P * P);
  const xRe = takeFrom(cur, (H + 1) * size);
  const xIm = takeFrom(cur, (H + 1) * size);
  const xtRe = takeFrom(cur, (H + 1) * size * P);
  const xtIm = takeFrom(cur, (H + 1) * size * P);

  const aRe = takeFrom(cur, size * size);
  const aIm = takeFrom(cur, size * size);
  const piv = new Int32Array(size);
  const bRe = takeFrom(cur, size);
  const bIm = takeFrom(cur, size);
  const tmp = takeFrom(cur, 2);
  const L = net.inductance;
  const A = { re: aRe, im: aIm, n: size };

  for (let h = 0; h <= H; h++) {
    const wh = h * w;
    aRe.fill(0);
    aIm.fill(0);
    bRe.fill(0);
    bIm.fill(0);
    // mutual inductances in every loop row
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) if (i !== j) addAt(A, loop(i), loop(j), 0, wh * L[i]![j]!);
    }
    // ── transmitter rows ──
    for (let i = 0; i < t; i++) {
      const tx = txs[i]!;
      const drive = tx.drive;
      if (drive.kind === "current") {
        for (let j = 0; j < size; j++) {
          aRe[i * size + j] = 0;
          aIm[i * size + j] = 0;
        }
        addAt(A, i, i, 1, 0);
        if (h === 1) {
          const ph = tx.phase ?? 0;
          bRe[i] = ph === 0 ? drive.amplitude : drive.amplitude * Math.cos(ph);
          bIm[i] = ph === 0 ? 0 : drive.amplitude * Math.sin(ph);
        }
      } else if (hasSwitch && wf?.kind === "singleSwitch") {
        addAt(A, 0, 0, tx.resistance, wh * L[0]![0]!);
        addAt(A, 0, switchNode, 1, 0);
        if (h === 0) bRe[0] = wf.supply;
        // switch-node KCL: I₀ − Y_C₀·V_sw = I_sw − Y_C₀·V_DD·[h = 0]
        const [ycRe, ycIm] = capacitorAdmittance(tx.capacitance ?? 0, tx.capacitorEsr ?? 0, wh);
        addAt(A, switchNode, 0, 1, 0);
        addAt(A, switchNode, switchNode, -ycRe, -ycIm);
        if (h === 0) bRe[switchNode] = -ycRe * wf.supply;
      } else {
        const th = transmitterThevenin(tx, drive, emf[i]!, h, wh, tmp);
        addAt(A, i, i, th.zRe + tx.resistance, th.zIm + wh * L[i]![i]!);
        bRe[i] = th.eRe;
        bIm[i] = th.eIm;
      }
    }
    // ── receivers ──
    for (let k = 0; k < m; k++) {
      const r = rx[k]!;
      const row = loop(t + k);
      addAt(A, row, row, r.resistance, wh * L[t + k]![t + k]!);
      if (r.topology === "series") {
        const [zr, zi] = capacitorImpedance(r.capacitance, r.capacitorEsr ?? 0, wh);
        addAt(A, row, row, zr, zi);
      }
      const prow = voltage(k);
      if (r.topology === "parallel") {
        // the tank voltage is the coil's voltage a − b; KCL at the top: −I_k − Y_C·V_k = I_L
        addAt(A, row, prow, -1, 0);
        addAt(A, prow, row, -1, 0);
        const [yr, yi] = capacitorAdmittance(r.capacitance, r.capacitorEsr ?? 0, wh);
        addAt(A, prow, prow, -yr, -yi);
      } else {
        // one loop: the load carries the coil current I_k
        addAt(A, row, prow, 1, 0);
        addAt(A, prow, row, 1, 0);
      }
      if (!nonlinear[k]) {
        linearAdmittance(k, h, tmp);
        addAt(A, prow, prow, -tmp[0]!, -tmp[1]!);
      }
    }
    const bad = complexLuFactor(aRe, aIm, size, piv);
    if (bad >= 0) {
      throw new TanklightInputError(
        [{ path: bad < t ? (t > 1 ? `transmitters[${bad}]` : "transmitter") : "network", message: `the linear network is singular at harmonic ${h} (${(h * net.frequency).toPrecision(4)} Hz): a loop without resistance at DC, or a lossless tank exactly at a harmonic`, value: h }],
        where,
      );
    }
    complexLuSolve(aRe, aIm, size, piv, bRe, bIm);
    for (let i = 0; i < size; i++) {
      xRe[h * size + i] = bRe[i]!;
      xIm[h * size + i] = bIm[i]!;
    }
    for (let p = 0; p < P; p++) {
      eRe[h * P + p] = bRe[portIndex[p]!]!;
      eIm[h * P + p] = bIm[portIndex[p]!]!;
    }
    for (let q = 0; q < P; q++) {
      bRe.fill(0);
      bIm.fill(0);
      bRe[portIndex[q]!] = 1; // unit port current in the port's KCL row
      complexLuSolve(aRe, aIm, size, piv, bRe, bIm);
      for (let i = 0; i < size; i++) {
        xtRe[(h * size + i) * P + q] = bRe[i]!;
        xtIm[(h * size + i) * P + q] = bIm[i]!;
      }
      for (let p = 0; p < P; p++) {
        tRe[(h * P + p) * P + q] = bRe[portIndex[p]!]!;
        tIm[(h * P + p) * P + q] = bIm[portIndex[p]!]!;
      }
    }
  }
  return {
    order: H,
    transmitters: t,
    ports: P,
    size,
    portReceiver: Int32Array.from(portReceiver),
    receiverPort,
    switchPort,
    index: { loop, voltage, switchNode },
    eRe,
    eIm,
    tRe,
    tIm,
    xRe,
    xIm,
    xtRe,
    xtIm,
  };
}

/**
 * The next n entries of a shared backing store (one allocation for many work arrays), advancing its cursor.
 * @example takeFrom({ buf: new Float64Array(4), at: 1 }, 2).length // → 2
 */
export function takeFrom(c: { readonly buf: Float64Array; at: number }, n: number): Float64Array {
  const out = c.buf.subarray(c.at, c.at + n);
  c.at += n;
  return out;
}

/** a[i][j] += re + j·im in a split complex n×n matrix. */
function addAt(a: { readonly re: Float64Array; readonly im: Float64Array; readonly n: number }, i: number, j: number, re: number, im: number): void {
  a.re[i * a.n + j] = a.re[i * a.n + j]! + re;
  a.im[i * a.n + j] = a.im[i * a.n + j]! + im;
}

/** A voltage drive's source as the transmitter coil sees it at one harmonic: EMF and impedance (V, Ω). */
export interface TransmitterSource {
  readonly eRe: number;
  readonly eIm: number;
  readonly zRe: number;
  readonly zIm: number;
}

/**
 * The Thevenin source in series with the transmitter coil at harmonic h (angular frequency wh):
 * the drive's EMF at h behind its source impedance, plus a series capacitor, or seen through a
 * parallel capacitor (as in the describing-function solver). Not for the single-switch drive
 * (its switch node is a port).
 * @param tx the transmitter; drive its voltage drive; emf the drive's EMF spectrum; tmp a 2-slot scratch.
 * @example transmitterThevenin(tx, sineDrive(2), emfSpectrum(net), 1, w, tmp).eRe is 2 V for a sine of 2 V and no capacitor
 */
export function transmitterThevenin(
  tx: LinkNetwork["transmitter"],
  drive: Extract<LinkNetwork["transmitter"]["drive"], { kind: "voltage" }>,
  emf: EmfSpectrum,
  h: number,
  wh: number,
  tmp: Float64Array,
): TransmitterSource {
  emf(h, tmp);
  let vRe = tmp[0]!;
  let vIm = tmp[1]!;
  const zsRe = drive.resistance;
  const zsIm = drive.reactance >= 0 ? h * drive.reactance : h === 0 ? 0 : drive.reactance / h;
  let thRe = zsRe;
  let thIm = zsIm;
  if (tx.compensation === "series") {
    const [zr, zi] = capacitorImpedance(tx.capacitance!, tx.capacitorEsr ?? 0, wh);
    thRe += zr;
    thIm += zi;
  } else if (tx.compensation === "parallel") {
    const [zcr, zci] = capacitorImpedance(tx.capacitance!, tx.capacitorEsr ?? 0, wh);
    const dRe = zsRe + zcr;
    const dIm = zsIm + zci;
    const den = dRe * dRe + dIm * dIm;
    const qRe = (zcr * dRe + zci * dIm) / den;
    const qIm = (zci * dRe - zcr * dIm) / den;
    const v0 = vRe;
    vRe = v0 * qRe - vIm * qIm;
    vIm = v0 * qIm + vIm * qRe;
    thRe = zsRe * qRe - zsIm * qIm;
    thIm = zsRe * qIm + zsIm * qRe;
  }
  return { eRe: vRe, eIm: vIm, zRe: thRe, zIm: thIm };
}

/** Z_C = ESR + 1/(jωC) at angular frequency wh (DC: the insulation resistance), Ω. */
export function capacitorImpedance(c: number, esr: number, wh: number): [number, number] {
  if (wh === 0) return [DC_INSULATION_RESISTANCE, 0];
  return [esr, -1 / (wh * c)];
}

/** Y_C = 1/Z_C, S (0 for no capacitor). */
export function capacitorAdmittance(c: number, esr: number, wh: number): [number, number] {
  if (!(c > 0)) return [0, 0];
  const [zr, zi] = capacitorImpedance(c, esr, wh);
  const den = zr * zr + zi * zi;
  return [zr / den, -zi / den];
}

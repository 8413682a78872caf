/**
 * The linear, load-independent part of the link's coupled-circuit (loop) impedance matrix and
 * the tank impedances that the loads see (see ./solveNetwork.ts for the equations):
 * - the base matrix: jωMᵢⱼ off the diagonal, the transmitters' meshes with their drives (own
 *   drives by Thevenin's theorem, shared drives as strings or parallel branches), each
 *   receiver's Rₖ + jωLₖ on the diagonal (its tank and load added later);
 * - each receiver's capacitor impedance Z_C = ESR + 1/(jωC) and admittance Y_C = 1/Z_C;
 * - Z_ext(Y), the impedance a receiver's tank and load add to its loop, and Z_v(Y), the ratio
 *   of load voltage to loop current, for a load admittance Y = G + jB.
 * All SI; complex numbers as split real and imaginary parts.
 */
import { networkTransmitters, type LinkNetwork, type ReceiverNetwork } from "./network.ts";

/**
 * The load-independent coupled-circuit matrix and the transmitters' sources.
 *
 * Unknowns: first the p transmitter-side mesh currents, then one loop current per receiver
 * (receiver k is unknown p + k). Every transmitter coil's current is ± one unknown
 * (`coilUnknown`, `coilSign`): its own for a coil with its own drive or on a parallel-wired
 * shared drive, the string current for a series- or un-compensated coil in a series string, its
 * tank's inner mesh for a parallel-compensated coil in a series string. A parallel-compensated
 * coil on a parallel-wired drive adds its capacitor branch as one more unknown.
 */
export interface BaseMatrix {
  /** row-major n×n real and imaginary parts, Ω (a held-current row: [0 … 1 … 0]) */
  readonly re: Float64Array;
  readonly im: Float64Array;
  /** number of transmitter-side unknowns; receiver k is unknown p + k */
  readonly p: number;
  /** right-hand side of the transmitter-side rows, V peak (a held-current row: the current, A) */
  readonly eRe: Float64Array;
  readonly eIm: Float64Array;
  /** per transmitter: the unknown carrying its coil current, and the sign (coil current = sign·x) */
  readonly coilUnknown: Int32Array;
  readonly coilSign: Float64Array;
  /** per transmitter: its capacitor's impedance ESR + 1/(jωC), Ω (0 without a capacitor) */
  readonly zcRe: Float64Array;
  readonly zcIm: Float64Array;
  /** per shared drive: its string current's unknown (series wiring) or −1 (parallel wiring) */
  readonly stringUnknown: Int32Array;
}

/** a[i] += v */
function acc(a: Float64Array, i: number, v: number): void {
  a[i] = a[i]! + v;
}

/** EMF phasor amplitude·e^{jφ} into out[0], out[1] (φ = 0 exactly: no rotation, so one transmitter keeps its bits). */
function rotated(amplitude: number, phase: number | undefined, out: Float64Array): void {
  if (phase === undefined || phase === 0) {
    out[0] = amplitude;
    out[1] = 0;
    return;
  }
  out[0] = amplitude * Math.cos(phase);
  out[1] = amplitude * Math.sin(phase);
}

/**
 * Builds the base matrix of a network at angular frequency w (rad/s) by mesh analysis
 * (loop currents; Kirchhoff's voltage law around each mesh):
 * - a transmitter with its own voltage drive: one mesh, its drive seen through Thevenin's
 *   theorem — series compensation adds Z_C to Z_s; parallel compensation gives
 *   V_th = V·Z_C/(Z_s + Z_C), Z_th = Z_s ∥ Z_C; a current drive holds the coil current
 *   (its row becomes I = I_set·e^{jφ});
 * - a shared drive wired in series: one string mesh through Z_s and every tank (a
 *   parallel-compensated tank adds its inner coil–capacitor mesh); a held current holds the
 *   string current;
 * - a shared drive wired in parallel: one mesh per branch (each coil, and each capacitor of a
 *   parallel-compensated tank) closing through the drive, so Z_s appears in every pair of the
 *   drive's branches;
 * - jωMᵢⱼ·sᵢsⱼ between the meshes carrying coils i and j (s = ±1, the coil's connection).
 * @example baseMatrix(net, 2π·200e3).re[0] // → R_s + R₀ (+ ESR) of a series-tuned transmitter
 */
export function baseMatrix(network: LinkNetwork, w: number): BaseMatrix {
  // One function on purpose (≈ 180 lines): one mesh-equation assembly — the unknowns' layout, the mutual terms, each
  // transmitter's mesh, the shared drives and the held currents all index the same matrix and mesh numbering.
  const rx = network.receivers;
  const txs = networkTransmitters(network);
  const shared = network.sharedDrives ?? [];
  const t = txs.length;
  const m = rx.length;
  // ── layout of the transmitter-side unknowns ──
  const coilUnknown = new Int32Array(t);
  const coilSign = new Float64Array(t);
  const stringUnknown = new Int32Array(shared.length).fill(-1);
  const capBranch = new Int32Array(t).fill(-1);
  const groupUnknowns: number[][] = [];
  for (let g = 0; g < shared.length; g++) groupUnknowns.push([]);
  let p = 0;
  for (let i = 0; i < t; i++) {
    const tx = txs[i]!;
    const feed = tx.feed;
    if (feed === undefined) {
      coilUnknown[i] = p++;
      coilSign[i] = 1;
      continue;
    }
    const g = feed.drive;
    // the coil current is ± the unknown; the inner mesh of a parallel tank in a string is the
    // coil current itself (the connection's sign sits where the string passes the capacitor)
    coilSign[i] = shared[g]!.wiring === "series" && tx.compensation === "parallel" ? 1 : feed.polarity;
    if (shared[g]!.wiring === "series") {
      if (stringUnknown[g]! < 0) {
        stringUnknown[g] = p++;
        groupUnknowns[g]!.push(stringUnknown[g]!);
      }
      coilUnknown[i] = tx.compensation === "parallel" ? p++ : stringUnknown[g]!;
    } else {
      coilUnknown[i] = p++;
      groupUnknowns[g]!.push(coilUnknown[i]!);
      if (tx.compensation === "parallel") {
        capBranch[i] = p++;
        groupUnknowns[g]!.push(capBranch[i]!);
      }
    }
  }
  const n = p + m;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  const eRe = new Float64Array(p);
  const eIm = new Float64Array(p);
  const zcRe = new Float64Array(t);
  const zcIm = new Float64Array(t);
  const L = network.inductance;
  // ── mutual inductances between the meshes carrying coils c and d ──
  // (coil c's unknown: coilUnknown[c] for a transmitter, p + c − t for a receiver; its sign coilSign[c] or 1;
  // loops rather than closures: this runs once per solve, and batch runs solve many)
  for (let c = 0; c < t + m; c++) {
    const uc = c < t ? coilUnknown[c]! : p + c - t;
    const sc = c < t ? coilSign[c]! : 1;
    for (let d = 0; d < t + m; d++) {
      if (c === d) continue;
      const x = w * L[c]![d]!;
      const sd = d < t ? coilSign[d]! : 1;
      acc(im, uc * n + (d < t ? coilUnknown[d]! : p + d - t), sc === sd ? x : -x);
    }
  }
  for (let k = 0; k < m; k++) {
    re[(p + k) * n + p + k] = rx[k]!.resistance;
    im[(p + k) * n + p + k] = w * L[t + k]![t + k]!;
  }
  const e = new Float64Array(2);
  const held: { u: number; re: number; im: number }[] = [];
  // ── transmitters ──
  for (let i = 0; i < t; i++) {
    const tx = txs[i]!;
    const c0 = tx.compensation === "none" ? 0 : tx.capacitance!;
    zcRe[i] = c0 > 0 ? (tx.capacitorEsr ?? 0) : 0;
    zcIm[i] = c0 > 0 ? -1 / (w * c0) : 0;
    const u = coilUnknown[i]!;
    const d = u * n + u;
    if (tx.feed !== undefined) {
      // coil on a shared drive: its own R + jωL on its mesh, its capacitor by the wiring
      acc(re, d, tx.resistance);
      acc(im, d, w * L[i]![i]!);
      const g = tx.feed.drive;
      if (shared[g]!.wiring === "series") {
        const j = stringUnknown[g]!;
        if (tx.compensation === "series") {
          acc(re, j * n + j, zcRe[i]!);
          acc(im, j * n + j, zcIm[i]!);
        } else if (tx.compensation === "parallel") {
          // inner mesh u around coil and capacitor; the string J passes the capacitor (sign s)
          const s = tx.feed.polarity;
          acc(re, d, zcRe[i]!);
          acc(im, d, zcIm[i]!);
          acc(re, j * n + j, zcRe[i]!);
          acc(im, j * n + j, zcIm[i]!);
          acc(re, u * n + j, -(s * zcRe[i]!));
          acc(im, u * n + j, -(s * zcIm[i]!));
          acc(re, j * n + u, -(s * zcRe[i]!));
          acc(im, j * n + u, -(s * zcIm[i]!));
        }
      } else if (tx.compensation === "series") {
        acc(re, d, zcRe[i]!);
        acc(im, d, zcIm[i]!);
      } else if (tx.compensation === "parallel") {
        const a = capBranch[i]!;
        acc(re, a * n + a, zcRe[i]!);
        acc(im, a * n + a, zcIm[i]!);
      }
      continue;
    }
    const drive = tx.drive;
    if (drive.kind === "current") {
      rotated(drive.amplitude, tx.phase, e);
      held.push({ u, re: e[0]!, im: e[1]! });
      continue;
    }
    const zsRe = drive.resistance;
    const zsIm = drive.reactance;
    const zc0Re = zcRe[i]!;
    const zc0Im = zcIm[i]!;
    let thRe = zsRe;
    let thIm = zsIm;
    let vthRe = drive.amplitude;
    let vthIm = 0;
    if (tx.compensation === "series") {
      thRe += zc0Re;
      thIm += zc0Im;
    } else if (tx.compensation === "parallel") {
      // V_th = V·Zc/(Zs + Zc), Z_th = Zs·Zc/(Zs + Zc)
      const dRe = zsRe + zc0Re;
      const dIm = zsIm + zc0Im;
      const den = dRe * dRe + dIm * dIm;
      const qRe = (zc0Re * dRe + zc0Im * dIm) / den; // Zc/(Zs+Zc)
      const qIm = (zc0Im * dRe - zc0Re * dIm) / den;
      vthRe = drive.amplitude * qRe;
      vthIm = drive.amplitude * qIm;
      thRe = zsRe * qRe - zsIm * qIm;
      thIm = zsRe * qIm + zsIm * qRe;
    }
    re[d] = thRe + tx.resistance;
    im[d] = thIm + w * L[i]![i]!;
    if (tx.phase === undefined || tx.phase === 0) {
      eRe[u] = vthRe;
      eIm[u] = vthIm;
    } else {
      const c = Math.cos(tx.phase);
      const s = Math.sin(tx.phase);
      eRe[u] = vthRe * c - vthIm * s;
      eIm[u] = vthRe * s + vthIm * c;
    }
  }
  // ── shared drives ──
  shared.forEach((sd, g) => {
    const us = groupUnknowns[g]!;
    if (us.length === 0) return;
    const drive = sd.drive;
    rotated(drive.amplitude, sd.phase, e);
    if (drive.kind === "current") {
      // only a series string can hold one current (validateNetwork)
      held.push({ u: stringUnknown[g]!, re: e[0]!, im: e[1]! });
      return;
    }
    for (const u of us) {
      eRe[u] = e[0]!;
      eIm[u] = e[1]!;
      if (sd.wiring === "series") {
        acc(re, u * n + u, drive.resistance);
        acc(im, u * n + u, drive.reactance);
      } else {
        for (const v of us) {
          acc(re, u * n + v, drive.resistance);
          acc(im, u * n + v, drive.reactance);
        }
      }
    }
  });
  for (const h of held) {
    for (let j = 0; j < n; j++) {
      re[h.u * n + j] = 0;
      im[h.u * n + j] = 0;
    }
    re[h.u * n + h.u] = 1;
    eRe[h.u] = h.re;
    eIm[h.u] = h.im;
  }
  return { re, im, p, eRe, eIm, coilUnknown, coilSign, zcRe, zcIm, stringUnknown };
}

/** Each receiver's capacitor as impedance and admittance, and its topology (1 = series). */
export interface ReceiverTanks {
  /** Z_C = ESR + 1/(jωC), Ω */
  readonly zcRe: Float64Array;
  readonly zcIm: Float64Array;
  /** Y_C = 1/Z_C, S */
  readonly ycRe: Float64Array;
  readonly ycIm: Float64Array;
  /** 1 for a series tank (coil, C and load in one loop), 0 for a parallel one */
  readonly series: Uint8Array;
}

/**
 * The receivers' capacitors at angular frequency w (rad/s).
 * @example receiverTanks([{ capacitance: 1e-9, topology: "series", … }], 2π·1e6).zcIm[0] // → −159.15 Ω
 */
export function receiverTanks(rx: readonly ReceiverNetwork[], w: number): ReceiverTanks {
  const m = rx.length;
  const t = {
    zcRe: new Float64Array(m),
    zcIm: new Float64Array(m),
    ycRe: new Float64Array(m),
    ycIm: new Float64Array(m),
    series: new Uint8Array(m),
  };
  for (let k = 0; k < m; k++) {
    const r = rx[k]!;
    const esr = r.capacitorEsr ?? 0;
    t.zcRe[k] = esr;
    t.zcIm[k] = -1 / (w * r.capacitance);
    const den = esr * esr + t.zcIm[k]! * t.zcIm[k]!;
    t.ycRe[k] = esr / den;
    t.ycIm[k] = -t.zcIm[k]! / den;
    t.series[k] = r.topology === "series" ? 1 : 0;
  }
  return t;
}

/**
 * Z_ext(Y) of receiver k: the impedance its tank and a load of admittance g + jb (S) add to its
 * loop — Z_C + 1/Y in series, 1/(Y_C + Y) in parallel. Writes [re, im] (Ω) into `out`.
 */
export function externalImpedance(t: ReceiverTanks, k: number, g: number, b: number, out: Float64Array): void {
  if (t.series[k]) {
    const den = g * g + b * b;
    out[0] = t.zcRe[k]! + g / den;
    out[1] = t.zcIm[k]! - b / den;
    return;
  }
  parallelImpedance(t, k, g, b, out);
}

/**
 * Z_v(Y) of receiver k: load voltage = loop current · Z_v — 1/Y in series, Z_ext in parallel.
 * Writes [re, im] (Ω) into `out`.
 */
export function loadVoltageImpedance(t: ReceiverTanks, k: number, g: number, b: number, out: Float64Array): void {
  if (t.series[k]) {
    const den = g * g + b * b;
    out[0] = g / den;
    out[1] = -b / den;
    return;
  }
  parallelImpedance(t, k, g, b, out);
}

/** 1/(Y_C + Y) of receiver k. */
function parallelImpedance(t: ReceiverTanks, k: number, g: number, b: number, out: Float64Array): void {
  const tRe = t.ycRe[k]! + g;
  const tIm = t.ycIm[k]! + b;
  const den = tRe * tRe + tIm * tIm;
  out[0] = tRe / den;
  out[1] = -tIm / den;
}

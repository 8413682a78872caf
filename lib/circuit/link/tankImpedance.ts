/**
 * The linear, load-independent part of the link's coupled-circuit (loop) impedance matrix and
 * the tank impedances that the loads see (see ./solveNetwork.ts for the equations):
 * - the base matrix: jωMᵢⱼ off the diagonal, the transmitter row with its drive's Thevenin
 *   equivalent, each receiver's Rₖ + jωLₖ on the diagonal (its tank and load added later);
 * - each receiver's capacitor impedance Z_C = ESR + 1/(jωC) and admittance Y_C = 1/Z_C;
 * - Z_ext(Y), the impedance a receiver's tank and load add to its loop, and Z_v(Y), the ratio
 *   of load voltage to loop current, for a load admittance Y = G + jB.
 * All SI; complex numbers as split real and imaginary parts.
 */
import type { LinkNetwork, ReceiverNetwork } from "./network.ts";

/** The load-independent coupled-circuit matrix and the transmitter's equivalent source. */
export interface BaseMatrix {
  /** row-major n×n real and imaginary parts, Ω (row 0 of a current drive: [1, 0, …]) */
  readonly re: Float64Array;
  readonly im: Float64Array;
  /** Thevenin EMF of the drive as the coil sees it, V peak (a current drive: the set current, A) */
  readonly vthRe: number;
  readonly vthIm: number;
  /** the transmitter capacitor's impedance ESR + 1/(jωC₀), Ω (0 without a capacitor) */
  readonly zc0Re: number;
  readonly zc0Im: number;
}

/**
 * Builds the base matrix of an n-loop network at angular frequency w (rad/s).
 * A parallel-compensated transmitter behind Z_s becomes V_th = V·Z_C/(Z_s + Z_C),
 * Z_th = Z_s ∥ Z_C (Thevenin's theorem); a current drive replaces row 0 by I₀ = I_set.
 * @example baseMatrix(net, 2π·200e3).re[0] // → R_s + R₀ (+ ESR) of a series-tuned transmitter
 */
export function baseMatrix(network: LinkNetwork, w: number): BaseMatrix {
  const rx = network.receivers;
  const n = rx.length + 1;
  const tx = network.transmitter;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  const L = network.inductance;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) if (i !== j) im[i * n + j] = w * L[i]![j]!;
  }
  let vthRe = 0;
  let vthIm = 0;
  const drive = tx.drive;
  const c0 = tx.compensation === "none" ? 0 : tx.capacitance!;
  const zc0Re = tx.capacitorEsr ?? 0;
  const zc0Im = c0 > 0 ? -1 / (w * c0) : 0;
  if (drive.kind === "current") {
    for (let j = 0; j < n; j++) im[j] = 0;
    re[0] = 1;
    vthRe = drive.amplitude;
  } else {
    const zsRe = drive.resistance;
    const zsIm = drive.reactance;
    let thRe = zsRe;
    let thIm = zsIm;
    vthRe = drive.amplitude;
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
    re[0] = thRe + tx.resistance;
    im[0] = thIm + w * L[0]![0]!;
  }
  rx.forEach((r, k) => {
    re[(k + 1) * n + k + 1] = r.resistance;
    im[(k + 1) * n + k + 1] = w * L[k + 1]![k + 1]!;
  });
  return { re, im, vthRe, vthIm, zc0Re, zc0Im };
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

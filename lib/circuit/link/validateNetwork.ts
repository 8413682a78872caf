/**
 * Input checks of the link solver's numeric core: the inductance matrix (square, symmetric,
 * positive diagonal, every coupling factor below 1) and every transmitter and receiver number.
 * Throws TanklightInputError naming the field; returns nothing.
 */
import { TanklightInputError, requireFinite, requirePositive } from "../../errors.ts";
import type { LinkNetwork } from "./network.ts";
import type { DriveEquivalent } from "../drive.ts";

/**
 * Checks a {@link LinkNetwork} of n = transmitters + receivers coils before it is solved.
 * @param net the network (SI numbers).
 * @param where the calling function's name, for the error message.
 * @example validateNetwork(net, "solveLinkNetwork") // throws on inductance[0][1] ≠ inductance[1][0]
 */
export function validateNetwork(net: LinkNetwork, where: string): void {
  const txs = net.transmitters ?? [net.transmitter];
  if (net.transmitters !== undefined && (!Array.isArray(net.transmitters) || net.transmitters.length === 0)) {
    throw new TanklightInputError([{ path: "transmitters", message: "must list at least one transmitter", value: net.transmitters }], where);
  }
  const n = net.receivers.length + txs.length;
  validateInductance(net.inductance, n, txs.length, where);
  const shared = net.sharedDrives ?? [];
  shared.forEach((sd, g) => {
    validateDrive(sd.drive, `sharedDrives[${g}].drive`, where);
    if (sd.wiring !== "series" && sd.wiring !== "parallel") {
      throw new TanklightInputError([{ path: `sharedDrives[${g}].wiring`, message: "must be 'series' or 'parallel'", value: sd.wiring }], where);
    }
    if (sd.drive.kind === "current" && sd.wiring === "parallel") {
      throw new TanklightInputError(
        [{ path: `sharedDrives[${g}].wiring`, message: "a current-regulated drive holds one current: wire the coils it shares in series", value: sd.wiring }],
        where,
      );
    }
    if (sd.phase !== undefined) requireFinite(sd.phase, `sharedDrives[${g}].phase`, "rad", where);
  });
  txs.forEach((tx, i) => {
    const at = net.transmitters === undefined ? "transmitter" : `transmitters[${i}]`;
    nonNeg(tx.resistance, `${at}.resistance`, "Ω", where);
    if (tx.compensation !== "none") requirePositive(tx.capacitance ?? NaN, `${at}.capacitance`, "F", where);
    if (tx.capacitorEsr !== undefined) nonNeg(tx.capacitorEsr, `${at}.capacitorEsr`, "Ω", where);
    if (tx.phase !== undefined) requireFinite(tx.phase, `${at}.phase`, "rad", where);
    if (tx.feed !== undefined) {
      const g = tx.feed.drive;
      if (!(Number.isInteger(g) && g >= 0 && g < shared.length)) {
        throw new TanklightInputError([{ path: `${at}.feed.drive`, message: `must index one of the ${shared.length} shared drives`, value: g }], where);
      }
      if (tx.feed.polarity !== 1 && tx.feed.polarity !== -1) {
        throw new TanklightInputError([{ path: `${at}.feed.polarity`, message: "must be 1 or −1", value: tx.feed.polarity }], where);
      }
      return;
    }
    validateDrive(tx.drive, `${at}.drive`, where);
  });
  net.receivers.forEach((r, k) => {
    nonNeg(r.resistance, `receivers[${k}].resistance`, "Ω", where);
    requirePositive(r.capacitance, `receivers[${k}].capacitance`, "F", where);
    if (r.capacitorEsr !== undefined) nonNeg(r.capacitorEsr, `receivers[${k}].capacitorEsr`, "Ω", where);
    if (r.topology !== "series" && r.topology !== "parallel") {
      throw new TanklightInputError([{ path: `receivers[${k}].topology`, message: "must be 'series' or 'parallel'", value: r.topology }], where);
    }
    if (!r.load || typeof r.load.conductance !== "function") {
      throw new TanklightInputError([{ path: `receivers[${k}].load`, message: "must have a conductance(amplitude) describing function", value: r.load }], where);
    }
  });
}

/** A drive equivalent's numbers: amplitude ≥ 0, source resistance ≥ 0, finite reactance. */
function validateDrive(d: DriveEquivalent, at: string, where: string): void {
  nonNeg(d.amplitude, `${at}.amplitude`, d.kind === "current" ? "A" : "V", where);
  if (d.kind === "voltage") {
    nonNeg(d.resistance, `${at}.resistance`, "Ω", where);
    requireFinite(d.reactance, `${at}.reactance`, "Ω", where);
  }
}

/** Square n×n, finite, positive diagonal, symmetric to 1e-9, every |Mᵢⱼ| < √(LᵢLⱼ). */
function validateInductance(L: LinkNetwork["inductance"], n: number, t: number, where: string): void {
  if (!Array.isArray(L) || L.length !== n || L.some((row) => !Array.isArray(row) || row.length !== n)) {
    const what = t === 1 ? `transmitter + ${n - 1} receivers` : `${t} transmitters + ${n - t} receivers`;
    throw new TanklightInputError([{ path: "inductance", message: `must be a ${n}×${n} matrix (${what})`, value: L }], where);
  }
  for (let i = 0; i < n; i++) {
    requirePositive(L[i]![i]!, `inductance[${i}][${i}]`, "H", where);
    for (let j = 0; j < n; j++) {
      const v = requireFinite(L[i]![j]!, `inductance[${i}][${j}]`, "H", where);
      const t = L[j]![i]!;
      if (Math.abs(v - t) > 1e-9 * Math.max(Math.abs(v), Math.abs(t))) {
        throw new TanklightInputError(
          [{ path: `inductance[${i}][${j}]`, message: `must equal inductance[${j}][${i}] (reciprocity)`, value: v, expected: `${t} H` }],
          where,
        );
      }
      if (i !== j && Math.abs(v) >= Math.sqrt(L[i]![i]! * L[j]![j]!)) {
        throw new TanklightInputError(
          [{ path: `inductance[${i}][${j}]`, message: "|M| must be below √(LᵢLⱼ) (coupling factor < 1)", value: v }],
          where,
        );
      }
    }
  }
}

function nonNeg(x: number, field: string, unit: string, where: string): void {
  requireFinite(x, field, unit, where);
  if (x < 0) throw new TanklightInputError([{ path: field, message: `must be ≥ 0 ${unit}`, value: x }], where);
}

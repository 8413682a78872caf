/**
 * Input checks of the link solver's numeric core: the inductance matrix (square, symmetric,
 * positive diagonal, every coupling factor below 1) and every transmitter and receiver number.
 * Throws TanklightInputError naming the field; returns nothing.
 */
import { TanklightInputError, requireFinite, requirePositive } from "../../errors.ts";
import type { LinkNetwork } from "./network.ts";

/**
 * Checks a {@link LinkNetwork} of n = receivers + 1 loops before it is solved.
 * @param net the network (SI numbers).
 * @param where the calling function's name, for the error message.
 * @example validateNetwork(net, "solveLinkNetwork") // throws on inductance[0][1] ≠ inductance[1][0]
 */
export function validateNetwork(net: LinkNetwork, where: string): void {
  const n = net.receivers.length + 1;
  validateInductance(net.inductance, n, where);
  const tx = net.transmitter;
  nonNeg(tx.resistance, "transmitter.resistance", "Ω", where);
  if (tx.compensation !== "none") requirePositive(tx.capacitance ?? NaN, "transmitter.capacitance", "F", where);
  if (tx.capacitorEsr !== undefined) nonNeg(tx.capacitorEsr, "transmitter.capacitorEsr", "Ω", where);
  const d = tx.drive;
  nonNeg(d.amplitude, "transmitter.drive.amplitude", d.kind === "current" ? "A" : "V", where);
  if (d.kind === "voltage") {
    nonNeg(d.resistance, "transmitter.drive.resistance", "Ω", where);
    requireFinite(d.reactance, "transmitter.drive.reactance", "Ω", where);
  }
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

/** Square n×n, finite, positive diagonal, symmetric to 1e-9, every |Mᵢⱼ| < √(LᵢLⱼ). */
function validateInductance(L: LinkNetwork["inductance"], n: number, where: string): void {
  if (!Array.isArray(L) || L.length !== n || L.some((row) => !Array.isArray(row) || row.length !== n)) {
    throw new TanklightInputError(
      [{ path: "inductance", message: `must be a ${n}×${n} matrix (transmitter + ${n - 1} receivers)`, value: L }],
      where,
    );
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

/**
 * Litz wire: per-strand skin effect plus per-strand proximity effect in the bundle's own
 * (internal) field and the field of the other turns (external).
 *
 * Method: Ferreira 1994's orthogonality applied strand by strand, with the internal field of a
 * bundle carrying a uniformly shared current, H(r) = I·r/(2πR_b²), as in Bartoli, Noferi,
 * Reatti & Kazimierczuk, "Modeling litz-wire winding losses in high-frequency power inductors",
 * IEEE PESC 1996, and Sullivan, IEEE TPEL 14(2):283–291, 1999 (from memory, unverified) —
 * n strands see ⟨H_int²⟩ = I²/(8π²R_b²) on average over the bundle. Not modelled: the
 * lay-length (twist) increase of strand length (typically 1–3 %), imperfect transposition
 * (bundle-level skin effect), the effective permeability of the bundle.
 */

import { acFactorFromQ } from "./roundWireAcFactor.ts";
import { proximityG } from "./proximity.ts";
import { skinDepthCore } from "./skinDepth.ts";
import { TanklightInputError } from "../../errors.ts";
import { SIZE_LIMITS } from "../builders/common.ts";
import { checkNumbers } from "../inputs.ts";

/** Per-unit-length resistances of a litz bundle at one frequency, Ω/m. */
export interface LitzResistance {
  /** DC resistance per unit length of the bundle (strands in parallel), Ω/m */
  readonly dc: number;
  /** extra resistance from each strand's own skin effect, Ω/m */
  readonly skin: number;
  /** extra resistance from the bundle's internal field (proximity among strands), Ω/m */
  readonly internalProximity: number;
  /**
   * factor K such that the external-field loss adds K·h² Ω/m, with h² the mean squared external
   * field per ampere of bundle current, (A/m)²/A²
   */
  readonly externalFactor: number;
}

/**
 * Per-unit-length resistance of a litz bundle (hot path, validated inputs).
 * @param strands number of strands n, ≥ 1.
 * @param strandDiameter bare strand diameter d_s, m, > 0.
 * @param bundleDiameter diameter of the strand bundle (we use the outer diameter, serving
 *   included, which makes R_b slightly large and the internal term slightly small), m, > 0.
 * @param f frequency, Hz, ≥ 0.
 * @param resistivity Ω·m, > 0.
 * @returns dc, skin, internal proximity, Ω/m, and the external-field factor.
 * @example litzResistancePerLength(100, 0.1e-3, 1.3e-3, 200e3, 1.7241e-8).dc // → 2.1952e-2 Ω/m
 */
export function litzResistancePerLength(strands: number, strandDiameter: number, bundleDiameter: number, f: number, resistivity: number): LitzResistance {
  const where = "litzResistancePerLength";
  if (!(Number.isInteger(strands) && strands >= 1 && strands <= SIZE_LIMITS.strands.max)) {
    throw new TanklightInputError([{ path: "strands", message: `must be a whole number from 1 to ${SIZE_LIMITS.strands.max} (${SIZE_LIMITS.strands.why})`, value: strands }], where);
  }
  checkNumbers(where, [["strandDiameter", strandDiameter, "positive"], ["bundleDiameter", bundleDiameter, "positive"], ["f", f, "nonNegative"], ["resistivity", resistivity, "positive"]]);
  const rs = strandDiameter / 2;
  const dc = resistivity / (strands * Math.PI * rs * rs);
  if (f === 0) return { dc, skin: 0, internalProximity: 0, externalFactor: 0 };
  const delta = skinDepthCore(f, resistivity);
  const q = (Math.SQRT2 * rs) / delta;
  const skin = dc * (acFactorFromQ(q) - 1);
  // P′ = n·ρ·g(γ)·⟨H²⟩ with ⟨H²⟩ = Î²(h² + 1/(8π²R_b²)); resistance = 2P′/Î²
  const G = resistivity * proximityG(strandDiameter / (delta * Math.SQRT2));
  const Rb = bundleDiameter / 2;
  const internalProximity = (2 * strands * G) / (8 * Math.PI * Math.PI * Rb * Rb);
  const externalFactor = 2 * strands * G;
  return { dc, skin, internalProximity, externalFactor };
}

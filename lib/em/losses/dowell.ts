/**
 * Dowell's one-dimensional layer model of winding losses, the classic cross-check for layered
 * windings (Dowell, Proc. IEE 113(8):1387–1394, 1966).
 */

import { TanklightInputError, requirePositive, requireNonNegative } from "../../errors.ts";
import { skinDepthCore } from "./skinDepth.ts";
import { checkNumbers } from "../inputs.ts";

/**
 * Dowell's AC resistance factor of a winding of m layers (averaged over the winding).
 *
 * F_R = Δ·[(sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ) + (2(m² − 1)/3)·(sinh Δ − sin Δ)/(cosh Δ + cos Δ)]
 * (Dowell 1966, eq. for the layer-averaged ratio). The m-th layer alone has
 * Δ·[M(Δ) + 2m(m−1)·D(Δ)]; averaging 2m(m−1) over m = 1…M gives 2(M²−1)/3.
 * Low frequency: F_R ≈ 1 + (5M² − 1)Δ⁴/45.
 * @param Delta Δ = (h/δ)·√η, dimensionless, ≥ 0 (see dowellDelta).
 * @param layers number of layers M, ≥ 1 (real values accepted for portions, e.g. half layers).
 * @returns F_R = R_ac/R_dc, dimensionless.
 * @example dowellFactor(1, 3) // → 1.9400
 * @example dowellFactor(0, 5) // → 1
 */
export function dowellFactor(Delta: number, layers: number): number {
  requireNonNegative(Delta, "Delta", "", "dowellFactor");
  if (!(typeof layers === "number" && Number.isFinite(layers) && layers >= 1 && layers <= 1e4)) {
    throw new TanklightInputError([{ path: "layers", message: "must be a finite number from 1 to 10000 (the factor grows with layers²; no winding has more)", value: layers }], "dowellFactor");
  }
  if (Delta === 0) return 1;
  const k = (2 * (layers * layers - 1)) / 3;
  if (Delta < 0.01) {
    // series (sinh − sin cancels at small Δ): F ≈ 1 + 4Δ⁴/45 + kΔ⁴/6; the first omitted terms
    // are O(Δ⁶) ≤ 1e-12 here (at Δ = 0.05 they were already 9e-10, measured against the direct form)
    return 1 + (4 * Delta ** 4) / 45 + (k * Delta ** 4) / 6;
  }
  if (Delta > 20) {
    // hyperbolic terms dominate: M → 1, D → 1 (tanh-like), exact to e^{−20}
    return Delta * (1 + k);
  }
  const s2 = (Math.sinh(2 * Delta) + Math.sin(2 * Delta)) / (Math.cosh(2 * Delta) - Math.cos(2 * Delta));
  const d = (Math.sinh(Delta) - Math.sin(Delta)) / (Math.cosh(Delta) + Math.cos(Delta));
  return Delta * (s2 + k * d);
}

/**
 * Dowell's penetration ratio Δ for a layer of round wires.
 *
 * Δ = (h/δ)·√η with the equivalent square-conductor thickness h = (√π/2)·d and the layer
 * porosity η = h/p (p the centre-to-centre pitch of the turns along the layer) (Dowell 1966 §2
 * for rectangular conductors; the round-to-square substitution of equal area is the usual one).
 * @param diameter bare wire diameter d, m, > 0.
 * @param pitch turn pitch along the layer p, m, ≥ h.
 * @param f frequency, Hz, > 0.
 * @param resistivity Ω·m, > 0.
 * @returns Δ, dimensionless.
 * @example dowellDelta(0.5e-3, 0.55e-3, 200e3, 1.7241e-8) // → 2.6916
 */
export function dowellDelta(diameter: number, pitch: number, f: number, resistivity: number): number {
  requirePositive(diameter, "diameter", "m", "dowellDelta");
  requirePositive(pitch, "pitch", "m", "dowellDelta");
  requirePositive(f, "f", "Hz", "dowellDelta");
  requirePositive(resistivity, "resistivity", "Ω·m", "dowellDelta");
  checkNumbers("dowellDelta", [["diameter", diameter, "positive"], ["pitch", pitch, "positive"], ["f", f, "positive"], ["resistivity", resistivity, "positive"]]);
  const h = (Math.sqrt(Math.PI) / 2) * diameter;
  const delta = skinDepthCore(f, resistivity);
  return (h / delta) * Math.sqrt(h / pitch);
}

/**
 * PCB traces (rectangular copper strips): a stated model, not a published one.
 *
 * DC: R′ = ρ/(w·t). Skin effect: only through the thickness, as the exact 1-D solution of a
 * slab carrying current with equal and opposite fields on its two faces (the isolated-strip
 * limit w ≫ t), which is Dowell's single-layer term for half the thickness:
 *   F_skin = Δ·(sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ),  Δ = t/(2δ).
 * It ignores current crowding towards the strip edges, so it is a lower bound on the skin
 * loss (more so for w/t ≲ 10). Proximity: the low-frequency eddy loss of a strip in a uniform
 * transverse field, by Faraday's law with the unperturbed field (derived in
 * docs/methods/losses.md): P′ = σω²μ₀²(Ĥ_n²·w³t + Ĥ_t²·t³w)/24, Ĥ_n normal to the board,
 * Ĥ_t in the board plane across the trace. It holds while w·t ≪ 2δ²; beyond, it overstates the
 * loss (the strip starts to exclude the field) and a warning says so. Marked: model stated by
 * us, accuracy on real boards unverified.
 */

import { MU0 } from "../../constants.ts";
import { skinDepthCore } from "./skinDepth.ts";
import { checkNumbers } from "../inputs.ts";

/** Per-unit-length trace resistances at one frequency. */
export interface TraceResistance {
  /** DC resistance per unit length, Ω/m */
  readonly dc: number;
  /** extra resistance from the slab skin effect, Ω/m */
  readonly skin: number;
  /** factor for the field normal to the board: ΔR′ = normalFactor·h_n² (h per ampere), Ω/m per (A/m)²/A² */
  readonly normalFactor: number;
  /** factor for the in-plane transverse field: ΔR′ = tangentialFactor·h_t², Ω/m per (A/m)²/A² */
  readonly tangentialFactor: number;
  /** true when w·t > 2δ² (the low-frequency proximity formula overstates the loss) */
  readonly beyondThinStrip: boolean;
}

/**
 * Slab skin factor Δ(sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ) with Δ = t/(2δ) (hot path).
 * @example slabSkinFactor(0.5) // → 1.0055
 */
export function slabSkinFactor(Delta: number): number {
  checkNumbers("slabSkinFactor", [["Delta", Delta, "nonNegative"]]);
  if (Delta < 0.01) return 1 + (4 * Delta ** 4) / 45;
  if (Delta > 20) return Delta;
  return (Delta * (Math.sinh(2 * Delta) + Math.sin(2 * Delta))) / (Math.cosh(2 * Delta) - Math.cos(2 * Delta));
}

/**
 * Per-unit-length resistance of a PCB trace (hot path, validated inputs).
 * @param width trace width w, m, > 0.
 * @param thickness copper thickness t, m, > 0.
 * @param f frequency, Hz, ≥ 0.
 * @param resistivity Ω·m, > 0.
 * @example traceResistancePerLength(1e-3, 35e-6, 200e3, 1.7241e-8).dc // → 0.49260 Ω/m
 */
export function traceResistancePerLength(width: number, thickness: number, f: number, resistivity: number): TraceResistance {
  checkNumbers("traceResistancePerLength", [["width", width, "positive"], ["thickness", thickness, "positive"], ["f", f, "nonNegative"], ["resistivity", resistivity, "positive"]]);
  const dc = resistivity / (width * thickness);
  if (f === 0) return { dc, skin: 0, normalFactor: 0, tangentialFactor: 0, beyondThinStrip: false };
  const delta = skinDepthCore(f, resistivity);
  const skin = dc * (slabSkinFactor(thickness / (2 * delta)) - 1);
  const sigma = 1 / resistivity;
  const w = 2 * Math.PI * f;
  // ΔR′ = 2P′/Î², P′ = σω²μ₀²Ĥ²·(w³t or t³w)/24
  const k = (2 * sigma * w * w * MU0 * MU0) / 24;
  return {
    dc,
    skin,
    normalFactor: k * width ** 3 * thickness,
    tangentialFactor: k * thickness ** 3 * width,
    beyondThinStrip: width * thickness > 2 * delta * delta,
  };
}

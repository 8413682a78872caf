/**
 * Self-capacitance and self-resonance of a coil.
 *
 * - Single-layer circular coils (solenoid, one-layer roundCoil): Medhurst's empirical table,
 *   C = H·D (pF, D in cm), H interpolated log–log in ℓ/D (Medhurst, Wireless Engineer 24,
 *   1947, pp. 35–43 and 80–92; table in docs/references.md). Medhurst measured real single-layer coils
 *   in free space; turn-to-turn models are badly wrong for them (Knight 2010–2013).
 * - Multi-layer roundCoil: the turn-to-turn cell capacitance of Massarini & Kazimierczuk
 *   (IEEE TPEL 12(4):671–676, 1997) between turns of adjacent layers, combined over the winding
 *   by the electrostatic-energy method for layers wound back and forth (the layer-to-layer
 *   voltage rises linearly from 0 to 2V/N_L along the layer): C_s = 4(N_L − 1)/(3N_L²)·C_ll,
 *   plus Medhurst's free-space term for the winding's outer diameter and height. The formulas
 *   are from memory (unverified against the paper); expect ±50 %.
 * - Flat spirals (wire or trace), planar rectangular spirals and anything else: an estimate, not
 *   a published model — inter-turn term by the energy method (adjacent turns at V/N) plus
 *   Medhurst's coefficient at its smallest tabulated ratio (ℓ/D = 0.1) for the outer diameter;
 *   expect a factor of 2 either way, and a warning says so.
 */

import { EPS0 } from "../constants.ts";
import { TanklightInputError } from "../errors.ts";
import { ellipticK } from "../math/elliptic.ts";
import { selfInductanceDetailCore } from "./selfInductance.ts";
import { checkCoil } from "./inputs.ts";
import type { Coil, Conductor } from "./types.ts";

/** Medhurst 1947 table: ℓ/D → H (pF per cm of diameter). docs/references.md, status "checked". */
export const MEDHURST_TABLE: readonly (readonly [number, number])[] = [
  [0.1, 0.96], [0.2, 0.7], [0.3, 0.6], [0.5, 0.5], [0.8, 0.46], [1, 0.46], [1.5, 0.47], [2, 0.5], [3, 0.61],
  [4, 0.72], [5, 0.81], [7, 1.01], [10, 1.32], [15, 1.86], [20, 2.36], [30, 3.4], [50, 5.8],
];

/** Relative permittivity assumed for magnet-wire enamel (polyurethane/polyester-imide ≈ 3–4): trade practice (no source). */
export const ENAMEL_PERMITTIVITY = 3.5;
/** Relative permittivity of FR-4 at ~1 MHz ≈ 4.4: trade practice (no source). */
export const FR4_PERMITTIVITY = 4.4;

/**
 * Medhurst's coefficient H(ℓ/D), pF per cm of coil diameter, interpolated linearly in
 * ln H against ln(ℓ/D) between the tabulated points (a power law per interval: H is nearly
 * proportional to ℓ/D at long coils, which linear-in-ln(ℓ/D) interpolation of H overshoots by
 * up to 3 %); outside 0.1…50 the end segment's power law is extended (`extrapolated` is true).
 * @param lengthOverDiameter ℓ/D, > 0.
 * @example medhurstCoefficient(1) // → { H: 0.46, extrapolated: false }
 * @example medhurstCoefficient(0.4) // → H ≈ 0.5414 (between 0.60 at 0.3 and 0.50 at 0.5)
 */
export function medhurstCoefficient(lengthOverDiameter: number): { H: number; extrapolated: boolean } {
  const x = lengthOverDiameter;
  if (!(typeof x === "number" && Number.isFinite(x) && x >= 1e-6 && x <= 1e6)) {
    throw new TanklightInputError([{ path: "lengthOverDiameter", message: "must be a finite number from 1e-6 to 1e6 (the table's power law extrapolated beyond leaves double precision)", value: x }], "medhurstCoefficient");
  }
  const T = MEDHURST_TABLE;
  const n = T.length;
  let i = 0;
  while (i < n - 2 && x > T[i + 1]![0]) i++;
  const [x0, h0] = T[i]!;
  const [x1, h1] = T[i + 1]!;
  const t = Math.log(x / x0) / Math.log(x1 / x0);
  const H = h0 * Math.pow(h1 / h0, t); // linear in ln H against ln(ℓ/D): a power law between nodes
  return { H, extrapolated: x < T[0]![0] || x > T[n - 1]![0] };
}

/** Self-capacitance with the parts it was built from, F. */
export interface SelfCapacitanceDetail {
  /** total self-capacitance, F */
  readonly value: number;
  /** which model: "medhurst", "multilayer", "interTurnEstimate" */
  readonly model: "medhurst" | "multilayer" | "interTurnEstimate";
  /** Medhurst (free-space) part, F */
  readonly external: number;
  /** inter-layer or inter-turn part, F */
  readonly internal: number;
  readonly warnings: readonly string[];
}

/**
 * Turn-to-turn capacitance per unit length of two touching enamelled round wires
 * (Massarini & Kazimierczuk 1997, elementary-cell model, from memory — unverified):
 * C′ = ε₀[ε_r θ₀/ln(d_o/d_c) + cot(θ₀/2) − cot(π/12)], θ₀ = arccos(1 − ln(d_o/d_c)/ε_r).
 * For spaced wires (pitch p > d_o) the two-wire line C′ = πε₀/arccosh(p/d_o) (insulation
 * ignored; standard electrostatics) is used instead.
 * @returns F/m.
 */
export function turnToTurnCapacitancePerLength(conductorDiameter: number, outerDiameter: number, pitch: number, epsR = ENAMEL_PERMITTIVITY): number {
  if (pitch > outerDiameter * 1.02 || outerDiameter <= conductorDiameter) {
    const ratio = Math.max(pitch / Math.max(outerDiameter, conductorDiameter), 1.0001);
    return (Math.PI * EPS0) / Math.acosh(ratio);
  }
  const L = Math.log(outerDiameter / conductorDiameter);
  const theta = Math.acos(Math.max(-1, 1 - L / epsR));
  return EPS0 * ((epsR * theta) / L + 1 / Math.tan(theta / 2) - 1 / Math.tan(Math.PI / 12));
}

/**
 * Capacitance per unit length between two coplanar strips of width w with gap s on a substrate
 * (conformal mapping, C′ = ε₀ε_eff·K(k′²)/K(k²), k = s/(s + 2w), ε_eff = (1 + ε_r)/2;
 * e.g. Gupta, Garg, Bahl & Bhartia, Microstrip Lines and Slotlines, 2nd ed. 1996, ch. 7 —
 * from memory, unverified). @returns F/m.
 */
export function coplanarStripCapacitancePerLength(width: number, gap: number, epsR = FR4_PERMITTIVITY): number {
  const k = gap / (gap + 2 * width);
  const k2 = k * k;
  return EPS0 * ((1 + epsR) / 2) * (ellipticK(1 - k2) / ellipticK(k2));
}

/**
 * Film build assumed for a round wire given without insulation (a bare wire cannot be wound
 * touching): outer diameter 1.1 × bare, roughly grade-1 enamel for 0.1–1 mm wire — trade
 * practice (no source).
 */
const ASSUMED_FILM_RATIO = 1.1;

function conductorSizes(c: Conductor): { d: number; od: number } {
  switch (c.kind) {
    case "round": return { d: c.diameter, od: c.outerDiameter > c.diameter * 1.001 ? c.outerDiameter : c.diameter * ASSUMED_FILM_RATIO };
    case "litz": return { d: c.outerDiameter * 0.9, od: c.outerDiameter };
    case "trace": return { d: c.width, od: c.width };
  }
}

/** Medhurst capacitance C = H·D pF (D in cm) → F, for winding length ℓ and diameter D, m. */
function medhurst(length: number, diameter: number, warnings: string[]): number {
  const { H, extrapolated } = medhurstCoefficient(length / diameter);
  if (extrapolated) {
    warnings.push(`Medhurst's table covers 0.1 ≤ ℓ/D ≤ 50; ℓ/D = ${(length / diameter).toPrecision(3)} is extrapolated`);
  }
  return H * diameter * 1e-10; // H pF/cm × D cm = H·(100·D) pF = H·D·1e-10 F
}

/**
 * Self-capacitance of a coil and how it was obtained.
 *
 * See the module comment for the models: Medhurst 1947 (single layer), Massarini &
 * Kazimierczuk 1997 with the energy method (multi-layer), an inter-turn estimate (flat and
 * other spirals).
 * @param coil a builder's coil (uses coil.shape; without a shape the filament extents are used).
 * @returns `{ value (F), model, external, internal, warnings }`.
 * @example selfCapacitanceDetail(solenoid({ radius: 0.02, turns: 40, pitch: 1e-3, wire: { diameter: 0.5e-3 } })).value // → 1.84e-12 (ℓ/D = 1: 0.46 pF/cm × 4 cm)
 */
export function selfCapacitanceDetail(coil: Coil): SelfCapacitanceDetail {
  checkCoil(coil, "coil", "selfCapacitance");
  const warnings: string[] = [];
  const s = coil.shape;
  const { d, od } = conductorSizes(coil.conductor);
  if (coil.conductor.kind === "round" && !(coil.conductor.outerDiameter > coil.conductor.diameter * 1.001)) {
    warnings.push(`wire given without insulation: an enamel film of outer diameter ${ASSUMED_FILM_RATIO} × bare is assumed for the capacitance`);
  }
  if (s?.kind === "solenoid") {
    const C = medhurst(s.length, 2 * s.radius, warnings);
    return { value: C, model: "medhurst", external: C, internal: 0, warnings };
  }
  if (s?.kind === "roundCoil") {
    if (s.layers <= 1) {
      const C = medhurst(s.windingHeight, 2 * s.meanRadius, warnings);
      return { value: C, model: "medhurst", external: C, internal: 0, warnings };
    }
    const NL = s.layers;
    // adjacent layers: one turn faces one turn (square stacking), mean turn length of the pair
    const rMid = s.meanRadius;
    const cPrime = turnToTurnCapacitancePerLength(d, od, Math.max(s.radialPitch, od));
    const Cll = s.turnsPerLayer * cPrime * 2 * Math.PI * rMid;
    const internal = ((4 * (NL - 1)) / (3 * NL * NL)) * Cll;
    const external = medhurst(s.windingHeight, 2 * s.outerRadius, warnings);
    warnings.push("multi-layer self-capacitance: Massarini & Kazimierczuk 1997 cell model (formula from memory) with the layer energy method; expect ±50 %");
    return { value: internal + external, model: "multilayer", external, internal, warnings };
  }
  // flat spirals, rectangular spirals, loops, custom coils: inter-turn estimate + Medhurst at ℓ/D = 0.1
  const radii =
    s?.kind === "flatSpiral"
      ? Array.from({ length: Math.max(1, Math.round(s.turns)) }, (_, i) => s.innerRadius + s.conductorWidth / 2 + (i + 0.5) * s.pitch)
      : coil.filaments.map((f) => (f.kind === "circle" ? f.radius : equivalentRadius(f.points)));
  const sorted = [...radii].sort((a, b) => a - b);
  const outer = sorted[sorted.length - 1] ?? 0;
  if (!(outer > 0)) {
    throw new TanklightInputError([{ path: "coil.filaments", message: "a coil needs at least one filament with a size", value: coil.filaments.length }], "selfCapacitance");
  }
  const N = Math.max(coil.turns, 1);
  let internal = 0;
  const isTrace = coil.conductor.kind === "trace";
  for (let i = 1; i < sorted.length; i++) {
    const pitch = sorted[i]! - sorted[i - 1]!;
    if (!(pitch > 0)) continue; // stacked turns (same radius): not adjacent in the plane
    const rMid = (sorted[i]! + sorted[i - 1]!) / 2;
    const cPrime = isTrace && coil.conductor.kind === "trace"
      ? coplanarStripCapacitancePerLength(coil.conductor.width, Math.max(pitch - coil.conductor.width, 1e-6))
      : turnToTurnCapacitancePerLength(d, od, Math.max(pitch, od));
    internal += (cPrime * 2 * Math.PI * rMid) / (N * N);
  }
  const external = 0.96 * 2 * outer * 1e-10; // Medhurst H at ℓ/D = 0.1, D = outer diameter
  warnings.push(
    `self-capacitance of a ${s?.kind ?? "custom"} coil is an estimate (inter-turn energy method + Medhurst at ℓ/D = 0.1), not a published model: expect a factor of 2 either way`,
  );
  return { value: internal + external, model: "interTurnEstimate", external, internal, warnings };
}

function equivalentRadius(points: readonly (readonly [number, number, number])[]): number {
  // radius of the circle with the polygon's projected (xy) area
  let a = 0;
  for (let k = 0; k < points.length; k++) {
    const p = points[k]!, q = points[(k + 1) % points.length]!;
    a += p[0] * q[1] - q[0] * p[1];
  }
  return Math.sqrt(Math.abs(a) / 2 / Math.PI);
}

/**
 * Self-capacitance of a coil, F (Medhurst 1947 single layer; Massarini & Kazimierczuk 1997
 * multi-layer; an estimate for flat spirals — see selfCapacitanceDetail).
 * @param coil the coil. @returns C, F.
 * @example selfCapacitance(roundCoil({ meanRadius: 0.04, turns: 20, wire: { diameter: 0.5e-3 } })) // → 6.94e-12 (F; one layer, ℓ/D = 10 mm / 80 mm)
 */
export function selfCapacitance(coil: Coil): number {
  return selfCapacitanceDetail(coil).value;
}

const srfCache = new WeakMap<Coil, number>();

/**
 * Self-resonant frequency of a coil with its self-capacitance: f_sr = 1/(2π√(L·C)).
 *
 * L is selfInductance(coil, { frequency: f_sr }) (one fixed-point step from the DC value; the
 * internal-inductance change moves f_sr by well under 1 %).
 * @param coil the coil. @returns f_sr, Hz.
 * @example selfResonance(tx20Turns) // → 8.19e6 (Hz; radius 40 mm, 20 turns of 0.5 mm wire with 25 µm enamel)
 */
export function selfResonance(coil: Coil): number {
  const cached = srfCache.get(coil);
  if (cached !== undefined) return cached;
  checkCoil(coil, "coil", "selfResonance");
  const C = selfCapacitance(coil);
  const L0 = selfInductanceDetailCore(coil, undefined).value;
  const f0 = 1 / (2 * Math.PI * Math.sqrt(L0 * C));
  const L1 = selfInductanceDetailCore(coil, f0).value;
  const f1 = 1 / (2 * Math.PI * Math.sqrt(L1 * C));
  if (!(Number.isFinite(f1) && f1 > 0)) {
    throw new TanklightInputError(
      [{ path: "coil", message: `has no finite self-resonance estimate (L = ${L1} H, C = ${C} F): its wire does not fit its turns, or its turns are not physical`, value: "coil" }],
      "selfResonance",
    );
  }
  srfCache.set(coil, f1);
  return f1;
}

/** The warning every result computed above a third of the self-resonant frequency carries. */
export function selfResonanceWarning(coil: Coil, f: number): string | undefined {
  const fsr = selfResonance(coil);
  if (f > fsr / 3) {
    return `frequency ${f.toPrecision(4)} Hz is above a third of the coil's estimated self-resonance ${fsr.toPrecision(3)} Hz: the lumped L and R are no longer accurate`;
  }
  return undefined;
}

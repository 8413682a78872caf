/**
 * emissionEstimate: the transmitters as one small magnetic dipole, its field at 10, 30 and
 * 300 m with the full near/far-field expressions, against 47 CFR 15.209 and CEPT ERC/REC 70-03
 * Annex 9. An estimate, not a compliance test.
 */
import * as z from "../zod.ts";
import { MU0, SPEED_OF_LIGHT } from "../constants.ts";
import { lazySchema, length, parseArgs } from "../schema.ts";
import type { Pose, Vec3 } from "../em/types.ts";
import { parseSafetyDesign, type SafetyDesign } from "./design.ts";
import { momentPerAmpere } from "./geometry.ts";
import { decibels, rmsFromPeak, RMS_CONVENTION } from "./rms.ts";
import { EMISSION_RULES, emissionRows } from "./emissionLimits.ts";
import type { SourceStatus } from "./referenceLevels.ts";

/** Free-space wave impedance μ₀c, Ω (≈ 376.73): E = Z₀H in a plane wave. */
export const FREE_SPACE_IMPEDANCE = MU0 * SPEED_OF_LIGHT.value;

/** Printed with every emission result. */
export const EMISSION_DISCLAIMER =
  "An estimate from a magnetic-dipole model of the transmitter, not a compliance test: radiated emission is decided by measurement under the rules that apply where the product is sold (local codes, regulations and licensed practice).";

/** The field at one distance. */
export interface FieldAtDistance {
  /** distance, m */
  readonly distance: number;
  /** H, A/m RMS, in the direction where it is largest */
  readonly fieldStrength: number;
  readonly dBuAm: number;
  /** the plane-wave equivalent E = Z₀H, dBµV/m (what E-field rules compare) */
  readonly dBuVm: number;
  /** "axis" (near field, kr < 1: the field along the moment is the larger) or "broadside" */
  readonly direction: "axis" | "broadside";
  /** k·r: below 1 the near field (1/r³), above it the far field (1/r) */
  readonly kr: number;
}

/** One limit compared with the estimate. */
export interface EmissionVerdict {
  readonly rule: string;
  readonly row: string;
  readonly status: SourceStatus;
  readonly distance: number;
  /** the limit, dBµV/m (E rules) or dBµA/m (H rules) */
  readonly limitDb: number;
  readonly unit: "dBµV/m" | "dBµA/m";
  /** our estimate in the same unit at the same distance */
  readonly estimateDb: number;
  /** limit − estimate, dB (negative: exceeded) */
  readonly marginDb: number;
  readonly verdict: "meets" | "exceeds";
  readonly text: string;
}

/** What emissionEstimate returns. */
export interface EmissionEstimate {
  readonly frequency: number;
  /** λ/2π, m: the near/far transition */
  readonly transition: number;
  /** magnetic dipole moment, A·m² peak: the phasor sum's largest instantaneous value (the polarisation ellipse's half major axis) */
  readonly moment: number;
  readonly momentRms: number;
  /** each transmitter's moment, A·m² peak, and its world direction */
  readonly moments: readonly { readonly label: string; readonly moment: number; readonly direction: Vec3 }[];
  readonly fields: readonly FieldAtDistance[];
  /** "not covered" entries name the rules that have no row at this frequency */
  readonly limits: readonly EmissionVerdict[];
  readonly notCovered: readonly string[];
  readonly notes: readonly string[];
  readonly model: string;
  readonly convention: string;
  readonly warnings: readonly string[];
  readonly disclaimer: string;
}

/** The model, named once. */
export const DIPOLE_MODEL =
  "small magnetic dipole m = Σ N·I·A (phasors), full near/far-field expressions (Cochran & Heinrich, Applications of Maxwell's Equations, §7.5): |H_r| = m·cosθ·√(1+(kr)²)/(2πr³), |H_θ| = m·sinθ·√(1−(kr)²+(kr)⁴)/(4πr³)";

/**
 * Magnetic-dipole field magnitude, A/m (same convention as m), largest over directions:
 * on the axis m√(1+(kr)²)/(2πr³), broadside m√(1−(kr)²+(kr)⁴)/(4πr³) (Cochran & Heinrich §7.5).
 * @param moment dipole moment, A·m², 0 … 1e9 (a 1000-turn, 1 m² coil at 1000 A is 1e6).
 * @param r distance, m (or "10 m"), 1 nm … 1e9 m (beyond these r³ leaves the double range).
 * @param k wavenumber 2πf/c, 1/m, 0 … 1e6 (1e6 /m is 48 THz).
 * @example dipoleField(1, 10, 2*Math.PI*200e3/299792458) .value // → 1.5929e-4 (A/m, on the axis: near field at 10 m)
 */
export function dipoleField(moment: number, r: number | string, k: number): { value: number; direction: "axis" | "broadside"; kr: number } {
  if (!(typeof r === "number" && inRange(moment, 0, 1e9) && inRange(r, 1e-9, 1e9) && inRange(k, 0, 1e6))) ({ moment, r, k } = parseArgs(DipoleArgs, [moment, r, k], "dipoleField"));
  return dipoleFieldCore(moment, r as number, k);
}

/** dipoleField for checked numbers (emissionEstimate's distances 10–300 m). */
function dipoleFieldCore(moment: number, r: number, k: number): { value: number; direction: "axis" | "broadside"; kr: number } {
  const kr = k * r;
  const axis = (moment * Math.sqrt(1 + kr * kr)) / (2 * Math.PI * r ** 3);
  const side = (moment * Math.sqrt(1 - kr * kr + kr ** 4)) / (4 * Math.PI * r ** 3);
  return axis >= side ? { value: axis, direction: "axis", kr } : { value: side, direction: "broadside", kr };
}

const inRange = (x: unknown, lo: number, hi: number): boolean => typeof x === "number" && x >= lo && x <= hi;
const bounded = (lo: number, hi: number, unit: string) =>
  z.number({ error: `must be a finite number in ${unit}` }).min(lo, { error: `must be ≥ ${lo} ${unit}` }).max(hi, { error: `must be ≤ ${hi} ${unit} (beyond it the field leaves the double range or the model's meaning)` });
/** dipoleField's arguments, checked by name when a plain call is out of range. */
const DipoleArgs = lazySchema(() => z.strictObject({ moment: bounded(0, 1e9, "A·m²"), r: length({ min: 1e-9, max: 1e9 }), k: bounded(0, 1e6, "1/m") }));

/** Distances at which the field is reported, m. */
export const EMISSION_DISTANCES = [10, 30, 300] as const;

/** Extrapolation of a field at r₁ to r₂ at 40 dB/decade (47 CFR 15.31(f)(2)). */
function ruleExtrapolate(dbAtR1: number, r1: number, r2: number): number {
  return dbAtR1 - 40 * Math.log10(r2 / r1);
}

/**
 * Radiated-emission estimate: the transmitters' magnetic dipole moment (turns × current × area
 * of every filament, phasors summed over transmitter coils), the magnetic field at 10, 30 and
 * 300 m with the full dipole expressions (near field 1/r³ below λ/2π, far field 1/r beyond), in
 * A/m, dBµA/m and the plane-wave-equivalent dBµV/m, compared with 47 CFR 15.209 and CEPT ERC/REC
 * 70-03 Annex 9 for the band. For an E-field rule at 300 m the estimate used is the larger of
 * the dipole field at 300 m and the 10 m field extrapolated at 40 dB/decade (§15.31(f)(2)), as
 * a test lab measuring at 10 m would report it.
 * @param design see {@link SafetyDesign}.
 * @returns {@link EmissionEstimate}: moment, fields, one verdict per rule with its margin, notes,
 *   warnings and a disclaimer (an estimate, not a compliance test).
 * @example emissionEstimate({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil: tx, current: 1 }] }).moment // → 0.10564 (A·m² peak: 20 turns × 1 A × their mean area)
 */
export function emissionEstimate(design: SafetyDesign): EmissionEstimate {
  const d = parseSafetyDesign(design, "emissionEstimate");
  const f = d.frequency;
  const k = (2 * Math.PI * f) / SPEED_OF_LIGHT.value;
  const re = [0, 0, 0], im = [0, 0, 0];
  let sumAbs = 0;
  const moments = d.transmitters.map((t, i) => {
    const m = momentPerAmpere(t.coil, (t.pose as Pose | undefined) ?? { position: [0, 0, 0] });
    const phase = t.phase ?? 0;
    const size = Math.hypot(...m) * t.current;
    for (let c = 0; c < 3; c++) { re[c]! += t.current * Math.cos(phase) * m[c]!; im[c]! += t.current * Math.sin(phase) * m[c]!; }
    sumAbs += size;
    const l = Math.hypot(...m) || 1;
    return { label: t.label ?? `transmitter ${i + 1}`, moment: size, direction: [m[0] / l, m[1] / l, m[2] / l] as Vec3 };
  });
  // half major axis of the ellipse traced by Re(m·e^{jωt})
  const a2 = re[0]! ** 2 + re[1]! ** 2 + re[2]! ** 2, b2 = im[0]! ** 2 + im[1]! ** 2 + im[2]! ** 2, ab = re[0]! * im[0]! + re[1]! * im[1]! + re[2]! * im[2]!;
  const moment = Math.sqrt((a2 + b2) / 2 + Math.sqrt(((a2 - b2) / 2) ** 2 + ab * ab));
  const momentRms = rmsFromPeak(moment);
  const warnings: string[] = [];
  if (sumAbs > 0 && moment < 0.1 * sumAbs) {
    warnings.push(`the coils' dipole moments cancel to ${(100 * moment / sumAbs).toFixed(1)} % of their sum: the quadrupole and higher terms, not estimated here, then dominate — the estimate is too low`);
  }
  const zDb = decibels(FREE_SPACE_IMPEDANCE, 1);
  const at = (r: number): FieldAtDistance => {
    const h = dipoleFieldCore(momentRms, r, k);
    const dBuAm = decibels(h.value, 1e-6);
    return { distance: r, fieldStrength: h.value, dBuAm, dBuVm: dBuAm + zDb, direction: h.direction, kr: h.kr };
  };
  const fields = EMISSION_DISTANCES.map(at);
  const limits: EmissionVerdict[] = [];
  const notCovered: string[] = [];
  const notes: string[] = [];
  for (const rule of EMISSION_RULES) {
    const rows = emissionRows(rule, f);
    if (rows.length === 0) { notCovered.push(`${rule.id}: no row at ${(f / 1e3).toPrecision(4)} kHz`); continue; }
    notes.push(...rule.notes.map((n) => `${rule.id}: ${n}`));
    let pick: EmissionVerdict | undefined;
    for (const row of rows) {
      const here = at(row.distance);
      let est = row.quantity === "E" ? here.dBuVm : here.dBuAm;
      let how = `dipole field at ${row.distance} m`;
      if (row.quantity === "E" && row.distance > 10) {
        const extrap = ruleExtrapolate(fields[0]!.dBuVm, 10, row.distance);
        if (extrap > est) { est = extrap; how = `10 m estimate extrapolated at 40 dB/decade (§15.31(f)(2)); the dipole field itself is ${here.dBuVm.toFixed(1)} dBµV/m there`; }
      }
      const limit = row.limitDb(f);
      const margin = limit - est;
      const unit = row.quantity === "E" ? "dBµV/m" : "dBµA/m";
      const v: EmissionVerdict = {
        rule: rule.id, row: row.published, status: row.status, distance: row.distance, limitDb: limit, unit, estimateDb: est, marginDb: margin,
        verdict: margin >= 0 ? "meets" : "exceeds",
        text: `${rule.id} (${row.published}; ${row.status}): estimate ${est.toFixed(1)} ${unit} (${how}) against ${limit.toFixed(1)} ${unit}: ${margin >= 0 ? `margin ${margin.toFixed(1)} dB` : `EXCEEDS by ${(-margin).toFixed(1)} dB`}`,
      };
      if (!pick || v.marginDb < pick.marginDb) pick = v;
    }
    limits.push(pick!);
  }
  return {
    frequency: f,
    transition: 1 / k,
    moment,
    momentRms,
    moments,
    fields,
    limits,
    notCovered,
    notes,
    model: DIPOLE_MODEL,
    convention: `${RMS_CONVENTION}; E-equivalent by the plane-wave impedance μ₀c = ${FREE_SPACE_IMPEDANCE.toFixed(2)} Ω (+${zDb.toFixed(2)} dB), as the rules convert`,
    warnings,
    disclaimer: EMISSION_DISCLAIMER,
  };
}

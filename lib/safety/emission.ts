/**
 * emissionEstimate: one transmitter as a small magnetic dipole, several as the superposition of
 * each coil's dipole field from its own centre with its own phase (so an anti-phase or quadrature
 * array is credited with its lower far field; the in-phase bound where that model does not
 * apply), the field at 10, 30 and 300 m with the full near/far-field expressions, against 47 CFR
 * 15.209 and CEPT ERC/REC 70-03 Annex 9. An estimate, not a compliance test.
 */
import * as z from "../zod.ts";
import { MU0, SPEED_OF_LIGHT } from "../constants.ts";
import { lazySchema, length, parseArgs } from "../schema.ts";
import type { Pose, Vec3 } from "../em/types.ts";
import { parseSafetyDesign, type SafetyDesign } from "./design.ts";
import { coilReach, momentPerAmpere } from "./geometry.ts";
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
  /**
   * several transmitters: how their field was found — "superposition" (each coil's dipole field
   * from its own centre with its own phase, added as phasors) or "in-phase bound" (where that
   * model does not apply: every coil's moment added in phase) — and why, in words
   */
  readonly array?: { readonly method: "superposition" | "in-phase bound"; readonly text: string };
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
 * 300 m with the full dipole expressions (several transmitters: each coil's dipole field from its
 * own centre, superposed with its phase — Jackson eq. 9.36 — or the in-phase bound where that
 * model does not apply; `array` says which and why) (near field 1/r³ below λ/2π, far field 1/r beyond), in
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
  const zDb = decibels(FREE_SPACE_IMPEDANCE, 1);
  const field = (h: { value: number; direction: "axis" | "broadside"; kr: number }, r: number): FieldAtDistance => {
    const dBuAm = decibels(h.value, 1e-6);
    return { distance: r, fieldStrength: h.value, dBuAm, dBuVm: dBuAm + zDb, direction: h.direction, kr: h.kr };
  };
  let at = (r: number): FieldAtDistance => field(dipoleFieldCore(momentRms, r, k), r);
  let array: EmissionEstimate["array"];
  if (d.transmitters.length > 1) {
    const sources = d.transmitters.map((t) => {
      const pose = (t.pose as Pose | undefined) ?? { position: [0, 0, 0] };
      const m = momentPerAmpere(t.coil, pose);
      const c = rmsFromPeak(t.current);
      const phase = t.phase ?? 0;
      return { position: pose.position as Vec3, re: scale(m, c * Math.cos(phase)), im: scale(m, c * Math.sin(phase)), size: c * Math.hypot(...m), reach: coilReach(t.coil) };
    });
    const fit = superposition(sources, k);
    if (fit.applies) {
      at = (r: number): FieldAtDistance => field(fit.field(r), r);
      array = { method: "superposition", text: `the ${sources.length} coils' dipole fields superposed from their own centres with their phases (Jackson eq. 9.36; cancelling phases credited)` };
      if (sumAbs > 0 && moment < 0.1 * sumAbs) {
        warnings.push(`the coils' dipole moments cancel to ${(100 * moment / sumAbs).toFixed(1)} % of their sum: the field is that of the array's higher terms (their superposition), which falls faster than a dipole's near the coils`);
      }
    } else {
      const bound = rmsFromPeak(sumAbs);
      at = (r: number): FieldAtDistance => field(dipoleFieldCore(bound, r, k), r);
      array = { method: "in-phase bound", text: `every coil's moment taken in phase (${bound.toPrecision(3)} A·m² RMS): the superposition of the coils' dipole fields does not apply here — ${fit.why}` };
      warnings.push(`emission of the array taken as the in-phase bound: ${fit.why}`);
    }
  }
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
    model: array?.method === "superposition" ? SUPERPOSITION_MODEL : DIPOLE_MODEL,
    ...(array ? { array } : {}),
    convention: `${RMS_CONVENTION}; E-equivalent by the plane-wave impedance μ₀c = ${FREE_SPACE_IMPEDANCE.toFixed(2)} Ω (+${zDb.toFixed(2)} dB), as the rules convert`,
    warnings,
    disclaimer: EMISSION_DISCLAIMER,
  };
}

function scale(v: Vec3, f: number): Vec3 {
  return [v[0] * f, v[1] * f, v[2] * f];
}

/** The array model, named once. */
export const SUPERPOSITION_MODEL =
  "H = Σᵢ e^{−jkRᵢ}/(4π)·[k²(uᵢ×mᵢ)×uᵢ/Rᵢ + (3uᵢ(uᵢ·mᵢ) − mᵢ)(1/Rᵢ³ + jk/Rᵢ²)], the time-harmonic magnetic-dipole field (Jackson, Classical Electrodynamics, 3rd ed., eq. 9.36, e^{jωt} convention) of every coil from its own centre, largest over 1024 directions at each distance";

/** Directions searched for an array's largest field: a Fibonacci sphere. */
const ARRAY_DIRECTIONS = 1024;
/** The superposition must exceed the coils' own neglected terms by this factor to be used. */
const SUPERPOSITION_MARGIN = 10;

interface DipoleSource {
  readonly position: Vec3;
  /** moment phasor, A·m² RMS: re + j·im */
  readonly re: Vec3;
  readonly im: Vec3;
  /** |moment|, A·m² RMS */
  readonly size: number;
  /** the coil's largest filament distance from its axis, m */
  readonly reach: number;
}

/**
 * The field of several coils by superposing each coil's magnetic-dipole field (Jackson eq. 9.36)
 * from its own centre with its own phase: the largest half major axis of the polarisation
 * ellipse over {@link ARRAY_DIRECTIONS} directions at distance r from the coils' centroid. Each
 * coil as a point dipole leaves out its own higher terms, ≈ (3/2)(a/R)² of its dipole field on its
 * axis (the exact on-axis field of a loop, μ₀Ia²/2(a² + z²)^{3/2}, expanded), bounded here by
 * 2(a/R)²; the model applies at a distance when the superposed field is at least 10 times the sum
 * of those bounds — else (the coils cancel so far that the neglected terms could matter, or the
 * distance is not large against the coils) the caller takes the in-phase bound.
 */
function superposition(sources: readonly DipoleSource[], k: number): { applies: boolean; why: string; field: (r: number) => { value: number; direction: "axis" | "broadside"; kr: number } } {
  const n = sources.length;
  const mid = (c: number): number => sources.reduce((a, s) => a + s.position[c]!, 0) / n;
  const centre: Vec3 = [mid(0), mid(1), mid(2)];
  // the array's mean moment direction (for "axis" / "broadside"): Σ|mᵢ| directions
  const mean = [0, 1, 2].map((c) => sources.reduce((a, s) => a + Math.hypot(s.re[c]!, s.im[c]!) * Math.sign(s.re[c]! + s.im[c]! || 1), 0));
  const ml = Math.hypot(mean[0]!, mean[1]!, mean[2]!) || 1;
  const dirs: Vec3[] = [[0, 0, 1], [0, 0, -1], [1, 0, 0], [-1, 0, 0], [0, 1, 0], [0, -1, 0]];
  const golden = Math.PI * (3 - Math.sqrt(5));
  for (let i = 0; i < ARRAY_DIRECTIONS; i++) {
    const z = 1 - (2 * (i + 0.5)) / ARRAY_DIRECTIONS;
    const rho = Math.sqrt(1 - z * z);
    dirs.push([rho * Math.cos(golden * i), rho * Math.sin(golden * i), z]);
  }
  const at = (r: number): { value: number; direction: "axis" | "broadside"; kr: number } => {
    let best = -1;
    let bestDir: Vec3 = dirs[0]!;
    for (const u0 of dirs) {
      const p: Vec3 = [centre[0] + r * u0[0], centre[1] + r * u0[1], centre[2] + r * u0[2]];
      const hr = [0, 0, 0], hi = [0, 0, 0];
      for (const s of sources) {
        const dx = p[0] - s.position[0], dy = p[1] - s.position[1], dz = p[2] - s.position[2];
        const R = Math.hypot(dx, dy, dz);
        const u = [dx / R, dy / R, dz / R];
        const sr = u[0]! * s.re[0] + u[1]! * s.re[1] + u[2]! * s.re[2];
        const si = u[0]! * s.im[0] + u[1]! * s.im[1] + u[2]! * s.im[2];
        const A = (k * k) / R, b1 = 1 / R ** 3, b2 = k / (R * R);
        const cos = Math.cos(k * R), sin = Math.sin(k * R);
        for (let c = 0; c < 3; c++) {
          const ar = A * (s.re[c]! - u[c]! * sr), ai = A * (s.im[c]! - u[c]! * si);
          const wr = 3 * u[c]! * sr - s.re[c]!, wi = 3 * u[c]! * si - s.im[c]!;
          const vr = ar + b1 * wr - b2 * wi, vi = ai + b1 * wi + b2 * wr;
          hr[c]! += (vr * cos + vi * sin) / (4 * Math.PI);
          hi[c]! += (vi * cos - vr * sin) / (4 * Math.PI);
        }
      }
      const a2 = hr[0]! ** 2 + hr[1]! ** 2 + hr[2]! ** 2, bb = hi[0]! ** 2 + hi[1]! ** 2 + hi[2]! ** 2, ab = hr[0]! * hi[0]! + hr[1]! * hi[1]! + hr[2]! * hi[2]!;
      const h = Math.sqrt((a2 + bb) / 2 + Math.sqrt(((a2 - bb) / 2) ** 2 + ab * ab));
      if (h > best) {
        best = h;
        bestDir = u0;
      }
    }
    const along = Math.abs(bestDir[0] * mean[0]! + bestDir[1] * mean[1]! + bestDir[2] * mean[2]!) / ml;
    return { value: best, direction: along >= Math.SQRT1_2 ? "axis" : "broadside", kr: k * r };
  };
  // applicability at the nearest reported distance (the neglected terms fall fastest with distance)
  const r0 = EMISSION_DISTANCES[0];
  const h0 = at(r0).value;
  const spread = Math.max(...sources.map((s) => Math.hypot(s.position[0] - centre[0], s.position[1] - centre[1], s.position[2] - centre[2])));
  const neglected = sources.reduce((a, s) => a + dipoleFieldCore(s.size, r0 - spread, k).value * 2 * (s.reach / (r0 - spread)) ** 2, 0);
  if (!(r0 > 10 * (spread + Math.max(...sources.map((s) => s.reach))))) {
    return { applies: false, why: `the coils span ${(spread * 2).toPrecision(3)} m, not small against ${r0} m`, field: at };
  }
  if (!(h0 >= SUPERPOSITION_MARGIN * neglected)) {
    return { applies: false, why: `the coils' fields cancel at ${r0} m to ${h0.toExponential(2)} A/m, within ${SUPERPOSITION_MARGIN}× of each coil's own neglected terms (${neglected.toExponential(2)} A/m)`, field: at };
  }
  return { applies: true, why: "", field: at };
}

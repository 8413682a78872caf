/**
 * AC resistance of a coil: DC resistance at temperature, skin effect of its conductor, and
 * the proximity effect of the field the other turns produce at each turn (Ferreira 1994).
 */

import * as z from "../../zod.ts";
import { TanklightInputError } from "../../errors.ts";
import { frequency, temperature as temperatureQ, lazySchema } from "../../schema.ts";
import { checkCoil, optionsArg, quantityArg } from "../inputs.ts";
import { skinDepthCore } from "./skinDepth.ts";
import type { Coil, Filament } from "../types.ts";
import { material, resistivityAt, REFERENCE_TEMPERATURE } from "../materials.ts";
import { acFactorFromQ } from "./roundWireAcFactor.ts";
import { proximityG, turnFieldsPerAmpere, type TurnFields } from "./proximity.ts";
import { litzResistancePerLength } from "./litz.ts";
import { traceResistancePerLength } from "./trace.ts";
import { selfResonanceWarning } from "../selfCapacitance.ts";

/** Options of coilResistance. */
export interface CoilResistanceOptions {
  /** conductor temperature, K, 150–700 K (default 293.15 K = 20 °C); "80 degC" accepted */
  readonly temperature?: number | string;
}

/** The options of coilResistance and qualityFactor as a strict schema (unknown keys name the nearest valid one). */
export const CoilResistanceOptionsSpec = lazySchema(() => z.strictObject({
  temperature: temperatureQ()
    .refine((t) => t >= 150 && t <= 700, { error: "must be a conductor temperature in kelvin between 150 K and 700 K (20 °C = 293.15 K; write \"20 degC\" for Celsius)" })
    .optional(),
}));

/**
 * The checked inputs of coilResistance/qualityFactor: the coil, f in Hz (≥ 0, or > 0 when
 * `positive`), the temperature in K.
 */
const FREQUENCY_DC = lazySchema(() => frequency({ nonNegative: true }));
const FREQUENCY_AC = lazySchema(() => frequency());

export function coilLossInputs(coil: Coil, f: unknown, opts: unknown, where: string, positive = false): { coil: Coil; f: number; temperature: number } {
  checkCoil(coil, "coil", where);
  const F = quantityArg(positive ? FREQUENCY_AC : FREQUENCY_DC, (x) => (positive ? x > 0 : x >= 0), f, "f", where);
  const o = optionsArg(CoilResistanceOptionsSpec, opts, "opts", where, (x) => {
    for (const k in x) if (k !== "temperature") return false;
    const t = x["temperature"];
    return t === undefined || (typeof t === "number" && t >= 150 && t <= 700);
  }) as { temperature?: number };
  return { coil, f: F, temperature: o.temperature ?? REFERENCE_TEMPERATURE };
}

/** The parts of a coil's AC resistance, Ω (series resistance at the coil terminals). */
export interface CoilResistanceDetail {
  /** DC resistance at the temperature, Ω */
  readonly dc: number;
  /** extra resistance from each conductor's own skin effect, Ω */
  readonly skin: number;
  /** extra resistance from the proximity effect (other turns' field, and for litz the bundle's own), Ω */
  readonly proximity: number;
  /** dc + skin + proximity, Ω */
  readonly total: number;
  /** frequency, Hz */
  readonly frequency: number;
  /** conductor temperature used, K */
  readonly temperature: number;
  readonly warnings: readonly string[];
}

/** The per-turn field and per-turn conductor lengths the proximity sum needs. */
interface ProximityGeometry {
  readonly fields: TurnFields;
  /** conductor length of each entry of fields, m */
  readonly lengths: Float64Array;
}

const geometryCache = new WeakMap<Coil, ProximityGeometry>();

/**
 * Per-ampere field at each turn and each turn's conductor length, cached per coil object (coils
 * are immutable plain data). A flat spiral built as one spiral polygon (`model: "spiral"`) is
 * represented by its rings (turn i at r₀ + (i + ½)p, as the builder's "rings" model), since one
 * filament carries no turn-to-turn proximity; other polygon turns by circles of equal area.
 */
export function proximityGeometry(coil: Coil): ProximityGeometry {
  let g = geometryCache.get(coil);
  if (g) return g;
  const s = coil.shape;
  if (s?.kind === "flatSpiral" && coil.filaments.some((f) => f.kind === "path")) {
    const r0 = s.innerRadius + s.conductorWidth / 2;
    const N = Math.max(1, Math.round(s.turns));
    const rings: Filament[] = Array.from({ length: N }, (_, i) => ({ kind: "circle", center: [0, 0, 0], axis: [0, 0, 1], radius: r0 + (i + 0.5) * s.pitch, turns: 1 }));
    const ringCoil: Coil = { ...coil, filaments: rings };
    g = { fields: turnFieldsPerAmpere(ringCoil), lengths: filamentLengths(ringCoil) };
  } else {
    g = { fields: turnFieldsPerAmpere(equivalentCircleCoil(coil)), lengths: filamentLengths(coil) };
  }
  geometryCache.set(coil, g);
  return g;
}

/**
 * A coil whose polygon (path) turns are replaced by circles of equal enclosed area, centred on
 * the polygon's centroid and normal to its plane, for the proximity-field computation only
 * (the conductor length stays the polygon's perimeter). Circles pass through unchanged.
 */
function equivalentCircleCoil(coil: Coil): Coil {
  if (coil.filaments.every((f) => f.kind === "circle")) return coil;
  const filaments: Filament[] = coil.filaments.map((f) => {
    if (f.kind === "circle") return f;
    const pts = f.points;
    const n = pts.length;
    let cx = 0, cy = 0, cz = 0;
    for (const p of pts) { cx += p[0]; cy += p[1]; cz += p[2]; }
    cx /= n; cy /= n; cz /= n;
    // vector area ½ Σ (p_k − c) × (p_{k+1} − c)
    let ax = 0, ay = 0, az = 0;
    for (let k = 0; k < n; k++) {
      const p = pts[k]!, q = pts[(k + 1) % n]!;
      const ux = p[0] - cx, uy = p[1] - cy, uz = p[2] - cz;
      const vx = q[0] - cx, vy = q[1] - cy, vz = q[2] - cz;
      ax += 0.5 * (uy * vz - uz * vy);
      ay += 0.5 * (uz * vx - ux * vz);
      az += 0.5 * (ux * vy - uy * vx);
    }
    const area = Math.hypot(ax, ay, az);
    return { kind: "circle", center: [cx, cy, cz], axis: [ax / area, ay / area, az / area], radius: Math.sqrt(area / Math.PI), turns: f.turns };
  });
  return { ...coil, filaments };
}

/**
 * Conductor length each filament stands for: turns × circumference (circle) or perimeter (path), m.
 */
function filamentLengths(coil: Coil): Float64Array {
  const out = new Float64Array(coil.filaments.length);
  coil.filaments.forEach((f, i) => {
    if (f.kind === "circle") out[i] = f.turns * 2 * Math.PI * f.radius;
    else {
      let L = 0;
      const n = f.points.length;
      for (let k = 0; k < n; k++) {
        const p = f.points[k]!, q = f.points[(k + 1) % n]!;
        L += Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]);
      }
      out[i] = f.turns * L;
    }
  });
  return out;
}

/**
 * The AC series resistance of a coil and its parts: DC, skin effect, proximity effect.
 *
 * R = R_dc(T)·F_skin + Σ_turns ℓ_i·2G·⟨Ĥ_i²⟩/Î², with R_dc(T) = ρ(T)·ℓ_wire/A (ρ(T) per IEC 60028,
 * α₂₀ = 0.00393/K for copper), F_skin the exact round-wire factor (Kelvin functions), G the
 * uniform-transverse-field loss factor of the conductor (Ferreira 1994 orthogonality) and Ĥ_i
 * the field all other turns produce at turn i (loopField, per ampere). Litz: per strand, with
 * the bundle's internal field added (Bartoli et al. 1996). Traces: slab skin factor and
 * low-frequency strip eddy loss (a stated model). See docs/methods/losses.md.
 * @param coil the coil (any builder's, or hand-built circle/path filaments).
 * @param f frequency, Hz, ≥ 0 (or a quantity string, "200 kHz").
 * @param opts `{ temperature }`, K (default 293.15 K; "80 degC" accepted).
 * @returns the parts, Ω, and warnings (f above a third of the self-resonance, filaments standing
 *   for several turns, traces beyond the thin-strip regime, polygon turns approximated by circles
 *   for the proximity field).
 * @example coilResistanceDetail(roundCoil({ meanRadius: 0.04, turns: 20, wire: { diameter: 0.5e-3 } }), 200e3)
 *   // → { dc: 0.4414, skin: 0.0664, proximity: 0.2926, total: 0.8004, … } Ω
 */
export function coilResistanceDetail(coil: Coil, f: number | string, opts: CoilResistanceOptions = {}): CoilResistanceDetail {
  const x = coilLossInputs(coil, f, opts, "coilResistance");
  return coilResistanceCore(x.coil, x.f, x.temperature, true);
}

/**
 * {@link coilResistanceDetail} on a checked coil and SI numbers (f ≥ 0 Hz, T in 150–700 K) — the
 * unchecked core; `withSelfResonance` adds the f_sr/3 check (costs a self-capacitance estimate).
 */
export function coilResistanceCore(coil: Coil, f: number, temperature: number, withSelfResonance: boolean): CoilResistanceDetail {
  const c = coil.conductor;
  const rho = resistivityAt(material(c.material), temperature);
  const warnings: string[] = [];
  const len = coil.wireLength;
  let dc: number, skin: number, proximity = 0;
  const geo = f > 0 ? proximityGeometry(coil) : undefined;
  const fields = geo?.fields;
  const lengths = geo?.lengths ?? new Float64Array(0);
  if (fields) for (const w of fields.warnings) warnings.push(w);
  if (fields && coil.filaments.some((fl) => fl.kind === "path")) {
    warnings.push(
      coil.shape?.kind === "flatSpiral"
        ? "spiral polygon: the proximity field is computed for the spiral's rings (approximation)"
        : "polygon turns: the proximity field is computed for circles of equal area (approximation)",
    );
  }
  switch (c.kind) {
    case "round": {
      const r = c.diameter / 2;
      dc = (rho * len) / (Math.PI * r * r);
      if (!fields) { skin = 0; break; }
      const delta = skinDepthCore(f, rho);
      skin = dc * (acFactorFromQ((Math.SQRT2 * r) / delta) - 1);
      const G = rho * proximityG(c.diameter / (delta * Math.SQRT2));
      for (let i = 0; i < lengths.length; i++) proximity += lengths[i]! * 2 * G * fields.h2[i]!;
      break;
    }
    case "litz": {
      const p = litzResistancePerLength(c.strands, c.strandDiameter, c.outerDiameter, f, rho);
      dc = p.dc * len;
      skin = p.skin * len;
      if (!fields) break;
      proximity = p.internalProximity * len;
      for (let i = 0; i < lengths.length; i++) proximity += lengths[i]! * p.externalFactor * fields.h2[i]!;
      break;
    }
    case "trace": {
      const p = traceResistancePerLength(c.width, c.thickness, f, rho);
      dc = p.dc * len;
      skin = p.skin * len;
      if (!fields) break;
      for (let i = 0; i < lengths.length; i++) proximity += lengths[i]! * (p.normalFactor * fields.hz2[i]! + p.tangentialFactor * fields.hr2[i]!);
      if (p.beyondThinStrip) {
        warnings.push(
          `trace ${c.width} m × ${c.thickness} m at ${f} Hz: width·thickness exceeds 2δ², so the low-frequency strip proximity model overstates the loss`,
        );
      }
      break;
    }
    default: {
      const never: never = c;
      throw new TanklightInputError([{ path: "coil.conductor.kind", message: "unknown conductor kind", value: (never as { kind: string }).kind }], "coilResistance");
    }
  }
  if (f > 0 && withSelfResonance) {
    try {
      const w = selfResonanceWarning(coil, f);
      if (w) warnings.push(w);
    } catch (e) {
      if (!(e instanceof TanklightInputError)) throw e;
      warnings.push(`self-resonance could not be estimated for this coil (${e.message}); the f_sr/3 check was skipped`);
    }
  }
  return { dc, skin, proximity, total: dc + skin + proximity, frequency: f, temperature, warnings };
}

/**
 * AC series resistance of a coil (DC at temperature + skin + proximity), Ω.
 * @param coil the coil.  @param f frequency, Hz, ≥ 0 ("200 kHz" accepted).  @param opts `{ temperature }`, K (default 293.15 K).
 * @returns R, Ω. See coilResistanceDetail for the parts, the method and warnings.
 * @example coilResistance(coil, 0) // → the DC resistance ρℓ/A at 20 °C
 */
export function coilResistance(coil: Coil, f: number | string, opts: CoilResistanceOptions = {}): number {
  const x = coilLossInputs(coil, f, opts, "coilResistance");
  return coilResistanceCore(x.coil, x.f, x.temperature, false).total;
}

/**
 * metalHeating: eddy-current power in a coin, a piece of foil or a finger ring lying on the
 * surface above the transmitter, from the transmitters' own field at their operating current.
 */
import * as z from "../zod.ts";
import { parseInput, length, resistivity, vec3, lazySchema } from "../schema.ts";
import { TanklightInputError, requireObject } from "../errors.ts";
import { MU0 } from "../constants.ts";
import { COPPER, ALUMINIUM, type Material } from "../em/materials.ts";
import { GEOMETRY_LIMITS } from "../em/inputs.ts";
import { skinDepth } from "../em/losses/skinDepth.ts";
import { selfInductance } from "../em/selfInductance.ts";
import type { Coil, Pose, Vec3 } from "../em/types.ts";
import { METAL_HEATING_POWER } from "../hazards.ts";
import { parseSafetyDesign, type SafetyDesign } from "./design.ts";
import { fieldPhasors, type FieldSource } from "./fieldGrid.ts";
import { rmsFromPeak, RMS_CONVENTION } from "./rms.ts";

/**
 * Metals of everyday objects besides lib/em's copper and aluminium. Resistivities at 20 °C —
 * trade practice (no source): typical handbook figures, alloys vary by ±20 %.
 */
export const OBJECT_METALS: Readonly<Record<string, Material>> = {
  copper: COPPER,
  aluminium: ALUMINIUM,
  brass: { name: "brass", resistivity20: 6.4e-8, temperatureCoefficient20: 0.0015, relativePermeability: 1, source: "trade practice (no source): cartridge brass, about 28 % IACS" },
  cupronickel: { name: "cupronickel", resistivity20: 3.5e-7, temperatureCoefficient20: 0.0001, relativePermeability: 1, source: "trade practice (no source): 75/25 coin cupronickel" },
  silver: { name: "silver", resistivity20: 1.59e-8, temperatureCoefficient20: 0.0038, relativePermeability: 1, source: "trade practice (no source)" },
  gold: { name: "gold", resistivity20: 2.44e-8, temperatureCoefficient20: 0.0034, relativePermeability: 1, source: "trade practice (no source): pure gold; jewellery alloys are 2–5× more resistive" },
  "stainless steel": { name: "stainless steel", resistivity20: 7.2e-7, temperatureCoefficient20: 0.001, relativePermeability: 1, source: "trade practice (no source): austenitic (non-magnetic) grades" },
};

const metal = lazySchema(() => z.union([z.enum(Object.keys(OBJECT_METALS) as [string, ...string[]]), z.strictObject({ name: z.string(), resistivity: resistivity() })]));

/** The object: a thin disc (coin, foil) or a ring (finger ring), lying flat on the surface. */
export const MetalObjectInput = lazySchema(() => z.discriminatedUnion("kind", [
  z.strictObject({
    kind: z.literal("disc"),
    label: z.string().optional(),
    radius: length(),
    thickness: length(),
    metal,
    /** centre of the object's lower face, world m; default: on the surface above the first transmitter */
    position: vec3({ min: -GEOMETRY_LIMITS.maxLength, max: GEOMETRY_LIMITS.maxLength }).optional(),
  }),
  z.strictObject({
    kind: z.literal("ring"),
    label: z.string().optional(),
    /** mean radius of the band, m */
    radius: length(),
    /** band width along the axis, m */
    width: length(),
    /** wall thickness (radial), m */
    thickness: length(),
    metal,
    position: vec3({ min: -GEOMETRY_LIMITS.maxLength, max: GEOMETRY_LIMITS.maxLength }).optional(),
  }),
]));
export type MetalObject = z.input<typeof MetalObjectInput>;

/** What metalHeating returns. */
export interface MetalHeating {
  readonly object: string;
  /** time-averaged eddy power, W */
  readonly power: number;
  /** which regime applies: the field reaches through the metal, the metal excludes it, or in between */
  readonly regime: "field-penetrating (low frequency)" | "field-excluding (skin effect)" | "transition";
  /** a·t/(2δ²) for a disc (≪ 1: low-frequency limit valid), or R/(ωL) for a ring (≫ 1: resistance-limited) */
  readonly regimeParameter: number;
  /** skin depth in the metal, m */
  readonly skinDepth: number;
  /** mean flux density over the object, T RMS */
  readonly flux: number;
  /** the two limiting estimates, W */
  readonly lowFrequencyPower: number;
  readonly fieldExcludingPower: number;
  /** steady temperature rise in still air, K (Newton cooling, h = 10 W/(m²·K), trade practice) */
  readonly temperatureRise: number;
  /** the caution threshold, W (lib/hazards.ts) */
  readonly threshold: number;
  readonly verdict: "caution" | "below threshold";
  readonly model: string;
  readonly text: string;
  readonly convention: string;
}

/** Still-air cooling of a small object, W/(m²·K): trade practice (no source), natural convection plus radiation. */
const STILL_AIR_H = 10;
/** Rings of the low-frequency integral over the disc, and angles per ring. */
const DISC_RINGS = 48;
const DISC_ANGLES = 16;

function materialOf(m: z.output<typeof metal>): Material {
  if (typeof m === "string") return OBJECT_METALS[m]!;
  return { name: m.name, resistivity20: m.resistivity, temperatureCoefficient20: 0, relativePermeability: 1, source: "given" };
}

/**
 * Flux Φ(ρ) (phasor, Wb peak) through horizontal circles about a centre at the ring midpoints
 * ρ_j = (j + ½)·a/N, and the mean B_z over each annulus, from ring-averaged B_z (midpoint rule).
 */
function fluxProfile(sources: readonly FieldSource[], c: Vec3, a: number): { rho: Float64Array; phiRe: Float64Array; phiIm: Float64Array; totalRe: number; totalIm: number } {
  const N = DISC_RINGS, M = DISC_ANGLES;
  const xs = new Float64Array(N * M), ys = new Float64Array(N * M);
  const rho = new Float64Array(N);
  for (let j = 0; j < N; j++) {
    rho[j] = ((j + 0.5) * a) / N;
    for (let q = 0; q < M; q++) {
      const th = (2 * Math.PI * (q + 0.5 * (j % 2))) / M;
      xs[j * M + q] = c[0] + rho[j]! * Math.cos(th);
      ys[j * M + q] = c[1] + rho[j]! * Math.sin(th);
    }
  }
  const B = fieldPhasors(sources, { xs, ys, zs: Float64Array.of(c[2]) });
  const phiRe = new Float64Array(N), phiIm = new Float64Array(N);
  let accRe = 0, accIm = 0;
  const dr = a / N;
  for (let j = 0; j < N; j++) {
    let br = 0, bi = 0;
    for (let q = 0; q < M; q++) { br += B.re[2][j * M + q]! / M; bi += B.im[2][j * M + q]! / M; }
    const inner = j * dr;
    // flux to the midpoint: all inner annuli plus the inner half of this one
    phiRe[j] = accRe + br * Math.PI * (rho[j]! ** 2 - inner ** 2);
    phiIm[j] = accIm + bi * Math.PI * (rho[j]! ** 2 - inner ** 2);
    accRe += br * Math.PI * ((inner + dr) ** 2 - inner ** 2);
    accIm += bi * Math.PI * ((inner + dr) ** 2 - inner ** 2);
  }
  return { rho, phiRe, phiIm, totalRe: accRe, totalIm: accIm };
}

/**
 * Eddy-current power in a thin conductive disc (coin, foil) or a ring (finger ring) lying flat on
 * the surface, in the transmitters' field at their operating current, with the regime that
 * applies and a caution above METAL_HEATING_POWER (0.25 W, lib/hazards.ts).
 *
 * Disc, low-frequency limit (the field passes through; valid while a·t ≪ 2δ²): each annulus is a
 * shorted turn driven by the flux inside it, P = ∫ σt·(ωΦ(ρ))²/(4πρ) dρ — in a uniform field
 * B₀ (peak) the textbook thin-disc loss P = πσω²B₀²·t·a⁴/16 (Faraday's law E = ωB₀ρ/2 and
 * P = ½∫σE²dV; e.g. Griffiths §7.2 with Joule heating, the classic eddy-current-brake exercise).
 * Disc, field-excluding (a·t ≫ 2δ²): the currents flow in a skin layer; the faces carry the
 * tangential field of a perfectly conducting disc in a perpendicular field,
 * |H_t| = (2H₀/π)·ρ/√(a²−ρ²) (Smythe, Static and Dynamic Electricity, the oblate-spheroid limit;
 * from memory (unverified)), cut off one thickness from the rim where the rim face takes over,
 * lost in the surface resistance R_s = √(ωμ₀/(2σ)): P = ½R_s∮|H_t|²dA (for a sheet thinner than
 * about 2δ the sheet resistance takes over: 2/(σt) in place of R_s, whichever is larger).
 * In between the two limits are combined as 1/P = 1/P_LF + 1/P_FE, exact for a single shorted
 * turn. Ring: a shorted turn, P = (ωΦ)²R/(2(R² + (ωL)²)), R of the band's cross-section (or
 * of a skin layer δ deep round it, whichever is smaller) and L from selfInductance (Rosa &
 * Grover's round-wire loop with the band's geometric mean distance 0.2235(w + t), Grover 1946).
 *
 * @param design see {@link SafetyDesign}.
 * @param object `{ kind: "disc", radius, thickness, metal, position? }` or `{ kind: "ring", radius,
 *   width, thickness, metal, position? }`; metal a name in {@link OBJECT_METALS} or
 *   `{ name, resistivity }`; position of the lower face's centre (default: on the surface above
 *   the first transmitter).
 * @returns {@link MetalHeating}: power (W), regime, both limits, a temperature-rise estimate and
 *   a caution above the threshold.
 * @example metalHeating({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil: tx, current: 1 }] }, { kind: "disc", radius: "12 mm", thickness: "1.5 mm", metal: "copper" }).regime // → "field-excluding (skin effect)"
 */
export function metalHeating(design: SafetyDesign, object: MetalObject): MetalHeating {
  const where = "metalHeating";
  const d = parseSafetyDesign(design, where);
  requireObject(object, "object", where);
  const o = parseInput(MetalObjectInput, object, where);
  const mat = materialOf(o.metal);
  const f = d.frequency, w = 2 * Math.PI * f;
  const sigma = 1 / mat.resistivity20;
  const delta = skinDepth(f, mat.resistivity20);
  const sources: FieldSource[] = d.transmitters.map((t) => ({ coil: t.coil, pose: (t.pose as Pose | undefined) ?? { position: [0, 0, 0] }, current: t.current, phase: t.phase ?? 0 }));
  const tx0 = sources[0]!.pose.position;
  const base: Vec3 = (o.position as Vec3 | undefined) ?? [tx0[0], tx0[1], d.surfaceHeight];
  if (base[2] < d.surfaceHeight) {
    throw new TanklightInputError([{ path: "object.position", message: `must lie on or above the surface (z ≥ ${d.surfaceHeight} m)`, value: base }], where);
  }
  const label = o.label ?? `${mat.name} ${o.kind}`;
  const rs = Math.sqrt((w * MU0) / (2 * sigma)); // surface resistance of one face, Ω
  let pLf: number, pFe: number, power: number, param: number, regime: MetalHeating["regime"], fluxRms: number, area: number, model: string;
  if (o.kind === "disc") {
    const a = o.radius, t = o.thickness;
    const prof = fluxProfile(sources, [base[0], base[1], base[2] + t / 2], a);
    pLf = 0;
    for (let j = 0; j < prof.rho.length; j++) {
      const phi2 = prof.phiRe[j]! ** 2 + prof.phiIm[j]! ** 2; // |Φ|², peak
      pLf += (sigma * t * w * w * phi2) / (4 * Math.PI * prof.rho[j]!) * (a / prof.rho.length);
    }
    const b0 = Math.hypot(prof.totalRe, prof.totalIm) / (Math.PI * a * a); // mean B_z, peak
    // a sheet thinner than about 2δ carries its current through the whole thickness: sheet resistance
    // 1/(σt) for the jump 2H_t, i.e. 2/(σt) in place of the two faces' R_s (the larger of the two holds)
    pFe = fieldExcludingDiscPower(b0 / MU0, a, t, Math.max(rs, 2 / (sigma * t)));
    param = (a * t) / (2 * delta * delta);
    power = 1 / (1 / pLf + 1 / pFe);
    regime = pLf < pFe / 3 ? "field-penetrating (low frequency)" : pFe < pLf / 3 ? "field-excluding (skin effect)" : "transition";
    fluxRms = rmsFromPeak(b0);
    area = 2 * Math.PI * a * a + 2 * Math.PI * a * t;
    model = "thin disc: annuli as shorted turns (low-frequency limit, πσω²B₀²ta⁴/16 in a uniform field) combined with the field-excluding surface-resistance estimate, 1/P = 1/P_LF + 1/P_FE";
  } else {
    const R0 = o.radius, bw = o.width, th = o.thickness;
    const prof = fluxProfile(sources, [base[0], base[1], base[2] + bw / 2], R0);
    const phi = Math.hypot(prof.totalRe, prof.totalIm); // peak
    const areaEff = Math.min(bw * th, 2 * (bw + th) * delta);
    const R = (2 * Math.PI * R0) / (sigma * areaEff);
    const gmd = 0.2235 * (bw + th);
    const turn: Coil = { filaments: [{ kind: "circle", center: [0, 0, 0], axis: [0, 0, 1], radius: R0, turns: 1 }], conductor: { kind: "round", diameter: 2 * gmd, outerDiameter: 2 * gmd }, turns: 1, wireLength: 2 * Math.PI * R0 };
    const L = selfInductance(turn, { frequency: f });
    pLf = ((w * phi) ** 2) / (2 * R);
    pFe = (phi * phi * R) / (2 * L * L);
    power = ((w * phi) ** 2 * R) / (2 * (R * R + (w * L) ** 2));
    param = R / (w * L);
    regime = param > 3 ? "field-penetrating (low frequency)" : param < 1 / 3 ? "field-excluding (skin effect)" : "transition";
    fluxRms = rmsFromPeak(phi / (Math.PI * R0 * R0));
    area = 2 * Math.PI * R0 * bw * 2 + 2 * 2 * Math.PI * R0 * th;
    model = "ring: a shorted turn, P = (ωΦ)²R/(2(R² + (ωL)²)), L by selfInductance with the band's geometric mean distance (Grover 1946)";
  }
  const rise = power / (STILL_AIR_H * area);
  const thr = METAL_HEATING_POWER.value;
  const verdict = power > thr ? "caution" : "below threshold";
  const text = `${label} on the surface: ${fmtW(power)} of eddy-current heating (${regime}; skin depth ${(delta * 1e3).toPrecision(3)} mm), about ${rise.toPrecision(2)} K above ambient in still air — ${
    verdict === "caution" ? `CAUTION: above ${thr} W; metal objects on the transmitter get hot: keep them off, detect them, or lower the field` : `below the ${thr} W caution threshold (×${(thr / power).toPrecision(3)} margin)`
  }`;
  return {
    object: label, power, regime, regimeParameter: param, skinDepth: delta, flux: fluxRms, lowFrequencyPower: pLf, fieldExcludingPower: pFe,
    temperatureRise: rise, threshold: thr, verdict, model, text, convention: RMS_CONVENTION,
  };
}

function fmtW(p: number): string {
  return p >= 1 ? `${p.toPrecision(3)} W` : p >= 1e-3 ? `${(p * 1e3).toPrecision(3)} mW` : `${(p * 1e6).toPrecision(3)} µW`;
}

/**
 * Field-excluding disc: ½R_s·∮|H_t|²dA over both faces, |H_t| = (2H₀/π)ρ/√(a²−ρ²) up to
 * ρ' = a − t, plus the rim face (area 2πa·t) at the field of ρ'. Closed form of the face integral:
 * 2·½R_s·(4H₀²/π²)·2π·[(a²/2)ln(a²/(a²−ρ'²)) − ρ'²/2].
 * @param h0 peak applied field, A/m; a radius, t thickness, m; rs surface resistance, Ω.
 */
export function fieldExcludingDiscPower(h0: number, a: number, t: number, rs: number): number {
  const c = Math.min(t, 0.5 * a);
  const rp = a - c;
  const faces = rs * ((4 * h0 * h0) / (Math.PI * Math.PI)) * 2 * Math.PI * (0.5 * a * a * Math.log((a * a) / (a * a - rp * rp)) - 0.5 * rp * rp);
  const hEdge = ((2 * h0) / Math.PI) * (rp / Math.sqrt(a * a - rp * rp));
  const rim = 0.5 * rs * hEdge * hEdge * 2 * Math.PI * a * t;
  return faces + rim;
}

/**
 * Proximity effect: the eddy loss a conductor suffers in the field of the other turns.
 *
 * Orthogonality (Ferreira, IEEE Trans. Power Electron. 9(1):127–131, 1994): for a round
 * conductor, the loss of its own current (skin effect) and the loss caused by an external
 * transverse field (proximity effect) add without cross term, because the two current
 * distributions have orthogonal angular symmetry (cos 0φ against cos 1φ). So
 *   P′ = ½·R′_dc·F_skin·Î² + G_prox·Ĥ²,
 * with G_prox the loss per unit length of the conductor in a uniform transverse field of unit
 * peak amplitude. Ĥ is the field the *other* turns produce at the conductor (per ampere × Î).
 */

import { MU0 } from "../../constants.ts";
import { TanklightInputError } from "../../errors.ts";
import { kelvinScaledInto } from "../../math/kelvin.ts";
import { loopField } from "../loopField.ts";
import type { Coil, Filament } from "../types.ts";
import { checkRoundWire } from "./roundWireAcFactor.ts";
import { skinDepthCore } from "./skinDepth.ts";
import { checkCoil } from "../inputs.ts";

/**
 * g(γ) = P′·σ/Ĥ² of a round wire in a uniform transverse field (hot path, no checks), γ ≥ 0.
 *
 * g(γ) = −2πγ·(ber₂γ·ber′γ + bei₂γ·bei′γ)/(ber²γ + bei²γ), γ = d/(δ√2)
 * (docs/references.md; we verified it against the exact 2-D eddy-current solution to 1e-20 in
 * scripts/gen_loss_fixtures.py). Low frequency g → πγ⁴/8, i.e. P′ = πσω²B̂²a⁴/8.
 */
export function proximityG(gamma: number): number {
  if (gamma === 0) return 0;
  if (gamma < 1e-3) return (Math.PI * gamma ** 4) / 8; // next term is O(γ⁸): relative 1e-13 here
  const buf = new Float64Array(6);
  kelvinScaledInto(gamma, buf);
  const br = buf[0]!, bi = buf[1]!;
  const b1r = buf[2]!, b1i = buf[3]!;
  const b2r = buf[4]!, b2i = buf[5]!;
  const dr = (b1r + b1i) * Math.SQRT1_2;
  const di = (b1i - b1r) * Math.SQRT1_2;
  return (-2 * Math.PI * gamma * (b2r * dr + b2i * di)) / (br * br + bi * bi);
}

/**
 * Proximity-loss factor of a round wire: the time-averaged eddy loss per unit length in a uniform
 * transverse magnetic field of unit peak strength.
 *
 * P′ = G·Ĥ², G = ρ·g(γ), γ = d/(δ√2), g(γ) = −2πγ(ber₂γ ber′γ + bei₂γ bei′γ)/(ber²γ + bei²γ)
 * (Ferreira 1994's orthogonal proximity term for a round conductor; the Kelvin form of
 * docs/references.md, checked here against the exact 2-D solution). Low frequency:
 * P′ = πσω²μ₀²Ĥ²a⁴/8 (Faraday's law with the unperturbed field; derived in docs/methods/losses.md).
 * High frequency: G grows like √f (the field is excluded; surface loss).
 * @param diameter bare wire diameter d, m, > 0.
 * @param f frequency, Hz, ≥ 0 (0 → 0).
 * @param resistivity Ω·m, > 0 (non-magnetic conductor).
 * @returns G, W·m⁻¹ per (A/m)² of peak field (P′ = G·Ĥ² in W/m, time-averaged).
 * @example roundWireProximityFactor(0.5e-3, 200e3, 1.7241e-8) // → 1.1654e-7 W·m⁻¹/(A/m)² (0.5 mm copper, 200 kHz)
 */
export function roundWireProximityFactor(diameter: number, f: number, resistivity: number): number {
  checkRoundWire("roundWireProximityFactor", "diameter", diameter, f, resistivity);
  if (f === 0) return 0;
  const delta = skinDepthCore(f, resistivity);
  return resistivity * proximityG(diameter / (delta * Math.SQRT2));
}

/** Per-ampere field the other turns produce at each filament of a coil. */
export interface TurnFields {
  /** mean |H_transverse|² over each filament, (A/m)² per A², index = filament index */
  readonly h2: Float64Array;
  /** mean squared field component along the coil axis (z) at each filament, (A/m)² per A² */
  readonly hz2: Float64Array;
  /** mean squared in-plane transverse component (radial for circles) at each filament, (A/m)² per A² */
  readonly hr2: Float64Array;
  /** conductor length each filament stands for (its turns × its circumference), m */
  readonly length: Float64Array;
  readonly warnings: readonly string[];
}

/** Number of points around a turn where the field is sampled when the coil is not coaxial. */
const RING_SAMPLES = 24;

/**
 * The magnetic field that all other turns produce at each turn of a coil, per ampere of coil
 * current, as the mean of |H|² over the turn (Ferreira 1994: the proximity loss of a conductor
 * is set by the external field at it; its own field is the skin term).
 *
 * Each filament j contributes turns_j × its field per ampere (loopField, closed form). The
 * field is taken at the conductor's centre line: by the mean-value property of a harmonic field
 * this is exactly the uniform (dipole) part of the external field over the cross-section, the part
 * the uniform-field loss formula needs; the higher multipoles of a touching neighbour add a few
 * per cent at low frequency and are neglected (docs/methods/losses.md). For coaxial circle
 * filaments (every builder's circular coil) the field is the same all round a turn and one point
 * suffices; otherwise RING_SAMPLES points around the turn are averaged.
 * @param coil the coil, circle filaments only (a path filament throws TanklightInputError here;
 *   coilResistance maps polygon turns to equal-area circles, and a spiral polygon to its rings,
 *   before calling this).
 * @returns per-filament mean |H|², its axial and in-plane parts, and conductor lengths.
 * @example turnFieldsPerAmpere(tx).length.length // → 20 (one entry per filament)
 */
export function turnFieldsPerAmpere(coil: Coil): TurnFields {
  checkCoil(coil, "coil", "turnFieldsPerAmpere");
  const circles = circleFilaments(coil);
  const n = circles.length;
  const out = { h2: new Float64Array(n), hz2: new Float64Array(n), hr2: new Float64Array(n), length: new Float64Array(n) };
  const warnings: string[] = [];
  if (circles.some((c) => c.turns > 1)) {
    warnings.push("some filaments stand for several turns: the proximity effect among the turns of one filament is not modelled");
  }
  const coaxial = circles.every((c) => Math.abs(c.center[0]) < 1e-12 && Math.abs(c.center[1]) < 1e-12 && Math.abs(c.axis[0]) < 1e-12 && Math.abs(c.axis[1]) < 1e-12);
  for (let i = 0; i < n; i++) out.length[i] = circles[i]!.turns * 2 * Math.PI * circles[i]!.radius;
  if (coaxial) coaxialTurnFields(circles, out);
  else generalTurnFields(circles, out);
  return { ...out, warnings };
}

type Circle = Extract<Filament, { kind: "circle" }>;
type TurnFieldArrays = Pick<TurnFields, "h2" | "hz2" | "hr2">;

/** The coil's filaments, which must all be circles (a path filament throws, naming turnFieldsPerAmpere). */
function circleFilaments(coil: Coil): Circle[] {
  const circles: Circle[] = [];
  for (const f of coil.filaments) {
    if (f.kind !== "circle") {
      throw new TanklightInputError(
        [{ path: "coil.filaments", message: "polygon (path) filaments: proximity loss is not modelled yet", value: f.kind, expected: "circle filaments" }],
        "turnFieldsPerAmpere",
      );
    }
    circles.push(f);
  }
  return circles;
}

/** Coaxial circles (axes ±z on the z axis): the field is the same all round a turn, one point per turn. Writes h2, hz2, hr2. */
function coaxialTurnFields(circles: readonly Circle[], out: TurnFieldArrays): void {
  const n = circles.length;
  for (let i = 0; i < n; i++) {
    const ci = circles[i]!;
    let br = 0;
    let bz = 0;
    for (let j = 0; j < n; j++) {
      if (j === i) continue;
      const cj = circles[j]!;
      // axis may be ±z: a −z axis reverses the current sense and the local z
      const s = cj.axis[2] >= 0 ? 1 : -1;
      const b = loopField(cj.radius, cj.turns, ci.radius, s * (ci.center[2] - cj.center[2]));
      br += b.bRho;
      bz += s * b.bZ;
    }
    out.hr2[i] = (br * br) / (MU0 * MU0);
    out.hz2[i] = (bz * bz) / (MU0 * MU0);
    out.h2[i] = out.hr2[i]! + out.hz2[i]!;
  }
}

/**
 * General placement: RING_SAMPLES points around each turn i, each expressed in filament j's frame;
 * the field component along the wire is dropped (it induces no eddy current in a long wire). Writes h2, hz2, hr2.
 */
function generalTurnFields(circles: readonly Circle[], out: TurnFieldArrays): void {
  const n = circles.length;
  for (let i = 0; i < n; i++) {
    const ci = circles[i]!;
    const [ui, vi, wi] = frame(ci.axis);
    let sum2 = 0;
    let sumZ2 = 0;
    for (let k = 0; k < RING_SAMPLES; k++) {
      const phi = (2 * Math.PI * (k + 0.5)) / RING_SAMPLES;
      const c = Math.cos(phi), s = Math.sin(phi);
      const radial: [number, number, number] = [ui[0] * c + vi[0] * s, ui[1] * c + vi[1] * s, ui[2] * c + vi[2] * s];
      const tangent: [number, number, number] = [-ui[0] * s + vi[0] * c, -ui[1] * s + vi[1] * c, -ui[2] * s + vi[2] * c];
      const p: [number, number, number] = [ci.center[0] + ci.radius * radial[0], ci.center[1] + ci.radius * radial[1], ci.center[2] + ci.radius * radial[2]];
      const B: [number, number, number] = [0, 0, 0];
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        const cj = circles[j]!;
        const [uj, vj, wj] = frame(cj.axis);
        const d: [number, number, number] = [p[0] - cj.center[0], p[1] - cj.center[1], p[2] - cj.center[2]];
        const z = dot(d, wj);
        const x = dot(d, uj), y = dot(d, vj);
        const rho = Math.hypot(x, y);
        const b = loopField(cj.radius, cj.turns, rho, z);
        const ex = rho > 0 ? x / rho : 1, ey = rho > 0 ? y / rho : 0;
        for (let q = 0; q < 3; q++) B[q] = B[q]! + b.bRho * (ex * uj[q]! + ey * vj[q]!) + b.bZ * wj[q]!;
      }
      const bt = dot(B, tangent);
      const bAx = dot(B, wi);
      sum2 += (dot(B, B) - bt * bt) / (MU0 * MU0);
      sumZ2 += (bAx * bAx) / (MU0 * MU0);
    }
    out.h2[i] = sum2 / RING_SAMPLES;
    out.hz2[i] = sumZ2 / RING_SAMPLES;
    out.hr2[i] = Math.max(0, out.h2[i]! - out.hz2[i]!);
  }
}

function dot(a: readonly number[], b: readonly number[]): number {
  return a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;
}

type V3 = [number, number, number];

/** Orthonormal frame (u, v, w) with w along the (normalised) axis, right-handed (u × v = w). */
function frame(axis: readonly number[]): [V3, V3, V3] {
  const len = Math.hypot(axis[0]!, axis[1]!, axis[2]!);
  const w: V3 = [axis[0]! / len, axis[1]! / len, axis[2]! / len];
  const h: V3 = Math.abs(w[2]) < 0.9 ? [0, 0, 1] : [1, 0, 0];
  const u0: V3 = [h[1] * w[2] - h[2] * w[1], h[2] * w[0] - h[0] * w[2], h[0] * w[1] - h[1] * w[0]];
  const ul = Math.hypot(u0[0], u0[1], u0[2]);
  const u: V3 = [u0[0] / ul, u0[1] / ul, u0[2] / ul];
  const v: V3 = [w[1] * u[2] - w[2] * u[1], w[2] * u[0] - w[0] * u[2], w[0] * u[1] - w[1] * u[0]];
  return [u, v, w];
}

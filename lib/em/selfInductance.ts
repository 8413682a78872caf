/**
 * Self-inductance of a coil by the filament method with each turn's own-wire term.
 */
import { MU0 } from "../constants.ts";
import * as z from "../zod.ts";
import { TanklightInputError } from "../errors.ts";
import { frequency, lazySchema } from "../schema.ts";
import { checkCoil, optionsArg } from "./inputs.ts";
import { skinDepthCore } from "./losses/skinDepth.ts";
import { material, resistivityAt } from "./materials.ts";
import { filamentMutual } from "./filamentMutual.ts";
import { segmentMutual, straightWireSelfInductance } from "./polygonMutual.ts";
import type { Coil, Conductor, Filament } from "./types.ts";

/** Options of {@link selfInductance}. */
export interface SelfInductanceOptions {
  /** frequency, Hz, ≥ 0 ("200 kHz" accepted); sets the internal-inductance factor Y from the skin depth (default: DC, Y = 1/4) */
  readonly frequency?: number | string;
}

/** The options of {@link selfInductance} as a strict schema (unknown keys name the nearest valid one). */
const SelfInductanceOptionsSpec = lazySchema(() => z.strictObject({ frequency: frequency({ nonNegative: true }).optional() }));

/** Breakdown returned by {@link selfInductanceDetail}. */
export interface SelfInductanceDetail {
  /** L, H */
  readonly value: number;
  /** Σ over filaments of N²·(own-wire term), H */
  readonly ownTerms: number;
  /** Σ over filament pairs i ≠ j of NᵢNⱼMᵢⱼ, H */
  readonly mutualTerms: number;
  /** internal-inductance factor used (1/4 uniform current … 0 surface current) */
  readonly Y: number;
  readonly warnings: readonly string[];
}

/** Exponent of the blend Y(x) = (1/4)/(1 + (x/2)^p)^{1/p}, fitted to the exact curve (max error 0.7 % of Y). */
const Y_BLEND_POWER = 4.8;

/**
 * Internal-inductance factor Y of a round wire of radius r at skin depth δ, x = r/δ:
 * Y = 2πL′_int/μ₀, exactly (1/x)·Im-part of the Bessel-function internal impedance
 * (Ramo, Whinnery & Van Duzer 1994 §5.5); here the blend Y ≈ (1/4)/(1 + (x/2)^4.8)^{1/4.8},
 * which has both exact limits (1/4 for x → 0, 1/(2x) for x → ∞) and stays within 0.7 % of
 * the exact Y everywhere (tests/fixtures/em/internalInductance.json). Y is a small part of L
 * (≈ 1/4 against ln(8a/r) − 2 ≈ 3–6), so this costs < 0.1 % of L.
 * @example internalInductanceFactor(0) // → 0.25
 */
export function internalInductanceFactor(x: number): number {
  if (!(typeof x === "number" && Number.isFinite(x) && x >= 0)) {
    throw new TanklightInputError([{ path: "x", message: "must be a finite number ≥ 0 (wire radius over skin depth)", value: x }], "internalInductanceFactor");
  }
  return internalInductanceFactorCore(x);
}

/** The unchecked core of {@link internalInductanceFactor} (the own-wire term of every turn). */
function internalInductanceFactorCore(x: number): number {
  return 0.25 / Math.pow(1 + Math.pow(x / 2, Y_BLEND_POWER), 1 / Y_BLEND_POWER);
}

/**
 * Own-wire geometry of a conductor: the radius r and factor Y that enter μ₀a(ln(8a/r) − 2 + Y).
 * Round wire: r = d/2, Y from the skin depth (copper resistivity per IEC 60028 from
 * lib/em/materials.ts). Litz: r = bundle radius, Y = 1/4 (litz keeps the current spread over the
 * bundle — its purpose; an approximation). PCB trace: the geometric mean distance of a rectangle,
 * g = 0.2235(w + t) (Grover 1946, ch. 3, GMD of a rectangle), expressed as r = g·e^{1/4} with Y = 1/4
 * at every frequency (edge crowding in traces not modelled).
 */
export function ownWireGeometry(c: Conductor, frequency?: number): { r: number; Y: number } {
  switch (c.kind) {
    case "round": {
      const r = c.diameter / 2;
      if (frequency === undefined || frequency === 0) return { r, Y: 0.25 };
      const delta = skinDepthCore(frequency, resistivityAt(material(c.material)));
      return { r, Y: internalInductanceFactorCore(r / delta) };
    }
    case "litz":
      return { r: c.outerDiameter / 2, Y: 0.25 };
    case "trace":
      return { r: 0.2235 * (c.width + c.thickness) * Math.exp(0.25), Y: 0.25 };
  }
}

/**
 * Own-wire term of one filament (one turn), H: a circle of radius a,
 * μ₀a[ln(8a/r) − 2 + Y] (Maxwell 1865 for Y = 0; Rosa & Grover 1916 / Grover 1946 for the
 * uniform-current Y = 1/4); a polygon turn, Σ over its segments of the straight-wire partial
 * self-inductance (μ₀/2π)l[ln(2l/r) − 1 + Y] (Grover 1946 ch. 5 eq. 7) plus the Neumann mutual
 * inductances between its own segments (Grover 1946 ch. 6, the method for polygons).
 */
export function ownTurnInductance(f: Filament, r: number, Y: number): number {
  if (f.kind === "circle") {
    return MU0 * f.radius * (Math.log((8 * f.radius) / r) - 2 + Y);
  }
  const pts = f.points;
  const n = pts.length;
  let L = 0;
  for (let i = 0; i < n; i++) {
    const p = pts[i]!, q = pts[(i + 1) % n]!;
    const l = Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]);
    if (l > 0) L += straightWireSelfInductance(l, r, Y);
    for (let j = i + 1; j < n; j++) {
      L += 2 * segmentMutual(p, q, pts[j]!, pts[(j + 1) % n]!);
    }
  }
  return L;
}

/**
 * Self-inductance with its breakdown and warnings; see {@link selfInductance}.
 * @example selfInductanceDetail(roundCoil({ meanRadius: 0.04, turns: 1, wire: { diameter: 1e-3 } })).Y // → 0.25 (uniform current: no frequency given)
 */
export function selfInductanceDetail(coil: Coil, options: SelfInductanceOptions = {}): SelfInductanceDetail {
  const where = "selfInductance";
  checkCoil(coil, "coil", where);
  const o = optionsArg(SelfInductanceOptionsSpec, options, "options", where, (x) => {
    for (const k in x) if (k !== "frequency") return false;
    const f = x["frequency"];
    return f === undefined || (typeof f === "number" && Number.isFinite(f) && f >= 0);
  }) as { frequency?: number };
  return selfInductanceDetailCore(coil, o.frequency);
}

/**
 * {@link selfInductanceDetail} on a checked coil and an SI frequency (or undefined: DC) — the
 * unchecked core for callers that validated already.
 */
export function selfInductanceDetailCore(coil: Coil, f: number | undefined): SelfInductanceDetail {
  const { r, Y } = ownWireGeometry(coil.conductor, f);
  const warnings: string[] = [];
  const fil = coil.filaments.map((x) =>
    x.kind === "circle"
      ? { ...x, axis: normalise(x.axis) }
      : x,
  );
  let own = 0;
  for (const x of fil) {
    own += x.turns * x.turns * ownTurnInductance(x, r, Y);
    if (x.kind === "circle" && x.radius < 5 * r) {
      warnings.push(`a turn of radius ${x.radius} m is less than 5 wire radii: the thin-wire own term μ₀a(ln(8a/r) − 2 + Y) loses accuracy`);
    }
    if (x.turns !== 1) {
      warnings.push(`a filament stands for ${x.turns} turns: its own term counts them as coincident turns (N²·own-turn inductance), an upper estimate`);
    }
  }
  let mutual = 0;
  for (let i = 0; i < fil.length; i++) {
    for (let j = i + 1; j < fil.length; j++) {
      let m: number;
      try {
        m = filamentMutual(fil[i]!, fil[j]!);
      } catch (e) {
        if (!(e instanceof TanklightInputError)) throw e;
        throw new TanklightInputError([{ path: "coil.filaments", message: `filaments ${i} and ${j} intersect: the filament method needs turns that do not touch`, value: `filaments ${i}, ${j}` }], "selfInductance");
      }
      mutual += 2 * fil[i]!.turns * fil[j]!.turns * m;
    }
  }
  return { value: own + mutual, ownTerms: own, mutualTerms: mutual, Y, warnings: [...new Set(warnings)] };
}

function normalise(v: readonly [number, number, number]): [number, number, number] {
  const l = Math.hypot(v[0], v[1], v[2]);
  return [v[0] / l, v[1] / l, v[2] / l];
}

/**
 * Self-inductance of a coil by the filament method: the mutual inductances of all pairs of
 * distinct filaments, L = Σ_{i≠j} NᵢNⱼMᵢⱼ, plus each turn's own-wire term N²·L_own
 * (circles: μ₀a[ln(8a/r) − 2 + Y], Rosa & Grover 1916 / Grover 1946; polygon turns: straight-wire
 * partial inductances plus the Neumann mutuals of their own segments, Grover 1946 ch. 5–6).
 * Y = 1/4 (uniform current) without a frequency; with one, Y follows the skin depth of the
 * conductor's material (round wire; see {@link internalInductanceFactor}), falling towards 0.
 *
 * @param coil a Coil (any builder's output or hand-made filaments).
 * @param options `{ frequency? }`, Hz ≥ 0.
 * @returns L, H.
 * @example selfInductance(roundCoil({ meanRadius: 0.04, turns: 1, wire: { diameter: 1e-3 } })) // → 2.3682e-7 (H; = µ₀·0.04·(ln 640 − 1.75))
 * @see selfInductanceDetail (breakdown, warnings), couplingFactor
 */
export function selfInductance(coil: Coil, options: SelfInductanceOptions = {}): number {
  return selfInductanceDetail(coil, options).value;
}

/** Low-frequency self-inductance of a checked coil, H — the unchecked core of {@link selfInductance}. */
export function selfInductanceCore(coil: Coil): number {
  return selfInductanceDetailCore(coil, undefined).value;
}

/**
 * Shared helpers of the coil builders (lib/em/builders/*): input-issue collection, the
 * placement of round turns in a winding window, rounded-rectangle polygons and the arc length of
 * an Archimedean spiral. Conventions are stated once in docs/methods/coils.md.
 */
import * as z from "../../zod.ts";
import { TanklightInputError, type InputIssue } from "../../errors.ts";
import type { Filament, Vec3 } from "../types.ts";

/** Collects every problem with a builder's input, then throws them together. */
export class IssueList {
  readonly issues: InputIssue[] = [];
  constructor(readonly where: string) {}
  /** Record one problem with one field. */
  add(path: string, message: string, value: unknown, expected?: string): void {
    this.issues.push(expected === undefined ? { path, message, value } : { path, message, value, expected });
  }
  /** Throw a TanklightInputError listing every recorded problem (no-op when there is none). */
  throwIfAny(): void {
    if (this.issues.length > 0) throw new TanklightInputError(this.issues, this.where);
  }
}

/** True when x is a finite integer ≥ 1. */
export function isPositiveInteger(x: number): boolean {
  return Number.isInteger(x) && x >= 1;
}

/** Round a metre value for error messages (6 significant digits, unit m). */
export function metres(x: number): string {
  return `${Number(x.toPrecision(6))} m`;
}

/** Circle filament of one turn in the coil frame, axis +z. */
export function circleTurn(radius: number, z: number): Filament {
  return { kind: "circle", center: [0, 0, z], axis: [0, 0, 1], radius, turns: 1 };
}

/**
 * Vertices of a rectangle with rounded corners, centred on the z axis at height z, traversed
 * counter-clockwise seen from +z (current circulating right-handed about +z, like a circle
 * filament with axis +z). Corners of radius r are replaced by arcs through `cornerSegments`
 * chords (r = 0: one sharp vertex per corner).
 *
 * @param halfWidth half the centreline width along x, m, > 0.
 * @param halfHeight half the centreline height along y, m, > 0.
 * @param r centreline corner radius, m, 0 ≤ r ≤ min(halfWidth, halfHeight).
 * @param z height of the polygon plane, m.
 * @param cornerSegments chords per 90° arc, ≥ 1.
 */
export function roundedRectangle(halfWidth: number, halfHeight: number, r: number, z: number, cornerSegments: number): Vec3[] {
  const points: Vec3[] = [];
  // Corner centres, counter-clockwise starting at the lower right; each arc spans 90°.
  const corners: ReadonlyArray<readonly [number, number, number]> = [
    [halfWidth - r, -halfHeight + r, -Math.PI / 2],
    [halfWidth - r, halfHeight - r, 0],
    [-halfWidth + r, halfHeight - r, Math.PI / 2],
    [-halfWidth + r, -halfHeight + r, Math.PI],
  ];
  for (const [cx, cy, start] of corners) {
    if (r === 0) {
      points.push([cx, cy, z]);
      continue;
    }
    for (let k = 0; k <= cornerSegments; k++) {
      const phi = start + (k / cornerSegments) * (Math.PI / 2);
      points.push([cx + r * Math.cos(phi), cy + r * Math.sin(phi), z]);
    }
  }
  return points;
}

/**
 * Perimeter of a rectangle with rounded corners (centreline), m:
 * 2(2X + 2Y) − (8 − 2π)r for half-dimensions X, Y and corner radius r.
 * @example roundedRectanglePerimeter(0.01, 0.005, 0) // → 0.06
 */
export function roundedRectanglePerimeter(halfWidth: number, halfHeight: number, r: number): number {
  return 4 * (halfWidth + halfHeight) - (8 - 2 * Math.PI) * r;
}

/** Perimeter of a closed polygon (last vertex joins the first), m. */
export function polygonPerimeter(points: readonly Vec3[]): number {
  let sum = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % points.length]!;
    sum += Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]);
  }
  return sum;
}

/**
 * Arc length of the Archimedean spiral r(θ) = r₀ + bθ, b = pitch/(2π), between radii r₀ and r₁, m.
 * From ds = √(r² + b²) dθ and dr = b dθ:
 *   s = [r√(r²+b²) + b² ln(r + √(r²+b²))]_{r₀}^{r₁} / (2b).
 * (Standard calculus; e.g. any table of integrals, ∫√(x²+a²)dx.)
 * @param r0 start radius, m, ≥ 0.
 * @param r1 end radius, m, ≥ r0.
 * @param pitch radial advance per turn, m, > 0.
 * @example archimedeanArcLength(0.01, 0.02, 0.001) // → 0.94248… (≈ 10 turns of mean circumference 2π·0.015 m)
 */
export function archimedeanArcLength(r0: number, r1: number, pitch: number): number {
  const ok = (x: unknown, min: number): boolean => typeof x === "number" && x >= min && x <= 1e6;
  const bad = !ok(r0, 0) ? ["r0", r0, "≥ 0 m"] : !ok(r1, 0) || r1 < r0 ? ["r1", r1, "≥ r0 m"] : !ok(pitch, 1e-12) ? ["pitch", pitch, "> 0 m"] : undefined;
  if (bad !== undefined) {
    throw new TanklightInputError([{ path: bad[0] as string, message: `must be a finite length ${bad[2] as string} and ≤ 1e6 m (pitch ≥ 1e-12 m)`, value: bad[1] }], "archimedeanArcLength");
  }
  const b = pitch / (2 * Math.PI);
  const f = (r: number): number => {
    const h = Math.hypot(r, b);
    return r * h + b * b * Math.log(r + h);
  };
  return (f(r1) - f(r0)) / (2 * b);
}

/**
 * Size limits of the builders: each bounds a count whose memory or time grows with it, and the
 * error states the limit and why.
 */
export const SIZE_LIMITS = {
  /** turns of one coil: one filament per turn, and self-inductance sums turns² filament pairs (10⁸ at the limit, minutes) */
  turns: { max: 10_000, why: "each turn is one filament and self-inductance sums turns² filament pairs" },
  /** layers of a wound coil (no more layers than turns) */
  layers: { max: 10_000, why: "each layer holds at least one turn" },
  /** chords per 90° corner of a rounded rectangle: every field and inductance evaluation pays for each chord */
  cornerSegments: { max: 256, why: "every field and inductance evaluation pays for each chord" },
  /** chords per turn of a spiral polygon */
  segmentsPerTurn: { max: 4096, why: "every field and inductance evaluation pays for each chord" },
  /** vertices of all polygon filaments of one coil together (memory, and time of every evaluation) */
  points: { max: 1_000_000, why: "memory and the time of every field and inductance evaluation grow with the vertex count" },
  /** strands of a litz wire */
  strands: { max: 100_000, why: "beyond it no litz wire is made; the strand model loses meaning" },
} as const;

/**
 * zod schema of a count: a whole number ≥ min (default 1) and, when a limit is named, at most
 * its maximum, with a message that says why.
 * @example count(1, "turns") // rejects 1e9 with "must be a whole number ≥ 1 and ≤ 10000 (each turn is one filament …)"
 */
export function count(min = 1, limit?: keyof typeof SIZE_LIMITS): z.ZodNumber {
  const message = `must be a whole number ≥ ${min}`;
  const base = z.number({ error: message }).int({ error: message }).min(min, { error: message });
  if (limit === undefined) return base;
  const { max, why } = SIZE_LIMITS[limit];
  return base.max(max, { error: `must be a whole number ≥ ${min} and ≤ ${max} (${why})` });
}

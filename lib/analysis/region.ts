/**
 * Regions of token positions (a line, a plane or a volume on an axis-aligned grid) and token
 * orientations (flat, tilted about an axis, or a set of tilts), parsed from user input with
 * units.
 */
import * as z from "../zod.ts";
import { angle, length, parseInput, quantity, unitVector, lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import type { Vec3 } from "../em/types.ts";

const coordinate = lazySchema(() => quantity("length"));

/** One axis of a region: a fixed coordinate, or a range with a number of points or a step. */
export const AxisInput = lazySchema(() => z.union([
  coordinate,
  z.strictObject({
    from: coordinate,
    to: coordinate,
    /** number of grid points including both ends, integer ≥ 2 */
    points: z.number().int().min(2).optional(),
    /** grid step, m (rounded so the points fall on both ends) */
    step: length().optional(),
  }),
]));

/** A region: each of x, y, z is a fixed coordinate or a range; one range is a line, two a plane, three a volume. */
export const RegionInput = lazySchema(() => z.strictObject({ x: AxisInput, y: AxisInput, z: AxisInput }));
/** What coverageMap accepts as a region. */
export type RegionInput = z.input<typeof RegionInput>;

/** One grid axis. */
export interface GridAxis {
  readonly name: "x" | "y" | "z";
  /** coordinates, m */
  readonly values: Float64Array;
  readonly unit: "m";
}

/** A parsed region: the ranged axes in x, y, z order, and the fixed coordinates. */
export interface Region {
  readonly axes: readonly GridAxis[];
  readonly fixed: Readonly<Partial<Record<"x" | "y" | "z", number>>>;
}

/** Parses a region; every axis is a fixed coordinate or a range (from ≠ to). */
export function parseRegion(input: RegionInput, where: string): Region {
  const r = parseInput(RegionInput, input, where);
  const axes: GridAxis[] = [];
  const fixed: Partial<Record<"x" | "y" | "z", number>> = {};
  for (const name of ["x", "y", "z"] as const) {
    const a = r[name];
    if (typeof a === "number") {
      fixed[name] = a;
      continue;
    }
    const span = a.to - a.from;
    if (!(span !== 0) || (a.points === undefined) === (a.step === undefined)) {
      throw new TanklightInputError(
        [{ path: `region.${name}`, message: "a range needs from ≠ to and exactly one of points or step", value: a, expected: "{ from: '-90 mm', to: '90 mm', points: 121 }" }],
        where,
      );
    }
    const n = a.points ?? Math.max(2, Math.round(Math.abs(span) / a.step!) + 1);
    const values = new Float64Array(n);
    for (let i = 0; i < n; i++) values[i] = a.from + (span * i) / (n - 1);
    axes.push({ name, values, unit: "m" });
  }
  if (axes.length === 0) {
    throw new TanklightInputError([{ path: "region", message: "needs at least one ranged axis (a line, plane or volume)", value: input }], where);
  }
  return { axes, fixed };
}

/** A tilt of the token: its axis turned by `tilt` about the direction `about` (default the x axis). */
export const TiltInput = lazySchema(() => z.strictObject({ tilt: angle(), about: unitVector().optional() }));
/** Orientation: flat (omit), one tilt, or several (the worst counts at each point). */
export const OrientationInput = lazySchema(() => z.union([TiltInput, z.array(TiltInput).min(1)]));
/** What coverageMap and findRange accept as an orientation. */
export type OrientationInput = z.input<typeof OrientationInput>;

/**
 * The token axes of an orientation: [0, 0, 1] turned by each tilt (Rodrigues' rotation formula).
 * @example tokenAxes({ tilt: "90 deg", about: [1, 0, 0] }, "f") // → [[0, -1, 6.1e-17]]
 */
export function tokenAxes(input: OrientationInput | undefined, where: string): Vec3[] {
  if (input === undefined) return [[0, 0, 1]];
  const parsed = parseInput(OrientationInput, input, where);
  const list = Array.isArray(parsed) ? parsed : [parsed];
  return list.map((t) => rotateZ(t.tilt, (t.about as Vec3 | undefined) ?? [1, 0, 0]));
}

/** [0, 0, 1] rotated by angle θ about the unit vector k: v cosθ + (k × v) sinθ + k (k·v)(1 − cosθ). */
function rotateZ(theta: number, k: Vec3): Vec3 {
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  const [kx, ky, kz] = k;
  // v = ez: k × v = (ky, −kx, 0), k·v = kz
  return [ky * s + kx * kz * (1 - c), -kx * s + ky * kz * (1 - c), c + kz * kz * (1 - c)];
}

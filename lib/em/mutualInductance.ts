/**
 * Mutual inductance and coupling factor of two coils in any poses (filament method).
 */
import { TanklightInputError } from "../errors.ts";
import { checkCoil, checkPose } from "./inputs.ts";
import { filamentMutual, filamentProbe } from "./filamentMutual.ts";
import { poseFrame, filamentToWorld } from "./frames.ts";
import { selfInductanceCore } from "./selfInductance.ts";
import type { Coil, Conductor, Pose } from "./types.ts";

/** Outcome of {@link mutualInductanceChecked}. */
export interface MutualInductanceResult {
  /** M, H (finite) */
  readonly value: number;
  /** smallest distance found between filaments of the two coils, m */
  readonly minFilamentDistance: number;
  /** physically doubtful conditions, e.g. overlapping conductors */
  readonly warnings: readonly string[];
}

/** Bare conductor radius used for overlap checks, m (trace: half its width). */
export function conductorRadius(c: Conductor): number {
  switch (c.kind) {
    case "round":
      return c.diameter / 2;
    case "litz":
      return c.outerDiameter / 2;
    case "trace":
      return c.width / 2;
  }
}

/**
 * Mutual inductance with the overlap check reported instead of thrown: the filament sum
 * M = Σᵢ Σⱼ Nᵢ Nⱼ M(fᵢ, fⱼ) over the filaments of a (turn weights Nᵢ) and of b, both carried
 * into the world by their poses; and a warning where filaments of the two coils come closer
 * than the sum of their bare conductor radii (the conductors would overlap — a token
 * intersecting the transmitter's winding). The value stays finite unless two filaments
 * actually touch (then TanklightInputError).
 *
 * @returns `{ value (H), minFilamentDistance (m), warnings }`.
 * @example mutualInductanceChecked(tx, { position: [0, 0, 0] }, token, { position: [0, 0, 0.03] }).value // → 5.5375e-7 (H; tx, token of docs/methods/em.md)
 */
export function mutualInductanceChecked(a: Coil, poseA: Pose, b: Coil, poseB: Pose): MutualInductanceResult {
  return mutualInductanceAt(a, poseA, b, poseB, "mutualInductance");
}

/** {@link mutualInductanceChecked} with its inputs checked under the public function's name `where`. */
function mutualInductanceAt(a: Coil, poseA: Pose, b: Coil, poseB: Pose, where: string): MutualInductanceResult {
  checkCoil(a, "a", where);
  checkCoil(b, "b", where);
  const fa = poseFrame(checkPose(poseA, "poseA", where), where, "poseA");
  const fb = poseFrame(checkPose(poseB, "poseB", where), where, "poseB");
  const wa = a.filaments.map((f) => filamentToWorld(f, fa));
  const wb = b.filaments.map((f) => filamentToWorld(f, fb));
  let sum = 0;
  let min2 = Infinity;
  const probe = filamentProbe();
  for (let i = 0; i < wa.length; i++) {
    for (let j = 0; j < wb.length; j++) {
      const x = wa[i]!, y = wb[j]!;
      let m: number;
      try {
        m = filamentMutual(x, y, undefined, probe);
      } catch (e) {
        if (!(e instanceof TanklightInputError)) throw e;
        throw new TanklightInputError(
          [{ path: "poseA, poseB", message: `filament ${i} of a and filament ${j} of b intersect at these poses: their filament mutual inductance is not defined`, value: { poseA, poseB } }],
          where,
        );
      }
      sum += x.turns * y.turns * m;
      if (probe.minDistance2 < min2) min2 = probe.minDistance2;
    }
  }
  const minDistance = Math.sqrt(min2);
  const clearance = conductorRadius(a.conductor) + conductorRadius(b.conductor);
  const warnings: string[] = [];
  if (minDistance < clearance) {
    warnings.push(
      `the coils' conductors overlap: filaments come within ${(minDistance * 1e3).toPrecision(3)} mm of each other, less than the sum of the wire radii (${(clearance * 1e3).toPrecision(3)} mm); the filament mutual inductance is not physical there`,
    );
  }
  if (!Number.isFinite(sum)) {
    throw new TanklightInputError([{ path: "poseA, poseB", message: "the coils' filaments touch; no finite mutual inductance", value: [poseA, poseB] }], where);
  }
  return { value: sum, minFilamentDistance: minDistance, warnings };
}

/**
 * Mutual inductance of two coils in any poses: M = Σᵢ Σⱼ Nᵢ Nⱼ M(fᵢ, fⱼ), the filament pairs in
 * world coordinates — circle pairs by the closed-form vector potential integrated over the
 * other circle (Grover 1944; Babic et al. 2010), polygon segments by Neumann's formula with
 * the closed-form segment potential (Hanson & Hirshman 2002). The sign follows the coils'
 * axes (both poses' axes and the filaments' own orientation).
 *
 * @param a first coil (own frame), @param poseA its pose; @param b, @param poseB the second.
 * @returns M, H. Throws TanklightInputError when the conductors overlap (filaments closer than
 *   the sum of the bare wire radii: e.g. a token intersecting the transmitter winding) —
 *   use {@link mutualInductanceChecked} to get the value with a warning instead.
 * @example mutualInductance(tx, { position: [0, 0, 0] }, token, { position: [0, 0, 0.03] }) // → 5.5375e-7 H (tx, token of docs/methods/em.md)
 * @see couplingFactor, couplingEvaluator (fast sweeps)
 */
export function mutualInductance(a: Coil, poseA: Pose, b: Coil, poseB: Pose): number {
  return mutualInductanceStrict(a, poseA, b, poseB, "mutualInductance");
}

function mutualInductanceStrict(a: Coil, poseA: Pose, b: Coil, poseB: Pose, where: string): number {
  const r = mutualInductanceAt(a, poseA, b, poseB, where);
  if (r.warnings.length > 0) {
    throw new TanklightInputError([{ path: "poseA, poseB", message: r.warnings[0]!, value: { poseA, poseB } }], where);
  }
  return r.value;
}

/**
 * Coupling factor k = M/√(L₁L₂) of two coils in any poses (low-frequency self-inductances,
 * selfInductance without frequency). Sign as M.
 * @returns k, dimensionless, |k| < 1. Throws like {@link mutualInductance} on overlap.
 * @example couplingFactor(tx, { position: [0, 0, 0] }, token, { position: [0.02, 0, 0.03], axis: [Math.sin(π/6), 0, Math.cos(π/6)] }) // → 0.0151 (docs/methods/em.md)
 */
export function couplingFactor(a: Coil, poseA: Pose, b: Coil, poseB: Pose): number {
  const M = mutualInductanceStrict(a, poseA, b, poseB, "couplingFactor");
  return M / Math.sqrt(selfInductanceCore(a) * selfInductanceCore(b));
}

/**
 * The fast path of couplingEvaluator for coils with straight conductors (rectangular loops and
 * spirals, PCB traces, any polygon): closed-form segment formulas, the round coil lumped into
 * representative loops, an error estimate, and `false` where the caller must take the exact
 * filament sum.
 */
import { ringResult, ringSegmentsIntegral, type RingResult } from "./circlePolygonMutual.ts";
import { packPolygons, packedPolygonMutual, SEG_STRIDE } from "./straightMutual.ts";
import { coaxialTurns, groupLevels, momentLumps, type Lumps } from "./turnLumps.ts";
import type { Frame } from "./frames.ts";
import type { Coil, Filament } from "./types.ts";

/** One evaluation of the fast path (a workspace the caller passes in). */
export interface PolygonCouplingResult {
  /** M, H */
  mutual: number;
  /** error estimate of M, H */
  error: number;
  /** "lumped" (representative loops) or "exact" (every turn, closed-form segments) */
  method: "lumped" | "exact";
  /** smallest squared distance between the coils' filaments seen, m² */
  minDist2: number;
}

/** The fast path configured for one coil pair. */
export interface PolygonCoupling {
  /**
   * M at the given frames into `out`; returns false (out untouched) where the fast path cannot
   * resolve the pose (a receiver turn grazing a wire, overlapping segments): use the exact sum.
   */
  evaluate(fTx: Frame, fRx: Frame, out: PolygonCouplingResult): boolean;
}

/** Safety factor on the lumping error estimate (as couplingEvaluator's). */
const LUMP_SAFETY = 3;
/** Lumps are trusted only while the nearest wire is farther than GUARD × the lumped coil's extent. */
const GUARD = 2;
/** Relative error of the closed-form segment sums (rounding, and the 1e-10 adaptive band). */
const CLOSED_FORM_RTOL = 1e-9;

const isPath = (f: Filament): boolean => f.kind === "path";

/** R_aᵀ·R_b (row-major) and R_aᵀ(p_b − p_a): frame b's coordinates in frame a. */
function relative(fa: Frame, fb: Frame, rot: Float64Array, off: Float64Array): void {
  const A = fa.R, B = fb.R;
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) rot[3 * i + j] = A[i]! * B[j]! + A[3 + i]! * B[3 + j]! + A[6 + i]! * B[6 + j]!;
  }
  const dx = fb.position[0] - fa.position[0], dy = fb.position[1] - fa.position[1], dz = fb.position[2] - fa.position[2];
  for (let i = 0; i < 3; i++) off[i] = A[i]! * dx + A[3 + i]! * dy + A[6 + i]! * dz;
}

/** Squared distance between segments p₁ + s·ŝ₁ (0 ≤ s ≤ l) and p₂ + t·ŝ₂ (0 ≤ t ≤ m) of packed sets. */
function segmentDistance2(a: Float64Array, i: number, b: Float64Array, j: number): number {
  const o = i * SEG_STRIDE, k = j * SEG_STRIDE;
  const l = a[o + 6]!, m = b[k + 6]!;
  const ux = a[o + 3]!, uy = a[o + 4]!, uz = a[o + 5]!, vx = b[k + 3]!, vy = b[k + 4]!, vz = b[k + 5]!;
  const wx = a[o]! - b[k]!, wy = a[o + 1]! - b[k + 1]!, wz = a[o + 2]! - b[k + 2]!;
  const c = ux * vx + uy * vy + uz * vz;
  const d = ux * wx + uy * wy + uz * wz, e = vx * wx + vy * wy + vz * wz;
  const den = 1 - c * c;
  // closest points of the lines, clamped to the segments (then re-clamped for the other)
  let s = den > 1e-14 ? (c * e - d) / den : 0;
  s = Math.min(l, Math.max(0, s));
  let t = Math.min(m, Math.max(0, e + s * c));
  s = Math.min(l, Math.max(0, t * c - d));
  t = Math.min(m, Math.max(0, e + s * c));
  const rx = wx + s * ux - t * vx, ry = wy + s * uy - t * vy, rz = wz + s * uz - t * vz;
  return rx * rx + ry * ry + rz * rz;
}

/**
 * The fast path for a coil pair, or undefined when it does not apply (then couplingEvaluator
 * takes the exact sum at every pose). It applies when one coil is all polygons and the other is
 * all polygons, or all coaxial circles (any roundCoil, solenoid or circular flatSpiral) no larger
 * than the polygon coil (a round token over a rectangular board; not a large round pad under a
 * small rectangular token, which keeps the exact sum).
 *
 * Polygon–polygon: the closed-form segment-pair sum (straightMutual.ts) with the receiver's
 * segments carried into the transmitter's frame — exact to rounding, no lumping needed.
 * Round–polygon: in the polygon coil's frame, the round coil's turns lumped into representative
 * loops (order 0: one loop at the means of r² and z; order 1: the tensor product of two-point
 * Gauss rules in r² and z, turnLumps.ts), each loop integrated through the polygons' closed-form segment vector
 * potential by the periodic trapezoidal rule (circlePolygonMutual.ts). Lumping error estimate:
 * 3·(extent/D)²·|M₁ − M₀| (D the closest approach of a node to a wire) plus the quadrature
 * estimates; accepted when below max(relTol·|M|, absTol) and D > 2 extents. Otherwise the round
 * coil is refined as couplingEvaluator refines a receiver (bisection tree of turn groups, down to
 * one loop per turn), and where a loop grazes a wire the caller's exact sum takes over.
 *
 * @param tx, rx the coils (own frames). @param relTol relative target of M. @param absTol
 *   absolute floor, H (undefined: 1e-2·relTol·|M| with the receiver at the transmitter's centre).
 */
export function polygonCoupling(tx: Coil, rx: Coil, relTol: number, absTol: number | undefined): PolygonCoupling | undefined {
  // One function on purpose (≈ 140 lines): a factory whose closures share the carried segments, the lump tables and the
  // scratch of every pose, as couplingEvaluator's do.
  const txPaths = tx.filaments.every(isPath);
  const rxPaths = rx.filaments.every(isPath);
  const rot = new Float64Array(9), off = new Float64Array(3);
  let floor = absTol ?? 0;

  if (txPaths && rxPaths) {
    const a = packPolygons(tx.filaments as readonly Extract<Filament, { kind: "path" }>[]);
    const own = packPolygons(rx.filaments as readonly Extract<Filament, { kind: "path" }>[]);
    const moved = new Float64Array(own.length);
    const n = own.length / SEG_STRIDE, na = a.length / SEG_STRIDE;
    const core: PolygonCoupling = {
      evaluate(fTx, fRx, out) {
        relative(fTx, fRx, rot, off);
        for (let k = 0; k < n; k++) {
          const o = k * SEG_STRIDE;
          for (let i = 0; i < 3; i++) {
            moved[o + i] = rot[3 * i]! * own[o]! + rot[3 * i + 1]! * own[o + 1]! + rot[3 * i + 2]! * own[o + 2]! + off[i]!;
            moved[o + 3 + i] = rot[3 * i]! * own[o + 3]! + rot[3 * i + 1]! * own[o + 4]! + rot[3 * i + 2]! * own[o + 5]!;
          }
          moved[o + 6] = own[o + 6]!;
          moved[o + 7] = own[o + 7]!;
        }
        const m = packedPolygonMutual(a, moved);
        if (!Number.isFinite(m)) return false;
        let min2 = Infinity;
        for (let i = 0; i < na; i++) for (let j = 0; j < n; j++) min2 = Math.min(min2, segmentDistance2(a, i, moved, j));
        out.mutual = m;
        out.error = CLOSED_FORM_RTOL * Math.abs(m);
        out.method = "exact";
        out.minDist2 = min2;
        return true;
      },
    };
    return core;
  }

  // one coil of polygons, the other of coaxial circles: work in the polygon coil's frame
  const ringIsRx = txPaths;
  const ringCoil = ringIsRx ? rx : tx;
  const segCoil = ringIsRx ? tx : rx;
  if (!segCoil.filaments.every(isPath)) return undefined;
  const turns = coaxialTurns(ringCoil.filaments);
  if (turns === undefined) return undefined;
  const segs = packPolygons(segCoil.filaments as readonly Extract<Filament, { kind: "path" }>[]);
  // the ring rule samples the round coil's turns; it is reliable when they are small against the
  // polygons (a token over a board). A round coil larger than the polygon coil's half-diagonal
  // (a round pad under a small rectangular token) would need dense nodes near the token: exact sum.
  let half = 0;
  for (let k = 0; k < segs.length; k += SEG_STRIDE) half = Math.max(half, Math.hypot(segs[k]!, segs[k + 1]!));
  if (Math.max(...turns.map((t) => t.r)) > half) return undefined;
  const levels = groupLevels(turns);
  const l0 = levels[0]!;
  const l1 = momentLumps(turns);
  const weight = Math.abs(l0.w[0]!);
  const qtol = 0.1 * relTol;
  const ring: RingResult = ringResult();
  // ring coil's origin and axis in the polygon coil's frame (set per pose)
  let ox = 0, oy = 0, oz = 0, nx = 0, ny = 0, nz = 1;
  const sum = { m: 0, err: 0, coarseErr: 0, minD2: Infinity, ok: true };
  const rings = (lumps: Lumps, maxNodes?: number): void => {
    let m = 0, err = 0, coarseErr = 0, minD2 = Infinity;
    const ringFloor = floor / weight;
    for (let k = 0; k < lumps.r.length; k++) {
      const h = lumps.z[k]!;
      ringSegmentsIntegral(segs, ox + h * nx, oy + h * ny, oz + h * nz, nx, ny, nz, lumps.r[k]!, qtol, ringFloor, ring, maxNodes);
      if (!ring.converged) { sum.ok = false; return; }
      m += lumps.w[k]! * ring.value;
      err += Math.abs(lumps.w[k]!) * ring.error;
      coarseErr += Math.abs(lumps.w[k]! * (ring.value - ring.coarse));
      if (ring.minDist2 < minD2) minD2 = ring.minDist2;
    }
    sum.m = m; sum.err = err; sum.coarseErr = coarseErr; sum.minD2 = minD2; sum.ok = true;
  };
  const place = (fTx: Frame, fRx: Frame): void => {
    if (ringIsRx) relative(fTx, fRx, rot, off);
    else relative(fRx, fTx, rot, off);
    ox = off[0]!; oy = off[1]!; oz = off[2]!;
    nx = rot[2]!; ny = rot[5]!; nz = rot[8]!;
  };
  const accept = (e: number, m: number): boolean => e <= Math.max(relTol * Math.abs(m), floor);

  const core: PolygonCoupling = {
    evaluate(fTx, fRx, out) {
      place(fTx, fRx);
      // order 1 and order 0 lumps
      rings(l1);
      if (!sum.ok) return false;
      const m1 = sum.m, e1 = sum.err, e8 = sum.coarseErr;
      let minD2 = sum.minD2;
      const guarded = minD2 > GUARD * GUARD * l0.extent * l0.extent;
      // far from every wire the lumping estimate is small whatever M₀ is (|M₁ − M₀| ≤ 2|M₁| + e8):
      // accept without the order-0 rings
      const shrink1 = Math.min(1, (LUMP_SAFETY * l0.extent * l0.extent) / minD2);
      const bound = (2 * Math.abs(m1) + e8 + e1) * shrink1 + e1;
      if (guarded && accept(bound, m1)) {
        out.mutual = m1; out.error = bound; out.method = "lumped"; out.minDist2 = minD2;
        return true;
      }
      // order 0 only feeds the lumping estimate, scaled by 3(extent/D)² ≪ 1: the fixed 8-node
      // rule, whose error is taken as that of the order-1 rings at 8 nodes (|M₁ − M₁(8 nodes)| + e1)
      rings(l0, 8);
      if (!sum.ok) return false;
      const m0 = sum.m;
      if (sum.minD2 < minD2) minD2 = sum.minD2;
      const D2 = minD2;
      const shrink = Math.min(1, (LUMP_SAFETY * l0.extent * l0.extent) / D2);
      const eLump = (Math.abs(m1 - m0) + e8 + e1) * shrink;
      if (D2 > GUARD * GUARD * l0.extent * l0.extent && accept(eLump + e1, m1)) {
        out.mutual = m1; out.error = eLump + e1; out.method = "lumped"; out.minDist2 = minD2;
        return true;
      }
      // refine the round coil group by group; the last level is one loop per turn
      let prev = m0;
      for (let l = 1; l < levels.length; l++) {
        const lv = levels[l]!;
        rings(lv);
        if (!sum.ok) return false;
        const last = l === levels.length - 1;
        const e = last ? sum.err : Math.abs(sum.m - prev) + sum.err;
        if ((last || sum.minD2 > GUARD * GUARD * lv.extent * lv.extent) && (last || accept(e, sum.m))) {
          out.mutual = sum.m; out.error = e; out.method = last ? "exact" : "lumped"; out.minDist2 = sum.minD2;
          return true;
        }
        prev = sum.m;
      }
      // a single-turn round coil: level 0 is already one loop per turn
      if (levels.length === 1) {
        out.mutual = m0; out.error = sum.err; out.method = "exact"; out.minDist2 = minD2;
        return true;
      }
      return false;
    },
  };
  if (absTol === undefined) {
    const centre: Frame = { R: new Float64Array([1, 0, 0, 0, 1, 0, 0, 0, 1]), position: [0, 0, 0] };
    const probe: PolygonCouplingResult = { mutual: 0, error: 0, method: "exact", minDist2: 0 };
    if (core.evaluate(centre, centre, probe)) floor = 1e-2 * relTol * Math.abs(probe.mutual);
  }
  return core;
}

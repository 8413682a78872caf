/**
 * The peer the coupling-map benchmark measures the library against: the same 121 × 61 map
 * written the way a practitioner would write it without tanklight — straightforward
 * vectorised array code over every filament pair at once. Not part of the library.
 *
 * Per pose: the token's turns (radius b, height z_g) are sampled at N equally spaced angles
 * (the periodic trapezoidal rule); at every node and for every transmitter turn (radius a,
 * height z_f) the textbook vector potential of a circular filament
 *   A_φ = (μ₀/(π k))·√(a/ρ)·[(1 − k²/2)K(k²) − E(k²)],   k² = 4aρ/((a + ρ)² + Δz²)
 * (Smythe 1950 §7.10) is evaluated with K and E computed on whole Float64Arrays by the AGM
 * (sweeps over the whole array until every entry has converged), and M = Σ_pairs ∮ A_φ (φ̂·dl).
 * Error control: N doubles (8, 16, … 4096) until |M_2N − M_N| ≤ 0.1·√(0.1·relTol)·|M_2N|
 * — the acceptance rule of the library's ring quadrature.
 *
 * Plain TypeScript with no imports, so that a fresh process can run it without tanklight.
 */

/** μ₀, N/A² (CODATA 2018). */
const MU0 = 1.25663706212e-6;
/** AGM sweeps over the whole array stop when every c_n/a_n < 1e-9 (at most this many). */
const AGM_MAX_SWEEPS = 30;
/** Most trapezoidal nodes per turn. */
const MAX_NODES = 4096;

/** Turns of one coil as parallel arrays (radius m, height m, turns). */
export interface PeerTurns {
  readonly r: Float64Array;
  readonly z: Float64Array;
  readonly w: Float64Array;
}

/** Scratch arrays sized for `size` pair·node entries. */
interface Work {
  sum: number;
  abs: number;
  /** smallest and largest squared node-to-wire distance so far (this pose) */
  minA2: number;
  maxA2: number;
  cos: Float64Array;
  sin: Float64Array;
  m: Float64Array;
  a: Float64Array;
  b: Float64Array;
  s: Float64Array;
  rho: Float64Array;
  geo: Float64Array;
  pre: Float64Array;
}

function work(size: number): Work {
  return {
    sum: 0,
    abs: 0,
    minA2: Infinity,
    maxA2: 0,
    cos: new Float64Array(MAX_NODES / 2),
    sin: new Float64Array(MAX_NODES / 2),
    m: new Float64Array(size),
    a: new Float64Array(size),
    b: new Float64Array(size),
    s: new Float64Array(size),
    rho: new Float64Array(size),
    geo: new Float64Array(size),
    pre: new Float64Array(size),
  };
}

/**
 * Σ over all pairs and over the `count` angles t_j = t0 + j·dt of A_φ·(φ̂·dl/dt)·w_f·w_g, for
 * the token at lateral offset x and height h above the transmitter's plane.
 */
function sumNodes(tx: PeerTurns, rx: PeerTurns, x: number, h: number, t0: number, dt: number, count: number, wk: Work): void {
  const nf = tx.r.length, ng = rx.r.length;
  const size = nf * ng * count;
  const { m, a, b, s, rho, geo, pre, cos, sin } = wk;
  for (let j = 0; j < count; j++) {
    cos[j] = Math.cos(t0 + j * dt);
    sin[j] = Math.sin(t0 + j * dt);
  }
  // geometry, vectorised over (f, g, j)
  let q = 0;
  let minA2 = wk.minA2, maxA2 = wk.maxA2;
  for (let f = 0; f < nf; f++) {
    const af = tx.r[f]!, zf = tx.z[f]!;
    for (let g = 0; g < ng; g++) {
      const bg = rx.r[g]!, dz = h + rx.z[g]! - zf, wfg = tx.w[f]! * rx.w[g]!;
      for (let j = 0; j < count; j++, q++) {
        const c = cos[j]!, sn = sin[j]!;
        const px = x + bg * c, py = bg * sn;
        const r = Math.sqrt(px * px + py * py);
        rho[q] = r;
        const al2 = (af - r) * (af - r) + dz * dz;
        if (al2 < minA2) minA2 = al2;
        if (al2 > maxA2) maxA2 = al2;
        const beta2 = (af + r) * (af + r) + dz * dz;
        m[q] = (4 * af * r) / beta2;
        geo[q] = (wfg * bg * (bg + x * c)) / r; // φ̂·dl/dt
        pre[q] = (MU0 / Math.PI) * Math.sqrt(af / r);
      }
    }
  }
  // K and E on the whole array: AGM with a₀ = 1, b₀ = √(1 − m), s = Σ 2^{n−1} c_n²
  for (let i = 0; i < size; i++) {
    a[i] = 1;
    b[i] = Math.sqrt(1 - m[i]!);
    s[i] = 0.5 * m[i]!;
  }
  let w = 0.5;
  for (let sweep = 0; sweep < AGM_MAX_SWEEPS; sweep++) {
    w *= 2;
    let worst = 0;
    for (let i = 0; i < size; i++) {
      const ai = a[i]!, bi = b[i]!;
      const c = 0.5 * (ai - bi);
      a[i] = 0.5 * (ai + bi);
      b[i] = Math.sqrt(ai * bi);
      s[i]! += w * c * c;
      if (c > worst * ai) worst = c / ai;
    }
    if (worst < 1e-9) break; // the next sweep changes nothing at double precision
  }
  let sum = 0, abs = 0;
  for (let i = 0; i < size; i++) {
    const K = Math.PI / (2 * a[i]!);
    const E = K * (1 - s[i]!);
    const k = Math.sqrt(m[i]!);
    const v = (pre[i]! / k) * ((1 - 0.5 * m[i]!) * K - E) * geo[i]!;
    sum += v;
    abs += Math.abs(v);
  }
  wk.sum = sum;
  wk.abs = abs;
  wk.minA2 = minA2;
  wk.maxA2 = maxA2;
}

/**
 * M (H) of the token `rx` at (x, 0, h) over the transmitter `tx` at the origin, both axes +z,
 * by the error-controlled trapezoidal rule of the header.
 */
export function peerMutual(tx: PeerTurns, rx: PeerTurns, x: number, h: number, relTol: number, absTol: number, wk: Work): number {
  const tol = 0.1 * Math.sqrt(0.1 * relTol);
  let n = 8;
  let bMax = 0;
  for (const b of rx.r) bMax = Math.max(bMax, b);
  wk.minA2 = Infinity;
  wk.maxA2 = 0;
  sumNodes(tx, rx, x, h, 0, (2 * Math.PI) / n, n, wk);
  let sum = wk.sum, abs = wk.abs;
  let prev = ((2 * Math.PI) / n) * sum;
  for (;;) {
    // the N new nodes of the 2N rule sit halfway between the old ones
    sumNodes(tx, rx, x, h, Math.PI / n, (2 * Math.PI) / n, n, wk);
    sum += wk.sum;
    abs += wk.abs;
    n *= 2;
    const v = ((2 * Math.PI) / n) * sum;
    // the library's acceptance rule: relative to |M|, to 1e-3 of the absolute sum, or to absTol
    const scale = Math.max(Math.abs(v), 1e-3 * ((2 * Math.PI) / n) * abs, absTol);
    // and only once the node spacing resolves the closest approach to a wire (a narrow peak
    // can hide between the nodes of both rules) — the library's guard as well
    const resolved = wk.maxA2 <= 4 * wk.minA2 || n * n * wk.minA2 >= 4 * Math.PI * Math.PI * bMax * bMax;
    if ((Math.abs(v - prev) <= tol * scale && resolved) || n >= MAX_NODES) return v;
    prev = v;
  }
}

/**
 * The map: M at every (x, h) of the grid, H, as a Float64Array in row order (h outer).
 * @param xs lateral offsets, m; @param hs heights, m.
 */
export function peerMap(tx: PeerTurns, rx: PeerTurns, xs: readonly number[], hs: readonly number[], relTol: number): Float64Array {
  const out = new Float64Array(xs.length * hs.length);
  const wk = work((tx.r.length * rx.r.length * MAX_NODES) / 2);
  // absolute floor as the library sets it: 1e-2·relTol·M₀, M₀ with the token at the centre
  const m0 = Math.abs(peerMutual(tx, rx, 0, 0.002, relTol, 0, wk));
  const absTol = 1e-2 * relTol * m0;
  let k = 0;
  for (const h of hs) for (const x of xs) out[k++] = peerMutual(tx, rx, x, h, relTol, absTol, wk);
  return out;
}

/** Turns of a coil's coaxial circle filaments as the peer takes them. */
export function peerTurns(filaments: readonly ({ kind: "circle"; radius: number; center: readonly number[]; turns: number } | { kind: string })[]): PeerTurns {
  const circles = filaments.filter((f): f is { kind: "circle"; radius: number; center: readonly number[]; turns: number } => f.kind === "circle");
  return {
    r: Float64Array.from(circles, (f) => f.radius),
    z: Float64Array.from(circles, (f) => f.center[2]!),
    w: Float64Array.from(circles, (f) => f.turns),
  };
}

/**
 * Numerical quadrature: Gauss–Legendre rules of any order (cached) and adaptive
 * Gauss–Kronrod 7/15 with absolute and relative tolerance.
 *
 * Methods: Gauss–Legendre nodes by Newton's iteration on P_n (Abramowitz & Stegun 1964,
 * §25.4.29; Numerical Recipes §4.6); Kronrod 7/15 nodes and weights as tabulated by
 * Piessens et al., QUADPACK (1983), routine QK15.
 */

/** Nodes and weights of an n-point Gauss–Legendre rule on [−1, 1]. */
export interface GaussRule {
  readonly nodes: Float64Array;
  readonly weights: Float64Array;
}

const ruleCache = new Map<number, GaussRule>();

/**
 * Gauss–Legendre nodes and weights on [−1, 1], exact for polynomials of degree ≤ 2n − 1.
 *
 * @param n number of points, integer ≥ 1. Results are cached per n.
 * @example gaussLegendre(2).nodes // → [−0.5773502691896257, 0.5773502691896257]
 */
export function gaussLegendre(n: number): GaussRule {
  if (!Number.isInteger(n) || n < 1) {
    throw new RangeError(`gaussLegendre: n must be an integer ≥ 1 (got ${n})`);
  }
  const cached = ruleCache.get(n);
  if (cached) return cached;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  const half = Math.floor((n + 1) / 2);
  for (let i = 0; i < half; i++) {
    // Initial guess (A&S 22.16.6 asymptotics), then Newton on P_n.
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      const pn = n === 1 ? x : p1;
      const pnm1 = n === 1 ? 1 : p0;
      dp = (n * (x * pn - pnm1)) / (x * x - 1);
      const dx = pn / dp;
      x -= dx;
      if (Math.abs(dx) <= 1e-16 * Math.max(1, Math.abs(x))) {
        // recompute derivative at the converged node
        break;
      }
    }
    // Derivative at the final x for the weight (A&S 25.4.29).
    let p0 = 1;
    let p1 = x;
    for (let k = 2; k <= n; k++) {
      const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
      p0 = p1;
      p1 = p2;
    }
    dp = n === 1 ? 1 : (n * (x * p1 - p0)) / (x * x - 1);
    const w = 2 / ((1 - x * x) * dp * dp);
    nodes[i] = -x;
    nodes[n - 1 - i] = x;
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  if (n % 2 === 1) nodes[(n - 1) / 2] = 0;
  const rule = { nodes, weights };
  ruleCache.set(n, rule);
  return rule;
}

/**
 * ∫_a^b f(x) dx by an n-point Gauss–Legendre rule.
 * @example integrateGaussLegendre(x => x ** 3, 0, 1, 2) // → 0.25 (exact: degree 3 ≤ 2n − 1)
 */
export function integrateGaussLegendre(f: (x: number) => number, a: number, b: number, n: number): number {
  const { nodes, weights } = gaussLegendre(n);
  const half = 0.5 * (b - a);
  const mid = 0.5 * (a + b);
  let s = 0;
  for (let i = 0; i < n; i++) s += weights[i]! * f(mid + half * nodes[i]!);
  return s * half;
}

// QUADPACK QK15 abscissae (Kronrod nodes; odd indices are the 7-point Gauss nodes).
const XGK = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
  0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
  0.58608723546769113029414483825873, 0.405845151377397166906606412076961,
  0.207784955007898467600689403773245, 0.0,
];
const WGK = [
  0.02293532201052922496373200805897, 0.063092092629978553290700663189204,
  0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
  0.16900472663926790282658342659855, 0.190350578064785409913256402421014,
  0.204432940075298892414161999234649, 0.209482141084727828012999174891714,
];
const WG = [
  0.129484966168869693270611432679082, 0.27970539148927666790146777142378,
  0.381830050505118944950369775488975, 0.417959183673469387755102040816327,
];

/** Outcome of an adaptive integration. */
export interface IntegrationResult {
  /** the integral's estimate */
  readonly value: number;
  /** estimated absolute error (|K15 − G7| summed over the final intervals) */
  readonly error: number;
  /** number of integrand evaluations */
  readonly evaluations: number;
}

/** Options for {@link integrateAdaptive}. */
export interface AdaptiveOptions {
  /** absolute error target, default 1e-12 */
  readonly absTol?: number;
  /** relative error target, default 1e-10 */
  readonly relTol?: number;
  /** maximum number of subintervals, default 2000 */
  readonly maxIntervals?: number;
}

function kronrod15(f: (x: number) => number, a: number, b: number): { k: number; g: number } {
  const c = 0.5 * (a + b);
  const h = 0.5 * (b - a);
  const fc = f(c);
  let k = fc * WGK[7]!;
  let g = fc * WG[3]!;
  for (let j = 0; j < 7; j++) {
    const dx = h * XGK[j]!;
    const fs = f(c - dx) + f(c + dx);
    k += WGK[j]! * fs;
    if (j % 2 === 1) g += WG[(j - 1) / 2]! * fs;
  }
  return { k: k * h, g: g * h };
}

/**
 * ∫_a^b f(x) dx by globally adaptive Gauss–Kronrod 7/15 bisection (QUADPACK QAG strategy):
 * always split the interval with the largest error estimate until
 * error ≤ max(absTol, relTol·|value|). Integrable endpoint singularities (log, x^−½) are
 * handled because no node sits on an endpoint.
 *
 * @param f integrand; a, b finite limits.
 * @returns `{ value, error, evaluations }`.
 * @example integrateAdaptive(x => Math.log(x), 0, 1).value // → −1
 */
export function integrateAdaptive(
  f: (x: number) => number,
  a: number,
  b: number,
  options: AdaptiveOptions = {},
): IntegrationResult {
  const absTol = options.absTol ?? 1e-12;
  const relTol = options.relTol ?? 1e-10;
  const maxIntervals = options.maxIntervals ?? 2000;
  if (!Number.isFinite(a) || !Number.isFinite(b)) {
    throw new RangeError(`integrateAdaptive: limits must be finite (got ${a}, ${b})`);
  }
  if (a === b) return { value: 0, error: 0, evaluations: 0 };
  interface Piece { a: number; b: number; value: number; error: number }
  const first = kronrod15(f, a, b);
  const pieces: Piece[] = [{ a, b, value: first.k, error: Math.abs(first.k - first.g) }];
  let evaluations = 15;
  let value = first.k;
  let error = pieces[0]!.error;
  while (error > Math.max(absTol, relTol * Math.abs(value)) && pieces.length < maxIntervals) {
    // take the worst piece
    let worst = 0;
    for (let i = 1; i < pieces.length; i++) if (pieces[i]!.error > pieces[worst]!.error) worst = i;
    const p = pieces[worst]!;
    const mid = 0.5 * (p.a + p.b);
    if (mid <= p.a || mid >= p.b) break; // interval at rounding resolution
    const left = kronrod15(f, p.a, mid);
    const right = kronrod15(f, mid, p.b);
    evaluations += 30;
    const l: Piece = { a: p.a, b: mid, value: left.k, error: Math.abs(left.k - left.g) };
    const r: Piece = { a: mid, b: p.b, value: right.k, error: Math.abs(right.k - right.g) };
    pieces[worst] = l;
    pieces.push(r);
    value = 0;
    error = 0;
    for (const q of pieces) {
      value += q.value;
      error += q.error;
    }
  }
  return { value, error, evaluations };
}

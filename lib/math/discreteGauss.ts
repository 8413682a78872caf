/**
 * Gauss quadrature rules for a discrete measure (a weighted set of points): the p nodes and
 * weights that reproduce Σ wᵢ f(xᵢ) exactly for every polynomial f of degree ≤ 2p − 1.
 *
 * Method: the three-term recurrence of the measure's monic orthogonal polynomials by the
 * discretised Stieltjes procedure (Gautschi 2004, "Orthogonal Polynomials: Computation and
 * Approximation", §2.2.3), the nodes as the eigenvalues of the Jacobi matrix by Sturm-sequence
 * bisection (Wilkinson 1965, §5.37), the weights as Christoffel numbers
 * λⱼ = μ₀ / Σₖ qₖ(xⱼ)² with the orthonormal polynomials qₖ (Gautschi 2004, Thm. 1.46).
 * Points are centred and scaled to [−1, 1] first; p is small (≤ 12) in every use.
 */

/** A quadrature rule: nodes and positive weights (same length). */
export interface DiscreteRule {
  readonly x: Float64Array;
  readonly w: Float64Array;
}

/**
 * The p-point Gauss rule of the discrete measure Σ wᵢ δ(x − xᵢ) (weights > 0). When p is at
 * least the number of distinct points, the measure itself (distinct points, summed weights,
 * ascending) is returned: it is its own exact rule.
 *
 * @param x points (any order, repeats allowed). @param w their weights, > 0. @param p nodes, ≥ 1.
 * @returns `{ x, w }` ascending, Σw equal to the measure's total.
 * @example discreteGaussRule([0, 1, 2, 3], [1, 1, 1, 1], 2).x // → [0.381966, 2.618034] (roots of x² − 3x + 1)
 */
export function discreteGaussRule(x: ArrayLike<number>, w: ArrayLike<number>, p: number): DiscreteRule {
  // distinct points with summed weights
  const order = Array.from({ length: x.length }, (_, i) => i).sort((a, b) => x[a]! - x[b]!);
  const xs: number[] = [];
  const ws: number[] = [];
  for (const i of order) {
    if (xs.length > 0 && xs[xs.length - 1] === x[i]) ws[ws.length - 1]! += w[i]!;
    else { xs.push(x[i]!); ws.push(w[i]!); }
  }
  const n = xs.length;
  if (p >= n) return { x: Float64Array.from(xs), w: Float64Array.from(ws) };
  const lo = xs[0]!, hi = xs[n - 1]!;
  const c = 0.5 * (lo + hi), h = 0.5 * (hi - lo);
  const t = xs.map((v) => (v - c) / h);
  // Stieltjes: α_k = ⟨tπ_k, π_k⟩/⟨π_k, π_k⟩, β_k = ⟨π_k, π_k⟩/⟨π_{k−1}, π_{k−1}⟩
  const alpha = new Float64Array(p);
  const beta = new Float64Array(p); // beta[0] = μ₀
  let prev = new Float64Array(n); // π_{k−1}
  let cur = new Float64Array(n).fill(1); // π_k
  let normPrev = 1;
  for (let k = 0; k < p; k++) {
    let nn = 0, tn = 0;
    for (let i = 0; i < n; i++) { const q = ws[i]! * cur[i]! * cur[i]!; nn += q; tn += q * t[i]!; }
    alpha[k] = tn / nn;
    beta[k] = k === 0 ? nn : nn / normPrev;
    if (k === p - 1) break;
    const next = new Float64Array(n);
    for (let i = 0; i < n; i++) next[i] = (t[i]! - alpha[k]!) * cur[i]! - (k === 0 ? 0 : beta[k]! * prev[i]!);
    prev = cur;
    cur = next;
    normPrev = nn;
  }
  // eigenvalues of the Jacobi matrix (diagonal α, off-diagonal √β_k, k ≥ 1), all in [−1, 1]
  const off = Float64Array.from({ length: p }, (_, k) => (k === 0 ? 0 : Math.sqrt(beta[k]!)));
  /** number of eigenvalues below s (Sturm count of the LDLᵀ pivots) */
  const below = (s: number): number => {
    let count = 0, d = 1;
    for (let k = 0; k < p; k++) {
      d = alpha[k]! - s - (k === 0 ? 0 : (off[k]! * off[k]!) / d);
      if (d === 0) d = -1e-300;
      if (d < 0) count++;
    }
    return count;
  };
  const nodes = new Float64Array(p);
  const weights = new Float64Array(p);
  for (let j = 0; j < p; j++) {
    let a = -1, b = 1; // below(a) ≤ j < below(b)
    for (let it = 0; it < 200 && b - a > 4e-16 * Math.max(1, Math.abs(a)); it++) {
      const mid = 0.5 * (a + b);
      if (below(mid) <= j) a = mid; else b = mid;
    }
    const s = 0.5 * (a + b);
    // Christoffel number: μ₀ / Σ q_k(s)², q_k orthonormal
    let q0 = 0, q1 = 1, sum = 1;
    for (let k = 0; k + 1 < p; k++) {
      const q2 = ((s - alpha[k]!) * q1 - (k === 0 ? 0 : off[k]! * q0)) / off[k + 1]!;
      sum += q2 * q2;
      q0 = q1;
      q1 = q2;
    }
    nodes[j] = c + h * s;
    weights[j] = beta[0]! / sum;
  }
  return { x: nodes, w: weights };
}

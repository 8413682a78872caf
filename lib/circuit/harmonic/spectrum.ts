/**
 * Exact discrete Fourier transforms between N uniform samples of one period and the harmonics
 * 0…H of a real waveform (H small: a direct sum is faster than an FFT here and needs no
 * power-of-two N). Conventions (phasors e^{jhωt}, peak amplitudes):
 *   x(θ) = X₀ + Σ_{h=1}^{H} Re(X_h·e^{jhθ}),  θ_s = 2πs/N,
 *   X₀ = (1/N)·Σ x_s,  X_h = (2/N)·Σ x_s·e^{−jhθ_s}.
 * The analysis is exact (no leakage) for any waveform whose harmonics stay below N/2; above
 * that they alias, which is why harmonic balance oversamples (N ≫ 2H). Only cos and sin of
 * 2πr/N (r = 0…N−1) are tabulated; harmonic h reads them at r = h·s mod N.
 */

/** cos and sin of 2πr/N, r = 0…N−1. */
export interface SpectrumTables {
  readonly samples: number;
  readonly cos: Float64Array;
  readonly sin: Float64Array;
}

/**
 * Tables for transforms with N samples.
 * @example spectrumTables(8).cos[2] // → cos(π/2) ≈ 6.1e-17
 */
export function spectrumTables(samples: number): SpectrumTables {
  const N = samples;
  const both = new Float64Array(2 * N); // one backing store
  const cos = both.subarray(0, N);
  const sin = both.subarray(N);
  for (let r = 0; r < N; r++) {
    const th = (2 * Math.PI * r) / N;
    cos[r] = Math.cos(th);
    sin[r] = Math.sin(th);
  }
  return { samples: N, cos, sin };
}

/**
 * Samples of x(θ) = X₀ + Σ Re(X_h e^{jhθ}) from the coefficient block
 * `coef[off] = X₀, coef[off + 2h − 1] = Re X_h, coef[off + 2h] = Im X_h` (h = 1…H).
 */
export function synthesize(t: SpectrumTables, H: number, coef: Float64Array, off: number, out: Float64Array): void {
  const N = t.samples;
  const c = t.cos;
  const sn = t.sin;
  const x0 = coef[off]!;
  for (let s = 0; s < N; s++) out[s] = x0;
  for (let h = 1; h <= H; h++) {
    const re = coef[off + 2 * h - 1]!;
    const im = coef[off + 2 * h]!;
    if (re === 0 && im === 0) continue;
    const step = h % N;
    let r = 0;
    for (let s = 0; s < N; s++) {
      out[s] = out[s]! + re * c[r]! - im * sn[r]!;
      r += step;
      if (r >= N) r -= N;
    }
  }
}

/** The inverse of {@link synthesize}: harmonics 0…H of the samples x into `coef` at `off`. */
export function analyze(t: SpectrumTables, H: number, x: Float64Array, coef: Float64Array, off: number): void {
  const N = t.samples;
  const c = t.cos;
  const sn = t.sin;
  let s0 = 0;
  for (let s = 0; s < N; s++) s0 += x[s]!;
  coef[off] = s0 / N;
  const k = 2 / N;
  for (let h = 1; h <= H; h++) {
    const step = h % N;
    let r = 0;
    let a = 0;
    let b = 0;
    for (let s = 0; s < N; s++) {
      a += x[s]! * c[r]!;
      b += x[s]! * sn[r]!;
      r += step;
      if (r >= N) r -= N;
    }
    coef[off + 2 * h - 1] = k * a;
    coef[off + 2 * h] = -k * b;
  }
}

/**
 * Two-sided Fourier coefficients γ_d = (1/N)·Σ g_s·e^{−jdθ_s}, d = 0…D, of a sampled
 * function (the "conversion matrix" entries of a time-varying conductance), into re/im.
 */
export function twoSided(t: SpectrumTables, D: number, g: Float64Array, re: Float64Array, im: Float64Array): void {
  const N = t.samples;
  const c = t.cos;
  const sn = t.sin;
  for (let d = 0; d <= D; d++) {
    const step = d % N;
    let r = 0;
    let a = 0;
    let b = 0;
    for (let s = 0; s < N; s++) {
      a += g[s]! * c[r]!;
      b += g[s]! * sn[r]!;
      r += step;
      if (r >= N) r -= N;
    }
    re[d] = a / N;
    im[d] = -b / N;
  }
}

/** Σ_s w_s·cos(kθ_s) (part 0) or −Σ_s w_s·sin(kθ_s) (part 1): a sampled weight against one basis waveform. */
export function project(t: SpectrumTables, w: Float64Array, k: number, part: 0 | 1): number {
  const N = t.samples;
  const tab = part === 0 ? t.cos : t.sin;
  const step = k % N;
  let r = 0;
  let s1 = 0;
  for (let s = 0; s < N; s++) {
    s1 += w[s]! * tab[r]!;
    r += step;
    if (r >= N) r -= N;
  }
  return part === 0 ? s1 : -s1;
}

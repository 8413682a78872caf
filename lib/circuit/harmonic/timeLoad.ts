/**
 * Token loads evaluated in time, for harmonic balance: given the tank voltage at N samples of
 * one period, the current the load draws at each sample, its derivative dI/dV there, and each
 * LED's average and peak current. Memoryless loads (one LED, LED pairs, the bridge) are
 * i(v) pointwise. The half-wave reservoir has memory; it is taken in the same large-reservoir
 * limit as its describing function (lib/circuit/loads/rectifier.ts): the reservoir voltage V_c is
 * constant over the period and set by the charge balance mean(i_D(v − V_c)) = I_LED(V_c), so
 * the load is i(t) = i_D(v(t) − V_c) with V_c depending on the whole waveform — a pointwise
 * derivative plus a rank-one term (see {@link TimeLoad.rank1}).
 */
import type { Junction, Led } from "../loads/led.ts";
import type { TokenLoad } from "../loads/types.ts";
import { JunctionBranch, type StringBranch } from "../loads/halfWave.ts";
import { bridgeBranch, cachedBranch } from "../loads/rectifier.ts";
import { TanklightInputError } from "../../errors.ts";

/** One LED's current over the sampled period. */
export interface LedWaveformSummary {
  readonly label: string;
  /** average current, A */
  readonly current: number;
  /** peak current, A */
  readonly peakCurrent: number;
  /** average current / the LED's rated current */
  readonly relativeBrightness: number;
}

/** A load evaluated on the samples of one period (workspace owned by the load; no allocation per call). */
export interface TimeLoad {
  /**
   * Writes i(v_s) (A) into `i` and dI/dv (S) into `g` for s = 0…N−1. After the call, `rank1`
   * (if present) holds u, w with the full sample-space derivative diag(g) + u·wᵀ.
   */
  evaluate(v: Float64Array, i: Float64Array, g: Float64Array): void;
  readonly rank1?: { readonly u: Float64Array; readonly w: Float64Array };
  /** each LED's average and peak current for the samples `v` */
  leds(v: Float64Array): readonly LedWaveformSummary[];
}

/** A junction's branch (one Lambert W gives current and conductance), shared per junction object. */
function branchOf(j: Junction): JunctionBranch {
  return cachedBranch(j, () => new JunctionBranch(j.is, j.n * j.thermalVoltage, j.rs));
}

function junctionSummary(j: Led, v: Float64Array, sign: number): LedWaveformSummary {
  const br = branchOf(j);
  let s = 0;
  let peak = 0;
  for (let k = 0; k < v.length; k++) {
    const u = sign * v[k]!;
    br.evalAt(u);
    const c = br.i - j.is + j.leakage * u;
    s += c;
    if (c > peak) peak = c;
  }
  const current = s / v.length;
  return { label: j.label, current, peakCurrent: peak, relativeBrightness: current / j.ratedCurrent };
}

/**
 * Junctions across the tank with orientations ±1: i = Σ sign·i_j(sign·v). Each junction is
 * evaluated through its Lambert-W branch (halfWave.ts), i_j = (nV_T/r_s)·W − I_s + g_leak·u,
 * di_j/du = W/(r_s(1 + W)) + g_leak — the same values as Junction.current/conductance, one W each.
 */
function junctionsLoad(parts: readonly { readonly j: Led; readonly sign: 1 | -1 }[]): TimeLoad {
  const brs = parts.map((p) => branchOf(p.j));
  const j0 = parts[0]!.j;
  const b0 = brs[0]!;
  const s0 = parts[0]!.sign;
  const single = parts.length === 1;
  return {
    evaluate(v, i, g) {
      if (single) {
        const is = j0.is;
        const leak = j0.leakage;
        for (let s = 0; s < v.length; s++) {
          const u = s0 * v[s]!;
          b0.evalAt(u);
          i[s] = s0 * (b0.i - is + leak * u);
          g[s] = b0.g + leak;
        }
        return;
      }
      for (let s = 0; s < v.length; s++) {
        let cur = 0;
        let dg = 0;
        for (let k = 0; k < parts.length; k++) {
          const p = parts[k]!;
          const br = brs[k]!;
          const u = p.sign * v[s]!;
          br.evalAt(u);
          cur += p.sign * (br.i - p.j.is + p.j.leakage * u);
          dg += br.g + p.j.leakage;
        }
        i[s] = cur;
        g[s] = dg;
      }
    },
    leds(v) {
      return parts.map((p) => junctionSummary(p.j, v, p.sign));
    },
  };
}

function bridgeLoad(load: Extract<TokenLoad, { kind: "bridge" }>): TimeLoad {
  const br: StringBranch = cachedBranch(load, () => bridgeBranch(load.diode, load.led, load.seriesResistance ?? 0));
  return {
    evaluate(v, i, g) {
      for (let s = 0; s < v.length; s++) {
        const x = v[s]!;
        br.evalAt(Math.abs(x));
        i[s] = x < 0 ? -br.i : br.i;
        g[s] = br.g;
      }
    },
    leds(v) {
      let sum = 0;
      let peak = 0;
      for (let s = 0; s < v.length; s++) {
        br.evalAt(Math.abs(v[s]!));
        sum += br.i;
        if (br.i > peak) peak = br.i;
      }
      const current = sum / v.length;
      return [{ label: load.led.label, current, peakCurrent: peak, relativeBrightness: current / load.led.ratedCurrent }];
    },
  };
}

/**
 * Reservoir rectifier in the large-reservoir limit: V_c from mean(i_D(v − V_c)) = I_LED(V_c)
 * (monotone in V_c; bracketed Newton), then i = i_D(v − V_c). Derivative: δi_s = g_s(δv_s − δV_c)
 * with δV_c = Σ g_s δv_s / (Σ g_s + N·g_LED): rank-one u = −g, w = g/(Σg + N·g_LED).
 */
function reservoirLoad(load: Extract<TokenLoad, { kind: "halfWaveReservoir" }>, n: number): TimeLoad {
  const d = load.diode;
  const led = load.led;
  const br = cachedBranch(load, () => new JunctionBranch(d.is, d.n * d.thermalVoltage, d.rs + (load.seriesResistance ?? 0)));
  const u = new Float64Array(n);
  const w = new Float64Array(n);
  const state = { vc: 0, peak: 0 };
  const diodeCurrent = (x: number): number => {
    br.evalAt(x);
    return br.i - d.is;
  };
  const solveVc = (v: Float64Array): void => {
    let vmax = 0;
    for (let s = 0; s < v.length; s++) vmax = Math.max(vmax, v[s]!);
    // f(V_c) = mean i_D(v − V_c) − I_LED(V_c): falls with V_c; f(0) ≥ 0, f(max(v, 0)) ≤ 0
    const f = (vc: number): { f: number; df: number } => {
      let m = 0;
      let gm = 0;
      for (let s = 0; s < v.length; s++) {
        br.evalAt(v[s]! - vc);
        m += br.i - d.is;
        gm += br.g;
      }
      m /= v.length;
      gm /= v.length;
      return { f: m - led.current(vc), df: -gm - led.conductance(vc) };
    };
    let lo = 0;
    let hi = Math.max(vmax, 0);
    let x = Math.min(Math.max(state.vc, lo), hi);
    for (let it = 0; it < 100; it++) {
      const r = f(x);
      if (r.f > 0) lo = x;
      else hi = x;
      let next = x - r.f / r.df;
      if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
      if (Math.abs(next - x) <= 1e-13 * Math.max(1, Math.abs(x)) || hi - lo <= 1e-14) {
        x = next;
        break;
      }
      x = next;
    }
    state.vc = x;
  };
  return {
    rank1: { u, w },
    evaluate(v, i, g) {
      solveVc(v);
      const vc = state.vc;
      let gs = 0;
      for (let s = 0; s < v.length; s++) {
        br.evalAt(v[s]! - vc);
        i[s] = br.i - d.is;
        g[s] = br.g;
        gs += br.g;
      }
      const den = gs + v.length * led.conductance(vc);
      for (let s = 0; s < v.length; s++) {
        u[s] = -g[s]!;
        w[s] = g[s]! / den;
      }
    },
    leds(v) {
      solveVc(v);
      const current = led.current(state.vc);
      let peak = 0;
      for (let s = 0; s < v.length; s++) peak = Math.max(peak, diodeCurrent(v[s]! - state.vc));
      return [{ label: led.label, current, peakCurrent: Math.max(peak, current), relativeBrightness: current / led.ratedCurrent }];
    },
  };
}

/**
 * The time-domain view of a token load for harmonic balance.
 * @param load a {@link TokenLoad}; a resistor is linear and never needs this (the solver folds it
 *   into the network), but it is accepted.
 * @param samples samples per period N (workspace size), integer ≥ 4.
 * @returns a {@link TimeLoad}.
 * @example timeLoad({ kind: "resistor", resistance: 100 }, 8) // i = v/100 at every sample
 */
export function timeLoad(load: TokenLoad, samples: number): TimeLoad {
  switch (load.kind) {
    case "resistor": {
      const gr = 1 / load.resistance;
      return {
        evaluate(v, i, g) {
          for (let s = 0; s < v.length; s++) {
            i[s] = gr * v[s]!;
            g[s] = gr;
          }
        },
        leds: () => [],
      };
    }
    case "led":
      return junctionsLoad([{ j: load.led, sign: 1 }]);
    case "antiParallel":
      return junctionsLoad([
        { j: load.a, sign: 1 },
        { j: load.b, sign: -1 },
      ]);
    case "parallelSameDirection":
      return junctionsLoad([
        { j: load.a, sign: 1 },
        { j: load.b, sign: 1 },
      ]);
    case "bridge":
      return bridgeLoad(load);
    case "halfWaveReservoir":
      return reservoirLoad(load, samples);
    default: {
      const kind = (load as { kind?: unknown }).kind;
      throw new TanklightInputError([{ path: "load.kind", message: "is not a known token load", value: kind }], "timeLoad");
    }
  }
}

/**
 * Whether a load's current law is odd, i(−v) = −i(v), so that a sinusoidal tank voltage draws
 * no DC and no even harmonics: resistors, bridges, and anti-parallel pairs of one LED model
 * (the same object twice). Everything else rectifies.
 * @example isSymmetricLoad({ kind: "resistor", resistance: 10 }) // → true
 */
export function isSymmetricLoad(load: TokenLoad): boolean {
  switch (load.kind) {
    case "resistor":
    case "bridge":
      return true;
    case "antiParallel":
      return load.a === load.b || (load.a.is === load.b.is && load.a.n === load.b.n && load.a.rs === load.b.rs && load.a.thermalVoltage === load.b.thermalVoltage && load.a.leakage === load.b.leakage);
    default:
      return false;
  }
}

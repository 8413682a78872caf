/**
 * Adapter from a token load (lib/circuit/loads/types.ts `TokenLoad`) to the link solver's
 * {@link LinkLoadModel}: the describing function is `fundamentalConductance(load, amplitude)` and
 * the LED currents `averageLoadCurrent(load, amplitude)` (lib/circuit/loads/describingFunction.ts).
 *
 * For sweeps, `tokenLoadModel(load, { tabulate: true })` builds once (per load object) a table of
 * the describing function G(A) = I₁/A on a uniform amplitude grid and interpolates ln G by cubic
 * Hermite with the exact slopes from dI₁/dA (fundamentalCurrentSlope) — a few tens of nanoseconds per
 * call instead of a cycle integral; the relative error is checked in tests/circuit/linkLoads.test.ts.
 * Above the uniform grid a geometric tail (32 nodes per doubling, ten doublings: up to 1024 times
 * the grid's top) interpolates ln G against ln A the same way — the first amplitudes a nonlinear
 * solve tries are those of an unclamped tank, often tens to hundreds of volts. Amplitudes outside
 * both fall back to the exact functions.
 */
import { averageLoadCurrent, checkLoad, fundamentalConductance, fundamentalCurrentSlope } from "../loads/describingFunction.ts";
import type { TokenLoad } from "../loads/types.ts";
import { TanklightInputError, assertNever } from "../../errors.ts";
import type { LinkLoadModel } from "./network.ts";

/** Options of {@link tokenLoadModel}. */
export interface TokenLoadModelOptions {
  /** tabulate the describing function (default false: exact call each time) */
  readonly tabulate?: boolean;
  /** highest tabulated amplitude, V (default 12 V) */
  readonly maxAmplitude?: number;
  /** grid step, V (default 5 mV) */
  readonly step?: number;
}

interface Table {
  readonly h: number;
  readonly n: number;
  /** ln G = ln(I₁/A) at A = (j+1)·h */
  readonly y: Float64Array;
  /** d ln G / dA there */
  readonly d: Float64Array;
  /** average current of each LED at the nodes: ledAvg[led][j] */
  readonly avg: Float64Array[];
  readonly labels: string[];
  readonly brightness: Float64Array[];
  /** the geometric tail: node i at top·e^{i·du}; ln G, d ln G/d ln A, LED currents and brightness there */
  readonly tail: { readonly du: number; readonly n: number; readonly y: Float64Array; readonly d: Float64Array; readonly avg: Float64Array[]; readonly brightness: Float64Array[] };
}

/** Tail nodes per doubling of the amplitude, and doublings. */
const TAIL_PER_DOUBLING = 32;
const TAIL_DOUBLINGS = 10;

const tables = new WeakMap<TokenLoad, Map<string, Table>>();

function buildTable(load: TokenLoad, maxA: number, h: number): Table {
  const n = Math.ceil(maxA / h);
  const y = new Float64Array(n);
  const d = new Float64Array(n);
  const first = averageLoadCurrent(load, h);
  const avg = first.map(() => new Float64Array(n));
  const brightness = first.map(() => new Float64Array(n));
  for (let j = 0; j < n; j++) {
    const a = (j + 1) * h;
    const i1 = fundamentalConductance(load, a) * a;
    const s = fundamentalCurrentSlope(load, a);
    y[j] = Math.log(i1 / a); // ln G: smooth down to A → 0, unlike ln I₁
    d[j] = s / i1 - 1 / a;
    averageLoadCurrent(load, a).forEach((e, k) => {
      avg[k]![j] = e.current;
      brightness[k]![j] = e.relativeBrightness;
    });
  }
  const top = n * h;
  const du = Math.LN2 / TAIL_PER_DOUBLING;
  const nt = TAIL_PER_DOUBLING * TAIL_DOUBLINGS + 1;
  const ty = new Float64Array(nt);
  const td = new Float64Array(nt);
  const tavg = first.map(() => new Float64Array(nt));
  const tbr = first.map(() => new Float64Array(nt));
  for (let i = 0; i < nt; i++) {
    const a = top * Math.exp(i * du);
    const i1 = fundamentalConductance(load, a) * a;
    ty[i] = Math.log(i1 / a);
    td[i] = (a * fundamentalCurrentSlope(load, a)) / i1 - 1; // d ln G / d ln A
    averageLoadCurrent(load, a).forEach((e, k) => {
      tavg[k]![i] = e.current;
      tbr[k]![i] = e.relativeBrightness;
    });
  }
  return { h, n, y, d, avg, labels: first.map((e) => e.label), brightness, tail: { du, n: nt, y: ty, d: td, avg: tavg, brightness: tbr } };
}

/** Node j and the fraction s along [j, j+1] of an amplitude in the tail (u = ln(a/top)/du). */
function tailPosition(tab: Table, top: number, a: number): { j: number; s: number } {
  const u = Math.log(a / top) / tab.tail.du;
  const j = Math.min(Math.floor(u), tab.tail.n - 2);
  return { j, s: u - j };
}

/** Cubic Hermite on [j, j+1] from values y and slopes d (per unit of the grid variable × step). */
function hermite(y: Float64Array, d: Float64Array, j: number, s: number, step: number): number {
  const s2 = s * s;
  const s3 = s2 * s;
  return (2 * s3 - 3 * s2 + 1) * y[j]! + (s3 - 2 * s2 + s) * step * d[j]! + (-2 * s3 + 3 * s2) * y[j + 1]! + (s3 - s2) * step * d[j + 1]!;
}

/** LED currents interpolated between nodes j and j+1: log-linear where both are positive, else linear. */
function ledsAt(labels: readonly string[], avg: readonly Float64Array[], bright: readonly Float64Array[], j: number, s: number): { label: string; current: number; relativeBrightness: number }[] {
  return labels.map((lab, k) => {
    const p = avg[k]!;
    const b = bright[k]!;
    const c0 = p[j]!;
    const c1 = p[j + 1]!;
    const cur = c0 > 0 && c1 > 0 ? Math.exp((1 - s) * Math.log(c0) + s * Math.log(c1)) : (1 - s) * c0 + s * c1;
    const scale = c0 !== 0 ? b[j]! / c0 : 0;
    return { label: lab, current: cur, relativeBrightness: scale !== 0 ? cur * scale : (1 - s) * b[j]! + s * b[j + 1]! };
  });
}

/**
 * The link solver's view of a token load.
 * @param load a {@link TokenLoad} (LED, anti-parallel pair, bridge, reservoir, resistor).
 * @param options `tabulate` (default false), `maxAmplitude` (V, default 12: top of the uniform
 *   grid; the geometric tail reaches 1024 times it), `step` (V, default 5 mV).
 * @returns a {@link LinkLoadModel}; a resistor is marked linear (no Newton unknown).
 * @example tokenLoadModel({ kind: "resistor", resistance: 1000 }).conductance(3) // → 0.001
 */
export function tokenLoadModel(load: TokenLoad, options: TokenLoadModelOptions = {}): LinkLoadModel {
  checkLoad(load, "tokenLoadModel");
  const label = loadLabel(load);
  const exact: LinkLoadModel = {
    label,
    token: load,
    linear: load.kind === "resistor",
    conductance: (amplitude: number) => fundamentalConductance(load, amplitude),
    ledCurrents: (amplitude: number) =>
      averageLoadCurrent(load, amplitude).map((e) => ({ label: e.label, current: e.current, relativeBrightness: e.relativeBrightness })),
  };
  if (!options.tabulate || load.kind === "resistor") return exact;
  const maxA = options.maxAmplitude ?? 12;
  const h = options.step ?? 5e-3;
  if (!(maxA > 0 && Number.isFinite(maxA)) || !(h > 0 && h < maxA)) {
    throw new TanklightInputError([{ path: "options", message: "need maxAmplitude > step > 0 V", value: options }], "tokenLoadModel");
  }
  const key = `${maxA}|${h}`;
  let byKey = tables.get(load);
  if (!byKey) {
    byKey = new Map();
    tables.set(load, byKey);
  }
  let t = byKey.get(key);
  if (!t) {
    t = buildTable(load, maxA, h);
    byKey.set(key, t);
  }
  const tab = t;
  const top = tab.n * h;
  const tailTop = top * Math.exp((tab.tail.n - 1) * tab.tail.du);
  return {
    label,
    token: load,
    conductance(a: number): number {
      if (a >= top && a < tailTop) {
        const { j, s } = tailPosition(tab, top, a);
        return Math.exp(hermite(tab.tail.y, tab.tail.d, j, s, tab.tail.du));
      }
      if (!(a >= h && a < top)) return fundamentalConductance(load, a);
      // cubic Hermite on ln G between nodes j and j+1 (node j at (j+1)·h)
      const u = a / h - 1;
      const j = Math.min(Math.floor(u), tab.n - 2);
      const s = u - j;
      const s2 = s * s;
      const s3 = s2 * s;
      const y0 = tab.y[j]!;
      const y1 = tab.y[j + 1]!;
      const lnG =
        (2 * s3 - 3 * s2 + 1) * y0 + (s3 - 2 * s2 + s) * h * tab.d[j]! + (-2 * s3 + 3 * s2) * y1 + (s3 - s2) * h * tab.d[j + 1]!;
      return Math.exp(lnG);
    },
    ledCurrents(a: number) {
      if (a >= top && a < tailTop) {
        const { j, s } = tailPosition(tab, top, a);
        return ledsAt(tab.labels, tab.tail.avg, tab.tail.brightness, j, s);
      }
      if (!(a >= h && a < top)) return exact.ledCurrents!(a);
      const u = a / h - 1;
      const j = Math.min(Math.floor(u), tab.n - 2);
      const s = u - j;
      // linear between nodes in ln (average current) where both are positive, else linear
      return tab.labels.map((lab, k) => {
        const p = tab.avg[k]!;
        const b = tab.brightness[k]!;
        const c0 = p[j]!;
        const c1 = p[j + 1]!;
        const cur = c0 > 0 && c1 > 0 ? Math.exp((1 - s) * Math.log(c0) + s * Math.log(c1)) : (1 - s) * c0 + s * c1;
        const scale = c0 !== 0 ? b[j]! / c0 : 0;
        return { label: lab, current: cur, relativeBrightness: scale !== 0 ? cur * scale : (1 - s) * b[j]! + s * b[j + 1]! };
      });
    },
  };
}

function loadLabel(load: TokenLoad): string {
  switch (load.kind) {
    case "resistor":
      return `resistor ${load.resistance} Ω`;
    case "led":
      return load.led.label ?? "LED";
    case "antiParallel":
      return `anti-parallel ${load.a.label ?? "LED"} + ${load.b.label ?? "LED"}`;
    case "parallelSameDirection":
      return `parallel ${load.a.label ?? "LED"} + ${load.b.label ?? "LED"}`;
    case "bridge":
      return `bridge + ${load.led.label ?? "LED"}`;
    case "halfWaveReservoir":
      return `half-wave reservoir + ${load.led.label ?? "LED"}`;
    default:
      return assertNever(load, "load.kind", "tokenLoadModel", "is not a known token load");
  }
}

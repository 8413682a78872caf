/**
 * Adapter from a token load (lib/circuit/loads/types.ts `TokenLoad`) to the link solver's
 * {@link LinkLoadModel}: the describing function is `fundamentalConductance(load, amplitude)` and
 * the LED currents `averageLoadCurrent(load, amplitude)` (lib/circuit/loads/describingFunction.ts).
 *
 * For sweeps, `tokenLoadModel(load, { tabulate: true })` keeps (per load object) a table of
 * the describing function G(A) = I₁/A on a uniform amplitude grid — each node evaluated on first
 * use, so a sweep pays for the amplitudes it visits and gets a full build's values — and
 * interpolates ln G by cubic Hermite with the exact slopes from dI₁/dA (fundamentalCurrentSlope),
 * a few tens of nanoseconds per call instead of a cycle integral; the relative error is checked in tests/circuit/linkLoads.test.ts.
 * Above the uniform grid a geometric tail (32 nodes per doubling, ten doublings: up to 1024 times
 * the grid's top) interpolates ln G against ln A the same way — the first amplitudes a nonlinear
 * solve tries are those of an unclamped tank, often tens to hundreds of volts. Amplitudes outside
 * both fall back to the exact functions.
 */
import { averageLoadCurrent, checkLoad, fundamentalConductance, fundamentalCurrentSlope } from "../loads/describingFunction.ts";
import type { TokenLoad } from "../loads/types.ts";
import { TanklightInputError, assertNever, requireObject, unknownKeyMessage } from "../../errors.ts";
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

/** One tabulated grid: ln G, its slope, and each LED's average current and brightness at the nodes. */
interface Grid {
  readonly n: number;
  /** ln G = ln(I₁/A) at the nodes */
  readonly y: Float64Array;
  /** slope of ln G: d ln G/dA (uniform grid), d ln G/d ln A (tail) */
  readonly d: Float64Array;
  /** average current of each LED at the nodes: avg[led][j] */
  readonly avg: Float64Array[];
  readonly brightness: Float64Array[];
  /** 1 where node j has been evaluated */
  readonly filled: Uint8Array;
  /** the amplitude of node j, V */
  readonly amplitude: (j: number) => number;
  /** true for the tail (slope per ln A) */
  readonly logSlope: boolean;
}

interface Table {
  readonly load: TokenLoad;
  readonly h: number;
  readonly n: number;
  readonly labels: string[];
  /** the uniform grid: node j at A = (j+1)·h */
  readonly grid: Grid;
  /** the geometric tail: node i at top·e^{i·du} */
  readonly tail: Grid & { readonly du: number };
}

/** Tail nodes per doubling of the amplitude, and doublings. */
const TAIL_PER_DOUBLING = 32;
const TAIL_DOUBLINGS = 10;

const tables = new WeakMap<TokenLoad, Map<string, Table>>();

function emptyGrid(n: number, leds: number, amplitude: (j: number) => number, logSlope: boolean): Grid {
  const f = (): Float64Array => new Float64Array(n);
  return { n, y: f(), d: f(), avg: Array.from({ length: leds }, f), brightness: Array.from({ length: leds }, f), filled: new Uint8Array(n), amplitude, logSlope };
}

/**
 * The table's shell: nodes are evaluated on first use ({@link node}), so a sweep that visits a
 * narrow band of amplitudes pays for that band only; every node's values are those a full build
 * would give.
 */
function buildTable(load: TokenLoad, maxA: number, h: number): Table {
  const n = Math.ceil(maxA / h);
  const first = averageLoadCurrent(load, h);
  const top = n * h;
  const du = Math.LN2 / TAIL_PER_DOUBLING;
  const nt = TAIL_PER_DOUBLING * TAIL_DOUBLINGS + 1;
  return {
    load,
    h,
    n,
    labels: first.map((e) => e.label),
    grid: emptyGrid(n, first.length, (j) => (j + 1) * h, false),
    tail: { ...emptyGrid(nt, first.length, (i) => top * Math.exp(i * du), true), du },
  };
}

/** Evaluates node j of a grid if it has not been (the describing function, its slope, the LED currents). */
function node(load: TokenLoad, g: Grid, j: number): void {
  if (g.filled[j] === 1) return;
  const a = g.amplitude(j);
  const i1 = fundamentalConductance(load, a) * a;
  const s = fundamentalCurrentSlope(load, a);
  g.y[j] = Math.log(i1 / a); // ln G: smooth down to A → 0, unlike ln I₁
  g.d[j] = g.logSlope ? (a * s) / i1 - 1 : s / i1 - 1 / a;
  averageLoadCurrent(load, a).forEach((e, k) => {
    g.avg[k]![j] = e.current;
    g.brightness[k]![j] = e.relativeBrightness;
  });
  g.filled[j] = 1;
}

/** Evaluates nodes j and j+1 of a grid (the interval an interpolation needs). */
function nodes(load: TokenLoad, g: Grid, j: number): void {
  node(load, g, j);
  node(load, g, j + 1);
}

/** Node j and the fraction s along [j, j+1] of an amplitude in the tail (u = ln(a/top)/du). */
function tailPosition(tab: Table, top: number, a: number): { j: number; s: number } {
  const u = Math.log(a / top) / tab.tail.du;
  const j = Math.min(Math.floor(u), tab.tail.n - 2);
  nodes(tab.load, tab.tail, j);
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
  checkModelOptions(options);
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
  const grid = tab.grid;
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
      nodes(load, grid, j);
      const s = u - j;
      const s2 = s * s;
      const s3 = s2 * s;
      const y0 = grid.y[j]!;
      const y1 = grid.y[j + 1]!;
      const lnG =
        (2 * s3 - 3 * s2 + 1) * y0 + (s3 - 2 * s2 + s) * h * grid.d[j]! + (-2 * s3 + 3 * s2) * y1 + (s3 - s2) * h * grid.d[j + 1]!;
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
      nodes(load, grid, j);
      const s = u - j;
      // linear between nodes in ln (average current) where both are positive, else linear
      return tab.labels.map((lab, k) => {
        const p = grid.avg[k]!;
        const b = grid.brightness[k]!;
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

const MODEL_OPTION_KEYS: readonly string[] = Object.freeze(["tabulate", "maxAmplitude", "step"]);
/** Tabulated points at most (maxAmplitude / step): memory and build time grow with them. */
const MAX_TABLE_POINTS = 1_000_000;

/** tokenLoadModel's options: known keys only (a typo names the nearest), a boolean, amplitudes in V > 0, a bounded table. */
function checkModelOptions(options: unknown): void {
  const where = "tokenLoadModel";
  requireObject(options, "options", where);
  const o = options as Record<string, unknown>;
  const fail = (key: string, message: string): never => {
    throw new TanklightInputError([{ path: `options.${key}`, message, value: o[key] }], where);
  };
  for (const key of Object.keys(o)) if (!MODEL_OPTION_KEYS.includes(key)) fail(key, unknownKeyMessage(key, MODEL_OPTION_KEYS));
  if (o["tabulate"] !== undefined && typeof o["tabulate"] !== "boolean") fail("tabulate", "must be true, false or absent");
  for (const key of ["maxAmplitude", "step"]) {
    const v = o[key];
    if (v !== undefined && !(typeof v === "number" && v > 0 && v <= 1e4)) fail(key, "must be a number > 0 and ≤ 10000 V");
  }
  const points = ((o["maxAmplitude"] as number | undefined) ?? 12) / ((o["step"] as number | undefined) ?? 5e-3);
  if (points > MAX_TABLE_POINTS) fail("step", `gives ${Math.round(points)} table points (maxAmplitude / step), more than ${MAX_TABLE_POINTS}: memory and build time grow with them`);
}

/**
 * Adapter from a token load (lib/circuit/loads/types.ts `TokenLoad`) to the link solver's
 * {@link LinkLoadModel}: the describing function is `fundamentalConductance(load, amplitude)` and
 * the LED currents `averageLoadCurrent(load, amplitude)` (lib/circuit/loads/describingFunction.ts).
 *
 * For sweeps, `tokenLoadModel(load, { tabulate: true })` builds once (per load object) a table of
 * the describing function G(A) = I₁/A on a uniform amplitude grid and interpolates ln G by cubic
 * Hermite with the exact slopes from dI₁/dA (fundamentalCurrentSlope) — a few tens of nanoseconds per
 * call instead of a cycle integral; the relative error is checked in tests/circuit/linkLoads.test.ts.
 * Amplitudes outside the table fall back to the exact functions.
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
}

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
  return { h, n, y, d, avg, labels: first.map((e) => e.label), brightness };
}

/**
 * The link solver's view of a token load.
 * @param load a {@link TokenLoad} (LED, anti-parallel pair, bridge, reservoir, resistor).
 * @param options `tabulate` (default false), `maxAmplitude` (V, default 12), `step` (V, default 5 mV).
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
  return {
    label,
    token: load,
    conductance(a: number): number {
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

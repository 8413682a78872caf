/**
 * Calibrate a link model from bench measurements, then predict what has not been built.
 *
 * Makers often know the transmitter coil they can see but not the current its driver puts
 * through it. They can measure: where a known token stops lighting (an *edge*), the token's
 * tank voltage on a scope, whether it is lit at a pose, the frequency, sometimes the coil
 * current. `calibrate` fits the unknown parameters of the model in ./calibrationModel.ts to
 * such measurements and says whether the data pin each one down; `predictToken` and
 * `predictRange` carry the fitted uncertainty into new poses and new token designs.
 *
 * Methods:
 * - continuous data (edges, tank amplitudes, frequency, coil current): weighted least squares
 *   by the Levenberg–Marquardt method (Levenberg 1944; Marquardt, J. SIAM 11(2):431–441, 1963,
 *   with Marquardt's diagonal scaling), on ln of the positive parameters; residuals are
 *   (model − measured)/uncertainty, so χ² has its usual meaning;
 * - covariance from the Gauss–Newton approximation (JᵀJ)⁻¹ at the optimum; 95 % intervals
 *   ±1.96σ in the fitted coordinates (so intervals of positive parameters are asymmetric);
 * - lit/unlit data with one unknown: bracketing — each observation bounds the parameter from
 *   one side (the LED current is monotone in coil current, in token Q and in threshold);
 * - identifiability: a parameter is *identified* when its 95 % interval spans less than a
 *   factor of 10 (positive parameters) or ±5 % of the nominal frequency (frequency offset);
 *   fewer data than unknowns, or a singular JᵀJ, identify nothing. No number is returned for
 *   a parameter the data do not pin down.
 * - predictions: Monte Carlo over the fitted parameters (multivariate normal in the fitted
 *   coordinates, Cholesky factor of the covariance; log-uniform inside a bracket), seeded.
 *
 * Why not a package: ml-levenberg-marquardt (the obvious candidate) stops on an absolute
 * error threshold, which weighted residuals of noisy data never reach, so it always runs to
 * its iteration cap (each iteration here costs tens of link solves); it also costs about
 * 0.3 s to import. The loop below is 40 lines and stops on relative progress.
 */
import * as z from "../zod.ts";
import { current, frequency, inductance, length, parseArgs, parseInput, resistance, voltage, lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import { createRandom } from "../math/random.ts";
import { DEFAULT_LIT_THRESHOLD } from "../circuit/link/network.ts";
import { PoseInput } from "../circuit/link/schema.ts";
import { unitVector } from "../schema.ts";
import {
  edgeAlong,
  parseCalibrationDesign,
  tokenOutcome,
  type CalibrationDesign,
  type CalibrationDesignParsed,
  type CalibrationParameters,
  type PoseSI,
} from "./calibrationModel.ts";
import type { Vec3 } from "../em/types.ts";

// ── inputs ───────────────────────────────────────────────────────────────────

/**
 * One bench measurement (quantities with units accepted):
 * - `edge` — the token, moved along `along` (default: straight up, +z), stops lighting at
 *   `pose`; `uncertainty` is how well that position is known (length);
 * - `lit` — the token is (or is not) lit at `pose`;
 * - `tankAmplitude` — the token capacitor's voltage amplitude (peak, as a scope shows it
 *   through a probe across the capacitor) at `pose`;
 * - `frequency` — the drive frequency; `coilCurrent` — the transmitter coil current
 *   amplitude (peak), where a current probe was at hand.
 */
export const MeasurementInput = lazySchema(() => z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("edge"), token: z.string(), pose: PoseInput, along: unitVector().optional(), uncertainty: length() }),
  z.strictObject({ kind: z.literal("lit"), token: z.string(), pose: PoseInput, lit: z.boolean() }),
  z.strictObject({ kind: z.literal("tankAmplitude"), token: z.string(), pose: PoseInput, value: voltage({ positive: true }), uncertainty: voltage({ positive: true }) }),
  z.strictObject({ kind: z.literal("frequency"), value: frequency(), uncertainty: frequency() }),
  z.strictObject({ kind: z.literal("coilCurrent"), value: current({ positive: true }), uncertainty: current({ positive: true }) }),
]));
export type Measurement = z.input<typeof MeasurementInput>;
type MeasurementParsed = z.output<typeof MeasurementInput>;

/** The parameters a calibration can fit. */
export type CalibrationUnknown = "coilCurrent" | "tokenQ" | "litThreshold" | "frequencyOffset";
const UNKNOWNS: readonly CalibrationUnknown[] = ["coilCurrent", "tokenQ", "litThreshold", "frequencyOffset"];
const UNITS: Record<CalibrationUnknown, string> = { coilCurrent: "A", tokenQ: "", litThreshold: "A", frequencyOffset: "Hz" };

/** Some or all of the calibration parameters, with units (for `assume` and `initial`). */
const ParameterValuesInput = lazySchema(() => z.strictObject({
  coilCurrent: current({ positive: true }).optional(),
  tokenQ: z.number().positive().finite().optional(),
  litThreshold: current({ positive: true }).optional(),
  frequencyOffset: frequency({ positive: false }).optional(),
}));

const CalibrateOptionsInput = lazySchema(() => z.strictObject({
  /** values of the parameters that are not fitted (defaults: tokenQ 1, litThreshold 0.5 mA, frequencyOffset 0) */
  assume: ParameterValuesInput.optional(),
  /** starting values for the fit (by default found from the data) */
  initial: ParameterValuesInput.optional(),
  /** iteration cap of the least-squares loop (default 60) */
  maxIterations: z.number().int().min(1).max(1000).optional(),
}));
export type CalibrateOptions = z.input<typeof CalibrateOptionsInput>;

// ── results ──────────────────────────────────────────────────────────────────

/** One parameter's outcome. */
export interface CalibratedParameter {
  readonly name: CalibrationUnknown;
  /** "fitted" (least squares), "bracketed" (lit/unlit bounds), "notIdentifiable", or "assumed" */
  readonly status: "fitted" | "bracketed" | "notIdentifiable" | "assumed";
  /** the estimate in SI (absent when not identifiable) */
  readonly estimate?: number;
  /** 95 % interval in SI (fitted: ±1.96σ in the fitted coordinate; bracketed: the bracket) */
  readonly interval?: readonly [number, number];
  readonly unit: string;
  /** a plain sentence: what the data say about this parameter */
  readonly verdict: string;
}

/** One measurement against the calibrated model. */
export interface CalibrationResidual {
  readonly index: number;
  readonly kind: MeasurementParsed["kind"];
  readonly token?: string;
  /** measured value (SI): for an edge, 0 m (the measured position itself) */
  readonly measured: number;
  /** model value (SI): for an edge, where the model puts the edge, relative to the measured pose, m */
  readonly predicted: number;
  /** (predicted − measured)/uncertainty; for lit/unlit: 0 if the model agrees, else undefined */
  readonly normalized?: number;
  readonly agrees: boolean;
  readonly unit: string;
}

/** What `calibrate` returns. */
export interface Calibration {
  readonly design: CalibrationDesignParsed;
  /** every parameter: fitted, bracketed, assumed or not identifiable */
  readonly parameters: Readonly<Record<CalibrationUnknown, CalibratedParameter>>;
  /** the point estimate used for predictions (SI; assumed values where not fitted) */
  readonly values: CalibrationParameters;
  /** transmitter ampere-turns: coil current amplitude × turns, A (peak) */
  readonly ampereTurns?: number;
  readonly residuals: readonly CalibrationResidual[];
  /** Σ normalized² over the continuous measurements, and the degrees of freedom */
  readonly chiSquared: number;
  readonly degreesOfFreedom: number;
  /** true when every fitted or bracketed unknown is identified and the data are consistent */
  readonly identified: boolean;
  /** covariance of the fitted coordinates (ln of positive parameters; frequency offset in Hz), row-major */
  readonly covariance: { readonly names: readonly CalibrationUnknown[]; readonly matrix: readonly number[] };
  readonly summary: readonly string[];
  readonly warnings: readonly string[];
}

// ── fitted coordinates ───────────────────────────────────────────────────────

const isLog = (u: CalibrationUnknown): boolean => u !== "frequencyOffset";
const toCoord = (u: CalibrationUnknown, v: number): number => (isLog(u) ? Math.log(v) : v);
const fromCoord = (u: CalibrationUnknown, c: number): number => (isLog(u) ? Math.exp(c) : c);

function withValues(base: CalibrationParameters, names: readonly CalibrationUnknown[], coords: ArrayLike<number>): CalibrationParameters {
  const out: Record<CalibrationUnknown, number> = { ...base };
  names.forEach((u, i) => (out[u] = fromCoord(u, coords[i]!)));
  return out;
}

// ── the residual vector ──────────────────────────────────────────────────────

interface Continuous {
  readonly index: number;
  readonly m: Exclude<MeasurementParsed, { kind: "lit" }>;
}

function edgeOffset(design: CalibrationDesignParsed, m: Extract<MeasurementParsed, { kind: "edge" }>, p: CalibrationParameters, where: string): number {
  const along: Vec3 = (m.along as Vec3 | undefined) ?? [0, 0, 1];
  const distance = Math.hypot(...(m.pose.position as Vec3));
  const r = edgeAlong(design, m.token, m.pose as PoseSI, along, p, {
    step: Math.max(m.uncertainty, 1e-3),
    minOffset: -0.95 * distance,
    maxOffset: Math.max(10 * distance, 1),
    tolerance: 1e-6 * m.uncertainty,
  }, where);
  return r.offset;
}

/** Model value of a continuous measurement (SI), and its measured value and uncertainty. */
function modelValue(design: CalibrationDesignParsed, c: Continuous, p: CalibrationParameters, where: string): { model: number; measured: number; sigma: number; unit: string } {
  const m = c.m;
  switch (m.kind) {
    case "edge":
      return { model: edgeOffset(design, m, p, where), measured: 0, sigma: m.uncertainty, unit: "m" };
    case "tankAmplitude":
      return { model: tokenOutcome(design, m.token, m.pose as PoseSI, p, where).tankAmplitude, measured: m.value, sigma: m.uncertainty, unit: "V" };
    case "frequency":
      return { model: design.frequency + p.frequencyOffset, measured: m.value, sigma: m.uncertainty, unit: "Hz" };
    case "coilCurrent":
      return { model: p.coilCurrent, measured: m.value, sigma: m.uncertainty, unit: "A" };
    default:
      return assertNeverMeasurement(m);
  }
}

function assertNeverMeasurement(m: never): never {
  throw new TanklightInputError([{ path: "kind", message: "is not a measurement kind", value: (m as { kind?: unknown }).kind }], "calibrate");
}

function residuals(design: CalibrationDesignParsed, data: readonly Continuous[], p: CalibrationParameters, where: string): Float64Array {
  const r = new Float64Array(data.length);
  data.forEach((c, i) => {
    const v = modelValue(design, c, p, where);
    r[i] = (v.model - v.measured) / v.sigma;
  });
  return r;
}

const sumSq = (r: ArrayLike<number>): number => {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += r[i]! * r[i]!;
  return s;
};

// ── small dense linear algebra (p ≤ 4) ───────────────────────────────────────

/** Solves A x = b (n × n, row-major) by Gaussian elimination with partial pivoting; undefined if singular. */
function solveSmall(a: Float64Array, b: Float64Array, n: number): Float64Array | undefined {
  const m = Float64Array.from(a);
  const x = Float64Array.from(b);
  const scale = Math.max(...Array.from(m, Math.abs), 1e-300);
  for (let k = 0; k < n; k++) {
    let piv = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(m[i * n + k]!) > Math.abs(m[piv * n + k]!)) piv = i;
    if (!(Math.abs(m[piv * n + k]!) > 1e-13 * scale)) return undefined;
    if (piv !== k) {
      for (let j = 0; j < n; j++) [m[k * n + j], m[piv * n + j]] = [m[piv * n + j]!, m[k * n + j]!];
      [x[k], x[piv]] = [x[piv]!, x[k]!];
    }
    for (let i = k + 1; i < n; i++) {
      const f = m[i * n + k]! / m[k * n + k]!;
      for (let j = k; j < n; j++) m[i * n + j]! -= f * m[k * n + j]!;
      x[i]! -= f * x[k]!;
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let s = x[k]!;
    for (let j = k + 1; j < n; j++) s -= m[k * n + j]! * x[j]!;
    x[k] = s / m[k * n + k]!;
  }
  return x;
}

/** Inverse of a small symmetric positive semi-definite matrix in correlation scaling; undefined if singular. */
function inverseSmall(a: Float64Array, n: number): Float64Array | undefined {
  const d = Float64Array.from({ length: n }, (_, i) => Math.sqrt(Math.max(a[i * n + i]!, 0)));
  if (d.some((v) => !(v > 0))) return undefined;
  const c = Float64Array.from(a, (v, k) => v / (d[Math.floor(k / n)]! * d[k % n]!));
  const inv = new Float64Array(n * n);
  for (let j = 0; j < n; j++) {
    const e = new Float64Array(n);
    e[j] = 1;
    const col = solveSmall(c, e, n);
    if (col === undefined) return undefined;
    for (let i = 0; i < n; i++) inv[i * n + j] = col[i]! / (d[i]! * d[j]!);
  }
  return inv;
}

/** Lower Cholesky factor of a small SPD matrix (row-major). */
function cholesky(a: readonly number[], n: number): Float64Array {
  const l = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i * n + j]!;
      for (let k = 0; k < j; k++) s -= l[i * n + k]! * l[j * n + k]!;
      l[i * n + j] = i === j ? Math.sqrt(Math.max(s, 0)) : s / (l[j * n + j]! || 1);
    }
  }
  return l;
}

// ── Levenberg–Marquardt ──────────────────────────────────────────────────────

interface Fit {
  readonly coords: Float64Array;
  readonly chi2: number;
  /** JᵀJ at the optimum (row-major) */
  readonly jtj: Float64Array;
  readonly iterations: number;
  readonly converged: boolean;
}

/** Jacobian of the residual vector by central differences (step h in the fitted coordinates). */
function jacobian(f: (c: Float64Array) => Float64Array, c: Float64Array, m: number, h: number): Float64Array {
  const p = c.length;
  const j = new Float64Array(m * p);
  for (let k = 0; k < p; k++) {
    const up = Float64Array.from(c);
    const dn = Float64Array.from(c);
    up[k]! += h;
    dn[k]! -= h;
    const ru = f(up);
    const rd = f(dn);
    for (let i = 0; i < m; i++) j[i * p + k] = (ru[i]! - rd[i]!) / (2 * h);
  }
  return j;
}

function normalEquations(j: Float64Array, r: Float64Array, m: number, p: number): { jtj: Float64Array; jtr: Float64Array } {
  const jtj = new Float64Array(p * p);
  const jtr = new Float64Array(p);
  for (let i = 0; i < m; i++) {
    for (let a = 0; a < p; a++) {
      jtr[a]! += j[i * p + a]! * r[i]!;
      for (let b = 0; b < p; b++) jtj[a * p + b]! += j[i * p + a]! * j[i * p + b]!;
    }
  }
  return { jtj, jtr };
}

/**
 * Minimises Σ rᵢ(c)² by Levenberg–Marquardt with Marquardt's scaling (damping λ·diag(JᵀJ));
 * stops when χ² falls by less than 1e-9 relative, or the step is below 1e-9 in every coordinate.
 */
function levenbergMarquardt(f: (c: Float64Array) => Float64Array, start: Float64Array, maxIterations: number): Fit {
  const p = start.length;
  let c = Float64Array.from(start);
  let r = f(c);
  const m = r.length;
  let chi2 = sumSq(r);
  let lambda = 1e-3;
  let converged = false;
  let it = 0;
  let jtj: Float64Array = new Float64Array(p * p);
  for (; it < maxIterations && !converged; it++) {
    const j = jacobian(f, c, m, 1e-4);
    const ne = normalEquations(j, r, m, p);
    jtj = ne.jtj;
    let accepted = false;
    for (let tries = 0; tries < 12 && !accepted; tries++) {
      const a = Float64Array.from(jtj);
      for (let k = 0; k < p; k++) a[k * p + k]! += lambda * Math.max(jtj[k * p + k]!, 1e-12);
      const step = solveSmall(a, Float64Array.from(ne.jtr, (v) => -v), p);
      if (step === undefined) {
        lambda *= 10;
        continue;
      }
      const trial = Float64Array.from(c, (v, k) => v + step[k]!);
      const rt = f(trial);
      const chiT = sumSq(rt);
      if (chiT <= chi2) {
        const small = step.every((s) => Math.abs(s) < 1e-9);
        converged = small || chi2 - chiT <= 1e-9 * Math.max(chi2, 1e-300);
        c = trial;
        r = rt;
        chi2 = chiT;
        lambda = Math.max(lambda / 3, 1e-12);
        accepted = true;
      } else {
        lambda *= 4;
      }
    }
    if (!accepted) converged = true; // no step lowers χ²: at a minimum within the floating-point resolution
  }
  const jEnd = jacobian(f, c, m, 1e-4);
  return { coords: c, chi2, jtj: normalEquations(jEnd, r, m, p).jtj, iterations: it, converged };
}

// ── bracketing for lit/unlit data ────────────────────────────────────────────

/** The value of one unknown at which the LED current at a pose equals the threshold (bisection in ln). */
function crossing(design: CalibrationDesignParsed, m: Extract<MeasurementParsed, { kind: "lit" }>, u: CalibrationUnknown, base: CalibrationParameters, where: string): number | undefined {
  const lo0 = u === "litThreshold" ? 1e-9 : u === "coilCurrent" ? 1e-6 : 1e-2;
  const hi0 = u === "litThreshold" ? 1 : u === "coilCurrent" ? 1e3 : 1e2;
  const lit = (v: number): boolean => tokenOutcome(design, m.token, m.pose as PoseSI, { ...base, [u]: v }, where).lit;
  // lit is increasing in coil current and token Q, decreasing in the threshold
  const increasing = u !== "litThreshold";
  let lo = Math.log(lo0);
  let hi = Math.log(hi0);
  if (lit(Math.exp(increasing ? lo : hi))) return increasing ? lo0 : hi0;
  if (!lit(Math.exp(increasing ? hi : lo))) return undefined;
  for (let i = 0; i < 60 && hi - lo > 1e-6; i++) {
    const mid = 0.5 * (lo + hi);
    if (lit(Math.exp(mid)) === increasing) hi = mid;
    else lo = mid;
  }
  return Math.exp(0.5 * (lo + hi));
}

// ── calibrate ────────────────────────────────────────────────────────────────

/**
 * Fits the unknowns of a link model to bench measurements and says what the data pin down.
 * Edges, tank amplitudes, frequency and coil current are fitted by weighted least squares
 * (Levenberg–Marquardt); lit/unlit observations bracket a single unknown, and are checked
 * against the fit otherwise. Parameters not fitted take `opts.assume` values (coilCurrent has
 * no default: fit it or assume it).
 * @param design the coils and parts that are known (see CalibrationDesignInput)
 * @param measurements bench data (see MeasurementInput), quantities with units accepted
 * @param unknowns the parameters to fit, e.g. ["coilCurrent"] or ["coilCurrent", "litThreshold"]
 * @returns {@link Calibration}: estimates with 95 % intervals, residuals, identifiability verdicts
 * @example
 *   // design: { frequency: "200 kHz", transmitter: { coil }, tokens: { red: { coil, topology, capacitor, load } } }
 *   calibrate(design, [{ kind: "edge", token: "red", pose: { position: [0, 0, "105 mm"] }, uncertainty: "5 mm" }],
 *     ["coilCurrent"], { assume: { litThreshold: "0.1 mA" } }).parameters.coilCurrent
 *   // { status: "fitted", estimate: 1.1 (A), interval: [0.95, 1.3] (A), … } for the pebble-drawer coils
 */
export function calibrate(design: CalibrationDesign, measurements: readonly Measurement[], unknowns: readonly CalibrationUnknown[], opts: CalibrateOptions = {}): Calibration {
  const where = "calibrate";
  const { d, data, o, names } = parseCalibrateArgs(design, measurements, unknowns, opts, where);
  const base: CalibrationParameters = {
    coilCurrent: o.assume?.coilCurrent ?? o.initial?.coilCurrent ?? 1,
    tokenQ: o.assume?.tokenQ ?? 1,
    litThreshold: o.assume?.litThreshold ?? DEFAULT_LIT_THRESHOLD,
    frequencyOffset: o.assume?.frequencyOffset ?? 0,
  };
  const continuous: Continuous[] = [];
  const binary: Binary[] = [];
  data.forEach((m, index) => (m.kind === "lit" ? binary.push({ index, m }) : continuous.push({ index, m })));
  const warnings: string[] = [];
  const params = {} as Record<CalibrationUnknown, CalibratedParameter>;
  for (const u of UNKNOWNS) {
    if (!names.includes(u)) params[u] = { name: u, status: "assumed", estimate: base[u], unit: UNITS[u], verdict: `assumed ${fmt(u, base[u])} (not fitted)` };
  }

  let values = { ...base };
  let cov: number[] = [];
  let chi2 = 0;
  let dof = continuous.length - names.length;

  if (names.length > 0 && continuous.length >= names.length) {
    const fit = fitUnknowns(d, continuous, binary, names, base, o, where);
    values = fit.values;
    chi2 = fit.chi2;
    cov = fit.covariance;
    for (const u of names) params[u] = fit.params[u]!;
    warnings.push(...fit.warnings);
    if (dof > 0 && chi2 / dof > 4) {
      warnings.push(`χ²/dof = ${(chi2 / dof).toFixed(1)}: the model and the data disagree by more than the stated uncertainties (check the uncertainties, the design, or fit another unknown)`);
    }
  } else if (names.length === 1 && continuous.length === 0 && binary.length > 0) {
    const u = names[0]!;
    const r = bracket(d, binary, u, base, where);
    dof = 0;
    params[u] = r.param;
    if (r.value !== undefined) values = { ...values, [u]: r.value };
  } else if (names.length > 0) {
    for (const u of names) {
      params[u] = {
        name: u,
        status: "notIdentifiable",
        unit: UNITS[u],
        verdict:
          continuous.length === 0 && binary.length > 0
            ? `lit/unlit observations alone can bracket one unknown, not ${names.length}: add edges, tank amplitudes or a coil-current reading`
            : `${continuous.length} continuous measurement(s) for ${names.length} unknowns: not enough to fit`,
      };
    }
  }

  const res = residualTable(d, continuous, binary, values, where);
  const disagreeing = res.filter((x) => x.kind === "lit" && !x.agrees);
  if (disagreeing.length > 0) warnings.push(`${disagreeing.length} lit/unlit observation(s) disagree with the calibrated model: measurements ${disagreeing.map((x) => x.index).join(", ")}`);
  const identified = names.every((u) => params[u].status === "fitted" || params[u].status === "bracketed") && disagreeing.length === 0;
  const turns = d.transmitter.coil.turns;
  const ampereTurns = params.coilCurrent.estimate !== undefined ? params.coilCurrent.estimate * turns : undefined;
  const summary = [
    ...UNKNOWNS.map((u) => `${u}: ${params[u].verdict}`),
    ...(ampereTurns !== undefined ? [`transmitter: ${fmt("coilCurrent", params.coilCurrent.estimate!)} peak × ${turns} turns = ${ampereTurns.toPrecision(3)} ampere-turns (peak)`] : []),
    names.length > 0 && continuous.length > 0 ? `fit: χ² = ${chi2.toPrecision(3)} over ${Math.max(dof, 0)} degree(s) of freedom` : "",
    identified ? "verdict: the data pin down every unknown" : "verdict: not every unknown is pinned down — see the lines above",
  ].filter((s) => s !== "");
  return {
    design: d,
    parameters: params,
    values,
    ...(ampereTurns !== undefined ? { ampereTurns } : {}),
    residuals: res,
    chiSquared: chi2,
    degreesOfFreedom: Math.max(dof, 0),
    identified,
    covariance: { names: params && names.length > 0 && cov.length > 0 ? [...names] : [], matrix: cov },
    summary,
    warnings,
  };
}

type Binary = { index: number; m: Extract<MeasurementParsed, { kind: "lit" }> };

/** calibrate's arguments parsed and cross-checked (tokens named by the measurements exist; the coil current fitted or assumed). */
function parseCalibrateArgs(design: CalibrationDesign, measurements: readonly Measurement[], unknowns: readonly CalibrationUnknown[], opts: CalibrateOptions, where: string) {
  const d = parseCalibrationDesign(design, where);
  const data = parseInput(z.array(MeasurementInput).min(1).max(10_000), measurements, where) as MeasurementParsed[];
  const o = parseInput(CalibrateOptionsInput, opts, where);
  const names = parseInput(z.array(z.enum(UNKNOWNS as [CalibrationUnknown, ...CalibrationUnknown[]])).max(4), unknowns, where);
  if (new Set(names).size !== names.length) {
    throw new TanklightInputError([{ path: "unknowns", message: "names a parameter twice", value: names }], where);
  }
  for (const [i, m] of data.entries()) {
    if ("token" in m && d.tokens[m.token] === undefined) {
      throw new TanklightInputError([{ path: `measurements[${i}].token`, message: `names no token of the design (have: ${Object.keys(d.tokens).join(", ")})`, value: m.token }], where);
    }
  }
  if (!names.includes("coilCurrent") && o.assume?.coilCurrent === undefined) {
    throw new TanklightInputError([{ path: "unknowns", message: "must include 'coilCurrent', or opts.assume.coilCurrent must give it", value: names }], where);
  }
  return { d, data, o, names };
}

/**
 * The weighted least-squares fit of the unknowns to the continuous measurements, from a start
 * whose coil current puts the first edge (or tank amplitude) where measured; returns the values,
 * χ², the covariance (empty when JᵀJ is singular) and each unknown's estimate with its interval.
 */
function fitUnknowns(
  d: CalibrationDesignParsed, continuous: readonly Continuous[], binary: readonly Binary[], names: readonly CalibrationUnknown[],
  base: CalibrationParameters, o: ReturnType<typeof parseCalibrateArgs>["o"], where: string,
): { values: CalibrationParameters; chi2: number; covariance: number[]; params: Partial<Record<CalibrationUnknown, CalibratedParameter>>; warnings: string[] } {
  const warnings: string[] = [];
  let start = { ...base, ...(o.initial ?? {}) } as CalibrationParameters;
  if (names.includes("coilCurrent") && o.initial?.coilCurrent === undefined) start = { ...start, coilCurrent: initialCoilCurrent(d, continuous, binary, start, where) };
  const f = (c: Float64Array): Float64Array => residuals(d, continuous, withValues(start, names, c), where);
  const fit = levenbergMarquardt(f, Float64Array.from(names, (u) => toCoord(u, start[u])), o.maxIterations ?? 60);
  if (!fit.converged) warnings.push(`the least-squares fit stopped at its iteration cap (${fit.iterations}) before converging`);
  const inv = inverseSmall(fit.jtj, names.length);
  const params: Partial<Record<CalibrationUnknown, CalibratedParameter>> = {};
  names.forEach((u, i) => {
    const sd = inv ? Math.sqrt(Math.max(inv[i * names.length + i]!, 0)) : Infinity;
    params[u] = describeFitted(u, fit.coords[i]!, sd, d.frequency);
  });
  if (!inv) warnings.push("the measurements cannot separate the unknowns (JᵀJ is singular): measure at more poses, with another token, or fit fewer unknowns");
  return { values: withValues(start, names, fit.coords), chi2: fit.chi2, covariance: inv ? Array.from(inv) : [], params, warnings };
}

function fmt(u: CalibrationUnknown, v: number): string {
  if (u === "tokenQ") return `${v.toPrecision(3)}× nominal Q`;
  if (u === "frequencyOffset") return `${v.toPrecision(3)} Hz`;
  const a = Math.abs(v);
  return a >= 1 ? `${v.toPrecision(3)} A` : a >= 1e-3 ? `${(v * 1e3).toPrecision(3)} mA` : `${(v * 1e6).toPrecision(3)} µA`;
}

function describeFitted(u: CalibrationUnknown, coord: number, sd: number, f0: number): CalibratedParameter {
  const est = fromCoord(u, coord);
  if (!Number.isFinite(sd)) {
    return { name: u, status: "notIdentifiable", unit: UNITS[u], verdict: "not identifiable: the data do not separate it from the other unknowns" };
  }
  const lo = fromCoord(u, coord - 1.96 * sd);
  const hi = fromCoord(u, coord + 1.96 * sd);
  const pinned = isLog(u) ? hi / lo < 10 : 1.96 * sd < 0.05 * f0;
  if (!pinned) {
    return {
      name: u,
      status: "notIdentifiable",
      unit: UNITS[u],
      verdict: `not identifiable: the 95 % interval would be ${fmt(u, lo)} … ${fmt(u, hi)}, wider than the data can support a number`,
    };
  }
  return { name: u, status: "fitted", estimate: est, interval: [lo, hi], unit: UNITS[u], verdict: `${fmt(u, est)} (95 %: ${fmt(u, lo)} … ${fmt(u, hi)})` };
}

/** The coil current that puts the first edge measurement exactly where it was seen (a good start). */
function initialCoilCurrent(d: CalibrationDesignParsed, continuous: readonly Continuous[], binary: readonly { m: Extract<MeasurementParsed, { kind: "lit" }> }[], p: CalibrationParameters, where: string): number {
  const edge = continuous.find((c) => c.m.kind === "edge")?.m as Extract<MeasurementParsed, { kind: "edge" }> | undefined;
  if (edge) {
    const x = crossing(d, { kind: "lit", token: edge.token, pose: edge.pose, lit: true }, "coilCurrent", p, where);
    if (x !== undefined) return x;
  }
  const cc = continuous.find((c) => c.m.kind === "coilCurrent")?.m as Extract<MeasurementParsed, { kind: "coilCurrent" }> | undefined;
  if (cc) return cc.value;
  const b = binary[0];
  if (b) return crossing(d, b.m, "coilCurrent", p, where) ?? p.coilCurrent;
  return p.coilCurrent;
}

function bracket(
  d: CalibrationDesignParsed,
  binary: readonly { index: number; m: Extract<MeasurementParsed, { kind: "lit" }> }[],
  u: CalibrationUnknown,
  base: CalibrationParameters,
  where: string,
): { param: CalibratedParameter; value?: number } {
  if (u === "frequencyOffset") {
    return { param: { name: u, status: "notIdentifiable", unit: UNITS[u], verdict: "lit/unlit observations do not bracket a frequency offset (the response is not monotone in it)" } };
  }
  let lo = 0;
  let hi = Infinity;
  const increasing = u !== "litThreshold";
  for (const { m } of binary) {
    const x = crossing(d, m, u, base, where);
    // lit needs (increasing) value ≥ x, or (threshold) value ≤ x
    if (x === undefined) {
      if (m.lit) return { param: { name: u, status: "notIdentifiable", unit: UNITS[u], verdict: `a token seen lit could not be lit by any ${u} in the searched range: check the design` } };
      continue;
    }
    if (m.lit === increasing) lo = Math.max(lo, x);
    else hi = Math.min(hi, x);
  }
  if (lo > hi) {
    return { param: { name: u, status: "notIdentifiable", unit: UNITS[u], verdict: `the lit/unlit observations contradict each other (they need ${fmt(u, lo)} ≤ ${u} ≤ ${fmt(u, hi)})` } };
  }
  if (!(lo > 0) || !Number.isFinite(hi)) {
    return {
      param: {
        name: u,
        status: "notIdentifiable",
        unit: UNITS[u],
        verdict: !(lo > 0) ? `bounded above only (≤ ${fmt(u, hi)}): add an observation where the token is lit` : `bounded below only (≥ ${fmt(u, lo)}): add an observation where the token is dark`,
      },
    };
  }
  const est = Math.sqrt(lo * hi);
  const pinned = hi / lo < 10;
  return {
    param: pinned
      ? { name: u, status: "bracketed", estimate: est, interval: [lo, hi], unit: UNITS[u], verdict: `between ${fmt(u, lo)} and ${fmt(u, hi)} (bracketed by lit/unlit observations; estimate the geometric mean)` }
      : { name: u, status: "notIdentifiable", unit: UNITS[u], verdict: `only bracketed within a factor of ${(hi / lo).toFixed(0)} (${fmt(u, lo)} … ${fmt(u, hi)}): observe closer to the edge` },
    ...(pinned ? { value: est } : {}),
  };
}

function residualTable(
  d: CalibrationDesignParsed,
  continuous: readonly Continuous[],
  binary: readonly { index: number; m: Extract<MeasurementParsed, { kind: "lit" }> }[],
  p: CalibrationParameters,
  where: string,
): CalibrationResidual[] {
  const rows: CalibrationResidual[] = [];
  for (const c of continuous) {
    const v = modelValue(d, c, p, where);
    const normalized = (v.model - v.measured) / v.sigma;
    rows.push({ index: c.index, kind: c.m.kind, ...("token" in c.m ? { token: c.m.token } : {}), measured: v.measured, predicted: v.model, normalized, agrees: Math.abs(normalized) <= 2, unit: v.unit });
  }
  for (const b of binary) {
    const o = tokenOutcome(d, b.m.token, b.m.pose as PoseSI, p, where);
    rows.push({ index: b.index, kind: "lit", token: b.m.token, measured: b.m.lit ? 1 : 0, predicted: o.lit ? 1 : 0, agrees: o.lit === b.m.lit, unit: "" });
  }
  return rows.sort((a, b) => a.index - b.index);
}

// ── predictions ──────────────────────────────────────────────────────────────

const PredictOptionsInput = lazySchema(() => z.strictObject({
  /** Monte Carlo samples over the fitted parameters (default 200, at most 100 000) */
  samples: z.number().int().min(1).max(100_000).optional(),
  /** seed of the random stream (default 1) */
  seed: z.number().int().optional(),
}));
export type PredictOptions = z.input<typeof PredictOptionsInput>;

/** A predicted quantity with its spread over the calibrated parameters. */
export interface PredictedQuantity {
  readonly unit: string;
  /** the value at the point estimate */
  readonly nominal: number;
  /** 2.5 %, 50 % and 97.5 % points over the parameter samples */
  readonly low: number;
  readonly median: number;
  readonly high: number;
}

/** Parameter samples drawn from the calibration (fitted: normal in fitted coordinates; bracketed: log-uniform). */
function parameterSamples(cal: Calibration, n: number, seed: number): CalibrationParameters[] {
  const rnd = createRandom(seed);
  const names = cal.covariance.names;
  const k = names.length;
  const l = k > 0 ? cholesky(cal.covariance.matrix, k) : new Float64Array(0);
  const out: CalibrationParameters[] = [];
  for (let s = 0; s < n; s++) {
    const v: Record<CalibrationUnknown, number> = { ...cal.values };
    if (k > 0) {
      const zv = Array.from({ length: k }, () => rnd.normal());
      names.forEach((u, i) => {
        let dlt = 0;
        for (let j = 0; j <= i; j++) dlt += l[i * k + j]! * zv[j]!;
        v[u] = fromCoord(u, toCoord(u, cal.values[u]) + dlt);
      });
    }
    for (const u of UNKNOWNS) {
      const p = cal.parameters[u];
      if (p.status === "bracketed" && p.interval) v[u] = Math.exp(Math.log(p.interval[0]) + rnd.uniform() * Math.log(p.interval[1] / p.interval[0]));
    }
    out.push(v);
  }
  return out;
}

function quantiles(nominal: number, xs: number[], unit: string): PredictedQuantity {
  const s = [...xs].sort((a, b) => a - b);
  const q = (f: number): number => s[Math.min(s.length - 1, Math.max(0, Math.round(f * (s.length - 1))))]!;
  return { unit, nominal, low: q(0.025), median: q(0.5), high: q(0.975) };
}

function requireIdentified(cal: Calibration, where: string): void {
  const missing = UNKNOWNS.filter((u) => cal.parameters[u].estimate === undefined);
  if (missing.length > 0) {
    throw new TanklightInputError([{ path: "calibration", message: `cannot predict: ${missing.join(", ")} not identified by the measurements`, value: missing }], where);
  }
}

/** A token design to predict: a name of the calibration's design, or a new token spec (ReceiverInput without a pose). */
export type TokenChoice = string | CalibrationDesign["tokens"][string];

function withToken(cal: Calibration, token: TokenChoice, where: string): { design: CalibrationDesignParsed; name: string } {
  if (typeof token === "string") return { design: cal.design, name: token };
  const name = "__predicted__";
  const design = parseCalibrationDesign({ ...cal.design, tokens: { [name]: token } } as CalibrationDesign, where);
  return { design, name };
}

/**
 * The calibrated model's prediction for a token at a pose: LED current and tank amplitude with
 * their 95 % spread over the fitted parameters, and the probability that the token lights.
 * @example predictToken(cal, "green", { position: [0, 0, "60 mm"] }).probabilityLit
 *   // 1 when every parameter sample lights the green token 6 cm up
 */
export function predictToken(cal: Calibration, token: TokenChoice, pose: unknown, opts: PredictOptions = {}): { ledCurrent: PredictedQuantity; tankAmplitude: PredictedQuantity; probabilityLit: number } {
  const where = "predictToken";
  requireIdentified(cal, where);
  const o = parseInput(PredictOptionsInput, opts, where);
  const { design, name } = withToken(cal, token, where);
  const at = parseInput(PoseInput, pose, `${where}: pose`) as PoseSI;
  const nominal = tokenOutcome(design, name, at, cal.values, where);
  const samples = parameterSamples(cal, o.samples ?? 200, o.seed ?? 1).map((p) => tokenOutcome(design, name, at, p, where));
  return {
    ledCurrent: quantiles(nominal.ledCurrent, samples.map((s) => s.ledCurrent), "A"),
    tankAmplitude: quantiles(nominal.tankAmplitude, samples.map((s) => s.tankAmplitude), "V"),
    probabilityLit: samples.filter((s) => s.lit).length / samples.length,
  };
}

/**
 * How far a token lights, predicted with its uncertainty: the distance from `from` along
 * `along` (default: straight up) to the lit/unlit edge, at the point estimate and over
 * parameter samples (each to 0.1 mm).
 * @example predictRange(cal, "green", { from: { position: [0, 0, "5 mm"] } })
 *   // { unit: "m", nominal: 0.094, low: 0.087, median: 0.092, high: 0.102 } for the pebble-drawer coils
 */
export function predictRange(
  cal: Calibration,
  token: TokenChoice,
  line: { readonly from: unknown; readonly along?: Vec3 },
  opts: PredictOptions = {},
): PredictedQuantity & { readonly warnings: readonly string[] } {
  const where = "predictRange";
  requireIdentified(cal, where);
  const o = parseInput(PredictOptionsInput, opts, where);
  const { design, name } = withToken(cal, token, where);
  const from = parseInput(PoseInput, line.from, `${where}: from`) as PoseSI;
  const along = (line.along ?? [0, 0, 1]) as Vec3;
  const warnings: string[] = [];
  const reach = (p: CalibrationParameters): number => {
    const r = edgeAlong(design, name, from, along, p, { step: 0.005, minOffset: 0, maxOffset: 2, tolerance: 1e-4 }, where);
    if (r.status === "darkEverywhere") return 0;
    if (r.status === "litBeyond" && warnings.length === 0) warnings.push("some samples light the token beyond 2 m along the line: range capped there");
    return r.offset;
  };
  const nominal = reach(cal.values);
  const xs = parameterSamples(cal, o.samples ?? 100, o.seed ?? 1).map(reach);
  return { ...quantiles(nominal, xs, "m"), warnings };
}

/**
 * Whether a calibrated coil current is one a 5 V driver can plausibly make: the coil's voltage
 * amplitude ωL·I must stay below the largest tank swing a single switch from the supply gives
 * (3.562 × supply, the class-E peak switch voltage — source: Sokal & Sokal 1975, Raab 1977),
 * and the coil's own loss ½I²R must stay below what the supply can deliver (supply × its
 * current limit).
 * Quantity strings are read ("2.1 A", "6 uH"); values are bounded where the products would leave the double range.
 * @example drivePlausibility(2.1, { inductance: 6e-6, resistance: 0.1, frequency: 2e5 }, { supply: 5, currentLimit: 0.5 }).coilVoltage // → 15.83 (V peak, below 3.562 × 5 V)
 */
export function drivePlausibility(
  coilCurrent: number | string,
  coil: { readonly inductance: number | string; readonly resistance: number | string; readonly frequency: number | string },
  supply: { readonly supply: number | string; readonly currentLimit: number | string },
): { plausible: boolean; coilVoltage: number; maxCoilVoltage: number; coilLoss: number; maxPower: number; reasons: string[] } {
  const args = parseArgs(DrivePlausibilityArgs, [coilCurrent, coil, supply], "drivePlausibility");
  return drivePlausibilityCore(args.coilCurrent, args.coil, args.supply);
}

/** drivePlausibility's arguments (strict; quantities with units; bounds keep ωLI and I²R finite). */
const DrivePlausibilityArgs = lazySchema(() => z.strictObject({
  coilCurrent: current({ nonNegative: true, max: 1e6 }),
  coil: z.strictObject({ inductance: inductance({ max: 1e3 }), resistance: resistance({ max: 1e9 }), frequency: frequency({ max: 1e12 }) }),
  supply: z.strictObject({ supply: voltage({ positive: true, max: 1e6 }), currentLimit: current({ positive: true, max: 1e6 }) }),
}));

function drivePlausibilityCore(
  coilCurrent: number,
  coil: { readonly inductance: number; readonly resistance: number; readonly frequency: number },
  supply: { readonly supply: number; readonly currentLimit: number },
): { plausible: boolean; coilVoltage: number; maxCoilVoltage: number; coilLoss: number; maxPower: number; reasons: string[] } {
  const coilVoltage = 2 * Math.PI * coil.frequency * coil.inductance * coilCurrent;
  const maxCoilVoltage = 3.562 * supply.supply;
  const coilLoss = 0.5 * coilCurrent * coilCurrent * coil.resistance;
  const maxPower = supply.supply * supply.currentLimit;
  const reasons: string[] = [];
  if (coilVoltage > maxCoilVoltage) reasons.push(`coil voltage ${coilVoltage.toPrecision(3)} V peak exceeds ${maxCoilVoltage.toPrecision(3)} V (3.562 × ${supply.supply} V)`);
  if (coilLoss > maxPower) reasons.push(`coil loss ${coilLoss.toPrecision(3)} W exceeds the supply's ${maxPower.toPrecision(3)} W`);
  return { plausible: reasons.length === 0, coilVoltage, maxCoilVoltage, coilLoss, maxPower, reasons };
}



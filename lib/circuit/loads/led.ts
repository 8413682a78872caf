/**
 * LEDs and rectifier diodes as Shockley junctions with series resistance, solved exactly.
 *
 * Model (Shockley 1949, with an ohmic series resistance):
 *   v = n·V_T·ln(1 + i_j/I_s) + i_j·r_s,        i = i_j + g_leak·v
 * where V_T = kT/q. The junction current has the closed form (Banwell & Jayakumar,
 * Electron. Lett. 36(4), 2000, "Exact analytical solution for current flow through diode
 * with series resistance"):
 *   i_j = (n·V_T/r_s)·W( (I_s·r_s/(n·V_T))·exp((v + I_s·r_s)/(n·V_T)) ) − I_s
 * with W the principal Lambert W branch; far in forward bias the argument's logarithm is used
 * (W(e^y) from y) so nothing overflows, and the current continues as (v − V_knee)/r_s.
 * dv/di_j = n·V_T/(I_s + i_j) + r_s gives the conductance without another W evaluation:
 *   di_j/dv = W/(r_s·(1 + W)).
 * g_leak is a tiny parallel conductance (default 1e-12 S, a numerical floor standing for the
 * junction's real reverse leakage) that keeps the conductance > 0 for every finite v.
 */
import type { DiodeModel } from "../types.ts";
import { thermalVoltage } from "../../constants.ts";
import * as z from "../../zod.ts";
import { TanklightInputError, requireFinite } from "../../errors.ts";
import { conductance, current, dimensionless, parseArgs, parseInput, resistance, temperature, voltage, lazySchema } from "../../schema.ts";
import { lambertWOfLogCore } from "../../math/lambertW.ts";
import { luFactorCore, luSolveCore } from "../../math/lu.ts";

/** A datasheet-style point of the forward characteristic: the voltage at a current. */
export const ForwardPoint = lazySchema(() => z.strictObject({
  /** forward current, A, > 0 */
  current: current({ positive: true }),
  /** forward voltage at that current, V, > 0 */
  voltage: voltage({ positive: true }),
}));
/** A forward point in SI numbers (as results carry it; specs also accept quantity strings). */
export type ForwardPoint = z.output<typeof ForwardPoint>;

/** Shockley parameters at one temperature. */
export interface ShockleyParameters {
  /** saturation current I_s, A, > 0 */
  readonly saturationCurrent: number;
  /** ideality (emission) factor n, > 0 (LEDs ≈ 1.5–4, silicon ≈ 1–2) */
  readonly idealityFactor: number;
  /** ohmic series resistance r_s, Ω, > 0 */
  readonly seriesResistance: number;
}

const positiveNumber = () => dimensionless({ positive: true });

/** Options shared by {@link led} and {@link diode}. */
const junctionOptions = lazySchema(() => ({
  /** junction temperature the model is evaluated at, K; default = referenceTemperature */
  temperature: temperature({ positive: true }).optional(),
  /** temperature at which the points or parameters hold, K; default 298.15 (25 °C, datasheet convention) */
  referenceTemperature: temperature({ positive: true }).optional(),
  /**
   * forward-voltage temperature coefficient at the reference current, V/K; default −0.002
   * (about −2 mV/K: from memory (unverified), docs/references.md "LED forward voltage")
   */
  temperatureCoefficient: z.number({ error: "must be a finite number of V/K" }).refine(Number.isFinite, { error: "must be a finite number of V/K" }).optional(),
  /** current at which the temperature coefficient holds, A; default: the largest fit point or 20 mA */
  referenceCurrent: current({ positive: true }).optional(),
  /** parallel leakage conductance, S, ≥ 0; default 1e-12 (numerical floor, see module comment) */
  leakage: conductance().optional(),
  /** short label for reports */
  label: z.string().optional(),
  /** where the numbers come from (datasheet, preset table, fit …) */
  source: z.string().optional(),
}));
const pointsList = lazySchema(() => z
  .array(ForwardPoint, { error: "must be a list of two or three (current, voltage) points" })
  .min(2, { error: "must hold two or three (current, voltage) points" })
  .max(3, { error: "must hold two or three (current, voltage) points" })
  .readonly());
/** The extra fields of an LED spec. */
const ledFields = lazySchema(() => ({
  /** colour name, e.g. "red" (free text) */
  colour: z.string().optional(),
  /** current at which relative brightness is 1, A; default 20 mA */
  ratedCurrent: current({ positive: true }).optional(),
}));

/** The two forms of a junction spec: forward points, or Shockley parameters. */
function junctionForms<E extends z.ZodRawShape>(extra: E) {
  return {
    points: z.strictObject({
      ...junctionOptions,
      ...extra,
      /** two or three (current, voltage) points, distinct currents */
      points: pointsList,
      /** ideality factor to hold fixed when only two points are given; default 2 */
      idealityFactor: positiveNumber().optional(),
    }),
    parameters: z.strictObject({
      ...junctionOptions,
      ...extra,
      saturationCurrent: current({ positive: true }),
      idealityFactor: positiveNumber(),
      seriesResistance: resistance({ positive: true }),
    }),
  };
}
const DIODE_FORMS = lazySchema(() => junctionForms({}));
const LED_FORMS = lazySchema(() => junctionForms(ledFields));

/** How a junction is specified: datasheet-style points, or Shockley parameters directly (SI numbers or quantity strings). */
export const JunctionSpec = lazySchema(() => z.union([DIODE_FORMS.points, DIODE_FORMS.parameters]));
/** What {@link diode} accepts. */
export type JunctionSpec = z.input<typeof JunctionSpec>;
/** What {@link led} accepts: a junction spec plus colour and rated current. */
export const LedSpec = lazySchema(() => z.union([LED_FORMS.points, LED_FORMS.parameters]));
/** What {@link led} accepts. */
export type LedSpec = z.input<typeof LedSpec>;
type ParsedSpec = z.output<typeof LedSpec>;

/** Options shared by {@link led} and {@link diode} (the fields besides points or parameters). */
export type JunctionOptions = z.input<z.ZodObject<typeof junctionOptions>>;

/**
 * Parses a spec with the form its keys choose (`points` present: the points form), so the
 * messages name the user's fields of that form, not a list of forms.
 */
function parseSpec(spec: unknown, forms: { points: z.ZodType; parameters: z.ZodType }, where: string): ParsedSpec {
  if (spec === null || typeof spec !== "object" || Array.isArray(spec)) {
    throw new TanklightInputError([{ path: "spec", message: "must be an object { points } or { saturationCurrent, idealityFactor, seriesResistance }", value: spec }], where);
  }
  const form = Object.hasOwn(spec, "points") ? forms.points : forms.parameters;
  return parseInput(form, spec, where) as ParsedSpec;
}

/** A Shockley junction with series resistance, ready to evaluate (satisfies DiodeModel). */
export interface Junction extends DiodeModel {
  readonly label: string;
  /** where its numbers come from */
  readonly source: string;
  /** I_s at `temperature`, A */
  readonly is: number;
  /** ideality factor */
  readonly n: number;
  /** series resistance, Ω */
  readonly rs: number;
  /** temperature the model is evaluated at, K */
  readonly temperature: number;
  /** thermal voltage kT/q at `temperature`, V */
  readonly thermalVoltage: number;
  /** parallel leakage conductance, S */
  readonly leakage: number;
  /** the fit points, when the model was built from points */
  readonly points?: readonly ForwardPoint[];
  /** current anode → cathode at voltage v (A); finite for every finite v */
  current(v: number): number;
  /** dI/dV at v, S, > 0 */
  conductance(v: number): number;
  /** the voltage at which the current is i (the exact inverse of `current`), V */
  voltage(i: number): number;
}

/** An LED: a junction plus its colour. */
export interface Led extends Junction {
  readonly kind: "led";
  /** colour name, e.g. "red" (free text for user-built LEDs) */
  readonly colour?: string;
  /** current at which relative brightness is 1, A (the preset's rated current; default 20 mA) */
  readonly ratedCurrent: number;
}

/** A rectifier diode. */
export interface Diode extends Junction {
  readonly kind: "diode";
}

const DEFAULT_T = 298.15;
const DEFAULT_TEMPCO = -0.002;
const DEFAULT_LEAKAGE = 1e-12;

/**
 * The Lambert W value of a junction with series resistance at voltage v, so that the
 * junction current is (n·V_T/r_s)·W − I_s (exported for the loads' hot loops).
 * @param v voltage, V; lnIs ln(I_s); is I_s, A; nvt n·V_T, V; rs Ω (> 0).
 */
export function junctionW(v: number, lnIs: number, is: number, nvt: number, rs: number): number {
  return lambertWOfLogCore(lnIs + Math.log(rs / nvt) + (v + is * rs) / nvt);
}

/**
 * Fits Shockley parameters (I_s, n, r_s) to two or three datasheet-style points.
 *
 * Three points: v_k = n·V_T·ln(1 + I_k/I_s) + I_k·r_s solved exactly for all three unknowns
 * (linear solve in (n·V_T, −n·V_T·ln I_s, r_s) with ln I_k, then Newton on the exact equations;
 * both linear solves by lib/math's dense LU).
 * Two points: n is held at `idealityFactor` (default 2) and I_s, r_s are solved.
 * @param points forward points (current A > 0, voltage V > 0), distinct currents.
 * @param temperature K, > 0, at which the points hold.
 * @param idealityFactor n for the two-point fit.
 * @returns Shockley parameters; throws TanklightInputError when the points imply r_s ≤ 0 or n ≤ 0.
 * The points fix I_s only to about 1e-14 relative in double precision (a voltage's round-off,
 * 4e-16 V, is 1e-14 of n·V_T), so the digits below show 12 figures.
 * @example fitShockley([{current:1e-3,voltage:1.75},{current:5e-3,voltage:1.85},{current:20e-3,voltage:2.0}], 298.15)
 *   // → { saturationCurrent: 2.21647655110e-19, idealityFactor: 1.88367568690, seriesResistance: 5.52721489967 }
 */
export function fitShockley(
  points: readonly z.input<typeof ForwardPoint>[],
  temperature: number | string = DEFAULT_T,
  idealityFactor: number | string = 2,
): ShockleyParameters {
  const a = parseArgs(FitArgs, [points, temperature, idealityFactor], "fitShockley");
  return fitShockleyCore(a.points, a.temperature ?? DEFAULT_T, a.idealityFactor ?? 2, "fitShockley");
}

const FitArgs = lazySchema(() => z.strictObject({
  points: pointsList,
  temperature: temperature({ positive: true }).optional(),
  idealityFactor: positiveNumber().optional(),
}));

/** fitShockley on checked points (SI); `where` names the public function in its errors. */
function fitShockleyCore(points: readonly ForwardPoint[], temperature: number, idealityFactor: number, where: string): ShockleyParameters {
  const sorted = [...points].sort((a, b) => a.current - b.current);
  for (let k = 1; k < sorted.length; k++) {
    if (!(sorted[k]!.current > sorted[k - 1]!.current) || !(sorted[k]!.voltage > sorted[k - 1]!.voltage)) {
      throw new TanklightInputError(
        [{ path: "points", message: "voltage must rise with current and the currents must differ", value: points, expected: "increasing (current, voltage)" }],
        where,
      );
    }
  }
  const vt = thermalVoltage(temperature);
  // unknowns x = [ln I_s, n, r_s]
  let x: number[];
  if (sorted.length === 3) {
    // v = a·ln I + b + r·I with a = nV_T, b = −a ln I_s (valid for I ≫ I_s)
    const A = Float64Array.from(sorted.flatMap((p) => [Math.log(p.current), 1, p.current]));
    const s = solveSmall(A, Float64Array.from(sorted, (p) => p.voltage), 3);
    const a = s[0]!;
    x = [-s[1]! / a, a / vt, s[2]!];
  } else {
    const a = idealityFactor * vt;
    const [p0, p1] = [sorted[0]!, sorted[1]!];
    const r = (p1.voltage - p0.voltage - a * Math.log(p1.current / p0.current)) / (p1.current - p0.current);
    x = [(p0.current * r + a * Math.log(p0.current) - p0.voltage) / a, idealityFactor, r];
  }
  // Newton refinement on the exact equations (log1p), Jacobian by hand.
  const free = sorted.length === 3 ? [0, 1, 2] : [0, 2];
  for (let it = 0; it < 30; it++) {
    const [lnIs, n, r] = x as [number, number, number];
    const is = Math.exp(lnIs);
    const res: number[] = [];
    const J: number[][] = [];
    for (const p of sorted) {
      const u = Math.log1p(p.current / is);
      res.push(n * vt * u + p.current * r - p.voltage);
      const dIs = (n * vt * (-p.current / is)) / (1 + p.current / is); // d/d lnIs
      J.push([dIs, vt * u, p.current]);
    }
    const Jr = Float64Array.from(J.flatMap((row) => free.map((c) => row[c]!)));
    const step = solveSmall(Jr, Float64Array.from(res), free.length);
    let maxStep = 0;
    free.forEach((c, k) => {
      x[c] = x[c]! - step[k]!;
      maxStep = Math.max(maxStep, Math.abs(step[k]!) / Math.max(1, Math.abs(x[c]!)));
    });
    if (maxStep < 1e-15) break;
  }
  const [lnIs, n, r] = x as [number, number, number];
  if (!(n > 0) || !Number.isFinite(n) || !(r > 0) || !Number.isFinite(lnIs)) {
    throw new TanklightInputError(
      [{
        path: "points",
        message: `these points imply n = ${n.toPrecision(4)}, r_s = ${r.toPrecision(4)} Ω; a Shockley junction needs n > 0 and r_s > 0 (check the points, or give two points and an ideality factor)`,
        value: points,
        expected: "points of a real diode",
      }],
      where,
    );
  }
  return { saturationCurrent: Math.exp(lnIs), idealityFactor: n, seriesResistance: r };
}

/**
 * Solves the fit's small dense system in place with lib/math's LU (unchecked core: the
 * matrices are built here from finite, checked points); a singular system (coincident
 * points) leaves NaN, which the fit's final check reports as points that imply no junction.
 */
function solveSmall(a: Float64Array, b: Float64Array, n: number): Float64Array {
  const piv = new Int32Array(n);
  if (luFactorCore(a, n, piv) >= 0) return b.fill(NaN);
  luSolveCore(a, n, piv, b);
  return b;
}

/** Resolves a parsed spec into parameters at the reference temperature, plus the fit points. */
function resolveSpec(spec: ParsedSpec, where: string): { p: ShockleyParameters; points?: readonly ForwardPoint[] } {
  const tRef = spec.referenceTemperature ?? DEFAULT_T;
  if ("points" in spec) {
    return { p: fitShockleyCore(spec.points, tRef, spec.idealityFactor ?? 2, where), points: spec.points };
  }
  return { p: { saturationCurrent: spec.saturationCurrent, idealityFactor: spec.idealityFactor, seriesResistance: spec.seriesResistance } };
}

/**
 * Builds an evaluable junction from parameters at the reference temperature, moved to the
 * evaluation temperature by holding the forward voltage's temperature coefficient at the
 * reference current: V_F(T) = V_F(T_ref) + tc·(T − T_ref) at i_ref, I_s(T) re-solved from it.
 */
function makeJunction(spec: ParsedSpec, where: string, defaultLabel: string, defaultSource: string) {
  const { p, points } = resolveSpec(spec, where);
  const tRef = spec.referenceTemperature ?? DEFAULT_T;
  const temperature = spec.temperature ?? tRef;
  const tc = spec.temperatureCoefficient ?? DEFAULT_TEMPCO;
  const leakage = spec.leakage ?? DEFAULT_LEAKAGE;
  const n = p.idealityFactor;
  const rs = p.seriesResistance;
  let is = p.saturationCurrent;
  const vtRef = thermalVoltage(tRef);
  const vt = thermalVoltage(temperature);
  const iRef = spec.referenceCurrent ?? (points ? Math.max(...points.map((q) => q.current)) : 20e-3);
  if (temperature !== tRef) {
    const vfRef = n * vtRef * Math.log1p(iRef / is) + iRef * rs;
    const vf = vfRef + tc * (temperature - tRef);
    const junctionDrop = vf - iRef * rs;
    if (!(junctionDrop > 0)) {
      throw new TanklightInputError(
        [{ path: "temperature", message: "moves the forward voltage below the series-resistance drop; outside the model", value: temperature }],
        where,
      );
    }
    is = iRef / Math.expm1(junctionDrop / (n * vt));
  }
  const nvt = n * vt;
  const lnIs = Math.log(is);
  const current = (v: number): number => {
    const w = junctionW(v, lnIs, is, nvt, rs);
    return (nvt / rs) * w - is + leakage * v;
  };
  const conductance = (v: number): number => {
    const w = junctionW(v, lnIs, is, nvt, rs);
    return w / (rs * (1 + w)) + leakage;
  };
  const voltage = (i: number): number => {
    requireFinite(i, "i", "A", `${where}.voltage`);
    // start from the leakage-free inverse, then Newton on current(v) = i
    let v = i > -is * (1 - 1e-9) ? nvt * Math.log1p(i / is) + i * rs : leakage > 0 ? (i + is) / leakage : -Infinity;
    if (!Number.isFinite(v)) {
      throw new TanklightInputError(
        [{ path: "i", message: `a junction without leakage cannot carry less than −I_s = ${-is} A`, value: i }],
        `${where}.voltage`,
      );
    }
    for (let k = 0; k < 50; k++) {
      const dv = (current(v) - i) / conductance(v);
      v -= dv;
      if (Math.abs(dv) <= 1e-15 * Math.max(1, Math.abs(v))) break;
    }
    return v;
  };
  return {
    label: spec.label ?? defaultLabel,
    source: spec.source ?? (points ? "fitted to the given forward points" : defaultSource),
    is,
    n,
    rs,
    temperature,
    thermalVoltage: vt,
    leakage,
    ...(points ? { points } : {}),
    current,
    conductance,
    voltage,
  };
}

/**
 * An LED as a Shockley junction with series resistance, I(V) exact by Lambert W.
 *
 * @param spec either `{ points: [{ current, voltage }, …] }` (two or three datasheet-style
 *   points; with two, `idealityFactor` is held, default 2) or `{ saturationCurrent,
 *   idealityFactor, seriesResistance }`; plus optional temperature (K), referenceTemperature
 *   (K, default 298.15), temperatureCoefficient (V/K, default −0.002), leakage (S, default
 *   1e-12), colour, ratedCurrent (A, default 0.02), label, source.
 * @returns a {@link Led}: `current(v)` A, `conductance(v)` S, `voltage(i)` V and its parameters.
 * Method: Shockley equation with series resistance, closed form with Lambert W (Banwell &
 *   Jayakumar 2000).
 * @example led({ points: [{ current: 1e-3, voltage: 1.75 }, { current: 20e-3, voltage: 2.0 }] }).voltage(20e-3) // → 1.99999999998475 (the 20 mA point; the 1e-12 S leakage floor shifts it by 1.5e-11 V)
 * Related: ledPreset, diode, fitShockley.
 */
export function led(input: LedSpec): Led {
  const spec = parseSpec(input, LED_FORMS, "led");
  const j = makeJunction(spec, "led", spec.colour ? `${spec.colour} LED` : "LED", "Shockley parameters given by the caller");
  const ratedCurrent = spec.ratedCurrent ?? 20e-3;
  return { kind: "led", ...j, ...(spec.colour ? { colour: spec.colour } : {}), ratedCurrent };
}

/**
 * A rectifier diode as a Shockley junction with series resistance (same model as {@link led}).
 * @param spec as for led (points or parameters).
 * @returns a {@link Diode}.
 * @example diode({ saturationCurrent: 1e-9, idealityFactor: 1.9, seriesResistance: 0.1 }).current(0.5) // → 2.807040878375539e-5 A
 * Related: diodePreset.
 */
export function diode(input: JunctionSpec): Diode {
  const spec = parseSpec(input, DIODE_FORMS, "diode");
  const j = makeJunction(spec, "diode", "diode", "Shockley parameters given by the caller");
  return { kind: "diode", ...j };
}

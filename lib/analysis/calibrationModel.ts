/**
 * The model a calibration fits: a transmitter coil of unknown current, tokens whose Q, lit
 * threshold and drive frequency may be off, evaluated through the link solver.
 *
 * A calibration parameter set `{ coilCurrent, tokenQ, litThreshold, frequencyOffset }`:
 * - coilCurrent — transmitter coil current amplitude, A peak (the drive is modelled as a
 *   current-regulated source of this amplitude: whatever the real driver is, the tokens only
 *   see the coil's ampere-turns);
 * - tokenQ — a factor on every token's quality factor (the coil's AC resistance is divided
 *   by it; 1 = as the loss models compute);
 * - litThreshold — LED average current at which a token counts as lit, A;
 * - frequencyOffset — drive frequency minus the nominal, Hz.
 */
import * as z from "../zod.ts";
import { frequency, parseInput, temperature, unitVector, lazySchema } from "../schema.ts";
import { TanklightInputError } from "../errors.ts";
import { solveLink } from "../circuit/link.ts";
import { PoseInput, ReceiverInput, TransmitterInput } from "../circuit/link/schema.ts";
import { coilResistance } from "../em/losses/coilResistance.ts";
import type { Vec3 } from "../em/types.ts";

/** What the maker knows: the coils and parts they can see, and the nominal frequency. */
export const CalibrationDesignInput = lazySchema(() => z.strictObject({
  /** nominal drive frequency, Hz */
  frequency: frequency(),
  /** the transmitter coil and its pose (default: origin, axis +z); its drive is what is unknown */
  transmitter: TransmitterInput.pick({ label: true, coil: true, pose: true }),
  /** the tokens used on the bench (and any to be predicted), by name; each without a pose */
  tokens: z.record(z.string().min(1), ReceiverInput.omit({ pose: true })),
  /** conductor temperature for the coil resistances, K (default 20 °C) */
  temperature: temperature().optional(),
}));
export type CalibrationDesign = z.input<typeof CalibrationDesignInput>;
export type CalibrationDesignParsed = z.output<typeof CalibrationDesignInput>;

/** The parameters of the model (SI). */
export interface CalibrationParameters {
  /** transmitter coil current amplitude, A peak */
  readonly coilCurrent: number;
  /** factor on the tokens' Q (1 = as computed) */
  readonly tokenQ: number;
  /** lit threshold, A (LED average current) */
  readonly litThreshold: number;
  /** drive frequency minus nominal, Hz */
  readonly frequencyOffset: number;
}

/** A pose as the link solver takes it (SI numbers). */
export interface PoseSI {
  readonly position: Vec3;
  readonly axis?: Vec3;
  readonly spin?: number;
}

/** What one token does at one pose under one parameter set. */
export interface TokenOutcome {
  /** the brightest LED's average current, A */
  readonly ledCurrent: number;
  /** the token capacitor's voltage amplitude, V peak */
  readonly tankAmplitude: number;
  readonly lit: boolean;
}

/** Parses a design once; the result is reused for every evaluation. */
export function parseCalibrationDesign(design: CalibrationDesign, where: string): CalibrationDesignParsed {
  const parsed = parseInput(CalibrationDesignInput, design, where);
  if (Object.keys(parsed.tokens).length === 0) {
    throw new TanklightInputError([{ path: "design.tokens", message: "must name at least one token", value: {} }], where);
  }
  return parsed;
}

/** The nominal AC resistance of each token coil at a frequency (memoised per design object). */
function nominalResistance(design: CalibrationDesignParsed, name: string, f: number): number {
  const t = design.tokens[name]!;
  if (t.resistance !== undefined) return t.resistance;
  return coilResistance(t.coil, f, design.temperature !== undefined ? { temperature: design.temperature } : {});
}

/**
 * One token at one pose under a parameter set: the link solved with the transmitter coil
 * carrying `coilCurrent` and the token's coil resistance divided by `tokenQ`.
 * @example tokenOutcome(design, "red", { position: [0, 0, 0.05] }, params).lit // → true
 */
export function tokenOutcome(design: CalibrationDesignParsed, token: string, pose: PoseSI, p: CalibrationParameters, where: string): TokenOutcome {
  const spec = design.tokens[token];
  if (spec === undefined) {
    throw new TanklightInputError([{ path: "token", message: `names no token of the design (have: ${Object.keys(design.tokens).join(", ")})`, value: token }], where);
  }
  const f = design.frequency + p.frequencyOffset;
  const r = solveLink({
    frequency: f,
    transmitter: {
      ...(design.transmitter.label !== undefined ? { label: design.transmitter.label } : {}),
      coil: design.transmitter.coil,
      ...(design.transmitter.pose !== undefined ? { pose: design.transmitter.pose } : {}),
      compensation: "none",
      drive: { kind: "currentRegulated", amplitude: p.coilCurrent },
    },
    receivers: [{ ...spec, pose, resistance: nominalResistance(design, token, f) / p.tokenQ }],
    ...(design.temperature !== undefined ? { temperature: design.temperature } : {}),
  });
  const rx = r.receivers[0]!;
  const ledCurrent = rx.leds.reduce((m, l) => Math.max(m, l.averageCurrent), 0);
  return { ledCurrent, tankAmplitude: rx.capacitorVoltage, lit: ledCurrent >= p.litThreshold };
}

/** Unit vector of a direction; throws on a zero vector. */
function unit(v: Vec3, where: string): Vec3 {
  const n = Math.hypot(v[0], v[1], v[2]);
  if (!(n > 0)) throw new TanklightInputError([{ path: "along", message: "must be a non-zero direction", value: v }], where);
  return [v[0] / n, v[1] / n, v[2] / n];
}

/** The pose moved by s metres along a unit direction. */
function shifted(pose: PoseSI, along: Vec3, s: number): PoseSI {
  return { ...pose, position: [pose.position[0] + s * along[0], pose.position[1] + s * along[1], pose.position[2] + s * along[2]] };
}

/** ln(I_LED / threshold), floored so that a dark LED gives a large negative finite number. */
function margin(design: CalibrationDesignParsed, token: string, pose: PoseSI, p: CalibrationParameters, where: string): number {
  return Math.log(Math.max(tokenOutcome(design, token, pose, p, where).ledCurrent, 1e-30) / p.litThreshold);
}

/** How an edge search went. */
export interface EdgeSearch {
  /** displacement along the direction from the start pose to the lit/unlit boundary, m */
  readonly offset: number;
  /** "found", or why not: the token is lit all the way out, or dark all the way in */
  readonly status: "found" | "litBeyond" | "darkEverywhere";
}

/**
 * Where along a line the token stops lighting: the displacement s from `start` along `along`
 * at which the LED current equals the threshold, by outward/inward bracketing (steps of
 * `step`, doubling up to 4 × `step`, so that a dead ring narrower than that — the flux through a
 * flat token crosses zero over a transmitter's winding — is not jumped) and the Illinois variant of regula falsi on ln(I/threshold) (Dowell & Jarratt
 * 1971), to `tolerance` metres. The search never moves closer than `minOffset` (negative:
 * towards the transmitter) nor further than `maxOffset`.
 * @example edgeAlong(design, "red", { position: [0, 0, 0.08] }, [0, 0, 1], params, { step: 0.005 }).offset // → 0.021 (edge at 10.1 cm)
 */
export function edgeAlong(
  design: CalibrationDesignParsed,
  token: string,
  start: PoseSI,
  alongInput: Vec3,
  p: CalibrationParameters,
  opts: { readonly step: number; readonly minOffset: number; readonly maxOffset: number; readonly tolerance?: number },
  where: string,
): EdgeSearch {
  const along = unit(alongInput, where);
  const g = (s: number): number => margin(design, token, shifted(start, along, s), p, where);
  const tol = opts.tolerance ?? 1e-7;
  let a = 0;
  let fa = g(0);
  let b: number;
  let fb: number;
  let step = opts.step;
  // bracket: lit at a, dark at b (lit side inward)
  if (fa >= 0) {
    for (;;) {
      b = Math.min(a + step, opts.maxOffset);
      fb = g(b);
      if (fb < 0) break;
      if (b >= opts.maxOffset) return { offset: opts.maxOffset, status: "litBeyond" };
      a = b;
      fa = fb;
      step = Math.min(2 * step, 4 * opts.step);
    }
  } else {
    b = a;
    fb = fa;
    for (;;) {
      a = Math.max(b - step, opts.minOffset);
      fa = g(a);
      if (fa >= 0) break;
      if (a <= opts.minOffset) return { offset: opts.minOffset, status: "darkEverywhere" };
      b = a;
      fb = fa;
      step = Math.min(2 * step, 4 * opts.step);
    }
  }
  // Illinois regula falsi on g, with a bisection step whenever it stalls; 60 steps is far
  // more than the bracket (≤ 2⁴⁰ × tolerance) needs.
  let side = 0;
  for (let i = 0; i < 60 && b - a > tol; i++) {
    let s = (a * fb - b * fa) / (fb - fa);
    if (!(s > a && s < b)) s = 0.5 * (a + b);
    const fs = g(s);
    if (fs >= 0) {
      a = s;
      fa = fs;
      if (side === -1) fb /= 2;
      side = -1;
    } else {
      b = s;
      fb = fs;
      if (side === 1) fa /= 2;
      side = 1;
    }
  }
  return { offset: 0.5 * (a + b), status: "found" };
}

/** Parses a pose given with units. */
export function parsePose(pose: unknown, where: string, field: string): PoseSI {
  return parseInput(PoseInput, pose, `${where}: ${field}`) as PoseSI;
}

/** A direction given with or without units (normalised). */
export const DirectionInput = lazySchema(() => unitVector());

/**
 * Builders for token loads (plain readonly data, validated once here; the describing-function
 * hot path trusts them). Each returns a {@link TokenLoad}.
 */
import type { Diode, Led } from "./led.ts";
import type { TokenLoad } from "./types.ts";
import * as z from "../../zod.ts";
import { TanklightInputError } from "../../errors.ts";
import { parseInput, lazySchema } from "../../schema.ts";

/** halfWaveReservoir's options: only their keys are checked here (values below, SI numbers). */
const HalfWaveOptions = lazySchema(() => z.strictObject({
  options: z.strictObject({ seriesResistance: z.unknown().optional(), frequency: z.unknown().optional() }, { error: "must be an object { seriesResistance?, frequency? }" }),
}));

function requireJunction(x: unknown, kind: "led" | "diode", field: string, where: string): void {
  const k = (x as { kind?: unknown } | null)?.kind;
  if (k !== kind) {
    throw new TanklightInputError(
      [{ path: field, message: `must be ${kind === "led" ? "an LED from led()/ledPreset()" : "a diode from diode()/diodePreset()"}`, value: k ?? x }],
      where,
    );
  }
}

function requireNonNegative(x: unknown, field: string, unit: string, where: string): void {
  if (!(typeof x === "number" && Number.isFinite(x) && x >= 0)) {
    throw new TanklightInputError([{ path: field, message: `must be a finite number ≥ 0 ${unit}`, value: x }], where);
  }
}

function requirePos(x: unknown, field: string, unit: string, where: string): void {
  if (!(typeof x === "number" && Number.isFinite(x) && x > 0)) {
    throw new TanklightInputError([{ path: field, message: `must be a finite number > 0 ${unit}`, value: x }], where);
  }
}

/** One LED across the tank. @example singleLed(ledPreset("red")) */
export function singleLed(l: Led): TokenLoad {
  requireJunction(l, "led", "led", "singleLed");
  return { kind: "led", led: l };
}

/**
 * Two LEDs back to back (any two colours): a on the positive, b on the negative half-cycle.
 * @example antiParallelPair(ledPreset("red"), ledPreset("green-gap")).kind // → "antiParallel"
 */
export function antiParallelPair(a: Led, b: Led): TokenLoad {
  requireJunction(a, "led", "a", "antiParallelPair");
  requireJunction(b, "led", "b", "antiParallelPair");
  return { kind: "antiParallel", a, b };
}

/**
 * Two LEDs in parallel pointing the same way.
 * @example sameDirectionPair(ledPreset("red"), ledPreset("green-gap")).kind // → "parallelSameDirection"
 */
export function sameDirectionPair(a: Led, b: Led): TokenLoad {
  requireJunction(a, "led", "a", "sameDirectionPair");
  requireJunction(b, "led", "b", "sameDirectionPair");
  return { kind: "parallelSameDirection", a, b };
}

/**
 * A full-wave bridge of four identical diodes feeding an LED, with an optional series
 * resistor (Ω ≥ 0) in the DC path.
 * @example bridgeRectifier(diodePreset("schottky"), ledPreset("red")).kind // → "bridge"
 */
export function bridgeRectifier(d: Diode, l: Led, seriesResistance = 0): TokenLoad {
  requireJunction(d, "diode", "diode", "bridgeRectifier");
  requireJunction(l, "led", "led", "bridgeRectifier");
  requireNonNegative(seriesResistance, "seriesResistance", "Ω", "bridgeRectifier");
  return { kind: "bridge", diode: d, led: l, seriesResistance };
}

/**
 * A half-wave rectifier (diode + optional series resistor) charging a reservoir capacitor
 * with the LED across it. capacitance F > 0; frequency Hz > 0 (optional, ripple estimate only).
 * @example halfWaveReservoir(diodePreset("schottky"), ledPreset("red"), 1e-6).capacitance // → 1e-6 (F)
 */
export function halfWaveReservoir(
  d: Diode,
  l: Led,
  capacitance: number,
  options: { readonly seriesResistance?: number; readonly frequency?: number } = {},
): TokenLoad {
  parseInput(HalfWaveOptions, { options }, "halfWaveReservoir");
  requireJunction(d, "diode", "diode", "halfWaveReservoir");
  requireJunction(l, "led", "led", "halfWaveReservoir");
  requirePos(capacitance, "capacitance", "F", "halfWaveReservoir");
  if (options.seriesResistance !== undefined) requireNonNegative(options.seriesResistance, "seriesResistance", "Ω", "halfWaveReservoir");
  if (options.frequency !== undefined) requirePos(options.frequency, "frequency", "Hz", "halfWaveReservoir");
  return {
    kind: "halfWaveReservoir",
    diode: d,
    led: l,
    capacitance,
    ...(options.seriesResistance !== undefined ? { seriesResistance: options.seriesResistance } : {}),
    ...(options.frequency !== undefined ? { frequency: options.frequency } : {}),
  };
}

/**
 * A plain resistor (Ω > 0), for checks.
 * @example resistorLoad(100).resistance // → 100 (Ω)
 */
export function resistorLoad(resistance: number): TokenLoad {
  requirePos(resistance, "resistance", "Ω", "resistorLoad");
  return { kind: "resistor", resistance };
}

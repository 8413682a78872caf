/**
 * Ready-made LEDs and rectifier diodes, each built from datasheet-style forward points and
 * labelled with where its numbers come from.
 *
 * Provenance (read before relying on a preset):
 * - LED forward voltage at 20 mA lies inside the ranges of docs/references.md ("reference tables,
 *   not a handbook"): red AlInGaP 1.8–2.1 V, orange 2.0–2.1, yellow 2.1–2.2, green InGaN
 *   3.0–3.5, yellow-green GaP about 2.1, blue 3.0–3.3, white 3.0–3.3.
 * - The 1 mA and 5 mA points (the shape of the curve below rated current) are from memory
 *   (unverified) of typical indicator-LED curves; they are chosen so that a red indicator LED
 *   clamps a tank near 1.7 V and a GaP green one near 2 V at token currents of a few mA
 *   (trade practice, no source).
 * - "Green" is two different parts: the older GaP yellow-green indicator (≈ 2 V, the "about
 *   2 V" of trade lore) and the InGaN true green (≈ 3.2 V). `ledPreset("green")` refuses to
 *   guess and names both.
 * - Diodes: silicon small-signal and small Schottky curves from memory (unverified) of typical
 *   datasheet graphs.
 */
import * as z from "../../zod.ts";
import { led, diode, type Diode, type ForwardPoint, type Led } from "./led.ts";
import { TanklightInputError } from "../../errors.ts";
import { oneOf, parseArgs, temperature, lazySchema } from "../../schema.ts";

const LED_COLOURS = ["red", "orange", "yellow", "green-gap", "green-ingan", "blue", "white"] as const;
const DIODE_KINDS = ["schottky", "silicon"] as const;

/** The LED colours with presets. */
export type LedColour = (typeof LED_COLOURS)[number];

/** The rectifier diode presets. */
export type DiodeKind = (typeof DIODE_KINDS)[number];

/** One preset's data: points, a typical peak wavelength and the provenance text. */
export interface LedPresetData {
  readonly colour: LedColour;
  readonly chemistry: string;
  /** typical peak (dominant) wavelength, m — from memory (unverified); white: the blue pump */
  readonly wavelength: number;
  readonly points: readonly ForwardPoint[];
  readonly source: string;
}

const TABLE_20MA = "V_F at 20 mA inside the docs/references.md range (reference tables, not a handbook)";
const LOW_POINTS = "1 mA and 5 mA points from memory (unverified), typical indicator-LED curve";

/** The currents of every LED preset's forward points, A: the curve's knee (1, 5 mA) and the rated 20 mA. */
const PRESET_CURRENTS = [1e-3, 5e-3, 20e-3] as const;

/** One LED preset: its forward voltages at {@link PRESET_CURRENTS} (V) and the 20 mA range of docs/references.md they sit in. */
function ledRow(colour: LedColour, chemistry: string, wavelength: number, voltages: readonly [number, number, number], range: string): LedPresetData {
  const points = PRESET_CURRENTS.map((current, i) => ({ current, voltage: voltages[i]! }));
  return { colour, chemistry, wavelength, points, source: `${TABLE_20MA} (${range}); ${LOW_POINTS}` };
}

/** The preset table (plain data, exported for docs and tests). */
export const LED_PRESET_DATA: Readonly<Record<LedColour, LedPresetData>> = {
  red: ledRow("red", "AlInGaP", 625e-9, [1.66, 1.77, 1.92], "red AlInGaP 1.8–2.1 V"),
  orange: ledRow("orange", "AlInGaP", 605e-9, [1.78, 1.9, 2.05], "orange 2.0–2.1 V"),
  yellow: ledRow("yellow", "AlInGaP", 590e-9, [1.85, 1.97, 2.15], "yellow 2.1–2.2 V"),
  "green-gap": ledRow("green-gap", "GaP (yellow-green, the older 'about 2 V' indicator green)", 570e-9, [1.9, 1.99, 2.15], "yellow-green GaP about 2.1 V, dim"),
  "green-ingan": ledRow("green-ingan", "InGaN (true green)", 525e-9, [2.65, 2.85, 3.2], "green InGaN 3.0–3.5 V"),
  blue: ledRow("blue", "InGaN", 470e-9, [2.7, 2.88, 3.15], "blue 3.0–3.3 V"),
  white: ledRow("white", "InGaN blue + phosphor", 455e-9, [2.68, 2.86, 3.15], "white 3.0–3.3 V"),
};

/** Diode preset data. */
export const DIODE_PRESET_DATA: Readonly<Record<DiodeKind, { readonly points: readonly ForwardPoint[]; readonly source: string }>> = {
  silicon: {
    points: [{ current: 1e-3, voltage: 0.62 }, { current: 10e-3, voltage: 0.74 }, { current: 100e-3, voltage: 0.95 }],
    source: "silicon small-signal diode, typical curve from memory (unverified)",
  },
  schottky: {
    points: [{ current: 1e-3, voltage: 0.28 }, { current: 10e-3, voltage: 0.36 }, { current: 100e-3, voltage: 0.6 }],
    source: "small-signal Schottky diode, typical curve from memory (unverified)",
  },
};

/** Options for presets: the junction temperature and a label override. */
export const PresetOptions = lazySchema(() => z.strictObject({
  /** junction temperature, K (or "60 degC"); default 298.15 (the points hold at 25 °C) */
  temperature: temperature({ positive: true }).optional(),
  /** label for reports */
  label: z.string().optional(),
}));
/** What {@link ledPreset} and {@link diodePreset} accept as options. */
export type PresetOptions = z.input<typeof PresetOptions>;

const LedPresetArgs = lazySchema(() => z.strictObject({
  colour: oneOf(LED_COLOURS),
  options: PresetOptions.optional(),
}));
const DiodePresetArgs = lazySchema(() => z.strictObject({ kind: oneOf(DIODE_KINDS), options: PresetOptions.optional() }));

/**
 * The presets at the default options, each fitted on first use (the fit is not free) and never
 * changed after: at most one entry per colour. With a temperature or a label the LED is fitted anew.
 */
const defaultLeds = new Map<LedColour, Led>();

/**
 * A ready-made LED of a colour, fitted (three points, exact) to its preset forward points.
 * @param colour "red" | "orange" | "yellow" | "green-gap" | "green-ingan" | "blue" | "white";
 *   "green" alone is ambiguous and throws, naming both greens.
 * @param options temperature (K) and label.
 * @returns a {@link Led} with `source` naming where its numbers come from.
 * @example ledPreset("red").voltage(20e-3) // → 1.92 (V, the preset's 20 mA point)
 * Related: led, LED_PRESET_DATA, diodePreset.
 */
export function ledPreset(colour: LedColour, options: PresetOptions = {}): Led {
  if ((colour as string) === "green") {
    const hint = "ambiguous: use 'green-gap' (GaP yellow-green, ≈ 2 V, the trade's 'about 2 V' green) or 'green-ingan' (InGaN true green, ≈ 3.2 V)";
    throw new TanklightInputError([{ path: "colour", message: hint, value: colour }], "ledPreset");
  }
  const args = parseArgs(LedPresetArgs, [colour, options], "ledPreset");
  const o = args.options ?? {};
  if (o.temperature !== undefined || o.label !== undefined) return presetLed(args.colour, o);
  const made = defaultLeds.get(args.colour) ?? presetLed(args.colour, o);
  defaultLeds.set(args.colour, made);
  return made;
}

/** The preset LED of a colour fitted to its points, at a temperature and with a label. */
function presetLed(colour: LedColour, options: { readonly temperature?: number | undefined; readonly label?: string | undefined }): Led {
  const data = LED_PRESET_DATA[colour];
  return led({
    points: data.points,
    colour,
    label: options.label ?? `${colour} LED (preset)`,
    source: data.source,
    ...(options.temperature !== undefined ? { temperature: options.temperature } : {}),
  });
}

/**
 * A ready-made rectifier diode: "schottky" (small-signal Schottky) or "silicon" (small-signal).
 * @example diodePreset("schottky").voltage(10e-3) // → 0.36 (V)
 */
export function diodePreset(kind: DiodeKind, options: PresetOptions = {}): Diode {
  const args = parseArgs(DiodePresetArgs, [kind, options], "diodePreset");
  const o = args.options ?? {};
  const data = DIODE_PRESET_DATA[args.kind];
  return diode({
    points: data.points,
    label: o.label ?? `${args.kind} diode (preset)`,
    source: data.source,
    ...(o.temperature !== undefined ? { temperature: o.temperature } : {}),
  });
}

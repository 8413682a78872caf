/**
 * Design files: a tanklight design as JSON — one transmitter coil under a surface, a token
 * (coil, E-series capacitor, LED colours), the drive and supply, the barrier between them —
 * validated by our zod schema, with a JSON Schema exported for editors.
 *
 * Design files are untrusted input: the text is size-limited before parsing, parsed with
 * JSON.parse only (nothing is evaluated), every object is strict (unknown fields are errors),
 * arrays and counts are bounded, and every quantity passes the unit checks of lib/schema.ts.
 * Errors name the field by its JSON path ("token.coil.turns: …").
 */
import * as z from "../zod.ts";
import { TanklightInputError } from "../errors.ts";
import { LED_PRESET_DATA } from "../circuit/loads/ledPresets.ts";
import { FlatSpiralSpec } from "../em/builders/flatSpiral.ts";
import { RectSpiralSpec } from "../em/builders/rectSpiral.ts";
import { RoundCoilSpec } from "../em/builders/roundCoil.ts";
import { SolenoidSpec } from "../em/builders/solenoid.ts";
import { current, frequency, length, parseInput, quantityMeta, resistivity, voltage, lazySchema } from "../schema.ts";
import { DIMENSIONS } from "../units.ts";

/** Largest design file accepted, bytes. */
export const DESIGN_FILE_MAX_BYTES = 64 * 1024;

/** Most turns a design file may ask for (a bound on the work an untrusted file can cause). */
export const DESIGN_MAX_TURNS = 3000;

const bounded = lazySchema(() => ({ turns: z.number().int().min(1).max(DESIGN_MAX_TURNS), segmentsPerTurn: z.number().int().min(8).max(256).optional() }));
const coil = lazySchema(() => z
  .discriminatedUnion("shape", [
    RoundCoilSpec.extend({ shape: z.literal("roundCoil"), turns: bounded.turns }),
    FlatSpiralSpec.extend({ shape: z.literal("flatSpiral"), ...bounded }),
    RectSpiralSpec.extend({ shape: z.literal("rectSpiral"), ...bounded }),
    SolenoidSpec.extend({ shape: z.literal("solenoid"), turns: bounded.turns }),
  ])
  .describe("a coil: shape 'roundCoil' | 'flatSpiral' | 'rectSpiral' | 'solenoid' with that builder's fields (docs/methods/coils.md)"));

const series = lazySchema(() => z.enum(["E3", "E6", "E12", "E24", "E48", "E96", "E192"]));
const ledColour = lazySchema(() => z.enum(Object.keys(LED_PRESET_DATA) as [string, ...string[]]));
const text = (max: number) => z.string().max(max);

/** The schema of a design file. */
export const DesignFile = lazySchema(() => z.strictObject({
  /** editors' schema reference (ignored) */
  $schema: text(300).optional(),
  /** short name: the report folder out/<name> (lower-case letters, digits, '-') */
  name: z.string().regex(/^[a-z0-9][a-z0-9-]{0,59}$/, "lower-case letters, digits and '-', at most 60").describe("short name: the report is written to out/<name>/"),
  title: text(120).describe("the report's title"),
  question: text(300).optional().describe("the question the design answers"),
  dataNote: text(600).describe("where the numbers come from; say 'Demo data' for invented ones"),
  story: z.array(text(2000)).max(20).optional().describe("paragraphs printed after the title (Markdown: **bold**, *italic*, `code`, '- ' lists)"),
  transmitter: z.strictObject({
    coil,
    /** the drive: a single switch to ground (parallel tank, tuned 1.3× above the drive) or a half bridge (series tank) */
    drive: z.enum(["singleSwitch", "halfBridge"]).describe("singleSwitch: one switch to ground under a parallel tank; halfBridge: a half bridge into a series tank"),
    capacitorSeries: series,
    /** parts per tank capacitor, 1–3 */
    capacitorParts: z.union([z.literal(1), z.literal(2), z.literal(3)]),
  }),
  token: z.strictObject({
    coil,
    capacitorSeries: series,
    capacitorParts: z.union([z.literal(1), z.literal(2), z.literal(3)]),
    /** the frequency the token is tuned to with its E-series capacitor (the drive follows the token) */
    tuneTo: frequency({ min: 1e3, max: 30e6 }).describe("the token is tuned here with its E-series capacitor; the drive follows the token"),
    /** one or more LED colours to compare */
    leds: z.array(ledColour).min(1).max(4).describe("LED colours to compare (presets)"),
    /** tokens in the batch (for the parts list) */
    count: z.number().int().min(1).max(100000),
  }),
  supply: z.strictObject({
    voltage: voltage({ positive: true, max: 60 }),
    /** the supply's current rating */
    rating: current({ positive: true, max: 100 }),
  }),
  surface: z.strictObject({
    /** token coil centre above the transmitter winding centre when the token lies on the surface */
    gap: length({ max: 1 }).describe("token coil centre above the transmitter winding centre when the token lies on the surface"),
    /** how far out from the centre the display area reaches */
    reach: length({ max: 2 }).describe("how far from the centre the display area reaches"),
    touchHeight: length({ max: 1 }).optional().describe("height above the winding of the nearest surface people touch (default: 2 mm below the token coil centre)"),
    /** heights above the winding to tabulate (default: the gap to 6 × the gap) */
    heights: z.array(length({ max: 2 })).min(2).max(60).optional(),
    /** what lies between transmitter and token */
    barrier: z.strictObject({
      material: text(60),
      thickness: length({ max: 1 }),
      /** its resistivity, Ω·m (paper, wood, glass ~1e8–1e14; copper 1.7e-8) */
      resistivity: resistivity(),
    }),
  }),
  /** lit threshold (default 0.5 mA, the link solver's) */
  litThreshold: current({ positive: true, max: 1 }).optional(),
}));

/** A design file as written (quantities as numbers or strings). */
export type DesignFileInput = z.input<typeof DesignFile>;
/** A parsed design (quantities SI numbers; coil specs as given, for the builders). */
export type Design = z.output<typeof DesignFile>;

/**
 * Validates a design (already parsed JSON).
 * @throws TanklightInputError whose issues carry the JSON path of each bad field.
 * @example parseDesign({ name: "my pad" }) // → throws TanklightInputError (naming each missing field by its JSON path)
 */
export function parseDesign(input: unknown): Design {
  return parseInput(DesignFile, input, "design file");
}

/**
 * Reads a design file's text: size limit, JSON.parse (no evaluation), then the schema.
 * @example parseDesignText("[1, 2") // → throws TanklightInputError (not valid JSON)
 */
export function parseDesignText(textIn: string): Design {
  if (typeof textIn !== "string") throw new TanklightInputError([{ path: "text", message: "must be the design file's text (a string; parseDesign takes the parsed object)", value: textIn }], "design file");
  const bytes = new TextEncoder().encode(textIn).length;
  if (bytes > DESIGN_FILE_MAX_BYTES) {
    throw new TanklightInputError([{ path: "", message: `is too large (limit ${DESIGN_FILE_MAX_BYTES} bytes)`, value: `${bytes} bytes` }], "design file");
  }
  let json: unknown;
  try {
    json = JSON.parse(textIn);
  } catch (e) {
    throw new TanklightInputError([{ path: "", message: `is not valid JSON (${(e as Error).message})`, value: textIn.slice(0, 40) }], "design file");
  }
  return parseDesign(json);
}

/**
 * The JSON Schema (draft 2020-12) of design files, for editors: quantities appear as
 * "a number in SI units or a string with a unit", with their dimension and an example.
 * @example designJsonSchema().type // → "object"
 */
export function designJsonSchema(): Record<string, unknown> {
  return z.toJSONSchema(DesignFile, {
    io: "input",
    unrepresentable: "any",
    override: (ctx) => {
      const meta = quantityMeta(ctx.zodSchema as unknown as z.ZodType);
      if (!meta) return;
      const info = DIMENSIONS[meta.dimension];
      const prior = (ctx.jsonSchema as { description?: string }).description;
      for (const k of Object.keys(ctx.jsonSchema)) delete (ctx.jsonSchema as Record<string, unknown>)[k];
      Object.assign(ctx.jsonSchema, {
        anyOf: [{ type: "number" }, { type: "string" }],
        description: `${prior ? `${prior}: ` : ""}${info.noun}, a number in ${meta.unit || "SI units"} or a string with a unit, e.g. '${info.example}'`,
      });
    },
  }) as Record<string, unknown>;
}

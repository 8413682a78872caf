/**
 * The parts list of a design: every capacitor as the purchasable parts it is made of (series,
 * value, tolerance, voltage rating, dielectric), the wire of each coil (gauge and length),
 * the LEDs by colour, and the supply with the current it must deliver.
 *
 * Voltage ratings follow recommendCapacitor (trade practice, no source: rating ≥ 2 × peak).
 * In a series string the peak voltage divides in inverse proportion to the capacitances
 * (charge conservation: V_i = V·C_total/C_i); in the mixed two-level forms each part is rated
 * for the whole tank voltage, which is on the safe side.
 */
import * as z from "../zod.ts";
import { recommendCapacitor, DIELECTRICS, DielectricSchema, type Dielectric } from "../circuit/dielectrics.ts";
import { SERIES_TOLERANCE, ESeriesSchema, type ESeries } from "../circuit/eseries.ts";
import { checkCoil, checkConductor } from "../em/inputs.ts";
import { capacitance, current, lazySchema, oneOf, parseArgs, parseInput, voltage, wholeNumber } from "../schema.ts";
import { awgDiameter } from "../em/classicFormulas.ts";
import type { Coil, Conductor } from "../em/types.ts";
import { formatQuantity } from "../units.ts";

/** One line of the parts list. */
export interface PartRow {
  /** where it goes, e.g. "token tank capacitor" */
  readonly item: string;
  /** what to buy, e.g. "2.2 nF ±10 % (E12), 100 V, class 1 ceramic C0G (NP0)" */
  readonly part: string;
  /** how many per design (or per batch, as the caller counts) */
  readonly quantity: number;
  readonly notes: string;
}

/** A tank capacitor made of standard parts (as tuneWithStandardParts / bestCombination choose them). */
export interface CapacitorBuild {
  readonly item: string;
  /** part values, F */
  readonly parts: readonly number[];
  /** "single", "series", "parallel" or a mixed form */
  readonly topology: string;
  readonly series: ESeries;
  /** peak voltage across the whole capacitor, V */
  readonly peakVoltage: number;
  /** how many such capacitors (default 1) */
  readonly quantity?: number;
  /** dielectric to use instead of the recommendation */
  readonly dielectric?: Dielectric;
}

/** What {@link partsList} needs. */
export interface PartsInput {
  readonly coils: readonly { readonly item: string; readonly coil: Coil; readonly quantity?: number }[];
  readonly capacitors: readonly CapacitorBuild[];
  readonly leds: readonly { readonly item: string; readonly colour: string; readonly quantity?: number }[];
  readonly supply: { readonly item: string; readonly voltage: number; readonly current: number; readonly rating?: number };
}

/** AWG gauge whose diameter is within 2 % of d, if any. */
function nearestAwg(d: number): number | undefined {
  let best: number | undefined, err = Infinity;
  for (let g = -3; g <= 56; g++) {
    const e = Math.abs(awgDiameter(g) / d - 1);
    if (e < err) { err = e; best = g; }
  }
  return err <= 0.02 ? best : undefined;
}

/**
 * The wire of a coil in words: "0.10 mm enamelled copper (AWG 38)".
 * @example wireText(roundWire("0.1 mm", { insulation: "10 um" })) // → "0.10 mm copper wire (AWG 38), 0.12 mm over insulation"
 */
export function wireText(c: Conductor): string {
  c = checkConductor(c, "conductor", "wireText");
  const mm = (x: number) => `${(x * 1e3).toFixed(x < 1e-3 ? 3 : 2).replace(/0$/, "")} mm`;
  switch (c.kind) {
    case "round": {
      const g = nearestAwg(c.diameter);
      return `${mm(c.diameter)} ${c.material ?? "copper"} wire${g !== undefined ? ` (AWG ${g})` : ""}, ${mm(c.outerDiameter)} over insulation`;
    }
    case "litz":
      return `litz ${c.strands} × ${mm(c.strandDiameter)} ${c.material ?? "copper"}, ${mm(c.outerDiameter)} over serving`;
    case "trace":
      return `PCB trace ${mm(c.width)} wide, ${(c.thickness * 1e6).toFixed(0)} µm ${c.material ?? "copper"}`;
    default:
      return "conductor";
  }
}

/**
 * Peak voltage across each part of a combination, V (see the module comment).
 * @example partVoltages([2.2e-9, 2.2e-9], "series", 3) // → [1.5, 1.5] (V: equal parts in series share the peak)
 */
export function partVoltages(parts: readonly number[], topology: string, peak: number | string): number[] {
  ({ parts, topology, peak } = parseArgs(PartVoltagesArgs, [parts, topology, peak], "partVoltages"));
  return partVoltagesCore(parts, topology, peak);
}

/** partVoltages for checked values (partsList's parsed builds). */
function partVoltagesCore(parts: readonly number[], topology: string, peak: number): number[] {
  if (topology === "series") {
    const total = 1 / parts.reduce((s, c) => s + 1 / c, 0);
    return parts.map((c) => (peak * total) / c);
  }
  return parts.map(() => peak);
}

/**
 * The parts list of a design.
 * @param input coils, capacitor builds, LEDs and the supply (SI values).
 * @returns one row per purchasable part.
 * @example partsList({ coils: [], capacitors: [{ item: "token tank", parts: [2.2e-9], topology: "single", series: "E12", peakVoltage: 3 }], leds: [], supply: { item: "USB", voltage: 5, current: 0.2 } })[0].part
 * // → "2.20 nF ±10 % (E12), 6.3 V, class 1 ceramic C0G (NP0)"
 */
export function partsList(input: PartsInput): PartRow[] {
  input = parseInput(PartsListArgs, { input }, "partsList").input as PartsInput;
  input.coils.forEach((k, i) => checkCoil(k.coil, `input.coils[${i}].coil`, "partsList"));
  const rows: PartRow[] = [];
  for (const c of input.capacitors) {
    const volts = partVoltagesCore(c.parts, c.topology, c.peakVoltage);
    const tol = SERIES_TOLERANCE[c.series];
    c.parts.forEach((value, i) => {
      const rec = recommendCapacitor(volts[i]!, value);
      const d = c.dielectric ?? rec.dielectrics[0]!;
      const rating = Number.isFinite(rec.ratedVoltage) ? `${rec.ratedVoltage} V` : `≥ ${formatQuantity(2 * volts[i]!, "V")} (split into several in series)`;
      rows.push({
        item: c.parts.length > 1 ? `${c.item} (part ${i + 1} of ${c.parts.length}, ${c.topology})` : c.item,
        part: `${formatQuantity(value, "F")} ±${(tol * 100).toFixed(tol < 0.01 ? 1 : 0)} % (${c.series}), ${rating}, ${DIELECTRICS[d].name}`,
        quantity: c.quantity ?? 1,
        notes: `${formatQuantity(volts[i]!, "V")} peak across it`,
      });
    });
  }
  for (const k of input.coils) {
    rows.push({
      item: k.item,
      part: wireText(k.coil.conductor),
      quantity: k.quantity ?? 1,
      notes: `${k.coil.turns} turns, ${formatQuantity(k.coil.wireLength, "m")} of wire each (plus leads)`,
    });
  }
  for (const l of input.leds) {
    rows.push({ item: l.item, part: `${l.colour} indicator LED`, quantity: l.quantity ?? 1, notes: "any common indicator LED of that colour; the model uses the colour's preset" });
  }
  const s = input.supply;
  const rated = s.rating !== undefined ? `, rated ${formatQuantity(s.rating, "A")}` : "";
  rows.push({
    item: s.item,
    part: `${formatQuantity(s.voltage, "V")} DC supply${rated}`,
    quantity: 1,
    notes: `draws ${formatQuantity(s.current, "A")} (${formatQuantity(s.current * s.voltage, "W")})${s.rating !== undefined ? (s.current <= s.rating ? `, ${((100 * s.current) / s.rating).toFixed(0)} % of its rating` : ", MORE than its rating") : ""}`,
  });
  return rows;
}

/** The topologies bestCombination names (docs of Combination.topology). */
const TOPOLOGIES = ["single", "series", "parallel", ...(["series", "parallel"] as const).flatMap((a) => (["series", "parallel"] as const).map((b) => `${a} pair in ${b} with one`))];
/** Parts in one combination at most (a tank is built from a few parts). */
const MAX_PARTS = 64;
/** Items of one row at most (a batch). */
const MAX_QUANTITY = 1e6;
const capacitorParts = () => z.array(capacitance()).min(1).max(MAX_PARTS, { error: `must hold at most ${MAX_PARTS} parts (one combination)` });
/** partVoltages' arguments. */
const PartVoltagesArgs = lazySchema(() => z.strictObject({ parts: capacitorParts(), topology: oneOf(TOPOLOGIES), peak: voltage({ nonNegative: true }) }));
/** partsList's input (strict: a typo names the nearest key); coils are checked like hand-made ones. */
const PartsListArgs = lazySchema(() => {
  const quantity = () => wholeNumber(1, MAX_QUANTITY, "a batch count").optional();
  const item = () => z.string({ error: "must be a string naming the item" });
  return z.strictObject({
    input: z.strictObject({
      coils: z.array(z.strictObject({ item: item(), coil: z.unknown(), quantity: quantity() })),
      capacitors: z.array(z.strictObject({
        item: item(), parts: capacitorParts(), topology: oneOf(TOPOLOGIES), series: ESeriesSchema,
        peakVoltage: voltage({ nonNegative: true }), quantity: quantity(), dielectric: DielectricSchema.optional(),
      })),
      leds: z.array(z.strictObject({ item: item(), colour: z.string({ error: "must be a colour (a string)" }), quantity: quantity() })),
      supply: z.strictObject({ item: item(), voltage: voltage({ nonNegative: true }), current: current({ nonNegative: true }), rating: current({ positive: true }).optional() }),
    }),
  });
});

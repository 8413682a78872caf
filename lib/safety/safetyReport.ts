/**
 * safetyReport: every safety check of a design in one record, with margins, plus the same as
 * Markdown lines for a report or casebook notebook to print.
 */
import * as z from "../zod.ts";
import { TanklightInputError } from "../errors.ts";
import { lazySchema, parseInput } from "../schema.ts";
import { parseSafetyDesign, type SafetyDesign } from "./design.ts";
import { exposureCheck, ExposureOptionsInput, type ExposureCheck, type ExposureOptions } from "./exposure.ts";
import { emissionEstimate, type EmissionEstimate } from "./emission.ts";
import { componentStress, type ComponentStress } from "./componentStress.ts";
import { metalHeating, MetalObjectInput, type MetalHeating, type MetalObject } from "./metalHeating.ts";
import { cautions, type Caution } from "./cautions.ts";
import { fmtValue } from "./partRatings.ts";

/**
 * The everyday objects a report heats by default, each lying on the surface above the first
 * transmitter: a 24 mm coin (cupronickel, 1.7 mm), a 60 mm disc of kitchen foil (aluminium,
 * 20 µm) and a finger ring (gold, 18 mm across, 4 mm wide, 1.5 mm wall). Demo objects, sizes
 * typical of the trade (no source).
 */
export const DEFAULT_METAL_OBJECTS: readonly MetalObject[] = [
  { kind: "disc", label: "24 mm coin", radius: 0.012, thickness: 1.7e-3, metal: "cupronickel" },
  { kind: "disc", label: "60 mm kitchen foil", radius: 0.03, thickness: 2e-5, metal: "aluminium" },
  { kind: "ring", label: "finger ring", radius: 0.009, width: 4e-3, thickness: 1.5e-3, metal: "gold" },
];

/** Options of {@link safetyReport}. */
export interface SafetyReportOptions {
  readonly exposure?: ExposureOptions;
  /** metal objects to heat (default {@link DEFAULT_METAL_OBJECTS}) */
  readonly metalObjects?: readonly MetalObject[];
}

/** Everything, with margins. */
export interface SafetyReport {
  readonly exposure: ExposureCheck;
  readonly emission: EmissionEstimate;
  readonly stress: ComponentStress;
  readonly metal: readonly MetalHeating[];
  readonly cautions: readonly Caution[];
  /** one line per finding that needs attention (an exceeded limit, rating or threshold) */
  readonly attention: readonly string[];
  /** the report as Markdown lines: sections Exposure, Emission, Component stress, Metal heating, Cautions */
  readonly markdown: readonly string[];
}

/**
 * All safety checks of a design: exposureCheck (reference levels and basic restriction),
 * emissionEstimate (15.209 and 70-03 Annex 9), componentStress (capacitors, switch, winding,
 * LEDs), metalHeating for a coin, foil and a ring (or the objects given), and cautions quoting
 * their numbers — with a Markdown rendering for reports. Every section says it is an estimate,
 * not a compliance test.
 * @param design see {@link SafetyDesign} (designFromLink builds one from a solved link).
 * @param options exposure grid options and the metal objects.
 * @returns {@link SafetyReport}.
 * @example safetyReport({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil: tx, current: 1 }] }).markdown[0] // → "## Safety and compliance margins (estimates, not a compliance test)"
 */
export function safetyReport(design: SafetyDesign, options: SafetyReportOptions = {}): SafetyReport {
  const d = parseSafetyDesign(design, "safetyReport");
  const o = parseInput(SafetyReportArgs, { options }, "safetyReport").options ?? {};
  const exposure = exposureCheck(d, o.exposure ?? {});
  const emission = emissionEstimate(d);
  const stress = componentStress(d);
  const metal = (o.metalObjects ?? DEFAULT_METAL_OBJECTS).map((m, i) => metalOf(d, m, i));
  const list = cautions(d, { exposure, emission, metal });
  const attention = [
    ...exposure.referenceLevels.filter((l) => l.verdict === "exceeds" && l.status === "checked").map((l) => l.text),
    ...exposure.basicRestriction.filter((b) => b.verdict === "exceeds").map((b) => b.text),
    ...emission.limits.filter((l) => l.verdict === "exceeds").map((l) => l.text),
    ...stress.problems,
    ...metal.filter((m) => m.verdict === "caution").map((m) => m.text),
  ];
  return { exposure, emission, stress, metal, cautions: list, attention, markdown: markdownOf(exposure, emission, stress, metal, list) };
}

/** safetyReport's options (strict: a typo names the nearest key; fields checked as exposureCheck and metalHeating check them). */
const SafetyReportArgs = lazySchema(() => z.strictObject({
  options: z.strictObject({ exposure: ExposureOptionsInput.optional(), metalObjects: z.array(MetalObjectInput).optional() }).optional(),
}));

/** metalHeating of one object; its cross-field error (an object below the surface) named under safetyReport's option. */
function metalOf(d: Parameters<typeof metalHeating>[0], object: MetalObject, i: number): MetalHeating {
  try {
    return metalHeating(d, object);
  } catch (e) {
    if (!(e instanceof TanklightInputError)) throw e;
    throw new TanklightInputError(e.issues.map((x) => ({ ...x, path: x.path.replace(/^object/, `options.metalObjects[${i}]`) })), "safetyReport");
  }
}

function markdownOf(exposure: ExposureCheck, emission: EmissionEstimate, stress: ComponentStress, metal: readonly MetalHeating[], list: readonly Caution[]): string[] {
  const w = exposure.worst;
  const lines = [
    "## Safety and compliance margins (estimates, not a compliance test)",
    "",
    "### Exposure",
    "",
    `Worst accessible point: ${fmtValue(w.flux, "T")} RMS (${fmtValue(w.fieldStrength, "A/m")} RMS), ${fmtValue(w.height, "m")} above the surface at (${w.point.map((x) => fmtValue(x, "m")).join(", ")}). Grid: ${exposure.grid}.`,
    "",
    "| standard | population | limit (RMS) | status | verdict | met from (above surface) |",
    "|---|---|---|---|---|---|",
    ...exposure.referenceLevels.map((l) =>
      l.verdict === "not covered"
        ? `| ${l.standard} | ${l.population} | — | — | not covered at this frequency | — |`
        : `| ${l.standard} | ${l.population} | ${fmtValue(l.limit!, "T")} (${l.row}) | ${l.status} | ${l.verdict === "meets" ? `meets, margin ${l.marginDb!.toFixed(1)} dB` : `EXCEEDS by ${(-l.marginDb!).toFixed(1)} dB (×${l.ratio!.toPrecision(3)})`} | ${l.compliantAbove === undefined ? "not within the assessed space" : fmtValue(l.compliantAbove, "m")} |`,
    ),
    "",
    "Basic restriction (internal electric field, ICNIRP 2010 Table 2):",
    "",
    ...exposure.basicRestriction.map((b) => `- ${b.text}`),
    "",
    ...exposure.governs.map((g) => `- ${g}`),
    "",
    `Conventions: ${exposure.convention}. Model: ${exposure.model}. ${exposure.disclaimer}`,
    ...exposure.warnings.map((x) => `- warning: ${x}`),
    "",
    "### Radiated emission",
    "",
    `Magnetic dipole moment ${fmtValue(emission.moment, "A·m²")} peak; near/far transition at λ/2π = ${fmtValue(emission.transition, "m")}.`,
    "",
    "| distance | H (RMS) | dBµA/m | dBµV/m (plane-wave equivalent) | zone |",
    "|---|---|---|---|---|",
    ...emission.fields.map((f) => `| ${f.distance} m | ${fmtValue(f.fieldStrength, "A/m")} | ${f.dBuAm.toFixed(1)} | ${f.dBuVm.toFixed(1)} | ${f.kr < 1 ? "near field" : "far field"} (kr = ${f.kr.toPrecision(3)}) |`),
    "",
    ...emission.limits.map((l) => `- ${l.text}`),
    ...emission.notCovered.map((n) => `- ${n}`),
    ...emission.warnings.map((x) => `- warning: ${x}`),
    "",
    emission.disclaimer,
    "",
    "### Component stress",
    "",
    ...[...stress.transmitters.flatMap((t) => t.checks), ...stress.receivers.flatMap((r) => r.checks)].map((c) => `- ${c.text}`),
    "",
    `Models: ${stress.model}.`,
    "",
    "### Metal objects on the surface",
    "",
    ...metal.map((m) => `- ${m.text}`),
    "",
    "### Cautions",
    "",
    ...list.map((c) => `- ${c.text}`),
  ];
  return lines;
}

/**
 * cautions: the plain-language cautions every report prints — implanted medical devices, metal
 * objects heating, high tank voltages, small tokens within reach of children, radio
 * interference — each with this design's numbers where they are known, and each deferring to
 * local codes, regulations and licensed practice.
 */
import { HIGH_VOLTAGE, METAL_HEATING_POWER, SMALL_PART_DIAMETER } from "../hazards.ts";
import { TanklightInputError, requireObject, unknownKeyMessage } from "../errors.ts";
import { parseSafetyDesign, type SafetyDesign } from "./design.ts";
import type { ExposureCheck } from "./exposure.ts";
import type { EmissionEstimate } from "./emission.ts";
import type { MetalHeating } from "./metalHeating.ts";
import { fmtValue } from "./partRatings.ts";

/** One caution: which hazard, and the sentence. */
export interface Caution {
  readonly hazard: "implanted medical devices" | "metal heating" | "high voltage" | "small parts" | "radio interference";
  readonly text: string;
}

/** Results that make the cautions specific (all optional; without them the cautions are general). */
export interface CautionContext {
  readonly exposure?: ExposureCheck;
  readonly emission?: EmissionEstimate;
  readonly metal?: readonly MetalHeating[];
}

const DEFER = "Follow local codes, regulations and licensed practice.";

/**
 * The cautions for a design: always implanted medical devices, metal heating and radio
 * interference; high voltage when a tank or switch exceeds HIGH_VOLTAGE (42.4 V peak); small
 * parts when a token is smaller than the small-parts cylinder (31.7 mm) or its size is not given.
 * Each ends by deferring to local codes, regulations and licensed practice.
 * @param design see {@link SafetyDesign}.
 * @param context results of exposureCheck, emissionEstimate and metalHeating, to quote their numbers.
 * @returns the cautions, one per hazard.
 * @example cautions({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil: tx, current: 1 }] }).length // → 4 (no token size given: the small-parts caution is included)
 */
export function cautions(design: SafetyDesign, context: CautionContext = {}): Caution[] {
  const d = parseSafetyDesign(design, "cautions");
  checkContext(context);
  const out: Caution[] = [];
  const worst = context.exposure ? ` This design's field reaches ${fmtValue(context.exposure.worst.flux, "T")} RMS at the surface.` : "";
  out.push({
    hazard: "implanted medical devices",
    text: `People with pacemakers, defibrillators, insulin pumps, cochlear implants or other implanted or body-worn medical devices should keep them away from the transmitter surface and follow the device maker's guidance on induction sources; exposure limits for the general public do not protect such devices.${worst} ${DEFER}`,
  });
  const hot = (context.metal ?? []).filter((m) => m.verdict === "caution");
  const metalNumbers = context.metal?.length
    ? ` Estimated here: ${context.metal.map((m) => `${m.object} ${fmtValue(m.power, "W")}`).join(", ")} (caution above ${METAL_HEATING_POWER.value} W${hot.length ? `; exceeded by ${hot.map((m) => m.object).join(", ")}` : ""}).`
    : "";
  out.push({
    hazard: "metal heating",
    text: `Coins, keys, foil, rings and other metal left on the transmitter heat up in its field and can burn; do not leave it powered unattended with metal on it, or add detection of foreign metal.${metalNumbers} ${DEFER}`,
  });
  const highV: string[] = [];
  for (const [i, t] of d.transmitters.entries()) {
    const label = t.label ?? `transmitter ${i + 1}`;
    if (t.capacitor && t.capacitor.voltage > HIGH_VOLTAGE.value) highV.push(`${label} tank ${fmtValue(t.capacitor.voltage, "V")} peak`);
    if (t.switchPeakVoltage !== undefined && t.switchPeakVoltage > HIGH_VOLTAGE.value) highV.push(`${label} switch ${fmtValue(t.switchPeakVoltage, "V")} peak`);
  }
  for (const [k, r] of d.receivers.entries()) {
    if (r.capacitor && r.capacitor.voltage > HIGH_VOLTAGE.value) highV.push(`${r.label ?? `receiver ${k + 1}`} tank ${fmtValue(r.capacitor.voltage, "V")} peak`);
  }
  if (highV.length) {
    out.push({ hazard: "high voltage", text: `High voltage: ${highV.join(", ")} — above ${HIGH_VOLTAGE.value} V peak (30 V RMS). Resonant tanks can shock and burn: insulate, rate the parts for it and discharge before handling. ${DEFER}` });
  }
  const sizes = d.receivers.map((r) => r.size);
  const small = sizes.filter((s): s is number => s !== undefined && s < SMALL_PART_DIAMETER.value);
  if (d.receivers.length === 0 || sizes.some((s) => s === undefined) || small.length) {
    const why = small.length
      ? `tokens of ${small.map((s) => fmtValue(s, "m")).join(", ")} fit through the ${SMALL_PART_DIAMETER.value * 1e3} mm small-parts cylinder`
      : "token sizes are not given: check them against the 31.7 mm small-parts cylinder";
    out.push({ hazard: "small parts", text: `Small tokens within reach of young children are a choking hazard (${why}); toys and products for children fall under toy-safety rules. ${DEFER}` });
  }
  const em = context.emission?.limits.filter((l) => l.verdict === "exceeds") ?? [];
  const emText = context.emission
    ? em.length
      ? ` The dipole estimate exceeds ${em.map((l) => `${l.rule} by ${(-l.marginDb).toFixed(1)} dB`).join(" and ")}.`
      : ` The dipole estimate meets the carried limits (smallest margin ${Math.min(...context.emission.limits.map((l) => l.marginDb)).toFixed(1)} dB).`
    : "";
  out.push({
    hazard: "radio interference",
    text: `Any transmitter radiates and can interfere with radio services and nearby electronics; radio rules for inductive devices apply to the product, and the estimates here are not a compliance test.${emText} ${DEFER}`,
  });
  return out;
}

const CONTEXT_KEYS: readonly string[] = Object.freeze(["exposure", "emission", "metal"]);

/** cautions' context: only the results of exposureCheck, emissionEstimate and metalHeating (a typo names the nearest key). */
function checkContext(context: unknown): void {
  const where = "cautions";
  requireObject(context, "context", where);
  const c = context as Record<string, unknown>;
  const fail = (path: string, message: string, value: unknown): never => {
    throw new TanklightInputError([{ path, message, value }], where);
  };
  for (const key of Object.keys(c)) if (!CONTEXT_KEYS.includes(key)) fail(`context.${key}`, unknownKeyMessage(key, CONTEXT_KEYS), c[key]);
  const has = (v: unknown, path: readonly string[]): boolean => path.reduce<unknown>((o, k) => (o !== null && typeof o === "object" ? (o as Record<string, unknown>)[k] : undefined), v) !== undefined;
  if (c["exposure"] !== undefined && !(has(c["exposure"], ["worst", "flux"]) && typeof (c["exposure"] as { worst: { flux: unknown } }).worst.flux === "number")) {
    fail("context.exposure", "must be what exposureCheck returned", c["exposure"]);
  }
  if (c["emission"] !== undefined && !(typeof c["emission"] === "object" && c["emission"] !== null && !Array.isArray(c["emission"]))) fail("context.emission", "must be what emissionEstimate returned", c["emission"]);
  const metal = c["metal"];
  if (metal !== undefined && !(Array.isArray(metal) && metal.every((m) => m !== null && typeof m === "object" && typeof m.object === "string" && typeof m.power === "number" && typeof m.verdict === "string"))) {
    fail("context.metal", "must be a list of what metalHeating returned", metal);
  }
}

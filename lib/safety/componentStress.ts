/**
 * componentStress: tank capacitors, the drive's switch, the transmitter winding and the tokens'
 * LEDs at the operating point, against their ratings (given, or typical where the design gives
 * none), with a first estimate of the winding's temperature rise.
 */
import { capacitorStress } from "../circuit/stress.ts";
import { coilResistance } from "../em/losses/coilResistance.ts";
import type { Coil } from "../em/types.ts";
import { HIGH_VOLTAGE, WINDING_TEMPERATURE_RISE } from "../hazards.ts";
import { parseSafetyDesign, type SafetyDesign, type SafetyDesignParsed } from "./design.ts";
import { TYPICAL_INDICATOR_LED, WINDING_CURRENT_DENSITY, checkRatingCore, fmtValue, type RatingCheck } from "./partRatings.ts";
import { rmsFromPeak } from "./rms.ts";

/** The winding-temperature model, named once. */
export const WINDING_TEMPERATURE_MODEL =
  "McLyman's empirical rise of a small wound component in still air, ΔT = 450·(P/A)^0.826 K with P in W and A the winding's outer surface in cm² (Transformer and Inductor Design Handbook; from memory (unverified)) — about h ≈ 10–13 W/(m²·K) at these loadings";

/** One transmitter's stress. */
export interface TransmitterStress {
  readonly label: string;
  readonly checks: readonly RatingCheck[];
  /** coil current density over the copper cross-section, A/m² RMS */
  readonly currentDensity: number;
  /** winding loss used for the temperature estimate, W, and where it came from */
  readonly windingLoss: number;
  readonly windingLossSource: "given" | "coilResistance";
  /** winding outer surface, m² */
  readonly windingSurface: number;
  /** estimated winding temperature rise, K */
  readonly temperatureRise: number;
}

/** One token's stress. */
export interface ReceiverStress {
  readonly label: string;
  readonly checks: readonly RatingCheck[];
}

/** What componentStress returns. */
export interface ComponentStress {
  readonly transmitters: readonly TransmitterStress[];
  readonly receivers: readonly ReceiverStress[];
  /** every check that is over a rating or a threshold, as text */
  readonly problems: readonly string[];
  /** high-voltage cautions (tank voltages above HIGH_VOLTAGE) */
  readonly cautions: readonly string[];
  readonly model: string;
}

/** Copper cross-section of a coil's conductor, m² (DC area: the skin effect only adds to the density). */
export function copperArea(coil: Coil): number {
  const c = coil.conductor;
  switch (c.kind) {
    case "round":
      return (Math.PI * c.diameter * c.diameter) / 4;
    case "litz":
      return (c.strands * Math.PI * c.strandDiameter * c.strandDiameter) / 4;
    case "trace":
      return c.width * c.thickness;
  }
}

/** Outer surface of a winding, m², from the builder's shape record; the bare wire's surface when there is none. */
export function windingSurface(coil: Coil): number {
  const s = coil.shape;
  const c = coil.conductor;
  const perimeter = c.kind === "trace" ? 2 * (c.width + c.thickness) : Math.PI * c.outerDiameter;
  switch (s?.kind) {
    case "roundCoil":
      return 2 * Math.PI * s.outerRadius * s.windingHeight + 2 * Math.PI * (s.outerRadius ** 2 - s.innerRadius ** 2) + 2 * Math.PI * s.innerRadius * s.windingHeight;
    case "solenoid":
      return 2 * Math.PI * s.radius * s.length;
    case "flatSpiral":
      return 2 * Math.PI * (s.outerRadius ** 2 - s.innerRadius ** 2);
    case "rectSpiral":
      return s.stacking === "planar" ? 2 * (s.outerWidth * s.outerHeight - s.innerWidth * s.innerHeight) : 2 * (s.outerWidth + s.outerHeight) * s.turns * s.pitch;
    default:
      return coil.wireLength * perimeter;
  }
}

/** McLyman's still-air rise, K: 450·(P/A)^0.826 with P/A in W/cm². */
function mcLymanRise(power: number, surface: number): number {
  const psi = power / (surface * 1e4);
  return psi > 0 ? 450 * psi ** 0.826 : 0;
}

function capacitorChecks(what: string, cap: NonNullable<SafetyDesignParsed["transmitters"][number]["capacitor"]>, f: number, cautions: string[]): RatingCheck[] {
  const s = capacitorStress({ capacitance: cap.capacitance, frequency: f, voltageAmplitude: cap.voltage });
  cautions.push(...s.cautions.map((c) => `${what}: ${c}`));
  return [
    checkRatingCore(`${what} voltage (peak)`, s.peakVoltage, "V", cap.rating),
    checkRatingCore(`${what} current (RMS)`, s.rmsCurrent, "A", cap.currentRating),
  ];
}

/**
 * Stress on every part at the operating point: each tank capacitor's peak voltage and RMS
 * current (capacitorStress, lib/circuit) against its ratings, the switch's peak voltage against
 * its rating, the transmitter winding's current density (RMS over the copper's DC area, against
 * 5 A/mm², trade practice) and temperature rise ({@link WINDING_TEMPERATURE_MODEL}, against 40 K,
 * lib/hazards.ts), and each LED's average current against its rated and absolute-maximum
 * current (typical indicator LED, 20 mA / 30 mA, trade practice, unless the design gives them).
 * @param design see {@link SafetyDesign}.
 * @returns {@link ComponentStress}: per-part checks with margins, the problems in words, and
 *   the high-voltage cautions.
 * @example componentStress({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil: tx, current: 1 }], receivers: [{ leds: [{ averageCurrent: 0.502 }] }] }).receivers[0].checks[0].verdict // → "over absolute maximum"
 */
export function componentStress(design: SafetyDesign): ComponentStress {
  const d = parseSafetyDesign(design, "componentStress");
  const f = d.frequency;
  const cautions: string[] = [];
  const transmitters = d.transmitters.map((t, i): TransmitterStress => {
    const label = t.label ?? `transmitter ${i + 1}`;
    const checks: RatingCheck[] = [];
    if (t.capacitor) checks.push(...capacitorChecks(`${label} capacitor`, t.capacitor, f, cautions));
    if (t.switchPeakVoltage !== undefined) {
      checks.push(checkRatingCore(`${label} switch voltage (peak)`, t.switchPeakVoltage, "V", t.switchRating));
      if (t.switchPeakVoltage > HIGH_VOLTAGE.value) cautions.push(`${label} switch node: ${fmtValue(t.switchPeakVoltage, "V")} peak, above ${HIGH_VOLTAGE.value} V: ${HIGH_VOLTAGE.meaning}; follow local codes, regulations and licensed practice`);
    }
    const iRms = rmsFromPeak(t.current);
    const j = iRms / copperArea(t.coil);
    checks.push(checkRatingCore(`${label} winding current density (RMS)`, j * 1e-6, "A/mm²", WINDING_CURRENT_DENSITY.value * 1e-6));
    const lossSource = t.coilLoss !== undefined ? "given" : "coilResistance";
    const loss = t.coilLoss ?? iRms * iRms * coilResistance(t.coil, f);
    const surface = windingSurface(t.coil);
    const rise = mcLymanRise(loss, surface);
    checks.push(checkRatingCore(`${label} winding temperature rise`, rise, "K", WINDING_TEMPERATURE_RISE.value));
    return { label, checks, currentDensity: j, windingLoss: loss, windingLossSource: lossSource, windingSurface: surface, temperatureRise: rise };
  });
  const receivers = d.receivers.map((r, k): ReceiverStress => {
    const label = r.label ?? `receiver ${k + 1}`;
    const checks: RatingCheck[] = [];
    r.leds.forEach((led, n) => {
      const name = `${label} ${led.label ?? `LED ${n + 1}`} current (average)`;
      checks.push(checkRatingCore(name, led.averageCurrent, "A", led.ratedCurrent ?? TYPICAL_INDICATOR_LED.ratedCurrent, led.maximumCurrent ?? TYPICAL_INDICATOR_LED.maximumCurrent));
    });
    if (r.capacitor) checks.push(...capacitorChecks(`${label} capacitor`, r.capacitor, f, cautions));
    return { label, checks };
  });
  const problems = [...transmitters.flatMap((t) => t.checks), ...receivers.flatMap((r) => r.checks)]
    .filter((c) => c.verdict === "over rating" || c.verdict === "over absolute maximum")
    .map((c) => c.text);
  return {
    transmitters,
    receivers,
    problems,
    cautions,
    model: `capacitors: capacitorStress (I = ωCV, RMS = peak/√2); winding: ${WINDING_TEMPERATURE_MODEL}; LED ratings: ${TYPICAL_INDICATOR_LED.source} unless given`,
  };
}

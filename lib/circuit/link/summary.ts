/**
 * A link result in words and units: one row per quantity, with the SI value, its unit and the
 * formatted text ("1.04 A", "9.88 mW"), and a plain-text rendering — "how bright is each of
 * these tokens, here", answered with units.
 */
import { formatQuantity } from "../../units.ts";
import { TanklightInputError, requireObject } from "../../errors.ts";
import type { LinkResult } from "./result.ts";

/** One reported quantity. */
export interface LinkSummaryRow {
  /** what the number is, e.g. "token 1 · red LED (preset) · average current" */
  readonly quantity: string;
  /** SI value */
  readonly value: number;
  /** SI unit ("" for a ratio) */
  readonly unit: string;
  /** value with unit and SI prefix, e.g. "1.23 mA" */
  readonly text: string;
}

/** The summary: rows, verdict lines, warnings and cautions, and all of it as text. */
export interface LinkSummary {
  readonly rows: readonly LinkSummaryRow[];
  /** one line per LED: "token 1 · red LED (preset): lit (1.23 mA ≥ 0.5 mA)" */
  readonly verdicts: readonly string[];
  readonly warnings: readonly string[];
  readonly cautions: readonly string[];
  readonly text: string;
}

/**
 * Every number of a link result with its unit, plus one lit/unlit line per LED.
 * @param result from solveLink or solveLinkNetwork.
 * @param digits significant figures (default 3).
 * @returns {@link LinkSummary}; `text` is a printable block.
 * @example summarizeLink(solveLink(system)).verdicts[0] // → "receiver 1 · red LED (preset): lit (1.16 mA ≥ 500 µA)" (system: solveLink's example)
 */
export function summarizeLink(result: LinkResult, digits = 3): LinkSummary {
  requireObject(result, "result", "summarizeLink");
  const r = result as { frequency?: unknown; receivers?: unknown; transmitters?: unknown };
  if (!(typeof r.frequency === "number" && Number.isFinite(r.frequency) && Array.isArray(r.receivers) && Array.isArray(r.transmitters))) {
    throw new TanklightInputError([{ path: "result", message: "must be what solveLink or solveLinkNetwork returned (a frequency, transmitters and receivers)", value: "an object without them" }], "summarizeLink");
  }
  if (!(Number.isInteger(digits) && digits >= 1 && digits <= 17)) throw new TanklightInputError([{ path: "digits", message: "must be a whole number of significant figures from 1 to 17", value: digits }], "summarizeLink");
  const rows: LinkSummaryRow[] = [];
  const add = (quantity: string, value: number, unit: string): void => {
    rows.push({ quantity, value, unit, text: formatQuantity(value, unit, digits) });
  };
  add("drive frequency", result.frequency, "Hz");
  for (const t of result.transmitters ?? [result.transmitter]) {
    const tx = t.label;
    add(`${tx} · coil current (peak)`, t.coilCurrent, "A");
    add(`${tx} · coil current (RMS)`, t.coilCurrentRms, "A");
    add(`${tx} · coil voltage (peak)`, t.coilVoltage, "V");
    add(`${tx} · capacitor voltage (peak)`, t.capacitorVoltage, "V");
    add(`${tx} · capacitor current (peak)`, t.capacitorCurrent, "A");
    add(`${tx} · source current (peak)`, t.sourceCurrent, "A");
    add(`${tx} · reflected resistance`, t.reflectedImpedance.re, "Ω");
    add(`${tx} · reflected reactance`, t.reflectedImpedance.im, "Ω");
    add(`${tx} · coil loss`, t.coilLoss, "W");
    add(`${tx} · capacitor loss`, t.capacitorLoss, "W");
    add(`${tx} · driver loss`, t.driverLoss, "W");
  }
  // shared drives (an own drive's numbers are its transmitter's above)
  for (const d of (result.drives ?? []).filter((x) => x.wiring !== "own")) {
    add(`drive ${d.label} (${d.wiring}: ${d.transmitters.join(", ")}) · source current (peak)`, d.sourceCurrent, "A");
    add(`drive ${d.label} · terminal voltage (peak)`, d.sourceVoltage, "V");
    add(`drive ${d.label} · input power`, d.inputPower, "W");
    add(`drive ${d.label} · driver loss`, d.driverLoss, "W");
  }
  const verdicts: string[] = [];
  for (const r of result.receivers) {
    const n = r.label;
    add(`${n} · induced EMF (peak)`, r.emf, "V");
    add(`${n} · coil current (peak)`, r.coilCurrent, "A");
    add(`${n} · tank voltage (peak)`, r.loadVoltage, "V");
    add(`${n} · tank voltage (RMS)`, r.loadVoltageRms, "V");
    add(`${n} · capacitor voltage (peak)`, r.capacitorVoltage, "V");
    add(`${n} · capacitor current (peak)`, r.capacitorCurrent, "A");
    add(`${n} · load power`, r.loadPower, "W");
    add(`${n} · coil loss`, r.coilLoss, "W");
    add(`${n} · capacitor loss`, r.capacitorLoss, "W");
    for (const led of r.leds) {
      add(`${n} · ${led.label} · average current`, led.averageCurrent, "A");
      add(`${n} · ${led.label} · relative brightness`, led.relativeBrightness, "");
      const cmp = led.lit ? "≥" : "<";
      verdicts.push(
        `${n} · ${led.label}: ${led.lit ? "lit" : "unlit"} (${formatQuantity(led.averageCurrent, "A", digits)} ${cmp} ${formatQuantity(result.litThreshold, "A", digits)})`,
      );
    }
  }
  const p = result.power;
  add("input power", p.input, "W");
  add("power to the loads", p.delivered, "W");
  add("efficiency", p.efficiency * 100, "%");
  const width = Math.max(...rows.map((r) => r.quantity.length));
  const lines = [
    `drive: ${result.drive.label}`,
    ...rows.map((r) => `${r.quantity.padEnd(width)}  ${r.text}`),
    "",
    `lit threshold ${formatQuantity(result.litThreshold, "A", digits)} (${result.litThresholdSource})`,
    ...verdicts,
    ...(result.warnings.length ? ["", "warnings:", ...result.warnings.map((w) => `- ${w}`)] : []),
    ...(result.cautions.length ? ["", "cautions:", ...result.cautions.map((c) => `- ${c}`)] : []),
    ...(result.converged ? [] : ["", "NOT CONVERGED: the numbers above are the last iterate"]),
  ];
  return { rows, verdicts, warnings: result.warnings, cautions: result.cautions, text: lines.join("\n") };
}

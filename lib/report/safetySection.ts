/**
 * The safety sections of a report, from lib/safety's safetyReport: exposure (reference levels
 * and the basic restriction, with a map of the field where people reach), radiated emission,
 * component stress and metal heating — as notebook cells with units. Every section says it is
 * an estimate, not a compliance test. The cautions are returned for the report's cautions cell.
 */
import { magneticField } from "../em/magneticField.ts";
import type { Coil, Pose } from "../em/types.ts";
import type { SafetyReport } from "../safety/safetyReport.ts";
import { formatQuantity as fmt } from "../units.ts";
import * as chart from "./chart.ts";
import { requireNotebook, type Notebook } from "./notebook.ts";
import { TanklightInputError } from "../errors.ts";

/** What the exposure map needs: the transmitter coil, its pose, its current and the surface. */
export interface FieldMapInput {
  readonly coil: Coil;
  readonly pose?: Pose;
  /** transmitter coil current, A peak */
  readonly current: number;
  /** height of the touchable surface above the transmitter, m */
  readonly surfaceHeight: number;
  /** how far out from the axis to map, m */
  readonly reach: number;
}

/**
 * Adds the exposure, emission, stress and metal-heating sections of `report` to `nb`.
 * @param map when given, an exposure map (RMS |B| over offset × height above the surface, from
 *   the field model at the coil current, sinusoidal: RMS = peak/√2) with the ICNIRP 2010
 *   general-public reference level drawn as a contour.
 * @returns the caution texts, for nb.cautions.
 * @example const texts = addSafetySections(nb, safetyReport(designFromLink(system, solveLink(system), { surfaceHeight: 0.005 })))
 */
export function addSafetySections(nb: Notebook, report: SafetyReport, map?: FieldMapInput): string[] {
  requireNotebook(nb, "nb", "addSafetySections");
  const r = report as Partial<SafetyReport> | null;
  if (typeof r !== "object" || r === null || typeof r.exposure?.worst !== "object" || typeof r.emission !== "object" || typeof r.stress !== "object" || !Array.isArray(r.metal) || !Array.isArray(r.cautions)) {
    throw new TanklightInputError([{ path: "report", message: "must be what safetyReport returned", value: typeof r === "object" && r !== null ? "an object without exposure, emission, stress, metal and cautions" : report }], "addSafetySections");
  }
  const e = report.exposure;
  nb.heading("Exposure (an estimate, not a compliance test)");
  nb.text(`Worst accessible point: **${fmt(e.worst.flux, "T")} RMS** (${fmt(e.worst.fieldStrength, "A/m")} RMS), ${fmt(e.worst.height, "m")} above the surface. Grid: ${e.grid}.`);
  nb.table(
    ["standard", "population", "limit (RMS)", "verdict", "met from (height above the surface)"],
    e.referenceLevels.map((l) => [
      `${l.standard}${l.status && l.status !== "checked" ? ` (${l.status})` : ""}`,
      l.population,
      l.limit === undefined ? "—" : { value: l.limit, unit: "T" },
      l.verdict === "not covered" ? "not covered at this frequency" : l.verdict === "meets" ? `meets, margin ${l.marginDb!.toFixed(1)} dB` : `EXCEEDS by ${(-l.marginDb!).toFixed(1)} dB`,
      l.verdict === "not covered" ? "—" : l.compliantAbove === undefined ? "not within the assessed space" : { value: l.compliantAbove, unit: "m" },
    ]),
    "magnetic reference levels at the operating frequency",
  );
  nb.text(...e.basicRestriction.map((b) => `- ${b.text}`), "", ...e.governs.map((g) => `- ${g}`), "", `Conventions: ${e.convention}. Model: ${e.model}. ${e.disclaimer}`);
  const level = e.referenceLevels.find((l) => l.standard === "ICNIRP 2010" && l.population === "public" && l.limit !== undefined);
  if (map && level?.limit) {
    const offsets = Array.from({ length: 31 }, (_, i) => (i / 30) * map.reach);
    const heights = Array.from({ length: 21 }, (_, i) => 0.002 + (i / 20) * Math.max(0.1, 2 * map.reach));
    const pose = map.pose ?? { position: [0, 0, 0] as const };
    const field = heights.map((h) =>
      offsets.map((x) => {
        const b = magneticField(map.coil, pose, map.current, [x, 0, map.surfaceHeight + h]);
        return Math.hypot(b[0], b[1], b[2]) / Math.SQRT2;
      }),
    );
    nb.figure(
      "exposure",
      chart.exposure({ title: "Magnetic field above the surface", offset: offsets, height: heights, field, referenceLevel: level.limit, referenceName: "ICNIRP 2010 general public" }),
      "RMS flux density over a vertical plane through the transmitter axis, above the touchable surface; the red line, where drawn, is the ICNIRP 2010 general-public reference level",
    );
  }
  const m = report.emission;
  nb.heading("Radiated emission (an estimate, not a compliance test)");
  nb.text(`Magnetic dipole moment ${fmt(m.moment, "A·m²")} peak; the near field turns into the far field at λ/2π = ${fmt(m.transition, "m")}.`);
  nb.table(
    ["distance", "H (RMS)", "dBµA/m", "dBµV/m (plane-wave equivalent)", "zone"],
    m.fields.map((f) => [{ value: f.distance, unit: "m" }, { value: f.fieldStrength, unit: "A/m" }, f.dBuAm.toFixed(1), f.dBuVm.toFixed(1), f.kr < 1 ? "near field" : "far field"]),
  );
  nb.text(...m.limits.map((l) => `- ${l.text}`), ...m.notCovered.map((n) => `- ${n}`), "", m.disclaimer);
  nb.heading("Component stress");
  nb.text(...[...report.stress.transmitters.flatMap((t) => t.checks), ...report.stress.receivers.flatMap((r) => r.checks)].map((c) => `- ${c.text}`));
  nb.heading("Metal objects on the surface");
  nb.table(
    ["object", "eddy-current power", "regime", "verdict"],
    report.metal.map((x) => [x.object, { value: x.power, unit: "W" }, x.regime, x.verdict]),
  );
  nb.text(...report.metal.map((x) => `- ${x.text}`));
  return report.cautions.map((c) => c.text);
}

import { describe, expect, it } from "vitest";
import { componentStress, copperArea, windingSurface } from "../../lib/safety/componentStress.ts";
import { cautions } from "../../lib/safety/cautions.ts";
import { safetyReport } from "../../lib/safety/safetyReport.ts";
import { designFromLink } from "../../lib/safety/design.ts";
import { checkRating, TYPICAL_INDICATOR_LED } from "../../lib/safety/partRatings.ts";
import { solveLink } from "../../lib/circuit/link.ts";
import { ledPreset } from "../../lib/circuit/loads/ledPresets.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { flatSpiral } from "../../lib/em/builders/flatSpiral.ts";
import { HIGH_VOLTAGE } from "../../lib/hazards.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { expectOutside } from "../helpers/validation.ts";

const drawerTx = roundCoil({ meanRadius: "50 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
const pebble = roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
const system = (drive: object) => ({
  frequency: "200 kHz",
  transmitter: { coil: drawerTx, compensation: "parallel" as const, capacitor: { capacitance: "56 nF", rating: "50 V" }, drive: drive as { kind: "parallelTank"; supply: string } },
  receivers: [{ coil: pebble, pose: { position: [0, 0, "30 mm"] as [number, number, string] }, topology: "parallel" as const, capacitor: { capacitance: "2.2 nF" }, load: { kind: "led" as const, led: ledPreset("red") } }],
});

describe("designFromLink: a solved link as the safety checks' input", () => {
  it("carries the solved coil current and phase, the capacitor voltage and rating, the switch's peak and the LED currents", () => {
    const sys = system({ kind: "parallelTank", supply: "5 V" });
    const sol = solveLink(sys);
    const d = designFromLink(sys, sol, { surfaceHeight: 0.004, tokenSize: 0.025 });
    const t = d.transmitters[0]!;
    expect(t.current).toBe(sol.transmitter.coilCurrent);
    expect((t.capacitor as { voltage: number }).voltage).toBe(sol.transmitter.capacitorVoltage);
    expect((t.capacitor as { rating: number }).rating).toBe(50);
    expectRelClose(t.switchPeakVoltage as number, Math.PI * 5, 1e-15, "single switch under a parallel tank: π·V_DD");
    expect(d.receivers![0]!.leds![0]!.averageCurrent).toBe(sol.receivers[0]!.leds[0]!.averageCurrent);
    expect(d.surfaceHeight).toBe(0.004);
  });
});

describe("componentStress: parts against their ratings", () => {
  it("the regulated 1000 A drive that put hundreds of mA through an indicator LED now says it is over the absolute maximum", () => {
    const sys = system({ kind: "currentRegulated", amplitude: "1000 A" });
    const d = designFromLink(sys, solveLink(sys), { surfaceHeight: 0.004 });
    const s = componentStress(d);
    const led = s.receivers[0]!.checks[0]!;
    expect(led.value).toBeGreaterThan(0.1);
    expect(led.verdict).toBe("over absolute maximum");
    expect(led.text).toMatch(/EXCEEDS the absolute maximum 30\.0 mA/);
    expect(s.problems.join("\n")).toMatch(/transmitter capacitor voltage \(peak\): .* EXCEEDS its rating 50\.0 V/);
    expect(s.cautions.join(" ")).toMatch(/local codes/);
  });

  it("a design inside its ratings says its margins; the LED defaults are the typical indicator values (trade practice)", () => {
    const sys = system({ kind: "parallelTank", supply: "5 V" });
    const s = componentStress(designFromLink(sys, solveLink(sys), { surfaceHeight: 0.004 }));
    expect(s.problems).toEqual([]);
    expect(s.receivers[0]!.checks[0]!.text).toMatch(/within its rating 20\.0 mA \(margin ×/);
    expect(TYPICAL_INDICATOR_LED.ratedCurrent).toBe(20e-3);
    expect(checkRating("x", 25e-3, "A", 20e-3, 30e-3).verdict).toBe("over rating");
  });

  it("winding current density over the copper area, and the capacitor current I = ωCV", () => {
    const coil = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
    const s = componentStress({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil, current: 2, capacitor: { capacitance: 10e-9, voltage: 30, currentRating: 0.1 }, coilLoss: 0.5 }] });
    const t = s.transmitters[0]!;
    expectRelClose(t.currentDensity, 2 / Math.SQRT2 / (Math.PI * 0.25e-3 ** 2), 1e-12, "J = I_rms/area");
    expectRelClose(copperArea(coil), Math.PI * 0.25e-3 ** 2, 1e-15, "round wire area");
    const ic = t.checks.find((c) => c.what.includes("capacitor current"))!;
    expectRelClose(ic.value, (2 * Math.PI * 200e3 * 10e-9 * 30) / Math.SQRT2, 1e-12, "I_rms = ωCV/√2");
    expect(ic.verdict).toBe("over rating");
    // McLyman: ΔT = 450·ψ^0.826, ψ in W/cm² — from memory (unverified)
    expectOutside({ quantity: "winding rise, 0.5 W over the winding surface", source: "from memory (unverified): McLyman, Transformer and Inductor Design Handbook, ΔT = 450·ψ^0.826", ours: t.temperatureRise, reference: 450 * (0.5 / (windingSurface(coil) * 1e4)) ** 0.826, rtol: 1e-12, unit: "K" });
    // a flat spiral: both faces
    const sp = flatSpiral({ innerRadius: 0.01, turns: 10, pitch: 1e-3, wire: { diameter: 0.5e-3 } });
    const shape = sp.shape as { outerRadius: number; innerRadius: number };
    expectRelClose(windingSurface(sp), 2 * Math.PI * (shape.outerRadius ** 2 - shape.innerRadius ** 2), 1e-15, "flat spiral faces");
  });
});

describe("cautions and safetyReport", () => {
  it("every caution defers to local codes, regulations and licensed practice; high voltage appears only above the threshold", () => {
    const coil = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
    const low = cautions({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil, current: 1, capacitor: { capacitance: 1e-8, voltage: HIGH_VOLTAGE.value * 0.99 } }], receivers: [{ size: 0.05 }] });
    expect(low.map((c) => c.hazard)).toEqual(["implanted medical devices", "metal heating", "radio interference"]);
    for (const c of low) expect(c.text).toMatch(/local codes, regulations and licensed practice/);
    const high = cautions({ frequency: 200e3, surfaceHeight: 0.005, transmitters: [{ coil, current: 1, capacitor: { capacitance: 1e-8, voltage: HIGH_VOLTAGE.value * 1.01 } }], receivers: [{ size: 0.02 }] });
    expect(high.map((c) => c.hazard)).toEqual(["implanted medical devices", "metal heating", "high voltage", "small parts", "radio interference"]);
    expect(high.find((c) => c.hazard === "small parts")!.text).toMatch(/20\.0 mm fit through the 31\.7 mm/);
  });

  it("safetyReport bundles exposure, emission, stress, metal heating and cautions, with margins, as Markdown too", () => {
    const sys = system({ kind: "parallelTank", supply: "5 V" });
    const r = safetyReport(designFromLink(sys, solveLink(sys), { surfaceHeight: 0.004, tokenSize: 0.025 }), { exposure: { nx: 21, ny: 21, nz: 6 } });
    const md = r.markdown.join("\n");
    for (const h of ["### Exposure", "### Radiated emission", "### Component stress", "### Metal objects on the surface", "### Cautions"]) expect(md).toContain(h);
    expect(md).toMatch(/not a compliance test/);
    expect(md).toMatch(/margin/);
    expect(r.metal.length).toBe(3);
    expect(r.cautions.length).toBeGreaterThanOrEqual(4);
    expect(r.attention.join("\n")).toMatch(/ICNIRP 2010 .*EXCEEDS/);
  });
});

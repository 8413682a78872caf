/**
 * Trade-practice range check (issue 6): a hand-sized 5 V single-switch kit lights small LC+LED
 * tokens up to about 10–11 cm on the axis and less sideways at the surface, and a red LED
 * reaches further than a green one. trade practice (no source).
 *
 * The parts are chosen once as a real kit could have them, and not tuned afterwards:
 * - transmitter: 5 turns of 0.8 mm enamelled copper (0.03 mm enamel) on a 50 mm mean radius,
 *   one layer; its capacitor 100 nF + 6.8 nF in parallel (two E12 film capacitors, tan δ 1e-3)
 *   chosen to land near the token's resonance;
 * - drive: one switch to ground under the transmitter tank fed from 5 V (R_on 0.05 Ω, a small
 *   logic-level MOSFET), self-oscillating at the transmitter tank's resonance — modelled by
 *   parallelTankDrive (tank fundamental π·V_DD/2, see lib/circuit/drive.ts);
 * - token: 120 turns of 0.1 mm enamelled copper (AWG 38, 0.01 mm enamel), 6 layers on a 6.5 mm
 *   former (mean radius ≈ 6.9 mm, inside the 5–8 mm of the trade statement); 2.2 nF C0G (E12,
 *   tan δ 1e-3); one red (AlInGaP) or one yellow-green GaP LED preset across the capacitor;
 * - the surface: tokens lie flat on a lid whose top puts the token's centre 5 mm above the
 *   transmitter's winding plane.
 * Visibility: the trade band 0.1–1 mA of average LED current (trade practice, no source); the
 * range is reported at both ends; the "about 10–11 cm" is compared with the range at the band's
 * low end (a token that is just visible indoors).
 */
import { describe, expect, it } from "vitest";
import { expectOutside } from "../helpers/validation.ts";
import { solveLink, type LinkSystem } from "../../lib/circuit/link.ts";
import { classEDesign } from "../../lib/circuit/drive.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { selfInductance } from "../../lib/em/selfInductance.ts";
import { coilResistance } from "../../lib/em/losses/coilResistance.ts";
import { ledPreset, type LedColour } from "../../lib/circuit/loads/ledPresets.ts";

const tx = roundCoil({ meanRadius: "50 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
const token = roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
const C1 = 100e-9 + 6.8e-9;
const C2 = 2.2e-9;
const L1 = selfInductance(tx);
const frequency = 1 / (2 * Math.PI * Math.sqrt(L1 * C1)); // the self-oscillating kit runs at its tank's resonance
const SURFACE = 0.005;

function kit(colour: LedColour, x: number, z: number): LinkSystem {
  return {
    frequency,
    transmitter: {
      coil: tx,
      compensation: "parallel",
      capacitor: { capacitance: C1, dissipationFactor: 1e-3 },
      drive: { kind: "parallelTank", supply: "5 V", onResistance: "0.05 ohm" },
    },
    receivers: [
      {
        coil: token,
        pose: { position: [x, 0, z] },
        topology: "parallel",
        capacitor: { capacitance: C2, dissipationFactor: 1e-3, rating: "50 V" },
        load: { kind: "led", led: ledPreset(colour) },
      },
    ],
  };
}
const ledCurrent = (colour: LedColour, x: number, z: number): number => solveLink(kit(colour, x, z)).receivers[0]!.leds[0]!.averageCurrent;

/** Largest axial distance at which the LED still carries `threshold` (bisection, 0.1 mm). */
function axialRange(colour: LedColour, threshold: number): number {
  let lo = 0.005;
  let hi = 0.3;
  expect(ledCurrent(colour, 0, lo)).toBeGreaterThan(threshold);
  while (hi - lo > 1e-4) {
    const m = (lo + hi) / 2;
    if (ledCurrent(colour, 0, m) >= threshold) lo = m;
    else hi = m;
  }
  return lo;
}

/** Sliding sideways on the surface from the centre: the first offset where the LED drops below `threshold` (1 mm steps, then bisection). */
function sidewaysRange(colour: LedColour, threshold: number): number {
  let x = 0;
  while (x < 0.3 && ledCurrent(colour, x + 1e-3, SURFACE) >= threshold) x += 1e-3;
  let lo = x;
  let hi = x + 1e-3;
  while (hi - lo > 1e-4) {
    const m = (lo + hi) / 2;
    if (ledCurrent(colour, m, SURFACE) >= threshold) lo = m;
    else hi = m;
  }
  return lo;
}

describe("trade-practice range of a 5 V single-switch kit", () => {
  const TRADE = "trade practice (no source): hand-sized 5 V kits light small LC+LED tokens to about 10–11 cm on the axis";

  it("the parts are what a kit has: resonances near 200 kHz and matched within a few per cent", () => {
    const L2 = selfInductance(token);
    const f2 = 1 / (2 * Math.PI * Math.sqrt(L2 * C2));
    expect(frequency).toBeGreaterThan(180e3);
    expect(frequency).toBeLessThan(220e3);
    expect(Math.abs(f2 / frequency - 1)).toBeLessThan(0.03);
    const shape = token.shape as { meanRadius: number; outerRadius: number };
    expect(shape.meanRadius).toBeGreaterThan(0.005);
    expect(shape.outerRadius).toBeLessThan(0.008);
    // why not an optimum class-E drive here: sized for the bare coil's resistance it asks for
    // tens of watts from 5 V (R = 0.5768·V²/P, Sokal & Sokal 1975) — not a hand-sized kit
    const r1 = coilResistance(tx, frequency);
    expect(classEDesign({ supply: 5, frequency, resistance: r1 + 0.05 }).power).toBeGreaterThan(20);
  });

  it("on the axis a red token stays visible to about 10–11 cm (low end of the visibility band)", () => {
    const at01 = axialRange("red", 0.1e-3);
    const at1 = axialRange("red", 1e-3);
    // tolerance 15 %: the trade figure is "about", and the visibility threshold itself spans a
    // decade (0.1–1 mA) — the range at 1 mA is printed beside it for the report
    expectOutside({ quantity: "kit on-axis range, red LED, 0.1 mA visible", source: TRADE, ours: at01, reference: 0.105, rtol: 0.15, unit: "m" });
    expect(at1).toBeLessThan(at01);
    console.info(`kit: f = ${(frequency / 1e3).toFixed(1)} kHz; red on-axis range ${(at01 * 100).toFixed(1)} cm at 0.1 mA, ${(at1 * 100).toFixed(1)} cm at 1 mA`);
  });

  it("a red LED reaches further than a green (GaP) one", () => {
    // trade practice (no source): red lights further than green — the lower forward voltage
    // clamps the tank lower and conducts at a weaker field
    const red = axialRange("red", 0.1e-3);
    const green = axialRange("green-gap", 0.1e-3);
    expect(red).toBeGreaterThan(green);
    console.info(`kit: on-axis range at 0.1 mA: red ${(red * 100).toFixed(2)} cm, green (GaP) ${(green * 100).toFixed(2)} cm`);
  });

  it("sliding sideways on the surface the token goes dark sooner than it does along the axis", () => {
    // trade practice (no source): less range sideways at the surface. The physics behind it:
    // near the winding the flux through a flat token reverses and passes through zero
    // (docs/physics-notes.md), so a dark ring sits just outside the winding radius.
    for (const threshold of [0.1e-3, 0.3e-3, 1e-3]) {
      const side = sidewaysRange("red", threshold);
      const axial = axialRange("red", threshold);
      // the dark ring near the 50 mm winding ends the lit patch at every threshold
      expect(side).toBeLessThan(0.06);
      expect(side).toBeGreaterThan(0.03);
      // at the visible end of the band (0.1, 0.3 mA) sideways < axial, as the trade says; at
      // 1 mA the axial range (3.5 cm) is already shorter than the distance to the winding:
      // there the statement does not hold, and we say so rather than hide it
      if (threshold < 0.5e-3) expect(side).toBeLessThan(axial);
      console.info(`kit: threshold ${threshold * 1e3} mA: sideways ${(side * 100).toFixed(1)} cm, axial ${(axial * 100).toFixed(1)} cm`);
    }
  });
});

/**
 * coverageMap and findRange over a system of several transmitters (issues 13 and 16): the
 * probe solves the same network solveLink builds (every transmitter, every transmitter–token
 * mutual inductance), so a map agrees with direct solveLink calls point by point; two coils in
 * anti-phase cancel on their symmetry plane, and the adaptive refinement finds that dead line
 * where a uniform 1 cm grid steps over it.
 */
import { describe, expect, it } from "vitest";
import { coverageMap, findRange, ledPreset, roundCoil, solveLink, TanklightInputError, toleranceYield, type LinkSystem } from "../../lib/mod.ts";
import { expectOutside } from "../helpers/validation.ts";
import type { Vec3 } from "../../lib/em/types.ts";
import { portableSpec } from "../../lib/analysis/probe.ts";
import { probeSpec } from "../../lib/analysis/probeSpec.ts";
import { selfInductance } from "../../lib/em/selfInductance.ts";

// demo parts (not a published design): two 40 mm, 5-turn pads 90 mm apart and a 60-turn LED token
const pad = roundCoil({ meanRadius: "40 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
const token = roundCoil({ innerRadius: "5 mm", turns: 60, layers: 3, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
const f = 200e3;
const Z = 0.01;
const w = 2 * Math.PI * f;
const Cpad = 1 / (w * w * selfInductance(pad, { frequency: f }));
const Ctok = 1 / (w * w * selfInductance(token, { frequency: f }));

type Tx = NonNullable<LinkSystem["transmitters"]>[number];
const padTx = (x: number, phase: string): Tx => ({
  coil: pad,
  pose: { position: [x, 0, 0] },
  compensation: "series",
  capacitor: { capacitance: Cpad, esr: 0.05 },
  drive: { kind: "sine", amplitude: "5 V", outputResistance: "1 Ω" },
  phase,
});
/** two pads in anti-phase (own drives, 0° and 180°), one LED token at `position` */
const pair = (position: Vec3 = [0, 0, Z]): LinkSystem => ({
  frequency: f,
  transmitters: [padTx(-0.045, "0 deg"), padTx(0.045, "180 deg")],
  receivers: [{ coil: token, pose: { position }, topology: "parallel", capacitor: { capacitance: Ctok, dissipationFactor: 1e-3 }, load: { kind: "led", led: ledPreset("red") } }],
});

const ledAt = (position: Vec3): number => solveLink(pair(position), { tabulateLoads: true }).receivers[0]!.leds[0]!.averageCurrent;
const DIRECT = "independent method: solveLink(system) with the token at that pose (tabulated loads, as the map)";

describe("coverageMap and findRange over several transmitters", () => {
  it("agree point by point with direct solveLink calls (2 coils in anti-phase)", async () => {
    const map = await coverageMap(pair(), { x: { from: -0.06, to: 0.06, points: 5 }, y: { from: 0, to: 0.02, points: 2 }, z: Z }, { refine: false });
    expect(map.shape).toEqual([5, 2]);
    for (let j = 0; j < 2; j++) {
      for (let i = 0; i < 5; i++) {
        const pos: Vec3 = [map.axes[0]!.values[i]!, map.axes[1]!.values[j]!, Z];
        const direct = solveLink(pair(pos), { tabulateLoads: true });
        const k = i + 5 * j;
        expectOutside({ quantity: `LED current at (${pos.join(", ")}) m`, source: DIRECT, ours: map.ledCurrent[k]!, reference: direct.receivers[0]!.leds[0]!.averageCurrent, rtol: 1e-9, atol: 1e-15, unit: "A" });
        // the net coupling: Σ Mᵢ·Re(Iᵢ/I₀) with the network's M and the solved coil currents
        const I = direct.transmitters.map((t) => t.coilCurrentPhasor);
        const ref = 0;
        const d = I[ref]!.re ** 2 + I[ref]!.im ** 2;
        const net = [0, 1].reduce((a, n) => a + (direct.network.inductance[n]![2]! * (I[n]!.re * I[ref]!.re + I[n]!.im * I[ref]!.im)) / d, 0);
        expectOutside({ quantity: `net coupling at (${pos.join(", ")}) m`, source: DIRECT, ours: map.mutual[k]!, reference: net, rtol: 1e-9, atol: 1e-18, unit: "H" });
      }
    }
    // on the symmetry plane the two fields cancel through a flat token: no current at all
    expect(map.ledCurrent[2]).toBe(0);
    expect(Math.abs(map.mutual[2]!)).toBeLessThan(1e-15);
  });

  it("finds the anti-phase dead line on the symmetry plane that a uniform 1 cm grid steps over", async () => {
    const region = { x: { from: -0.055, to: 0.065, step: 0.01 }, y: 0, z: Z };
    const coarse = await coverageMap(pair(), region, { refine: false });
    expect(coarse.deadZones).toHaveLength(0);
    expect(coarse.litFraction).toBe(1);
    const fine = await coverageMap(pair(), region, { resolution: "0.1 mm" });
    expect(fine.deadZones).toHaveLength(1);
    const dz = fine.deadZones[0]!;
    if (dz.kind !== "interval") throw new Error("expected an interval on a line map");
    expect(dz.from[0]).toBeLessThan(0);
    expect(dz.to[0]).toBeGreaterThan(0);
    // the band is narrow (well under the grid step): bounded by the refinement's resolution
    expect(dz.length).toBeGreaterThan(0);
    expect(dz.length).toBeLessThan(0.004);
    // its edges agree with solveLink: just outside lit, just inside dark
    expect(ledAt([dz.to[0] + 2e-4, 0, Z])).toBeGreaterThanOrEqual(fine.litThreshold);
    expect(ledAt([dz.to[0] - 2e-4, 0, Z])).toBeLessThan(fine.litThreshold);
    expect(ledAt([dz.from[0] - 2e-4, 0, Z])).toBeGreaterThanOrEqual(fine.litThreshold);
  });

  it("the array probe's spec is plain data for worker threads, and a 2-thread map equals the 1-thread one", async () => {
    const spec = portableSpec(probeSpec(pair(), {}, "test"));
    expect(spec.array?.coils).toHaveLength(2);
    expect(structuredClone(spec)).toEqual(spec);
    const region = { x: { from: -0.05, to: 0.05, points: 9 }, y: { from: 0, to: 0.02, points: 2 }, z: Z };
    const one = await coverageMap(pair(), region, { threads: 1, refine: false });
    const two = await coverageMap(pair(), region, { threads: 2, refine: false });
    expect(Array.from(two.ledCurrent)).toEqual(Array.from(one.ledCurrent));
    expect(Array.from(two.mutual)).toEqual(Array.from(one.mutual));
  });

  it("findRange over one coil of the pair: lit below the range, dark above it (solveLink)", () => {
    const r = findRange(pair(), { from: [0.045, 0, 0.005], along: [0, 0, 1] }, { resolution: "0.2 mm" });
    expect(r.openEnded).toBe(false);
    expect(r.range).toBeGreaterThan(0.005);
    expect(ledAt([0.045, 0, 0.005 + r.range - 4e-4])).toBeGreaterThanOrEqual(r.litThreshold);
    expect(ledAt([0.045, 0, 0.005 + r.range + 4e-4])).toBeLessThan(r.litThreshold);
  });

  it("maps several transmitters on their own drives by harmonic balance, as solveLink solves them; refuses it for coils on a shared drive", async () => {
    const map = await coverageMap(pair(), { x: { from: 0.03, to: 0.045, points: 2 }, y: 0, z: Z }, { model: "harmonic", refine: false });
    for (let i = 0; i < 2; i++) {
      const pos: Vec3 = [map.axes[0]!.values[i]!, 0, Z];
      const direct = solveLink(pair(pos), { model: "harmonic", tabulateLoads: true });
      expect(direct.model).toBe("harmonic");
      expectOutside({ quantity: `LED current at (${pos.join(", ")}) m, harmonic balance`, source: "independent method: solveLink(system) with the token at that pose, model 'harmonic'", ours: map.ledCurrent[i]!, reference: direct.receivers[0]!.leds[0]!.averageCurrent, rtol: 1e-9, atol: 1e-15, unit: "A" });
    }
    const bus = { name: "bus", drive: { kind: "sine" as const, amplitude: "5 V" }, wiring: "series" as const };
    const shared = (position: Vec3): LinkSystem => ({ ...pair(position), sharedDrives: [bus], transmitters: [{ ...padTx(-0.045, "0 deg"), drive: "bus" }, { ...padTx(0.045, "180 deg"), drive: "bus" }] });
    await expect(coverageMap(shared([0, 0, Z]), { x: { from: 0, to: 0.01, points: 2 }, y: 0, z: Z }, { model: "harmonic" })).rejects.toThrow(/harmonic balance solves transmitters on their own drives/);
    await expect(toleranceYield(shared([0.02, 0, Z]), {}, { samples: 10, seed: 1, model: "harmonic" })).rejects.toThrow(TanklightInputError);
  });
});

/**
 * toleranceYield over a transmitter array (issue 16): each transmitter's capacitor and winding
 * vary as its own physical parts, the token's placement and tilt relative to the array; every
 * sample is the network solveLink builds for that batch member. Checked against direct solveLink
 * calls on the changed system (independent path: the system rebuilt from coils, poses and parts).
 */
import { describe, expect, it } from "vitest";
import { ledPreset, roundCoil, solveLink, toleranceYield, type LinkSystem } from "../../lib/mod.ts";
import { tokenLoadModel } from "../../lib/advanced.ts";
import { expectOutside } from "../helpers/validation.ts";
import type { Coil, Vec3 } from "../../lib/em/types.ts";
import { selfInductance } from "../../lib/em/selfInductance.ts";
import { decodeLoad, encodeLoad } from "../../lib/analysis/loadCodec.ts";
import { capacitorColumn, drawsPerSample, makeYieldModel, turnsColumn } from "../../lib/analysis/yieldModel.ts";
import { sampleDrawer, yieldSpec, type VariationsInput } from "../../lib/analysis/yieldSpec.ts";

// demo parts (not a published design): two 40 mm, 5-turn pads 90 mm apart, in phase, and a 60-turn LED token
const padOf = (turns: number): Coil => roundCoil({ meanRadius: 0.04, turns, wire: { diameter: 0.8e-3, insulation: 0.03e-3 } });
const pad = padOf(5);
const token = roundCoil({ innerRadius: 0.005, turns: 60, layers: 3, wire: { diameter: 0.1e-3, insulation: 0.01e-3 } });
const f = 200e3;
const w = 2 * Math.PI * f;
const Cpad = 1 / (w * w * selfInductance(pad, { frequency: f }));
const Ctok = 1 / (w * w * selfInductance(token, { frequency: f }));
const POS: Vec3 = [0.03, 0.005, 0.012];

type Tx = NonNullable<LinkSystem["transmitters"]>[number];
const padTx = (x: number, coil: Coil = pad, capacitance = Cpad, amplitude = 5): Tx => ({
  coil,
  pose: { position: [x, 0, 0] },
  compensation: "series",
  capacitor: { capacitance, esr: 0.05 },
  drive: { kind: "sine", amplitude, outputResistance: 1 },
});
const array = (): LinkSystem => ({
  frequency: f,
  transmitters: [padTx(-0.045), padTx(0.045)],
  receivers: [{ coil: token, pose: { position: POS }, topology: "parallel", capacitor: { capacitance: Ctok, dissipationFactor: 1e-3 }, load: { kind: "led", led: ledPreset("red") } }],
});
const dimmest = (s: LinkSystem): number => Math.max(0, Math.min(...solveLink(s).receivers[0]!.leds.map((l) => l.averageCurrent)));

describe("toleranceYield over a transmitter array", () => {
  it("with zero spread reproduces solveLink on the array exactly (the same load table)", async () => {
    const y = await toleranceYield(array(), { tokenCapacitor: 0, transmitterCapacitor: 0 }, { samples: 20, seed: 1 });
    expect(y.ledCurrent.min).toBe(y.nominal.ledCurrent);
    expect(y.ledCurrent.max).toBe(y.nominal.ledCurrent);
    // solveLink with the load tabulated as the yield model tabulates it (8 V top, 5 mV step):
    // the same network, the same numbers
    const sys = array();
    const led = ledPreset("red");
    const load = tokenLoadModel(decodeLoad(encodeLoad({ kind: "led", led })), { tabulate: true, maxAmplitude: 8, step: 5e-3 });
    const direct = dimmest({ ...sys, receivers: [{ ...sys.receivers[0]!, load }] } as LinkSystem);
    expect(y.nominal.ledCurrent).toBe(direct);
    // and the exact describing function, to the table's accuracy (linear in ln I between 5 mV nodes: measured ≈ 1e-4)
    expectOutside({ quantity: "array yield nominal LED current", source: "independent method: solveLink(system) with the exact describing function", ours: y.nominal.ledCurrent, reference: dimmest(sys), rtol: 1e-3, unit: "A" });
    expect(y.model).toEqual({ requested: "fundamental", fundamentalSamples: 20, harmonicSamples: 0 });
  });

  it("each seeded sample equals solveLink on the array with that sample's parts, windings and pose", () => {
    const build = (turns: number, i: number): Coil => {
      expect([0, 1]).toContain(i); // the builder is told which transmitter it builds
      return padOf(turns);
    };
    const variations: VariationsInput = { transmitterCapacitor: 0.05, transmitterTurns: { spread: 1, build }, tokenCapacitor: 0.05, placement: "3 mm", height: "1 mm", tilt: "15 deg", supply: 0.05 };
    const { spec, parsed, active } = yieldSpec(array(), variations, {}, "test");
    expect(active.map((a) => a.variation)).toEqual(["tokenCapacitor", "transmitterCapacitor[0]", "transmitterCapacitor[1]", "placement", "height", "tilt", "supply", "transmitterTurns[0]", "transmitterTurns[1]"]);
    const stride = drawsPerSample(2);
    const table = tokenLoadModel(decodeLoad(encodeLoad({ kind: "led", led: ledPreset("red") })), { tabulate: true, maxAmplitude: 8, step: 5e-3 });
    const draws = sampleDrawer(spec, parsed, 7)(6);
    const values = makeYieldModel(spec).evaluate(draws);
    for (let s = 0; s < 6; s++) {
      const d = draws.subarray(s * stride, (s + 1) * stride);
      const [th, ph] = [d[9]!, d[10]!];
      // the nominal axis +z tilted by θ about the horizontal direction (cos φ, sin φ, 0)
      const axis: Vec3 = [Math.sin(th) * Math.sin(ph), -Math.sin(th) * Math.cos(ph), Math.cos(th)];
      const txs = [-0.045, 0.045].map((x, i) => padTx(x, padOf(5 + d[turnsColumn(i)]! - 1), Cpad * (1 + d[capacitorColumn(i)]!), 5 * (1 + d[11]!)));
      const sys = (load: LinkSystem["receivers"][number]["load"]): LinkSystem => ({
        frequency: f,
        transmitters: txs,
        receivers: [{ coil: token, pose: { position: [POS[0] + d[6]!, POS[1] + d[7]!, POS[2] + d[8]!], axis }, topology: "parallel", capacitor: { capacitance: Ctok * (1 + d[0]!), dissipationFactor: 1e-3 }, load }],
      });
      // with the yield model's LED table: the same network but for M, the yield model's
      // couplingEvaluator at the probe tolerance against solveLink's own (measured: within 1e-9)
      expectOutside({ quantity: `array yield sample ${s} LED current (same LED table)`, source: "independent method: solveLink on the changed array", ours: values.current[s]!, reference: dimmest(sys(table)), rtol: 1e-9, unit: "A" });
      // with the exact describing function: the table's own error on top (≈ 1e-4, see above)
      expectOutside({ quantity: `array yield sample ${s} LED current`, source: "independent method: solveLink on the changed array, exact describing function", ours: values.current[s]!, reference: dimmest(sys({ kind: "led", led: ledPreset("red") })), rtol: 1e-3, unit: "A" });
    }
  });

  it("ranks each transmitter's parts separately and gives the same yield on 1 and 2 threads", async () => {
    const variations: VariationsInput = { transmitterCapacitor: 0.1, placement: "5 mm", ledBrightness: 0.3 };
    const one = await toleranceYield(array(), variations, { samples: 300, seed: 3 });
    const two = await toleranceYield(array(), variations, { samples: 300, seed: 3, threads: 2 });
    expect(two.lit).toBe(one.lit);
    expect(two.ledCurrent).toEqual(one.ledCurrent);
    expect(one.sensitivity.map((e) => e.variation).sort()).toEqual(["ledBrightness", "placement", "transmitterCapacitor[0]", "transmitterCapacitor[1]"]);
    expect(one.supplyCurrent).toBeUndefined(); // sine drives name no DC supply
  });

  it("solves every sample of an array with model 'auto' as solveLink does (harmonic balance where the describing function is off)", async () => {
    const y = await toleranceYield(array(), { tokenCapacitor: 0.05 }, { samples: 10, seed: 2, model: "auto" });
    expect(solveLink(array(), { model: "auto" }).model).toBe("harmonic"); // a single red LED conducting: it rectifies
    expect(y.model.requested).toBe("auto");
    expect(y.model.harmonicSamples).toBeGreaterThan(0);
    expect(y.model.fundamentalSamples + y.model.harmonicSamples).toBe(10);
  });
});

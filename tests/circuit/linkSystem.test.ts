import { describe, expect, expectTypeOf, it } from "vitest";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { linkNetwork, solveLink, type LinkSolution, type LinkSystem } from "../../lib/circuit/link.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { mutualInductance } from "../../lib/em/mutualInductance.ts";
import { selfInductance } from "../../lib/em/selfInductance.ts";
import { coilResistance } from "../../lib/em/losses/coilResistance.ts";
import { ledPreset } from "../../lib/circuit/loads/ledPresets.ts";
import { fundamentalConductance } from "../../lib/circuit/loads/describingFunction.ts";
import type { TokenLoad } from "../../lib/circuit/loads/types.ts";
import { TanklightInputError } from "../../lib/errors.ts";

// demo parts (not a published design): a 50 mm, 6-turn transmitter and a 5 mm, 150-turn token
const tx = roundCoil({ meanRadius: "50 mm", turns: 6, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
const token = roundCoil({ innerRadius: "5 mm", turns: 150, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
const f = 200e3;
const w = 2 * Math.PI * f;
const red: TokenLoad = { kind: "led", led: ledPreset("red") };

function system(receivers: LinkSystem["receivers"], drive: NonNullable<LinkSystem["transmitter"]>["drive"] = { kind: "parallelTank", supply: "5 V" }): LinkSystem {
  return {
    frequency: "200 kHz",
    transmitter: { coil: tx, compensation: "parallel", capacitor: { capacitance: 1 / (w * w * selfInductance(tx, { frequency: f })), dissipationFactor: 1e-3 }, drive },
    receivers,
  };
}
const tokenAt = (x: number | string, z: number | string, load: TokenLoad = red, label?: string): LinkSystem["receivers"][number] => ({
  ...(label ? { label } : {}),
  coil: token,
  pose: { position: [x, 0, z] },
  topology: "parallel",
  capacitor: { capacitance: "2.2 nF", dissipationFactor: 1e-3, rating: "50 V" },
  load,
});

describe("solveLink(system)", () => {
  it("takes L, R and M from the electromagnetic and loss layers", () => {
    const built = linkNetwork(system([tokenAt(0, "40 mm"), tokenAt("12 mm", "40 mm")]));
    const L = built.network.inductance;
    // same functions called directly: equality to rounding
    expectRelClose(L[0]![0]!, selfInductance(tx, { frequency: f }), 1e-15, "L₁");
    // M comes from couplingEvaluator, asked for 1e-3 relative (MUTUAL_RTOL in lib/circuit/link.ts),
    // against the exact filament sum
    expectRelClose(L[0]![1]!, mutualInductance(tx, { position: [0, 0, 0] }, token, { position: [0, 0, 0.04] }), 1e-3, "M₀₁");
    expectRelClose(built.network.receivers[0]!.resistance, coilResistance(token, f), 1e-15, "R₂");
    // tokens side by side, coplanar: each sits in the other's return flux — negative M
    expect(L[1]![2]!).toBeLessThan(0);
    expectRelClose(L[1]![2]!, mutualInductance(token, { position: [0, 0, 0.04] }, token, { position: [0.012, 0, 0.04] }), 1e-3, "M₁₂ token–token"); // same evaluator tolerance
    expectRelClose(built.coupling[0]![1]!, L[0]![1]! / Math.sqrt(L[0]![0]! * L[1]![1]!), 1e-15, "k₀₁");
    // ESR from tan δ: ESR = tan δ/(ωC)
    expectRelClose(built.network.receivers[0]!.capacitorEsr!, 1e-3 / (w * 2.2e-9), 1e-12, "ESR = tan δ/(ωC)");
  });

  it("solves a real LED token: the amplitude is a fixed point of the LED's describing function and power balances", () => {
    // the describing-function model (its fixed point is what this pins)
    const r = solveLink(system([tokenAt(0, "50 mm")]), { model: "fundamental" });
    expect(r.model).toBe("fundamental");
    const s = r.receivers[0]!;
    const frozen = solveLink(system([tokenAt(0, "50 mm", { kind: "resistor", resistance: 1 / fundamentalConductance(red, s.loadVoltage) })]), { model: "fundamental" });
    // independent linear re-solve; rtol 1e-9 (Newton tolerance 1e-10)
    expectRelClose(frozen.receivers[0]!.loadVoltage, s.loadVoltage, 1e-9, "fixed point with the red preset");
    const p = r.power;
    expectRelClose(p.driver + p.transmitterCoil + p.transmitterCapacitor + p.receiverCoils + p.receiverCapacitors + p.delivered, p.input, 1e-9, "power balance");
    expect(s.leds[0]!.label).toMatch(/red/);
    expect(s.leds[0]!.averageCurrent).toBeGreaterThan(0);
    expect(r.coupling[0]![1]!).toBeGreaterThan(0);
  });

  it("an anti-parallel red + green pair conducts on both half-cycles", () => {
    const pair: TokenLoad = { kind: "antiParallel", a: ledPreset("red"), b: ledPreset("green-gap") };
    const r = solveLink(system([tokenAt(0, "30 mm", pair)]));
    const [a, b] = r.receivers[0]!.leds;
    expect(a!.averageCurrent).toBeGreaterThan(0);
    expect(b!.averageCurrent).toBeGreaterThan(0);
    // the lower forward voltage (red) clamps the symmetric tank: it carries more
    expect(a!.averageCurrent).toBeGreaterThan(b!.averageCurrent);
  });

  it("tabulateLoads gives the same operating point to the table's accuracy", () => {
    const exact = solveLink(system([tokenAt(0, "50 mm")]));
    const fast = solveLink(system([tokenAt(0, "50 mm")]), { tabulateLoads: true });
    // rtol 1e-7: the tabulated describing function is within ≈ 1e-8 of the exact one
    expectRelClose(fast.receivers[0]!.loadVoltage, exact.receivers[0]!.loadVoltage, 1e-7, "amplitude");
  });

  it("names the bad field: wrong dimension, missing capacitor", () => {
    const bad = system([{ ...tokenAt(0, "40 mm"), capacitor: { capacitance: "5 kHz" } }]);
    expect(() => solveLink(bad)).toThrow(TanklightInputError);
    expect(() => solveLink(bad)).toThrow(/receivers\[0\]\.capacitor\.capacitance/);
    const noCap = { ...system([tokenAt(0, "40 mm")]) };
    const t = { ...noCap.transmitter! };
    delete (t as { capacitor?: unknown }).capacitor;
    expect(() => solveLink({ ...noCap, transmitter: t })).toThrow(/transmitter\.capacitor/);
    expect(() => solveLink({ ...noCap, frequency: "-3 kHz" })).toThrow(/frequency/);
  });

  it("accepts drive specs with units and ready equivalents", () => {
    const a = solveLink(system([tokenAt(0, "40 mm")], { kind: "currentRegulated", amplitude: "1.5 A" }));
    expectRelClose(a.transmitter.coilCurrent, 1.5, 1e-14, "current-regulated coil current");
    const b = solveLink({ ...system([tokenAt(0, "40 mm")], { kind: "halfBridge", supply: "12 V" }), transmitter: { ...system([]).transmitter!, compensation: "series", drive: { kind: "halfBridge", supply: "12 V" } } });
    expect(b.drive.label).toMatch(/half bridge/);
    // a drive used outside its assumptions is flagged
    const c = solveLink({ ...system([tokenAt(0, "40 mm")]), transmitter: { ...system([]).transmitter!, compensation: "series", drive: { kind: "parallelTank", supply: "5 V" } } });
    expect(c.warnings.join(" ")).toMatch(/parallel-tank drive assumes a parallel-compensated transmitter/);
    expectTypeOf(solveLink).returns.toEqualTypeOf<LinkSolution>();
  });
});

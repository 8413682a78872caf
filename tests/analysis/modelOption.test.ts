/**
 * The analysis layer honours solveLink's `model`: coverageMap and findRange with model "auto"
 * agree point by point with solveLink(system, { model: "auto" }) (independent method: the full
 * link build at that pose), and differ from the describing function where it is outside its
 * validity — a red + InGaN green pair back to back (demo token, tests/analysis/fixtures.ts coils),
 * whose green LED the describing function leaves dark (docs/validation-transient.md).
 */
import { describe, expect, it } from "vitest";
import { coverageMap, findRange, ledPreset, selfInductance, solveLink, type LinkSystem } from "../../lib/mod.ts";
import { expectOutside } from "../helpers/validation.ts";
import { drawer, FREQUENCY, LID, token, tx } from "./fixtures.ts";

/** The drawer with a bi-colour token (red + InGaN green back to back) at a position; supply in V. */
function bicolour(position: readonly [number, number, number] = [0, 0, LID], supply = 5): LinkSystem {
  const sys = drawer({ position, supply }) as { receivers: readonly Record<string, unknown>[] } & LinkSystem;
  return { ...sys, receivers: [{ ...sys.receivers[0]!, load: { kind: "antiParallel", a: ledPreset("red"), b: ledPreset("green-ingan") } }] } as LinkSystem;
}
const dimmest = (sys: LinkSystem, model: "fundamental" | "auto"): number => Math.max(0, Math.min(...solveLink(sys, { model }).receivers[0]!.leds.map((l) => l.averageCurrent)));

describe("analysis with a steady-state model", () => {
  it("coverageMap with model 'auto' agrees with solveLink({ model: 'auto' }) point by point", async () => {
    const xs = [0, 0.03, 0.06];
    const map = await coverageMap(bicolour(), { x: { from: 0, to: 0.06, points: 3 }, y: 0, z: LID }, { refine: false, model: "auto" });
    const fundamental = await coverageMap(bicolour(), { x: { from: 0, to: 0.06, points: 3 }, y: 0, z: LID }, { refine: false });
    let differs = false;
    xs.forEach((x, i) => {
      const direct = dimmest(bicolour([x, 0, LID]), "auto");
      // the same M and the same solver: measured 3e-15
      expectOutside({ quantity: `coverageMap (model auto) dimmest-LED current at x = ${x} m`, source: "independent method: solveLink(system, { model: 'auto' }) at that pose", ours: map.ledCurrent[i]!, reference: direct, rtol: 1e-9, atol: 1e-12, unit: "A" });
      if (Math.abs(fundamental.ledCurrent[i]! - map.ledCurrent[i]!) > 0.1 * map.ledCurrent[i]!) differs = true;
    });
    // the fundamental map is a different model: it misses the green LED somewhere on this line,
    // and says so at its strongest coupling (solveLink's own warning there: with the single-switch
    // drive the describing function's error cannot be estimated; elsewhere each LED is named)
    expect(differs).toBe(true);
    expect(fundamental.warnings.some((w) => w.startsWith("at the map's strongest coupling (30.0, 0.0, 5.0) mm: describing function"))).toBe(true);
    expect(map.warnings.some((w) => w.includes("describing function"))).toBe(false);
  });

  it("findRange with model 'auto' brackets the edge that solveLink({ model: 'auto' }) sees; the describing function finds none", () => {
    // at 12 V harmonic balance lights the green LED (1.3 mA at the lid, 0.41 mA at 40 mm); the
    // describing function leaves it at nanoamperes everywhere
    const ray = { from: [0, 0, LID] as [number, number, number], along: [0, 0, 1] as [number, number, number] };
    const opts = { max: 0.06, step: 0.005, resolution: 5e-4 };
    const r = findRange(bicolour(undefined, 12), ray, { ...opts, model: "auto" });
    expect(r.range).toBeGreaterThan(0.01);
    const th = r.litThreshold;
    expect(dimmest(bicolour([0, 0, LID + r.range - 1e-3], 12), "auto")).toBeGreaterThanOrEqual(th);
    expect(dimmest(bicolour([0, 0, LID + r.range + 1e-3], 12), "auto")).toBeLessThan(th);
    const dark = findRange(bicolour(undefined, 12), ray, opts);
    expect(dark.range).toBe(0);
    expect(dark.warnings.some((w) => w.startsWith("at the ray's start (0.0, 0.0, 5.0) mm: describing function"))).toBe(true);
  });

  it("coverageMap with model 'auto' on a full bridge (token table) agrees with solveLink({ model: 'harmonic' }) within 1 % at every lit point, and states its model", async () => {
    // the drawer's coils, the transmitter series-tuned on a 5 V full bridge: one transmitter, a
    // sine-like coil current, so every pose comes from the token's harmonic balance tabulated
    // against its EMF (lib/circuit/harmonic/linkTable.ts) — demo system
    const w = 2 * Math.PI * FREQUENCY;
    const c = (coil: typeof tx): number => 1 / (w * w * selfInductance(coil, { frequency: FREQUENCY }));
    const at = (position: readonly [number, number, number]): LinkSystem => ({
      frequency: FREQUENCY,
      transmitter: { coil: tx, compensation: "series", capacitor: { capacitance: c(tx) }, drive: { kind: "fullBridge", supply: 5, onResistance: 0.05 } },
      receivers: [{ coil: token, pose: { position }, topology: "parallel", capacitor: { capacitance: c(token) }, load: { kind: "antiParallel", a: ledPreset("red"), b: ledPreset("green-ingan") } }],
    });
    const xs = [0, 0.0175, 0.035, 0.0525, 0.07];
    const zs = [LID, 0.03];
    const map = await coverageMap(at([0, 0, LID]), { x: { from: 0, to: 0.07, points: 5 }, y: 0, z: { from: LID, to: 0.03, points: 2 } }, { refine: false, model: "auto" });
    expect(map.model?.method).toMatch(/tabulated/);
    expect(map.model?.errorBand.relative).toBe(0.01);
    let lit = 0;
    zs.forEach((zz, j) =>
      xs.forEach((x, i) => {
        const direct = solveLink(at([x, 0, zz]), { model: "harmonic" }).receivers[0]!.leds;
        const dimmest = Math.max(0, Math.min(...direct.map((l) => l.averageCurrent)));
        if (dimmest < map.litThreshold) return;
        lit++;
        // measured ≤ 0.1 %: the table and M to 1e-3 (the probe's coupling accuracy) against solveLink's own
        expectOutside({ quantity: `dimmest-LED current at (${x}, 0, ${zz}) m`, source: "independent method: solveLink(system, { model: 'harmonic' }) at that pose (direct harmonic balance)", ours: map.ledCurrent[i + 5 * j]!, reference: dimmest, rtol: 0.01, unit: "A" });
      }),
    );
    expect(lit).toBeGreaterThan(3);
    // the table grows in fixed chunks, so two worker threads (each with its own table) give the same bits
    const threaded = await coverageMap(at([0, 0, LID]), { x: { from: 0, to: 0.07, points: 5 }, y: 0, z: { from: LID, to: 0.03, points: 2 } }, { refine: false, model: "auto", threads: 2 });
    expect(Array.from(threaded.ledCurrent)).toEqual(Array.from(map.ledCurrent));
  });

  it("rejects an unknown model naming the field", async () => {
    await expect(coverageMap(bicolour(), { x: 0, y: 0, z: LID }, { model: "exact" as never })).rejects.toThrow(/model/);
  });
});

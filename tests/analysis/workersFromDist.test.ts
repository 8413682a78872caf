/**
 * Worker threads from the bundled build: bundles lib/ with scripts/bundle.ts (its own worker
 * entry, zod loaded on demand, tinypool outside) into out/, then runs a two-thread coverage map in a plain
 * `node` process and compares it with the one-thread map. The .ts sources under vitest and tsx
 * are covered by parallel.test.ts, toleranceYield.test.ts and the benchmarks.
 */
import { describe, expect, it } from "vitest";
import { runInBundle } from "../helpers/bundledRun.ts";

describe("worker threads from dist/", () => {
  it("a bundled build runs a two-thread coverage map identical to one thread", async () => {
    const last = await runInBundle(
      "dist-workers",
      `import * as t from "./mod.js";
const tx = t.roundCoil({ meanRadius: "50 mm", turns: 5, wire: { diameter: "0.8 mm" } });
const tok = t.roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm" } });
const sys = { frequency: "197 kHz", transmitter: { coil: tx, compensation: "parallel", capacitor: { capacitance: "106.8 nF" }, drive: { kind: "parallelTank", supply: "12 V" } },
  receivers: [{ coil: tok, pose: { position: [0, 0, 0] }, topology: "parallel", capacitor: { capacitance: "2.2 nF" }, load: { kind: "led", led: t.ledPreset("red") } }] };
const region = { x: { from: 0, to: 0.09, step: 0.01 }, y: 0, z: 0.005 };
const a = await t.coverageMap(sys, region);
const b = await t.coverageMap(sys, region, { threads: 2 });
console.log(JSON.stringify({ same: a.ledCurrent.every((v, i) => v === b.ledCurrent[i]) && a.solves === b.solves, solves: a.solves, zones: a.deadZones.length }));
`,
    );
    const r = JSON.parse(last) as { same: boolean; solves: number; zones: number };
    expect(r.same).toBe(true);
    expect(r.zones).toBe(1);
    expect(r.solves).toBeGreaterThan(10);
  }, 300_000);
});

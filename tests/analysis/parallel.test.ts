import { describe, expect, it } from "vitest";
import { coverageMap, taskPool, type Progress } from "../../lib/mod.ts";
import { drawer, LID } from "./fixtures.ts";

describe("worker threads", () => {
  it("coverageMap gives identical numbers on 1 and 2 threads, with progress", async () => {
    const region = { x: { from: 0, to: 0.09, step: 0.01 }, y: { from: 0, to: 0.02, step: 0.01 }, z: LID };
    const one = await coverageMap(drawer({ supply: 12 }), region, { resolution: "1 mm" });
    const pool = await taskPool(2);
    try {
      const seen: Progress[] = [];
      const two = await coverageMap(drawer({ supply: 12 }), region, { resolution: "1 mm", threads: pool, onProgress: (p) => seen.push(p) });
      expect(Array.from(two.ledCurrent)).toEqual(Array.from(one.ledCurrent));
      expect(Array.from(two.mutual)).toEqual(Array.from(one.mutual));
      expect(two.deadZones).toEqual(one.deadZones);
      expect(two.litFraction).toBe(one.litFraction);
      expect(two.solves).toBe(one.solves);
      const last = seen[seen.length - 1]!;
      expect(last.done).toBe(last.total);
      expect(last.total).toBe(one.solves);
      expect(seen.every((p) => p.remaining >= 0 && p.done <= p.total)).toBe(true);
    } finally {
      await pool.close();
    }
  });
});

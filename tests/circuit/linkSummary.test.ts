import { describe, expect, expectTypeOf, it } from "vitest";
import { summarizeLink, type LinkSummary } from "../../lib/circuit/link/summary.ts";
import { solveLinkNetwork } from "../../lib/circuit/link/solveNetwork.ts";
import { sineDrive } from "../../lib/circuit/drive.ts";
import { stubLedLoad } from "./linkStubs.ts";
import { parseQuantity } from "../../lib/units.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

const f = 200e3;
const w = 2 * Math.PI * f;
const [L1, L2] = [24e-6, 180e-6];
const m = 0.05 * Math.sqrt(L1 * L2);
const result = solveLinkNetwork({
  frequency: f,
  inductance: [
    [L1, m],
    [m, L2],
  ],
  transmitter: { resistance: 0.25, compensation: "series", capacitance: 1 / (w * w * L1), drive: sineDrive(2, 0.5) },
  receivers: [{ label: "token 1", resistance: 6.5, topology: "parallel", capacitance: 1 / (w * w * L2), load: stubLedLoad("red stub") }],
});

describe("summarizeLink", () => {
  it("reports every number with its unit, and the text round-trips through parseQuantity", () => {
    const s = summarizeLink(result);
    const current = s.rows.find((r) => r.quantity === "transmitter · coil current (peak)")!;
    expect(current.unit).toBe("A");
    expect(current.value).toBe(result.transmitter.coilCurrent);
    // 3 significant figures: the text parses back within half a unit of the 3rd digit
    expectRelClose(parseQuantity(current.text, "current"), current.value, 5e-3, "formatted coil current");
    expect(s.rows.some((r) => r.quantity === "token 1 · red stub · average current" && r.unit === "A")).toBe(true);
    expect(s.text).toMatch(/token 1 · tank voltage \(peak\)\s+\d/);
  });

  it("gives one lit/unlit line per LED against the threshold, naming where the default comes from", () => {
    const s = summarizeLink(result);
    expect(s.verdicts.length).toBe(1);
    expect(s.verdicts[0]).toMatch(/^token 1 · red stub: (lit|unlit) \(/);
    expect(s.text).toMatch(/trade practice/);
    expectTypeOf(summarizeLink).returns.toEqualTypeOf<LinkSummary>();
  });
});

/**
 * The token table (lib/circuit/harmonic/tokenTable.ts, linkTable.ts): a token's harmonic
 * balance tabulated against its induced EMF, and the link at any coupling from it by the
 * transmitter's loop equation — against the direct harmonic-balance solve of the same link at
 * that coupling (independent method: solveLinkHarmonic on the full network, every harmonic of
 * the transmitter current included), and at one point against the transient engine's periodic
 * steady state. Demo circuits (tests/circuit/harmonic/circuits.ts).
 */
import { describe, expect, it } from "vitest";
import { solveLinkHarmonic } from "../../../lib/circuit/harmonic/solveHarmonic.ts";
import { EMF_HARMONICS_LIMIT, linkTable, linkTableRefusal } from "../../../lib/circuit/harmonic/linkTable.ts";
import type { LinkNetwork } from "../../../lib/circuit/link/network.ts";
import { ADMITTANCE_TOLERANCE, LED_TOLERANCE } from "../../../lib/circuit/harmonic/tokenTable.ts";
import type { TokenLoad } from "../../../lib/circuit/loads/types.ts";
import { TanklightInputError } from "../../../lib/errors.ts";
import { expectOutside } from "../../helpers/validation.ts";
import { LOADS, networkOf, transientSteady, type DriveKind } from "./circuits.ts";

const L1 = 10e-6;
const L2 = 30e-6;
const OPTS = { order: 15, samples: 120, litThreshold: 5e-4 };
const COUPLINGS = [0.005, 0.012, 0.02, 0.03, 0.045, 0.06, 0.08, 0.1];

/** The circuit of circuits.ts, the transmitter coil's resistance optionally set (Ω): a full bridge behind a higher-Q coil has smaller current harmonics. */
const network = (kind: DriveKind, level: number, k: number, load: TokenLoad, txResistance?: number): LinkNetwork => networkOf(kind, level, k, load, txResistance);

// drive kind, level (sine: peak V; full bridge: supply V), load, transmitter coil resistance (Ω; default 1.5, Q ≈ 8)
const CASES: readonly [DriveKind, number, string, number?][] = [
  ["sine", 2, "red + InGaN green back to back"],
  ["sine", 4, "red LED"],
  ["sine", 4, "Schottky bridge + red LED"],
  ["sine", 3, "half-wave reservoir 10 µF + red LED"],
  ["fullBridge", 5, "red + InGaN green back to back", 0.3],
  ["fullBridge", 3, "red LED", 0.3],
];

describe("linkTable against the direct harmonic-balance solve at each coupling", () => {
  for (const [kind, level, loadName, r1] of CASES) {
    it(`${kind} ${level} V, ${loadName}${r1 === undefined ? "" : `, transmitter ${r1} Ω`}: each lit LED's average current, the coil current and the input power within 1 %`, () => {
      const load = LOADS[loadName]!;
      const table = linkTable(network(kind, level, 0.05, load, r1), OPTS);
      const p = table.point();
      let lit = 0;
      for (const k of COUPLINGS) {
        const direct = solveLinkHarmonic(network(kind, level, k, load, r1), { order: OPTS.order, samples: OPTS.samples });
        table.solve(k * Math.sqrt(L1 * L2), p);
        const source = "independent method: solveLinkHarmonic on the full network at that coupling (order 15, every transmitter harmonic)";
        direct.receivers[0]!.leds.forEach((l, i) => {
          if (l.averageCurrent < OPTS.litThreshold) return;
          lit++;
          // measured ≤ 0.05 % with a sine, ≤ 0.12 % on the bridge (its EMF harmonics, which the table leaves out); 1 % is harmonic balance's own band
          expectOutside({ quantity: `${l.label} average current, k = ${k}`, source, ours: p.leds[i]!, reference: l.averageCurrent, rtol: 0.01, unit: "A" });
        });
        expectOutside({ quantity: `transmitter coil current, k = ${k}`, source, ours: p.transmitterCurrent, reference: direct.transmitter.coilCurrent, rtol: 0.01, unit: "A" });
        expectOutside({ quantity: `input power, k = ${k}`, source, ours: p.input, reference: direct.power.input, rtol: 0.01, unit: "W" });
        expect(p.emfHarmonics).toBeLessThan(kind === "sine" ? 1e-15 : EMF_HARMONICS_LIMIT);
      }
      expect(lit).toBeGreaterThan(0);
      const dev = table.token.deviation();
      expect(dev.admittance).toBeLessThanOrEqual(ADMITTANCE_TOLERANCE);
      expect(dev.led).toBeLessThanOrEqual(LED_TOLERANCE);
    });
  }

  it("a full bridge behind a low-Q coil (Q ≈ 8): its EMF harmonics exceed the limit, so a caller solves those poses directly", () => {
    const table = linkTable(network("fullBridge", 2, 0.05, LOADS["red + InGaN green back to back"]!), OPTS);
    const p = table.point();
    table.solve(0.05 * Math.sqrt(L1 * L2), p);
    expect(p.emfHarmonics).toBeGreaterThan(EMF_HARMONICS_LIMIT); // measured 6.7 %: the table's LED currents are 1.2 % off there
  });

  it("the bi-colour pebble on a full bridge (transmitter Q ≈ 42): the table agrees with the transient engine's periodic steady state within 1 %", () => {
    const load = LOADS["red + InGaN green back to back"]!;
    const ref = transientSteady("fullBridge", 2, 0.05, load, 400, 0.3);
    expect(ref.reached).toBe(true);
    const table = linkTable(network("fullBridge", 2, 0.02, load, 0.3), OPTS);
    const p = table.point();
    table.solve(0.05 * Math.sqrt(L1 * L2), p);
    const source = "independent method: transient engine, 400 steps a cycle, run to a cycle-to-cycle change below 1e-7";
    ref.leds.forEach((c, i) => expectOutside({ quantity: `LED ${i} average current`, source, ours: p.leds[i]!, reference: c, rtol: 0.01, unit: "A" }));
    expectOutside({ quantity: "transmitter coil current", source, ours: p.transmitterCurrent, reference: ref.coilCurrent, rtol: 0.01, unit: "A" });
  });
});

describe("linkTable: determinism, scope, finite answers", () => {
  it("gives the same bits whatever order the couplings are asked in (the table grows in fixed chunks)", () => {
    const net = networkOf("fullBridge", 2, 0.05, LOADS["red + InGaN green back to back"]!);
    const a = linkTable(net, OPTS);
    const b = linkTable(net, OPTS);
    const ms = COUPLINGS.map((k) => k * Math.sqrt(L1 * L2));
    const pa = a.point();
    const pb = b.point();
    const up = ms.map((m) => (a.solve(m, pa), [...pa.leds, pa.transmitterCurrent]));
    const down = [...ms].reverse().map((m) => (b.solve(m, pb), [...pb.leds, pb.transmitterCurrent])).reverse();
    expect(down).toEqual(up);
  });

  it("zero coupling: the transmitter alone, LEDs dark, nothing NaN", () => {
    const table = linkTable(networkOf("sine", 2, 0.05, LOADS["red LED"]!), OPTS);
    const p = table.point();
    table.solve(0, p);
    expect(p.emf).toBe(0);
    expect(Number.isFinite(p.transmitterCurrent) && Number.isFinite(p.input)).toBe(true);
    expect(Math.abs(p.leds[0]!)).toBeLessThan(1e-9);
  });

  it("refuses what it cannot tabulate, naming why", () => {
    const sw = networkOf("singleSwitch", 5, 0.05, LOADS["red LED"]!);
    expect(linkTableRefusal(sw)).toMatch(/single-switch/);
    const two = networkOf("sine", 2, 0.05, LOADS["red LED"]!);
    const twoTokens = { ...two, inductance: [[L1, 1e-7, 1e-7], [1e-7, L2, 0], [1e-7, 0, L2]], receivers: [two.receivers[0]!, two.receivers[0]!] };
    expect(linkTableRefusal(twoTokens)).toMatch(/several receivers/);
    expect(() => linkTable(sw, OPTS)).toThrow(TanklightInputError);
    expect(linkTableRefusal(two)).toBeUndefined();
  });
});

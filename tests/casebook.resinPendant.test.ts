import { describe, expect, it } from "vitest";
import { run } from "../casebook/resinPendant.ts";
import { expectOutside } from "./helpers/validation.ts";

describe("casebook: resin-pendant (tiny coil, frequency, colour, tilt, bi-colour)", () => {
  const { notebook, results: r } = run();

  it("the tiny coil's Q rises with frequency and the reach peaks in between", () => {
    // source: Q = ωL/R with R growing slower than ω (skin and proximity effect, docs/methods/losses.md);
    // trade practice (no source): millimetre coils of fine wire show Q below 10 near 100–200 kHz
    for (let i = 1; i < r.frequencies.length; i++) expect(r.frequencies[i]!.tokenQ).toBeGreaterThan(r.frequencies[i - 1]!.tokenQ);
    expect(r.frequencies[0]!.tokenQ).toBeLessThan(10);
    const reaches = r.frequencies.map((x) => x.reach);
    const peak = reaches.indexOf(Math.max(...reaches));
    expect(peak).toBeGreaterThan(0);
    expect(peak).toBeLessThan(reaches.length - 1);
    // the choice: the longest reach among the frequencies whose emission estimate meets 15.209
    const allowed = r.frequencies.filter((x) => x.emissionMarginDb > 0);
    const best = allowed.reduce((a, b) => (b.reach > a.reach ? b : a));
    expect(r.chosen).toBe(best.frequency);
    expect(r.chosen).toBeGreaterThan(300e3);
    expect(r.chosen).toBeLessThan(490e3);
  });

  it("red reaches furthest, blue and white need the pendant closer", () => {
    // trade practice (no source): the lower forward voltage of a red LED lights in a weaker field
    const reach = Object.fromEntries(r.colours.map((c) => [c.colour, c.reach]));
    expect(reach.red!).toBeGreaterThan(reach.blue!);
    expect(reach.red!).toBeGreaterThan(reach.white!);
    expect(reach.red!).toBeGreaterThanOrEqual(reach.yellow!);
  });

  it("tilt dims the pendant monotonically and the red one forgives more than the blue one", () => {
    for (let i = 1; i < r.tilt.length; i++) expect(r.tilt[i]!.current).toBeLessThan(r.tilt[i - 1]!.current);
    // flat on the axis the flux through the coil falls about as cos θ: at 90° almost nothing is left
    expect(r.tilt[r.tilt.length - 1]!.current).toBeLessThan(0.05 * r.tilt[0]!.current);
    expect(r.tiltLimit).toBeGreaterThan(45);
    expect(r.tiltLimit).toBeLessThan(90);
    expect(r.blueTiltLimit).toBeLessThanOrEqual(r.tiltLimit);
  });

  it("computes the back-to-back pair with harmonic balance, where the fundamental model fails", () => {
    // "auto" chooses harmonic balance here and states its validated band (docs: 1 % against the transient engine)
    expect(r.bicolour.model).toBe("harmonic");
    expect(r.bicolour.band).toBeLessThanOrEqual(0.01);
    expect(r.bicolour.fundamentalEstimate).toBeGreaterThan(0.1);
    // both LEDs light in harmonic balance; the describing function leaves the blue one all but dark
    expect(r.bicolour.harmonic[0]!).toBeGreaterThan(1e-3);
    expect(r.bicolour.harmonic[1]!).toBeGreaterThan(5e-4);
    expect(r.bicolour.fundamental[1]!).toBeLessThan(0.1 * r.bicolour.harmonic[1]!);
    // independent method: the transient engine's periodic steady state of the same circuit (half
    // bridge's square wave, lossless capacitors as the engine has them); harmonic balance is
    // validated to 1 % against it (docs/methods: harmonic balance)
    ["red", "blue"].forEach((colour, i) =>
      expectOutside({
        quantity: `resin-pendant: ${colour} LED of the back-to-back pair, harmonic balance vs transient`,
        source: "independent method: transient engine periodic steady state (shooting)",
        ours: r.bicolour.sameCircuit[i]!,
        reference: r.bicolour.transient[i]!,
        rtol: 0.01,
        unit: "A",
      }),
    );
  });

  it("fits a USB 2.0 port and shows the figures", () => {
    // USB 2.0 specification: 500 mA
    expect(r.supply.current).toBeLessThan(0.5);
    expect(r.supply.verdict).toBe("within");
    const figures = notebook.cells.filter((c) => c.kind === "figure").map((c) => (c as { name: string }).name);
    expect(figures).toEqual(expect.arrayContaining(["colours-by-height", "tilt", "exposure"]));
  });
});

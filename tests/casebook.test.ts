import { describe, expect, it } from "vitest";
import { scenarios } from "../casebook/scenarios.ts";
import * as coaxialLoops from "../casebook/coaxialLoops.ts";
import { expectOutside } from "./helpers/validation.ts";


describe("casebook", () => {
  it("every scenario runs and prints a notebook with units", async () => {
    for (const [name, s] of Object.entries(scenarios)) {
      const { notebook } = await s.run();
      expect(notebook.length, name).toBeGreaterThan(100);
      expect(notebook, name).toMatch(/\d (m|µ|n|p|k)?(H|m|Hz|V|A|W)\b/);
    }
  });

  it("coaxial-loops: the exact coupling approaches the small-token and dipole limits", () => {
    const { results } = coaxialLoops.run();
    const far = results.rows[results.rows.length - 1]!;
    // independent method: for a token much smaller than the transmitter, M → B_axis(d)·πb²/I
    // (source: on-axis loop field μ₀Ia²/(2(a²+d²)^{3/2}), e.g. Jackson, Classical Electrodynamics, 3rd ed., §5.5)
    // b/a = 0.15: the field's variation over the token disc changes M by O((b/a)²) ≈ 1 %.
    for (const r of results.rows) {
      expectOutside({
        quantity: `M(a = 40 mm, b = 6 mm, d = ${(r.height * 1e3).toFixed(0)} mm) vs small-token limit`,
        source: "independent method: on-axis field × token area (Jackson 1999 §5.5)",
        ours: r.mutual,
        reference: r.smallToken,
        rtol: 0.01,
        unit: "H",
      });
    }
    // the dipole law overestimates at finite d, and the gap shrinks with height
    expect(far.dipole / far.mutual).toBeGreaterThan(1);
    expect(far.dipole).toBeGreaterThan(0);
  });
});

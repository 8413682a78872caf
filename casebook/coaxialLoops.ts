/**
 * Casebook — "How fast does coupling fall with height?"
 *
 * A token coil floats above a transmitter loop, on its axis. Before any circuit, the
 * geometry alone sets how much of the transmitter's flux the token catches. This run prints
 * the mutual inductance and coupling factor of a 40 mm transmitter loop and a 6 mm token loop
 * from touching distance to 12 cm, and shows the 1/d³ dipole fall-off taking over beyond the
 * transmitter's radius (docs/physics-notes.md: range grows only as the cube root of drive).
 *
 * Demo data: the radii and heights are our own example, not a product.
 */
import { addSafetySections, chart, coaxialLoopMutualInductance, formatQuantity, MU0, notebook, partsList, roundCoil, safetyReport, selfInductance, type Notebook } from "../lib/mod.ts";

export interface CoaxialLoopsRow {
  /** axial distance, m */
  readonly height: number;
  /** mutual inductance, H */
  readonly mutual: number;
  /** small-token estimate: the transmitter's on-axis field times the token area, μ₀πa²b²/(2(a²+d²)^{3/2}), H */
  readonly smallToken: number;
  /** the far-field dipole law μ₀πa²b²/(2d³), H */
  readonly dipole: number;
}

export interface CoaxialLoopsResult {
  readonly transmitterRadius: number;
  readonly tokenRadius: number;
  readonly rows: readonly CoaxialLoopsRow[];
}

/** Runs the scenario and returns its notebook and its numbers. */
export function run(): { notebook: Notebook; results: CoaxialLoopsResult } {
  const a = 0.04; // transmitter loop radius, m (demo)
  const b = 0.006; // token loop radius, m (demo)
  const heights = [0.002, 0.005, 0.01, 0.02, 0.03, 0.04, 0.06, 0.08, 0.1, 0.12];
  const rows = heights.map((d) => ({
    height: d,
    mutual: coaxialLoopMutualInductance(a, b, d),
    smallToken: (MU0 * Math.PI * a * a * b * b) / (2 * (a * a + d * d) ** 1.5),
    dipole: (MU0 * Math.PI * a * a * b * b) / (2 * d ** 3),
  }));
  // for the coupling factor, single turns of 0.5 mm wire (demo): k = M/√(L_a·L_b)
  const wire = { diameter: "0.5 mm" };
  const La = selfInductance(roundCoil({ meanRadius: a, turns: 1, wire }));
  const Lb = selfInductance(roundCoil({ meanRadius: b, turns: 1, wire }));
  const worstSmall = Math.max(...rows.map((r) => Math.abs(r.smallToken / r.mutual - 1)));
  const last = rows[rows.length - 1]!;
  const q = formatQuantity;
  const nb = notebook("How fast does coupling fall with height?", {
    note: "Demo data: the radii, wire and heights are our own example, not a product.",
  });
  nb.text(
    `Transmitter loop radius ${formatQuantity(a, "m")}, token loop radius ${formatQuantity(b, "m")}, coaxial.`,
    "Single turns; multiply M by both turn counts for wound coils.",
  );
  nb.table(
    ["height", "M (Maxwell, exact)", "small-token estimate", "ratio", "1/d³ dipole law", "ratio"],
    rows.map((r) => [
      { value: r.height, unit: "m" },
      { value: r.mutual, unit: "H" },
      { value: r.smallToken, unit: "H" },
      Number((r.smallToken / r.mutual).toFixed(4)),
      { value: r.dipole, unit: "H" },
      Number((r.dipole / r.mutual).toFixed(3)),
    ]),
  );
  nb.figure(
    "coupling-by-height",
    chart.coupling({
      title: "Coupling of a 6 mm token loop over a 40 mm loop",
      subtitle: "single turns of 0.5 mm wire, coaxial",
      byHeight: [
        { label: "exact (Maxwell)", distance: heights, k: rows.map((r) => r.mutual / Math.sqrt(La * Lb)) },
        { label: "1/d³ dipole law", distance: heights, k: rows.map((r) => r.dipole / Math.sqrt(La * Lb)) },
      ],
    }),
    "coupling factor against height: the dipole law overestimates until the token is several transmitter radii away",
  );
  nb.text(
    "A token this much smaller than the transmitter sees an almost uniform field: the",
    `small-token estimate stays within ${(100 * worstSmall).toFixed(1)} % of the exact value at every height.`,
    `The 1/d³ law is reached only slowly: it is still ${(100 * (last.dipole / last.mutual - 1)).toFixed(0)} % high at ${formatQuantity(last.height, "m")}`,
    "(three transmitter radii); from there on, doubling the height cuts the coupling about eightfold.",
  );
  // ── Supply and safety at a demo operating point ──────────────────────────────
  // geometry has no current; to show what the safety sections say about such a loop, assess it
  // as if series-tuned at 200 kHz and carrying 3 A peak (demo operating point, ours), under a 2 mm cover
  const f = 200e3;
  const current = 3;
  const w = 2 * Math.PI * f;
  const tuning = 1 / (w * w * La);
  const loop = roundCoil({ meanRadius: a, turns: 1, wire });
  const cover = 0.002;
  nb.heading("Supply");
  nb.text(
    "This run is geometry only: no drive, so no supply current to budget (the pebble-drawer and token-batch scenarios carry",
    `one). The sections below assess the 40 mm loop as if it were series-tuned (${q(tuning, "F")}) and driven at ${q(f, "Hz")} with`,
    `${q(current, "A")} peak under a ${q(cover, "m")} cover — a demo operating point of our own, to show the margins such a loop has.`,
  );
  const safety = safetyReport({
    frequency: f,
    surfaceHeight: cover,
    transmitters: [{ label: "40 mm loop", coil: loop, current, capacitor: { capacitance: tuning, voltage: current / (w * tuning), rating: 100 } }],
    receivers: [{ label: "6 mm token loop", leds: [], size: 2 * b + 0.004 }],
  });
  const safetyCautions = addSafetySections(nb, safety, { coil: loop, current, surfaceHeight: cover, reach: 0.08 });
  if (safety.attention.length > 0) nb.text("Needs attention at this operating point:", ...safety.attention.map((x) => `- ${x}`));
  nb.parts(
    partsList({
      coils: [
        { item: "transmitter loop", coil: roundCoil({ meanRadius: a, turns: 1, wire }) },
        { item: "token loop", coil: roundCoil({ meanRadius: b, turns: 1, wire }) },
      ],
      capacitors: [],
      leds: [],
      supply: { item: "supply", voltage: 0, current: 0 },
    }).filter((r) => r.item !== "supply"),
  );
  nb.cautions(["Geometry only: the safety numbers above are for a demo operating point; assess your own drive before building.", ...safetyCautions]);
  return { notebook: nb, results: { transmitterRadius: a, tokenRadius: b, rows } };
}

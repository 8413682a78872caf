/**
 * Regenerates the figures of docs/casebook.md: runs each scenario, renders its main figure
 * and writes docs/casebook/<scenario>.svg (deterministic SVG, committed).
 *   npm run casebook:figures            every scenario
 *   npm run casebook:figures -- <name>  one
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { renderSvg, type ChartSpec } from "../lib/mod.ts";
import { scenarios } from "../casebook/scenarios.ts";

/** The figure docs/casebook.md shows for each scenario (a figure name of its notebook). */
export const MAIN_FIGURE: Readonly<Record<string, string>> = {
  "pebble-drawer": "led-current-by-height",
  "coaxial-loops": "coupling-by-height",
  "through-the-books": "led-current-by-height",
  "unknown-driver": "measured-vs-predicted",
};

const wanted = process.argv.slice(2).filter((a) => !a.startsWith("-"));
const dir = new URL("../docs/casebook/", import.meta.url);
mkdirSync(dir, { recursive: true });
for (const name of wanted.length > 0 ? wanted : Object.keys(scenarios)) {
  const { notebook } = await scenarios[name]!.run();
  const want = MAIN_FIGURE[name];
  const cell = notebook.cells.find((c) => c.kind === "figure" && (want === undefined || c.name === want));
  if (!cell || cell.kind !== "figure") {
    console.error(`casebook:figures: ${name} has no figure${want ? ` named ${want}` : ""}`);
    process.exitCode = 1;
    continue;
  }
  writeFileSync(new URL(`${name}.svg`, dir), await renderSvg(cell.spec as ChartSpec));
  console.log(`docs/casebook/${name}.svg ← ${name}: ${cell.name}`);
}

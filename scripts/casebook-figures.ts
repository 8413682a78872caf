/**
 * Regenerates the figures of docs/casebook.md: runs each scenario, renders its main figure
 * and writes docs/casebook/<scenario>.svg (deterministic SVG, committed); where Debian's chromium
 * is installed, also docs/casebook/report-screenshot.png: the top of one report.html as a
 * reader's browser shows it (tests/report/browserCheck.ts).
 *   npm run casebook:figures            every scenario
 *   npm run casebook:figures -- <name>  one
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { join } from "node:path";
import { renderSvg, writeNotebook, type ChartSpec } from "../lib/mod.ts";
import { scenarios } from "../casebook/scenarios.ts";
import { checkInBrowser, hasChromium } from "../tests/report/browserCheck.ts";

/** The figure docs/casebook.md shows for each scenario (a figure name of its notebook). */
export const MAIN_FIGURE: Readonly<Record<string, string>> = {
  "pebble-drawer": "led-current-by-height",
  "coaxial-loops": "coupling-by-height",
  "through-the-books": "led-current-by-height",
  "unknown-driver": "measured-vs-predicted",
  "resin-pendant": "tilt",
  "token-batch": "batch-histogram",
  "drive-waveforms": "fast-model-trust",
  "game-board": "board-coverage",
  "museum-shelf": "shelf-array",
};

/** The scenario whose report.html the screenshot shows. */
const SCREENSHOT = "drive-waveforms";

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
  if (name === SCREENSHOT) {
    if (!hasChromium()) {
      console.error("casebook:figures: no /usr/bin/chromium — the report screenshot was not regenerated (apt-get install -y chromium)");
      continue;
    }
    const out = join(fileURLToPath(new URL("../out/", import.meta.url)), name);
    await writeNotebook(notebook, out);
    const seen = await checkInBrowser(join(out, "report.html"), { screenshot: fileURLToPath(new URL("report-screenshot.png", dir)) });
    console.log(`docs/casebook/report-screenshot.png ← ${name}/report.html (${seen.renderedSvgs} of ${seen.figures} figures rendered, ${seen.consoleErrors.length} console errors)`);
  }
}

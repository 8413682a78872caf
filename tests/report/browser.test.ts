/**
 * The browser check (issue 17): report.html opened in Debian's headless Chromium through
 * playwright-core — every figure rendered as an SVG with a size, no console error, no request
 * leaving the file. Runs where /usr/bin/chromium exists (.ci/run installs it with apt-get);
 * elsewhere it is skipped, and says so.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { writeNotebook } from "../../lib/mod.ts";
import { scenarios } from "../../casebook/scenarios.ts";
import { CHROMIUM, checkInBrowser, hasChromium } from "./browserCheck.ts";

const present = hasChromium();
if (!present) {
  console.warn(`BROWSER CHECK SKIPPED: ${CHROMIUM} not found. Install Debian's chromium package (apt-get install -y chromium) to open report.html in a real browser; .ci/run does this.`);
}

describe.skipIf(!present)("report.html in headless Chromium (playwright-core, Debian's browser)", () => {
  const dir = mkdtempSync(join(tmpdir(), "tanklight-browser-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  for (const name of ["drive-waveforms", "resin-pendant", "coaxial-loops"]) {
    it(`${name}: every chart renders, no console error, nothing fetched`, async () => {
      const { notebook } = await scenarios[name]!.run();
      const figures = notebook.cells.filter((c) => c.kind === "figure").length;
      await writeNotebook(notebook, join(dir, name));
      const seen = await checkInBrowser(join(dir, name, "report.html"), { screenshot: join(dir, `${name}.png`) });
      expect(figures).toBeGreaterThan(0);
      expect(seen.figures).toBe(figures);
      expect(seen.renderedSvgs).toBe(figures);
      expect(seen.svgs).toBeGreaterThanOrEqual(figures);
      expect(seen.consoleErrors).toEqual([]);
      expect(seen.externalRequests).toEqual([]);
      expect(seen.title.length).toBeGreaterThan(0);
    }, 120_000);
  }
});

/**
 * Opens a report.html in Debian's headless Chromium, driven by playwright-core (no browser
 * download: the system's /usr/bin/chromium), and reports what a reader's browser shows: the
 * figures in the page, how many of them rendered as an SVG with a size, console errors and
 * page errors, and any request that left the file (a self-contained report makes none).
 * Used by tests/report/browser.test.ts and scripts/casebook-figures.ts (the docs' screenshot).
 */
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";

/** Where Debian's chromium package puts the browser. */
export const CHROMIUM = "/usr/bin/chromium";

/** Whether the browser check can run here. */
export function hasChromium(): boolean {
  return existsSync(CHROMIUM);
}

/** What the browser showed. */
export interface BrowserCheck {
  /** figure elements in the page */
  readonly figures: number;
  /** figures holding an <svg> that the browser laid out with a non-zero size */
  readonly renderedSvgs: number;
  /** every <svg> in the page */
  readonly svgs: number;
  readonly consoleErrors: readonly string[];
  /** requests to anything but the file itself and data: URLs */
  readonly externalRequests: readonly string[];
  readonly title: string;
}

/**
 * Loads `htmlPath` in headless Chromium and inspects it; with `screenshot`, saves a PNG of the
 * top of the page (viewport 1000 × 1400) there.
 */
export async function checkInBrowser(htmlPath: string, opts: { screenshot?: string } = {}): Promise<BrowserCheck> {
  const { chromium } = await import("playwright-core");
  const profile = mkdtempSync(join(tmpdir(), "tanklight-chromium-"));
  // a fresh profile directory for every run (playwright takes it as the persistent context's user-data-dir)
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1000, height: 1400 },
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  try {
    const page = await context.newPage();
    const consoleErrors: string[] = [];
    const externalRequests: string[] = [];
    page.on("console", (m) => {
      if (m.type() === "error") consoleErrors.push(m.text());
    });
    page.on("pageerror", (e) => consoleErrors.push(String(e)));
    const url = pathToFileURL(htmlPath).href;
    page.on("request", (r) => {
      const u = r.url();
      if (u !== url && !u.startsWith("data:")) externalRequests.push(u);
    });
    await page.goto(url, { waitUntil: "load" });
    // evaluated in the page (a string: this project's TypeScript has no DOM types)
    const counts = (await page.evaluate(`(() => {
      const figs = Array.from(document.querySelectorAll("figure[data-chart]"));
      const rendered = figs.filter((f) => {
        const svg = f.querySelector("svg");
        if (!svg) return false;
        const box = svg.getBoundingClientRect();
        return box.width > 10 && box.height > 10 && svg.querySelectorAll("path, rect, line, text").length > 0;
      });
      return { figures: figs.length, rendered: rendered.length, svgs: document.querySelectorAll("svg").length, title: document.title };
    })()`)) as { figures: number; rendered: number; svgs: number; title: string };
    if (opts.screenshot) await page.screenshot({ path: opts.screenshot, fullPage: false });
    return { figures: counts.figures, renderedSvgs: counts.rendered, svgs: counts.svgs, consoleErrors, externalRequests, title: counts.title };
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}

import { mkdtempSync, readFileSync, readdirSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import * as chart from "../../lib/report/chart.ts";
import { notebookHtml, proseHtml } from "../../lib/report/html.ts";
import { notebookMarkdown } from "../../lib/report/markdown.ts";
import { notebook, DEFER_LINE } from "../../lib/report/notebook.ts";
import { notebookText } from "../../lib/report/terminal.ts";
import { writeNotebook } from "../../lib/report/write.ts";
import { TanklightInputError } from "../../lib/errors.ts";

function sample() {
  const lines: string[] = [];
  const nb = notebook("A <test> drawer", { subtitle: "Does it light?", note: "Demo data.", log: (l) => lines.push(l) });
  nb.heading("Coils");
  nb.text("The coil has **five** turns.", "", "- first point", "  continued", "- second `code`");
  nb.table(["quantity", "value"], [["inductance", { value: 6.09e-6, unit: "H" }], ["turns", 5], ["k", 0.0123]], "the coils");
  nb.figure("led", chart.ledCurrent({ curves: [{ colour: "red", distance: [0.01, 0.05], current: [2e-3, 2e-4] }], threshold: 5e-4 }), "LED current | height");
  nb.parts([{ item: "token capacitor", part: "2.20 nF ±10 % (E12), 10 V, C0G", quantity: 12, notes: "1.9 V peak" }]);
  nb.cautions(["Small parts: keep from children."]);
  const tick = nb.step("sweep");
  for (let i = 1; i <= 100; i++) tick(i, 100);
  return { nb, lines };
}

describe("notebook", () => {
  it("renders Markdown with headings, unit-bearing tables, figure links, the parts list and the cautions", () => {
    const md = notebookMarkdown(sample().nb);
    expect(md).toContain("# A <test> drawer");
    expect(md).toContain("| inductance | 6.09 µH |");
    expect(md).toContain("| turns | 5 |");
    expect(md).toContain("|---|---:|"); // the value column is numeric, right-aligned
    expect(md).toContain("![LED current \\| height](led.svg)".replace("\\|", "|"));
    expect(md).toContain("## Parts list");
    expect(md).toContain("| token capacitor | 2.20 nF ±10 % (E12), 10 V, C0G | 12 | 1.9 V peak |");
    expect(md).toContain("## Cautions");
    expect(md).toContain(DEFER_LINE);
  });

  it("renders plain text for the terminal with aligned columns and no Markdown marks", () => {
    const t = notebookText(sample().nb);
    expect(t).toContain("The coil has five turns.");
    expect(t).toMatch(/inductance {2}6\.09 µH/);
    expect(t).toContain("[figure led.svg: LED current | height]");
    expect(t).not.toContain("**");
  });

  it("renders one self-contained HTML page: escaped text, inlined SVG, no external resource", () => {
    const html = notebookHtml(sample().nb, new Map([["led", "<svg id=\"x\"></svg>"]]));
    expect(html).toContain("<h1>A &lt;test&gt; drawer</h1>");
    expect(html).toContain('<figure data-chart="led"><svg id="x"></svg>');
    expect(html).toContain("<strong>five</strong>");
    expect(html).not.toMatch(/<(script|link|img)\b/);
    expect(html).not.toMatch(/(src|href)="https?:/);
    expect(proseHtml("- a\n  b\n- c")).toBe("<ul><li>a b</li><li>c</li></ul>");
  });

  it("shows progress of long steps at most every tenth of the way", () => {
    const { lines } = sample();
    expect(lines[0]).toBe("[1] sweep …");
    expect(lines.length).toBe(11);
    expect(lines[lines.length - 1]).toMatch(/^\[1\] sweep: 100\/100 \(\d+\.\d s\)$/);
  });

  it("refuses a row of the wrong length, NaN and a figure name that is not a file name", () => {
    const nb = notebook("t");
    expect(() => nb.table(["a", "b"], [["x"]])).toThrow(TanklightInputError);
    expect(() => nb.table(["a"], [[{ value: Number.NaN, unit: "V" }]])).toThrow(/rows\[0\]\[0\]/);
    const spec = chart.tradeoff({ points: [{ label: "a", cost: 1, margin: 1 }], cost: { name: "c", unit: "A" }, margin: { name: "m", unit: "×" } });
    expect(() => nb.figure("../evil", spec, "x")).toThrow(/name/);
    nb.figure("ok", spec, "x");
    expect(() => nb.figure("ok", spec, "again")).toThrow(/name/);
  });

  it("writeNotebook writes report.md, one SVG per figure and report.html with the SVG inlined", async () => {
    const dir = mkdtempSync(join(tmpdir(), "tanklight-nb-"));
    await writeNotebook(sample().nb, dir);
    expect(readdirSync(dir).sort()).toEqual(["led.svg", "report.html", "report.md"]);
    const svg = readFileSync(join(dir, "led.svg"), "utf8");
    expect(svg.startsWith("<svg")).toBe(true);
    expect(readFileSync(join(dir, "report.html"), "utf8")).toContain(svg);
  });
});

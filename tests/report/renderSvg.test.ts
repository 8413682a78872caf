import { describe, expect, it } from "vitest";
import * as chart from "../../lib/report/chart.ts";
import { renderSvg } from "../../lib/report/renderSvg.ts";

/** the text of every SVG element of a class (axis titles, labels…) */
function texts(svg: string, cls: string): string[] {
  const out: string[] = [];
  const re = new RegExp(`<g class="mark-text ${cls}"[^>]*>(.*?)</g>`, "gs");
  for (const m of svg.matchAll(re)) for (const t of m[1]!.matchAll(/<text[^>]*>([^<]*)<\/text>/g)) out.push(t[1]!);
  return out;
}

describe("renderSvg", () => {
  const spec = chart.ledCurrent({
    curves: [
      { colour: "red", distance: [0.01, 0.03, 0.06, 0.1], current: [5e-3, 2e-3, 4e-4, 5e-5] },
      { colour: "blue", distance: [0.01, 0.03, 0.06, 0.1], current: [2e-3, 5e-4, 6e-5, 6e-6] },
    ],
    threshold: 5e-4,
  });

  it("draws an SVG with both axis titles (with units), the lines, the rule and the legend, without a browser", async () => {
    const svg = await renderSvg(spec);
    expect(svg.startsWith("<svg")).toBe(true);
    expect(texts(svg, "role-axis-title").sort()).toEqual(["LED average current (mA)", "height above the transmitter (mm)"]);
    expect(svg.match(/class="mark-line role-mark/g)).toHaveLength(2); // one line per LED
    expect(svg).toMatch(/class="mark-rule role-mark/);
    expect(texts(svg, "role-legend-label")).toEqual(["red LED", "blue LED"]);
    // the x axis covers the data: labels from 10 to 100 mm
    const xLabels = texts(svg, "role-axis-label").map(Number).filter((v) => Number.isFinite(v));
    expect(Math.max(...xLabels)).toBeGreaterThanOrEqual(100);
    // our palette, not vega's defaults: the paper background and the LED swatches
    expect(svg).toContain("#fbf8f1");
    expect(svg).toContain("#d23a2a");
    expect(svg).not.toMatch(/https?:\/\/(?!www\.w3\.org)/); // nothing to fetch
  });

  it("is deterministic: the same spec gives the same bytes, also after other charts were drawn", async () => {
    const a = await renderSvg(spec);
    await renderSvg(chart.yieldHistogram({ samples: [1e-3, 2e-3, 3e-4], threshold: 5e-4 }));
    const b = await renderSvg(spec);
    expect(b).toBe(a);
  });

  it("renders every builder's chart (coverage with boundary, exposure with gradients)", async () => {
    const g = Array.from({ length: 9 }, (_, i) => -0.04 + i * 0.01);
    const cur = g.map((y) => g.map((x) => 2e-3 * Math.exp(-(x * x + y * y) / 1e-3)));
    const svg = await renderSvg(chart.coverage({ x: g, y: g, current: cur, threshold: 5e-4 }));
    expect(svg.match(/<path/g)!.length).toBeGreaterThan(81);
    expect(texts(svg, "role-axis-title").sort()).toEqual(["x position (mm)", "y position (mm)"]);
    // gradient ids are renumbered per chart and every reference resolves
    for (const m of svg.matchAll(/url\(#([^)]+)\)/g)) expect(svg).toContain(`id="${m[1]}"`);
  });
});

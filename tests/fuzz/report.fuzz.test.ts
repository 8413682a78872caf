/**
 * Fuzz: the report builders of lib/mod.ts (lib/report) — notebooks and their renderers, the parts
 * list, the load line, design files and the safety sections. Bad and extreme arguments give a
 * clear TanklightInputError naming the function and the user's field, or a finite result
 * (framework: tests/fuzz/framework.ts). A notebook, a safety report and a coil are library
 * objects passed along (`skip`), but null, junk and a missing one still are tried. Demo data.
 */
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll } from "vitest";
import { fuzzSuite } from "./framework.ts";
import {
  ledSwatch, notebook, partsList, partVoltages, wireText, notebookMarkdown, notebookHtml, notebookText, tokenLoadLine, parseDesign,
  parseDesignText, designJsonSchema, addSafetySections, roundWire, roundCoil, ledPreset, safetyReport, renderSvg, renderNotebook, writeNotebook, chart,
} from "../../lib/mod.ts";

const coil = roundCoil({ innerRadius: "6 mm", turns: 20, wire: { diameter: "0.1 mm" } });
const nb = notebook("Fuzz notebook", { subtitle: "demo", note: "Demo data." });
nb.heading("Coils");
nb.text("A paragraph with **bold** and `code`.");
nb.table(["quantity", "value"], [["L", { value: 4.7e-6, unit: "H" }], ["turns", 20]], "demo table");
nb.cautions(["Keep metal away."]);
const report = safetyReport(
  { frequency: "200 kHz", surfaceHeight: "4 mm", transmitters: [{ coil, current: "0.5 A" }] },
  { exposure: { nx: 3, ny: 3, nz: 2, discGrid: 2 }, metalObjects: [] },
);
const spec = chart.ledCurrent({ curves: [{ colour: "red", distance: [0.01, 0.05], current: [5e-3, 2e-4] }], threshold: 5e-4 });
const withFigure = notebook("Figure notebook", { note: "Demo data." });
withFigure.figure("led-current", spec, "LED current against distance (demo data)");
/** writeNotebook writes below a temporary directory: a mutated dir ('toString', '') stays inside it */
const tmp = mkdtempSync(join(tmpdir(), "tanklight-fuzz-"));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));
const write = (nb: never, dir: unknown, onProgress: never) => writeNotebook(nb, typeof dir === "string" && dir !== "" ? join(tmp, dir) : (dir as string), onProgress);
/** the casebook's design file (demo data) */
const designText = readFileSync(new URL("../../casebook/designs/through-the-books.json", import.meta.url), "utf8");

fuzzSuite("report", [
  { name: "ledSwatch", call: ledSwatch, valid: ["green-gap"], params: ["colour"], text: ["0"] },
  { name: "notebook", call: notebook, valid: ["Title", { subtitle: "sub", note: "Demo data.", log: () => undefined }], params: ["title", "options"], text: ["0", "1.subtitle", "1.note"] },
  {
    name: "partsList", call: partsList, params: ["input"], skip: ["0.coils.0.coil"], text: ["0.coils.0.item", "0.capacitors.0.item", "0.leds.0.item", "0.leds.0.colour", "0.supply.item"],
    valid: [{ coils: [{ item: "token coil", coil, quantity: 2 }], capacitors: [{ item: "token tank", parts: [2.2e-9, 1e-9], topology: "parallel", series: "E12", peakVoltage: "3 V", quantity: 2 }], leds: [{ item: "LED", colour: "red", quantity: 2 }], supply: { item: "USB", voltage: "5 V", current: "0.2 A", rating: "0.5 A" } }],
  },
  { name: "partVoltages", call: partVoltages, valid: [[2.2e-9, 1e-9], "series", "30 V"], params: ["parts", "topology", "peak"] },
  { name: "wireText", call: wireText, valid: [{ ...roundWire("0.1 mm", { insulation: "10 um" }) }], params: ["conductor"] },
  { name: "notebookMarkdown", call: notebookMarkdown, valid: [nb], params: ["nb"], skip: ["0"] },
  { name: "notebookHtml", call: notebookHtml, valid: [nb, new Map()], params: ["nb", "svgs"], skip: ["0"] },
  { name: "notebookText", call: notebookText, valid: [nb], params: ["nb"], skip: ["0"] },
  {
    name: "tokenLoadLine", call: tokenLoadLine, params: ["input"], skip: ["0.load.led"],
    valid: [{ frequency: "200 kHz", mutualInductance: "50 nH", transmitterCurrent: "1 A", inductance: "100 uH", resistance: "5 ohm", capacitance: "6.3 nF", load: { kind: "led", led: ledPreset("red") }, maxVoltage: "4 V", points: 51 }],
  },
    // a design file's errors name the file and the field's JSON path; the file itself (the root) has no other name
  { name: "parseDesign", where: "design file", call: parseDesign, valid: [JSON.parse(designText)], text: ["0.name", "0.title", "0.question", "0.dataNote", "0.story.0", "0.$schema", "0.surface.barrier.material"] },
  { name: "parseDesignText", where: "design file", call: parseDesignText, valid: [designText], extreme: [["{"], ["[]"], [" ".repeat(100)]] },
  { name: "designJsonSchema", call: designJsonSchema, valid: [] },
  { name: "addSafetySections", call: (r: never) => addSafetySections(notebook("t"), r), valid: [report], params: ["report"], skip: ["0"] },
  // async renderers (vega is loaded on the first call): the spec and notebooks are library objects
  { name: "renderSvg", call: renderSvg, valid: [spec, { scale: 2 }], params: ["spec", "options"], skip: ["0"], budgetMs: 8000, junkRuns: 8, bad: [[{}], [{ mark: "nonsense" }]] },
  { name: "renderNotebook", call: renderNotebook, valid: [withFigure, () => undefined], params: ["nb", "onProgress"], skip: ["0"], budgetMs: 8000, junkRuns: 8 },
  { name: "writeNotebook", call: write, valid: [withFigure, "out", () => undefined], params: ["nb", "dir", "onProgress"], skip: ["0"], text: ["1"], budgetMs: 8000, junkRuns: 8 },
]);

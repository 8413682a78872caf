/**
 * Runs the casebook: every scenario, or the ones named on the command line.
 *   npx tsx casebook/run.ts [scenario …]
 *   npx deno run -A casebook/run.ts [scenario …]
 *   npx tsx casebook/run.ts --design my-design.json   (a design file: the same full report)
 * Each scenario prints its worked run and writes out/<scenario>/report.md with its SVG
 * figures beside it and a self-contained out/<scenario>/report.html.
 */
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { readFileSync } from "node:fs";
import { designReport, notebookText, parseDesignText, TanklightInputError, writeNotebook, type Notebook } from "../lib/mod.ts";
import { scenarios } from "./scenarios.ts";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const args = typeof Deno !== "undefined" ? Deno.args : process.argv.slice(2);
const log = (line: string): void => console.error(line);
const designAt = args.indexOf("--design");
const designPath = designAt >= 0 ? args[designAt + 1] : undefined;
const wanted = args.filter((a, i) => !a.startsWith("-") && !(designAt >= 0 && i === designAt + 1));

async function write(name: string, nb: Notebook, started: number): Promise<void> {
  await writeNotebook(nb, join(root, "out", name), (done, total) => log(`   figures ${done}/${total}`));
  console.log(notebookText(nb));
  console.log(`(written to out/${name}/report.md, report.html and its figures in ${((Date.now() - started) / 1000).toFixed(1)} s)\n`);
}

if (designAt >= 0) {
  if (!designPath) throw new Error("casebook: --design needs a file name, e.g. --design my-design.json");
  const started = Date.now();
  let design;
  try {
    design = parseDesignText(readFileSync(designPath, "utf8"));
  } catch (e) {
    if (!(e instanceof TanklightInputError)) throw e;
    console.error(`casebook: ${designPath} has errors:\n${e.issues.map((i) => `  ${i.path || "(file)"}: ${i.message}, got ${JSON.stringify(i.value)}${i.expected ? ` (expected ${i.expected})` : ""}`).join("\n")}`);
    process.exit(1);
  }
  log(`── design ${designPath}: ${design.title}`);
  await write(design.name, designReport(design, { log }).notebook, started);
}

const unknown = wanted.filter((w) => !(w in scenarios));
if (unknown.length > 0) {
  console.error(`casebook: no scenario named ${unknown.map((u) => `'${u}'`).join(", ")}; known: ${Object.keys(scenarios).join(", ")}`);
  throw new Error("unknown scenario");
}

for (const name of wanted.length > 0 ? wanted : designAt >= 0 ? [] : Object.keys(scenarios)) {
  const started = Date.now();
  log(`── ${name}: ${scenarios[name]!.title}`);
  const { notebook } = await scenarios[name]!.run({ log });
  await write(name, notebook, started);
}

declare const Deno: { args: string[] } | undefined;

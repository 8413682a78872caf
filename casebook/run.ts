/**
 * Runs the casebook: every scenario, or the ones named on the command line.
 *   npx tsx casebook/run.ts [scenario …]
 *   npx deno run -A casebook/run.ts [scenario …]
 * Each scenario prints its worked run and writes out/<scenario>/report.md with its SVG
 * figures beside it and a self-contained out/<scenario>/report.html.
 */
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { notebookText, writeNotebook } from "../lib/mod.ts";
import { scenarios } from "./scenarios.ts";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const args = typeof Deno !== "undefined" ? Deno.args : process.argv.slice(2);
const wanted = args.filter((a) => !a.startsWith("-"));
const log = (line: string): void => console.error(line);

const unknown = wanted.filter((w) => !(w in scenarios));
if (unknown.length > 0) {
  console.error(`casebook: no scenario named ${unknown.map((u) => `'${u}'`).join(", ")}; known: ${Object.keys(scenarios).join(", ")}`);
  throw new Error("unknown scenario");
}

for (const name of wanted.length > 0 ? wanted : Object.keys(scenarios)) {
  const started = Date.now();
  log(`── ${name}: ${scenarios[name]!.title}`);
  const { notebook } = await scenarios[name]!.run({ log });
  const dir = join(root, "out", name);
  await writeNotebook(notebook, dir, (done, total) => log(`   figures ${done}/${total}`));
  console.log(notebookText(notebook));
  console.log(`(written to out/${name}/report.md, report.html and its figures in ${((Date.now() - started) / 1000).toFixed(1)} s)\n`);
}

declare const Deno: { args: string[] } | undefined;

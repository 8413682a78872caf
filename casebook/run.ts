/**
 * Runs the casebook: every scenario, or the one named on the command line.
 *   npx tsx casebook/run.ts [scenario]
 *   npx deno run -A casebook/run.ts [scenario]
 * Each scenario prints its worked run and writes out/<scenario>/report.md.
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { scenarios } from "./scenarios.ts";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const args = typeof Deno !== "undefined" ? Deno.args : process.argv.slice(2);
const wanted = args.filter((a) => !a.startsWith("-"));

const unknown = wanted.filter((w) => !(w in scenarios));
if (unknown.length > 0) {
  console.error(`casebook: no scenario named ${unknown.map((u) => `'${u}'`).join(", ")}; known: ${Object.keys(scenarios).join(", ")}`);
  throw new Error("unknown scenario");
}

for (const name of wanted.length > 0 ? wanted : Object.keys(scenarios)) {
  const scenario = scenarios[name]!;
  const { notebook } = await scenario.run();
  const dir = join(root, "out", name);
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, "report.md"), notebook + "\n");
  console.log(notebook);
  console.log(`\n(written to out/${name}/report.md)\n`);
}

declare const Deno: { args: string[] } | undefined;

/**
 * `npm run bench` — runs every bench/*.bench.ts module (each exports `workloads: Workload[]`)
 * and prints one line per workload. `npm run bench -- em` runs only files whose name contains "em".
 */
import { readdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { formatResult, runWorkload, type Workload } from "./harness.ts";

const here = dirname(fileURLToPath(import.meta.url));
const filter = process.argv[2];
const files = readdirSync(here)
  .filter((f) => f.endsWith(".bench.ts") && (!filter || f.includes(filter)))
  .sort();
for (const file of files) {
  const mod = (await import(pathToFileURL(join(here, file)).href)) as { workloads?: Workload[] };
  for (const w of mod.workloads ?? []) {
    console.log(formatResult(runWorkload(w)));
  }
}

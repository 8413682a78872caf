/**
 * `npm run bench` — runs every bench/*.bench.ts module (each exports `workloads: Workload[]`)
 * and prints one line per workload: min and median per call over the rounds, the target
 * verdict, and the ratio to the workload named in `against` (measured earlier in the same run;
 * a quick reference is measured again in rounds alternating with the workload, so that a change
 * of machine load during the run falls on both).
 * `npm run bench -- em` runs only files whose name contains "em".
 */
import { readdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { formatResult, runInterleaved, runWorkload, type BenchResult, type Workload } from "./harness.ts";

const here = dirname(fileURLToPath(import.meta.url));
const filter = process.argv[2];
const files = readdirSync(here)
  .filter((f) => f.endsWith(".bench.ts") && (!filter || f.includes(filter)))
  .sort();
console.log(`tanklight benchmarks — ${new Date().toISOString()}, Node ${process.version}; times per call, min and median over rounds`);
for (const file of files) {
  const mod = (await import(pathToFileURL(join(here, file)).href)) as { workloads?: Workload[] };
  const done = new Map<string, BenchResult>();
  const byName = new Map((mod.workloads ?? []).map((w) => [w.name, w] as const));
  for (const w of mod.workloads ?? []) {
    const ref = w.against === undefined ? undefined : done.get(w.against);
    // a quick reference (or any, with `interleave`) is re-run in rounds alternating with this workload (runInterleaved)
    if (ref !== undefined && (ref.median < 0.1 || w.interleave === true) && byName.has(w.against!)) {
      const pair = runInterleaved(byName.get(w.against!)!, w);
      done.set(w.name, pair.result);
      console.log(formatResult(pair.result, w, pair.ref) + "  (interleaved rounds)");
      continue;
    }
    const r = runWorkload(w);
    done.set(w.name, r);
    console.log(formatResult(r, w, ref));
  }
}

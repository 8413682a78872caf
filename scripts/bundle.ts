/**
 * `npm run build`, second step: bundles lib/mod.ts and lib/advanced.ts into dist/ (one shared
 * chunk, minified, names kept) after tsc has written the declarations (tsconfig.build.json).
 *
 * Why a bundle: a user's `import "tanklight"` from dist/ otherwise opens and compiles one file
 * per module (about 70 of ours); on a busy machine each open costs milliseconds. zod stays an
 * outside package so that user schemas and ours share one zod; small helpers of other
 * dependencies are inlined where they are used. Measured in bench/startup.bench.ts.
 */
import { build } from "esbuild";
import { readdirSync, rmSync } from "node:fs";
import { join } from "node:path";

// chunk names change with their content: remove the previous build's JS (tsc's .d.ts stay)
const clean = (dir: string): void => {
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, e.name);
    if (e.isDirectory()) clean(p);
    else if (e.name.endsWith(".js") || e.name.endsWith(".js.map")) rmSync(p);
  }
};
clean("dist");

await build({
  // the analysis worker is its own entry (dist/analysis/worker.js): worker threads load it by URL
  entryPoints: { mod: "lib/mod.ts", advanced: "lib/advanced.ts", "analysis/worker": "lib/analysis/worker.ts" },
  outdir: "dist",
  bundle: true,
  splitting: true,
  format: "esm",
  platform: "node",
  target: "node20",
  minify: true,
  keepNames: true,
  sourcemap: true,
  // tinypool finds its own worker entry next to its files, so it stays an outside package too
  external: ["zod", "tinypool"],
  logLevel: "warning",
});

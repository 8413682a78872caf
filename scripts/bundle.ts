/**
 * `npm run build`, second step: bundles lib/mod.ts and lib/advanced.ts into dist/ (shared
 * chunks, minified, names kept) after tsc has written the declarations (tsconfig.build.json).
 *
 * Why a bundle: a user's `import "tanklight"` from dist/ otherwise opens and compiles one file
 * per module (about 170 of ours); on a busy machine each open costs milliseconds. Small helpers
 * of other dependencies are inlined where they are used; vega and tinypool are imported only
 * by the async functions that need them.
 *
 * zod is loaded on demand: `import { z } from "zod"` in lib/ becomes scripts/zodOnDemand.ts
 * (dist/zod.js), which requires dist/zod.cjs — zod bundled into one CommonJS file — when the
 * first schema is built. Measured with bench/startup.bench.ts and CPU time of fresh processes
 * on this 2-core machine (2026-12-02, load ≈ 11): bare node 110 ms; import with zod outside as
 * an ESM package (its ~50 files loaded at import) 300 ms; with zod bundled into our chunks
 * (evaluated at import, ~590 kB) 230 ms; with zod on demand 160 ms. zod is not tree-shaken in
 * zod.cjs (CommonJS), which costs nothing until a schema is used. The copy of zod in dist/ is
 * not a user's zod: zod keeps its registry and configuration on globalThis, so our schemas
 * and a user's compose (tests/bundle.test.ts).
 */
import { build, type Plugin } from "esbuild";
import { readdirSync, rmSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const onDemand = join(root, "scripts", "zodOnDemand.ts");

/** Every `import … from "zod"` of lib/ resolves to the on-demand stand-in; other zod paths are refused. */
const zodOnDemand: Plugin = {
  name: "zod-on-demand",
  setup(b) {
    b.onResolve({ filter: /^zod($|\/)/ }, (args) =>
      args.path === "zod"
        ? { path: onDemand }
        : { errors: [{ text: `${args.path}: lib/ may import only "zod" (loaded on demand by scripts/zodOnDemand.ts)` }] },
    );
  },
};

/** Builds dist/ (or another folder: tests bundle into out/). */
export async function bundle(outdir: string): Promise<void> {
  // chunk names change with their content: remove the previous build's JS (tsc's .d.ts stay)
  const clean = (dir: string): void => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) clean(p);
      else if (/\.(c?js)(\.map)?$/.test(e.name)) rmSync(p);
    }
  };
  clean(outdir);
  const common = { bundle: true, platform: "node", target: "node20", minify: true, keepNames: true, sourcemap: true, logLevel: "warning" } as const;
  // zod's CommonJS build as one file, required by dist/zod.js on first use
  await build({ ...common, entryPoints: [createRequire(import.meta.url).resolve("zod")], outfile: join(outdir, "zod.cjs"), format: "cjs" });
  await build({
    ...common,
    // the analysis worker is its own entry (dist/analysis/worker.js): worker threads load it by URL
    entryPoints: { mod: join(root, "lib/mod.ts"), advanced: join(root, "lib/advanced.ts"), "analysis/worker": join(root, "lib/analysis/worker.ts"), zod: onDemand },
    outdir,
    splitting: true,
    format: "esm",
    // tinypool finds its own worker entry next to its files, so it stays an outside package
    external: ["tinypool"],
    plugins: [zodOnDemand],
  });
}

if (process.argv[1] !== undefined && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) await bundle(join(root, "dist"));

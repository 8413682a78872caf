/**
 * `npm run build`, second step: bundles lib/mod.ts and lib/advanced.ts into dist/ (shared
 * chunks, minified) after tsc has written the declarations (tsconfig.build.json).
 *
 * Why a bundle: a user's `import "tanklight"` from dist/ otherwise opens and compiles one file
 * per module (about 170 of ours); on a busy machine each open costs milliseconds. Small helpers
 * of other dependencies are inlined where they are used; vega and tinypool are imported only
 * by the async functions that need them.
 *
 * zod is loaded on demand: lib/ reaches zod only through lib/zod.ts, which requires it on the
 * first schema built (lib/zodLoader.ts); here lib/zodLoader.ts becomes scripts/zodOnDemand.ts,
 * which requires dist/zod.cjs — the part of zod lib/ uses, bundled into one CommonJS file of
 * ≈ 118 kB instead of zod's 106 ES modules.
 * Measured as CPU time of fresh processes on this 2-core machine (2026-12-02, load ≈ 11, one
 * run): bare node 110 ms; import with zod outside as an ESM package 300 ms; with all of zod
 * bundled into our chunks (evaluated at import, ≈ 590 kB) 230 ms; with zod on demand 160 ms.
 * Requiring zod.cjs then takes 65–120 ms wall at load ≈ 14 (all of zod's CommonJS build, with
 * its 40 locales, 120–210 ms). The copy of zod in dist/ is not a user's zod: zod keeps its
 * registry and configuration on globalThis, so our schemas and a user's compose
 * (tests/bundle.test.ts).
 *
 * Function names are not kept (esbuild's keepNames): it wraps each of ≈ 1,500 functions in a
 * `name` definition run at import (and each inner closure at each call). Measured as CPU time
 * of fresh processes, min of 31 interleaved rounds (2026-12-02, load ≈ 14): bare node 101 ms,
 * import with names kept 164 ms, without 150 ms. Exported names are unchanged; a function's
 * `.name` and stack frames read minified (dist/ ships source maps: `node --enable-source-maps`).
 */
import { build, type Plugin } from "esbuild";
import { readdirSync, readFileSync, rmSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const onDemand = join(root, "scripts", "zodOnDemand.ts");

/**
 * lib/zodLoader.ts (zod's CommonJS build) becomes the on-demand loader of dist/zod.cjs; a
 * value import of zod itself is refused (lib/ reaches zod through lib/zod.ts; type imports are
 * gone before esbuild resolves).
 */
const zodOnDemand: Plugin = {
  name: "zod-on-demand",
  setup(b) {
    b.onResolve({ filter: /(^|\/)zodLoader\.ts$/ }, () => ({ path: onDemand }));
    b.onResolve({ filter: /^zod($|\/)/ }, (args) => ({ errors: [{ text: `${args.path}: lib/ reaches zod through lib/zod.ts (loaded on demand)` }] }));
  },
};

/**
 * The members of zod's `z` that lib/ uses: those lib/zod.ts calls (`member("strictObject")`,
 * `loadZod().globalRegistry`). dist/zod.cjs exports just these, so esbuild leaves out the rest
 * of zod (its 40 other locales, JSON Schema import, …).
 */
function zodMembers(): string[] {
  const text = readFileSync(join(root, "lib", "zod.ts"), "utf8");
  const named = new Set([...text.matchAll(/\bmember\("(\w+)"\)|\bloadZod\(\)\.(\w+)/g)].map((m) => (m[1] ?? m[2])!));
  const { z } = createRequire(import.meta.url)("zod") as { z: Record<string, unknown> };
  const missing = [...named].filter((k) => !(k in z));
  if (missing.length > 0) throw new Error(`lib/zod.ts names z.${missing.join(", z.")}, which zod does not have`);
  return [...named].sort();
}

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
  const common = { bundle: true, platform: "node", target: "node20", minify: true, sourcemap: true, logLevel: "warning" } as const;
  // the members of zod's z that lib/ uses, and only what they need, as one CommonJS file
  const members = zodMembers();
  await build({ ...common, stdin: { contents: `export { ${members.join(", ")} } from "zod";\n`, resolveDir: root, loader: "js" }, outfile: join(outdir, "zod.cjs"), format: "cjs" });
  await build({
    ...common,
    // the analysis worker is its own entry (dist/analysis/worker.js): worker threads load it by URL
    entryPoints: { mod: join(root, "lib/mod.ts"), advanced: join(root, "lib/advanced.ts"), "analysis/worker": join(root, "lib/analysis/worker.ts") },
    outdir,
    splitting: true,
    format: "esm",
    // tinypool finds its own worker entry next to its files, so it stays an outside package
    external: ["tinypool"],
    plugins: [zodOnDemand],
  });
}

if (process.argv[1] !== undefined && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) await bundle(join(root, "dist"));

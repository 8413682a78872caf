/**
 * Importing the library builds nothing (issue 12: import cost; DEVELOPERS.md): a fresh process
 * imports lib/mod.ts and lib/advanced.ts and counts the zod schema objects constructed while
 * it does — zod's constructor reads `_zod` once on each new schema, so a getter on
 * Object.prototype counts them. A module-level schema not wrapped in `lazySchema` fails here,
 * naming nothing but the count (find it by the module's top-level `const … = z.…`); the probe
 * counts a schema built before the import (it is not blind). A second fresh process records
 * every module the import loads (an ES module hook, plus Node's CommonJS cache) and checks that
 * none of them is zod's (lib/ reaches zod through lib/zod.ts, which loads it on first use) and
 * that no other package but simple-statistics loads. The
 * time it takes is measured in bench/startup.bench.ts, not here.
 */
import { describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const url = (p: string): string => JSON.stringify(pathToFileURL(join(root, p)).href);

const script = `
let built = 0;
Object.defineProperty(Object.prototype, "_zod", { get() { built++; return undefined; }, configurable: true });
const { z } = await import("zod");
z.string();
const counted = built; // the probe sees a schema being built
const base = built;
await import(${url("lib/mod.ts")});
await import(${url("lib/advanced.ts")});
const atImport = built - base;
delete Object.prototype._zod;
console.log(JSON.stringify({ counted, atImport }));
`;

/**
 * Imports the given files in a fresh tsx process and returns the URLs of every ES module it
 * loaded and the paths of every CommonJS module; `before` runs first (to prove the probe sees a load).
 */
function modulesLoaded(files: readonly string[], before = ""): { esm: string[]; cjs: string[] } {
  const hooks = `let port; export function initialize(d) { port = d.port; } export async function load(url, context, next) { port.postMessage(url); return next(url, context); }`;
  const end = "data:text/javascript,export const end = 1;";
  const probe = `
import { register, createRequire } from "node:module";
import { MessageChannel } from "node:worker_threads";
const { port1, port2 } = new MessageChannel();
const esm = [];
const ended = new Promise((done) => port1.on("message", (url) => (url === ${JSON.stringify(end)} ? done() : esm.push(url))));
register("data:text/javascript," + encodeURIComponent(${JSON.stringify(hooks)}), { data: { port: port2 }, transferList: [port2] });
${before}
${files.map((f) => `await import(${url(f)});`).join("\n")}
await import(${JSON.stringify(end)}); // messages arrive in order: once this one is seen, all are
await ended;
port1.close();
console.log(JSON.stringify({ esm, cjs: Object.keys(createRequire(import.meta.url).cache) }));
`;
  const out = execFileSync(process.execPath, ["--import", "tsx", "--input-type=module", "-e", probe], { cwd: root, encoding: "utf8", timeout: 120_000 });
  return JSON.parse(out.trim().split("\n").pop()!) as { esm: string[]; cjs: string[] };
}

const isZod = (p: string): boolean => /[\\/]node_modules[\\/]zod[\\/]/.test(p);

describe("import cost", () => {
  it("importing lib/mod.ts and lib/advanced.ts loads no zod module (lib/zod.ts loads it on first use)", () => {
    const seen = modulesLoaded([], `await import("zod"); createRequire(import.meta.url)("zod");`);
    expect(seen.esm.filter(isZod).length, "the probe sees zod's ES modules").toBeGreaterThan(10);
    expect(seen.cjs.filter(isZod).length, "the probe sees zod's CommonJS modules").toBeGreaterThan(10);
    const r = modulesLoaded(["lib/mod.ts", "lib/advanced.ts"]);
    expect(r.esm.some((u) => u.endsWith("/lib/mod.ts"))).toBe(true);
    expect([...r.esm, ...r.cjs].filter(isZod)).toEqual([]);
    // of the other packages only simple-statistics (one file) loads at import: vega, vega-lite
    // and tinypool are imported by the async functions that use them, mathjs nowhere
    const packages = new Set([...r.esm, ...r.cjs].map((p) => /[\\/]node_modules[\\/]((?:@[^\\/]+[\\/])?[^\\/]+)/.exec(p)?.[1]).filter((p) => p !== undefined && p !== "tsx" && p !== "esbuild"));
    expect([...packages]).toEqual(["simple-statistics"]);
  }, 150_000);


  it("importing lib/mod.ts and lib/advanced.ts constructs no zod schema", () => {
    const out = execFileSync(process.execPath, ["--import", "tsx", "--input-type=module", "-e", script], { cwd: root, encoding: "utf8", timeout: 120_000 });
    const r = JSON.parse(out.trim().split("\n").pop()!) as { counted: number; atImport: number };
    expect(r.counted).toBeGreaterThan(0);
    expect(r.atImport).toBe(0);
  }, 150_000);
});

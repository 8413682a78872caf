/**
 * Importing the library builds nothing (issue 12: import cost; DEVELOPERS.md): a fresh process
 * imports lib/mod.ts and lib/advanced.ts and counts the zod schema objects constructed while
 * it does — zod's constructor reads `_zod` once on each new schema, so a getter on
 * Object.prototype counts them. A module-level schema not wrapped in `lazySchema` fails here,
 * naming nothing but the count (find it by the module's top-level `const … = z.…`); the probe
 * counts a schema built before the import (it is not blind). The time it takes is measured in bench/startup.bench.ts, not here.
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

describe("import cost", () => {
  it("importing lib/mod.ts and lib/advanced.ts constructs no zod schema", () => {
    const out = execFileSync(process.execPath, ["--import", "tsx", "--input-type=module", "-e", script], { cwd: root, encoding: "utf8", timeout: 120_000 });
    const r = JSON.parse(out.trim().split("\n").pop()!) as { counted: number; atImport: number };
    expect(r.counted).toBeGreaterThan(0);
    expect(r.atImport).toBe(0);
  }, 150_000);
});

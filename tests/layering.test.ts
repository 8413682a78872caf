import { describe, expect, it } from "vitest";
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, normalize, relative, resolve, sep } from "node:path";
import { fileURLToPath } from "node:url";

/**
 * The layer rule of docs/design.md §2: a module imports only from its own layer or below.
 *   edge (lib/units.ts, lib/unitAlgebra.ts, lib/schema.ts, lib/zod.ts, lib/zodLoader.ts, lib/errors.ts, lib/constants.ts, lib/hazards.ts) = 0,
 *   math 0 (and knows no physics: only itself and the edge files errors/constants),
 *   em 1, circuit 2, safety 3, analysis 4, report 5, the entries (mod.ts, advanced.ts) 9;
 *   casebook/ imports only lib/mod.ts (as a user's script would) and its own files.
 * A new folder under lib/ must be given a rank here, so the rule cannot be skipped by accident.
 */
const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const lib = join(root, "lib");

const RANK: Record<string, number> = {
  "units.ts": 0,
  "unitAlgebra.ts": 0,
  "schema.ts": 0,
  "zod.ts": 0,
  "zodLoader.ts": 0,
  "errors.ts": 0,
  "constants.ts": 0,
  "hazards.ts": 0,
  math: 0,
  em: 1,
  circuit: 2,
  safety: 3,
  analysis: 4,
  report: 5,
  "mod.ts": 9,
  "advanced.ts": 9,
};

function tsFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...tsFiles(p));
    else if (name.endsWith(".ts")) out.push(p);
  }
  return out;
}

/** Static and dynamic import/export specifiers of a source text. */
function specifiers(text: string): string[] {
  const found: string[] = [];
  for (const m of text.matchAll(/(?:^|[\s;])(?:import|export)\b[^;'"]*?\bfrom\s*["']([^"']+)["']/gm)) found.push(m[1]!);
  for (const m of text.matchAll(/\bimport\s*\(\s*["']([^"']+)["']\s*\)/g)) found.push(m[1]!);
  for (const m of text.matchAll(/^\s*import\s*["']([^"']+)["']/gm)) found.push(m[1]!);
  return found;
}

/** The top-level entry of lib/ a path belongs to ("em", "units.ts", …), or undefined outside lib/. */
function topOf(path: string): string | undefined {
  const rel = relative(lib, path);
  if (rel.startsWith("..")) return undefined;
  return rel.split(sep)[0];
}

describe("layering (docs/design.md §2)", () => {
  const files = tsFiles(lib);

  it("every top-level entry of lib/ has a layer rank", () => {
    const unranked = readdirSync(lib).filter((n) => RANK[n] === undefined);
    expect(unranked, "give each new folder or edge file a rank in tests/layering.test.ts").toEqual([]);
  });

  it("no module in lib/ imports from a higher layer", () => {
    expect(files.length).toBeGreaterThan(50);
    const bad: string[] = [];
    for (const file of files) {
      const mine = RANK[topOf(file)!]!;
      for (const s of specifiers(readFileSync(file, "utf8"))) {
        if (!s.startsWith(".")) continue;
        const target = normalize(join(dirname(file), s));
        const top = topOf(target);
        if (top === undefined) {
          bad.push(`${relative(root, file)} imports ${s}, outside lib/`);
          continue;
        }
        const theirs = RANK[top];
        if (theirs === undefined || theirs > mine) bad.push(`${relative(root, file)} imports ${s} (a higher layer)`);
      }
    }
    expect(bad).toEqual([]);
  });

  it("lib/math knows no physics: it imports only itself, errors.ts, constants.ts and mathjs", () => {
    const bad: string[] = [];
    for (const file of files.filter((f) => topOf(f) === "math")) {
      for (const s of specifiers(readFileSync(file, "utf8"))) {
        const target = s.startsWith(".") ? topOf(normalize(join(dirname(file), s))) : s;
        if (!["math", "errors.ts", "constants.ts", "mathjs"].includes(target ?? "")) bad.push(`${relative(root, file)} imports ${s}`);
      }
    }
    expect(bad).toEqual([]);
  });

  it("the casebook imports the library only through lib/mod.ts, as a user's script would", () => {
    const dir = join(root, "casebook");
    if (!existsSync(dir)) return;
    const bad: string[] = [];
    for (const file of tsFiles(dir)) {
      for (const s of specifiers(readFileSync(file, "utf8"))) {
        if (!s.startsWith(".")) continue;
        const target = normalize(join(dirname(file), s));
        const inCasebook = !relative(dir, target).startsWith("..");
        if (!inCasebook && target !== join(lib, "mod.ts")) bad.push(`${relative(root, file)} imports ${s}`);
      }
    }
    expect(bad).toEqual([]);
  });

  it("the rule catches an upward import (self-check of the scanner)", () => {
    expect(specifiers('import { x } from "../circuit/link.ts";\nexport * from "./a.ts";\nconst m = await import("../report/chart.ts");')).toEqual([
      "../circuit/link.ts",
      "./a.ts",
      "../report/chart.ts",
    ]);
  });
});

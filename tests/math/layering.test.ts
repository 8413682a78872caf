import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

// design.md §2: lib/math knows no physics — it imports only from itself, lib/errors.ts
// (bottom layer) and mathjs.
const mathDir = join(dirname(fileURLToPath(import.meta.url)), "..", "..", "lib", "math");

describe("lib/math layering", () => {
  it("every lib/math module imports only lib/math, ../errors.ts, ../constants.ts or mathjs", () => {
    const files = readdirSync(mathDir).filter((f) => f.endsWith(".ts"));
    expect(files.length).toBeGreaterThan(5);
    for (const f of files) {
      const text = readFileSync(join(mathDir, f), "utf8");
      const specifiers = [...text.matchAll(/^\s*(?:import|export)[^;]*?from\s+"([^"]+)"/gm)].map((m) => m[1]!);
      for (const s of specifiers) {
        const allowed = s.startsWith("./") || s === "../errors.ts" || s === "../constants.ts" || s === "mathjs";
        expect(allowed, `${f} imports ${s}`).toBe(true);
      }
    }
  });
});

/**
 * Unions checked for completeness by the compiler: a new TokenLoad variant (here a `zener`)
 * must fail to type-check at every place that has to handle it. The test copies lib/ to a
 * scratch folder, adds the variant to the union, runs tsc over the copy and reads the errors.
 */
import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { cpSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

const root = join(import.meta.dirname, "..", "..");

/** Every place that must handle a new TokenLoad kind (file and function), found by this test. */
const MUST_HANDLE = [
  "lib/circuit/link/tokenLoad.ts",
  "lib/circuit/loads/describingFunction.ts", // the input check, fundamentalConductance, averageLoadCurrent
  "lib/circuit/transient/token.ts",
  "lib/analysis/loadCodec.ts", // encodeLoad: a load crossing a worker boundary as plain data
];

describe("exhaustiveness: a new TokenLoad variant fails to compile where it is not handled", () => {
  it("adding { kind: 'zener' } gives a 'not assignable to never' error at every assertNever over TokenLoad", () => {
    const dir = mkdtempSync(join(tmpdir(), "tanklight-zener-"));
    try {
      cpSync(join(root, "lib"), join(dir, "lib"), { recursive: true });
      symlinkSync(join(root, "node_modules"), join(dir, "node_modules"), "dir");
      writeFileSync(join(dir, "package.json"), JSON.stringify({ type: "module" }));
      const config = JSON.parse(readFileSync(join(root, "tsconfig.json"), "utf8")) as { include: string[] };
      writeFileSync(join(dir, "tsconfig.json"), JSON.stringify({ ...config, include: ["lib"] }));
      const typesFile = join(dir, "lib/circuit/loads/types.ts");
      const types = readFileSync(typesFile, "utf8");
      const union = '  | { readonly kind: "resistor"; readonly resistance: number };';
      expect(types).toContain(union);
      writeFileSync(typesFile, types.replace(union, union.slice(0, -1) + '\n  | { readonly kind: "zener"; readonly voltage: number };'));
      const tsc = spawnSync(process.execPath, [join(root, "node_modules/typescript/bin/tsc"), "-p", "tsconfig.json", "--noEmit"], { cwd: dir, encoding: "utf8", timeout: 540_000 });
      const errors = tsc.stdout.split("\n").filter((l) => /error TS/.test(l));
      const zener = errors.filter((l) => l.includes('"zener"') && l.includes("'never'"));
      const files = new Set(zener.map((l) => l.slice(0, l.indexOf("("))));
      console.log(`exhaustiveness: ${errors.length} places refuse the new variant:\n${errors.join("\n")}`);
      // every error is an unhandled variant: an assertNever, or a switch without default that
      // no longer returns on every path (TS2366) — layers above the circuit may add such places
      for (const l of errors) expect(l.includes('"zener"') || l.includes("error TS2366"), l).toBe(true);
      for (const f of MUST_HANDLE) expect(files.has(f), f).toBe(true);
      expect(zener.filter((l) => l.startsWith("lib/circuit/loads/describingFunction.ts")).length).toBe(3);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 600_000);
});

/**
 * Runs a script against a fresh bundle of lib/ (scripts/bundle.ts into out/<name>/<pid>) in a
 * plain `node` process and returns the last line it prints; the bundle is removed afterwards.
 * The script is an ES module beside the bundle's mod.js (`import * as t from "./mod.js"`).
 */
import { execFileSync } from "node:child_process";
import { mkdirSync, rmSync, writeFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { bundle } from "../../scripts/bundle.ts";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..");

export async function runInBundle(name: string, script: string, timeout = 240_000): Promise<string> {
  const out = join(root, "out", name, String(process.pid));
  rmSync(out, { recursive: true, force: true });
  mkdirSync(out, { recursive: true });
  try {
    await bundle(out);
    writeFileSync(join(out, "run.mjs"), script);
    const stdout = execFileSync(process.execPath, [join(out, "run.mjs")], { cwd: root, encoding: "utf8", timeout });
    return stdout.trim().split("\n").pop()!;
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
}

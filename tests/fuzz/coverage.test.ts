/**
 * Every exported function of tanklight (lib/mod.ts) and tanklight/advanced (lib/advanced.ts)
 * has a fuzz case in some tests/fuzz/*.fuzz.test.ts (issue 11): a new export without one fails
 * here. The suites' case names are read from their source (`name: "…"` of each case), so this
 * test does not run them. Names still waiting for a suite are listed in NOT_YET_FUZZED with the
 * suite they belong to; an entry there that gained a case fails too, so the list only shrinks.
 */
import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import * as mod from "../../lib/mod.ts";
import * as advanced from "../../lib/advanced.ts";

/** Exports that are classes (errors): thrown, not called with user input. */
const CLASSES = new Set(["TanklightInputError", "LinkConvergenceError", "TransientConvergenceError", "SingularMatrixError"]);

/**
 * Exported functions without a fuzz case yet, by the area whose suite they belong to (issue 11:
 * what is left). Keep it shrinking: move a name out when its case lands.
 */
const NOT_YET_FUZZED: Readonly<Record<string, readonly string[]>> = {
  // solveLinkHarmonic, solveLinkModel and fundamentalCheck: tests/fuzz/steadyEngines.fuzz.test.ts
  "transient (periodicSteadyState: its circuit is a transient circuit; the options are checked by name in tests/circuit/transient/shooting.test.ts)": ["periodicSteadyState"],
  "analysis (whole-design runs: each call solves many links)": ["coverageMap", "findRange", "taskPool", "toleranceYield", "searchDesign", "calibrate", "predictToken", "predictRange"],
  "report (designReport runs a whole design: a minute a call)": ["designReport"],
};

/** Every `name: "…"` of a fuzz case in tests/fuzz/*.fuzz.test.ts (a method case "f().g" covers f). */
function fuzzedNames(): Set<string> {
  const dir = new URL(".", import.meta.url);
  const names = new Set<string>();
  for (const file of readdirSync(dir).filter((f) => f.endsWith(".fuzz.test.ts"))) {
    const text = readFileSync(new URL(file, dir), "utf8");
    for (const m of text.matchAll(/\{\s*name: "([^"]+)"/g)) names.add(m[1]!.replace(/\(\).*$/, ""));
  }
  return names;
}

const exportedFunctions = (m: Record<string, unknown>): string[] =>
  Object.entries(m).filter(([k, v]) => typeof v === "function" && !CLASSES.has(k)).map(([k]) => k);

describe("fuzz coverage", () => {
  const fuzzed = fuzzedNames();
  const pending = new Set(Object.values(NOT_YET_FUZZED).flat());
  const all = [...exportedFunctions(mod as Record<string, unknown>), ...exportedFunctions(advanced as Record<string, unknown>)];

  it("every exported function of lib/mod.ts and lib/advanced.ts has a fuzz case (or is listed as not yet fuzzed)", () => {
    const missing = all.filter((n) => !fuzzed.has(n) && !pending.has(n));
    expect(missing, "exported functions with no fuzz case: add one to a tests/fuzz/*.fuzz.test.ts").toEqual([]);
  });

  it("the not-yet-fuzzed list only holds exports without a case (move a name out when its case lands)", () => {
    expect([...pending].filter((n) => fuzzed.has(n))).toEqual([]);
    expect([...pending].filter((n) => !all.includes(n))).toEqual([]);
  });

  it("prints the coverage", () => {
    const covered = all.filter((n) => fuzzed.has(n)).length;
    console.log(`fuzz coverage: ${covered} of ${all.length} exported functions have a fuzz case; ${pending.size} not yet (${Object.keys(NOT_YET_FUZZED).join("; ")})`);
    expect(covered).toBeGreaterThan(0);
  });
});

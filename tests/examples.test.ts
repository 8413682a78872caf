/**
 * Every public name has a doc comment, every public function an `@example`, and every
 * example of the form `call(...) // → value` runs and gives the value it shows
 * (docs/style.md §2 and §17).
 *
 * How an example is read: each `@example` tag is split at `;  ` into cases; a case
 * `EXPR // → VALUE` (or `EXPR // out → VALUE`, which compares the Float64Array `out` the call
 * wrote) is evaluated with every name of `tanklight` and `tanklight/advanced` in scope plus a
 * scratch `out = new Float64Array(16)`. VALUE is compared when it reads as a JavaScript value
 * (numbers, strings, arrays, objects; `π`, `−` and `×10^` are understood); numbers are
 * compared to half a unit in the last digit shown. A parenthesised remark after VALUE is a
 * comment. A case that is prose (no `// →`) only has to be present.
 */
import { describe, expect, it } from "vitest";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import ts from "typescript";
import * as mod from "../lib/mod.ts";
import * as advanced from "../lib/advanced.ts";
import { z } from "zod";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");

/**
 * The named objects examples may use besides the library's own names (each is what the
 * example's remark says it is): `tx` and `token` are the coils of docs/methods/em.md; `tx20Turns`
 * the 40 mm, 20-turn transmitter of docs/methods/losses.md; `coil` the same; `drawerTx` and
 * `pebble` the coils of the pebble-drawer scenario; `system` the one-token link of solveLink's
 * example; `drive` the single-switch drive of singleSwitchDrive's example; `z` is zod;
 * `π` is Math.PI.
 */
function exampleFixtures(): Record<string, unknown> {
  const tx = mod.roundCoil({ innerRadius: "40 mm", turns: 20, layers: 4, wire: { diameter: "0.5 mm" } });
  const token = mod.roundCoil({ innerRadius: "6 mm", turns: 30, wire: { diameter: "0.1 mm" } });
  const tx20Turns = mod.roundCoil({ meanRadius: "40 mm", turns: 20, wire: mod.roundWire("0.5 mm", { insulation: "25 um" }) });
  const drawerTx = mod.roundCoil({ meanRadius: "50 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
  const pebble = mod.roundCoil({ innerRadius: "6.5 mm", turns: 120, layers: 6, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
  const system: mod.LinkSystem = {
    frequency: "200 kHz",
    transmitter: { coil: drawerTx, compensation: "parallel", capacitor: { capacitance: "56 nF" }, drive: { kind: "parallelTank", supply: "5 V" } },
    receivers: [{ coil: pebble, pose: { position: [0, 0, "30 mm"] }, topology: "parallel", capacitor: { capacitance: "2.2 nF" }, load: { kind: "led", led: mod.ledPreset("red") } }],
  };
  const drive = mod.singleSwitchDrive({ supply: 5, frequency: 200e3, coilInductance: 10e-6, tankCapacitance: 63e-9 });
  return { tx, token, tx20Turns, coil: tx20Turns, drawerTx, pebble, system, drive, z, π: Math.PI };
}
const scope: Record<string, unknown> = { ...advanced, ...mod, ...exampleFixtures() };

interface PublicName {
  readonly entry: string;
  readonly name: string;
  readonly isFunction: boolean;
  readonly doc: string;
  readonly examples: readonly string[];
}

function publicNames(): PublicName[] {
  const entries = ["lib/mod.ts", "lib/advanced.ts"].map((e) => join(root, e));
  const program = ts.createProgram(entries, {
    allowImportingTsExtensions: true,
    noEmit: true,
    target: ts.ScriptTarget.ES2022,
    module: ts.ModuleKind.ESNext,
    moduleResolution: ts.ModuleResolutionKind.Bundler,
  });
  const checker = program.getTypeChecker();
  const out: PublicName[] = [];
  for (const entry of entries) {
    const symbol = checker.getSymbolAtLocation(program.getSourceFile(entry)!)!;
    for (const e of checker.getExportsOfModule(symbol)) {
      const t = e.flags & ts.SymbolFlags.Alias ? checker.getAliasedSymbol(e) : e;
      if (!(t.flags & (ts.SymbolFlags.Function | ts.SymbolFlags.Variable | ts.SymbolFlags.Class))) continue;
      if (t.flags & ts.SymbolFlags.ValueModule) continue; // `export * as schema` namespaces
      const isFunction = (t.flags & ts.SymbolFlags.Function) !== 0;
      const examples = t
        .getJsDocTags(checker)
        .filter((tag) => tag.name === "example")
        .map((tag) => ts.displayPartsToString(tag.text));
      out.push({ entry: entry.slice(root.length + 1), name: e.name, isFunction, doc: ts.displayPartsToString(t.getDocumentationComment(checker)), examples });
    }
  }
  return out;
}

/** The printed value as JavaScript source: unicode minus, π, ×10^n, trailing remarks removed. */
function valueSource(text: string): string | undefined {
  let s = text.trim();
  const remark = /\s+\([^()]*\)\s*$/.exec(s); // "1.27e-5 (1 mil = …)"
  if (remark && !/^[[{]/.test(s.slice(remark.index).trim())) s = s.slice(0, remark.index);
  s = s.replace(/[;,.]\s*$/, "").replace(/−/g, "-").replace(/(\d)\s*×\s*10\^\(?(-?\d+)\)?/g, "$1e$2").replace(/π/g, "Math.PI");
  if (!/^[-+\d."'[{A-Za-z]/.test(s)) return undefined;
  return s;
}

/** Half a unit in the last significant digit a number was printed with, relative. */
function printedRtol(printed: string): number {
  const m = /(-?)(\d*)\.?(\d*)(?:e([-+]?\d+))?/i.exec(printed.replace(/−/g, "-"));
  if (!m) return 1e-12;
  const digits = (m[2]!.replace(/^0+/, "") + m[3]!).replace(/^0+/, "").length;
  return Math.max(1e-15, 0.5 * 10 ** (1 - Math.max(digits, 1)));
}

function compare(actual: unknown, expected: unknown, printed: string, where: string): void {
  if (typeof expected === "number") {
    expect(typeof actual, where).toBe("number");
    const a = actual as number;
    if (!Number.isFinite(expected)) return void expect(a, where).toBe(expected);
    const numbers = printed.match(/-?[\d.]+(?:e[-+]?\d+)?/gi) ?? [String(expected)];
    const rtol = Math.max(...numbers.map(printedRtol));
    const scale = Math.max(Math.abs(expected), expected === 0 ? 0 : 0);
    expect(Math.abs(a - expected) <= rtol * scale + (expected === 0 ? 1e-15 : 0), `${where}: ${a} vs ${expected} (rtol ${rtol})`).toBe(true);
  } else if (Array.isArray(expected)) {
    const arr = Array.from(actual as ArrayLike<unknown>);
    expected.forEach((x, i) => compare(arr[i], x, String(x), `${where}[${i}]`));
  } else if (expected !== null && typeof expected === "object") {
    for (const [k, v] of Object.entries(expected)) compare((actual as Record<string, unknown>)[k], v, String(v), `${where}.${k}`);
  } else {
    expect(actual, where).toEqual(expected);
  }
}

interface Case {
  readonly expr: string;
  readonly target: "result" | "out";
  readonly value: string | undefined;
}

function casesOf(example: string): Case[] {
  const cases: Case[] = [];
  const code = example
    .split("\n")
    .filter((line) => !/^\s*\*?\s*\/\/(?!.*→)/.test(line)) // whole-line comments that show no value
    .join(" ");
  for (const part of code.replace(/\s+/g, " ").split(/;\s{2,}|;\s*(?=[A-Za-z_]\w*\()/)) {
    const m = /^(.*?)\/\/\s*(out\s*)?→\s*(.*)$/.exec(part.trim());
    if (!m) continue;
    cases.push({ expr: m[1]!.trim(), target: m[2] ? "out" : "result", value: m[3]!.trim() });
  }
  return cases;
}

/** Evaluates an example expression (which may `await`) with the library's names in scope. */
async function evaluate(source: string, out: Float64Array): Promise<unknown> {
  const names = Object.keys(scope).filter((n) => /^[\p{L}_$][\p{L}\p{N}_$]*$/u.test(n));
  const AsyncFunction = Object.getPrototypeOf(async () => undefined).constructor as new (...args: string[]) => (...values: unknown[]) => Promise<unknown>;
  return await new AsyncFunction(...names, "out", `"use strict"; return (${source});`)(...names.map((n) => scope[n]), out);
}

describe("public names: doc comments and examples that run", () => {
  const names = publicNames();

  it("finds the public names of both entries", () => {
    expect(names.length).toBeGreaterThan(150);
  });

  it("every public name has a doc comment", () => {
    const missing = names.filter((n) => n.doc.trim() === "").map((n) => `${n.entry}: ${n.name}`);
    expect(missing, "write a doc comment (docs/style.md §2) for").toEqual([]);
  });

  it("every public function has an @example", () => {
    const missing = names.filter((n) => n.isFunction && n.examples.length === 0).map((n) => `${n.entry}: ${n.name}`);
    expect(missing, "add an `@example call(...) // → value` (docs/style.md §2) to").toEqual([]);
  });

  const runnable = names.flatMap((n) => n.examples.flatMap((ex) => casesOf(ex).map((c) => ({ n, c }))));
  it("at least 100 examples show a value and are run below", () => {
    expect(runnable.length).toBeGreaterThan(100);
  });

  for (const { n, c } of runnable) {
    it(`${n.name}: ${c.expr} → ${c.value}`, async () => {
      const out = new Float64Array(16);
      const where = `${n.entry} ${n.name} @example ${c.expr}`;
      let result: unknown;
      try {
        result = await evaluate(c.expr, out);
      } catch (e) {
        // An example may show a thrown error: "… // → throws TanklightInputError"
        if (c.value !== undefined && /^throws\b/.test(c.value)) return;
        throw new Error(`${where}: ${(e as Error).message}`);
      }
      if (c.value !== undefined && /^throws\b/.test(c.value)) throw new Error(`${where}: shows "${c.value}" but returned ${String(result)}`);
      if (c.value === undefined) return;
      const src = valueSource(c.value);
      if (src === undefined) return;
      let expected: unknown;
      try {
        expected = await evaluate(src, new Float64Array(16));
      } catch {
        return; // a value shown in words ("the same as …"): the call ran, which is what is checked
      }
      compare(c.target === "out" ? out : result, expected, src, where);
    });
  }
});

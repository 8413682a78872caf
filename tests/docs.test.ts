/**
 * Executable docs (docs/style.md §15): every ```ts block of README.md and docs/**\/*.md runs here,
 * and type-checks against the library.
 *
 * Rules: a block whose first line is `// not run` is skipped; `from "tanklight"` (and
 * `import("tanklight")`) is rewritten to the path of lib/mod.ts, `"tanklight/advanced"` to lib/advanced.ts; each block is its own
 * module (top-level await allowed). A failure names the doc file and line:
 * `docs/methods/units.md:42: TanklightInputError: …`.
 * tests/fixtures/docs/ holds fixture docs that prove the runner fails when it should; they are
 * not scanned by default.
 */
import { describe, expect, it } from "vitest";
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import ts from "typescript";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const modPath = join(root, "lib", "mod.ts");
const advancedPath = join(root, "lib", "advanced.ts");
const workDir = join(root, "out", "docs-test", String(process.pid));

/** One fenced TypeScript block of a Markdown file. */
interface DocBlock {
  /** path of the Markdown file relative to the repository root */
  readonly file: string;
  /** 1-based line, in the Markdown file, of the block's first code line */
  readonly line: number;
  readonly code: string;
}

/** README.md and every Markdown file under docs/, sorted. */
function docFiles(): string[] {
  const files: string[] = [];
  const readme = join(root, "README.md");
  if (existsSync(readme)) files.push(readme);
  const walk = (dir: string): void => {
    if (!existsSync(dir)) return;
    for (const name of readdirSync(dir).sort()) {
      const p = join(dir, name);
      if (statSync(p).isDirectory()) walk(p);
      else if (name.endsWith(".md")) files.push(p);
    }
  };
  walk(join(root, "docs"));
  return files;
}

/** The ```ts / ```typescript blocks of one Markdown file, minus those marked `// not run`. */
function extractBlocks(path: string): DocBlock[] {
  const lines = readFileSync(path, "utf8").split(/\r?\n/);
  const blocks: DocBlock[] = [];
  // an open fence: its marker (``` or ~~~, possibly longer), language, first code line, body
  let open: { marker: string; lang: string; start: number; body: string[] } | undefined;
  for (let i = 0; i < lines.length; i++) {
    const text = lines[i] ?? "";
    if (open === undefined) {
      const m = /^\s*(`{3,}|~{3,})\s*([^\s`]*)/.exec(text);
      if (m !== null) open = { marker: m[1] ?? "```", lang: (m[2] ?? "").toLowerCase(), start: i + 2, body: [] };
      continue;
    }
    const close = /^\s*(`{3,}|~{3,})\s*$/.exec(text);
    if (close !== null && close[1]?.[0] === open.marker[0] && (close[1]?.length ?? 0) >= open.marker.length) {
      const isTs = open.lang === "ts" || open.lang === "typescript";
      const notRun = (open.body[0] ?? "").trim().startsWith("// not run");
      if (isTs && !notRun) blocks.push({ file: relative(root, path), line: open.start, code: open.body.join("\n") });
      open = undefined;
    } else {
      open.body.push(text);
    }
  }
  return blocks;
}

/** The block's source as a module importing the library by absolute path. */
function rewrite(code: string): string {
  // relative from the temporary module (tsc's rewriteRelativeImportExtensions rejects absolute .ts paths)
  const target = (p: string): string => JSON.stringify(relative(workDir, p).replace(/\\/g, "/"));
  return (
    code
      .replace(/(\bfrom\s*)(["'])tanklight\/advanced\2/g, `$1${target(advancedPath)}`)
      .replace(/(\bimport\s*\(\s*)(["'])tanklight\/advanced\2/g, `$1${target(advancedPath)}`)
      .replace(/(\bfrom\s*)(["'])tanklight\2/g, `$1${target(modPath)}`)
      .replace(/(\bimport\s*\(\s*)(["'])tanklight\2/g, `$1${target(modPath)}`) +
    // keep line numbers: only append; `export {}` makes every block its own module
    "\nexport {};\n"
  );
}

/** Write a block to a temporary module file; returns its path. */
function writeBlock(block: DocBlock): string {
  mkdirSync(workDir, { recursive: true });
  const name = `${block.file.replace(/[\\/.]/g, "_")}_L${block.line}.ts`;
  const file = join(workDir, name);
  writeFileSync(file, rewrite(block.code));
  return file;
}

/** Run one block; rejects with "<file>:<line>: <error>" pointing into the Markdown file. */
async function runBlock(block: DocBlock): Promise<void> {
  const file = writeBlock(block);
  try {
    await import(`${pathToFileURL(file).href}?t=${Date.now()}`);
  } catch (e) {
    const err = e instanceof Error ? e : new Error(String(e));
    // Point at the failing line when the stack names the temporary file.
    const at = new RegExp(`${file.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}:(\\d+)`).exec(err.stack ?? "");
    const line = at?.[1] === undefined ? block.line : block.line + Number(at[1]) - 1;
    throw new Error(`${block.file}:${line}: ${err.name}: ${err.message}`, { cause: err });
  }
}

/** Type-check blocks against the library; returns "<file>:<line>: <message>" per problem in the blocks. */
function typeCheck(blocks: readonly DocBlock[]): string[] {
  if (blocks.length === 0) return [];
  const files = new Map(blocks.map((b) => [writeBlock(b), b] as const));
  const configPath = join(root, "tsconfig.json");
  const config = ts.readConfigFile(configPath, (p) => ts.sys.readFile(p));
  const parsed = ts.parseJsonConfigFileContent(config.config, ts.sys, root);
  const program = ts.createProgram([...files.keys()], { ...parsed.options, noEmit: true });
  const problems: string[] = [];
  // Only the blocks' own diagnostics: checking the whole program would re-check the library
  // (and report other layers' work in progress); this checks what the blocks use, lazily.
  for (const [path, block] of files) {
    const source = program.getSourceFile(path);
    if (source === undefined) {
      problems.push(`${block.file}:${block.line}: not compiled`);
      continue;
    }
    const diagnostics = [...program.getSyntacticDiagnostics(source), ...program.getSemanticDiagnostics(source)];
    for (const d of diagnostics) {
      const { line } = source.getLineAndCharacterOfPosition(d.start ?? 0);
      problems.push(`${block.file}:${block.line + line}: ${ts.flattenDiagnosticMessageText(d.messageText, "\n")}`);
    }
  }
  return problems;
}

const blocks = docFiles().flatMap(extractBlocks);
const fixture = (name: string): string => join(root, "tests", "fixtures", "docs", name);
const mistyped = extractBlocks(fixture("mistyped.md"));

// One TypeScript program for the docs' blocks and the mistyped fixture (building a program costs
// seconds: it loads the library's and its dependencies' types); created on first use.
let typeProblems: string[] | undefined;
function problemsIn(file: string): string[] {
  typeProblems ??= typeCheck([...blocks, ...mistyped]);
  return typeProblems.filter((p) => p.startsWith(`${file}:`));
}

describe("docs: every ts block of README.md and docs/ runs", () => {
  it(`finds the blocks (${blocks.length} now; none is fine)`, () => {
    for (const b of blocks) expect(b.code.trim().length, `${b.file}:${b.line} is empty`).toBeGreaterThan(0);
  });

  for (const block of blocks) {
    it(`${block.file}:${block.line} runs`, async () => {
      await runBlock(block);
    });
  }

  it("every block type-checks against lib/mod.ts", () => {
    const files = [...new Set(blocks.map((b) => b.file))];
    expect(files.flatMap(problemsIn)).toEqual([]);
  });
});

describe("docs runner (fixtures in tests/fixtures/docs, not scanned by default)", () => {
  it("skips `// not run` blocks and other languages, and runs the rest", async () => {
    const found = extractBlocks(fixture("passing.md"));
    expect(found.map((b) => b.line)).toEqual([6]);
    for (const b of found) await runBlock(b);
  });

  it("a block that throws fails with the doc file and the failing line", async () => {
    const found = extractBlocks(fixture("throwing.md"));
    expect(found.map((b) => b.line)).toEqual([6, 11]);
    const first = found[0];
    const second = found[1];
    if (first === undefined || second === undefined) throw new Error("fixture blocks missing");
    await runBlock(first);
    await expect(runBlock(second)).rejects.toThrow(
      "tests/fixtures/docs/throwing.md:12: TanklightInputError: parseQuantity: coil.radius: expected a length like '12 mm', got '5 kHz' (a frequency)",
    );
  });

  it("a block that does not type-check is reported with its doc line", () => {
    const problems = problemsIn("tests/fixtures/docs/mistyped.md");
    expect(problems, problems.join("\n")).toHaveLength(1);
    expect(problems[0]).toMatch(/^tests\/fixtures\/docs\/mistyped\.md:5: Type 'number' is not assignable to type 'string'/);
  });

  it("the fixture docs are outside the default scan", () => {
    expect(docFiles().some((f) => f.includes(join("tests", "fixtures")))).toBe(false);
  });
});

// Remove this run's temporary modules (out/ is ignored by git either way).
process.on("exit", () => {
  rmSync(workDir, { recursive: true, force: true });
});

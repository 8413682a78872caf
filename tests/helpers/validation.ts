import { afterAll, expect } from "vitest";
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { expectRelClose } from "./expectRelClose.ts";

/** One check of our value against something outside the project (docs/design.md §6). */
export interface OutsideCheck {
  /** what is compared, with its arguments, e.g. "K(m = 0.5)" */
  readonly quantity: string;
  /**
   * where the reference comes from, in one of the docs/design.md §6 forms:
   * "source: A&S 1964 Table 17.1", "reference library: @stdlib/...",
   * "trade practice (no source)", "from memory (unverified)", "independent method: ..."
   */
  readonly source: string;
  readonly ours: number;
  readonly reference: number;
  /** relative tolerance */
  readonly rtol: number;
  /** absolute floor, for references that are exactly zero */
  readonly atol?: number;
  /** unit of ours and reference, e.g. "H"; "" when dimensionless */
  readonly unit?: string;
}

const root = join(dirname(fileURLToPath(import.meta.url)), "..", "..");
const recorded = new Map<string, OutsideCheck[]>();

/**
 * expectRelClose plus a record of the check for docs/validation.md. Use it for every check
 * against an outside value; the record is written after the test file finishes to
 * out/validation/<test file>.json and collected by `npm run validation`.
 */
export function expectOutside(check: OutsideCheck): void {
  const file = expect.getState().testPath ?? "unknown";
  const list = recorded.get(file) ?? [];
  list.push(check);
  recorded.set(file, list);
  expectRelClose(check.ours, check.reference, check.rtol, `${check.quantity} [${check.source}]`, check.atol ?? 0);
}

afterAll(() => {
  for (const [file, checks] of recorded) {
    const rel = relative(root, file);
    const dir = join(root, "out", "validation");
    mkdirSync(dir, { recursive: true });
    const name = rel.replace(/[\\/]/g, "__").replace(/\.ts$/, "") + ".json";
    writeFileSync(join(dir, name), JSON.stringify({ testFile: rel, checks }, null, 1));
  }
});

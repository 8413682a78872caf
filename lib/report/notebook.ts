/**
 * A notebook: the worked run of a design as a list of cells — prose, tables of numbers with
 * their units, figures (vega-lite specs), the parts list and the cautions — that renders to
 * Markdown, a self-contained HTML page and a plain-text summary (lib/report/markdown.ts,
 * html.ts, terminal.ts) and is written to disk by writeNotebook (lib/report/write.ts).
 *
 * The notebook is a plain record of cells; its methods only append a cell (and return it), so
 * a scenario reads top to bottom like the report it makes.
 */
import { TanklightInputError, requireObject, unknownKeyMessage } from "../errors.ts";
import type { ChartSpec } from "./charts/spec.ts";
import type { PartRow } from "./partsList.ts";

/** A number with its SI unit, printed with a prefix ("1.23 mA"); digits default 3. */
export interface Quantity {
  readonly value: number;
  readonly unit: string;
  readonly digits?: number;
}

/** One table entry: text, a plain number (counts, ratios) or a quantity with its unit. */
export type TableValue = string | number | Quantity;

/** The cells a notebook holds. */
export type Cell =
  | { readonly kind: "heading"; readonly text: string }
  | { readonly kind: "text"; readonly text: string }
  | { readonly kind: "table"; readonly caption?: string; readonly header: readonly string[]; readonly rows: readonly (readonly TableValue[])[] }
  | { readonly kind: "figure"; readonly name: string; readonly caption: string; readonly spec: ChartSpec }
  | { readonly kind: "parts"; readonly rows: readonly PartRow[] }
  | { readonly kind: "cautions"; readonly items: readonly string[] };

/** Options of {@link notebook}. */
export interface NotebookOptions {
  /** one line under the title, e.g. the question the run answers */
  readonly subtitle?: string;
  /** a note printed under the title, e.g. "Demo data: …" */
  readonly note?: string;
  /** receives progress lines of long steps (default: none) */
  readonly log?: (line: string) => void;
}

/** A notebook under construction. */
export interface Notebook {
  readonly title: string;
  readonly subtitle?: string;
  readonly note?: string;
  readonly cells: readonly Cell[];
  /** a section heading */
  heading(text: string): void;
  /** prose in Markdown (paragraphs, "- " lists, **bold**, `code`) */
  text(...lines: string[]): void;
  /** a table; numbers as Quantity print with their unit */
  table(header: readonly string[], rows: readonly (readonly TableValue[])[], caption?: string): void;
  /** a figure: `name` becomes the file name `<name>.svg` (letters, digits, '-') */
  figure(name: string, spec: ChartSpec, caption: string): void;
  /** the parts list (from partsList()) */
  parts(rows: readonly PartRow[]): void;
  /** the cautions; the report adds the line that defers to local codes and licensed practice */
  cautions(items: readonly string[]): void;
  /**
   * Announces a long step and returns a progress callback (done, total) that writes a line
   * to `log` at most every 10 % of the way.
   */
  step(label: string): (done: number, total: number) => void;
}

/**
 * Starts a notebook.
 * @param title the report's title.
 * @example const nb = notebook("The pebble drawer", { note: "Demo data." }); nb.heading("Coils"); nb.table(["quantity", "value"], [["L", { value: 4.7e-6, unit: "H" }]]);
 */
export function notebook(title: string, options: NotebookOptions = {}): Notebook {
  checkNotebookArgs(title, options);
  const cells: Cell[] = [];
  const names = new Set<string>();
  const log = options.log ?? (() => {});
  let steps = 0;
  return {
    title,
    subtitle: options.subtitle,
    note: options.note,
    cells,
    heading: (text) => { cells.push({ kind: "heading", text }); },
    text: (...lines) => { cells.push({ kind: "text", text: lines.join("\n") }); },
    table: (header, rows, caption) => {
      rows.forEach((r, i) => {
        if (r.length !== header.length) {
          throw new TanklightInputError([{ path: `rows[${i}]`, message: `must have one entry per column (${header.length})`, value: r.length }], "notebook.table");
        }
        r.forEach((v, j) => {
          const n = typeof v === "number" ? v : typeof v === "object" ? v.value : 0;
          if (Number.isNaN(n)) throw new TanklightInputError([{ path: `rows[${i}][${j}]`, message: "must be a number, not NaN", value: v }], "notebook.table");
        });
      });
      cells.push({ kind: "table", header, rows, caption });
    },
    figure: (name, spec, caption) => {
      if (!/^[a-z0-9][a-z0-9-]*$/i.test(name) || names.has(name)) {
        throw new TanklightInputError([{ path: "name", message: "must be a new file name of letters, digits and '-'", value: name }], "notebook.figure");
      }
      names.add(name);
      cells.push({ kind: "figure", name, spec, caption });
    },
    parts: (rows) => { cells.push({ kind: "parts", rows }); },
    cautions: (items) => { cells.push({ kind: "cautions", items }); },
    step: (label) => {
      steps++;
      const started = Date.now();
      log(`[${steps}] ${label} …`);
      let shown = 0;
      return (done, total) => {
        const pct = total > 0 ? Math.floor((10 * done) / total) : 10;
        if (pct > shown || done === total) {
          shown = pct;
          log(`[${steps}] ${label}: ${done}/${total} (${((Date.now() - started) / 1000).toFixed(1)} s)`);
        }
      };
    },
  };
}

/** The closing line of every cautions section. */
export const DEFER_LINE = "These are engineering estimates, not certification: follow local codes and regulations and, where they require it, licensed practice and accredited testing.";

const OPTION_KEYS: readonly string[] = Object.freeze(["subtitle", "note", "log"]);

/** notebook's arguments: a string title; options strict (a typo names the nearest key), strings and a function. */
function checkNotebookArgs(title: unknown, options: unknown): void {
  const fail = (path: string, message: string, value: unknown): never => {
    throw new TanklightInputError([{ path, message, value }], "notebook");
  };
  if (typeof title !== "string") fail("title", "must be a string", title);
  requireObject(options, "options", "notebook");
  const o = options as Record<string, unknown>;
  for (const key of Object.keys(o)) if (!OPTION_KEYS.includes(key)) fail(`options.${key}`, unknownKeyMessage(key, OPTION_KEYS), o[key]);
  for (const key of ["subtitle", "note"]) if (o[key] !== undefined && typeof o[key] !== "string") fail(`options.${key}`, "must be a string or absent", o[key]);
  if (o["log"] !== undefined && typeof o["log"] !== "function") fail("options.log", "must be a function (line) => void or absent", o["log"]);
}

/**
 * A renderer's notebook argument: what notebook() returned (a string title and a list of cells),
 * else a TanklightInputError naming `field` and `where`.
 * @example requireNotebook(null, "nb", "notebookMarkdown") // → throws TanklightInputError
 */
export function requireNotebook(nb: unknown, field: string, where: string): void {
  const n = nb as { title?: unknown; cells?: unknown } | null;
  if (typeof n !== "object" || n === null || typeof n.title !== "string" || !Array.isArray(n.cells)) {
    throw new TanklightInputError([{ path: field, message: "must be a notebook (what notebook() returned)", value: typeof n === "object" && n !== null ? "an object without a title and cells" : nb }], where);
  }
}

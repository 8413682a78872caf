/**
 * Renders a notebook's figures and writes the report: `<dir>/report.md` with each figure as
 * `<dir>/<name>.svg` beside it, and `<dir>/report.html` with the same figures inlined.
 */
import { mkdir, writeFile } from "node:fs/promises";
import { join } from "node:path";
import { notebookHtml } from "./html.ts";
import { notebookMarkdown } from "./markdown.ts";
import { requireNotebook, type Notebook } from "./notebook.ts";
import { TanklightInputError } from "../errors.ts";
import { renderSvg } from "./renderSvg.ts";

/** The rendered report. */
export interface RenderedNotebook {
  readonly markdown: string;
  readonly html: string;
  /** SVG text by figure name */
  readonly svgs: ReadonlyMap<string, string>;
}

/**
 * Renders every figure (progress through `onProgress(done, total)`) and the Markdown and HTML.
 * @example const { markdown, html } = await renderNotebook(nb);
 */
export async function renderNotebook(nb: Notebook, onProgress?: (done: number, total: number) => void): Promise<RenderedNotebook> {
  checkNotebookArgs(nb, onProgress, "renderNotebook");
  const figures = nb.cells.flatMap((c) => (c.kind === "figure" ? [c] : []));
  const svgs = new Map<string, string>();
  for (const [i, f] of figures.entries()) {
    svgs.set(f.name, await renderSvg(f.spec));
    onProgress?.(i + 1, figures.length);
  }
  return { markdown: notebookMarkdown(nb), html: notebookHtml(nb, svgs), svgs };
}

/**
 * Writes report.md, report.html and the SVG figures into `dir` (created if missing).
 * @returns the paths written.
 * @example await writeNotebook(nb, "out/my-scenario") // writes report.md, report.html and one SVG per figure; returns their paths
 */
export async function writeNotebook(nb: Notebook, dir: string, onProgress?: (done: number, total: number) => void): Promise<string[]> {
  checkNotebookArgs(nb, onProgress, "writeNotebook");
  if (typeof dir !== "string" || dir === "") throw new TanklightInputError([{ path: "dir", message: "must be a directory path (a non-empty string)", value: dir }], "writeNotebook");
  const r = await renderNotebook(nb, onProgress);
  await mkdir(dir, { recursive: true });
  const written: string[] = [];
  const put = async (name: string, text: string): Promise<void> => {
    const p = join(dir, name);
    await writeFile(p, text);
    written.push(p);
  };
  await put("report.md", r.markdown);
  for (const [name, svg] of r.svgs) await put(`${name}.svg`, svg);
  await put("report.html", r.html);
  return written;
}

/** A notebook (what notebook() returned) and an optional progress callback. */
function checkNotebookArgs(nb: unknown, onProgress: unknown, where: string): void {
  requireNotebook(nb, "nb", where);
  if (onProgress !== undefined && typeof onProgress !== "function") throw new TanklightInputError([{ path: "onProgress", message: "must be a function (done, total) => void or absent", value: onProgress }], where);
}

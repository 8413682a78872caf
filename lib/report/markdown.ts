/**
 * A notebook as Markdown (GitHub-flavoured tables); figures are referenced as `<name>.svg`
 * beside the report.
 */
import { valueText } from "./format.ts";
import { DEFER_LINE, requireNotebook, type Cell, type Notebook } from "./notebook.ts";

const escapeCell = (s: string): string => s.replace(/\|/g, "\\|").replace(/\n/g, " ");

function table(header: readonly string[], rows: readonly (readonly string[])[], numericCols: readonly boolean[]): string[] {
  return [
    `| ${header.map(escapeCell).join(" | ")} |`,
    `|${header.map((_, i) => (numericCols[i] ? "---:" : "---")).join("|")}|`,
    ...rows.map((r) => `| ${r.map(escapeCell).join(" | ")} |`),
  ];
}

function cellMarkdown(c: Cell): string[] {
  switch (c.kind) {
    case "heading":
      return [`## ${c.text}`, ""];
    case "text":
      return [c.text, ""];
    case "table": {
      const numeric = c.header.map((_, j) => c.rows.length > 0 && c.rows.every((r) => typeof r[j] !== "string"));
      return [...(c.caption ? [`*${c.caption}*`, ""] : []), ...table(c.header, c.rows.map((r) => r.map(valueText)), numeric), ""];
    }
    case "figure":
      return [`![${c.caption}](${c.name}.svg)`, "", `*Figure: ${c.caption}*`, ""];
    case "parts":
      return ["## Parts list", "", ...table(["item", "part", "quantity", "notes"], c.rows.map((r) => [r.item, r.part, String(r.quantity), r.notes]), [false, false, true, false]), ""];
    case "cautions":
      return ["## Cautions", "", ...c.items.map((i) => `- ${i}`), "", DEFER_LINE, ""];
  }
}

/**
 * The notebook's Markdown text.
 * @example notebookMarkdown(notebook("Drawer")).split("\n")[0] // → "# Drawer"
 */
export function notebookMarkdown(nb: Notebook): string {
  requireNotebook(nb, "nb", "notebookMarkdown");
  const head = [`# ${nb.title}`, "", ...(nb.subtitle ? [`*${nb.subtitle}*`, ""] : []), ...(nb.note ? [`> ${nb.note}`, ""] : [])];
  return [...head, ...nb.cells.flatMap(cellMarkdown)].join("\n").replace(/\n{3,}/g, "\n\n").trimEnd() + "\n";
}

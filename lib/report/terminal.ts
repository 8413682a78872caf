/**
 * A notebook as plain text for a terminal: headings underlined, tables aligned in columns,
 * figures named with their file, the parts list and the cautions. No colour codes.
 */
import { valueText } from "./format.ts";
import { DEFER_LINE, requireNotebook, type Cell, type Notebook } from "./notebook.ts";

/** Markdown emphasis and code marks removed. */
function plain(s: string): string {
  return s.replace(/\*\*([^*]+)\*\*/g, "$1").replace(/\*([^*]+)\*/g, "$1").replace(/`([^`]+)`/g, "$1");
}

function columns(rows: readonly (readonly string[])[]): string[] {
  const widths = rows[0]!.map((_, j) => Math.max(...rows.map((r) => [...(r[j] ?? "")].length)));
  return rows.map((r) => r.map((v, j) => v + " ".repeat(widths[j]! - [...v].length)).join("  ").trimEnd());
}

function cellText(c: Cell): string[] {
  switch (c.kind) {
    case "heading":
      return ["", c.text, "─".repeat([...c.text].length)];
    case "text":
      return [plain(c.text), ""];
    case "table":
      return [...(c.caption ? [plain(c.caption)] : []), ...columns([c.header, ...c.rows.map((r) => r.map(valueText))]), ""];
    case "figure":
      return [`[figure ${c.name}.svg: ${plain(c.caption)}]`, ""];
    case "parts":
      return ["", "Parts list", "──────────", ...columns([["item", "part", "qty", "notes"], ...c.rows.map((r) => [r.item, r.part, String(r.quantity), r.notes])]), ""];
    case "cautions":
      return ["", "Cautions", "────────", ...c.items.map((i) => `- ${plain(i)}`), DEFER_LINE, ""];
  }
}

/**
 * The notebook as terminal text.
 * @example notebookText(notebook("Drawer")).split("\n")[0] // → "Drawer"
 */
export function notebookText(nb: Notebook): string {
  requireNotebook(nb, "nb", "notebookText");
  const rule = "═".repeat(Math.min(78, [...nb.title].length));
  return [nb.title, rule, ...(nb.subtitle ? [nb.subtitle] : []), ...(nb.note ? [nb.note] : []), ...nb.cells.flatMap(cellText)].join("\n").replace(/\n{3,}/g, "\n\n").trimEnd() + "\n";
}

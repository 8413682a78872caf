/**
 * A notebook as one self-contained HTML page: the charts inlined as SVG, the styles inline,
 * nothing fetched from the network. Prose cells use a small Markdown subset (paragraphs,
 * "- " lists with indented continuation lines, **bold**, *italic*, `code`); everything
 * else is escaped.
 */
import { valueText } from "./format.ts";
import { DEFER_LINE, requireNotebook, type Cell, type Notebook } from "./notebook.ts";
import { TanklightInputError } from "../errors.ts";
import { PALETTE } from "./theme.ts";

/** HTML-escaped text. */
export function escapeHtml(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

function inline(s: string): string {
  return escapeHtml(s)
    .replace(/`([^`]+)`/g, "<code>$1</code>")
    .replace(/\*\*([^*]+)\*\*/g, "<strong>$1</strong>")
    .replace(/\*([^*]+)\*/g, "<em>$1</em>");
}

/** The Markdown subset of prose cells as HTML. */
export function proseHtml(text: string): string {
  const out: string[] = [];
  for (const block of text.split(/\n\s*\n/)) {
    const lines = block.split("\n");
    if (lines[0]!.startsWith("- ")) {
      const items: string[] = [];
      for (const l of lines) {
        if (l.startsWith("- ")) items.push(l.slice(2));
        else if (items.length > 0) items[items.length - 1] += " " + l.trim();
      }
      out.push(`<ul>${items.map((i) => `<li>${inline(i)}</li>`).join("")}</ul>`);
    } else {
      out.push(`<p>${inline(lines.join(" "))}</p>`);
    }
  }
  return out.join("\n");
}

function table(header: readonly string[], rows: readonly (readonly string[])[], numeric: readonly boolean[], caption?: string): string {
  const cls = (j: number) => (numeric[j] ? ' class="num"' : "");
  return [
    "<table>",
    caption ? `<caption>${inline(caption)}</caption>` : "",
    `<thead><tr>${header.map((h, j) => `<th${cls(j)}>${inline(h)}</th>`).join("")}</tr></thead>`,
    `<tbody>${rows.map((r) => `<tr>${r.map((v, j) => `<td${cls(j)}>${inline(v)}</td>`).join("")}</tr>`).join("")}</tbody>`,
    "</table>",
  ].join("");
}

function cellHtml(c: Cell, svgs: ReadonlyMap<string, string>): string {
  switch (c.kind) {
    case "heading":
      return `<h2>${inline(c.text)}</h2>`;
    case "text":
      return proseHtml(c.text);
    case "table": {
      const numeric = c.header.map((_, j) => c.rows.length > 0 && c.rows.every((r) => typeof r[j] !== "string"));
      return table(c.header, c.rows.map((r) => r.map(valueText)), numeric, c.caption);
    }
    case "figure":
      return `<figure data-chart="${escapeHtml(c.name)}">${svgs.get(c.name) ?? ""}<figcaption>${inline(c.caption)}</figcaption></figure>`;
    case "parts":
      return `<h2>Parts list</h2>${table(["item", "part", "quantity", "notes"], c.rows.map((r) => [r.item, r.part, String(r.quantity), r.notes]), [false, false, true, false])}`;
    case "cautions":
      return `<section class="cautions"><h2>Cautions</h2><ul>${c.items.map((i) => `<li>${inline(i)}</li>`).join("")}</ul><p>${inline(DEFER_LINE)}</p></section>`;
  }
}

const STYLE = `
body{margin:0;background:${PALETTE.paper};color:${PALETTE.ink};font:15px/1.55 Georgia,serif}
main{max-width:60rem;margin:0 auto;padding:2rem 1.5rem 4rem}
h1{font-weight:normal;font-size:2rem;margin:0 0 .2rem}
h2{font-weight:normal;font-size:1.35rem;margin:2rem 0 .6rem;border-bottom:2px solid ${PALETTE.grid};padding-bottom:.2rem}
.subtitle{color:${PALETTE.muted};font-style:italic;margin:0 0 .8rem}
.note{border-left:4px solid ${PALETTE.amber};padding:.3rem .8rem;background:#fff;margin:.8rem 0}
table{border-collapse:collapse;margin:.8rem 0;font:13px/1.4 Helvetica,Arial,sans-serif;background:#fff}
caption{text-align:left;font-style:italic;padding:.2rem 0;color:${PALETTE.muted}}
th,td{padding:.3rem .7rem;border-bottom:1px solid ${PALETTE.grid};text-align:left;vertical-align:top}
th{border-bottom:2px solid ${PALETTE.teal}}
.num{text-align:right;font-variant-numeric:tabular-nums}
figure{margin:1.2rem 0;overflow-x:auto}
figure svg{max-width:100%;height:auto}
figcaption{color:${PALETTE.muted};font-style:italic;font-size:.92rem}
code{font:13px ui-monospace,monospace;background:#fff;padding:0 .2rem}
.cautions{border:2px solid ${PALETTE.brick};background:#fff;padding:.2rem 1.2rem .6rem;margin-top:2rem}
.cautions h2{border:none;color:${PALETTE.brick}}
`;

/**
 * The notebook as a self-contained HTML page.
 * @param svgs rendered figures by name (from renderSvg).
 * @example notebookHtml(notebook("Drawer"), new Map()).startsWith("<!doctype html>") // → true
 */
export function notebookHtml(nb: Notebook, svgs: ReadonlyMap<string, string>): string {
  requireNotebook(nb, "nb", "notebookHtml");
  if (!(svgs instanceof Map) || [...svgs].some(([k, v]) => typeof k !== "string" || typeof v !== "string")) {
    throw new TanklightInputError([{ path: "svgs", message: "must be a Map from figure name to SVG text (what renderNotebook returned)", value: svgs instanceof Map ? `a Map of ${svgs.size}` : svgs }], "notebookHtml");
  }
  return [
    "<!doctype html>",
    '<html lang="en"><head><meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${escapeHtml(nb.title)}</title>`,
    `<style>${STYLE}</style></head><body><main>`,
    `<h1>${inline(nb.title)}</h1>`,
    nb.subtitle ? `<p class="subtitle">${inline(nb.subtitle)}</p>` : "",
    nb.note ? `<p class="note">${inline(nb.note)}</p>` : "",
    ...nb.cells.map((c) => cellHtml(c, svgs)),
    "</main></body></html>",
    "",
  ].join("\n");
}

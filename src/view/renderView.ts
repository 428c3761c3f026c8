/**
 * Private to the library: render a {@link ResultView} as plain text, Markdown or HTML, and as a
 * Jupyter MIME bundle. Small and dependency-free, because every result that carries a view pulls it in.
 *
 * @module
 * @internal
 */
import type { MimeBundle, ResultView, ViewCell, ViewColumn, ViewTable } from "./types.js";

/** Default significant digits of a number cell. */
const DEFAULT_DIGITS = 6;

/**
 * Format one cell: numbers to `digits` significant digits (no `-0`, no trailing zeros), exponent
 * form below 1e-4 or from 1e9 up; text as is; null as an empty string.
 */
export function formatCell(cell: ViewCell, digits = DEFAULT_DIGITS): string {
  if (cell === null) return "";
  if (typeof cell === "string") return cell;
  if (Number.isNaN(cell)) return "NaN";
  if (!Number.isFinite(cell)) return cell > 0 ? "∞" : "−∞";
  if (cell === 0) return "0";
  const a = Math.abs(cell);
  if (a < 1e-4 || a >= 1e9) {
    const [m, e] = cell.toExponential(Math.max(0, digits - 1)).split("e") as [string, string];
    return `${trimZeros(m)}e${e.replace("+", "")}`;
  }
  return String(Number(cell.toPrecision(digits))); // shortest form of the rounded value: no trailing zeros
}

/** Header text of a column: `label (unit)`. */
export function columnHeader(c: ViewColumn): string {
  return c.unit === undefined || c.unit === "" ? c.label : `${c.label} (${c.unit})`;
}

/** Text of every cell of a table, row by row. */
function cellTexts(t: ViewTable): string[][] {
  return t.rows.map((r) => t.columns.map((c, j) => formatCell(r[j] ?? null, c.digits)));
}

/** True when the column holds numbers (right-aligned). */
function numeric(t: ViewTable, j: number): boolean {
  return t.rows.some((r) => typeof r[j] === "number");
}

/** Render a view as aligned plain text. */
export function viewToText(v: ResultView): string {
  const out: string[] = [v.title];
  for (const t of v.tables) {
    out.push("");
    if (t.caption !== undefined) out.push(t.caption);
    const head = t.columns.map(columnHeader);
    const body = cellTexts(t);
    const width = head.map((h, j) => Math.max(h.length, ...body.map((r) => (r[j] as string).length)));
    const line = (cells: string[]): string =>
      cells.map((c, j) => (numeric(t, j) ? c.padStart(width[j]!) : c.padEnd(width[j]!))).join("  ").trimEnd();
    out.push(line(head), width.map((w) => "-".repeat(w)).join("  "));
    for (const r of body) out.push(line(r));
  }
  for (const n of v.notes ?? []) out.push("", `note: ${n}`);
  return out.join("\n");
}

/** Render a view as Markdown (a bold title and pipe tables). */
export function viewToMarkdown(v: ResultView): string {
  const out: string[] = [`**${mdEscape(v.title)}**`];
  for (const t of v.tables) {
    out.push("");
    if (t.caption !== undefined) out.push(`*${mdEscape(t.caption)}*`, "");
    out.push(`| ${t.columns.map((c) => mdEscape(columnHeader(c))).join(" | ")} |`);
    out.push(`|${t.columns.map((_, j) => (numeric(t, j) ? "---:" : ":---")).join("|")}|`);
    for (const r of cellTexts(t)) out.push(`| ${r.map(mdEscape).join(" | ")} |`);
  }
  for (const n of v.notes ?? []) out.push("", `> ${mdEscape(n)}`);
  return out.join("\n");
}

/** Render a view as HTML: one `<div class="rxtherm">` holding a `<table>` per view table. */
export function viewToHtml(v: ResultView): string {
  const out: string[] = [`<div class="rxtherm"><strong>${htmlEscape(v.title)}</strong>`];
  for (const t of v.tables) {
    const right = t.columns.map((_, j) => numeric(t, j));
    out.push('<table class="rxtherm-table">');
    if (t.caption !== undefined) out.push(`<caption>${htmlEscape(t.caption)}</caption>`);
    out.push(`<thead><tr>${t.columns.map((c, j) => `<th${align(right[j]!)}>${htmlEscape(columnHeader(c))}</th>`).join("")}</tr></thead>`);
    out.push("<tbody>");
    for (const r of cellTexts(t)) out.push(`<tr>${r.map((c, j) => `<td${align(right[j]!)}>${htmlEscape(c)}</td>`).join("")}</tr>`);
    out.push("</tbody></table>");
  }
  for (const n of v.notes ?? []) out.push(`<p><em>${htmlEscape(n)}</em></p>`);
  out.push("</div>");
  return out.join("\n");
}

/** The MIME bundle of a view: `text/plain`, `text/markdown` and `text/html`. */
export function viewMimeBundle(v: ResultView): MimeBundle {
  return { "text/plain": viewToText(v), "text/markdown": viewToMarkdown(v), "text/html": viewToHtml(v) };
}

function align(right: boolean): string {
  return right ? ' style="text-align:right"' : ' style="text-align:left"';
}

function trimZeros(s: string): string {
  return s.includes(".") ? s.replace(/\.?0+$/, "") : s;
}

function htmlEscape(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

function mdEscape(s: string): string {
  return s.replace(/\|/g, "\\|").replace(/\*/g, "\\*");
}

/**
 * Plain-text output: aligned tables and numbers with a fixed number of significant digits.
 *
 * @module
 */

/** Column alignment: text left, numbers right. */
export type Align = "left" | "right";

/**
 * An aligned table: a header row, a rule of dashes, then the rows; columns two spaces apart.
 * Trailing spaces are trimmed so golden files stay clean.
 */
export function table(headers: readonly string[], rows: readonly (readonly string[])[], align: readonly Align[]): string {
  const widths = headers.map((h, c) => Math.max(width(h), ...rows.map((r) => width(r[c] ?? ""))));
  const line = (cells: readonly string[]): string =>
    cells.map((cell, c) => pad(cell, widths[c]!, align[c] ?? "left")).join("  ").trimEnd();
  return [line(headers), line(widths.map((w) => "-".repeat(w))), ...rows.map(line)].join("\n");
}

/** Label/value lines, labels padded to one width. */
export function fields(pairs: readonly (readonly [string, string])[]): string {
  const w = Math.max(...pairs.map(([k]) => width(k)));
  return pairs.map(([k, v]) => `${pad(k, w, "left")}  ${v}`.trimEnd()).join("\n");
}

/**
 * A number with `digits` significant digits, plain notation between 1e-4 and 1e9 (scientific
 * outside), no `-0`, trailing zeros of the fraction kept so columns line up.
 */
export function num(x: number, digits = 6): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return "0";
  const a = Math.abs(x);
  if (a < 1e-4 || a >= 1e9) return x.toExponential(digits - 1);
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(a)));
  const s = x.toFixed(Math.min(decimals, 20));
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
}

/** A number with a fixed count of decimals (no `-0`). */
export function fixed(x: number, decimals: number): string {
  const s = x.toFixed(decimals);
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
}

/** Display width: code points (°, ³, → count as one column). */
function width(s: string): number {
  return [...s].length;
}
function pad(s: string, w: number, align: Align): string {
  const fill = " ".repeat(Math.max(0, w - width(s)));
  return align === "right" ? fill + s : s + fill;
}

/** Shortest text of a number to 12 significant digits (counts, atomic weights, coefficients): 2, 25.5, 1.008. */
export function short(x: number): string {
  const r = Number(x.toPrecision(12));
  return r === 0 ? "0" : String(r);
}

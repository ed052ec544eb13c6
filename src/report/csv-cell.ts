/**
 * Spreadsheet-safe CSV cells. A spreadsheet evaluates a cell that begins with `=`, `+`, `-`,
 * `@`, a tab or a carriage return as a formula, so a layer named `=HYPERLINK("http://…")` or
 * `@SUM(1)` in a results table would run when the file is opened. Every text cell Lamina
 * writes to a CSV that begins with one of those characters gets a leading apostrophe, which
 * the spreadsheet shows as text (OWASP, "CSV Injection",
 * https://owasp.org/www-community/attacks/CSV_Injection). Numbers are written as numbers and
 * never changed, so −1.5 in a numeric column stays −1.5. Quoting (commas, quotes, line
 * breaks) is left to d3-dsv's `csvFormat` (RFC 4180).
 *
 *     neutraliseCsvText('=1+2')   // "'=1+2"
 *     neutraliseCsvText('shale')  // "shale"
 *     csvSafeRow({ name: '-x', fs: -1.5 }) // { name: "'-x", fs: -1.5 }
 */

const FORMULA_START = /^[=+\-@\t\r]/;

/** The text as a spreadsheet will show it (never evaluate it). */
export function neutraliseCsvText(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** A copy of a CSV row with every text cell neutralised; numbers and booleans unchanged. */
export function csvSafeRow<T extends Record<string, unknown>>(row: T): T {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(row)) out[key] = typeof value === 'string' ? neutraliseCsvText(value) : value;
  return out as T;
}

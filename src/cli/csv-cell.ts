/**
 * Spreadsheet-safe text cells for the CSV files the command line writes (OWASP, "CSV
 * Injection"): a text cell that begins with `=`, `+`, `-`, `@`, a tab or a carriage return
 * would be read as a formula by a spreadsheet, so it gets a leading apostrophe. Only text
 * columns (names) pass through here; numbers are written as numbers.
 *
 *     safeCsvText('=HYPERLINK("http://x","y")') // "'=HYPERLINK(\"http://x\",\"y\")"
 *     safeCsvText('Room 1')                     // "Room 1"
 */
const FORMULA_START = /^[=+\-@\t\r]/;

export function safeCsvText(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

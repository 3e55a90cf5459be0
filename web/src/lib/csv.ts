/**
 * CSV that is safe to open in a spreadsheet: RFC 4180 quoting, and cells that a spreadsheet
 * would read as a formula (beginning with =, +, -, @, or a tab or carriage return) escaped
 * with a leading apostrophe, so an exported name such as "=HYPERLINK(…)" stays text.
 * Numbers are written as numbers (a negative stress is not a formula).
 */

/** Characters that make a spreadsheet treat a text cell as a formula. */
const FORMULA_START = /^[=+\-@\t\r]/;

/** One cell: numbers as they are, text escaped against formulas and quoted when needed. */
export function csvCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : value > 0 ? "inf" : "";
  let text = value;
  if (FORMULA_START.test(text)) text = `'${text}`;
  return /[",\n\r]/.test(text) || text !== text.trim() ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Rows of cells as CSV text with CRLF line ends (what spreadsheets expect). */
export function toCsv(rows: readonly (readonly (string | number | null | undefined)[])[]): string {
  return rows.map((row) => row.map(csvCell).join(",")).join("\r\n") + "\r\n";
}

/** Offers `text` as a file download in the browser. */
export function downloadText(fileName: string, text: string, type = "text/csv;charset=utf-8"): void {
  const url = URL.createObjectURL(new Blob(["\uFEFF", text], { type }));
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  a.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

import { VERDICT_TEXT } from "../../../../../core/report";

/** Which verdict a table cell states, so the page can colour it (the word and mark stay in the text). */
export function verdictOfCell(text: string): "pass" | "close" | "fail" | null {
  for (const verdict of ["pass", "close", "fail"] as const) {
    const mark = VERDICT_TEXT[verdict].slice(0, 1);
    if (text.startsWith(VERDICT_TEXT[verdict]) || text.endsWith(` ${mark}`)) return verdict;
  }
  return null;
}

/**
 * The CSS of the print page's running furniture: every printed page names the record (or the draft)
 * and "page n of m" in its bottom margin, as the PDF does. Written as a string because it carries the
 * identifier; quotes and backslashes are escaped for a CSS string.
 */
export function pageRuleCss(pageIdentifier: string): string {
  const quoted = `"${pageIdentifier.replace(/\\/g, "\\\\").replace(/"/g, '\\"').replace(/\n/g, " ")}"`;
  return `@page { size: A4; margin: 16mm 14mm 20mm 14mm;
  @bottom-left { content: ${quoted}; font: 7pt "JetBrains Mono", monospace; color: #5b5e66; }
  @bottom-right { content: "page " counter(page) " of " counter(pages); font: 7pt "JetBrains Mono", monospace; color: #5b5e66; } }`;
}

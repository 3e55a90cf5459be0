import type { PointTableSeparator } from "./types";

const QUOTE = 34;
const SPACE = 32;
const TAB = 9;

/** The char code of a one-character separator, or −1 for "whitespace". */
export function separatorCode(separator: PointTableSeparator): number {
  switch (separator) {
    case ",":
      return 44;
    case ";":
      return 59;
    case "\t":
      return TAB;
    case "whitespace":
      return -1;
    default:
      throw new RangeError(
        `separator must be ",", ";", "\\t" or "whitespace", got ${JSON.stringify(separator)}`,
      );
  }
}

/**
 * The end of the field that starts at `i` in `text[i, end)`: the index of the separator (or of a
 * space or tab when `sep` is −1) that closes it, or `end`. A field that starts with a double quote
 * runs to its closing quote ("" inside is a quote), so a separator inside quotes belongs to the
 * field; an unclosed quote makes the field run to the end of the line.
 */
export function fieldEnd(text: string, i: number, end: number, sep: number): number {
  let j = i;
  if (j < end && text.charCodeAt(j) === QUOTE) {
    j++;
    while (j < end) {
      if (text.charCodeAt(j) === QUOTE) {
        if (j + 1 < end && text.charCodeAt(j + 1) === QUOTE) j += 2;
        else {
          j++;
          break;
        }
      } else j++;
    }
  }
  if (sep < 0) {
    while (j < end) {
      const c = text.charCodeAt(j);
      if (c === SPACE || c === TAB) break;
      j++;
    }
  } else {
    while (j < end && text.charCodeAt(j) !== sep) j++;
  }
  return j;
}

/** Index of the first character at or after `i` that is not a space or tab (for "whitespace"). */
export function skipBlanks(text: string, i: number, end: number): number {
  while (i < end) {
    const c = text.charCodeAt(i);
    if (c !== SPACE && c !== TAB) break;
    i++;
  }
  return i;
}

/** True when `text[start, end)` (trimmed) is a quoted field. */
export function isQuoted(text: string, start: number, end: number): boolean {
  const s = skipBlanks(text, start, end);
  return s < end && text.charCodeAt(s) === QUOTE;
}

/**
 * The value of a field: trimmed, and without its quotes ("" inside read as one quote).
 * @returns the text, or null when a quote is opened and never closed
 */
export function fieldText(text: string, start: number, end: number): string | null {
  const s = text.slice(start, end).trim();
  if (s.charCodeAt(0) !== QUOTE) return s;
  if (s.length < 2 || s.charCodeAt(s.length - 1) !== QUOTE) return null;
  const inner = s.slice(1, -1);
  if (inner.replace(/""/g, "").includes('"')) return null;
  return inner.replace(/""/g, '"');
}

/**
 * Splits one line (without its line break) into its field texts, unquoted and trimmed: for
 * headers and for the first rows a mapping screen shows.
 * @param line one line of the table
 * @param separator how fields are separated
 */
export function splitLine(line: string, separator: PointTableSeparator): string[] {
  const sep = separatorCode(separator);
  const out: string[] = [];
  const end = line.endsWith("\r") ? line.length - 1 : line.length;
  let i = sep < 0 ? skipBlanks(line, 0, end) : 0;
  if (i >= end) return out;
  for (;;) {
    const j = fieldEnd(line, i, end, sep);
    out.push(fieldText(line, i, j) ?? line.slice(i, j).trim());
    if (sep < 0) {
      i = skipBlanks(line, j, end);
      if (i >= end) return out;
    } else {
      if (j >= end) return out;
      i = j + 1;
    }
  }
}

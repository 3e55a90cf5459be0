/** Exact powers of ten: every 10^k with k ≤ 22 is a double without rounding. */
const POW10 = [
  1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19,
  1e20, 1e21, 1e22,
];

const SPACE = 32;
const TAB = 9;
const PLUS = 43;
const MINUS = 45;
const POINT = 46;
const COMMA = 44;

/** A plain decimal number (optional sign, digits with one decimal point, optional exponent). */
const DECIMAL_FORM = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * The number written in `text[start, end)`, or NaN when it is not one. Accepted: an optional sign
 * (U+2212 minus too), digits with at most one decimal mark, an optional exponent (`1.5E+03`);
 * spaces and tabs around it. Refused: an empty field, hexadecimal, "Infinity", "NaN", thousands
 * separators, a point when the decimal mark is a comma.
 *
 * Why not Number(text.slice(…)): slicing allocates a string per field, ten per row. The fast path
 * reads up to 15 significant digits into an integer m (exact, < 2^53) and returns m·10^e or m/10^−e
 * for |e| ≤ 22, where both factors are exact doubles, so the one rounding of the multiplication or
 * division gives the correctly rounded value, the same double Number() gives (Clinger's fast path).
 * Longer or larger numbers go through Number() on the slice.
 * @param decimal char code of the decimal mark (46 "." or 44 ",")
 */
export function readNumber(text: string, start: number, end: number, decimal: number): number {
  let i = start;
  let e = end;
  let c = 0;
  while (i < e && ((c = text.charCodeAt(i)) === SPACE || c === TAB)) i++;
  while (e > i && ((c = text.charCodeAt(e - 1)) === SPACE || c === TAB)) e--;
  // The fast path is readNumberAt's; it must have read the whole trimmed field.
  const v = readNumberAt(text, i, e, decimal);
  if (!Number.isNaN(v) && numberScan.end === e) return v;
  return slowNumber(text, i, e, decimal);
}

/** The rare forms: more than 15 digits, a large exponent, U+2212 minus, or not a number at all. */
function slowNumber(text: string, start: number, end: number, decimal: number): number {
  let s = text.slice(start, end).replace(/\u2212/g, "-");
  if (decimal === COMMA) {
    if (s.includes(".")) return Number.NaN;
    s = s.replace(",", ".");
  } else if (decimal !== POINT) return Number.NaN;
  return DECIMAL_FORM.test(s) ? Number(s) : Number.NaN;
}

/** Where {@link readNumberAt} stopped (an out-parameter, so the hot path allocates nothing). */
export const numberScan = { end: 0 };

/**
 * The common case of {@link readNumber} in one pass with finding the field's end: reads a plain
 * number (sign, up to 15 digits with one decimal mark, an optional exponent) starting exactly at
 * `start`, and leaves in `numberScan.end` the index where it stopped. The caller accepts the value
 * only when it stopped at the field's separator or the line's end; for anything else (NaN, or a
 * stop elsewhere) it finds the field's end and calls {@link readNumber}, which also takes the rare
 * forms. Scanning each field once instead of twice was about a third of the parse.
 */
export function readNumberAt(text: string, start: number, end: number, decimal: number): number {
  let i = start;
  let negative = false;
  let c = text.charCodeAt(i);
  if (c === MINUS) {
    negative = true;
    i++;
  } else if (c === PLUS) i++;
  let m = 0;
  let digits = 0;
  let frac = 0;
  while (i < end) {
    const d = text.charCodeAt(i) - 48;
    if (d < 0 || d > 9) break;
    m = m * 10 + d;
    digits++;
    i++;
  }
  if (i < end && text.charCodeAt(i) === decimal) {
    i++;
    while (i < end) {
      const d = text.charCodeAt(i) - 48;
      if (d < 0 || d > 9) break;
      m = m * 10 + d;
      digits++;
      frac++;
      i++;
    }
  }
  let exp = 0;
  if (i < end && ((c = text.charCodeAt(i)) === 101 || c === 69)) {
    i++;
    let expNegative = false;
    c = text.charCodeAt(i);
    if (c === MINUS) {
      expNegative = true;
      i++;
    } else if (c === PLUS) i++;
    let expDigits = 0;
    while (i < end) {
      const d = text.charCodeAt(i) - 48;
      if (d < 0 || d > 9) break;
      exp = exp * 10 + d;
      expDigits++;
      i++;
    }
    if (expDigits === 0 || expDigits > 4) return Number.NaN;
    if (expNegative) exp = -exp;
  }
  numberScan.end = i;
  if (digits === 0 || digits > 15) return Number.NaN;
  const e10 = exp - frac;
  let v: number;
  if (e10 === 0) v = m;
  else if (e10 < 0 && e10 >= -22) v = m / POW10[-e10];
  else if (e10 > 0 && e10 <= 22) v = m * POW10[e10];
  else return Number.NaN;
  return negative ? -v : v;
}

/**
 * {@link readNumberAt} over UTF-8 bytes instead of a string, for a Web Worker that parses the bytes
 * of a file without decoding them to text (decoding 90 MB and scanning the string cost more than
 * the parse itself). The same rules, line for line: keep the two in step (the tests give both the
 * same fields). A byte of a multi-byte character is never a digit, sign, mark or `e`, so the
 * scan stops at it and the caller falls back to the decoded line.
 */
export function readNumberAtBytes(bytes: Uint8Array, start: number, end: number, decimal: number): number {
  let i = start;
  let negative = false;
  let c = bytes[i];
  if (c === MINUS) {
    negative = true;
    i++;
  } else if (c === PLUS) i++;
  let m = 0;
  let digits = 0;
  let frac = 0;
  while (i < end) {
    const d = bytes[i] - 48;
    if (d < 0 || d > 9) break;
    m = m * 10 + d;
    digits++;
    i++;
  }
  if (i < end && bytes[i] === decimal) {
    i++;
    while (i < end) {
      const d = bytes[i] - 48;
      if (d < 0 || d > 9) break;
      m = m * 10 + d;
      digits++;
      frac++;
      i++;
    }
  }
  let exp = 0;
  if (i < end && ((c = bytes[i]) === 101 || c === 69)) {
    i++;
    let expNegative = false;
    c = bytes[i];
    if (c === MINUS) {
      expNegative = true;
      i++;
    } else if (c === PLUS) i++;
    let expDigits = 0;
    while (i < end) {
      const d = bytes[i] - 48;
      if (d < 0 || d > 9) break;
      exp = exp * 10 + d;
      expDigits++;
      i++;
    }
    if (expDigits === 0 || expDigits > 4) return Number.NaN;
    if (expNegative) exp = -exp;
  }
  numberScan.end = i;
  if (digits === 0 || digits > 15) return Number.NaN;
  const e10 = exp - frac;
  let v: number;
  if (e10 === 0) v = m;
  else if (e10 < 0 && e10 >= -22) v = m / POW10[-e10];
  else if (e10 > 0 && e10 <= 22) v = m * POW10[e10];
  else return Number.NaN;
  return negative ? -v : v;
}

import type { Component } from "../tensor/types";
import type { StressUnit } from "../units/stress";

/** The decimal mark of pasted numbers: a point (commas then separate values) or a comma ("1,5" = 1.5). */
export type DecimalMark = "." | ",";

/** A piece of pasted text with its 1-based place. */
export type Token = {
  text: string;
  line: number;
  column: number;
  /** what stood between this token and the previous one of its row (absent for the first) */
  after?: "comma" | "space";
  /**
   * Set when a comma joins this token to the one before with no space, both sides digits ("1,5",
   * "1,000"): such a comma may be a decimal comma, a thousands separator or a value separator.
   */
  glued?: boolean;
  /** true when the token stands inside brackets ("[1,2,3]") */
  inBrackets?: boolean;
};

/** Why the tokenizer refused the text. */
export type TokenProblem = "bracket" | "empty-field";

/** Tokens grouped into rows (a row ends at a line break, a `;`, or an inner closing bracket). */
export type Tokenized =
  | { ok: true; rows: Token[][] }
  | { ok: false; message: string; line: number; column: number; problem: TokenProblem };

const OPEN = "[({";
const CLOSE = "])}";
const RUN_STOP = " \t\r\n\u00a0;[](){}";

/** The stretch of text around index i up to the nearest space, `;`, bracket or line end. */
function runAround(text: string, i: number): string {
  let a = i;
  let b = i + 1;
  while (a > 0 && !RUN_STOP.includes(text[a - 1])) a--;
  while (b < text.length && !RUN_STOP.includes(text[b])) b++;
  return text.slice(a, b);
}

const isDigit = (ch: string | undefined): boolean => ch !== undefined && ch >= "0" && ch <= "9";

/**
 * Splits pasted text into rows of tokens. Entries are separated by spaces, tabs or commas (with
 * `decimal` ",": spaces and tabs only, the comma belonging to the number); rows by line breaks or
 * `;`; brackets are optional, and in nested form ("[[1,2,3],[4,5,6],[7,8,9]]") each inner bracket
 * pair is one row. Reports an unbalanced or mismatched bracket with its place, and — when commas
 * separate values — an empty field (two commas with nothing between, or a comma that starts or ends
 * a row), which a spreadsheet writes for a blank cell and which must not silently shift the values
 * after it (product rule).
 * @param text the pasted text
 * @param decimal the decimal mark; "auto" (the default) reads commas as separators and marks the
 *   ones that could be something else (see {@link Token.glued})
 */
export function tokenize(text: string, decimal: DecimalMark | "auto" = "auto"): Tokenized {
  const commaSeparates = decimal !== ",";
  const rows: Token[][] = [];
  let row: Token[] = [];
  const stack: { ch: string; line: number; column: number }[] = [];
  let line = 1;
  let column = 1;
  let cur = "";
  let curLine = 0;
  let curCol = 0;
  let curAfter: Token["after"];
  let curGlued = false;
  let curInBrackets = false;
  // what came last in the current row, for the empty-field check
  let last: "start" | "token" | "comma" | "open" | "close" | "structural" = "start";
  let lastComma = { line: 0, column: 0, at: 0 };
  let commaSinceToken = false;
  const endToken = (): void => {
    if (cur !== "") {
      const token: Token = { text: cur, line: curLine, column: curCol };
      if (row.length > 0) token.after = curAfter;
      if (curGlued) token.glued = true;
      if (curInBrackets) token.inBrackets = true;
      row.push(token);
      last = "token";
      commaSinceToken = false;
    }
    cur = "";
  };
  const emptyField = (where: string): Tokenized => ({
    ok: false,
    problem: "empty-field",
    message:
      `empty field (${where}) in '${runAround(text, lastComma.at)}': a blank cell is not read as zero; ` +
      "type 0 or remove the extra comma",
    line: lastComma.line,
    column: lastComma.column,
  });
  const endRow = (): Tokenized | undefined => {
    endToken();
    if (commaSeparates && last === "comma") return emptyField("a comma ends the row");
    if (row.length > 0) rows.push(row);
    row = [];
    last = "start";
    commaSinceToken = false;
    return undefined;
  };
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (ch === "\n") {
      const bad = endRow();
      if (bad) return bad;
      line++;
      column = 1;
      continue;
    }
    if (ch === "," && commaSeparates) {
      endToken();
      if (last === "comma" || last === "start" || last === "open") {
        lastComma = { line, column, at: i };
        return emptyField(
          last === "comma" ? "two commas with nothing between them" : "a comma starts the row",
        );
      }
      last = last === "close" ? "structural" : "comma";
      lastComma = { line, column, at: i };
      commaSinceToken = true;
    } else if (ch === " " || ch === "\t" || ch === "\r" || ch === "\u00a0") {
      endToken();
    } else if (ch === ";") {
      const bad = endRow();
      if (bad) return bad;
    } else if (OPEN.includes(ch)) {
      endToken();
      stack.push({ ch, line, column });
      last = "open";
    } else if (CLOSE.includes(ch)) {
      endToken();
      if (commaSeparates && last === "comma") return emptyField("a comma before a closing bracket");
      const open = stack.pop();
      if (open === undefined) {
        return { ok: false, problem: "bracket", message: `unmatched closing bracket '${ch}'`, line, column };
      }
      if (OPEN.indexOf(open.ch) !== CLOSE.indexOf(ch)) {
        return {
          ok: false,
          problem: "bracket",
          message: `closing bracket '${ch}' does not match '${open.ch}' opened at line ${open.line}, column ${open.column}`,
          line,
          column,
        };
      }
      if (stack.length === 1) {
        const bad = endRow();
        if (bad) return bad;
      }
      last = "close";
    } else {
      if (cur === "") {
        curLine = line;
        curCol = column;
        curAfter = commaSinceToken ? "comma" : "space";
        curGlued = commaSeparates && text[i - 1] === "," && isDigit(text[i - 2]) && isDigit(ch);
        curInBrackets = stack.length > 0;
      }
      cur += ch;
    }
    column++;
  }
  const bad = endRow();
  if (bad) return bad;
  const open = stack.pop();
  if (open !== undefined) {
    return {
      ok: false,
      problem: "bracket",
      message: `bracket '${open.ch}' is never closed`,
      line: open.line,
      column: open.column,
    };
  }
  return { ok: true, rows };
}

const UNIT_ALIASES: readonly (readonly [string, StressUnit])[] = [
  ["N/mm^2", "MPa"],
  ["N/mm²", "MPa"],
  ["N/mm2", "MPa"],
  ["kPa", "kPa"],
  ["MPa", "MPa"],
  ["GPa", "GPa"],
  ["psi", "psi"],
  ["PSI", "psi"],
  ["ksi", "ksi"],
  ["KSI", "ksi"],
  ["Pa", "Pa"],
];

/** The stress unit a token names exactly (Pa, kPa, MPa, GPa, psi, ksi, N/mm²), else undefined. */
export function unitOf(text: string): StressUnit | undefined {
  for (const [alias, unit] of UNIT_ALIASES) if (text === alias) return unit;
  return undefined;
}

/** What a number token turned out to be. */
export type NumberParse =
  | { kind: "number"; value: number; unit?: StressUnit }
  | { kind: "point-with-decimal-comma" }
  | { kind: "non-finite"; text: string }
  | { kind: "bad-unit"; value: string; unit: string }
  | { kind: "not-number" };

function plainNumber(t: string): number | undefined {
  if (t === "" || /\s/.test(t)) return undefined;
  const v = Number(t);
  return Number.isNaN(v) && !/^[+-]?NaN$/.test(t) ? undefined : v;
}

/**
 * Reads a number in any form JavaScript's Number() accepts ("1e3", "0x10", "+.5", U+2212 minus
 * allowed), optionally followed directly by a stress unit ("120MPa"). With `decimal` ",", one comma
 * is the decimal mark ("1,5" = 1.5) and a point is refused (a thousands point, "1.000,5", is not read).
 * @param raw the token text
 * @param decimal the decimal mark (default ".")
 */
export function parseNumberToken(raw: string, decimal: DecimalMark = "."): NumberParse {
  let t = raw.replace(/\u2212/g, "-");
  if (decimal === ",") {
    if (/^[+-]?[\d,]/.test(t) && t.includes(".")) return { kind: "point-with-decimal-comma" };
    t = t.replace(",", ".");
  }
  const whole = plainNumber(t);
  if (whole !== undefined)
    return Number.isFinite(whole) ? { kind: "number", value: whole } : { kind: "non-finite", text: raw };
  for (const [alias, unit] of UNIT_ALIASES) {
    if (t.length > alias.length && t.endsWith(alias)) {
      const head = plainNumber(t.slice(0, -alias.length));
      if (head !== undefined) {
        return Number.isFinite(head)
          ? { kind: "number", value: head, unit }
          : { kind: "non-finite", text: raw };
      }
    }
  }
  const m = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)([^\d.].*)$/.exec(t);
  if (m !== null) return { kind: "bad-unit", value: m[1], unit: m[2] };
  return { kind: "not-number" };
}

const AXIS: Readonly<Record<string, number>> = { x: 0, y: 1, z: 2, "1": 0, "2": 1, "3": 2 };
const PAIR: readonly (readonly Component[])[] = [
  ["xx", "xy", "zx"],
  ["xy", "yy", "yz"],
  ["zx", "yz", "zz"],
];

/**
 * The component a header name denotes, e.g. "xx", "sxx", "σ_xx", "sigma_x", "txy", "τyz", "s13",
 * "xz" (= zx); case-insensitive. Undefined when the text is not a component name.
 * @param text a header token
 */
export function componentOf(text: string): Component | undefined {
  const m = /^(?:sigma|tau|σ|τ|s|t)?_?([xyz]{1,2}|[123]{2})$/i.exec(text);
  if (m === null) return undefined;
  const axes = m[1].toLowerCase();
  const i = AXIS[axes[0]];
  const j = axes.length === 2 ? AXIS[axes[1]] : i;
  return PAIR[i][j];
}

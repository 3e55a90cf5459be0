import type { Component } from "../tensor/types";
import type { StressUnit } from "../units/stress";

/** A piece of pasted text with its 1-based place. */
export type Token = { text: string; line: number; column: number };

/** Tokens grouped into rows (a row ends at a line break, a `;`, or an inner closing bracket). */
export type Tokenized =
  { ok: true; rows: Token[][] } | { ok: false; message: string; line: number; column: number };

const OPEN = "[({";
const CLOSE = "])}";

/**
 * Splits pasted text into rows of tokens. Entries are separated by spaces, tabs or commas; rows by
 * line breaks or `;`; brackets are optional, and in nested form ("[[1,2,3],[4,5,6],[7,8,9]]") each
 * inner bracket pair is one row. Reports an unbalanced or mismatched bracket with its place.
 * @param text the pasted text
 */
export function tokenize(text: string): Tokenized {
  const rows: Token[][] = [];
  let row: Token[] = [];
  const stack: { ch: string; line: number; column: number }[] = [];
  let line = 1;
  let column = 1;
  let cur = "";
  let curLine = 0;
  let curCol = 0;
  const endToken = (): void => {
    if (cur !== "") row.push({ text: cur, line: curLine, column: curCol });
    cur = "";
  };
  const endRow = (): void => {
    endToken();
    if (row.length > 0) rows.push(row);
    row = [];
  };
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (ch === "\n") {
      endRow();
      line++;
      column = 1;
      continue;
    }
    if (ch === " " || ch === "\t" || ch === "," || ch === "\r" || ch === "\u00a0") {
      endToken();
    } else if (ch === ";") {
      endRow();
    } else if (OPEN.includes(ch)) {
      endToken();
      stack.push({ ch, line, column });
    } else if (CLOSE.includes(ch)) {
      const open = stack.pop();
      if (open === undefined) {
        return { ok: false, message: `unmatched closing bracket '${ch}'`, line, column };
      }
      if (OPEN.indexOf(open.ch) !== CLOSE.indexOf(ch)) {
        return {
          ok: false,
          message: `closing bracket '${ch}' does not match '${open.ch}' opened at line ${open.line}, column ${open.column}`,
          line,
          column,
        };
      }
      if (stack.length === 1) endRow();
      else endToken();
    } else {
      if (cur === "") {
        curLine = line;
        curCol = column;
      }
      cur += ch;
    }
    column++;
  }
  endRow();
  const open = stack.pop();
  if (open !== undefined) {
    return {
      ok: false,
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
 * allowed), optionally followed directly by a stress unit ("120MPa").
 * @param raw the token text
 */
export function parseNumberToken(raw: string): NumberParse {
  const t = raw.replace(/\u2212/g, "-");
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

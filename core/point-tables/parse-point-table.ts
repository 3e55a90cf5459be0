import { FIRST_BAD_ROWS_LIMIT } from "../batch/principal-batch";
import { COMPONENTS } from "../tensor/types";
import { MAX_INPUT_STRESS } from "../tensor/validate";
import { pascalsPer } from "../units/stress";
import { decodeUtf8 } from "./decode-utf8";
import { numberScan, readNumber, readNumberAt, readNumberAtBytes } from "./read-number";
import { fieldEnd, fieldText, isQuoted, separatorCode, skipBlanks, splitLine } from "./split-line";
import type { BadRow, PointTable, PointTableOptions, PointTableSeparator } from "./types";

// Long because the chunked parser's states (header, skipped rows, a line split across chunks,
// quoting) share one loop; the field and number readers are in split-line.ts and read-number.ts.

/** Roles 0–5 are the components in storage order, then the coordinates and the id. */
const ROLE_X = 6;
const ROLE_ID = 9;
const ROLE_NAMES = ["σxx", "σyy", "σzz", "σxy", "σyz", "σzx", "x", "y", "z", "point id"];
const ROLE_KEYS = [...COMPONENTS, "x", "y", "z", "id"] as const;

const BOM = 0xfeff;
const CR = 13;
const POINT = 46;
/** The most rows allocated before any is read (2M rows: 160 MB with coordinates and ids). */
const MAX_PREALLOCATED_ROWS = 2_000_000;
const LF = "\n";
const LF_BYTE = 10;
// Module-local copies of two imports the per-field loops read: run under tsx (the Node bench and
// workers), an imported binding is read through a getter on every access, which was a fifth of
// the byte parse in a profile. The bundled app (Vite) reads them directly either way.
const MAX_STRESS = MAX_INPUT_STRESS;
const scan = numberScan;
const QUOTE = 34;
const SPACE = 32;
const TAB = 9;
/** The UTF-8 byte-order mark. */
const BOM_BYTES = [0xef, 0xbb, 0xbf];

/**
 * Reads a delimited point table (CSV, TSV, semicolon- or whitespace-separated) into Float64Arrays,
 * a piece at a time: `push` any chunks of the text, cut anywhere (a Web Worker reading a file in
 * slices), then `finish`. The result does not depend on where the chunks were cut.
 *
 * Lines end with LF or CRLF; a byte-order mark at the start is dropped; blank lines are passed over;
 * `skipRows` lines are skipped first, then a header line is read when `header` is set. Fields may be
 * quoted ("…", with "" for a quote) but a quoted field does not span lines. Each mapped component
 * must be a plain decimal number (exponent allowed, decimal mark as stated), finite and at most
 * `MAX_INPUT_STRESS` in magnitude in the unit written; it is stored in Pa. Coordinates must be
 * finite numbers and are stored as written. A row that breaks any of this is left out and reported
 * by its line number with a reason naming the column; it never stops the table.
 *
 * To parse a file in two workers, cut it at a line boundary: the first part with the layout's
 * `skipRows` and `header`, the second with neither (and the header's `columnNames`), then
 * {@link mergePointTables} the two results (it renumbers the second part's lines).
 *
 * Own code rather than uDSV (a well-kept fast CSV parser): scripts/bench/point-tables.ts measures
 * both on the same generated 1,000,000-row file; this parser alone ran 1.9×–3.1× faster than
 * uDSV's typed parse alone in five runs, and 2.5× (text) and 3.3× (bytes, pushBytes) in the run of
 * 3 December 2026 at load average 14 (figures in that file's comment), and uDSV's typed rows would
 * still have to be copied into Float64Arrays.
 */
export class PointTableParser {
  private readonly sep: number;
  private readonly decimal: number;
  private readonly scale: number;
  private readonly roleOf: Int8Array;
  private readonly textIds: boolean;
  private readonly hasCoords: boolean;
  private readonly hasIds: boolean;
  private readonly firstLine: number;
  private columnNames: readonly string[] | null;
  private toSkip: number;
  private needHeader: boolean;
  private header: string[] | null = null;
  private carry = "";
  /** the bytes after the last line break of the byte chunks (see pushBytes) */
  private carryBytes: Uint8Array | null = null;
  /** which of push / pushBytes this parser was given: the two do not mix */
  private input: "text" | "bytes" | null = null;
  private line: number;
  private atStart = true;
  private finished = false;
  private count = 0;
  private capacity: number;
  private components: Float64Array;
  private coordinates: Float64Array | null;
  private numericIds: Float64Array | null;
  private readonly stringIds: string[] = [];
  private badCount = 0;
  private readonly firstBad: BadRow[] = [];

  constructor(options: PointTableOptions) {
    if (typeof options !== "object" || options === null) throw new TypeError("options must be an object");
    this.sep = separatorCode(options.separator);
    const decimal = options.decimal ?? ".";
    if (decimal !== "." && decimal !== ",") {
      throw new RangeError(`decimal must be "." or ",", got ${JSON.stringify(decimal)}`);
    }
    if (decimal === "," && options.separator === ",") {
      throw new RangeError('a decimal comma needs a separator other than the comma (";", tab or whitespace)');
    }
    this.decimal = decimal.charCodeAt(0);
    this.scale = pascalsPer(options.unit);
    const skip = options.skipRows ?? 0;
    if (!Number.isInteger(skip) || skip < 0)
      throw new RangeError(`skipRows must be an integer ≥ 0, got ${skip}`);
    this.toSkip = skip;
    this.needHeader = options.header === true;
    const first = options.firstLine ?? 1;
    if (!Number.isInteger(first) || first < 1)
      throw new RangeError(`firstLine must be an integer ≥ 1, got ${first}`);
    this.firstLine = first;
    this.line = first;
    this.columnNames = options.columnNames ?? null;
    this.textIds = options.idKind === "text";
    if (options.idKind !== undefined && options.idKind !== "number" && options.idKind !== "text") {
      throw new RangeError(`idKind must be "number" or "text", got ${JSON.stringify(options.idKind)}`);
    }
    this.roleOf = rolesOf(options.columns);
    this.hasCoords = [6, 7, 8].some((r) => this.roleOf.includes(r));
    this.hasIds = this.roleOf.includes(ROLE_ID);
    const expected = options.expectedRows ?? 0;
    // allocated up front up to MAX_PREALLOCATED_ROWS; a larger table grows past it as it is read
    this.capacity = Math.max(
      1024,
      Math.min(MAX_PREALLOCATED_ROWS, Number.isFinite(expected) ? Math.ceil(expected) : 0),
    );
    this.components = new Float64Array(6 * this.capacity);
    this.coordinates = this.hasCoords ? new Float64Array(3 * this.capacity) : null;
    this.numericIds = this.hasIds && !this.textIds ? new Float64Array(this.capacity) : null;
  }

  /** Reads the complete lines of `chunk` (with what was left of the previous one); keeps the rest. */
  push(chunk: string): void {
    if (this.finished) throw new Error("push after finish: start a new PointTableParser");
    if (typeof chunk !== "string") throw new TypeError(`chunk must be a string, got ${typeof chunk}`);
    this.takeInput("text");
    if (chunk.length === 0) return;
    let text = this.carry.length > 0 ? this.carry + chunk : chunk;
    if (this.atStart) {
      this.atStart = false;
      if (text.charCodeAt(0) === BOM) text = text.slice(1);
    }
    let pos = 0;
    for (;;) {
      const nl = text.indexOf(LF, pos);
      if (nl < 0) break;
      this.readLine(text, pos, nl);
      pos = nl + 1;
    }
    this.carry = pos === 0 ? text : text.slice(pos);
  }

  /**
   * Reads the complete lines of a chunk of the file's UTF-8 bytes (with what was left of the
   * previous one); keeps the rest. The same result as decoding the bytes and calling `push`, but a
   * line of plain numbers is read from the bytes without making a string: only a line the fast
   * path does not take (skipped and header lines, a quoted or non-ASCII field, a bad row) is
   * decoded and read by the text path, which also writes every bad row's reason. Text ids are
   * made from their bytes. Do not mix with `push`.
   */
  pushBytes(chunk: Uint8Array): void {
    if (this.finished) throw new Error("pushBytes after finish: start a new PointTableParser");
    if (!(chunk instanceof Uint8Array)) throw new TypeError("chunk must be a Uint8Array");
    this.takeInput("bytes");
    if (chunk.length === 0) return;
    let bytes = chunk;
    let pos = 0;
    const carry = this.carryBytes;
    if (carry !== null) {
      // the line begun in the previous chunk: joined with the start of this one (a short copy)
      const nl = chunk.indexOf(LF_BYTE);
      const joined = new Uint8Array(carry.length + (nl < 0 ? chunk.length : nl + 1));
      joined.set(carry);
      joined.set(nl < 0 ? chunk : chunk.subarray(0, nl + 1), carry.length);
      if (nl < 0) {
        this.carryBytes = joined;
        return;
      }
      this.carryBytes = null;
      this.readByteLine(joined, this.skipBom(joined), joined.length - 1);
      pos = nl + 1;
    } else if (this.atStart) pos = this.skipBom(bytes);
    for (;;) {
      const nl = bytes.indexOf(LF_BYTE, pos);
      if (nl < 0) break;
      this.readByteLine(bytes, pos, nl);
      pos = nl + 1;
    }
    if (pos < bytes.length) {
      bytes = bytes.slice(pos);
      // a chunk without any line break waits whole for the next one (a BOM is still looked for)
      this.carryBytes = bytes;
    }
  }

  /** Reads the last line (which may lack a line break) and returns the table. */
  finish(): PointTable {
    if (this.finished) throw new Error("finish called twice");
    if (this.carry.length > 0) this.readLine(this.carry, 0, this.carry.length);
    this.carry = "";
    const rest = this.carryBytes;
    if (rest !== null) this.readByteLine(rest, this.skipBom(rest), rest.length);
    this.carryBytes = null;
    this.finished = true;
    const n = this.count;
    let ids: Float64Array | string[] | null = null;
    if (this.numericIds !== null) ids = fitted(this.numericIds, n, this.capacity);
    else if (this.hasIds) {
      this.stringIds.length = n;
      ids = this.stringIds;
    }
    return {
      count: n,
      components: fitted(this.components, 6 * n, 6 * this.capacity),
      coordinates: this.coordinates === null ? null : fitted(this.coordinates, 3 * n, 3 * this.capacity),
      ids,
      header: this.header,
      badRows: { count: this.badCount, first: this.firstBad },
      lines: this.line - this.firstLine,
    };
  }

  private readLine(text: string, start: number, nl: number): void {
    const line = this.line++;
    let end = nl;
    if (end > start && text.charCodeAt(end - 1) === CR) end--;
    if (this.toSkip > 0) {
      this.toSkip--;
      return;
    }
    const sep = this.sep;
    let p = skipBlanks(text, start, end);
    if (p >= end) return; // a blank line
    if (this.needHeader) {
      this.needHeader = false;
      this.header = splitLine(text.slice(start, end), this.separatorName());
      this.columnNames = this.header;
      return;
    }
    if (sep >= 0) p = start;
    const n = this.count;
    if (n === this.capacity) this.grow();
    const roleOf = this.roleOf;
    const last = roleOf.length - 1;
    const comps = this.components;
    const scale = this.scale;
    const decimal = this.decimal;
    const textIds = this.textIds;
    let col = 0;
    for (; col <= last; col++) {
      if (sep < 0 ? p >= end : p > end) break;
      const role = roleOf[col];
      let fe: number;
      if (role >= 0 && (role < ROLE_ID || !textIds)) {
        // numeric ids are integers or plain numbers: always read with the decimal point
        const mark = role === ROLE_ID ? POINT : decimal;
        let v = readNumberAt(text, p, end, mark);
        fe = scan.end;
        const stop = fe < end ? text.charCodeAt(fe) : -2;
        if (v !== v || !(stop === -2 || stop === sep || (sep < 0 && (stop === 32 || stop === 9)))) {
          // not the common form: find the field's end, then read it with every rule
          fe = fieldEnd(text, p, end, sep);
          v = readNumber(text, p, fe, mark);
          if (v !== v && isQuoted(text, p, fe)) {
            const inner = fieldText(text, p, fe);
            if (inner !== null) v = readNumber(inner, 0, inner.length, mark);
          }
        }
        if (role < ROLE_X) {
          if (!(v <= MAX_STRESS && v >= -MAX_STRESS)) return this.bad(line, col, text, p, fe, v);
          comps[6 * n + role] = v * scale;
        } else if (!(v - v === 0)) {
          return this.bad(line, col, text, p, fe, v);
        } else if (role === ROLE_ID) this.numericIds![n] = v;
        else this.coordinates![3 * n + role - ROLE_X] = v;
      } else {
        fe = fieldEnd(text, p, end, sep);
        if (role === ROLE_ID) {
          const id = fieldText(text, p, fe);
          if (id === null || id === "") return this.bad(line, col, text, p, fe, Number.NaN);
          this.stringIds[n] = id;
        }
      }
      p = sep < 0 ? skipBlanks(text, fe, end) : fe + 1;
    }
    if (col <= last) {
      let missing = col;
      while (roleOf[missing] < 0) missing++;
      return this.noteBad(
        line,
        `${col} field${col === 1 ? "" : "s"}; ${this.columnLabel(missing)} is missing`,
      );
    }
    this.count = n + 1;
  }

  private takeInput(kind: "text" | "bytes"): void {
    if (this.input !== null && this.input !== kind)
      throw new Error("push and pushBytes do not mix: give one parser either text or bytes");
    this.input = kind;
  }

  /** Past a UTF-8 byte-order mark when `bytes` starts the file; the index reading starts at. */
  private skipBom(bytes: Uint8Array): number {
    if (!this.atStart) return 0;
    if (bytes.length < 3 && BOM_BYTES.slice(0, bytes.length).every((b, i) => bytes[i] === b)) return 0;
    this.atStart = false;
    return BOM_BYTES.every((b, i) => bytes[i] === b) ? 3 : 0;
  }

  /**
   * One line of bytes, `bytes[start, nl)` (nl: the line feed, or the end of the last line): the
   * twin of readLine's number loop over bytes; anything it does not take goes to readLine as text,
   * so every rule and every bad row's reason stays in one place.
   */
  private readByteLine(bytes: Uint8Array, start: number, nl: number): void {
    if (this.toSkip > 0 || this.needHeader) return this.readDecodedLine(bytes, start, nl);
    let end = nl;
    if (end > start && bytes[end - 1] === CR) end--;
    const sep = this.sep;
    let p = skipBlankBytes(bytes, start, end);
    if (p >= end) {
      this.line++; // a blank line
      return;
    }
    if (sep >= 0) p = start;
    const n = this.count;
    if (n === this.capacity) this.grow();
    const roleOf = this.roleOf;
    const last = roleOf.length - 1;
    const comps = this.components;
    const scale = this.scale;
    const decimal = this.decimal;
    const textIds = this.textIds;
    let textId: string | null = null;
    let col = 0;
    for (; col <= last; col++) {
      if (sep < 0 ? p >= end : p > end) break;
      const role = roleOf[col];
      let fe: number;
      if (role >= 0 && (role < ROLE_ID || !textIds)) {
        const v = readNumberAtBytes(bytes, p, end, role === ROLE_ID ? POINT : decimal);
        fe = scan.end;
        const stop = fe < end ? bytes[fe] : -2;
        if (v !== v || !(stop === -2 || stop === sep || (sep < 0 && (stop === SPACE || stop === TAB)))) {
          return this.readDecodedLine(bytes, start, nl);
        }
        if (role < ROLE_X) {
          if (!(v <= MAX_STRESS && v >= -MAX_STRESS)) return this.readDecodedLine(bytes, start, nl);
          comps[6 * n + role] = v * scale;
        } else if (!(v - v === 0)) {
          return this.readDecodedLine(bytes, start, nl);
        } else if (role === ROLE_ID) this.numericIds![n] = v;
        else this.coordinates![3 * n + role - ROLE_X] = v;
      } else {
        // a field not read as a number, unquoted: its end is where the text path finds it (no
        // byte of a multi-byte character is a separator); a text id is taken when it is plain
        // printable ASCII, anything else goes to the text path
        if (bytes[p] === QUOTE) return this.readDecodedLine(bytes, start, nl);
        fe = p;
        let from = -1;
        let to = -1;
        for (; fe < end; fe++) {
          const c = bytes[fe];
          if (c === sep || (sep < 0 && (c === SPACE || c === TAB))) break;
          if (role !== ROLE_ID || c === SPACE || c === TAB) continue;
          if (c < SPACE || c >= 0x7f || c === QUOTE) return this.readDecodedLine(bytes, start, nl);
          if (from < 0) from = fe;
          to = fe + 1;
        }
        if (role === ROLE_ID) {
          // (a very long one too: fromCharCode takes its arguments on the stack)
          if (from < 0 || to - from > 4096) return this.readDecodedLine(bytes, start, nl);
          textId = String.fromCharCode(...bytes.subarray(from, to));
        }
      }
      p = sep < 0 ? skipBlankBytes(bytes, fe, end) : fe + 1;
    }
    if (col <= last) return this.readDecodedLine(bytes, start, nl);
    if (textId !== null) this.stringIds[n] = textId;
    this.line++;
    this.count = n + 1;
  }

  /** A line the byte path does not take, decoded and read by readLine (its line break left out). */
  private readDecodedLine(bytes: Uint8Array, start: number, nl: number): void {
    const text = decodeUtf8(bytes, start, nl);
    this.readLine(text, 0, text.length);
  }

  private separatorName(): PointTableSeparator {
    return this.sep === 44 ? "," : this.sep === 59 ? ";" : this.sep === 9 ? "\t" : "whitespace";
  }

  private columnLabel(col: number): string {
    const name = this.columnNames?.[col];
    const role = ROLE_NAMES[this.roleOf[col]];
    return name === undefined || name === ""
      ? `column ${col + 1} (${role})`
      : `column ${col + 1} (${role}, '${name}')`;
  }

  /** Builds the reason for a field that was refused (the slow path: only for bad rows). */
  private bad(line: number, col: number, text: string, start: number, end: number, v: number): void {
    const raw = text.slice(start, end).trim();
    const label = this.columnLabel(col);
    const role = this.roleOf[col];
    let why: string;
    if (raw === "" || raw === '""') why = "is empty";
    else if (raw.startsWith('"') && fieldText(text, start, end) === null) {
      why = `'${raw}' opens a quote that is not closed on this line`;
    } else if (v !== v) {
      const comma = this.decimal === 44;
      why =
        `'${raw}' is not a number` +
        (comma && raw.includes(".") ? " (the decimal mark is set to a comma)" : "") +
        (!comma && /^[+-]?\d+,\d+$/.test(raw) ? " (the decimal mark is set to a point)" : "");
    } else if (role < ROLE_X) why = `'${raw}' is beyond ±${MAX_INPUT_STRESS} in the unit of the table`;
    else why = `'${raw}' is not a finite number`;
    this.noteBad(line, `${label}: ${why}`);
  }

  private noteBad(line: number, reason: string): void {
    if (this.badCount < FIRST_BAD_ROWS_LIMIT) this.firstBad.push({ line, reason });
    this.badCount++;
  }

  private grow(): void {
    const cap = this.capacity * 2;
    const comps = new Float64Array(6 * cap);
    comps.set(this.components);
    this.components = comps;
    if (this.coordinates !== null) {
      const c = new Float64Array(3 * cap);
      c.set(this.coordinates);
      this.coordinates = c;
    }
    if (this.numericIds !== null) {
      const ids = new Float64Array(cap);
      ids.set(this.numericIds);
      this.numericIds = ids;
    }
    this.capacity = cap;
  }
}

/**
 * The first `length` entries of a buffer of `capacity`: a view when at most a fifth of it is unused
 * (the usual case after {@link estimateRows}: copying 80 MB for a million points costs more than
 * the spare 5 % keeps), a copy otherwise.
 */
function fitted(arr: Float64Array, length: number, capacity: number): Float64Array {
  return length >= 0.8 * capacity ? arr.subarray(0, length) : arr.slice(0, length);
}

/** Index of the first byte at or after `i` that is not a space or tab (skipBlanks over bytes). */
function skipBlankBytes(bytes: Uint8Array, i: number, end: number): number {
  while (i < end && (bytes[i] === SPACE || bytes[i] === TAB)) i++;
  return i;
}

/** Role of each column (−1: not read), up to the last mapped column; checks the mapping. */
function rolesOf(columns: PointTableOptions["columns"]): Int8Array {
  if (typeof columns !== "object" || columns === null) throw new TypeError("columns must be an object");
  const taken = new Map<number, string>();
  let last = -1;
  ROLE_KEYS.forEach((key, role) => {
    const col = (columns as Record<string, number | undefined>)[key];
    if (col === undefined && role >= ROLE_X) return;
    if (!Number.isInteger(col) || (col as number) < 0 || (col as number) > 10_000) {
      throw new RangeError(`columns.${key} must be a column index (integer from 0), got ${String(col)}`);
    }
    const other = taken.get(col as number);
    if (other !== undefined)
      throw new RangeError(`columns.${key} and columns.${other} are both column ${col}`);
    taken.set(col as number, key);
    last = Math.max(last, col as number);
  });
  const roleOf = new Int8Array(last + 1).fill(-1);
  ROLE_KEYS.forEach((key, role) => {
    const col = (columns as Record<string, number | undefined>)[key];
    if (col !== undefined) roleOf[col] = role;
  });
  return roleOf;
}

/**
 * About how many lines a text holds, from the line breaks in its first 64 kB (a few percent over,
 * so the parser's arrays are allocated once instead of grown and copied about twenty times).
 * @param text a whole table, or a file's first chunk with the file's length as `totalLength`
 */
export function estimateRows(text: string, totalLength = text.length): number {
  const sample = Math.min(text.length, 65_536);
  let breaks = 0;
  for (let i = text.indexOf(LF); i >= 0 && i < sample; i = text.indexOf(LF, i + 1)) breaks++;
  const estimate = Math.ceil(((breaks + 1) / Math.max(1, sample)) * totalLength * 1.05);
  // a row holds at least six one-digit fields and their separators: 12 characters
  return Math.min(estimate, Math.ceil(totalLength / 12) + 1);
}

/** Parses a whole text at once (see {@link PointTableParser}). */
export function parsePointTable(text: string, options: PointTableOptions): PointTable {
  const parser = new PointTableParser({
    ...options,
    expectedRows: options.expectedRows ?? estimateRows(text),
  });
  parser.push(text);
  return parser.finish();
}

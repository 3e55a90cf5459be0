/**
 * An OpenType "name" table with some names replaced (OpenType spec, "name — Naming table",
 * format 0). Used for an instanced variable face: the variable file names its default instance
 * (Source Sans 3's PostScript name is "SourceSans3-Roman", its family "Source Sans 3 ExtraLight"),
 * so both weights made from it would reach the PDF under one name; a reader that matches fonts by
 * name could then draw the bold text regular.
 *
 * Replaced names are written once, as Windows Unicode English (platform 3, encoding 1, language
 * 0x0409) UTF-16BE strings; every other record (copyright, licence, version …) is kept as it was.
 */

type NameRecord = {
  platformId: number;
  encodingId: number;
  languageId: number;
  nameId: number;
  bytes: Buffer;
};

const WINDOWS = 3;
const WINDOWS_UNICODE_BMP = 1;
const ENGLISH_US = 0x0409;
const HEADER = 6;
const RECORD = 12;

/** The records of a format-0 or format-1 name table (format 1's language tags are not kept). */
export function readNameRecords(table: Buffer): NameRecord[] {
  const count = table.readUInt16BE(2);
  const strings = table.readUInt16BE(4);
  const records: NameRecord[] = [];
  for (let i = 0; i < count; i++) {
    const at = HEADER + RECORD * i;
    const length = table.readUInt16BE(at + 8);
    const offset = table.readUInt16BE(at + 10);
    records.push({
      platformId: table.readUInt16BE(at),
      encodingId: table.readUInt16BE(at + 2),
      languageId: table.readUInt16BE(at + 4),
      nameId: table.readUInt16BE(at + 6),
      bytes: table.subarray(strings + offset, strings + offset + length),
    });
  }
  return records;
}

/** The text of name `nameId` (the Windows English record, else the first Windows one), or null. */
export function nameOf(records: readonly NameRecord[], nameId: number): string | null {
  const windows = records.filter((r) => r.nameId === nameId && r.platformId === WINDOWS);
  const record = windows.find((r) => r.languageId === ENGLISH_US) ?? windows[0];
  return record ? Buffer.from(record.bytes).swap16().toString("utf16le") : null;
}

/**
 * `table` with the names in `replace` (name id → text) written anew and the ids in `drop` left out;
 * a name id in `replace` loses its records on every platform and gets one Windows English record.
 */
export function replaceNames(
  table: Buffer,
  replace: ReadonlyMap<number, string>,
  drop: ReadonlySet<number> = new Set(),
): Buffer {
  const kept = readNameRecords(table).filter((r) => !replace.has(r.nameId) && !drop.has(r.nameId));
  const added = [...replace].map(([nameId, text]) => ({
    platformId: WINDOWS,
    encodingId: WINDOWS_UNICODE_BMP,
    languageId: ENGLISH_US,
    nameId,
    bytes: Buffer.from(text, "utf16le").swap16(),
  }));
  // Records are sorted by platform, encoding, language, then name id (the spec requires it).
  const records = [...kept, ...added].sort(
    (a, b) =>
      a.platformId - b.platformId ||
      a.encodingId - b.encodingId ||
      a.languageId - b.languageId ||
      a.nameId - b.nameId,
  );
  const strings = HEADER + RECORD * records.length;
  const out = Buffer.alloc(strings + records.reduce((sum, r) => sum + r.bytes.length, 0));
  out.writeUInt16BE(0, 0);
  out.writeUInt16BE(records.length, 2);
  out.writeUInt16BE(strings, 4);
  let offset = 0;
  records.forEach((r, i) => {
    const at = HEADER + RECORD * i;
    out.writeUInt16BE(r.platformId, at);
    out.writeUInt16BE(r.encodingId, at + 2);
    out.writeUInt16BE(r.languageId, at + 4);
    out.writeUInt16BE(r.nameId, at + 6);
    out.writeUInt16BE(r.bytes.length, at + 8);
    out.writeUInt16BE(offset, at + 10);
    r.bytes.copy(out, strings + offset);
    offset += r.bytes.length;
  });
  return out;
}

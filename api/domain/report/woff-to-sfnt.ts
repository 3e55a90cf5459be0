import { inflateSync } from "node:zlib";

/**
 * A WOFF 1.0 file unpacked to the plain TrueType/OpenType file it wraps (W3C WOFF File Format 1.0:
 * a 44-byte header, a 20-byte directory entry per table, each table zlib-compressed when that makes
 * it smaller). The report embeds @fontsource's WOFF files; unpacking them once here, with Node's
 * zlib, spares fontkit inflating the glyph table again in JavaScript for every glyph it subsets —
 * that took most of a report's time (measured: about 3 s of 4 s for a six-page draft).
 * @param drop tables to leave out (by tag), e.g. the layout tables of a face drawn without them
 */
export function woffToSfnt(woff: Buffer, drop: readonly string[] = []): Buffer {
  if (woff.toString("latin1", 0, 4) !== "wOFF") throw new RangeError("not a WOFF 1.0 file (signature wOFF)");
  const flavor = woff.readUInt32BE(4);
  const all = Array.from({ length: woff.readUInt16BE(12) }, (_, i) => {
    const at = 44 + i * 20;
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const raw = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : raw;
    if (data.length !== origLength)
      throw new RangeError(`WOFF table ${woff.toString("latin1", at, at + 4)} has the wrong length`);
    return { tag: woff.subarray(at, at + 4), checksum: woff.readUInt32BE(at + 16), data };
  });
  const tables = all.filter((t) => !drop.includes(t.tag.toString("latin1")));
  const numTables = tables.length;
  // The sfnt offset table's binary-search fields (OpenType spec, "Table directory").
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  const header = Buffer.alloc(12 + 16 * numTables);
  header.writeUInt32BE(flavor, 0);
  header.writeUInt16BE(numTables, 4);
  header.writeUInt16BE(searchRange, 6);
  header.writeUInt16BE(entrySelector, 8);
  header.writeUInt16BE(numTables * 16 - searchRange, 10);
  const bodies: Buffer[] = [];
  let offset = header.length;
  tables.forEach((t, i) => {
    const record = 12 + i * 16;
    t.tag.copy(header, record);
    header.writeUInt32BE(t.checksum, record + 4);
    header.writeUInt32BE(offset, record + 8);
    header.writeUInt32BE(t.data.length, record + 12);
    const padded = Buffer.alloc((t.data.length + 3) & ~3);
    t.data.copy(padded);
    bodies.push(padded);
    offset += padded.length;
  });
  return Buffer.concat([header, ...bodies]);
}

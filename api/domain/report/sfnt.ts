/** One table of a TrueType/OpenType file: its four-letter tag and its bytes. */
export type SfntTable = { tag: string; data: Buffer };

/** The OpenType checksum of a table: its bytes as big-endian uint32s, zero-padded, summed mod 2³². */
export function tableChecksum(data: Buffer): number {
  let sum = 0;
  for (let i = 0; i < data.length; i += 4) {
    const word =
      ((data[i] << 24) | ((data[i + 1] ?? 0) << 16) | ((data[i + 2] ?? 0) << 8) | (data[i + 3] ?? 0)) >>> 0;
    sum = (sum + word) >>> 0;
  }
  return sum;
}

/**
 * A TrueType/OpenType file from its tables (OpenType spec, "Table directory"): the offset table,
 * one 16-byte record per table in tag order, then each table padded to four bytes.
 * @param flavor the sfnt version, 0x00010000 for TrueType outlines
 * @param checksums a checksum per tag to write instead of computing it (a WOFF file carries them)
 */
export function writeSfnt(
  flavor: number,
  tables: readonly SfntTable[],
  checksums: ReadonlyMap<string, number> = new Map(),
): Buffer {
  const sorted = [...tables].sort((a, b) => (a.tag < b.tag ? -1 : a.tag > b.tag ? 1 : 0));
  const numTables = sorted.length;
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
  sorted.forEach((t, i) => {
    const record = 12 + i * 16;
    header.write(t.tag, record, 4, "latin1");
    header.writeUInt32BE(checksums.get(t.tag) ?? tableChecksum(t.data), record + 4);
    header.writeUInt32BE(offset, record + 8);
    header.writeUInt32BE(t.data.length, record + 12);
    const padded = Buffer.alloc((t.data.length + 3) & ~3);
    t.data.copy(padded);
    bodies.push(padded);
    offset += padded.length;
  });
  return Buffer.concat([header, ...bodies]);
}

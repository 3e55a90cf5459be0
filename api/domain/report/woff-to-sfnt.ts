import { inflateSync } from "node:zlib";
import { writeSfnt } from "./sfnt";

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
  const kept = all.filter((t) => !drop.includes(t.tag.toString("latin1")));
  return writeSfnt(
    flavor,
    kept.map((t) => ({ tag: t.tag.toString("latin1"), data: Buffer.from(t.data) })),
    new Map(kept.map((t) => [t.tag.toString("latin1"), t.checksum])),
  );
}

import * as fontkit from "fontkit";
import { nameOf, readNameRecords, replaceNames } from "./name-table";
import { writeSfnt, type SfntTable } from "./sfnt";

/**
 * A static TrueType file of a variable TrueType face (here a WOFF2 file of @fontsource-variable)
 * at one point of its design space, e.g. weight 400 — what a font tool's "instancer" writes.
 *
 * Why: the app ships its text face, Source Sans 3, only as a variable WOFF2, and the font engine
 * under pdfkit (fontkit 2) neither embeds it at a chosen weight (it embeds the default instance,
 * weight 200) nor subsets its composite glyphs. Here fontkit reads each glyph's outline with the
 * weight applied (gvar deltas, HVAR advances), and every glyph is written back as a simple glyph
 * (accented letters, once composites, keep their drawn shape), so the file embeds like any static
 * face. Hinting and the layout tables are left out: a PDF is not hinted, and the report draws the
 * characters typed (no ligatures) without kerning.
 */

type Point = { x: number; y: number; onCurve: boolean; endContour: boolean; copy(): Point };
type Contour = Point[];
type DecodedGlyph = {
  numberOfContours: number;
  points?: Point[];
  components?: { dx: number; dy: number }[];
  xMin?: number;
  yMax?: number;
};
type Internals = {
  variationCoords: number[] | null;
  fvar: { axis: { axisTag: string; minValue: number; defaultValue: number; maxValue: number }[] };
  _transformedGlyphs: (DecodedGlyph | undefined)[] | undefined;
  _variationProcessor: { transformPoints(gid: number, points: Point[]): void } | null;
};
type GlyphInternals = { _getContours(): Contour[]; _getPhantomPoints(glyph: unknown): Point[] };

/** The tables copied as they are; everything else is either rewritten here or left out. */
const COPIED = ["cmap", "post"] as const;

/** Name ids (OpenType "name"): family, subfamily, unique id, full name, PostScript name, typographic family and subfamily, variations PostScript prefix. */
const NAME = {
  family: 1,
  subfamily: 2,
  unique: 3,
  full: 4,
  postscript: 6,
  typoFamily: 16,
  typoSubfamily: 17,
  variationsPrefix: 25,
} as const;

/**
 * The name table of the instance: named after the face's named instance at `coords` (e.g.
 * "SemiBold"), or after its weight when no named instance sits there. The variable file names
 * only its default instance, so without this every weight would carry that one PostScript name.
 */
function instanceNames(font: fontkit.Font, coords: Readonly<Record<string, number>>): Buffer {
  const table = rawTable(font, "name");
  const records = readNameRecords(table);
  const named = Object.entries(font.namedVariations).find(([, at]) =>
    Object.entries(at).every(([axis, value]) => coords[axis.trim()] === value),
  );
  const style = named?.[0] ?? `W${Math.round(coords.wght ?? 0)}`;
  // The family without the default instance's style ("Source Sans 3 ExtraLight" → "Source Sans 3").
  const defaultStyle = nameOf(records, NAME.typoSubfamily) ?? "";
  const family =
    nameOf(records, NAME.typoFamily) ??
    (nameOf(records, NAME.family) ?? "").replace(new RegExp(` ${defaultStyle}$`), "");
  const prefix = nameOf(records, NAME.variationsPrefix) ?? font.postscriptName.split("-")[0];
  const postscript = `${prefix}-${style.replace(/[^A-Za-z0-9]/g, "")}`;
  const regular = style === "Regular";
  return replaceNames(
    table,
    new Map<number, string>([
      [NAME.family, regular ? family : `${family} ${style}`],
      [NAME.subfamily, "Regular"],
      [NAME.unique, postscript],
      [NAME.full, `${family} ${style}`],
      [NAME.postscript, postscript],
      [NAME.typoFamily, family],
      [NAME.typoSubfamily, style],
    ]),
    new Set([NAME.variationsPrefix]),
  );
}

/** The bytes of one table of `font` as stored (WOFF2 tables that are not transformed). */
function rawTable(font: fontkit.Font, tag: string): Buffer {
  const entry = font.directory.tables[tag];
  const stream = font._getTableStream(tag);
  if (!entry || !stream) throw new RangeError(`the font has no ${tag} table`);
  return Buffer.from(stream.buffer.subarray(stream.pos, stream.pos + entry.length));
}

/** A simple glyph (OpenType "glyf": header, contour ends, no instructions, flags, x and y as words). */
function encodeSimpleGlyph(contours: Contour[]): Buffer {
  const points = contours.flat();
  if (points.length === 0) return Buffer.alloc(0);
  const xs = points.map((p) => Math.round(p.x));
  const ys = points.map((p) => Math.round(p.y));
  const size = 10 + 2 * contours.length + 2 + points.length * 5;
  const out = Buffer.alloc((size + 3) & ~3);
  out.writeInt16BE(contours.length, 0);
  out.writeInt16BE(Math.min(...xs), 2);
  out.writeInt16BE(Math.min(...ys), 4);
  out.writeInt16BE(Math.max(...xs), 6);
  out.writeInt16BE(Math.max(...ys), 8);
  let at = 10;
  let end = -1;
  for (const contour of contours) {
    end += contour.length;
    out.writeUInt16BE(end, at);
    at += 2;
  }
  out.writeUInt16BE(0, at); // no instructions
  at += 2;
  // Flag 0x01: on curve; no short vectors and no repeats, so every coordinate is a signed word delta.
  for (const p of points) out.writeUInt8(p.onCurve ? 1 : 0, at++);
  for (const [values, from] of [
    [xs, at],
    [ys, at + 2 * points.length],
  ] as const) {
    let last = 0;
    values.forEach((v, i) => {
      out.writeInt16BE(v - last, from + 2 * i);
      last = v;
    });
  }
  return out;
}

/**
 * The face of `file` at `axes` (e.g. { wght: 400 }; axes not named stay at their default) as a
 * static TrueType file.
 */
export function instanceVariableFont(file: Uint8Array, axes: Readonly<Record<string, number>>): Buffer {
  // fontkit's WOFF2 reader throws decoding a composite glyph once a variation is set, so the glyph
  // table is decoded by a copy without one, then handed to the copy that applies the weight.
  const plain = fontkit.create(file);
  plain.getGlyph(0);
  const font = fontkit.create(file);
  const inner = font as unknown as Internals;
  inner.variationCoords = inner.fvar.axis.map((a) =>
    Math.max(a.minValue, Math.min(a.maxValue, axes[a.axisTag.trim()] ?? a.defaultValue)),
  );
  const decoded = (plain as unknown as Internals)._transformedGlyphs;
  const variation = inner._variationProcessor;
  if (!decoded || !variation) throw new RangeError("the font is not a variable TrueType face in WOFF2");
  inner._transformedGlyphs = decoded;

  // fontkit applies the weight (gvar) only while decoding a plain glyf table, never to glyphs read
  // from WOFF2, so it is applied here, as fontkit does for glyf: each simple glyph's points plus its
  // four phantom points, then each composite's component offsets plus its phantom points.
  decoded.forEach((g, gid) => {
    if (!g || g.numberOfContours <= 0 || !g.points) return;
    const xs = g.points.map((p) => p.x);
    const ys = g.points.map((p) => p.y);
    g.xMin = Math.min(...xs);
    g.yMax = Math.max(...ys);
    const glyph = font.getGlyph(gid) as unknown as GlyphInternals;
    variation.transformPoints(gid, [...g.points, ...glyph._getPhantomPoints(g)]);
  });
  const anyPoint = decoded.find((g) => g?.points?.length)?.points?.[0];
  if (!anyPoint) throw new RangeError("the font has no outlines");
  const PointClass = anyPoint.constructor as new (on: boolean, end: boolean, x: number, y: number) => Point;
  decoded.forEach((g, gid) => {
    if (!g || g.numberOfContours >= 0 || !g.components) return;
    const glyph = font.getGlyph(gid) as unknown as GlyphInternals;
    const points = g.components.map((c) => new PointClass(true, true, c.dx, c.dy));
    variation.transformPoints(gid, [...points, ...glyph._getPhantomPoints(g)]);
    g.components.forEach((c, i) => {
      c.dx = points[i].x;
      c.dy = points[i].y;
    });
  });

  const glyphs: Buffer[] = [];
  const advances: number[] = [];
  const bearings: number[] = [];
  let maxPoints = 0;
  let maxContours = 0;
  for (let gid = 0; gid < font.numGlyphs; gid++) {
    const glyph = font.getGlyph(gid);
    const contours = (glyph as unknown as GlyphInternals)._getContours();
    const encoded = encodeSimpleGlyph(contours);
    glyphs.push(encoded);
    advances.push(Math.round(glyph.advanceWidth));
    bearings.push(encoded.length > 0 ? encoded.readInt16BE(2) : 0);
    maxPoints = Math.max(maxPoints, contours.flat().length);
    maxContours = Math.max(maxContours, contours.length);
  }

  const loca = Buffer.alloc(4 * (glyphs.length + 1));
  let offset = 0;
  glyphs.forEach((g, i) => {
    loca.writeUInt32BE(offset, 4 * i);
    offset += g.length;
  });
  loca.writeUInt32BE(offset, 4 * glyphs.length);
  const hmtx = Buffer.alloc(4 * glyphs.length);
  advances.forEach((a, i) => {
    hmtx.writeUInt16BE(a, 4 * i);
    hmtx.writeInt16BE(bearings[i], 4 * i + 2);
  });

  const head = rawTable(font, "head");
  head.writeUInt32BE(0, 8); // checkSumAdjustment, set below
  head.writeInt16BE(1, 50); // indexToLocFormat: long offsets
  const hhea = rawTable(font, "hhea");
  hhea.writeUInt16BE(Math.max(...advances), 10); // advanceWidthMax
  hhea.writeUInt16BE(glyphs.length, 34); // numberOfHMetrics: one per glyph
  const maxp = rawTable(font, "maxp");
  if (maxp.length >= 32) {
    maxp.writeUInt16BE(maxPoints, 6);
    maxp.writeUInt16BE(maxContours, 8);
    // No composites, no instructions left.
    for (const at of [10, 12, 28, 30]) maxp.writeUInt16BE(0, at);
  }
  const os2 = rawTable(font, "OS/2");
  if (axes.wght !== undefined) os2.writeUInt16BE(Math.round(axes.wght), 4); // usWeightClass

  const tables: SfntTable[] = [
    { tag: "head", data: head },
    { tag: "hhea", data: hhea },
    { tag: "maxp", data: maxp },
    { tag: "hmtx", data: hmtx },
    { tag: "loca", data: loca },
    { tag: "glyf", data: Buffer.concat(glyphs) },
    ...COPIED.map((tag) => ({ tag, data: rawTable(font, tag) })),
    { tag: "name", data: instanceNames(font, axes) },
    { tag: "OS/2", data: os2 },
  ];
  const sfnt = writeSfnt(0x00010000, tables);
  // head.checkSumAdjustment: 0xB1B0AFBA minus the whole file's checksum (OpenType spec, "head").
  const headAt = sfnt.indexOf(Buffer.from("head", "latin1"), 12);
  const headOffset = sfnt.readUInt32BE(headAt + 8);
  let whole = 0;
  for (let i = 0; i < sfnt.length; i += 4) whole = (whole + sfnt.readUInt32BE(i)) >>> 0;
  sfnt.writeUInt32BE((0xb1b0afba - whole) >>> 0, headOffset + 8);
  return sfnt;
}

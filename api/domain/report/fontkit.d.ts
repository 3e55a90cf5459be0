/**
 * The little of fontkit (installed with pdfkit, which draws with it; no types of its own) that the
 * report reads: glyphs' outlines and advances at a chosen weight, coverage and raw tables.
 */
declare module "fontkit" {
  export type PathCommand = {
    command: "moveTo" | "lineTo" | "quadraticCurveTo" | "bezierCurveTo" | "closePath";
    args: number[];
  };
  export type Glyph = {
    id: number;
    advanceWidth: number;
    path: { commands: PathCommand[] };
  };
  export type Font = {
    numGlyphs: number;
    postscriptName: string;
    fullName: string | null;
    copyright: string | null;
    namedVariations: Record<string, Record<string, number>>;
    unitsPerEm: number;
    variationAxes: Record<string, { min: number; default: number; max: number }>;
    directory: { tables: Record<string, { offset: number; length: number } | undefined> };
    getGlyph(id: number): Glyph;
    glyphForCodePoint(codePoint: number): Glyph;
    hasGlyphForCodePoint(codePoint: number): boolean;
    getVariation(settings: Record<string, number>): Font;
    _getTableStream(tag: string): { buffer: Uint8Array; pos: number } | null;
  };
  export function create(buffer: Uint8Array, postscriptName?: string): Font;
}

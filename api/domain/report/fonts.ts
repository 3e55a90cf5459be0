import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import * as fontkit from "fontkit";
import { instanceVariableFont } from "./instance-variable-font";
import { woffToSfnt } from "./woff-to-sfnt";

/**
 * The app's own faces for the PDF, shipped with the app (no network): prose in its text face,
 * Source Sans 3, and numbers in its number face, JetBrains Mono — as on the screens. @fontsource
 * splits a face into files by script (latin, greek, latin-ext …); a line is drawn in runs, each in
 * the first file whose glyphs cover its characters (checked against each file's own character map).
 *
 * Source Sans 3 comes only as a variable WOFF2 (@fontsource-variable), which fontkit under pdfkit
 * cannot embed at a text weight: it is instanced here at 400 and 600 (instance-variable-font.ts).
 * JetBrains Mono comes as static WOFF files at 400 and 600, unpacked with woff-to-sfnt.
 */

const require = createRequire(import.meta.url);
/** The scripts the report needs, in the order a character is looked up. */
const SUBSETS = ["latin", "greek", "latin-ext"] as const;
export type Weight = "regular" | "bold";
/** Which of the app's faces a piece of text is set in: prose, or numbers (and formulas, ids, hashes). */
export type Family = "text" | "number";
const WEIGHT_VALUE: Readonly<Record<Weight, number>> = { regular: 400, bold: 600 };

/** One registered file: its pdfkit name, the characters it has glyphs for, its advances, and its bytes. */
export type FontFace = {
  name: string;
  family: Family;
  weight: Weight;
  /** The code points the file has a glyph for (its cmap). */
  covers: ReadonlySet<number>;
  /** Advance width of a code point's glyph, in em (for the text face's widths; no kerning is applied). */
  advance: (codePoint: number) => number;
  data: Buffer;
};

/**
 * The layout tables left out of the embedded faces. JetBrains Mono's GSUB draws "->", "==", "..."
 * as code ligatures, and its per-script files lack some of those glyphs (fontkit throws on them); a
 * calculation sheet writes the characters typed. Without GSUB and GPOS fontkit's shaping has nothing
 * to do, so a line's width is the sum of its glyphs' advances, which the layout here computes itself.
 */
const LAYOUT_TABLES = ["GSUB", "GPOS"] as const;

function faceOf(name: string, family: Family, weight: Weight, data: Buffer): FontFace {
  const font = fontkit.create(data) as fontkit.Font & { characterSet: number[] };
  const widths = new Map<number, number>();
  return {
    name,
    family,
    weight,
    covers: new Set(font.characterSet),
    advance: (codePoint) => {
      let width = widths.get(codePoint);
      if (width === undefined) {
        width = font.glyphForCodePoint(codePoint).advanceWidth / font.unitsPerEm;
        widths.set(codePoint, width);
      }
      return width;
    },
    data,
  };
}

let cached: FontFace[] | null = null;

/** The report's faces (read, and the text face instanced, once per process). */
export function reportFaces(): FontFace[] {
  if (cached) return cached;
  const weights = Object.keys(WEIGHT_VALUE) as Weight[];
  const text = weights.flatMap((weight) =>
    SUBSETS.map((subset) =>
      faceOf(
        `text-${weight}-${subset}`,
        "text",
        weight,
        instanceVariableFont(
          readFileSync(
            require.resolve(
              `@fontsource-variable/source-sans-3/files/source-sans-3-${subset}-wght-normal.woff2`,
            ),
          ),
          { wght: WEIGHT_VALUE[weight] },
        ),
      ),
    ),
  );
  const number = weights.flatMap((weight) =>
    SUBSETS.map((subset) =>
      faceOf(
        `number-${weight}-${subset}`,
        "number",
        weight,
        woffToSfnt(
          readFileSync(
            require.resolve(
              `@fontsource/jetbrains-mono/files/jetbrains-mono-${subset}-${WEIGHT_VALUE[weight]}-normal.woff`,
            ),
          ),
          LAYOUT_TABLES,
        ),
      ),
    ),
  );
  cached = [...text, ...number];
  return cached;
}

/**
 * What the report writes for a character that no embedded file has a glyph for (the screens get
 * these from the system's fallback fonts; a PDF must not show an empty box instead). Only used when
 * neither face carries the glyph; Source Sans 3's and JetBrains Mono's @fontsource files carry σ
 * and τ (greek) but not ∞ ≥ ≤ ✓.
 */
export const STAND_INS: Readonly<Record<string, string>> = {
  "∞": "infinite",
  "≥": ">=",
  "≤": "<=",
  "≈": "~",
  "✓": "+",
  "✗": "x",
  "→": "->",
  "√": "sqrt",
};

/** A piece of a line drawn in one file, and its width in em. */
export type Run = { font: string; text: string; em: number };

/**
 * `text` cut into runs by the file that covers each character: the family's own files first, then
 * the other family's (a glyph of the other face beats a word), then the character's stand-in.
 */
export function runsOf(
  text: string,
  family: Family,
  weight: Weight,
  faces: FontFace[] = reportFaces(),
): Run[] {
  const mine = faces.filter((f) => f.weight === weight);
  const order = [...mine.filter((f) => f.family === family), ...mine.filter((f) => f.family !== family)];
  const first = order[0];
  const runs: Run[] = [];
  const push = (face: FontFace, piece: string) => {
    let em = 0;
    for (const ch of piece) em += face.advance(ch.codePointAt(0)!);
    const last = runs[runs.length - 1];
    if (last && last.font === face.name) {
      last.text += piece;
      last.em += em;
    } else runs.push({ font: face.name, text: piece, em });
  };
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    const face = order.find((f) => f.covers.has(cp));
    if (face) push(face, ch);
    else push(first, STAND_INS[ch] ?? "?");
  }
  return runs;
}

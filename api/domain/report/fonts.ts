import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { woffToSfnt } from "./woff-to-sfnt";

/**
 * The app's own number face, JetBrains Mono from @fontsource (shipped with the app, no network),
 * for the PDF. @fontsource splits a face into files by script (latin, latin-ext, greek …), each
 * covering the code points its unicode.json names — the same ranges the browser picks files by —
 * so a line with σ in it is drawn in runs, each in the file that covers its characters.
 *
 * Why not Source Sans 3, the screens' text face: the app ships it only as a variable WOFF2, and the
 * font engine under pdfkit (fontkit 2) neither instances it at a text weight (the default instance is
 * weight 200) nor subsets its composite glyphs (it throws while embedding). JetBrains Mono comes as
 * static WOFF files at 400 and 600, which embed cleanly.
 */

const require = createRequire(import.meta.url);
const PACKAGE = "@fontsource/jetbrains-mono";
/** The scripts the report needs, in the order a character is looked up. */
const SUBSETS = ["latin", "greek", "latin-ext"] as const;
export type Weight = "regular" | "bold";
const WEIGHT_FILE: Readonly<Record<Weight, string>> = { regular: "400", bold: "600" };

/** One registered file: its pdfkit name, the code points it covers, and its bytes. */
export type FontFace = { name: string; weight: Weight; ranges: [number, number][]; data: Buffer };

/** "U+0000-00FF,U+0131" → [[0x0, 0xff], [0x131, 0x131]]. */
export function parseUnicodeRanges(text: string): [number, number][] {
  return text.split(",").map((part) => {
    const [from, to = from] = part.trim().replace(/^U\+/i, "").split("-");
    return [parseInt(from, 16), parseInt(to, 16)];
  });
}

/**
 * The layout tables left out of the embedded faces. JetBrains Mono's GSUB draws "->", "==", "..."
 * as code ligatures, and its per-script files lack some of those glyphs (fontkit throws on them); a
 * calculation sheet writes the characters typed. Without GSUB and GPOS (a monospaced face needs no
 * kerning) fontkit's shaping has nothing to do, which also makes laying out text several times faster.
 */
const LAYOUT_TABLES = ["GSUB", "GPOS"] as const;

let cached: FontFace[] | null = null;

/** The report's faces (read once per process). */
export function reportFaces(): FontFace[] {
  if (cached) return cached;
  const ranges = JSON.parse(readFileSync(require.resolve(`${PACKAGE}/unicode.json`), "utf8")) as Record<
    string,
    string
  >;
  cached = (Object.keys(WEIGHT_FILE) as Weight[]).flatMap((weight) =>
    SUBSETS.map((subset) => ({
      name: `mono-${weight}-${subset}`,
      weight,
      ranges: parseUnicodeRanges(ranges[subset]),
      data: woffToSfnt(
        readFileSync(
          require.resolve(`${PACKAGE}/files/jetbrains-mono-${subset}-${WEIGHT_FILE[weight]}-normal.woff`),
        ),
        LAYOUT_TABLES,
      ),
    })),
  );
  return cached;
}

/**
 * What the report writes for a character no embedded file carries (the screens' fonts have these
 * from the system's fallback; a PDF must not show an empty box instead).
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

function isLatin1(text: string): boolean {
  for (let i = 0; i < text.length; i++) if (text.charCodeAt(i) > 0xff) return false;
  return true;
}

/** How many characters `text` prints as: each character once, a stand-in as its own length. */
export function printedLength(text: string): number {
  if (isLatin1(text)) return text.length;
  let n = 0;
  for (const ch of text) n += STAND_INS[ch]?.length ?? 1;
  return n;
}

/** A piece of a line drawn in one file. */
export type Run = { font: string; text: string };

/** `text` cut into runs by the file that covers each character; uncovered characters become their stand-ins. */
export function runsOf(text: string, weight: Weight, faces: FontFace[] = reportFaces()): Run[] {
  const mine = faces.filter((f) => f.weight === weight);
  // Most text is Latin-1, which the first (latin) file covers whole: one run, no lookups.
  if (isLatin1(text)) return [{ font: mine[0].name, text }];
  const covers = (f: FontFace, cp: number) => f.ranges.some(([a, b]) => cp >= a && cp <= b);
  const runs: Run[] = [];
  const push = (font: string, piece: string) => {
    const last = runs[runs.length - 1];
    if (last && last.font === font) last.text += piece;
    else runs.push({ font, text: piece });
  };
  for (const ch of text) {
    const face = mine.find((f) => covers(f, ch.codePointAt(0)!));
    if (face) push(face.name, ch);
    else push(mine[0].name, STAND_INS[ch] ?? "?");
  }
  return runs;
}

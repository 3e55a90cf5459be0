import type PdfDocument from "pdfkit";
import { runsOf, type Weight } from "./fonts";

type Doc = InstanceType<typeof PdfDocument>;

/** A line's look: size in points, weight and colour. */
export type TextStyle = { size: number; weight: Weight; color: string };

/** Each face's advance per point of size. */
const advances = new WeakMap<Doc, Map<string, number>>();

/**
 * Width of `text` in points in `style`. JetBrains Mono is monospaced (every glyph of every script
 * file has the same advance), so a run's width is its character count times the face's advance,
 * measured once per face: fontkit's layout, which pdfkit does not cache when features are set,
 * would otherwise run for every word the line breaker tries.
 */
export function textWidth(doc: Doc, text: string, style: TextStyle): number {
  let perFont = advances.get(doc);
  if (!perFont) advances.set(doc, (perFont = new Map()));
  let w = 0;
  for (const run of runsOf(text, style.weight)) {
    let advance = perFont.get(run.font);
    if (advance === undefined) {
      advance = doc.font(run.font).fontSize(1000).widthOfString("0") / 1000;
      perFont.set(run.font, advance);
    }
    w += [...run.text].length * advance * style.size;
  }
  return w;
}

/**
 * Draws one line with its baseline at y, never wrapping or adding a page (the layout has decided
 * where it goes). `anchor` says whether x is the line's start, middle or end.
 */
export function drawLine(
  doc: Doc,
  text: string,
  x: number,
  y: number,
  style: TextStyle,
  anchor: "start" | "middle" | "end" = "start",
): void {
  const width = anchor === "start" ? 0 : textWidth(doc, text, style);
  let at = anchor === "start" ? x : anchor === "middle" ? x - width / 2 : x - width;
  doc.fillColor(style.color);
  for (const run of runsOf(text, style.weight)) {
    doc.font(run.font).fontSize(style.size);
    doc.text(run.text, at, y, { lineBreak: false, baseline: "alphabetic" });
    at += textWidth(doc, run.text, style);
  }
}

/** `text` broken into lines no wider than `width` (at spaces; a word wider than a line is cut). */
export function wrapText(doc: Doc, text: string, width: number, style: TextStyle): string[] {
  const lines: string[] = [];
  for (const paragraph of text.split("\n")) {
    let line = "";
    for (const word of paragraph.split(" ")) {
      const candidate = line === "" ? word : `${line} ${word}`;
      if (textWidth(doc, candidate, style) <= width) {
        line = candidate;
        continue;
      }
      if (line !== "") lines.push(line);
      line = word;
      while (textWidth(doc, line, style) > width && line.length > 1) {
        let cut = line.length - 1;
        while (cut > 1 && textWidth(doc, line.slice(0, cut), style) > width) cut--;
        lines.push(line.slice(0, cut));
        line = line.slice(cut);
      }
    }
    lines.push(line);
  }
  return lines;
}

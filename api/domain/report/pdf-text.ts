import type PdfDocument from "pdfkit";
import { printedLength, runsOf, type Weight } from "./fonts";

type Doc = InstanceType<typeof PdfDocument>;

/** A line's look: size in points, weight and colour. */
export type TextStyle = { size: number; weight: Weight; color: string };

/** JetBrains Mono's advance, the same for every glyph of every script file: 600 units per 1000 em. */
const ADVANCE_PER_EM = 0.6;

/**
 * Width of `text` in points in `style`. JetBrains Mono is monospaced (every glyph of every script
 * file the report embeds advances 600/1000 em; checked when the faces were chosen), so a line's
 * width is its printed character count times the advance — no font layout per word tried while
 * breaking lines, which took most of a large report's time.
 */
export function textWidth(_doc: Doc, text: string, style: TextStyle): number {
  return printedLength(text) * ADVANCE_PER_EM * style.size;
}

/** The colour last set on each document, so a run of lines in one colour sets it once. */
const lastColor = new WeakMap<Doc, string>();

/** Forget the remembered colour (after doc.restore(), which puts the graphics state back). */
export function colorUnknown(doc: Doc): void {
  lastColor.delete(doc);
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
  if (lastColor.get(doc) !== style.color) {
    doc.fillColor(style.color);
    lastColor.set(doc, style.color);
  }
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

import type PdfDocument from "pdfkit";
import { runsOf, type Family, type Weight } from "./fonts";

type Doc = InstanceType<typeof PdfDocument>;

/** A line's look: size in points, weight, colour, and the face — prose ("text", the default) or numbers. */
export type TextStyle = { size: number; weight: Weight; color: string; family?: Family };

/**
 * Width of `text` in points in `style`: the sum of its glyphs' advances in the files that draw it
 * (the embedded faces carry no kerning or ligatures, so this is the width pdfkit draws).
 */
export function textWidth(_doc: Doc, text: string, style: TextStyle): number {
  let em = 0;
  for (const run of runsOf(text, style.family ?? "text", style.weight)) em += run.em;
  return em * style.size;
}

/**
 * The face a value is set in: numbers (a value that starts with a digit or a signed digit, e.g.
 * "120 MPa", "−3.5", "1.52", and hex hashes) in the number face, everything else as prose.
 */
export function familyOf(text: string): Family {
  return /^\s*[−+-]?\.?\d/.test(text) || /^[0-9a-f]{16,}$/.test(text) ? "number" : "text";
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
  for (const run of runsOf(text, style.family ?? "text", style.weight)) {
    doc.font(run.font).fontSize(style.size);
    doc.text(run.text, at, y, { lineBreak: false, baseline: "alphabetic" });
    at += run.em * style.size;
  }
}

/**
 * `text` broken into lines no wider than `width` (at spaces; a word wider than a line is cut). A
 * line's width is the sum of its words' and spaces' widths (the faces carry no kerning), so each
 * word is measured once rather than the whole line again for every word tried.
 */
export function wrapText(doc: Doc, text: string, width: number, style: TextStyle): string[] {
  const lines: string[] = [];
  const space = textWidth(doc, " ", style);
  for (const paragraph of text.split("\n")) {
    let line = "";
    let lineWidth = 0;
    for (const word of paragraph.split(" ")) {
      const wordWidth = textWidth(doc, word, style);
      const candidate = line === "" ? wordWidth : lineWidth + space + wordWidth;
      if (candidate <= width) {
        line = line === "" ? word : `${line} ${word}`;
        lineWidth = candidate;
        continue;
      }
      if (line !== "") lines.push(line);
      line = word;
      lineWidth = wordWidth;
      while (lineWidth > width && line.length > 1) {
        let cut = line.length - 1;
        while (cut > 1 && textWidth(doc, line.slice(0, cut), style) > width) cut--;
        lines.push(line.slice(0, cut));
        line = line.slice(cut);
        lineWidth = textWidth(doc, line, style);
      }
    }
    lines.push(line);
  }
  return lines;
}

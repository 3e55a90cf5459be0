import PdfDocument from "pdfkit";
import type { ReportBlock, ReportColumn, ReportModel, ReportMohr, ReportSection } from "../../../core/report";
import { reportFaces } from "./fonts";
import { colorUnknown, drawLine, familyOf, textWidth, wrapText, type TextStyle } from "./pdf-text";

type Doc = InstanceType<typeof PdfDocument>;

/** Sigmacube's tokens (tailwind.config.ts), for paper. */
const COLOR = {
  graphite: "#2a2c30",
  soft: "#5b5e66",
  ink: "#1d5a55",
  inkWash: "#e3eeec",
  panel: "#fcfcfa",
  rule: "#d8d1c1",
  ruleStrong: "#b9b09c",
  pass: "#2f7446",
  close: "#85560c",
  fail: "#b02a22",
} as const;

const PAGE = { width: 595.28, height: 841.89, left: 48, right: 48, top: 52, bottom: 70 } as const;
const CONTENT_WIDTH = PAGE.width - PAGE.left - PAGE.right;

const STYLE = {
  title: { size: 17, weight: "bold", color: COLOR.ink },
  section: { size: 13, weight: "bold", color: COLOR.ink },
  heading: { size: 9.5, weight: "bold", color: COLOR.graphite },
  body: { size: 8.2, weight: "regular", color: COLOR.graphite },
  note: { size: 7.6, weight: "regular", color: COLOR.soft },
  caution: { size: 7.6, weight: "bold", color: COLOR.close },
  cell: { size: 7, weight: "regular", color: COLOR.graphite },
  numberCell: { size: 7, weight: "regular", color: COLOR.graphite, family: "number" },
  formula: { size: 8.2, weight: "regular", color: COLOR.ink, family: "number" },
  cellHead: { size: 7, weight: "bold", color: COLOR.soft },
  furniture: { size: 6.6, weight: "regular", color: COLOR.soft },
} satisfies Record<string, TextStyle>;

/** Blocks drawn between two yields to the event loop (about one case of a location section). */
const BLOCKS_PER_YIELD = 8;

const lineHeight = (s: TextStyle) => s.size * 1.35;

/** A verdict cell's colour: the word and mark carry the meaning, the colour repeats it. */
function cellColor(text: string): string {
  if (text.includes("passes")) return COLOR.pass;
  if (text.includes("close")) return COLOR.close;
  if (text.includes("fails")) return COLOR.fail;
  return COLOR.graphite;
}

/** Lays blocks down a page and starts a new one when the next piece does not fit. */
class Sheet {
  y: number = PAGE.top;
  constructor(readonly doc: Doc) {}

  /** Room for `height` points, or a new page. */
  need(height: number): void {
    if (this.y + height > PAGE.height - PAGE.bottom) this.newPage();
  }

  newPage(): void {
    this.doc.addPage();
    this.y = PAGE.top;
  }

  /** Lines of wrapped text in one style, each line placed where it fits. */
  lines(text: string, style: TextStyle, indent = 0): void {
    for (const line of wrapText(this.doc, text, CONTENT_WIDTH - indent, style)) {
      this.need(lineHeight(style));
      this.y += lineHeight(style);
      drawLine(this.doc, line, PAGE.left + indent, this.y - style.size * 0.3, style);
    }
  }

  gap(points: number): void {
    this.y += points;
  }

  rule(color: string = COLOR.rule, width = 0.5): void {
    this.doc
      .moveTo(PAGE.left, this.y)
      .lineTo(PAGE.left + CONTENT_WIDTH, this.y)
      .lineWidth(width)
      .strokeColor(color)
      .stroke();
  }
}

function drawFields(sheet: Sheet, rows: [string, string][]): void {
  const labelWidth = CONTENT_WIDTH * 0.3;
  for (const [label, value] of rows) {
    const style: TextStyle = { ...STYLE.body, family: familyOf(value) };
    const values = wrapText(sheet.doc, value, CONTENT_WIDTH - labelWidth, style);
    const height = values.length * lineHeight(STYLE.body);
    sheet.need(height);
    const top = sheet.y;
    drawLine(sheet.doc, label, PAGE.left, top + STYLE.body.size, { ...STYLE.body, color: COLOR.soft });
    values.forEach((v, i) =>
      drawLine(
        sheet.doc,
        v,
        PAGE.left + labelWidth,
        top + STYLE.body.size + i * lineHeight(STYLE.body),
        style,
      ),
    );
    sheet.y = top + height + 1;
  }
}

async function drawTable(
  sheet: Sheet,
  columns: ReportColumn[],
  rows: string[][],
  empty?: string,
): Promise<void> {
  if (rows.length === 0) {
    if (empty) sheet.lines(empty, STYLE.note);
    return;
  }
  const doc = sheet.doc;
  const total = columns.reduce((s, c) => s + c.width, 0);
  const widths = columns.map((c) => (c.width / total) * CONTENT_WIDTH);
  const pad = 3;
  // Numbers in the number face: a right-aligned column's cells, and any cell that is a number.
  const cellStyle = (text: string, i: number, style: TextStyle): TextStyle =>
    style === STYLE.cell && (columns[i].align === "right" || familyOf(text) === "number")
      ? STYLE.numberCell
      : style;
  const drawRow = (cells: string[], style: TextStyle, head: boolean) => {
    const styles = cells.map((text, i) => cellStyle(text, i, style));
    const wrapped = cells.map((text, i) => wrapText(doc, text, widths[i] - 2 * pad, styles[i]));
    const height = Math.max(...wrapped.map((w) => w.length)) * lineHeight(style) + 2 * pad;
    return { wrapped, styles, height, style, head };
  };
  const header = drawRow(
    columns.map((c) => c.title),
    STYLE.cellHead,
    true,
  );
  const paint = (row: ReturnType<typeof drawRow>) => {
    const top = sheet.y;
    let x = PAGE.left;
    row.wrapped.forEach((lines, i) => {
      const right = columns[i].align === "right";
      const color = row.head ? row.style.color : cellColor(lines.join(" "));
      lines.forEach((line, j) =>
        drawLine(
          doc,
          line,
          right ? x + widths[i] - pad : x + pad,
          top + pad + row.style.size + j * lineHeight(row.style),
          { ...row.styles[i], color },
          right ? "end" : "start",
        ),
      );
      x += widths[i];
    });
    sheet.y = top + row.height;
    sheet.rule(row.head ? COLOR.ruleStrong : COLOR.rule, row.head ? 0.8 : 0.4);
  };
  sheet.need(header.height + lineHeight(STYLE.cell) + 2 * pad);
  paint(header);
  for (let i = 0; i < rows.length; i++) {
    const row = drawRow(rows[i], STYLE.cell, false);
    if (sheet.y + row.height > PAGE.height - PAGE.bottom) {
      sheet.newPage();
      paint(header);
    }
    paint(row);
    // Long tables give the event loop back now and then, so one report never holds the server.
    if (i % 60 === 59) await yieldToEventLoop();
  }
  sheet.gap(4);
}

/** Mohr's circles from core/diagrams' geometry, scaled onto the page as vectors. */
function drawMohr(sheet: Sheet, figure: ReportMohr, caption: string): void {
  const doc = sheet.doc;
  const width = Math.min(300, CONTENT_WIDTH);
  const k = width / figure.width;
  const height = figure.height * k;
  sheet.need(height + lineHeight(STYLE.note) + 4);
  const top = sheet.y;
  doc.save();
  doc.translate(PAGE.left, top).scale(k);
  const { plot } = figure;
  doc.rect(plot.x, plot.y, plot.width, plot.height).lineWidth(0.6).strokeColor(COLOR.rule).stroke();
  doc.path(figure.halfDisks[0]).lineWidth(1.4).fillAndStroke(COLOR.inkWash, COLOR.ink);
  doc.path(figure.halfDisks[1]).lineWidth(1).fillAndStroke(COLOR.panel, COLOR.ink);
  doc.path(figure.halfDisks[2]).lineWidth(1).fillAndStroke(COLOR.panel, COLOR.ink);
  const a = figure.sigmaAxis;
  doc.moveTo(a.x1, a.y).lineTo(a.x2, a.y).lineWidth(0.8).strokeColor(COLOR.soft).stroke();
  const t = figure.tauAxis;
  if (t.x >= plot.x && t.x <= plot.x + plot.width)
    doc.moveTo(t.x, t.y1).lineTo(t.x, t.y2).lineWidth(0.8).strokeColor(COLOR.soft).stroke();
  const g = figure.maxShearGuide;
  doc
    .moveTo(g.x, g.y1)
    .lineTo(g.x, g.y2)
    .dash(3, { space: 3 })
    .lineWidth(0.8)
    .strokeColor(COLOR.soft)
    .stroke();
  doc.undash();
  const tick = { size: 10, weight: "regular", color: COLOR.soft, family: "number" } as const;
  const bottom = plot.y + plot.height;
  for (const x of figure.xTicks) {
    doc
      .moveTo(x.at, bottom)
      .lineTo(x.at, bottom + 4)
      .lineWidth(0.6)
      .strokeColor(COLOR.soft)
      .stroke();
    drawLine(doc, x.label, x.at, bottom + 15, tick, "middle");
  }
  for (const y of figure.yTicks) {
    doc
      .moveTo(plot.x - 4, y.at)
      .lineTo(plot.x, y.at)
      .lineWidth(0.6)
      .strokeColor(COLOR.soft)
      .stroke();
    drawLine(doc, y.label, plot.x - 6, y.at + 3.5, tick, "end");
  }
  drawLine(doc, figure.xTitle, plot.x + plot.width, bottom + 30, tick, "end");
  drawLine(doc, figure.yTitle, plot.x + 4, plot.y + 11, tick, "start");
  const label = { size: 12, weight: "regular", color: COLOR.graphite, family: "number" } as const;
  for (const p of figure.principal) {
    doc.circle(p.cx, p.cy, 3.2).fill(COLOR.ink);
    drawLine(doc, p.text, p.label.x, p.label.y, label, p.label.anchor);
  }
  for (const f of figure.faces) {
    doc.circle(f.cx, f.cy, 4.5).lineWidth(1.4).fillAndStroke(COLOR.panel, COLOR.graphite);
    drawLine(doc, f.text, f.label.x, f.label.y, label, f.label.anchor);
  }
  drawLine(
    doc,
    figure.maxShear.text,
    figure.maxShear.label.x,
    figure.maxShear.label.y,
    label,
    figure.maxShear.label.anchor,
  );
  doc.restore();
  colorUnknown(doc);
  sheet.y = top + height;
  sheet.lines(caption, STYLE.note);
  sheet.gap(4);
}

async function drawBlock(sheet: Sheet, block: ReportBlock): Promise<void> {
  switch (block.kind) {
    case "heading":
      sheet.need(lineHeight(STYLE.heading) * 3);
      sheet.gap(5);
      sheet.lines(block.text, STYLE.heading);
      sheet.gap(1);
      return;
    case "paragraph":
      sheet.lines(
        block.text,
        block.tone === "caution" ? STYLE.caution : block.tone === "note" ? STYLE.note : STYLE.body,
      );
      sheet.gap(3);
      return;
    case "fields":
      drawFields(sheet, block.rows);
      sheet.gap(3);
      return;
    case "table":
      await drawTable(sheet, block.columns, block.rows, block.empty);
      return;
    case "formulas":
      for (const line of block.lines) sheet.lines(line, STYLE.formula, 12);
      sheet.lines(`Source: ${block.source}.`, STYLE.note, 12);
      sheet.gap(2);
      return;
    case "list":
      for (const item of block.items) sheet.lines(`– ${item}`, STYLE.body, 6);
      sheet.gap(3);
      return;
    case "mohr":
      drawMohr(sheet, block.figure, block.caption);
      return;
  }
}

async function drawSection(sheet: Sheet, section: ReportSection, first: boolean): Promise<void> {
  if (section.pageBreakBefore && !first) sheet.newPage();
  else sheet.need(lineHeight(STYLE.section) * 4);
  sheet.gap(first ? 0 : 8);
  sheet.lines(section.title, first ? STYLE.title : STYLE.section);
  sheet.gap(2);
  sheet.rule(COLOR.ink, 0.8);
  sheet.gap(4);
  for (const [i, block] of section.blocks.entries()) {
    await drawBlock(sheet, block);
    // A location with many cases is a long section: give the event loop back every few blocks.
    if (i % BLOCKS_PER_YIELD === BLOCKS_PER_YIELD - 1) await yieldToEventLoop();
  }
}

/** Every page: the caution, the record (or draft) it belongs to and "page n of m"; a draft's watermark. */
function drawPageFurniture(doc: Doc, model: ReportModel): void {
  const range = doc.bufferedPageRange();
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i);
    if (model.watermark) {
      doc.save();
      doc.opacity(0.13);
      doc.rotate(-40, { origin: [PAGE.width / 2, PAGE.height / 2] });
      drawLine(
        doc,
        model.watermark,
        PAGE.width / 2,
        PAGE.height / 2 + 14,
        { size: 46, weight: "bold", color: COLOR.fail },
        "middle",
      );
      doc.restore();
      colorUnknown(doc);
    }
    const base = PAGE.height - PAGE.bottom + 18;
    doc
      .moveTo(PAGE.left, base - 10)
      .lineTo(PAGE.width - PAGE.right, base - 10)
      .lineWidth(0.5)
      .strokeColor(COLOR.rule)
      .stroke();
    for (const [j, line] of wrapText(
      doc,
      `Caution: ${model.caution}`,
      CONTENT_WIDTH,
      STYLE.furniture,
    ).entries())
      drawLine(doc, line, PAGE.left, base + j * lineHeight(STYLE.furniture), STYLE.furniture);
    const y = base + 3 * lineHeight(STYLE.furniture);
    const pageText = `page ${i + 1} of ${range.count}`;
    const idWidth = CONTENT_WIDTH - textWidth(doc, pageText, STYLE.furniture) - 12;
    drawLine(
      doc,
      wrapText(doc, model.pageIdentifier, idWidth, STYLE.furniture)[0],
      PAGE.left,
      y,
      STYLE.furniture,
    );
    drawLine(doc, pageText, PAGE.width - PAGE.right, y, STYLE.furniture, "end");
  }
}

/** Lets other requests run between pieces of a large report. */
export function yieldToEventLoop(): Promise<void> {
  return new Promise((resolve) => setImmediate(resolve));
}

/**
 * The report as a PDF (A4), with the app's own faces embedded (prose in Source Sans 3, numbers in
 * JetBrains Mono) and every diagram drawn as vectors.
 * Deterministic: the document's dates are the content's `takenAt` and nothing random goes in, so
 * the same model always gives the same bytes. Yields to the event loop between sections and every
 * 60 table rows.
 */
export async function renderReportPdf(model: ReportModel): Promise<Buffer> {
  const taken = new Date(model.takenAt);
  const doc = new PdfDocument({
    size: [PAGE.width, PAGE.height],
    margin: 0,
    bufferPages: true,
    autoFirstPage: true,
    info: {
      Title: model.title,
      Subject: model.pageIdentifier,
      Creator: "Sigmacube",
      Producer: "Sigmacube",
      CreationDate: taken,
      ModDate: taken,
    },
  });
  const chunks: Buffer[] = [];
  doc.on("data", (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  for (const face of reportFaces()) doc.registerFont(face.name, face.data);
  const sheet = new Sheet(doc);
  for (const [i, section] of model.sections.entries()) {
    await drawSection(sheet, section, i === 0);
    await yieldToEventLoop();
  }
  drawPageFurniture(doc, model);
  doc.end();
  return done;
}

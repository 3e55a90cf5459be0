import type { ReportMohr } from "./mohr-figure";

/**
 * The report as blocks that both the PDF renderer and the print page draw one by one, so the two
 * say the same thing in the same order: text, label–value fields, tables, formulas and figures.
 * Every string is final (numbers formatted, units written); the drawers only lay them out.
 */
export type ReportColumn = {
  title: string;
  /** Numbers align right, in the mono face. */
  align: "left" | "right";
  /** Share of the table's width (the drawers scale the shares to the page). */
  width: number;
};

export type ReportBlock =
  | { kind: "heading"; text: string }
  | { kind: "paragraph"; text: string; tone?: "plain" | "note" | "caution" }
  | { kind: "fields"; rows: [label: string, value: string][] }
  | { kind: "table"; columns: ReportColumn[]; rows: string[][]; empty?: string }
  | { kind: "formulas"; lines: string[]; source: string }
  | { kind: "list"; items: string[] }
  | { kind: "mohr"; figure: ReportMohr; caption: string };

export type ReportSection = {
  /** Stable id (anchors, test ids): "cover", "scope", "inputs", "method", "location-1", … */
  id: string;
  title: string;
  /** Starts a new page in print (the cover, and each location section). */
  pageBreakBefore: boolean;
  blocks: ReportBlock[];
};

import { formatFactor } from "../contract/comparison";
import { CRITERION_LABELS } from "../contract/projects";
import type { RecordContent } from "../contract/records";
import { fixed } from "../diagrams";
import { convertStress } from "../units/stress";
import type { ReportBlock, ReportSection } from "./blocks";
import { percentText, stressText } from "./format";
import { VERDICT_TEXT } from "./location-sections";

/**
 * The sections that stand beside the comparison's rows, as the record froze them: each stress
 * classification line (linearization) with its category checks, and each finite-element point
 * table with its governing point per criterion. A record frozen before a section existed has
 * none, and the report leaves that section out.
 */

/** "Pm ≤ S" checks of each saved line, each with its verdict and its source. */
export function linearizationSection(content: RecordContent): ReportSection | null {
  const lines = content.results.linearizations ?? [];
  if (lines.length === 0) return null;
  const blocks: ReportBlock[] = [
    {
      kind: "paragraph",
      text: "Each saved stress classification line through the wall: its stresses linearized into membrane (M), bending (B) and peak parts, and each category's equivalent stress checked against its allowable. Values in the line's own stress unit.",
    },
  ];
  for (const line of lines) {
    const unit = line.stressUnit;
    const text = (v: number) => stressText(convertStress(v, unit, "Pa"), unit);
    blocks.push(
      { kind: "heading", text: `${line.name} — ${line.caseName}` },
      {
        kind: "fields",
        rows: [
          ["Load case", line.caseName],
          ["Location", line.locationName ?? "none (not tied to a location)"],
          ["Classification", line.category],
          ["Equivalent stress", line.equivalent === "tresca" ? "Tresca (stress intensity)" : "von Mises"],
          ["Governing check", line.governingRule ?? "none made"],
        ],
      },
      {
        kind: "table",
        columns: [
          { title: "Check", align: "left", width: 2.4 },
          { title: `Value, ${unit}`, align: "right", width: 1.3 },
          { title: `Limit, ${unit}`, align: "right", width: 1.3 },
          { title: "Ratio", align: "right", width: 1 },
          { title: "Verdict", align: "left", width: 1.3 },
          { title: "Source", align: "left", width: 4 },
        ],
        rows: line.checks.map((k) => [
          k.rule,
          text(k.value),
          text(k.limit),
          fixed(k.ratio, 2),
          VERDICT_TEXT[k.verdict],
          k.source,
        ]),
        empty: "No check could be made (an allowable is missing).",
      },
    );
  }
  return { id: "linearizations", title: "Stress classification lines", pageBreakBefore: true, blocks };
}

/** "(12.5, 0, 3.25)", or "—" for a table without coordinates. */
function positionText(p: { x: number | null; y: number | null; z: number | null }): string {
  if (p.x === null || p.y === null || p.z === null) return "—";
  return `(${[p.x, p.y, p.z].map((v) => String(Number(v.toPrecision(6)))).join(", ")})`;
}

/** Each point table: its file, how many points, and per criterion the point that governs. */
export function pointTableSection(content: RecordContent): ReportSection | null {
  const tables = content.results.pointTables ?? [];
  if (tables.length === 0) return null;
  const hashes = new Map((content.pointTableFiles ?? []).map((f) => [f.tableId, f.sha256]));
  const blocks: ReportBlock[] = [
    {
      kind: "paragraph",
      text: "Each finite-element point table of a load case, rated point by point; per criterion the point with the highest utilisation governs the table and competes for the comparison's governing case. Coordinates as in the file.",
    },
  ];
  for (const t of tables) {
    blocks.push(
      { kind: "heading", text: `${t.fileName} — ${t.caseName}` },
      {
        kind: "fields",
        rows: [
          ["File", t.fileName],
          ["SHA-256", hashes.get(t.tableId) ?? "not recorded"],
          ["Points", String(t.pointCount)],
          ["Load case", `${t.caseName} (${t.category})`],
          ["Material", t.material.note ? `${t.material.label} (${t.material.note})` : t.material.label],
        ],
      },
      {
        kind: "table",
        columns: [
          { title: "Criterion", align: "left", width: 2 },
          { title: "Governing point", align: "left", width: 1.6 },
          { title: "Position", align: "left", width: 2.6 },
          { title: "n", align: "right", width: 1 },
          { title: "Required", align: "right", width: 1 },
          { title: "Utilisation", align: "right", width: 1.3 },
          { title: "Verdict", align: "left", width: 1.4 },
          { title: "Failing / close", align: "right", width: 1.4 },
        ],
        rows: t.perCriterion.map((c) => [
          CRITERION_LABELS[c.criterion],
          c.governing ? String(c.governing.id) : c.status === "not-applicable" ? "n/a" : "—",
          c.governing ? positionText(c.governing) : "",
          c.status === "evaluated" ? formatFactor(c.factor) : "",
          fixed(c.requiredFactor, 2),
          c.utilisation === null ? "" : percentText(c.utilisation),
          c.verdict ? VERDICT_TEXT[c.verdict] : (c.reason ?? "not rated"),
          `${c.countFail} / ${c.countClose}`,
        ]),
        empty: "The table was not rated.",
      },
    );
  }
  return { id: "point-tables", title: "Finite-element point tables", pageBreakBefore: true, blocks };
}

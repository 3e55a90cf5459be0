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
 * classification line (linearization) with where it runs, its equivalent stresses at both ends
 * and its category checks, and each finite-element point
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
  const ends = new Map((content.linearizationEnds ?? []).map((e) => [e.id, e]));
  for (const line of lines) {
    const unit = line.stressUnit;
    const text = (v: number) => stressText(convertStress(v, unit, "Pa"), unit);
    const where = ends.get(line.id);
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
          ...(where
            ? ([
                [
                  "Line",
                  `from ${positionText(where.start)} to ${positionText(where.end)} ${where.lengthUnit}; thickness ${numberText(where.thickness)} ${where.lengthUnit}; ${where.pointCount} points`,
                ],
              ] as [string, string][])
            : []),
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
    if (where) {
      const e = where.equivalent;
      const all = [
        e.membrane,
        e.membranePlusBending.start,
        e.membranePlusBending.end,
        e.peak.start,
        e.peak.end,
      ];
      const aligned = (v: number) =>
        stressText(
          convertStress(v, unit, "Pa"),
          unit,
          all.map((a) => convertStress(a, unit, "Pa")),
        );
      blocks.push({
        kind: "table",
        columns: [
          { title: `Equivalent stress (${e.label})`, align: "left", width: 3 },
          { title: `At the start, ${unit}`, align: "right", width: 1.6 },
          { title: `At the end, ${unit}`, align: "right", width: 1.6 },
        ],
        rows: [
          ["Membrane (M)", aligned(e.membrane), aligned(e.membrane)],
          [
            "Membrane + bending (M + B)",
            aligned(e.membranePlusBending.start),
            aligned(e.membranePlusBending.end),
          ],
          ["Peak", aligned(e.peak.start), aligned(e.peak.end)],
        ],
      });
    }
  }
  return { id: "linearizations", title: "Stress classification lines", pageBreakBefore: true, blocks };
}

/** A length or coordinate to six significant figures, without trailing zeros: "12.5", "0", "3.25". */
function numberText(v: number): string {
  return String(Number(v.toPrecision(6)));
}

/** "(12.5, 0, 3.25)" for coordinates, "d = 4.2" for a distance along the line. */
function positionText(p: readonly number[]): string {
  return p.length === 1 ? `d = ${numberText(p[0])}` : `(${p.map(numberText).join(", ")})`;
}

/** A governing point's place, or "—" for a table without coordinates. */
function pointPositionText(p: { x: number | null; y: number | null; z: number | null }): string {
  return p.x === null || p.y === null || p.z === null ? "—" : positionText([p.x, p.y, p.z]);
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
          c.governing ? pointPositionText(c.governing) : "",
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

import { formatFactor, type ComparisonCheck, type ComparisonRowView } from "../contract/comparison";
import { CRITERION_LABELS } from "../contract/projects";
import type { RecordContent } from "../contract/records";
import { principalStresses } from "../tensor/principal";
import { convertStress, type StressUnit } from "../units/stress";
import type { ReportBlock, ReportSection } from "./blocks";
import { cosineText, percentText, stressText } from "./format";
import { reportMohr } from "./mohr-figure";

/** Verdicts as the screens write them: a mark and a word, never a colour alone. */
export const VERDICT_TEXT = { pass: "✓ passes", close: "≈ close", fail: "✗ fails" } as const;

/**
 * Two principal stresses closer than this share of the state's size are treated as repeated: their
 * directions are then any orthonormal pair in their plane, and the report says so.
 */
const REPEATED_REL = 1e-9;

/** One check in a table row: criterion, required factor and where it comes from, factor, utilisation, verdict. */
export function checkCells(check: ComparisonCheck): string[] {
  const label = CRITERION_LABELS[check.criterion];
  const from = check.category === null ? "default" : `“${check.category}”`;
  const required = `${check.requiredFactor} (${from})`;
  if (check.status === "evaluated") {
    const verdict =
      VERDICT_TEXT[check.verdict] + (check.unsuited ? ` (rated though unsuited: ${check.unsuited})` : "");
    return [label, required, formatFactor(check.factor), percentText(check.utilisation), verdict];
  }
  const why =
    check.status === "not-evaluated" && check.missing.length > 0
      ? `not evaluated: needs ${check.missing.join(", ")}`
      : `${check.status === "not-evaluated" ? "not evaluated" : "not applicable"}: ${check.reason}`;
  return [label, required, "—", "—", why];
}

function principalBlocks(row: ComparisonRowView, unit: StressUnit): ReportBlock[] {
  const { values, directions } = principalStresses(row.componentsPa);
  const size = Math.max(...values.map(Math.abs), 1e-300);
  const repeated = [
    [0, 1],
    [1, 2],
  ].filter(([i, j]) => Math.abs(values[i] - values[j]) <= REPEATED_REL * size);
  const blocks: ReportBlock[] = [
    {
      kind: "table",
      columns: [
        { title: "Principal", align: "left", width: 2 },
        { title: `Stress, ${unit}`, align: "right", width: 2 },
        { title: "Direction (x, y, z)", align: "right", width: 5 },
      ],
      rows: row.principalPa.map((v, i) => [
        `σ${i + 1}`,
        stressText(v, unit, row.principalPa),
        `(${directions[i].map(cosineText).join(", ")})`,
      ]),
    },
  ];
  if (repeated.length > 0) {
    blocks.push({
      kind: "paragraph",
      tone: "note",
      text: `${repeated.map(([i, j]) => `σ${i + 1} = σ${j + 1}`).join(" and ")}: any direction in the plane of the repeated pair is principal; the directions shown are one such choice.`,
    });
  }
  return blocks;
}

function rowBlocks(row: ComparisonRowView, unit: StressUnit): ReportBlock[] {
  const c = row.componentsPa;
  const inUnit = (pa: number) => convertStress(pa, "Pa", unit);
  const derived = [row.vonMisesPa, row.trescaPa, row.maxShearPa];
  const kind = row.kind === "combination" ? "combination" : `load case, category “${row.category || "none"}”`;
  const revision = row.stateRevision === null ? "" : `, state revision ${row.stateRevision}`;
  return [
    { kind: "heading", text: row.caseName },
    {
      kind: "paragraph",
      text: `${kind}${revision}; material ${row.material.label}; checked against ${row.allowable.label}.`,
    },
    {
      kind: "table",
      columns: ["σx", "σy", "σz", "τxy", "τyz", "τzx"].map((title) => ({
        title: `${title}, ${unit}`,
        align: "right" as const,
        width: 1,
      })),
      rows: [[c.xx, c.yy, c.zz, c.xy, c.yz, c.zx].map((v, _i, all) => stressText(v, unit, all))],
    },
    ...principalBlocks(row, unit),
    {
      kind: "fields",
      rows: [
        ["von Mises stress σvm", `${stressText(row.vonMisesPa, unit, derived)} ${unit}`],
        ["Tresca stress σ1 − σ3", `${stressText(row.trescaPa, unit, derived)} ${unit}`],
        ["Maximum shear τmax", `${stressText(row.maxShearPa, unit, derived)} ${unit}`],
      ],
    },
    {
      kind: "mohr",
      figure: reportMohr(
        [inUnit(row.principalPa[0]), inUnit(row.principalPa[1]), inUnit(row.principalPa[2])],
        {
          xx: inUnit(c.xx),
          yy: inUnit(c.yy),
          zz: inUnit(c.zz),
          xy: inUnit(c.xy),
          yz: inUnit(c.yz),
          zx: inUnit(c.zx),
        },
        unit,
      ),
      caption: `Mohr's circles of ${row.caseName} at ${row.locationName} (x, y, z: the element's faces), ${unit}.`,
    },
    {
      kind: "table",
      columns: [
        { title: "Criterion", align: "left", width: 2.4 },
        { title: "Required n", align: "right", width: 2 },
        { title: "n", align: "right", width: 1.2 },
        { title: "Utilisation", align: "right", width: 1.6 },
        { title: "Verdict", align: "left", width: 4 },
      ],
      rows: row.checks.map(checkCells),
      empty: "No criterion is checked.",
    },
  ];
}

/** One section per location, in the order of the project's locations: each case's state, principal stresses, Mohr diagram and checks. */
export function locationSections(content: RecordContent, unit: StressUnit): ReportSection[] {
  const rows = content.results.rows;
  const order = content.inputs.locations.map((l) => content.ids.locations[l.key]);
  const ids = [...new Set([...order, ...rows.map((r) => r.locationId)])];
  return ids.flatMap((id, i) => {
    const here = rows.filter((r) => r.locationId === id);
    const location = content.inputs.locations.find((l) => content.ids.locations[l.key] === id);
    const name = location?.name ?? here[0]?.locationName;
    if (name === undefined) return [];
    const blocks: ReportBlock[] = [];
    if (location?.note) blocks.push({ kind: "paragraph", tone: "note", text: location.note });
    if (here.length === 0)
      blocks.push({ kind: "paragraph", text: "No load case or combination has a state at this location." });
    for (const row of here) blocks.push(...rowBlocks(row, unit));
    return [{ id: `location-${i + 1}`, title: `Location: ${name}`, pageBreakBefore: true, blocks }];
  });
}

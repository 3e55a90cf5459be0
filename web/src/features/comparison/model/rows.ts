import { convertStress } from "../../../../../core";
import type { Comparison, ComparisonCheck, ComparisonRowView } from "../../../../../core/contract/comparison";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { CRITERION_LABELS, type CriterionName } from "../../../../../core/contract/projects";

/** How a row governs: for which criteria overall, and for which at its own location. */
export type GoverningMarks = { overall: CriterionName[]; atLocation: CriterionName[] };

/** Which rows govern, by row id. */
export function governingMarks(comparison: Comparison): Map<string, GoverningMarks> {
  const marks = new Map<string, GoverningMarks>();
  const mark = (rowId: string) => {
    if (!marks.has(rowId)) marks.set(rowId, { overall: [], atLocation: [] });
    return marks.get(rowId)!;
  };
  for (const g of comparison.governing) mark(g.rowId).overall.push(g.criterion);
  for (const l of comparison.governingByLocation)
    for (const g of l.governing) mark(g.rowId).atLocation.push(g.criterion);
  return marks;
}

/** The check of `criterion` on a row, if the project requires it. */
export const checkOf = (row: ComparisonRowView, criterion: CriterionName): ComparisonCheck | undefined =>
  row.checks.find((c) => c.criterion === criterion);

/** A stress of the row in the display unit. */
export const inUnit = (pa: number, unit: StressUnitName) => convertStress(pa, "Pa", unit);

/**
 * The comparison as spreadsheet rows: one header, then one line per row with stresses in
 * `unit` and, per required criterion, the factor, utilisation and verdict; then the summary
 * line and the cautions. Names are left as typed; lib/csv escapes anything a spreadsheet
 * would read as a formula.
 */
export function comparisonTable(comparison: Comparison, unit: StressUnitName): (string | number | null)[][] {
  const criteria = comparison.requirements.map((r) => r.criterion);
  const header = [
    "case or combination",
    "kind",
    "category",
    "location",
    "material",
    `σ1 (${unit})`,
    `σ2 (${unit})`,
    `σ3 (${unit})`,
    `von Mises (${unit})`,
    `Tresca σ1−σ3 (${unit})`,
    `τmax (${unit})`,
    ...criteria.flatMap((c) => [
      `${CRITERION_LABELS[c]} SF`,
      `${CRITERION_LABELS[c]} required`,
      `${CRITERION_LABELS[c]} utilisation`,
      `${CRITERION_LABELS[c]} verdict`,
    ]),
  ];
  const lines = comparison.rows.map((r) => [
    r.caseName,
    r.kind,
    r.category,
    r.locationName,
    r.material.label,
    inUnit(r.principalPa[0], unit),
    inUnit(r.principalPa[1], unit),
    inUnit(r.principalPa[2], unit),
    inUnit(r.vonMisesPa, unit),
    inUnit(r.trescaPa, unit),
    inUnit(r.maxShearPa, unit),
    ...criteria.flatMap((c) => {
      const check = checkOf(r, c);
      if (!check) return [null, null, null, null];
      if (check.status === "not-evaluated")
        return [null, check.requiredFactor, null, `not evaluated: needs ${check.missing.join(", ")}`];
      return [check.factor ?? Infinity, check.requiredFactor, check.utilisation, check.verdict];
    }),
  ]);
  // Below the table, as a calculation sheet would have it: what governs, then the cautions,
  // so a copy that travels without the screen still carries them.
  const footer = [
    [],
    [comparison.summary ?? "governs: nothing could be evaluated"],
    ...comparison.cautions.map((c) => [c]),
  ];
  return [header, ...lines, ...footer];
}

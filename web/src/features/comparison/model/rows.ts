import type { Comparison, ComparisonCheck, ComparisonRowView } from "../../../../../core/contract/comparison";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { CRITERION_LABELS, type CriterionName } from "../../../../../core/contract/projects";
import { stressInUnit as inUnit } from "../../../lib/stress";

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

/** Significant figures of the stresses in the CSV, counted from the row's largest principal stress. */
export const CSV_STRESS_FIGURES = 6;
/** Significant figures of safety factors and utilisations in the CSV. */
export const CSV_FACTOR_FIGURES = 4;

/**
 * `value` rounded to `figures` significant figures of `scale` (the largest magnitude it is read
 * against), so float noise on a zero (4.59e-15 beside 100) becomes 0 and 79.99999999999999
 * becomes 80; a negative zero is written 0.
 */
export function roundToScale(value: number, scale: number, figures: number): number {
  if (!Number.isFinite(value)) return value;
  const s = Math.abs(scale) > 0 && Number.isFinite(scale) ? Math.abs(scale) : Math.abs(value);
  if (s === 0) return 0;
  const decimals = figures - 1 - Math.floor(Math.log10(s));
  const rounded =
    decimals >= 0
      ? Number(value.toFixed(Math.min(decimals, 100)))
      : Math.round(value / 10 ** -decimals) * 10 ** -decimals;
  return rounded === 0 ? 0 : rounded;
}

/** A factor or utilisation as the CSV writes it: CSV_FACTOR_FIGURES significant figures, no −0. */
const factorCell = (v: number) => roundToScale(v, v, CSV_FACTOR_FIGURES);

/** How a check that was not rated reads in a cell. */
function notRated(check: Exclude<ComparisonCheck, { status: "evaluated" }>): string {
  return check.status === "not-applicable"
    ? `not applicable to this material: ${check.reason}`
    : `not evaluated: ${check.reason}`;
}

/**
 * The comparison as spreadsheet rows: one header (every quantity with its unit), then one
 * line per row with stresses in `unit` rounded to CSV_STRESS_FIGURES significant figures of
 * the row's largest principal stress and, per required criterion, the factor, the factor
 * required (and which allowables it came from), utilisation and verdict, rounded to
 * CSV_FACTOR_FIGURES significant figures; then the summary line, the rounding rule and the
 * cautions. Names are left as typed; lib/csv escapes anything a spreadsheet would read as a formula.
 */
export function comparisonTable(comparison: Comparison, unit: StressUnitName): (string | number | null)[][] {
  const criteria = comparison.requirements.map((r) => r.criterion);
  const header = [
    "case or combination",
    "kind",
    "category",
    "allowables used",
    "location",
    "material",
    `σ1 (${unit})`,
    `σ2 (${unit})`,
    `σ3 (${unit})`,
    `von Mises (${unit})`,
    `Tresca σ1−σ3 (${unit})`,
    `τmax = (σ1−σ3)/2 (${unit})`,
    ...criteria.flatMap((c) => [
      `${CRITERION_LABELS[c]} SF (dimensionless)`,
      `${CRITERION_LABELS[c]} required SF (dimensionless)`,
      `${CRITERION_LABELS[c]} utilisation (dimensionless)`,
      `${CRITERION_LABELS[c]} verdict`,
    ]),
  ];
  const lines = comparison.rows.map((r) => {
    const scale = Math.max(...r.principalPa.map((v) => Math.abs(inUnit(v, unit))));
    const stress = (pa: number) => roundToScale(inUnit(pa, unit), scale, CSV_STRESS_FIGURES);
    return [
      r.caseName,
      r.kind,
      r.category,
      r.allowable.label,
      r.locationName,
      r.material.label,
      stress(r.principalPa[0]),
      stress(r.principalPa[1]),
      stress(r.principalPa[2]),
      stress(r.vonMisesPa),
      stress(r.trescaPa),
      stress(r.maxShearPa),
      ...criteria.flatMap((c) => {
        const check = checkOf(r, c);
        if (!check) return [null, null, null, null];
        if (check.status !== "evaluated") return [null, check.requiredFactor, null, notRated(check)];
        return [
          check.factor === null ? Infinity : factorCell(check.factor),
          check.requiredFactor,
          factorCell(check.utilisation),
          check.verdict,
        ];
      }),
    ];
  });
  // Below the table, as a calculation sheet would have it: what governs, how the numbers are
  // rounded, then the cautions, so a copy that travels without the screen still carries them.
  const footer = [
    [],
    [comparison.summary ?? "governs: nothing could be evaluated"],
    [
      `Stresses in ${unit}, rounded to ${CSV_STRESS_FIGURES} significant figures of each row's largest principal stress; safety factors and utilisations rounded to ${CSV_FACTOR_FIGURES} significant figures; "inf": the state never reaches the criterion.`,
    ],
    ...comparison.cautions.map((c) => [c]),
  ];
  return [header, ...lines, ...footer];
}

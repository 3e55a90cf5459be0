/**
 * The comparison table's model, without React: which columns there are (header, numeric or not,
 * the value each sorts and filters by), how rows are filtered (free text, kind, location, worst
 * verdict) and what a row carries to the bench. ComparisonTable hands these to TanStack Table,
 * which keeps the sort and filter state; every rule lives here (stresses are written by lib/stress).
 */
import type { ComparisonRowView } from "../../../../../core/contract/comparison";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { CRITERION_LABELS, type CriterionName } from "../../../../../core/contract/projects";
import { editableStress } from "../../../lib/stress";
import { checkOf } from "./rows";

type Row = ComparisonRowView;

/** Worst verdict of a row over its evaluated checks; "" when none was evaluated. */
export type WorstVerdict = "fail" | "close" | "pass" | "";

/**
 * One column: its id, header, whether it holds numbers (right-aligned, sorted largest first on the
 * first click), the value it sorts and filters by, how two rows compare when the value is not what
 * reads (locations sort by name), whether it filters by equality, and whether it is shown.
 */
export type ColumnSpec = {
  id: string;
  header: string;
  numeric: boolean;
  /** null: a column with no value (the bench link) that neither sorts nor filters */
  value: ((row: Row) => string | number) | null;
  compare?: (a: Row, b: Row) => number;
  filter?: "equals";
  hidden?: boolean;
  /** the criterion of a utilisation column */
  criterion?: CriterionName;
};

/** The utilisation a column of `criterion` sorts by, with "not evaluated" (−1) after every rated row. */
export function utilisationOf(row: Row, criterion: CriterionName): number {
  const check = checkOf(row, criterion);
  return check?.status === "evaluated" ? check.utilisation : -1;
}

/** The row's worst verdict over its evaluated checks ("" when none was evaluated). */
export function worstVerdict(row: Row): WorstVerdict {
  const verdicts = row.checks.flatMap((c) => (c.status === "evaluated" ? [c.verdict] : []));
  return verdicts.includes("fail")
    ? "fail"
    : verdicts.includes("close")
      ? "close"
      : verdicts.length
        ? "pass"
        : "";
}

/** True when the free-text filter (any letter case) is found in the row's case, location, category or material. */
export function matchesText(row: Row, text: string): boolean {
  return `${row.caseName} ${row.locationName} ${row.category} ${row.material.label}`
    .toLowerCase()
    .includes(text.toLowerCase());
}

/** True when an equality filter keeps the row: no filter (empty), or the column's value equals it. */
export function matchesEquals(spec: ColumnSpec, row: Row, wanted: string | undefined): boolean {
  if (!wanted || !spec.value) return true;
  return String(spec.value(row)) === wanted;
}

/** The locations of the rows, once each in the order they first appear: [id, name]. */
export function locationOptions(rows: readonly Row[]): [string, string][] {
  return [...new Map(rows.map((r) => [r.locationId, r.locationName])).entries()];
}

/** The kind filter's choices: value and words. */
export const KIND_OPTIONS = [
  ["", "all"],
  ["load-case", "load cases"],
  ["combination", "combinations"],
] as const;

/** The verdict filter's choices, worst first. */
export const VERDICT_OPTIONS = [
  ["", "all"],
  ["fail", "fails"],
  ["close", "close"],
  ["pass", "passes"],
] as const;

/** Columns hidden from view that exist to be filtered on. */
export const HIDDEN_COLUMNS = { kind: false, verdict: false } as const;

/** Subscript digits for σ₁ σ₂ σ₃ in headers. */
const SUB = ["₁", "₂", "₃"] as const;

/**
 * The table's columns, in order: case, kind (hidden), location, σ₁ σ₂ σ₃, σvm, σ₁−σ₃, τmax, one
 * safety-factor column per required criterion, the worst verdict (hidden) and the bench link.
 * Each header says what the column holds and, for stresses, in which unit.
 * @param criteria the project's required criteria, in its order
 * @param unit the unit the stresses are shown in
 */
export function comparisonColumns(criteria: readonly CriterionName[], unit: StressUnitName): ColumnSpec[] {
  return [
    { id: "caseName", header: "Case", numeric: false, value: (r) => r.caseName },
    { id: "kind", header: "Kind", numeric: false, value: (r) => r.kind, filter: "equals", hidden: true },
    {
      id: "locationId",
      header: "Location",
      numeric: false,
      value: (r) => r.locationId,
      compare: (a, b) => a.locationName.localeCompare(b.locationName),
      filter: "equals",
    },
    ...([0, 1, 2] as const).map((k): ColumnSpec => ({
      id: `s${k + 1}`,
      header: `σ${SUB[k]}, ${unit}`,
      numeric: true,
      value: (r) => r.principalPa[k],
    })),
    { id: "vonMisesPa", header: `von Mises σvm, ${unit}`, numeric: true, value: (r) => r.vonMisesPa },
    { id: "trescaPa", header: `Tresca σ₁−σ₃, ${unit}`, numeric: true, value: (r) => r.trescaPa },
    { id: "maxShearPa", header: `Max shear τmax, ${unit}`, numeric: true, value: (r) => r.maxShearPa },
    ...criteria.map((c): ColumnSpec => ({
      id: `u:${c}`,
      header: `${CRITERION_LABELS[c]} safety factor n / required`,
      numeric: true,
      value: (r) => utilisationOf(r, c),
      criterion: c,
    })),
    { id: "verdict", header: "Worst", numeric: false, value: worstVerdict, filter: "equals", hidden: true },
    { id: "bench", header: "Bench", numeric: false, value: null },
  ];
}

/** How a row is marked: governing overall (ink wash), governing at its location (paper), or not at all. */
export function rowHighlight(
  marks: { overall: readonly unknown[]; atLocation: readonly unknown[] } | undefined,
): {
  className: string;
  governs: "overall" | undefined;
} {
  if (marks && marks.overall.length > 0) return { className: "bg-ink-wash", governs: "overall" };
  if (marks && marks.atLocation.length > 0) return { className: "bg-paper", governs: undefined };
  return { className: "", governs: undefined };
}

/** The row's components in `unit`, to twelve significant figures, for the bench link (a link carries no float noise). */
export function benchComponents(row: Row, unit: StressUnitName): Row["componentsPa"] {
  return Object.fromEntries(
    Object.entries(row.componentsPa).map(([k, v]) => [k, editableStress(v, unit)]),
  ) as Row["componentsPa"];
}

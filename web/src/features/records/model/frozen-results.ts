import {
  formatFactor,
  governingSentence,
  type ComparisonRowView,
} from "../../../../../core/contract/comparison";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { CRITERION_LABELS } from "../../../../../core/contract/projects";
import type { RecordContent } from "../../../../../core/contract/records";
import { displayUnit, formatStress } from "../../../lib/stress";

/** One check of a frozen row as the record page writes it. */
export type FrozenCheck = {
  criterion: string;
  /** "1.58" or "∞"; null when the check was not rated. */
  factor: string | null;
  required: string;
  verdict: "pass" | "close" | "fail" | null;
  /** Why it was not rated, when it was not. */
  note: string | null;
};

/** One comparison row of a record, ready to draw. */
export type FrozenRow = {
  rowId: string;
  /** "Hydrostatic test at mid-shell": what a comment on it is about. */
  name: string;
  caseName: string;
  kind: string;
  locationName: string;
  /** σ₁, σ₂, σ₃ and von Mises in the record's unit, as sheet values. */
  principal: [string, string, string];
  vonMises: string;
  checks: FrozenCheck[];
};

/** The stress unit the record's project shows values in. */
export const recordUnit = (content: RecordContent): StressUnitName =>
  displayUnit(content.inputs.project.unitSystem);

function frozenCheck(check: ComparisonRowView["checks"][number]): FrozenCheck {
  const base = { criterion: CRITERION_LABELS[check.criterion], required: String(check.requiredFactor) };
  if (check.status === "evaluated")
    return { ...base, factor: formatFactor(check.factor), verdict: check.verdict, note: null };
  return {
    ...base,
    factor: null,
    verdict: null,
    note:
      check.status === "not-applicable" ? `not applicable: ${check.reason}` : `not rated: ${check.reason}`,
  };
}

/** The record's comparison rows, in the order the comparison gave them. */
export function frozenRows(content: RecordContent): FrozenRow[] {
  const unit = recordUnit(content);
  return content.results.rows.map((r) => ({
    rowId: r.rowId,
    name: `${r.caseName} at ${r.locationName}`,
    caseName: r.caseName,
    kind: r.kind === "combination" ? "combination" : r.category || "load case",
    locationName: r.locationName,
    principal: [
      formatStress(r.principalPa[0], unit),
      formatStress(r.principalPa[1], unit),
      formatStress(r.principalPa[2], unit),
    ],
    vonMises: formatStress(r.vonMisesPa, unit),
    checks: r.checks.map(frozenCheck),
  }));
}

/**
 * The governing sentence of the record, as the comparison said it when it was frozen
 * ("governs: … SF 1.30 against 1.5 required"), or why there is none.
 */
export function frozenGoverning(content: RecordContent): string {
  const g = content.results.governingOverall;
  if (content.results.summary) return content.results.summary;
  if (g) return `governs: ${governingSentence(g)}`;
  return "Nothing was evaluated in this record: no state had a material with the strengths the criteria need.";
}

/** A row's name for a comment that names a row id not in this record (should not happen; kept readable). */
export function rowName(rows: readonly FrozenRow[], rowId: string): string {
  return rows.find((r) => r.rowId === rowId)?.name ?? "a row no longer in this record";
}

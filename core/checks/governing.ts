import type { Criterion } from "../criteria/safety-factor";
import type { CriterionCheck, StateEvaluation } from "./evaluate";

/** One row of a comparison: a load case (or combination) at a location, evaluated. */
export type ComparisonRow<Id = string> = { caseId: Id; locationId: Id; evaluation: StateEvaluation };

/** The row that governs for one criterion, with its check. */
export type Governing<Id = string> = {
  criterion: Criterion;
  caseId: Id;
  locationId: Id;
  check: Extract<CriterionCheck, { factor: number }>;
};

function evaluatedCheck(row: ComparisonRow<unknown>, criterion: Criterion) {
  const check = row.evaluation.checks.find((c) => c.criterion === criterion);
  return check && "factor" in check ? check : null;
}

/**
 * The governing row for each criterion: the highest utilisation (the smallest margin against
 * the required factor). Ties go to the row that comes first, so the order of the input is
 * the tie-break the caller chooses. Criteria no row could evaluate are left out.
 * @param rows evaluated rows, any number of cases × locations
 * @param locationId when given, only rows at this location compete
 */
export function findGoverning<Id>(rows: readonly ComparisonRow<Id>[], locationId?: Id): Governing<Id>[] {
  const best = new Map<Criterion, Governing<Id>>();
  for (const row of rows) {
    if (locationId !== undefined && row.locationId !== locationId) continue;
    for (const check of row.evaluation.checks) {
      const evaluated = evaluatedCheck(row, check.criterion);
      if (!evaluated) continue;
      const current = best.get(check.criterion);
      if (!current || evaluated.utilisation > current.check.utilisation) {
        best.set(check.criterion, {
          criterion: check.criterion,
          caseId: row.caseId,
          locationId: row.locationId,
          check: evaluated,
        });
      }
    }
  }
  return [...best.values()];
}

import type { Criterion } from "../criteria/safety-factor";
import { moreCritical, type EvaluatedCheck, type StateEvaluation } from "./evaluate";

/** One row of a comparison: a load case (or combination) at a location, evaluated. */
export type ComparisonRow<Id = string> = { caseId: Id; locationId: Id; evaluation: StateEvaluation };

/** The row that governs for one criterion, with its check. */
export type Governing<Id = string> = {
  criterion: Criterion;
  caseId: Id;
  locationId: Id;
  check: EvaluatedCheck;
};

/**
 * The governing row for each criterion, by the one rule of `moreCritical` (the highest
 * utilisation, i.e. the smallest margin against the factor required of that row — which may
 * differ per load-case category). Ties go to the row that comes first, so the order of the
 * input is the tie-break the caller chooses. Checks that were not rated (missing strengths,
 * criteria that do not suit the material unless the caller asked for them, refused materials)
 * take no part; criteria no row could rate are left out.
 * @param rows evaluated rows, any number of cases × locations
 * @param locationId when given, only rows at this location compete
 */
export function findGoverning<Id>(rows: readonly ComparisonRow<Id>[], locationId?: Id): Governing<Id>[] {
  const best = new Map<Criterion, Governing<Id>>();
  for (const row of rows) {
    if (locationId !== undefined && row.locationId !== locationId) continue;
    for (const check of row.evaluation.checks) {
      if (check.status !== "evaluated") continue;
      const current = best.get(check.criterion);
      if (moreCritical(check, current?.check ?? null)) {
        best.set(check.criterion, {
          criterion: check.criterion,
          caseId: row.caseId,
          locationId: row.locationId,
          check,
        });
      }
    }
  }
  return [...best.values()];
}

/**
 * The single governing check over rows and criteria, by the same rule (ties: the first row, then
 * the first criterion in its list), or null when nothing was rated.
 */
export function findOverallGoverning<Id>(rows: readonly ComparisonRow<Id>[]): Governing<Id> | null {
  let top: Governing<Id> | null = null;
  for (const row of rows) {
    const g = row.evaluation.governing;
    if (g && moreCritical(g, top?.check ?? null)) {
      top = { criterion: g.criterion, caseId: row.caseId, locationId: row.locationId, check: g };
    }
  }
  return top;
}

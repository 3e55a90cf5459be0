import type { Combination as CombinationView } from "../../../core/contract/combinations";
import type { CombinationRow } from "../../../db/repositories/combinations";
import { personOf, type PersonRef } from "../../domain/projects/people";
import type { StoredTerm } from "../../domain/combinations/superpose";

/** A combination as the API sends it. */
export function presentCombination(
  c: CombinationRow,
  terms: StoredTerm[],
  people: Map<string, PersonRef>,
): CombinationView {
  return {
    id: c.id,
    projectId: c.projectId,
    name: c.name,
    description: c.description,
    terms: terms.map((t) => ({ loadCaseId: t.loadCaseId, loadCaseName: t.loadCaseName, factor: t.factor })),
    version: c.version,
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
    updatedBy: personOf(people, c.updatedBy ?? c.createdBy),
  };
}

/** "1 × Operating + 0.6 × Vacuum upset": how the audit trail and the page write a combination. */
export function combinationFormula(terms: { loadCaseName: string; factor: number }[]): string {
  return terms.map((t) => `${t.factor} × ${t.loadCaseName}`).join(" + ");
}

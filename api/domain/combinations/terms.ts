import type { Transaction } from "sequelize";
import { termRowsOf } from "../../../db/repositories/combinations";
import { loadCaseNames } from "../../../db/repositories/load-cases";
import type { StoredTerm } from "./superpose";

/** The terms of these combinations in order, with their cases' names and whether each case is live, by combination id. */
export async function termsOf(
  combinations: { id: string }[],
  transaction?: Transaction,
): Promise<Map<string, StoredTerm[]>> {
  const byCombination = new Map<string, StoredTerm[]>(combinations.map((c) => [c.id, []]));
  if (combinations.length === 0) return byCombination;
  const rows = await termRowsOf(
    combinations.map((c) => c.id),
    transaction,
  );
  const cases = await loadCaseNames([...new Set(rows.map((r) => r.loadCaseId))], transaction);
  for (const r of rows) {
    const c = cases.get(r.loadCaseId);
    byCombination.get(r.combinationId)!.push({
      loadCaseId: r.loadCaseId,
      loadCaseName: c?.name ?? "(deleted case)",
      factor: r.factor,
      live: !!c && c.live,
    });
  }
  return byCombination;
}

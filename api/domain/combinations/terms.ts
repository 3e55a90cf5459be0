import type { Transaction } from "sequelize";
import type { Combination } from "../../../db/models/combination";
import { CombinationTerm } from "../../../db/models/combination-term";
import { LoadCase } from "../../../db/models/load-case";
import type { StoredTerm } from "./superpose";

/** The terms of these combinations in order, with their cases' names and whether each case is live, by combination id. */
export async function termsOf(
  combinations: Combination[],
  transaction?: Transaction,
): Promise<Map<string, StoredTerm[]>> {
  const byCombination = new Map<string, StoredTerm[]>(combinations.map((c) => [c.id, []]));
  if (combinations.length === 0) return byCombination;
  const rows = await CombinationTerm.findAll({
    where: { combinationId: combinations.map((c) => c.id) },
    order: [["position", "ASC"]],
    transaction,
  });
  const cases = await LoadCase.findAll({
    attributes: ["id", "name", "deletedAt"],
    where: { id: [...new Set(rows.map((r) => r.loadCaseId))] },
    transaction,
  });
  const caseById = new Map(cases.map((c) => [c.id, c]));
  for (const r of rows) {
    const c = caseById.get(r.loadCaseId);
    byCombination.get(r.combinationId)!.push({
      loadCaseId: r.loadCaseId,
      loadCaseName: c?.name ?? "(deleted case)",
      factor: r.factor,
      live: !!c && c.deletedAt === null,
    });
  }
  return byCombination;
}

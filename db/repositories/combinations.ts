import type { Transaction } from "sequelize";
import { Combination } from "../models/combination";
import { CombinationTerm } from "../models/combination-term";
import {
  countLive,
  findLiveChild,
  listLiveChildren,
  lastPosition,
  toPlain,
  updateById,
  type ReadOptions,
  type Row,
} from "./plain";

/** A combination of load cases (Σ factor × case), as a plain object; its terms are rows of their own. */
export type CombinationRow = Row<Combination>;
/** One term of a combination: a factor on a load case, at a position. */
export type CombinationTermRow = Row<CombinationTerm>;

/** What creating a combination sets; version and timestamps are the table's. */
export type NewCombination = Pick<
  CombinationRow,
  "projectId" | "name" | "description" | "position" | "createdBy" | "updatedBy"
>;

/** A term to store, in the order given. */
export type NewTerm = { loadCaseId: string; factor: number };

/** The combination `id` of `projectId`, not in the trash (locked FOR UPDATE with `lock`), or null. */
export async function findLiveCombination(
  projectId: string,
  id: string,
  options: ReadOptions = {},
): Promise<CombinationRow | null> {
  return findLiveChild(Combination, projectId, id, options);
}

/** The project's live combinations in their order. */
export async function listLiveCombinations(
  projectId: string,
  transaction?: Transaction,
): Promise<CombinationRow[]> {
  return listLiveChildren(Combination, projectId, transaction);
}

/** How many combinations of the project are not in the trash. */
export function countLiveCombinations(projectId: string, transaction?: Transaction): Promise<number> {
  return countLive(Combination, projectId, transaction);
}

/** The position after the project's last combination (trashed ones count). */
export async function nextCombinationPosition(projectId: string, transaction?: Transaction): Promise<number> {
  return ((await lastPosition(Combination, projectId, transaction)) ?? -1) + 1;
}

/** Creates a combination and its terms (positions 0, 1, … in the order given). */
export async function createCombination(
  values: NewCombination,
  terms: NewTerm[],
  transaction?: Transaction,
): Promise<CombinationRow> {
  const created = toPlain(await Combination.create(values, { transaction }));
  await replaceTerms(created.id, terms, transaction);
  return created;
}

/** Sets `values` on the combination `id`; the row as stored after. */
export async function updateCombination(
  id: string,
  values: Partial<CombinationRow>,
  transaction?: Transaction,
): Promise<CombinationRow> {
  return (await updateById(Combination, id, values, transaction))!;
}

/** Replaces the terms of a combination by `terms`, in their order. */
export async function replaceTerms(
  combinationId: string,
  terms: NewTerm[],
  transaction?: Transaction,
): Promise<void> {
  await CombinationTerm.destroy({ where: { combinationId }, transaction });
  await CombinationTerm.bulkCreate(
    terms.map((t, position) => ({ combinationId, loadCaseId: t.loadCaseId, factor: t.factor, position })),
    { transaction },
  );
}

/** The terms of these combinations, in position order. */
export async function termRowsOf(
  combinationIds: string[],
  transaction?: Transaction,
): Promise<CombinationTermRow[]> {
  if (combinationIds.length === 0) return [];
  const rows = await CombinationTerm.findAll({
    where: { combinationId: combinationIds },
    order: [["position", "ASC"]],
    transaction,
  });
  return rows.map(toPlain);
}

import type { Transaction } from "sequelize";
import { LoadCase } from "../models/load-case";
import {
  countLive,
  findLiveChild,
  listLiveChildren,
  liveChildIdsAmong,
  lastPosition,
  toPlain,
  updateById,
  type ReadOptions,
  type Row,
} from "./plain";

/** A load case of a project, as a plain object. */
export type LoadCaseRow = Row<LoadCase>;

/** What creating a load case sets; version and timestamps are the table's. */
export type NewLoadCase = Pick<
  LoadCaseRow,
  "projectId" | "name" | "category" | "description" | "position" | "createdBy" | "updatedBy"
>;

/** The load case `id` of `projectId`, not in the trash (locked FOR UPDATE with `lock`), or null. */
export async function findLiveLoadCase(
  projectId: string,
  id: string,
  options: ReadOptions = {},
): Promise<LoadCaseRow | null> {
  return findLiveChild(LoadCase, projectId, id, options);
}

/** The project's live load cases in their order. */
export async function listLiveLoadCases(
  projectId: string,
  transaction?: Transaction,
): Promise<LoadCaseRow[]> {
  return listLiveChildren(LoadCase, projectId, transaction);
}

/** Which of `ids` are live load cases of `projectId`. */
export async function liveLoadCaseIdsAmong(
  projectId: string,
  ids: string[],
  transaction?: Transaction,
): Promise<Set<string>> {
  return liveChildIdsAmong(LoadCase, projectId, ids, transaction);
}

/** The name of each load case with these ids and whether it is live (trashed ones too), by id. */
export async function loadCaseNames(
  ids: string[],
  transaction?: Transaction,
): Promise<Map<string, { name: string; live: boolean }>> {
  if (ids.length === 0) return new Map();
  const rows = await LoadCase.findAll({
    attributes: ["id", "name", "deletedAt"],
    where: { id: ids },
    transaction,
  });
  return new Map(rows.map((c) => [c.id, { name: c.name, live: c.deletedAt === null }]));
}

/** How many load cases of the project are not in the trash. */
export function countLiveLoadCases(projectId: string, transaction?: Transaction): Promise<number> {
  return countLive(LoadCase, projectId, transaction);
}

/** The position after the project's last load case (trashed ones count). */
export async function nextLoadCasePosition(projectId: string, transaction?: Transaction): Promise<number> {
  return ((await lastPosition(LoadCase, projectId, transaction)) ?? -1) + 1;
}

export async function createLoadCase(values: NewLoadCase, transaction?: Transaction): Promise<LoadCaseRow> {
  return toPlain(await LoadCase.create(values, { transaction }));
}

/** Sets `values` on the load case `id`; the row as stored after. */
export async function updateLoadCase(
  id: string,
  values: Partial<LoadCaseRow>,
  transaction?: Transaction,
): Promise<LoadCaseRow> {
  return (await updateById(LoadCase, id, values, transaction))!;
}

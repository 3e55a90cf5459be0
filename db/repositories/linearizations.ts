import type { Transaction } from "sequelize";
import { Linearization } from "../models/linearization";
import {
  lastPosition,
  lockOf,
  toPlain,
  toPlainOrNull,
  updateById,
  type ReadOptions,
  type Row,
} from "./plain";

/** A saved stress classification line, as a plain object. */
export type LinearizationRow = Row<Linearization>;

/** What creating a line sets; version and timestamps are the table's. */
export type NewLinearization = Pick<
  LinearizationRow,
  "projectId" | "loadCaseId" | "locationId" | "name" | "input" | "summary" | "createdBy" | "updatedBy"
>;

const ORDER: [string, string][] = [
  ["position", "ASC"],
  ["createdAt", "ASC"],
];

/** The line `id` of load case `loadCaseId` (locked FOR UPDATE with `lock`), or null. */
export async function findLinearization(
  loadCaseId: string,
  id: string,
  options: ReadOptions = {},
): Promise<LinearizationRow | null> {
  const row = await Linearization.findOne({
    where: { id, loadCaseId },
    transaction: options.transaction,
    lock: lockOf(options),
  });
  return toPlainOrNull(row);
}

/** The lines of a load case in their order. */
export async function listLinearizations(
  loadCaseId: string,
  transaction?: Transaction,
): Promise<LinearizationRow[]> {
  const rows = await Linearization.findAll({ where: { loadCaseId }, order: ORDER, transaction });
  return rows.map(toPlain);
}

/** The lines of several load cases in one query, each case's in their order (for the project export). */
export async function listLinearizationsOfCases(
  loadCaseIds: readonly string[],
  transaction?: Transaction,
): Promise<LinearizationRow[]> {
  if (loadCaseIds.length === 0) return [];
  const rows = await Linearization.findAll({
    where: { loadCaseId: [...loadCaseIds] },
    order: ORDER,
    transaction,
  });
  return rows.map(toPlain);
}

/** How many lines the load case holds. */
export function countLinearizations(loadCaseId: string, transaction?: Transaction): Promise<number> {
  return Linearization.count({ where: { loadCaseId }, transaction });
}

/** Creates a line after the project's last one. */
export async function createLinearization(
  values: NewLinearization,
  transaction?: Transaction,
): Promise<LinearizationRow> {
  const position = ((await lastPosition(Linearization, values.projectId, transaction)) ?? -1) + 1;
  return toPlain(await Linearization.create({ ...values, position }, { transaction }));
}

/** Sets `values` on the line `id`; the row as stored after. */
export async function updateLinearization(
  id: string,
  values: Partial<LinearizationRow>,
  transaction?: Transaction,
): Promise<LinearizationRow> {
  return (await updateById(Linearization, id, values, transaction))!;
}

/** Deletes the line `id` for good (the audit trail keeps its inputs). */
export async function deleteLinearization(id: string, transaction?: Transaction): Promise<void> {
  await Linearization.destroy({ where: { id }, transaction });
}

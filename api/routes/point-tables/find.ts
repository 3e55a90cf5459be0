import type { Transaction } from "sequelize";
import { findLiveLoadCase } from "../../../db/repositories/load-cases";
import { findPointTable } from "../../../db/repositories/point-tables";
import { findProject } from "../../domain/projects/scope";
import { errors } from "../../errors";
export type CaseParams = { workspaceId: string; projectId: string; loadCaseId: string };
export type TableParams = CaseParams & { tableId: string };

/** The project and its live load case, or 404 (the case locked FOR UPDATE inside a transaction). */
export async function findCase(
  workspaceId: string,
  params: CaseParams,
  options: { transaction?: Transaction; lock?: boolean } = {},
) {
  const project = await findProject(workspaceId, params.projectId, options);
  const loadCase = await findLiveLoadCase(project.id, params.loadCaseId, options);
  if (!loadCase) throw errors.notFound("This load case");
  return { project, loadCase };
}

/** The project, the load case and the table, or 404. */
export async function findTable(
  workspaceId: string,
  params: TableParams,
  options: { transaction?: Transaction; lock?: boolean } = {},
) {
  const { project, loadCase } = await findCase(workspaceId, params, options);
  const table = await findPointTable(loadCase.id, params.tableId, options);
  if (!table) throw errors.notFound("This point table");
  return { project, loadCase, table };
}

/** A table's points are read only once its content has arrived. */
export function assertReady(table: { status: string; fileName: string }) {
  if (table.status !== "ready") {
    throw errors.conflictWithId(
      "awaiting_content",
      `The point table "${table.fileName}" has no points yet; send its file with PUT …/content first.`,
    );
  }
}

import { col, fn, type Model, type ModelStatic, type Transaction } from "sequelize";
import { Combination } from "../models/combination";
import { LoadCase } from "../models/load-case";
import { Location } from "../models/location";
import { Project } from "../models/project";
import { lockOf, toPlain, toPlainOrNull, updateById, type ReadOptions, type Row } from "./plain";

/** A project of a workspace, as a plain object. */
export type ProjectRow = Row<Project>;

/** What creating a project sets; version and timestamps are the table's. */
export type NewProject = Pick<
  ProjectRow,
  | "workspaceId"
  | "name"
  | "requirements"
  | "defaultMaterialId"
  | "defaultPublishedMaterial"
  | "createdBy"
  | "updatedBy"
> &
  Partial<
    Pick<ProjectRow, "description" | "unitSystem" | "categoryRequirements" | "includeUnsuitedCriteria">
  >;

/** How many live locations, load cases and combinations a project holds. */
export type ProjectCounts = { locations: number; loadCases: number; combinations: number };

/**
 * The project `id` of `workspaceId`, not in the trash, or null. With `lock` (inside a
 * transaction) the row is locked FOR UPDATE for the rest of it.
 */
export async function findLiveProject(
  workspaceId: string,
  id: string,
  options: ReadOptions = {},
): Promise<ProjectRow | null> {
  const row = await Project.findOne({
    where: { id, workspaceId, deletedAt: null },
    transaction: options.transaction,
    lock: lockOf(options),
  });
  return toPlainOrNull(row);
}

/** Locks the project row `id` (trashed or not) FOR UPDATE for the rest of `transaction`. */
export async function lockProject(id: string, transaction: Transaction): Promise<void> {
  await Project.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
}

/** The workspace's projects not in the trash, by name. */
export async function listLiveProjects(
  workspaceId: string,
  transaction?: Transaction,
): Promise<ProjectRow[]> {
  const rows = await Project.findAll({
    where: { workspaceId, deletedAt: null },
    order: [["name", "ASC"]],
    transaction,
  });
  return rows.map(toPlain);
}

/** Every project of the workspace, trashed ones too (id, name and when it was trashed). */
export async function projectNamesOf(
  workspaceId: string,
  transaction?: Transaction,
): Promise<Pick<ProjectRow, "id" | "name" | "deletedAt">[]> {
  const rows = await Project.findAll({
    attributes: ["id", "name", "deletedAt"],
    where: { workspaceId },
    transaction,
  });
  return rows.map((p) => ({ id: p.id, name: p.name, deletedAt: p.deletedAt }));
}

/** How many projects the workspace holds, trashed ones too. */
export function countProjects(workspaceId: string, transaction?: Transaction): Promise<number> {
  return Project.count({ where: { workspaceId }, transaction });
}

export async function createProject(values: NewProject, transaction?: Transaction): Promise<ProjectRow> {
  return toPlain(await Project.create(values, { transaction }));
}

/** Sets `values` on the project `id`; the row as stored after. */
export async function updateProject(
  id: string,
  values: Partial<ProjectRow>,
  transaction?: Transaction,
): Promise<ProjectRow> {
  return (await updateById(Project, id, values, transaction))!;
}

/** Live (not trashed) locations, load cases and combinations per project id. */
export async function projectCounts(
  projectIds: string[],
  transaction?: Transaction,
): Promise<Map<string, ProjectCounts>> {
  const counts = new Map<string, ProjectCounts>(
    projectIds.map((id) => [id, { locations: 0, loadCases: 0, combinations: 0 }]),
  );
  if (projectIds.length === 0) return counts;
  const tally = async (model: ModelStatic<Model>, key: keyof ProjectCounts) => {
    const rows = (await model.findAll({
      attributes: ["projectId", [fn("count", col("id")), "count"]],
      where: { projectId: projectIds, deletedAt: null },
      group: ["projectId"],
      raw: true,
      transaction,
    })) as unknown as { projectId: string; count: string }[];
    for (const r of rows) counts.get(r.projectId)![key] = Number(r.count);
  };
  await tally(Location, "locations");
  await tally(LoadCase, "loadCases");
  await tally(Combination, "combinations");
  return counts;
}

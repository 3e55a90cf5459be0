import type { Transaction } from "sequelize";
import { findLiveProject, type ProjectRow } from "../../../db/repositories/projects";
import { errors } from "../../errors";

/**
 * The project `projectId` of `workspaceId`, not in the trash, or a 404. With `lock`, the row
 * is locked for the rest of `transaction`, which serialises changes inside one project
 * (versions and positions are then read and written without races).
 */
export async function findProject(
  workspaceId: string,
  projectId: string,
  options: { transaction?: Transaction; lock?: boolean } = {},
): Promise<ProjectRow> {
  const project = await findLiveProject(workspaceId, projectId, options);
  if (!project) throw errors.notFound("This project");
  return project;
}

import type { Transaction } from "sequelize";
import { Project } from "../../../db/models/project";
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
): Promise<Project> {
  const project = await Project.findOne({
    where: { id: projectId, workspaceId, deletedAt: null },
    transaction: options.transaction,
    lock: options.lock && options.transaction ? options.transaction.LOCK.UPDATE : undefined,
  });
  if (!project) throw errors.notFound("This project");
  return project;
}

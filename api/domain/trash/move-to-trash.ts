import type { Transaction } from "sequelize";
import { markDeleted, TRASH_TABLES } from "../../../db/repositories/trash";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import type { RouteHandler } from "../../openapi/registry";
import { recordAudit } from "../audit/record";
import { findProject } from "../projects/scope";

type NoInput = Record<string, never>;

/**
 * `DELETE` for something inside a project (a location, a load case, a combination): marks it
 * deleted and audits the move in one transaction; the trash routes restore it.
 * @param item what it is (its trash `kind`, and `noun` for its summary line) and how to find
 *   it in the project from the route's params (a 404 when it is not there)
 */
export function moveToTrashHandler<P extends { projectId: string }>(
  context: AppContext,
  item: {
    kind: "location" | "load-case" | "combination";
    noun: string;
    find(projectId: string, params: P, transaction: Transaction): Promise<{ id: string; name: string }>;
  },
): RouteHandler<P, NoInput, NoInput> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const params = res.locals.input.params;
    await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, params.projectId, { transaction });
      const row = await item.find(project.id, params, transaction);
      await markDeleted(item.kind, row.id, user.id, transaction);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: TRASH_TABLES[item.kind].entity,
        entityId: row.id,
        action: "delete",
        summary: `moved the ${item.noun} "${row.name}" of "${project.name}" to the trash`,
      });
    });
    res.status(204).end();
  };
}

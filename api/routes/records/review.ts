import type { UpdateReviewBody } from "../../../core/contract/records";
import { setRequiredApprovals } from "../../../db/repositories/records";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { recordAudit } from "../../domain/audit/record";
import { findProject } from "../../domain/projects/scope";
import { projectReview } from "../../domain/records/review";
import type { RouteHandler } from "../../openapi/registry";
import type { NoInput, ProjectParams } from "./schema";

/** `GET …/review`: the project's review status, revision, latest and last approved records. */
export function getReviewHandler(context: AppContext): RouteHandler<ProjectParams, NoInput, NoInput> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const project = await findProject(workspace.id, res.locals.input.params.projectId);
    res.set("Cache-Control", "no-store").json(await projectReview(context.sequelize, project));
  };
}

/** `PATCH …/review`: how many approvals the project's records need from now on (owners). */
export function updateReviewHandler(
  context: AppContext,
): RouteHandler<ProjectParams, NoInput, UpdateReviewBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { requiredApprovals } = res.locals.input.body;
    const project = await context.sequelize.transaction(async (transaction) => {
      const found = await findProject(workspace.id, res.locals.input.params.projectId, {
        transaction,
        lock: true,
      });
      if (found.requiredApprovals !== requiredApprovals) {
        await setRequiredApprovals(found.id, requiredApprovals, transaction);
        await recordAudit(transaction, user, {
          workspaceId: workspace.id,
          projectId: found.id,
          entityType: "project",
          entityId: found.id,
          action: "update",
          summary: `set the approvals each record of "${found.name}" needs to ${requiredApprovals}`,
          changes: { requiredApprovals: { from: found.requiredApprovals, to: requiredApprovals } },
        });
      }
      return { ...found, requiredApprovals };
    });
    res.json(await projectReview(context.sequelize, project));
  };
}

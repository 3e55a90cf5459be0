import type { User } from "lucia";
import type { Transaction } from "sequelize";
import type { ApproveRecordBody, ReturnRecordBody } from "../../../core/contract/records";
import type { ProjectRow } from "../../../db/repositories/projects";
import {
  approvalsOf,
  findRecordHead,
  insertRecordApproval,
  insertRecordEvent,
  setRecordStatus,
  type RecordHeadRow,
} from "../../../db/repositories/records";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import { recordAudit } from "../../domain/audit/record";
import { findProject } from "../../domain/projects/scope";
import { assertMayApprove, assertMayReturn } from "../../domain/records/independence";
import { notifyApproved, notifyReturned } from "../../domain/records/notify";
import { assertSubmitted, isComplete } from "../../domain/records/status";
import { recordSummary } from "../../domain/records/summary";
import type { Response } from "express";
import type { RouteHandler } from "../../openapi/registry";
import type { NoInput, RecordParams } from "./schema";

/**
 * Returning and approving: a checker's two decisions on a record submitted for check. Both are
 * for reviewers and owners only (an editor writes calculations, and does not sign them off),
 * both refuse the submitter (independence), and approving also refuses whoever last edited an
 * input frozen in the record. Each decision is dated, signed, kept as a record event and written
 * to the audit trail in one transaction; the submitter is mailed after the commit.
 */

/** 403 unless the caller is a reviewer or an owner of the workspace. */
function assertChecker(res: Response, doing: string): void {
  const { role } = currentMembership(res).membership;
  if (role !== "reviewer" && role !== "owner") {
    throw errors.forbidden(
      `Only reviewers and owners ${doing} records; you are ${role === "editor" ? "an" : "a"} ${role}.`,
    );
  }
}

/** The record of the route, locked for the decision, inside `transaction`; 404 when it is not the project's. */
async function lockedRecord(
  workspaceId: string,
  params: RecordParams,
  transaction: Transaction,
): Promise<{ project: ProjectRow; record: RecordHeadRow }> {
  const project = await findProject(workspaceId, params.projectId, { transaction });
  const record = await findRecordHead(project.id, params.recordId, { transaction, lock: true });
  if (!record) throw errors.notFound("This record");
  return { project, record };
}

async function signEvent(
  transaction: Transaction,
  user: User,
  record: RecordHeadRow,
  action: "approve" | "return",
  note: string,
) {
  await insertRecordEvent(
    { recordId: record.id, action, status: record.status, actorId: user.id, actorName: user.name, note },
    transaction,
  );
}

/** `POST …/records/{recordId}/return`: back to the originator with a comment. */
export function returnRecordHandler(
  context: AppContext,
): RouteHandler<RecordParams, NoInput, ReturnRecordBody> {
  return async (_req, res) => {
    assertChecker(res, "return");
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { comment } = res.locals.input.body;
    const { project, record } = await context.sequelize.transaction(async (transaction) => {
      const found = await lockedRecord(workspace.id, res.locals.input.params, transaction);
      assertSubmitted(found.record, "returned");
      assertMayReturn(found.record, user.id);
      const returned = await setRecordStatus(
        found.record.id,
        {
          status: "returned",
          returnedBy: user.id,
          returnedByName: user.name,
          returnedAt: new Date(),
          returnComment: comment,
        },
        transaction,
      );
      await signEvent(transaction, user, returned, "return", comment);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: found.project.id,
        entityType: "record",
        entityId: returned.id,
        action: "return",
        summary: `returned record ${returned.number} (revision ${returned.revision}) of "${found.project.name}" with comments`,
        changes: { status: { from: "submitted", to: "returned" }, comment },
      });
      return { project: found.project, record: returned };
    });
    await notifyReturned(context, project, record);
    res.json(await recordSummary(record));
  };
}

/**
 * `POST …/records/{recordId}/approve`: one approval; the record is approved once it has as many
 * as it needs. 409 when the caller already approved it or it is not submitted.
 */
export function approveRecordHandler(
  context: AppContext,
): RouteHandler<RecordParams, NoInput, ApproveRecordBody> {
  return async (_req, res) => {
    assertChecker(res, "approve");
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { comment } = res.locals.input.body;
    const outcome = await context.sequelize.transaction(async (transaction) => {
      const { project, record } = await lockedRecord(workspace.id, res.locals.input.params, transaction);
      const earlier = (await approvalsOf([record.id], transaction)).get(record.id)!;
      if (earlier.some((a) => a.approverId === user.id)) {
        throw errors.conflictWithId(
          "already_approved",
          `You have approved record ${record.number} already; a second approval must come from someone else.`,
        );
      }
      assertSubmitted(record, "approved");
      assertMayApprove(record, user.id);
      await insertRecordApproval(
        { recordId: record.id, approverId: user.id, approverName: user.name, comment },
        transaction,
      );
      const count = earlier.length + 1;
      const complete = isComplete(count, record.requiredApprovals);
      const after = complete
        ? await setRecordStatus(record.id, { status: "approved", approvedAt: new Date() }, transaction)
        : record;
      await signEvent(
        transaction,
        user,
        after,
        "approve",
        comment || `approval ${count} of ${record.requiredApprovals}`,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "record",
        entityId: record.id,
        action: "approve",
        summary: complete
          ? `approved record ${record.number} (revision ${record.revision}) of "${project.name}"`
          : `gave approval ${count} of ${record.requiredApprovals} to record ${record.number} (revision ${record.revision}) of "${project.name}"`,
        changes: complete ? { status: { from: "submitted", to: "approved" }, comment } : { comment },
      });
      const approverNames = [...earlier.map((a) => a.approverName), user.name];
      return { project, record: after, complete, approverNames };
    });
    if (outcome.complete)
      await notifyApproved(context, outcome.project, outcome.record, outcome.approverNames);
    res.json(await recordSummary(outcome.record));
  };
}

import type { RecordScope, SubmitRecordBody } from "../../../core/contract/records";
import {
  insertRecord,
  insertRecordEvent,
  listRecordHeads,
  returnedRecordHeads,
  setRecordStatus,
} from "../../../db/repositories/records";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { recordAudit } from "../../domain/audit/record";
import { findProject } from "../../domain/projects/scope";
import { freezeProjectContent } from "../../domain/records/freeze";
import { notifySubmitted } from "../../domain/records/notify";
import { revisionOfNextRecord } from "../../domain/records/revision";
import { assertNothingPending } from "../../domain/records/status";
import { recordSummary } from "../../domain/records/summary";
import type { RouteHandler } from "../../openapi/registry";
import type { NoInput, ProjectParams } from "./schema";

/**
 * `POST …/records`: submits the project for check. The content is frozen in one snapshot
 * (freeze.ts), then stored with its hash in a second transaction that holds the project row,
 * checks again that nothing else is waiting for a check, numbers the record and gives it its
 * revision letter, supersedes the returned records before it, and writes the event and the
 * audit line. The reviewers and owners are mailed after the commit.
 */
export function submitRecordHandler(
  context: AppContext,
): RouteHandler<ProjectParams, NoInput, SubmitRecordBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { projectId } = res.locals.input.params;
    const { reason, scope } = res.locals.input.body;
    // Refuse early, before the comparison is computed for nothing.
    const project = await findProject(workspace.id, projectId);
    assertNothingPending((await listRecordHeads(project.id))[0] ?? null);

    const frozen = await freezeProjectContent(context.sequelize, workspace.id, projectId, {
      scope,
      unknownIds: "refuse",
    });
    const record = await context.sequelize.transaction(async (transaction) => {
      const locked = await findProject(workspace.id, projectId, { transaction, lock: true });
      const latest = (await listRecordHeads(locked.id, transaction))[0] ?? null;
      assertNothingPending(latest);
      const now = new Date();
      for (const returned of await returnedRecordHeads(locked.id, transaction)) {
        await setRecordStatus(returned.id, { status: "superseded" }, transaction);
        await insertRecordEvent(
          {
            recordId: returned.id,
            action: "supersede",
            status: "superseded",
            actorId: user.id,
            actorName: user.name,
            note: `superseded by record ${(latest?.number ?? 0) + 1}`,
          },
          transaction,
        );
      }
      const { content: _content, ...created } = await insertRecord(
        {
          projectId: locked.id,
          workspaceId: workspace.id,
          number: (latest?.number ?? 0) + 1,
          revision: revisionOfNextRecord(latest),
          reason,
          content: frozen.content,
          hash: frozen.hash,
          engineVersion: frozen.content.engine.version,
          requiredApprovals: locked.requiredApprovals,
          inputEditors: frozen.inputEditors,
          submittedBy: user.id,
          submittedByName: user.name,
          submittedAt: now,
        },
        transaction,
      );
      await insertRecordEvent(
        {
          recordId: created.id,
          action: "submit",
          status: "submitted",
          actorId: user.id,
          actorName: user.name,
          note: reason,
        },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: locked.id,
        entityType: "record",
        entityId: created.id,
        action: "submit",
        summary: `submitted "${locked.name}" for check as record ${created.number}, revision ${created.revision}${frozen.content.scope ? `, covering ${coverage(frozen.content.scope)}` : ""}`,
        changes: {
          after: {
            number: created.number,
            revision: created.revision,
            reason,
            hash: created.hash,
            scope: coverage(frozen.content.scope),
          },
        },
      });
      return created;
    });
    await notifySubmitted(context, project, record);
    res.status(201).json(await recordSummary(record));
  };
}

/** What a record covers in words, as the audit trail writes it: "whole project" or "2 of 3 load cases and 1 of 4 locations". */
function coverage(scope: RecordScope | undefined): string {
  if (!scope) return "whole project";
  return `${scope.loadCases.length} of ${scope.projectLoadCases} load cases and ${scope.locations.length} of ${scope.projectLocations} locations`;
}

import type { Transaction } from "sequelize";
import { CT7_REVIEWS } from "../core/demo-data/ct7-review";
import { Project } from "./models/project";
import { User } from "./models/user";
import { Workspace } from "./models/workspace";
import { insertAuditEvent } from "./repositories/audit";
import {
  insertRecord,
  insertRecordApproval,
  insertRecordComment,
  insertRecordEvent,
  setRecordStatus,
} from "./repositories/records";
import { DEMO_WORKSPACE_NAME } from "./seed-accounts";

/** What freezing a project gives: the record's content, its hash, the engine version and who last edited each input. */
export type FrozenForSeed = {
  content: { results: { rows: { rowId: string; caseName: string; locationName: string }[] } };
  hash: string;
  engineVersion: string;
  inputEditors: { userId: string; what: string }[];
};

/**
 * Freezes a project's content inside the seed's transaction. The comparison lives in api/, which
 * db/ may not import, so the caller (scripts/prepare-database.ts, tests) hands it in.
 */
export type FreezeForSeed = (
  transaction: Transaction,
  workspaceId: string,
  projectId: string,
) => Promise<FrozenForSeed>;

/**
 * Seed step "records": the CT-7 demo's calculation records (core/demo-data/ct7-review.ts) — one
 * approved, one returned with comments — frozen from the seeded projects, with their events,
 * comments, approvals and audit lines as the routes would write them.
 */
export async function seedDemoRecords(
  transaction: Transaction,
  freeze: FreezeForSeed,
  log: (line: string) => void,
): Promise<void> {
  const workspace = await Workspace.findOne({ where: { name: DEMO_WORKSPACE_NAME }, transaction });
  if (!workspace) return;
  const person = async (email: string) => (await User.findOne({ where: { email }, transaction }))!;
  let made = 0;
  for (const review of CT7_REVIEWS) {
    const project = await Project.findOne({
      where: { workspaceId: workspace.id, name: review.projectName, deletedAt: null },
      transaction,
    });
    if (!project) continue;
    const originator = await person(review.originatorEmail);
    const checker = await person(review.checkerEmail);
    const frozen = await freeze(transaction, workspace.id, project.id);
    const submittedAt = new Date();
    const { content: _content, ...record } = await insertRecord(
      {
        projectId: project.id,
        workspaceId: workspace.id,
        number: 1,
        revision: "A",
        reason: review.reason,
        content: frozen.content,
        hash: frozen.hash,
        engineVersion: frozen.engineVersion,
        requiredApprovals: 1,
        inputEditors: frozen.inputEditors,
        submittedBy: originator.id,
        submittedByName: originator.name,
        submittedAt,
      },
      transaction,
    );
    const event = (
      action: "submit" | "approve" | "return",
      status: typeof record.status,
      who: User,
      note: string,
    ) =>
      insertRecordEvent(
        { recordId: record.id, action, status, actorId: who.id, actorName: who.name, note },
        transaction,
      );
    const audit = (action: "submit" | "approve" | "return", who: User, summary: string) =>
      insertAuditEvent(
        {
          workspaceId: workspace.id,
          projectId: project.id,
          entityType: "record",
          entityId: record.id,
          action,
          actorId: who.id,
          actorName: who.name,
          summary,
        },
        transaction,
      );
    await event("submit", "submitted", originator, review.reason);
    await audit("submit", originator, `submitted "${project.name}" for check as record 1, revision A`);
    if (review.outcome === "approved") {
      await insertRecordApproval(
        {
          recordId: record.id,
          approverId: checker.id,
          approverName: checker.name,
          comment: review.approvalComment,
        },
        transaction,
      );
      await setRecordStatus(record.id, { status: "approved", approvedAt: new Date() }, transaction);
      await event("approve", "approved", checker, review.approvalComment);
      await audit("approve", checker, `approved record 1 (revision A) of "${project.name}"`);
    } else {
      for (const comment of review.comments) {
        const row = comment.row
          ? frozen.content.results.rows.find(
              (r) => r.caseName === comment.row!.caseName && r.locationName === comment.row!.locationName,
            )
          : null;
        await insertRecordComment(
          {
            recordId: record.id,
            rowId: row ? row.rowId : null,
            replyTo: null,
            text: comment.text,
            authorId: checker.id,
            authorName: checker.name,
          },
          transaction,
        );
      }
      await setRecordStatus(
        record.id,
        {
          status: "returned",
          returnedBy: checker.id,
          returnedByName: checker.name,
          returnedAt: new Date(),
          returnComment: review.returnComment,
        },
        transaction,
      );
      await event("return", "returned", checker, review.returnComment);
      await audit("return", checker, `returned record 1 (revision A) of "${project.name}" with comments`);
    }
    made += 1;
  }
  log(`demo records: ${made} calculation records in "${DEMO_WORKSPACE_NAME}" (one approved, one returned)`);
}

import type { RecordContent, RecordPerson, RecordSummary } from "../../../core/contract/records";
import { findRecord, listRecordHeads, recordEventsOf } from "../../../db/repositories/records";
import { errors } from "../../errors";
import { findProject } from "../projects/scope";
import { recordSummaries, recordSummary } from "./summary";

/** Someone who signed a record, and when. */
export type Signature = { by: RecordPerson; at: string; comment: string };

/** What a printed record needs in one piece: its summary, its frozen content and its signatures. */
export type RecordForReport = {
  summary: RecordSummary;
  content: RecordContent;
  /** The project's records up to and including this one, oldest first: the report's revision table. */
  revisions: RecordSummary[];
  signatures: {
    /** Who submitted the record, and when. */
    originator: Signature;
    /** Everyone who approved it, in order, with their dates and comments. */
    checkers: Signature[];
    /** The approval that completed it (the last required one), or null while it is not approved. */
    approver: Signature | null;
    /** Who returned it with comments, or null. */
    returnedBy: Signature | null;
  };
};

/**
 * The record `recordId` of the live project `projectId` in `workspaceId`, ready to print; 404
 * when the project or the record (in that project) does not exist. For the report routes.
 */
export async function recordForReport(
  workspaceId: string,
  projectId: string,
  recordId: string,
): Promise<RecordForReport> {
  const project = await findProject(workspaceId, projectId);
  const row = await findRecord(project.id, recordId);
  if (!row) throw errors.notFound("This record");
  const { content, ...head } = row;
  const summary = await recordSummary(head);
  const events = await recordEventsOf(row.id);
  const earlier = (await listRecordHeads(project.id)).filter((h) => h.number <= row.number).reverse();
  const revisions = await recordSummaries(earlier);
  const submitted = events.find((e) => e.action === "submit");
  const checkers: Signature[] = summary.approvals.map((a) => ({ by: a.by, at: a.at, comment: a.comment }));
  return {
    summary,
    content: content as RecordContent,
    revisions,
    signatures: {
      originator: {
        by: summary.submittedBy,
        at: summary.submittedAt,
        comment: submitted?.note ?? summary.reason,
      },
      checkers,
      approver:
        summary.approvedAt !== null && checkers.length >= summary.requiredApprovals
          ? checkers[summary.requiredApprovals - 1]
          : null,
      returnedBy: summary.returned,
    },
  };
}

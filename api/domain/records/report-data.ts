import type { RecordContent, RecordSummary } from "../../../core/contract/records";
import { findRecord, listRecordHeads } from "../../../db/repositories/records";
import { errors } from "../../errors";
import { findProject } from "../projects/scope";
import { recordSummaries } from "./summary";

/**
 * What a printed record needs in one piece: its summary (with its approvals, from which the
 * report's signatures follow — core/report/record-meta.ts), its frozen content and the revision
 * table (the project's records up to and including this one).
 */
export type RecordForReport = {
  summary: RecordSummary;
  content: RecordContent;
  revisions: RecordSummary[];
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
  const earlier = (await listRecordHeads(project.id)).filter((h) => h.number <= row.number);
  const revisions = await recordSummaries(earlier);
  const summary = revisions.find((r) => r.id === row.id) ?? (await recordSummaries([head]))[0];
  return { summary, content: content as RecordContent, revisions };
}

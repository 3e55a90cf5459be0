import type { RecordContent } from "../../../core/contract/records";
import {
  findRecord,
  listRecordHeads,
  previousRecord,
  recordCommentsOf,
  recordEventsOf,
  type RecordRow,
} from "../../../db/repositories/records";
import { currentMembership } from "../../auth/guards";
import { errors } from "../../errors";
import { findProject } from "../../domain/projects/scope";
import { diffInputs, diffVerdicts } from "../../domain/records/diff";
import { recordSummaries, recordSummary } from "../../domain/records/summary";
import type { RouteHandler } from "../../openapi/registry";
import { presentComment, presentEvent } from "./presenter";
import type { NoInput, ProjectParams, RecordParams } from "./schema";

/** The record `recordId` of the live project in the route, or a 404 (also for another project's record). */
async function recordInRoute(workspaceId: string, params: RecordParams): Promise<RecordRow> {
  const project = await findProject(workspaceId, params.projectId);
  const record = await findRecord(project.id, params.recordId);
  if (!record) throw errors.notFound("This record");
  return record;
}

/** `GET …/records`: the revision table, newest first. */
export const listRecordsHandler: RouteHandler<ProjectParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  const records = await recordSummaries(await listRecordHeads(project.id));
  res.set("Cache-Control", "no-store").json({ records });
};

/** `GET …/records/{recordId}`: the record with its frozen content, comments and events. */
export const getRecordHandler: RouteHandler<RecordParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { content, ...head } = await recordInRoute(workspace.id, res.locals.input.params);
  const [summary, comments, events] = await Promise.all([
    recordSummary(head),
    recordCommentsOf(head.id),
    recordEventsOf(head.id),
  ]);
  res.set("Cache-Control", "no-store").json({
    ...summary,
    content,
    comments: comments.map(presentComment),
    events: events.map(presentEvent),
  });
};

/**
 * `GET …/records/{recordId}/diff?against=`: what changed from `against` (default: the record
 * before this one; 404 when there is none) to this record.
 */
export const diffRecordHandler: RouteHandler<RecordParams, { against?: string }, NoInput> = async (
  _req,
  res,
) => {
  const { workspace } = currentMembership(res);
  const { params, query } = res.locals.input;
  const to = await recordInRoute(workspace.id, params);
  const from = query.against
    ? await findRecord(to.projectId, query.against)
    : await previousRecord(to.projectId, to.number);
  if (!from) {
    throw errors.notFound(query.against ? "The record to compare against" : "A record before this one");
  }
  const { content: fromContent, ...fromHead } = from;
  const { content: toContent, ...toHead } = to;
  const [fromSummary, toSummary] = await recordSummaries([fromHead, toHead]);
  res.set("Cache-Control", "no-store").json({
    from: fromSummary,
    to: toSummary,
    inputs: diffInputs(fromContent as RecordContent, toContent as RecordContent),
    verdictChanges: diffVerdicts(fromContent as RecordContent, toContent as RecordContent),
  });
};

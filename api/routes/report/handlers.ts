import { currentMembership } from "../../auth/guards";
import type { AppContext } from "../../context";
import { findProject } from "../../domain/projects/scope";
import { buildRecordContent } from "../../domain/records/content";
import { recordForReport } from "../../domain/records/report-data";
import { sendReportPdf } from "../../domain/report/send";
import { recordReportMeta } from "../../../core/report";
import type { RouteHandler } from "../../openapi/registry";

type ProjectParams = { workspaceId: string; projectId: string };
type NoInput = Record<string, never>;

/** `GET …/report.pdf`: the draft report of the project as it is now ("DRAFT — not checked" on every page). */
export function draftReportPdfHandler(context: AppContext): RouteHandler<ProjectParams, NoInput, NoInput> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const project = await findProject(workspace.id, res.locals.input.params.projectId);
    await sendReportPdf(res, await buildRecordContent(context.sequelize, project), { kind: "draft" });
  };
}

/** `GET …/report-content`: the same content as JSON, for the print page to draw in the browser. */
export function draftReportContentHandler(
  context: AppContext,
): RouteHandler<ProjectParams, NoInput, NoInput> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const project = await findProject(workspace.id, res.locals.input.params.projectId);
    res.set("Cache-Control", "no-store").json(await buildRecordContent(context.sequelize, project));
  };
}

/** `GET …/records/:recordId/report.pdf`: the frozen record's report, as it was frozen, with its signatures. */
export const recordReportPdfHandler: RouteHandler<
  ProjectParams & { recordId: string },
  NoInput,
  NoInput
> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { projectId, recordId } = res.locals.input.params;
  const record = await recordForReport(workspace.id, projectId, recordId);
  await sendReportPdf(res, record.content, recordReportMeta(record.summary, record.revisions));
};

import type { Response } from "express";
import type { RecordContent } from "../../../core/contract/records";
import type { ReportMeta } from "../../../core/report";
import { renderReportInWorker } from "./render-in-worker";

/** A file name safe in a Content-Disposition header: "ct-7-shell-draft-report.pdf". */
export function reportFileName(projectName: string, meta: ReportMeta): string {
  const slug = (text: string) =>
    text
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-|-$/g, "");
  const what = meta.kind === "draft" ? "draft" : `${slug(meta.number)}-rev-${slug(meta.revision)}`;
  return `${slug(projectName) || "project"}-${what || "record"}-report.pdf`;
}

/**
 * Answers with the PDF report of `content` as `meta` describes it (a draft, or a frozen record with
 * its signatures): the one place the draft route and the record route share. The PDF is drawn in
 * the report worker thread, so the server keeps answering meanwhile.
 */
export async function sendReportPdf(res: Response, content: RecordContent, meta: ReportMeta): Promise<void> {
  const pdf = await renderReportInWorker(content, meta);
  res
    .set("Cache-Control", "no-store")
    .set("Content-Disposition", `attachment; filename="${reportFileName(content.inputs.project.name, meta)}"`)
    .type("application/pdf")
    .send(pdf);
}

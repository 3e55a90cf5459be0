import type { ReactNode } from "react";
import { Link, useParams } from "react-router-dom";
import type { RecordContent } from "../../../../../core/contract/records";
import { recordReportMeta, type ReportMeta } from "../../../../../core/report";
import { useRecord, useRecords } from "../../../entities/record/queries";
import { FormMessage, quietButton } from "../../../lib/forms";
import { recordPagePath, recordPdfPath } from "../model/paths";

/**
 * `/workspaces/:workspaceId/projects/:projectId/records/:recordId/report`: the print page of a
 * frozen record — its report drawn from the frozen content with the record's number, hash,
 * revision table and signatures (core/report/record-meta.ts, as the PDF signs it). The report's
 * HTML view lives in features/report; the app composes it in through `report` (features do not
 * import each other).
 */
export function RecordReportPage({
  report,
}: {
  report: (content: RecordContent, meta: ReportMeta) => ReactNode;
}) {
  const { workspaceId = "", projectId = "", recordId = "" } = useParams();
  const record = useRecord(workspaceId, projectId, recordId);
  const records = useRecords(workspaceId, projectId);
  if (record.isPending || records.isPending) return <p className="text-graphite-soft">Opening the record…</p>;
  if (record.error) return <FormMessage error={record.error} />;
  if (records.error) return <FormMessage error={records.error} />;
  const r = record.data;
  return (
    <div className="space-y-4">
      <div
        data-print-hidden
        className="flex flex-wrap items-center justify-between gap-3 border-b border-rule pb-3"
      >
        <p className="text-sm text-graphite-soft">
          <Link
            to={recordPagePath(workspaceId, projectId, recordId)}
            className="text-ink underline-offset-2 hover:underline"
          >
            Record <span className="num">{r.number}</span> · revision {r.revision}
          </Link>{" "}
          / calculation report
        </p>
        <div className="flex flex-wrap items-center gap-2">
          <button type="button" className={quietButton} onClick={() => window.print()}>
            Print
          </button>
          <a href={recordPdfPath(workspaceId, projectId, recordId)} className={quietButton}>
            Open the PDF
          </a>
        </div>
      </div>
      <h1 data-print-hidden className="text-2xl font-semibold tracking-tight">
        Calculation report of record <span className="num">{r.number}</span>, revision {r.revision}
      </h1>
      {report(r.content, recordReportMeta(r, records.data))}
    </div>
  );
}

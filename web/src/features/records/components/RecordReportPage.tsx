import { Link, useParams } from "react-router-dom";
import { useRecord } from "../../../entities/record/queries";
import { FormMessage, primaryButton } from "../../../lib/forms";
import { recordPagePath, recordPdfPath } from "../model/paths";

/**
 * `/workspaces/:workspaceId/projects/:projectId/records/:recordId/report`: the print page of a
 * frozen record. The report's HTML view (ReportView, features/report) is built beside this
 * branch; until it is composed here, the page offers the server's PDF of the same record, which
 * carries the same content, signatures and cautions.
 */
export function RecordReportPage() {
  const { workspaceId = "", projectId = "", recordId = "" } = useParams();
  const record = useRecord(workspaceId, projectId, recordId);
  if (record.isPending) return <p className="text-graphite-soft">Opening the record…</p>;
  if (record.error) return <FormMessage error={record.error} />;
  const r = record.data;
  return (
    <div className="space-y-4">
      <p className="text-sm text-graphite-soft">
        <Link
          to={recordPagePath(workspaceId, projectId, recordId)}
          className="text-ink underline-offset-2 hover:underline"
        >
          Record {r.number} · revision {r.revision}
        </Link>
      </p>
      <h1 className="text-3xl font-semibold tracking-tight">
        Calculation report of record <span className="num">{r.number}</span>
      </h1>
      <p className="max-w-3xl text-graphite-soft">
        The report of this frozen record, with its inputs, results, signatures and cautions, as a PDF to print
        or file.
      </p>
      <a href={recordPdfPath(workspaceId, projectId, recordId)} className={`inline-block ${primaryButton}`}>
        Open the PDF report
      </a>
    </div>
  );
}

import { Link, useParams } from "react-router-dom";
import { DownloadButton } from "../../../components/DownloadButton";
import { FormMessage, quietButton } from "../../../lib/forms";
import { useReportContent } from "../api/report-content";
import { ReportView } from "./ReportView";

const DRAFT = { kind: "draft" } as const;

/** `/workspaces/:workspaceId/projects/:projectId/report`: the draft report, to read, print or download as PDF. */
export function ReportPage() {
  const { workspaceId = "", projectId = "" } = useParams();
  const content = useReportContent(workspaceId, projectId);
  if (content.isPending)
    return <p className="text-graphite-soft">Taking the project's content for the report…</p>;
  if (content.error) return <FormMessage error={content.error} />;
  return (
    <div className="space-y-4">
      <div
        data-print-hidden
        className="flex flex-wrap items-center justify-between gap-3 border-b border-rule pb-3"
      >
        <p className="text-sm text-graphite-soft">
          <Link
            to={`/workspaces/${workspaceId}/projects/${projectId}`}
            className="text-ink underline-offset-2 hover:underline"
          >
            {content.data.inputs.project.name}
          </Link>{" "}
          / draft report (not checked)
        </p>
        <div className="flex flex-wrap items-center gap-2">
          <button type="button" className={quietButton} onClick={() => window.print()}>
            Print
          </button>
          <DownloadButton
            path={`/workspaces/${workspaceId}/projects/${projectId}/report.pdf`}
            fileName="draft-report.pdf"
            label="Download PDF"
            className={quietButton}
          />
        </div>
      </div>
      <h1 data-print-hidden className="text-2xl font-semibold tracking-tight">
        Draft calculation report
      </h1>
      <ReportView content={content.data} meta={DRAFT} />
    </div>
  );
}

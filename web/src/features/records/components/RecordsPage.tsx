import { Link, useParams } from "react-router-dom";
import { Panel } from "../../../components/Panel";
import { useProject } from "../../../entities/project/queries";
import { useRecords, useReview } from "../../../entities/record/queries";
import { useWorkspaceRole } from "../../../entities/workspace/queries";
import { FormMessage } from "../../../lib/forms";
import { readOnlyNote } from "../../../lib/role-note";
import { RequiredApprovals } from "./RequiredApprovals";
import { ReviewStatus } from "./ReviewStatus";
import { RevisionTable } from "./RevisionTable";

/** `/workspaces/:workspaceId/projects/:projectId/records`: the project's review and its revision table. */
export function RecordsPage() {
  const { workspaceId = "", projectId = "" } = useParams();
  const role = useWorkspaceRole(workspaceId);
  const project = useProject(workspaceId, projectId);
  const review = useReview(workspaceId, projectId);
  const records = useRecords(workspaceId, projectId);

  if (project.isPending || role.isPending || records.isPending)
    return <p className="text-graphite-soft">Loading the records…</p>;
  if (project.error || records.error) return <FormMessage error={project.error ?? records.error} />;
  const readOnly = role.role ? readOnlyNote(role.role) : null;
  return (
    <div className="space-y-5">
      <header className="border-b border-rule pb-4">
        <p className="text-sm text-graphite-soft">
          <Link
            to={`/workspaces/${workspaceId}/projects`}
            className="text-ink underline-offset-2 hover:underline"
          >
            {role.data?.name ?? "Workspace"}
          </Link>{" "}
          /{" "}
          <Link
            to={`/workspaces/${workspaceId}/projects/${projectId}`}
            className="text-ink underline-offset-2 hover:underline"
          >
            {project.data.name}
          </Link>
        </p>
        <h1 className="text-3xl font-semibold tracking-tight">Records and sign-off</h1>
        <p className="mt-1 max-w-3xl text-graphite-soft">
          Each record freezes the inputs and results as they were submitted for check. A checker comments,
          returns it or approves it; an approved record stays as it was, whatever changes later.
        </p>
        {readOnly && <p className="mt-1 max-w-3xl text-sm text-graphite-soft">{readOnly}</p>}
      </header>
      <ReviewStatus linkToRecords={false} />
      <Panel id="revisions" index="1" title="Revision table" subtitle="newest first">
        <RevisionTable records={records.data} workspaceId={workspaceId} projectId={projectId} />
      </Panel>
      {review.data && role.role && (
        <Panel id="approvals" index="2" title="Approvals required">
          <RequiredApprovals current={review.data.requiredApprovals} role={role.role} />
        </Panel>
      )}
    </div>
  );
}

import { Link, useParams } from "react-router-dom";
import { scopeCoverageSentence } from "../../../../../core/report";
import { Caution } from "../../../components/Caution";
import { Panel } from "../../../components/Panel";
import { useProject } from "../../../entities/project/queries";
import { useRecord } from "../../../entities/record/queries";
import { useWorkspaceRole } from "../../../entities/workspace/queries";
import { FormMessage, quietButton } from "../../../lib/forms";
import { reviewActionNote } from "../../../lib/role-note";
import { useSession } from "../../../lib/session";
import { commentThreads } from "../model/comments";
import { provenance } from "../model/frozen-inputs";
import { recordPdfPath, recordPrintPath, recordsPagePath } from "../model/paths";
import { frozenResultsSubtitle } from "../model/scope";
import { recordStatusWords } from "../model/status";
import { CommentThreads, type CommentPermission } from "./CommentThreads";
import { DecisionPanel } from "./DecisionPanel";
import { FrozenInputs } from "./FrozenInputs";
import { FrozenResults } from "./FrozenResults";
import { RecordDiffPanel } from "./RecordDiffPanel";
import { RecordEvents } from "./RecordEvents";
import { Signatures } from "./Signatures";
import { StatusBadge } from "./StatusBadge";

/**
 * `/workspaces/:workspaceId/projects/:projectId/records/:recordId`: one frozen record as the
 * checker reads it — sign-off, decision, what changed since the record before, the frozen results
 * with comments per row, comments on the whole, the inputs, and the status changes.
 */
export function RecordPage() {
  const { workspaceId = "", projectId = "", recordId = "" } = useParams();
  const role = useWorkspaceRole(workspaceId);
  const project = useProject(workspaceId, projectId);
  const record = useRecord(workspaceId, projectId, recordId);
  const session = useSession();

  if (record.isPending || role.isPending) return <p className="text-graphite-soft">Opening the record…</p>;
  if (record.error) return <FormMessage error={record.error} />;
  const r = record.data;
  const ids = { workspaceId, projectId, recordId };
  // The frozen content is what the record is; the summary's copy is the same for records the API writes.
  const scope = r.content.scope ?? r.scope;
  const threads = commentThreads(r.comments);
  const roleNote = role.role ? reviewActionNote(role.role, "comment") : null;
  const permission: CommentPermission =
    roleNote !== null
      ? { canWrite: false, why: roleNote }
      : r.status !== "submitted"
        ? {
            canWrite: false,
            why: `Comments are closed: this record is ${recordStatusWords(r.status).name.toLowerCase()}. Comments go on the record submitted for check.`,
          }
        : { canWrite: true, why: null };
  const records = recordsPagePath(workspaceId, projectId);
  return (
    <div className="space-y-5">
      <header className="flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
        <div>
          <p className="text-sm text-graphite-soft">
            <Link
              to={`/workspaces/${workspaceId}/projects/${projectId}`}
              className="text-ink underline-offset-2 hover:underline"
            >
              {project.data?.name ?? r.content.inputs.project.name}
            </Link>{" "}
            /{" "}
            <Link to={records} className="text-ink underline-offset-2 hover:underline">
              Records and sign-off
            </Link>
          </p>
          <h1 className="text-3xl font-semibold tracking-tight">
            Record <span className="num">{r.number}</span> · revision{" "}
            <span className="num">{r.revision}</span>
          </h1>
          <p className="mt-1 flex flex-wrap items-center gap-2 text-[14px]">
            <StatusBadge status={r.status} of="record" />
            <span className="text-graphite-soft">{recordStatusWords(r.status).next}</span>
          </p>
          <p className="mt-1 max-w-3xl whitespace-pre-line text-[14px]">
            <span className="text-graphite-soft">What changed and why: </span>
            {r.reason}
          </p>
          <p className="mt-1 max-w-3xl text-[14px]" data-testid="record-scope">
            {scopeCoverageSentence(
              scope,
              { loadCases: r.content.inputs.loadCases.length, locations: r.content.inputs.locations.length },
              "record",
            )}
          </p>
          <p className="mt-1 max-w-3xl break-all text-[12px] text-graphite-soft">
            {provenance(r.content, r.hash)}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <Link to={recordPrintPath(workspaceId, projectId, recordId)} className={quietButton}>
            Print page
          </Link>
          <a href={recordPdfPath(workspaceId, projectId, recordId)} className={quietButton}>
            PDF report
          </a>
        </div>
      </header>

      <Panel id="signatures" index="1" title="Sign-off" subtitle="originator, checkers and dates">
        <Signatures record={r} />
      </Panel>

      <Panel id="decision" index="2" title="Check" subtitle="return with comments or approve">
        {role.role && (
          <DecisionPanel record={r} role={role.role} userId={session.data?.user?.id ?? null} ids={ids} />
        )}
      </Panel>

      <Panel
        id="diff"
        index="3"
        title="Changes since the record before"
        subtitle="verdicts first, then inputs"
      >
        <RecordDiffPanel ids={ids} />
      </Panel>

      <Panel id="frozen-results" index="4" title="Results as frozen" subtitle={frozenResultsSubtitle(scope)}>
        <FrozenResults content={r.content} threads={threads} ids={ids} permission={permission} />
        <Caution className="border-t border-rule px-3 py-2" />
      </Panel>

      <Panel
        id="record-comments"
        index="5"
        title="Comments on the record"
        subtitle="as a whole; row comments sit beside their rows"
      >
        <div className="px-3 py-2">
          <CommentThreads
            threads={threads.onRecord}
            rowId={null}
            newLabel="Comment on the record as a whole"
            ids={ids}
            permission={permission}
          />
        </div>
      </Panel>

      <Panel
        id="frozen-inputs"
        index="6"
        title="Inputs as frozen"
        subtitle="with units, sources and state revisions"
      >
        <FrozenInputs content={r.content} />
      </Panel>

      <Panel id="events" index="7" title="Status changes" subtitle="who and when, oldest first">
        <RecordEvents record={r} />
      </Panel>
    </div>
  );
}

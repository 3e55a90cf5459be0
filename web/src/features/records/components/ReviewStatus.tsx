import { useState } from "react";
import { Link, useParams } from "react-router-dom";
import { useSubmitRecord } from "../../../entities/record/mutations";
import { useReview } from "../../../entities/record/queries";
import { useWorkspaceRole } from "../../../entities/workspace/queries";
import { ApiError } from "../../../lib/api-client";
import { quietButton } from "../../../lib/forms";
import { reviewActionNote } from "../../../lib/role-note";
import { reviewSummary, submitBlockedReason } from "../model/review-summary";
import { recordsPagePath } from "../model/paths";
import { scopeWords, type RecordScope } from "../model/scope";
import { StatusBadge } from "./StatusBadge";
import { SubmitRecordForm } from "./SubmitRecordForm";

/**
 * The project's review status as the project and comparison pages show it: the status in words,
 * the revision, whether the results on screen differ from the last approved record, a link to the
 * records, and "Submit for check" (asking what changed and why, and what the record covers) for
 * editors and owners.
 */
export function ReviewStatus({ linkToRecords = true }: { linkToRecords?: boolean } = {}) {
  const { workspaceId = "", projectId = "" } = useParams();
  const role = useWorkspaceRole(workspaceId);
  const review = useReview(workspaceId, projectId);
  const submit = useSubmitRecord(workspaceId, projectId);
  const [asking, setAsking] = useState(false);
  const [submitted, setSubmitted] = useState<{
    id: string;
    number: number;
    revision: string;
    scope: RecordScope | null;
  } | null>(null);

  // Until the records API answers (or where it does not exist), the pages stand as they were.
  if (review.isPending || role.isPending) return null;
  if (review.error) {
    if (review.error instanceof ApiError && review.error.status === 404) return null;
    return (
      <p className="text-sm text-graphite-soft">
        The review status could not be read ({review.error.message}). Reload the page to try again.
      </p>
    );
  }
  const r = review.data;
  const s = reviewSummary(r);
  const roleNote = role.role ? reviewActionNote(role.role, "submit") : null;
  const blocked = submitBlockedReason(r);
  const records = recordsPagePath(workspaceId, projectId);
  return (
    <section
      aria-label="Review status"
      className="space-y-2 rounded-sm border border-rule bg-panel px-4 py-3"
      data-testid="review-status"
    >
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <StatusBadge status={r.status} of="project" />
        <span className="text-[14px] text-graphite" data-testid="review-revision">
          {s.revision}
        </span>
        {linkToRecords && (
          <Link to={records} className="ml-auto text-[14px] text-ink underline-offset-2 hover:underline">
            Records and sign-off
          </Link>
        )}
      </div>
      <p className="text-[14px] text-graphite-soft">{s.next}</p>
      {s.differs && (
        <p className="text-[14px] font-semibold text-close" data-testid="review-differs">
          <span aria-hidden="true">≠ </span>
          {s.differs} {s.approved}
        </p>
      )}
      {!s.differs && s.approved && <p className="text-[13px] text-graphite-soft">{s.approved}</p>}
      {submitted && (
        <p role="status" className="text-[14px] text-pass">
          <span aria-hidden="true">✓ </span>
          Record {submitted.number} (revision {submitted.revision}) is submitted for check.{" "}
          {submitted.scope && <>It covers {scopeWords(submitted.scope)}. </>}
          <Link to={`${records}/${submitted.id}`} className="text-ink underline underline-offset-2">
            Open record {submitted.number}
          </Link>
        </p>
      )}
      {roleNote ? (
        <p className="text-[13px] text-graphite-soft">{roleNote}</p>
      ) : blocked ? (
        <p className="text-[13px] text-graphite-soft">{blocked}</p>
      ) : asking ? (
        <SubmitRecordForm
          workspaceId={workspaceId}
          projectId={projectId}
          pending={submit.isPending}
          error={submit.error}
          onCancel={() => setAsking(false)}
          onSend={(body) =>
            submit.mutateAsync(body).then((record) => {
              setSubmitted(record);
              setAsking(false);
            })
          }
        />
      ) : (
        <button
          type="button"
          className={quietButton}
          onClick={() => {
            submit.reset();
            setSubmitted(null);
            setAsking(true);
          }}
        >
          Submit for check
        </button>
      )}
    </section>
  );
}

import { useState } from "react";
import type { RecordDetail } from "../../../entities/record/api-types";
import { useApproveRecord, useReturnRecord } from "../../../entities/record/mutations";
import type { Role } from "../../../../../core/contract/workspaces";
import { ApiError } from "../../../lib/api-client";
import { FormMessage, quietButton } from "../../../lib/forms";
import { reviewActionNote } from "../../../lib/role-note";
import { readApprovalComment, readReturnComment } from "../model/forms";
import { independenceNote } from "../model/independence";
import { TextForm } from "./TextForm";

/** Why the server refused, in its words; an independence refusal says so first. */
function refusal(error: unknown): string | null {
  if (!(error instanceof ApiError)) return null;
  if (error.id === "independence") return `Not independent: ${error.message}`;
  return error.message;
}

/**
 * Return with comments / Approve, for reviewers and owners while the record waits for its check.
 * Whoever may not act is told why in words: their role, the record's status, or independence (the
 * page knows the submitter and who saved each frozen state; the server has the last word).
 */
export function DecisionPanel({
  record,
  role,
  userId,
  ids,
}: {
  record: RecordDetail;
  role: Role;
  userId: string | null;
  ids: { workspaceId: string; projectId: string; recordId: string };
}) {
  const approve = useApproveRecord(ids.workspaceId, ids.projectId, ids.recordId);
  const giveBack = useReturnRecord(ids.workspaceId, ids.projectId, ids.recordId);
  const [choice, setChoice] = useState<"approve" | "return" | null>(null);
  const roleNote = reviewActionNote(role, "decide");
  const approvals = `${record.approvals.length} of ${record.requiredApprovals} approval${record.requiredApprovals === 1 ? "" : "s"} given`;

  if (record.status !== "submitted") {
    return (
      <p className="px-3 py-2 text-[14px] text-graphite-soft">
        This record is no longer waiting for its check ({approvals}); decisions are made on the record
        submitted for check.
      </p>
    );
  }
  if (roleNote)
    return (
      <div className="px-3 py-2 text-[14px]">
        <p>{approvals}.</p>
        <p className="text-[13px] text-graphite-soft">{roleNote}</p>
      </div>
    );
  const notApprove = independenceNote(record, userId, "approve");
  const notReturn = independenceNote(record, userId, "return");
  const error = refusal(approve.error) ?? refusal(giveBack.error);
  return (
    <div className="space-y-2 px-3 py-2 text-[14px]">
      <p>{approvals}.</p>
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className={quietButton}
          disabled={!!notReturn}
          aria-describedby={notReturn ? "return-why" : undefined}
          onClick={() => {
            giveBack.reset();
            setChoice("return");
          }}
        >
          Return with comments
        </button>
        <button
          type="button"
          className={quietButton}
          disabled={!!notApprove}
          aria-describedby={notApprove ? "approve-why" : undefined}
          onClick={() => {
            approve.reset();
            setChoice("approve");
          }}
        >
          Approve
        </button>
      </div>
      {notReturn && (
        <p id="return-why" className="text-[13px] text-graphite-soft">
          {notReturn}
        </p>
      )}
      {notApprove && notApprove !== notReturn && (
        <p id="approve-why" className="text-[13px] text-graphite-soft">
          {notApprove}
        </p>
      )}
      {choice === "return" && (
        <TextForm
          label="Comment for the originator"
          hint="What must change before this can be approved. The record goes back to its originator."
          submitLabel="Return with comments"
          field="comment"
          read={readReturnComment}
          pending={giveBack.isPending}
          error={null}
          onCancel={() => setChoice(null)}
          onSend={(comment) => giveBack.mutateAsync({ comment }).then(() => setChoice(null))}
        />
      )}
      {choice === "approve" && (
        <TextForm
          label="Approval remark (optional)"
          hint="Your approval is signed with your name and the date, and the record stays as it is."
          submitLabel="Approve this record"
          field="comment"
          read={readApprovalComment}
          pending={approve.isPending}
          error={null}
          onCancel={() => setChoice(null)}
          onSend={(comment) => approve.mutateAsync(comment ? { comment } : {}).then(() => setChoice(null))}
        />
      )}
      {error && <FormMessage>{error}</FormMessage>}
    </div>
  );
}

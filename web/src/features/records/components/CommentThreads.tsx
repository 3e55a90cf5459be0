import { useState } from "react";
import type { RecordComment } from "../../../entities/record/api-types";
import { useAddComment } from "../../../entities/record/mutations";
import { formatDateTime } from "../model/dates";
import type { Thread } from "../model/comments";
import { readComment } from "../model/forms";
import { TextForm } from "./TextForm";

/** Who may write here and why not, decided by the page (role and record status). */
export type CommentPermission = { canWrite: boolean; why: string | null };

function CommentText({ comment }: { comment: RecordComment }) {
  return (
    <div>
      <p className="text-[13px] text-graphite-soft">
        <strong className="text-graphite">{comment.by.name}</strong>{" "}
        <time dateTime={comment.at} className="num">
          {formatDateTime(comment.at)}
        </time>
      </p>
      <p className="whitespace-pre-line text-[14px]">{comment.text}</p>
    </div>
  );
}

/** One thread: the comment, its answers indented beneath it, and "Answer" for those who may write. */
function ThreadView({
  thread,
  ids,
  permission,
}: {
  thread: Thread;
  ids: { workspaceId: string; projectId: string; recordId: string };
  permission: CommentPermission;
}) {
  const add = useAddComment(ids.workspaceId, ids.projectId, ids.recordId);
  const [answering, setAnswering] = useState(false);
  return (
    <li className="space-y-1.5 py-2" data-testid="comment-thread">
      <CommentText comment={thread.comment} />
      {thread.replies.length > 0 && (
        <ol className="ml-4 space-y-1.5 border-l-2 border-rule pl-3" aria-label="Answers">
          {thread.replies.map((reply) => (
            <li key={reply.id}>
              <CommentText comment={reply} />
            </li>
          ))}
        </ol>
      )}
      {permission.canWrite &&
        (answering ? (
          <div className="ml-4">
            <TextForm
              label={`Answer ${thread.comment.by.name}`}
              submitLabel="Send answer"
              field="text"
              read={readComment}
              rows={2}
              pending={add.isPending}
              error={add.error}
              onCancel={() => setAnswering(false)}
              onSend={(text) =>
                add
                  .mutateAsync({ text, rowId: thread.comment.rowId, replyTo: thread.comment.id })
                  .then(() => setAnswering(false))
              }
            />
          </div>
        ) : (
          <button
            type="button"
            className="ml-4 text-[13px] text-ink underline-offset-2 hover:underline"
            onClick={() => {
              add.reset();
              setAnswering(true);
            }}
          >
            Answer {thread.comment.by.name}
          </button>
        ))}
    </li>
  );
}

/**
 * The comments on the record as a whole, or on one row (`rowId`), with a box for a new one when
 * the person may write; otherwise the reason they may not.
 */
export function CommentThreads({
  threads,
  rowId,
  newLabel,
  ids,
  permission,
}: {
  threads: readonly Thread[];
  rowId: string | null;
  newLabel: string;
  ids: { workspaceId: string; projectId: string; recordId: string };
  permission: CommentPermission;
}) {
  const add = useAddComment(ids.workspaceId, ids.projectId, ids.recordId);
  return (
    <div className="space-y-2">
      {threads.length === 0 ? (
        <p className="text-[14px] text-graphite-soft">No comments yet.</p>
      ) : (
        <ol className="divide-y divide-rule">
          {threads.map((t) => (
            <ThreadView key={t.comment.id} thread={t} ids={ids} permission={permission} />
          ))}
        </ol>
      )}
      {permission.canWrite ? (
        <TextForm
          label={newLabel}
          submitLabel="Add comment"
          field="text"
          read={readComment}
          rows={2}
          pending={add.isPending}
          error={add.error}
          onSend={(text) => add.mutateAsync({ text, rowId, replyTo: null })}
        />
      ) : (
        permission.why && <p className="text-[13px] text-graphite-soft">{permission.why}</p>
      )}
    </div>
  );
}

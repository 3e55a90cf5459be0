import type { RecordComment } from "../../../entities/record/api-types";

/** A comment with the answers to it (and to its answers), oldest first. */
export type Thread = { comment: RecordComment; replies: RecordComment[] };

/** The comments of a record: on the record as a whole, and per comparison row. */
export type CommentThreads = { onRecord: Thread[]; byRow: Map<string, Thread[]> };

const byTime = (a: RecordComment, b: RecordComment) => a.at.localeCompare(b.at) || a.id.localeCompare(b.id);

/**
 * Groups comments into threads: each comment that answers nothing starts one; an answer joins
 * the thread of the comment it answers, however deep the chain of answers goes (one level of
 * indentation reads best on a phone). An answer whose comment is not in the list starts its own
 * thread rather than vanish.
 */
export function commentThreads(comments: readonly RecordComment[]): CommentThreads {
  const byId = new Map(comments.map((c) => [c.id, c]));
  const rootOf = (c: RecordComment): RecordComment => {
    const seen = new Set<string>();
    let current = c;
    while (current.replyTo && byId.has(current.replyTo) && !seen.has(current.id)) {
      seen.add(current.id);
      current = byId.get(current.replyTo)!;
    }
    return current;
  };
  const threads = new Map<string, Thread>();
  const sorted = [...comments].sort(byTime);
  for (const c of sorted) if (rootOf(c) === c) threads.set(c.id, { comment: c, replies: [] });
  for (const c of sorted) {
    const root = rootOf(c);
    if (root !== c) threads.get(root.id)!.replies.push(c);
  }
  const onRecord: Thread[] = [];
  const byRow = new Map<string, Thread[]>();
  for (const thread of threads.values()) {
    const rowId = thread.comment.rowId;
    if (rowId === null) onRecord.push(thread);
    else byRow.set(rowId, [...(byRow.get(rowId) ?? []), thread]);
  }
  return { onRecord, byRow };
}

/** How many comments (answers included) a row carries, for the button beside it. */
export const commentCount = (threads: readonly Thread[] | undefined): number =>
  (threads ?? []).reduce((n, t) => n + 1 + t.replies.length, 0);

/** The words of a row's comment button: what it does and how many comments it hides. */
export function rowCommentLabel(rowName: string, count: number): string {
  if (count === 0) return `Comment on ${rowName}`;
  return `${count} comment${count === 1 ? "" : "s"} on ${rowName}`;
}

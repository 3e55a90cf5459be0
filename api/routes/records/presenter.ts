import type { RecordComment, RecordEvent } from "../../../core/contract/records";
import type { RecordCommentRow, RecordEventRow } from "../../../db/repositories/records";

/** A comment as the API sends it. */
export function presentComment(c: RecordCommentRow): RecordComment {
  return {
    id: c.id,
    recordId: c.recordId,
    rowId: c.rowId,
    replyTo: c.replyTo,
    text: c.text,
    by: { id: c.authorId, name: c.authorName },
    at: c.createdAt.toISOString(),
  };
}

/** A status change as the API sends it. */
export function presentEvent(e: RecordEventRow): RecordEvent {
  return {
    status: e.status,
    action: e.action,
    by: { id: e.actorId, name: e.actorName },
    at: e.createdAt.toISOString(),
    note: e.note,
  };
}

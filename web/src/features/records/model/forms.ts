/** What a form reads from a text box: the trimmed text, or an error that names the field and says what to do. */
export type ReadText = { ok: true; value: string } | { ok: false; error: string };

export const REASON_MAX = 2000;
export const COMMENT_MAX = 4000;

function readText(text: string, field: string, max: number, empty: string): ReadText {
  const value = text.trim();
  if (!value) return { ok: false, error: `${field}: ${empty}` };
  if (value.length > max)
    return { ok: false, error: `${field}: at most ${max} characters (now ${value.length}); shorten it.` };
  return { ok: true, value };
}

/** "What changed and why" of a submission: shown in the revision table, so it may not be empty. */
export const readReason = (text: string) =>
  readText(text, "What changed and why", REASON_MAX, "say what changed since the last record and why.");

/** A comment or an answer. */
export const readComment = (text: string) =>
  readText(text, "Comment", COMMENT_MAX, "write what the originator should look at.");

/** The comment a return carries: the originator must know what to change. */
export const readReturnComment = (text: string) =>
  readText(
    text,
    "Comment for the originator",
    COMMENT_MAX,
    "say what must change before this can be approved.",
  );

/** An approval's optional remark: empty is fine and is sent as no comment at all. */
export function readApprovalComment(text: string): ReadText {
  const value = text.trim();
  if (value.length > COMMENT_MAX)
    return {
      ok: false,
      error: `Approval remark: at most ${COMMENT_MAX} characters (now ${value.length}); shorten it.`,
    };
  return { ok: true, value };
}

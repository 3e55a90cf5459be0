import type { RecordDetail } from "../../../entities/record/api-types";

/**
 * Why the signed-in person may not return or approve this record, in words, before they try;
 * null when nothing here says so (the server decides in the end and its refusal is shown as it
 * says it). The rule: whoever approves cannot be the one who submitted the record or who last
 * edited an input in it; the submitter cannot return their own record either. Only the state
 * revisions carry who saved them in the frozen content, so other inputs are left to the server.
 */
export function independenceNote(
  record: Pick<RecordDetail, "submittedBy" | "approvals" | "content">,
  userId: string | null,
  action: "approve" | "return",
): string | null {
  if (!userId) return null;
  if (record.submittedBy.id === userId)
    return action === "approve"
      ? "You submitted this record, so you cannot approve it: an independent checker approves it."
      : "You submitted this record, so you cannot return it: an independent checker reviews it.";
  if (action === "return") return null;
  if (record.approvals.some((a) => a.by.id === userId))
    return "You have already approved this record; a second checker gives the other approval.";
  const edited = record.content.stateRevisions.find((s) => s.savedBy === userId);
  if (edited) {
    const caseName =
      record.content.inputs.loadCases.find((c) => c.key === edited.loadCase)?.name ?? edited.loadCase;
    const locationName =
      record.content.inputs.locations.find((l) => l.key === edited.location)?.name ?? edited.location;
    return `You last edited an input in this record (the state of ${caseName} at ${locationName}), so you cannot approve it: an independent checker approves it.`;
  }
  return null;
}

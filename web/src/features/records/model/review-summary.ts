import type { Review } from "../../../entities/record/api-types";
import { scopeWords } from "./scope";
import { projectStatusWords, type StatusWords } from "./status";

/** What the project and comparison pages say about the review, line by line. */
export type ReviewSummary = StatusWords & {
  /** "Revision B" and which record it is at. */
  revision: string;
  /** The sentence that warns the results on screen are not the approved ones, or null. */
  differs: string | null;
  /** Where the last approved record is, when there is one. */
  approved: string | null;
};

export const DIFFERS_SENTENCE = "The results shown differ from the last approved record.";

/**
 * "Last approved: record 2, revision A." and, when that record covers only part of the project,
 * which part: whether the results differ is judged within it, so the reader must know it.
 */
function lastApprovedSentence(record: NonNullable<Review["lastApproved"]>): string {
  const which = `Last approved: record ${record.number}, revision ${record.revision}.`;
  return record.scope ? `${which} It covers ${scopeWords(record.scope)}.` : which;
}

/** The review answer as the sentences a practitioner reads. */
export function reviewSummary(review: Review): ReviewSummary {
  const words = projectStatusWords(review.status);
  const latest = review.latestRecord;
  const revision = latest
    ? `Revision ${review.revision} · latest record ${latest.number} (revision ${latest.revision})`
    : `Revision ${review.revision} · no record submitted yet`;
  return {
    ...words,
    revision,
    differs: review.currentDiffersFromApproved === true ? DIFFERS_SENTENCE : null,
    approved: review.lastApproved ? lastApprovedSentence(review.lastApproved) : null,
  };
}

/**
 * Whether a new record may be submitted now: not while one waits for its check (the API
 * answers 409 then), so the button says why instead.
 */
export function submitBlockedReason(review: Review): string | null {
  if (review.status === "submitted")
    return "A record is already submitted for check: wait until it is returned or approved, then submit the next one.";
  return null;
}

import type { Review } from "../../../entities/record/api-types";
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
    approved: review.lastApproved
      ? `Last approved: record ${review.lastApproved.number}, revision ${review.lastApproved.revision}.`
      : null,
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

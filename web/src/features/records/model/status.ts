import type { ProjectReviewStatus, RecordStatus } from "../../../entities/record/api-types";

/**
 * The review statuses in words a practitioner reads at once: a short name for badges and
 * tables, and a sentence that says who acts next. Sigmacube's own wording.
 */
export type StatusWords = { name: string; next: string };

const PROJECT: Readonly<Record<ProjectReviewStatus, StatusWords>> = {
  "in-work": {
    name: "Work in progress",
    next: "Not submitted for check: the inputs and results may still change.",
  },
  submitted: {
    name: "Submitted for check",
    next: "Frozen and waiting for an independent checker to comment, return or approve it.",
  },
  returned: {
    name: "Returned with comments",
    next: "The checker sent it back: the originator answers the comments, changes what is needed and resubmits.",
  },
  approved: {
    name: "Approved",
    next: "The last record was checked and approved; a change to the inputs starts the next revision.",
  },
};

const RECORD: Readonly<Record<RecordStatus, StatusWords>> = {
  submitted: { name: "Submitted for check", next: "Waiting for the checker." },
  returned: { name: "Returned with comments", next: "Sent back to the originator." },
  approved: { name: "Approved", next: "Checked and signed off; it stays as it was." },
  superseded: { name: "Superseded", next: "A later record of this project was submitted." },
};

/** Where the project stands in its review. */
export const projectStatusWords = (status: ProjectReviewStatus): StatusWords => PROJECT[status];

/** Where one frozen record stands. */
export const recordStatusWords = (status: RecordStatus): StatusWords => RECORD[status];

/** A mark beside the status word, so the status never rests on colour alone. */
export const STATUS_MARK: Readonly<Record<ProjectReviewStatus | RecordStatus, string>> = {
  "in-work": "✎",
  submitted: "→",
  returned: "↩",
  approved: "✓",
  superseded: "↓",
};

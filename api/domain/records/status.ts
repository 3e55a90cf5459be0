import type { ProjectReviewStatus } from "../../../core/contract/records";
import type { RecordStatus } from "../../../db/models/calculation-record";
import { errors } from "../../errors";

/**
 * The review's status machine. A record is born "submitted"; a checker either returns it
 * ("returned") or approves it, and it becomes "approved" once it has the approvals it needs.
 * A returned record becomes "superseded" when the next one is submitted; an approved record
 * stays approved. Only a submitted record takes comments, returns and approvals, and a project
 * has at most one submitted record at a time.
 */

/**
 * The project's review status from its latest record: "in-work" with no record, or when the
 * latest is approved but the project has changed since (`differsFromApproved`); otherwise the
 * latest record's status.
 */
export function projectReviewStatus(
  latest: { status: RecordStatus } | null,
  differsFromApproved: boolean | null,
): ProjectReviewStatus {
  if (!latest || latest.status === "superseded") return "in-work";
  if (latest.status === "approved" && differsFromApproved) return "in-work";
  return latest.status;
}

/** 409 when the project already has a record waiting for a check. */
export function assertNothingPending(latest: { status: RecordStatus; number: number } | null): void {
  if (latest?.status === "submitted") {
    throw errors.conflictWithId(
      "record_pending",
      `Record ${latest.number} of this project is still submitted for check; it must be returned or approved before another is submitted.`,
    );
  }
}

/** 409 unless the record is waiting for a check (`doing`: "comment on", "return", "approve"). */
export function assertSubmitted(record: { status: RecordStatus; number: number }, doing: string): void {
  if (record.status !== "submitted") {
    throw errors.conflictWithId(
      "record_not_submitted",
      `Record ${record.number} is ${record.status}; only a record submitted for check can be ${doing}.`,
    );
  }
}

/** Whether `approvals` approvals complete a record that needs `required`. */
export function isComplete(approvals: number, required: number): boolean {
  return approvals >= required;
}

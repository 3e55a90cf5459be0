import type { RecordSummary } from "../../../entities/record/api-types";
import { formatDateTime } from "./dates";
import { scopeWords } from "./scope";
import { recordStatusWords } from "./status";

/** One line of the revision table, every cell already in words. */
export type RevisionRow = {
  id: string;
  number: number;
  revision: string;
  status: RecordSummary["status"];
  statusName: string;
  reason: string;
  submittedBy: string;
  submittedAt: string;
  /** When it was returned or (finally) approved, and by whom; "—" while it waits. */
  decided: string;
  /** "1 of 2 (Rui Tanager)". */
  approvals: string;
  /** What the record covers: "whole project" or "2 of 4 load cases, 1 of 3 locations". */
  scope: string;
};

/** When and by whom the record was returned or approved. */
function decision(r: RecordSummary): string {
  if (r.returned) return `returned ${formatDateTime(r.returned.at)} by ${r.returned.by.name}`;
  if (r.status === "approved" && (r.approvedAt || r.approvals.length > 0))
    return `approved ${formatDateTime(r.approvedAt ?? r.approvals[r.approvals.length - 1].at)}`;
  return "—";
}

/** The records as the revision table shows them, in the order given (the API's: newest first). */
export function revisionRows(records: readonly RecordSummary[]): RevisionRow[] {
  return records.map((r) => ({
    id: r.id,
    number: r.number,
    revision: r.revision,
    status: r.status,
    statusName: recordStatusWords(r.status).name,
    reason: r.reason,
    submittedBy: r.submittedBy.name,
    submittedAt: formatDateTime(r.submittedAt),
    decided: decision(r),
    approvals:
      `${r.approvals.length} of ${r.requiredApprovals}` +
      (r.approvals.length ? ` (${r.approvals.map((a) => a.by.name).join(", ")})` : ""),
    scope: scopeWords(r.scope),
  }));
}

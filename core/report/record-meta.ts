import type { RecordSummary } from "../contract/records";
import type { ReportMeta } from "./meta";

const signed = (s: { by: { name: string }; at: string }) => ({ name: s.by.name, at: s.at });

/**
 * What the report prints about a frozen record besides its content: number, revision, status,
 * hash, the revision table (the project's records up to this one, oldest first) and the
 * signatures — the originator is the submitter, the checkers everyone who approved it, the
 * approver the approval that completed it (none while the record waits or was returned). The
 * PDF (api/) and the print page (web/) both build it here, so they sign the same way.
 */
export function recordReportMeta(record: RecordSummary, revisions: readonly RecordSummary[]): ReportMeta {
  const upToThis = revisions.filter((r) => r.number <= record.number).sort((a, b) => a.number - b.number);
  const complete = record.approvedAt !== null && record.approvals.length >= record.requiredApprovals;
  return {
    kind: "record",
    recordId: record.id,
    number: String(record.number),
    revision: record.revision,
    status: record.status,
    hash: record.hash,
    revisions: upToThis.map((r) => ({
      number: String(r.number),
      revision: r.revision,
      status: r.status,
      reason: r.reason,
      submittedBy: r.submittedBy.name,
      submittedAt: r.submittedAt,
    })),
    signatures: {
      originator: { name: record.submittedBy.name, at: record.submittedAt },
      checkers: record.approvals.map(signed),
      approver: complete ? signed(record.approvals[record.requiredApprovals - 1]) : null,
    },
  };
}

import type { ReportMeta } from "../../../core/report";
import type { RecordForReport, Signature } from "../records/report-data";

const signed = (s: Signature) => ({ name: s.by.name, at: s.at });

/**
 * What the report prints about a frozen record besides its content: its number, revision, status,
 * hash, the revision table up to it and the signatures (originator = the submitter, checkers =
 * everyone who approved it, approver = the approval that completed it).
 */
export function recordReportMeta(record: RecordForReport): ReportMeta {
  const { summary, signatures } = record;
  return {
    kind: "record",
    recordId: summary.id,
    number: String(summary.number),
    revision: summary.revision,
    status: summary.status,
    hash: summary.hash,
    revisions: record.revisions.map((r) => ({
      number: String(r.number),
      revision: r.revision,
      status: r.status,
      reason: r.reason,
      submittedBy: r.submittedBy.name,
      submittedAt: r.submittedAt,
    })),
    signatures: {
      originator: signed(signatures.originator),
      checkers: signatures.checkers.map(signed),
      approver: signatures.approver ? signed(signatures.approver) : null,
    },
  };
}

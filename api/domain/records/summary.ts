import type { Transaction } from "sequelize";
import type { RecordScope, RecordSummary } from "../../../core/contract/records";
import { approvalsOf, type RecordApprovalRow, type RecordHeadRow } from "../../../db/repositories/records";

/**
 * A record as the revision table shows it. People are named as they were when they signed
 * (the stored name), with their id while their account exists.
 */
export function presentRecordSummary(row: RecordHeadRow, approvals: RecordApprovalRow[]): RecordSummary {
  return {
    id: row.id,
    number: row.number,
    revision: row.revision,
    status: row.status,
    hash: row.hash,
    engineVersion: row.engineVersion,
    reason: row.reason,
    requiredApprovals: row.requiredApprovals === 2 ? 2 : 1,
    submittedBy: { id: row.submittedBy, name: row.submittedByName },
    submittedAt: row.submittedAt.toISOString(),
    approvals: approvals.map((a) => ({
      by: { id: a.approverId, name: a.approverName },
      at: a.createdAt.toISOString(),
      comment: a.comment,
    })),
    returned:
      row.returnedAt && row.returnedByName !== null
        ? {
            by: { id: row.returnedBy, name: row.returnedByName },
            at: row.returnedAt.toISOString(),
            comment: row.returnComment ?? "",
          }
        : null,
    approvedAt: row.approvedAt ? row.approvedAt.toISOString() : null,
    // The content's scope (the table generates the column from it); absent for the whole project.
    scope: (row.scope as RecordScope | null | undefined) ?? null,
  };
}

/** The summaries of these records, in the order given, with their approvals (one query). */
export async function recordSummaries(
  rows: RecordHeadRow[],
  transaction?: Transaction,
): Promise<RecordSummary[]> {
  const approvals = await approvalsOf(
    rows.map((r) => r.id),
    transaction,
  );
  return rows.map((r) => presentRecordSummary(r, approvals.get(r.id)!));
}

/** The summary of one record. */
export async function recordSummary(row: RecordHeadRow, transaction?: Transaction): Promise<RecordSummary> {
  return (await recordSummaries([row], transaction))[0];
}

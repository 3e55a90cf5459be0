/**
 * Who and what a report speaks for besides its content: a draft taken from the project as it is
 * now, or a frozen record with its number, revision, status, hash, revision table and signatures.
 * The records half of the API builds the record's meta; the report only prints it.
 */

/** A person's signature on a record: who and when (ISO date-time). */
export type Signature = { name: string; at: string };

/** One line of a record's revision table. */
export type RevisionEntry = {
  number: string;
  revision: string;
  status: string;
  reason: string;
  submittedBy: string;
  submittedAt: string;
};

export type ReportMeta =
  | { kind: "draft" }
  | {
      kind: "record";
      recordId: string;
      number: string;
      revision: string;
      status: string;
      hash: string;
      revisions: RevisionEntry[];
      signatures: { originator: Signature; checkers: Signature[]; approver: Signature | null };
    };

/** The watermark every page of a draft carries. */
export const DRAFT_WATERMARK = "DRAFT — not checked";

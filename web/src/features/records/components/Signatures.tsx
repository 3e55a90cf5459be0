import type { RecordDetail } from "../../../entities/record/api-types";
import { formatDateTime } from "../model/dates";

/** The sign-off block: who originated the record and who checked and approved it, with dates. */
export function Signatures({ record }: { record: RecordDetail }) {
  // Each dt/dd pair sits in one div, the only wrapper a description list allows.
  const line = (key: string, role: string, name: string, at: string | null, note?: string | null) => (
    <div key={key} className="grid grid-cols-[9rem_1fr] gap-2 px-3 py-1.5 text-[14px]">
      <dt className="text-graphite-soft">{role}</dt>
      <dd>
        <strong>{name}</strong>{" "}
        {at && (
          <time dateTime={at} className="num text-[13px] text-graphite-soft">
            {formatDateTime(at)}
          </time>
        )}
        {note && <span className="block whitespace-pre-line text-[13px] text-graphite-soft">{note}</span>}
      </dd>
    </div>
  );
  return (
    <dl className="divide-y divide-rule" data-testid="record-signatures">
      {line("originator", "Originator", record.submittedBy.name, record.submittedAt)}
      {record.returned &&
        line("returned", "Returned by", record.returned.by.name, record.returned.at, record.returned.comment)}
      {record.approvals.map((a, i) =>
        line(
          `approval-${i}`,
          record.approvals.length > 1 || record.requiredApprovals > 1
            ? `Approved (${i + 1} of ${record.requiredApprovals})`
            : "Approved by",
          a.by.name,
          a.at,
          a.comment,
        ),
      )}
      {record.approvals.length === 0 &&
        !record.returned &&
        line("unchecked", "Checker", "not checked yet", null)}
    </dl>
  );
}

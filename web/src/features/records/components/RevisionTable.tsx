import { Link } from "react-router-dom";
import type { RecordSummary } from "../../../entities/record/api-types";
import { TableScroll } from "../../../components/TableScroll";
import { recordPagePath } from "../model/paths";
import { revisionRows } from "../model/revision-table";
import { StatusBadge } from "./StatusBadge";

/** The revision table: every record of the project, newest first. */
export function RevisionTable({
  records,
  workspaceId,
  projectId,
}: {
  records: readonly RecordSummary[];
  workspaceId: string;
  projectId: string;
}) {
  if (records.length === 0)
    return (
      <p className="px-3 py-2 text-[14px] text-graphite-soft">
        No record yet. An editor submits the project for check from here, the project page or the comparison.
      </p>
    );
  const th = "px-2 py-1.5 text-left font-semibold";
  return (
    <TableScroll label="Revision table">
      <table className="w-full min-w-[800px] text-[14px]" data-testid="revision-table">
        <thead className="border-b border-rule bg-paper text-[13px] text-graphite-soft">
          <tr>
            <th scope="col" className={th}>
              No.
            </th>
            <th scope="col" className={th}>
              Rev.
            </th>
            <th scope="col" className={th}>
              Status
            </th>
            <th scope="col" className={th}>
              Scope
            </th>
            <th scope="col" className={th}>
              What changed and why
            </th>
            <th scope="col" className={th}>
              Submitted
            </th>
            <th scope="col" className={th}>
              Decision
            </th>
            <th scope="col" className={th}>
              Approvals
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {revisionRows(records).map((r) => (
            <tr key={r.id}>
              <td className="num px-2 py-1.5">
                <Link
                  to={recordPagePath(workspaceId, projectId, r.id)}
                  className="text-ink underline underline-offset-2"
                  aria-label={`Record ${r.number}, revision ${r.revision}`}
                >
                  {r.number}
                </Link>
              </td>
              <td className="num px-2 py-1.5">{r.revision}</td>
              <td className="px-2 py-1.5">
                <StatusBadge status={r.status} of="record" />
              </td>
              <td className="px-2 py-1.5 text-[13px]" data-testid="revision-scope">
                {r.scope}
              </td>
              <td className="max-w-[28rem] whitespace-pre-line px-2 py-1.5">{r.reason}</td>
              <td className="px-2 py-1.5">
                {r.submittedBy}
                <br />
                <span className="num text-[13px] text-graphite-soft">{r.submittedAt}</span>
              </td>
              <td className="px-2 py-1.5 text-[13px]">{r.decided}</td>
              <td className="px-2 py-1.5 text-[13px]">{r.approvals}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </TableScroll>
  );
}

import { Fragment, useState } from "react";
import type { RecordContent } from "../../../../../core/contract/records";
import { TableScroll } from "../../../components/TableScroll";
import { Verdict } from "../../../components/Verdict";
import { commentCount, rowCommentLabel, type CommentThreads as Threads } from "../model/comments";
import { frozenGoverning, frozenRows, recordUnit } from "../model/frozen-results";
import { CommentThreads, type CommentPermission } from "./CommentThreads";

/**
 * The comparison as the record froze it: the governing sentence, then every row with its
 * principal stresses (in the project's unit) and checks, and beside each row a button that opens
 * its comments.
 */
export function FrozenResults({
  content,
  threads,
  ids,
  permission,
}: {
  content: RecordContent;
  threads: Threads;
  ids: { workspaceId: string; projectId: string; recordId: string };
  permission: CommentPermission;
}) {
  const [open, setOpen] = useState<string | null>(null);
  const rows = frozenRows(content);
  const unit = recordUnit(content);
  const th = "px-2 py-1.5 text-left font-semibold";
  const governing = content.results.governingOverall;
  return (
    <div>
      <p className="flex flex-wrap items-center gap-2 px-3 py-2 text-[15px]">
        {governing && <Verdict state={governing.verdict} />}
        <strong data-testid="record-governing">{frozenGoverning(content)}</strong>
      </p>
      <TableScroll label="Frozen comparison rows">
        <table className="w-full min-w-[760px] text-[14px]" data-testid="record-rows">
          <thead className="border-b border-rule bg-paper text-[13px] text-graphite-soft">
            <tr>
              <th scope="col" className={th}>
                Case or combination at location
              </th>
              <th scope="col" className={`${th} text-right`}>
                σ₁ ({unit})
              </th>
              <th scope="col" className={`${th} text-right`}>
                σ₂ ({unit})
              </th>
              <th scope="col" className={`${th} text-right`}>
                σ₃ ({unit})
              </th>
              <th scope="col" className={`${th} text-right`}>
                von Mises ({unit})
              </th>
              <th scope="col" className={th}>
                Checks (SF against required)
              </th>
              <th scope="col" className={th}>
                Comments
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {rows.map((r) => {
              const rowThreads = threads.byRow.get(r.rowId) ?? [];
              const count = commentCount(rowThreads);
              const panelId = `comments-${r.rowId.replace(/[^a-zA-Z0-9-]/g, "-")}`;
              const isOpen = open === r.rowId;
              return (
                <Fragment key={r.rowId}>
                  <tr data-row-id={r.rowId}>
                    <th scope="row" className="px-2 py-1.5 text-left font-normal">
                      <span className="font-semibold">{r.caseName}</span> at {r.locationName}
                      <span className="block text-[12px] text-graphite-soft">{r.kind}</span>
                    </th>
                    {[...r.principal, r.vonMises].map((v, i) => (
                      <td key={i} className="num px-2 py-1.5 text-right">
                        {v}
                      </td>
                    ))}
                    <td className="px-2 py-1.5">
                      <ul className="space-y-0.5">
                        {r.checks.map((c) => (
                          <li key={c.criterion} className="flex flex-wrap items-center gap-1.5 text-[13px]">
                            <span>{c.criterion}</span>
                            {c.factor === null ? (
                              <span className="text-graphite-soft">{c.note}</span>
                            ) : (
                              <>
                                <span className="num">
                                  {c.factor} / {c.required}
                                </span>
                                {c.verdict && <Verdict state={c.verdict} />}
                              </>
                            )}
                          </li>
                        ))}
                      </ul>
                    </td>
                    <td className="px-2 py-1.5">
                      <button
                        type="button"
                        className="rounded-sm border border-rule-strong bg-panel px-2 py-0.5 text-[13px] text-graphite hover:border-ink hover:text-ink"
                        aria-expanded={isOpen}
                        aria-controls={isOpen ? panelId : undefined}
                        onClick={() => setOpen(isOpen ? null : r.rowId)}
                      >
                        <span aria-hidden="true">✎ </span>
                        {rowCommentLabel(r.name, count)}
                      </button>
                    </td>
                  </tr>
                  {isOpen && (
                    <tr id={panelId}>
                      <td colSpan={7} className="bg-paper px-3 py-2">
                        {/* Held at the box's left edge and within the screen, so on a phone the
                            comments stay in view however far the table is scrolled sideways. */}
                        <div className="sticky left-3 max-w-[calc(100vw-4rem)] sm:max-w-3xl">
                          <CommentThreads
                            threads={rowThreads}
                            rowId={r.rowId}
                            newLabel={`Comment on ${r.name}`}
                            ids={ids}
                            permission={permission}
                          />
                        </div>
                      </td>
                    </tr>
                  )}
                </Fragment>
              );
            })}
          </tbody>
        </table>
      </TableScroll>
      {content.results.skipped.length > 0 && (
        <p className="px-3 py-2 text-[13px] text-graphite-soft">
          Not compared:{" "}
          {content.results.skipped.map((s) => `${s.caseName} at ${s.locationName} (${s.reason})`).join("; ")}.
        </p>
      )}
    </div>
  );
}

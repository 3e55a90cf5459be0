import { Link } from "react-router-dom";
import { CRITERION_LABELS } from "../../../../../core/contract/projects";
import type { ComparisonPointTableView } from "../../../../../core/contract/point-tables";
import { TableScroll } from "../../../components/TableScroll";
import { Verdict } from "../../../components/Verdict";

const th = "px-2 py-1 text-left text-[13px] font-semibold text-graphite";
const td = "px-2 py-1 text-right num whitespace-nowrap";

/** Where a point sits, in the file's own coordinates (the table keeps no length unit), to 6 figures. */
function place(p: { x: number | null; y: number | null; z: number | null }): string {
  if (p.x === null || p.y === null || p.z === null) return "no coordinates";
  return `(${[p.x, p.y, p.z].map((v) => String(Number(v.toPrecision(6)))).join(", ")})`;
}

/**
 * The finite-element point tables of the project's load cases, one section per table: for each
 * criterion the governing point with its safety factor against the required one, and how many
 * points fail or come close. The governing points already compete in the project's governing
 * check above; this says where each came from. The link opens that table's results, where every point is drawn.
 */
export function PointTableChecks({
  tables,
  workspaceId,
  projectId,
}: {
  tables: readonly ComparisonPointTableView[];
  workspaceId: string;
  projectId: string;
}) {
  return (
    <TableScroll label="Finite-element point tables">
      <table className="w-full border-collapse text-[14px]" data-testid="point-table-checks">
        <thead className="border-b border-rule">
          <tr>
            <th className={th}>table</th>
            <th className={th}>criterion</th>
            <th className={th}>governing point</th>
            <th className={`${th} text-right`}>safety factor n / required</th>
            <th className={`${th} text-right`}>points failing · close</th>
            <th className={th}>verdict</th>
          </tr>
        </thead>
        {tables.map((table) => (
          <tbody key={table.tableId} className="border-b border-rule" data-table={table.fileName}>
            {table.perCriterion.map((k, i) => (
              <tr key={k.criterion}>
                {i === 0 && (
                  <th
                    scope="rowgroup"
                    rowSpan={table.perCriterion.length}
                    className={`${th} align-top font-normal`}
                  >
                    <Link
                      to={`/workspaces/${workspaceId}/projects/${projectId}/load-cases/${table.caseId}/point-tables?table=${table.tableId}`}
                      className="font-semibold text-ink underline-offset-2 hover:underline"
                    >
                      {table.fileName}
                    </Link>
                    <div className="text-[12px] text-graphite-soft">
                      {table.caseName} ({table.category}); <span className="num">{table.pointCount}</span>{" "}
                      points; {table.material.label}
                    </div>
                  </th>
                )}
                <td className="px-2 py-1 whitespace-nowrap">{CRITERION_LABELS[k.criterion]}</td>
                {k.status === "evaluated" && k.governing ? (
                  <>
                    <td className="px-2 py-1 whitespace-nowrap">
                      point <span className="num">{String(k.governing.id)}</span>{" "}
                      <span className="text-[12px] text-graphite-soft">{place(k.governing)}</span>
                    </td>
                    <td className={td}>
                      {k.factor === null ? "∞" : k.factor.toFixed(2)}{" "}
                      <span className="text-graphite-soft">/ {k.requiredFactor}</span>
                    </td>
                    <td className={td}>
                      {k.countFail} · {k.countClose}
                    </td>
                    <td className="px-2 py-1">{k.verdict && <Verdict state={k.verdict} />}</td>
                  </>
                ) : (
                  <td colSpan={4} className="px-2 py-1 text-graphite-soft">
                    {k.status === "not-applicable" ? "not applicable" : "not evaluated"}
                    {k.reason ? `: ${k.reason}` : ""}
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        ))}
      </table>
    </TableScroll>
  );
}

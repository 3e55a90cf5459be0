import type { PointTable } from "../../../../../core";
import { CRITERION_LABELS } from "../../../../../core/contract/projects";
import { Verdict } from "../../../components/Verdict";
import { verdictForUtilisation } from "../../../../../core";
import type { TableEvaluation } from "../model/merge-evaluations";
import { coordinateText, pointId } from "../model/worst-points";

/** Per criterion the project checks: the point that governs it, its factor and utilisation, and how many points fail or are close. */
export function GoverningPoints({ table, evaluation }: { table: PointTable; evaluation: TableEvaluation }) {
  return (
    <div
      className="overflow-x-auto rounded border border-rule"
      role="region"
      aria-label="Governing point per criterion"
      tabIndex={0}
    >
      <table className="w-full border-collapse text-[14px]" data-testid="governing-points">
        <thead>
          <tr className="border-b border-rule text-left text-[13px] text-graphite-soft">
            <th scope="col" className="px-2 py-1">
              criterion
            </th>
            <th scope="col" className="px-2 py-1 text-right">
              n required
            </th>
            <th scope="col" className="px-2 py-1 text-right">
              governing point
            </th>
            {table.coordinates !== null && (
              <th scope="col" className="px-2 py-1 text-right">
                x, y, z
              </th>
            )}
            <th scope="col" className="px-2 py-1 text-right">
              n
            </th>
            <th scope="col" className="px-2 py-1 text-right">
              u
            </th>
            <th scope="col" className="px-2 py-1">
              verdict
            </th>
            <th scope="col" className="px-2 py-1 text-right">
              points failing
            </th>
            <th scope="col" className="px-2 py-1 text-right">
              points close
            </th>
          </tr>
        </thead>
        <tbody>
          {evaluation.criteria.map((c) => {
            const g = c.governing;
            const i = g?.index;
            return (
              <tr key={c.criterion} className="border-b border-rule last:border-0">
                <th scope="row" className="px-2 py-1 text-left font-semibold">
                  {CRITERION_LABELS[c.criterion]}
                  {c.category && (
                    <span className="ml-1 text-[12px] font-normal text-graphite-soft">({c.category})</span>
                  )}
                </th>
                <td className="num px-2 py-1 text-right">{c.requiredFactor}</td>
                {c.status !== "evaluated" || g === null || i === undefined ? (
                  <td colSpan={table.coordinates !== null ? 7 : 6} className="px-2 py-1 text-graphite-soft">
                    {c.reason ?? "not rated"}
                  </td>
                ) : (
                  <>
                    <td className="num px-2 py-1 text-right">{pointId(table, i)}</td>
                    {table.coordinates !== null && (
                      <td className="num px-2 py-1 text-right">
                        {[0, 1, 2].map((a) => coordinateText(table.coordinates![3 * i + a])).join(", ")}
                      </td>
                    )}
                    <td className="num px-2 py-1 text-right">
                      {Number.isFinite(g.factor) ? g.factor.toFixed(2) : "∞"}
                    </td>
                    <td className="num px-2 py-1 text-right">{g.utilisation.toFixed(3)}</td>
                    <td className="px-2 py-1">
                      <Verdict state={verdictForUtilisation(g.utilisation)} />
                    </td>
                    <td className="num px-2 py-1 text-right">{c.failing.toLocaleString("en-US")}</td>
                    <td className="num px-2 py-1 text-right">{c.close.toLocaleString("en-US")}</td>
                  </>
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

import { Suspense, lazy } from "react";
import type { PointTable } from "../../../../../core";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { Caution } from "../../../components/Caution";
import type { TableEvaluation } from "../model/merge-evaluations";
import type { PartTimings } from "../model/part-task";
import { BadRowsNote } from "./BadRowsNote";
import { GoverningPoints } from "./GoverningPoints";
import { loadPointCloud } from "./point-cloud-chunk";
import { UtilisationHistogram } from "./UtilisationHistogram";
import { UtilisationLegend } from "./UtilisationLegend";
import { WorstPointsTable } from "./WorstPointsTable";

const PointCloud = lazy(loadPointCloud);

/**
 * What a rated table shows: the caution once, beside the results; the governing point per
 * criterion; the histogram of utilisation; the points in 3D coloured by utilisation with its key;
 * and the worst points to sort, filter by region and keep.
 */
export function PointTableResults({
  table,
  evaluation,
  unit,
  seconds,
  workers,
  timings,
  selected,
  onToggle,
  benchHref,
  onPick,
}: {
  table: PointTable;
  evaluation: TableEvaluation;
  unit: StressUnitName;
  seconds: number;
  workers: number;
  timings: PartTimings[];
  selected: ReadonlySet<number>;
  onToggle: (index: number) => void;
  benchHref: (index: number) => string;
  onPick: (index: number) => void;
}) {
  return (
    <div
      className="space-y-4 p-3"
      data-testid="point-table-results"
      data-timings={timings.map((t) => `${t.parseMs.toFixed(0)}+${t.evaluateMs.toFixed(0)}`).join(" ")}
    >
      <Caution />
      <p className="text-sm">
        <span className="num">{table.count.toLocaleString("en-US")}</span> points read and rated in{" "}
        <span className="num">{seconds.toFixed(2)} s</span> ({workers} worker{workers === 1 ? "" : "s"});{" "}
        <span className="num">{evaluation.failing.toLocaleString("en-US")}</span> fail,{" "}
        <span className="num">{evaluation.close.toLocaleString("en-US")}</span> close (governing criterion per
        point).
      </p>
      <BadRowsNote badRows={table.badRows} />
      <GoverningPoints table={table} evaluation={evaluation} />
      <div className="grid gap-4 lg:grid-cols-2">
        <UtilisationHistogram histogram={evaluation.histogram} />
        <div className="space-y-2">
          {table.coordinates !== null ? (
            <>
              <div
                className="h-72 rounded border border-rule bg-panel"
                aria-label="Points in 3D, coloured by utilisation; click a point to open it in the bench"
              >
                <Suspense fallback={<p className="p-3 text-sm text-graphite-soft">Drawing the points…</p>}>
                  <PointCloud
                    coordinates={table.coordinates}
                    utilisation={evaluation.utilisation}
                    onPick={onPick}
                  />
                </Suspense>
              </div>
              <UtilisationLegend />
            </>
          ) : (
            <p className="text-sm text-graphite-soft">
              The table has no coordinates mapped, so the points cannot be placed in 3D.
            </p>
          )}
        </div>
      </div>
      <WorstPointsTable
        table={table}
        utilisation={evaluation.utilisation}
        unit={unit}
        selected={selected}
        onToggle={onToggle}
        benchHref={benchHref}
      />
    </div>
  );
}

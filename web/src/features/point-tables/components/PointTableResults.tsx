import { Suspense, lazy, useRef, type ReactNode } from "react";
import type { PointTable } from "../../../../../core";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { Caution } from "../../../components/Caution";
import { useCloudView } from "../hooks/use-cloud-view";
import { useStagedReveal } from "../hooks/use-staged-reveal";
import type { CloudView } from "../model/cloud-view";
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
 * The sections shown one after another: the summary and governing points; the histogram with the
 * 3D view's frame and key; the worst points; the 3D view's picture.
 */
const SECTIONS = 4;

/**
 * What a rated table shows, whether it was just read in this browser or opened from the project:
 * the caution (once per page: the page says which results carry it), how the points were rated,
 * the governing point per criterion, the histogram of utilisation, the points in 3D coloured by
 * utilisation with its key, and the worst points to sort, filter by region and keep. The
 * sections appear one frame after another, the 3D view last, so no one task lays them all out.
 */
export function PointTableResults({
  table,
  evaluation,
  cloud,
  unit,
  summary,
  withCaution,
  timings = [],
  selection,
  benchHref,
  onPick,
  testId = "point-table-results",
}: {
  table: PointTable;
  evaluation: TableEvaluation;
  /** what the 3D view draws, when the workers made it; else it is made here a slice at a time */
  cloud?: CloudView | null;
  unit: StressUnitName;
  /** the sentence that says where and how the points were rated */
  summary: ReactNode;
  withCaution: boolean;
  /** per worker, for the benchmark (a run in this browser only) */
  timings?: PartTimings[];
  /** the points ticked for keeping; null where the reader may not keep points */
  selection: { selected: ReadonlySet<number>; onToggle: (index: number) => void } | null;
  benchHref: (index: number) => string;
  onPick: (index: number) => void;
  testId?: string;
}) {
  const shown = useStagedReveal(SECTIONS, table);
  const view = useCloudView(table.coordinates, evaluation.utilisation, cloud);
  const drawing = useRef<HTMLDivElement>(null);
  // for the benchmark: how much of the picture is drawn, written straight to the element each frame
  const onDrawn = (drawn: number) => drawing.current?.setAttribute("data-points-drawn", String(drawn));
  return (
    <div
      className="space-y-4 p-3"
      data-testid={testId}
      data-timings={timings.map((t) => `${t.parseMs.toFixed(0)}+${t.evaluateMs.toFixed(0)}`).join(" ")}
    >
      {withCaution && <Caution />}
      <div className="space-y-1 text-sm">
        {summary}
        <p>
          <span className="num">{evaluation.failing.toLocaleString("en-US")}</span> fail,{" "}
          <span className="num">{evaluation.close.toLocaleString("en-US")}</span> close (governing criterion
          per point).
        </p>
      </div>
      <BadRowsNote badRows={table.badRows} />
      <GoverningPoints table={table} evaluation={evaluation} />
      {shown >= 2 && (
        <div className="grid gap-4 lg:grid-cols-2">
          <UtilisationHistogram histogram={evaluation.histogram} />
          <div className="space-y-2">
            {table.coordinates !== null ? (
              <>
                <div
                  ref={drawing}
                  className="relative h-72 rounded border border-rule bg-panel"
                  role="group"
                  aria-label="Points in 3D, coloured by utilisation; click a point to open it in the bench"
                >
                  {shown >= 4 && view !== null ? (
                    <Suspense fallback={drawingNote}>
                      <PointCloud view={view} onPick={onPick} onDrawn={onDrawn} />
                    </Suspense>
                  ) : (
                    drawingNote
                  )}
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
      )}
      {shown >= 3 && (
        <WorstPointsTable
          table={table}
          utilisation={evaluation.utilisation}
          unit={unit}
          selection={selection}
          benchHref={benchHref}
        />
      )}
    </div>
  );
}

const drawingNote = <p className="p-3 text-sm text-graphite-soft">Drawing the points…</p>;

import { useMemo, useState } from "react";
import { Link, useNavigate } from "react-router-dom";
import { COMPONENTS } from "../../../../../core";
import type { MaterialList } from "../../../../../core/contract/materials";
import { CRITERION_LABELS, type Project } from "../../../../../core/contract/projects";
import { useKeepPoints } from "../../../entities/point-table/mutations";
import { benchLinkForValues } from "../../../lib/bench-link";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { editableStress } from "../../../lib/stress";
import { useStoredResults, type OpenedResults } from "../hooks/use-stored-results";
import { governingSelection, toggleIn } from "../model/selection";
import { storedTableRating } from "../model/spec";
import { pointId, tensorAt } from "../model/worst-points";
import { PointTableResults } from "./PointTableResults";
import { ProgressLine } from "./ProgressLine";

type Ids = { workspaceId: string; projectId: string; caseId: string };

/**
 * A stored table's results, opened from the list: the server's rating of every point (governing
 * point per criterion, counts, histogram), the points downloaded with progress and Cancel, then
 * the same view as after a run in this browser. Editors may keep chosen points as locations;
 * viewers and reviewers read only.
 */
export function StoredTableResults({
  ids,
  tableId,
  canEdit,
  project,
  category,
  materials,
  withCaution,
}: {
  ids: Ids;
  tableId: string;
  canEdit: boolean;
  project: Project;
  category: string;
  materials: MaterialList | undefined;
  withCaution: boolean;
}) {
  const rating = useMemo(
    () => storedTableRating(project, category, materials),
    [project, category, materials],
  );
  const table = useMemo(() => ({ ...ids, tableId }), [ids, tableId]);
  const { state, cancel, retry } = useStoredResults(table, rating);
  switch (state.status) {
    case "loading":
      return <p className="p-3 text-sm text-graphite-soft">Loading the table…</p>;
    case "failed":
      return (
        <div className="p-3">
          <FormMessage error={state.error} />
        </div>
      );
    case "no-points":
      return (
        <p className="p-3 text-sm text-graphite-soft">
          {state.detail.status === "awaiting-content"
            ? "This table's file has not arrived: it holds no points yet. Store the file again or delete the table."
            : "The server has not rated this table's points."}
        </p>
      );
    case "downloading":
      return (
        <div className="p-3">
          <ProgressLine
            testId="columns-progress"
            label="Downloading the points"
            fraction={state.fraction}
            onCancel={cancel}
          />
        </div>
      );
    case "cancelled":
      return (
        <div className="flex flex-wrap items-center gap-3 p-3 text-sm">
          <span data-testid="columns-cancelled">Opening the results was cancelled; nothing is shown.</span>
          <button type="button" className={quietButton} onClick={retry}>
            Open the results again
          </button>
        </div>
      );
    case "rating":
      return (
        <div className="p-3">
          <ProgressLine
            testId="rating-progress"
            label="Rating each point for the colours"
            fraction={state.fraction}
            onCancel={cancel}
          />
        </div>
      );
    case "done":
      return (
        <OpenedTable
          ids={ids}
          tableId={tableId}
          canEdit={canEdit}
          results={state}
          withCaution={withCaution}
        />
      );
  }
}

function OpenedTable({
  ids,
  tableId,
  canEdit,
  results,
  withCaution,
}: {
  ids: Ids;
  tableId: string;
  canEdit: boolean;
  results: OpenedResults;
  withCaution: boolean;
}) {
  const navigate = useNavigate();
  const keep = useKeepPoints(ids.workspaceId, ids.projectId, ids.caseId);
  const { detail, table, evaluation } = results;
  // the governing points are chosen for keeping to begin with, as after a run in this browser
  const [selected, setSelected] = useState<ReadonlySet<number>>(() => governingSelection(evaluation));
  const unit = detail.unit;
  const benchHref = (index: number) => {
    const t = tensorAt(table.components, index);
    return benchLinkForValues(
      Object.fromEntries(COMPONENTS.map((c) => [c, editableStress(t[c], unit)])) as typeof t,
      unit,
    );
  };
  const rated = detail.evaluation;
  const by = detail.createdBy?.name;

  return (
    <>
      <PointTableResults
        testId="stored-table-results"
        table={table}
        evaluation={evaluation}
        unit={unit}
        withCaution={withCaution}
        summary={
          <>
            <p>
              <span className="font-semibold">{detail.fileName}</span>:{" "}
              <span className="num">{table.count.toLocaleString("en-US")}</span> points stored{" "}
              <span className="num">{detail.createdAt.slice(0, 16).replace("T", " ")} UTC</span>
              {by ? ` by ${by}` : ""}, rated by the server against{" "}
              {rated?.material.label ?? "the project's material"}{" "}
              {rated && (
                <>
                  on <span className="num">{rated.evaluatedAt.slice(0, 16).replace("T", " ")} UTC</span>
                </>
              )}
              .
            </p>
            {rated?.material.note && <p className="text-graphite-soft">{rated.material.note}</p>}
            {results.colourProblem !== null && (
              <p className="text-graphite-soft" data-testid="colour-note">
                Only the server&apos;s {evaluation.worst.length} worst points carry a utilisation here (the
                others are grey and left out of the region filter): {results.colourProblem}
              </p>
            )}
            {results.disagreements.length > 0 && (
              <p className="text-fail" role="status" data-testid="rating-disagrees">
                <span aria-hidden="true">✗ </span>
                This browser rates the governing point of{" "}
                {results.disagreements.map((c) => CRITERION_LABELS[c]).join(", ")} differently from the
                server: the project&apos;s checks or material may have changed since. The server&apos;s
                governing points are shown; reload the page before relying on the colours.
              </p>
            )}
          </>
        }
        selection={canEdit ? { selected, onToggle: (i) => setSelected(toggleIn(selected, i)) } : null}
        benchHref={benchHref}
        onPick={(i) => void navigate(benchHref(i))}
      />
      {canEdit && (
        <div className="space-y-2 border-t border-rule p-3">
          <button
            type="button"
            className={primaryButton}
            disabled={selected.size === 0 || keep.isPending}
            onClick={() => keep.mutate({ tableId, points: [...selected].map((i) => pointId(table, i)) })}
          >
            Keep {selected.size} chosen point{selected.size === 1 ? "" : "s"} as locations
          </button>
          {keep.error && <FormMessage error={keep.error} />}
          {keep.data && (
            <p className="text-sm" data-testid="stored-kept-locations">
              Kept as locations: {keep.data.locations.map((l) => l.name).join(", ")}.{" "}
              <Link
                to={`/workspaces/${ids.workspaceId}/projects/${ids.projectId}/comparison`}
                className="text-ink underline-offset-2 hover:underline"
              >
                See them in the comparison
              </Link>
            </p>
          )}
        </div>
      )}
    </>
  );
}

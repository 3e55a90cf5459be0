import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useState } from "react";
import type { Criterion, PointTable, PointTableSpec } from "../../../../../core";
import type { PointTableDetailView } from "../../../entities/point-table/contract";
import { pointTableKeys } from "../../../entities/point-table/keys";
import {
  pointTableColumnsQueryOptions,
  pointTableIdsQueryOptions,
  usePointTable,
  type PointTableIds,
} from "../../../entities/point-table/queries";
import type { TableEvaluation } from "../model/merge-evaluations";
import {
  evaluationFromServer,
  rateInSlices,
  ratingDisagreements,
  tableFromColumnsInSlices,
  utilisationOfWorst,
} from "../model/stored-results";

/** What this browser rates the points against to colour them: the server's rating, or why it cannot. */
export type BrowserRating = { spec: PointTableSpec; includeUnsuited: boolean } | { problem: string };

/** A stored table's results, opened: what the view shows, and how each point's utilisation is known. */
export type OpenedResults = {
  detail: PointTableDetailView;
  table: PointTable;
  evaluation: TableEvaluation;
  /** null: every point rated in this browser; else why only the server's worst points carry a utilisation */
  colourProblem: string | null;
  /** criteria whose governing point this browser's rating puts elsewhere than the server's */
  disagreements: Criterion[];
};

export type StoredResultsState =
  | { status: "loading" }
  | { status: "failed"; error: unknown }
  /** the table holds no points yet, or has no evaluation */
  | { status: "no-points"; detail: PointTableDetailView }
  | { status: "downloading"; fraction: number }
  | { status: "cancelled" }
  | { status: "rating"; fraction: number }
  | ({ status: "done" } & OpenedResults);

/** Progress is redrawn only when its whole percentage changes, so a long download does not redraw per packet. */
const percentOf = (done: number, total: number) => (total > 0 ? Math.floor((100 * done) / total) : 0);

/**
 * Opens a stored table's results: the server's evaluation (GET …/:tableId), the points as binary
 * columns (…/columns, with progress; Cancel aborts the download) and their ids (…/ids, when the
 * table maps an id column), then each point's utilisation rated in this browser in slices (the
 * server sends no per-point figures; they colour the 3D view and feed the region filter).
 * `rating` null waits (the materials are loading).
 */
export function useStoredResults(t: PointTableIds, rating: BrowserRating | null) {
  const queryClient = useQueryClient();
  const detail = usePointTable(t);
  const [cancelled, setCancelled] = useState(false);
  const [downloaded, setDownloaded] = useState(0);
  const [rated, setRated] = useState<{ percent: number; done: OpenedResults | null } | null>(null);

  const d = detail.data;
  const hasPoints = d !== undefined && d.status === "ready" && d.evaluation !== null;
  const hasIds = d !== undefined && d.columns.id !== undefined;
  // React leaves the page as it is when the percentage has not changed
  const onProgress = useCallback(
    (received: number, total: number) => setDownloaded(percentOf(received, total)),
    [],
  );
  const columns = useQuery({
    ...pointTableColumnsQueryOptions(t, onProgress),
    enabled: hasPoints && !cancelled,
  });
  const ids = useQuery({ ...pointTableIdsQueryOptions(t), enabled: hasPoints && hasIds && !cancelled });

  const points = columns.data;
  const idList = hasIds ? ids.data : null;
  useEffect(() => {
    if (d === undefined || d.evaluation === null || points === undefined || idList === undefined) return;
    if (rating === null || cancelled) return;
    const serverEvaluation = d.evaluation;
    let stopped = false;
    void (async () => {
      // in slices, yielding to the page first, so it draws the finished download and stays responsive
      const table = await tableFromColumnsInSlices(points.columns, points.count, idList, d, {
        isCancelled: () => stopped,
      });
      if (table === null || stopped) return;
      if ("problem" in rating) {
        const evaluation = evaluationFromServer(
          serverEvaluation,
          table.count,
          utilisationOfWorst(table.count, serverEvaluation.worst),
        );
        setRated({
          percent: 100,
          done: { detail: d, table, evaluation, colourProblem: rating.problem, disagreements: [] },
        });
        return;
      }
      let shown = -1;
      const browser = await rateInSlices(table.components, rating.spec, rating.includeUnsuited, {
        isCancelled: () => stopped,
        onProgress: (done, total) => {
          const percent = percentOf(done, total);
          if (percent !== shown) {
            shown = percent;
            setRated({ percent, done: null });
          }
        },
      });
      if (browser === null || stopped) return;
      const evaluation = evaluationFromServer(serverEvaluation, table.count, browser.utilisation);
      setRated({
        percent: 100,
        done: {
          detail: d,
          table,
          evaluation,
          colourProblem: null,
          disagreements: ratingDisagreements(evaluation.criteria, browser.criteria),
        },
      });
    })();
    return () => {
      stopped = true;
    };
  }, [d, points, idList, rating, cancelled]);

  const cancel = useCallback(() => {
    setCancelled(true);
    void queryClient.cancelQueries({
      queryKey: pointTableKeys.columns(t.workspaceId, t.projectId, t.tableId),
    });
    void queryClient.cancelQueries({ queryKey: pointTableKeys.ids(t.workspaceId, t.projectId, t.tableId) });
  }, [queryClient, t.workspaceId, t.projectId, t.tableId]);
  const retry = useCallback(() => {
    setDownloaded(0);
    setCancelled(false);
  }, []);

  let state: StoredResultsState;
  if (detail.error) state = { status: "failed", error: detail.error };
  else if (d === undefined) state = { status: "loading" };
  else if (!hasPoints) state = { status: "no-points", detail: d };
  else if (cancelled) state = { status: "cancelled" };
  else if (columns.error) state = { status: "failed", error: columns.error };
  else if (ids.error) state = { status: "failed", error: ids.error };
  else if (points === undefined || idList === undefined)
    state = { status: "downloading", fraction: downloaded / 100 };
  else if (rated?.done && rated.done.detail === d && rated.done.table.count === points.count)
    state = { status: "done", ...rated.done };
  else state = { status: "rating", fraction: (rated?.percent ?? 0) / 100 };
  return { state, cancel, retry };
}

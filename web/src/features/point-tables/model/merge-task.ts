/**
 * The last step of a table read by several workers, run in one of them (worker 0, which has
 * finished its own part): the parts' arrays come to it by transfer, core's mergePointTables and
 * mergeEvaluations join them there, and the whole goes back to the page by transfer. Joining on
 * the page was its longest task (about 100 ms for a million points) and held the parts and the
 * whole at once (2.7× the table's float64 size in the page's heap with two workers).
 */
import { mergePointTables, type PointTable } from "../../../../../core";
import { mergeEvaluations, type TableEvaluation } from "./merge-evaluations";
import { cloudViewTransferables, type CloudView } from "./cloud-view";
import {
  cloudOf,
  runPart,
  transferablesOf,
  type PartEvaluation,
  type PartMessage,
  type PartRequest,
} from "./part-task";

/** One finished part, as its worker posted it. */
export type FinishedPart = { table: PointTable; evaluation: PartEvaluation };

/** What the page asks the joining worker to do. */
export type MergeRequest = {
  kind: "merge";
  parts: FinishedPart[];
  worstCount: number;
  /** also make what the 3D view draws of the whole (cloud-view.ts) */
  cloud?: boolean;
};

/** Every request a point-table worker answers. */
export type WorkerRequest = PartRequest | MergeRequest;

/** What the joining worker posts back. */
export type MergedMessage = {
  kind: "merged";
  table: PointTable;
  evaluation: TableEvaluation;
  cloud?: CloudView | null;
};

/** Every message a point-table worker posts. */
export type WorkerMessage = PartMessage | MergedMessage;

export type WorkerPost = (message: WorkerMessage, transfer: Transferable[]) => void;

/** The buffers a merge request moves to the worker, each once. */
export function mergeTransferables(parts: readonly FinishedPart[]): ArrayBuffer[] {
  return [...new Set(parts.flatMap((p) => transferablesOf(p.table, p.evaluation)))];
}

/** Joins the parts, in file order, and posts the whole (arrays transferred) or the error. */
export function runMerge(request: MergeRequest, post: WorkerPost): void {
  try {
    const table = mergePointTables(request.parts.map((p) => p.table));
    const evaluation = mergeEvaluations(
      request.parts.map((p) => p.evaluation),
      request.worstCount,
    );
    const cloud = request.cloud === true ? cloudOf(table, evaluation) : null;
    post({ kind: "merged", table, evaluation, cloud }, [
      ...transferablesOf(table, evaluation),
      ...cloudViewTransferables(cloud),
    ]);
  } catch (error) {
    post({ kind: "error", message: error instanceof Error ? error.message : String(error) }, []);
  }
}

const isMerge = (request: WorkerRequest): request is MergeRequest =>
  (request as Partial<MergeRequest>).kind === "merge";

/** Answers one request: a part to read and rate, or parts to join. */
export async function handleWorkerRequest(request: WorkerRequest, post: WorkerPost): Promise<void> {
  if (isMerge(request)) runMerge(request, post);
  else await runPart(request, post);
}

/**
 * Reads and rates a point table in Web Workers, one per core: cuts the file into runs of whole
 * lines, gives each worker one (it reads its slice of the file itself, parses and rates it, see
 * part-task.ts), adds up their progress, and has worker 0 join the parts (merge-task.ts), so the
 * page only passes arrays on by transfer and never copies or scans the table. Cancelling stops
 * every worker at once. The workers are made by the caller (`createWorker`), so the tests drive
 * this with fake workers in Node.
 */
import { lineCuts, type PointTable, type PointTableOptions, type PointTableSpec } from "../../../../../core";
import { byteLineCuts } from "./byte-cuts";
import type { CloudView } from "./cloud-view";
import type { TableEvaluation } from "./merge-evaluations";
import {
  mergeTransferables,
  type FinishedPart,
  type MergedMessage,
  type WorkerMessage,
  type WorkerRequest,
} from "./merge-task";
import type { PartMessage, PartRequest, PartTimings } from "./part-task";

/** The part of a Worker the pipeline uses. */
export type WorkerPort = {
  postMessage(message: WorkerRequest, transfer?: Transferable[]): void;
  terminate(): void;
  onmessage: ((event: { data: WorkerMessage }) => void) | null;
  onerror: ((event: { message?: string }) => void) | null;
};

export type PipelineInput = {
  source: { file: Blob } | { text: string };
  options: PointTableOptions;
  spec: PointTableSpec;
  includeUnsuited: boolean;
  /** names of the columns, for the bad-row reasons of parts after the first */
  columnNames: readonly string[] | null;
  /**
   * Also make what the 3D view draws in a worker (its sample of the points, their positions,
   * colours and bounding sphere: cloud-view.ts), so the page need not; default false.
   */
  cloud?: boolean;
};

export type PipelineProgress = { phase: "parse" | "evaluate"; fraction: number };

export type PipelineResult = {
  table: PointTable;
  evaluation: TableEvaluation;
  workers: number;
  /** per part, in file order */
  timings: PartTimings[];
  /**
   * what the 3D view draws, when the input asked for it and the table has coordinates; else null
   * (optional, so results built elsewhere, e.g. from a stored table, need not name it)
   */
  cloud?: CloudView | null;
};

/** Thrown (as the run's rejection) when the engineer cancelled. */
export class PipelineCancelled extends Error {
  override name = "PipelineCancelled";
  constructor() {
    super("Reading the table was cancelled.");
  }
}

/** Below this size one worker reads the text: starting a second costs more than it saves. */
export const ONE_WORKER_BELOW = 512 * 1024;
/** The most workers used, whatever the machine reports. */
export const MAX_WORKERS = 8;
/** The worst points kept per table (the list the page sorts and filters shows them). */
export const WORST_KEPT = 1000;
/** Share of a part's progress bar given to reading (the rest to rating): reading is the slower. */
const PARSE_SHARE = 0.75;

/** One worker per core the browser reports, at least one, at most {@link MAX_WORKERS}. */
export const workerCountFor = (cores: number | undefined, size: number) =>
  size < ONE_WORKER_BELOW ? 1 : Math.max(1, Math.min(MAX_WORKERS, Math.floor(cores ?? 2)));

/** The parts' sources: runs of whole lines. */
async function partSources(source: PipelineInput["source"], parts: number): Promise<PartRequest["source"][]> {
  if ("text" in source) {
    const cuts = [0, ...lineCuts(source.text, parts), source.text.length];
    return cuts.slice(1).map((end, i) => ({ text: source.text.slice(cuts[i], end) }));
  }
  const cuts = [0, ...(await byteLineCuts(source.file, parts)), source.file.size];
  return cuts.slice(1).map((end, i) => ({ blob: source.file.slice(cuts[i], end) }));
}

/** The parser options of part `i`: only the first reads the skipped rows and the header. */
export function partOptions(
  options: PointTableOptions,
  i: number,
  columnNames: readonly string[] | null,
): PointTableOptions {
  if (i === 0) return options;
  return {
    ...options,
    skipRows: 0,
    header: false,
    ...(columnNames === null ? {} : { columnNames }),
  };
}

/**
 * Starts reading and rating; `done` resolves with the whole table and its rating, or rejects with
 * PipelineCancelled after `cancel()`, or with the first worker's error.
 */
export function runPipeline(
  input: PipelineInput,
  setup: {
    createWorker: () => WorkerPort;
    workers: number;
    onProgress: (progress: PipelineProgress) => void;
  },
): { done: Promise<PipelineResult>; cancel: () => void } {
  const started: WorkerPort[] = [];
  let stop: ((error: Error) => void) | null = null;
  let stopped = false;
  const endAll = () => {
    for (const w of started) w.terminate();
    started.length = 0;
  };
  const fail = (reject: (error: Error) => void, message: string) => {
    stopped = true;
    endAll();
    reject(new Error(message));
  };
  const cancel = () => {
    if (stopped) return;
    stopped = true;
    endAll();
    stop?.(new PipelineCancelled());
  };
  const done = (async () => {
    const sources = await partSources(input.source, Math.max(1, setup.workers));
    if (stopped) throw new PipelineCancelled();
    const progress = sources.map(() => ({ parse: 0, evaluate: 0 }));
    const report = (phase: "parse" | "evaluate") => {
      const sum = progress.reduce((s, p) => s + PARSE_SHARE * p.parse + (1 - PARSE_SHARE) * p.evaluate, 0);
      setup.onProgress({ phase, fraction: sum / progress.length });
    };
    type Done = Extract<PartMessage, { kind: "done" }>;
    const results = await new Promise<Done[]>((resolve, reject) => {
      stop = reject;
      const out: Done[] = new Array(sources.length);
      let left = sources.length;
      sources.forEach((source, i) => {
        const worker = setup.createWorker();
        started.push(worker);
        worker.onerror = (e) => fail(reject, e.message ?? "A worker stopped unexpectedly.");
        worker.onmessage = ({ data }) => {
          if (stopped) return;
          if (data.kind === "progress") {
            progress[i][data.phase] = data.total > 0 ? data.done / data.total : 1;
            if (data.phase === "evaluate") progress[i].parse = 1;
            report(data.phase);
          } else if (data.kind === "error") {
            fail(reject, data.message);
          } else if (data.kind === "done") {
            out[i] = data;
            progress[i] = { parse: 1, evaluate: 1 };
            report("evaluate");
            // worker 0 stays to join the parts when there are several
            if (i > 0 || sources.length === 1) worker.terminate();
            if (--left === 0) resolve(out);
          }
        };
        worker.postMessage({
          source,
          options: partOptions(input.options, i, input.columnNames),
          spec: input.spec,
          includeUnsuited: input.includeUnsuited,
          worstCount: WORST_KEPT,
          cloud: input.cloud === true && sources.length === 1,
        });
      });
    });
    const timings = results.map((r) => r.timings);
    if (results.length === 1) {
      started.length = 0;
      const { table, evaluation, cloud } = results[0];
      return { table, evaluation, workers: 1, timings, cloud: cloud ?? null };
    }
    const merged = await new Promise<MergedMessage>((resolve, reject) => {
      stop = reject;
      const joiner = started[0];
      joiner.onmessage = ({ data }) => {
        if (stopped) return;
        if (data.kind === "merged") resolve(data);
        else if (data.kind === "error") fail(reject, data.message);
      };
      const parts: FinishedPart[] = results.map((r) => ({ table: r.table, evaluation: r.evaluation }));
      joiner.postMessage(
        { kind: "merge", parts, worstCount: WORST_KEPT, cloud: input.cloud === true },
        mergeTransferables(parts),
      );
    });
    endAll();
    const { table, evaluation, cloud } = merged;
    return { table, evaluation, workers: results.length, timings, cloud: cloud ?? null };
  })();
  return { done, cancel };
}

/**
 * What one Web Worker does with its run of whole lines of a point table: parse it with core's
 * PointTableParser as the bytes arrive, rate every point with core's PointTableEvaluator, and hand
 * back the arrays by transfer (no copy). Plain functions over a `post` callback, so the unit
 * tests run them in Node without a worker.
 */
import {
  PointTableEvaluator,
  PointTableParser,
  estimateRows,
  parsePointTable,
  type PointTable,
  type PointTableEvaluation,
  type PointTableOptions,
  type PointTableSpec,
} from "../../../../../core";
import { cloudView, cloudViewTransferables, type CloudView } from "./cloud-view";

/** What the page asks a worker to do. */
export type PartRequest = {
  /** a run of whole lines: a slice of the file (read in the worker) or pasted text */
  source: { blob: Blob } | { text: string };
  options: PointTableOptions;
  spec: PointTableSpec;
  includeUnsuited: boolean;
  /** how many of the part's worst points to keep */
  worstCount: number;
  /** also make what the 3D view draws (cloud-view.ts): only when this part is the whole table */
  cloud?: boolean;
};

/** A part's rating without the per-criterion and per-point arrays the page does not keep. */
export type PartEvaluation = Pick<
  PointTableEvaluation,
  "count" | "worst" | "histogram" | "failing" | "close" | "badPoints" | "utilisation"
> & {
  criteria: Omit<PointTableEvaluation["criteria"][number], "factor" | "utilisation">[];
};

export type PartMessage =
  | { kind: "progress"; phase: "parse" | "evaluate"; done: number; total: number }
  | {
      kind: "done";
      table: PointTable;
      evaluation: PartEvaluation;
      timings: PartTimings;
      /** the 3D view's arrays, when asked for and the table has coordinates */
      cloud?: CloudView | null;
    }
  | { kind: "error"; message: string };

/** How long the worker spent reading and rating its part (ms), for the benchmark and the page's note. */
export type PartTimings = { parseMs: number; evaluateMs: number };

export type Post = (message: PartMessage, transfer: Transferable[]) => void;

/**
 * How much of its slice a worker reads at a time: the next piece is already being read while this
 * one is parsed, and progress is posted after each.
 */
export const READ_PIECE_BYTES = 4 << 20;

/**
 * The rows a slice of `size` bytes holds, about, by core's estimateRows on its first piece: decoded
 * one character per byte (windows-1252), so that lengths in characters are lengths in bytes.
 */
const rowsEstimate = (first: Uint8Array, size: number) =>
  estimateRows(new TextDecoder("windows-1252").decode(first.subarray(0, 65_536)), size);

/**
 * Reads the worker's slice of the file itself (`Blob.slice(…).arrayBuffer()`, a piece at a time,
 * the next piece read while this one is parsed) and hands the bytes to core's parser undecoded:
 * the page never holds the file's bytes or text.
 */
async function parseBlob(blob: Blob, options: PointTableOptions, post: Post): Promise<PointTable> {
  const read = (at: number) => blob.slice(at, Math.min(blob.size, at + READ_PIECE_BYTES)).arrayBuffer();
  let parser: PointTableParser | null = null;
  let next = blob.size > 0 ? read(0) : null;
  for (let at = 0; next !== null;) {
    const bytes = new Uint8Array(await next);
    at += bytes.length;
    next = at < blob.size && bytes.length > 0 ? read(at) : null;
    // the first piece tells how long the lines are, so the arrays are allocated once
    parser ??= new PointTableParser({ ...options, expectedRows: rowsEstimate(bytes, blob.size) });
    parser.pushBytes(bytes);
    post({ kind: "progress", phase: "parse", done: at, total: blob.size }, []);
  }
  parser ??= new PointTableParser(options);
  if (blob.size === 0) post({ kind: "progress", phase: "parse", done: 0, total: 0 }, []);
  return parser.finish();
}

/** Rates the table a chunk at a time, posting progress after each. */
function evaluate(table: PointTable, request: PartRequest, post: Post): PartEvaluation {
  const evaluator = new PointTableEvaluator(table.components, request.spec, {
    includeUnsuited: request.includeUnsuited,
    worstCount: request.worstCount,
  });
  while (evaluator.step()) {
    post({ kind: "progress", phase: "evaluate", done: evaluator.result.evaluated, total: table.count }, []);
  }
  const r = evaluator.result;
  return {
    count: r.count,
    worst: r.worst,
    histogram: r.histogram,
    failing: r.failing,
    close: r.close,
    badPoints: r.badPoints,
    utilisation: r.utilisation,
    criteria: r.criteria.map(({ factor: _f, utilisation: _u, ...rest }) => rest),
  };
}

/** The buffers of a part's arrays, each once (a transfer list may not name one twice). */
export function transferablesOf(table: PointTable, evaluation: PartEvaluation): ArrayBuffer[] {
  const buffers = new Set<ArrayBuffer>();
  const add = (a: Float64Array | null) => {
    if (a !== null) buffers.add(a.buffer as ArrayBuffer);
  };
  add(table.components);
  add(table.coordinates);
  if (table.ids instanceof Float64Array) add(table.ids);
  add(evaluation.utilisation);
  return [...buffers];
}

/** What the 3D view draws of a table with coordinates (its sample and arrays), else null. */
export const cloudOf = (table: PointTable, evaluation: Pick<PartEvaluation, "utilisation">) =>
  table.coordinates === null ? null : cloudView(table.coordinates, evaluation.utilisation);

/** Runs one part and posts its progress, then its result (arrays transferred) or the error. */
export async function runPart(request: PartRequest, post: Post): Promise<void> {
  try {
    const began = performance.now();
    const table =
      "blob" in request.source
        ? await parseBlob(request.source.blob, request.options, post)
        : parsePointTable(request.source.text, request.options);
    const parsed = performance.now();
    const evaluation = evaluate(table, request, post);
    const timings = { parseMs: parsed - began, evaluateMs: performance.now() - parsed };
    const cloud = request.cloud === true ? cloudOf(table, evaluation) : null;
    post({ kind: "done", table, evaluation, timings, cloud }, [
      ...transferablesOf(table, evaluation),
      ...cloudViewTransferables(cloud),
    ]);
  } catch (error) {
    post({ kind: "error", message: error instanceof Error ? error.message : String(error) }, []);
  }
}

/**
 * A worker of the point-table bench: parses its byte range of the shared file as the page's
 * workers do (core's PointTableParser.pushBytes, in 4 MB pieces, no decoding), evaluates it with
 * core, and sends back a small summary (the arrays stay here; a real worker would transfer them).
 */
import { parentPort } from "node:worker_threads";
import {
  estimateRows,
  evaluatePointTable,
  PointTableParser,
  type PointTableOptions,
} from "../../../core/index";
import { BENCH_SPEC } from "./point-table-text";

type Job = { bytes: SharedArrayBuffer; from: number; to: number; options: PointTableOptions };

/** The page's workers read this much at a time (web/src/features/point-tables/model/part-task.ts). */
const PIECE = 4 << 20;

parentPort!.on("message", (job: Job) => {
  // the rows estimated from the first 64 kB as the page does (one character per byte)
  const sample = new TextDecoder("latin1").decode(
    new Uint8Array(job.bytes, job.from, Math.min(65_536, job.to - job.from)),
  );
  const parser = new PointTableParser({
    ...job.options,
    expectedRows: estimateRows(sample, job.to - job.from),
  });
  for (let at = job.from; at < job.to; at += PIECE) {
    parser.pushBytes(new Uint8Array(job.bytes, at, Math.min(PIECE, job.to - at)));
  }
  const table = parser.finish();
  const result = evaluatePointTable(table.components, BENCH_SPEC, { includeUnsuited: true });
  parentPort!.postMessage({
    count: table.count,
    lines: table.lines,
    badRows: table.badRows.count,
    failing: result.failing,
    worst: result.worst[0]?.utilisation ?? 0,
  });
});

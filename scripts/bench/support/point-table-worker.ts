/**
 * A worker of the point-table bench: decodes its byte range of the shared file, parses and
 * evaluates it with core, and sends back a small summary (the arrays stay here; a real worker
 * would transfer them).
 */
import { parentPort } from "node:worker_threads";
import { evaluatePointTable, parsePointTable, type PointTableOptions } from "../../../core/index";
import { BENCH_SPEC } from "./point-table-text";

type Job = { bytes: SharedArrayBuffer; from: number; to: number; options: PointTableOptions };

const decoder = new TextDecoder();
parentPort!.on("message", (job: Job) => {
  const text = decoder.decode(new Uint8Array(job.bytes, job.from, job.to - job.from));
  const table = parsePointTable(text, job.options);
  const result = evaluatePointTable(table.components, BENCH_SPEC, { includeUnsuited: true });
  parentPort!.postMessage({
    count: table.count,
    lines: table.lines,
    badRows: table.badRows.count,
    failing: result.failing,
    worst: result.worst[0]?.utilisation ?? 0,
  });
});

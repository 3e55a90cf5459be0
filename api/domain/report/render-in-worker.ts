import { Worker } from "node:worker_threads";
import type { RecordContent } from "../../../core/contract/records";
import type { ReportMeta } from "../../../core/report";
import type { PdfAnswer, PdfJob, WarmJob } from "./pdf-worker";

/**
 * Draws report PDFs in one worker thread, so that laying out hundreds of rows never holds the
 * server's event loop (measured before: up to about 0.46 s at 500 rows on the main thread, during
 * which /api/health did not answer). The worker starts on the first report, keeps its fonts for the
 * next ones, and does not keep the process alive while idle. Reports queue in the worker one after
 * another, in the order asked.
 */

type Pending = { resolve: (pdf: Buffer) => void; reject: (error: Error) => void };

let worker: Worker | null = null;
let nextId = 1;
const pending = new Map<number, Pending>();

/** Every waiting report fails with `error`, and the next report starts a fresh worker. */
function failAll(error: Error): void {
  worker = null;
  for (const waiting of pending.values()) waiting.reject(error);
  pending.clear();
}

function startWorker(): Worker {
  // A JavaScript shim registers tsx in the thread, then loads the TypeScript worker beside it.
  const started = new Worker(new URL("./pdf-worker.mjs", import.meta.url));
  started.on("message", (answer: PdfAnswer) => {
    const waiting = pending.get(answer.id);
    if (!waiting) return;
    pending.delete(answer.id);
    if (pending.size === 0) started.unref();
    if ("error" in answer) waiting.reject(new Error(`the report could not be drawn: ${answer.error}`));
    else waiting.resolve(Buffer.from(answer.pdf.buffer, answer.pdf.byteOffset, answer.pdf.byteLength));
  });
  started.on("error", (error) => {
    if (worker === started) failAll(error);
  });
  started.on("exit", (code) => {
    if (worker === started) failAll(new Error(`the report worker stopped (exit code ${code})`));
  });
  return started;
}

/** The PDF of `content` as `meta` presents it, drawn in the report worker. */
export function renderReportInWorker(content: RecordContent, meta: ReportMeta): Promise<Buffer> {
  worker ??= startWorker();
  const current = worker;
  const id = nextId++;
  return new Promise<Buffer>((resolve, reject) => {
    pending.set(id, { resolve, reject });
    // While a report is waiting, the worker keeps the process alive; idle, it does not.
    current.ref();
    current.postMessage({ id, content, meta } satisfies PdfJob);
  });
}

/**
 * Starts the worker and has it read and instance its fonts now (1.5 to 4 s of one core, measured on
 * this machine), so the first report after a start does not wait for them. The worker stays unref'd:
 * a warming worker never keeps the process alive.
 */
export function warmReportWorker(): void {
  worker ??= startWorker();
  worker.unref();
  worker.postMessage({ warm: true } satisfies WarmJob);
}

/** Stops the worker (tests and shutdown); a later report starts a new one. */
export async function stopReportWorker(): Promise<void> {
  const current = worker;
  worker = null;
  if (current) await current.terminate();
}

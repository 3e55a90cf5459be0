/**
 * The worker thread that draws reports: it receives a record's content and how to present it,
 * builds the report model and renders the PDF here, off the server's event loop, and sends the
 * bytes back (transferred, not copied).
 */
import { parentPort } from "node:worker_threads";
import type { RecordContent } from "../../../core/contract/records";
import { buildReportModel, type ReportMeta } from "../../../core/report";
import { reportFaces } from "./fonts";
import { renderReportPdf } from "./render-pdf";

/** One request to the worker; `id` pairs the answer with its caller. */
export type PdfJob = { id: number; content: RecordContent; meta: ReportMeta };
/** Asks the worker to read and instance its fonts now, before the first report needs them. */
export type WarmJob = { warm: true };
/** The worker's answer: the PDF's bytes, or the message of what went wrong. */
export type PdfAnswer = { id: number; pdf: Uint8Array } | { id: number; error: string };

parentPort!.on("message", (job: PdfJob | WarmJob) => {
  if ("warm" in job) {
    reportFaces();
    return;
  }
  renderReportPdf(buildReportModel(job.content, job.meta)).then(
    (pdf) => {
      // Transfer only a buffer the PDF owns whole; a slice of Node's shared pool is copied first.
      const whole = pdf.byteOffset === 0 && pdf.byteLength === pdf.buffer.byteLength;
      const bytes = whole ? new Uint8Array(pdf.buffer) : new Uint8Array(pdf);
      parentPort!.postMessage({ id: job.id, pdf: bytes } satisfies PdfAnswer, [bytes.buffer as ArrayBuffer]);
    },
    (error: unknown) =>
      parentPort!.postMessage({
        id: job.id,
        error: error instanceof Error ? (error.stack ?? error.message) : String(error),
      } satisfies PdfAnswer),
  );
});

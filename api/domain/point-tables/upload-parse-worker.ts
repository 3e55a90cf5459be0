import { serveJobs } from "./job-thread";
import { UploadParse, type ChunkOnTheWire, type UploadSetup, type UploadSummary } from "./upload-parse";

/** What the upload thread asks of its worker, per upload (several uploads may run at once). */
export type UploadMessage =
  | { kind: "start"; upload: number; setup: UploadSetup }
  | { kind: "bytes"; upload: number; bytes: Uint8Array }
  | { kind: "finish"; upload: number }
  | { kind: "chunk"; upload: number; index: number }
  | { kind: "drop"; upload: number };

export type UploadAnswer = null | UploadSummary | ChunkOnTheWire;

const uploads = new Map<number, UploadParse>();

function parseOf(upload: number): UploadParse {
  const parse = uploads.get(upload);
  if (!parse) throw new Error(`no upload ${upload} is being parsed`);
  return parse;
}

// The worker thread behind upload-parse-thread.ts: parses uploads' bytes and cuts the parsed
// tables into stored chunks, so the API's event loop only hashes and forwards the body.
serveJobs<UploadMessage, UploadAnswer>((m) => {
  switch (m.kind) {
    case "start":
      uploads.set(m.upload, new UploadParse(m.setup));
      return { answer: null };
    case "bytes":
      parseOf(m.upload).push(m.bytes);
      return { answer: null };
    case "finish":
      return { answer: parseOf(m.upload).finish() };
    case "chunk": {
      const { chunk, buffers } = parseOf(m.upload).chunk(m.index);
      return { answer: chunk, transfer: buffers };
    }
    case "drop":
      uploads.delete(m.upload);
      return { answer: null };
  }
});

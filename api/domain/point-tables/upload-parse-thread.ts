import type { NewPointTableChunk } from "../../../db/repositories/point-tables";
import { JobThread } from "./job-thread";
import type { ChunkOnTheWire, UploadSetup, UploadSummary } from "./upload-parse";
import type { UploadAnswer, UploadMessage } from "./upload-parse-worker";

/** One worker thread parses every upload of the process (see upload-parse-worker.ts). */
const thread = new JobThread<UploadMessage, UploadAnswer>(
  new URL("./upload-parse-worker.mjs", import.meta.url),
  "the point-table upload worker",
);

let nextUpload = 1;

/** A chunk that crossed from the worker, with its byte arrays as the Buffers the repository writes. */
function asStoredChunk(chunk: ChunkOnTheWire): NewPointTableChunk {
  const buffer = (bytes: Uint8Array) => Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  return {
    ...chunk,
    components: buffer(chunk.components),
    coordinates: chunk.coordinates && buffer(chunk.coordinates),
    numericIds: chunk.numericIds && buffer(chunk.numericIds),
  };
}

/**
 * An upload's parse, run in the upload worker: {@link push} the body's bytes in order, then
 * {@link finish}, then take the stored chunks from {@link chunks}; {@link drop} frees the worker's
 * copy of the table, whatever happened (call it in a `finally`).
 */
export class UploadParseInWorker {
  private readonly upload = nextUpload++;
  private readonly started: Promise<UploadAnswer>;

  constructor(setup: UploadSetup) {
    this.started = thread.run({ kind: "start", upload: this.upload, setup });
  }

  /** Sends a piece of the body; `bytes` must own its buffer (it moves to the worker). */
  async push(bytes: Uint8Array): Promise<void> {
    await this.started;
    await thread.run({ kind: "bytes", upload: this.upload, bytes }, [bytes.buffer as ArrayBuffer]);
  }

  async finish(): Promise<UploadSummary> {
    await this.started;
    return (await thread.run({ kind: "finish", upload: this.upload })) as UploadSummary;
  }

  /** The parsed table's chunks in order, the next one cut in the worker while this one is written. */
  async *chunks(chunkCount: number): AsyncGenerator<NewPointTableChunk> {
    const cut = (index: number) =>
      thread.run({ kind: "chunk", upload: this.upload, index }) as Promise<ChunkOnTheWire>;
    let next = chunkCount > 0 ? cut(0) : null;
    try {
      for (let index = 0; next !== null; index++) {
        const chunk = await next;
        next = index + 1 < chunkCount ? cut(index + 1) : null;
        yield asStoredChunk(chunk);
      }
    } finally {
      // Stopped early (a failed write): let the chunk cut ahead end without an unhandled rejection.
      next?.catch(() => undefined);
    }
  }

  async drop(): Promise<void> {
    await this.started.catch(() => undefined);
    await thread.run({ kind: "drop", upload: this.upload });
  }
}

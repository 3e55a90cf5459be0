import { createHash } from "node:crypto";
import type { Request } from "express";
import type { PointColumns, StressUnit } from "../../../core";
import { POINT_TABLE_LIMITS } from "../../../core/contract/limits";
import { POINT_TABLE_CONTENT_TYPES } from "../../../core/contract/point-tables";
import type { PointTableRow } from "../../../db/repositories/point-tables";
import { pointTableLimitError } from "../../domain/point-tables/limits";
import type { UploadSummary } from "../../domain/point-tables/upload-parse";
import { UploadParseInWorker } from "../../domain/point-tables/upload-parse-thread";
import { errors } from "../../errors";

const LF = 10;

/**
 * Bytes of the body sent to the upload worker at once: the network hands the body over in pieces
 * of 16–64 kB, and fewer, larger messages cost the event loop and the parser less per byte.
 */
const BATCH_BYTES = 1 << 20;

/** Line breaks in a piece of the body (counted on the bytes, before decoding). */
function lineBreaks(bytes: Buffer): number {
  let count = 0;
  for (let i = bytes.indexOf(LF); i >= 0; i = bytes.indexOf(LF, i + 1)) count++;
  return count;
}

/** A received and parsed body: what the parse found, and the parse that holds the points in the worker. */
export type ReceivedContent = { summary: UploadSummary; parse: UploadParseInWorker };

/**
 * Reads the body of PUT …/content as it arrives and has core's PointTableParser parse it in the
 * upload worker (upload-parse-thread.ts), a batch of about a megabyte at a time: the file's text is
 * never held whole, and the event loop only counts lines, hashes and forwards bytes. Checks on the
 * way that the body fits what POST declared — its size in bytes (400 naming `sizeBytes` as soon
 * as it runs past it, or at the end when it falls short) and its SHA-256 (400 naming `sha256`) —
 * and the row limit (413 as soon as it is passed), so a wrong or oversized file is refused
 * without being parsed to its end. On success the caller takes the chunks from `parse` and must
 * `drop()` it; on a refusal it is dropped here.
 */
export async function receiveContent(req: Request, table: PointTableRow): Promise<ReceivedContent> {
  const type = (req.headers["content-type"] ?? "").split(";")[0].trim().toLowerCase();
  if (!(POINT_TABLE_CONTENT_TYPES as readonly string[]).includes(type)) {
    throw errors.unsupportedMediaType(
      `Send the file's bytes as they are, with Content-Type ${POINT_TABLE_CONTENT_TYPES.join(", ")} (got "${type || "none"}").`,
    );
  }
  const declaredLength = req.headers["content-length"];
  if (declaredLength !== undefined && Number(declaredLength) !== table.sizeBytes) {
    throw errors.invalidInput([
      {
        path: "sizeBytes",
        message: `the body is ${declaredLength} bytes but the table was declared with sizeBytes ${table.sizeBytes}; send the file that was declared, or declare a new table`,
      },
    ]);
  }
  const layout = table.layout;
  const maxLines = POINT_TABLE_LIMITS.rowsPerTable + layout.skipRows + (layout.header ? 1 : 0);
  const parse = new UploadParseInWorker({
    separator: layout.separator,
    decimal: layout.decimal,
    skipRows: layout.skipRows,
    header: layout.header,
    columns: table.columns as PointColumns,
    unit: table.unit as StressUnit,
    idKind: table.idKind,
    sizeBytes: table.sizeBytes,
    maxRows: POINT_TABLE_LIMITS.rowsPerTable,
  });
  let sending: Promise<void> = Promise.resolve();
  try {
    await receiveInto(req, table, maxLines, (next) => {
      // One batch in the worker while the next is gathered: the socket waits when parsing is slower.
      const previous = sending;
      sending = previous.then(() => parse.push(next));
      return previous;
    });
    await sending;
    return { summary: checkedSummary(await parse.finish()), parse };
  } catch (error) {
    await sending.catch(() => undefined);
    await parse.drop().catch(() => undefined);
    throw error;
  }
}

/** Copies pieces of the body into batches of {@link BATCH_BYTES}, each in a buffer of its own. */
class Batcher {
  private batch = new Uint8Array(BATCH_BYTES);
  private filled = 0;

  /** Adds `piece`, answering the batches it completed. */
  add(piece: Uint8Array): Uint8Array[] {
    const full: Uint8Array[] = [];
    for (let at = 0; at < piece.length;) {
      const take = Math.min(piece.length - at, BATCH_BYTES - this.filled);
      this.batch.set(piece.subarray(at, at + take), this.filled);
      this.filled += take;
      at += take;
      if (this.filled === BATCH_BYTES) {
        full.push(this.batch);
        this.batch = new Uint8Array(BATCH_BYTES);
        this.filled = 0;
      }
    }
    return full;
  }

  /** The last, partly filled batch (a copy of its own), or null. */
  rest(): Uint8Array | null {
    return this.filled === 0 ? null : this.batch.slice(0, this.filled);
  }
}

/** Reads the body into `send`, checking its size, line count and SHA-256 against the declaration. */
async function receiveInto(
  req: Request,
  table: PointTableRow,
  maxLines: number,
  send: (bytes: Uint8Array) => Promise<void>,
): Promise<void> {
  const hash = createHash("sha256");
  const batcher = new Batcher();
  let bytes = 0;
  let lines = 0;
  for await (const piece of req as AsyncIterable<Buffer>) {
    bytes += piece.length;
    if (bytes > table.sizeBytes) {
      throw errors.invalidInput([
        {
          path: "sizeBytes",
          message: `the body runs past the declared sizeBytes ${table.sizeBytes}; send the file that was declared, or declare a new table`,
        },
      ]);
    }
    lines += lineBreaks(piece);
    // The last line may end without a line break, so the lines so far are the breaks plus one at most.
    if (lines > maxLines) throw pointTableLimitError("rowsPerTable", "content", lines);
    hash.update(piece);
    for (const batch of batcher.add(piece)) await send(batch);
  }
  const rest = batcher.rest();
  if (rest !== null) await send(rest);
  if (bytes !== table.sizeBytes) {
    throw errors.invalidInput([
      {
        path: "sizeBytes",
        message: `the body was ${bytes} bytes but the table was declared with sizeBytes ${table.sizeBytes}; send the whole file`,
      },
    ]);
  }
  const sha256 = hash.digest("hex");
  if (sha256 !== table.sha256) {
    throw errors.invalidInput([
      {
        path: "sha256",
        message: `the body's SHA-256 is ${sha256}, not the declared ${table.sha256}; the file changed or arrived damaged — send it again`,
      },
    ]);
  }
}

/** The finished parse, refused when it holds more rows than a table may, or none. */
function checkedSummary(parsed: UploadSummary): UploadSummary {
  if (parsed.count > POINT_TABLE_LIMITS.rowsPerTable) {
    throw pointTableLimitError("rowsPerTable", "content", parsed.count);
  }
  if (parsed.count === 0) {
    throw errors.invalidInput([
      {
        path: "content",
        message:
          parsed.badRows.count > 0
            ? `no row could be read (${parsed.badRows.count} bad rows; line ${parsed.badRows.first[0].line}: ${parsed.badRows.first[0].reason}); check the layout and the column mapping`
            : "the file holds no rows of points after the skipped and header lines",
      },
    ]);
  }
  return parsed;
}

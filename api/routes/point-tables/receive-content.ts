import { createHash } from "node:crypto";
import type { Request } from "express";
import {
  estimateRows,
  PointTableParser,
  type PointColumns,
  type PointTable,
  type StressUnit,
} from "../../../core";
import { POINT_TABLE_LIMITS } from "../../../core/contract/limits";
import { POINT_TABLE_CONTENT_TYPES } from "../../../core/contract/point-tables";
import type { PointTableRow } from "../../../db/repositories/point-tables";
import { pointTableLimitError } from "../../domain/point-tables/limits";
import { errors } from "../../errors";

const LF = 10;

/** Line breaks in a piece of the body (counted on the bytes, before decoding). */
function lineBreaks(bytes: Buffer): number {
  let count = 0;
  for (let i = bytes.indexOf(LF); i >= 0; i = bytes.indexOf(LF, i + 1)) count++;
  return count;
}

/**
 * Reads the body of PUT …/content as it arrives and parses it with core's PointTableParser, one
 * network chunk at a time: the file's text is never held whole, only the parsed Float64Arrays
 * (about 80 bytes a point). Checks on the way that the body fits what POST declared — its size
 * in bytes (400 naming `sizeBytes` as soon as it runs past it, or at the end when it falls
 * short) and its SHA-256 (400 naming `sha256`) — and the row limit (413 as soon as it is
 * passed), so a wrong or oversized file is refused without being parsed to its end.
 */
export async function receiveContent(req: Request, table: PointTableRow): Promise<PointTable> {
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
  const hash = createHash("sha256");
  const decoder = new TextDecoder("utf-8");
  let parser: PointTableParser | null = null;
  const start = (firstText: string) =>
    new PointTableParser({
      separator: layout.separator,
      decimal: layout.decimal,
      skipRows: layout.skipRows,
      header: layout.header,
      columns: table.columns as PointColumns,
      unit: table.unit as StressUnit,
      idKind: table.idKind,
      expectedRows: Math.min(POINT_TABLE_LIMITS.rowsPerTable, estimateRows(firstText, table.sizeBytes)),
    });
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
    const text = decoder.decode(piece, { stream: true });
    parser ??= start(text);
    parser.push(text);
  }
  const rest = decoder.decode();
  parser ??= start(rest);
  parser.push(rest);
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
  const parsed = parser.finish();
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

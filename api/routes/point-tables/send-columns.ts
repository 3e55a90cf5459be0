import { once } from "node:events";
import type { Response } from "express";
import type { PointTableRow } from "../../../db/repositories/point-tables";
import { readColumnBlocks } from "../../../db/repositories/point-tables";
import { POINTS_PER_CHUNK } from "../../../db/repositories/point-table-chunks";

/** Writes `bytes`, waiting for the socket to drain when its buffer is full. */
async function write(res: Response, bytes: Buffer): Promise<void> {
  if (!res.write(bytes)) await once(res, "drain");
}

/** 8·n bytes of NaN: a coordinate column of a table without coordinates. */
async function writeNaNs(res: Response, n: number): Promise<void> {
  const block = Buffer.from(new Float64Array(Math.min(n, POINTS_PER_CHUNK)).fill(Number.NaN).buffer);
  for (let left = n; left > 0; left -= POINTS_PER_CHUNK) {
    await write(res, left >= POINTS_PER_CHUNK ? block : block.subarray(0, 8 * left));
  }
}

/**
 * GET …/columns: the table's columns one after another as little-endian float64 — xx[n] yy[n]
 * zz[n] xy[n] yz[n] zx[n] in Pa, then x[n] y[n] z[n] (NaN without coordinates) — for the browser's
 * 3D view and table, which wraps each in a Float64Array without parsing. Read one column at a time
 * (PostgreSQL cuts it out of every chunk), so the server holds one column, not the table.
 */
export async function sendColumns(res: Response, table: PointTableRow): Promise<void> {
  const n = table.pointCount;
  res
    .status(200)
    .set({
      "Content-Type": "application/octet-stream",
      "Content-Length": String(9 * 8 * n),
      "X-Point-Count": String(n),
      "Cache-Control": "no-store",
    })
    .flushHeaders();
  for (let block = 0; block < 6; block++) {
    for (const part of await readColumnBlocks(table.id, "components", block)) await write(res, part);
  }
  for (let block = 0; block < 3; block++) {
    if (!table.hasCoordinates) await writeNaNs(res, n);
    else for (const part of await readColumnBlocks(table.id, "coordinates", block)) await write(res, part);
  }
  res.end();
}

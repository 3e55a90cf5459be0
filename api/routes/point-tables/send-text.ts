import { once } from "node:events";
import type { Response } from "express";
import { convertStress, type StressUnit } from "../../../core";
import { readChunk, type PointTableRow } from "../../../db/repositories/point-tables";
import { chunkIds, doublesOf } from "../../../db/repositories/point-table-chunks";

/** Writes `text`, waiting for the socket to drain when its buffer is full. */
async function write(res: Response, text: string): Promise<void> {
  if (!res.write(text)) await once(res, "drain");
}

/** Each stored chunk of the table in order, with the columns asked for. */
async function* chunksOfTable(table: PointTableRow, columns: { components: boolean; coordinates: boolean }) {
  for (let i = 0; ; i++) {
    const chunk = await readChunk(table.id, i, { ...columns, ids: true });
    if (chunk === null) return;
    yield chunk;
  }
}

/** GET …/ids: the ids of the points in table order, as one JSON array written a chunk at a time. */
export async function sendIds(res: Response, table: PointTableRow): Promise<void> {
  res.status(200).type("json").set("Cache-Control", "no-store");
  let first = true;
  await write(res, "[");
  for await (const chunk of chunksOfTable(table, { components: false, coordinates: false })) {
    const ids = JSON.stringify(chunkIds(chunk));
    await write(res, (first ? "" : ",") + ids.slice(1, -1));
    first = false;
  }
  res.end("]");
}

/** A text field of a CSV line, quoted when it holds a separator, a quote or a line break. */
function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/**
 * A stress in the table's unit as the CSV writes it: the shortest text that reads back to the
 * very same double in Pa when the parser multiplies it by the unit's scale (15 significant
 * digits when they do — "123.456", not the "123.45600000000002" that dividing gives — else the
 * shortest round trip of the quotient).
 */
function stressText(pa: number, scale: number): string {
  const v = pa / scale;
  const short = Number(v.toPrecision(15));
  return short * scale === pa ? String(short) : String(v);
}

/**
 * GET …/download: the table again as a CSV (comma-separated, header line, "." decimal mark):
 * the id column when the table has one, x y z when it has coordinates, then the six components in
 * the unit the file was written in. Bad rows of the original are not in it (they were never stored).
 */
export async function sendCsv(res: Response, table: PointTableRow): Promise<void> {
  const scale = convertStress(1, table.unit as StressUnit, "Pa");
  const hasIds = table.columns.id !== undefined;
  const header = [
    ...(hasIds ? ["id"] : []),
    ...(table.hasCoordinates ? ["x", "y", "z"] : []),
    "xx",
    "yy",
    "zz",
    "xy",
    "yz",
    "zx",
  ];
  res.status(200).attachment(table.fileName).type("text/csv; charset=utf-8").set("Cache-Control", "no-store");
  await write(res, header.join(",") + "\n");
  for await (const chunk of chunksOfTable(table, { components: true, coordinates: table.hasCoordinates })) {
    const n = chunk.pointCount;
    const comps = doublesOf(chunk.components!);
    const xyz = chunk.coordinates ? doublesOf(chunk.coordinates) : null;
    const ids = hasIds ? chunkIds(chunk) : null;
    const lines: string[] = [];
    for (let k = 0; k < n; k++) {
      const fields: string[] = [];
      if (ids) fields.push(typeof ids[k] === "string" ? csvField(ids[k] as string) : String(ids[k]));
      if (xyz) fields.push(String(xyz[k]), String(xyz[n + k]), String(xyz[2 * n + k]));
      for (let c = 0; c < 6; c++) fields.push(stressText(comps[c * n + k], scale));
      lines.push(fields.join(","));
    }
    await write(res, lines.join("\n") + "\n");
  }
  res.end();
}

import { literal, Op, QueryTypes, type Transaction } from "sequelize";
import { PointTable } from "../models/point-table";
import { PointTableChunk } from "../models/point-table-chunk";
import { toPlain, toPlainOrNull, updateById, type Row } from "./plain";

/** A point table's declaration, mapping and stored evaluation, as a plain object. */
export type PointTableRow = Row<PointTable>;

/** A stored chunk of points, as a plain object (binary columns as Buffers). */
export type PointTableChunkRow = Row<PointTableChunk>;

/** What declaring a table sets; status, counts, evaluation and timestamps are the table's. */
export type NewPointTable = Pick<
  PointTableRow,
  | "projectId"
  | "loadCaseId"
  | "fileName"
  | "sizeBytes"
  | "sha256"
  | "layout"
  | "columns"
  | "unit"
  | "idKind"
  | "createdBy"
>;

/** Declares a table; its points come later with {@link storePointTableContent}. */
export async function createPointTable(
  values: NewPointTable,
  transaction?: Transaction,
): Promise<PointTableRow> {
  return toPlain(await PointTable.create(values, { transaction }));
}

/** The table `id` of load case `loadCaseId`, or null (locked FOR UPDATE with `lock` inside a transaction). */
export async function findPointTable(
  loadCaseId: string,
  id: string,
  options: { transaction?: Transaction; lock?: boolean } = {},
): Promise<PointTableRow | null> {
  const row = await PointTable.findOne({
    where: { id, loadCaseId },
    transaction: options.transaction,
    lock: options.lock && options.transaction ? options.transaction.LOCK.UPDATE : undefined,
  });
  return toPlainOrNull(row);
}

/** The tables of a load case, newest first (a new upload starts from the newest one's mapping). */
export async function listPointTables(
  loadCaseId: string,
  transaction?: Transaction,
): Promise<PointTableRow[]> {
  const rows = await PointTable.findAll({
    where: { loadCaseId },
    order: [
      ["createdAt", "DESC"],
      ["id", "ASC"],
    ],
    transaction,
  });
  return rows.map(toPlain);
}

/** The ready tables of the project's live load cases, in the cases' order, then oldest first. */
export async function listReadyPointTablesOfProject(
  projectId: string,
  transaction?: Transaction,
): Promise<PointTableRow[]> {
  const rows = await PointTable.findAll({
    where: {
      projectId,
      status: "ready",
      [Op.and]: [
        literal(`"PointTable"."load_case_id" IN (SELECT id FROM load_cases WHERE deleted_at IS NULL)`),
      ],
    },
    order: [
      [literal(`(SELECT position FROM load_cases WHERE load_cases.id = "PointTable"."load_case_id")`), "ASC"],
      ["createdAt", "ASC"],
    ],
    transaction,
  });
  return rows.map(toPlain);
}

/** How many tables a load case holds, and how many the project holds over all its cases. */
export async function countPointTables(
  projectId: string,
  loadCaseId: string,
  transaction?: Transaction,
): Promise<{ inLoadCase: number; inProject: number }> {
  // One after another: on a transaction both go through one connection, and pg deprecates
  // issuing them concurrently.
  const inLoadCase = await PointTable.count({ where: { loadCaseId }, transaction });
  const inProject = await PointTable.count({ where: { projectId }, transaction });
  return { inLoadCase, inProject };
}

/** The node-postgres client under a Sequelize transaction. */
type PgWriter = { query(config: { text: string; values: unknown[] }): Promise<unknown> };

/** A chunk to store: its points as binary columns. */
export type NewPointTableChunk = Omit<PointTableChunkRow, "pointTableId">;

/**
 * Stores a table's points (replacing any stored before) and marks it ready with its counts and
 * bad rows, in `transaction`: the points and the status change together or not at all.
 */
export async function storePointTableContent(
  id: string,
  content: {
    chunks: Iterable<NewPointTableChunk> | AsyncIterable<NewPointTableChunk>;
    pointCount: number;
    hasCoordinates: boolean;
    badRows: PointTableRow["badRows"];
  },
  transaction: Transaction,
): Promise<PointTableRow> {
  await PointTableChunk.destroy({ where: { pointTableId: id }, transaction });
  // One row per statement, on the transaction's own node-postgres connection with bound
  // parameters: node-postgres sends a Buffer as binary, where a model's create writes the bytea
  // as hex text into the SQL (storing 1,000,000 points took 23 s that way, 16 chunks of 7.5 MB)
  // and Sequelize's `bind` turns a Buffer into text.
  const connection = (transaction as unknown as { connection: PgWriter }).connection;
  for await (const chunk of content.chunks) {
    await connection.query({
      text: `INSERT INTO point_table_chunks
         (point_table_id, chunk_index, point_count, components, coordinates, numeric_ids, text_ids)
       VALUES ($1, $2, $3, $4, $5, $6, $7)`,
      values: [
        id,
        chunk.chunkIndex,
        chunk.pointCount,
        chunk.components,
        chunk.coordinates,
        chunk.numericIds,
        chunk.textIds === null ? null : JSON.stringify(chunk.textIds),
      ],
    });
  }
  const row = await updateById(
    PointTable,
    id,
    {
      status: "ready",
      pointCount: content.pointCount,
      hasCoordinates: content.hasCoordinates,
      badRows: content.badRows,
      evaluation: null,
      evaluationBasis: null,
    },
    transaction,
  );
  return row!;
}

/** Keeps a table's evaluation with the allowables it was made against. */
export async function saveEvaluation(
  id: string,
  evaluation: unknown,
  basis: string,
  transaction?: Transaction,
): Promise<void> {
  await PointTable.update({ evaluation, evaluationBasis: basis }, { where: { id }, transaction });
}

/**
 * Runs a read whose bytea columns the SQL wraps in `encode(…, 'base64')`, and decodes them with
 * Node's native base64 decoder. In the default text format PostgreSQL sends a bytea as hex and
 * node-postgres decodes it in JavaScript, which took most of the time of reading a table back
 * (and node-postgres decodes every field as UTF-8 text, so the binary result format is no way out).
 */
async function rowsWithBytes(
  sql: string,
  values: unknown[],
  byteColumns: readonly string[],
): Promise<Record<string, Buffer | string | number | null>[]> {
  const rows = await PointTableChunk.sequelize!.query<Record<string, string | number | null>>(sql, {
    bind: values,
    type: QueryTypes.SELECT,
  });
  return rows.map((row) => {
    const out: Record<string, Buffer | string | number | null> = { ...row };
    for (const c of byteColumns) {
      const v = row[c];
      out[c] = typeof v === "string" ? Buffer.from(v, "base64") : null;
    }
    return out;
  });
}

/** A chunk as the readers use it: its binary columns as Buffers (null when not asked for or not stored). */
export type StoredChunk = Pick<PointTableChunkRow, "chunkIndex" | "pointCount"> & {
  components: Buffer | null;
  coordinates: Buffer | null;
  numericIds: Buffer | null;
  textIds: string[] | null;
};

/** Chunk `chunkIndex` of a table with the columns asked for, or null past the last one. */
export async function readChunk(
  pointTableId: string,
  chunkIndex: number,
  columns: { coordinates?: boolean; ids?: boolean; components?: boolean },
): Promise<StoredChunk | null> {
  const [row] = await rowsWithBytes(
    `SELECT point_count,
       ${columns.components === false ? "NULL" : "encode(components, 'base64')"} AS components,
       ${columns.coordinates ? "encode(coordinates, 'base64')" : "NULL"} AS coordinates,
       ${columns.ids ? "encode(numeric_ids, 'base64')" : "NULL"} AS numeric_ids,
       ${columns.ids ? "text_ids::text" : "NULL"} AS text_ids
     FROM point_table_chunks WHERE point_table_id = $1 AND chunk_index = $2`,
    [pointTableId, chunkIndex],
    ["components", "coordinates", "numeric_ids"],
  );
  if (!row) return null;
  return {
    chunkIndex,
    pointCount: Number(row.point_count),
    components: row.components as Buffer | null,
    coordinates: row.coordinates as Buffer | null,
    numericIds: row.numeric_ids as Buffer | null,
    textIds: typeof row.text_ids === "string" ? (JSON.parse(row.text_ids) as string[]) : null,
  };
}

/** Where a point of a table is: its id (number or text) and coordinates (null without them). */
export type PointPlace = { id: number | string; x: number | null; y: number | null; z: number | null };

/**
 * The ids and coordinates of the points at the 0-based table indices `indices` (a table's
 * governing and worst points), cut out of their chunks by PostgreSQL so that 8 bytes per value
 * cross the wire instead of the chunks; a point without a stored id gets its 1-based row number,
 * as `chunkIds` (point-table-chunks.ts) gives it. Indices past the table are left out of the map.
 */
export async function readPointPlaces(
  pointTableId: string,
  indices: readonly number[],
  pointsPerChunk: number,
): Promise<Map<number, PointPlace>> {
  const places = new Map<number, PointPlace>();
  if (indices.length === 0) return places;
  const rows = await rowsWithBytes(
    `SELECT p.i AS index,
       encode(substring(c.numeric_ids FROM 1 + 8 * p.k FOR 8), 'base64') AS numeric_id,
       c.text_ids ->> p.k AS text_id,
       encode(substring(c.coordinates FROM 1 + 8 * p.k FOR 8), 'base64') AS x,
       encode(substring(c.coordinates FROM 1 + 8 * (c.point_count + p.k) FOR 8), 'base64') AS y,
       encode(substring(c.coordinates FROM 1 + 8 * (2 * c.point_count + p.k) FOR 8), 'base64') AS z
     FROM (SELECT i, i / $3::int AS chunk, i % $3::int AS k FROM unnest($2::int[]) AS i) p
     JOIN point_table_chunks c ON c.point_table_id = $1 AND c.chunk_index = p.chunk AND p.k < c.point_count`,
    [pointTableId, [...new Set(indices)], pointsPerChunk],
    ["numeric_id", "x", "y", "z"],
  );
  const double = (b: Buffer | string | number | null) => (b instanceof Buffer ? b.readDoubleLE(0) : null);
  for (const row of rows) {
    const index = Number(row.index);
    const textId = row.text_id;
    places.set(index, {
      id: typeof textId === "string" ? textId : (double(row.numeric_id) ?? index + 1),
      x: double(row.x),
      y: double(row.y),
      z: double(row.z),
    });
  }
  return places;
}

/**
 * One stored column of a table, chunk by chunk (in order): bytes [offset, offset + 8·n) of the
 * binary column `column` of each chunk, cut by PostgreSQL so only that column crosses the wire.
 * @param block which column of the chunk: 0…5 the components (xx…zx) or 0…2 the coordinates
 */
export async function readColumnBlocks(
  pointTableId: string,
  column: "components" | "coordinates",
  block: number,
): Promise<Buffer[]> {
  const rows = await rowsWithBytes(
    `SELECT encode(substring(${column} FROM 1 + 8 * point_count * $2::int FOR 8 * point_count), 'base64') AS part
     FROM point_table_chunks WHERE point_table_id = $1 ORDER BY chunk_index`,
    [pointTableId, block],
    ["part"],
  );
  return rows.map((r) => (r.part as Buffer | null) ?? Buffer.alloc(0));
}

/** Deletes a table and its points; false when there was none. */
export async function deletePointTable(id: string, transaction?: Transaction): Promise<boolean> {
  return (await PointTable.destroy({ where: { id }, transaction })) > 0;
}

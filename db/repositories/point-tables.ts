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
  const [inLoadCase, inProject] = await Promise.all([
    PointTable.count({ where: { loadCaseId }, transaction }),
    PointTable.count({ where: { projectId }, transaction }),
  ]);
  return { inLoadCase, inProject };
}

/** A chunk to store: its points as binary columns. */
export type NewPointTableChunk = Omit<PointTableChunkRow, "pointTableId">;

/**
 * Stores a table's points (replacing any stored before) and marks it ready with its counts and
 * bad rows, in `transaction`: the points and the status change together or not at all.
 */
export async function storePointTableContent(
  id: string,
  content: {
    chunks: Iterable<NewPointTableChunk>;
    pointCount: number;
    hasCoordinates: boolean;
    badRows: PointTableRow["badRows"];
  },
  transaction: Transaction,
): Promise<PointTableRow> {
  await PointTableChunk.destroy({ where: { pointTableId: id }, transaction });
  // One row per statement: a chunk is up to about 5 MB, and a multi-row insert would hold every
  // chunk's parameters at once.
  for (const chunk of content.chunks) {
    await PointTableChunk.create({ ...chunk, pointTableId: id }, { transaction });
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

/** Chunk `chunkIndex` of a table with the columns asked for, or null past the last one. */
export async function readChunk(
  pointTableId: string,
  chunkIndex: number,
  columns: { coordinates?: boolean; ids?: boolean; components?: boolean },
  transaction?: Transaction,
): Promise<PointTableChunkRow | null> {
  const attributes = ["pointTableId", "chunkIndex", "pointCount"];
  if (columns.components !== false) attributes.push("components");
  if (columns.coordinates) attributes.push("coordinates");
  if (columns.ids) attributes.push("numericIds", "textIds");
  const row = await PointTableChunk.findOne({ where: { pointTableId, chunkIndex }, attributes, transaction });
  return toPlainOrNull(row);
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
  transaction?: Transaction,
): Promise<Buffer[]> {
  const rows = await PointTable.sequelize!.query<{ part: Buffer | null }>(
    `SELECT substring(${column} FROM 1 + 8 * point_count * $2 FOR 8 * point_count) AS part
     FROM point_table_chunks WHERE point_table_id = $1 ORDER BY chunk_index`,
    { bind: [pointTableId, block], type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => r.part ?? Buffer.alloc(0));
}

/** Deletes a table and its points; false when there was none. */
export async function deletePointTable(id: string, transaction?: Transaction): Promise<boolean> {
  return (await PointTable.destroy({ where: { id }, transaction })) > 0;
}

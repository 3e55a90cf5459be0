import type { InferAttributes, Model, ModelStatic, Transaction, WhereOptions } from "sequelize";

/**
 * The repositories hand out plain objects, never model instances: a caller cannot save,
 * reload or lazily query a row behind the repository's back, and a presenter or a test can
 * build one by hand.
 */
export type Row<M extends Model> = InferAttributes<M>;

/** A model instance as the plain object of its attributes (getters applied). */
export function toPlain<M extends Model>(instance: M): Row<M> {
  return instance.get({ plain: true }) as Row<M>;
}

/** `toPlain`, or null for a row that was not found. */
export function toPlainOrNull<M extends Model>(instance: M | null): Row<M> | null {
  return instance ? toPlain(instance) : null;
}

/** Options every read of a row to be changed takes: its transaction, and whether to lock it FOR UPDATE. */
export type ReadOptions = { transaction?: Transaction; lock?: boolean };

/** The `lock` option for Sequelize: FOR UPDATE only when asked and inside a transaction. */
export function lockOf(options: ReadOptions) {
  return options.lock && options.transaction ? options.transaction.LOCK.UPDATE : undefined;
}

/**
 * Sets `values` on the row `id` of `model` in one statement and returns the row as stored
 * after it (updatedAt raised), or null when there is no such row.
 */
export async function updateById<M extends Model>(
  model: ModelStatic<M>,
  id: string,
  values: Partial<Row<M>>,
  transaction?: Transaction,
): Promise<Row<M> | null> {
  const [, rows] = await model.update(values as never, {
    where: { id } as WhereOptions,
    returning: true,
    transaction,
  });
  return rows.length > 0 ? toPlain(rows[0]) : null;
}

/** The largest `position` among the rows of `projectId` (trashed ones too), or null when it has none. */
export async function lastPosition(
  model: ModelStatic<Model>,
  projectId: string,
  transaction?: Transaction,
): Promise<number | null> {
  return (await model.max("position", { where: { projectId }, transaction })) as number | null;
}

/** How many rows of `projectId` are not in the trash. */
export function countLive(model: ModelStatic<Model>, projectId: string, transaction?: Transaction) {
  return model.count({ where: { projectId, deletedAt: null }, transaction });
}

/** The order of a project's children (locations, load cases, combinations): position, then creation. */
const CHILD_ORDER: [string, string][] = [
  ["position", "ASC"],
  ["createdAt", "ASC"],
];

/** The child `id` of `projectId` in `model`, not in the trash (locked FOR UPDATE with `lock`), or null. */
export async function findLiveChild<M extends Model>(
  model: ModelStatic<M>,
  projectId: string,
  id: string,
  options: ReadOptions = {},
): Promise<Row<M> | null> {
  const row = await model.findOne({
    where: { id, projectId, deletedAt: null } as WhereOptions,
    transaction: options.transaction,
    lock: lockOf(options),
  });
  return toPlainOrNull(row);
}

/** The project's live children in `model`, in their order. */
export async function listLiveChildren<M extends Model>(
  model: ModelStatic<M>,
  projectId: string,
  transaction?: Transaction,
): Promise<Row<M>[]> {
  const rows = await model.findAll({
    where: { projectId, deletedAt: null } as WhereOptions,
    order: CHILD_ORDER,
    transaction,
  });
  return rows.map(toPlain);
}

/** Which of `ids` are live children of `projectId` in `model`. */
export async function liveChildIdsAmong(
  model: ModelStatic<Model>,
  projectId: string,
  ids: string[],
  transaction?: Transaction,
): Promise<Set<string>> {
  if (ids.length === 0) return new Set();
  const rows = await model.findAll({
    attributes: ["id"],
    where: { id: ids, projectId, deletedAt: null } as WhereOptions,
    transaction,
  });
  return new Set(rows.map((row) => row.get("id") as string));
}

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

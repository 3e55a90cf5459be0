import { Op, type Transaction } from "sequelize";
import { DevMailMessage } from "../models/dev-mail-message";
import { toPlain, toPlainOrNull, type Row } from "./plain";

/** A message the fake SMTP server caught (development and tests only), as a plain object. */
export type DevMailRow = Row<DevMailMessage>;

/** The newest `limit` caught messages, only those to `to` when given. */
export async function listDevMail(
  filter: { to?: string; limit: number },
  transaction?: Transaction,
): Promise<DevMailRow[]> {
  const rows = await DevMailMessage.findAll({
    where: filter.to ? { toAddresses: { [Op.contains]: [filter.to.toLowerCase()] } } : {},
    order: [["receivedAt", "DESC"]],
    limit: filter.limit,
    transaction,
  });
  return rows.map(toPlain);
}

/** The caught message `id`, or null. */
export async function findDevMail(id: string, transaction?: Transaction): Promise<DevMailRow | null> {
  return toPlainOrNull(await DevMailMessage.findByPk(id, { transaction }));
}

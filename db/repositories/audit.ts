import { Op, type Transaction, type WhereOptions } from "sequelize";
import { AuditEvent } from "../models/audit-event";
import { toPlain, type Row } from "./plain";

/** One line of a workspace's audit trail, as a plain object. */
export type AuditEventRow = Row<AuditEvent>;

/** What an audit line records; its id and time are the table's. */
export type NewAuditEvent = Omit<AuditEventRow, "id" | "createdAt" | "changes"> & {
  changes?: Record<string, unknown> | null;
};

/** Writes one audit line (inside the change's transaction, so both commit or neither). */
export async function insertAuditEvent(
  values: NewAuditEvent,
  transaction?: Transaction,
): Promise<AuditEventRow> {
  return toPlain(await AuditEvent.create({ ...values, changes: values.changes ?? null }, { transaction }));
}

/**
 * A page of the workspace's trail, newest first: at most `limit` lines older than the line
 * `before` (all when null), optionally of one project or one record.
 */
export async function listAuditEvents(
  filter: { workspaceId: string; projectId?: string; entityId?: string; before?: number; limit: number },
  transaction?: Transaction,
): Promise<AuditEventRow[]> {
  const where: WhereOptions = { workspaceId: filter.workspaceId };
  if (filter.projectId) Object.assign(where, { projectId: filter.projectId });
  if (filter.entityId) Object.assign(where, { entityId: filter.entityId });
  if (filter.before) Object.assign(where, { id: { [Op.lt]: filter.before } });
  const rows = await AuditEvent.findAll({ where, order: [["id", "DESC"]], limit: filter.limit, transaction });
  return rows.map(toPlain);
}

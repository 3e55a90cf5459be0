import type { Transaction } from "sequelize";
import type { User } from "lucia";
import type { AuditAction, AuditEntityType } from "../../../db/models/audit-event";
import { insertAuditEvent } from "../../../db/repositories/audit";

/** What one change was: which record, what happened to it, and a line a person reads. */
export type AuditEntry = {
  workspaceId: string;
  projectId: string | null;
  entityType: AuditEntityType;
  entityId: string;
  action: AuditAction;
  summary: string;
  changes?: Record<string, unknown> | null;
};

/**
 * Writes one audit event inside the caller's transaction, so the trail and the change it
 * describes are committed (or rolled back) together.
 */
export async function recordAudit(transaction: Transaction, actor: User, entry: AuditEntry): Promise<void> {
  await insertAuditEvent({ ...entry, actorId: actor.id, actorName: actor.name }, transaction);
}

/**
 * The fields that differ between `before` and `after`, as `{ field: { from, to } }`
 * (compared by JSON, so arrays and objects compare by value). Fields absent from `after` are skipped.
 */
export function changedFields(
  before: Record<string, unknown>,
  after: Record<string, unknown>,
): Record<string, { from: unknown; to: unknown }> {
  const changes: Record<string, { from: unknown; to: unknown }> = {};
  for (const [key, to] of Object.entries(after)) {
    if (to === undefined) continue;
    const from = before[key];
    if (JSON.stringify(from) !== JSON.stringify(to)) changes[key] = { from, to };
  }
  return changes;
}

import type { AuditEventView } from "../../../core/contract/projects";
import type { AuditEventRow } from "../../../db/repositories/audit";
import { describeChanges, type AuditNames } from "../../domain/audit/describe";

/** An audit event as the API sends it, its changes also in words. */
export function presentAuditEvent(e: AuditEventRow, names: AuditNames): AuditEventView {
  return {
    id: String(e.id),
    at: e.createdAt.toISOString(),
    actor: { id: e.actorId, name: e.actorName },
    projectId: e.projectId,
    entityType: e.entityType,
    entityId: e.entityId,
    action: e.action,
    summary: e.summary,
    changes: e.changes,
    details: describeChanges(e, names),
  };
}

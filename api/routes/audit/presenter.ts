import type { AuditEventView } from "../../../core/contract/projects";
import type { AuditEventRow } from "../../../db/repositories/audit";

/** An audit event as the API sends it. */
export function presentAuditEvent(e: AuditEventRow): AuditEventView {
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
  };
}

import { DataTypes, Model, type Sequelize } from "sequelize";

export type AuditAction =
  "create" | "update" | "delete" | "restore" | "import" | "purge" | "submit" | "return" | "approve";
export type AuditEntityType =
  | "project"
  | "location"
  | "load-case"
  | "stress-state"
  | "combination"
  | "material"
  | "linearization"
  | "record"
  | "point-table";

/** One entry of the audit trail (table `audit_events`): who changed what, when, and how. */
export class AuditEvent extends Model {
  declare id: string;
  declare workspaceId: string;
  declare projectId: string | null;
  declare entityType: AuditEntityType;
  declare entityId: string;
  declare action: AuditAction;
  declare actorId: string | null;
  /** The actor's name when it happened (kept if the account goes). */
  declare actorName: string;
  declare summary: string;
  /** Fields before and after, `{ field: { from, to } }`, or a snapshot for create/delete. */
  declare changes: Record<string, unknown> | null;
  declare createdAt: Date;
}

export function initAuditEvent(sequelize: Sequelize) {
  AuditEvent.init(
    {
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
      workspaceId: { type: DataTypes.UUID, allowNull: false },
      projectId: { type: DataTypes.UUID, allowNull: true },
      entityType: { type: DataTypes.STRING(24), allowNull: false },
      entityId: { type: DataTypes.UUID, allowNull: false },
      action: { type: DataTypes.STRING(16), allowNull: false },
      actorId: { type: DataTypes.UUID, allowNull: true },
      actorName: { type: DataTypes.STRING(100), allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      changes: { type: DataTypes.JSONB, allowNull: true },
    },
    { sequelize, tableName: "audit_events", updatedAt: false },
  );
  return AuditEvent;
}

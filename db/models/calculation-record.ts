import { DataTypes, Model, type Sequelize } from "sequelize";

/** A record's status: waiting for a check, returned with comments, approved, or replaced by a newer submission. */
export type RecordStatus = "submitted" | "returned" | "approved" | "superseded";

/** Who last edited one input of a record when it was frozen (for the independence rule). */
export type StoredInputEditor = { userId: string; what: string };

/**
 * A frozen calculation record (table `calculation_records`): a project's inputs and results as
 * submitted for check. The database refuses any change to what was frozen (see the migration's
 * trigger); only the status and the return/approval columns move.
 */
export class CalculationRecord extends Model {
  declare id: string;
  declare projectId: string;
  declare workspaceId: string;
  /** 1, 2, 3 … within the project. */
  declare number: number;
  /** "A", "B", … */
  declare revision: string;
  declare status: RecordStatus;
  /** What changed and why (the revision table's text). */
  declare reason: string;
  /** The RecordContent (core/contract/records.ts). */
  declare content: unknown;
  declare hash: string;
  declare engineVersion: string;
  declare requiredApprovals: number;
  declare inputEditors: StoredInputEditor[];
  declare submittedBy: string | null;
  declare submittedByName: string;
  declare submittedAt: Date;
  declare returnedBy: string | null;
  declare returnedByName: string | null;
  declare returnedAt: Date | null;
  declare returnComment: string | null;
  declare approvedAt: Date | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initCalculationRecord(sequelize: Sequelize) {
  CalculationRecord.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      workspaceId: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      revision: { type: DataTypes.STRING(8), allowNull: false },
      status: { type: DataTypes.STRING(16), allowNull: false },
      reason: { type: DataTypes.TEXT, allowNull: false },
      content: { type: DataTypes.JSONB, allowNull: false },
      hash: { type: DataTypes.CHAR(64), allowNull: false },
      engineVersion: { type: DataTypes.STRING(40), allowNull: false },
      requiredApprovals: { type: DataTypes.SMALLINT, allowNull: false },
      inputEditors: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
      submittedBy: { type: DataTypes.UUID, allowNull: true },
      submittedByName: { type: DataTypes.STRING(100), allowNull: false },
      submittedAt: { type: DataTypes.DATE, allowNull: false },
      returnedBy: { type: DataTypes.UUID, allowNull: true },
      returnedByName: { type: DataTypes.STRING(100), allowNull: true },
      returnedAt: { type: DataTypes.DATE, allowNull: true },
      returnComment: { type: DataTypes.TEXT, allowNull: true },
      approvedAt: { type: DataTypes.DATE, allowNull: true },
    },
    { sequelize, tableName: "calculation_records" },
  );
  return CalculationRecord;
}

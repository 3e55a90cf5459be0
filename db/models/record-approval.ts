import { DataTypes, Model, type Sequelize } from "sequelize";

/** One person's approval of a record (table `record_approvals`; one per person and record). */
export class RecordApproval extends Model {
  declare id: string;
  declare recordId: string;
  declare approverId: string | null;
  declare approverName: string;
  declare comment: string;
  declare createdAt: Date;
}

export function initRecordApproval(sequelize: Sequelize) {
  RecordApproval.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      recordId: { type: DataTypes.UUID, allowNull: false },
      approverId: { type: DataTypes.UUID, allowNull: true },
      approverName: { type: DataTypes.STRING(100), allowNull: false },
      comment: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    },
    { sequelize, tableName: "record_approvals", updatedAt: false },
  );
  return RecordApproval;
}

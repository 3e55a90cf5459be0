import { DataTypes, Model, type Sequelize } from "sequelize";
import type { RecordStatus } from "./calculation-record";

/** What happened to a record. */
export type RecordAction = "submit" | "approve" | "return" | "supersede";

/** One dated, signed change of a record's status (table `record_events`). */
export class RecordEvent extends Model {
  declare id: string;
  declare recordId: string;
  declare action: RecordAction;
  /** The record's status after the event. */
  declare status: RecordStatus;
  declare actorId: string | null;
  /** The actor's name when it happened (kept if the account goes). */
  declare actorName: string;
  declare note: string;
  declare createdAt: Date;
}

export function initRecordEvent(sequelize: Sequelize) {
  RecordEvent.init(
    {
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
      recordId: { type: DataTypes.UUID, allowNull: false },
      action: { type: DataTypes.STRING(16), allowNull: false },
      status: { type: DataTypes.STRING(16), allowNull: false },
      actorId: { type: DataTypes.UUID, allowNull: true },
      actorName: { type: DataTypes.STRING(100), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    },
    { sequelize, tableName: "record_events", updatedAt: false },
  );
  return RecordEvent;
}

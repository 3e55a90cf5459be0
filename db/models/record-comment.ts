import { DataTypes, Model, type Sequelize } from "sequelize";

/** A comment on a record as a whole (rowId null) or on one comparison row of it (table `record_comments`). */
export class RecordComment extends Model {
  declare id: string;
  declare recordId: string;
  declare rowId: string | null;
  /** The comment this one answers, or null. */
  declare replyTo: string | null;
  declare text: string;
  declare authorId: string | null;
  declare authorName: string;
  declare createdAt: Date;
}

export function initRecordComment(sequelize: Sequelize) {
  RecordComment.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      recordId: { type: DataTypes.UUID, allowNull: false },
      rowId: { type: DataTypes.STRING(200), allowNull: true },
      replyTo: { type: DataTypes.UUID, allowNull: true },
      text: { type: DataTypes.TEXT, allowNull: false },
      authorId: { type: DataTypes.UUID, allowNull: true },
      authorName: { type: DataTypes.STRING(100), allowNull: false },
    },
    { sequelize, tableName: "record_comments", updatedAt: false },
  );
  return RecordComment;
}

import { DataTypes, Model, type Sequelize } from "sequelize";

/**
 * A message caught by the development fake SMTP server (table `dev_mail_messages`).
 * Kept in PostgreSQL, not in memory, so every API process shows the same mailbox.
 */
export class DevMailMessage extends Model {
  declare id: string;
  declare fromAddress: string;
  declare toAddresses: string[];
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string | null;
  declare receivedAt: Date;
}

export function initDevMailMessage(sequelize: Sequelize) {
  DevMailMessage.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      fromAddress: { type: DataTypes.TEXT, allowNull: false },
      toAddresses: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
      subject: { type: DataTypes.TEXT, allowNull: false },
      textBody: { type: DataTypes.TEXT, allowNull: false },
      htmlBody: { type: DataTypes.TEXT, allowNull: true },
      receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    },
    { sequelize, tableName: "dev_mail_messages", timestamps: false },
  );
  return DevMailMessage;
}

import { DataTypes, Model, type Sequelize } from "sequelize";

/** One installation-wide setting (table `app_settings`). */
export class AppSetting extends Model {
  declare key: string;
  declare value: unknown;
  declare updatedAt: Date;
}

export function initAppSetting(sequelize: Sequelize) {
  AppSetting.init(
    {
      key: { type: DataTypes.STRING(100), primaryKey: true },
      value: { type: DataTypes.JSONB, allowNull: false },
    },
    { sequelize, tableName: "app_settings", createdAt: false, updatedAt: "updated_at" },
  );
  return AppSetting;
}

import { DataTypes } from "sequelize";
import type { Migration } from "../migrate";

/**
 * Key-value settings of the installation itself (not of a user or workspace),
 * e.g. which version of the demo seed has been applied.
 */
export const up: Migration["up"] = async ({ queryInterface, transaction }) => {
  await queryInterface.createTable(
    "app_settings",
    {
      key: { type: DataTypes.STRING(100), primaryKey: true },
      value: { type: DataTypes.JSONB, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    },
    { transaction },
  );
};

export const down: Migration["down"] = async ({ queryInterface, transaction }) => {
  await queryInterface.dropTable("app_settings", { transaction });
};

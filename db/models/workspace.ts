import { DataTypes, Model, type Sequelize } from "sequelize";

/** A team's workspace (table `workspaces`); projects and everything in them hang off it. */
export class Workspace extends Model {
  declare id: string;
  declare name: string;
  declare createdBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initWorkspace(sequelize: Sequelize) {
  Workspace.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      name: { type: DataTypes.STRING(100), allowNull: false },
      createdBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "workspaces" },
  );
  return Workspace;
}

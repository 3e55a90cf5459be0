import { DataTypes, Model, type Sequelize } from "sequelize";

/** A load case of a project (table `load_cases`); its states are `StressState` rows. */
export class LoadCase extends Model {
  declare id: string;
  declare projectId: string;
  declare name: string;
  declare category: string;
  declare description: string;
  declare position: number;
  /** Raised by every change to the case or any of its states (optimistic concurrency). */
  declare version: number;
  declare createdBy: string | null;
  declare updatedBy: string | null;
  declare deletedAt: Date | null;
  declare deletedBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initLoadCase(sequelize: Sequelize) {
  LoadCase.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(150), allowNull: false },
      category: { type: DataTypes.STRING(40), allowNull: false, defaultValue: "" },
      description: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      deletedAt: { type: DataTypes.DATE, allowNull: true },
      deletedBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "load_cases" },
  );
  return LoadCase;
}

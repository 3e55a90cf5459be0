import { DataTypes, Model, type Sequelize } from "sequelize";

/** A named linear combination of a project's load cases (table `combinations`); terms in `CombinationTerm`. */
export class Combination extends Model {
  declare id: string;
  declare projectId: string;
  declare name: string;
  declare description: string;
  declare position: number;
  declare version: number;
  declare createdBy: string | null;
  declare updatedBy: string | null;
  declare deletedAt: Date | null;
  declare deletedBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initCombination(sequelize: Sequelize) {
  Combination.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(150), allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      deletedAt: { type: DataTypes.DATE, allowNull: true },
      deletedBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "combinations" },
  );
  return Combination;
}

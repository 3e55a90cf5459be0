import { DataTypes, Model, type Sequelize } from "sequelize";

/** A material of a workspace's library (table `materials`); strengths and E in Pa. */
export class Material extends Model {
  declare id: string;
  declare workspaceId: string;
  declare name: string;
  /** The unit the values were entered in (shown back in it). */
  declare unit: string;
  declare yieldPa: number | null;
  declare ultimateTensionPa: number | null;
  declare ultimateCompressionPa: number | null;
  declare elasticModulusPa: number | null;
  declare poissonRatio: number | null;
  declare reference: string;
  declare note: string;
  declare version: number;
  declare createdBy: string | null;
  declare updatedBy: string | null;
  declare deletedAt: Date | null;
  declare deletedBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initMaterial(sequelize: Sequelize) {
  Material.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      workspaceId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      unit: { type: DataTypes.STRING(8), allowNull: false },
      yieldPa: { type: DataTypes.DOUBLE, allowNull: true },
      ultimateTensionPa: { type: DataTypes.DOUBLE, allowNull: true },
      ultimateCompressionPa: { type: DataTypes.DOUBLE, allowNull: true },
      elasticModulusPa: { type: DataTypes.DOUBLE, allowNull: true },
      poissonRatio: { type: DataTypes.DOUBLE, allowNull: true },
      reference: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      deletedAt: { type: DataTypes.DATE, allowNull: true },
      deletedBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "materials" },
  );
  return Material;
}

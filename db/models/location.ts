import { DataTypes, Model, type Sequelize } from "sequelize";

/** A named point of the structure in a project (table `locations`), with an optional material override. */
export class Location extends Model {
  declare id: string;
  declare projectId: string;
  declare name: string;
  declare note: string;
  declare materialId: string | null;
  declare publishedMaterial: string | null;
  declare position: number;
  declare version: number;
  declare createdBy: string | null;
  declare updatedBy: string | null;
  declare deletedAt: Date | null;
  declare deletedBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initLocation(sequelize: Sequelize) {
  Location.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      materialId: { type: DataTypes.UUID, allowNull: true },
      publishedMaterial: { type: DataTypes.STRING(40), allowNull: true },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      deletedAt: { type: DataTypes.DATE, allowNull: true },
      deletedBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "locations" },
  );
  return Location;
}

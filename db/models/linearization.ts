import { DataTypes, Model, type Sequelize } from "sequelize";

/**
 * A stress classification line saved under a load case (table `linearizations`): its inputs as
 * one document and the checks the server computed from them at the last save.
 */
export class Linearization extends Model {
  declare id: string;
  declare projectId: string;
  declare loadCaseId: string;
  declare locationId: string | null;
  declare name: string;
  /** The validated input (core/contract/linearizations.ts `linearizationInputSchema`, name and location aside). */
  declare input: Record<string, unknown>;
  /** What the comparison lists: classification, equivalent, unit, point count and the checks. */
  declare summary: Record<string, unknown>;
  declare position: number;
  declare version: number;
  declare createdBy: string | null;
  declare updatedBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initLinearization(sequelize: Sequelize) {
  Linearization.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      loadCaseId: { type: DataTypes.UUID, allowNull: false },
      locationId: { type: DataTypes.UUID, allowNull: true },
      name: { type: DataTypes.STRING(150), allowNull: false },
      input: { type: DataTypes.JSONB, allowNull: false },
      summary: { type: DataTypes.JSONB, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "linearizations" },
  );
  return Linearization;
}

import { DataTypes, Model, type Sequelize } from "sequelize";

/** factor × load case, one term of a combination (table `combination_terms`). */
export class CombinationTerm extends Model {
  declare id: string;
  declare combinationId: string;
  declare loadCaseId: string;
  declare position: number;
  declare factor: number;
}

export function initCombinationTerm(sequelize: Sequelize) {
  CombinationTerm.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      combinationId: { type: DataTypes.UUID, allowNull: false },
      loadCaseId: { type: DataTypes.UUID, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false },
      factor: { type: DataTypes.DOUBLE, allowNull: false },
    },
    { sequelize, tableName: "combination_terms", timestamps: false },
  );
  return CombinationTerm;
}

import { DataTypes, Model, type Sequelize } from "sequelize";
import type { CalculatorRecord } from "../../core/constants/calculators";

/**
 * One immutable revision of a load case's stress state at a location (table `stress_states`).
 * Components in Pa; `unit` is what they were entered in. Rows are never updated except to
 * clear `isCurrent` when a newer revision replaces them. `calculator` keeps the calculator and
 * every input that produced the state (null when it came from elsewhere).
 */
export class StressState extends Model {
  declare id: string;
  declare loadCaseId: string;
  declare locationId: string;
  declare revision: number;
  declare isCurrent: boolean;
  declare xxPa: number;
  declare yyPa: number;
  declare zzPa: number;
  declare xyPa: number;
  declare yzPa: number;
  declare zxPa: number;
  declare unit: string;
  declare source: string;
  declare note: string;
  declare calculator: CalculatorRecord | null;
  declare createdBy: string | null;
  declare createdAt: Date;
}

export function initStressState(sequelize: Sequelize) {
  StressState.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      loadCaseId: { type: DataTypes.UUID, allowNull: false },
      locationId: { type: DataTypes.UUID, allowNull: false },
      revision: { type: DataTypes.INTEGER, allowNull: false },
      isCurrent: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      xxPa: { type: DataTypes.DOUBLE, allowNull: false },
      yyPa: { type: DataTypes.DOUBLE, allowNull: false },
      zzPa: { type: DataTypes.DOUBLE, allowNull: false },
      xyPa: { type: DataTypes.DOUBLE, allowNull: false },
      yzPa: { type: DataTypes.DOUBLE, allowNull: false },
      zxPa: { type: DataTypes.DOUBLE, allowNull: false },
      unit: { type: DataTypes.STRING(8), allowNull: false },
      source: { type: DataTypes.STRING(32), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      calculator: { type: DataTypes.JSONB, allowNull: true },
      createdBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "stress_states", updatedAt: false },
  );
  return StressState;
}

import { DataTypes, Model, type Sequelize } from "sequelize";

/** The layout a point table's text is read with (as core's parser takes it). */
export type StoredPointTableLayout = {
  separator: "," | ";" | "\t" | "whitespace";
  decimal: "." | ",";
  skipRows: number;
  header: boolean;
};

/**
 * A finite-element point table of a load case (table `point_tables`): the file's declaration,
 * how it is read, and its stored evaluation. The points themselves are in `point_table_chunks`.
 */
export class PointTable extends Model {
  declare id: string;
  declare projectId: string;
  declare loadCaseId: string;
  declare status: "awaiting-content" | "ready";
  declare fileName: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare layout: StoredPointTableLayout;
  declare columns: Record<string, number>;
  declare unit: string;
  declare idKind: "number" | "text";
  declare pointCount: number;
  declare hasCoordinates: boolean;
  declare badRows: { count: number; first: { line: number; reason: string }[] };
  declare evaluation: unknown;
  declare evaluationBasis: string | null;
  declare createdBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initPointTable(sequelize: Sequelize) {
  PointTable.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      loadCaseId: { type: DataTypes.UUID, allowNull: false },
      status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "awaiting-content" },
      fileName: { type: DataTypes.STRING(255), allowNull: false },
      // bigint comes back from pg as a string; the limit keeps sizes far inside a double's integers
      sizeBytes: {
        type: DataTypes.BIGINT,
        allowNull: false,
        get(this: PointTable) {
          return Number(this.getDataValue("sizeBytes"));
        },
      },
      sha256: { type: DataTypes.CHAR(64), allowNull: false },
      layout: { type: DataTypes.JSONB, allowNull: false },
      columns: { type: DataTypes.JSONB, allowNull: false },
      unit: { type: DataTypes.STRING(8), allowNull: false },
      idKind: { type: DataTypes.STRING(8), allowNull: false },
      pointCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      hasCoordinates: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      badRows: { type: DataTypes.JSONB, allowNull: false, defaultValue: { count: 0, first: [] } },
      evaluation: { type: DataTypes.JSONB, allowNull: true },
      evaluationBasis: { type: DataTypes.TEXT, allowNull: true },
      createdBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "point_tables" },
  );
  return PointTable;
}

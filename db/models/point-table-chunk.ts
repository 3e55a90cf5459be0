import { DataTypes, Model, type Sequelize } from "sequelize";

/**
 * Up to 65,536 points of a point table (table `point_table_chunks`) as binary columns of
 * little-endian float64: `components` xx[n] yy[n] zz[n] xy[n] yz[n] zx[n] in Pa, `coordinates`
 * x[n] y[n] z[n] or null, `numericIds` id[n] or null; `textIds` the ids as text, or null.
 */
export class PointTableChunk extends Model {
  declare pointTableId: string;
  declare chunkIndex: number;
  declare pointCount: number;
  declare components: Buffer;
  declare coordinates: Buffer | null;
  declare numericIds: Buffer | null;
  declare textIds: string[] | null;
}

export function initPointTableChunk(sequelize: Sequelize) {
  PointTableChunk.init(
    {
      pointTableId: { type: DataTypes.UUID, primaryKey: true },
      chunkIndex: { type: DataTypes.INTEGER, primaryKey: true },
      pointCount: { type: DataTypes.INTEGER, allowNull: false },
      components: { type: DataTypes.BLOB, allowNull: false },
      coordinates: { type: DataTypes.BLOB, allowNull: true },
      numericIds: { type: DataTypes.BLOB, allowNull: true },
      textIds: { type: DataTypes.JSONB, allowNull: true },
    },
    { sequelize, tableName: "point_table_chunks", timestamps: false },
  );
  return PointTableChunk;
}

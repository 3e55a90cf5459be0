import type { Migration } from "../migrate";

/** The binary columns of point_table_chunks: float64 columns of points. */
const BINARY_COLUMNS = ["components", "coordinates", "numeric_ids"] as const;

/**
 * Stores the point chunks' binary columns out of line without compression (STORAGE EXTERNAL
 * instead of EXTENDED). Float64 stress components hardly compress (pglz took 48 MB of components
 * of a generated 1,000,000-point table to 31 MB) but compressing them was most of storing a table
 * (12.2 s against 3.8 s uncompressed, measured 3 December 2026 on the 2-core machine under load)
 * and decompressing every chunk again was paid on each evaluation; uncompressed values also let
 * PostgreSQL read a slice of a value (one point's coordinates) without reading the whole value.
 * Applies to rows written from now on; rows stored before stay readable as they are.
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  for (const column of BINARY_COLUMNS) {
    await sequelize.query(`alter table point_table_chunks alter column ${column} set storage external`, {
      transaction,
    });
  }
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  for (const column of [...BINARY_COLUMNS].reverse()) {
    await sequelize.query(`alter table point_table_chunks alter column ${column} set storage extended`, {
      transaction,
    });
  }
};

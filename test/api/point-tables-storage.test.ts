import { afterAll, describe, expect, it } from "vitest";
import { PointTableChunk } from "../../db/models/point-table-chunk";
import * as migration from "../../db/migrations/20261203-1600-store-point-chunks-uncompressed";
import { buildTestApp } from "../support/app";

const { close } = buildTestApp({ webDist: null });
afterAll(close);

/** The storage strategy of each binary column of point_table_chunks (PostgreSQL's pg_attribute.attstorage). */
async function storageOf(transaction: unknown): Promise<Record<string, string>> {
  const [rows] = await PointTableChunk.sequelize!.query(
    `select attname, attstorage from pg_attribute
     where attrelid = 'point_table_chunks'::regclass and attname in ('components', 'coordinates', 'numeric_ids')`,
    { transaction: transaction as never },
  );
  return Object.fromEntries(
    (rows as { attname: string; attstorage: string }[]).map((r) => [r.attname, r.attstorage]),
  );
}

describe("the migration that stores point chunks uncompressed", () => {
  // 'e' external (out of line, not compressed) and 'x' extended (compressed) are PostgreSQL's
  // codes in pg_attribute.attstorage (PostgreSQL documentation, "pg_attribute" and "TOAST").
  it("when it has run, then the binary columns are stored external; when it is undone, extended again; up again, external (up → down → up)", async () => {
    const sequelize = PointTableChunk.sequelize!;
    const rollback = new Error("roll back the schema test");
    const seen: Record<string, string>[] = [];
    await expect(
      sequelize.transaction(async (transaction) => {
        const context = { queryInterface: sequelize.getQueryInterface(), sequelize, transaction };
        seen.push(await storageOf(transaction));
        await migration.down(context);
        seen.push(await storageOf(transaction));
        await migration.up(context);
        seen.push(await storageOf(transaction));
        throw rollback;
      }),
    ).rejects.toBe(rollback);
    const external = { components: "e", coordinates: "e", numeric_ids: "e" };
    expect(seen).toEqual([external, { components: "x", coordinates: "x", numeric_ids: "x" }, external]);
  });
});

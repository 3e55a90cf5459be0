import type { Migration } from "../migrate";

/**
 * What a calculation record covers — a chosen set of load cases and locations, or the whole
 * project (null) — as a column the revision table can read without the record's content (which
 * runs to megabytes). Generated from the content's `scope`, so it is filled for the records already
 * stored, can never disagree with the content, and is as frozen as the content is.
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  await sequelize.query(
    `alter table calculation_records add column scope jsonb generated always as (content -> 'scope') stored`,
    { transaction },
  );
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  await sequelize.query(`alter table calculation_records drop column scope`, { transaction });
};

import type { Migration } from "../migrate";

/**
 * Stress classification lines saved per load case (`linearizations`). The inputs (the path's
 * points, frame, classification, allowables and options) are one jsonb document the server
 * validated with core/contract/linearizations.ts; `summary` holds the checks the server computed
 * from them at the last save, so the comparison can list every line without reading their points.
 * A line goes with its load case (cascade) and loses its location when the location is deleted
 * for good. `version` gives optimistic concurrency like the other project rows.
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`
    create table linearizations (
      id uuid primary key default gen_random_uuid(),
      project_id uuid not null references projects(id) on delete cascade,
      load_case_id uuid not null references load_cases(id) on delete cascade,
      location_id uuid references locations(id) on delete set null,
      name varchar(150) not null,
      input jsonb not null,
      summary jsonb not null,
      position integer not null default 0,
      version integer not null default 1,
      created_by uuid references users(id) on delete set null,
      updated_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    )`);
  await sql(`create index linearizations_load_case_id on linearizations (load_case_id)`);
  await sql(`create index linearizations_project_id on linearizations (project_id)`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  await sequelize.query(`drop table linearizations`, { transaction });
};

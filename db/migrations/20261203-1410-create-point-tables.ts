import type { Migration } from "../migrate";

/**
 * Finite-element point tables of a load case.
 *
 * - `point_tables`: one row per uploaded file: its name, size and SHA-256 as declared before the
 *   upload, the layout and column mapping it is read with, the unit, the bad rows the parser
 *   reported, and the stored evaluation (`evaluation`, jsonb) with the allowables it was made
 *   against (`evaluation_basis`, text), so lists and the comparison read it instead of
 *   evaluating again; a different basis means the allowables changed and the table is evaluated
 *   again. `status` is 'awaiting-content' until the file's text has arrived and checked out.
 * - `point_table_chunks`: the points, 65,536 per row, as binary columns of little-endian float64:
 *   `components` holds xx[n] yy[n] zz[n] xy[n] yz[n] zx[n] (Pa), `coordinates` x[n] y[n] z[n]
 *   (null without coordinates), `numeric_ids` id[n] (null unless the ids are numbers),
 *   `text_ids` a JSON array (null unless the ids are text).
 * Deleting a load case or project deletes its tables (on delete cascade).
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`
    create table point_tables (
      id uuid primary key default gen_random_uuid(),
      project_id uuid not null references projects(id) on delete cascade,
      load_case_id uuid not null references load_cases(id) on delete cascade,
      status varchar(20) not null default 'awaiting-content'
        check (status in ('awaiting-content', 'ready')),
      file_name varchar(255) not null,
      size_bytes bigint not null check (size_bytes > 0),
      sha256 char(64) not null,
      layout jsonb not null,
      columns jsonb not null,
      unit varchar(8) not null check (unit in ('Pa', 'kPa', 'MPa', 'GPa', 'psi', 'ksi')),
      id_kind varchar(8) not null check (id_kind in ('number', 'text')),
      point_count integer not null default 0,
      has_coordinates boolean not null default false,
      bad_rows jsonb not null default '{"count":0,"first":[]}'::jsonb,
      evaluation jsonb,
      evaluation_basis text,
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    )`);
  await sql(`create index point_tables_project_id on point_tables (project_id)`);
  await sql(`create index point_tables_load_case_id on point_tables (load_case_id)`);
  await sql(`
    create table point_table_chunks (
      point_table_id uuid not null references point_tables(id) on delete cascade,
      chunk_index integer not null check (chunk_index >= 0),
      point_count integer not null check (point_count > 0),
      components bytea not null,
      coordinates bytea,
      numeric_ids bytea,
      text_ids jsonb,
      primary key (point_table_id, chunk_index)
    )`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`drop table point_table_chunks`);
  await sql(`drop table point_tables`);
};

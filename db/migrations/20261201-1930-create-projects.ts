import type { Migration } from "../migrate";

/**
 * Projects and everything a check is made of: the workspace's material library, projects,
 * locations, load cases, their stress states, combinations and the audit trail.
 *
 * - Everything hangs off workspaces(id) with on delete cascade: deleting a workspace deletes
 *   its projects and all below them.
 * - Stress states are immutable revisions: saving a state inserts a new row (revision + 1) and
 *   clears `is_current` on the old one, so a later sign-off can point at exactly the rows it
 *   checked. Components are SI (Pa, double precision) with the unit they were entered in.
 *   `source` already allows the calculators', measurements' and finite-element rows to come.
 * - Projects, load cases, combinations, locations and materials have `version` (optimistic
 *   concurrency) and `deleted_at` (the 30-day trash).
 * - Material references are either a built-in published grade (`*_published_material`, its
 *   id in core's list) or a library row (`*_material_id`), never both (check constraints).
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`
    create table materials (
      id uuid primary key default gen_random_uuid(),
      workspace_id uuid not null references workspaces(id) on delete cascade,
      name varchar(120) not null,
      unit varchar(8) not null check (unit in ('Pa', 'kPa', 'MPa', 'GPa', 'psi', 'ksi')),
      yield_pa double precision check (yield_pa > 0),
      ultimate_tension_pa double precision check (ultimate_tension_pa > 0),
      ultimate_compression_pa double precision check (ultimate_compression_pa > 0),
      elastic_modulus_pa double precision check (elastic_modulus_pa > 0),
      poisson_ratio double precision check (poisson_ratio >= 0 and poisson_ratio < 0.5),
      reference varchar(500) not null default '',
      note text not null default '',
      version integer not null default 1,
      created_by uuid references users(id) on delete set null,
      updated_by uuid references users(id) on delete set null,
      deleted_at timestamptz,
      deleted_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    )`);
  await sql(`create index materials_workspace_id on materials (workspace_id)`);

  await sql(`
    create table projects (
      id uuid primary key default gen_random_uuid(),
      workspace_id uuid not null references workspaces(id) on delete cascade,
      name varchar(150) not null,
      description text not null default '',
      unit_system varchar(2) not null default 'SI' check (unit_system in ('SI', 'US')),
      requirements jsonb not null,
      default_material_id uuid references materials(id) on delete set null,
      default_published_material varchar(40),
      version integer not null default 1,
      created_by uuid references users(id) on delete set null,
      updated_by uuid references users(id) on delete set null,
      deleted_at timestamptz,
      deleted_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now(),
      check (default_material_id is null or default_published_material is null)
    )`);
  await sql(`create index projects_workspace_id on projects (workspace_id)`);

  await sql(`
    create table locations (
      id uuid primary key default gen_random_uuid(),
      project_id uuid not null references projects(id) on delete cascade,
      name varchar(120) not null,
      note text not null default '',
      material_id uuid references materials(id) on delete set null,
      published_material varchar(40),
      position integer not null default 0,
      version integer not null default 1,
      created_by uuid references users(id) on delete set null,
      updated_by uuid references users(id) on delete set null,
      deleted_at timestamptz,
      deleted_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now(),
      check (material_id is null or published_material is null)
    )`);
  await sql(`create index locations_project_id on locations (project_id)`);

  await sql(`
    create table load_cases (
      id uuid primary key default gen_random_uuid(),
      project_id uuid not null references projects(id) on delete cascade,
      name varchar(150) not null,
      category varchar(40) not null default '',
      description text not null default '',
      position integer not null default 0,
      version integer not null default 1,
      created_by uuid references users(id) on delete set null,
      updated_by uuid references users(id) on delete set null,
      deleted_at timestamptz,
      deleted_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    )`);
  await sql(`create index load_cases_project_id on load_cases (project_id)`);

  await sql(`
    create table stress_states (
      id uuid primary key default gen_random_uuid(),
      load_case_id uuid not null references load_cases(id) on delete cascade,
      location_id uuid not null references locations(id) on delete cascade,
      revision integer not null,
      is_current boolean not null default true,
      xx_pa double precision not null,
      yy_pa double precision not null,
      zz_pa double precision not null,
      xy_pa double precision not null,
      yz_pa double precision not null,
      zx_pa double precision not null,
      unit varchar(8) not null check (unit in ('Pa', 'kPa', 'MPa', 'GPa', 'psi', 'ksi')),
      source varchar(32) not null
        check (source in ('typed', 'pasted', 'calculator', 'measured', 'finite-element point')),
      note text not null default '',
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      unique (load_case_id, location_id, revision)
    )`);
  // At most one current revision per case and location.
  await sql(`
    create unique index stress_states_current on stress_states (load_case_id, location_id) where is_current`);

  await sql(`
    create table combinations (
      id uuid primary key default gen_random_uuid(),
      project_id uuid not null references projects(id) on delete cascade,
      name varchar(150) not null,
      description text not null default '',
      position integer not null default 0,
      version integer not null default 1,
      created_by uuid references users(id) on delete set null,
      updated_by uuid references users(id) on delete set null,
      deleted_at timestamptz,
      deleted_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    )`);
  await sql(`create index combinations_project_id on combinations (project_id)`);

  await sql(`
    create table combination_terms (
      id uuid primary key default gen_random_uuid(),
      combination_id uuid not null references combinations(id) on delete cascade,
      load_case_id uuid not null references load_cases(id) on delete cascade,
      position integer not null,
      factor double precision not null,
      unique (combination_id, load_case_id)
    )`);
  await sql(`create index combination_terms_load_case_id on combination_terms (load_case_id)`);

  // The trail outlives the rows it describes (no FK to them), but not its workspace.
  await sql(`
    create table audit_events (
      id bigserial primary key,
      workspace_id uuid not null references workspaces(id) on delete cascade,
      project_id uuid,
      entity_type varchar(24) not null,
      entity_id uuid not null,
      action varchar(16) not null
        check (action in ('create', 'update', 'delete', 'restore', 'import', 'purge')),
      actor_id uuid references users(id) on delete set null,
      actor_name varchar(100) not null,
      summary text not null,
      changes jsonb,
      created_at timestamptz not null default now()
    )`);
  await sql(`create index audit_events_workspace on audit_events (workspace_id, created_at desc)`);
  await sql(`create index audit_events_entity on audit_events (entity_id)`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql("drop table audit_events");
  await sql("drop table combination_terms");
  await sql("drop table combinations");
  await sql("drop table stress_states");
  await sql("drop table load_cases");
  await sql("drop table locations");
  await sql("drop table projects");
  await sql("drop table materials");
};

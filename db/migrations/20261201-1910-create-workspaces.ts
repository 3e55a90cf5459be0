import type { Migration } from "../migrate";

/**
 * Team workspaces and how people get into them. Projects, load cases, materials and the
 * audit trail will reference workspaces(id) with on delete cascade; reviewers' approvals
 * will reference memberships or users. Roles are varchar + check (not a PostgreSQL enum)
 * so a later migration can change the list inside a transaction.
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`
    create table workspaces (
      id uuid primary key default gen_random_uuid(),
      name varchar(100) not null,
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    )`);
  await sql(`
    create table invitations (
      id uuid primary key default gen_random_uuid(),
      workspace_id uuid not null references workspaces(id) on delete cascade,
      email varchar(254) not null,
      role varchar(16) not null check (role in ('owner', 'editor', 'reviewer', 'viewer')),
      token_hash char(64) not null unique,
      expires_at timestamptz not null,
      last_sent_at timestamptz not null default now(),
      send_count integer not null default 1,
      accepted_at timestamptz,
      accepted_by uuid references users(id) on delete set null,
      revoked_at timestamptz,
      revoked_by uuid references users(id) on delete set null,
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    )`);
  await sql(`create index invitations_workspace_id on invitations (workspace_id)`);
  // At most one open invitation per address and workspace (expired ones are revoked before a new one).
  await sql(`
    create unique index invitations_open_unique on invitations (workspace_id, lower(email))
    where accepted_at is null and revoked_at is null`);
  await sql(`
    create table share_links (
      id uuid primary key default gen_random_uuid(),
      workspace_id uuid not null references workspaces(id) on delete cascade,
      role varchar(16) not null check (role in ('editor', 'reviewer', 'viewer')),
      label varchar(100),
      token_hash char(64) not null unique,
      expires_at timestamptz not null,
      max_uses integer check (max_uses is null or max_uses > 0),
      use_count integer not null default 0,
      revoked_at timestamptz,
      revoked_by uuid references users(id) on delete set null,
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    )`);
  await sql(`create index share_links_workspace_id on share_links (workspace_id)`);
  await sql(`
    create table memberships (
      id uuid primary key default gen_random_uuid(),
      workspace_id uuid not null references workspaces(id) on delete cascade,
      user_id uuid not null references users(id) on delete cascade,
      role varchar(16) not null check (role in ('owner', 'editor', 'reviewer', 'viewer')),
      joined_via varchar(16) not null check (joined_via in ('created', 'invitation', 'share_link', 'seed')),
      invitation_id uuid references invitations(id) on delete set null,
      share_link_id uuid references share_links(id) on delete set null,
      added_by uuid references users(id) on delete set null,
      last_active_at timestamptz,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now(),
      unique (workspace_id, user_id)
    )`);
  await sql(`create index memberships_user_id on memberships (user_id)`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  await sequelize.query("drop table memberships", { transaction });
  await sequelize.query("drop table share_links", { transaction });
  await sequelize.query("drop table invitations", { transaction });
  await sequelize.query("drop table workspaces", { transaction });
};

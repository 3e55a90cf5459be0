import type { Migration } from "../migrate";

/**
 * People and their sign-in state: users (e-mail unique case-insensitively), lucia sessions
 * (stored by a hash of the session id, so a leaked table does not hand out live sessions)
 * and single-use password-reset tokens (hash only).
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`
    create table users (
      id uuid primary key default gen_random_uuid(),
      name varchar(100) not null,
      email varchar(254) not null,
      password_hash text not null,
      password_changed_at timestamptz not null default now(),
      last_sign_in_at timestamptz,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    )`);
  await sql(`create unique index users_email_lower_unique on users (lower(email))`);
  await sql(`
    create table sessions (
      id char(64) primary key,
      user_id uuid not null references users(id) on delete cascade,
      expires_at timestamptz not null,
      created_at timestamptz not null default now()
    )`);
  await sql(`create index sessions_user_id on sessions (user_id)`);
  await sql(`create index sessions_expires_at on sessions (expires_at)`);
  await sql(`
    create table password_reset_tokens (
      id uuid primary key default gen_random_uuid(),
      user_id uuid not null references users(id) on delete cascade,
      token_hash char(64) not null unique,
      expires_at timestamptz not null,
      used_at timestamptz,
      created_at timestamptz not null default now()
    )`);
  await sql(`create index password_reset_tokens_user_id on password_reset_tokens (user_id)`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  await sequelize.query("drop table password_reset_tokens", { transaction });
  await sequelize.query("drop table sessions", { transaction });
  await sequelize.query("drop table users", { transaction });
};

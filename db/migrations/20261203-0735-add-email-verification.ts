import type { Migration } from "../migrate";

/**
 * Whether an account's address is proven (`users.email_verified_at`) and the single-use
 * links that prove it (`email_verification_tokens`, hash only). An invitation can be
 * accepted only by an account whose address is proven.
 *
 * Existing accounts are marked verified where a link already proved the address: an
 * accepted invitation sent to that address, or a password reset that was used.
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`alter table users add column email_verified_at timestamptz`);
  await sql(`
    update users set email_verified_at = proof.at
    from (
      select i.accepted_by as user_id, min(i.accepted_at) as at
      from invitations i join users u on u.id = i.accepted_by and lower(u.email) = lower(i.email)
      group by i.accepted_by
      union all
      select user_id, min(used_at) from password_reset_tokens where used_at is not null group by user_id
    ) as proof
    where users.id = proof.user_id and users.email_verified_at is null`);
  await sql(`
    create table email_verification_tokens (
      id uuid primary key default gen_random_uuid(),
      user_id uuid not null references users(id) on delete cascade,
      token_hash char(64) not null unique,
      next_path varchar(500),
      expires_at timestamptz not null,
      used_at timestamptz,
      created_at timestamptz not null default now()
    )`);
  await sql(`create index email_verification_tokens_user_id on email_verification_tokens (user_id)`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  await sequelize.query("drop table email_verification_tokens", { transaction });
  await sequelize.query("alter table users drop column email_verified_at", { transaction });
};

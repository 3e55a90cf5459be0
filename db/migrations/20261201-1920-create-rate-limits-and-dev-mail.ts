import type { Migration } from "../migrate";

/**
 * Rate-limit counters shared by every API process (one row per client key and window),
 * and the development mailbox that the fake SMTP server fills when no SMTP_URL is set.
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`
    create table rate_limit_hits (
      key varchar(300) primary key,
      hits integer not null,
      reset_at timestamptz not null
    )`);
  await sql(`create index rate_limit_hits_reset_at on rate_limit_hits (reset_at)`);
  await sql(`
    create table dev_mail_messages (
      id uuid primary key default gen_random_uuid(),
      from_address text not null,
      to_addresses text[] not null,
      subject text not null,
      text_body text not null,
      html_body text,
      received_at timestamptz not null default now()
    )`);
  await sql(`create index dev_mail_messages_received_at on dev_mail_messages (received_at)`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  await sequelize.query("drop table dev_mail_messages", { transaction });
  await sequelize.query("drop table rate_limit_hits", { transaction });
};

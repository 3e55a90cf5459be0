import type { Migration } from "../migrate";

/**
 * The calculation record (issue 14): a project's inputs and results frozen when it is submitted
 * for check, and what the check did with it.
 *
 * - `projects.required_approvals`: how many independent approvals a record of the project needs
 *   (1 or 2, chosen by an owner; 1 for every existing project).
 * - `calculation_records`: one frozen record per submission, numbered 1, 2, 3 … within the
 *   project, with its revision letter, its content (JSONB), the SHA-256 of that content and the
 *   engine version. `input_editors` keeps who last edited each input when it was frozen, for the
 *   independence rule. A trigger refuses any UPDATE that would change what was frozen (content,
 *   hash, engine version, number, revision, reason, who submitted it and when), so not even a
 *   faulty route or a hand-written statement can alter a record after the fact; only its status
 *   and the return/approval columns move.
 * People are kept by id and by their name at the time (the names stay when an account goes).
 * - `record_events`: every change of status, dated and signed.
 * - `record_comments`: a checker's comments on the record or on one comparison row, and answers.
 * - `record_approvals`: one row per approval, at most one per person and record.
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`
    alter table projects add column required_approvals smallint not null default 1
      check (required_approvals in (1, 2))`);

  await sql(`
    create table calculation_records (
      id uuid primary key default gen_random_uuid(),
      project_id uuid not null references projects(id) on delete cascade,
      workspace_id uuid not null references workspaces(id) on delete cascade,
      number integer not null check (number > 0),
      revision varchar(8) not null check (revision ~ '^[A-Z]+$'),
      status varchar(16) not null check (status in ('submitted', 'returned', 'approved', 'superseded')),
      reason text not null,
      content jsonb not null,
      hash char(64) not null check (hash ~ '^[0-9a-f]{64}$'),
      engine_version varchar(40) not null,
      required_approvals smallint not null check (required_approvals in (1, 2)),
      input_editors jsonb not null default '[]'::jsonb,
      submitted_by uuid references users(id) on delete set null,
      submitted_by_name varchar(100) not null,
      submitted_at timestamptz not null,
      returned_by uuid references users(id) on delete set null,
      returned_by_name varchar(100),
      returned_at timestamptz,
      return_comment text,
      approved_at timestamptz,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now(),
      unique (project_id, number)
    )`);
  // At most one record of a project waits for a check at a time.
  await sql(`
    create unique index calculation_records_one_submitted on calculation_records (project_id)
      where status = 'submitted'`);

  await sql(`
    create function calculation_records_refuse_change() returns trigger language plpgsql as $$
    begin
      if new.content is distinct from old.content
        or new.hash is distinct from old.hash
        or new.engine_version is distinct from old.engine_version
        or new.number is distinct from old.number
        or new.revision is distinct from old.revision
        or new.reason is distinct from old.reason
        or new.project_id is distinct from old.project_id
        or new.input_editors is distinct from old.input_editors
        or new.submitted_at is distinct from old.submitted_at
        or new.submitted_by_name is distinct from old.submitted_by_name
        or (new.submitted_by is distinct from old.submitted_by and new.submitted_by is not null) then
        raise exception 'a calculation record is frozen: its content, hash and submission cannot change'
          using errcode = 'check_violation';
      end if;
      return new;
    end $$`);
  await sql(`
    create trigger calculation_records_frozen before update on calculation_records
      for each row execute function calculation_records_refuse_change()`);

  await sql(`
    create table record_events (
      id bigserial primary key,
      record_id uuid not null references calculation_records(id) on delete cascade,
      action varchar(16) not null check (action in ('submit', 'approve', 'return', 'supersede')),
      status varchar(16) not null check (status in ('submitted', 'returned', 'approved', 'superseded')),
      actor_id uuid references users(id) on delete set null,
      actor_name varchar(100) not null,
      note text not null default '',
      created_at timestamptz not null default now()
    )`);
  await sql(`create index record_events_record_id on record_events (record_id)`);

  await sql(`
    create table record_comments (
      id uuid primary key default gen_random_uuid(),
      record_id uuid not null references calculation_records(id) on delete cascade,
      row_id varchar(200),
      reply_to uuid references record_comments(id) on delete cascade,
      text text not null,
      author_id uuid references users(id) on delete set null,
      author_name varchar(100) not null,
      created_at timestamptz not null default now()
    )`);
  await sql(`create index record_comments_record_id on record_comments (record_id)`);

  await sql(`
    create table record_approvals (
      id uuid primary key default gen_random_uuid(),
      record_id uuid not null references calculation_records(id) on delete cascade,
      approver_id uuid references users(id) on delete set null,
      approver_name varchar(100) not null,
      comment text not null default '',
      created_at timestamptz not null default now(),
      unique (record_id, approver_id)
    )`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`drop table record_approvals`);
  await sql(`drop table record_comments`);
  await sql(`drop table record_events`);
  await sql(`drop trigger calculation_records_frozen on calculation_records`);
  await sql(`drop function calculation_records_refuse_change()`);
  await sql(`drop table calculation_records`);
  await sql(`alter table projects drop column required_approvals`);
};

import type { Migration } from "../migrate";

/**
 * The audit trail learns the review's actions: submitting a record for check, returning it and
 * approving it (entity type "record"). Only the list of allowed actions grows; no row changes.
 * Rolling back keeps the review's lines of the trail (the old check is added NOT VALID, so it
 * applies to new rows only).
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`alter table audit_events drop constraint audit_events_action_check`);
  await sql(`
    alter table audit_events add constraint audit_events_action_check
      check (action in ('create', 'update', 'delete', 'restore', 'import', 'purge', 'submit', 'return', 'approve'))`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`alter table audit_events drop constraint audit_events_action_check`);
  await sql(`
    alter table audit_events add constraint audit_events_action_check
      check (action in ('create', 'update', 'delete', 'restore', 'import', 'purge')) not valid`);
};

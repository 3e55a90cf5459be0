import type { Sequelize, Transaction } from "sequelize";

/**
 * Stamps that change whenever an input of a project's comparison changes, kept by PostgreSQL.
 *
 * `comparison_stamps` holds one counter per scope: a project (its own row, locations, cases,
 * combinations, terms and states) or a workspace (its material library, which every project
 * of the workspace reads). Triggers on every table the comparison reads note the scopes a
 * statement touched; the counters are raised when the transaction commits, in the same commit
 * as the change, so a reader sees the new stamp exactly when it sees the new rows. The API
 * reads a project's stamp along with the session (one tiny index lookup) and sends the answer
 * it kept for that stamp instead of reading and evaluating the inputs again.
 *
 * Why the counters are raised at commit and not by the statement that changed a row: a trigger
 * that updated the counter at once would hold the project's one counter row from the first
 * write of a transaction to its end, so two transactions that lock rows in different orders
 * (one holding the counter and waiting for a case, the other holding the case and waiting for
 * the counter) could deadlock. A statement only inserts a row (transaction id, scope) into
 * `comparison_stamp_pending`, which conflicts with no one; a deferred constraint trigger on
 * that table raises, when the transaction commits, every counter the transaction noted, in
 * scope order, and deletes its notes. At that point the transaction takes no lock but counter
 * rows, always in the same order, so the counters cannot deadlock.
 *
 * Statement-level triggers with transition tables: one note per statement, not per row (an
 * import writes thousands of states in a few statements).
 */

/**
 * A table whose rows are inputs of the comparison, and how to find the scopes a change of its
 * rows touches: a SELECT of scope ids (project ids, or workspace ids for workspace-wide
 * inputs) over `changed`, the rows a statement inserted, deleted, or updated (before and after).
 */
export type WatchedTable = { table: string; scopes: string };

type Step = { sequelize: Sequelize; transaction: Transaction };

/** Creates the counters, the notes and the commit-time trigger that turns notes into raised counters. */
export async function createComparisonStamps({ sequelize, transaction }: Step): Promise<void> {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`create table comparison_stamps (scope_id uuid primary key, stamp bigint not null)`);
  await sql(`
    create table comparison_stamp_pending (
      xact bigint not null,
      scope_id uuid not null,
      primary key (xact, scope_id)
    )`);
  await sql(`
    create function comparison_stamp_apply() returns trigger language plpgsql as $$
    begin
      -- The first firing in a transaction raises every counter it noted, in scope order (so two
      -- committing transactions take counter rows in the same order), and removes the notes;
      -- the later firings of the same transaction find none left.
      with mine as (
        delete from comparison_stamp_pending where xact = txid_current() returning scope_id
      )
      insert into comparison_stamps as s (scope_id, stamp)
      select scope_id, 1 from mine order by scope_id
      on conflict (scope_id) do update set stamp = s.stamp + 1;
      return null;
    end $$`);
  await sql(`
    create constraint trigger comparison_stamp_apply
      after insert on comparison_stamp_pending
      deferrable initially deferred
      for each row execute function comparison_stamp_apply()`);
}

/** Undoes `createComparisonStamps` (after `unwatchComparisonInputs` for every watched table). */
export async function dropComparisonStamps({ sequelize, transaction }: Step): Promise<void> {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`drop trigger comparison_stamp_apply on comparison_stamp_pending`);
  await sql(`drop function comparison_stamp_apply()`);
  await sql(`drop table comparison_stamp_pending`);
  await sql(`drop table comparison_stamps`);
}

const noteFunction = (table: string) => `comparison_stamp_note_${table}`;
const noteUpdateFunction = (table: string) => `comparison_stamp_note_${table}_update`;
const IDENTIFIER = /^[a-z_][a-z0-9_]*$/;

/** The body that notes the scopes `scopes` finds in `changed` for this transaction. */
function noteBody(scopes: string): string {
  return `
      insert into comparison_stamp_pending (xact, scope_id)
      select distinct txid_current(), found.scope from (${scopes}) as found(scope)
      where found.scope is not null
      on conflict do nothing;`;
}

/**
 * Installs the triggers that note a change of each table's rows (insert, update, delete) as a
 * change of the comparison inputs of the scopes it touches. Adding a table the comparison reads
 * is one entry in a migration: `watchComparisonInputs(step, [{ table, scopes }])`, and
 * `unwatchComparisonInputs(step, [{ table, scopes }])` in its `down`.
 */
export async function watchComparisonInputs(step: Step, tables: readonly WatchedTable[]): Promise<void> {
  const sql = (statement: string) => step.sequelize.query(statement, { transaction: step.transaction });
  for (const { table, scopes } of tables) {
    if (!IDENTIFIER.test(table))
      throw new Error(`watchComparisonInputs: "${table}" is not a plain table name`);
    await sql(`
      create function ${noteFunction(table)}() returns trigger language plpgsql as $$
      begin ${noteBody(scopes)}
        return null;
      end $$`);
    // An update may move a row from one scope to another: both the rows before and after count.
    await sql(`
      create function ${noteUpdateFunction(table)}() returns trigger language plpgsql as $$
      begin
        with changed as (select * from changed_before union all select * from changed_after)
        ${noteBody(scopes).trim()}
        return null;
      end $$`);
    await sql(`
      create trigger ${table}_comparison_stamp_insert after insert on ${table}
        referencing new table as changed
        for each statement execute function ${noteFunction(table)}()`);
    await sql(`
      create trigger ${table}_comparison_stamp_delete after delete on ${table}
        referencing old table as changed
        for each statement execute function ${noteFunction(table)}()`);
    await sql(`
      create trigger ${table}_comparison_stamp_update after update on ${table}
        referencing old table as changed_before new table as changed_after
        for each statement execute function ${noteUpdateFunction(table)}()`);
  }
}

/** Removes what `watchComparisonInputs` installed on each table. */
export async function unwatchComparisonInputs(step: Step, tables: readonly WatchedTable[]): Promise<void> {
  const sql = (statement: string) => step.sequelize.query(statement, { transaction: step.transaction });
  for (const { table } of [...tables].reverse()) {
    if (!IDENTIFIER.test(table))
      throw new Error(`unwatchComparisonInputs: "${table}" is not a plain table name`);
    for (const event of ["update", "delete", "insert"]) {
      await sql(`drop trigger ${table}_comparison_stamp_${event} on ${table}`);
    }
    await sql(`drop function ${noteUpdateFunction(table)}()`);
    await sql(`drop function ${noteFunction(table)}()`);
  }
}

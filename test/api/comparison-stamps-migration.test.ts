import { QueryTypes } from "sequelize";
import { afterAll, describe, expect, inject, it } from "vitest";
import { ensureDatabase } from "../../db/ensure-database";
import { createMigrator } from "../../db/migrate";
import { createSequelize } from "../../db/sequelize";

const MIGRATION = "20261203-1430-stamp-comparison-inputs";
const DATABASE = "sigmacube_comparison_stamps";

describe(`migration ${MIGRATION}`, () => {
  const adminUrl = inject("adminUrl");
  const sequelize = createSequelize(adminUrl.replace(/\/postgres$/, `/${DATABASE}`));
  afterAll(() => sequelize.close());
  const sql = (statement: string) => sequelize.query(statement, { type: QueryTypes.SELECT });
  const stampTriggers = async () =>
    (
      await sql(
        `select tgname from pg_trigger where not tgisinternal and tgname like '%comparison_stamp%' order by tgname`,
      )
    ).length;
  const project = "00000000-0000-4000-8000-0000000000bb";
  const stampOfProject = async () =>
    (await sql(`select stamp from comparison_stamps where scope_id = '${project}'`)) as { stamp: string }[];

  it("when it runs on a database with projects, then writes raise stamps; down removes every trigger, function and table and writes still work; up again works", async () => {
    await ensureDatabase(adminUrl, DATABASE);
    const migrator = createMigrator(sequelize);
    const pending = (await migrator.pending()).map((m) => m.name);
    await migrator.up({ to: pending[pending.indexOf(MIGRATION) - 1] });
    await sql(`insert into users (id, name, email, password_hash) values
      ('00000000-0000-4000-8000-000000000001', 'Owner', 'owner@example.test', 'x')`);
    await sql(`insert into workspaces (id, name) values ('00000000-0000-4000-8000-0000000000aa', 'W')`);
    await sql(
      `insert into projects (id, workspace_id, name, requirements) values ('${project}', '00000000-0000-4000-8000-0000000000aa', 'P', '[]')`,
    );

    await migrator.up({ to: MIGRATION });
    // Seven tables, three triggers each, and the commit-time trigger.
    expect(await stampTriggers()).toBe(7 * 3 + 1);
    expect(await stampOfProject()).toEqual([]); // never changed since: read as 0
    await sql(`update projects set name = 'P, renamed' where id = '${project}'`);
    expect(await stampOfProject()).toEqual([{ stamp: "1" }]);

    await migrator.down({ to: MIGRATION });
    expect(await stampTriggers()).toBe(0);
    expect(await sql(`select proname from pg_proc where proname like 'comparison_stamp%'`)).toEqual([]);
    expect(await sql(`select to_regclass('comparison_stamps') as t`)).toEqual([{ t: null }]);
    await sql(`update projects set name = 'P, renamed again' where id = '${project}'`);

    await migrator.up({ to: MIGRATION });
    await sql(`update projects set name = 'P, third name' where id = '${project}'`);
    expect(await stampOfProject()).toEqual([{ stamp: "1" }]);
  });
});

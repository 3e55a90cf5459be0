import { QueryTypes } from "sequelize";
import { afterAll, describe, expect, inject, it } from "vitest";
import { ensureDatabase } from "../../db/ensure-database";
import { createMigrator } from "../../db/migrate";
import { createSequelize } from "../../db/sequelize";

const MIGRATION = "20261203-0735-add-email-verification";

describe(`migration ${MIGRATION}`, () => {
  const adminUrl = inject("adminUrl");
  const sequelize = createSequelize(adminUrl.replace(/\/postgres$/, "/sigmacube_email_verification"));
  afterAll(() => sequelize.close());
  const sql = (statement: string) => sequelize.query(statement, { type: QueryTypes.SELECT });

  it("when accounts exist before it, then those a mailed link already proved are confirmed, the rest not; down and up again work", async () => {
    await ensureDatabase(adminUrl, "sigmacube_email_verification");
    const migrator = createMigrator(sequelize);
    const before = (await migrator.pending()).map((m) => m.name);
    await migrator.up({ to: before[before.indexOf(MIGRATION) - 1] });

    await sql(`insert into users (id, name, email, password_hash) values
      ('00000000-0000-4000-8000-000000000001', 'Joined', 'joined@example.test', 'x'),
      ('00000000-0000-4000-8000-000000000002', 'Reset', 'reset@example.test', 'x'),
      ('00000000-0000-4000-8000-000000000003', 'Never', 'never@example.test', 'x'),
      ('00000000-0000-4000-8000-000000000004', 'Other', 'other@example.test', 'x')`);
    await sql(`insert into workspaces (id, name) values ('00000000-0000-4000-8000-0000000000aa', 'W')`);
    // Accepted by the invited address (case aside), and one accepted by someone signed in with another address.
    await sql(`insert into invitations (workspace_id, email, role, token_hash, expires_at, accepted_at, accepted_by) values
      ('00000000-0000-4000-8000-0000000000aa', 'JOINED@example.test', 'viewer', repeat('a', 64), now(), now(), '00000000-0000-4000-8000-000000000001'),
      ('00000000-0000-4000-8000-0000000000aa', 'someone@example.test', 'viewer', repeat('b', 64), now(), now(), '00000000-0000-4000-8000-000000000004')`);
    await sql(`insert into password_reset_tokens (user_id, token_hash, expires_at, used_at) values
      ('00000000-0000-4000-8000-000000000002', repeat('c', 64), now(), now()),
      ('00000000-0000-4000-8000-000000000003', repeat('d', 64), now(), null)`);

    await migrator.up({ to: MIGRATION });
    const rows = await sql(`select name, email_verified_at is not null as verified from users order by name`);
    expect(rows).toEqual([
      { name: "Joined", verified: true },
      { name: "Never", verified: false },
      { name: "Other", verified: false },
      { name: "Reset", verified: true },
    ]);

    await migrator.down({ to: MIGRATION });
    const columns = await sql(
      `select column_name from information_schema.columns where table_name = 'users' and column_name = 'email_verified_at'`,
    );
    expect(columns).toEqual([]);
    expect(await sql(`select to_regclass('email_verification_tokens') as t`)).toEqual([{ t: null }]);
    await migrator.up({ to: MIGRATION });
    expect(await sql(`select to_regclass('email_verification_tokens')::text as t`)).toEqual([
      { t: "email_verification_tokens" },
    ]);
  });
});

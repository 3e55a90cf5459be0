/**
 * `npm run db:migrate` / `npm run db:rollback` against DATABASE_URL: for deployments,
 * where migrations run once per release before new API processes start.
 */
import { createMigrator } from "./migrate";
import { createSequelize } from "./sequelize";

const command = process.argv[2];
const databaseUrl = process.env.DATABASE_URL;
if (!databaseUrl || !["migrate", "rollback"].includes(command ?? "")) {
  console.error("usage: DATABASE_URL=postgres://… tsx db/cli.ts migrate|rollback");
  process.exit(2);
}
const sequelize = createSequelize(databaseUrl);
try {
  const migrator = createMigrator(sequelize, (line) => console.log(line));
  const done = command === "migrate" ? await migrator.up() : await migrator.down();
  console.log(
    done.length ? `${command}: ${done.map((m) => m.name).join(", ")}` : `${command}: nothing to do`,
  );
} finally {
  await sequelize.close();
}

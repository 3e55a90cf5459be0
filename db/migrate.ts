import path from "node:path";
import { fileURLToPath } from "node:url";
import type { QueryInterface, Sequelize, Transaction } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";

const migrationsDir = path.join(path.dirname(fileURLToPath(import.meta.url)), "migrations");

/** What a migration step receives; pass `transaction` to every query it makes. */
export type MigrationContext = {
  queryInterface: QueryInterface;
  sequelize: Sequelize;
  transaction: Transaction;
};

/** What a migration module exports: `down` must undo every step of `up`. */
export type Migration = {
  up(context: MigrationContext): Promise<void>;
  down(context: MigrationContext): Promise<void>;
};

/**
 * Umzug over `db/migrations/*.ts` (timestamped kebab-case names, applied in name order),
 * recording what ran in the `schema_migrations` table. Each migration runs in its own
 * transaction so a failure leaves nothing half-applied.
 */
export function createMigrator(sequelize: Sequelize, log: (message: string) => void = () => {}) {
  return new Umzug({
    migrations: {
      glob: ["*.ts", { cwd: migrationsDir, ignore: ["*.test.ts"] }],
      resolve: ({ name, path: file, context }) => {
        const load = async (): Promise<Migration> => (await import(file!)) as Migration;
        const step = (direction: "up" | "down") => async () => {
          const migration = await load();
          await sequelize.transaction((transaction) => migration[direction]({ ...context, transaction }));
        };
        return { name: name.replace(/\.ts$/, ""), up: step("up"), down: step("down") };
      },
    },
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    storage: new SequelizeStorage({ sequelize, tableName: "schema_migrations" }),
    logger: {
      info: (e) => log(formatEvent(e)),
      warn: (e) => log(formatEvent(e)),
      error: (e) => log(formatEvent(e)),
      debug: () => {},
    },
  });
}

function formatEvent(event: Record<string, unknown>): string {
  return `${String(event.event ?? "migration")} ${String(event.name ?? "")}`.trim();
}

/** Applies every pending migration; returns their names. */
export async function migrate(sequelize: Sequelize, log?: (message: string) => void): Promise<string[]> {
  const applied = await createMigrator(sequelize, log).up();
  return applied.map((m) => m.name);
}

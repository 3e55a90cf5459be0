import type { Sequelize } from "sequelize";
import { AppSetting } from "./models/app-setting";
import { seedDemoAccounts } from "./seed-accounts";
import { backfillDemoCalculatorInputs } from "./seed-calculator-inputs";
import { seedDemoProjects } from "./seed-projects";
import { upgradeDemoNozzleProject } from "./seed-nozzle-upgrade";
import { seedDemoRecords, type FreezeForSeed } from "./seed-records";

/**
 * Version of the demo seed. Each capability that adds demo content (accounts, projects,
 * load cases) adds a step below and raises this number; a database seeded by an older
 * version gets the new steps on the next start.
 */
export const DEMO_SEED_VERSION = 5;
const SEED_KEY = "demo_seed";

type SeedRecord = { version: number; seededAt: string };

/**
 * Seeds the demo scenario (Quillon Process Works) on first start only.
 * Returns what it did, so `npm start` can print it. Models must be initialised.
 * `freeze` (api/domain/records/seed-freeze.ts) freezes the demo's calculation records; without
 * it the seed stops at version 3 and adds the records on a later start that passes it.
 */
export async function seedDemo(
  sequelize: Sequelize,
  log: (line: string) => void = () => {},
  freeze?: FreezeForSeed,
): Promise<{ seeded: boolean; version: number; backfilled: number }> {
  const target = freeze ? DEMO_SEED_VERSION : 3;
  return sequelize.transaction(async (transaction) => {
    const existing = await AppSetting.findByPk(SEED_KEY, { transaction, lock: transaction.LOCK.UPDATE });
    const done = (existing?.value as SeedRecord | undefined)?.version ?? 0;
    // On every start, not a numbered step: demo states seeded before they kept their calculator
    // inputs get them (db/seed-calculator-inputs.ts says why and when a state is left alone).
    // Before the records' step, so records frozen from here on hold the inputs.
    const backfilled = done >= 3 ? await backfillDemoCalculatorInputs(transaction, log) : 0;
    if (done >= target) return { seeded: false, version: done, backfilled };

    // Version 1: nothing but the record itself. Accounts and projects arrive with their issues.
    log(`demo seed: applying version ${target} (was ${done})`);
    // Version 2: the demo team and their workspace; the passwords are printed only now.
    if (done < 2) await seedDemoAccounts(transaction, log);
    // Version 3: the CT-7 projects, their load cases, states, combination and a library material.
    if (done < 3) await seedDemoProjects(transaction, log);
    // Version 4: one approved calculation record and one returned with comments.
    if (done < 4 && freeze) await seedDemoRecords(transaction, freeze, log);
    // Version 5: a demo seeded before point tables gets the nozzle project's table (a fresh seed
    // made it in step 3 already, and the step leaves that project alone).
    if (done < 5 && target >= 5) await upgradeDemoNozzleProject(transaction, log);

    const value: SeedRecord = { version: target, seededAt: new Date().toISOString() };
    await AppSetting.upsert({ key: SEED_KEY, value }, { transaction });
    return { seeded: true, version: target, backfilled };
  });
}

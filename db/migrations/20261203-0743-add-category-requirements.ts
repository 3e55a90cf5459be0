import type { Migration } from "../migrate";

/**
 * Allowables per load-case category. `projects.requirements` stays what it was and becomes the
 * project-wide default (every existing requirement keeps its criterion and factor, nothing is
 * rewritten); `category_requirements` holds, per category, the factors that replace the
 * default's ([{ category, factors: { criterion: n } }], empty for every existing project).
 * `include_unsuited_criteria` records the user's choice to rate criteria that do not suit a
 * material (ductile vs brittle) and let them govern; off, as before the rule existed.
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`alter table projects add column category_requirements jsonb not null default '[]'::jsonb`);
  await sql(`alter table projects add column include_unsuited_criteria boolean not null default false`);
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  const sql = (statement: string) => sequelize.query(statement, { transaction });
  await sql(`alter table projects drop column include_unsuited_criteria`);
  await sql(`alter table projects drop column category_requirements`);
};

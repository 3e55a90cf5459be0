import type { Migration } from "../migrate";

/**
 * A stress-state revision keeps the calculator that produced it: `calculator` holds
 * { name, version, inputs: { units, numbers: { key: { value, unit } }, choices } } as checked by
 * core/contract/calculator-inputs.ts, so the history shows the inputs and "reopen in calculator"
 * restores them. Null for every existing row and for states typed, pasted or imported from
 * elsewhere; existing rows are not rewritten (they stay immutable revisions).
 */
export const up: Migration["up"] = async ({ sequelize, transaction }) => {
  await sequelize.query(`alter table stress_states add column calculator jsonb`, { transaction });
};

export const down: Migration["down"] = async ({ sequelize, transaction }) => {
  await sequelize.query(`alter table stress_states drop column calculator`, { transaction });
};

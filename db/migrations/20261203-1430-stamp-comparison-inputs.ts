import {
  createComparisonStamps,
  dropComparisonStamps,
  unwatchComparisonInputs,
  watchComparisonInputs,
  type WatchedTable,
} from "../comparison-stamps";
import type { Migration } from "../migrate";

/**
 * Per-project (and, for the material library, per-workspace) stamps of the comparison's
 * inputs, raised by triggers when a transaction that changed any of them commits (see
 * db/comparison-stamps.ts). The tables below are every table the comparison's input statement
 * (api/domain/comparison/load.ts) reads, as they stood at this migration; a later migration
 * that adds an input table watches it with one more `watchComparisonInputs` entry.
 */
const WATCHED: WatchedTable[] = [
  { table: "projects", scopes: "select id from changed" },
  { table: "locations", scopes: "select project_id from changed" },
  { table: "load_cases", scopes: "select project_id from changed" },
  { table: "combinations", scopes: "select project_id from changed" },
  {
    table: "combination_terms",
    scopes: "select k.project_id from changed t join combinations k on k.id = t.combination_id",
  },
  {
    table: "stress_states",
    scopes: "select c.project_id from changed s join load_cases c on c.id = s.load_case_id",
  },
  { table: "materials", scopes: "select workspace_id from changed" },
];

export const up: Migration["up"] = async (step) => {
  await createComparisonStamps(step);
  await watchComparisonInputs(step, WATCHED);
};

export const down: Migration["down"] = async (step) => {
  await unwatchComparisonInputs(step, WATCHED);
  await dropComparisonStamps(step);
};

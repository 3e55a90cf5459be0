import { unwatchComparisonInputs, watchComparisonInputs, type WatchedTable } from "../comparison-stamps";
import type { Migration } from "../migrate";

/**
 * Saved stress classification lines and finite-element point tables are sections of the
 * comparison (api/domain/comparison/load.ts reads them), so adding, changing, re-evaluating or
 * deleting one must raise the project's comparison stamp like any other input.
 */
const WATCHED: WatchedTable[] = [
  { table: "linearizations", scopes: "select project_id from changed" },
  { table: "point_tables", scopes: "select project_id from changed" },
];

export const up: Migration["up"] = (step) => watchComparisonInputs(step, WATCHED);

export const down: Migration["down"] = (step) => unwatchComparisonInputs(step, WATCHED);

import { unwatchComparisonInputs, watchComparisonInputs, type WatchedTable } from "../comparison-stamps";
import type { Migration } from "../migrate";

/**
 * Saved stress classification lines are a section of the comparison (api/domain/comparison/load.ts
 * reads them), so a change to one must raise the project's comparison stamp like any other input.
 */
const WATCHED: WatchedTable[] = [{ table: "linearizations", scopes: "select project_id from changed" }];

export const up: Migration["up"] = (step) => watchComparisonInputs(step, WATCHED);

export const down: Migration["down"] = (step) => unwatchComparisonInputs(step, WATCHED);

import { comparisonKeys } from "../comparison/keys";
import { projectKeys } from "../project/keys";

/**
 * Query keys of a project's review and its frozen records.
 *
 * The review answer (`review`) says whether the current results differ from the last approved
 * record, so it goes stale exactly when the comparison does: it sits under the comparison's key,
 * and every input write that refreshes the comparison (states, locations, cases, combinations,
 * materials, the project's factors) refreshes it too without each of those mutations naming it.
 * Records themselves are frozen; only review actions change them, under `all`.
 */
export const recordKeys = {
  review: (workspaceId: string, projectId: string) =>
    [...comparisonKeys.all(workspaceId, projectId), "review"] as const,
  all: (workspaceId: string, projectId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "records"] as const,
  list: (workspaceId: string, projectId: string) =>
    [...recordKeys.all(workspaceId, projectId), "list"] as const,
  detail: (workspaceId: string, projectId: string, recordId: string) =>
    [...recordKeys.all(workspaceId, projectId), "record", recordId] as const,
  /** `against` null: the record before it. */
  diff: (workspaceId: string, projectId: string, recordId: string, against: string | null) =>
    [...recordKeys.all(workspaceId, projectId), "diff", recordId, against ?? "previous"] as const,
};

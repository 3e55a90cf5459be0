import { AsyncLocalStorage } from "node:async_hooks";
import type { FoundMembership } from "./membership-row";

/**
 * The membership of the workspace a request's path names, read in the same statement as the
 * session (see the session adapter), so a signed-in workspace request costs one round trip
 * less. lucia's validateSession takes only the session id, so the workspace id reaches the
 * adapter through this request-scoped store, and what the adapter found comes back in it.
 * Measured with `npm run bench -- api-load`: a database round trip is a large share of a small
 * request's CPU time on loopback (the pg socket write alone was about a sixth of a profile).
 *
 * When the path asks for a project's comparison, the same statement also reads the stamp of
 * that project's comparison inputs (api/domain/comparison/stamp.ts), so a comparison nobody
 * has changed since it was last answered is sent again after that one statement.
 */
export type MembershipPrefetch = {
  /** The workspace named by the path. */
  workspaceId: string;
  /** The project whose comparison the path asks for, if it does. */
  comparisonProjectId?: string;
  /** What the session statement found: the membership, null for none; undefined until it ran. */
  found?: FoundMembership | null;
  /** The inputs stamp of `comparisonProjectId` the session statement read; undefined until it ran. */
  comparisonStamp?: string;
};

export const membershipPrefetch = new AsyncLocalStorage<MembershipPrefetch>();

const UUID = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";
const WORKSPACE_PATH = new RegExp(`^/workspaces/(${UUID})(?:/|$)`, "i");
const COMPARISON_PATH = new RegExp(`^/workspaces/${UUID}/projects/(${UUID})/comparison/?$`, "i");

/** The workspace id in a path under /api ("/workspaces/{id}/…"), when it is UUID-shaped; else null. */
export function workspaceIdInPath(path: string): string | null {
  return WORKSPACE_PATH.exec(path)?.[1] ?? null;
}

/** The project id in a comparison path under /api ("/workspaces/{id}/projects/{id}/comparison"); else null. */
export function comparisonProjectIdInPath(path: string): string | null {
  return COMPARISON_PATH.exec(path)?.[1] ?? null;
}

/**
 * The inputs stamp the session statement read for the comparison of `projectId` in
 * `workspaceId`, or undefined when it read none for exactly that pair (the caller then reads
 * the stamp with the inputs).
 */
export function prefetchedComparisonStamp(
  prefetch: MembershipPrefetch | undefined,
  workspaceId: string,
  projectId: string,
): string | undefined {
  if (!prefetch || prefetch.workspaceId !== workspaceId || prefetch.comparisonProjectId !== projectId) {
    return undefined;
  }
  return prefetch.comparisonStamp;
}

import { AsyncLocalStorage } from "node:async_hooks";
import type { FoundMembership } from "./membership-row";

/**
 * The membership of the workspace a request's path names, read in the same statement as the
 * session (see the session adapter), so a signed-in workspace request costs one round trip
 * less. lucia's validateSession takes only the session id, so the workspace id reaches the
 * adapter through this request-scoped store, and what the adapter found comes back in it.
 * Measured with `npm run bench -- api-load`: a database round trip is a large share of a small
 * request's CPU time on loopback (the pg socket write alone was about a sixth of a profile).
 */
export type MembershipPrefetch = {
  /** The workspace named by the path. */
  workspaceId: string;
  /** What the session statement found: the membership, null for none; undefined until it ran. */
  found?: FoundMembership | null;
};

export const membershipPrefetch = new AsyncLocalStorage<MembershipPrefetch>();

const WORKSPACE_PATH =
  /^\/workspaces\/([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})(?:\/|$)/i;

/** The workspace id in a path under /api ("/workspaces/{id}/…"), when it is UUID-shaped; else null. */
export function workspaceIdInPath(path: string): string | null {
  return WORKSPACE_PATH.exec(path)?.[1] ?? null;
}

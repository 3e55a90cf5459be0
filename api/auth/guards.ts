import type { Response } from "express";
import type { User } from "lucia";
import { Op, QueryTypes } from "sequelize";
import { roleAtLeast, type Role } from "../../core/contract/workspaces";
import { Membership } from "../../db/models/membership";
import { Workspace } from "../../db/models/workspace";
import { errors } from "../errors";
import {
  MEMBERSHIP_COLUMNS,
  membershipFromRow,
  type FoundMembership,
  type MembershipRow,
} from "./membership-row";
import type { SessionLocals } from "./session-middleware";

/** The caller's membership in the workspace named by the route, loaded by `loadMembership`. */
export type MembershipLocals = { membership: Membership; workspace: Workspace };

/** How stale `last_active_at` may get before a request writes it again (one write per member per minute at most). */
const ACTIVITY_RESOLUTION_MS = 60_000;

/** The signed-in user, or a 401. */
export function currentUser(res: Response): User {
  const user = res.locals.user as User | null | undefined;
  if (!user) throw errors.unauthorized();
  return user;
}

/** The membership that `loadMembership` found; calling it on a route without one is a programming error. */
export function currentMembership(res: Response): MembershipLocals {
  const locals = res.locals as Partial<MembershipLocals>;
  if (!locals.membership || !locals.workspace) {
    throw new Error("currentMembership() on a route whose access is not { kind: 'member' }");
  }
  return { membership: locals.membership, workspace: locals.workspace };
}

/**
 * Finds the caller's membership of `workspaceId` and checks the role: 404 when they are not
 * a member (the workspace's existence is not revealed), 403 when their role is below
 * `minimum`. Also records their last activity in the workspace.
 */
export async function loadMembership(
  res: Response,
  workspaceId: string,
  minimum: Role,
): Promise<MembershipLocals> {
  const user = currentUser(res);
  const found = await findMembership(res, workspaceId, user.id);
  if (!found) throw errors.notFound("This workspace");
  const { membership, workspace } = found;
  if (!roleAtLeast(membership.role, minimum)) {
    throw errors.forbidden(`This needs the ${minimum} role or higher; you are ${article(membership.role)}.`);
  }
  await touchActivity(membership);
  res.locals.membership = membership;
  res.locals.workspace = workspace;
  return { membership, workspace };
}

const MEMBERSHIP_SQL = `
SELECT ${MEMBERSHIP_COLUMNS}
FROM memberships m JOIN workspaces w ON w.id = m.workspace_id
WHERE m.workspace_id = :workspaceId AND m.user_id = :userId`;

/**
 * The caller's membership of `workspaceId`: the one the session statement read along (when the
 * path named this workspace), else read now.
 */
async function findMembership(
  res: Response,
  workspaceId: string,
  userId: string,
): Promise<FoundMembership | null> {
  const prefetched = (res.locals as SessionLocals).prefetchedMembership;
  if (prefetched?.workspaceId === workspaceId && prefetched.found !== undefined) return prefetched.found;
  const [row] = await Membership.sequelize!.query<MembershipRow>(MEMBERSHIP_SQL, {
    type: QueryTypes.SELECT,
    replacements: { workspaceId, userId },
  });
  return membershipFromRow(row);
}

async function touchActivity(membership: Membership) {
  const now = new Date();
  if (membership.lastActiveAt && now.getTime() - membership.lastActiveAt.getTime() < ACTIVITY_RESOLUTION_MS) {
    return;
  }
  // A plain UPDATE, not save(): it must not bump updated_at, which means "role or details changed".
  await Membership.update(
    { lastActiveAt: now },
    {
      where: {
        id: membership.id,
        [Op.or]: [{ lastActiveAt: null }, { lastActiveAt: { [Op.lt]: now } }],
      },
      silent: true,
    },
  );
  membership.lastActiveAt = now;
}

function article(role: Role): string {
  return `${/^[aeiou]/.test(role) ? "an" : "a"} ${role}`;
}

import type { Response } from "express";
import type { User } from "lucia";
import { Op, QueryTypes } from "sequelize";
import { roleAtLeast, type Role } from "../../core/contract/workspaces";
import { Membership } from "../../db/models/membership";
import { Workspace } from "../../db/models/workspace";
import { errors } from "../errors";

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
  const { membership, workspace } = await findMembership(workspaceId, user.id);
  if (!membership || !workspace) throw errors.notFound("This workspace");
  if (!roleAtLeast(membership.role, minimum)) {
    throw errors.forbidden(`This needs the ${minimum} role or higher; you are ${article(membership.role)}.`);
  }
  await touchActivity(membership);
  res.locals.membership = membership;
  res.locals.workspace = workspace;
  return { membership, workspace };
}

/**
 * The membership and its workspace in one raw statement. Every workspace request runs it, and
 * the model query with an include it replaces spent more CPU building and parsing SQL than
 * PostgreSQL spent answering (a profile of 100 connections put Sequelize's include machinery
 * at over a quarter of the process).
 */
const MEMBERSHIP_SQL = `
SELECT m.id, m.workspace_id AS "workspaceId", m.user_id AS "userId", m.role, m.joined_via AS "joinedVia",
  m.invitation_id AS "invitationId", m.share_link_id AS "shareLinkId", m.added_by AS "addedBy",
  m.last_active_at AS "lastActiveAt", m.created_at AS "createdAt", m.updated_at AS "updatedAt",
  w.name AS "workspaceName", w.created_by AS "workspaceCreatedBy",
  w.created_at AS "workspaceCreatedAt", w.updated_at AS "workspaceUpdatedAt"
FROM memberships m JOIN workspaces w ON w.id = m.workspace_id
WHERE m.workspace_id = :workspaceId AND m.user_id = :userId`;

type MembershipRow = Pick<
  Membership,
  | "id"
  | "workspaceId"
  | "userId"
  | "role"
  | "joinedVia"
  | "invitationId"
  | "shareLinkId"
  | "addedBy"
  | "lastActiveAt"
  | "createdAt"
  | "updatedAt"
> & {
  workspaceName: string;
  workspaceCreatedBy: string | null;
  workspaceCreatedAt: Date;
  workspaceUpdatedAt: Date;
};

async function findMembership(workspaceId: string, userId: string) {
  const [row] = await Membership.sequelize!.query<MembershipRow>(MEMBERSHIP_SQL, {
    type: QueryTypes.SELECT,
    replacements: { workspaceId, userId },
  });
  if (!row) return { membership: null, workspace: null };
  const { workspaceName, workspaceCreatedBy, workspaceCreatedAt, workspaceUpdatedAt, ...membership } = row;
  return {
    membership: Membership.build(membership, { isNewRecord: false, raw: true }),
    workspace: Workspace.build(
      {
        id: workspaceId,
        name: workspaceName,
        createdBy: workspaceCreatedBy,
        createdAt: workspaceCreatedAt,
        updatedAt: workspaceUpdatedAt,
      },
      { isNewRecord: false, raw: true },
    ),
  };
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

import { Membership } from "../../db/models/membership";
import { Workspace } from "../../db/models/workspace";

/**
 * A membership and its workspace as one row of raw SQL, and the model instances built from it.
 * Every workspace request reads one, so it is read with plain SQL: the model query with an
 * include it replaces spent more CPU building and parsing SQL than PostgreSQL spent answering
 * (a profile at 100 connections put Sequelize's include machinery at over a quarter of the process).
 */

/** The select list, for `memberships m JOIN workspaces w` (or LEFT JOINs: all null when absent). */
export const MEMBERSHIP_COLUMNS = `
  m.id AS "membershipId", m.workspace_id AS "workspaceId", m.user_id AS "memberUserId", m.role,
  m.joined_via AS "joinedVia", m.invitation_id AS "invitationId", m.share_link_id AS "shareLinkId",
  m.added_by AS "addedBy", m.last_active_at AS "lastActiveAt", m.created_at AS "membershipCreatedAt",
  m.updated_at AS "membershipUpdatedAt", w.name AS "workspaceName", w.created_by AS "workspaceCreatedBy",
  w.created_at AS "workspaceCreatedAt", w.updated_at AS "workspaceUpdatedAt"`;

export type MembershipRow = {
  membershipId: string | null;
  workspaceId: string | null;
  memberUserId: string | null;
  role: Membership["role"] | null;
  joinedVia: Membership["joinedVia"] | null;
  invitationId: string | null;
  shareLinkId: string | null;
  addedBy: string | null;
  lastActiveAt: Date | null;
  membershipCreatedAt: Date | null;
  membershipUpdatedAt: Date | null;
  workspaceName: string | null;
  workspaceCreatedBy: string | null;
  workspaceCreatedAt: Date | null;
  workspaceUpdatedAt: Date | null;
};

export type FoundMembership = { membership: Membership; workspace: Workspace };

/** The instances a row stands for, or null when the row has no membership (a LEFT JOIN that found none). */
export function membershipFromRow(row: MembershipRow | undefined): FoundMembership | null {
  if (!row?.membershipId || !row.workspaceId) return null;
  const membership = Membership.build(
    {
      id: row.membershipId,
      workspaceId: row.workspaceId,
      userId: row.memberUserId,
      role: row.role,
      joinedVia: row.joinedVia,
      invitationId: row.invitationId,
      shareLinkId: row.shareLinkId,
      addedBy: row.addedBy,
      lastActiveAt: row.lastActiveAt,
      createdAt: row.membershipCreatedAt,
      updatedAt: row.membershipUpdatedAt,
    },
    { isNewRecord: false, raw: true },
  );
  const workspace = Workspace.build(
    {
      id: row.workspaceId,
      name: row.workspaceName,
      createdBy: row.workspaceCreatedBy,
      createdAt: row.workspaceCreatedAt,
      updatedAt: row.workspaceUpdatedAt,
    },
    { isNewRecord: false, raw: true },
  );
  return { membership, workspace };
}

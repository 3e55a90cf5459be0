import type { Transaction } from "sequelize";
import type { Role } from "../../../core/contract/workspaces";
import type { JoinedVia } from "../../../db/models/membership";
import { createMembership, findMembershipOf, type MembershipRow } from "../../../db/repositories/workspaces";

/**
 * Adds `userId` to a workspace with `role`, unless they are a member already, in which
 * case their role is left as it is (a link never demotes or promotes an existing member).
 */
export async function addMember(
  options: {
    workspaceId: string;
    userId: string;
    role: Role;
    joinedVia: JoinedVia;
    invitationId?: string;
    shareLinkId?: string;
    addedBy?: string | null;
  },
  transaction: Transaction,
): Promise<{ membership: MembershipRow; alreadyMember: boolean }> {
  const existing = await findMembershipOf(options.workspaceId, options.userId, transaction);
  if (existing) return { membership: existing, alreadyMember: true };
  const membership = await createMembership({ ...options, lastActiveAt: new Date() }, transaction);
  return { membership, alreadyMember: false };
}

import type { Transaction } from "sequelize";
import type { Role } from "../../../core/contract/workspaces";
import { Membership, type JoinedVia } from "../../../db/models/membership";

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
): Promise<{ membership: Membership; alreadyMember: boolean }> {
  const existing = await Membership.findOne({
    where: { workspaceId: options.workspaceId, userId: options.userId },
    transaction,
  });
  if (existing) return { membership: existing, alreadyMember: true };
  const membership = await Membership.create({ ...options, lastActiveAt: new Date() }, { transaction });
  return { membership, alreadyMember: false };
}

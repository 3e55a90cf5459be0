import type { Member } from "../../../core/contract/workspaces";
import type { MemberRow } from "../../../db/repositories/workspaces";

/** One row of the members table. */
export function presentMember(membership: MemberRow, callerId: string): Member {
  return {
    id: membership.id,
    userId: membership.userId,
    name: membership.user.name,
    email: membership.user.email,
    role: membership.role,
    joinedAt: membership.createdAt.toISOString(),
    lastActiveAt: membership.lastActiveAt?.toISOString() ?? null,
    isYou: membership.userId === callerId,
  };
}

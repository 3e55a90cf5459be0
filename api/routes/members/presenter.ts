import type { Member } from "../../../core/contract/workspaces";
import type { Membership } from "../../../db/models/membership";
import type { User } from "../../../db/models/user";

/** One row of the members table. */
export function presentMember(membership: Membership & { user: User }, callerId: string): Member {
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

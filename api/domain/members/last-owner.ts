import type { Transaction } from "sequelize";
import type { Role } from "../../../core/contract/workspaces";
import { countOwners, type MembershipRow } from "../../../db/repositories/workspaces";
import { errors } from "../../errors";

/**
 * Throws 409 `last_owner` if giving `membership` the role `next` (null = removing it) would
 * leave its workspace without an owner. Call inside a transaction after `lockWorkspace`,
 * which makes concurrent role changes in one workspace happen one after another (two owners
 * demoting each other cannot both succeed).
 */
export async function assertKeepsAnOwner(
  membership: Pick<MembershipRow, "role" | "workspaceId">,
  next: Role | null,
  transaction: Transaction,
): Promise<void> {
  if (membership.role !== "owner" || next === "owner") return;
  const owners = await countOwners(membership.workspaceId, transaction);
  if (owners <= 1) {
    throw errors.conflictWithId(
      "last_owner",
      "A workspace always keeps at least one owner: make another member owner first.",
    );
  }
}

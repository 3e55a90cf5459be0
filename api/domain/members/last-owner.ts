import type { Transaction } from "sequelize";
import type { Role } from "../../../core/contract/workspaces";
import { Membership } from "../../../db/models/membership";
import { Workspace } from "../../../db/models/workspace";
import { errors } from "../../errors";

/**
 * Locks the workspace row for the rest of `transaction`, so concurrent role changes in one
 * workspace happen one after another (two owners demoting each other cannot both succeed).
 */
export async function lockWorkspace(workspaceId: string, transaction: Transaction): Promise<void> {
  await Workspace.findByPk(workspaceId, { transaction, lock: transaction.LOCK.UPDATE });
}

/**
 * Throws 409 `last_owner` if giving `membership` the role `next` (null = removing it) would
 * leave its workspace without an owner. Call inside a transaction after `lockWorkspace`.
 */
export async function assertKeepsAnOwner(
  membership: Membership,
  next: Role | null,
  transaction: Transaction,
): Promise<void> {
  if (membership.role !== "owner" || next === "owner") return;
  const owners = await Membership.count({
    where: { workspaceId: membership.workspaceId, role: "owner" },
    transaction,
  });
  if (owners <= 1) {
    throw errors.conflictWithId(
      "last_owner",
      "A workspace always keeps at least one owner: make another member owner first.",
    );
  }
}

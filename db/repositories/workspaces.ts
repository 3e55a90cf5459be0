import { col, fn, type Transaction } from "sequelize";
import type { JoinedVia } from "../models/membership";
import { Membership } from "../models/membership";
import { User } from "../models/user";
import { Workspace } from "../models/workspace";
import { toPlain, toPlainOrNull, updateById, type Row } from "./plain";

/** A workspace, as a plain object. */
export type WorkspaceRow = Row<Workspace>;
/** Someone's membership of a workspace (their role), as a plain object. */
export type MembershipRow = Omit<Row<Membership>, "user">;
/** A membership with the member's name and e-mail address. */
export type MemberRow = MembershipRow & { user: { name: string; email: string } };

/** What adding a member sets; the id and timestamps are the table's. */
export type NewMembership = Pick<MembershipRow, "workspaceId" | "userId" | "role" | "joinedVia"> &
  Partial<Pick<MembershipRow, "invitationId" | "shareLinkId" | "addedBy" | "lastActiveAt">>;

const withUser = [{ model: User, as: "user", required: true, attributes: ["name", "email"] }];

const memberOf = (m: Membership): MemberRow => {
  const { user, ...membership } = toPlain(m) as Row<Membership>;
  return { ...membership, user: { name: user!.name, email: user!.email } };
};

/** Number of members per workspace id. */
export async function memberCounts(
  workspaceIds: string[],
  transaction?: Transaction,
): Promise<Map<string, number>> {
  if (workspaceIds.length === 0) return new Map();
  const rows = (await Membership.findAll({
    attributes: ["workspaceId", [fn("count", col("id")), "count"]],
    where: { workspaceId: workspaceIds },
    group: ["workspaceId"],
    raw: true,
    transaction,
  })) as unknown as { workspaceId: string; count: string }[];
  return new Map(rows.map((r) => [r.workspaceId, Number(r.count)]));
}

/** The user's memberships, each with its workspace. */
export async function workspacesOfUser(
  userId: string,
  transaction?: Transaction,
): Promise<{ membership: MembershipRow; workspace: WorkspaceRow }[]> {
  const rows = await Membership.findAll({
    where: { userId },
    include: [{ model: Workspace, as: "workspace", required: true }],
    transaction,
  });
  return rows.map((m) => {
    const { workspace, ...membership } = m.get({ plain: true }) as MembershipRow & {
      workspace: WorkspaceRow;
    };
    return { membership, workspace };
  });
}

/** Creates a workspace with `ownerId` as its first owner. */
export async function createWorkspaceWithOwner(
  name: string,
  ownerId: string,
  transaction?: Transaction,
): Promise<WorkspaceRow> {
  const created = await Workspace.create({ name, createdBy: ownerId }, { transaction });
  await Membership.create(
    {
      workspaceId: created.id,
      userId: ownerId,
      role: "owner",
      joinedVia: "created" satisfies JoinedVia,
      lastActiveAt: new Date(),
    },
    { transaction },
  );
  return toPlain(created);
}

/** Sets `values` on the workspace `id`; the row as stored after. */
export async function updateWorkspace(
  id: string,
  values: Partial<WorkspaceRow>,
  transaction?: Transaction,
): Promise<WorkspaceRow> {
  return (await updateById(Workspace, id, values, transaction))!;
}

/** Deletes the workspace and, by the foreign keys' cascade, its memberships, invitations and links. */
export async function deleteWorkspace(id: string, transaction?: Transaction): Promise<void> {
  await Workspace.destroy({ where: { id }, transaction });
}

/**
 * Locks the workspace row for the rest of `transaction`, so concurrent role changes in one
 * workspace happen one after another.
 */
export async function lockWorkspace(id: string, transaction: Transaction): Promise<void> {
  await Workspace.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
}

/** Every member of the workspace with their name and address. */
export async function membersOf(workspaceId: string, transaction?: Transaction): Promise<MemberRow[]> {
  const rows = await Membership.findAll({ where: { workspaceId }, include: withUser, transaction });
  return rows.map(memberOf);
}

/** The membership `id` of the workspace with the member's name and address, or null. */
export async function findMember(
  workspaceId: string,
  id: string,
  transaction?: Transaction,
): Promise<MemberRow | null> {
  const row = await Membership.findOne({ where: { id, workspaceId }, include: withUser, transaction });
  return row ? memberOf(row) : null;
}

/** The membership `id` (of any workspace), or null. */
export async function findMembershipById(
  id: string,
  transaction?: Transaction,
): Promise<MembershipRow | null> {
  return toPlainOrNull(await Membership.findByPk(id, { transaction })) as MembershipRow | null;
}

/** `userId`'s membership of the workspace, or null. */
export async function findMembershipOf(
  workspaceId: string,
  userId: string,
  transaction?: Transaction,
): Promise<MembershipRow | null> {
  return toPlainOrNull(
    await Membership.findOne({ where: { workspaceId, userId }, transaction }),
  ) as MembershipRow | null;
}

export async function createMembership(
  values: NewMembership,
  transaction?: Transaction,
): Promise<MembershipRow> {
  return toPlain(await Membership.create(values, { transaction })) as MembershipRow;
}

/** Sets `values` on the membership `id`; the row as stored after. */
export async function updateMembership(
  id: string,
  values: Partial<MembershipRow>,
  transaction?: Transaction,
): Promise<MembershipRow> {
  return (await updateById(Membership, id, values, transaction)) as MembershipRow;
}

export async function deleteMembership(id: string, transaction?: Transaction): Promise<void> {
  await Membership.destroy({ where: { id }, transaction });
}

/** How many owners the workspace has. */
export function countOwners(workspaceId: string, transaction?: Transaction): Promise<number> {
  return Membership.count({ where: { workspaceId, role: "owner" }, transaction });
}

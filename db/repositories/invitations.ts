import type { Transaction } from "sequelize";
import { Invitation } from "../models/invitation";
import { User } from "../models/user";
import { Workspace } from "../models/workspace";
import { toPlain, toPlainOrNull, updateById, type Row } from "./plain";

/** An invitation to a workspace (only its token's hash is stored), as a plain object. */
export type InvitationRow = Omit<Row<Invitation>, "inviter" | "workspace"> & {
  /** Who sent it, when read with its inviter. */
  inviter?: { name: string } | null;
  /** Its workspace's name, when read by token. */
  workspace?: { name: string };
};

/** What inviting sets; the id, send count and timestamps are the table's. */
export type NewInvitation = Pick<
  InvitationRow,
  "workspaceId" | "email" | "role" | "tokenHash" | "expiresAt" | "createdBy"
>;

const withInviter = [{ model: User, as: "inviter", attributes: ["name"] }];
const plain = (row: Invitation | null) => toPlainOrNull(row) as InvitationRow | null;

/** The workspace's invitations, newest first, each with its inviter's name. */
export async function listInvitations(
  workspaceId: string,
  transaction?: Transaction,
): Promise<InvitationRow[]> {
  const rows = await Invitation.findAll({
    where: { workspaceId },
    include: withInviter,
    order: [["createdAt", "DESC"]],
    transaction,
  });
  return rows.map((r) => toPlain(r) as InvitationRow);
}

/** The workspace's invitations neither accepted nor revoked (expired ones included). */
export async function openInvitations(
  workspaceId: string,
  transaction?: Transaction,
): Promise<InvitationRow[]> {
  const rows = await Invitation.findAll({
    where: { workspaceId, acceptedAt: null, revokedAt: null },
    transaction,
  });
  return rows.map((r) => toPlain(r) as InvitationRow);
}

export async function createInvitation(
  values: NewInvitation,
  transaction?: Transaction,
): Promise<InvitationRow> {
  return toPlain(await Invitation.create(values, { transaction })) as InvitationRow;
}

/** The invitation `id` of the workspace with its inviter's name, or null. */
export async function findInvitation(
  workspaceId: string,
  id: string,
  transaction?: Transaction,
): Promise<InvitationRow | null> {
  return plain(await Invitation.findOne({ where: { id, workspaceId }, include: withInviter, transaction }));
}

/** The invitation whose token hashes to `tokenHash`, with its inviter's and workspace's names, or null. */
export async function findInvitationByToken(
  tokenHash: string,
  transaction?: Transaction,
): Promise<InvitationRow | null> {
  return plain(
    await Invitation.findOne({
      where: { tokenHash },
      include: [...withInviter, { model: Workspace, as: "workspace", required: true }],
      transaction,
    }),
  );
}

/** The invitation `id` locked FOR UPDATE for the rest of `transaction`, or null. */
export async function lockInvitation(id: string, transaction: Transaction): Promise<InvitationRow | null> {
  return plain(await Invitation.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE }));
}

/** Sets `values` on the invitation `id`; the row as stored after (without its inviter). */
export async function updateInvitation(
  id: string,
  values: Partial<InvitationRow>,
  transaction?: Transaction,
): Promise<InvitationRow> {
  return (await updateById(Invitation, id, values as Partial<Row<Invitation>>, transaction)) as InvitationRow;
}

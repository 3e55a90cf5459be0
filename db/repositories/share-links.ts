import type { Transaction } from "sequelize";
import { ShareLink } from "../models/share-link";
import { User } from "../models/user";
import { Workspace } from "../models/workspace";
import { toPlain, toPlainOrNull, updateById, type Row } from "./plain";

/** A workspace's share link (only its token's hash is stored), as a plain object. */
export type ShareLinkRow = Omit<Row<ShareLink>, "creator" | "workspace"> & {
  /** Who made it, when read with its creator. */
  creator?: { name: string } | null;
  /** Its workspace's name, when read by token. */
  workspace?: { name: string };
};

/** What making a link sets; its id, use count and timestamps are the table's. */
export type NewShareLink = Pick<
  ShareLinkRow,
  "workspaceId" | "role" | "label" | "tokenHash" | "expiresAt" | "maxUses" | "createdBy"
>;

const withCreator = [{ model: User, as: "creator", attributes: ["name"] }];

const plainLink = (link: ShareLink | null) => toPlainOrNull(link) as ShareLinkRow | null;

/** The workspace's links, newest first, each with its creator's name. */
export async function listShareLinks(
  workspaceId: string,
  transaction?: Transaction,
): Promise<ShareLinkRow[]> {
  const rows = await ShareLink.findAll({
    where: { workspaceId },
    include: withCreator,
    order: [["createdAt", "DESC"]],
    transaction,
  });
  return rows.map((r) => toPlain(r) as ShareLinkRow);
}

/** Makes a link and returns it with its creator's name. */
export async function createShareLink(
  values: NewShareLink,
  transaction?: Transaction,
): Promise<ShareLinkRow> {
  const link = await ShareLink.create(values, { transaction });
  await link.reload({ include: withCreator, transaction });
  return toPlain(link) as ShareLinkRow;
}

/** The link `id` of the workspace, or null. */
export async function findShareLink(
  workspaceId: string,
  id: string,
  transaction?: Transaction,
): Promise<ShareLinkRow | null> {
  return plainLink(await ShareLink.findOne({ where: { id, workspaceId }, transaction }));
}

/** The link whose token hashes to `tokenHash`, with its workspace's name, or null. */
export async function findShareLinkByToken(
  tokenHash: string,
  transaction?: Transaction,
): Promise<ShareLinkRow | null> {
  return plainLink(
    await ShareLink.findOne({
      where: { tokenHash },
      include: [{ model: Workspace, as: "workspace", required: true }],
      transaction,
    }),
  );
}

/** The link `id` locked FOR UPDATE for the rest of `transaction` (its use limit is checked under it), or null. */
export async function lockShareLink(id: string, transaction: Transaction): Promise<ShareLinkRow | null> {
  return plainLink(await ShareLink.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE }));
}

/** Sets `values` on the link `id`. */
export async function updateShareLink(
  id: string,
  values: Partial<ShareLinkRow>,
  transaction?: Transaction,
): Promise<void> {
  await updateById(ShareLink, id, values as Partial<Row<ShareLink>>, transaction);
}

/** Counts one more use of the link `id`. */
export async function countShareLinkUse(id: string, transaction?: Transaction): Promise<void> {
  await ShareLink.increment("useCount", { where: { id }, transaction });
}

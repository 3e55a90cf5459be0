import type { z } from "zod";
import type { createShareLinkBodySchema } from "../../../core/contract/share-links";
import {
  countShareLinkUse,
  createShareLink,
  findShareLink,
  findShareLinkByToken,
  listShareLinks,
  lockShareLink,
  updateShareLink,
  type ShareLinkRow,
} from "../../../db/repositories/share-links";
import { findMembershipOf } from "../../../db/repositories/workspaces";
import { currentMembership, currentUser } from "../../auth/guards";
import { hashToken, newLinkToken } from "../../auth/tokens";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { addMember } from "../../domain/members/join";
import { presentShareLink, presentShareLinkPreview, shareLinkState } from "./presenter";

type NoInput = Record<string, never>;
type WorkspaceParams = { workspaceId: string };
type LinkParams = WorkspaceParams & { linkId: string };
type TokenParams = { token: string };
type CreateBody = z.output<typeof createShareLinkBodySchema>;

const DAY_MS = 24 * 60 * 60 * 1000;

export const listShareLinksHandler: RouteHandler<WorkspaceParams, NoInput, NoInput> = async (_req, res) => {
  const rows = await listShareLinks(currentMembership(res).workspace.id);
  res.set("Cache-Control", "no-store").json({ shareLinks: rows.map(presentShareLink) });
};

/** Creates a link; its URL is in this answer only, because only the token's hash is stored. */
export function createShareLinkHandler(
  context: AppContext,
): RouteHandler<WorkspaceParams, NoInput, CreateBody> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const { role, label, expiresInDays, maxUses } = res.locals.input.body;
    const token = newLinkToken();
    const link = await createShareLink({
      workspaceId: workspace.id,
      role,
      label: label || null,
      tokenHash: hashToken(token),
      expiresAt: new Date(Date.now() + expiresInDays * DAY_MS),
      maxUses: maxUses ?? null,
      createdBy: currentUser(res).id,
    });
    res.status(201).json({ shareLink: presentShareLink(link), url: `${context.publicOrigin}/join/${token}` });
  };
}

export const revokeShareLinkHandler: RouteHandler<LinkParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const link = await findShareLink(workspace.id, res.locals.input.params.linkId);
  if (!link) throw errors.notFound("This share link");
  if (link.revokedAt)
    throw errors.conflictWithId("share_link_revoked", "This share link was revoked already.");
  await updateShareLink(link.id, { revokedAt: new Date(), revokedBy: currentUser(res).id });
  res.status(204).end();
};

async function linkByToken(token: string): Promise<ShareLinkRow> {
  const link = await findShareLinkByToken(hashToken(token));
  if (!link) throw errors.notFound("This share link");
  return link;
}

export const previewShareLinkHandler: RouteHandler<TokenParams, NoInput, NoInput> = async (_req, res) => {
  res
    .set("Cache-Control", "no-store")
    .json(presentShareLinkPreview(await linkByToken(res.locals.input.params.token)));
};

const UNUSABLE = {
  revoked: "This share link was revoked; ask the workspace's team for a new one.",
  expired: "This share link has expired; ask the workspace's team for a new one.",
  used_up: "This share link has been used as many times as it allows.",
} as const;

/** Joins with the link's role; a member already keeps their role and uses up nothing. */
export function joinShareLinkHandler(context: AppContext): RouteHandler<TokenParams, NoInput, NoInput> {
  return async (_req, res) => {
    const user = currentUser(res);
    const found = await linkByToken(res.locals.input.params.token);
    const result = await context.sequelize.transaction(async (transaction) => {
      // Locked so the use limit holds when several people join at the same moment.
      const link = await lockShareLink(found.id, transaction);
      if (!link) throw errors.notFound("This share link");
      // A member opening any of the workspace's links is simply sent on, whatever the link's state.
      const existing = await findMembershipOf(link.workspaceId, user.id, transaction);
      if (existing) return { membership: existing, alreadyMember: true };
      const state = shareLinkState(link);
      if (state !== "active") throw errors.conflictWithId(`share_link_${state}`, UNUSABLE[state]);
      const joined = await addMember(
        {
          workspaceId: link.workspaceId,
          userId: user.id,
          role: link.role,
          joinedVia: "share_link",
          shareLinkId: link.id,
          addedBy: link.createdBy,
        },
        transaction,
      );
      if (!joined.alreadyMember) await countShareLinkUse(link.id, transaction);
      return joined;
    });
    res.json({
      workspaceId: result.membership.workspaceId,
      role: result.membership.role,
      alreadyMember: result.alreadyMember,
    });
  };
}

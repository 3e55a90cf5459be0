import { z } from "zod";
import { workspaceIdParamsSchema } from "./workspaces";

/** Share links: anyone signed in who opens one joins the workspace with its role. Imports only zod. */

/** A share link never makes anyone an owner. */
export const SHARE_LINK_ROLES = ["viewer", "reviewer", "editor"] as const;
export const shareLinkRoleSchema = z.enum(SHARE_LINK_ROLES, {
  error: "A share link grants viewer, reviewer or editor (never owner).",
});
export type ShareLinkRole = z.infer<typeof shareLinkRoleSchema>;

export const SHARE_LINK_MAX_DAYS = 90;

export const createShareLinkBodySchema = z.object({
  role: shareLinkRoleSchema.default("viewer"),
  label: z.string().trim().max(100, "A label has at most 100 characters.").optional(),
  expiresInDays: z
    .int({ error: "Give the number of days as a whole number." })
    .min(1, "A link lives at least 1 day.")
    .max(SHARE_LINK_MAX_DAYS, `A link lives at most ${SHARE_LINK_MAX_DAYS} days.`)
    .default(7),
  /** null or absent: any number of people may join with it. */
  maxUses: z
    .int({ error: "Give the number of uses as a whole number." })
    .min(1, "Allow at least 1 use, or leave empty for no limit.")
    .max(1000, "At most 1000 uses.")
    .nullable()
    .optional(),
});
export type CreateShareLinkBody = z.input<typeof createShareLinkBodySchema>;

export const SHARE_LINK_STATES = ["active", "expired", "revoked", "used_up"] as const;
export const shareLinkStateSchema = z.enum(SHARE_LINK_STATES);
export type ShareLinkState = z.infer<typeof shareLinkStateSchema>;

export const shareLinkParamsSchema = workspaceIdParamsSchema.extend({
  linkId: z.uuid({ error: "must be a share link id (UUID)" }),
});

export const shareLinkSchema = z.object({
  id: z.uuid(),
  role: shareLinkRoleSchema,
  label: z.string().nullable(),
  state: shareLinkStateSchema,
  createdByName: z.string().nullable(),
  createdAt: z.iso.datetime(),
  expiresAt: z.iso.datetime(),
  maxUses: z.int().nullable(),
  useCount: z.int(),
  revokedAt: z.iso.datetime().nullable(),
});
export type ShareLink = z.infer<typeof shareLinkSchema>;

export const shareLinkListSchema = z.object({ shareLinks: z.array(shareLinkSchema) });
export type ShareLinkList = z.infer<typeof shareLinkListSchema>;

/**
 * The answer to creating a link: the only time its URL is shown, because the server keeps
 * only a hash of the token.
 */
export const createdShareLinkSchema = z.object({ shareLink: shareLinkSchema, url: z.url() });
export type CreatedShareLink = z.infer<typeof createdShareLinkSchema>;

export const shareLinkPreviewSchema = z.object({
  workspaceName: z.string(),
  role: shareLinkRoleSchema,
  state: shareLinkStateSchema,
  expiresAt: z.iso.datetime(),
});
export type ShareLinkPreview = z.infer<typeof shareLinkPreviewSchema>;

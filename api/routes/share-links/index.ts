import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  createShareLinkHandler,
  joinShareLinkHandler,
  listShareLinksHandler,
  previewShareLinkHandler,
  revokeShareLinkHandler,
} from "./handlers";
import {
  createdShareLinkSchema,
  createShareLinkBodySchema,
  joinedWorkspaceSchema,
  shareLinkListSchema,
  shareLinkParamsSchema,
  shareLinkPreviewSchema,
  shareLinkTokenParamsSchema,
  workspaceIdParamsSchema,
} from "./schema";

const tag = "share-links";

/** Share links: editors and owners manage them; any signed-in person with one joins. */
export function shareLinkRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/share-links",
      tag,
      summary: "Share links of the workspace with their state",
      access: { kind: "member", role: "editor" },
      request: { params: workspaceIdParamsSchema },
      responses: { 200: { description: "Newest first.", schema: shareLinkListSchema } },
      handler: listShareLinksHandler,
    }),
    defineRoute({
      method: "post",
      path: "/workspaces/{workspaceId}/share-links",
      tag,
      summary: "Create a share link (role viewer by default, never owner; expiry; optional use limit)",
      description: "The answer carries the link's URL; it is not shown again (only a hash is stored).",
      access: { kind: "member", role: "editor" },
      request: { params: workspaceIdParamsSchema, body: createShareLinkBodySchema },
      responses: { 201: { description: "The link and its URL.", schema: createdShareLinkSchema } },
      handler: createShareLinkHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: "/workspaces/{workspaceId}/share-links/{linkId}",
      tag,
      summary: "Revoke a share link",
      access: { kind: "member", role: "editor" },
      request: { params: shareLinkParamsSchema },
      responses: { 204: { description: "Revoked." } },
      errors: { 409: "Revoked already." },
      handler: revokeShareLinkHandler,
    }),
    defineRoute({
      method: "get",
      path: "/share-links/{token}",
      tag,
      summary: "What a share link offers (workspace, role, state)",
      access: { kind: "public" },
      request: { params: shareLinkTokenParamsSchema },
      responses: { 200: { description: "The link as its holder sees it.", schema: shareLinkPreviewSchema } },
      errors: { 404: "No share link has this token." },
      handler: previewShareLinkHandler,
    }),
    defineRoute({
      method: "post",
      path: "/share-links/{token}/join",
      tag,
      summary: "Join the workspace with the link's role",
      access: { kind: "signed-in" },
      request: { params: shareLinkTokenParamsSchema },
      responses: { 200: { description: "Joined (or was a member already).", schema: joinedWorkspaceSchema } },
      errors: {
        404: "No share link has this token.",
        409: "Revoked, expired or used up (share_link_revoked, share_link_expired, share_link_used_up).",
      },
      handler: joinShareLinkHandler(context),
    }),
  ];
}

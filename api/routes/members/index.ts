import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  leaveWorkspaceHandler,
  listMembersHandler,
  removeMemberHandler,
  updateMemberHandler,
} from "./handlers";
import {
  memberListSchema,
  memberParamsSchema,
  memberResponseSchema,
  updateMemberBodySchema,
  workspaceIdParamsSchema,
} from "./schema";

const tag = "members";
const lastOwner = { 409: "The change would leave the workspace without an owner (id last_owner)." };

/** Members of a workspace and their roles. */
export function memberRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/members",
      tag,
      summary: "Members with role, joined date and last activity",
      access: { kind: "member", role: "viewer" },
      request: { params: workspaceIdParamsSchema },
      responses: { 200: { description: "The members.", schema: memberListSchema } },
      handler: listMembersHandler,
    }),
    defineRoute({
      method: "patch",
      path: "/workspaces/{workspaceId}/members/{memberId}",
      tag,
      summary: "Change a member's role",
      access: { kind: "member", role: "owner" },
      request: { params: memberParamsSchema, body: updateMemberBodySchema },
      responses: { 200: { description: "The member with the new role.", schema: memberResponseSchema } },
      errors: lastOwner,
      handler: updateMemberHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: "/workspaces/{workspaceId}/members/{memberId}",
      tag,
      summary: "Remove a member",
      access: { kind: "member", role: "owner" },
      request: { params: memberParamsSchema },
      responses: { 204: { description: "Removed." } },
      errors: lastOwner,
      handler: removeMemberHandler(context),
    }),
    defineRoute({
      method: "post",
      path: "/workspaces/{workspaceId}/leave",
      tag,
      summary: "Leave the workspace (any member)",
      access: { kind: "member", role: "viewer" },
      request: { params: workspaceIdParamsSchema },
      responses: { 204: { description: "The caller is no longer a member." } },
      errors: lastOwner,
      handler: leaveWorkspaceHandler(context),
    }),
  ];
}

import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  createWorkspaceHandler,
  deleteWorkspaceHandler,
  getWorkspaceHandler,
  listWorkspacesHandler,
  updateWorkspaceHandler,
} from "./handlers";
import {
  createWorkspaceBodySchema,
  updateWorkspaceBodySchema,
  workspaceIdParamsSchema,
  workspaceListSchema,
  workspaceResponseSchema,
} from "./schema";

const tag = "workspaces";

/** Workspaces the caller belongs to, under /api/workspaces. */
export function workspaceRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces",
      tag,
      summary: "The workspaces the caller is a member of, with their role in each",
      access: { kind: "signed-in" },
      responses: { 200: { description: "The caller's workspaces.", schema: workspaceListSchema } },
      handler: listWorkspacesHandler,
    }),
    defineRoute({
      method: "post",
      path: "/workspaces",
      tag,
      summary: "Create a workspace; the caller becomes its owner",
      access: { kind: "signed-in" },
      request: { body: createWorkspaceBodySchema },
      responses: { 201: { description: "The new workspace.", schema: workspaceResponseSchema } },
      handler: createWorkspaceHandler(context),
    }),
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}",
      tag,
      summary: "One workspace",
      access: { kind: "member", role: "viewer" },
      request: { params: workspaceIdParamsSchema },
      responses: { 200: { description: "The workspace.", schema: workspaceResponseSchema } },
      handler: getWorkspaceHandler,
    }),
    defineRoute({
      method: "patch",
      path: "/workspaces/{workspaceId}",
      tag,
      summary: "Rename a workspace",
      access: { kind: "member", role: "owner" },
      request: { params: workspaceIdParamsSchema, body: updateWorkspaceBodySchema },
      responses: { 200: { description: "The renamed workspace.", schema: workspaceResponseSchema } },
      handler: updateWorkspaceHandler,
    }),
    defineRoute({
      method: "delete",
      path: "/workspaces/{workspaceId}",
      tag,
      summary: "Delete a workspace and everything in it",
      access: { kind: "member", role: "owner" },
      request: { params: workspaceIdParamsSchema },
      responses: { 204: { description: "Deleted." } },
      handler: deleteWorkspaceHandler,
    }),
  ];
}

import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  createProjectHandler,
  deleteProjectHandler,
  getProjectHandler,
  listProjectsHandler,
  updateProjectHandler,
} from "./handlers";
import {
  createProjectBodySchema,
  projectListSchema,
  projectParamsSchema,
  projectResponseSchema,
  updateProjectBodySchema,
  workspaceIdParamsSchema,
} from "./schema";

const tag = "projects";

/** Projects of a workspace, under /api/workspaces/{workspaceId}/projects. */
export function projectRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/projects",
      tag,
      summary: "The workspace's projects (not those in the trash)",
      access: { kind: "member", role: "viewer" },
      request: { params: workspaceIdParamsSchema },
      responses: { 200: { description: "The projects.", schema: projectListSchema } },
      handler: listProjectsHandler,
    }),
    defineRoute({
      method: "post",
      path: "/workspaces/{workspaceId}/projects",
      tag,
      summary: "Create a project",
      access: { kind: "member", role: "editor" },
      request: { params: workspaceIdParamsSchema, body: createProjectBodySchema },
      responses: { 201: { description: "The new project.", schema: projectResponseSchema } },
      handler: createProjectHandler(context),
    }),
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/projects/{projectId}",
      tag,
      summary: "One project",
      access: { kind: "member", role: "viewer" },
      request: { params: projectParamsSchema },
      responses: { 200: { description: "The project.", schema: projectResponseSchema } },
      handler: getProjectHandler,
    }),
    defineRoute({
      method: "patch",
      path: "/workspaces/{workspaceId}/projects/{projectId}",
      tag,
      summary: "Change a project (send the version you started from)",
      access: { kind: "member", role: "editor" },
      request: { params: projectParamsSchema, body: updateProjectBodySchema },
      responses: { 200: { description: "The changed project.", schema: projectResponseSchema } },
      errors: { 409: "The project changed since that version; details carry the current one." },
      handler: updateProjectHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: "/workspaces/{workspaceId}/projects/{projectId}",
      tag,
      summary: "Move a project to the trash (restorable for 30 days by owners and editors)",
      access: { kind: "member", role: "editor" },
      request: { params: projectParamsSchema },
      responses: { 204: { description: "In the trash." } },
      handler: deleteProjectHandler(context),
    }),
  ];
}

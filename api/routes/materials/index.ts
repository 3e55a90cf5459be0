import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  createMaterialHandler,
  deleteMaterialHandler,
  getMaterialHandler,
  listMaterialsHandler,
  updateMaterialHandler,
} from "./handlers";
import {
  createMaterialBodySchema,
  materialListSchema,
  materialParamsSchema,
  materialResponseSchema,
  updateMaterialBodySchema,
  workspaceIdParamsSchema,
} from "./schema";

const tag = "materials";

/** The workspace's material library and the built-in published list, under /api/workspaces/{workspaceId}/materials. */
export function materialRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/materials",
      tag,
      summary: "The workspace's library materials and the built-in published list",
      access: { kind: "member", role: "viewer" },
      request: { params: workspaceIdParamsSchema },
      responses: {
        200: { description: "Library and built-in materials, values in Pa.", schema: materialListSchema },
      },
      handler: listMaterialsHandler,
    }),
    defineRoute({
      method: "post",
      path: "/workspaces/{workspaceId}/materials",
      tag,
      summary: "Add a material to the library",
      access: { kind: "member", role: "editor" },
      request: { params: workspaceIdParamsSchema, body: createMaterialBodySchema },
      responses: { 201: { description: "The new material.", schema: materialResponseSchema } },
      handler: createMaterialHandler(context),
    }),
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/materials/{materialId}",
      tag,
      summary: "One library material",
      access: { kind: "member", role: "viewer" },
      request: { params: materialParamsSchema },
      responses: { 200: { description: "The material.", schema: materialResponseSchema } },
      handler: getMaterialHandler,
    }),
    defineRoute({
      method: "patch",
      path: "/workspaces/{workspaceId}/materials/{materialId}",
      tag,
      summary: "Change a library material (send the version you started from)",
      access: { kind: "member", role: "editor" },
      request: { params: materialParamsSchema, body: updateMaterialBodySchema },
      responses: { 200: { description: "The changed material.", schema: materialResponseSchema } },
      errors: { 409: "The material changed since that version; details carry the current one." },
      handler: updateMaterialHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: "/workspaces/{workspaceId}/materials/{materialId}",
      tag,
      summary: "Move a library material to the trash (restorable for 30 days)",
      access: { kind: "member", role: "editor" },
      request: { params: materialParamsSchema },
      responses: { 204: { description: "In the trash." } },
      handler: deleteMaterialHandler(context),
    }),
  ];
}

import { trashItemParamsSchema, trashListSchema } from "../../../core/contract/projects";
import { workspaceIdParamsSchema } from "../../../core/contract/workspaces";
import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { listTrashHandler, purgeHandler, restoreHandler } from "./handlers";

const tag = "trash";

/** The 30-day trash of projects, locations, load cases, combinations and materials. */
export function trashRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/trash",
      tag,
      summary: "What is in the trash and when it goes for good (older items are purged first)",
      access: { kind: "member", role: "editor" },
      request: { params: workspaceIdParamsSchema },
      responses: { 200: { description: "The trash, newest first.", schema: trashListSchema } },
      handler: listTrashHandler(context),
    }),
    defineRoute({
      method: "post",
      path: "/workspaces/{workspaceId}/trash/{kind}/{itemId}/restore",
      tag,
      summary: "Restore an item from the trash",
      access: { kind: "member", role: "editor" },
      request: { params: trashItemParamsSchema },
      responses: { 204: { description: "Restored." } },
      errors: { 409: "The item's project is in the trash; restore it first." },
      handler: restoreHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: "/workspaces/{workspaceId}/trash/{kind}/{itemId}",
      tag,
      summary: "Delete an item in the trash for good (owners only)",
      access: { kind: "member", role: "owner" },
      request: { params: trashItemParamsSchema },
      responses: { 204: { description: "Deleted for good." } },
      handler: purgeHandler(context),
    }),
  ];
}

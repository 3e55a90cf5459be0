import { PUBLISHED_MATERIALS } from "../../../core";
import {
  importResponseSchema,
  projectExportSchema,
  projectExportSchemaWith,
} from "../../../core/contract/project-export";
import { projectParamsSchema } from "../../../core/contract/projects";
import { workspaceIdParamsSchema } from "../../../core/contract/workspaces";
import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { exportHandler, importHandler } from "./handlers";

const tag = "project-transfer";

/** Project export (a versioned JSON file, see docs/project-export.md) and import into any workspace. */
export function projectTransferRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/projects/{projectId}/export",
      tag,
      summary:
        "The project as an export file (format sigmacube.project, schemaVersion 4; versions 1 to 4 are read)",
      access: { kind: "member", role: "viewer" },
      request: { params: projectParamsSchema },
      responses: { 200: { description: "The export file.", schema: projectExportSchema } },
      handler: exportHandler,
    }),
    defineRoute({
      method: "post",
      path: "/workspaces/{workspaceId}/project-imports",
      tag,
      summary:
        "Import an export file as a new project (refused whole, with every reason, if anything is wrong)",
      access: { kind: "member", role: "editor" },
      request: {
        params: workspaceIdParamsSchema,
        body: projectExportSchemaWith(new Set(PUBLISHED_MATERIALS.map((m) => m.id))),
      },
      responses: { 201: { description: "The new project and what it holds.", schema: importResponseSchema } },
      handler: importHandler(context),
    }),
  ];
}

import { auditListSchema, auditQuerySchema } from "../../../core/contract/projects";
import { workspaceIdParamsSchema } from "../../../core/contract/workspaces";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { listAuditHandler } from "./handlers";

/** The audit trail (who changed what and when), readable by every member. */
export function auditRoutes(): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/audit",
      tag: "audit",
      summary: "Who changed what and when in the workspace's projects and materials, newest first",
      access: { kind: "member", role: "viewer" },
      request: { params: workspaceIdParamsSchema, query: auditQuerySchema },
      responses: { 200: { description: "One page of events.", schema: auditListSchema } },
      handler: listAuditHandler,
    }),
  ];
}

import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  createLinearizationHandler,
  deleteLinearizationHandler,
  getLinearizationHandler,
  listLinearizationsHandler,
  pathFromPointTableHandler,
  previewLinearizationHandler,
  updateLinearizationHandler,
} from "./handlers";
import {
  linearizationCaseParamsSchema,
  linearizationInputSchema,
  linearizationListSchema,
  linearizationParamsSchema,
  linearizationPreviewSchema,
  linearizationResponseSchema,
  pathFromPointTableBodySchema,
  pathFromPointTableResponseSchema,
  updateLinearizationBodySchema,
} from "./schema";

const tag = "linearizations";
const base = "/workspaces/{workspaceId}/projects/{projectId}/load-cases/{loadCaseId}/linearizations";

/**
 * Stress classification lines saved per load case, under …/load-cases/{loadCaseId}/linearizations.
 * The server linearizes every line with core's `linearize`; clients send inputs, never results.
 */
export function linearizationRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: base,
      tag,
      summary: "A load case's saved linearizations (without their points)",
      access: { kind: "member", role: "viewer" },
      request: { params: linearizationCaseParamsSchema },
      responses: { 200: { description: "The lines and their checks.", schema: linearizationListSchema } },
      handler: listLinearizationsHandler,
    }),
    defineRoute({
      method: "post",
      path: `${base}/preview`,
      tag,
      summary: "Linearize a line without saving it",
      access: { kind: "member", role: "viewer" },
      request: { params: linearizationCaseParamsSchema, body: linearizationInputSchema },
      responses: {
        200: { description: "The result the server computed.", schema: linearizationPreviewSchema },
      },
      handler: previewLinearizationHandler,
    }),
    defineRoute({
      method: "post",
      path: `${base}/path-from-point-table`,
      tag,
      summary: "Pick a path out of a stored point table: the points near the line between two ends",
      access: { kind: "member", role: "viewer" },
      request: { params: linearizationCaseParamsSchema, body: pathFromPointTableBodySchema },
      responses: {
        200: {
          description: "How many points were found, and the path sorted along the line (not saved).",
          schema: pathFromPointTableResponseSchema,
        },
      },
      handler: pathFromPointTableHandler,
    }),
    defineRoute({
      method: "post",
      path: base,
      tag,
      summary: "Save a stress classification line under the load case",
      access: { kind: "member", role: "editor" },
      request: { params: linearizationCaseParamsSchema, body: linearizationInputSchema },
      responses: {
        201: { description: "The saved line and its result.", schema: linearizationResponseSchema },
      },
      handler: createLinearizationHandler(context),
    }),
    defineRoute({
      method: "get",
      path: `${base}/{linearizationId}`,
      tag,
      summary: "One saved line with its inputs and result",
      access: { kind: "member", role: "viewer" },
      request: { params: linearizationParamsSchema },
      responses: { 200: { description: "The line.", schema: linearizationResponseSchema } },
      handler: getLinearizationHandler,
    }),
    defineRoute({
      method: "put",
      path: `${base}/{linearizationId}`,
      tag,
      summary: "Replace a line's inputs (send the version you started from)",
      access: { kind: "member", role: "editor" },
      request: { params: linearizationParamsSchema, body: updateLinearizationBodySchema },
      responses: { 200: { description: "The changed line.", schema: linearizationResponseSchema } },
      errors: { 409: "The line changed since that version; details carry the current one." },
      handler: updateLinearizationHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: `${base}/{linearizationId}`,
      tag,
      summary: "Delete a line for good (the audit trail keeps its inputs)",
      access: { kind: "member", role: "editor" },
      request: { params: linearizationParamsSchema },
      responses: { 204: { description: "Deleted." } },
      handler: deleteLinearizationHandler(context),
    }),
  ];
}

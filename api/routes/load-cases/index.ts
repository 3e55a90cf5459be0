import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  createLoadCaseHandler,
  deleteLoadCaseHandler,
  getLoadCaseHandler,
  listLoadCasesHandler,
  putStateHandler,
  stateHistoryHandler,
  updateLoadCaseHandler,
} from "./handlers";
import {
  createLoadCaseBodySchema,
  loadCaseListSchema,
  loadCaseParamsSchema,
  loadCaseResponseSchema,
  projectParamsSchema,
  putStateBodySchema,
  stateHistorySchema,
  stateParamsSchema,
  updateLoadCaseBodySchema,
} from "./schema";

const tag = "load-cases";
const base = "/workspaces/{workspaceId}/projects/{projectId}/load-cases";
const stale = {
  409: "The load case changed since that version; details carry the current version and case.",
};

/** Load cases and their stress states, under …/projects/{projectId}/load-cases. */
export function loadCaseRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: base,
      tag,
      summary: "A project's load cases with their current states",
      access: { kind: "member", role: "viewer" },
      request: { params: projectParamsSchema },
      responses: { 200: { description: "The load cases.", schema: loadCaseListSchema } },
      handler: listLoadCasesHandler,
    }),
    defineRoute({
      method: "post",
      path: base,
      tag,
      summary: "Create a load case, optionally with its states",
      description: "States are given in any accepted unit and stored in Pa; a 3×3 matrix must be symmetric.",
      access: { kind: "member", role: "editor" },
      request: { params: projectParamsSchema, body: createLoadCaseBodySchema },
      responses: { 201: { description: "The new load case.", schema: loadCaseResponseSchema } },
      handler: createLoadCaseHandler(context),
    }),
    defineRoute({
      method: "get",
      path: `${base}/{loadCaseId}`,
      tag,
      summary: "One load case with its current states",
      access: { kind: "member", role: "viewer" },
      request: { params: loadCaseParamsSchema },
      responses: { 200: { description: "The load case.", schema: loadCaseResponseSchema } },
      handler: getLoadCaseHandler,
    }),
    defineRoute({
      method: "patch",
      path: `${base}/{loadCaseId}`,
      tag,
      summary: "Change a load case and any of its states (send the version you started from)",
      access: { kind: "member", role: "editor" },
      request: { params: loadCaseParamsSchema, body: updateLoadCaseBodySchema },
      responses: { 200: { description: "The changed load case.", schema: loadCaseResponseSchema } },
      errors: stale,
      handler: updateLoadCaseHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: `${base}/{loadCaseId}`,
      tag,
      summary: "Move a load case to the trash (restorable for 30 days by owners and editors)",
      access: { kind: "member", role: "editor" },
      request: { params: loadCaseParamsSchema },
      responses: { 204: { description: "In the trash." } },
      handler: deleteLoadCaseHandler(context),
    }),
    defineRoute({
      method: "put",
      path: `${base}/{loadCaseId}/states/{locationId}`,
      tag,
      summary: "Save the state at one location as a new revision (send the case's version)",
      access: { kind: "member", role: "editor" },
      request: { params: stateParamsSchema, body: putStateBodySchema },
      responses: {
        200: { description: "The load case with the new state.", schema: loadCaseResponseSchema },
      },
      errors: stale,
      handler: putStateHandler(context),
    }),
    defineRoute({
      method: "get",
      path: `${base}/{loadCaseId}/states/{locationId}/revisions`,
      tag,
      summary: "Every saved revision of the state at one location, newest first",
      access: { kind: "member", role: "viewer" },
      request: { params: stateParamsSchema },
      responses: { 200: { description: "The revisions.", schema: stateHistorySchema } },
      handler: stateHistoryHandler,
    }),
  ];
}

import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  combinationResultsHandler,
  createCombinationHandler,
  deleteCombinationHandler,
  getCombinationHandler,
  listCombinationsHandler,
  updateCombinationHandler,
} from "./handlers";
import {
  combinationListSchema,
  combinationParamsSchema,
  combinationResponseSchema,
  combinationResultsSchema,
  createCombinationBodySchema,
  projectParamsSchema,
  updateCombinationBodySchema,
} from "./schema";

const tag = "combinations";
const base = "/workspaces/{workspaceId}/projects/{projectId}/combinations";

/** Load combinations (Σ factor × case, by superposition), under …/projects/{projectId}/combinations. */
export function combinationRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: base,
      tag,
      summary: "A project's combinations",
      access: { kind: "member", role: "viewer" },
      request: { params: projectParamsSchema },
      responses: { 200: { description: "The combinations.", schema: combinationListSchema } },
      handler: listCombinationsHandler,
    }),
    defineRoute({
      method: "post",
      path: base,
      tag,
      summary: "Create a combination of the project's load cases with factors",
      access: { kind: "member", role: "editor" },
      request: { params: projectParamsSchema, body: createCombinationBodySchema },
      responses: { 201: { description: "The new combination.", schema: combinationResponseSchema } },
      handler: createCombinationHandler(context),
    }),
    defineRoute({
      method: "get",
      path: `${base}/{combinationId}`,
      tag,
      summary: "One combination",
      access: { kind: "member", role: "viewer" },
      request: { params: combinationParamsSchema },
      responses: { 200: { description: "The combination.", schema: combinationResponseSchema } },
      handler: getCombinationHandler,
    }),
    defineRoute({
      method: "get",
      path: `${base}/{combinationId}/results`,
      tag,
      summary: "The combination superposed at every location (linear-elastic assumption)",
      access: { kind: "member", role: "viewer" },
      request: { params: combinationParamsSchema },
      responses: { 200: { description: "The superposed states, in Pa.", schema: combinationResultsSchema } },
      handler: combinationResultsHandler,
    }),
    defineRoute({
      method: "patch",
      path: `${base}/{combinationId}`,
      tag,
      summary: "Change a combination (send the version you started from)",
      access: { kind: "member", role: "editor" },
      request: { params: combinationParamsSchema, body: updateCombinationBodySchema },
      responses: { 200: { description: "The changed combination.", schema: combinationResponseSchema } },
      errors: { 409: "The combination changed since that version; details carry the current one." },
      handler: updateCombinationHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: `${base}/{combinationId}`,
      tag,
      summary: "Move a combination to the trash (restorable for 30 days)",
      access: { kind: "member", role: "editor" },
      request: { params: combinationParamsSchema },
      responses: { 204: { description: "In the trash." } },
      handler: deleteCombinationHandler(context),
    }),
  ];
}

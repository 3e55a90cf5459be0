import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  createLocationHandler,
  deleteLocationHandler,
  getLocationHandler,
  listLocationsHandler,
  updateLocationHandler,
} from "./handlers";
import {
  createLocationBodySchema,
  locationListSchema,
  locationParamsSchema,
  locationResponseSchema,
  projectParamsSchema,
  updateLocationBodySchema,
} from "./schema";

const tag = "locations";
const base = "/workspaces/{workspaceId}/projects/{projectId}/locations";

/** The named points of a project's structure, under …/projects/{projectId}/locations. */
export function locationRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: base,
      tag,
      summary: "A project's locations, in order",
      access: { kind: "member", role: "viewer" },
      request: { params: projectParamsSchema },
      responses: { 200: { description: "The locations.", schema: locationListSchema } },
      handler: listLocationsHandler,
    }),
    defineRoute({
      method: "post",
      path: base,
      tag,
      summary: "Add a location",
      access: { kind: "member", role: "editor" },
      request: { params: projectParamsSchema, body: createLocationBodySchema },
      responses: { 201: { description: "The new location.", schema: locationResponseSchema } },
      handler: createLocationHandler(context),
    }),
    defineRoute({
      method: "get",
      path: `${base}/{locationId}`,
      tag,
      summary: "One location",
      access: { kind: "member", role: "viewer" },
      request: { params: locationParamsSchema },
      responses: { 200: { description: "The location.", schema: locationResponseSchema } },
      handler: getLocationHandler,
    }),
    defineRoute({
      method: "patch",
      path: `${base}/{locationId}`,
      tag,
      summary: "Change a location (send the version you started from)",
      access: { kind: "member", role: "editor" },
      request: { params: locationParamsSchema, body: updateLocationBodySchema },
      responses: { 200: { description: "The changed location.", schema: locationResponseSchema } },
      errors: { 409: "The location changed since that version; details carry the current one." },
      handler: updateLocationHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: `${base}/{locationId}`,
      tag,
      summary: "Move a location to the trash (its states stay, restorable for 30 days)",
      access: { kind: "member", role: "editor" },
      request: { params: locationParamsSchema },
      responses: { 204: { description: "In the trash." } },
      handler: deleteLocationHandler(context),
    }),
  ];
}

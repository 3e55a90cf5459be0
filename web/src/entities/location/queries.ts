import { queryOptions, useQuery } from "@tanstack/react-query";
import { locationListSchema, locationResponseSchema } from "../../../../core/contract/projects";
import { apiGet } from "../../lib/api-client";
import { projectPath } from "../project/keys";
import { locationKeys } from "./keys";

/** Base path of a project's location routes. */
export const locationsPath = (workspaceId: string, projectId: string) =>
  `${projectPath(workspaceId, projectId)}/locations`;

export const listLocations = (workspaceId: string, projectId: string) =>
  apiGet(locationsPath(workspaceId, projectId), locationListSchema).then((r) => r.locations);

export const getLocation = (workspaceId: string, projectId: string, locationId: string) =>
  apiGet(`${locationsPath(workspaceId, projectId)}/${locationId}`, locationResponseSchema).then(
    (r) => r.location,
  );

export const locationsQueryOptions = (workspaceId: string, projectId: string) =>
  queryOptions({
    queryKey: locationKeys.list(workspaceId, projectId),
    queryFn: () => listLocations(workspaceId, projectId),
  });

export const locationQueryOptions = (workspaceId: string, projectId: string, locationId: string) =>
  queryOptions({
    queryKey: locationKeys.detail(workspaceId, projectId, locationId),
    queryFn: () => getLocation(workspaceId, projectId, locationId),
    retry: false,
  });

/** The project's locations (where states are read), each with its own material or none. */
export const useLocations = (workspaceId: string, projectId: string) =>
  useQuery(locationsQueryOptions(workspaceId, projectId));

/** One location. */
export const useLocation = (workspaceId: string, projectId: string, locationId: string) =>
  useQuery(locationQueryOptions(workspaceId, projectId, locationId));

import { queryOptions, useQuery } from "@tanstack/react-query";
import { materialListSchema } from "../../../../core/contract/materials";
import { apiGet } from "../../lib/api-client";
import { materialKeys } from "./keys";

export const listMaterials = (workspaceId: string) =>
  apiGet(`/workspaces/${workspaceId}/materials`, materialListSchema);

export const materialsQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: materialKeys.list(workspaceId), queryFn: () => listMaterials(workspaceId) });

/** The library and the built-in list of published grades. */
export const useMaterials = (workspaceId: string) => useQuery(materialsQueryOptions(workspaceId));
